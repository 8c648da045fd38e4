/**
 * The lattice section of `npm run bench`: every lattice method over every
 * charge-balanced pair of one built-in cation and one built-in anion, and
 * the cost of a Kapustinskii estimate of an already-parsed salt against a
 * bare inline evaluation of the same equation for the same salt, in the same
 * run. Target: that ratio ≤ 20.
 */
import { performance } from 'node:perf_hooks';
import { freshDataset } from './freshDataset.js';
import type { Salt } from '../../chem/salt.js';
import { isIonheatError } from '../../error.js';
import { cycleLatticeEnthalpy } from '../../cycle/cycleLatticeEnthalpy.js';
import { latticeEstimate, latticeMethods, tryLatticeEstimate } from '../../lattice/latticeEstimate.js';
import { KAPUSTINSKII_CONSTANT, KAPUSTINSKII_RHO } from '../../lattice/kapustinskii.js';
import { latticeIons } from '../../lattice/latticeIons.js';
import { latticeCalibration } from '../../lattice/latticeCalibration.js';
import { ionRadius } from '../../lattice/ionRadius.js';
import { RT_STANDARD } from '../../quantity/constants.js';
import { chargeBalancedPairs } from './benchDissolve.js';

/** Largest allowed cost of a Kapustinskii estimate, in bare inline evaluations (issue target). */
export const KAPUSTINSKII_RATIO_TARGET = 20;

/** Runs `pass` repeatedly for about `ms` milliseconds; returns calls per second. */
function rate(pass: () => number, ms = 600): number {
  let calls = 0;
  const t0 = performance.now();
  let elapsed = 0;
  while (elapsed < ms) {
    calls += pass();
    elapsed = performance.now() - t0;
  }
  return calls / (elapsed / 1000);
}

let sink = 0;

/** Runs the section and returns its report lines. */
export function benchLattice(): string[] {
  const dataset = freshDataset();
  const salts = chargeBalancedPairs(dataset);
  const lines = [`lattice methods over every charge-balanced cation–anion pair (${salts.length} salts; calls per second counting the pairs a method has no data for, which return undefined from tryLatticeEstimate)`];

  // The calibration of every estimator against the cycle salts, built once per dataset.
  let t0 = performance.now();
  const calibrated = latticeCalibration(dataset).residuals.length;
  lines.push(`  calibration (${calibrated} salt–estimator residuals, indexes included): ${(performance.now() - t0).toFixed(0)} ms, once per dataset`);
  // First pass per method: every estimate computed (nothing cached yet).
  const applies = new Map<string, Salt[]>();
  const first = new Map<string, number>();
  for (const method of latticeMethods) {
    const ok: Salt[] = [];
    t0 = performance.now();
    for (const salt of salts) {
      try {
        sink += latticeEstimate(salt, method, {}, dataset).value;
        ok.push(salt);
      } catch (e) {
        if (!isIonheatError(e)) throw e;
      }
    }
    first.set(method, salts.length / ((performance.now() - t0) / 1000));
    applies.set(method, ok);
  }

  for (const method of latticeMethods) {
    const ok = applies.get(method)!;
    const perSecond = rate(() => {
      for (const salt of salts) sink += tryLatticeEstimate(salt, method, {}, dataset)?.value ?? 0;
      return salts.length;
    });
    lines.push(`  ${method.padEnd(24)} ${String(ok.length).padStart(4)} of ${salts.length} apply; first pass ${first.get(method)!.toFixed(0).padStart(6)}/s, later passes ${perSecond.toFixed(0).padStart(8)}/s`);
  }
  const cycles = rate(() => {
    for (const salt of salts) sink += cycleLatticeEnthalpy(salt, dataset)?.value ?? 0;
    return salts.length;
  });
  lines.push(`  ${'cycle (born-haber)'.padEnd(24)} ${String(salts.filter((s) => cycleLatticeEnthalpy(s, dataset)).length).padStart(4)} of ${salts.length} close; ${cycles.toFixed(0).padStart(9)} calls/s`);

  // Kapustinskii against the same equation written inline, for the salts it applies to.
  const kap = applies.get('kapustinskii')!;
  const ions = latticeIons(dataset);
  const radius = new Map<string, number>();
  for (const [id, ion] of ions) {
    const r = ionRadius(ion, 6);
    if (r) radius.set(id, r.value);
  }
  const binary = kap.filter((s) => s.ions.length === 2 && s.ions.every((i) => radius.has(i.ion)));
  // Inline: radii looked up by ion id from a plain map, charges and counts read off the parsed salt.
  const inline = rate(() => {
    for (const salt of binary) {
      const [c, a] = salt.ions as [Salt['ions'][number], Salt['ions'][number]];
      const d = radius.get(c.ion)! + radius.get(a.ion)!;
      const factor = c.count * c.charge * c.charge + a.count * a.charge * a.charge;
      sink += ((KAPUSTINSKII_CONSTANT * factor) / d) * (1 - KAPUSTINSKII_RHO / d) - RT_STANDARD;
    }
    return binary.length;
  });
  // Bare arithmetic on numbers extracted beforehand, for reference.
  const d0 = binary.map((s) => radius.get(s.ions[0]!.ion)! + radius.get(s.ions[1]!.ion)!);
  const f0 = binary.map((s) => s.ions.reduce((n, i) => n + i.count * i.charge * i.charge, 0));
  const bare = rate(() => {
    for (let i = 0; i < d0.length; i++) sink += ((KAPUSTINSKII_CONSTANT * f0[i]!) / d0[i]!) * (1 - KAPUSTINSKII_RHO / d0[i]!);
    return d0.length;
  });
  const library = rate(() => {
    for (const salt of binary) sink += latticeEstimate(salt, 'kapustinskii', {}, dataset).value;
    return binary.length;
  });
  const ratio = inline / library;
  lines.push(
    `  Kapustinskii of an already-parsed salt (${binary.length} binary salts): ${library.toFixed(0)}/s; inline evaluation of the same equation ${inline.toFixed(0)}/s`,
    `  ratio estimate : inline = ${ratio.toFixed(1)} (target ≤ ${KAPUSTINSKII_RATIO_TARGET}: ${ratio <= KAPUSTINSKII_RATIO_TARGET ? 'met' : 'MISSED'}); against bare arithmetic on pre-extracted numbers (${bare.toFixed(0)}/s): ${(bare / library).toFixed(0)}`,
  );
  if (sink === 42) lines.push('');
  return lines;
}
