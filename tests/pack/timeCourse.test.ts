// The lumped time course, checked against closed-form solutions of its own equations.
import { describe, expect, it } from 'vitest';
import { packFinalTemperature, packTimeCourse } from '../../src/index.js';

const dilute = { solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 };

/** Linear interpolation of the returned curve at time t. */
function at(points: { t: number; temperature: number }[], t: number): number {
  const k = points.findIndex((p) => p.t >= t);
  const a = points[k - 1]!;
  const b = points[k]!;
  return a.temperature + ((b.temperature - a.temperature) * (t - a.t)) / (b.t - a.t);
}

describe('no heat exchange: T(t) relaxes to the adiabatic final temperature', () => {
  // Unsaturated, the equilibrium heat Q does not depend on T, so dq/dt = (Q − q)/τ gives
  // q = Q·(1 − e^(−t/τ)) and T(t) = T₀ − (Q/C)·(1 − e^(−t/τ)), exactly, for the exponential steps used.
  const course = packTimeCourse(dilute, { ambientConductanceWPerK: 0, skinConductanceWPerK: 0, dissolutionTimeConstantS: 60, durationS: 600 });
  const final = packFinalTemperature(dilute).finalTemperature.value;
  it('follows 1 − e^(−t/τ)', () => {
    for (const t of [30, 60, 120, 300]) {
      const expected = 20 + (final - 20) * (1 - Math.exp(-t / 60));
      expect(Math.abs(at(course.points, t) - expected)).toBeLessThan(1e-3);
    }
    expect(course.points.at(-1)!.temperature).toBeCloseTo(20 + (final - 20) * (1 - Math.exp(-10)), 6);
  });
  it('ends at the adiabatic temperature for a saturated fill too', () => {
    const heavy = { solids: [{ formula: 'KNO3', massG: 200 }], waterG: 100, startC: 20 };
    const c = packTimeCourse(heavy, { ambientConductanceWPerK: 0, skinConductanceWPerK: 0 });
    expect(c.points.at(-1)!.temperature).toBeCloseTo(packFinalTemperature(heavy).finalTemperature.value, 4);
  });
});

describe('with heat exchange: the closed form of the linear model', () => {
  // C·dT/dt = −(Q/τ)·e^(−t/τ) − G·(T − T_env), G = G_air + G_skin, T_env their weighted mean.
  // With k = G/C: T(t) = T_env + (T₀ − T_env)·e^(−kt) − (Q/(Cτ))·(e^(−t/τ) − e^(−kt))/(k − 1/τ).
  const gAir = 0.2;
  const gSkin = 0.3;
  const course = packTimeCourse(dilute, { ambientC: 22, ambientConductanceWPerK: gAir, skinC: 33, skinConductanceWPerK: gSkin, dissolutionTimeConstantS: 60, durationS: 3600 });
  const C = course.heatCapacityJPerK;
  const Q = (20 - packFinalTemperature(dilute).finalTemperature.value) * C;
  const G = gAir + gSkin;
  const tEnv = (gAir * 22 + gSkin * 33) / G;
  const k = G / C;
  const exact = (t: number) => tEnv + (20 - tEnv) * Math.exp(-k * t) - (Q / (C * 60)) * ((Math.exp(-t / 60) - Math.exp(-k * t)) / (k - 1 / 60));
  it('matches it within 0.05 K', () => {
    for (const t of [60, 300, 900, 1800, 3600]) expect(Math.abs(at(course.points, t) - exact(t))).toBeLessThan(0.05);
  });
  it('reports the coldest point and labels the defaults it did not use', () => {
    expect(course.extreme.temperature).toBeLessThan(20);
    expect(course.parameters.ambientC.assumed).toBe(false);
    expect(course.parameters.durationS.assumed).toBe(false);
  });
});

describe('time inside a band, and time above the burn threshold', () => {
  const hot = packTimeCourse({ solids: [{ formula: 'CaCl2', massG: 25 }], waterG: 100, startC: 20 }, { band: { lowC: 40, highC: 50 } });
  it('counts the seconds between first entering and last leaving, no more', () => {
    const b = hot.band!;
    expect(b.secondsInside).toBeGreaterThan(0);
    expect(b.secondsInside).toBeLessThanOrEqual(b.lastInsideS! - b.firstInsideS! + 1e-6);
    // the curve crosses 40–50 °C twice (warming fast, cooling slowly): most of the time inside is on the way down
    expect(b.lastInsideS!).toBeGreaterThan(hot.extreme.timeS);
  });
  it('labels the defaults as assumed values for illustration and carries the burn caution with the time held', () => {
    expect(hot.parameters.dissolutionTimeConstantS).toEqual({ value: 60, unit: 's', assumed: true });
    expect(hot.notes.some((n) => n.startsWith('assumed values for illustration'))).toBe(true);
    expect(hot.secondsAboveBurnThreshold).toBeGreaterThan(60);
    expect(hot.cautions[0]?.text).toContain('stays above 44 °C for about');
  });
  it('rejects a band the wrong way round, naming the field', () => {
    expect(() => packTimeCourse(dilute, { band: { lowC: 10, highC: 5 } })).toThrow(/band/);
    expect(() => packTimeCourse(dilute, { dissolutionTimeConstantS: 0 })).toThrow(/dissolutionTimeConstantS/);
  });
});
