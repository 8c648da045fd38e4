/**
 * The salt model: what a written formula means once it has been decomposed
 * into the ions of the table.
 *
 * @module
 */
import { isIssuedSalt } from './issuedSalts.js';
import { IonheatError } from '../error.js';
import type { Salt } from './saltSchema.js';

export type { Salt, SaltIon } from './saltSchema.js';

/** Bounds of what the structural functions read of a salt: its ions (formula, charge, count) and its water. Extra keys are allowed. */
const SALT_SHAPE = { maxCharge: 12, maxCount: 1_000_000, maxWater: 1_000_000 } as const;

const kindOf = (x: unknown): string => (x === null ? 'null' : Array.isArray(x) ? 'array' : typeof x === 'number' && !Number.isFinite(x) ? String(x) : typeof x);

/** The first way `salt` differs from the shape the structural functions read, as [path, message], or undefined. */
function saltShapeProblem(salt: unknown): [string[], string] | undefined {
  if (salt === null || typeof salt !== 'object' || Array.isArray(salt)) return [[], `invalid input: expected object, received ${kindOf(salt)}`];
  const { ions, water } = salt as { ions?: unknown; water?: unknown };
  if (!Array.isArray(ions)) return [['ions'], `invalid input: expected array, received ${kindOf(ions)}`];
  for (let i = 0; i < ions.length; i++) {
    const ion = ions[i] as unknown;
    if (ion === null || typeof ion !== 'object' || Array.isArray(ion)) return [['ions', String(i)], `invalid input: expected object, received ${kindOf(ion)}`];
    const { formula, charge, count } = ion as Record<string, unknown>;
    if (typeof formula !== 'string') return [['ions', String(i), 'formula'], `invalid input: expected string, received ${kindOf(formula)}`];
    const c = integerProblem(charge, -SALT_SHAPE.maxCharge, SALT_SHAPE.maxCharge);
    if (c) return [['ions', String(i), 'charge'], c];
    const n = integerProblem(count, 1, SALT_SHAPE.maxCount);
    if (n) return [['ions', String(i), 'count'], n];
  }
  if (typeof water !== 'number' || !Number.isFinite(water)) return [['water'], `invalid input: expected number, received ${kindOf(water)}`];
  if (water < 0) return [['water'], 'too small: expected number to be >=0'];
  if (water > SALT_SHAPE.maxWater) return [['water'], `too big: expected number to be <=${SALT_SHAPE.maxWater}`];
  return undefined;
}

function integerProblem(x: unknown, min: number, max: number): string | undefined {
  if (typeof x !== 'number' || !Number.isFinite(x)) return `invalid input: expected number, received ${kindOf(x)}`;
  if (!Number.isInteger(x)) return 'invalid input: expected int, received number';
  if (x < min) return `too small: expected number to be >=${min}`;
  if (x > max) return `too big: expected number to be <=${max}`;
  return undefined;
}

/**
 * Checks that `salt` has the ions and water a {@link Salt} has, else an
 * `INVALID_ARGUMENT` error naming the field.
 * @internal
 */
export function checkSaltShape(salt: unknown, field = 'salt'): void {
  if (isIssuedSalt(salt)) return;
  const problem = saltShapeProblem(salt);
  if (!problem) return;
  const at = [field, ...problem[0]].join('.');
  throw new IonheatError('INVALID_ARGUMENT', `${field} must be a salt from parseSalt: ${at} ${problem[1]}`, { field: at });
}

/**
 * The charge type |z₊|:|z₋| of a salt with one kind of cation and one kind of
 * anion: `1:1` (NaCl), `2:1` (CaCl2), `1:2` (Na2SO4). Undefined for a double
 * salt or a non-electrolyte.
 *
 * @param salt - a parsed salt ({@link parseSalt})
 * @see The charge-type classes of electrolytes used throughout Parker (1965), source key `parker1965`.
 *
 * @example
 * ```ts
 * chargeType(parseSalt('CaCl2')); // '2:1'
 * chargeType(parseSalt('Na2SO4')); // '1:2'
 * chargeType(parseSalt('KAl(SO4)2·12H2O')); // undefined
 * ```
 */
export function chargeType(salt: Salt): string | undefined {
  checkSaltShape(salt);
  const cations = salt.ions.filter((i) => i.charge > 0);
  const anions = salt.ions.filter((i) => i.charge < 0);
  if (cations.length !== 1 || anions.length !== 1) return undefined;
  return `${cations[0]!.charge}:${-anions[0]!.charge}`;
}

/**
 * Total number of ions per formula unit, ν = Σᵢ νᵢ, of the dissolution
 * reaction MₐXᵦ(s) → a M(aq) + b X(aq); water of crystallization excluded.
 * ν is the prefactor of the Kapustinskii equation.
 *
 * @param salt - a parsed salt ({@link parseSalt})
 * @see Kapustinskii (1956), source key `kapustinskii1956`, for ν as the number of ions per formula unit.
 *
 * @example
 * ```ts
 * ionsPerFormulaUnit(parseSalt('CaCl2·6H2O')); // 3
 * ionsPerFormulaUnit(parseSalt('KAl(SO4)2·12H2O')); // 4
 * ```
 */
export function ionsPerFormulaUnit(salt: Salt): number {
  checkSaltShape(salt);
  return salt.ions.reduce((n, i) => n + i.count, 0);
}
