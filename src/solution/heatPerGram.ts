/**
 * Heat of solution per gram: of the salt alone, and of a saturated fill (the
 * salt plus the water that just dissolves it at 25 °C), which is what a pack
 * designer weighs.
 *
 * @module
 */
import { describeValue, estimateArgument, numberArgument } from '../quantity/argumentChecks.js';
import { IonheatError } from '../error.js';
import { saltArgument } from '../chem/saltArgument.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { molarMass } from '../chem/molarMass.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';

/** Heat absorbed per gram, J/g, from kJ/mol: ×1000/M. Positive = the fill cools. */
function scaled(e: Estimate, factor: number, quantity: string, notes: readonly string[] = []): Estimate {
  return makeEstimate({ quantity, value: e.value * factor, u: e.u * factor, unit: 'J/g', basis: e.basis, method: e.method, sources: e.sources, notes: notes.length > 0 ? [...e.notes, ...notes] : e.notes, low: e.low * factor, high: e.high * factor });
}

/**
 * The heat of solution per gram of salt as dissolved (hydrate water
 * included in the mass), J/g: ΔsolH°·1000/M. Positive = heat absorbed.
 *
 * @param e - the enthalpy of solution, kJ/mol
 * @param salt - the salt as dissolved; its molar mass M (g/mol) includes any hydrate water
 * @returns J/g
 * @see molar masses from the standard atomic weights of Prohaska et al. (2022), source key `iupac2021`.
 *
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'enthalpy of solution', value: 25.69, u: 0.2, unit: 'kJ/mol', basis: 'measured', method: 'table' });
 * heatPerGramOfSalt(e, parseSalt('NH4NO3')).value; // ≈ 321 J/g
 * ```
 */
export function heatPerGramOfSalt(e: Estimate, salt: Salt): Estimate {
  e = estimateArgument(e);
  if (salt === null || typeof salt !== 'object') throw new IonheatError('INVALID_ARGUMENT', `salt must be a salt from parseSalt, got ${describeValue(salt)}`, { field: 'salt' });
  numberArgument(salt.molarMass, 'salt.molarMass', 'the molar mass in g/mol', { min: 1, max: 1e6 });
  return scaled(e, 1000 / salt.molarMass, 'heat of solution per gram of salt');
}

/** The solubility at 25 °C from the tabulated points, g anhydrous salt per 100 g water. */
export interface Solubility25 {
  /** g of anhydrous salt per 100 g of water. */
  value: number;
  /** The equilibrium solid at 25 °C. */
  solidPhase: string;
  source: string;
  fromMemory: boolean;
  /** `tabulated` at 25 °C, or `interpolated` linearly between the neighbouring points. */
  how: 'tabulated' | 'interpolated';
}

/**
 * Solubility at 25 °C of the salt's anhydrous form, from
 * `solubility.json`: the tabulated point, or linear interpolation between
 * the points either side. Undefined where the table has no record or no
 * points around 25 °C.
 *
 * @example
 * ```ts
 * solubilityAt25(parseSalt('KNO3'))?.value; // 38.31 g per 100 g water (CRC)
 * ```
 */
export function solubilityAt25(salt: Salt, dataset: Dataset = builtinDataset()): Solubility25 | undefined {
  const record = saltRecords('solubility.json', { formula: salt.anhydrous }, dataset)[0];
  if (!record) return undefined;
  const points = [...record.points].sort((a, b) => a.t - b.t);
  const phaseOf = (p: (typeof points)[number]): string => (p as { solidPhase?: string }).solidPhase ?? record.solidPhase ?? record.formula;
  const exact = points.find((p) => p.t === 25);
  if (exact) return { value: exact.value, solidPhase: phaseOf(exact), source: record.source, fromMemory: record.fromMemory, how: 'tabulated' };
  const below = points.filter((p) => p.t < 25).at(-1);
  const above = points.find((p) => p.t > 25);
  if (!below || !above) return undefined;
  const f = (25 - below.t) / (above.t - below.t);
  return { value: below.value + f * (above.value - below.value), solidPhase: phaseOf(below), source: record.source, fromMemory: record.fromMemory, how: 'interpolated' };
}

/** A saturated fill at 25 °C: per mole of salt, how much water it takes. */
export interface SaturatedFill {
  /** Grams of fill (salt as dissolved + added water) per mole of salt. */
  massPerMole: number;
  /** Grams of water to add per gram of salt as dissolved. */
  waterPerGramSalt: number;
  /** Mass fraction of the salt (as dissolved) in the fill. */
  saltMassFraction: number;
  /** The solubility used, g anhydrous per 100 g water at 25 °C. */
  solubility: number;
  /** Source key of the solubility record. */
  source: string;
  /** What a reader should know about the fill. */
  notes: string[];
}

