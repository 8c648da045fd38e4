/**
 * The look-up layer of the brine module: for a salt, the Pitzer parameters
 * to use (its own from data/brine-pitzer.json, the charge-type estimate
 * where it has none, or a mix: own 25 °C values with estimated temperature
 * coefficients), their fitted range and sources, and the standard
 * uncertainties that go with φ, φL and φJ at a molality. Everything here is
 * built once per dataset; the kernels in `brineProperties.ts` read it
 * without allocating.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import type { PitzerParameters } from './pitzerBrine.js';
import { brineRecords, chargeScaleOf, chargeTypeEstimate, saltCharges, splice } from './brineParameterSets.js';
import { discrepancyScalesOf } from './brineCalibration.js';
import { nonElectrolyteRecords } from './brineParameterSets.js';
import type { NonElectrolyteParameters } from './nonElectrolyteBrine.js';

/** How a salt's brine parameters were found. */
export type BrineBasis = 'pitzer' | 'pitzer-with-estimated-temperature-terms' | 'charge-type-estimate' | 'non-electrolyte' | 'non-electrolyte-estimate';

/** Scales of the model discrepancy, per mol/kg of molality (standard uncertainties). */
export interface DiscrepancyScales {
  /** Of the osmotic coefficient, per mol/kg. */
  osmotic: number;
  /** Of φL, J/mol per mol/kg. */
  enthalpy: number;
  /** Of φJ, J/(mol·K) per mol/kg. */
  heatCapacity: number;
}

/** A salt's brine model, resolved. */
export interface BrineModel {
  formula: string;
  basis: BrineBasis;
  /** Ions per formula unit in solution (1 for a non-electrolyte). */
  particles: number;
  /** Pitzer parameters; undefined for a non-electrolyte. */
  pitzer: PitzerParameters | undefined;
  /** A non-electrolyte's own series (urea); undefined for a salt and for a non-electrolyte without data (φ = 1, φL = φJ = 0 with the discrepancy). */
  nonElectrolyte?: NonElectrolyteParameters;
  /** Relative standard uncertainty of φL inside the fitted range, where the data give their own (else FIT_ALLOWANCE.enthalpyRelative). */
  enthalpyRelativeU?: number;
  /** Relative standard uncertainty of φ inside the fitted range, where the data give their own (added to the fit allowance). */
  osmoticRelativeU?: number;
  /** Own data for φ, for φL and for φJ (else the estimate stands in, with its discrepancy). */
  own: { osmotic: boolean; enthalpy: boolean; heatCapacity: boolean };
  /** Highest molality of the own fit, mol/kg (0 without own data). */
  maxMolality: number;
  /** Discrepancy scales applied past maxMolality, or from zero when the estimate stands in. */
  scales: DiscrepancyScales;
  /** Scale factor of the charge type, ν·|zMzX|/2 (1 for 1:1), by which the discrepancy grows. */
  chargeScale: number;
  sources: string[];
  fromMemory: boolean;
  notes: string[];
}

/**
 * Allowance for the fit itself inside its range: relative part and per-molality part (assumed, see docs/methods.md).
 * The heat-capacity part grows as √m and with the charge type (c = ν|zMzX|/2): 8 J/(mol·K) per c·√(mol/kg) is the
 * smallest whole number for which φCp° + φJ covers 90 % of the apparent molar heat capacities of Laliberté (2009)
 * at 25 °C, 1–6 mol/kg, for the salts with their own heat-capacity terms (tests/brine/apparentHeatCapacity.test.ts).
 * Away from 25 °C the osmotic part grows by 0.0006 per K and mol/kg, or by 0.0015 where the temperature terms are the
 * charge-type estimate: the smallest that takes in the CRC freezing points of KNO3 (0.05–1.1 mol/kg, to −2.8 °C), which
 * the 1:1 temperature terms put up to 0.23 K too low (docs/brine-validation.md).
 */
export const FIT_ALLOWANCE = { osmoticPerMolality: 0.005, osmoticPerMolalityKelvin: 0.0006, osmoticPerMolalityKelvinEstimated: 0.0015, enthalpyRelative: 0.03, enthalpyPerMolality: 20, heatCapacityRelative: 0.05, heatCapacityPerRootMolality: 8 } as const;

/**
 * Discrepancy scales of a non-electrolyte without data: assumed, not
 * calibrated (no non-electrolyte has data here); see docs/methods.md.
 */
export const NON_ELECTROLYTE_SCALES: DiscrepancyScales = { osmotic: 0.02, enthalpy: 150, heatCapacity: 5 };

/**
 * The brine model of a salt (per dataset, by canonical anhydrous formula).
 *
 * @param salt - a parsed salt; its anhydrous form is what dissolves
 * @param dataset - the Pitzer table (default: built-in)
 */
export function brineModel(salt: Salt, dataset: Dataset = builtinDataset()): BrineModel {
  const cache = dataset.cache<string, BrineModel>('brine.models');
  const key = salt.anhydrous;
  let model = cache.get(key);
  if (!model) {
    model = buildModel(salt, dataset);
    cache.set(key, model);
  }
  return model;
}

