export const USAGE = `mainbrace — thrust and restraint at every fitting of a buried water main

Usage:
  mainbrace schedule FILE [--format json|csv|table] [--units us|si] [--pretty]
                                  the fitting schedule (default: table, the project's units;
                                  JSON is indented at a terminal or with --pretty)
  mainbrace quantities FILE [--format table|csv|json] [--units us|si]
                                  the quantities take-off: concrete by element and to order (with
                                  the project's waste allowance), restrained joints by size,
                                  fittings by size and angle, anchors
  mainbrace explain FILE MARK [--units us|si]
                                  the calculation record of one fitting (its mark, A4, or node id)
  mainbrace validate FILE         check a project file
  mainbrace schema                the JSON Schema of the project file

Options for every command reading FILE:
  --max-size MB                   refuse files larger than this (default 20, as the app)

Exit status: 0 done; 2 a bad file or command line (one line per problem); 1 a fault of Mainbrace.
Design aid only: results must be checked by a licensed engineer; local codes and the utility's standards govern.
`;
