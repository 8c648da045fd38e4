/**
 * Molar heat capacities the pack model needs: of a crystal (tabulated, or
 * estimated by Neumann–Kopp or Dulong–Petit), of liquid water, and of a salt
 * at infinite dilution (Σν·Cp° of its aqueous ions).
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords, WATER } from '../chem/saltRecords.js';
import { molarMass } from '../chem/molarMass.js';
import { IonheatError } from '../error.js';
import { GAS_CONSTANT } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { quadrature } from '../quantity/propagate.js';

/**
 * Relative standard uncertainty given to a Dulong–Petit estimate. An assumed
 * allowance, not a published figure: 3R per atom overstates Cp° of crystals
 * with light atoms (H, O) at 25 °C by tens of per cent.
 */
const DULONG_PETIT_RELATIVE_U = 0.25;

const QUANTITY = 'molar heat capacity';
const UNIT = 'J/(mol·K)';

function tabulated(formula: string, phase: 'cr' | 'l', dataset: Dataset) {
  return saltRecords('heat-capacities.json', { formula }, dataset).find((r) => r.phase === phase);
}

/**
 * The Neumann–Kopp increment per water of crystallization, J/(mol·K), taken
 * from the table itself: the mean of (Cp°(hydrate) − Cp°(anhydrous))/n over
 * every hydrate–anhydrous pair it holds, with their spread as the standard
 * uncertainty. Undefined when fewer than two pairs exist.
 *
 * @example
 * ```ts
 * crystalWaterIncrement()?.value; // ≈ 40.6 (mean over the hydrate–anhydrous pairs of NBS Cp° values)
 * ```
 */
export function crystalWaterIncrement(dataset: Dataset = builtinDataset()): Estimate | undefined {
  return dataset.memo('pack.crystalWaterIncrement', () => {
    const increments: number[] = [];
    const sources = new Set<string>();
    for (const record of dataset.records('heat-capacities.json')) {
      if (record.phase !== 'cr' || record.formula === WATER) continue;
      let salt: Salt;
      try {
        salt = parseSalt(record.formula, dataset);
      } catch {
        continue; // a bad record is reported by the table checks, not here
      }
      if (salt.water <= 0) continue;
      const anhydrous = tabulated(salt.anhydrous, 'cr', dataset);
      if (!anhydrous) continue;
      increments.push((record.value - anhydrous.value) / salt.water);
      sources.add(record.source).add(anhydrous.source);
    }
    if (increments.length < 2) return undefined;
    const mean = increments.reduce((s, x) => s + x, 0) / increments.length;
    const sd = Math.sqrt(increments.reduce((s, x) => s + (x - mean) ** 2, 0) / (increments.length - 1));
    return makeEstimate({
      quantity: 'heat capacity per water of crystallization',
      value: mean,
      u: sd,
      unit: UNIT,
      basis: 'model',
      method: 'neumann-kopp-increment',
      sources: [...sources],
      notes: [`mean over ${increments.length} hydrate–anhydrous pairs of the heat-capacity table`],
    });
  });
}

/**
 * Cp° of a crystalline solid at 25 °C: the tabulated value; for a hydrate
 * missing from the table, Cp°(anhydrous) + n·(increment per crystal water)
 * (Neumann–Kopp additivity with the table's own increment); otherwise the
 * Dulong–Petit estimate 3R per atom with a 25 % standard uncertainty.
 *
 * @param salt - formula or parsed salt, hydrate water included
 * @returns J/(mol·K) per formula unit as written
 * @see Kopp, H. Ann. Chem. Pharm. Suppl. 3, 1 and 289 (1864) (additivity of heat capacities)
 * @see Petit, A.-T.; Dulong, P.-L. Ann. Chim. Phys. 10, 395 (1819)
 * @example
 * ```ts
 * solidHeatCapacity('KNO3').value; // 96.4 (NBS)
 * solidHeatCapacity('NaCl').method; // 'table'
 * ```
 */
