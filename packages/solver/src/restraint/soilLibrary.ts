import { FOOT, PSF } from '../units/conversions.js';
import type { Soil } from '../model/projectSchema.js';

/** A built-in soil the user can copy into a project; `family` groups the rows by their table. */
export interface LibrarySoil extends Soil {
  family: 'horizontal-bearing' | 'safe-bearing' | 'ibc-1806';
  source: string;
}

const psf = (v: number) => v * PSF;
const psfPerFoot = (v: number) => (v * PSF) / FOOT;
const kNm3 = (v: number) => v * 1000;
const kPa = (v: number) => v * 1000;

/** Unit weight, friction angle and cohesion of the library rows are typical values (common practice). */
const TYPICAL = 'γ, φ, c typical values (common practice): replace with site data';

const HORIZONTAL =
  'Horizontal bearing strength table, DIPRA "Thrust Restraint Design for Ductile Iron Pipe" (use with SF 1.5)';
const SAFE = 'Safe bearing load, PVC pipe literature (AWWA M23 / Uni-Bell lineage, unverified), for cover over 2 ft';
const IBC = 'IBC 2012 Table 1806.2 presumptive lateral bearing, grows with depth below natural grade';

/** Seven horizontal bearing strengths for thrust blocks (domain reference §4.2). */
const horizontalBearing: LibrarySoil[] = [
  { id: 'dipra-muck', label: 'Muck', bearing: 0, unitWeight: kNm3(14), frictionAngle: 0, cohesion: 0 },
  {
    id: 'dipra-soft-clay',
    label: 'Soft clay',
    bearing: psf(1000),
    unitWeight: kNm3(17),
    frictionAngle: 0,
    cohesion: kPa(12),
  },
  { id: 'dipra-silt', label: 'Silt', bearing: psf(1500), unitWeight: kNm3(18), frictionAngle: 28, cohesion: 0 },
  {
    id: 'dipra-sandy-silt',
    label: 'Sandy silt',
    bearing: psf(3000),
    unitWeight: kNm3(18),
    frictionAngle: 30,
    cohesion: 0,
  },
  { id: 'dipra-sand', label: 'Sand', bearing: psf(4000), unitWeight: kNm3(18.5), frictionAngle: 32, cohesion: 0 },
  {
    id: 'dipra-sandy-clay',
    label: 'Sandy clay',
    bearing: psf(6000),
    unitWeight: kNm3(19),
    frictionAngle: 20,
    cohesion: kPa(10),
  },
  {
    id: 'dipra-hard-clay',
    label: 'Hard clay',
    bearing: psf(9000),
    unitWeight: kNm3(20),
    frictionAngle: 0,
    cohesion: kPa(100),
  },
].map((s) => ({ ...s, family: 'horizontal-bearing' as const, source: `${HORIZONTAL}; ${TYPICAL}` }));

/** Safe bearing loads of the PVC literature, valid for more than 2 ft of cover (§4.3). */
const safeBearing: LibrarySoil[] = [
  { id: 'pvc-muck-peat', label: 'Muck, peat', bearing: 0, unitWeight: kNm3(14), frictionAngle: 0, cohesion: 0 },
  {
    id: 'pvc-soft-clay',
    label: 'Soft clay',
    bearing: psf(1000),
    unitWeight: kNm3(17),
    frictionAngle: 0,
    cohesion: kPa(12),
  },
  { id: 'pvc-sand', label: 'Sand', bearing: psf(2000), unitWeight: kNm3(18.5), frictionAngle: 32, cohesion: 0 },
  {
    id: 'pvc-sand-gravel',
    label: 'Sand and gravel',
    bearing: psf(3000),
    unitWeight: kNm3(19.5),
    frictionAngle: 35,
    cohesion: 0,
  },
  {
    id: 'pvc-sand-gravel-clay',
    label: 'Sand and gravel cemented with clay',
    bearing: psf(4000),
    unitWeight: kNm3(20),
    frictionAngle: 35,
    cohesion: kPa(10),
  },
  {
    id: 'pvc-hard-shale',
    label: 'Hard shale',
    bearing: psf(10000),
    unitWeight: kNm3(22),
    frictionAngle: 40,
    cohesion: kPa(50),
  },
].map((s) => ({ ...s, family: 'safe-bearing' as const, minCover: 2 * FOOT, source: `${SAFE}; ${TYPICAL}` }));

/** IBC Table 1806.2 classes: lateral bearing per foot of depth, vertical foundation pressure (§4.4). */
const ibc: LibrarySoil[] = [
  {
    id: 'ibc-1-bedrock',
    label: 'IBC class 1: crystalline bedrock',
    perFoot: 1200,
    vertical: 12000,
    unitWeight: kNm3(24),
    frictionAngle: 45,
    cohesion: 0,
  },
  {
    id: 'ibc-2-sedimentary-rock',
    label: 'IBC class 2: sedimentary and foliated rock',
    perFoot: 400,
    vertical: 4000,
    unitWeight: kNm3(23),
    frictionAngle: 40,
    cohesion: 0,
  },
  {
    id: 'ibc-3-gravel',
    label: 'IBC class 3: sandy gravel, gravel (GW, GP)',
    perFoot: 200,
    vertical: 3000,
    unitWeight: kNm3(20),
    frictionAngle: 36,
    cohesion: 0,
  },
  {
    id: 'ibc-4-sand',
    label: 'IBC class 4: sand, silty or clayey sand and gravel (SW, SP, SM, SC, GM, GC)',
    perFoot: 150,
    vertical: 2000,
    unitWeight: kNm3(19),
    frictionAngle: 32,
    cohesion: 0,
  },
  {
    id: 'ibc-5-clay-silt',
    label: 'IBC class 5: clay, sandy or silty clay, silt (CL, ML, MH, CH)',
    perFoot: 100,
    vertical: 1500,
    unitWeight: kNm3(18),
    frictionAngle: 0,
    cohesion: kPa(20),
  },
].map(({ perFoot, vertical, ...s }) => ({
  ...s,
  bearing: 0,
  bearingPerDepth: psfPerFoot(perFoot),
  verticalBearing: psf(vertical),
  family: 'ibc-1806' as const,
  source: `${IBC}; ${TYPICAL}`,
}));

export const SOIL_LIBRARY: readonly LibrarySoil[] = [...horizontalBearing, ...safeBearing, ...ibc];

export const findLibrarySoil = (id: string): LibrarySoil | undefined => SOIL_LIBRARY.find((s) => s.id === id);
