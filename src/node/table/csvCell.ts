/**
 * Values as CSV cells that a spreadsheet will not run as formulas.
 *
 * @module
 */

import { escapeControls } from '../terminalText.js';

/** First characters that make a spreadsheet read a cell as a formula (and their full-width forms). */
const TRIGGERS = new Set(['=', '+', '-', '@', '\t', '\r', '＝', '＋', '－', '＠']);

/**
 * A value as a CSV cell. Numbers stay numbers: a finite number is written in
 * full, the shortest text that reads back as the same number (`-37.03`), and
 * is never altered. A text that starts with `=`, `+`, `-`, `@`, a tab, a
 * carriage return or their full-width forms gets a leading apostrophe, which
 * spreadsheets show as text and never evaluate. Control characters other
 * than tab and line breaks (NUL, escape sequences) are written as visible
 * escapes (`\x00`, `\x1b`). true/false are written as words; an absent
 * value is an empty cell.
 *
 * (Numbers are written with JSON.stringify, which gives the same digits as
 * String() but does not go through V8's number-to-string cache; on long
 * screens that cache kept every written number alive for a while.)
 */
export function csvCell(value: string | number | boolean | undefined): string {
  if (value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? JSON.stringify(value) : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  const text = escapeControls(value, true);
  return text.length > 0 && TRIGGERS.has(text[0]!) ? `'${text}` : text;
}
