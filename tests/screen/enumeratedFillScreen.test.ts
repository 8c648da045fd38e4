// An enumerated cold-pack screen with a standard fill (30 g salt in 100 g water from 20 °C), ranked by the
// temperature the fill reaches. Before solubility gated the fill, salts without solubility data were taken to
// dissolve completely, and Sc(OH)3, ScF3, metal fluorides and hydroxides took every top place.
import { describe, expect, it } from 'vitest';
import { enumerate, saltSolubility, screen } from '../../src/index.js';

const FILL = { saltMassG: 30, waterMassG: 100, startC: 20 };
const result = screen(enumerate(), { fill: FILL, direction: 'cool' });
const ranked = result.rows.filter((r) => r.rank !== undefined).sort((a, b) => a.rank! - b.rank!);

describe('an enumerated cold-pack screen with a fill', () => {
  it('ranks, at the top, ten salts that really dissolve: measured solubility of at least 20 g per 100 g water at 20 °C', () => {
    const top = ranked.slice(0, 10);
    expect(top).toHaveLength(10);
    for (const row of top) {
      const s = saltSolubility(row.formula!, 20);
      expect(s.status, row.formula).toBe('measured');
      // 20 g per 100 g water: common practice calls a salt soluble above about 1 g; a cold-pack salt dissolves tens of grams.
      expect(s.value!, row.formula).toBeGreaterThanOrEqual(20);
      expect(row.suitability).toBe('suitable');
      expect(row.fill!.dissolved[0]!.dissolvedMass, row.formula).toBeGreaterThan(5);
    }
    // The usual cold-pack salts are among them (ammonium nitrate, ammonium chloride, potassium nitrate, urea is not enumerated).
    const names = top.map((r) => r.formula);
    expect(names).toEqual(expect.arrayContaining(['NH4NO3', 'NH4Cl', 'KNO3']));
    // And none of the insoluble hydroxides or fluorides that used to lead.
    for (const n of names) expect(n).not.toMatch(/\(OH\)|F\d?$/);
  });

  it('ranks a salt that barely dissolves as the poor pack it is: AgCl and CaF2 stay within 0.1 K of the start, below every salt that dissolves 20 g', () => {
    const soluble = ranked.filter((r) => r.suitability === 'suitable' && (saltSolubility(r.formula!, 20).value ?? 0) >= 20);
    expect(soluble.length).toBeGreaterThanOrEqual(25);
    for (const formula of ['AgCl', 'CaF2']) {
      const row = ranked.find((r) => r.formula === formula)!;
      expect(row.fill!.dissolved[0]!.solubilityStatus, formula).not.toBe('unknown');
      expect(Math.abs(row.fill!.temperatureChange), formula).toBeLessThan(0.1);
      for (const r of soluble) expect(r.rank!, `${r.formula} above ${formula}`).toBeLessThan(row.rank!);
    }
  });

  it('does not rank a salt whose solubility is unknown by its fill, and says why', () => {
    const row = result.rows.find((r) => r.formula === 'ScF3')!;
    expect(row.status).toBe('computed');
    expect(row.rank).toBeUndefined();
    expect(row.objective).toBeUndefined();
    expect(row.fill!.dissolved[0]!.solubilityStatus).toBe('unknown');
    expect(row.notes!.some((n) => n.startsWith('not ranked by the fill: the solubility of ScF3 is unknown'))).toBe(true);
  });

  it('ranks it once the candidate brings its own solubility', () => {
    const own = screen([{ formula: 'ScF3', solubility: 0.01 }, 'KNO3'], { fill: FILL, direction: 'cool' });
    const scf3 = own.rows[0]!;
    expect(scf3.fill!.dissolved[0]!.solubilityStatus).toBe('measured');
    // 0.01 g per 100 g water dissolves 0.01 g of the 30 g: the fill barely moves, and KNO3 ranks first.
    expect(scf3.fill!.dissolved[0]!.dissolvedMass).toBeCloseTo(0.01, 4);
    expect(scf3.rank).toBe(2);
    expect(own.rows[1]!.rank).toBe(1);
  });
});
