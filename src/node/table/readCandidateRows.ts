/**
 * Reading a candidate list (CSV or JSON) as a stream of records with their
 * line numbers, for `ionheat screen`. CSV goes through csv-parse, record by
 * record, so a file of any length is read in flat memory.
 *
 * @module
 */
import { createReadStream, statSync } from 'node:fs';
import { PassThrough, type Readable } from 'node:stream';
import { parse, type Options } from 'csv-parse';
import { IonheatError } from '../../error.js';
import { candidateFields, type CandidateLike } from '../../screen/candidate.js';
import { parseJsonStrict } from '../strictJson.js';

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
}

const KNOWN = new Set<string>(candidateFields);
/** Longest CSV record accepted, in characters. */
const MAX_RECORD = 100_000;

function columnsOf(header: readonly string[], label: string): string[] {
  const columns = header.map((h) => h.trim());
  const seen = new Set<string>();
  for (const [i, c] of columns.entries()) {
    if (c === '') throw new IonheatError('INVALID_DATA', `${label}, line 1: column ${i + 1} has no name (the header names the columns: ${candidateFields.join(', ')})`, { field: label });
    if (!KNOWN.has(c)) throw new IonheatError('INVALID_DATA', `${label}, line 1: unknown column "${c.length > 40 ? c.slice(0, 40) + '…' : c}" (the columns a candidate list may have: ${candidateFields.join(', ')})`, { field: c });
    if (seen.has(c)) throw new IonheatError('INVALID_DATA', `${label}, line 1: the column "${c}" is named twice`, { field: c });
    seen.add(c);
  }
  if (!seen.has('formula')) throw new IonheatError('INVALID_DATA', `${label}, line 1: the header has no "formula" column (found: ${columns.join(', ')})`, { field: 'formula' });
  return columns;
}

/** Line breaks inside the cells of a record (quoted fields may hold them): `\n`, or a `\r` not followed by `\n`. */
function breaksIn(record: readonly string[]): number {
  let n = 0;
  for (const cell of record) {
    if (cell.indexOf('\n') < 0 && cell.indexOf('\r') < 0) continue;
    for (let i = 0; i < cell.length; i++) {
      const c = cell.charCodeAt(i);
      if (c === 10 || (c === 13 && cell.charCodeAt(i + 1) !== 10)) n++;
    }
  }
  return n;
}

/** The records a csv-parse stream has ready, a batch at a time, without a promise per record. */
async function* parsedBatches(parser: ReturnType<typeof parse>): AsyncGenerator<string[][]> {
  let ended = false;
  let failure: unknown;
  let wake: () => void = () => {};
  parser.on('end', () => {
    ended = true;
    wake();
  });
  parser.on('error', (e) => {
    failure = e;
    wake();
  });
  for (;;) {
    const batch: string[][] = [];
    for (let record = parser.read() as string[] | null; record !== null; record = parser.read() as string[] | null) batch.push(record);
    if (batch.length > 0) yield batch;
    if (failure !== undefined) throw failure;
    if (ended) return;
    await new Promise<void>((resolve) => {
      wake = resolve;
      parser.once('readable', resolve);
    });
  }
}

/**
 * The records of a CSV text stream: header first, then one record per row,
 * each with the line it starts on. Lines are counted from the records
 * (one per record, plus the line breaks inside quoted cells), which is much
 * cheaper than asking the parser for its position at every record.
 */
