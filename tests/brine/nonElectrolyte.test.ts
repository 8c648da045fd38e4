// Urea, a non-electrolyte: its osmotic coefficient (a series fitted to the CRC freezing points) and its φL
// (Gucker & Pickard 1940, from memory), against the CRC table of concentrative properties (102nd ed.) as
// transcribed in tests/reference/brine-crc-freezing-points.json.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature } from '../../src/index.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { brineModel } from '../../src/brine/brineModel.js';
import { brineFreezingPoint } from '../../src/brine/brineFreezingPoint.js';
import { brineEnthalpy, brineOsmotic } from '../../src/brine/brineProperties.js';
import { integralEnthalpyOfSolution } from '../../src/solution/integralEnthalpy.js';
import { crcFreezingPoints } from '../../src/node/scripts/brineReferenceData.js';

const urea = parseSalt('urea');
const points = crcFreezingPoints()['CO(NH2)2']!;

describe('urea brine: freezing points', () => {
  it('has its own series, not the ideal solution', () => {
    const model = brineModel(urea);
    expect(model.basis).toBe('non-electrolyte');
    expect(model.sources).toEqual(['crcConcentrative', 'guckerPickard1940']);
    expect(brineOsmotic(model, 4, 273.15)).toBeCloseTo(0.921, 3);
  });
  it('reproduces all 33 CRC freezing points (0.08–13.1 mol/kg) within 0.1 K, and 90 % of them lie inside the 95 % interval', () => {
    // 0.1 K: the table gives the depression to 0.01 K; the three-term fit leaves at most 0.07 K. Below 1 mol/kg the
    // interval (the fit allowance 0.005·m on φ) is narrower than the table's scatter of ±0.01 K, so a few points fall out.
    expect(points.length).toBe(33);
    let inside = 0;
    for (const p of points) {
      const e = brineFreezingPoint(urea, p.m);
      expect(Math.abs(e.value + p.depression), `${p.m} mol/kg`).toBeLessThan(0.1);
      // inside the interval, allowing the table's rounding to 0.01 K
      if (e.low - 0.005 <= -p.depression && -p.depression <= e.high + 0.005) inside++;
    }
    expect(inside / points.length).toBeGreaterThanOrEqual(0.9);
  });
  it('freezes about 10 % warmer than the ideal cryoscopic law at 4 mol/kg (7.00 K, ideal about 7.7 K)', () => {
    const ideal = 1.8597 * 4.163; // K·kg/mol, the cryoscopic constant of water, times m (dilute-limit law)
    expect(-brineFreezingPoint(urea, 4.163).value).toBeLessThan(0.92 * ideal);
  });
});

describe('urea brine: φL and the integral heat of solution', () => {
  it('φL = −360·m + 12·m² J/mol (heats of dilution, from memory), so the integral heat falls with molality', () => {
    const model = brineModel(urea);
    expect(brineEnthalpy(model, 5, 298.15)).toBeCloseTo(-1500, 6);
    const at = (m: number) => integralEnthalpyOfSolution(urea, m).value;
    expect(at(0)).toBeCloseTo(15.1, 1); // NBS ΔsolH°(∞)
    expect(at(10)).toBeCloseTo(15.1 - 3.6 + 1.2, 1);
  });
  it('carries 20 % of φL as its standard uncertainty inside 10 mol/kg', () => {
    const e = integralEnthalpyOfSolution(urea, 10);
    const infinite = integralEnthalpyOfSolution(urea, 0);
    expect(Math.sqrt(e.u ** 2 - infinite.u ** 2)).toBeGreaterThan(0.2 * 2.4 * 0.99);
  });
});

describe('a urea cold fill: 60 g urea in 100 g water at 20 °C', () => {
  // n = 60/60.056 = 0.99907 mol, m = 9.99 mol/kg, all dissolved (108 g per 100 g water at 20 °C, 67 at 0 °C:
  // at the final temperature S(T) lies above 60 g only down to about −4 °C, so the fill saturates near there)
  const r = packFinalTemperature({ solids: [{ formula: 'CO(NH2)2', massG: 60 }], waterG: 100, startC: 20 });
  it('ends near −4.6 °C, above the brine freezing point of about −15 °C at 10 mol/kg, without ice', () => {
    expect(r.iceMass).toBe(0);
    expect(r.finalTemperature.value).toBeGreaterThan(brineFreezingPoint(urea, 10).value);
    expect(r.finalTemperature.value).toBeCloseTo(-4.6, 0);
    expect(r.dissolved[0]!.integralEnthalpy.method).toBe('infinite-dilution+non-electrolyte');
  });
  it('closes its energy balance within 0.1 %', () => {
    expect(Math.abs(r.heat.absorbed + r.heat.sensible)).toBeLessThanOrEqual(0.001 * Math.abs(r.heat.absorbed));
  });
});
