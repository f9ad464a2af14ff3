import { PAGE_CAUTIONS } from '@mainbrace/solver';

/**
 * Width of a line of Helvetica text, mm, taken generously: its characters average about half an em
 * (0.55 allows for capitals and wide letters), so that a wrapped line stays inside its width.
 */
const textWidth = (text: string, size: number) => text.length * size * 0.55;

/** Text broken at spaces into lines no wider than `width` mm at `size` mm; a longer word has a line of its own. */
export function wrapText(text: string, size: number, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    const next = line ? `${line} ${word}` : word;
    if (line && textWidth(next, size) > width) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

/** Text height of the cautions, mm: 2.5 mm ≈ 7 pt, the least a drawing set prints. */
export const CAUTION_SIZE = 2.5;
export const CAUTION_LINE = 3.5;

/** Indent of a caution's second and later lines, mm: under its text, clear of its number. */
export const CAUTION_INDENT = 4;

/**
 * The cautions every printed page carries, numbered, as lines no wider than `width` mm; `indent` marks
 * a caution's continuation lines.
 */
export const cautionLines = (width: number): { text: string; indent: boolean }[] =>
  PAGE_CAUTIONS.flatMap((c, i) =>
    wrapText(`${i + 1}. ${c}`, CAUTION_SIZE, width - CAUTION_INDENT).map((text, j) => ({ text, indent: j > 0 })),
  );
