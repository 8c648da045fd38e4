/**
 * A user's own data files under hostile content (issue 7): override tables
 * read by loadDataset (`--data`) and candidate lists read by `screen`. Each
 * bad file is refused with a message naming the file, the record and the
 * field; loading one never changes the built-in tables or another caller's
 * dataset; in a candidate list a bad row is reported in its own output row
 * and the rest of the batch is computed.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { builtinDataset, dissolve, isIonheatError, type Dataset } from '../../src/index.js';
import { loadDataset } from '../../src/node/loadDataset.js';
import { implausibleOverrides } from '../../src/node/plausibleOverrides.js';
import { tableSchemas, type TableName } from '../../src/data/schemas.js';
import { runInProcess } from './cliHarness.js';

const dir = mkdtempSync(join(tmpdir(), 'ionheat-datafiles-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

/** The IonheatError from loading `text` as an override file named `name`. */
function loadError(name: string, text: string): { code: string; message: string } {
  try {
    loadDataset([file(name, text)]);
  } catch (e) {
    if (isIonheatError(e)) return { code: e.code, message: e.message };
    throw e;
  }
  throw new Error(`${name} was accepted`);
}

const doc = (tables: Record<string, unknown[]>, sources: Record<string, unknown> = {}) => JSON.stringify({ sources, tables });
const mySource = { myLab: { citation: 'Invented test value for the hardening tests', kind: 'derived' } };
const radius = (value: number) => ({ ion: 'Na[+]', coordination: 6, value, unit: 'Å', uncertainty: 0.01, source: 'myLab', fromMemory: false });
const solution = (value: number, extra: Record<string, unknown> = {}) => ({ formula: 'KNO3', value, unit: 'kJ/mol', uncertainty: 0.2, source: 'myLab', fromMemory: false, ...extra });

describe('override files: each bad one is refused, naming the file, the record and the field', () => {
  it.each([
    ['not JSON', 'notjson.json', '{"tables": ', /^notjson\.json: not valid JSON/],
    ['a key twice in one object', 'twice.json', '{"tables": {"solution-enthalpies": []},\n "tables": {}}', /^twice\.json, line 2: the key "tables" appears twice in one object/],
    ['a key twice inside a record', 'twice-record.json', doc({ 'solution-enthalpies': [] }).replace('[]', '[{"formula": "KNO3", "value": 1, "value": 2}]'), /^twice-record\.json, line 1: the key "value" appears twice/],
    ['a __proto__ key', 'proto.json', '{"tables": {"solution-enthalpies": [{"__proto__": {"value": 1}}]}}', /^proto\.json, line 1: the key "__proto__" is not allowed/],
    ['a constructor key', 'ctor.json', '{"constructor": {}, "tables": {}}', /^ctor\.json, line 1: the key "constructor" is not allowed/],
    ['a prototype key', 'prototype.json', '{"tables": {"prototype": []}}', /^prototype\.json, line 1: the key "prototype" is not allowed/],
    ['a table that is not a list', 'notlist.json', '{"tables": {"solution-enthalpies": {}}}', /^notlist\.json: tables\.solution-enthalpies: /],
    ['an unknown table', 'unknown.json', doc({ 'my-table': [] }), /^unknown\.json: "my-table\.json" is not a table ionheat knows/],
    ['a value of the wrong type', 'type.json', doc({ 'solution-enthalpies': [solution(34.9), { ...solution(1), value: 'hot' }] }, mySource), /^type\.json: solution-enthalpies\.json record 2 \(KNO3\), field "value"/],
    ['a unit other than the table\'s', 'unit.json', doc({ 'shannon-radii': [{ ...radius(1.02), unit: 'm' }] }, mySource), /^unit\.json: shannon-radii\.json record 1 \(Na\[\+\]\), field "unit"/],
    ['a radius in metres', 'metres.json', doc({ 'shannon-radii': [radius(1.02e-10)] }, mySource), /^metres\.json: shannon-radii\.json record 1 \(Na\[\+\]\), field "value": 1\.02e-10 Å is outside the plausible range of a Shannon ionic radius, 0\.05 to 3 Å; check the unit/],
    ['an enthalpy of 1e9 kJ/mol', 'joules.json', doc({ 'solution-enthalpies': [solution(34.9), { ...solution(1e9), formula: 'NaCl' }] }, mySource), /^joules\.json: solution-enthalpies\.json record 2 \(NaCl\), field "value": 1000000000 kJ\/mol is outside the plausible range/],
    ['an uncertainty of 1e9 kJ/mol', 'wide.json', doc({ 'solution-enthalpies': [solution(34.9, { uncertainty: 1e9 })] }, mySource), /^wide\.json: solution-enthalpies\.json record 1 \(KNO3\), field "uncertainty"/],
    ['a negative molar mass', 'mass.json', doc({ elements: [{ symbol: 'Na', z: 11, name: 'sodium', value: -22.99, unit: 'g/mol', uncertainty: null, source: 'myLab', fromMemory: false }] }, mySource), /^mass\.json: (2 problems: \(1\) )?elements\.json record 1( \(Na\))?, field "value": (must be greater than zero|-22\.99 g\/mol is outside the plausible range)/],
    ['a molar mass in kg/mol', 'kg.json', doc({ elements: [{ symbol: 'Na', z: 11, name: 'sodium', value: 0.02299, unit: 'g/mol', uncertainty: null, source: 'myLab', fromMemory: false }] }, mySource), /^kg\.json: elements\.json record 1 \(Na\), field "value": 0\.02299 g\/mol is outside the plausible range/],
    ['an unknown source key', 'source.json', doc({ 'solution-enthalpies': [solution(34.9, { source: 'nowhere' })] }), /^source\.json: .*nowhere/],
    ['a key repeated across records', 'repeat.json', doc({ 'solution-enthalpies': [solution(34.9), solution(35)] }, mySource), /^repeat\.json: solution-enthalpies\.json record 2 \(KNO3\) repeats the key/],
  ])('%s', (_, name, text, message) => {
    const e = loadError(name, text);
    expect(e.code).toBe('INVALID_DATA');
    expect(e.message).toMatch(message);
  });

  it('a file that cannot be read is named, with the reason', () => {
    expect(() => loadDataset([join(dir, 'no-such-file.json')])).toThrow(/cannot read data file ".*no-such-file\.json": ENOENT/);
    expect(() => loadDataset([dir])).toThrow(/cannot read data file ".*": it is a directory, not a file/);
  });

  it('the built-in tables themselves lie within the plausible ranges', () => {
    const base = builtinDataset();
    const tables: Record<string, unknown[]> = {};
    for (const name of Object.keys(tableSchemas) as TableName[]) tables[name] = [...base.records(name)];
    expect(implausibleOverrides(tables)).toEqual([]);
    expect(Object.keys(tables).length).toBeGreaterThan(15);
  });

  it('a refused file leaves nothing polluted: no prototype gained a property', () => {
    loadError('proto2.json', '{"tables": {"solution-enthalpies": [{"__proto__": {"polluted": true}}]}}');
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.prototype.hasOwnProperty.call(Object.prototype, 'polluted')).toBe(false);
  });
});

