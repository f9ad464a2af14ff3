import type { PlanPoint } from '../state/documentEdits.js';

/** What is under the pointer, in plan terms. */
export type Hit =
  { kind: 'node'; id: string; at: PlanPoint } | { kind: 'pipe'; id: string; at: PlanPoint } | { kind: 'none' };

export const NO_HIT: Hit = { kind: 'none' };
