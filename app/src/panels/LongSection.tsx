import { FOOT, type Analysis, type UnitSystem } from '@mainbrace/solver';
import { show } from '../format/quantity.js';
import { gridSpacing } from '../state/viewport.js';
import type { ProfileData, ProfilePoint } from './profileData.js';
import { sectionWindow } from './sectionScale.js';
import { extentOf } from '../format/extent.js';
import { placeLabels, type Box, type LabelSpot, type LabelWish } from './labelPlacement.js';

export const SECTION_W = 980;
export const SECTION_M = { left: 70, right: 190, top: 14, bottom: 22 };
const H = 240;

/** Chainage from the main's start to the farthest point of the main or any branch, m. */
export function sectionExtent(data: ProfileData): [number, number] {
  const x0 = data.points[0]!.chainage;
  let x1 = data.points[data.points.length - 1]!.chainage;
  for (const b of data.branches) for (const p of b.points) x1 = Math.max(x1, p.chainage);
  return [x0, x1];
}

export const ticks = (a: number, b: number, step: number) => {
  const out: number[] = [];
  for (let v = Math.ceil(a / step) * step; v <= b + 1e-9; v += step) out.push(v);
  return out;
};

/**
 * The long section: ground and pipe of the main line with every fitting marked, crests and sags named,
 * each branch unfolded from its tee, the groundwater level, at a stated round vertical exaggeration.
 */
