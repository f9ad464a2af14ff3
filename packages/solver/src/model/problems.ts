/** One reason a file was refused: where (`pipes[1].outsideDiameter`) and what was expected. */
export interface Problem {
  path: string;
  message: string;
}

export const problemText = (p: Problem) => (p.path ? `${p.path}: ${p.message}` : p.message);

/** `['pipes', 1, 'outsideDiameter']` → `pipes[1].outsideDiameter` */
export function pathText(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else if (typeof key === 'string' && /^[A-Za-z_$][\w$]*$/.test(key)) out += out ? `.${key}` : key;
    else out += `[${JSON.stringify(String(key))}]`;
  }
  return out;
}
