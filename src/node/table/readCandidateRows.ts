/**
 * Reading a candidate list (CSV or JSON) as a stream of records with their
 * line numbers, for `ionheat screen`. CSV is split record by record as it
 * streams in (csvSplitter.ts), so a file of any length is read in flat
 * memory and a fault in one record is reported at its own line while the
 * records around it are read.
 *
 * @module
 */
import { createReadStream } from 'node:fs';
import { PassThrough, type Readable } from 'node:stream';
import { IonheatError } from '../../error.js';
import { candidateFields, type CandidateLike } from '../../screen/candidate.js';
import { parseJsonStrict } from '../strictJson.js';
import { nearestName } from '../../quantity/nearestName.js';
import { megabytes, openRegularFile, withoutBom } from '../readInputFile.js';
import { csvRecords as splitCsv } from './csvSplitter.js';

/** One record of the input: a candidate's fields, a blank line, or a record that could not be read. */
export type InputRecord =
  | { kind: 'candidate'; line: number; candidate: CandidateLike }
  | { kind: 'blank'; line: number }
  | { kind: 'unreadable'; line: number; formula?: string; error: IonheatError };

/** Where the candidates come from. */
export interface CandidateSource {
  /** A file name for messages (`-` is standard input). */
  label: string;
  /** `csv` or `json`: by the file's extension, or for standard input by its first character. */
  format: 'csv' | 'json';
  /** The records, in input order, a batch at a time (what the parser has ready). */
  records: AsyncIterable<InputRecord[]>;
  /** Bytes of input read so far, and in all when known (for a progress bar). */
  progress(): { bytes: number; total?: number };
  /** The candidate fields the input can have: a CSV header's columns once read; undefined for JSON (any field). */
  columns(): readonly string[] | undefined;
  /** Device and inode of the file read (none for standard input), so that no output is written over it. */
  file?: { dev: number; ino: number };
}

const KNOWN = new Set<string>(candidateFields);
/** Longest CSV record accepted, in characters. */
const MAX_RECORD = 100_000;
/** Most lines one quoted CSV cell may span (a note of a few paragraphs). */
const MAX_CELL_LINES = 50;
/** Largest JSON candidate list read (JSON is read whole; CSV streams and has no bound). */
const MAX_JSON_BYTES = 64 * 2 ** 20;

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
async function* csvRecords(input: Readable, label: string, counter: { bytes: number; columns?: string[] }): AsyncGenerator<InputRecord[]> {
  input.on('data', (chunk: Buffer | string) => {
    counter.bytes += chunk.length;
  });
  let columns: string[] | undefined;
  let formulaAt = 0;
  try {
    for await (const records of splitCsv(input as AsyncIterable<Buffer>, { maxChars: MAX_RECORD, maxLines: MAX_CELL_LINES })) {
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
    throw new IonheatError('INVALID_ARGUMENT', `cannot read ${label === 'standard input' ? 'standard input' : `the candidate file "${label}"`}: ${(e as NodeJS.ErrnoException).code ?? String(e)}`, { field: label });
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

async function* jsonRecords(text: string, label: string): AsyncGenerator<InputRecord[]> {
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

/** All of a stream as text (a leading byte-order mark dropped), refused beyond `maxBytes`. */
async function readAll(input: Readable, label: string, maxBytes: number): Promise<string> {
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of input) {
    const b = typeof chunk === 'string' ? Buffer.from(chunk) : (chunk as Buffer);
    total += b.length;
    if (total > maxBytes) {
      input.destroy();
      throw new IonheatError('INVALID_ARGUMENT', `${label}: a JSON candidate list is read whole and may be at most ${megabytes(maxBytes)}; give a longer list as CSV, which is read as it streams`, { field: label });
    }
    chunks.push(b);
  }
  return withoutBom(Buffer.concat(chunks, total).toString('utf8'));
}

/** Peeks at the first non-blank character of a stream and gives back a stream that still starts at the beginning. */
async function sniff(input: Readable): Promise<{ first: string; stream: Readable }> {
  const out = new PassThrough();
  const held: Buffer[] = [];
  let first = '';
  const iterator = input[Symbol.asyncIterator]();
  while (first === '') {
    const { value, done } = (await iterator.next()) as { value: Buffer | string; done?: boolean };
    if (done) break;
    const chunk = typeof value === 'string' ? Buffer.from(value) : value;
    held.push(chunk);
    const textSoFar = Buffer.concat(held).toString('utf8').replace(/^\uFEFF/, '').trimStart();
    first = textSoFar.slice(0, 1);
  }
  (async () => {
    for (const h of held) out.write(h);
    for (;;) {
      const { value, done } = (await iterator.next()) as { value: Buffer; done?: boolean };
      if (done) break;
      if (!out.write(value)) await new Promise((resolve) => out.once('drain', resolve));
    }
    out.end();
  })().catch((e: unknown) => out.destroy(e as Error));
  return { first, stream: out };
}

/**
 * Opens a candidate list: a `.csv` or `.json` file, or `-` for standard input
 * (JSON when its first character is `[` or `{`, CSV otherwise). Only a
 * regular file is opened (a FIFO or a device is refused: pipe it to `-`).
 *
 * @param path - the file name as given, or `-`
 * @param cwd - directory of relative names
 * @param stdin - the standard input stream (for `-`)
 */
export async function openCandidates(path: string, cwd: string, stdin: Readable): Promise<CandidateSource> {
  const counter: { bytes: number; columns?: string[] } = { bytes: 0 };
  const columns = () => counter.columns;
  if (path === '-') {
    const { first, stream } = await sniff(stdin);
    if (first === '[' || first === '{') {
      const text = await readAll(stream, 'standard input', MAX_JSON_BYTES);
      counter.bytes = text.length;
      return { label: 'standard input', format: 'json', records: jsonRecords(text, 'standard input'), progress: () => ({ bytes: counter.bytes, total: text.length }), columns: () => undefined };
    }
    return { label: 'standard input', format: 'csv', records: csvRecords(stream, 'standard input', counter), progress: () => ({ bytes: counter.bytes }), columns };
  }
  const full = path.startsWith('/') ? path : `${cwd}/${path}`;
  const lower = path.toLowerCase();
  const format = lower.endsWith('.json') ? 'json' : lower.endsWith('.csv') || lower.endsWith('.txt') ? 'csv' : undefined;
  if (!format) throw new IonheatError('INVALID_ARGUMENT', `"${path}": a candidate list is a .csv or .json file, or - for standard input`, { field: path });
  const opened = openRegularFile(full, 'the candidate file', path, '; to read from a pipe, give - and send it to standard input');
  const { size } = opened;
  const file = { dev: opened.dev, ino: opened.ino };
  const stream = createReadStream('', { fd: opened.fd });
  if (format === 'json') {
    const text = await readAll(stream, path, MAX_JSON_BYTES);
    return { label: path, format, records: jsonRecords(text, path), progress: () => ({ bytes: size, total: size }), columns: () => undefined, file };
  }
  return { label: path, format, records: csvRecords(stream, path, counter), progress: () => ({ bytes: counter.bytes, total: size }), columns, file };
}
