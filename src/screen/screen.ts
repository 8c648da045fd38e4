/**
 * `screen`: rank candidate salts for a hot or cold pack.
 *
 * @module
 */
import { describeValue } from '../quantity/argumentChecks.js';
import { IonheatError } from '../error.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { CandidateLike } from './candidate.js';
import { candidateListError, createScreener, type ScreenOptions } from './createScreener.js';
import { rankRows } from './rankRows.js';
import type { ScreenRow, ScreenSettings, ScreenSummary } from './screenRow.js';

/** What {@link screen} returns. */
export interface ScreenResult {
  settings: ScreenSettings;
  /** One row per candidate, in input order, ranked rows with their `rank`. */
  rows: ScreenRow[];
  summary: ScreenSummary;
}

/**
 * Screens candidate salts: for each candidate its `dissolve` result (the
 * enthalpy of solution on the most trusted basis, every estimate, the
 * verdict, the heat per gram), its hazard classes, whether it suits the
 * direction, the objective to rank by and, where a price is given, the cost
 * per kJ. Every candidate gives exactly one row, in input order: a candidate
 * that cannot be computed carries its error, one left out by a filter says
 * which, and the summary counts them all. Rows that are computed get a
 * `rank`: salts that suit the direction first, then undetermined ones, then
 * those that work the other way, each group by the objective.
 *
 * A candidate is a formula (`'KNO3'`), a parsed salt (from {@link enumerate})
 * or an object with a `formula` and any of `measuredEnthalpy` (kJ/mol),
 * `measuredUncertainty` (kJ/mol), `solubility` (g per 100 g of water),
 * `pricePerKg`, `source` and `note`. A measured enthalpy given with a
 * candidate is merged over the tables for that candidate only
 * ({@link Dataset.withOverrides}); the tables themselves never change.
 *
 * Rows are plain JSON-serialisable objects. Candidates with the same
 * formula share their results, which are frozen: copy a row's parts before
 * changing them. For inputs too large to hold, use {@link screenStream}.
 *
 * @param candidates - formulas, salts or candidate rows (enthalpies in kJ/mol, solubility in g per 100 g water)
 * @param options - objective, direction, spec, filters, excludeMeasured, extra sources, standard fill (g, g, °C)
 * @param dataset - the tables every row is computed from (default: built-in)
 * @see the bases and their sources as in {@link dissolve} (`crcSolution`, `parker1965`, `wagman1982`, `marcus1997`,
 *   `jenkinsGlasser2004`); hazards from the hazards table (`clpAnnexVI`, `eu2019_1148`, …); docs/methods.md, "Screening".
 * @throws IonheatError for a bad option or spec (a bad candidate gives a failed row instead)
 * @example
 * ```ts
 * const result = screen(['NH4NO3', 'KNO3', 'NaCl', 'Xy'], { spec: 'best.low > 10' });
 * result.rows.map((r) => r.rank ?? r.status); // [2, 1, 3, 'failed']
 * result.rows[1].best.value; // 34.89 kJ/mol (CRC, measured)
 * result.rows[2].spec.holds; // false (3.88 kJ/mol is not above 10)
 * result.summary.failed; // 1
 * ```
 */
export function screen(candidates: Iterable<CandidateLike>, options: ScreenOptions = {}, dataset: Dataset = builtinDataset()): ScreenResult {
  let iterable: boolean;
  try {
    iterable = candidates !== null && typeof candidates === 'object' && typeof (candidates as Iterable<CandidateLike>)[Symbol.iterator] === 'function';
  } catch (e) {
    throw candidateListError(e);
  }
  if (!iterable) {
    throw new IonheatError('INVALID_ARGUMENT', `the candidates of a screen are a list of formulas or candidate objects, got ${describeValue(candidates)}`, { field: 'candidates' });
  }
  const screener = createScreener(options, dataset);
  const rows: ScreenRow[] = [];
  let iterator: Iterator<CandidateLike>;
  try {
    iterator = candidates[Symbol.iterator]();
  } catch (e) {
    throw candidateListError(e);
  }
  for (;;) {
    let next: IteratorResult<CandidateLike>;
    try {
      next = iterator.next();
    } catch (e) {
      throw candidateListError(e);
    }
    if (next.done) break;
    rows.push(screener.row(next.value));
  }
  return { settings: screener.settings, rows: rankRows(rows, screener.settings.objective, screener.settings.direction), summary: screener.summary() };
}