describe('datasets side by side: loading overrides changes neither the built-in tables nor another dataset', () => {
  it('two override files loaded into two datasets; builtinDataset() and each other unchanged', () => {
    const builtinBefore = JSON.stringify(builtinDataset().records('solution-enthalpies.json'));
    // Built-in KNO3: 34.89 kJ/mol (solution-enthalpies.json; CRC Handbook, enthalpy of solution at infinite dilution).
    const builtinKno3 = dissolve('KNO3', {}, builtinDataset()).best.value;
    const a: Dataset = loadDataset([file('a.json', doc({ 'solution-enthalpies': [solution(30.0)] }, mySource))]);
    const b: Dataset = loadDataset([file('b.json', doc({ 'solution-enthalpies': [solution(40.0)] }, mySource))]);
    // Invented override values: each dataset answers with its own.
    expect(dissolve('KNO3', {}, a).best.value).toBe(30);
    expect(dissolve('KNO3', {}, b).best.value).toBe(40);
    expect(dissolve('KNO3', {}, builtinDataset()).best.value).toBe(builtinKno3);
    expect(JSON.stringify(builtinDataset().records('solution-enthalpies.json'))).toBe(builtinBefore);
    expect(a.label).toBe('built-in + a.json');
    expect(b.label).toBe('built-in + b.json');
    // A failed load after them changes neither.
    loadError('c.json', doc({ 'solution-enthalpies': [solution(1e9)] }, mySource));
    expect(dissolve('KNO3', {}, a).best.value).toBe(30);
    expect(dissolve('KNO3', {}, b).best.value).toBe(40);
    // The records handed out are frozen: a caller cannot edit the tables through them.
    const record = builtinDataset().records('solution-enthalpies.json')[0]!;
    expect(Object.isFrozen(record)).toBe(true);
  });

  it('on the command line, --data in one run leaves the next run on the built-in tables', async () => {
    const data = file('cli.json', doc({ 'solution-enthalpies': [solution(30.0)] }, mySource));
    const withData = await runInProcess(['dissolve', 'KNO3', '--json', '--data', data], dir);
    const without = await runInProcess(['dissolve', 'KNO3', '--json'], dir);
    expect(JSON.parse(withData.out).best.value).toBe(30);
    expect(JSON.parse(without.out).best.value).toBe(dissolve('KNO3').best.value);
  });
});

