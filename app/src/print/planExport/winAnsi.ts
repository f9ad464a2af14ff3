/**
 * WinAnsiEncoding codes 0x80–0x9F (PDF 32000-1:2008, Annex D, Table D.2; Windows code page 1252),
 * by Unicode character. 0xA0–0xFF are the Latin-1 characters of the same number; 0x20–0x7E are ASCII.
 */
const HIGH: Record<string, number> = {
  '€': 0x80,
  '‚': 0x82,
  ƒ: 0x83,
  '„': 0x84,
  '…': 0x85,
  '†': 0x86,
  '‡': 0x87,
  ˆ: 0x88,
  '‰': 0x89,
  Š: 0x8a,
  '‹': 0x8b,
  Œ: 0x8c,
  Ž: 0x8e,
  '‘': 0x91,
  '’': 0x92,
  '“': 0x93,
  '”': 0x94,
  '•': 0x95,
  '–': 0x96,
  '—': 0x97,
  '˜': 0x98,
  '™': 0x99,
  š: 0x9a,
  '›': 0x9b,
  œ: 0x9c,
  ž: 0x9e,
  Ÿ: 0x9f,
};

/** Signs and spaces outside the encoding, written with the nearest it has. */
const NEAREST: Record<string, string> = {
  '\t': ' ',
  '\u2212': '-', // minus sign
  '\u2010': '-',
  '\u2011': '-',
  '\u2012': '–',
  '\u2015': '—',
  '\u2032': '’', // prime
  '\u2033': '”', // double prime
  '\u2009': ' ',
  '\u200a': ' ',
  '\u2002': ' ',
  '\u2003': ' ',
  '\u202f': ' ',
  '\u2007': ' ',
  '\u2264': '<=',
  '\u2265': '>=',
  '\u2260': '/=',
  '\u2248': '~',
  '\u2192': '->',
  '\u2190': '<-',
  '\u221a': 'sqrt',
  '\u2211': 'sum',
  '\u03bc': 'µ', // Greek mu as the micro sign
  Ł: 'L',
  ł: 'l',
  Đ: 'D',
  đ: 'd',
  Ħ: 'H',
  ħ: 'h',
  ı: 'i',
  Ŋ: 'N',
  ŋ: 'n',
  Ŧ: 'T',
  ŧ: 't',
};

/** Mainbrace's plain romanisation of Greek and Cyrillic letters (lower case; capitals follow). */
// prettier-ignore
const ROMAN: Record<string, string> = {
  α: 'a', β: 'b', γ: 'g', δ: 'd', ε: 'e', ζ: 'z', η: 'e', θ: 'th', ι: 'i', κ: 'k', λ: 'l', ν: 'n',
  ξ: 'x', ο: 'o', π: 'p', ρ: 'r', σ: 's', ς: 's', τ: 't', υ: 'y', φ: 'ph', χ: 'ch', ψ: 'ps', ω: 'o',
  а: 'a', б: 'b', в: 'v', г: 'g', д: 'd', е: 'e', ж: 'zh', з: 'z', и: 'i', й: 'i', к: 'k', л: 'l',
  м: 'm', н: 'n', о: 'o', п: 'p', р: 'r', с: 's', т: 't', у: 'u', ф: 'f', х: 'kh', ц: 'ts', ч: 'ch',
  ш: 'sh', щ: 'shch', ъ: '', ы: 'y', ь: '', э: 'e', ю: 'yu', я: 'ya', є: 'ye', і: 'i', ї: 'yi', ґ: 'g',
};

/** The WinAnsi code of a character, or null where the encoding has none. */
function code(ch: string): number | null {
  const c = ch.codePointAt(0)!;
  if ((c >= 0x20 && c <= 0x7e) || (c >= 0xa0 && c <= 0xff)) return c;
  return HIGH[ch] ?? null;
}

/** A character outside the encoding as the closest text inside it; '?' only where there is none. */
function nearest(ch: string): string {
  const sign = NEAREST[ch];
  if (sign !== undefined) return sign;
  const lower = ch.toLowerCase();
  const roman = ROMAN[lower] ?? ROMAN[lower.normalize('NFD').charAt(0)];
  if (roman !== undefined) return lower === ch ? roman : roman.charAt(0).toUpperCase() + roman.slice(1);
  // A letter with an accent the encoding lacks (ő, ą, ē): the letter itself, its marks dropped.
  const bare = ch.normalize('NFKD').replace(/\p{M}/gu, '');
  if (bare && bare !== ch && [...bare].every((b) => code(b) !== null)) return bare;
  return '?';
}

/**
 * Text as a string of WinAnsi bytes (each character's code below 256): what a PDF string shown with a
 * standard font in WinAnsiEncoding must hold. Characters the encoding lacks become their nearest
 * spelling in it.
 */
export function winAnsiBytes(text: string): string {
  let out = '';
  for (const ch of text) {
    const c = code(ch);
    if (c !== null) out += String.fromCharCode(c);
    else for (const n of nearest(ch)) out += String.fromCharCode(code(n) ?? 0x3f);
  }
  return out;
}
