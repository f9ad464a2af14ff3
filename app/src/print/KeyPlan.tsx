import type { Analysis, Project } from '@mainbrace/solver';
import { formatSi } from '@mainbrace/solver';
import { gridSpacing } from '../state/viewport.js';
import { useApp } from '../state/StoreContext.js';
import { LABEL_FACE, PALETTE } from '../plan/palette.js';
import { FittingGlyph } from '../plan/FittingGlyph.js';
import { placeKeyMarks } from './keyPlanMarks.js';

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

interface Frame {
  sx: (x: number) => number;
  sy: (y: number) => number;
  scale: number;
  /** the route as one path: one element however many pipes (a long route prints hundreds of key plans) */
  route: string;
  tieIns: Project['nodes'];
}
const frames = new WeakMap<Analysis, Frame>();

/** The key plan's fit of the route, its path and tie-ins: made once per analysis, shared by every page. */
function frameOf(project: Project, analysis: Analysis): Frame {
  const cached = frames.get(analysis);
  if (cached) return cached;
  let x0 = Infinity,
    x1 = -Infinity,
    y0 = Infinity,
    y1 = -Infinity;
  for (const n of project.nodes) {
    x0 = Math.min(x0, n.x);
    x1 = Math.max(x1, n.x);
    y0 = Math.min(y0, n.y);
    y1 = Math.max(y1, n.y);
  }
  const scale = Math.min((W - 2 * PAD) / Math.max(x1 - x0, 1), (H - 2 * PAD) / Math.max(y1 - y0, 1));
  const cx = (x0 + x1) / 2,
    cy = (y0 + y1) / 2;
  const sx = (x: number) => W / 2 + (x - cx) * scale;
  const sy = (y: number) => H / 2 - (y - cy) * scale;
  const at = new Map(project.nodes.map((n) => [n.id, n]));
  const every = Math.max(1, Math.ceil(project.pipes.length / MOST_SEGMENTS));
  const parts: string[] = [];
  project.pipes.forEach((p, i) => {
    if (i % every !== 0) return;
    const a = at.get(p.from)!,
      b = at.get(p.to)!;
    parts.push(`M${sx(a.x).toFixed(1)} ${sy(a.y).toFixed(1)}L${sx(b.x).toFixed(1)} ${sy(b.y).toFixed(1)}`);
  });
  const tieIns = project.nodes.filter(
    (n) => n.end === 'tie-in' && analysis.marks.has(n.id) && !analysis.byNode.has(n.id),
  );
  const frame = { sx, sy, scale, route: parts.join(''), tieIns };
  frames.set(analysis, frame);
  return frame;
}

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
  const { sx, sy, scale, route, tieIns } = frameOf(project, analysis);
  const bar = gridSpacing(scale, 80);
  // Other fittings as dots while they are few enough to read; on a long route the line alone.
  const dots = !marks || analysis.fittings.length <= 200;
  const strong = marks ? analysis.fittings.filter((f) => marks.has(f.mark)) : analysis.fittings;
  // Tie-ins first: they bound the route, and a crew finds its way from them.
  const labels = placeKeyMarks(
    [
      ...tieIns.map((n) => ({ key: n.id, text: analysis.marks.get(n.id) ?? '', x: sx(n.x), y: sy(n.y) })),
      ...strong.map((f) => ({ key: f.node.id, text: f.mark, x: sx(f.node.x), y: sy(f.node.y) })),
    ],
    W,
    H,
    MARK,
  );
  return (
    <figure className="key-plan">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Key plan of the route with fitting marks">
        <rect x="0.5" y="0.5" width={W - 1} height={H - 1} fill="none" stroke={PALETTE.gridMajor} />
        <path d={route} fill="none" stroke={PALETTE.pipe} strokeWidth={1.6} strokeLinecap="round" />
        {(marks && !dots ? strong : analysis.fittings).map((f) =>
          marks && !marks.has(f.mark) ? (
            dots ? (
              <circle key={f.node.id} cx={sx(f.node.x)} cy={sy(f.node.y)} r={1.6} fill={PALETTE.gridLabel} />
            ) : null
          ) : (
            <FittingGlyph
              key={f.node.id}
              kind={f.geometry.kind}
              x={sx(f.node.x)}
              y={sy(f.node.y)}
              angle={f.legs[0] ? (Math.atan2(-f.legs[0].direction[1], f.legs[0].direction[0]) * 180) / Math.PI : 0}
              scale={0.6}
            />
          ),
        )}
        {tieIns.map((n) => (
          <FittingGlyph key={n.id} kind="tie-in" x={sx(n.x)} y={sy(n.y)} scale={0.6} />
        ))}
        {labels.map((m) => (
          <g key={m.key}>
            {m.leader && (
              <line
                x1={m.x}
                y1={m.y}
                x2={Math.min(Math.max(m.x, m.box.x), m.box.x + m.box.w)}
                y2={Math.min(Math.max(m.y, m.box.y), m.box.y + m.box.h)}
                stroke={PALETTE.ink}
                strokeWidth={0.6}
              />
            )}
            <text
              x={m.box.x}
              y={m.baseline}
              fontSize={MARK}
              fontFamily={LABEL_FACE}
              fontWeight="700"
              fill={PALETTE.ink}
            >
              {m.text}
            </text>
          </g>
        ))}
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
