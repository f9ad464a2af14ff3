/** What an import has to say about the file: errors stop it, warnings and notes come with the project. */
export interface ImportNote {
  level: 'error' | 'warning' | 'note';
  /** where in the file: `features[2] "Elm Lane", coordinates[4] [7.1234, 46.98]`, `row 12, column "RL"` */
  where: string;
  message: string;
}

export const noteText = (n: ImportNote): string => `${n.level}: ${n.where ? `${n.where}: ` : ''}${n.message}`;

/** A coordinate pair as written in a message: metres to the millimetre, degrees to 7 places. */
export const pointText = (x: number, y: number, degrees = false): string =>
  degrees ? `[${x.toFixed(7)}, ${y.toFixed(7)}]` : `(${x.toFixed(3)}, ${y.toFixed(3)})`;
