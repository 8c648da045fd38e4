/**
 * The Pitzer parameter sets of data/brine-pitzer.json read once per
 * dataset, the constants of water and ice, and the charge-type estimate of
 * a salt's parameters from the salts that have data.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { tableFormulaSalt } from '../chem/tableFormulaSalt.js';
import type { Salt } from '../chem/salt.js';
import type { BrinePitzerRecord, NonElectrolyteBrineRecord } from '../data/schemas.js';
import type { NonElectrolyteParameters } from './nonElectrolyteBrine.js';
import { hasTemperatureDependence, pitzerCoefficients, type PitzerCoefficients } from './pitzerTemperature.js';
import type { PitzerParameters } from './pitzerBrine.js';
import type { WaterConstants } from './waterPhases.js';

/** The parameters as read from a record, with the salt's ions. */
export interface BrineRecordParameters {
  formula: string;
  type: string;
  pitzer: PitzerParameters;
  hasEnthalpy: boolean;
  hasHeatCapacity: boolean;
  record: BrinePitzerRecord;
}

/** One salt's ions as Pitzer needs them, or undefined for a double salt or a non-electrolyte. */
export function saltCharges(salt: Salt): { zM: number; zX: number; nuM: number; nuX: number } | undefined {
  if (salt.kind !== 'ionic' || salt.ions.length !== 2) return undefined;
  const cation = salt.ions.find((i) => i.charge > 0);
  const anion = salt.ions.find((i) => i.charge < 0);
  if (!cation || !anion) return undefined;
  return { zM: cation.charge, zX: -anion.charge, nuM: cation.count, nuX: anion.count };
}

export function chargeScaleOf(z: { zM: number; zX: number; nuM: number; nuX: number }): number {
  return ((z.nuM + z.nuX) * z.zM * z.zX) / 2;
}

/** Whether coefficients carry curvature (a heat-capacity term), not only a slope. */
function hasCurvature(a: PitzerCoefficients): boolean {
  return a[1] !== 0 || a[2] !== 0 || a[4] !== 0 || a[5] !== 0;
}

/** The records of the table, parsed, per dataset. */
export function brineRecords(dataset: Dataset = builtinDataset()): readonly BrineRecordParameters[] {
  return dataset.memo('brine.records', () => {
    const out: BrineRecordParameters[] = [];
    for (const record of dataset.records('brine-pitzer.json')) {
      const salt = tableFormulaSalt(record.formula, dataset);
      if (!salt) continue;
      const z = saltCharges(salt);
      if (!z) continue;
      const pitzer: PitzerParameters = {
        ...z,
        beta0: pitzerCoefficients(record.beta0),
        beta1: pitzerCoefficients(record.beta1),
        beta2: pitzerCoefficients(record.beta2 ?? []),
        cphi: pitzerCoefficients(record.cphi),
        alpha1: record.alpha1,
        alpha2: record.beta2 ? (record.alpha2 ?? 12) : 0,
      };
      const all = [pitzer.beta0, pitzer.beta1, pitzer.cphi];
      out.push({
        formula: salt.formula,
        type: `${z.zM}:${z.zX}`,
        pitzer,
        hasEnthalpy: all.some(hasTemperatureDependence),
        hasHeatCapacity: all.some(hasCurvature),
        record,
      });
    }
    // Table order must not change a result (sums of floats): keep the sets in formula order.
    return out.sort((a, b) => (a.formula < b.formula ? -1 : a.formula > b.formula ? 1 : 0));
  });
}

/**
 * The non-electrolytes of the table with their series (φ − 1 = Σ aᵢ·mⁱ at T_ref in K, φL = Σ hᵢ·mⁱ in J/mol), by the
 * formula of the solute, per dataset.
 *
 * @see data/brine-pitzer.json `nonElectrolytes` (urea: `crcConcentrative`, `guckerPickard1940`)
 * @example
 * ```ts
 * nonElectrolyteRecords().get('CO(NH2)2')?.parameters.referenceK; // 273.15
 * ```
 */
export function nonElectrolyteRecords(dataset: Dataset = builtinDataset()): ReadonlyMap<string, { record: NonElectrolyteBrineRecord; parameters: NonElectrolyteParameters }> {
  return dataset.memo('brine.nonElectrolytes', () => {
    // The envelope's extra field is validated by its schema; its static type is not carried through `table()`.
    const list = (dataset.table('brine-pitzer.json') as unknown as { nonElectrolytes?: NonElectrolyteBrineRecord[] } | undefined)?.nonElectrolytes ?? [];
    const out = new Map<string, { record: NonElectrolyteBrineRecord; parameters: NonElectrolyteParameters }>();
    for (const record of list) {
      const salt = tableFormulaSalt(record.formula, dataset);
      if (!salt || salt.kind === 'ionic') continue;
      out.set(salt.anhydrous, {
        record,
        parameters: { osmotic: Float64Array.from(record.osmotic.coefficients), enthalpy: Float64Array.from(record.enthalpy.coefficients), referenceK: record.osmotic.referenceTemperature },
      });
    }
    return out;
  });
}

