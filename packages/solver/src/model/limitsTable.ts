import { LIMITS, type Limit } from './limits.js';

const SI: Record<string, string> = {
  pressure: 'Pa',
  stress: 'Pa',
  elevation: 'm',
  length: 'm',
  diameter: 'm',
  flow: 'm³/s',
  velocity: 'm/s',
  density: 'kg/m³',
  unitWeight: 'N/m³',
  angle: '°',
  stressGradient: 'Pa/m',
  forcePerLength: 'N/m',
  ratio: '—',
};

const range = (r: { min: number; max: number }) => `${r.min} to ${Number.isFinite(r.max) ? r.max : 'no limit'}`;

/** docs/limits.md: the one table of plausibility ranges the file, the app's fields and the CLI share. */
export function limitsMarkdown(): string {
  const rows = (Object.entries(LIMITS) as [string, Limit][]).map(
    ([id, l]) =>
      `| \`${id}\` | ${l.name} | ${SI[l.kind] ?? l.kind} | ${l.hard.exclusiveMin ? 'more than ' : ''}${range(l.hard)} | ${l.usual ? range(l.usual) : '—'} |`,
  );
  return [
    '# Plausibility ranges',
    '',
    'One table, in `packages/solver/src/model/limits.ts`, used by the project-file schema, the app’s input fields and',
    'the command line. A value outside its **hard** range is refused, naming the field. A value outside its **usual**',
    'range is accepted with a warning diagnostic (`input.*-unusual`, see [diagnostics.md](diagnostics.md)), since it',
    'is more often a unit slip — kPa typed as Pa, millimetres as metres — than a design. The hard ranges also keep',
    'every product the solver forms finite in double precision.',
    '',
    'Generated from the code; a test keeps it current (`UPDATE_DOCS=1 corepack pnpm test`).',
    '',
    '| limit | what | SI unit | hard range | usual range |',
    '|---|---|---|---|---|',
    ...rows,
    '',
  ].join('\n');
}
