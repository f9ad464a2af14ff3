import { memo, useMemo, type RefObject } from 'react';
import { FOOT, formatSi, KIND_NAME, KIP, type FittingKind, type Material } from '@mainbrace/solver';
import { useActions, useApp } from '../state/StoreContext.js';
import { showColumnForce } from '../format/quantity.js';
import { gridSpacing } from '../state/viewport.js';
import { gridStep } from './drawGrid.js';
import { ARROW_PX } from './drawRoute.js';
import { LINE, MATERIAL_DASH, MATERIAL_NAME, PALETTE } from './palette.js';
import { FittingGlyph } from './FittingGlyph.js';
import { LEGEND_KINDS } from './symbols.js';
import { caseNames } from '../state/caseNames.js';
import type { Scene } from './planScene.js';
import { lazyPart } from '../chrome/lazyPart.js';

/** The run's finish buttons: shown only while a run is drawn, so they load after the first screen. */
const FinishRun = lazyPart(() => import('./FinishRun.js').then((m) => m.FinishRun));

/** A round force below `f` for the arrow legend: 1, 2, 5 × 10ⁿ in kN or kip (the plan's one force unit). */
function roundForce(f: number, us: boolean): number {
  const unit = us ? KIP : 1000;
  const v = f / unit;
  const p = Math.pow(10, Math.floor(Math.log10(v)));
  const m = [5, 2, 1].find((k) => k * p <= v) ?? 1;
  return m * p * unit;
}

/** The fitting symbols of the legend, those on the plan only; rendered again only when that list changes. */
const LegendGlyphs = memo(function LegendGlyphs({ kinds }: { kinds: readonly FittingKind[] }) {
  if (kinds.length === 0) return null;
  return (
    <div className="legend-row legend-glyphs">
      {kinds.map((k) => (
        <span key={k} className="legend-glyph">
          <FittingGlyph kind={k} /> {KIND_NAME[k].toLowerCase()}
        </span>
      ))}
    </div>
  );
});

/** Scale bar, north arrow, grid spacing, pointer coordinates and the legend, over the plan canvas. */
export function PlanOverlays({ scene, coordsRef }: { scene: Scene; coordsRef: RefObject<HTMLSpanElement | null> }) {
  const viewport = useApp((s) => s.viewport);
  const units = useApp((s) => s.units);
  const legendOpen = useApp((s) => s.legendOpen);
  const actions = useActions();
  const caseView = useApp((s) => s.caseView);
  const cases = useApp((s) => caseNames(s.project.loadCases));
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
  // What the legend lists changes with the route only: a pressure change keeps the scene's pipes,
  // symbols and marks (the same objects), so the legend's rows are neither worked out nor rendered again.
  const { pipes, fittings, plainNodes } = scene;
  const materials = useMemo(() => [...new Set(pipes.map((p) => p.material))] as Material[], [pipes]);
  const kinds = useMemo(() => {
    const present = new Set<string>([
      ...fittings.map((f) => f.kind),
      ...plainNodes.filter((n) => n.tieIn).map(() => 'tie-in'),
    ]);
    return LEGEND_KINDS.filter((k) => present.has(k));
  }, [fittings, plainNodes]);
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
      {!legendOpen && (
        <button
          className="legend-toggle legend-closed"
          aria-expanded={false}
          aria-controls="plan-legend"
          onClick={() => actions.setLegendOpen(true)}
          onPointerDown={(e) => e.stopPropagation()}
          data-testid="legend-toggle"
        >
          Legend ▴
        </button>
      )}
      <div
        className="plan-legend"
        id="plan-legend"
        aria-label="Legend"
        hidden={!legendOpen}
        data-testid="legend"
        onPointerDown={(e) => e.stopPropagation()}
      >
        <div className="legend-title">
          <span>Thrust shown: {shown}</span>
          <button
            className="legend-toggle"
            aria-expanded={true}
            aria-controls="plan-legend"
            title="Hide the legend (Fit then uses the whole plan)"
            onClick={() => actions.setLegendOpen(false)}
            data-testid="legend-hide"
          >
            Hide ▾
          </button>
        </div>
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
            horizontal thrust {showColumnForce(ref, units)}
          </div>
        )}
        <LegendGlyphs kinds={kinds} />
        <div className="legend-row">
          <span className="legend-swatch legend-block" /> bearing block
        </div>
        <div className="legend-row">
          <span className="legend-swatch legend-anchor" /> gravity anchor
        </div>
        <div className="legend-row">
          <svg width="34" height="16" viewBox="0 0 34 16" aria-hidden="true">
            <line x1="1" y1="11" x2="33" y2="11" stroke={PALETTE.pipe} strokeWidth="3" />
            <g stroke={PALETTE.restraint} strokeWidth={LINE.joint}>
              <line x1="4" y1="6.5" x2="4" y2="15.5" />
              <line x1="17" y1="6.5" x2="17" y2="15.5" />
              <line x1="30" y1="6.5" x2="30" y2="15.5" />
            </g>
            <g stroke={PALETTE.restraint} strokeWidth={LINE.dimension}>
              <line x1="4" y1="2.5" x2="30" y2="2.5" />
              <line x1="1.5" y1="5" x2="6.5" y2="0" />
              <line x1="27.5" y1="5" x2="32.5" y2="0" />
            </g>
          </svg>
          restrained joints, with the restrained length
        </div>
        <div className="legend-row">
          <span className="legend-warn" aria-hidden="true">
            !
          </span>{' '}
          warning
        </div>
      </div>
      {drawing && <FinishRun />}
    </>
  );
}
