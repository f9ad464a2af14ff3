import type { Analysis, ScheduleFitting, UnitSystem } from '@mainbrace/solver';
import { fittingTitle } from '@mainbrace/solver';
import { LABEL_FACE, PALETTE } from '../plan/palette.js';
import { sketchOf, VIEW, type Role, type Shape } from './sketchModel.js';

const STROKE: Record<Role, { stroke: string; fill: string; width: number }> = {
  pipe: { stroke: PALETTE.pipe, fill: 'none', width: 2.2 },
  block: { stroke: PALETTE.block, fill: PALETTE.blockFill, width: 1.2 },
  outline: { stroke: PALETTE.thrust, fill: 'none', width: 1.4 },
  anchor: { stroke: PALETTE.anchor, fill: 'rgba(47, 72, 88, 0.14)', width: 1.3 },
  pad: { stroke: PALETTE.pad, fill: 'rgba(109, 106, 95, 0.14)', width: 1 },
  soil: { stroke: PALETTE.ink, fill: 'none', width: 0.6 },
  ground: { stroke: PALETTE.ink, fill: 'none', width: 0.9 },
  water: { stroke: PALETTE.pipe, fill: PALETTE.pipe, width: 0.7 },
  thrust: { stroke: PALETTE.thrust, fill: PALETTE.thrust, width: 1.6 },
  joint: { stroke: PALETTE.restraint, fill: 'none', width: 1.6 },
  ink: { stroke: PALETTE.ink, fill: PALETTE.ink, width: 0.8 },
};

/** Font size of dimension text, sketch units (≈ 7 pt at the printed size of a sketch). */
const TEXT = 9.5;

function arrowHead(x: number, y: number, fromX: number, fromY: number, size = 4): string {
  const a = Math.atan2(y - fromY, x - fromX);
  const p = (da: number) => `${x - size * Math.cos(a + da)},${y - size * Math.sin(a + da)}`;
  return `${x},${y} ${p(0.4)} ${p(-0.4)}`;
}

