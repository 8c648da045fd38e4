/**
 * The data of one salt-hydrate melt as the warmer model uses them: the
 * record of the warmer-melts table, the hydrate's liquidus below its melting
 * point from the solubility table, and the solubility of the solid that
 * separates on incongruent melting.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { WarmerMeltRecord } from '../data/schemas.js';
import { parseSalt } from '../chem/parseSalt.js';
import { saltArgument } from '../chem/saltArgument.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError, isIonheatError } from '../error.js';
import { solubilityCurve } from '../pack/solubilityCurve.js';
import type { LiquidusPoint } from './crystallisingFill.js';

/** A hydrate melt with its data. */
export interface WarmerMelt {
  /** The hydrate. */
  salt: Salt;
  record: WarmerMeltRecord;
  /** Mass fraction of anhydrous salt in the hydrate (and in its melt). */
  anhydrousFraction: number;
  /** Tabulated points of the hydrate's solubility below its melting point (g anhydrous salt per g water), temperatures rising; empty when the table has none. */
  hydrateSolubility: readonly LiquidusPoint[];
  /** Tabulated solubility of the solid that separates on melting, temperatures rising; empty when there is none. */
  separatedSolubility: readonly LiquidusPoint[];
  /** The solubility table's source, when it gave points. */
  solubilitySource: string | undefined;
}

/** The table's records by canonical hydrate formula, built once per dataset. */
function meltIndex(dataset: Dataset): ReadonlyMap<string, WarmerMeltRecord> {
  return dataset.memo('warmer.meltIndex', () => {
    const index = new Map<string, WarmerMeltRecord>();
    dataset.records('warmer-melts.json').forEach((record, i) => {
      let formula: string;
      try {
        formula = parseSalt(record.formula, dataset).formula;
      } catch (e) {
        throw new IonheatError('INVALID_DATA', `${dataset.label} table warmer-melts.json, record ${i + 1} ("${record.formula}"): ${isIonheatError(e) ? e.message : String(e)}`, { field: `warmer-melts.json[${i}].formula` });
      }
      index.set(formula, record);
    });
    return index;
  });
}

/** The hydrates the table holds, canonical formulas in table order. */
export function warmerSalts(dataset: Dataset = builtinDataset()): string[] {
  return [...meltIndex(dataset).keys()];
}

/**
 * The melt data of a salt hydrate.
 *
 * @throws IonheatError `NOT_APPLICABLE` when the salt is not a hydrate; `MISSING_DATA` naming what is missing when
 *   the warmer-melts table has no record for it
 */
export function warmerMelt(salt: string | Salt, dataset: Dataset = builtinDataset()): WarmerMelt {
  const parsed = saltArgument(salt, dataset);
  const known = warmerSalts(dataset);
  if (parsed.water === 0) {
    throw new IonheatError('NOT_APPLICABLE', `${parsed.formula} is not a salt hydrate, so it has no hydrate melt to supercool; a latent-heat warmer needs one of ${known.join(', ')}`, { field: 'salt', text: parsed.formula });
  }
  const record = meltIndex(dataset).get(parsed.formula);
  if (!record) {
    throw new IonheatError('MISSING_DATA', `no melting point, latent heat of fusion or heat capacities of the solid and the melt for ${parsed.formula} in warmer-melts.json of the ${dataset.label} tables (known: ${known.join(', ')})`, { field: 'salt', text: parsed.formula });
  }
  const anhydrousFraction = parseSalt(parsed.anhydrous, dataset).molarMass / parsed.molarMass;
  const curve = solubilityCurve(parsed, dataset);
  const separated = record.solidOnMelting ? parseSalt(record.solidOnMelting, dataset).formula : undefined;
  const pick = (phase: string | undefined) => (curve && phase ? curve.points.filter((p) => p.phase === phase).map((p) => ({ t: p.t, s: p.value / 100 })) : []);
  const hydrateSolubility = pick(parsed.formula).filter((p) => p.t < record.meltingPoint.value);
  const separatedSolubility = pick(separated);
  return {
    salt: parsed,
    record,
    anhydrousFraction,
    hydrateSolubility,
    separatedSolubility,
    solubilitySource: hydrateSolubility.length + separatedSolubility.length > 0 ? curve!.source : undefined,
  };
}