export function solidHeatCapacity(salt: string | Salt, dataset: Dataset = builtinDataset()): Estimate {
  const s = typeof salt === 'string' ? parseSalt(salt, dataset) : salt;
  const own = tabulated(s.formula, 'cr', dataset);
  if (own) {
    return makeEstimate({
      quantity: QUANTITY,
      value: own.value,
      u: dataset.uncertaintyOf('heat-capacities.json', own) ?? 0,
      unit: UNIT,
      basis: 'measured',
      method: 'table',
      sources: [own.source],
      notes: own.fromMemory ? [`Cp° of ${s.formula} entered from memory`] : [],
    });
  }
  if (s.water > 0) {
    const anhydrous = tabulated(s.anhydrous, 'cr', dataset);
    const increment = crystalWaterIncrement(dataset);
    if (anhydrous && increment) {
      const ua = dataset.uncertaintyOf('heat-capacities.json', anhydrous) ?? 0;
      return makeEstimate({
        quantity: QUANTITY,
        value: anhydrous.value + s.water * increment.value,
        u: quadrature(ua, s.water * increment.u),
        unit: UNIT,
        basis: 'model',
        method: 'neumann-kopp',
        sources: [anhydrous.source, ...increment.sources],
        notes: [`Cp° of ${s.formula} estimated as Cp°(${s.anhydrous}) + ${s.water} × ${increment.value.toFixed(1)} J/(mol·K) per crystal water (Neumann–Kopp)`],
      });
    }
  }
  const atoms = Object.values(s.composition).reduce((n, c) => n + c, 0);
  const value = 3 * GAS_CONSTANT * atoms;
  return makeEstimate({
    quantity: QUANTITY,
    value,
    u: DULONG_PETIT_RELATIVE_U * value,
    unit: UNIT,
    basis: 'model',
    method: 'dulong-petit',
    sources: [],
    notes: [`no Cp° for ${s.formula} in the table; estimated as 3R per atom (Dulong–Petit), ±25 % assumed`],
  });
}

/**
 * Specific heat capacity of liquid water at 25 °C, J/(g·K): Cp°(H2O, l) of
 * the table over the molar mass of water.
 *
 * @example
 * ```ts
 * waterSpecificHeat().value; // 4.179 (75.291 J/(mol·K), NBS, over 18.015 g/mol)
 * ```
 */
export function waterSpecificHeat(dataset: Dataset = builtinDataset()): Estimate {
  return dataset.memo('pack.waterSpecificHeat', () => {
    const record = tabulated(WATER, 'l', dataset);
    if (!record) throw new IonheatError('MISSING_DATA', `the ${dataset.label} heat-capacity table has no Cp° of liquid water (H2O, phase l)`, { field: 'heat-capacities.json' });
    const m = molarMass({ H: 2, O: 1 }, dataset);
    const u = dataset.uncertaintyOf('heat-capacities.json', record) ?? 0;
    return makeEstimate({ quantity: 'specific heat capacity of water', value: record.value / m, u: u / m, unit: 'J/(g·K)', basis: 'measured', method: 'table', sources: [record.source] });
  });
}

/**
 * Σν·Cp°(ion, aq) of a salt at infinite dilution, 25 °C, J/(mol·K) per
 * formula unit of the anhydrous salt, on the conventional scale
 * (Cp°(H⁺, aq) = 0; sums over a neutral salt are scale-free). Undefined when
 * an ion has no tabulated value.
 *
 * @example
 * ```ts
 * aqueousHeatCapacity('NaCl')?.value; // -90.0 (46.4 − 136.4, NBS)
 * ```
 */
export function aqueousHeatCapacity(salt: string | Salt, dataset: Dataset = builtinDataset()): Estimate | undefined {
  const s = typeof salt === 'string' ? parseSalt(salt, dataset) : salt;
  const index = dataset.index('ion-heat-capacities-aq.json');
  let value = 0;
  const us: number[] = [];
  const sources: string[] = [];
  for (const { ion, count } of s.ions) {
    const r = index.get(ion);
    if (!r) return undefined;
    value += count * r.value;
    us.push(count * (dataset.uncertaintyOf('ion-heat-capacities-aq.json', r) ?? 0));
    sources.push(r.source);
  }
  return makeEstimate({ quantity: 'heat capacity at infinite dilution', value, u: quadrature(...us), unit: UNIT, basis: 'measured', method: 'ion-sum', sources });
}
