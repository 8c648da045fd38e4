/**
 * One CSV record as text, written directly: the screen's CSV output runs to
 * hundreds of thousands of records, and a general CSV library spends most
 * of its time per field on options that the screen never uses.
 *
 * @module
 */

/** True when a cell must be quoted: it holds a quote, the delimiter or a line break. */
function needsQuotes(cell: string): boolean {
  for (let i = 0; i < cell.length; i++) {
    const c = cell.charCodeAt(i);
    if (c === 34 || c === 44 || c === 10 || c === 13) return true; // " , \n \r
  }
  return false;
}

/**
 * The cells as one CSV record ending in `\n` (RFC 4180 quoting: a cell
 * holding `"`, `,`, `\n` or `\r` is put in double quotes, with each `"`
 * doubled; other cells are written as they are). The same text as
 * csv-stringify writes with its default options; tests check the two agree.
 * Formula injection is handled before, by `csvCell`.
 *
 * @param cells - the record's cells, already text
 * @returns the record with its line end
 * @example
 * ```ts
 * csvRecord(['NaCl', '3.88', 'a, b', 'say "hi"']); // 'NaCl,3.88,"a, b","say ""hi"""\n'
 * ```
 */
export function csvRecord(cells: readonly string[]): string {
  let out = '';
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i]!;
    if (i > 0) out += ',';
    out += needsQuotes(cell) ? `"${cell.replaceAll('"', '""')}"` : cell;
  }
  return `${out}\n`;
}
