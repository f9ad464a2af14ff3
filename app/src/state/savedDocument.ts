import type { Project, UnitSystem } from '@mainbrace/solver';

const withUnits = new WeakMap<Project, Project>();

/**
 * The document as it is saved: the design, carrying the display units the user last chose (a view
 * setting, not an edit, so it is kept outside the undo history and written into the file only here).
 * The same object comes back for the same document and units, so a save can tell when nothing changed.
 */
export function savedDocument(s: { project: Project; units: UnitSystem }): Project {
  if (s.project.units === s.units) return s.project;
  let doc = withUnits.get(s.project);
  if (!doc || doc.units !== s.units) {
    doc = { ...s.project, units: s.units };
    withUnits.set(s.project, doc);
  }
  return doc;
}
