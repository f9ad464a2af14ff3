import { useMemo } from 'react';
import { FOOT } from '@mainbrace/solver';
import { useActions, useAnalysis, useApp } from '../state/StoreContext.js';
import { show } from '../format/quantity.js';
import { gridSpacing } from '../state/viewport.js';
import { profileData } from './profileData.js';

const W = 980;
const H = 230;
const M = { left: 62, right: 150, top: 14, bottom: 34 };
const GRADE_COLOURS = ['#1d6fb8', '#7a4fb0', '#b83a14', '#2f7d4f', '#8a6d1f'];

/** Ground, pipe and static hydraulic grade of each case along the main line, fittings marked with their pressure. */
export function ProfilePanel() {
  const project = useApp((s) => s.project);
  const analysis = useAnalysis();
  const actions = useActions();
  const data = useMemo(() => profileData(project, analysis), [project, analysis]);
  const u = project.units;
  if (data.points.length < 2) return <p className="muted">Draw a main to see its profile.</p>;
  const x0 = data.points[0]!.chainage, x1 = data.points[data.points.length - 1]!.chainage;
  const zs = [...data.points.flatMap((p) => [p.pipe, p.ground]), ...data.grades.map((g) => g.elevation)];
  const z0 = Math.min(...zs) - 1, z1 = Math.max(...zs) + 1;
  const sx = (c: number) => M.left + ((c - x0) / (x1 - x0 || 1)) * (W - M.left - M.right);
  const sz = (z: number) => H - M.bottom - ((z - z0) / (z1 - z0)) * (H - M.top - M.bottom);
  const unit = u === 'us' ? FOOT : 1;
  const xStep = gridSpacing((W - M.left - M.right) / ((x1 - x0) / unit || 1), 90) * unit;
  const zStep = gridSpacing((H - M.top - M.bottom) / ((z1 - z0) / unit), 36) * unit;
  const ticks = (a: number, b: number, step: number) => {
    const out: number[] = [];
    for (let v = Math.ceil(a / step) * step; v <= b; v += step) out.push(v);
    return out;
  };
  const line = (key: 'pipe' | 'ground') => data.points.map((p, i) => `${i ? 'L' : 'M'}${sx(p.chainage).toFixed(1)} ${sz(p[key]).toFixed(1)}`).join(' ');
  return (
    <figure className="profile" data-testid="profile">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Profile of the main line: ground, pipe and hydraulic grade against chainage">
        {ticks(z0, z1, zStep).map((z) => (
          <g key={`z${z}`}>
            <line x1={M.left} x2={W - M.right} y1={sz(z)} y2={sz(z)} className="profile-grid" />
            <text x={M.left - 6} y={sz(z) + 3} textAnchor="end" className="profile-axis">{show(z, 'elevation', u, 4)}</text>
          </g>
        ))}
        {ticks(x0, x1, xStep).map((c) => (
          <g key={`x${c}`}>
            <line x1={sx(c)} x2={sx(c)} y1={M.top} y2={H - M.bottom} className="profile-grid" />
            <text x={sx(c)} y={H - M.bottom + 14} textAnchor="middle" className="profile-axis">{show(c, 'length', u, 4)}</text>
          </g>
        ))}
        <text x={(M.left + W - M.right) / 2} y={H - 4} textAnchor="middle" className="profile-axis">chainage</text>
        <path d={line('ground')} className="profile-ground" />
        <path d={line('pipe')} className="profile-pipe" />
        {data.grades.map((g, i) => (
          <g key={g.caseId}>
            <line x1={M.left} x2={W - M.right} y1={sz(g.elevation)} y2={sz(g.elevation)} stroke={GRADE_COLOURS[i % GRADE_COLOURS.length]} strokeDasharray={['6 4', '2 3', '10 3 2 3'][i % 3]} strokeWidth="1.5" />
            <text x={W - M.right + 6} y={sz(g.elevation) + 3} className="profile-label" fill={GRADE_COLOURS[i % GRADE_COLOURS.length]}>
              {g.label} grade {show(g.elevation, 'elevation', u, 4)}
            </text>
          </g>
        ))}
        {data.points
          .filter((p) => p.tag)
          .map((p) => {
            const f = analysis.byNode.get(p.node)!;
            return (
              <g key={p.node} className="profile-fitting" onClick={() => actions.selectNode(p.node)}>
                <circle cx={sx(p.chainage)} cy={sz(p.pipe)} r="4" />
                <text x={sx(p.chainage)} y={sz(p.pipe) + 15} textAnchor="middle" className="profile-tag">{p.tag}</text>
                <title>{`${p.tag}: ${show(f.envelope.pressure, 'pressure', u)} design pressure`}</title>
                <text x={sx(p.chainage)} y={sz(p.pipe) + 26} textAnchor="middle" className="profile-axis">{show(f.envelope.pressure, 'pressure', u)}</text>
              </g>
            );
          })}
        <g className="profile-key">
          <line x1={W - M.right + 6} x2={W - M.right + 26} y1={H - M.bottom - 24} y2={H - M.bottom - 24} className="profile-ground" />
          <text x={W - M.right + 30} y={H - M.bottom - 21} className="profile-label">ground</text>
          <line x1={W - M.right + 6} x2={W - M.right + 26} y1={H - M.bottom - 10} y2={H - M.bottom - 10} className="profile-pipe" />
          <text x={W - M.right + 30} y={H - M.bottom - 7} className="profile-label">pipe centreline</text>
        </g>
      </svg>
      <figcaption className="muted small">Main line from its start to its farthest point; static hydraulic grade of each case (datum + p/ρg). Elevations {show(z0 + 1, 'elevation', u, 4)} to {show(z1 - 1, 'elevation', u, 4)}.</figcaption>
    </figure>
  );
}
