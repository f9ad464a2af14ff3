// The one-line caution of every result screen, in a module of its own: the first screen shows it, and
// the full list in cautions.ts then loads only with the parts that print or open it.
export const SHORT_CAUTION =
  'Design aid only — every result must be checked by a licensed engineer; local codes and the utility’s standards govern. Blocks bear on undisturbed soil; let the concrete cure before the pressure test.';
