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
import { megabytes, openRegularFile, withoutBom } from '../readInputFile.js';
import { csvCandidateRecords, jsonCandidateRecords, type InputRecord } from './candidateRecords.js';

export type { InputRecord } from './candidateRecords.js';

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

/** Largest JSON candidate list read (JSON is read whole; CSV streams and has no bound). */
const MAX_JSON_BYTES = 64 * 2 ** 20;

/** The CSV records of a stream, counting its bytes for the progress bar. */
async function* csvFrom(input: Readable, label: string, counter: { bytes: number; columns?: string[] }): AsyncGenerator<InputRecord[]> {
  // Counted from when reading starts (the generator's first step), as the records are taken.
  input.on('data', (chunk: Buffer | string) => {
    counter.bytes += chunk.length;
  });
  yield* csvCandidateRecords(input as AsyncIterable<Buffer>, label, counter);
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
      return { label: 'standard input', format: 'json', records: jsonCandidateRecords(text, 'standard input'), progress: () => ({ bytes: counter.bytes, total: text.length }), columns: () => undefined };
    }
    return { label: 'standard input', format: 'csv', records: csvFrom(stream, 'standard input', counter), progress: () => ({ bytes: counter.bytes }), columns };
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
    return { label: path, format, records: jsonCandidateRecords(text, path), progress: () => ({ bytes: size, total: size }), columns: () => undefined, file };
  }
  return { label: path, format, records: csvFrom(stream, path, counter), progress: () => ({ bytes: counter.bytes, total: size }), columns, file };
}
