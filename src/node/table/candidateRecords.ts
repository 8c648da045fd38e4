/**
 * Candidate records from CSV text or a JSON candidate list, with their line
 * numbers: the header checked, blank lines and unreadable records kept in
 * their place. No Node built-in: the command line (readCandidateRows.ts,
 * which opens files and streams) and the workbench page read candidates
 * with this same code, so a bad row gives the same message in both.
 *
 * @module
 */
import { IonheatError } from '../../error.js';
import { candidateFields, type CandidateLike } from '../../screen/candidate.js';
import { parseJsonStrict } from '../strictJson.js';
import { nearestName } from '../../quantity/nearestName.js';
import { csvRecords as splitCsv } from './csvSplitter.js';

/** One record of the input: a candidate's fields, a blank line, or a record that could not be read. */
export type InputRecord =
  | { kind: 'candidate'; line: number; candidate: CandidateLike }
  | { kind: 'blank'; line: number }
  | { kind: 'unreadable'; line: number; formula?: string; error: IonheatError };

const KNOWN = new Set<string>(candidateFields);
/** Longest CSV record accepted, in characters. */
const MAX_RECORD = 100_000;
/** Most lines one quoted CSV cell may span (a note of a few paragraphs). */
const MAX_CELL_LINES = 50;
/** A hint for a header that is one cell holding another separator: semicolons or tabs, as some spreadsheets write. */
function separatorHint(cell: string): string {
  for (const [sep, name] of [[';', 'semicolons'], ['\t', 'tabs']] as const) {
    if (cell.includes(sep) && cell.split(sep).some((c) => c.trim() === 'formula' || nearestName(c.trim(), candidateFields) !== undefined)) {
      return `; this header is separated by ${name}, but a candidate list is separated by commas (save it as "CSV, comma-separated")`;
    }
  }
  return '';
}
function columnsOf(header: readonly string[], label: string): string[] {
  const columns = header.map((h) => h.trim());
  const seen = new Set<string>();
  for (const [i, c] of columns.entries()) {
    if (c === '') throw new IonheatError('INVALID_DATA', `${label}, line 1: column ${i + 1} has no name (the header names the columns: ${candidateFields.join(', ')})`, { field: label });
    if (!KNOWN.has(c)) {
      const near = nearestName(c, candidateFields);
      const hint = separatorHint(c) || (near ? `; did you mean "${near}"? (names are case-sensitive)` : '');
      throw new IonheatError('INVALID_DATA', `${label}, line 1: unknown column "${c.length > 40 ? c.slice(0, 40) + '…' : c}" (the columns a candidate list may have: ${candidateFields.join(', ')})${hint}`, { field: c });
    }
    if (seen.has(c)) throw new IonheatError('INVALID_DATA', `${label}, line 1: the column "${c}" is named twice`, { field: c });
    seen.add(c);
  }
  if (!seen.has('formula')) throw new IonheatError('INVALID_DATA', `${label}, line 1: the header has no "formula" column (found: ${columns.join(', ')})`, { field: 'formula' });
  return columns;
}

/**
 * The records of a CSV stream: header first, then one record per row, each
 * with the line it starts on. A record that cannot be read becomes an
 * `unreadable` record at its line, and reading goes on.
 */
