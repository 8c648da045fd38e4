/**
 * The dissolve section of `npm run bench`: `dissolve` for every
 * charge-balanced pair of one built-in cation and one built-in anion, all
 * bases, on one core. Target: ≥ 50,000 salts per second.
 */
import { performance } from 'node:perf_hooks';
import { Dataset, type Tables } from '../../data/dataset.js';
import { builtinDataset } from '../../data/builtin.js';
import { tableSchemas, type TableName } from '../../data/schemas.js';
import { parseSalt } from '../../chem/parseSalt.js';
import type { Salt } from '../../chem/salt.js';
import { isIonheatError } from '../../error.js';
import { dissolve } from '../../solution/dissolve.js';

/** Target of the issue, salts per second. */
export const DISSOLVE_TARGET_PER_SECOND = 50_000;

/** A dataset with the built-in tables and empty caches, so the first pass pays for every index. */
function freshDataset(): Dataset {
  const base = builtinDataset();
  const tables: Tables = {};
  for (const name of Object.keys(tableSchemas) as TableName[]) {
    const t = base.table(name);
    if (t) (tables as Record<string, unknown>)[name] = t;
  }
  return new Dataset(tables, base.sources, 'built-in (fresh)');
}

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

function pass(salts: readonly Salt[], dataset: Dataset, counts?: Map<string, number>): void {
  for (const salt of salts) {
    try {
      const r = dissolve(salt, {}, dataset);
      if (counts) counts.set(r.best.basis, (counts.get(r.best.basis) ?? 0) + 1);
    } catch (e) {
      if (!isIonheatError(e)) throw e;
      if (counts) counts.set('none', (counts.get('none') ?? 0) + 1);
    }
  }
}

/** Runs the section and returns its report lines. */
export function benchDissolve(): string[] {
  const dataset = freshDataset();
  const salts = chargeBalancedPairs(dataset);
  const counts = new Map<string, number>();
  let t0 = performance.now();
  pass(salts, dataset, counts);
  const cold = performance.now() - t0;
  // Let the JIT settle, then time whole passes for three seconds and take the median pass.
  for (t0 = performance.now(); performance.now() - t0 < 1000; ) pass(salts, dataset);
  const rates: number[] = [];
  for (t0 = performance.now(); performance.now() - t0 < 3000; ) {
    const t = performance.now();
    pass(salts, dataset);
    rates.push(salts.length / ((performance.now() - t) / 1000));
  }
  rates.sort((a, b) => a - b);
  const passes = rates.length;
  const warmRate = rates[Math.floor(passes / 2)]!;
  const coldRate = salts.length / (cold / 1000);
  return [
    `dissolve, every charge-balanced cation–anion pair (${salts.length} salts; best basis: ${[...counts.entries()].map(([b, n]) => `${b} ${n}`).join(', ')})`,
    `  first pass on a fresh dataset (builds the anchor index, calibrations, lattice estimates and per-salt profiles): ${cold.toFixed(0)} ms, ${coldRate.toFixed(0)} salts/s`,
    `  later passes (indexes and profiles reused; median of ${passes} passes): ${warmRate.toFixed(0)} salts/s — ${(warmRate / DISSOLVE_TARGET_PER_SECOND).toFixed(2)} × the target of ${DISSOLVE_TARGET_PER_SECOND} salts/s`,
  ];
}
