/**
 * The heat capacity of solution and the Kirchhoff correction of an enthalpy
 * of solution from 25 °C to another temperature between 0 and 40 °C.
 *
 * @module
 */
import { describeValue, estimateArgument, numberArgument } from '../quantity/argumentChecks.js';
import { saltArgument } from '../chem/saltArgument.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords, WATER } from '../chem/saltRecords.js';
import { tableFormulaSalt } from '../chem/tableFormulaSalt.js';
import { IonheatError } from '../error.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { widenEstimate } from './widenEstimate.js';
import { exactSum, type Term } from '../quantity/exactSum.js';
import { linearUncertainty } from '../quantity/propagate.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';

/** The range of temperatures the Kirchhoff correction is offered for, °C. */
export const KIRCHHOFF_RANGE_C = { min: 0, max: 40 } as const;
/** The temperature of the tables, °C. */
export const TABLE_TEMPERATURE_C = 25;

function ionCpIndex(dataset: Dataset) {
  return dataset.index('ion-heat-capacities-aq.json');
}

/**
 * ΔsolCp° = Σν·Cp°(ion, aq) + n_w·Cp°(H₂O, l) − Cp°(salt, cr), J/(mol·K),
 * at 25 °C and infinite dilution: how fast the enthalpy of solution changes
 * with temperature. Ionic heat capacities are on the conventional scale
 * (Cp°(H⁺, aq) = 0), which cancels for a neutral salt.
 *
 * @param salt - the salt as dissolved
 * @param dataset - heat capacities of the crystal (J/(K·mol)) and of the aqueous ions at infinite dilution (default: built-in)
 * @returns basis `cycle`; undefined where a heat capacity is missing (non-electrolytes: no aqueous value in the tables)
 * @see Wagman et al. 1982, the NBS tables (J. Phys. Chem. Ref. Data 11, Suppl. 2)
 * @example
 * ```ts
 * // 46.4 − 136.4 − 50.5 = −140.5 J/(mol·K) (NBS)
 * solutionHeatCapacity(parseSalt('NaCl'))?.value; // -140.5
 * ```
 */
export function solutionHeatCapacity(salt: Salt, dataset: Dataset = builtinDataset()): Estimate | undefined {
  salt = saltArgument(salt, dataset);
  if (salt.kind !== 'ionic') return undefined;
  const crystal = saltRecords('heat-capacities.json', salt, dataset).find((r) => r.phase === 'cr');
  if (!crystal) return undefined;
  const terms: (Term & { u: number })[] = [{ coefficient: -1, value: crystal.value, u: dataset.uncertaintyOf('heat-capacities.json', crystal) ?? 0 }];
  const sources = [crystal.source];
  let memory = crystal.fromMemory;
  for (const { ion, count } of salt.ions) {
    const r = ionCpIndex(dataset).get(ion);
    if (!r) return undefined;
    terms.push({ coefficient: count, value: r.value, u: dataset.uncertaintyOf('ion-heat-capacities-aq.json', r) ?? 0 });
    sources.push(r.source);
    memory ||= r.fromMemory;
  }
  if (salt.water > 0) {
    const water = saltRecords('heat-capacities.json', { formula: WATER }, dataset).find((r) => r.phase === 'l');
    if (!water) return undefined;
    terms.push({ coefficient: salt.water, value: water.value, u: dataset.uncertaintyOf('heat-capacities.json', water) ?? 0 });
    sources.push(water.source);
  }
  return makeEstimate({
    quantity: 'heat capacity of solution',
    value: exactSum(terms),
    u: linearUncertainty(terms),
    unit: 'J/(mol·K)',
    basis: 'cycle',
    method: 'heat-capacities',
    sources,
    notes: memory ? ['heat capacities entered from memory, not checked against the source'] : [],
  });
}

/**
 * The spread of ΔsolCp° over the salts of the dataset that have one: the RMS
 * value, J/(mol·K). Used as the uncertainty of the temperature correction
 * of a salt whose own ΔsolCp° is unknown.
 */