/** Water constants of the table. */
export function waterConstants(dataset: Dataset = builtinDataset()): WaterConstants & { iceSpecificHeat: number; sources: string[] } {
  return dataset.memo('brine.water', () => {
    // The envelope's extra field is validated by its schema; its static type is not carried through `table()`.
    const w = (dataset.table('brine-pitzer.json') as unknown as { water?: Record<'fusionEnthalpy' | 'fusionHeatCapacity' | 'vaporizationEnthalpy' | 'molarMass' | 'iceSpecificHeat', { value: number; source: string }> } | undefined)?.water;
    if (!w) return { fusionEnthalpy: 6007, fusionHeatCapacity: 37.9, vaporizationEnthalpy: 40650, molarMass: 0.01801528, iceSpecificHeat: 2.09, sources: ['wagman1982'] };
    return {
      fusionEnthalpy: w.fusionEnthalpy.value,
      fusionHeatCapacity: w.fusionHeatCapacity.value,
      vaporizationEnthalpy: w.vaporizationEnthalpy.value,
      molarMass: w.molarMass.value,
      iceSpecificHeat: w.iceSpecificHeat.value,
      sources: [...new Set([w.fusionEnthalpy.source, w.fusionHeatCapacity.source, w.vaporizationEnthalpy.source, w.iceSpecificHeat.source])],
    };
  });
}

/** Mean of coefficient lists (element by element). */
function meanCoefficients(list: readonly PitzerCoefficients[]): PitzerCoefficients {
  const a = new Float64Array(6);
  if (list.length === 0) return a;
  for (const c of list) for (let i = 0; i < 6; i++) a[i]! += c[i]! / list.length;
  return a;
}

/** A0 from one set, A1…A5 from another. */
export function splice(base: PitzerCoefficients, temperature: PitzerCoefficients): PitzerCoefficients {
  const a = new Float64Array(temperature);
  a[0] = base[0]!;
  return a;
}

/**
 * The charge-type estimate of a salt's Pitzer parameters from the records
 * (excluding `exclude`): the mean of the 25 °C values over the salts of the
 * same charge type, and the mean of the temperature coefficients over those
 * of them that have any. Where no salt of the type has data, the type with
 * the same |zMzX| and then 1:1 stand in (`fallback` says so).
 * @internal
 */
export function chargeTypeEstimate(
  z: { zM: number; zX: number; nuM: number; nuX: number },
  records: readonly BrineRecordParameters[],
  exclude?: string,
): { pitzer: PitzerParameters; fallback: string | undefined; salts: string[] } {
  const type = `${z.zM}:${z.zX}`;
  const usable = records.filter((r) => r.formula !== exclude);
  let group = usable.filter((r) => r.type === type);
  let fallback: string | undefined;
  if (group.length === 0) {
    group = usable.filter((r) => r.pitzer.zM * r.pitzer.zX === z.zM * z.zX);
    fallback = group.length ? `salts of another charge type with the same |z₊z₋| (${[...new Set(group.map((r) => r.type))].join(', ')})` : undefined;
  }
  if (group.length === 0) {
    group = usable.filter((r) => r.type === '1:1');
    fallback = '1:1 salts (no salt of this charge type or |z₊z₋| has data)';
  }
  const withT = group.filter((r) => r.hasEnthalpy);
  const tGroup = withT.length ? withT : group;
  const part = (key: 'beta0' | 'beta1' | 'beta2' | 'cphi'): PitzerCoefficients =>
    splice(meanCoefficients(group.map((r) => r.pitzer[key])), meanCoefficients(tGroup.map((r) => r.pitzer[key])));
  // β² and α₂ belong to particular salts (ion association); the estimate leaves them out.
  return {
    pitzer: { ...z, beta0: part('beta0'), beta1: part('beta1'), beta2: new Float64Array(6), cphi: part('cphi'), alpha1: z.zM === 2 && z.zX === 2 ? 1.4 : 2, alpha2: 0 },
    fallback,
    salts: group.map((r) => r.formula),
  };
}

