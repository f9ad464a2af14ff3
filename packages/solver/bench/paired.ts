/** Figures of a paired measurement, ms: medians of each side and the median of the per-pair ratios. */
export interface Paired {
  figure: number;
  floor: number;
  ratio: number;
}

const median = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

/**
 * Runs `figure` and `floor` one right after the other, `pairs` times, alternating which goes first:
 * on a shared machine a burst of load hits both sides of a pair alike, so the median of the ratios
 * holds still where each median alone wanders.
 */
export function paired(figure: () => void, floor: () => void, pairs: number): Paired {
  const f: number[] = [];
  const b: number[] = [];
  const r: number[] = [];
  const time = (run: () => void) => {
    const start = performance.now();
    run();
    return performance.now() - start;
  };
  for (let i = 0; i < pairs; i++) {
    let tf: number;
    let tb: number;
    if (i % 2) {
      tb = time(floor);
      tf = time(figure);
    } else {
      tf = time(figure);
      tb = time(floor);
    }
    f.push(tf);
    b.push(tb);
    r.push(tf / tb);
  }
  return { figure: median(f), floor: median(b), ratio: median(r) };
}
