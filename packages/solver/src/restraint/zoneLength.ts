import type { Pipe, Project } from '../model/projectSchema.js';
import { pipesAlong } from './routeReach.js';
import { pipeSoilResistance } from './pipeSoilResistance.js';
import { holdingPerMetre, type RestrainedLeg } from './restrainedLength.js';
import type { FittingSite } from './site.js';

type Ground = Pick<FittingSite, 'soil' | 'cover' | 'waterDepth' | 'waterUnitWeight'>;

/** N/m that a metre of `pipe` holds in the form the leg's length was found with. */
const perMetre = (pipe: Pipe, form: RestrainedLeg['form'], g: Ground): number =>
  holdingPerMetre(pipeSoilResistance(pipe, g.soil, g.cover, g), form);

/**
 * m, the length of a restrained zone that runs from `node` past its own pipe onto pipes of another size or
 * material. The DIPRA length is the resistance needed over the resistance per metre of restrained pipe
 * (F_s, or F_s + ½R on a bend), so the resistance `leg.length` stands for on the first pipe is gathered
 * pipe by pipe, each at its own resistance per metre: through a reducer onto a smaller pipe the zone
 * grows. Soil and cover are the fitting's, as for its own pipe; past the end of the line the last pipe's
 * resistance goes on (the caller cuts the zone there or carries it into an existing main). Where every
 * pipe holds alike, `leg.length` itself.
 */
export function zoneLength(project: Project, node: string, leg: RestrainedLeg, ground: Ground): number {
  let within = leg.length;
  for (;;) {
    const { steps } = pipesAlong(project, node, leg.pipe, within);
    if (!steps.length) return leg.length;
    const first = perMetre(steps[0]!.spec, leg.form, ground);
    let needed = leg.length * first;
    let length = 0;
    let walked = 0;
    let r = first;
    let alike = true;
    for (const s of steps) {
      walked += s.length;
      if (s !== steps[0]) r = perMetre(s.spec, leg.form, ground);
      alike &&= r === first;
      if (needed <= s.length * r) {
        length += needed / r;
        needed = 0;
        break;
      }
      needed -= s.length * r;
      length += s.length;
    }
    if (alike) return leg.length;
    length += needed / r;
    // The walk stops where `within` is covered or the line ends: walk again only if it stopped short.
    if (length <= walked || walked < within) return length;
    within = length;
  }
}
