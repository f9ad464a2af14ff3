/** Rounds a length up to the next whole step; a hair of floating-point slack avoids a step too many. */
export const roundUpTo = (length: number, step: number): number => Math.ceil(length / step - 1e-9) * step;

/** Rounds a length down to a whole step. */
export const roundDownTo = (length: number, step: number): number => Math.floor(length / step + 1e-9) * step;
