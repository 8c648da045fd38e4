/**
 * Checks of what a caller passes to the public functions: numbers that must
 * be finite (and in a range), estimates, option objects. Each failure is an
 * `INVALID_ARGUMENT` error that names the field and the value it got.
 *
 * @module
 */
import { IonheatError } from '../error.js';
import type { Estimate } from './estimate.js';
import { basisOrder } from './basisOrder.js';
import { didYouMean } from './nearestName.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/** A short, safe rendering of any value for an error message (symbols, cycles and long text included). */
export function describeValue(value: unknown): string {
  if (typeof value === 'string') return value.length > 40 ? `"${value.slice(0, 40)}…"` : `"${value}"`;
  if (typeof value === 'number') return Object.is(value, -0) ? '-0' : String(value);
  if (typeof value === 'bigint') return `${value}n`;
  if (typeof value === 'symbol') return 'a symbol';
  if (typeof value === 'function') return 'a function';
  if (value === null || value === undefined) return String(value);
  if (Array.isArray(value)) return 'a list';
  return 'an object';
}

/** Range and kind of a number argument. */
export interface NumberRule {
  /** Smallest allowed value (inclusive unless `above`). */
  min?: number;
  /** Largest allowed value (inclusive unless `below`). */
  max?: number;
  /** The value must be greater than `min`. */
  above?: boolean;
  /** The value must be less than `max`. */
  below?: boolean;
  integer?: boolean;
  /** The unit, written after each bound in an error (`g`, `°C`). */
  unit?: string;
  /** Why the range is what it is, added to an error (`where water is liquid at 1 bar`). */
  reason?: string;
}

/**
 * `value` as a finite number within the rule's range, else an
 * `INVALID_ARGUMENT` error naming `field` (and, in words, `what` it is).
 * −0 is returned as 0.
 */
export function numberArgument(value: unknown, field: string, what: string, rule: NumberRule = {}): number {
  // The common case first and without allocating: this runs inside solver loops.
  if (withinRule(value, rule)) return unsignedZero(value);
  throw new IonheatError('INVALID_ARGUMENT', `${what} (${field}) ${numberProblem(value, rule)}`, { field });
}

/** Whether `value` is a finite number that keeps `rule`. */
export function withinRule(value: unknown, rule: NumberRule): value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) return false;
  const { min, max } = rule;
  const aboveMin = min === undefined || (rule.above ? value > min : value >= min);
  const belowMax = max === undefined || (rule.below ? value < max : value <= max);
  return aboveMin && belowMax && (!rule.integer || Number.isInteger(value));
}

/** What is wrong with a `value` that breaks `rule`, in words: `must be at least 0.001 g and at most 1000000 g, got 0 g`. */
export function numberProblem(value: unknown, rule: NumberRule): string {
  const unit = rule.unit ? ` ${rule.unit}` : '';
  const got = `, got ${describeValue(value)}${typeof value === 'number' && Number.isFinite(value) ? unit : ''}`;
  if (typeof value !== 'number' || !Number.isFinite(value)) return `must be a finite number${unit ? ` of${unit}` : ''}${got}`;
  if (rule.integer && !Number.isInteger(value)) return `must be a whole number${got}`;
  const { min, max } = rule;
  const reason = rule.reason ? `, ${rule.reason}` : '';
  // The whole range, low end first, whichever end was crossed.
  const low = min === undefined ? '' : `${rule.above ? 'greater than' : 'at least'} ${min}${unit}`;
  const high = max === undefined ? '' : `${rule.below ? 'less than' : 'at most'} ${max}${unit}`;
  return `must be ${low && high ? `${low} and ${high}` : low || high}${reason}${got}`;
}

/** The keys an options object may have, and whose options they are (`dissolve`), for errors that name both. */
export interface OptionNames {
  readonly owner: string;
  readonly keys: readonly string[];
}

/**
 * The option names of `T`, written as an object so that the compiler checks
 * that every key of `T` is listed (and nothing else).
 */
export function optionNames<T extends object>(owner: string, keys: { readonly [K in keyof Required<T>]: true }): OptionNames {
  return Object.freeze({ owner, keys: Object.freeze(Object.keys(keys)) });
}

/**
 * `INVALID_OPTION` for the first key of `value` that is not one of `names`,
 * naming it and the nearest valid key: a misspelt option must not be ignored
 * and the default used in silence.
 */
