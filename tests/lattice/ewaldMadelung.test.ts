// Madelung constants by Ewald summation against the published values, each
// referred to the shortest cation–anion distance and unit charges (CRC
// Handbook, 'Madelung constants', source crcMadelung; digits beyond the CRC's
// five decimals as stated in the issue: rock salt 1.747565, caesium chloride
// 1.762675, zinc blende 1.638055, fluorite 2.519392).
import { describe, expect, it } from 'vitest';
import { builtinDataset, IonheatError } from '../../src/index.js';
import { erfc } from '../../src/lattice/ewaldMadelung.js';
import { ewaldMadelung, type PointChargeCell, type Vec3 } from '../../src/lattice/ewaldMadelung.js';
import { idealCell } from '../../src/lattice/idealCell.js';

const published = [
  ['rock-salt', 1.747565],
  ['caesium-chloride', 1.762675],
  ['zinc-blende', 1.638055],
  ['fluorite', 2.519392],
] as const;

/** The same crystal described by a cell repeated `times` along a. */
function doubled(cell: PointChargeCell, times = 2): PointChargeCell {
  const [a, b, c] = cell.lattice;
  const sites = [];
  for (let m = 0; m < times; m++) for (const s of cell.sites) sites.push({ position: [(s.position[0] + m) / times, s.position[1], s.position[2]] as Vec3, charge: s.charge });
  return { lattice: [[a[0] * times, a[1] * times, a[2] * times], b, c], sites };
}

describe('erfc (Abramowitz & Stegun 7.1)', () => {
  it('matches tabulated values', () => {
    // erfc(1) = 0.157299207050285, erfc(0.5) = 0.479500122186953, erfc(5) = 1.5374597944280e−12 (A&S table 7.1, extended-precision values)
    expect(erfc(1)).toBeCloseTo(0.157299207050285, 14);
    expect(erfc(0.5)).toBeCloseTo(0.479500122186953, 14);
    expect(erfc(5) / 1.537459794428e-12).toBeCloseTo(1, 10);
    expect(erfc(-1)).toBeCloseTo(2 - 0.157299207050285, 14);
  });
});

describe('ewaldMadelung', () => {
  it.each(published)('%s gives %f to 1e−6', (type, value) => {
    const r = ewaldMadelung(idealCell(type));
    expect(Math.abs(r.madelung - value)).toBeLessThan(1e-6);
  });

  it('is converged: a looser cut-off changes the constant by less than 1e−6', () => {
    const tight = ewaldMadelung(idealCell('rock-salt'), { tolerance: 1e-14 }).madelung;
    const loose = ewaldMadelung(idealCell('rock-salt'), { tolerance: 1e-8 }).madelung;
    expect(Math.abs(tight - loose)).toBeLessThan(1e-6);
  });

  it.each(published)('%s: a doubled cell gives the same constant', (type) => {
    const one = ewaldMadelung(idealCell(type)).madelung;
    const two = ewaldMadelung(doubled(idealCell(type)));
    expect(two.formulaUnits).toBe(2 * ewaldMadelung(idealCell(type)).formulaUnits);
    expect(Math.abs(two.madelung - one)).toBeLessThan(1e-9);
  });

  it('rock salt in its primitive (rhombohedral) cell and scaled to a = 5.64 Å gives the same constant', () => {
    const primitive: PointChargeCell = {
      lattice: [
        [0, 0.5, 0.5],
        [0.5, 0, 0.5],
        [0.5, 0.5, 0],
      ],
      sites: [
        { position: [0, 0, 0], charge: 1 },
        { position: [0.5, 0.5, 0.5], charge: -1 },
      ],
    };
    expect(ewaldMadelung(primitive).formulaUnits).toBe(1);
    expect(Math.abs(ewaldMadelung(primitive).madelung - 1.747565)).toBeLessThan(1e-6);
    const cell = idealCell('rock-salt');
    const scaled = { ...cell, lattice: cell.lattice.map((v) => v.map((x) => x * 5.64) as unknown as Vec3) as unknown as PointChargeCell['lattice'] };
    const r = ewaldMadelung(scaled);
    expect(r.shortestDistance).toBeCloseTo(2.82, 12);
    expect(Math.abs(r.madelung - 1.747565)).toBeLessThan(1e-6);
  });

  it('scales with the charges as the tabulated convention says (MgO-type charges ±2: same constant, 4× the energy)', () => {
    const unit = ewaldMadelung(idealCell('rock-salt'));
    const cell = idealCell('rock-salt');
    const twice = ewaldMadelung({ ...cell, sites: cell.sites.map((s) => ({ ...s, charge: 2 * s.charge })) });
    expect(twice.chargeProduct).toBe(4);
    expect(twice.madelung).toBeCloseTo(unit.madelung, 10);
    expect(twice.cellEnergy).toBeCloseTo(4 * unit.cellEnergy, 8);
  });

  it("agrees with the built-in Madelung table for every ideal type it holds (madelung-constants.json)", () => {
    const table = new Map(builtinDataset().records('madelung-constants.json').map((r) => [r.structure, r.value]));
    for (const type of ['rock-salt', 'caesium-chloride', 'zinc-blende', 'wurtzite', 'fluorite', 'antifluorite'] as const) {
      expect(Math.abs(ewaldMadelung(idealCell(type)).madelung - table.get(type)!), type).toBeLessThan(1e-5);
    }
    // perovskite: the table's convention divides by z² of the A(+z) B(+2z) X(−z) pattern (KMgF3: z = 1)
    expect(Math.abs(ewaldMadelung(idealCell('perovskite'), { chargeProduct: 1 }).madelung - table.get('perovskite')!)).toBeLessThan(1e-5);
  });

  it('rejects a charged cell, coplanar vectors and types without an ideal geometry', () => {
    const cell = idealCell('caesium-chloride');
    expect(() => ewaldMadelung({ ...cell, sites: [cell.sites[0]!, { position: [0.5, 0.5, 0.5], charge: -2 }] })).toThrow(IonheatError);
    expect(() => ewaldMadelung({ ...cell, lattice: [[1, 0, 0], [0, 1, 0], [1, 1, 0]] })).toThrow(/coplanar/);
    expect(() => idealCell('rutile')).toThrow(IonheatError);
  });
});
