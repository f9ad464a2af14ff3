import { useEffect, useMemo, useState } from 'react';
import { createPortal } from 'react-dom';
import { FOOT, PSI, SHORT_CAUTION } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { show } from '../format/quantity.js';
import { gridSpacing } from '../state/viewport.js';
import { profileData } from './profileData.js';
import { LongSection, SECTION_M as M, SECTION_W as W, sectionExtent, ticks } from './LongSection.js';
import { extentOf } from '../format/extent.js';
import { TitleBlock } from '../print/TitleBlock.js';
import { LevelsTable } from './LevelsTable.js';

const CASE_STYLES = [
  { stroke: '#1d6fb8', dash: '' },
  { stroke: '#7a4fb0', dash: '6 4' },
  { stroke: '#b83a14', dash: '2 3' },
  { stroke: '#2f7d4f', dash: '10 3 2 3' },
];

/**
 * The long section of the route (LongSection.tsx), printable on its own; below it the pressure of every
 * case along the main line, where the low points show as peaks. Grades far above the pipe are named
 * rather than drawn, so the pipe is never flattened to a line.
 */
export function ProfilePanel() {
  const project = useApp((s) => s.project);
  const analysis = useAnalysis();
  const actions = useActions();
  const data = useMemo(() => profileData(project, analysis), [project, analysis]);
  const u = useApp((s) => s.units);
  const [printing, setPrinting] = useState(false);
  // Print the long section alone: it is drawn outside the app while the browser prints, then removed.
  useEffect(() => {
    if (!printing) return;
    document.body.classList.add('printing-long-section');
    const done = () => setPrinting(false);
    window.addEventListener('afterprint', done);
    const t = setTimeout(() => window.print(), 50);
    return () => {
      clearTimeout(t);
      window.removeEventListener('afterprint', done);
      document.body.classList.remove('printing-long-section');
    };
  }, [printing]);
  if (data.points.length < 2) return <p className="muted">Draw a main to see its profile.</p>;
  const print = () => setPrinting(true);
  const [x0, x1] = sectionExtent(data);
  const sx = (c: number) => M.left + ((c - x0) / (x1 - x0 || 1)) * (W - M.left - M.right);
  const lengthUnit = u === 'us' ? FOOT : 1;
  const xStep = gridSpacing((W - M.left - M.right) / ((x1 - x0) / lengthUnit || 1), 90) * lengthUnit;

  // Pressure along the line, every case.
  const H2 = 150;
  const all = data.pressures.flatMap((c) => c.values);
  const [low, high] = extentOf(all);
  const p0 = Math.min(0, low),
    p1 = high * 1.08 || 1;
  const sp = (p: number) => H2 - M.bottom - ((p - p0) / (p1 - p0)) * (H2 - M.top - M.bottom);
  const pressureUnit = u === 'us' ? PSI : 1000;
  const pStep = gridSpacing((H2 - M.top - M.bottom) / ((p1 - p0) / pressureUnit), 28) * pressureUnit;

  const xAxis = (h: number) =>
    ticks(x0, x1, xStep).map((c) => (
      <g key={`x${c}`}>
        <line x1={sx(c)} x2={sx(c)} y1={M.top} y2={h - M.bottom} className="profile-grid" />
        <text x={sx(c)} y={h - M.bottom + 13} textAnchor="middle" className="profile-axis">
          {show(c, 'length', u, 4)}
        </text>
      </g>
    ));
  return (
    <figure className="profile" data-testid="profile">
      {printing &&
        createPortal(
          <div className="long-section-print" data-testid="long-section-print">
            <TitleBlock
              project={project}
              units={u}
              kind="Long section"
              subtitle={`Main line, chainage ${show(data.points[0]?.chainage ?? 0, 'length', u, 4)} to ${show(data.points.at(-1)?.chainage ?? 0, 'length', u, 4)}`}
              sheet="Sheet 1 of 1"
              scale="Vertical scale as stated on the section; levels and chainages as figured"
            />
            <LongSection data={data} analysis={analysis} units={u} />
            <p className="caution-line">{SHORT_CAUTION}</p>
          </div>,
          document.body,
        )}
      <div className="profile-actions no-print">
        <button onClick={print} data-testid="print-long-section">
          Print the long section…
        </button>
        <span className="muted" data-testid="profile-levels-hint">
          Levels are typed in the table under the section, or in a node’s details: click a node on the section or the
          plan.
        </span>
      </div>
      <LongSection data={data} analysis={analysis} units={u} onSelect={actions.revealNode} />
      <svg viewBox={`0 0 ${W} ${H2}`} role="img" aria-label="Pressure of every case along the main line">
        {ticks(p0, p1, pStep).map((p) => (
          <g key={`p${p}`}>
            <line x1={M.left} x2={W - M.right} y1={sp(p)} y2={sp(p)} className="profile-grid" />
            <text x={M.left - 6} y={sp(p) + 3} textAnchor="end" className="profile-axis">
              {show(p, 'pressure', u, 3)}
            </text>
          </g>
        ))}
        {xAxis(H2)}
        {data.pressures.map((c, i) => {
          const style = CASE_STYLES[i % CASE_STYLES.length]!;
          const d = c.values
            .map((v, k) => `${k ? 'L' : 'M'}${sx(data.points[k]!.chainage).toFixed(1)} ${sp(v).toFixed(1)}`)
            .join(' ');
          return (
            <g key={c.caseId}>
              <path d={d} fill="none" stroke={style.stroke} strokeWidth="1.8" strokeDasharray={style.dash} />
              <line
                x1={W - M.right + 8}
                x2={W - M.right + 28}
                y1={M.top + 10 + i * 14}
                y2={M.top + 10 + i * 14}
                stroke={style.stroke}
                strokeWidth="1.8"
                strokeDasharray={style.dash}
              />
              <text x={W - M.right + 32} y={M.top + 13 + i * 14} className="profile-label">
                {c.label}
              </text>
            </g>
          );
        })}
        <text x={(M.left + W - M.right) / 2} y={H2 - 2} textAnchor="middle" className="profile-axis">
          chainage along the main line — gauge pressure at the pipe
        </text>
      </svg>
      <LevelsTable project={project} analysis={analysis} />
      <p className="caution-foot">{SHORT_CAUTION}</p>
    </figure>
  );
}
