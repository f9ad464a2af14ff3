import { describe, it, expect } from 'vitest';
import { analyse } from './analyse.js';
import { route } from '../../test/projectBuilder.js';
import { RUN_TOLERANCE } from '../network/fittingKind.js';
import { scheduleOf } from '../schedule/scheduleOf.js';
import { fittingTitle, kindName } from '../schedule/fittingNames.js';
import { takeOff } from '../schedule/quantities.js';

/**
 * A junction of three pipes: the main comes in from the west, goes out toward (x, y) and a branch
 * leaves square to the incoming pipe (due north) to a cap. Standard tees and wyes have a straight run
 * (common practice), so a run that turns more than the run tolerance is a tee or wye and a bend, which
 * the crew must build as two fittings.
 */
const junction = (outX: number, outY: number) =>
  route({
    pressure: 1e6,
    nodes: [
      { id: 'w', x: -40, y: 0 },
      { id: 'j', x: 0, y: 0 },
      { id: 'e', x: outX, y: outY },
      { id: 'n', x: 0, y: 30 },
    ],
    pipes: [
      { from: 'w', to: 'j', od: 0.222 },
      { from: 'j', to: 'e', od: 0.222 },
      { from: 'j', to: 'n', od: 0.222 },
    ],
  });

const bentRun = (outX: number, outY: number) =>
  analyse(junction(outX, outY))
    .byNode.get('j')!
    .diagnostics.find((d) => d.code === 'fitting.bent-run');

describe('a three-pipe junction whose run is not straight', () => {
  it('is flagged with the angle the run turns', () => {
    // out toward (30, −20): the run turns atan(20/30) = 33.69° (hand calculation)
    const d = bentRun(30, -20);
    expect(d?.severity).toBe('warning');
    expect(d!.values.turn).toBeCloseTo((Math.atan(20 / 30) * 180) / Math.PI, 9);
  });

  it('is not flagged for a straight run or a turn within the run tolerance', () => {
    expect(bentRun(40, 0)).toBeUndefined();
    // a 3° turn (tan 3° · 40 m = 2.096 m off line) is within the 5° tolerance
    expect(RUN_TOLERANCE).toBe(5);
    expect(bentRun(40, -40 * Math.tan((3 * Math.PI) / 180))).toBeUndefined();
  });

  it('is named as a junction whose run turns, in the schedule and the take-off, not as a wye to order', () => {
    const project = junction(30, -20);
    const rows = scheduleOf(analyse(project)).fittings;
    const j = rows.find((f) => f.node === 'j')!;
    // the branch is square to the incoming pipe; the run turns 33.69° (hand calculation above)
    expect(fittingTitle(j)).toBe('Junction, run turns 33.7°, branch at 90°');
    // the kind alone (the route summary's list of largest thrusts) says junction too; a straight run's tee stays a tee
    expect(kindName(j)).toBe('Junction');
    const tee = scheduleOf(analyse(junction(40, 0))).fittings.find((f) => f.node === 'j')!;
    expect(kindName(tee)).toBe('Tee');
    const fittings = takeOff(rows, project, 'si').fittings.map((l) => l.fitting);
    expect(fittings.some((t) => t.startsWith('Junction, run turns 33.7°'))).toBe(true);
    expect(fittings.some((t) => t.startsWith('Wye'))).toBe(false);
  });
});
