// Issue 12 item 6 and issue 13 item 6: a user's own data. An inHouse source kind; every problem of a file reported
// at once; plausible ranges by quantity that catch unit slips (a Shannon radius of 7–10 Å is refused naming file,
// record and field); built-in source keys protected; conflicts between override files reported; a measured value
// that disagrees with the other bases flagged; text output that says "your value".
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { dissolve, isIonheatError } from '../../src/index.js';
import { applyOverrideDocument, loadDataset } from '../../src/node/index.js';
import { runCliInMemory } from './runCliInMemory.js';

const lab = { myLab: { citation: 'Our calorimeter (a test source, not data)', kind: 'inHouse' } };
const kno3 = (value: number, uncertainty = 0.3) => ({ formula: 'KNO3', value, unit: 'kJ/mol', uncertainty, source: 'myLab', fromMemory: false });
const radius = (value: number) => ({ ion: 'Na[+]', coordination: 6, value, unit: 'Å', uncertainty: 0.01, source: 'myLab', fromMemory: false });

function loadError(document: unknown, label = 'mine.json'): { message: string; field: string | undefined } {
  try {
    applyOverrideDocument(document, label);
  } catch (e) {
    if (isIonheatError(e)) {
      expect(e.code).toBe('INVALID_DATA');
      return { message: e.message, field: e.field };
    }
    throw e;
  }
  throw new Error('the document was accepted');
}

const dir = mkdtempSync(join(tmpdir(), 'ionheat-own-'));
const file = (name: string, document: unknown) => {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify(document));
  return path;
};

