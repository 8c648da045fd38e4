import { escapeControls } from '../terminalText.js';

/** Characters as a terminal counts them (code points, not UTF-16 units); no array is made. */
function shownLength(s: string): number {
  let n = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c < 0xd800 || c > 0xdbff) n++;
  }
  return n;
}

/**
 * The lines of a plain-text table with aligned columns, one at a time;
 * columns in `rightAligned` are right-aligned. Control characters in cells
 * are shown as escapes. Any number of rows: the rows are gone through
 * twice (`rowsOf` is called for each pass: widths, then lines), never spread
 * into an argument list nor held twice.
 */
export function* textTableLines(header: readonly string[], rowsOf: () => Iterable<readonly string[]>, rightAligned: ReadonlySet<number> = new Set()): Generator<string> {
  const width = header.map((h) => shownLength(h));
  for (const r of rowsOf()) {
    for (let c = 0; c < width.length; c++) {
      const n = shownLength(escapeControls(r[c] ?? ''));
      if (n > width[c]!) width[c] = n;
    }
  }
  const line = (cells: readonly string[]) => {
    let out = '';
    for (let c = 0; c < width.length; c++) {
      const s = escapeControls(cells[c] ?? '');
      const gap = ' '.repeat(width[c]! - shownLength(s));
      out += (c > 0 ? '  ' : '') + (rightAligned.has(c) ? gap + s : s + gap);
    }
    return out.trimEnd();
  };
  yield line(header);
  yield width.map((w) => '─'.repeat(w)).join('  ');
  for (const r of rowsOf()) yield line(r);
}

/** Renders rows as a plain-text table with aligned columns; numbers right-aligned. */
export function textTable(header: readonly string[], rows: readonly (readonly string[])[], rightAligned: ReadonlySet<number> = new Set()): string {
  let out = '';
  for (const l of textTableLines(header, () => rows, rightAligned)) out += `${l}\n`;
  return out;
}
