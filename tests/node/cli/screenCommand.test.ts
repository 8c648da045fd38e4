// `ionheat screen`: one output row per input row, errors carried in their rows,
// formula injection neutralised, exit statuses, and the JSON output against the
// shipped JSON Schema.
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { parse } from 'csv-parse/sync';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../../src/node/cli/main.js';
import type { CliIO } from '../../../src/node/cli/io.js';
import { screenOutputJsonSchema } from '../../../src/index.js';

const dir = mkdtempSync(join(tmpdir(), 'ionheat-screen-test-'));

async function run(args: string[], options: { stdin?: string; tty?: boolean; stream?: boolean } = {}) {
  let out = '';
  let err = '';
  const io: CliIO = {
    stdout: (t) => void (out += t),
    stderr: (t) => void (err += t),
    stderrIsTTY: options.tty ?? false,
    readStdin: async () => options.stdin ?? '',
    cwd: dir,
    ...(options.stream ? { stdinStream: () => Readable.from([options.stdin ?? '']) } : {}),
  };
  const status = await runCli(args, io);
  return { status, out, err };
}

function file(name: string, text: string): string {
  writeFileSync(join(dir, name), text);
  return name;
}

const csvRows = (text: string): Record<string, string>[] => parse(text, { columns: true }) as Record<string, string>[];

// Line 1 header; 2 good; 3 unknown ion; 4 unbalanced; 5 blank; 6 good; 7 injection; 8 blank (spaces);
// 9 repeats line 2; 10 a second injection, in the note; 11 a bad number.
const MIXED = [
  'formula,pricePerKg,note',
  'KNO3,2.0,good',
  'NaXy,1.0,unknown element',
  'Na2Cl,1.0,unbalanced',
  '',
  'NH4Cl,0.8,good',
  '"=HYPERLINK(""http://example.invalid"",""click"")",1.0,injection',
  '   ,  ,  ',
  'KNO3,2.0,good',
  'NaCl,0.2,"+SUM(A1:A9)"',
  'KCl,cheap,bad number',
].join('\n');