export async function* csvCandidateRecords(input: AsyncIterable<Uint8Array | string>, label: string, counter: { columns?: string[] }): AsyncGenerator<InputRecord[]> {
  let columns: string[] | undefined;
  let formulaAt = 0;
  try {
    for await (const records of splitCsv(input, { maxChars: MAX_RECORD, maxLines: MAX_CELL_LINES })) {
      const out: InputRecord[] = [];
      for (const record of records) {
        const { line, cells } = record;
        if ('error' in record) {
          const formula = columns ? cells[formulaAt] : undefined;
          const error = new IonheatError('INVALID_DATA', `${label}, line ${line}: not readable as CSV: ${record.error}`, { field: label });
          if (!columns) throw error;
          out.push({ kind: 'unreadable', line, ...(formula !== undefined ? { formula: formula.slice(0, 200) } : {}), error });
          continue;
        }
        let blank = true;
        for (const cell of cells) {
          if (cell.trim() !== '') {
            blank = false;
            break;
          }
        }
        if (blank) {
          if (columns) out.push({ kind: 'blank', line });
          continue;
        }
        if (!columns) {
          columns = columnsOf(cells, label);
          counter.columns = columns;
          formulaAt = columns.indexOf('formula');
          continue;
        }
        if (cells.length > columns.length) {
          out.push({ kind: 'unreadable', line, formula: cells[formulaAt] ?? '', error: new IonheatError('INVALID_DATA', `${label}, line ${line}: ${cells.length} fields, but the header names ${columns.length} columns`, { field: label }) });
          continue;
        }
        const fields: Record<string, unknown> = {};
        for (let i = 0; i < cells.length; i++) {
          const cell = cells[i]!;
          if (cell !== '') fields[columns[i]!] = cell;
        }
        out.push({ kind: 'candidate', line, candidate: fields });
      }
      if (out.length > 0) yield out;
    }
  } catch (e) {
    if (e instanceof IonheatError) throw e;
    throw new IonheatError('INVALID_ARGUMENT', `cannot read ${label === 'standard input' ? 'standard input' : `the candidate file "${label}"`}: ${(e as { code?: string }).code ?? String(e)}`, { field: label });
  }
  if (!columns) throw new IonheatError('INVALID_DATA', `${label}: no header line; the first line names the columns, e.g. formula,pricePerKg`, { field: label });
}

/** The line on which each top-level element of a JSON array starts (one pass over the text). */
function elementLines(text: string): number[] {
  const lines: number[] = [];
  let line = 1;
  let depth = 0;
  let expectValue = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === '\n') {
      line++;
      continue;
    }
    if (c === ' ' || c === '\t' || c === '\r') continue;
    if (depth === 1 && expectValue && c !== ']') {
      lines.push(line);
      expectValue = false;
    }
    if (c === '"') {
      let j = i + 1;
      while (j < text.length && text[j] !== '"') {
        if (text[j] === '\n') line++;
        j += text[j] === '\\' ? 2 : 1;
      }
      i = j;
    } else if (c === '[' || c === '{') {
      depth++;
      if (depth === 1 && c === '[') expectValue = true;
    } else if (c === ']' || c === '}') depth--;
    else if (c === ',' && depth === 1) expectValue = true;
  }
  return lines;
}

/** The records of a JSON candidate list (an array of formulas or rows), each with the line its element starts on. */
export async function* jsonCandidateRecords(text: string, label: string): AsyncGenerator<InputRecord[]> {
  const value = parseJsonStrict(text, label);
  const rows = Array.isArray(value) ? value : undefined;
  if (!rows) {
    const got = value !== null && typeof value === 'object' ? 'an object' : value === null ? 'null' : typeof value;
    const hint = value !== null && typeof value === 'object' && Object.hasOwn(value, 'formula') ? `; for one candidate write [${JSON.stringify(value).slice(0, 60)}]` : '';
    throw new IonheatError('INVALID_DATA', `${label}: a JSON candidate list is an array of rows, e.g. [{"formula": "KNO3"}, "NH4Cl"], got ${got}${hint}`, { field: label });
  }
  const lines = elementLines(text);
  const batch = (i: number, row: unknown): InputRecord => {
    const line = lines[i] ?? i + 1;
    if (typeof row === 'string') return { kind: 'candidate', line, candidate: row };
    if (row !== null && typeof row === 'object' && !Array.isArray(row)) return { kind: 'candidate', line, candidate: row as Record<string, unknown> };
    return { kind: 'unreadable', line, error: new IonheatError('INVALID_DATA', `${label}, line ${line}: a row is a formula or an object with a "formula" field, got ${row === null ? 'null' : Array.isArray(row) ? 'a list' : typeof row}`, { field: label }) };
  };
  for (let start = 0; start < rows.length; start += 256) yield rows.slice(start, start + 256).map((row, k) => batch(start + k, row));
}

