import type { WordingContext } from '../src/diagnostics/wording.js';

/** A wording context that names everything by its id, in SI: for tests of a finding's sentence alone. */
export const plainWording: WordingContext = {
  units: 'si',
  caseName: (id) => id,
  soilName: (id) => id,
  legName: () => 'the leg',
  material: () => 'ductile iron',
  nodeName: (id) => id,
  pipeName: (id) => id,
};
