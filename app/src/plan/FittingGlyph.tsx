import type { FittingKind } from '@mainbrace/solver';
import { PALETTE, LABEL_FACE } from './palette.js';
import { GLYPHS } from './symbols.js';

/**
 * A fitting symbol as SVG, the same as the plan draws it: for the legend, the key plan and the print.
 * Inside another SVG give `x`, `y` and `angle` (degrees, screen, clockwise); alone it is its own 18 px box.
 */
export function FittingGlyph({
  kind,
  x,
  y,
  angle = 0,
  scale = 1,
}: {
  kind: FittingKind;
  x?: number;
  y?: number;
  angle?: number;
  scale?: number;
}) {
  const g = GLYPHS[kind];
  const shape = (
    <g transform={`translate(${x ?? 9} ${y ?? 9}) scale(${scale})`}>
      <g transform={g.turns ? `rotate(${angle})` : undefined}>
        <path
          d={g.d}
          fill={g.fill === 'none' ? 'none' : g.fill === 'ink' ? PALETTE.ink : PALETTE.paper}
          stroke={g.stroke > 0 ? PALETTE.ink : 'none'}
          strokeWidth={g.stroke}
        />
        {g.dot ? <circle r={g.dot} fill={PALETTE.ink} /> : null}
      </g>
      {g.letter ? (
        <text
          y="0.5"
          textAnchor="middle"
          dominantBaseline="middle"
          fontFamily={LABEL_FACE}
          fontWeight="700"
          fontSize="9"
          fill={PALETTE.ink}
        >
          {g.letter}
        </text>
      ) : null}
    </g>
  );
  if (x !== undefined) return shape;
  return (
    <svg width="18" height="18" viewBox="0 0 18 18" aria-hidden="true" className="glyph">
      {shape}
    </svg>
  );
}
