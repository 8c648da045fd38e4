import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/recordCheck.js';
import { IonheatError } from '../../src/error.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { measuredSolutionEnthalpy } from '../../src/solution/measuredSolution.js';

const mine = {
  formula: 'KNO3',
  value: 34.5,
  unit: 'kJ/mol',
  uncertainty: 0.3,
  source: 'myLab',
  fromMemory: false,
};
const myLab = { myLab: { citation: 'Our own calorimeter, run 12 (test fixture)', kind: 'derived' as const } };

function codeOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    if (e instanceof IonheatError) return `${e.code}: ${e.message}`;
    throw e;
  }
  return 'OK';
}

describe('Dataset.withOverrides', () => {
  it('merges a user record over the built-in one and leaves the built-in tables untouched', () => {
    const base = builtinDataset();
    const before = JSON.stringify(base.records('solution-enthalpies.json'));
    const a = base.withOverrides({ 'solution-enthalpies.json': [mine] }, 'a.json', myLab);
    const b = base.withOverrides({ 'solution-enthalpies.json': [{ ...mine, value: 36 }] }, 'b.json', myLab);
    // Two datasets side by side: each sees its own value, the base sees the CRC's (34.89, crcSolution).
    expect(measuredSolutionEnthalpy(parseSalt('KNO3', a), a)!.value).toBe(34.5);
    expect(measuredSolutionEnthalpy(parseSalt('KNO3', b), b)!.value).toBe(36);
    expect(measuredSolutionEnthalpy(parseSalt('KNO3'))!.value).toBe(34.89);
    expect(JSON.stringify(base.records('solution-enthalpies.json'))).toBe(before);
    expect(a.records('solution-enthalpies.json').length).toBe(base.records('solution-enthalpies.json').length);
    expect(a.label).toBe('built-in + a.json');
  });

  it('adds records with new keys', () => {
    const extra = { ...mine, formula: 'RbNO2' };
    const d = builtinDataset().withOverrides({ 'solution-enthalpies.json': [extra] }, 'x.json', myLab);
    expect(d.records('solution-enthalpies.json').length).toBe(builtinDataset().records('solution-enthalpies.json').length + 1);
  });

  it('freezes the built-in records so no caller can change them in place', () => {
    const record = builtinDataset().records('solution-enthalpies.json')[0]!;
    expect(() => {
      (record as { value: number }).value = 0;
    }).toThrow(TypeError);
  });

  it.each([
    [{ 'solution-enthalpies.json': [{ ...mine, value: 'hot' }] }, /x\.json: solution-enthalpies\.json record 1 \(KNO3\), field "value"/],
    [{ 'solution-enthalpies.json': [{ ...mine, unit: 'kcal/mol' }] }, /field "unit"/],
    [{ 'solution-enthalpies.json': [{ ...mine, extra: 1 }] }, /Unrecognized key/],
    [{ 'solution-enthalpies.json': [mine, mine] }, /record 2 \(KNO3\) repeats the key "KNO3"/],
    [{ 'solution-enthalpies.json': [{ ...mine, source: 'nowhere' }] }, /cites source "nowhere"/],
    [{ 'no-such-table.json': [] }, /"no-such-table\.json" is not a table/],
    [{ 'solution-enthalpies.json': {} }, /must be a list of records/],
  ])('rejects bad records with a message naming file, record and field (%#)', (overrides, message) => {
    const result = codeOf(() => builtinDataset().withOverrides(overrides as never, 'x.json', myLab));
    expect(result).toMatch(/^INVALID_DATA: /);
    expect(result).toMatch(message);
  });

  it('uses the table default where a record gives a null uncertainty', () => {
    const d = builtinDataset();
    const table = d.table('ion-formation-aq.json')!;
    const r = d.records('ion-formation-aq.json').find((x) => x.uncertainty === null)!;
    expect(d.uncertaintyOf('ion-formation-aq.json', r)).toBe(table.defaultUncertainty);
  });
});
