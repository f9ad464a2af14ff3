import { sizeFromWall, type PipeSeries } from './pipeSeries.js';
import { en545Rating } from './pressureRatings.js';

/** One EN 545 size: DN, external diameter (mm), minimum wall of its preferred class (mm), class. */
type En545Row = readonly [dn: number, od: number, wall: number, pressureClass: 'C40' | 'C30' | 'C25'];

/**
 * EN 545:2010 / ISO 2531 ductile iron, DN80–DN1200.
 * External diameters: EN 545:2010 dimension table [read: a pipe producer's reproduction], except DN450, DN1100, DN1200 (from memory).
 * Walls: the minimum wall thickness of EN 545:2010's pressure-class table [read: a pipe producer's
 * reproduction, DN80–DN1000 without DN450], taken in the preferred class: C40 to DN300 and C30 for
 * DN350–600 [read: a second producer's dimensions page], C25 for DN700 and up.
 * DN450 (5.1), DN1100 (10.2) and DN1200 (11.1) walls are from memory; they match the class formula
 * e_min = PFA·SF·DE/(20·Rm + PFA·SF), SF 3, Rm 420 MPa (from memory), which reproduces the read
 * walls except at DN350, 400 and 700, where the table raises them to smooth the class changes.
 */
// prettier-ignore
const EN545: readonly En545Row[] = [
  [80, 98, 3.0, 'C40'], [100, 118, 3.0, 'C40'], [125, 144, 3.0, 'C40'], [150, 170, 3.0, 'C40'],
  [200, 222, 3.1, 'C40'], [250, 274, 3.9, 'C40'], [300, 326, 4.6, 'C40'],
  [350, 378, 4.7, 'C30'], [400, 429, 4.8, 'C30'], [450, 480, 5.1, 'C30'], [500, 532, 5.6, 'C30'],
  [600, 635, 6.7, 'C30'],
  [700, 738, 6.8, 'C25'], [800, 842, 7.5, 'C25'], [900, 945, 8.4, 'C25'], [1000, 1048, 9.3, 'C25'],
  [1100, 1152, 10.2, 'C25'], [1200, 1255, 11.1, 'C25'],
];

const MM = 1e-3; // m per mm

export const DI_EN545: PipeSeries = {
  id: 'di-en545',
  label: 'Ductile iron, EN 545 / ISO 2531, preferred classes',
  material: 'ductile-iron',
  sizing: 'metric',
  standard: 'EN 545:2010 / ISO 2531 external diameters and pressure-class minimum walls',
  wallBasis:
    'ID = OD − 2 × t, t the EN 545:2010 minimum wall of the preferred class (C40 to DN300, C30 DN350–600, ' +
    'C25 DN700–1200; DN450, 1100, 1200 not verified against EN 545:2010, wall table); nominal walls are thicker, cement lining not deducted',
  sizes: EN545.map(([dn, od, wall, pressureClass]) =>
    sizeFromWall(`DN${dn}`, `DN ${dn}`, od * MM, wall * MM, en545Rating(pressureClass)),
  ),
};

/** The pressure class behind each EN 545 size's wall, keyed by nominal ('DN300' → 'C40'). */
export const EN545_CLASS: Readonly<Record<string, string>> = Object.fromEntries(
  EN545.map(([dn, , , pressureClass]) => [`DN${dn}`, pressureClass]),
);
