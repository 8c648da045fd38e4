/**
 * The dissolve section of `npm run bench`: `dissolve` for every salt that
 * `enumerate` produces (every charge-balanced pair of one built-in cation and
 * one built-in anion), all bases, on one core, three ways in one run:
 *
 * - cold: the first pass on a fresh dataset, which builds every index and
 *   calibration and fills the per-salt result cache;
 * - computed: later passes with the indexes and calibrations built but no
 *   per-salt results reused (`dissolveUncached`: each call computes its salt
 *   afresh) — the honest speed of the computation;
 * - cached: later passes of `dissolve`, which hand back each salt's kept
 *   results (a look-up, not a computation).
 *
 * Target: ≥ 50,000 salts per second.
 */
import { performance } from 'node:perf_hooks';
import { freshDataset } from './freshDataset.js';
import type { Dataset } from '../../data/dataset.js';
import { parseSalt } from '../../chem/parseSalt.js';
import type { Salt } from '../../chem/salt.js';
import { isIonheatError } from '../../error.js';
import { dissolve, dissolveUncached, type DissolveOptions, type DissolveResult } from '../../solution/dissolve.js';
import { enumerate } from '../../screen/enumerate.js';

/** Target of the issue, salts per second. */
export const DISSOLVE_TARGET_PER_SECOND = 50_000;

type DissolveFn = (salt: Salt, options: DissolveOptions, dataset: Dataset) => DissolveResult;

/** Every charge-balanced salt of one cation and one anion of the ion table. */
export function chargeBalancedPairs(dataset: Dataset): Salt[] {
  const ions = dataset.records('ions.json').filter((i) => i.charge !== 0 && i.id !== 'H[+]');
  const gcd = (a: number, b: number): number => (b ? gcd(b, a % b) : a);
  const write = (f: string, n: number) => (n === 1 ? f : /^[A-Z][a-z]?$/.test(f) ? `${f}${n}` : `(${f})${n}`);
  const out: Salt[] = [];
  for (const c of ions.filter((i) => i.charge > 0)) {
    for (const a of ions.filter((i) => i.charge < 0)) {
      const g = gcd(c.charge, -a.charge);
      out.push(parseSalt(write(c.formula, -a.charge / g) + write(a.formula, c.charge / g), dataset));
    }
  }
  return out;
}

function pass(fn: DissolveFn, salts: readonly Salt[], dataset: Dataset, counts?: Map<string, number>): void {
  for (const salt of salts) {
    try {
      const r = fn(salt, {}, dataset);
      if (counts) counts.set(r.best.basis, (counts.get(r.best.basis) ?? 0) + 1);
    } catch (e) {
      if (!isIonheatError(e)) throw e;
      if (counts) counts.set('none', (counts.get('none') ?? 0) + 1);
    }
  }
}

/** Lets the JIT settle for `warmMs`, then times whole passes for `ms` and returns the median rate, salts/s, and the number of passes. */
function steadyRate(fn: DissolveFn, salts: readonly Salt[], dataset: Dataset, warmMs: number, ms: number): { rate: number; passes: number } {
  let t0 = performance.now();
  while (performance.now() - t0 < warmMs) pass(fn, salts, dataset);
  const rates: number[] = [];
  for (t0 = performance.now(); performance.now() - t0 < ms || rates.length < 3; ) {
    const t = performance.now();
    pass(fn, salts, dataset);
    rates.push(salts.length / ((performance.now() - t) / 1000));
  }
  rates.sort((a, b) => a - b);
  return { rate: rates[Math.floor(rates.length / 2)]!, passes: rates.length };
}

const perSecond = (x: number): string => `${Math.round(x).toLocaleString('en-US')} salts/s`;
const times = (x: number): string => `${x >= 10 ? x.toFixed(0) : x.toFixed(2)} ×`;

/** Runs the section and returns its report lines. */
export function benchDissolve(): string[] {
  const dataset = freshDataset();
  const salts = enumerate({}, dataset);
  const counts = new Map<string, number>();
  const t0 = performance.now();
  pass(dissolve, salts, dataset, counts);
  const coldMs = performance.now() - t0;
  const cold = salts.length / (coldMs / 1000);
  // The indexes and calibrations are built now; dissolveUncached reuses them but no per-salt result.
  const computed = steadyRate(dissolveUncached, salts, dataset, 1000, 3000);
  const cached = steadyRate(dissolve, salts, dataset, 500, 2000);
  const target = DISSOLVE_TARGET_PER_SECOND;
  const row = (label: string, rate: number, how: string): string => `  ${label.padEnd(10)} ${perSecond(rate).padStart(16)}  ${times(rate / target).padStart(7)} target  ${how}`;
  return [
    `dissolve over every salt enumerate() gives (${salts.length} salts; best basis: ${[...counts.entries()].map(([b, n]) => `${b} ${n}`).join(', ')}); target ${perSecond(target)}`,
    row('cold', cold, `first pass on a fresh dataset: builds every index and calibration and fills the per-salt result cache (${coldMs.toFixed(0)} ms)`),
    row('computed', computed.rate, `indexes built, no per-salt result reused (dissolveUncached; median of ${computed.passes} passes) — the honest figure`),
    row('cached', cached.rate, `dissolve handing back each salt's kept results (median of ${cached.passes} passes) — a look-up, not a computation`),
    `  ratios: computed / cold ${times(computed.rate / cold)}, cached / computed ${times(cached.rate / computed.rate)}`,
  ];
}
