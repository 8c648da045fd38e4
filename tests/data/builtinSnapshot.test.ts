// The indexes and calibrations of the built-in tables are computed when the package is built
// (src/data/builtinSnapshot.generated.ts, `npm run generate`). The file must be what the generator
// writes today, and a dataset that reads it must give exactly what one that builds them at run time gives.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { builtinSnapshotText } from '../../src/node/scripts/builtinSnapshot.js';
import { builtinTablesText } from '../../src/node/scripts/builtinTables.js';
import { freshDataset } from '../../src/node/scripts/freshDataset.js';
import { builtinDataset } from '../../src/data/builtin.js';
import { decodeSnapshot, encodeSnapshot } from '../../src/data/snapshotCodec.js';
import { enumerate } from '../../src/screen/enumerate.js';
import { tableSalts } from '../../src/solution/tableSalts.js';
import { dissolve } from '../../src/solution/dissolve.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { packFinalTemperature } from '../../src/pack/packFinalTemperature.js';
import { latticeCalibration } from '../../src/lattice/latticeCalibration.js';
import type { Dataset } from '../../src/data/dataset.js';

const root = join(import.meta.dirname, '..', '..');

/** Every outcome of dissolve for a formula on a dataset, as text (a refusal as its message). */
function outcome(formula: string, dataset: Dataset): string {
  try {
    return JSON.stringify(dissolve(parseSalt(formula, dataset), {}, dataset));
  } catch (e) {
    return `error: ${(e as Error).message}`;
  }
}

describe('the built-in tables and their snapshot', () => {
  it('the tables module is what npm run generate writes from data/ today', () => {
    const written = readFileSync(join(root, 'src', 'data', 'builtinTables.generated.ts'), 'utf8');
    expect(written === builtinTablesText(), 'src/data/builtinTables.generated.ts is stale: run npm run generate').toBe(true);
  });

  it('the tables module leaves out only prose: every other field of data/*.json is carried', () => {
    const file = JSON.parse(readFileSync(join(root, 'data', 'solubility.json'), 'utf8')) as { title: string; records: Record<string, unknown>[] };
    const carried = builtinDataset().table('solubility.json')!;
    expect(carried.title).toBe(file.title);
    const strip = (r: Record<string, unknown>): unknown => JSON.parse(JSON.stringify(r, (k, v: unknown) => (k === 'note' || k === 'checkedAgainst' ? undefined : v)));
    expect(carried.records).toEqual(file.records.map(strip));
    expect(builtinDataset().source('wagman1982')?.citation).toMatch(/Wagman/);
  });

  it('the snapshot is what npm run generate writes from the tables today', () => {
    const written = readFileSync(join(root, 'src', 'data', 'builtinSnapshot.generated.ts'), 'utf8');
    expect(written === builtinSnapshotText(), 'src/data/builtinSnapshot.generated.ts is stale: run npm run generate').toBe(true);
  });

  it('gives byte-identical dissolve results over the enumeration and every table salt', () => {
    const built = freshDataset();
    const formulas = [...new Set([...enumerate({}, built).map((s) => s.formula), ...tableSalts(built).keys()])];
    expect(formulas.length).toBeGreaterThan(1000);
    const snapshot = builtinDataset();
    const differing = formulas.filter((f) => outcome(f, snapshot) !== outcome(f, built));
    expect(differing).toEqual([]);
  });

  it('gives byte-identical fills and the same lattice calibration', () => {
    const built = freshDataset();
    for (const formula of ['KNO3', 'CaCl2', 'NH4NO3', 'CaCl2·6H2O', 'MgSO4']) {
      const fill = { solids: [{ formula, massG: 40 }], waterG: 100, startC: 20 };
      expect(JSON.stringify(packFinalTemperature(fill, {}, builtinDataset()))).toBe(JSON.stringify(packFinalTemperature(fill, {}, built)));
    }
    expect(latticeCalibration(builtinDataset()).residuals).toEqual(latticeCalibration(built).residuals);
  });

  it('reads back every value it writes: maps, sets, shared objects, −0, non-finite numbers and table records', () => {
    const rows: unknown[] = [{ formula: 'NaCl' }];
    const tables = { records: () => rows };
    const record = tables.records()[0];
    const shared = { a: 1 };
    const value = { m: new Map([['k', shared]]), s: new Set([1, 2]), again: shared, z: -0, inf: -Infinity, nan: NaN, u: undefined, r: record, f: Float64Array.of(1.5, -0) };
    const back = decodeSnapshot(JSON.parse(JSON.stringify(encodeSnapshot(value, tables, ['solubility.json']))), tables) as typeof value;
    expect(back).toEqual(value);
    expect(back.m.get('k')).toBe(back.again);
    expect(back.r).toBe(record);
    expect(Object.is(back.z, -0)).toBe(true);
    expect(() => encodeSnapshot({ at: new Date(0) }, tables, [])).toThrow(/Date/);
  });
});
