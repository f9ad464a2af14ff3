import { useMemo } from 'react';
import { FOOT, PSI } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { show } from '../format/quantity.js';
import { gridSpacing } from '../state/viewport.js';
import { profileData } from './profileData.js';

const W = 980;
const M = { left: 70, right: 190, top: 12, bottom: 22 };
const CASE_STYLES = [
  { stroke: '#1d6fb8', dash: '' },
  { stroke: '#7a4fb0', dash: '6 4' },
  { stroke: '#b83a14', dash: '2 3' },
  { stroke: '#2f7d4f', dash: '10 3 2 3' },
];

const ticks = (a: number, b: number, step: number) => {
  const out: number[] = [];
  for (let v = Math.ceil(a / step) * step; v <= b + 1e-9; v += step) out.push(v);
  return out;
};

/**
 * The main line in section: ground and pipe to their own vertical scale, fittings marked; below it the
 * pressure of every case along the line, where the low points show as peaks. Grades far above the
 * pipe are named rather than drawn, so the pipe is never flattened to a line.
 */
export function ProfilePanel() {
  const project = useApp((s) => s.project);
  const analysis = useAnalysis();
  const actions = useActions();
  const data = useMemo(() => profileData(project, analysis), [project, analysis]);
  const u = useApp((s) => s.units);
  if (data.points.length < 2) return <p className="muted">Draw a main to see its profile.</p>;
  const x0 = data.points[0]!.chainage,
    x1 = data.points[data.points.length - 1]!.chainage;
  const sx = (c: number) => M.left + ((c - x0) / (x1 - x0 || 1)) * (W - M.left - M.right);
  const lengthUnit = u === 'us' ? FOOT : 1;
  const xStep = gridSpacing((W - M.left - M.right) / ((x1 - x0) / lengthUnit || 1), 90) * lengthUnit;

  // Section: ground and pipe only, with a little room.
  const H1 = 170;
  const zs = data.points.flatMap((p) => [p.pipe, p.ground]);
  const pad = Math.max(0.5, (Math.max(...zs) - Math.min(...zs)) * 0.15);
  const z0 = Math.min(...zs) - pad,
    z1 = Math.max(...zs) + pad;
  const sz = (z: number) => H1 - M.bottom - ((z - z0) / (z1 - z0)) * (H1 - M.top - M.bottom);
  const zStep = gridSpacing((H1 - M.top - M.bottom) / ((z1 - z0) / lengthUnit), 30) * lengthUnit;
  const line = (key: 'pipe' | 'ground') =>
    data.points.map((p, i) => `${i ? 'L' : 'M'}${sx(p.chainage).toFixed(1)} ${sz(p[key]).toFixed(1)}`).join(' ');

  // Pressure along the line, every case.
  const H2 = 150;
  const all = data.pressures.flatMap((c) => c.values);
  const p0 = Math.min(0, ...all),
    p1 = Math.max(...all) * 1.08 || 1;
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
      <svg
        viewBox={`0 0 ${W} ${H1}`}
        role="img"
        aria-label="Section of the main line: ground and pipe against chainage, fittings marked"
      >
        {ticks(z0, z1, zStep).map((z) => (
          <g key={`z${z}`}>
            <line x1={M.left} x2={W - M.right} y1={sz(z)} y2={sz(z)} className="profile-grid" />
            <text x={M.left - 6} y={sz(z) + 3} textAnchor="end" className="profile-axis">
              {show(z, 'elevation', u, 4)}
            </text>
          </g>
        ))}
        {xAxis(H1)}
        <path d={line('ground')} className="profile-ground" />
        <path d={line('pipe')} className="profile-pipe" />
        {data.points
          .filter((p) => p.mark)
          .map((p, i) => (
            <g key={p.node} className="profile-fitting" onClick={() => actions.revealNode(p.node)}>
              <circle cx={sx(p.chainage)} cy={sz(p.pipe)} r="4" />
              <text x={sx(p.chainage)} y={sz(p.pipe) + (i % 2 ? 16 : -9)} textAnchor="middle" className="profile-mark">
                {p.mark}
              </text>
              <title>{`${p.mark}: pipe at ${show(p.pipe, 'elevation', u, 4)}, design pressure ${show(analysis.byNode.get(p.node)!.envelope.pressure, 'pressure', u)}`}</title>
            </g>
          ))}
        <text x={W - M.right + 8} y={M.top + 10} className="profile-label">
          elevation
        </text>
        <line x1={W - M.right + 8} x2={W - M.right + 28} y1={M.top + 24} y2={M.top + 24} className="profile-ground" />
        <text x={W - M.right + 32} y={M.top + 27} className="profile-label">
          ground
        </text>
        <line x1={W - M.right + 8} x2={W - M.right + 28} y1={M.top + 40} y2={M.top + 40} className="profile-pipe" />
        <text x={W - M.right + 32} y={M.top + 43} className="profile-label">
          pipe centreline
        </text>
        {data.grades.map((g, i) => (
          <text key={g.caseId} x={W - M.right + 8} y={M.top + 62 + i * 13} className="profile-label">
            {g.label} grade {show(g.elevation, 'elevation', u, 4)}
          </text>
        ))}
      </svg>
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
    </figure>
  );
}
