/**
 * Issue 13, "Nothing lost": each case of the issue as a named regression
 * test, run in this process (the cases where the operating system itself is
 * involved — pipes, slow readers, a full disk — are in nothingLostOs.test.ts).
 */
import { execFileSync } from 'node:child_process';
import { closeSync, existsSync, mkdtempSync, openSync, readFileSync, rmSync, writeFileSync, ftruncateSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { parse } from 'csv-parse/sync';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../../src/node/cli/main.js';
import type { CliIO } from '../../src/node/cli/io.js';
import { loadDataset } from '../../src/node/loadDataset.js';
import { parseJsonStrict } from '../../src/node/strictJson.js';
import { textTable } from '../../src/node/cli/textTable.js';
import { csvCell } from '../../src/node/table/csvCell.js';
import { BoundedCache } from '../../src/data/boundedCache.js';
import { builtinDataset } from '../../src/data/recordCheck.js';
import { parseSalt, screen, screenStream, dissolve } from '../../src/index.js';

const dir = mkdtempSync(join(tmpdir(), 'ionheat-nothing-lost-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, text: string | Buffer): string {
  writeFileSync(join(dir, name), text);
  return name;
}

async function run(args: string[], options: { stdin?: Readable } = {}) {
  let out = '';
  let err = '';
  const io: CliIO = {
    stdout: (t) => void (out += t),
    stderr: (t) => void (err += t),
    stderrIsTTY: false,
    readStdin: async () => '',
    cwd: dir,
    ...(options.stdin ? { stdinStream: () => options.stdin! } : {}),
  };
  const status = await runCli(args, io);
  return { status, out, err };
}

const csvRows = (text: string): Record<string, string>[] => parse(text, { columns: true }) as Record<string, string>[];
const FORMULAS = ['NaCl', 'KNO3', 'NH4NO3', 'KCl'];

describe('a CSV fault stays in its record', () => {
  it('an unclosed quote at row 1,500 of 2,000: that row fails at its own line, every other row is computed', async () => {
    const lines = ['formula,note'];
    for (let i = 1; i <= 2000; i++) lines.push(i === 1500 ? `KCl,"never closed` : `${FORMULAS[i % 4]},row ${i}`);
    const r = await run(['screen', file('unclosed.csv', `${lines.join('\n')}\n`), '--format', 'csv']);
    expect(r.status).toBe(2);
    const rows = csvRows(r.out);
    expect(rows).toHaveLength(2000);
    const failed = rows.filter((row) => row.status === 'failed');
    expect(failed.map((row) => row.line)).toEqual(['1501']);
    expect(failed[0]!['input.formula']).toBe('KCl');
    expect(failed[0]!['error.message']).toMatch(/^unclosed\.csv, line 1501: not readable as CSV: the quote opened at column 5 is not closed/);
    // The rows just before and every row after it are there, computed.
    expect(rows.find((row) => row.line === '1500')!.status).toBe('computed');
    expect(rows.find((row) => row.line === '1502')!.status).toBe('computed');
    expect(rows[rows.length - 1]!.line).toBe('2001');
    expect(r.err).toMatch(/^screen: 2000 rows read, 1999 computed, 1 failed\n$/);
  });

  it('a quoted cell over the record limit fails alone; the rows after it are computed', async () => {
    const text = `formula,note\nKNO3,a\nNaCl,"${'x'.repeat(120_000)}"\nKCl,b\n`;
    const r = await run(['screen', file('long.csv', text), '--format', 'csv']);
    const rows = csvRows(r.out);
    expect(rows.map((row) => [row.line, row.status])).toEqual([['2', 'computed'], ['3', 'failed'], ['4', 'computed']]);
    expect(rows[1]!['error.message']).toMatch(/line 3: not readable as CSV: the quote opened at column 6 is not closed within 50 lines or 100,000 characters/);
  });

  it('an unquoted line over the record limit fails alone and is skipped as it streams', async () => {
    const text = `formula\nKNO3\n${'N'.repeat(150_000)}\nKCl\n`;
    const r = await run(['screen', file('longline.csv', text), '--format', 'csv']);
    const rows = csvRows(r.out);
    expect(rows.map((row) => [row.line, row.status])).toEqual([['2', 'computed'], ['3', 'failed'], ['4', 'computed']]);
    expect(rows[1]!['error.message']).toMatch(/the record is longer than 100,000 characters/);
  });

  it('a lone CR ends its row: the next row is its own row, not part of a note', async () => {
    const r = await run(['screen', file('cr.csv', 'formula,note\nKNO3,first\rNaCl,second\nKCl,third\n'), '--format', 'csv']);
    expect(r.status).toBe(0);
    const rows = csvRows(r.out);
    expect(rows.map((row) => [row.line, row['input.formula'], row['input.note']])).toEqual([
      ['2', 'KNO3', 'first'],
      ['3', 'NaCl', 'second'],
      ['4', 'KCl', 'third'],
    ]);
  });

  it('a quoted cell may span lines; the line numbers after it stay right', async () => {
    const r = await run(['screen', file('multiline.csv', 'formula,note\nKNO3,"two\nlines"\nKCl,x\n'), '--format', 'csv']);
    expect(csvRows(r.out).map((row) => [row.line, row['input.note']])).toEqual([['2', 'two\nlines'], ['4', 'x']]);
  });

  it('input that fails mid-stream: the rows before it are written, the summary follows, then the reason; status 2', async () => {
    const stdin = new Readable({ read() {} });
    stdin.push('formula\nKNO3\nNaCl\n');
    setTimeout(() => stdin.destroy(Object.assign(new Error('read failed'), { code: 'EIO' })), 20);
    const r = await run(['screen', '-', '--format', 'csv'], { stdin });
    expect(r.status).toBe(2);
    expect(csvRows(r.out).map((row) => row['input.formula'])).toEqual(['KNO3', 'NaCl']);
    expect(r.err).toMatch(/^screen: 2 rows read, 2 computed, 0 failed\nionheat: cannot read standard input: EIO; the rows before it were written\n$/);
  });
});

describe('files written safely', () => {
  it('--svg naming the candidate file is refused before any work, and the candidates are untouched', async () => {
    const text = 'formula\nKNO3\n';
    file('cands.csv', text);
    const r = await run(['screen', 'cands.csv', '--svg', 'cands.csv']);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/^ionheat: --svg names an input of this run/);
    expect(r.out).toBe('');
    expect(readFileSync(join(dir, 'cands.csv'), 'utf8')).toBe(text);
  });

  it('--svg naming a --data file (by another spelling) is refused', async () => {
    const data = file('mine.json', JSON.stringify({ tables: {} }));
    const r = await run(['screen', file('c2.csv', 'formula\nKCl\n'), '--data', data, '--svg', `./${data}`]);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/--svg names an input of this run/);
    expect(readFileSync(join(dir, data), 'utf8')).toBe(JSON.stringify({ tables: {} }));
  });

  it('a chart that cannot be written leaves the old one and does not hide a failed spec (status 1)', async () => {
    // A directory in place of the chart's temporary file cannot happen by chance; a missing folder makes the write fail.
    const r = await run(['screen', file('c3.csv', 'formula\nKCl\n'), '--spec', 'best.low > 1000', '--svg', join(dir, 'missing', 'chart.svg')]);
    expect(r.status).toBe(1);
    expect(r.err).toMatch(/^screen: 1 row read, 1 computed, 0 failed, spec held for 0, failed for 1\nionheat: cannot write the chart/);
  });
});