export function LongSection({
  data,
  analysis,
  units: u,
  onSelect,
}: {
  data: ProfileData;
  analysis: Analysis;
  units: UnitSystem;
  onSelect?: (node: string) => void;
}) {
  const W = SECTION_W;
  const M = SECTION_M;
  const [x0, x1] = sectionExtent(data);
  const plotW = W - M.left - M.right;
  const plotH = H - M.top - M.bottom;
  const hScale = plotW / (x1 - x0 || 1);
  const sx = (c: number) => M.left + (c - x0) * hScale;
  const all = [data.points, ...data.branches.map((b) => b.points)].flat();
  const levels = all.flatMap((p) => [p.pipe, p.ground]);
  const [lo, hi] = extentOf(levels);
  // Groundwater is drawn where it lies near the section; far below or above, it is stated instead.
  const gw = data.groundwater;
  const gwDrawn = gw !== null && gw >= lo - (hi - lo + 1) && gw <= hi + (hi - lo + 1);
  const { exaggeration, z0, z1 } = sectionWindow(gwDrawn ? [...levels, gw] : levels, plotH, hScale);
  const sz = (z: number) => M.top + ((z1 - z) / (z1 - z0)) * plotH;
  const lengthUnit = u === 'us' ? FOOT : 1;
  const xStep = gridSpacing(hScale * lengthUnit, 90) * lengthUnit;
  const zStep = gridSpacing((plotH / (z1 - z0)) * lengthUnit, 30) * lengthUnit;
  const path = (pts: ProfilePoint[], key: 'pipe' | 'ground') =>
    pts.map((p, i) => `${i ? 'L' : 'M'}${sx(p.chainage).toFixed(1)} ${sz(p[key]).toFixed(1)}`).join(' ');
  const exText = exaggeration >= 1 ? `${exaggeration}` : exaggeration.toString();

  // Every label is placed clear of the fittings, the bend glyphs and the labels placed before it: the
  // main's marks first, then the branches', the branches' names, and last the bend words (the glyph
  // alone says crest or sag when its word has no room).
  const marked = [
    ...data.points.filter((p) => p.mark),
    ...data.branches.flatMap((b) => b.points.filter((p, i) => p.mark && i > 0)),
  ];
  const bent = [...data.points, ...data.branches.flatMap((b) => b.points)].filter((p) => p.bend);
  const glyph = (p: ProfilePoint) => ({ x: sx(p.chainage), y: sz(p.ground) });
  const blocked: Box[] = [
    ...marked.map((p) => ({ x0: sx(p.chainage) - 5, y0: sz(p.pipe) - 5, x1: sx(p.chainage) + 5, y1: sz(p.pipe) + 5 })),
    ...bent.map((p) => ({ x0: glyph(p).x - 6, y0: glyph(p).y - 17, x1: glyph(p).x + 6, y1: glyph(p).y - 9 })),
  ];
  const wishes: LabelWish[] = [
    ...marked.map((p, i) => {
      const x = sx(p.chainage);
      const y = sz(p.pipe);
      const above: LabelSpot = { x, y: y - 9, anchor: 'middle' };
      const below: LabelSpot = { x, y: y + 17, anchor: 'middle' };
      return {
        key: `mark-${p.node}`,
        text: p.mark!,
        size: 10.5,
        spots: [
          ...(i % 2 ? [below, above] : [above, below]),
          { x: x + 7, y: y + 4, anchor: 'start' as const },
          { x: x - 7, y: y + 4, anchor: 'end' as const },
          { x, y: y - 21, anchor: 'middle' as const },
          { x, y: y + 29, anchor: 'middle' as const },
        ],
      };
    }),
    ...data.branches.map((b) => {
      const end = b.points[b.points.length - 1]!;
      const x = sx(end.chainage);
      const y = sz(end.pipe);
      return {
        key: `branch-${b.letter}`,
        text: `run ${b.letter} from ${analysis.marks.get(b.from) ?? b.from}`,
        size: 9,
        spots: [
          { x: x + 4, y: y - 6, anchor: 'start' as const },
          { x: x + 4, y: y + 12, anchor: 'start' as const },
          { x: x - 4, y: y - 6, anchor: 'end' as const },
          { x: x - 4, y: y + 12, anchor: 'end' as const },
          { x, y: y - 20, anchor: 'middle' as const },
          { x, y: y + 26, anchor: 'middle' as const },
          { x: x - 4, y: y - 20, anchor: 'end' as const },
          { x: x - 4, y: y + 26, anchor: 'end' as const },
        ],
      };
    }),
    ...bent.map((p) => ({
      key: `bend-${p.node}`,
      text: p.bend!,
      size: 8.5,
      spots: [{ x: glyph(p).x, y: glyph(p).y - 19, anchor: 'middle' as const }],
      optional: true,
    })),
  ];
  const frame = { x0: M.left, y0: 0, x1: W - M.right, y1: H - M.bottom };
  const placed = new Map(placeLabels(wishes, blocked, frame).map((l) => [l.key, l]));
  const at = (key: string) => placed.get(key);

  const marks = (pts: ProfilePoint[], branch: boolean) =>
    pts
      .filter((p, i) => p.mark && !(branch && i === 0))
      .map((p) => {
        const label = at(`mark-${p.node}`);
        return (
          <g key={p.node} className="profile-fitting" onClick={() => onSelect?.(p.node)}>
            <circle cx={sx(p.chainage)} cy={sz(p.pipe)} r="4" />
            {label && (
              <text x={label.x} y={label.y} textAnchor={label.anchor} className="profile-mark">
                {p.mark}
              </text>
            )}
            <title>{`${p.mark}: pipe at ${show(p.pipe, 'elevation', u, 4)}, ground ${show(p.ground, 'elevation', u, 4)}, design pressure ${show(analysis.byNode.get(p.node)!.envelope.pressure, 'pressure', u)}`}</title>
          </g>
        );
      });
  const bends = (pts: ProfilePoint[]) =>
    pts
      .filter((p) => p.bend)
      .map((p) => {
        const { x, y } = glyph(p);
        const label = at(`bend-${p.node}`);
        return (
          <g key={`bend-${p.node}`} className={`profile-bend profile-${p.bend}`} data-testid={`section-${p.bend}`}>
            <path
              d={
                p.bend === 'crest'
                  ? `M${x - 5} ${y - 10} L${x} ${y - 16} L${x + 5} ${y - 10}`
                  : `M${x - 5} ${y - 16} L${x} ${y - 10} L${x + 5} ${y - 16}`
              }
            />
            {label && (
              <text x={label.x} y={label.y} textAnchor={label.anchor} className="profile-bend-label">
                {p.bend}
              </text>
            )}
            <title>{p.bend === 'crest' ? 'crest: the grade turns down' : 'sag: the grade turns up'}</title>
          </g>
        );
      });
  const legend = (y: number, cls: string, text: string) => (
    <g>
      <line x1={W - M.right + 8} x2={W - M.right + 28} y1={y} y2={y} className={cls} />
      <text x={W - M.right + 32} y={y + 3} className="profile-label">
        {text}
      </text>
    </g>
  );
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      role="img"
      aria-label={`Long section: ground, pipe and groundwater against chainage, fittings marked, vertical scale ${exText} times the horizontal`}
      data-testid="long-section"
    >
      {ticks(z0, z1, zStep).map((z) => (
        <g key={`z${z}`}>
          <line x1={M.left} x2={W - M.right} y1={sz(z)} y2={sz(z)} className="profile-grid" />
          <text x={M.left - 6} y={sz(z) + 3} textAnchor="end" className="profile-axis">
            {show(z, 'elevation', u, 4)}
          </text>
        </g>
      ))}
      {ticks(x0, x1, xStep).map((c) => (
        <g key={`x${c}`}>
          <line x1={sx(c)} x2={sx(c)} y1={M.top} y2={H - M.bottom} className="profile-grid" />
          <text x={sx(c)} y={H - M.bottom + 13} textAnchor="middle" className="profile-axis">
            {show(c, 'length', u, 4)}
          </text>
        </g>
      ))}
      {gwDrawn && <line x1={M.left} x2={W - M.right} y1={sz(gw)} y2={sz(gw)} className="profile-water" />}
      {data.branches.map((b) => (
        <g key={b.letter} className="profile-branch" data-testid={`section-branch-${b.letter}`}>
          <path d={path(b.points, 'ground')} className="profile-ground profile-branch-ground" />
          <path d={path(b.points, 'pipe')} className="profile-pipe profile-branch-pipe" />
          {marks(b.points, true)}
          {bends(b.points)}
        </g>
      ))}
      <path d={path(data.points, 'ground')} className="profile-ground" />
      <path d={path(data.points, 'pipe')} className="profile-pipe" />
      {marks(data.points, false)}
      {bends(data.points)}
      {/* Over the main, with a halo: a branch laid at the main's level runs along it. */}
      {data.branches.map((b) => {
        const label = at(`branch-${b.letter}`)!;
        return (
          <text
            key={b.letter}
            x={label.x}
            y={label.y}
            textAnchor={label.anchor}
            className="profile-label profile-branch-label"
            data-testid={`section-branch-label-${b.letter}`}
          >
            {label.text}
          </text>
        );
      })}
      <text x={W - M.right + 8} y={M.top + 8} className="profile-label profile-label-strong">
        Long section
      </text>
      {legend(M.top + 24, 'profile-ground', 'ground')}
      {legend(M.top + 39, 'profile-pipe', 'pipe centreline')}
      {data.branches.length > 0 && legend(M.top + 54, 'profile-pipe profile-branch-pipe', 'branch, from its tee')}
      {legend(
        M.top + 69,
        'profile-water',
        gw === null ? 'groundwater: none given' : `groundwater ${show(gw, 'elevation', u, 5)}`,
      )}
      {gw !== null && !gwDrawn && (
        <text x={W - M.right + 32} y={M.top + 84} className="profile-label">
          {gw < lo ? '(below the section)' : '(above the section)'}
        </text>
      )}
      <text x={W - M.right + 8} y={M.top + 102} className="profile-label">
        ▲ crest ▼ sag: vertical bends
      </text>
      <text
        x={W - M.right + 8}
        y={M.top + 118}
        className="profile-label profile-label-strong"
        data-testid="section-exaggeration"
      >
        {`Vertical scale ${exText} × horizontal`}
      </text>
      {data.grades.map((g, i) => (
        <text key={g.caseId} x={W - M.right + 8} y={M.top + 136 + i * 13} className="profile-label">
          {g.label} grade {show(g.elevation, 'elevation', u, 5)}
        </text>
      ))}
    </svg>
  );
}
