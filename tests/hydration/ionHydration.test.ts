// Single-ion and salt hydration enthalpies on the absolute (Marcus) and the
// conventional scale, and their agreement for every neutral salt.
import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/builtin.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import type { Salt } from '../../src/chem/salt.js';
import { ionHydrationEnthalpy } from '../../src/hydration/ionHydration.js';
import { saltHydrationEnthalpy } from '../../src/hydration/saltHydration.js';
import { COVERAGE_95 } from '../../src/quantity/constants.js';

const dataset = builtinDataset();

/** Every charge-balanced pair of one cation and one anion of the ion table (H+ excluded). */
export function allPairs(): Salt[] {
  const ions = dataset.records('ions.json').filter((i) => i.charge !== 0 && i.id !== 'H[+]');
  const gcd = (a: number, b: number): number => (b ? gcd(b, a % b) : a);
  const out: Salt[] = [];
  for (const c of ions.filter((i) => i.charge > 0)) {
    for (const a of ions.filter((i) => i.charge < 0)) {
      const g = gcd(c.charge, -a.charge);
      const write = (f: string, n: number) => (n === 1 ? f : /^[A-Z][a-z]?$/.test(f) ? `${f}${n}` : `(${f})${n}`);
      out.push(parseSalt(write(c.formula, -a.charge / g) + write(a.formula, c.charge / g), dataset));
    }
  }
  return out;
}

describe('single-ion hydration enthalpies', () => {
  it('absolute scale: the tabulated Marcus values', () => {
    // Marcus, Ion Properties (1997), as entered in hydration-enthalpies.json (from memory)
    expect(ionHydrationEnthalpy('Na[+]')!.value).toBe(-416);
    expect(ionHydrationEnthalpy('Cl[-]')!.value).toBe(-367);
  });
  it('conventional scale: ΔfH°(aq) − ΔfH°(g) + z·ΔfH°(H+, g), so that H+ is zero', () => {
    // NBS 1982: Na+(aq) −240.12, Na+(g) 609.358, H+(g) 1536.202
    expect(ionHydrationEnthalpy('Na[+]', 'conventional')!.value).toBeCloseTo(-240.12 - 609.358 + 1536.202, 6);
    expect(ionHydrationEnthalpy('H[+]', 'conventional')!.value).toBe(0);
  });
  it('the two scales differ by z·ΔhydH°abs(H+) = z·(−1103) within the stated uncertainties', () => {
    for (const ion of ['Na[+]', 'K[+]', 'Ca[2+]', 'Mg[2+]', 'Cl[-]', 'Br[-]']) {
      const z = dataset.records('ions.json').find((i) => i.id === ion)!.charge;
      const abs = ionHydrationEnthalpy(ion, 'absolute')!;
      const conv = ionHydrationEnthalpy(ion, 'conventional')!;
      expect(Math.abs(abs.value - (conv.value + z * -1103)), ion).toBeLessThanOrEqual(COVERAGE_95 * Math.hypot(abs.u, conv.u));
    }
  });
});

describe('salt hydration sums', () => {
  it('NaCl: −783 kJ/mol on both scales (Marcus −416 − 367; NBS formation enthalpies −783.5)', () => {
    expect(saltHydrationEnthalpy(parseSalt('NaCl'))!.value).toBe(-783);
    expect(saltHydrationEnthalpy(parseSalt('NaCl'), { scale: 'conventional' })!.value).toBeCloseTo(-783.507, 6);
  });

  const comparable = allPairs()
    .map((salt) => ({ salt, abs: saltHydrationEnthalpy(salt, { born: false }), conv: saltHydrationEnthalpy(salt, { scale: 'conventional', born: false }) }))
    .filter((x) => x.abs && x.conv);

  it('covers enough neutral salts to mean something', () => expect(comparable.length).toBeGreaterThan(200));

  it.each(comparable.map((x) => [x.salt.formula, x] as const))('%s: the absolute and conventional sums agree within their 95 %% uncertainty', (_f, { abs, conv }) => {
    expect(Math.abs(abs!.value - conv!.value)).toBeLessThanOrEqual(COVERAGE_95 * Math.hypot(abs!.u, conv!.u));
  });

  it('uses Born estimates for ions without values and says so', () => {
    const e = saltHydrationEnthalpy(parseSalt('Na2SO4'))!;
    expect(e.basis).toBe('model');
    expect(e.method).toBe('marcus+born-lps');
    expect(e.notes.join(' ')).toMatch(/SO4\[2-\]: Born estimate/);
    expect(saltHydrationEnthalpy(parseSalt('Na2SO4'), { born: false })).toBeUndefined();
  });

  it('gives nothing for a non-electrolyte', () => expect(saltHydrationEnthalpy(parseSalt('urea'))).toBeUndefined());
});
