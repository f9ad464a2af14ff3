import { sizeFromWall, type PipeSeries } from './pipeSeries.js';

/**
 * EN 545:2010 / ISO 2531 ductile iron: external diameter and the minimum wall of the preferred
 * pressure class, mm. ODs as read in domain reference §7.4 (DN450, 1100, 1200 from memory).
 * Walls read from a producer's reproduction of the EN 545:2010 table: class C40 for DN80–300,
 * C30 for DN350–600, C25 for DN700–1000; DN450, 1100 and 1200 walls are from memory.
 */
const EN545: readonly [dn: number, od: number, wall: number, cls: string][] = [
  [80, 98, 3.0, 'C40'], [100, 118, 3.0, 'C40'], [125, 144, 3.0, 'C40'], [150, 170, 3.0, 'C40'],
  [200, 222, 3.1, 'C40'], [250, 274, 3.9, 'C40'], [300, 326, 4.6, 'C40'], [350, 378, 4.7, 'C30'],
  [400, 429, 4.8, 'C30'], [450, 480, 5.2, 'C30'], [500, 532, 5.6, 'C30'], [600, 635, 6.7, 'C30'],
  [700, 738, 6.8, 'C25'], [800, 842, 7.5, 'C25'], [900, 945, 8.4, 'C25'], [1000, 1048, 9.3, 'C25'],
  [1100, 1152, 10.2, 'C25'], [1200, 1255, 11.1, 'C25'],
];

export const DI_EN545: PipeSeries = {
  id: 'di-en545',
  label: 'Ductile iron, EN 545 / ISO 2531, preferred classes',
  material: 'ductile-iron',
  standard: 'EN 545:2010 / ISO 2531 external diameters',
  wallBasis: 'ID = OD − 2 × minimum wall of the preferred class (C40 to DN300, C30 to DN600, C25 above)',
  sizes: EN545.map(([dn, od, wall]) => sizeFromWall(`DN${dn}`, `DN ${dn}`, od / 1000, wall / 1000)),
};

/** The pressure class behind each EN 545 size's wall, for the editor's tooltip. */
export const EN545_CLASS: Readonly<Record<string, string>> = Object.fromEntries(EN545.map(([dn, , , c]) => [`DN${dn}`, c]));
