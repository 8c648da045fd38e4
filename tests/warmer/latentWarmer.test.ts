// The latent-heat warmer model (src/warmer/): published plateau temperatures and latent heats, the share
// crystallised at once against hand calculations, extra water, the energy balance, start temperature, recharge
// and the intervals. The published values below were typed from memory of the compilations named beside them
// (Lane 1983, `lane1983`; Abhat 1983, `abhat1983`; Zalba et al. 2003, `zalba2003`), as the data table says.
import { describe, expect, it } from 'vitest';
import { latentWarmer, IonheatError } from '../../src/index.js';
import { builtinDataset } from '../../src/data/builtin.js';

/** Melting point (°C) and latent heat (J/g) as the compilations give them; the span is the spread between compilations. */
const PUBLISHED = [
  { salt: 'NaCH3COO·3H2O', meltingC: 58, latent: 264, others: [226, 265], source: 'Lane 1983 (58 °C, 264 J/g); Zalba et al. 2003 list 226 and 265 J/g' },
  { salt: 'Na2S2O3·5H2O', meltingC: 48, latent: 201, others: [209], source: 'Abhat 1983 (48 °C, 201 J/g); Lane 1983 about 209 J/g' },
  { salt: 'Na2HPO4·12H2O', meltingC: 35, latent: 281, others: [265], source: 'Abhat 1983 (35 °C, 281 J/g); Zalba et al. 2003 also list 265 J/g' },
  { salt: 'Na2SO4·10H2O', meltingC: 32.4, latent: 254, others: [251], source: 'Lane 1983 (32.4 °C, 254 J/g); Abhat 1983 about 251 J/g' },
  { salt: 'CaCl2·6H2O', meltingC: 29.8, latent: 190.8, others: [171], source: 'Lane 1983 (29.8 °C, 190.8 J/g); Zalba et al. 2003 also list 171 J/g' },
] as const;

describe('published plateau temperatures and latent heats', () => {
  for (const p of PUBLISHED) {
    it(`${p.salt}: plateau ${p.meltingC} °C and ${p.latent} J/g released from just below the melting point (${p.source})`, () => {
      // Triggered 1.5 K below the melting point little is left to warm: the heat is L less (c_l − c_s)·1.5 K, under
      // 1 % of L for every hydrate here (c_l − c_s at most 1.55 J/(g·K)).
      const w = latentWarmer({ salt: p.salt, massG: 100, startC: p.meltingC - 1.5 });
      expect(w.plateau.value).toBeCloseTo(p.meltingC, 6);
      expect(Math.abs(w.heatPerGram.value / p.latent - 1)).toBeLessThan(0.01);
      // the other compilations' values lie inside the 95 % interval of the heat
      for (const other of p.others) {
        expect(other).toBeGreaterThanOrEqual(w.heatPerGram.low);
        expect(other).toBeLessThanOrEqual(w.heatPerGram.high);
      }
    });
  }
});

describe('the share crystallised at once: hand calculations', () => {
  it('100 g of sodium acetate trihydrate from 20 °C: c_l·(T_m − T_s)/L_m = 3.0 × 38 / 264 = 0.4318', () => {
    // The heat of the crystals raises the whole fill to the melting point: x·L(T_s) = C(x)·(T_m − T_s), which with
    // L(T_s) = L_m − (c_l − c_s)(T_m − T_s) reduces to x = m·c_l·(T_m − T_s)/L_m (data: Lane 1983 as in the table).
    const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, startC: 20 });
    expect(w.crystallisedAtPlateau.value).toBeCloseTo((3.0 * 38) / 264, 10);
  });
  it('with a 20 J/K container the same fill crystallises (100·3.0 + 20)·38/(100·264) = 0.4606 at once', () => {
    const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, startC: 20, containerJPerK: 20 });
    expect(w.crystallisedAtPlateau.value).toBeCloseTo(((100 * 3.0 + 20) * 38) / (100 * 264), 10);
  });
  it('50 g of sodium thiosulfate pentahydrate from 25 °C: 2.38 × 23 / 201 = 0.2723 (Abhat 1983 data)', () => {
    const w = latentWarmer({ salt: 'Na2S2O3·5H2O', massG: 50, startC: 25 });
    expect(w.crystallisedAtPlateau.value).toBeCloseTo((2.38 * 23) / 201, 10);
    // and the heat back at 25 °C: m·(L_m − (c_l − c_s)(T_m − T_s)) = 50 × (201 − 0.92 × 23) J
    expect(w.heatReleased.value).toBeCloseTo((50 * (201 - (2.38 - 1.46) * 23)) / 1000, 9);
  });
  it('the plateau lasts while the rest crystallises: (m − x₁)·L_m / Q(T_m) by hand, within the step error', () => {
    // Q(T_m) = 0.15 W/K × (58 − 22) K + 0.25 W/K × (58 − 33) K = 11.65 W with the assumed conductances.
    const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, startC: 20 });
    const byHand = ((100 - 43.1818) * 264) / (0.15 * 36 + 0.25 * 25);
    expect(w.plateauDuration.value / byHand).toBeCloseTo(1, 2);
  });
});

