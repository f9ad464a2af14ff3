/**
 * Figures of a paired measurement, ms of CPU time (user + system, every thread of the process): medians
 * of each side and the median of the per-pair ratios; and the wall-clock medians beside them. CPU time
 * is what the budgets judge: on a machine shared with other work, a long run is interrupted more often
 * than a short one, which wall time would count against it.
 */
export interface Paired {
  figure: number;
  floor: number;
  ratio: number;
  wallFigure: number;
  wallFloor: number;
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
  const wf: number[] = [];
  const wb: number[] = [];
  const time = (run: () => void, cpu: number[], wall: number[]) => {
    const start = performance.now();
    const c = process.cpuUsage();
    run();
    const d = process.cpuUsage(c);
    wall.push(performance.now() - start);
    cpu.push((d.user + d.system) / 1000);
  };
  for (let i = 0; i < pairs; i++) {
    if (i % 2) {
      time(floor, b, wb);
      time(figure, f, wf);
    } else {
      time(figure, f, wf);
      time(floor, b, wb);
    }
    r.push(f[i]! / Math.max(b[i]!, 1e-3));
  }
  return { figure: median(f), floor: median(b), ratio: median(r), wallFigure: median(wf), wallFloor: median(wb) };
}