/**
 * The saturated fill of a salt at 25 °C: the salt as dissolved plus just
 * enough water to dissolve it,
 *
 *   m_w = max(0, M_anh·100/S − n_w·M_H₂O) per mole of salt,
 *
 * with S the solubility (g anhydrous per 100 g water) and a hydrate's own
 * water counted as solvent.
 *
 * @param salt - the salt as dissolved (a hydrate brings its water of crystallization into the fill)
 * @param dataset - the solubility table (g anhydrous salt per 100 g water) and the atomic weights (default: built-in)
 * @returns undefined where there are no solubility data
 * @see CRC Handbook of Chemistry and Physics, 'Aqueous solubility of inorganic compounds at various temperatures' (via solubility.json)
 * @example
 * ```ts
 * // NH4NO3, 212.5 g per 100 g water at 25 °C: 80.04 g salt + 37.67 g water per mole
 * saturatedFill(parseSalt('NH4NO3'))?.massPerMole; // ≈ 117.71
 * ```
 */
export function saturatedFill(salt: Salt, dataset: Dataset = builtinDataset()): SaturatedFill | undefined {
  salt = saltArgument(salt, dataset);
  const s = solubilityAt25(salt, dataset);
  if (!s || !(s.value > 0)) return undefined;
  const mWater = molarMass({ H: 2, O: 1 }, dataset);
  const ownWater = salt.water * mWater;
  const anhydrousMass = salt.molarMass - ownWater;
  const added = Math.max(0, (anhydrousMass * 100) / s.value - ownWater);
  const fill = salt.molarMass + added;
  return {
    massPerMole: fill,
    waterPerGramSalt: added / salt.molarMass,
    saltMassFraction: salt.molarMass / fill,
    solubility: s.value,
    source: s.source,
    notes: [
      `fill = salt + ${fixedDecimal(added / salt.molarMass, 3)} g water per g salt, saturated at 25 °C (solubility ${fixedDecimal(s.value, 2)} g ${salt.anhydrous} per 100 g water, ${s.how}${s.fromMemory ? ', from memory' : ''})`,
      'the heat per gram of this fill uses the integral enthalpy of solution to saturation, ΔsolH°(∞) + φL(m_sat) (brine module)',
    ],
  };
}

/**
 * The heat of solution per gram of a saturated fill, J/g:
 * q = ΔsolH°·1000/(M + m_w). Positive = the fill cools.
 *
 * @param e - the enthalpy of solution of the salt as dissolved, kJ/mol
 * @param fill - the fill, from {@link saturatedFill}: M + m_w, g per mole of salt
 * @returns J/g of fill
 * @see the solubilities behind the fill: the CRC table, source key `crcSolubility` (via solubility.json).
 *
 * @example
 * ```ts
 * const e = makeEstimate({ quantity: 'enthalpy of solution', value: 25.69, u: 0.2, unit: 'kJ/mol', basis: 'measured', method: 'table' });
 * heatPerGramOfFill(e, saturatedFill(parseSalt('NH4NO3'))).value; // ≈ 218.3 J/g
 * ```
 */
export function heatPerGramOfFill(e: Estimate, fill: SaturatedFill): Estimate {
  e = estimateArgument(e);
  if (fill === null || typeof fill !== 'object') throw new IonheatError('INVALID_ARGUMENT', `fill must be a saturated fill from saturatedFill, got ${describeValue(fill)}`, { field: 'fill' });
  numberArgument(fill.massPerMole, 'fill.massPerMole', 'the grams of fill per mole of salt', { min: 1, max: 1e9 });
  if (typeof fill.source !== 'string') throw new IonheatError('INVALID_ARGUMENT', `fill.source must be a source key, got ${describeValue(fill.source)}`, { field: 'fill.source' });
  if (!Array.isArray(fill.notes) || !fill.notes.every((n) => typeof n === 'string')) throw new IonheatError('INVALID_ARGUMENT', 'fill.notes must be a list of text', { field: 'fill.notes' });
  const heat = scaled(e, 1000 / fill.massPerMole, 'heat of solution per gram of saturated fill', fill.notes);
  return { ...heat, sources: [...new Set([...heat.sources, fill.source])].sort() };
}
