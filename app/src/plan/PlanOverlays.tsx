import type { RefObject } from 'react';
import { FOOT, formatSi, POUND_FORCE, type Material } from '@mainbrace/solver';
import { useApp } from '../state/StoreContext.js';
import { gridSpacing } from '../state/viewport.js';
import { gridStep } from './drawGrid.js';
import { ARROW_PX } from './drawRoute.js';
import { MATERIAL_DASH, MATERIAL_NAME, PALETTE } from './palette.js';
import type { Scene } from './planScene.js';

/** A round force below `f` for the arrow legend: 1, 2, 5 × 10ⁿ in kN or lbf. */
function roundForce(f: number, us: boolean): number {
  const unit = us ? POUND_FORCE : 1000;
  const v = f / unit;
  const p = Math.pow(10, Math.floor(Math.log10(v)));
  const m = [5, 2, 1].find((k) => k * p <= v) ?? 1;
  return m * p * unit;
}

/** Scale bar, north arrow, grid spacing, pointer coordinates and the legend, over the plan canvas. */
export function PlanOverlays({ scene, coordsRef }: { scene: Scene; coordsRef: RefObject<HTMLSpanElement | null> }) {
  const viewport = useApp((s) => s.viewport);
  const units = useApp((s) => s.units);
  const tool = useApp((s) => s.tool);
  const caseView = useApp((s) => s.caseView);
  const cases = useApp((s) => s.project.loadCases);
  const shown =
    caseView.kind === 'envelope'
      ? 'worst of all cases'
      : (cases.find((c) => c.id === caseView.id)?.label ?? caseView.id);
  const drawing = useApp((s) => s.draw.phase === 'drawing');
  const us = units === 'us';
  const barLength = us ? gridSpacing(viewport.scale * FOOT, 110) * FOOT : gridSpacing(viewport.scale, 110);
  const barPx = barLength * viewport.scale;
  const ref = scene.largestForce > 0 ? roundForce(scene.largestForce, us) : 0;
  const refPx = ref > 0 ? (ARROW_PX * ref) / scene.largestForce : 0;
  const materials = [...new Set(scene.pipes.map((p) => p.material))] as Material[];
  return (
    <>
      <div className="plan-north" aria-label="North is up">
        <svg width="34" height="46" viewBox="0 0 34 46" aria-hidden="true">
          <path d="M17 4 L25 30 L17 25 L9 30 Z" fill={PALETTE.ink} />
          <path d="M17 4 L9 30 L17 25 Z" fill={PALETTE.paper} stroke={PALETTE.ink} strokeWidth="1" />
          <text x="17" y="43" textAnchor="middle" fontSize="11" fontWeight="700" fill={PALETTE.ink}>
            N
          </text>
        </svg>
      </div>
      <div className="plan-scale" data-testid="scale-bar">
        <div className="plan-scale-bar" style={{ width: barPx }}>
          <span style={{ width: barPx / 2 }} />
        </div>
        <div className="plan-scale-text">
          {formatSi(barLength, 'length', units)} · grid {formatSi(gridStep(viewport, units), 'length', units)}
        </div>
        <div className="plan-coords">
          <span ref={coordsRef}>pointer position: move over the plan</span>
        </div>
      </div>
      <div className="plan-legend" aria-label="Legend">
        <div className="legend-title">Thrust shown: {shown}</div>
        {materials.map((m) => (
          <div key={m} className="legend-row">
            <svg width="34" height="10" aria-hidden="true">
              {m === 'steel' && <line x1="2" y1="5" x2="32" y2="5" stroke={PALETTE.ink} strokeWidth="5" />}
              <line
                x1="2"
                y1="5"
                x2="32"
                y2="5"
                stroke={PALETTE.pipe}
                strokeWidth="3"
                strokeDasharray={MATERIAL_DASH[m].map((d) => d * 3).join(' ')}
              />
            </svg>
            {MATERIAL_NAME[m]}
          </div>
        ))}
        {ref > 0 && (
          <div className="legend-row">
            <svg width={Math.max(34, refPx + 6)} height="10" aria-hidden="true">
              <line x1="2" y1="5" x2={refPx - 4} y2="5" stroke={PALETTE.thrust} strokeWidth="2.2" />
              <path d={`M${refPx + 2} 5 l-8 -4 v8 z`} fill={PALETTE.thrust} />
            </svg>
            horizontal thrust {formatSi(ref, 'force', units)}
          </div>
        )}
        <div className="legend-row">
          <span className="legend-swatch legend-block" /> bearing block
        </div>
        <div className="legend-row">
          <span className="legend-swatch legend-anchor" /> gravity anchor
        </div>
        <div className="legend-row">
          <span className="legend-swatch legend-restrained" /> restrained joints
        </div>
        <div className="legend-row">
          <svg width="30" height="12" aria-hidden="true">
            <path d="M15 1 L20 6 L15 11 L10 6 Z" fill={PALETTE.paper} stroke={PALETTE.ink} strokeWidth="1.3" />
          </svg>
          tie-in to an existing main
        </div>
        <div className="legend-row">
          <span className="legend-warn" aria-hidden="true">
            !
          </span>{' '}
          warning
        </div>
      </div>
      {tool === 'draw' && (
        <div className="plan-hint" role="status">
          {drawing
            ? 'Click to add a bend · click a node or pipe to join it · Enter or double-click to finish · Backspace removes the last point · Esc cancels · hold Alt to place off the snap'
            : 'Click to start a run — on a node to branch from it, on a pipe to split it into a tee'}
        </div>
      )}
    </>
  );
}
