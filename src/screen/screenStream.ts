/**
 * `screenStream`: {@link screen} for inputs too large to hold in memory.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { CandidateLike } from './candidate.js';
import { createScreener, type ScreenOptions } from './createScreener.js';
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
  const screener = createScreener(options, dataset);
  for await (const candidate of candidates) yield screener.row(candidate);
  return screener.summary();
}