describe('an inHouse source and "your value"', () => {
  const mine = applyOverrideDocument({ sources: lab, tables: { 'solution-enthalpies': [kno3(34.7)] } }, 'mine.json');
  it('accepts the inHouse kind and records which file gave the source', () => {
    expect(mine.source('myLab')?.kind).toBe('inHouse');
    expect(mine.userSource('myLab')).toBe('mine.json');
    expect(mine.userSource('crcSolution')).toBeUndefined();
  });
  it('dissolve and pack say "your value" in text output', async () => {
    const path = file('mine.json', { sources: lab, tables: { 'solution-enthalpies': [kno3(34.7)] } });
    const d = await runCliInMemory(['dissolve', 'KNO3', '--data', path]);
    expect(d.out.replace(/\n\s+/g, ' ')).toContain('(measured, your value: myLab in mine.json)'); // text wraps at 100 columns
    expect(d.out).toMatch(/measured \(your value\)\s+table/);
    const p = await runCliInMemory(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--data', path]);
    // The pack shows the integral enthalpy at the fill's molality, beside the infinite-dilution value (your 34.70 at
    // 25 °C, corrected to the 20 °C start) marked as yours.
    expect(p.out).toMatch(/\(∞: 3\d\.\d\d, your value\)/);
  });
});

describe('every problem of a file at once', () => {
  it('lists the schema, range and source problems of one file in one error', () => {
    const e = loadError({
      sources: { ...lab, crcSolution: { citation: 'mine', kind: 'inHouse' } },
      tables: { 'solution-enthalpies': [{ ...kno3(34.7), value: '34.7' }, { ...kno3(20), formula: 'NaCl', source: 'myLap' }], 'shannon-radii': [radius(102)] },
    });
    expect(e.message).toMatch(/^mine\.json: 4 problems: \(1\) /);
    expect(e.message).toContain('shannon-radii.json record 1 (Na[+]), field "value": 102 Å is outside the plausible range of a Shannon ionic radius');
    expect(e.message).toContain('source key "crcSolution" is a built-in source');
    expect(e.message).toContain('solution-enthalpies.json record 1 (KNO3), field "value"');
    expect(e.message).toContain('record 2 (NaCl) cites source "myLap", which is neither built in nor given with the overrides (did you mean "myLab"?)');
  });
  it('lists every unknown top-level key with the nearest valid one', () => {
    const e = loadError({ source: lab, table: {} });
    expect(e.message).toContain('unknown key "source" (did you mean "sources"?)');
  });
});

describe('plausible ranges by quantity', () => {
  it.each([7, 8.5, 10])('a Shannon radius of %s Å is refused naming file, record and field', (value) => {
    const e = loadError({ sources: lab, tables: { 'shannon-radii': [radius(value)] } }, 'radii.json');
    expect(e.message).toBe(`radii.json: shannon-radii.json record 1 (Na[+]), field "value": ${value} Å is outside the plausible range of a Shannon ionic radius, 0.05 to 3 Å; check the unit (a diameter, or a radius in another unit?)`);
    expect(e.field).toBe('shannon-radii.json[0].value');
  });
  it('a radius inside the range is used (Shannon 1976: Na+ in sixfold coordination is 1.02 Å)', () => {
    const mine = applyOverrideDocument({ sources: lab, tables: { 'shannon-radii': [radius(1.02)] } }, 'radii.json');
    expect(Number.isFinite(dissolve('NaCl', {}, mine).best.value)).toBe(true);
  });
  it('an enthalpy of solution of 1999 kJ/mol is refused as a likely unit slip', () => {
    expect(loadError({ sources: lab, tables: { 'solution-enthalpies': [kno3(1999)] } }).message).toContain('1999 kJ/mol is outside the plausible range of an enthalpy of solution, -600 to 600 kJ/mol; check the unit');
  });
});

describe('conflicts between override files', () => {
  it('a value two files give differently is refused, naming both files', () => {
    const a = file('a.json', { sources: lab, tables: { 'solution-enthalpies': [kno3(34.7)] } });
    const b = file('b.json', { sources: lab, tables: { 'solution-enthalpies': [kno3(35.2)] } });
    expect(() => loadDataset([a, b])).toThrow(/^b\.json: solution-enthalpies\.json record 1 \(KNO3\) is also given by a\.json, with other values/);
  });
  it('the same source key with another citation in a later file is refused', () => {
    const a = file('a2.json', { sources: lab, tables: {} });
    const b = file('b2.json', { sources: { myLab: { citation: 'another lab', kind: 'inHouse' } }, tables: {} });
    expect(() => loadDataset([a, b])).toThrow(/source key "myLab" is already defined by a2\.json with another citation/);
  });
  it('files that agree, or add different records, merge', () => {
    const a = file('a3.json', { sources: lab, tables: { 'solution-enthalpies': [kno3(34.7)] } });
    const b = file('b3.json', { sources: lab, tables: { 'solution-enthalpies': [kno3(34.7), { ...kno3(3.9), formula: 'NaCl' }] } });
    const data = loadDataset([a, b]);
    expect(dissolve('NaCl', {}, data).best.value).toBe(3.9);
  });
});

describe('a measured value that disagrees with the other bases', () => {
  // KNO3: the CRC measured value is 34.89 kJ/mol (crcSolution); the cycle basis from Wagman et al. (1982) agrees within
  // about 1 kJ/mol. A value of 60 ± 0.5 kJ/mol lies some 20 combined standard uncertainties away.
  it('is flagged in the result, naming the file and the other basis', () => {
    const mine = applyOverrideDocument({ sources: lab, tables: { 'solution-enthalpies': [kno3(60, 0.5)] } }, 'mine.json');
    const r = dissolve('KNO3', {}, mine);
    expect(r.best.value).toBe(60);
    const note = r.notes.find((n) => n.startsWith('your value 60 ± 0.5 kJ/mol (mine.json) disagrees with the cycle estimate'));
    expect(note).toBeDefined();
  });
  it('is not flagged when it agrees within the combined uncertainty', () => {
    const mine = applyOverrideDocument({ sources: lab, tables: { 'solution-enthalpies': [kno3(34.7)] } }, 'mine.json');
    expect(dissolve('KNO3', {}, mine).notes.some((n) => n.includes('disagrees'))).toBe(false);
  });
});
