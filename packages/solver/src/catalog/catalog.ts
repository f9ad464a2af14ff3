import type { Material } from '../model/projectSchema.js';
import { DI_AWWA_PC250, DI_AWWA_PC350 } from './ductileIronAwwa.js';
import { DI_EN545 } from './ductileIronEn545.js';
import { HDPE_C906_SERIES } from './hdpeC906.js';
import type { PipeSeries, PipeSize } from './pipeSeries.js';
import { PVC_C900_DR14, PVC_C900_DR18, PVC_C900_DR25 } from './pvcC900.js';
import { PE100_SDR11, PE100_SDR17, PVCU_ISO1452_PN10, PVCU_ISO1452_PN16 } from './metricPlastic.js';

/** Every pipe series the editor offers, each naming its standard; ids are stored in project files. */
export const CATALOG: readonly PipeSeries[] = [
  DI_AWWA_PC350,
  DI_AWWA_PC250,
  DI_EN545,
  PVC_C900_DR18,
  PVC_C900_DR14,
  PVC_C900_DR25,
  PVCU_ISO1452_PN10,
  PVCU_ISO1452_PN16,
  ...HDPE_C906_SERIES,
  PE100_SDR11,
  PE100_SDR17,
];

export const findSeries = (id: string): PipeSeries | undefined => CATALOG.find((s) => s.id === id);

export const findSize = (seriesId: string, nominal: string): PipeSize | undefined =>
  findSeries(seriesId)?.sizes.find((s) => s.nominal === nominal);

export const seriesForMaterial = (m: Material): PipeSeries[] => CATALOG.filter((s) => s.material === m);

/**
 * The series of a material with those sized in the project's own system first (millimetres for an SI
 * project, inches for a US one), so that a metric project is offered metric pipe before inch pipe.
 */
export const seriesChoices = (m: Material, units: 'si' | 'us'): PipeSeries[] => {
  const own = units === 'si' ? 'metric' : 'inch';
  const all = seriesForMaterial(m);
  return [...all.filter((s) => s.sizing === own), ...all.filter((s) => s.sizing !== own)];
};

/**
 * The size of a series whose OD is closest to the given OD (m), so the editor can match a typed
 * diameter to a catalogue entry; the smaller size wins a tie. Undefined for an unknown series.
 */
export function nearestSize(seriesId: string, outsideDiameter: number): PipeSize | undefined {
  let best: PipeSize | undefined;
  for (const s of findSeries(seriesId)?.sizes ?? []) {
    if (!best || Math.abs(s.outsideDiameter - outsideDiameter) < Math.abs(best.outsideDiameter - outsideDiameter)) {
      best = s;
    }
  }
  return best;
}
