import type { Pipe, Soil } from '../model/projectSchema.js';
import { diagnostic, type Diagnostic } from '../diagnostics/diagnostic.js';

/**
 * Whether restrained joints on a pipe of this material have a basis for their pipe–soil friction and
 * adhesion (register: joints.material-basis). Ductile iron takes the defaults of the ductile-iron
 * manual (registered unverified). Other materials have no default that Mainbrace could take from a
 * published table, so they are sized only with the project's own ratios on the soil (f_φ, and f_c
 * where the soil has cohesion); without them the joints are refused with an error naming what is
 * missing, rather than sized with ductile-iron values.
 */
export function jointMaterialBasis(
  pipe: Pipe,
  soil: Soil,
  node: string,
): { usable: boolean; diagnostics: Diagnostic[] } {
  if (pipe.material === 'ductile-iron') return { usable: true, diagnostics: [] };
  const subject = { node, pipe: pipe.id, soil: soil.id };
  const needsAdhesion = soil.cohesion > 0 && soil.pipeAdhesionRatio === undefined;
  if (soil.pipeFrictionRatio === undefined || needsAdhesion) {
    return {
      usable: false,
      diagnostics: [
        diagnostic('joints.no-material-basis', subject, {
          frictionMissing: soil.pipeFrictionRatio === undefined ? 1 : 0,
          adhesionMissing: needsAdhesion ? 1 : 0,
        }),
      ],
    };
  }
  const found = [diagnostic('joints.material-basis', subject)];
  if (pipe.material === 'hdpe') found.push(diagnostic('joints.fused-pe', { node, pipe: pipe.id }));
  return { usable: true, diagnostics: found };
}
