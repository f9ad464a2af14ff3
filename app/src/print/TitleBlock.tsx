import { sheetOf, type Project, type UnitSystem } from '@mainbrace/solver';

/**
 * The title block of every printed page (crew sheet, long section): what the sheet is and which part
 * of the route, then the project's drawing fields (empty boxes to fill by hand where the project has
 * none), units and scale.
 */
export function TitleBlock({
  project,
  units,
  subtitle,
  sheet,
  note,
  detail,
  kind = 'Restraint schedule — crew sheet',
  scale = 'Not to scale: build to figured dimensions',
}: {
  project: Project;
  units: UnitSystem;
  subtitle: string;
  sheet: string;
  /** the page's concrete, in the line across the foot of the block */
  note?: string;
  /** after it: what the page's restraints were sized for */
  detail?: string;
  /** what the drawing is */
  kind?: string;
  /** how it is scaled */
  scale?: string;
}) {
  const s = sheetOf(project.sheet);
  const box = (label: string, value: string, id: string) => (
    <div className="tb-box" data-field={id}>
      <span className="tb-label">{label}</span>
      <span className="tb-value">{value || '\u00a0'}</span>
    </div>
  );
  return (
    <header className="title-block">
      <div className="tb-main">
        <div className="sheet-kicker">{kind}</div>
        <h1>{project.name}</h1>
        <div className="tb-sub">
          {subtitle} · {sheet}
        </div>
      </div>
      <div className="tb-grid">
        {box('Drawing no.', s.drawingNumber, 'drawingNumber')}
        {box('Rev.', s.revision, 'revision')}
        {box('Date', s.date, 'date')}
        {box('Drawn', s.drawnBy, 'drawnBy')}
        {box('Checked', s.checkedBy, 'checkedBy')}
        {box('Approved', s.approvedBy, 'approvedBy')}
        {box('Units', units === 'si' ? 'm, mm, m³' : 'ft-in, in, yd³', 'units')}
        <div className="tb-box tb-scale" data-field="scale">
          <span className="tb-label">Scale</span>
          <span className="tb-value">{scale}</span>
        </div>
      </div>
      {(note || detail) && (
        <div className="tb-detail">
          {note && <span data-testid="page-concrete">{note}</span>}
          {note && detail ? ' · ' : null}
          {detail && <span data-testid="sized-for">{detail}</span>}
        </div>
      )}
    </header>
  );
}