describe('big outputs', () => {
  it('a text table of 200,000 rows is written (no spread into Math.max)', () => {
    const rows = Array.from({ length: 200_000 }, (_, i) => [String(i + 1), 'NaCl']);
    const text = textTable(['line', 'salt'], rows, new Set([0]));
    expect(text.split('\n')).toHaveLength(200_003);
    expect(text.split('\n')[2]).toBe('     1  NaCl');
  });
});

describe('bounded caches', () => {
  it('BoundedCache never holds more than its limit, and keeps what is used again', () => {
    const cache = new BoundedCache<number, number>(100);
    let keptZero = true;
    for (let i = 0; i < 10_000; i++) {
      cache.set(i, i * 2);
      keptZero &&= cache.get(0) === 0; // used all the time: never dropped
    }
    expect(keptZero).toBe(true);
    expect(cache.size).toBeLessThanOrEqual(100);
    expect(cache.get(9_999)).toBe(19_998);
    expect(cache.has(5)).toBe(false);
  });

  it('the per-salt caches of a dataset are bounded caches', () => {
    const data = builtinDataset().withOverrides({}, 'fresh');
    dissolve('KNO3', {}, data);
    dissolve('KBrO3', { excludeMeasured: true }, data); // measured values hidden: the estimators run, and their caches fill
    for (const key of ['solution.profiles', 'chem.saltArgument', 'lattice.estimateCache', 'cycle.latticeCache', 'pack.saltData']) {
      const kept = data.memo<unknown>(key, () => undefined);
      if (kept !== undefined) expect(kept, key).toBeInstanceOf(BoundedCache);
    }
    expect(data.memo('solution.profiles', () => undefined)).toBeInstanceOf(BoundedCache);
  });
});

