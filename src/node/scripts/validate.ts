/**
 * `npm run validate`: leave-one-out validation of the enthalpy-of-solution
 * estimators. Every salt with a measured enthalpy of solution is estimated
 * with its own measured value and crystal formation enthalpy hidden
 * (`excludeMeasured`), and each estimate is compared with the measured
 * value; the same is done against the cycle values of salts that have
 * formation enthalpies but no measured value (2:1, 1:2, 2:2 salts and the
 * pack hydrates). Writes docs/solution-validation.md.
 */
import { writeFileSync, mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { builtinDataset } from '../../data/builtin.js';
import { parseSalt } from '../../chem/parseSalt.js';
import { chargeType, type Salt } from '../../chem/salt.js';
import { isIonheatError } from '../../error.js';
import { basisOrder, type Estimate } from '../../quantity/estimate.js';
import { dissolve } from '../../solution/dissolve.js';
import { measuredSolutionEnthalpy } from '../../solution/measuredSolution.js';
import { solutionEnthalpyFromCycle } from '../../solution/cycleSolution.js';
import { solutionVerdict } from '../../solution/verdict.js';
import { saltIonClass, saltIonClasses } from '../../lattice/saltIonClass.js';

const dataset = builtinDataset();

interface Case {
  salt: Salt;
  /** The reference value, kJ/mol. */
  truth: number;
  estimates: Estimate[];
  best: Estimate | undefined;
}

interface Row {
  label: string;
  n: number;
  mae: number;
  rms: number;
  bias: number;
  coverage: number;
  right: number;
  undetermined: number;
  wrong: number;
}

function estimateCase(salt: Salt, truth: number): Case {
  try {
    const r = dissolve(salt, { excludeMeasured: true }, dataset);
    return { salt, truth, estimates: r.estimates, best: r.best };
  } catch (e) {
    if (isIonheatError(e)) return { salt, truth, estimates: [], best: undefined };
    throw e;
  }
}

function row(label: string, pairs: readonly { e: Estimate; truth: number }[]): Row {
  const n = pairs.length;
  const errors = pairs.map((p) => p.e.value - p.truth);
  let right = 0;
  let undetermined = 0;
  let wrong = 0;
  for (const p of pairs) {
    const v = solutionVerdict(p.e).verdict;
    const actual = p.truth > 0 ? 'endothermic' : p.truth < 0 ? 'exothermic' : 'undetermined';
    if (v === 'undetermined') undetermined++;
    else if (v === actual) right++;
    else wrong++;
  }
  return {
    label,
    n,
    mae: errors.reduce((s, x) => s + Math.abs(x), 0) / Math.max(1, n),
    rms: Math.sqrt(errors.reduce((s, x) => s + x * x, 0) / Math.max(1, n)),
    bias: errors.reduce((s, x) => s + x, 0) / Math.max(1, n),
    coverage: pairs.filter((p) => p.e.low <= p.truth && p.truth <= p.e.high).length / Math.max(1, n),
    right: right / Math.max(1, n),
    undetermined: undetermined / Math.max(1, n),
    wrong: wrong / Math.max(1, n),
  };
}

function rows(cases: readonly Case[]): Row[] {
  const groups = new Map<string, { e: Estimate; truth: number }[]>();
  for (const c of cases) {
    for (const e of c.estimates) {
      const key = `${e.basis} · ${e.method}`;
      const list = groups.get(key) ?? [];
      list.push({ e, truth: c.truth });
      groups.set(key, list);
    }
  }
  const keys = [...groups.keys()].sort((a, b) => basisOrder.indexOf(a.split(' · ')[0] as never) - basisOrder.indexOf(b.split(' · ')[0] as never) || (a < b ? -1 : 1));
  const out = keys.map((k) => row(k, groups.get(k)!));
  for (const basis of basisOrder) {
    const ofBasis = cases.flatMap((c) => {
      const e = c.estimates.find((x) => x.basis === basis);
      return e ? [{ e, truth: c.truth }] : [];
    });
    if (ofBasis.length > 0) out.push(row(`${basis} basis (most precise per salt)`, ofBasis));
  }
  out.push(row('best', cases.flatMap((c) => (c.best ? [{ e: c.best, truth: c.truth }] : []))));
  return out;
}

const pct = (x: number): string => `${(100 * x).toFixed(1)} %`;
const kj = (x: number): string => (x.toFixed(1) === '-0.0' ? '0.0' : x.toFixed(1));

function table(rs: readonly Row[]): string {
  const head = '| basis · method | n | MAE | RMS | bias | 95 % coverage | verdict right | undetermined | wrong |\n|---|---:|---:|---:|---:|---:|---:|---:|---:|';
  return [head, ...rs.map((r) => `| ${r.label} | ${r.n} | ${kj(r.mae)} | ${kj(r.rms)} | ${kj(r.bias)} | ${pct(r.coverage)} | ${pct(r.right)} | ${pct(r.undetermined)} | ${pct(r.wrong)} |`)].join('\n');
}

const carried = (r: Row): boolean => r.label.includes('+difference-rule');
const summary = (r: Row): boolean => r.label.includes('(') || r.label === 'best';

/** The three tables of one reference set: estimates made directly, hydrates carried over from their anhydrous salt, and per basis. */
function tables(rs: readonly Row[]): string {
  const direct = rs.filter((r) => !carried(r) && !summary(r));
  const hydrates = rs.filter(carried);
  const bases = rs.filter(summary);
  return [
    'Each estimator on its own:',
    '',
    table(direct),
    ...(hydrates.length > 0 ? ['', "Hydrates without values of their own, from their anhydrous salt's anchored or model estimate and the difference rule:", '', table(hydrates)] : []),
    '',
    'Per basis (its most precise estimate for each salt) and `best` (the estimate `dissolve` returns):',
    '',
    table(bases),
  ].join('\n');
}

/** The charge type of a case, or its kind where it has none (hydrates apart, whatever their charge type). */
function kindOf(c: Case): string {
  return c.salt.kind !== 'ionic' ? 'non-electrolytes' : c.salt.water > 0 ? 'hydrates' : (chargeType(c.salt) ?? 'several kinds of ion');
}

function classOf(c: Case): string {
  return c.salt.kind !== 'ionic' ? '—' : saltIonClass(c.salt, dataset);
}

/** Whether an interval misses its reference by more than its own half-width on that side. */
function farMiss(e: Estimate, truth: number): boolean {
  return truth > e.high ? truth - e.high > e.high - e.value : truth < e.low ? e.low - truth > e.value - e.low : false;
}

interface Breakdown {
  label: string;
  cases: number;
  best: Row;
  /** The anchored basis alone (its most precise estimate per salt). */
  anchored: Row;
  /** Salts whose best interval misses its reference by more than its own half-width. */
  farMisses: string[];
}

function breakdown(label: string, cases: readonly Case[]): Breakdown {
  const best = cases.flatMap((c) => (c.best ? [{ e: c.best, truth: c.truth }] : []));
  const anchored = cases.flatMap((c) => {
    const e = c.estimates.find((x) => x.basis === 'anchored');
    return e ? [{ e, truth: c.truth }] : [];
  });
  const farMisses = cases.filter((c) => c.best && farMiss(c.best, c.truth)).map((c) => c.salt.formula);
  return { label, cases: cases.length, best: row(label, best), anchored: row(label, anchored), farMisses };
}

function breakdowns(cases: readonly Case[]): Breakdown[] {
  const out: Breakdown[] = [];
  for (const t of [...new Set(cases.map(kindOf))].sort()) {
    const ofType = cases.filter((c) => kindOf(c) === t);
    out.push(breakdown(t, ofType));
    const classes = [...new Set(ofType.map(classOf))].filter((k) => k !== '—');
    if (classes.length > 1) for (const k of saltIonClasses.filter((x) => classes.includes(x))) out.push(breakdown(`  ${t} · ${k}`, ofType.filter((c) => classOf(c) === k)));
  }
  return out;
}

/** MAE, coverage, undetermined and wrong shares of `best` by charge type and ion class, with the anchored basis's MAE beside. */
function byChargeType(cases: readonly Case[]): string {
  const lines = [
    '| salts | n | estimated | best MAE | anchored MAE (n) | 95 % coverage | missed by > half-width | undetermined | wrong |',
    '|---|---:|---:|---:|---:|---:|---:|---:|---:|',
  ];
  for (const b of breakdowns(cases)) {
    const label = b.label.startsWith('  ') ? `&nbsp;&nbsp;${b.label.trim()}` : `**${b.label}**`;
    const anchored = b.anchored.n > 0 ? `${kj(b.anchored.mae)} (${b.anchored.n})` : '—';
    lines.push(
      b.best.n > 0
        ? `| ${label} | ${b.cases} | ${b.best.n} | ${kj(b.best.mae)} | ${anchored} | ${pct(b.best.coverage)} | ${b.farMisses.length} | ${pct(b.best.undetermined)} | ${pct(b.best.wrong)} |`
        : `| ${label} | ${b.cases} | 0 | — | — | — | — | — | — |`,
    );
  }
  return lines.join('\n');
}

function worst(cases: readonly Case[], k = 12): string {
  const misses = cases
    .flatMap((c) => c.estimates.map((e) => ({ c, e, z: Math.abs(e.value - c.truth) / Math.max(1e-9, (e.high - e.low) / 2) })))
    .filter((m) => m.e.low > m.c.truth || m.c.truth > m.e.high)
    .sort((a, b) => b.z - a.z)
    .slice(0, k);
  if (misses.length === 0) return 'No estimate missed its reference value.';
  const lines = ['| salt | basis · method | estimate | 95 % interval | reference |', '|---|---|---:|---:|---:|'];
  for (const m of misses) lines.push(`| ${m.c.salt.formula} | ${m.e.basis} · ${m.e.method} | ${kj(m.e.value)} | ${kj(m.e.low)} … ${kj(m.e.high)} | ${kj(m.c.truth)} |`);
  return lines.join('\n');
}

const verdictWord = (ok: boolean): string => (ok ? 'met' : '**missed**');

/** Where single estimators fall short of 90 % coverage or exceed 2 % wrong verdicts, and which anchored ones are within 4 kJ/mol. */
function estimatorNotes(rs: readonly Row[]): string {
  const methods = rs.filter((r) => !summary(r));
  const lines: string[] = [];
  const met = methods.filter((r) => r.label.startsWith('anchored') && r.mae <= 4).map((r) => `${r.label} (${kj(r.mae)})`);
  if (met.length > 0) lines.push(`- Single anchored estimators within 4 kJ/mol: ${met.join(', ')}.`);
  const low = methods.filter((r) => r.coverage < 0.9).map((r) => `${r.label} (${pct(r.coverage)} of ${r.n})`);
  lines.push(low.length > 0 ? `- Single estimators below 90 % coverage: ${low.join(', ')}.` : '- Every single estimator reaches 90 % coverage.');
  const wrong = methods.filter((r) => r.wrong > 0.02).map((r) => `${r.label} (${pct(r.wrong)} of ${r.n})`);
  lines.push(wrong.length > 0 ? `- Single estimators above 2 % wrong verdicts: ${wrong.join(', ')}.` : '- No single estimator gives more than 2 % wrong verdicts.');
  return lines.join('\n');
}

/** The targets of the estimates for salts no table covers, on every hidden salt (both reference sets together), by charge type. */
function targets(cases: readonly Case[]): string {
  const lines: string[] = [];
  const byType = breakdowns(cases).filter((b) => !b.label.startsWith('  ') && b.label !== 'non-electrolytes');
  const oneOne = byType.find((b) => b.label === '1:1');
  if (oneOne) lines.push(`- 1:1 salts, anchored MAE ≤ 4 kJ/mol (the anchored basis, ${oneOne.anchored.n} salts): ${kj(oneOne.anchored.mae)} kJ/mol — ${verdictWord(oneOne.anchored.mae <= 4)}.`);
  for (const b of byType) {
    if (b.best.n === 0) continue;
    const far = b.farMisses.length > 0 ? `${b.farMisses.length} (${b.farMisses.join(', ')})` : 'none';
    let line = `- ${b.label} (${b.best.n} salts): 95 % coverage ${pct(b.best.coverage)} — ${verdictWord(b.best.coverage >= 0.9)}; intervals missing by more than their half-width: ${far} — ${verdictWord(b.farMisses.length === 0)}`;
    if (['2:1', '1:2', '2:2', '3:1', 'hydrates'].includes(b.label)) {
      line += `; MAE ${kj(b.best.mae)} kJ/mol — ${verdictWord(b.best.mae <= 8)}; undetermined ${pct(b.best.undetermined)} — ${verdictWord(b.best.undetermined <= 1 / 3)}; wrong verdicts ${pct(b.best.wrong)} — ${verdictWord(b.best.wrong <= 0.02)}`;
    }
    lines.push(`${line}.`);
  }
  return lines.join('\n');
}

function main(): void {
  const measured: Case[] = [];
  for (const record of dataset.records('solution-enthalpies.json')) {
    const salt = parseSalt(record.formula, dataset);
    const m = measuredSolutionEnthalpy(salt, dataset)!;
    measured.push(estimateCase(salt, m.value));
  }
  const measuredSet = new Set(measured.map((c) => c.salt.formula));
  const cycle: Case[] = [];
  for (const record of dataset.records('compound-formation.json')) {
    if (record.phase !== 'cr' || record.formula === 'H2O') continue;
    const salt = parseSalt(record.formula, dataset);
    if (measuredSet.has(salt.formula)) continue;
    const c = solutionEnthalpyFromCycle(salt, dataset);
    if (c) cycle.push(estimateCase(salt, c.value));
  }
  // The cycle basis cannot be left out of its own reference set; against the measured values it is checked with nothing hidden.
  const closure: { e: Estimate; truth: number }[] = [];
  for (const c of measured) {
    const e = solutionEnthalpyFromCycle(c.salt, dataset);
    if (e) closure.push({ e, truth: c.truth });
  }
  const closureRow = row('cycle · formation-enthalpies', closure);
  const measuredRows = rows(measured);
  const cycleRows = rows(cycle);
  const missingMeasured = measured.filter((c) => !c.best).map((c) => c.salt.formula);
  const missingCycle = cycle.filter((c) => !c.best).map((c) => c.salt.formula);

  const doc = `# Enthalpy of solution: leave-one-out validation

Written by \`npm run validate\` (src/node/scripts/validate.ts); do not edit by hand.

Each salt is estimated with its **own** measured enthalpy of solution and crystal formation enthalpy hidden
(\`dissolve(salt, { excludeMeasured: true })\`); the values of every other salt stay available, so each
estimate is one a user would get for a salt the tables did not cover. Errors are estimate − reference in
kJ/mol. "95 % coverage" is how often the estimate's 95 % interval holds the reference value. A verdict
is *right* when it names the sign of the reference value, *undetermined* when the interval spans zero,
*wrong* otherwise.

## Against measured values (CRC Handbook, after Parker 1965)

${measured.length} salts with a measured enthalpy of solution at infinite dilution (1:1 electrolytes, their hydrates, urea).
${missingMeasured.length > 0 ? `No estimate at all for ${missingMeasured.length}: ${missingMeasured.join(', ')}.` : 'Every salt got at least one estimate.'}

${tables(measuredRows)}

By kind of salt (\`best\`):

${byChargeType(measured)}

The cycle basis against the same measured values, nothing hidden (the NBS formation enthalpies and the CRC
enthalpies of solution are largely derived from one another, so this checks the tables' consistency and the
stated uncertainties more than an independent method):

${table([closureRow])}

## Against cycle values (NBS formation enthalpies) of salts without a measured value

${cycle.length} salts whose crystal and aqueous-ion formation enthalpies are tabulated but whose enthalpy of solution
is not in the measured table: 2:1, 1:2, 2:2 and 3:1 salts and the pack hydrates. The reference is the cycle value
Σν·ΔfH°(aq) + n_w·ΔfH°(H₂O, l) − ΔfH°(cr), good to about 1–2 kJ/mol; the crystal value is hidden from the estimators.
${missingCycle.length > 0 ? `No estimate at all for ${missingCycle.length}: ${missingCycle.join(', ')}.` : 'Every salt got at least one estimate.'}

${tables(cycleRows)}

By kind of salt (\`best\`):

${byChargeType(cycle)}

## Largest misses (outside the 95 % interval)

Against measured values:

${worst(measured)}

Against cycle values:

${worst(cycle)}

## Targets of the issue

On every hidden salt, both reference sets together (\`best\`, by charge type; hydrates apart):

${targets([...measured, ...cycle])}
- 95 % coverage ≥ 90 % (cycle basis against measured values, nothing hidden): ${pct(closureRow.coverage)} — ${verdictWord(closureRow.coverage >= 0.9)}; wrong verdicts: ${pct(closureRow.wrong)}.

All hidden salts by charge type and ion class (\`best\`):

${byChargeType([...measured, ...cycle])}

Single estimators, measured set:

${estimatorNotes(measuredRows)}

Single estimators, cycle set:

${estimatorNotes(cycleRows)}

## Why targets are missed

- **1:1 anchored MAE (4 kJ/mol aimed for).** The four-salt difference assumes that a lattice model's error is
  additive over the ions. It nearly is for the alkali halides (the monatomic 1:1 salts, about 2 kJ/mol), but not
  for salts of Ag⁺, Tl⁺ and Cu⁺ (covalent bonding, about 20 kJ/mol), Li⁺ (anion contact) or polyatomic anions
  unlike their neighbours (LiOH, LiBrO₃, KClO₃, KOCN miss by 10–35 kJ/mol). The tables hold few close relatives
  of such salts to anchor on.
- **MAE of the 2:1, 1:2, 2:2 and 3:1 salts (8 kJ/mol aimed for).** Where a salt has anchors of its own charge
  type the anchored basis misses by about 7–14 kJ/mol: the lattice brackets of multiply charged salts do not
  cancel as well, even scaled. Salts with no relative of their own charge type (FeCl₂, ZnCl₂, CoSO₄, NiSO₄,
  Mg(ClO₄)₂, (NH₄)₂SO₄, Al₂(SO₄)₃) are estimated from sets spanning charge types with Kapustinskii differences
  (method \`anchored-cross-kapustinskii\`), with their own, wider floors. Those with no usable relative at all
  (HgCl₂, SnCl₂, BeCl₂, Na₂S, ZnS, Na₃PO₄: no other salt of the cation, or none that bonds alike) fall back to
  the model basis, whose misses run to hundreds of kJ/mol; they dominate the MAE of \`best\`.
- **Undetermined verdicts (a third aimed for).** Many of these salts dissolve with |ΔsolH°| below 20 kJ/mol
  while their anchored intervals are ±15–40 kJ/mol wide, so the interval spans zero. The spread is scaled down
  where the pool shows it overstating the misses (1:2, 2:1, 2:2); narrowing further without losing coverage
  would need closer anchors than the tables hold. Hydrates mostly come from the difference rule, whose
  scatter grows as √Δn (±30–70 kJ/mol for the decahydrates and dodecahydrates).
- **Coverage.** The intervals are calibrated leave-one-salt-out on the anchor pool, so they hold about 95 %
  overall, but a charge type of a few salts falls short when one or two of them are unlike the rest (Ag₂SO₄
  and Na₂S among the 1:2 salts), and a few 1:1 salts with polyatomic anions unlike their neighbours (LiOH,
  LiBrO₃, KClO₃, CsClO₄) fall just outside. Widening the anchored intervals to hold model-basis estimates that
  disagree with them was measured and not done: in every such disagreement the anchored interval held the
  reference and the model estimate was the one off.
`;
  const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
  const out = join(root, 'docs', 'solution-validation.md');
  mkdirSync(dirname(out), { recursive: true });
  writeFileSync(out, doc);
  process.stdout.write(`${table(measuredRows)}\n\n${table(cycleRows)}\n\nwrote ${out}\n`);
}

main();
