/**
 * What a caller gives the pack model — a fill and its options — and the one
 * table of the ranges its numbers may take. The library checks a fill
 * against this table (`preparePackFill`), the screen checks its standard
 * fill (object or text) against it, and the command line maps its flags
 * onto these fields, so that a name or a range is stated once.
 *
 * A plain table rather than a schema library: these checks run for every
 * fill a sweep or a screen solves.
 *
 * @module
 */
import { IonheatError } from '../error.js';
import { checkOptionKeys, numberArgument, optionNames, type NumberRule } from '../quantity/argumentChecks.js';

/** One solid of a fill. */
export interface PackSolid {
  /** Formula as loaded, hydrate water included (`CaCl2`, `NaCH3COO·3H2O`). */
  formula: string;
  /** Grams loaded. */
  massG: number;
}

/** What goes into the pack. */
export interface PackFill {
  solids: readonly PackSolid[];
  /** Grams of liquid water (not counting any water of crystallization of the solids). */
  waterG: number;
  /** Start temperature of water, solids and container, °C (default 20 °C). */
  startC?: number;
  /** Heat capacity of the container, gel or wrapping that follows the fill's temperature, J/K (default 0). */
  containerJPerK?: number;
}

/** How the 95 % interval of the final temperature is found. */
export type PackIntervalOptions =
  | { method: 'bounds' }
  | {
      method: 'monte-carlo';
      /** Number of draws (default 2000). */
      samples?: number;
      /** Seed of the pseudo-random draws (default 1): the same seed gives the same interval. */
      seed?: number;
    };

/** Options of the pack model. */
export interface PackOptions {
  /**
   * Your own heat capacity of the whole fill (solution, undissolved solid and
   * container), J/K, replacing the sum of parts.
   */
  heatCapacityJPerK?: number;
  /** Standard uncertainty of your heat capacity, J/K (default 0). */
  heatCapacityUJPerK?: number;
  /**
   * Kept for callers of earlier versions: the enthalpy balance now always
   * takes ΔsolH°(∞) at the start temperature (Kirchhoff, with the typical
   * ΔsolCp° and a wider interval where the salt's own is unknown).
   */
  kirchhoff?: boolean;
  /** Default `{ method: 'bounds' }`. */
  interval?: PackIntervalOptions;
}

/** Default start temperature: a room, °C (common practice). */
export const DEFAULT_START_C = 20;

/** One number of a pack input: what it is in words, with its unit, and the range it may take. */
export interface InputRange extends NumberRule {
  readonly what: string;
}

/**
 * Every number of a fill and of the pack options, by field name. Masses run
 * from a milligram to a tonne and heat capacities up to 1e8 J/K (a tonne of
 * water holds about 4.2e6 J/K): beyond them the numbers say nothing about a
 * pack, and far beyond them (1e308 g, a subnormal 1e-320 g) the heat balance
 * overflows or the solver stalls.
 */
export const PACK_INPUT_RANGES = {
  massG: { what: 'the mass of the solid', unit: 'g', min: 1e-3, max: 1e6 },
  waterG: { what: 'the water', unit: 'g', min: 1e-3, max: 1e6 },
  startC: { what: 'the start temperature', unit: '°C', min: 0, max: 100, below: true, reason: 'where water is liquid at 1 bar' },
  containerJPerK: { what: 'the container heat capacity', unit: 'J/K', min: 0, max: 1e8 },
  heatCapacityJPerK: { what: 'your heat capacity of the fill', unit: 'J/K', min: 1e-3, max: 1e8 },
  heatCapacityUJPerK: { what: 'the uncertainty of your heat capacity', unit: 'J/K', min: 0, max: 1e8 },
  samples: { what: 'the number of Monte Carlo draws', unit: 'draws', min: 20, max: 100_000, integer: true },
  seed: { what: 'the Monte Carlo seed', min: -Number.MAX_SAFE_INTEGER, max: Number.MAX_SAFE_INTEGER, integer: true },
} as const satisfies Record<string, InputRange>;

export type PackInputName = keyof typeof PACK_INPUT_RANGES;

/**
 * `value` checked against the range of `name` in {@link PACK_INPUT_RANGES};
 * the error names `field` (where the caller put it) and, in words, `what`
 * (default: the table's words for it). −0 comes back as 0.
 */
