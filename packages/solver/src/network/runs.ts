/** One line a crew walks: the main, or a branch from a fitting of another run. */
export interface Run {
  /** A for the main, then B, C … for branches in the order a crew meets them; AA after Z */
  letter: string;
  /** the node the run starts from (the branch's tee for a branch) */
  start: string;
  /** the run it branches from, or null */
  parent: string | null;
  /** nodes along the run from its start, each with its chainage along the run, m */
  nodes: { id: string; chainage: number }[];
  /** pipes along the run, in order */
  pipes: string[];
}

/** A, B … Z, AA, AB …: bijective base 26. */
export function runLetter(index: number): string {
  let n = index + 1;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}