function ShapeView({ s }: { s: Shape }) {
  switch (s.t) {
    case 'line': {
      const st = STROKE[s.role];
      return (
        <g>
          <line
            x1={s.x1}
            y1={s.y1}
            x2={s.x2}
            y2={s.y2}
            stroke={st.stroke}
            strokeWidth={st.width}
            strokeDasharray={s.dash ? '3 2' : undefined}
          />
          {s.role === 'thrust' && <polygon points={arrowHead(s.x2, s.y2, s.x1, s.y1, 5)} fill={st.fill} />}
        </g>
      );
    }
    case 'poly': {
      const st = STROKE[s.role];
      const pts = s.points.map(([x, y]) => `${x},${y}`).join(' ');
      return s.closed ? (
        <polygon
          points={pts}
          fill={st.fill}
          stroke={st.stroke}
          strokeWidth={st.width}
          strokeDasharray={s.dash || s.role === 'outline' ? '3 2' : undefined}
        />
      ) : (
        <polyline points={pts} fill="none" stroke={st.stroke} strokeWidth={st.width} />
      );
    }
    case 'circle': {
      const st = STROKE[s.role];
      return (
        <circle
          cx={s.x}
          cy={s.y}
          r={s.r}
          fill={s.role === 'ink' ? st.fill : '#fff'}
          stroke={st.stroke}
          strokeWidth={1.2}
        />
      );
    }
    case 'text':
      return (
        <text
          x={s.x}
          y={s.y}
          fontSize={TEXT - 1}
          fill={STROKE[s.role].stroke}
          textAnchor={s.anchor ?? 'start'}
          fontWeight={700}
        >
          {s.text}
        </text>
      );
    case 'hatch': {
      // Short 45° strokes along the edge on the given side: undisturbed soil or ground.
      const len = Math.hypot(s.x2 - s.x1, s.y2 - s.y1);
      const n = Math.max(2, Math.floor(len / 4));
      const [ux, uy] = [(s.x2 - s.x1) / len, (s.y2 - s.y1) / len];
      const [nx, ny] = [-uy * s.side, ux * s.side];
      const strokes = Array.from({ length: n + 1 }, (_, i) => {
        const x = s.x1 + ux * (i * (len / n));
        const y = s.y1 + uy * (i * (len / n));
        return `M${x},${y} l${(nx + ux) * 3.5},${(ny + uy) * 3.5}`;
      });
      return <path d={strokes.join(' ')} stroke={STROKE[s.role].stroke} strokeWidth={0.6} fill="none" />;
    }
    case 'dim': {
      const [mx, my] = [(s.x1 + s.x2) / 2, (s.y1 + s.y2) / 2];
      const vertical = Math.abs(s.x2 - s.x1) < Math.abs(s.y2 - s.y1);
      const angle = (Math.atan2(s.y2 - s.y1, s.x2 - s.x1) * 180) / Math.PI;
      const upright = vertical ? -90 : angle > 90 || angle < -90 ? angle + 180 : angle;
      return (
        <g className="dim">
          <line x1={s.x1} y1={s.y1} x2={s.x2} y2={s.y2} stroke={PALETTE.ink} strokeWidth={0.6} />
          <polygon points={arrowHead(s.x1, s.y1, s.x2, s.y2, 3.2)} fill={PALETTE.ink} />
          <polygon points={arrowHead(s.x2, s.y2, s.x1, s.y1, 3.2)} fill={PALETTE.ink} />
          <text
            x={mx}
            y={my}
            fontSize={TEXT}
            fontWeight={600}
            textAnchor="middle"
            dy={s.side === 1 ? -2 : TEXT}
            transform={`rotate(${upright} ${mx} ${my})`}
            paintOrder="stroke"
            stroke="#fff"
            strokeWidth={2.5}
            fill={PALETTE.ink}
          >
            {s.text}
          </text>
        </g>
      );
    }
  }
}

/**
 * A fitting's restraint sketch: plan and section side by side, then what to build in words. SVG, so
 * it is crisp in print and on screen; the same component draws it in the print and the details panel.
 */
export function RestraintSketch({
  fitting,
  analysis,
  units,
  notes,
}: {
  fitting: ScheduleFitting;
  analysis: Analysis;
  units: UnitSystem;
  /** the numbers of this row's notes, "1, 3" */
  notes?: string;
}) {
  const k = sketchOf(fitting, analysis, units);
  return (
    <figure className={`sketch ${k.notAdequate ? 'sketch-not-adequate' : ''}`} data-testid={`sketch-${k.mark}`}>
      <figcaption>
        <strong className="mark">{k.mark}</strong> {fittingTitle(fitting)}
        {notes ? <span className="sketch-notes"> · notes {notes}</span> : null}
      </figcaption>
      <svg
        viewBox={`0 0 ${VIEW.w * 2 + 4} ${VIEW.h}`}
        role="img"
        aria-label={`Restraint sketch of ${k.mark}: plan and section`}
        fontFamily={LABEL_FACE}
      >
        <g>
          <rect x={0.5} y={0.5} width={VIEW.w - 1} height={VIEW.h - 1} fill="none" stroke={PALETTE.gridMajor} />
          {k.plan.map((s, i) => (
            <ShapeView key={i} s={s} />
          ))}
        </g>
        <g transform={`translate(${VIEW.w + 4}, 0)`}>
          <rect x={0.5} y={0.5} width={VIEW.w - 1} height={VIEW.h - 1} fill="none" stroke={PALETTE.gridMajor} />
          {k.section.map((s, i) => (
            <ShapeView key={i} s={s} />
          ))}
        </g>
      </svg>
      <ul className="sketch-lines">
        {k.lines.map((l, i) => (
          <li key={i} className={k.notAdequate && i === 0 ? 'strong' : ''}>
            {l}
          </li>
        ))}
      </ul>
    </figure>
  );
}
