/**
 * `npm run calibrate`: how well each lattice estimator reproduces the cycle
 * lattice enthalpies of the built-in salts, by charge type, ion kind and
 * cation core; the leave-one-out coverage of every method's 95 % interval;
 * written to docs/lattice-calibration.md and printed.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { builtinDataset } from '../../data/builtin.js';
import type { Dataset } from '../../data/dataset.js';
import { isIonheatError } from '../../error.js';
import { latticeCalibration, MIN_GROUP } from '../../lattice/latticeCalibration.js';
import { latticeEstimate, latticeMethods, type LatticeMethod } from '../../lattice/latticeEstimate.js';

interface Row {
  formula: string;
  chargeType: string;
  ionKind: string;
  cationCore: string;
  reference: number;
  referenceU: number;
  value: number;
  low: number;
  high: number;
  group: string;
}

const pct = (x: number, digits = 1) => `${x >= 0 ? '+' : '−'}${Math.abs(100 * x).toFixed(digits)}`;
const mean = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
const sd = (xs: readonly number[]) => {
  if (xs.length < 2) return 0;
  const m = mean(xs);
  return Math.sqrt(xs.reduce((a, x) => a + (x - m) ** 2, 0) / (xs.length - 1));
};

/** Every calibration salt's leave-one-out estimate by one method. */
function rowsOf(method: LatticeMethod, dataset: Dataset): Row[] {
  const cal = latticeCalibration(dataset);
  const seen = new Map<string, (typeof cal.residuals)[number]>();
  for (const r of cal.residuals) if (!seen.has(r.formula)) seen.set(r.formula, r);
  const rows: Row[] = [];
  for (const r of seen.values()) {
    try {
      const e = latticeEstimate(r.formula, method, {}, dataset);
      const group = /from \d+ salts \(([^)]+)\)/.exec(e.notes[0] ?? '')?.[1] ?? '?';
      rows.push({ formula: r.formula, chargeType: r.chargeType, ionKind: r.ionKind, cationCore: r.cationCore, reference: r.reference, referenceU: r.referenceU, value: e.value, low: e.low, high: e.high, group });
    } catch (e) {
      if (!isIonheatError(e)) throw e;
    }
  }
  return rows;
}

function summary(rows: readonly Row[]): { n: number; bias: number; scatter: number; coverage: number; halfWidth: number } {
  const e = rows.map((r) => (r.reference - r.value) / r.value);
  const inside = rows.filter((r) => r.low <= r.reference && r.reference <= r.high).length;
  return { n: rows.length, bias: mean(e), scatter: sd(e), coverage: inside / rows.length, halfWidth: mean(rows.map((r) => (r.high - r.low) / 2 / r.value)) };
}

function table(header: readonly string[], body: readonly (readonly string[])[]): string[] {
  return [`| ${header.join(' | ')} |`, `|${header.map((_, i) => (i === 0 ? ' --- ' : ' ---: ')).join('|')}|`, ...body.map((r) => `| ${r.join(' | ')} |`)];
}

function groupTable(byMethod: ReadonlyMap<LatticeMethod, Row[]>, key: (r: Row) => string, title: string): string[] {
  const keys = [...new Set([...byMethod.values()].flat().map(key))].sort();
  const body: string[][] = [];
  for (const [method, rows] of byMethod) {
    for (const k of keys) {
      const sel = rows.filter((r) => key(r) === k);
      if (sel.length === 0) continue;
      const s = summary(sel);
      body.push([method, k, String(s.n), pct(s.bias), (100 * s.scatter).toFixed(1), (100 * s.coverage).toFixed(0), (100 * s.halfWidth).toFixed(1)]);
    }
  }
  return [`### By ${title}`, '', ...table(['method', title, 'n', 'bias %', 'scatter %', 'LOO coverage %', 'mean half-width %'], body), ''];
}

