import { CATALOG, findSeries } from '../catalog/catalog.js';
import type { PipeSeries, PipeSize } from '../catalog/pipeSeries.js';
import { MATERIALS, type Material } from '../model/projectSchema.js';

/** The pipe an imported run is given: a catalogue size, by series and nominal. */
export interface PipeChoice {
  series: string;
  nominal: string;
  material: Material;
  outsideDiameter: number;
  insideDiameter: number;
}

/** The default pipe of an import: EN 545 ductile iron DN200 (the CLI and the app's dialog can change it). */
export const DEFAULT_SERIES = 'di-en545';
export const DEFAULT_NOMINAL = 'DN200';

const choice = (s: PipeSeries, z: PipeSize): PipeChoice => ({
  series: s.id,
  nominal: z.nominal,
  material: s.material,
  outsideDiameter: z.outsideDiameter,
  insideDiameter: z.insideDiameter,
});

/** Words a GIS or a survey uses for the materials this program knows. */
const MATERIAL_WORDS: Record<string, Material> = {
  di: 'ductile-iron',
  dci: 'ductile-iron',
  'ductile iron': 'ductile-iron',
  ductile: 'ductile-iron',
  'pvc-u': 'pvc',
  upvc: 'pvc',
  'pvc-o': 'pvc',
  pe: 'hdpe',
  pe100: 'hdpe',
  pe80: 'hdpe',
  mdpe: 'hdpe',
  polyethylene: 'hdpe',
  st: 'steel',
};

export function materialOf(word: string): Material | undefined {
  const w = word.trim().toLowerCase();
  if ((MATERIALS as readonly string[]).includes(w)) return w as Material;
  return MATERIAL_WORDS[w] ?? MATERIAL_WORDS[w.replace(/[_-]/g, ' ')];
}

/** A size of a series from how a file writes it: '8', 8, 'DN200', 'DN 200', '200', '8 in'. */
function sizeIn(series: PipeSeries, written: string): PipeSize | undefined {
  const w = written
    .trim()
    .toUpperCase()
    .replace(/\s+/g, '')
    .replace(/(IN|")$/, '');
  return series.sizes.find((z) => {
    const n = z.nominal.toUpperCase();
    return n === w || n === `DN${w}` || n.replace(/^DN/, '') === w;
  });
}

/**
 * The pipe for a run from the series, size and material it names (any may be missing), falling back
 * to `fallback`. Returns the choice and, when something named could not be matched, why.
 */
export function pipeChoice(
  named: { series?: string; size?: string; material?: string },
  fallback: PipeChoice,
): { pipe: PipeChoice; problem: string | null } {
  let material: Material | undefined;
  if (named.material !== undefined) {
    material = materialOf(named.material);
    if (!material)
      return {
        pipe: fallback,
        problem: `material "${named.material}" is not one this program knows (${MATERIALS.join(', ')}); took ${fallback.material}`,
      };
  }
  let candidates: PipeSeries[];
  if (named.series !== undefined) {
    const s = findSeries(named.series);
    if (!s)
      return {
        pipe: fallback,
        problem: `no pipe series "${named.series}" (known: ${CATALOG.map((c) => c.id).join(', ')}); took ${fallback.series} ${fallback.nominal}`,
      };
    candidates = [s];
  } else {
    const m = material ?? fallback.material;
    const own = findSeries(fallback.series);
    candidates = [...(own && own.material === m ? [own] : []), ...CATALOG.filter((s) => s.material === m && s !== own)];
  }
  if (candidates.length === 0)
    return {
      pipe: fallback,
      problem: `no pipe in the catalogue is ${material}; took ${fallback.series} ${fallback.nominal} (${fallback.material}): set this run's pipe by hand`,
    };
  if (named.size !== undefined)
    for (const s of candidates) {
      const z = sizeIn(s, named.size);
      if (z) return { pipe: choice(s, z), problem: null };
    }
  const s = candidates[0]!;
  const z = named.size === undefined && s.id === fallback.series ? sizeIn(s, fallback.nominal) : undefined;
  if (z) return { pipe: choice(s, z), problem: null };
  // The nearest size by outside diameter to the fallback's, in the named series or material: a size
  // the file names but no series holds keeps the run's material and says so.
  let best = s.sizes[0]!;
  for (const c of s.sizes)
    if (
      Math.abs(c.outsideDiameter - fallback.outsideDiameter) < Math.abs(best.outsideDiameter - fallback.outsideDiameter)
    )
      best = c;
  return {
    pipe: choice(s, best),
    problem:
      named.size === undefined
        ? null
        : `size "${named.size}" is not in ${candidates.map((c) => c.id).join(' or ')}; took ${s.id} ${best.nominal}, the size nearest the default pipe's: check it`,
  };
}

/** The pipe of an import's options: series and size, each defaulting. Throws when they do not name one. */
export function defaultPipe(series = DEFAULT_SERIES, size = DEFAULT_NOMINAL): PipeChoice {
  const s = findSeries(series);
  if (!s) throw new Error(`no pipe series "${series}" (known: ${CATALOG.map((c) => c.id).join(', ')})`);
  const z = sizeIn(s, size);
  if (!z) throw new Error(`no size "${size}" in ${series} (sizes: ${s.sizes.map((x) => x.nominal).join(', ')})`);
  return choice(s, z);
}
