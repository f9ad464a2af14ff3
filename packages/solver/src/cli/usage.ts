export const USAGE = `mainbrace — thrust and restraint at every fitting of a buried water main

Usage:
  mainbrace schedule FILE [--format json|csv|table] [--units us|si] [--pretty] [--full]
                                  the fitting schedule (default: table, the project's units;
                                  JSON is indented at a terminal or with --pretty, and repeats
                                  positions, labels, soils and pipe sizes only with --full)
  mainbrace explain FILE MARK [--units us|si]
                                  the calculation record of one fitting (its mark, A4, or node id)
  mainbrace validate FILE         check a project file
  mainbrace schema                the JSON Schema of the project file
  mainbrace import FILE [options] a project file (JSON, on stdout) from a route: GeoJSON LineStrings
                                  in WGS 84 lon/lat (.geojson/.json) or a CSV survey (.csv)
      --format geojson|csv        when the file name does not say
      --easting COL --northing COL --level COL --run COL
                                  CSV header names (default: guessed from usual names)
      --unit m|ft|us-ft           CSV coordinates, levels, --cover and --tolerance (default m)
      --levels ground|pipe        what the levels are (default ground; the pipe goes --cover below)
      --cover N                   ground to top of pipe (default 1.2 m)
      --tolerance N               points closer than this are one node (default 0.1 m)
      --series ID --size NOMINAL  pipe of runs that name none (default di-en545 DN200)
      --proj4 DEF                 the CSV's grid, so the design can be exported as GeoJSON
      --name TEXT --pretty --verbose
  mainbrace export FILE           the design as GeoJSON in WGS 84 lon/lat: pipes, fittings, blocks,
                                  anchors, restrained zones with their results

Options for every command reading FILE:
  --max-size MB                   refuse files larger than this (default 20, as the app)

Exit status: 0 done; 2 a bad file or command line (one line per problem); 1 a fault of Mainbrace.
Design aid only: results must be checked by a licensed engineer; local codes and the utility's standards govern.
`;
