import type { Dataset } from '../../data/dataset.js';
import { VERDICT_WORDS, perGramText as perGram } from './dissolveWords.js';
import { formatSalt } from '../../chem/formatSalt.js';
import { roundEstimate, type Estimate } from '../../quantity/estimate.js';
import { dissolve, type DissolveResult } from '../../solution/dissolve.js';
import { integralEnthalpyOfSolution } from '../../solution/integralEnthalpy.js';
import { numberOption, readArgs } from './args.js';
import { userSourceOf } from '../../solution/userValueCheck.js';
import type { Command } from './command.js';
import { textTable } from './textTable.js';
import { bulletLines } from './paragraphs.js';
import { cautionLine } from '../../quantity/caution.js';
import { outputWidth } from './io.js';
import { formatNumber, withTrueMinus } from '../../notation/minus.js';
import { wrapText } from '../../notation/wrapText.js';

const rounded = (e: Estimate | undefined): Estimate | undefined => (e ? roundEstimate(e) : undefined);

/** The JSON contract of `ionheat dissolve --json`. */
function toJson(r: DissolveResult, integral: { molality: number; estimate: Estimate } | undefined) {
  const i = integral ? roundEstimate(integral.estimate) : undefined;
  return {
    formula: r.formula,
    best: rounded(r.best),
    estimates: r.estimates.map((e) => roundEstimate(e)),
    verdict: r.verdict,
    probabilityEndothermic: Math.round(r.probabilityEndothermic * 1e4) / 1e4,
    perGram: { salt: rounded(r.perGram.salt), ...(r.perGram.saturatedFill ? { saturatedFill: rounded(r.perGram.saturatedFill) } : {}) },
    ...(r.hydration ? { hydration: { absolute: rounded(r.hydration.absolute) ?? null, conventional: rounded(r.hydration.conventional) ?? null } } : {}),
    temperature: { celsius: r.temperature.celsius, heatCapacityOfSolution: rounded(r.temperature.heatCapacityOfSolution) ?? null },
    ...(integral && i ? { integral: { molality: integral.molality, value: i.value, low: i.low, high: i.high, unit: 'kJ/mol', basis: i.basis, method: i.method, sources: i.sources } } : {}),
    ...(r.hypotheticalHydrate ? { hypotheticalHydrate: r.hypotheticalHydrate } : {}),
    ...(r.suspectedTypo ? { suspectedTypo: r.suspectedTypo } : {}),
    molarMass: r.salt.molarMass,
    notes: r.notes,
    cautions: r.cautions,
  };
}

const signed = (x: number): string => formatNumber(x, { plus: true });

function line(e: Estimate, dataset: Dataset): string[] {
  const r = roundEstimate(e);
  const mine = userSourceOf(e, dataset);
  return [mine ? `${r.basis} (your value)` : r.basis, r.method, `${signed(r.value)} ± ${r.u}`, `${signed(r.low)} … ${signed(r.high)}`];
}

/** `measured, table`, or `your value from my-values.json (myLab)` where a user's own value is in use. */
function basisText(e: Estimate, dataset: Dataset): string {
  const mine = userSourceOf(e, dataset);
  return mine ? `${e.basis}, your value: ${e.sources.join(', ')} in ${mine}` : `${e.basis}, ${e.method}`;
}