describe('ionheat screen: a CSV with good rows, bad rows, blank lines, an injection and a repeat', () => {
  it('gives one CSV row per input row, in input order, with its line number', async () => {
    const r = await run(['screen', file('mixed.csv', MIXED), '--format', 'csv']);
    const rows = csvRows(r.out);
    expect(rows.map((x) => x.line)).toEqual(['2', '3', '4', '6', '7', '9', '10', '11']);
    expect(rows.map((x) => x.status)).toEqual(['computed', 'failed', 'failed', 'computed', 'failed', 'computed', 'computed', 'failed']);
    expect(rows[1]!['error.code']).toBe('UNKNOWN_ELEMENT');
    expect(rows[1]!['error.message']).toMatch(/"Xy" at position 3 is not a chemical element/);
    expect(rows[2]!['error.code']).toBe('UNBALANCED_CHARGE');
    expect(rows[2]!['error.message']).toMatch(/charges in "Na2Cl" do not balance/);
    expect(rows[4]!['error.code']).toBe('UNEXPECTED_CHARACTER');
    expect(rows[5]!.duplicateOf).toBe('2');
    expect(rows[5]!.notes).toMatch(/the same candidate as line 2/);
    expect(rows[7]!['error.message']).toBe('pricePerKg: "cheap" is not a number');
    // Measured, CRC Handbook (data/solution-enthalpies.json): KNO3 34.89 kJ/mol.
    expect(Number(rows[0]!['best.value'])).toBe(34.89);
  });

  it('neutralises cells a spreadsheet would run as formulas, and leaves numbers as numbers', async () => {
    const r = await run(['screen', 'mixed.csv', '--format', 'csv']);
    const rows = csvRows(r.out);
    expect(rows[4]!['input.formula']).toBe('\'=HYPERLINK("http://example.invalid","click")');
    expect(rows[6]!['input.note']).toBe("'+SUM(A1:A9)");
    const triggers = ['=', '+', '-', '@', '\t', '\r'];
    for (const row of rows) {
      for (const [column, cell] of Object.entries(row)) {
        if (cell !== '' && triggers.includes(cell[0]!)) {
          // Only numbers may start with "-" (a negative value), and they must read back as numbers.
          expect(cell[0], `${column} = ${cell}`).toBe('-');
          expect(Number.isFinite(Number(cell)), `${column} = ${cell}`).toBe(true);
        }
      }
    }
    // A negative number stays a bare number: LiCl's measured −37.03 kJ/mol (CRC) is written -37.03.
    const li = await run(['screen', file('li.csv', 'formula\nLiCl\n'), '--format', 'csv']);
    expect(li.out).toMatch(/,-37\.03,/);
  });

  it('counts rows read, computed and failed, and the blank lines, in one summary line on stderr', async () => {
    const r = await run(['screen', 'mixed.csv', '--format', 'csv']);
    expect(r.err).toBe('screen: 8 rows read, 4 computed, 4 failed (2 blank lines skipped)\n');
  });

  it('exits 2 when a row could not be computed, after writing every row', async () => {
    for (const format of ['csv', 'json', 'table', 'md']) {
      const r = await run(['screen', 'mixed.csv', '--format', format]);
      expect(r.status, format).toBe(2);
    }
  });

  it('shows the same rows in the table, with ranks and the errors in words', async () => {
    const r = await run(['screen', 'mixed.csv']);
    const lines = r.out.split('\n');
    expect(lines[0]).toMatch(/^rank\s+line\s+salt\s+enthalpy \(kJ\/mol\) \[95 %\]/);
    const body = lines.slice(2).filter((l) => /^\s*\d*\s+\d+\s/.test(l));
    expect(body).toHaveLength(8);
    expect(r.out).toMatch(/failed: "Xy" at position 3 is not a chemical element/);
    expect(r.out).toMatch(/same as line 2/);
    expect(r.out.replace(/\s+/g, ' ')).toMatch(/defer to local codes, product-safety regulation and licensed practice/);
  });

  it('keeps the table within 120 columns, with long cells numbered below it and the rest wrapped to the width', async () => {
    const r = await run(['screen', '--enumerate', '--fill', '30:100@22', '--spec', 'best.low > 0']);
    const lines = r.out.split('\n');
    expect(Math.max(...lines.map((l) => [...l].length))).toBeLessThanOrEqual(120);
    // The failed Li2O row points to its note below the table, which gives the reason in full.
    expect(r.out).toMatch(/^\s+5\s+Li₂O\s+\[\d+\]$/m);
    expect(r.out).toMatch(/^\[\d+\] line 5: failed: Li₂O reacts with water/m);
    const below = lines.slice(lines.findIndex((l) => l.startsWith('[1]')));
    expect(Math.max(...below.map((l) => [...l].length))).toBeLessThanOrEqual(100);
  });
});

describe('ionheat screen: exit statuses', () => {
  const good = 'formula\nKNO3\nNH4Cl\nNaCl\n';
  it('exits 0 when every row is computed and the spec holds for all', async () => {
    const r = await run(['screen', file('good.csv', good), '--spec', 'best.low > 0']);
    expect(r.status).toBe(0);
    expect(r.err).toBe('screen: 3 rows read, 3 computed, 0 failed, spec held for 3, failed for 0\n');
  });

  it('exits 1 when the spec fails for some row, and says why in the row', async () => {
    const r = await run(['screen', 'good.csv', '--spec', 'best.low > 10', '--format', 'csv']);
    expect(r.status).toBe(1);
    const rows = csvRows(r.out);
    expect(rows.map((x) => x['spec.holds'])).toEqual(['true', 'true', 'false']);
    expect(rows[2]!['spec.reason']).toMatch(/^best.low is 3\.48\d*, not > 10$/);
  });

  it('exits 2 for unusable arguments, with one line on stderr and no stack trace', async () => {
    const cases: [string[], RegExp][] = [
      [['screen'], /missing the candidate file/],
      [['screen', 'good.csv', '--enumerate'], /either a candidate file or --enumerate/],
      [['screen', 'good.csv', '--format', 'xml'], /--format must be one of table, csv, json, md/],
      [['screen', 'good.csv', '--objective', 'speed'], /--objective must be one of/],
      [['screen', 'good.csv', '--direction', 'up'], /--direction must be cool or heat/],
      [['screen', 'good.csv', '--spec', 'best.high <'], /spec, column 12: the expression ends where a value was expected/],
      [['screen', 'good.csv', '--spec', 'best.hihg < 0'], /did you mean "high"/],
      [['screen', 'good.csv', '--spec', 'fill.finalTemperature.high < 5'], /no standard fill was given/],
      [['screen', 'good.csv', '--fill', '40:80'], /write a fill as <salt-g>:<water-g>@<start-°C>/],
      [['screen', 'good.csv', '--fill', '40:80@120'], /start temperature/],
      [['screen', 'good.csv', '--objective', 'fill-temperature'], /needs a standard fill/],
      [['screen', 'good.csv', '--colour'], /unknown option --colour/],
      [['screen', 'absent.csv'], /cannot read the candidate file "absent.csv": ENOENT/],
      [['screen', 'good.txt2'], /a candidate list is a .csv or .json file/],
      [['screen', file('badhead.csv', 'formula,price\nKCl,1\n')], /unknown column "price"/],
      [['screen', file('nohead.csv', 'note\nx\n')], /no "formula" column/],
      [['screen', file('twice.csv', 'formula,formula\nKCl,KCl\n')], /named twice/],
      [['screen', file('bad.json', '{"formula": "KCl"}')], /a JSON candidate list is an array/],
      [['screen', file('dup.json', '[{"formula": "KCl", "formula": "NaCl"}]')], /appears twice/],
    ];
    for (const [args, message] of cases) {
      const r = await run(args);
      expect(r.status, args.join(' ')).toBe(2);
      expect(r.err, args.join(' ')).toMatch(message);
      expect(r.err.trim().split('\n'), args.join(' ')).toHaveLength(1);
      expect(r.err).not.toMatch(/\n\s+at /);
    }
  });

  it('a chart that cannot be written: the summary, then the reason, and status 2', async () => {
    const r = await run(['screen', 'good.csv', '--svg', join(dir, 'no', 'such', 'dir', 'x.svg')]);
    expect(r.status).toBe(2);
    const lines = r.err.trim().split('\n');
    expect(lines[0]).toMatch(/^screen: \d+ rows read/);
    expect(lines[1]).toMatch(/^ionheat: cannot write the chart to ".*x\.svg" \(--svg\): ENOENT/);
  });
});

