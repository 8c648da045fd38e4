/**
 * The Salt panel: `dissolve` of one formula, shown as `ionheat dissolve`
 * says it (the same verdict words, heat per gram and cautions), with every
 * basis as a chart.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { formatSalt } from '../chem/formatSalt.js';
import { dissolve } from '../solution/dissolve.js';
import { integralEnthalpyOfSolution } from '../solution/integralEnthalpy.js';
import { userSourceOf } from '../solution/userValueCheck.js';
import { basisChart } from '../render/basisChart.js';
import { VERDICT_WORDS, perGramWords } from '../node/cli/dissolveWords.js';
import { estimateQuantity, panelView, shown, type PanelView, type Quantity } from './view.js';
import type { Estimate } from '../quantity/estimate.js';

/** What the Salt panel asks. */
export interface SaltRequest {
  formula: string;
  /** °C, 0–40 (default 25). */
  temperatureC?: number;
  /** mol/kg, for the integral enthalpy of solution (none when absent). */
  molality?: number;
  excludeMeasured?: boolean;
}

function perGramQuantity(e: Estimate, what: string, path: string): Quantity {
  const w = perGramWords(e, what);
  return { label: w.lead, value: { text: w.magnitude, path: `${path}.value`, magnitude: true }, u: { text: w.u, path: `${path}.u` }, unit: 'J/g', ...(w.tail ? { words: w.tail.trim() } : {}) };
}

/** The Salt panel's view of a formula. */
export function saltView(request: SaltRequest, dataset: Dataset): PanelView {
  const r = dissolve(request.formula, { excludeMeasured: request.excludeMeasured === true, ...(request.temperatureC !== undefined ? { temperatureC: request.temperatureC } : {}) }, dataset);
  const view = panelView(`${formatSalt(r.salt, { style: 'unicode' })}  (${r.salt.molarMass.toFixed(2)} g/mol)`);
  view.cautions.push(...r.cautions);
  if (r.hypotheticalHydrate) {
    const h = r.hypotheticalHydrate;
    const known = h.knownWaters.length > 0 ? `known forms: ${h.knownWaters.map((w) => (w === 0 ? 'anhydrous' : `·${w}H₂O`)).join(', ')}` : 'no form of this salt is known to the tables';
    view.lines.push(`Hypothetical hydrate (${h.reason}; ${known}): the numbers below extrapolate the hydrate rule and describe no real solid.`);
  }
  const mine = userSourceOf(r.best, dataset);
  view.lines.push(`Verdict: ${VERDICT_WORDS[r.verdict]}; P(endothermic) = ${r.probabilityEndothermic.toFixed(3)}`);
  view.lines.push(`Best basis: ${mine ? `${r.best.basis}, your value: ${r.best.sources.join(', ')} in ${mine}` : `${r.best.basis}, ${r.best.method}`}`);
  view.quantities.push(estimateQuantity(`Enthalpy of solution at infinite dilution, ${r.temperature.celsius} °C`, r.best, 'best', 'kJ/mol', { signed: true, strong: true }));
  if (request.molality !== undefined) {
    const i = integralEnthalpyOfSolution(r.salt, request.molality, request.temperatureC ?? 25, dataset);
    view.quantities.push(estimateQuantity(`Integral enthalpy of solution to ${request.molality} mol/kg, ${r.temperature.celsius} °C`, i, 'integral', 'kJ/mol', { signed: true, words: i.method }));
  }
  view.quantities.push(perGramQuantity(r.perGram.salt, 'salt', 'perGram.salt'));
  if (r.perGram.saturatedFill) view.quantities.push(perGramQuantity(r.perGram.saturatedFill, 'a saturated fill (salt + water at 25 °C)', 'perGram.saturatedFill'));
  view.quantities.push({ label: 'P(endothermic)', value: shown(r.probabilityEndothermic, 'probabilityEndothermic', 3), unit: '' });
  view.tables.push({
    caption: 'Every estimate (kJ/mol, + = endothermic; ± is one standard uncertainty)',
    header: ['basis', 'method', 'value', '±', '95 % low', '95 % high'],
    numeric: [2, 3, 4, 5],
    rows: r.estimates.map((e, k) => {
      const q = estimateQuantity('', e, `estimates.${k}`, 'kJ/mol', { signed: true });
      return [userSourceOf(e, dataset) ? `${e.basis} (your value)` : e.basis, e.method, q.value, q.u!, q.low!, q.high!];
    }),
  });
  view.charts.push({ title: 'Every basis with its 95 % interval', svg: basisChart(r) });
  if (r.hydration?.absolute) view.quantities.push(estimateQuantity(`Hydration enthalpy of the ions, Σν·ΔhydH° (${r.hydration.absolute.method})`, r.hydration.absolute, 'hydration.absolute', 'kJ/mol'));
  // A suspected typo is among the cautions already.
  view.notes.push(...[...new Set([...r.notes, ...r.best.notes])].filter((n) => n !== r.suspectedTypo?.message));
  return view;
}