export function packInputNumber(value: unknown, name: PackInputName, field: string = name, what: string = PACK_INPUT_RANGES[name].what): number {
  return numberArgument(value, field, what, PACK_INPUT_RANGES[name]);
}

/** The numbers of a fill and its options, checked, defaults applied. */
export interface CheckedPackInput {
  waterG: number;
  startC: number;
  containerJPerK: number;
  /** The user's heat capacity, J/K, when given. */
  heatCapacityOverride: { value: number; u: number } | undefined;
}

const FILL_KEYS = optionNames<PackFill>('a pack fill', { solids: true, waterG: true, startC: true, containerJPerK: true });
/** Keys of one solid. */
export const SOLID_KEYS = optionNames<PackSolid>('a solid of the fill', { formula: true, massG: true });
const PACK_OPTION_KEYS = optionNames<PackOptions>('the pack model', { heatCapacityJPerK: true, heatCapacityUJPerK: true, kirchhoff: true, interval: true });
const INTERVAL_KEYS = optionNames<{ method: string; samples?: number; seed?: number }>('the interval option', { method: true, samples: true, seed: true });

function invalid(field: string, message: string): IonheatError {
  return new IonheatError('INVALID_ARGUMENT', message, { field });
}

/**
 * Checks the shape of a fill and its options and every number but the
 * solids' (which are checked with their formulas): objects with known keys
 * only, one to 100 solids, and each number within {@link PACK_INPUT_RANGES}.
 *
 * @throws IonheatError `INVALID_ARGUMENT` or `INVALID_OPTION` naming the field.
 */
export function checkPackInput(fill: PackFill, options: PackOptions): CheckedPackInput {
  if (options === null || typeof options !== 'object') throw invalid('options', `the pack options are an object, got ${options === null ? 'null' : typeof options}`);
  if (fill === null || typeof fill !== 'object') throw invalid('fill', 'a pack fill is an object with solids, waterG and optionally startC and containerJPerK');
  checkOptionKeys(options, PACK_OPTION_KEYS, 'options');
  checkOptionKeys(fill, FILL_KEYS, 'fill');
  if (!Array.isArray(fill.solids) || fill.solids.length === 0 || fill.solids.length > 100) throw invalid('solids', 'a pack fill needs from one to 100 solids (solids: [{ formula, massG }])');
  const waterG = packInputNumber(fill.waterG, 'waterG');
  const startC = fill.startC === undefined ? DEFAULT_START_C : packInputNumber(fill.startC, 'startC');
  const containerJPerK = fill.containerJPerK === undefined ? 0 : packInputNumber(fill.containerJPerK, 'containerJPerK');
  const interval: unknown = options.interval;
  if (interval !== undefined) {
    const iv = interval as { method?: unknown; samples?: unknown; seed?: unknown };
    if (iv === null || typeof iv !== 'object' || (iv.method !== 'bounds' && iv.method !== 'monte-carlo')) throw invalid('interval', `the interval option is { method: 'bounds' } or { method: 'monte-carlo', samples, seed }, got ${iv === null || typeof iv !== 'object' ? String(iv) : `method ${String(iv.method as string)}`}`);
    checkOptionKeys(iv, iv.method === 'bounds' ? { owner: 'the bounds interval', keys: ['method'] } : INTERVAL_KEYS, 'interval');
    if (iv.samples !== undefined) packInputNumber(iv.samples, 'samples', 'interval.samples');
    if (iv.seed !== undefined) packInputNumber(iv.seed, 'seed', 'interval.seed');
  }
  let heatCapacityOverride: CheckedPackInput['heatCapacityOverride'];
  if (options.heatCapacityJPerK !== undefined) {
    const value = packInputNumber(options.heatCapacityJPerK, 'heatCapacityJPerK');
    const u = options.heatCapacityUJPerK === undefined ? 0 : packInputNumber(options.heatCapacityUJPerK, 'heatCapacityUJPerK');
    if (u > value) throw invalid('heatCapacityUJPerK', `the uncertainty of your heat capacity (heatCapacityUJPerK) must be at most the heat capacity itself, ${value} J/K; got ${u} J/K`);
    heatCapacityOverride = { value, u };
  }
  return { waterG, startC, containerJPerK, heatCapacityOverride };
}