/** `ionheat dissolve <formula>`: the enthalpy of solution with its basis and verdict. */
export const dissolveCommand: Command = {
  usage: [
    'ionheat dissolve <formula> [--exclude-measured] [--temperature <°C>] [--molality <mol/kg>] [--json]',
    '',
    '  <formula>            e.g. "NH4NO3", "CaCl2·6H2O", "urea"',
    "  --exclude-measured   hide the salt's own measured enthalpy of solution and crystal formation enthalpy",
    '  --temperature <°C>   give values at this temperature, 0–40 °C (default 25), by a Kirchhoff correction',
    '  --molality <mol/kg>  also give the integral enthalpy of solution to this molality (0–30; mol of salt per kg of water)',
    '  --json               print one JSON object: formula, best, estimates, verdict, probabilityEndothermic, perGram, …',
  ].join('\n'),
  async run(argv, { io, dataset }) {
    const { values, positionals } = readArgs(
      argv,
      { json: { type: 'boolean' }, 'exclude-measured': { type: 'boolean' }, temperature: { type: 'string' }, molality: { type: 'string' } },
      { min: 1, max: 1, names: 'the formula' },
    );
    const temperatureC = numberOption(values.temperature, 'temperature');
    const r = dissolve(positionals[0]!, { excludeMeasured: values['exclude-measured'] === true, ...(temperatureC !== undefined ? { temperatureC } : {}) }, dataset);
    const molality = numberOption(values.molality, 'molality');
    const integral = molality !== undefined ? { molality, estimate: integralEnthalpyOfSolution(r.salt, molality, temperatureC ?? 25, dataset) } : undefined;
    if (values.json) {
      io.stdout(JSON.stringify(toJson(r, integral), null, 2) + '\n');
      return 0;
    }
    const best = roundEstimate(r.best);
    const out: string[] = [];
    out.push(`${formatSalt(r.salt, { style: 'unicode' })}  (${r.salt.molarMass.toFixed(2)} g/mol)`);
    // Said second: every number below is that of the salt as read, not of the one probably meant.
    if (r.suspectedTypo) out.push(`Suspected typo: ${r.suspectedTypo.message}. The numbers below are those of ${r.formula}.`);
    if (r.hypotheticalHydrate) {
      // Said first: every number below extrapolates the hydrate rule to a solid no table lists.
      const h = r.hypotheticalHydrate;
      const known = h.knownWaters.length > 0 ? `known forms: ${h.knownWaters.map((w) => (w === 0 ? 'anhydrous' : `·${w}H₂O`)).join(', ')}` : 'no form of this salt is known to the tables';
      out.push(`Hypothetical hydrate (${h.reason}; ${known}): the numbers below extrapolate the hydrate rule and describe no real solid.`);
    }
    out.push(`Enthalpy of solution at infinite dilution, ${r.temperature.celsius} °C: ${signed(best.value)} ± ${best.u} kJ/mol (${basisText(r.best, dataset)}); 95 % interval ${signed(best.low)} … ${signed(best.high)}`);
    if (integral) {
      const i = roundEstimate(integral.estimate);
      out.push(`Integral enthalpy of solution to ${integral.molality} mol/kg, ${r.temperature.celsius} °C: ${signed(i.value)} ± ${i.u} kJ/mol (${i.method}); 95 % interval ${signed(i.low)} … ${signed(i.high)}`);
    }
    out.push(`Verdict: ${VERDICT_WORDS[r.verdict]}; P(endothermic) = ${r.probabilityEndothermic.toFixed(3)}`);
    out.push(perGram(r.perGram.salt, 'salt'));
    if (r.perGram.saturatedFill) out.push(perGram(r.perGram.saturatedFill, 'a saturated fill (salt + water at 25 °C)'));
    out.push('', 'Every estimate (kJ/mol, + = endothermic; ± is one standard uncertainty):', '');
    io.stdout(out.flatMap((l) => (l === '' ? [''] : wrapText(withTrueMinus(l), outputWidth(io), '', '  '))).join('\n') + '\n');
    io.stdout(textTable(['basis', 'method', 'value', '95 % interval'], r.estimates.map((e) => line(e, dataset)), new Set([2, 3])));
    const tail: string[] = [];
    if (r.hydration?.absolute) {
      const h = roundEstimate(r.hydration.absolute);
      tail.push(`Hydration enthalpy of the ions, Σν·ΔhydH°: ${formatNumber(h.value)} ± ${h.u} kJ/mol (${h.method})`);
    }
    const notes = [...new Set([...r.notes, ...r.best.notes])];
    if (notes.length > 0) tail.push('', 'Notes:', ...bulletLines(notes, outputWidth(io)));
    tail.push('', 'Cautions:', ...bulletLines(r.cautions.map(cautionLine), outputWidth(io)));
    io.stdout('\n' + tail.join('\n') + '\n');
    return 0;
  },
};
