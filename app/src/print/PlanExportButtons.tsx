import { useState } from 'react';
import { scheduleOf } from '@mainbrace/solver';
import { useAnalysis, useApp } from '../state/StoreContext.js';
import { download, fileStem } from '../files/saveFile.js';
import { PLAN_SCALES, planDrawing } from './planExport/planDrawing.js';
import { drawingSvg } from './planExport/drawingSvg.js';
import { drawingPdf } from './planExport/drawingPdf.js';

/** Plan export at a chosen scale for the drawing set, as SVG or PDF (one sheet as large as the plan needs). */
export function PlanExportButtons() {
  const project = useApp((s) => s.project);
  const units = useApp((s) => s.units);
  const analysis = useAnalysis();
  const [scale, setScale] = useState(units === 'us' ? '1in40ft' : '1:500');
  const [problem, setProblem] = useState<string | null>(null);
  const exportAs = (kind: 'svg' | 'pdf') => {
    const s = PLAN_SCALES.find((x) => x.id === scale)!;
    try {
      const d = planDrawing(analysis, scheduleOf(analysis).fittings, units, s, project.name);
      const name = `${fileStem(project)}-plan-${s.id.replace(/[^0-9a-z]+/gi, '')}.${kind}`;
      if (kind === 'svg') download(name, drawingSvg(d), 'image/svg+xml');
      else download(name, drawingPdf(d) as BlobPart, 'application/pdf');
      setProblem(null);
    } catch (e) {
      setProblem((e as Error).message);
    }
  };
  return (
    <span className="plan-export">
      <label>
        Plan at{' '}
        <select
          value={scale}
          onChange={(e) => setScale(e.target.value)}
          aria-label="Plan scale"
          data-testid="plan-scale"
        >
          {PLAN_SCALES.map((s) => (
            <option key={s.id} value={s.id}>
              {s.label}
            </option>
          ))}
        </select>
      </label>
      <button onClick={() => exportAs('svg')} disabled={project.nodes.length === 0} data-testid="plan-svg">
        Plan SVG
      </button>
      <button onClick={() => exportAs('pdf')} disabled={project.nodes.length === 0} data-testid="plan-pdf">
        Plan PDF
      </button>
      {problem && (
        <span className="field-error" role="alert">
          {problem}
        </span>
      )}
    </span>
  );
}
