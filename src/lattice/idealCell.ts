/**
 * Unit cells of the ideal cubic (and ideal wurtzite) structure types, as
 * point charges for {@link ewaldMadelung}.
 *
 * @module
 */
import type { StructureType } from '../data/schemas.js';
import { isTerm, STRUCTURE_TYPES } from '../data/tableTerms.js';
import { IonheatError } from '../error.js';
import { describeValue } from '../quantity/argumentChecks.js';
import type { PointChargeCell, Vec3 } from './ewaldMadelung.js';

const FCC: readonly Vec3[] = [
  [0, 0, 0],
  [0, 0.5, 0.5],
  [0.5, 0, 0.5],
  [0.5, 0.5, 0],
];
const shift = (list: readonly Vec3[], d: Vec3): Vec3[] => list.map((p): Vec3 => [p[0] + d[0], p[1] + d[1], p[2] + d[2]]);
const CUBE: PointChargeCell['lattice'] = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
];

/** Structure types whose ideal cell {@link idealCell} builds. */
export const idealCellTypes = ['rock-salt', 'caesium-chloride', 'zinc-blende', 'wurtzite', 'fluorite', 'antifluorite', 'perovskite'] as const;

/**
 * The conventional cell of an ideal structure type, lattice parameter 1,
 * with unit-charge-pattern charges: MX types +1/−1; fluorite M²⁺ and 2 X⁻;
 * antifluorite 2 M⁺ and X²⁻; perovskite A⁺ B²⁺ 3 X⁻ (the KMgF₃ pattern);
 * wurtzite hexagonal with the ideal c/a = √(8/3) and u = 3/8. Atomic
 * positions are those of the standard descriptions of the types (common
 * practice; Wyckoff, Crystal Structures).
 *
 * @param type - one of {@link idealCellTypes}
 * @returns fractional site positions and charges in a cell of lattice parameter 1 (dimensionless)
 * @throws IonheatError `NOT_APPLICABLE` for the types whose geometry needs measured parameters (rutile, cadmium iodide, cadmium chloride, corundum)
 * @see Wyckoff, Crystal Structures, 2nd ed. (1963), source key `wyckoff1963`, for the site positions;
 *   the Madelung constants they give are checked against the CRC table, `crcMadelung`.
 *
 * @example
 * ```ts
 * ewaldMadelung(idealCell('rock-salt')).madelung; // 1.747565
 * ewaldMadelung(idealCell('caesium-chloride')).madelung; // 1.762675
 * idealCell('fluorite').sites.length; // 12
 * ```
 */
export function idealCell(type: StructureType): PointChargeCell {
  if (!isTerm(STRUCTURE_TYPES, type)) throw new IonheatError('INVALID_ARGUMENT', `${describeValue(type)} is not a structure type ionheat knows (known: ${STRUCTURE_TYPES.join(', ')})`, { field: 'structure' });
  const sites = (list: readonly Vec3[], charge: number) => list.map((position) => ({ position, charge }));
  switch (type) {
    case 'rock-salt':
      return { lattice: CUBE, sites: [...sites(FCC, 1), ...sites(shift(FCC, [0.5, 0, 0]), -1)] };
    case 'caesium-chloride':
      return { lattice: CUBE, sites: [...sites([[0, 0, 0]], 1), ...sites([[0.5, 0.5, 0.5]], -1)] };
    case 'zinc-blende':
      return { lattice: CUBE, sites: [...sites(FCC, 1), ...sites(shift(FCC, [0.25, 0.25, 0.25]), -1)] };
    case 'fluorite':
      return { lattice: CUBE, sites: [...sites(FCC, 2), ...sites(shift(FCC, [0.25, 0.25, 0.25]), -1), ...sites(shift(FCC, [0.75, 0.75, 0.75]), -1)] };
    case 'antifluorite':
      return { lattice: CUBE, sites: [...sites(FCC, -2), ...sites(shift(FCC, [0.25, 0.25, 0.25]), 1), ...sites(shift(FCC, [0.75, 0.75, 0.75]), 1)] };
    case 'perovskite':
      return {
        lattice: CUBE,
        sites: [
          ...sites([[0, 0, 0]], 1),
          ...sites([[0.5, 0.5, 0.5]], 2),
          ...sites(
            [
              [0.5, 0.5, 0],
              [0.5, 0, 0.5],
              [0, 0.5, 0.5],
            ],
            -1,
          ),
        ],
      };
    case 'wurtzite': {
      const c = Math.sqrt(8 / 3);
      const u = 3 / 8;
      return {
        lattice: [
          [1, 0, 0],
          [-0.5, Math.sqrt(3) / 2, 0],
          [0, 0, c],
        ],
        sites: [
          ...sites(
            [
              [1 / 3, 2 / 3, 0],
              [2 / 3, 1 / 3, 0.5],
            ],
            1,
          ),
          ...sites(
            [
              [1 / 3, 2 / 3, u],
              [2 / 3, 1 / 3, 0.5 + u],
            ],
            -1,
          ),
        ],
      };
    }
    default:
      throw new IonheatError('NOT_APPLICABLE', `the ${type} structure has no ideal geometry: its Madelung constant depends on measured cell parameters (give the cell to ewaldMadelung)`, { field: 'structure', text: type });
  }
}
