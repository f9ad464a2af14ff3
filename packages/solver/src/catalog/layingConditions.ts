import type { Pipe } from '../model/projectSchema.js';
import { VALUES } from '../provenance/registerValues.js';

/** A pipe's bedding: how the trench bottom and backfill around it are made. */
export interface Bedding {
  /** the laying condition number of AWWA C150/C151, kept as `trenchType` in the project file */
  condition: 1 | 2 | 3 | 4 | 5;
  /** in a few words, for a picker */
  short: string;
  /** in words a crew follows */
  words: string;
}

/**
 * The five standard laying conditions of AWWA C150/C151 (ductile-iron pipe), described in our words;
 * the number is the reference. They set the bearing of the pipe's side on the soil for restrained joints.
 */
export const BEDDINGS: readonly Bedding[] = [
  { condition: 1, short: 'Flat bottom, loose backfill', words: 'Flat-bottom trench; loose backfill.' },
  {
    condition: 2,
    short: 'Flat bottom, backfill firmed to mid-pipe',
    words: 'Flat-bottom trench; backfill lightly consolidated to the pipe centreline.',
  },
  {
    condition: 3,
    short: 'Loose-soil bed, backfill firmed over the top',
    words: 'Pipe bedded in at least 100 mm (4 in) of loose soil; backfill lightly consolidated to the top of the pipe.',
  },
  {
    condition: 4,
    short: 'Granular bed, backfill compacted over the top',
    words:
      'Pipe bedded in sand, gravel or crushed stone to one eighth of its diameter (at least 100 mm, 4 in); ' +
      'backfill compacted to the top of the pipe (about 80 % Standard Proctor).',
  },
  {
    condition: 5,
    short: 'Compacted granular to mid-pipe and over the top',
    words:
      'Pipe bedded to its centreline in compacted granular material, at least 100 mm (4 in) under the pipe; ' +
      'compacted granular or select backfill to the top of the pipe (about 90 % Standard Proctor).',
  },
];

/** Laying condition assumed when a pipe states none: the register's, which the restraint sizing reads too. */
export const DEFAULT_BEDDING: number = VALUES['joints.default-trench-type'];

/** "AWWA C150/C151 laying condition 4": the standard's reference for a bedding. */
export const beddingReference = (condition: number): string => `AWWA C150/C151 laying condition ${condition}`;

export const findBedding = (condition: number | undefined): Bedding =>
  BEDDINGS.find((b) => b.condition === (condition ?? DEFAULT_BEDDING)) ?? BEDDINGS[DEFAULT_BEDDING - 1]!;

/** The wrap around a pipe, in words: bare, or polyethylene encasement to AWWA C105. */
export const WRAP_WORDS: Record<NonNullable<Pipe['encasement']>, string> = {
  none: 'Bare pipe',
  polyethylene: 'Polyethylene wrap (AWWA C105 encasement)',
};
