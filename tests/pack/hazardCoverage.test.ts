// Issue 12 item 7 (hazards) and issue 15 item 4 (hazards): every ion the enumeration can produce has a hazards
// record naming its source; "no hazard data" is said as such, never shown as an empty list that reads "no hazard".
// Classes follow the EU harmonised classification (CLP Annex VI, source key clpAnnexVI) where it has an entry, the RAC
// opinion on lithium salts (echaRacLithium2021), or typical supplier safety data sheets (supplierSds); records say
// fromMemory where the classification was not checked against a copy.
import { describe, expect, it } from 'vitest';
import { builtinDataset, createScreener, Dataset, enumerate, hazardCoverage, hazardSummary, parseSalt, tableSchemas, type TableName } from '../../src/index.js';
import { textTableOf } from '../../src/node/table/screenWriters.js';
import hazardsFile from '../../data/hazards.json';

const data = builtinDataset();
const records = data.records('hazards.json');

describe('the hazards table covers the enumeration', () => {
  const ions = new Set(enumerate().flatMap((s) => s.ions.map((i) => i.ion)));
  it('every ion the enumeration uses has a record, with a known source', () => {
    const subjects = new Set(records.map((r) => r.subject));
    expect([...ions].filter((id) => !subjects.has(id))).toEqual([]);
    for (const r of records) expect(data.source(r.source), `${r.subject}: source ${r.source}`).toBeDefined();
  });
  it('so no enumerated salt is left without hazard data', () => {
    expect(enumerate().filter((s) => hazardCoverage(s).status === 'no hazard data').map((s) => s.formula)).toEqual([]);
  });
  it('a record checked against a copy says which, in its note', () => {
    // The table file itself: the running library carries the records without their notes.
    for (const r of (hazardsFile.records as { subject: string; fromMemory: boolean; note?: string }[]).filter((x) => !x.fromMemory)) expect(r.note ?? '', r.subject).toMatch(/[Cc]hecked against/);
  });
  it.each([
    ['BeSO4', 'carcinogen'],
    ['BaCl2', 'toxic'],
    ['PbCl2', 'toxic'],
    ['CdSO4', 'carcinogen'],
    ['HgCl2', 'toxic'],
    ['K2CrO4', 'carcinogen'],
    ['NiSO4', 'carcinogen'],
    ['CoCl2', 'carcinogen'],
    ['LiBr', 'harmful'],
    ['Na2Se', 'toxic'],
    ['N(CH3)4Cl', 'toxic'],
  ])('%s is classified %s', (formula, hazard) => {
    const h = hazardSummary(parseSalt(formula));
    expect(h.data).toBe('classified');
    expect(h.classes).toContain(hazard);
  });
  it('lithium salts cite the RAC opinion (reproductive toxicity), checked against its public summaries', () => {
    const li = records.find((r) => r.subject === 'Li[+]')!;
    expect(li.source).toBe('echaRacLithium2021');
    expect(li.fromMemory).toBe(false);
    expect(hazardSummary(parseSalt('LiBr')).statements.join(' ')).toMatch(/unborn child/);
  });
});

describe('"not classified" and "no hazard data" are told apart', () => {
  it('NaCl: both ions checked, neither adds a class', () => {
    expect(hazardCoverage('NaCl')).toEqual({ status: 'not classified', missingIons: [] });
    expect(hazardSummary(parseSalt('NaCl'))).toEqual({ classes: [], statements: [], data: 'not classified' });
  });
  // The same tables without the rubidium record: RbCl then has no hazard data.
  const tables = Object.fromEntries(Object.keys(tableSchemas).map((n) => [n, data.table(n as TableName)]).filter(([, t]) => t !== undefined));
  const hazards = data.table('hazards.json')!;
  const withoutRb = new Dataset({ ...tables, 'hazards.json': { ...hazards, records: hazards.records.filter((r) => r.subject !== 'Rb[+]') } }, data.sources, 'test');
  it('a salt whose ion has no record has "no hazard data", and the statement says it is no sign of safety', () => {
    expect(hazardCoverage('RbCl', withoutRb)).toEqual({ status: 'no hazard data', missingIons: ['Rb[+]'] });
    const h = hazardSummary(parseSalt('RbCl', withoutRb), withoutRb);
    expect(h.data).toBe('no hazard data');
    expect(h.statements[0]).toMatch(/^no hazard data for Rb\[\+\] in the hazards table: this is not a sign of safety/);
  });
  it('the screen row carries hazardData, and the table prints "no hazard data" or "none classified", never a blank', () => {
    const screener = createScreener({}, withoutRb);
    const rows = [screener.row('RbCl', 1), screener.row('NaCl', 2), screener.row('KNO3', 3)];
    expect(rows.map((r) => r.hazardData)).toEqual(['no hazard data', 'not classified', 'classified']);
    const text = textTableOf(rows, screener.settings);
    expect(text).toMatch(/RbCl.*no hazard data/);
    expect(text).toMatch(/NaCl.*none classified/);
  });
});