export function checkOptionKeys(value: object, names: OptionNames, field: string): void {
  for (const key in value) {
    if (!Object.prototype.hasOwnProperty.call(value, key) || names.keys.includes(key)) continue;
    const hint = didYouMean(key, names.keys);
    const where = field === 'options' ? `${names.owner} has no option` : `${field} (${names.owner}) has no key`;
    throw new IonheatError('INVALID_OPTION', `${where} "${key}"${hint}; ${names.keys.length === 0 ? 'it takes none' : `known: ${names.keys.join(', ')}`}`, { field: field === 'options' ? key : `${field}.${key}` });
  }
}

/**
 * `value` when it is an object (not a list) or undefined (then `{}`) whose
 * keys are all among `names`; else `INVALID_ARGUMENT` (not an object) or
 * `INVALID_OPTION` (an unknown key, with the nearest valid one) naming `field`.
 */
export function optionsArgument<T extends object>(value: T | undefined, names: OptionNames, field = 'options'): T {
  if (value === undefined) return {} as T;
  if (value === null || typeof value !== 'object' || Array.isArray(value)) throw new IonheatError('INVALID_ARGUMENT', `${field} must be an object of named options, got ${describeValue(value)}`, { field });
  checkOptionKeys(value, names, field);
  return value;
}

/** The largest magnitude an estimate's numbers may have (far beyond any enthalpy, heat or temperature), so that sums and products stay finite. */
export const ESTIMATE_LIMIT = 1e12;

/**
 * `value` when it is a complete {@link Estimate} (every field of the shape,
 * finite numbers of magnitude at most 1e12, u ≥ 0, low ≤ value ≤ high),
 * else an `INVALID_ARGUMENT` error naming `field`. A key an estimate does not have is refused.
 */
export function estimateArgument(value: unknown, field = 'estimate'): Estimate {
  const problem = estimateShapeProblem(value);
  if (problem) {
    const at = problem.path ? `${field}.${problem.path}` : field;
    throw new IonheatError('INVALID_ARGUMENT', `${field} must be an estimate as ionheat makes them (makeEstimate): ${at} ${problem.message}`, { field: at });
  }
  const e = value as Estimate;
  for (const k of ['value', 'u', 'low', 'high'] as const) numberArgument(e[k], `${field}.${k}`, `the ${k === 'u' ? 'uncertainty' : k} of ${field}`, { min: -ESTIMATE_LIMIT, max: ESTIMATE_LIMIT });
  if (!(e.low <= e.value && e.value <= e.high)) throw new IonheatError('INVALID_ARGUMENT', `${field}: the interval [${e.low}, ${e.high}] does not hold the value ${e.value}`, { field: `${field}.low` });
  return { ...e, value: unsignedZero(e.value), low: unsignedZero(e.low), high: unsignedZero(e.high), u: unsignedZero(e.u) };
}

/** The fields of an estimate and what each must be (the shape of `estimateSchema`, checked here without zod, which is not loaded at start-up). */
const ESTIMATE_FIELDS: Readonly<Record<keyof Estimate, 'string' | 'number' | 'basis' | 'strings'>> = {
  quantity: 'string',
  value: 'number',
  u: 'number',
  low: 'number',
  high: 'number',
  unit: 'string',
  basis: 'basis',
  method: 'string',
  sources: 'strings',
  notes: 'strings',
};

const typeName = (x: unknown): string => (x === null ? 'null' : Array.isArray(x) ? 'array' : typeof x);

/** The first way `value` differs from an estimate's shape (`path` empty for the object itself), or undefined. */
function estimateShapeProblem(value: unknown): { path: string; message: string } | undefined {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return { path: '', message: `invalid input: expected object, received ${typeName(value)}` };
  const e = value as Record<string, unknown>;
  for (const key in ESTIMATE_FIELDS) {
    const x = e[key];
    const kind = ESTIMATE_FIELDS[key as keyof Estimate];
    if (kind === 'basis') {
      if (!basisOrder.includes(x as never)) return { path: key, message: `invalid option: expected one of ${basisOrder.map((b) => `"${b}"`).join('|')}` };
    } else if (kind === 'strings') {
      if (!Array.isArray(x)) return { path: key, message: `invalid input: expected array, received ${typeName(x)}` };
      for (let i = 0; i < x.length; i++) if (typeof x[i] !== 'string') return { path: `${key}.${i}`, message: `invalid input: expected string, received ${typeName(x[i])}` };
    } else if (typeof x !== kind) return { path: key, message: `invalid input: expected ${kind}, received ${typeName(x)}` };
  }
  if ((e.u as number) < 0) return { path: 'u', message: 'too small: expected number to be >=0' };
  for (const key in e) if (!Object.hasOwn(ESTIMATE_FIELDS, key)) return { path: '', message: `unrecognized key: "${key}"` };
  return undefined;
}