describe('user-supplied objects: every throw becomes an IonheatError, one bad candidate one failed row', () => {
  const throwing = Object.defineProperty({}, 'formula', {
    enumerable: true,
    get() {
      throw new Error('getter exploded');
    },
  });
  const { proxy: revoked, revoke } = Proxy.revocable({ formula: 'KCl' }, {});
  revoke();
  const wrapped = new Proxy(parseSalt('KNO3'), {});

  it('a throwing getter, a revoked proxy and a proxy around a parsed salt, among good candidates', () => {
    const result = screen(['NaCl', throwing, revoked, wrapped, 'KCl']);
    expect(result.rows.map((r) => r.status)).toEqual(['computed', 'failed', 'failed', 'computed', 'computed']);
    expect(result.rows[1]!.error).toMatchObject({ code: 'INVALID_ARGUMENT', message: 'the candidate could not be read: getter exploded' });
    expect(result.rows[2]!.error?.code).toBe('INVALID_ARGUMENT');
    expect(result.rows[3]!.best?.value).toBe(dissolve('KNO3').best.value);
  });

  it('options with a throwing getter, and a list whose iterator throws', async () => {
    const options = Object.defineProperty({}, 'spec', {
      get() {
        throw new Error('no');
      },
    });
    expect(() => screen(['KCl'], options)).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', message: 'the options of the screen could not be read: no' }));
    const list = {
      *[Symbol.iterator]() {
        yield 'KCl';
        throw new Error('list broke');
      },
    };
    expect(() => screen(list)).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', message: 'the list of candidates could not be read: list broke' }));
    const { proxy: revokedList, revoke: revokeList } = Proxy.revocable(['KCl'], {});
    revokeList();
    expect(() => screen(revokedList)).toThrow(expect.objectContaining({ code: 'INVALID_ARGUMENT', field: 'candidates' }));
    const rows: string[] = [];
    await expect(
      (async () => {
        for await (const row of screenStream(list)) rows.push(row.formula!);
      })(),
    ).rejects.toMatchObject({ code: 'INVALID_ARGUMENT' });
    expect(rows).toEqual(['KCl']);
  });
});