async function* csvRecords(input: Readable, label: string, counter: { bytes: number; columns?: string[] }): AsyncGenerator<InputRecord[]> {
  // highWaterMark (a stream option the parser passes on) lets a batch hold a few hundred records.
  const options: Options & { highWaterMark: number } = { bom: true, relax_column_count: true, relax_quotes: true, skip_empty_lines: false, max_record_size: MAX_RECORD, highWaterMark: 64 };
  const parser = parse(options);
  input.on('data', (chunk: Buffer | string) => {
    counter.bytes += chunk.length;
  });
  input.on('error', (e) => parser.destroy(e));
  input.pipe(parser);
  let columns: string[] | undefined;
  let formulaAt = 0;
  let nextLine = 1;
  try {
    for await (const records of parsedBatches(parser)) {
      const out: InputRecord[] = [];
      for (const record of records) {
        const line = nextLine;
        nextLine = line + 1 + breaksIn(record);
        let blank = true;
        for (const cell of record) {
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
          columns = columnsOf(record, label);
          counter.columns = columns;
          formulaAt = columns.indexOf('formula');
          continue;
        }
        if (record.length > columns.length) {
          out.push({ kind: 'unreadable', line, formula: record[formulaAt] ?? '', error: new IonheatError('INVALID_DATA', `${label}, line ${line}: ${record.length} fields, but the header names ${columns.length} columns`, { field: label }) });
          continue;
        }
        const fields: Record<string, unknown> = {};
        for (let i = 0; i < record.length; i++) {
          const cell = record[i]!;
          if (cell !== '') fields[columns[i]!] = cell;
        }
        out.push({ kind: 'candidate', line, candidate: fields });
      }
      if (out.length > 0) yield out;
    }
  } catch (e) {
    if (e instanceof IonheatError) throw e;
    const err = e as { code?: string; message?: string; lines?: number };
    if (err.code === 'ENOENT' || err.code === 'EACCES' || err.code === 'EISDIR') throw new IonheatError('INVALID_ARGUMENT', `cannot read the candidate file "${label}": ${err.code}`, { field: label });
    const where = typeof err.lines === 'number' ? `, line ${err.lines}` : '';
    throw new IonheatError('INVALID_DATA', `${label}${where}: not readable as CSV (${(err.message ?? String(e)).split('\n')[0]!.replace(/^[A-Za-z ]+: /, '')})`, { field: label });
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
  if (!rows) throw new IonheatError('INVALID_DATA', `${label}: a JSON candidate list is an array of rows, e.g. [{"formula": "KNO3"}, "NH4Cl"]`, { field: label });
  const lines = elementLines(text);
  const batch = (i: number, row: unknown): InputRecord => {
    const line = lines[i] ?? i + 1;
    if (typeof row === 'string') return { kind: 'candidate', line, candidate: row };
    if (row !== null && typeof row === 'object' && !Array.isArray(row)) return { kind: 'candidate', line, candidate: row as Record<string, unknown> };
    return { kind: 'unreadable', line, error: new IonheatError('INVALID_DATA', `${label}, line ${line}: a row is a formula or an object with a "formula" field, got ${row === null ? 'null' : Array.isArray(row) ? 'a list' : typeof row}`, { field: label }) };
  };
  for (let start = 0; start < rows.length; start += 256) yield rows.slice(start, start + 256).map((row, k) => batch(start + k, row));
}

async function readAll(input: Readable): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const chunk of input) chunks.push(typeof chunk === 'string' ? Buffer.from(chunk) : (chunk as Buffer));
  return Buffer.concat(chunks).toString('utf8');
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
 * (JSON when its first character is `[`, CSV otherwise).
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
    if (first === '[') {
      const text = await readAll(stream);
      counter.bytes = text.length;
      return { label: 'standard input', format: 'json', records: jsonRecords(text, 'standard input'), progress: () => ({ bytes: counter.bytes, total: text.length }), columns: () => undefined };
    }
    return { label: 'standard input', format: 'csv', records: csvRecords(stream, 'standard input', counter), progress: () => ({ bytes: counter.bytes }), columns };
  }
  const full = path.startsWith('/') ? path : `${cwd}/${path}`;
  const lower = path.toLowerCase();
  const format = lower.endsWith('.json') ? 'json' : lower.endsWith('.csv') || lower.endsWith('.txt') ? 'csv' : undefined;
  if (!format) throw new IonheatError('INVALID_ARGUMENT', `"${path}": a candidate list is a .csv or .json file, or - for standard input`, { field: path });
  let size: number;
  try {
    const stat = statSync(full);
    if (!stat.isFile()) throw Object.assign(new Error('not a file'), { code: 'EISDIR' });
    size = stat.size;
  } catch (e) {
    throw new IonheatError('INVALID_ARGUMENT', `cannot read the candidate file "${path}": ${(e as NodeJS.ErrnoException).code ?? String(e)}`, { field: path });
  }
  if (format === 'json') {
    const text = await readAll(createReadStream(full));
    return { label: path, format, records: jsonRecords(text, path), progress: () => ({ bytes: size, total: size }), columns: () => undefined };
  }
  return { label: path, format, records: csvRecords(createReadStream(full), path, counter), progress: () => ({ bytes: counter.bytes, total: size }), columns };
}
