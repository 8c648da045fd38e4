/**
 * Text from a user's file, made safe to show: control characters and
 * escape sequences become visible escapes instead of reaching a terminal
 * (where they could clear the screen, move the cursor or hide rows) or a
 * CSV file (where a NUL byte breaks other readers).
 *
 * @module
 */

/** Characters shown as escapes: C0 controls, DEL, C1 controls, and the bidirectional overrides that reorder a line as shown. */
function isControl(c: number): boolean {
  return c < 0x20 || (c >= 0x7f && c <= 0x9f) || (c >= 0x202a && c <= 0x202e) || (c >= 0x2066 && c <= 0x2069);
}

function escapeOf(c: number): string {
  return c <= 0xff ? `\\x${c.toString(16).padStart(2, '0')}` : `\\u${c.toString(16).padStart(4, '0')}`;
}

/**
 * The text with every control character written as a visible escape
 * (`\x1b`, `\x00`, `\u202e`); the text itself when it has none (the usual
 * case, which allocates nothing).
 *
 * @param text - text that may come from a user's file
 * @param keepLayout - keep tab, line feed and carriage return as they are (for CSV cells, which quote them)
 * @see ECMA-48, Control Functions for Coded Character Sets (5th ed., 1991), for the C0 and C1 sets; Unicode
 *   Standard Annex #9 for the bidirectional embedding, override and isolate characters.
 */
export function escapeControls(text: string, keepLayout = false): string {
  let i = 0;
  for (; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (isControl(c) && !(keepLayout && (c === 9 || c === 10 || c === 13))) break;
  }
  if (i === text.length) return text;
  let out = text.slice(0, i);
  for (; i < text.length; i++) {
    const c = text.charCodeAt(i);
    out += isControl(c) && !(keepLayout && (c === 9 || c === 10 || c === 13)) ? escapeOf(c) : text[i];
  }
  return out;
}
