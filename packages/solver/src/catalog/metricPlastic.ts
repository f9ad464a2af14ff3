import { VALUES } from '../provenance/registerValues.js';
import { metricPlasticRating } from './pressureRatings.js';
import { sizeFromWall, type PipeSeries } from './pipeSeries.js';

const MM = 1e-3; // m per mm

/**
 * Minimum wall of a metric plastic pipe, m: OD/SDR rounded up to 0.1 mm (register:
 * rating.metric-wall-rounding). OD in mm.
 */
export function metricWall(odMm: number, sdr: number): number {
  const step = VALUES['rating.metric-wall-rounding'] / MM;
  return Math.ceil(odMm / sdr / step - 1e-9) * step * MM;
}

/** ISO 1452-2 PVC-U nominal outside diameters, mm, 63–630 (from memory: the usual water-main range). */
// prettier-ignore
const PVC_OD: readonly number[] = [63, 75, 90, 110, 125, 140, 160, 200, 225, 250, 280, 315, 355, 400, 450, 500, 560, 630];

/** ISO 4427-2 / EN 12201-2 PE nominal outside diameters, mm, 63–1000 (from memory). */
// prettier-ignore
const PE_OD: readonly number[] = [
  63, 75, 90, 110, 125, 140, 160, 180, 200, 225, 250, 280, 315, 355, 400, 450, 500, 560, 630, 710, 800, 900, 1000,
];

/**
 * The SDR that gives a PVC-U pipe its PN: ISO 1452 tables a PN by size, because the design coefficient
 * is 2.5 up to 90 mm OD and 2.0 above (σs 10 and 12.5 MPa): PN 10 is SDR 21 to 90 mm and SDR 26 above,
 * PN 16 is SDR 13.6 and SDR 17 (register: rating.pvc-iso1452-stress).
 */
export const PVC_SDR: Readonly<Record<10 | 16, { upTo90: number; above90: number }>> = {
  10: { upTo90: 21, above90: 26 },
  16: { upTo90: 13.6, above90: 17 },
};

export const pvcSdr = (pn: 10 | 16, odMm: number): number => (odMm <= 90 ? PVC_SDR[pn].upTo90 : PVC_SDR[pn].above90);

function pvcIso1452(pn: 10 | 16): PipeSeries {
  return {
    id: `pvcu-iso1452-pn${pn}`,
    label: `PVC-U, ISO 1452, PN ${pn}`,
    material: 'pvc',
    sizing: 'metric',
    standard: 'ISO 1452-2 (EN ISO 1452-2) PVC-U pipes for water supply, nominal outside diameters',
    wallBasis: `minimum wall t = OD/SDR rounded up to 0.1 mm, SDR ${PVC_SDR[pn].upTo90} to 90 mm and SDR ${PVC_SDR[pn].above90} above; ID = OD − 2t`,
    sizes: PVC_OD.map((od) =>
      sizeFromWall(`dn${od}`, `dn ${od}`, od * MM, metricWall(od, pvcSdr(pn, od)), metricPlasticRating(pn)),
    ),
  };
}

/** PE 100 SDR → PN: 20·8 MPa/(SDR − 1) bar (register: rating.pe100-stress). */
export const PE100_PN: Readonly<Record<11 | 17, number>> = { 11: 16, 17: 10 };

function pe100(sdr: 11 | 17): PipeSeries {
  const pn = PE100_PN[sdr];
  return {
    id: `pe100-iso4427-sdr${sdr}`,
    label: `PE 100, ISO 4427 / EN 12201, SDR ${sdr} (PN ${pn})`,
    material: 'hdpe',
    sizing: 'metric',
    standard: 'ISO 4427-2 / EN 12201-2 PE pipes for water supply, nominal outside diameters',
    wallBasis: `minimum wall t = OD/${sdr} rounded up to 0.1 mm; ID = OD − 2t`,
    sizes: PE_OD.map((od) =>
      sizeFromWall(`dn${od}`, `dn ${od}`, od * MM, metricWall(od, sdr), metricPlasticRating(pn)),
    ),
  };
}

export const PVCU_ISO1452_PN10 = pvcIso1452(10);
export const PVCU_ISO1452_PN16 = pvcIso1452(16);
export const PE100_SDR11 = pe100(11);
export const PE100_SDR17 = pe100(17);
