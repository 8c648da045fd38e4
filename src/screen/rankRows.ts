import type { Direction, ObjectiveName, ScreenRow, Suitability } from './screenRow.js';
import { higherIsBetter, WARMER_OBJECTIVES } from './screenObjective.js';

const GROUP: Record<Suitability, number> = { suitable: 0, undetermined: 1, unsuitable: 2 };

/** The rows that take part in a ranking: computed, with an objective. */
export function isRankable(row: ScreenRow): row is ScreenRow & { objective: NonNullable<ScreenRow['objective']>; suitability: Suitability } {
  return row.status === 'computed' && row.objective !== undefined && row.suitability !== undefined;
}

/** What ranking reads of a row (a table writer may keep only this and its cells). */
export type RankKey = Pick<ScreenRow, 'line' | 'suitability'> & { objective?: { value: number } | undefined };

/**
 * Orders two rankable rows: salts that suit the direction first, then those
 * whose verdict is undetermined, then those that work the other way; within
 * each group by the objective value, best first; ties by input line. A
 * warmer objective does not group by the dissolution verdict, which says
 * nothing about a melt that crystallises.
 */
export function compareRanked(a: RankKey, b: RankKey, objective: ObjectiveName, direction: Direction): number {
  const sign = higherIsBetter(objective, direction) ? -1 : 1;
  const group = WARMER_OBJECTIVES.has(objective) ? 0 : GROUP[a.suitability!] - GROUP[b.suitability!];
  return group || sign * (a.objective!.value - b.objective!.value) || a.line - b.line;
}

/**
 * The rows in input order, each computed row with an objective given its
 * `rank` (1 = best; see {@link compareRanked}). Rows are copied, not changed.
 *
 * @example
 * ```ts
 * const { rows } = screen(['NaCl', 'KNO3', 'NH4Cl']);
 * rankRows(rows, 'enthalpy', 'cool').map((r) => r.rank); // [3, 1, 2]
 * ```
 */
export function rankRows(rows: readonly ScreenRow[], objective: ObjectiveName, direction: Direction): ScreenRow[] {
  const order = rows.filter(isRankable).sort((a, b) => compareRanked(a, b, objective, direction));
  const rankOf = new Map<ScreenRow, number>(order.map((r, i) => [r, i + 1]));
  return rows.map((r) => {
    const { rank: _old, ...rest } = r;
    const rank = rankOf.get(r);
    return rank === undefined ? rest : { ...rest, rank };
  });
}
