/**
 * Splits CSV text (RFC 4180, comma-separated) into records as it streams in,
 * so that a fault stays in its own record: an unclosed quote, a record over
 * the size limit or a stray byte never takes the rows around it down.
 *
 * - A record ends at a line break outside quotes: `\n`, `\r\n`, or a lone
 *   `\r` (old Mac line ends), so a lone CR never glues two rows together.
 * - A quoted cell may hold commas, doubled quotes and line breaks, but may
 *   span at most {@link CsvLimits.maxLines} lines and the record at most
 *   {@link CsvLimits.maxChars} characters. A quote still open beyond that, or
 *   at the end of the input, makes its record unreadable, reported at the
 *   line it starts on, and reading goes on with the next line.
 * - A quote inside an unquoted cell, or text after a closing quote, is kept
 *   as written (as spreadsheets write and read it).
 * - A byte-order mark at the start is dropped.
 *
 * Bytes are decoded by the platform's `TextDecoder` (no Node built-in), so the
 * workbench page reads a candidate list with the same code as the command line.
 *
 * Memory is bounded by the limits: at most one record (and one chunk of
 * input) is held, and an over-long line is skipped as it streams.
 *
 * @module
 */

/** One record: its cells, or why it could not be read (with the cells read before the fault). */
export type CsvRecordRead = { line: number; cells: string[] } | { line: number; cells: string[]; error: string };

export interface CsvLimits {
  /** Longest record, in characters. */
  maxChars: number;
  /** Most lines one quoted cell may span. */
  maxLines: number;
}

const COMMA = 44;
const LF = 10;
const CR = 13;
const QUOTE = 34;

type Step = { kind: 'record'; end: number; lines: number; cells: string[] } | { kind: 'more' } | { kind: 'fault'; error: string; cells: string[]; skipTo: 'next line' | 'line end' };

/** Index just past the first line break at or after `from` (any kind), or -1 when none is in the text yet. */
function pastLineBreak(text: string, from: number): number {
  for (let i = from; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === LF) return i + 1;
    if (c === CR) return text.charCodeAt(i + 1) === LF ? i + 2 : i + 1 < text.length ? i + 1 : -1;
  }
  return -1;
}

/** Reads one record starting at `start`; `eof` says no more text will come. */
function readRecord(text: string, start: number, eof: boolean, limits: CsvLimits): Step {
  const cells: string[] = [];
  let i = start;
  let lines = 0;
  for (;;) {
    let cell = '';
    if (text.charCodeAt(i) === QUOTE) {
      const opened = i - start + 1;
      let j = i + 1;
      let spanned = 0;
      for (;;) {
        const q = text.indexOf('"', j);
        const stop = q < 0 ? text.length : q;
        // Line breaks inside the quotes, counted as lines of the record.
        for (let k = j; k < stop; k++) {
          const c = text.charCodeAt(k);
          if (c === LF || (c === CR && text.charCodeAt(k + 1) !== LF)) spanned++;
        }
        cell += text.slice(j, stop);
        if (spanned > limits.maxLines || stop - start > limits.maxChars) {
          return { kind: 'fault', error: `the quote opened at column ${opened} is not closed within ${limits.maxLines} lines or ${limits.maxChars.toLocaleString('en-US')} characters`, cells, skipTo: 'next line' };
        }
        if (q < 0 || q + 1 >= text.length) {
          if (!eof) return { kind: 'more' };
          if (q < 0) return { kind: 'fault', error: `the quote opened at column ${opened} is not closed before the end of the input`, cells, skipTo: 'next line' };
        }
        if (text.charCodeAt(q + 1) === QUOTE) {
          cell += '"';
          j = q + 2;
          continue;
        }
        i = q + 1;
        lines += spanned;
        break;
      }
    }
    // An unquoted cell, or what follows a closing quote up to the delimiter.
    let j = i;
    while (j < text.length) {
      const c = text.charCodeAt(j);
      if (c === COMMA || c === LF || c === CR) break;
      j++;
    }
    if (j - start > limits.maxChars) return { kind: 'fault', error: `the record is longer than ${limits.maxChars.toLocaleString('en-US')} characters`, cells, skipTo: 'line end' };
    if (j >= text.length && !eof) return { kind: 'more' };
    cell += text.slice(i, j);
    cells.push(cell);
    if (j >= text.length) return { kind: 'record', end: j, lines, cells };
    const c = text.charCodeAt(j);
    if (c === COMMA) {
      i = j + 1;
      continue;
    }
    if (c === CR && j + 1 >= text.length && !eof) return { kind: 'more' };
    return { kind: 'record', end: c === CR && text.charCodeAt(j + 1) === LF ? j + 2 : j + 1, lines: lines + 1, cells };
  }
}

/**
 * The records of a CSV byte stream, a batch at a time (what one chunk of
 * input completes), each with the line it starts on.
 *
 * @param input - the bytes (UTF-8) or text, in chunks
 * @param limits - the longest record and the most lines of a quoted cell
 */
export async function* csvRecords(input: AsyncIterable<Uint8Array | string>, limits: CsvLimits): AsyncGenerator<CsvRecordRead[]> {
  // ignoreBOM keeps a byte-order mark in the text, where the check below drops it once (as for text input).
  const decoder = new TextDecoder('utf-8', { ignoreBOM: true });
  let text = '';
  let line = 1;
  let first = true;
  /** Set while the rest of an over-long line is thrown away as it arrives. */
  let skippingLine = false;
  const iterator = input[Symbol.asyncIterator]();
  let eof = false;
  while (!eof) {
    const next = await iterator.next();
    if (next.done) {
      eof = true;
      text += decoder.decode();
    } else text += typeof next.value === 'string' ? next.value : decoder.decode(next.value, { stream: true });
    if (first && text.length > 0) {
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
      first = false;
    }
    const batch: CsvRecordRead[] = [];
    let at = 0;
    while (at < text.length) {
      if (skippingLine) {
        const past = pastLineBreak(text, at);
        if (past < 0) {
          at = text.length;
          break;
        }
        at = past;
        skippingLine = false;
        continue;
      }
      const step = readRecord(text, at, eof, limits);
      if (step.kind === 'more') break;
      if (step.kind === 'record') {
        batch.push({ line, cells: step.cells });
        line += step.lines;
        at = step.end;
        continue;
      }
      batch.push({ line, cells: step.cells, error: step.error });
      line++;
      if (step.skipTo === 'line end') {
        skippingLine = true;
        continue;
      }
      // Read on from the line after the one the record started on; if that line has not ended yet, skip the rest of it as it comes.
      const past = pastLineBreak(text, at);
      if (past < 0) skippingLine = true;
      at = past < 0 ? text.length : past;
    }
    text = text.slice(at);
    if (batch.length > 0) yield batch;
  }
}
