// Every data record that has a counterpart in an open reference copy under
// tests/reference/ is compared with it, family by family, at the tolerance each
// family justifies (the `why` of FAMILIES in src/node/scripts/reference/crossCheck.ts).
// A record outside its tolerance passes only when its note says
// "differs from <reference>" and why; tolerances are never widened to pass.
// The copies are made by src/node/scripts/reference/extract_reference.py (run by
// hand; CI reads only the JSON).
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FAMILIES, checkedAgainstText, checkedObject, crossChecks, loadInputs, type Check } from '../../src/node/scripts/reference/crossCheck.js';

const root = join(import.meta.dirname, '..', '..');
const { tables, refs } = loadInputs(root);
const checks = crossChecks(tables, refs);
const byFamily = (name: string): Check[] => checks.filter((c) => c.family === name);
const describeCheck = (c: Check) => `${c.table} ${c.subject}: ours ${c.ours}, ${c.reference} ${c.ref} ± ${c.tolerance.toFixed(3)} (${c.refLabel})`;

describe('reference copies under tests/reference', () => {
  const files = readdirSync(join(root, 'tests', 'reference')).filter((f) => f.endsWith('.json') && /^(chemicals|pymatgen|phreeqc)-/.test(f));

  it.each(files)('%s names its package, version, licence and file, and holds only numbers and identifiers', (file) => {
    const ref = JSON.parse(readFileSync(join(root, 'tests', 'reference', file), 'utf8'));
    for (const key of ['package', 'version', 'licence', 'file']) expect(typeof ref[key] === 'string' && ref[key].length > 0, `${file}: ${key}`).toBe(true);
    expect(ref.records.length).toBeGreaterThan(0);
    // No copied prose: every string in a record is an identifier (a CAS number, a formula, a short label, a reaction equation).
    const long: string[] = [];
    for (const record of ref.records) for (const value of Object.values(record)) if (typeof value === 'string' && value.length > 200) long.push(value);
    expect(long).toEqual([]);
  });

  it('every family reads a reference file that exists, and every reference file is read', () => {
    const read = new Set(Object.keys(refs));
    for (const file of files) expect(read.has(file.replace(/\.json$/, '')), file).toBe(true);
  });
});

describe.each(Object.values(FAMILIES))('$name: $table against $reference', (family) => {
  const list = byFamily(family.name);

  it('compares at least one record, with a tolerance stated and justified', () => {
    expect(list.length).toBeGreaterThan(0);
    expect(family.why.length).toBeGreaterThan(40);
  });

  it('every record agrees within the tolerance, or its note says why its source differs', () => {
    expect(list.filter((c) => !c.agree && !c.explained).map(describeCheck)).toEqual([]);
  });

  it('every compared record carries fromMemory: false and checkedAgainst naming this copy', () => {
    const text = checkedAgainstText(family);
    const unmarked = list.filter((c) => {
      const record = checkedObject(tables, c);
      return record.fromMemory !== false || record.checkedAgainst !== text;
    });
    expect(unmarked.map(describeCheck), 'run src/node/scripts/reference/markChecked.ts').toEqual([]);
  });
});

describe('provenance claims', () => {
  it('each record (or nested quantity) is compared by one family at most', () => {
    const seen = new Map<string, string>();
    const twice: string[] = [];
    for (const c of checks) {
      const key = `${c.table}#${c.index}${c.field ? `.${c.field}` : ''}`;
      if (seen.has(key)) twice.push(`${key}: ${seen.get(key)} and ${c.family}`);
      seen.set(key, c.family);
    }
    expect(twice).toEqual([]);
  });

  it('no record (nor nested quantity) claims a reference copy it was not compared with', () => {
    const compared = new Set(checks.map((c) => `${c.table}#${c.index}${c.field ? `.${c.field}` : ''}`));
    const stale: string[] = [];
    const claims = (x: any) => typeof x?.checkedAgainst === 'string' && x.checkedAgainst.startsWith('tests/reference/');
    for (const [table, file] of Object.entries(tables)) {
      file.records.forEach((r: any, i: number) => {
        if (claims(r) && !compared.has(`${table}#${i}`)) stale.push(`${table}#${i}`);
        for (const [field, value] of Object.entries(r)) if (claims(value) && !compared.has(`${table}#${i}.${field}`)) stale.push(`${table}#${i}.${field}`);
      });
    }
    expect(stale).toEqual([]);
  });

  it('a note that explains a difference names a difference that still exists', () => {
    const stale = checks.filter((c) => c.agree && String(checkedObject(tables, c).note ?? '').toLowerCase().includes(`differs from ${c.reference}`));
    expect(stale.map(describeCheck)).toEqual([]);
  });
});

