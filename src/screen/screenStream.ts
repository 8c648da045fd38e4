/**
 * `screenStream`: {@link screen} for inputs too large to hold in memory.
 *
 * @module
 */
import { describeValue } from '../quantity/argumentChecks.js';
import { IonheatError } from '../error.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { CandidateLike } from './candidate.js';
import { candidateListError, createScreener, type ScreenOptions } from './createScreener.js';
import type { ScreenRow, ScreenSummary } from './screenRow.js';

/**
 * Screens candidates as they arrive and yields one row per candidate, in
 * input order, without holding the input or the output: memory stays flat
 * however long the input is (results for repeated formulas come from a
 * bounded cache). Rows carry no `rank`, which needs every row; rank them
 * afterwards with `rankRows` if you keep them. The generator's return
 * value is the summary of the run.
 *
 * @param candidates - any iterable or async iterable of candidates (see {@link screen})
 * @param options - as for {@link screen}
 * @param dataset - the tables every row is computed from (default: built-in)
 * @see the bases and their sources as in {@link dissolve} (`crcSolution`, `parker1965`, `wagman1982`, `marcus1997`,
 *   `jenkinsGlasser2004`); hazards from the hazards table (`clpAnnexVI`, `eu2019_1148`, …); docs/methods.md, "Screening".
 *
 * @example
 * ```ts
 * async function* lines() { yield 'KNO3'; yield 'NH4Cl'; yield 'CaCl2·6H2O'; }
 * const formulas = [];
 * for await (const row of screenStream(lines(), { spec: 'verdict == "endothermic"' })) formulas.push(`${row.formula} ${row.spec.holds}`);
 * formulas; // ['KNO3 true', 'NH4Cl true', 'CaCl2·6H2O true']
 * ```
 */
export async function* screenStream(
  candidates: Iterable<CandidateLike> | AsyncIterable<CandidateLike>,
  options: ScreenOptions = {},
  dataset: Dataset = builtinDataset(),
): AsyncGenerator<ScreenRow, ScreenSummary, undefined> {
  let iterable: boolean;
  try {
    iterable = candidates !== null && typeof candidates === 'object' && (typeof (candidates as AsyncIterable<CandidateLike>)[Symbol.asyncIterator] === 'function' || typeof (candidates as Iterable<CandidateLike>)[Symbol.iterator] === 'function');
  } catch (e) {
    throw candidateListError(e);
  }
  if (!iterable) throw new IonheatError('INVALID_ARGUMENT', `the candidates of a screen are a list or stream of formulas or candidate objects, got ${describeValue(candidates)}`, { field: 'candidates' });
  const screener = createScreener(options, dataset);
  const asyncSource = typeof (candidates as AsyncIterable<CandidateLike>)[Symbol.asyncIterator] === 'function';
  let iterator: AsyncIterator<CandidateLike> | Iterator<CandidateLike>;
  try {
    iterator = asyncSource ? (candidates as AsyncIterable<CandidateLike>)[Symbol.asyncIterator]() : (candidates as Iterable<CandidateLike>)[Symbol.iterator]();
  } catch (e) {
    throw candidateListError(e);
  }
  for (;;) {
    let next: IteratorResult<CandidateLike>;
    try {
      next = await iterator.next();
    } catch (e) {
      throw candidateListError(e);
    }
    if (next.done) break;
    yield screener.row(next.value);
  }
  return screener.summary();
}
