/** Character codes the indenter looks at. */
const QUOTE = 34;
const BACKSLASH = 92;
const COMMA = 44;
const COLON = 58;
const OPEN_BRACE = 123;
const CLOSE_BRACE = 125;
const OPEN_BRACKET = 91;
const CLOSE_BRACKET = 93;

/**
 * Indents compact JSON text as `JSON.stringify(value, null, 2)` lays it out — a line per member, two
 * spaces a level, `": "` after a key, `[]` and `{}` kept on one line — fed in pieces of any size (the
 * schedule writer streams its text). Compact JSON has no white space outside strings, so a comma, a
 * colon or a bracket outside a string is structure; inside one nothing changes.
 */
export class JsonIndenter {
  private depth: number;
  private inString = false;
  private escaped = false;
  /** an opening bracket whose line break waits for the next character: none for an empty `[]` or `{}` */
  private opened = false;

  /** `depth`: the nesting level of the first piece's value (0 for a whole document). */
  constructor(depth = 0) {
    this.depth = depth;
  }

  private newline(depth: number): string {
    return '\n' + '  '.repeat(depth);
  }

  /** The next piece of compact text, indented. */
  feed(text: string): string {
    let out = '';
    let from = 0;
    for (let i = 0; i < text.length; i++) {
      const c = text.charCodeAt(i);
      if (this.opened) {
        this.opened = false;
        if (c !== CLOSE_BRACE && c !== CLOSE_BRACKET) {
          out += text.slice(from, i) + this.newline(this.depth);
          from = i;
        } else {
          // An empty array or object stays `[]` or `{}`: the closing bracket is written as it is.
          this.depth--;
          continue;
        }
      }
      if (this.inString) {
        if (this.escaped) this.escaped = false;
        else if (c === BACKSLASH) this.escaped = true;
        else if (c === QUOTE) this.inString = false;
        continue;
      }
      if (c === QUOTE) this.inString = true;
      else if (c === OPEN_BRACE || c === OPEN_BRACKET) {
        this.depth++;
        this.opened = true;
      } else if (c === CLOSE_BRACE || c === CLOSE_BRACKET) {
        this.depth--;
        out += text.slice(from, i) + this.newline(this.depth);
        from = i;
      } else if (c === COMMA) {
        out += text.slice(from, i + 1) + this.newline(this.depth);
        from = i + 1;
      } else if (c === COLON) {
        out += text.slice(from, i + 1) + ' ';
        from = i + 1;
      }
    }
    return out + text.slice(from);
  }
}
