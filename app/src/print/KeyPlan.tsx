import type { Analysis, Project } from '@mainbrace/solver';
import { formatSi } from '@mainbrace/solver';
import { gridSpacing } from '../state/viewport.js';
import { useApp } from '../state/StoreContext.js';
import { LABEL_FACE, PALETTE } from '../plan/palette.js';
import { FittingGlyph } from '../plan/FittingGlyph.js';

const W = 420;
const H = 230;
const PAD = 22;

/** A small plan of the whole route with every fitting's mark, north and a scale: where each row is. */
export function KeyPlan({ project, analysis }: { project: Project; analysis: Analysis }) {
  const units = useApp((s) => s.units);
  if (project.nodes.length === 0) return null;
  const xs = project.nodes.map((n) => n.x),
    ys = project.nodes.map((n) => n.y);
  const x0 = Math.min(...xs),
    x1 = Math.max(...xs),
    y0 = Math.min(...ys),
    y1 = Math.max(...ys);
  const scale = Math.min((W - 2 * PAD) / Math.max(x1 - x0, 1), (H - 2 * PAD) / Math.max(y1 - y0, 1));
  const cx = (x0 + x1) / 2,
    cy = (y0 + y1) / 2;
  const sx = (x: number) => W / 2 + (x - cx) * scale;
  const sy = (y: number) => H / 2 - (y - cy) * scale;
  const at = new Map(project.nodes.map((n) => [n.id, n]));
  const bar = gridSpacing(scale, 80);
  const tieIns = project.nodes.filter(
    (n) => n.end === 'tie-in' && analysis.marks.has(n.id) && !analysis.byNode.has(n.id),
  );
  return (
    <figure className="key-plan">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Key plan of the route with fitting marks">
        <rect x="0.5" y="0.5" width={W - 1} height={H - 1} fill="none" stroke={PALETTE.gridMajor} />
        {project.pipes.map((p) => {
          const a = at.get(p.from)!,
            b = at.get(p.to)!;
          return (
            <line
              key={p.id}
              x1={sx(a.x)}
              y1={sy(a.y)}
              x2={sx(b.x)}
              y2={sy(b.y)}
              stroke={PALETTE.pipe}
              strokeWidth={1 + p.outsideDiameter * 4}
            />
          );
        })}
        {tieIns.map((n) => (
          <g key={n.id}>
            <FittingGlyph kind="tie-in" x={sx(n.x)} y={sy(n.y)} scale={0.6} />
            <text x={sx(n.x) + 5} y={sy(n.y) - 4} fontSize="7.5" fontFamily={LABEL_FACE} fontWeight="700">
              {analysis.marks.get(n.id)}
            </text>
          </g>
        ))}
        {analysis.fittings.map((f, i) => (
          <g key={f.node.id}>
            <FittingGlyph
              kind={f.geometry.kind}
              x={sx(f.node.x)}
              y={sy(f.node.y)}
              angle={f.legs[0] ? (Math.atan2(-f.legs[0].direction[1], f.legs[0].direction[0]) * 180) / Math.PI : 0}
              scale={0.6}
            />
            <text
              x={sx(f.node.x) + 5}
              y={sy(f.node.y) + (i % 2 ? 10 : -4)}
              fontSize="7.5"
              fontFamily={LABEL_FACE}
              fontWeight="700"
              fill={PALETTE.ink}
            >
              {f.mark}
            </text>
          </g>
        ))}
        <g transform={`translate(${W - 18}, 10)`}>
          <path d="M0 0 L5 14 L0 11 L-5 14 Z" fill={PALETTE.ink} />
          <text x="0" y="23" textAnchor="middle" fontSize="8" fontWeight="700">
            N
          </text>
        </g>
        <g transform={`translate(10, ${H - 12})`}>
          <rect width={bar * scale} height="4" fill={PALETTE.ink} />
          <text x={bar * scale + 4} y="5" fontSize="7.5">
            {formatSi(bar, 'length', units)}
          </text>
        </g>
      </svg>
      <figcaption className="small muted">Key plan</figcaption>
    </figure>
  );
}