function buildModel(salt: Salt, dataset: Dataset): BrineModel {
  const scales = discrepancyScalesOf(dataset);
  const particles = salt.ions.reduce((n, i) => n + i.count, 0);
  const z = saltCharges(salt);
  const nonElectrolyte = salt.kind === 'ionic' ? undefined : nonElectrolyteRecords(dataset).get(salt.anhydrous);
  if (nonElectrolyte) {
    const { record, parameters } = nonElectrolyte;
    return {
      formula: salt.anhydrous,
      basis: 'non-electrolyte',
      particles: 1,
      pitzer: undefined,
      nonElectrolyte: parameters,
      enthalpyRelativeU: record.enthalpy.relativeUncertainty,
      osmoticRelativeU: record.osmotic.relativeUncertainty,
      own: { osmotic: true, enthalpy: true, heatCapacity: false },
      maxMolality: Math.min(record.osmotic.maxMolality, record.enthalpy.maxMolality),
      scales: NON_ELECTROLYTE_SCALES,
      chargeScale: 0.5,
      sources: [...new Set([record.osmotic.source, record.enthalpy.source])],
      fromMemory: record.osmotic.fromMemory || record.enthalpy.fromMemory,
      notes: [`${salt.anhydrous}: osmotic coefficient and φL from its own series (data/brine-pitzer.json); φJ is taken as zero with the assumed discrepancy`],
    };
  }
  if (!z) {
    return {
      formula: salt.anhydrous,
      basis: 'non-electrolyte-estimate',
      particles: salt.kind === 'ionic' ? particles : 1,
      pitzer: undefined,
      own: { osmotic: false, enthalpy: false, heatCapacity: false },
      maxMolality: 0,
      scales: salt.kind === 'ionic' ? scales.scales : NON_ELECTROLYTE_SCALES,
      chargeScale: salt.kind === 'ionic' ? particles / 2 : 0.5,
      sources: [],
      fromMemory: false,
      notes: [
        salt.kind === 'ionic'
          ? `${salt.anhydrous} has more than two kinds of ion: its brine is taken as ideal (φ = 1, φL = 0) with the calibrated model discrepancy`
          : `${salt.anhydrous} is a non-electrolyte without data here: its solution is taken as ideal (φ = 1, φL = 0) with an assumed discrepancy that grows with molality`,
      ],
    };
  }
  const records = brineRecords(dataset);
  const own = records.find((r) => r.formula === salt.anhydrous);
  const chargeScale = chargeScaleOf(z);
  if (own && own.hasEnthalpy) {
    return {
      formula: salt.anhydrous,
      basis: 'pitzer',
      particles,
      pitzer: own.pitzer,
      own: { osmotic: true, enthalpy: true, heatCapacity: own.hasHeatCapacity },
      maxMolality: own.record.maxMolality,
      scales: scales.scales,
      chargeScale,
      sources: [own.record.source, 'silvesterPitzer1977', 'moller1988'],
      fromMemory: own.record.fromMemory,
      notes: own.hasHeatCapacity ? [] : [`the Pitzer parameters of ${salt.anhydrous} have a temperature slope but no curvature: φJ is the Debye–Hückel term and the slope term only, with the heat-capacity discrepancy`],
    };
  }
  const estimate = chargeTypeEstimate(z, records, own?.formula);
  if (own) {
    const p = own.pitzer;
    const e = estimate.pitzer;
    return {
      formula: salt.anhydrous,
      basis: 'pitzer-with-estimated-temperature-terms',
      particles,
      pitzer: { ...p, beta0: splice(p.beta0, e.beta0), beta1: splice(p.beta1, e.beta1), beta2: p.beta2, cphi: splice(p.cphi, e.cphi) },
      own: { osmotic: true, enthalpy: false, heatCapacity: false },
      maxMolality: own.record.maxMolality,
      scales: scales.scales,
      chargeScale,
      sources: [own.record.source, 'silvesterPitzer1977', 'moller1988'],
      fromMemory: own.record.fromMemory,
      notes: [`${salt.anhydrous} has Pitzer parameters at 25 °C only: its φL and φJ use the temperature terms of ${z.zM}:${z.zX} salts (${estimate.salts.join(', ')}) with the calibrated model discrepancy`],
    };
  }
  return {
    formula: salt.anhydrous,
    basis: 'charge-type-estimate',
    particles,
    pitzer: estimate.pitzer,
    own: { osmotic: false, enthalpy: false, heatCapacity: false },
    maxMolality: 0,
    scales: scales.scales,
    chargeScale,
    sources: ['silvesterPitzer1977', 'moller1988', ...new Set(estimate.salts.map((f) => records.find((r) => r.formula === f)!.record.source))],
    fromMemory: false,
    notes: [
      `no Pitzer parameters for ${salt.anhydrous}: its brine is estimated from ${estimate.fallback ?? `the ${z.zM}:${z.zX} salts with data`} (${estimate.salts.join(', ')}), with the model discrepancy validated leaving one salt out`,
    ],
  };
}