describe('extra water', () => {
  it('lowers the plateau and the heat released, step by step (liquidus from the CRC solubility table)', () => {
    const runs = [0, 2, 5, 10, 20].map((water) => latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, extraWaterG: water, startC: 20 }));
    for (let i = 1; i < runs.length; i++) {
      expect(runs[i]!.heatReleased.value).toBeLessThan(runs[i - 1]!.heatReleased.value);
      expect(runs[i]!.plateau.value).toBeLessThan(runs[i - 1]!.plateau.value);
      expect(runs[i]!.liquidusC).toBeLessThan(runs[i - 1]!.liquidusC);
    }
  });
  it('10 g on 100 g of sodium acetate trihydrate: liquidus 54.5 °C, linear between 50 °C (82.15 g/100 g, CRC) and the melt at 58 °C', () => {
    // The fill holds 60.28 g of salt in 49.72 g of water, 121.2 g/100 g; the trihydrate's own melt is 151.7 g/100 g.
    const w0 = 82.034 / 136.08;
    const s = (100 * w0) / (100 * (1 - w0) + 10);
    const s0 = w0 / (1 - w0);
    const byHand = 50 + (8 * (s - 0.8215)) / (s0 - 0.8215);
    const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, extraWaterG: 10, startC: 20 });
    expect(w.liquidusC).toBeCloseTo(byHand, 2);
    expect(w.plateau.value).toBeLessThan(w.liquidusC);
    // the recharge needs only the liquidus: the separated anhydrous salt dissolves at 60 °C already (139.8 > 121.2)
    expect(w.rechargeTemperature!.value).toBeCloseTo(w.liquidusC, 6);
  });
  it('a hydrate without a tabulated liquidus refuses extra water, naming what is missing', () => {
    expect(() => latentWarmer({ salt: 'Na2HPO4·12H2O', massG: 100, extraWaterG: 5 })).toThrow(/no solubility of Na2HPO4·12H2O below its melting point/);
  });
});

describe('energy closes', () => {
  const fills = [
    { salt: 'NaCH3COO·3H2O', massG: 100, startC: 20 },
    { salt: 'NaCH3COO·3H2O', massG: 80, extraWaterG: 12, startC: 15, containerJPerK: 30 },
    { salt: 'Na2SO4·10H2O', massG: 200, extraWaterG: 20, startC: 22 },
    { salt: 'CaCl2·6H2O', massG: 50, startC: 10 },
  ];
  for (const fill of fills) {
    it(`${fill.massG} g ${fill.salt}${fill.extraWaterG ? ` + ${fill.extraWaterG} g water` : ''}: latent heat = sensible heat (+ heat lost), residual below 1e-6 of the heat`, () => {
      const w = latentWarmer(fill, { ambientC: 5 });
      const scale = w.heatReleased.value * 1000;
      expect(Math.abs(w.energy.trigger.residualJ)).toBeLessThan(1e-6 * scale);
      expect(Math.abs(w.energy.course.residualJ)).toBeLessThan(1e-6 * scale);
      expect(w.energy.trigger.latentJ).toBeGreaterThan(0);
      expect(w.energy.course.lostJ).toBeGreaterThan(0);
    });
  }
});

describe('start temperature', () => {
  it('a warmer start crystallises less at once, releases more heat back to its start and holds its plateau longer', () => {
    // dQ/dT_s = m·(c_l − c_s) > 0 for every hydrate of the table (the melt holds more heat than the crystal)
    const starts = [0, 10, 20, 30, 40, 50];
    const runs = starts.map((startC) => latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, startC }));
    for (let i = 1; i < runs.length; i++) {
      expect(runs[i]!.crystallisedAtPlateau.value).toBeLessThan(runs[i - 1]!.crystallisedAtPlateau.value);
      expect(runs[i]!.heatReleased.value).toBeGreaterThan(runs[i - 1]!.heatReleased.value);
      expect(runs[i]!.plateauDuration.value).toBeGreaterThan(runs[i - 1]!.plateauDuration.value);
      expect(runs[i]!.plateau.value).toBe(58);
    }
  });
  it('a fill at or above its liquidus is not supercooled: NOT_APPLICABLE naming the start', () => {
    expect(() => latentWarmer({ salt: 'Na2SO4·10H2O', massG: 100, startC: 35 })).toThrow(IonheatError);
    expect(() => latentWarmer({ salt: 'Na2SO4·10H2O', massG: 100, startC: 35 })).toThrow(/not below its liquidus of 32.4 °C/);
  });
});