describe('reads bounded, FIFOs and devices refused', () => {
  it('--data naming a FIFO with no writer is refused at once, as a FIFO (not EISDIR)', () => {
    const fifo = join(dir, 'pipe.json');
    try {
      execFileSync('mkfifo', [fifo]);
    } catch {
      console.warn('skipped: mkfifo is not available here');
      return;
    }
    expect(() => loadDataset([fifo])).toThrow(/cannot read data file ".*pipe\.json": it is a named pipe \(FIFO\), not a file/);
  });

  it('--data /dev/zero is refused as a device', () => {
    if (!existsSync('/dev/zero')) return;
    expect(() => loadDataset(['/dev/zero'])).toThrow(/"\/dev\/zero": it is a device, not a file/);
  });

  it('a data file over 16 MB is refused without being read', () => {
    const big = join(dir, 'huge.json');
    const fd = openSync(big, 'w');
    ftruncateSync(fd, 17 * 2 ** 20);
    closeSync(fd);
    expect(() => loadDataset([big])).toThrow(/larger than 16 MB/);
  });

  it('a candidate FIFO is refused, with a hint to use standard input', async () => {
    const fifo = join(dir, 'cands-pipe.csv');
    try {
      execFileSync('mkfifo', [fifo]);
    } catch {
      console.warn('skipped: mkfifo is not available here');
      return;
    }
    const r = await run(['screen', 'cands-pipe.csv']);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/it is a named pipe \(FIFO\), not a file; to read from a pipe, give - and send it to standard input/);
  });
});

describe('terminal hygiene', () => {
  it('escape sequences in a formula or note are shown, not sent to the terminal; NUL is neutralised in CSV', async () => {
    const text = 'formula,note\n"KNO3","\u001b[2J\u001b[Hcleared"\n"Na\u001b[8mCl",x\nKCl,"nul\u0000here"\n';
    const table = await run(['screen', file('escape.csv', text)]);
    expect(table.out).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/);
    expect(table.out).toContain('\\x1b[2J\\x1b[Hcleared');
    expect(table.err).not.toContain('\u001b');
    const csv = await run(['screen', 'escape.csv', '--format', 'csv']);
    expect(csv.out).not.toMatch(/[\u0000\u001b]/);
    expect(csv.out).toContain('nul\\x00here');
    expect(csvCell('a\tb\nc')).toBe('a\tb\nc'); // tab and line breaks are CSV's own business (quoted by csvRecord)
  });

  it('an error message quoting the user\'s text shows its control characters', async () => {
    const r = await run(['salt', 'Na\u001b[2JCl']);
    expect(r.status).toBe(2);
    expect(r.err).not.toContain('\u001b');
    expect(r.err).toContain('\\x1b');
  });
});

describe('clear errors', () => {
  it('a JSON data file with a byte-order mark is read', () => {
    const path = join(dir, file('bom.json', `\uFEFF${JSON.stringify({ tables: {} })}`));
    expect(loadDataset([path]).label).toBe('built-in + bom.json');
  });

  it('a JSON candidate file with a byte-order mark is read', async () => {
    const r = await run(['screen', file('bom-cands.json', '\uFEFF["KNO3"]'), '--format', 'csv']);
    expect(r.status).toBe(0);
    expect(csvRows(r.out)[0]!.formula).toBe('KNO3');
  });

  it('a JSON syntax error is reported at its line and column, not a byte offset', () => {
    expect(() => parseJsonStrict('{\n  "tables": {\n    "ions": [1, 2,]\n  }\n}', 'mine.json')).toThrow('mine.json: not valid JSON at line 3, column 19 (expected a value: a number, text in double quotes, true, false, null, [ or {)');
  });

  it('a JSON object on standard input is read as JSON, and refused as one', async () => {
    const r = await run(['screen', '-'], { stdin: Readable.from(['{"formula": "KNO3"}']) });
    expect(r.status).toBe(2);
    expect(r.err).toBe('ionheat: standard input: a JSON candidate list is an array of rows, e.g. [{"formula": "KNO3"}, "NH4Cl"], got an object; for one candidate write [{"formula":"KNO3"}]\n');
  });

  it('a semicolon-separated header says so', async () => {
    const r = await run(['screen', file('semi.csv', 'formula;pricePerKg\nKNO3;1,20\n')]);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/unknown column "formula;pricePerKg" .*; this header is separated by semicolons, but a candidate list is separated by commas/);
  });

  it('a header "Formula" gets a did-you-mean', async () => {
    const r = await run(['screen', file('upper.csv', 'Formula,PricePerKg\nKNO3,1\n')]);
    expect(r.err).toMatch(/unknown column "Formula" .*; did you mean "formula"\?/);
  });
});