export function typicalSolutionHeatCapacity(dataset: Dataset = builtinDataset()): { rms: number; salts: number } {
  return dataset.memo('solution.typicalCp', () => {
    const values: number[] = [];
    for (const record of dataset.records('heat-capacities.json')) {
      if (record.phase !== 'cr') continue;
      const salt = tableFormulaSalt(record.formula, dataset);
      if (!salt) continue;
      const cp = solutionHeatCapacity(salt, dataset);
      if (cp) values.push(cp.value);
    }
    values.sort((a, b) => a - b); // a sum independent of table order
    const rms = Math.sqrt(values.reduce((s, v) => s + v * v, 0) / Math.max(1, values.length));
    return { rms, salts: values.length };
  });
}

/** Checks a temperature for the Kirchhoff correction. */
export function checkKirchhoffTemperature(temperatureC: number): void {
  if (typeof temperatureC !== 'number' || !Number.isFinite(temperatureC) || temperatureC < KIRCHHOFF_RANGE_C.min || temperatureC > KIRCHHOFF_RANGE_C.max) {
    throw new IonheatError(
      'INVALID_ARGUMENT',
      `the temperature ${describeValue(temperatureC)} °C is outside ${KIRCHHOFF_RANGE_C.min}–${KIRCHHOFF_RANGE_C.max} °C, the range over which ionheat corrects enthalpies of solution for temperature`,
      { field: 'temperature' },
    );
  }
}

/**
 * Kirchhoff's law, ΔsolH°(T) = ΔsolH°(25 °C) + ΔsolCp°·(T − 25 °C), taking
 * ΔsolCp° as constant over 0–40 °C. Where the salt's ΔsolCp° is unknown,
 * the value is left as at 25 °C and the uncertainty grows by the typical
 * |ΔsolCp°| of the tabulated salts times |T − 25 °C|, with a note.
 *
 * @param e - an enthalpy of solution at 25 °C, kJ/mol
 * @param temperatureC - the temperature wanted, 0–40 °C
 * @param heatCapacity - ΔsolCp°, J/(mol·K), if known
 * @param typical - the typical |ΔsolCp°| to use if not, J/(mol·K)
 * @see Kirchhoff, G. Ann. Phys. 179, 177 (1858); any physical chemistry text
 * @example
 * ```ts
 * const h = makeEstimate({ quantity: 'enthalpy of solution', value: 3.88, u: 0.2, unit: 'kJ/mol', basis: 'measured', method: 'table' });
 * const cp = makeEstimate({ quantity: 'heat capacity of solution', value: -140.5, u: 3, unit: 'J/(mol·K)', basis: 'cycle', method: 'heat-capacities' });
 * kirchhoffCorrection(h, 40, cp, 100).value; // 1.7725 (3.88 − 0.1405·15)
 * ```
 */
export function kirchhoffCorrection(e: Estimate, temperatureC: number, heatCapacity: Estimate | undefined, typical: number): Estimate {
  e = estimateArgument(e);
  if (heatCapacity !== undefined) heatCapacity = estimateArgument(heatCapacity, 'heatCapacity');
  numberArgument(typical, 'typical', 'the typical |ΔsolCp°| in J/(mol·K)', { min: 0, max: 1e6 });
  checkKirchhoffTemperature(temperatureC);
  return kirchhoffShifted(e, temperatureC, heatCapacity, typical);
}

/**
 * The one Kirchhoff correction of ionheat, without the range check: used by
 * {@link kirchhoffCorrection} and by the pack model (which notes when the
 * temperature lies outside 0–40 °C).
 * @internal
 */
export function kirchhoffShifted(e: Estimate, temperatureC: number, heatCapacity: Estimate | undefined, typical: number): Estimate {
  const dT = temperatureC - TABLE_TEMPERATURE_C;
  if (dT === 0) return e;
  if (heatCapacity) {
    const shift = (heatCapacity.value * dT) / 1000;
    const uShift = (heatCapacity.u * Math.abs(dT)) / 1000;
    return widenEstimate(e, uShift, shift, [`at ${temperatureC} °C by Kirchhoff's law with ΔsolCp° = ${fixedDecimal(heatCapacity.value, 1)} J/(mol·K)`]);
  }
  const uShift = (typical * Math.abs(dT)) / 1000;
  return widenEstimate(e, uShift, 0, [
    `value at 25 °C: no heat capacity of solution for this salt, so the correction to ${temperatureC} °C is unknown; the interval is widened by a typical |ΔsolCp°| of ${fixedDecimal(typical, 0)} J/(mol·K)`,
  ]);
}
