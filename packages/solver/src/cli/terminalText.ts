/**
 * Characters a terminal acts on instead of showing: C0 controls (ESC starts an escape sequence, CR
 * returns to the line start), DEL, C1 controls (U+009B is a one-byte escape sequence introducer), the
 * line and paragraph separators, and the bidirectional overrides and isolates that reorder what is
 * shown (Unicode Standard Annex #9, section 2).
 */
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/** The same set, but keeping line feeds and the CR LF pairs that end CSV records: our own layout. */
const CONTROL_BUT_LINE_ENDS =
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  /\r(?!\n)|[\u0000-\u0009\u000b-\u000c\u000e-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

/**
 * Any character CONTROL_BUT_LINE_ENDS may match (every CR counts): a class without the look-ahead,
 * which the regular-expression engine scans several times faster, so that text with nothing to escape
 * (nearly all output, 13 MB for a 10,000-fitting JSON schedule) is passed over in one quick scan.
 */
const MAY_NEED_ESCAPE =
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/;

/**
 * The characters of MAY_NEED_ESCAPE that JSON text can hold as they are (U+007F and above; JSON escapes
 * every C0 control in a string), as a test of one code: the JSON schedule's byte writer asks it of each
 * such character, so that its output is what terminalSafe makes of the text (a test holds the two to
 * the same set).
 */
export const terminalActsOn = (c: number): boolean =>
  (c >= 0x7f && c <= 0x9f) ||
  c === 0x061c ||
  c === 0x200e ||
  c === 0x200f ||
  (c >= 0x2028 && c <= 0x202e) ||
  (c >= 0x2066 && c <= 0x2069);

/** As JSON writes it (`\u001b`): visible, and inside JSON output a string still means the same. */
const escaped = (c: string) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`;

/** A name, id or label made safe to print: every control character written as `\u001b`. */
export const escapeControls = (text: string): string => text.replace(CONTROL, escaped);

/** Every string inside a JSON-like value (a schedule) escaped, so tables measure what they print. */
export function escapeStrings<T>(value: T): T {
  if (typeof value === 'string') return escapeControls(value) as T;
  if (Array.isArray(value)) return value.map(escapeStrings) as T;
  if (value !== null && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, escapeStrings(v)])) as T;
  }
  return value;
}

/**
 * The last guard before the terminal: whatever a command writes keeps its line ends and nothing else
 * a terminal would act on.
 */
export const terminalSafe = (text: string): string =>
  MAY_NEED_ESCAPE.test(text) ? text.replace(CONTROL_BUT_LINE_ENDS, escaped) : text;
