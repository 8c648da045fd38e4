/**
 * A candidate's own measured enthalpy of solution, applied to its `dissolve`
 * result without building a whole merged dataset for it.
 *
 * Merging one record over the tables with {@link Dataset.withOverrides}
 * gives a new dataset whose indexes and calibrations are all rebuilt on
 * first use — about a tenth of a second, per candidate. The cheaper path
 * here gives the same result for the row (a test compares the two):
 *
 * - the measured estimate is built by {@link measuredSolutionEnthalpy} from a
 *   one-record solution table merged (through `withOverrides`, so the record
 *   passes the same schema and source checks) over a dataset holding only
 *   the ion and element tables, which is cheap to index;
 * - it becomes `best`, ahead of the salt's other estimates from the
 *   unchanged tables (the cycle, the difference rule, the anchored and model
 *   estimates do not use the salt's own measured enthalpy of solution), and
 *   the verdict and heats per gram are read from it as `dissolve` does.
 *
 * Nothing is written anywhere: the built-in tables are frozen, and the
 * result is new objects around shared, frozen estimates.
 *
 * @module
 */
import { mergeOverrides } from '../data/recordCheck.js';
import { measuredValueDisagreement } from '../solution/userValueCheck.js';
import { Dataset } from '../data/dataset.js';
import type { SourceEntry } from '../data/schemas.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError } from '../error.js';
import type { Estimate } from '../quantity/estimate.js';
import type { DissolveResult } from '../solution/dissolve.js';
import { saturatedFill } from '../solution/heatPerGram.js';
import { perGramOf } from '../solution/dissolve.js';
import { measuredSolutionEnthalpy } from '../solution/measuredSolution.js';
import { solutionVerdict } from '../solution/verdict.js';

/** A measured value given with a candidate. */
export interface OwnMeasurement {
  /** kJ/mol, positive = endothermic. */
  value: number;
  /** Standard uncertainty, kJ/mol; undefined = the solution-enthalpy table's default. */
  u: number | undefined;
  /** Source key. */
  source: string;
  /** The citation, when the key is not one of the dataset's. */
  citation?: SourceEntry;
}

/** How a candidate's own values are named, as the label of the dataset they are merged into. */
export const OWN_MEASUREMENT_LABEL = 'screening input';

/**
 * The measured estimate of a candidate's own value, exactly as the tables'
 * `measured` basis would give it for a record of that value.
 *
 * @param tableFormula - the formula as the record should be keyed (the table's own spelling, where it has the salt)
 */
export function ownMeasuredEstimate(salt: Salt, tableFormula: string, own: OwnMeasurement, dataset: Dataset): Estimate {
  const solutionTable = dataset.table('solution-enthalpies.json');
  const ions = dataset.table('ions.json');
  const elements = dataset.table('elements.json');
  if (!solutionTable || !ions || !elements) throw new IonheatError('MISSING_DATA', `the ${dataset.label} tables lack the ion, element or solution-enthalpy table`, {});
  const small = new Dataset({ 'ions.json': ions, 'elements.json': elements, 'solution-enthalpies.json': { ...solutionTable, records: [] } }, dataset.sources, dataset.label);
  const record = { formula: tableFormula, value: own.value, unit: 'kJ/mol', uncertainty: own.u ?? null, source: own.source, fromMemory: false, note: 'given with the candidate in the screening input' };
  const merged = mergeOverrides(small, { 'solution-enthalpies.json': [record] }, OWN_MEASUREMENT_LABEL, own.citation ? { [own.source]: own.citation } : {});
  const measured = measuredSolutionEnthalpy(salt, merged);
  if (!measured) throw new IonheatError('INVALID_ARGUMENT', `measuredEnthalpy: the value given for ${salt.formula} could not be matched to the salt`, { field: 'measuredEnthalpy' });
  return measured;
}

/**
 * The `dissolve` result of a salt with its own measured value in place of
 * the table's: that value as `best` and first of the estimates (any tabulated
 * measured value of the salt dropped), the verdict, the probability of an
 * endothermic dissolution and the heats per gram read from it.
 *
 * @param result - `dissolve` of the salt over the unchanged tables
 * @param measured - from {@link ownMeasuredEstimate}
 */
export function withOwnMeasurement(result: DissolveResult, measured: Estimate, dataset: Dataset): DissolveResult {
  const salt = result.salt;
  const others = result.estimates.filter((e) => !(e.basis === 'measured' && e.method === measured.method));
  // As dissolve over a merged dataset would say it: the candidate's value against the other bases.
  const disagreement = measuredValueDisagreement(measured, others, OWN_MEASUREMENT_LABEL);
  return {
    ...result,
    ...(disagreement ? { notes: [...result.notes, disagreement] } : {}),
    best: measured,
    estimates: [measured, ...others],
    ...solutionVerdict(measured),
    perGram: perGramOf(measured, salt, saturatedFill(salt, dataset), dataset),
  };
}