function main(): void {
  const dataset = builtinDataset();
  const byMethod = new Map<LatticeMethod, Row[]>();
  for (const m of latticeMethods) byMethod.set(m, rowsOf(m, dataset));

  const lines: string[] = [
    '# Lattice enthalpy estimators: calibration',
    '',
    'Written by `npm run calibrate` (src/node/scripts/calibrate.ts) from the built-in tables; do not edit by hand.',
    '',
    'Every estimator is compared with the **cycle lattice enthalpy** ΔH_L = Σν·ΔfH°(ion, g) − ΔfH°(crystal) of each',
    'built-in anhydrous salt whose cycle closes (crystal formation enthalpies from the NBS tables, gaseous ions from their',
    'elements or from ion-formation-gas.json). Residuals are relative: e = (ΔH_cycle − ΔH_model)/ΔH_model, so a positive',
    'bias means the model reads low. All values are lattice enthalpies at 298.15 K, positive, crystal → gaseous ions.',
    '',
    "Each method's 95 % interval is built from the residuals of the salt's calibration group, leaving the salt itself out",
    `(leave-one-out): the group is charge type × ion kind × cation core, falling back to charge type × core, then core, then`,
    `all salts when a group holds fewer than ${MIN_GROUP} salts. Plain methods report ΔH_model ± t·ΔH_model·√(b² + s²(1 + 1/n));`,
    'bias-corrected methods (`-corrected`) report ΔH_model(1 + b) ± t·ΔH_model·s·√(1 + 1/n), with b and s the group bias and',
    "scatter, n its size and t Student's 97.5 % quantile for n − 1 degrees of freedom. For the corrected methods the bias and",
    'scatter below are those of the leave-one-out corrected values, so they show what a user sees.',
    '',
    'Cation core: `noble-gas` for cations with a noble-gas configuration (alkali, alkaline-earth, Al³⁺, Sc³⁺, Y³⁺, La³⁺, Ti⁴⁺,',
    'NH₄⁺), `other` for d-block and post-transition cations (Ag⁺, Cu⁺, Tl⁺, Zn²⁺, Pb²⁺, Fe³⁺, …), whose more covalent lattices',
    'the ionic models underestimate.',
    '',
    '## Summary (target: leave-one-out coverage ≥ 90 % for every method)',
    '',
  ];
  const summaryRows: string[][] = [];
  const misses: string[] = [];
  for (const [method, rows] of byMethod) {
    const s = summary(rows);
    summaryRows.push([method, String(s.n), pct(s.bias), (100 * s.scatter).toFixed(1), (100 * s.coverage).toFixed(1), (100 * s.halfWidth).toFixed(1), s.coverage >= 0.9 ? 'met' : 'MISSED']);
    const out = rows.filter((r) => !(r.low <= r.reference && r.reference <= r.high));
    misses.push(`- **${method}**: ${out.length === 0 ? 'none' : out.map((r) => `${r.formula} (${pct((r.reference - r.value) / r.value)} %)`).join(', ')}`);
  }
  lines.push(...table(['method', 'n', 'bias %', 'scatter %', 'LOO coverage %', 'mean half-width %', 'target'], summaryRows), '');
  lines.push(...groupTable(byMethod, (r) => r.chargeType, 'charge type'));
  lines.push(...groupTable(byMethod, (r) => r.ionKind, 'ion kind'));
  lines.push(...groupTable(byMethod, (r) => r.cationCore, 'cation core'));
  lines.push('## Salts outside their 95 % interval (leave-one-out)', '', ...misses, '');
  lines.push('## Every salt', '', 'Cycle value, then each method\'s leave-one-out estimate (kJ/mol); `—` where the method does not apply.', '');
  const formulas = [...new Set([...byMethod.values()].flat().map((r) => r.formula))];
  const body = formulas.map((f) => {
    const any = [...byMethod.values()].flat().find((r) => r.formula === f)!;
    return [f, `${any.chargeType} ${any.ionKind} ${any.cationCore}`, `${any.reference.toFixed(1)} ± ${any.referenceU.toFixed(1)}`, ...latticeMethods.map((m) => {
      const r = byMethod.get(m)!.find((x) => x.formula === f);
      return r ? `${r.value.toFixed(0)}${r.low <= r.reference && r.reference <= r.high ? '' : ' ✗'}` : '—';
    })];
  });
  lines.push(...table(['salt', 'group', 'cycle', ...latticeMethods], body), '', '✗: the cycle value lies outside the method\'s 95 % interval.', '');
  const text = lines.join('\n');
  const target = fileURLToPath(new URL('../../../docs/lattice-calibration.md', import.meta.url));
  writeFileSync(target, text);
  process.stdout.write(text);
  process.stdout.write(`\nwritten to ${target}\n`);
}

main();
