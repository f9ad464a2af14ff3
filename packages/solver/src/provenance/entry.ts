/**
 * published: a document states it; common practice: a rule of thumb of the trade; own rule: a choice
 * of this project; derived: worked out here from other entries and statics.
 */
export type SourceKind = 'published' | 'common practice' | 'own rule' | 'derived';

/** One coefficient, table, formula or default the solver uses, with where it comes from. */
export interface ProvenanceEntry {
  /** what it is, in words */
  quantity: string;
  /** the value (a number, a table) or null for a formula */
  value: number | readonly number[] | Readonly<Record<string, number>> | null;
  /** its unit in SI, or "—" for a pure number */
  unit: string;
  kind: SourceKind;
  /** the document (title, edition) for published entries; a short reason otherwise */
  source: string;
  /** table, clause or equation within the document */
  clause?: string;
  /** how an unverified value was taken ("from memory", "equation recalled, not read"): the register's note */
  note?: string;
  /**
   * true only when the value was read in the document itself (or a faithful reproduction of its table,
   * named in `source`); false when recalled or taken second-hand. Every result that depends on an
   * unverified entry says so.
   */
  verified: boolean;
}

/**
 * "not verified against DIPRA …, trench-type table": what a screen or print says of an unverified entry.
 * A rule of thumb names no document: it says so, and what the rule is.
 */
export const notVerifiedText = (e: ProvenanceEntry): string =>
  e.kind === 'common practice'
    ? `common practice, not verified against a published source (${e.source.charAt(0).toLowerCase()}${e.source.slice(1)})`
    : `not verified against ${e.source}${e.clause ? `, ${e.clause}` : ''}`;