describe('candidate lists mixing good and bad rows: each bad row is reported in its own row, the rest computed', () => {
  const csv = [
    'formula,measuredEnthalpy,measuredUncertainty,solubility,pricePerKg',
    'NaCl,,,,',
    'KNO3,1e9,,,',
    'KCl,17.2,-1,,',
    'NH4NO3,,,-5,',
    'NaNO3,,,,-3',
    'NaXy,,,,',
    'KBr,abc,,,',
    'CaCl2,5,1e9,,',
    'NH4Cl,,,,',
  ].join('\n');
  const expected: [number, string, RegExp | null][] = [
    [2, 'NaCl', null],
    [3, 'KNO3', /measuredEnthalpy: must lie between -2000 and 2000 kJ\/mol/],
    [4, 'KCl', /measuredUncertainty: must not be negative/],
    [5, 'NH4NO3', /solubility: must be greater than zero/],
    [6, 'NaNO3', /pricePerKg: must not be negative/],
    [7, 'NaXy', /"Xy" at position 3 is not a chemical element/],
    [8, 'KBr', /measuredEnthalpy: "abc" is not a number/],
    [9, 'CaCl2', /measuredUncertainty: must be at most 1000 kJ\/mol/],
    [10, 'NH4Cl', null],
  ];

  function checkRows(rows: { line: number; status: string; input: { formula: string }; error?: { message: string } }[]): void {
    expect(rows.map((r) => [r.line, r.input.formula])).toEqual(expected.map(([line, formula]) => [line, formula]));
    for (const [i, [, , message]] of expected.entries()) {
      if (message === null) expect(rows[i]!.status).toBe('computed');
      else {
        expect(rows[i]!.status).toBe('failed');
        expect(rows[i]!.error!.message).toMatch(message);
      }
    }
  }

  it('CSV: one row out per row in, errors in their rows, exit 2 with the counts', async () => {
    file('mixed.csv', csv);
    const r = await runInProcess(['screen', 'mixed.csv', '--format', 'json'], dir);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/^screen: 9 rows read, 2 computed, 7 failed/);
    checkRows(JSON.parse(r.out).rows);
  });

  it('JSON: the same rows as objects give the same outcome', async () => {
    const header = csv.split('\n')[0]!.split(',');
    const objects = csv.split('\n').slice(1).map((line) => {
      const cells = line.split(',');
      const o: Record<string, unknown> = {};
      header.forEach((h, i) => {
        const c = cells[i]!;
        if (c !== '') o[h] = h === 'formula' || Number.isNaN(Number(c)) ? c : Number(c);
      });
      return o;
    });
    // Line numbers of a JSON list are those of each element's opening brace: one element a line.
    file('mixed.json', `[\n${objects.map((o) => JSON.stringify(o)).join(',\n')}\n]\n`);
    const r = await runInProcess(['screen', 'mixed.json', '--format', 'json'], dir);
    expect(r.status).toBe(2);
    const rows = JSON.parse(r.out).rows;
    expect(rows.filter((x: { status: string }) => x.status === 'computed').map((x: { input: { formula: string } }) => x.input.formula)).toEqual(['NaCl', 'NH4Cl']);
    expect(rows).toHaveLength(9);
  });

  it('a candidate list with a repeated key or a __proto__ key in a row: that row is reported, the rest computed', async () => {
    file('keys.json', '[\n{"formula": "NaCl"},\n{"formula": "KCl", "formula": "KBr"},\n{"formula": "KNO3", "__proto__": {}},\n{"formula": "NH4Cl"}\n]\n');
    const r = await runInProcess(['screen', 'keys.json', '--format', 'json'], dir);
    const out = r.out.trim().startsWith('{') ? JSON.parse(r.out) : undefined;
    // Either the file is refused as a whole, naming it and the key, or the two rows fail on their own.
    if (out === undefined) expect(r.err).toMatch(/^ionheat: keys\.json, line \d: the key "(formula|__proto__)"/);
    else expect(out.rows.map((x: { status: string }) => x.status)).toEqual(['computed', 'failed', 'failed', 'computed']);
    expect(r.status).toBe(2);
  });
});