describe('ionheat screen: inputs', () => {
  it('reads JSON rows (objects or formulas), with the line each row starts on', async () => {
    const json = '[\n  {"formula": "KNO3", "pricePerKg": 2},\n  "NH4Cl",\n  {\n    "formula": "NaXy"\n  },\n  42\n]\n';
    const r = await run(['screen', file('list.json', json), '--format', 'csv']);
    const rows = csvRows(r.out);
    expect(rows.map((x) => [x.line, x.status])).toEqual([
      ['2', 'computed'],
      ['3', 'computed'],
      ['4', 'failed'],
      ['7', 'failed'],
    ]);
    expect(rows[3]!['error.message']).toMatch(/a row is a formula or an object/);
  });

  it('reads standard input with -, as CSV or as JSON, streamed or whole', async () => {
    for (const stream of [false, true]) {
      const csv = await run(['screen', '-', '--format', 'csv'], { stdin: 'formula\nKNO3\n\nNaCl\n', stream });
      expect(csvRows(csv.out).map((x) => x.line), `csv, stream ${stream}`).toEqual(['2', '4']);
      const json = await run(['screen', '-', '--format', 'csv'], { stdin: '  ["KNO3", "NaCl"]', stream });
      expect(csvRows(json.out).map((x) => x.formula), `json, stream ${stream}`).toEqual(['KNO3', 'NaCl']);
    }
  });

  it('screens every charge-balanced salt of the built-in ions with --enumerate', async () => {
    const r = await run(['screen', '--enumerate', '--format', 'csv']);
    const rows = csvRows(r.out);
    expect(rows.length).toBe(36 * 35);
    expect(rows.map((x) => x.line)).toEqual(rows.map((_, i) => String(i + 1)));
    expect(r.err).toMatch(/^screen: 1260 rows read, \d+ computed, \d+ failed\n$/);
  });

  it('puts each row through a standard fill with --fill, ranked by the temperature reached', async () => {
    const r = await run(['screen', file('fill.csv', 'formula\nKNO3\nNaCl\n'), '--fill', '10:100@20', '--spec', 'fill.finalTemperature.high <= 15', '--format', 'csv']);
    expect(r.status).toBe(1);
    const rows = csvRows(r.out);
    // Hand check as in the pack model: 10 g KNO3 in 100 g water from 20 °C ends near 11.9 °C.
    expect(Number(rows[0]!['fill.finalTemperature.value'])).toBeCloseTo(11.51, 1); // tests/pack/handFills.test.ts
    expect(rows[0]!['objective.unit']).toBe('°C');
    expect(rows.map((x) => x['spec.holds'])).toEqual(['true', 'false']);
  });
});