describe('the known problems the comparison found stay fixed', () => {
  const gas = (ion: string) => tables['ion-formation-gas.json'].records.find((r: any) => r.ion === ion);
  const gasCheck = (ion: string) => checks.find((c) => c.table === 'ion-formation-gas.json' && c.subject === ion)!;

  // ATcT 1.112 (chemicals-atct-gas): HCOO− −465.85 kJ/mol on the ion convention → −472.05
  // on the electron convention. The former value used an outdated gas-phase acidity of HCOOH.
  it('HCOO−(g) agrees with ATcT', () => {
    expect(gasCheck('HCOO[-]').agree).toBe(true);
    expect(gas('HCOO[-]').value).toBeCloseTo(-472.0, 1);
  });

  // ATcT 1.112: CN− 67.26 kJ/mol (ion convention) → 61.06 (electron convention).
  it('CN−(g) agrees with ATcT', () => {
    expect(gasCheck('CN[-]').agree).toBe(true);
  });

  // CRC physical constants of inorganic compounds (chemicals-crc-densities): SrCO3 3.785 g/cm³.
  it('densities that were wrong now match the CRC copy', () => {
    const densities = checks.filter((c) => c.family === 'densityCrc' && ['SrCO3', 'KClO3', 'RbCl', 'MnCl2·4H2O'].includes(c.subject));
    expect(densities.length).toBe(4);
    for (const c of densities) expect(c.agree, describeCheck(c)).toBe(true);
  });
});

describe('what no reachable copy can check', () => {
  // src/node/scripts/reference/unreachable.ts: one reason per table that holds records from memory (the report prints it only while it does).
  it('names a reason for every table with records from memory, each naming a table that exists', async () => {
    const { UNREACHABLE } = await import('../../src/node/scripts/reference/unreachable.js');
    const tablesOnDisk = readdirSync(join(root, 'data')).filter((f) => f.endsWith('.json') && f !== 'sources.json');
    const withMemory = tablesOnDisk.filter((f) => JSON.parse(readFileSync(join(root, 'data', f), 'utf8')).records.some((r: any) => r.fromMemory === true));
    expect(withMemory.filter((f) => !(f in UNREACHABLE))).toEqual([]);
    expect(Object.keys(UNREACHABLE).filter((f) => !tablesOnDisk.includes(f))).toEqual([]);
    for (const reason of Object.values(UNREACHABLE)) expect(reason.length).toBeGreaterThan(40);
  });
});

describe('docs/provenance.md', () => {
  // Written by `npm run provenance`; stale when a table gains, loses or re-marks records.
  const report = readFileSync(join(root, 'docs', 'provenance.md'), 'utf8');

  it('counts, per table, the records, the checked ones and those from memory as the tables now hold them', () => {
    const stale: string[] = [];
    for (const file of readdirSync(join(root, 'data')).filter((f) => f.endsWith('.json') && f !== 'sources.json')) {
      const records: any[] = JSON.parse(readFileSync(join(root, 'data', file), 'utf8')).records;
      const checked = records.filter((r) => typeof r.checkedAgainst === 'string').length;
      const memory = records.filter((r) => r.fromMemory === true).length;
      const row = report.split('\n').find((line) => line.startsWith(`| ${file} |`));
      const cells = row?.split('|').map((c) => c.trim());
      if (!cells || Number(cells[2]) !== records.length || !cells[3]!.startsWith(`${checked} (`) || Number(cells[5]) !== memory) stale.push(file);
    }
    expect(stale, 'run npm run provenance').toEqual([]);
  });
});

describe('the llnl.dat extract', () => {
  // The USGS notice asks that copies and modifications carry it and say what was changed.
  it('travels with the USGS notice and says what was taken and changed', () => {
    const notice = readFileSync(join(root, 'tests', 'reference', 'phreeqc-NOTICE.TXT'), 'utf8');
    expect(notice).toMatch(/User Rights Notice/);
    const llnl = refs['phreeqc-llnl-phases']!;
    expect(llnl.licence).toMatch(/phreeqc-NOTICE\.TXT/);
    expect((llnl as unknown as { modifications: string }).modifications).toMatch(/Not the original distribution/);
  });
});
