import { norm, type Analysis, type FittingAnalysis } from '@mainbrace/solver';

/** The fittings with the largest governing thrust, largest first. */
export const largestThrusts = (analysis: Analysis, count: number): FittingAnalysis[] =>
  [...analysis.fittings]
    .sort((a, b) => norm(b.envelope.governing.total) - norm(a.envelope.governing.total))
    .slice(0, count);

/** Length of one pipe, m, node to node in 3-D, as the analysis measured it. */
export const pipeLength = (analysis: Analysis, pipe: { id: string; from: string }): number =>
  analysis.legs.get(pipe.from)?.find((l) => l.pipe.id === pipe.id)?.length ?? 0;

/** Length of the whole network, m: every pipe once (each appears as two legs). */
export function networkLength(analysis: Analysis): number {
  let sum = 0;
  for (const legs of analysis.legs.values()) for (const l of legs) sum += l.length;
  return sum / 2;
}