describe('ionheat screen: JSON output and the shipped JSON Schema', () => {
  const shipped = JSON.parse(readFileSync(join(import.meta.dirname, '..', '..', '..', 'docs', 'schema', 'screen-output.schema.json'), 'utf8'));
  const ajv = new Ajv2020({ allErrors: true, strict: false });
  const validate = ajv.compile(shipped);

  it('the shipped schema is the one the zod schemas generate (run npm run schema after changing them)', () => {
    expect(shipped).toEqual(JSON.parse(JSON.stringify(screenOutputJsonSchema())));
  });

  it('the package ships the schema file: the build copies it into dist/, which the package holds', () => {
    const root = join(import.meta.dirname, '..', '..', '..');
    const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
    expect(pkg.tsup.publicDir).toBe('docs/schema');
    expect(pkg.files).toContain('dist');
    expect(pkg.exports['./screen-output.schema.json']).toBe('./dist/screen-output.schema.json');
    // npm test builds first, so the copy is there and current.
    expect(JSON.parse(readFileSync(join(root, 'dist', 'screen-output.schema.json'), 'utf8'))).toEqual(shipped);
  });

  it('--format json output validates against it: good rows, failed rows, a fill and a spec', async () => {
    for (const args of [
      ['screen', 'mixed.csv', '--format', 'json'],
      ['screen', file('fill2.csv', 'formula,pricePerKg,measuredEnthalpy,solubility\nKNO3,2,,\nNaCl,,,\nCaCl2,,,\nKCl,1,17.5,30\n'), '--fill', '40:80@22', '--spec', 'fill.finalTemperature.high < 10', '--format', 'json'],
      ['screen', 'good.csv', '--direction', 'heat', '--objective', 'cost-per-kj', '--format', 'json'],
    ]) {
      const r = await run(args);
      const document = JSON.parse(r.out);
      const ok = validate(document);
      expect(ok, JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
      expect(document.rows.length).toBe(document.summary.read);
    }
  });

  it('carries what the CSV carries, and a summary that counts every row', async () => {
    const r = await run(['screen', 'mixed.csv', '--format', 'json']);
    const document = JSON.parse(r.out);
    expect(document.version).toBe(1);
    expect(document.settings).toEqual({ objective: 'enthalpy', direction: 'cool', fill: null, spec: null, excludeMeasured: false, specThresholds: [] });
    expect(document.rows.map((x: { line: number }) => x.line)).toEqual([2, 3, 4, 6, 7, 9, 10, 11]);
    expect(document.summary).toEqual({ read: 8, computed: 4, failed: 4, excluded: 0, blankLines: 2, specHeld: 0, specFailed: 0 });
    expect(document.rows[1].error.code).toBe('UNKNOWN_ELEMENT');
  });

  it('is byte-identical from run to run', async () => {
    const a = await run(['screen', 'mixed.csv', '--format', 'json']);
    const b = await run(['screen', 'mixed.csv', '--format', 'json']);
    expect(a.out).toBe(b.out);
  });
});

describe('ionheat screen: chart and progress', () => {
  it('writes the ranked interval chart with --svg', async () => {
    for (const format of ['table', 'csv']) {
      const target = join(dir, `chart-${format}.svg`);
      const r = await run(['screen', 'mixed.csv', '--format', format, '--svg', target]);
      expect(r.status).toBe(2);
      expect(existsSync(target)).toBe(true);
      const svg = readFileSync(target, 'utf8');
      expect(svg.startsWith('<svg')).toBe(true);
      expect(svg).toContain('KNO₃');
      expect(svg).toContain('4 could not be computed');
    }
  });

  it('draws a progress bar on stderr only when stderr is a terminal', async () => {
    const lines = ['formula', ...Array.from({ length: 30_000 }, (_, i) => ['KNO3', 'NaCl', 'NH4Cl'][i % 3])].join('\n');
    file('long.csv', lines);
    const quiet = await run(['screen', 'long.csv', '--format', 'csv']);
    expect(quiet.err).toBe('screen: 30000 rows read, 30000 computed, 0 failed\n');
    const tty = await run(['screen', 'long.csv', '--format', 'csv'], { tty: true });
    expect(tty.err.endsWith('screen: 30000 rows read, 30000 computed, 0 failed\n')).toBe(true);
    // Whatever was drawn is cleared again before the summary; CSV output is untouched either way.
    expect(tty.out).toBe(quiet.out);
  });
});