describe('recharge', () => {
  it('sodium acetate trihydrate melts clear only where the separated anhydrous salt redissolves: 78.0 °C by the CRC solubility', () => {
    // anhydrous NaC2H3O2: 145.7 g/100 g at 70 °C, 153.2 at 80 °C (CRC); the melt holds 151.7 g/100 g
    const s0 = (100 * (82.034 / 136.08)) / (1 - 82.034 / 136.08);
    const byHand = 70 + (10 * (s0 - 145.7)) / (153.2 - 145.7);
    const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100 });
    expect(w.rechargeTemperature!.value).toBeCloseTo(byHand, 1);
  });
  it('Glauber salt cannot be recharged by heating alone: its anhydrous salt is less soluble hot (CRC), so null and a caution', () => {
    const w = latentWarmer({ salt: 'Na2SO4·10H2O', massG: 100 });
    expect(w.rechargeTemperature).toBeNull();
    expect(w.cautions.some((c) => c.text.includes('cannot be fully recharged'))).toBe(true);
    expect(w.cautions.some((c) => c.text.startsWith('Repeated recharging of Na2SO4·10H2O: Incongruent melting'))).toBe(true);
  });
});

describe('intervals and cautions', () => {
  it('every estimate of every hydrate has an interval of non-zero width holding its value', () => {
    for (const p of PUBLISHED) {
      const w = latentWarmer({ salt: p.salt, massG: 100, startC: 15 }, { ambientC: 10 });
      for (const e of [w.plateau, w.crystallisedAtPlateau, w.heatReleased, w.heatPerGram, w.plateauDuration, ...(w.rechargeTemperature ? [w.rechargeTemperature] : [])]) {
        expect(e.high - e.low, `${p.salt} ${e.quantity}`).toBeGreaterThan(0);
        expect(e.low).toBeLessThanOrEqual(e.value);
        expect(e.high).toBeGreaterThanOrEqual(e.value);
      }
    }
  });
  it('a plateau above 44 °C carries the contact-burn caution and the screening line; one below it the long-contact one', () => {
    const hot = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100 });
    expect(hot.cautions[0]?.text).toMatch(/^Contact-burn risk: the warmer holds a plateau near 58.0 °C/);
    expect(hot.cautions.at(-1)?.text).toContain('licensed practice');
    const mild = latentWarmer({ salt: 'Na2HPO4·12H2O', massG: 100 });
    expect(mild.cautions[0]?.text).toMatch(/^Long contact/);
  });
  it('a salt that is not a hydrate, or a hydrate without melt data, is refused naming what is missing', () => {
    expect(() => latentWarmer({ salt: 'NaCl', massG: 10 })).toThrow(/NaCl is not a salt hydrate/);
    expect(() => latentWarmer({ salt: 'MgSO4·7H2O', massG: 10 })).toThrow(/no melting point, latent heat of fusion or heat capacities .* for MgSO4·7H2O in warmer-melts.json/);
  });
  it('surroundings too warm to end the plateau are refused, not answered with an endless plateau', () => {
    expect(() => latentWarmer({ salt: 'CaCl2·6H2O', massG: 100 }, { ambientC: 35 })).toThrow(/not cold enough to end the plateau/);
    expect(() => latentWarmer({ salt: 'CaCl2·6H2O', massG: 100 }, { ambientConductanceWPerK: 0, skinConductanceWPerK: 0 })).toThrow(/both conductances zero/);
  });
});

describe('the warmer-melts table', () => {
  const records = builtinDataset().records('warmer-melts.json');
  it('names a known source and a positive uncertainty for every value, and marks values typed from memory', () => {
    for (const r of records) {
      for (const q of [r.meltingPoint, r.latentHeat, r.solidHeatCapacity, r.meltHeatCapacity]) {
        expect(builtinDataset().source(q.source), `${r.formula} ${q.source}`).toBeDefined();
        expect(q.uncertainty).toBeGreaterThan(0);
        expect(typeof q.fromMemory).toBe('boolean');
      }
    }
  });
  it('states the consequence of incongruent melting and the solid that separates', () => {
    const incongruent = records.filter((r) => r.melting === 'incongruent');
    expect(incongruent.map((r) => r.formula).sort()).toEqual(['Na2HPO4·12H2O', 'Na2SO4·10H2O', 'NaCH3COO·3H2O']);
    for (const r of incongruent) {
      expect(r.solidOnMelting).toBeDefined();
      expect(r.consequence).toMatch(/cycle/);
    }
  });
});
