/**
 * The crystal structure a lattice estimate assumes: its Madelung constant,
 * coordination numbers and, for cubic types, the shortest cation–anion
 * distance from the lattice parameter.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { MadelungRecord, StructureType } from '../data/schemas.js';
import { isTerm, STRUCTURE_TYPES } from '../data/tableTerms.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { IonheatError } from '../error.js';

/** Stoichiometry classes of the Madelung table. */
export type Stoichiometry = MadelungRecord['stoichiometry'];

/** The structure resolved for a salt. */
export interface SaltStructure {
  type: StructureType;
  madelung: MadelungRecord;
  /** Lattice parameter a, Å: the caller's, else the tabulated one for this structure, else undefined. */
  latticeParameter: number | undefined;
  /** Where a came from. */
  latticeParameterSource: string | undefined;
  /** `option` when the caller named the structure, `table` when crystals.json gave it. */
  origin: 'option' | 'table';
  /** Source of the crystals.json record that named the structure. */
  crystalSource: string | undefined;
  crystalFromMemory: boolean;
}

/**
 * The stoichiometry class of a salt: `MX`, `MX2`, `M2X`, `M2X3`, `MX3` for
 * one kind of cation and one of anion, `ABX3` for two cations and three
 * anions of one kind; undefined otherwise.
 */
export function saltStoichiometry(salt: Pick<Salt, 'ions'>): Stoichiometry | undefined {
  const cations = salt.ions.filter((i) => i.charge > 0);
  const anions = salt.ions.filter((i) => i.charge < 0);
  if (anions.length !== 1) return undefined;
  const q = anions[0]!.count;
  if (cations.length === 2) return cations[0]!.count === 1 && cations[1]!.count === 1 && q === 3 ? 'ABX3' : undefined;
  if (cations.length !== 1) return undefined;
  const p = cations[0]!.count;
  const key = `${p}:${q}`;
  return ({ '1:1': 'MX', '1:2': 'MX2', '2:1': 'M2X', '2:3': 'M2X3', '1:3': 'MX3' } as const)[key as '1:1'];
}

/** Shortest cation–anion distance as a multiple of the cubic lattice parameter a. */
const CUBIC_DISTANCE: Partial<Record<StructureType, number>> = {
  'rock-salt': 1 / 2,
  'caesium-chloride': Math.sqrt(3) / 2,
  'zinc-blende': Math.sqrt(3) / 4,
  fluorite: Math.sqrt(3) / 4,
  antifluorite: Math.sqrt(3) / 4,
  perovskite: 1 / 2,
};

/**
 * The shortest cation–anion distance r₀ of a cubic structure from its
 * lattice parameter: a/2 (rock salt; perovskite B–X), a√3/2 (caesium
 * chloride), a√3/4 (zinc blende, fluorite, antifluorite). Geometry of the
 * ideal structures (common practice).
 *
 * @param type - structure type
 * @param a - cubic lattice parameter, Å
 * @returns r₀ in Å, or undefined for a structure that is not cubic
 * @example
 * ```ts
 * shortestDistance('rock-salt', 5.6402); // 2.8201 (NaCl)
 * shortestDistance('caesium-chloride', 4.123); // 3.5706 (CsCl)
 * ```
 */
export function shortestDistance(type: StructureType, a: number): number | undefined {
  const f = CUBIC_DISTANCE[type];
  return f === undefined ? undefined : f * a;
}

/** Madelung records by structure type, once per dataset. */
function madelungIndex(dataset: Dataset): ReadonlyMap<string, MadelungRecord> {
  return dataset.index('madelung-constants.json');
}

/** Reads a structure name from the caller, rejecting unknown names. */
export function readStructureType(name: string): StructureType {
  if (!isTerm(STRUCTURE_TYPES, name)) {
    throw new IonheatError('INVALID_ARGUMENT', `"${name}" is not a structure type ionheat knows (known: ${STRUCTURE_TYPES.join(', ')})`, { field: 'structure', text: name });
  }
  return name;
}

/**
 * The structure of a salt: the caller's choice, else the structure type in
 * crystals.json; with its Madelung record and lattice parameter. Undefined
 * when neither names a structure.
 *
 * @throws IonheatError `INVALID_ARGUMENT` for an unknown structure name or a
 *   lattice parameter given for a structure that is not cubic;
 *   `NOT_APPLICABLE` when the structure's stoichiometry does not fit the salt;
 *   `MISSING_DATA` when the Madelung table lacks the structure
 */
export function saltStructure(salt: Salt, options: { structure?: string; latticeParameter?: number }, dataset: Dataset): SaltStructure | undefined {
  const crystal = saltRecords('crystals.json', salt, dataset)[0];
  const type = options.structure !== undefined ? readStructureType(options.structure) : crystal?.structure;
  if (type === undefined) return undefined;
  const madelung = madelungIndex(dataset).get(type);
  if (!madelung) throw new IonheatError('MISSING_DATA', `no Madelung constant for the ${type} structure in the ${dataset.label} tables (madelung-constants.json)`, { field: 'structure', text: type });
  const stoichiometry = saltStoichiometry(salt);
  if (stoichiometry !== madelung.stoichiometry) {
    throw new IonheatError('NOT_APPLICABLE', `the ${type} structure is a ${madelung.stoichiometry} lattice; ${salt.formula} is ${stoichiometry ?? 'not a simple binary or ABX3 salt'}`, { field: 'structure', text: salt.formula });
  }
  let latticeParameter: number | undefined;
  let latticeParameterSource: string | undefined;
  if (options.latticeParameter !== undefined) {
    const a = options.latticeParameter;
    if (!(Number.isFinite(a) && a > 0)) throw new IonheatError('INVALID_ARGUMENT', `a lattice parameter must be a positive number of ångström, got ${a}`, { field: 'latticeParameter' });
    if (CUBIC_DISTANCE[type] === undefined) throw new IonheatError('INVALID_ARGUMENT', `a single lattice parameter fixes r₀ only for cubic structures; ${type} is not cubic`, { field: 'latticeParameter' });
    latticeParameter = a;
    latticeParameterSource = 'option';
  } else if (crystal?.latticeParameter !== undefined && crystal.structure === type && CUBIC_DISTANCE[type] !== undefined) {
    latticeParameter = crystal.latticeParameter;
    latticeParameterSource = crystal.source;
  }
  return {
    type,
    madelung,
    latticeParameter,
    latticeParameterSource,
    origin: options.structure !== undefined ? 'option' : 'table',
    crystalSource: crystal?.source,
    crystalFromMemory: crystal?.fromMemory ?? false,
  };
}
