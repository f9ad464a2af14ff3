import type { Analysis, Project } from '@mainbrace/solver';
import { formatSi } from '@mainbrace/solver';
import { gridSpacing } from '../state/viewport.js';
import { useApp } from '../state/StoreContext.js';
import { LABEL_FACE, PALETTE } from '../plan/palette.js';
import { FittingGlyph } from '../plan/FittingGlyph.js';

const W = 420;
const H = 230;
const PAD = 22;

/**
 * Mark size in viewBox units: the key plan prints about 88 mm wide, so 12.5 of 420 units is 2.6 mm,
 * 7.4 pt (crew-sheet.md: marks at least 7 pt).
 */
const MARK = 12.5;
/** More pipes than this are drawn as every n-th one joined up: a key plan shows the shape, not each joint. */
const MOST_SEGMENTS = 1500;

/**
 * A small plan of the whole route with fitting marks, north and a scale: where each row is. With
 * `marks`, only those fittings (a page's) are labelled and drawn strong, the rest as dots.
 */
export function KeyPlan({
  project,
  analysis,
  marks,
}: {
  project: Project;
  analysis: Analysis;
  marks?: ReadonlySet<string>;
}) {
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
        {(project.pipes.length > MOST_SEGMENTS
          ? project.pipes.filter((_, i) => i % Math.ceil(project.pipes.length / MOST_SEGMENTS) === 0)
          : project.pipes
        ).map((p) => {
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
            <text x={sx(n.x) + 5} y={sy(n.y) - 4} fontSize={MARK} fontFamily={LABEL_FACE} fontWeight="700">
              {analysis.marks.get(n.id)}
            </text>
          </g>
        ))}
        {analysis.fittings.map((f, i) =>
          marks && !marks.has(f.mark) ? (
            marks.size < 60 || i % 20 === 0 ? (
              <circle key={f.node.id} cx={sx(f.node.x)} cy={sy(f.node.y)} r={1.6} fill={PALETTE.gridLabel} />
            ) : null
          ) : (
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
                y={sy(f.node.y) + (i % 2 ? 14 : -5)}
                fontSize={MARK}
                fontFamily={LABEL_FACE}
                fontWeight="700"
                fill={PALETTE.ink}
              >
                {f.mark}
              </text>
            </g>
          ),
        )}
        <g transform={`translate(${W - 18}, 10)`}>
          <path d="M0 0 L5 14 L0 11 L-5 14 Z" fill={PALETTE.ink} />
          <text x="0" y="25" textAnchor="middle" fontSize={MARK} fontWeight="700">
            N
          </text>
        </g>
        <g transform={`translate(10, ${H - 12})`}>
          <rect width={bar * scale} height="4" fill={PALETTE.ink} />
          <text x={bar * scale + 4} y="5" fontSize={MARK}>
            {formatSi(bar, 'length', units)}
          </text>
        </g>
      </svg>
      <figcaption className="small muted">Key plan</figcaption>
    </figure>
  );
}
