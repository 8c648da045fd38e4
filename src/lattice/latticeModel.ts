/**
 * The four lattice estimators applied to a salt from the tables, before any
 * calibration: the model's lattice enthalpy at 298.15 K and what it rests on.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { Salt } from '../chem/salt.js';
import { chargeType } from '../chem/salt.js';
import { saltRecords } from '../chem/saltRecords.js';
import { IonheatError, isIonheatError, type ErrorCode } from '../error.js';
import { bornLande } from './bornLande.js';
import { bornMayer } from './bornMayer.js';
import { formulaUnitVolume } from './formulaUnitVolume.js';
import { glasserLatticeEnergy } from './glasserLatticeEnergy.js';
import { ionRadius, type ChosenRadius } from './ionRadius.js';
import { kapustinskii } from './kapustinskii.js';
import { latticeEnthalpyCorrection } from './latticeEnthalpyCorrection.js';
import { latticeIons, type LatticeIon } from './latticeIons.js';
import { saltStructure, shortestDistance, type SaltStructure } from './latticeStructure.js';
import { vbtLatticeEnergy } from './vbtLatticeEnergy.js';
import { fixedDecimal } from '../quantity/fixedDecimal.js';

/** The estimators. */
export type LatticeModel = 'kapustinskii' | 'born-lande' | 'born-mayer' | 'vbt';
/** Every estimator, in the order results list them. */
export const latticeModels: readonly LatticeModel[] = ['kapustinskii', 'born-lande', 'born-mayer', 'vbt'];

/** Options that change what an estimator assumes. */
export interface LatticeModelOptions {
  /** Structure type (`rock-salt`, `fluorite`, …); default: the one in crystals.json. */
  structure?: string;
  /** Cubic lattice parameter a, Å, for r₀ of Born–Landé and Born–Mayer; default: the tabulated one. */
  latticeParameter?: number;
  /** Coordination number at which Shannon radii are read (both ions); default: the structure's, else 6. */
  coordination?: number;
}

/** An estimator's uncalibrated result. */
export interface ModelPoint {
  /** Lattice enthalpy ΔH_L at 298.15 K, kJ/mol. */
  value: number;
  /** Lattice energy U before the enthalpy correction, kJ/mol. */
  energy: number;
  sources: string[];
  notes: string[];
}

/** Above this lattice energy (kJ/mol) the volume-based α, β fits give way to Glasser's form (Glasser 1995; Jenkins et al. 1999). */
export const GLASSER_THRESHOLD = 5000;

interface SaltIons {
  cations: { ion: LatticeIon; count: number }[];
  anions: { ion: LatticeIon; count: number }[];
}

/**
 * An estimator that cannot be applied to a salt: the error code, and the
 * error for people, built only when it is asked for (so that callers that
 * try every estimator on many salts pay for neither a message nor a stack).
 */
export class PointFailure {
  constructor(
    readonly code: ErrorCode,
    readonly error: () => IonheatError,
  ) {}
}

/** Notes of a model point: a list to fill, or undefined when the caller wants numbers and sources only. */
type Notes = string[] | undefined;

function applicable(salt: Salt): PointFailure | undefined {
  if (salt.kind !== 'ionic') return new PointFailure('NOT_APPLICABLE', () => new IonheatError('NOT_APPLICABLE', `${salt.formula} is a non-electrolyte: it forms a molecular crystal, not an ionic lattice`, { text: salt.formula }));
  if (salt.water > 0) {
    return new PointFailure('NOT_APPLICABLE', () => new IonheatError('NOT_APPLICABLE', `${salt.formula} is a hydrate; lattice enthalpies are estimated for the anhydrous salt (${salt.anhydrous})`, { text: salt.formula }));
  }
  return undefined;
}

function ionsOf(salt: Salt, dataset: Dataset): SaltIons | PointFailure {
  const index = latticeIons(dataset);
  const cations: SaltIons['cations'] = [];
  const anions: SaltIons['anions'] = [];
  for (const { ion, count } of salt.ions) {
    const li = index.get(ion);
    if (!li) return new PointFailure('UNKNOWN_ION', () => new IonheatError('UNKNOWN_ION', `the ion ${ion} of ${salt.formula} is not in the ${dataset.label} ion table`, { text: salt.formula }));
    (li.charge > 0 ? cations : anions).push({ ion: li, count });
  }
  return { cations, anions };
}

function correction(salt: SaltIons): number {
  const list: { count: number; shape: LatticeIon['shape'] }[] = [];
  for (const c of salt.cations) list.push({ count: c.count, shape: c.ion.shape });
  for (const a of salt.anions) list.push({ count: a.count, shape: a.ion.shape });
  return latticeEnthalpyCorrection(list);
}

function radiusOf(ion: LatticeIon, cn: number, salt: Salt, dataset: Dataset, notes: Notes, sources: string[]): ChosenRadius | PointFailure {
  const r = ionRadius(ion, cn);
  if (!r) {
    return new PointFailure(
      'MISSING_DATA',
      () =>
        new IonheatError(
          'MISSING_DATA',
          `no radius for ${ion.text} (neither a Shannon radius in shannon-radii.json nor a thermochemical radius in thermochemical-radii.json of the ${dataset.label} tables), needed for ${salt.formula}`,
          { text: salt.formula, field: ion.id },
        ),
    );
  }
  sources.push(r.source);
  if (r.substituted) notes?.push(`${ion.text}: Shannon radius at CN ${r.cn} (none tabulated at CN ${cn})`);
  if (r.fromMemory) notes?.push(`${ion.text} radius ${r.value} Å entered from memory, not checked against the source`);
  return r;
}

/** Coordination numbers for the radii: the caller's, else the structure's, else 6. */
function coordination(options: LatticeModelOptions, structure: SaltStructure | undefined): { cation: number; anion: number } | PointFailure {
  if (options.coordination !== undefined) {
    const cn = options.coordination;
    if (!(Number.isInteger(cn) && cn >= 2 && cn <= 14)) return new PointFailure('INVALID_ARGUMENT', () => new IonheatError('INVALID_ARGUMENT', `a coordination number is a whole number from 2 to 14, got ${cn}`, { field: 'coordination' }));
    return { cation: cn, anion: cn };
  }
  if (structure) return { cation: structure.madelung.cationCoordination, anion: structure.madelung.anionCoordination };
  return { cation: 6, anion: 6 };
}

function meanRadius(list: SaltIons['cations'], cn: number, salt: Salt, dataset: Dataset, notes: Notes, sources: string[]): number | PointFailure {
  let sum = 0;
  let n = 0;
  for (const { ion, count } of list) {
    const r = radiusOf(ion, cn, salt, dataset, notes, sources);
    if (r instanceof PointFailure) return r;
    sum += count * r.value;
    n += count;
  }
  return sum / n;
}

/** The structure of a salt (see {@link saltStructure}), its errors as failures. */
function structureOf(salt: Salt, options: LatticeModelOptions, dataset: Dataset): SaltStructure | undefined | PointFailure {
  try {
    return saltStructure(salt, options, dataset);
  } catch (e) {
    if (!isIonheatError(e)) throw e;
    return new PointFailure(e.code, () => e);
  }
}

/**
 * What every estimator reads of a salt, gathered once: its ions, its
 * structure with default structure options, and the energy → enthalpy
 * correction.
 */
export interface PreparedSalt {
  ions: SaltIons;
  structure: SaltStructure | undefined | PointFailure;
  correction: number;
}

/** The structure for these options: the prepared one unless the options name a structure or a lattice parameter. */
function structureFor(salt: Salt, prepared: PreparedSalt, options: LatticeModelOptions, dataset: Dataset): SaltStructure | undefined | PointFailure {
  return options.structure === undefined && options.latticeParameter === undefined ? prepared.structure : structureOf(salt, options, dataset);
}

function kapustinskiiPoint(salt: Salt, prepared: PreparedSalt, options: LatticeModelOptions, dataset: Dataset, notes: Notes): ModelPoint | PointFailure {
  const ions = prepared.ions;
  const structure = structureFor(salt, prepared, options, dataset);
  if (structure instanceof PointFailure) return structure;
  const cn = coordination(options, structure);
  if (cn instanceof PointFailure) return cn;
  const sources = ['kapustinskii1956'];
  const rc = meanRadius(ions.cations, cn.cation, salt, dataset, notes, sources);
  if (rc instanceof PointFailure) return rc;
  const ra = meanRadius(ions.anions, cn.anion, salt, dataset, notes, sources);
  if (ra instanceof PointFailure) return ra;
  const d = rc + ra;
  let chargeFactor = 0;
  for (const { ion, count } of ions.cations) chargeFactor += count * ion.charge * ion.charge;
  for (const { ion, count } of ions.anions) chargeFactor += count * ion.charge * ion.charge;
  if (ions.cations.length > 1 || ions.anions.length > 1) {
    notes?.push('several kinds of ion: Σnz² and the count-weighted mean cation–anion distance stand in for ν|z₊z₋| and r₊ + r₋ (Glasser 1995)');
    if (dataset.source('glasser1995')) sources.push('glasser1995');
  }
  const energy = kapustinskii(chargeFactor, d);
  return { value: energy + prepared.correction, energy, sources, notes: notes ?? [] };
}

function bornExponent(ions: SaltIons, salt: Salt, dataset: Dataset, sources: string[]): number | PointFailure {
  let sum = 0;
  let n = 0;
  for (const { ion, count } of [...ions.cations, ...ions.anions]) {
    if (!ion.bornExponent) {
      return new PointFailure(
        'MISSING_DATA',
        () =>
          new IonheatError('MISSING_DATA', `no Born exponent for ${ion.text} (its noble-gas core ${ion.bornCore ?? 'is not given'} has no record in born-exponents.json of the ${dataset.label} tables), needed for ${salt.formula}`, {
            text: salt.formula,
            field: ion.id,
          }),
      );
    }
    sources.push(ion.bornExponent.source);
    sum += count * ion.bornExponent.value;
    n += count;
  }
  return sum / n;
}

/** Madelung constant × charge factor, and r₀, for Born–Landé and Born–Mayer. */
function madelungTerms(salt: Salt, prepared: PreparedSalt, options: LatticeModelOptions, dataset: Dataset, notes: Notes, sources: string[]): { a: number; zz: number; r0: number } | PointFailure {
  const ions = prepared.ions;
  const structure = structureFor(salt, prepared, options, dataset);
  if (structure instanceof PointFailure) return structure;
  if (!structure && (ions.cations.length > 1 || ions.anions.length > 1)) {
    return new PointFailure(
      'NOT_APPLICABLE',
      () => new IonheatError('NOT_APPLICABLE', `${salt.formula} has several kinds of ion; a Madelung constant is tabulated for such a lattice only for the perovskite type (structure option)`, { text: salt.formula, field: 'structure' }),
    );
  }
  if (!structure) {
    return new PointFailure(
      'MISSING_DATA',
      () => new IonheatError('MISSING_DATA', `no structure type for ${salt.formula} in crystals.json of the ${dataset.label} tables; give one (structure option, e.g. rock-salt)`, { text: salt.formula, field: 'structure' }),
    );
  }
  const m = structure.madelung;
  sources.push(m.source);
  if (structure.crystalSource && structure.origin === 'table') sources.push(structure.crystalSource);
  if (m.fromMemory) notes?.push(`Madelung constant of ${m.structure} entered from memory`);
  let zz: number;
  let cationForR0: LatticeIon;
  const anion = ions.anions[0]!.ion;
  if (m.stoichiometry === 'ABX3') {
    // The tabulated perovskite constant is for charges A(+z) B(+2z) X(−z), divided by z² (see its note).
    const z = -anion.charge;
    const [a1, a2] = [ions.cations[0]!.ion, ions.cations[1]!.ion];
    const b = a1.charge === 2 * z && a2.charge === z ? a1 : a2.charge === 2 * z && a1.charge === z ? a2 : undefined;
    if (!b) {
      return new PointFailure(
        'NOT_APPLICABLE',
        () => new IonheatError('NOT_APPLICABLE', `the tabulated perovskite Madelung constant holds for the charge pattern A(+z) B(+2z) X(−z); ${salt.formula} does not follow it`, { text: salt.formula, field: 'structure' }),
      );
    }
    zz = z * z;
    cationForR0 = b;
  } else {
    cationForR0 = ions.cations[0]!.ion;
    zz = Math.abs(cationForR0.charge * anion.charge);
  }
  let r0: number;
  const fromA = structure.latticeParameter !== undefined ? shortestDistance(structure.type, structure.latticeParameter) : undefined;
  if (fromA !== undefined) {
    r0 = fromA;
    if (structure.latticeParameterSource && structure.latticeParameterSource !== 'option') sources.push(structure.latticeParameterSource);
    notes?.push(`r₀ = ${+fixedDecimal(r0, 4)} Å from the lattice parameter a = ${structure.latticeParameter} Å`);
  } else {
    const cn = coordination(options, structure);
    if (cn instanceof PointFailure) return cn;
    const rc = radiusOf(cationForR0, cn.cation, salt, dataset, notes, sources);
    if (rc instanceof PointFailure) return rc;
    const ra = radiusOf(anion, cn.anion, salt, dataset, notes, sources);
    if (ra instanceof PointFailure) return ra;
    r0 = rc.value + ra.value;
    notes?.push(`r₀ = ${+fixedDecimal(r0, 4)} Å as a sum of radii at CN ${cn.cation}/${cn.anion}`);
  }
  return { a: m.value, zz, r0 };
}

function bornPoint(model: 'born-lande' | 'born-mayer', salt: Salt, prepared: PreparedSalt, options: LatticeModelOptions, dataset: Dataset, notes: Notes): ModelPoint | PointFailure {
  const ions = prepared.ions;
  const sources: string[] = [model === 'born-lande' ? 'born1918' : 'born1932'];
  const terms = madelungTerms(salt, prepared, options, dataset, notes, sources);
  if (terms instanceof PointFailure) return terms;
  const { a, zz, r0 } = terms;
  let energy: number;
  if (model === 'born-lande') {
    const n = bornExponent(ions, salt, dataset, sources);
    if (n instanceof PointFailure) return n;
    energy = bornLande(a, zz, r0, n);
  } else {
    energy = bornMayer(a, zz, r0);
  }
  return { value: energy + prepared.correction, energy, sources, notes: notes ?? [] };
}

function vbtPoint(salt: Salt, prepared: PreparedSalt, dataset: Dataset, notes: Notes): ModelPoint | PointFailure {
  const ions = prepared.ions;
  const sources: string[] = [];
  const crystal = saltRecords('crystals.json', salt, dataset)[0];
  let volume: number;
  if (crystal?.density !== undefined) {
    volume = formulaUnitVolume(salt.molarMass, crystal.density);
    sources.push(crystal.source);
    if (crystal.fromMemory) notes?.push(`density of ${salt.formula} entered from memory`);
  } else {
    volume = 0;
    for (const { ion, count } of [...ions.cations, ...ions.anions]) {
      if (!ion.volume) {
        return new PointFailure(
          'MISSING_DATA',
          () =>
            new IonheatError('MISSING_DATA', `no density of ${salt.formula} in crystals.json and no volume of ${ion.text} in ion-volumes.json of the ${dataset.label} tables, needed for the formula-unit volume`, {
              text: salt.formula,
              field: ion.id,
            }),
        );
      }
      volume += count * ion.volume.value;
      sources.push(ion.volume.source);
    }
    notes?.push(`formula-unit volume ${+fixedDecimal(volume, 5)} nm³ as a sum of ion volumes (no density tabulated)`);
  }
  let ionicStrength = 0;
  for (const { ion, count } of [...ions.cations, ...ions.anions]) ionicStrength += (count * ion.charge * ion.charge) / 2;
  const type = chargeType(salt);
  const coefficients = dataset.index('volume-coefficients.json');
  const rec = (type !== undefined ? coefficients.get(type as never) : undefined) ?? coefficients.get('general');
  if (!rec) {
    return new PointFailure(
      'MISSING_DATA',
      () => new IonheatError('MISSING_DATA', `no volume-based coefficients for charge type ${type ?? 'of a mixed salt'} nor general ones in volume-coefficients.json of the ${dataset.label} tables`, { text: salt.formula }),
    );
  }
  if (rec.chargeType === 'general' && type !== 'general') notes?.push(`general α, β (no fit for charge type ${type ?? 'of a mixed salt'})`);
  sources.push(rec.source);
  if (rec.fromMemory) notes?.push(`volume-based coefficients (${rec.chargeType}) entered from memory`);
  let energy = vbtLatticeEnergy(ionicStrength, volume, rec.alpha, rec.beta);
  if (energy > GLASSER_THRESHOLD) {
    energy = glasserLatticeEnergy(ionicStrength, volume);
    notes?.push(`lattice energy above ${GLASSER_THRESHOLD} kJ/mol: Glasser's form U = A·I·(2I/V)^(1/3) used`);
    sources.push(dataset.source('glasser1995') ? 'glasser1995' : 'glasser2000');
  }
  return { value: energy + prepared.correction, energy, sources, notes: notes ?? [] };
}

/**
 * One estimator's lattice enthalpy of a salt, without calibration.
 *
 * @throws IonheatError `NOT_APPLICABLE` (non-electrolyte, hydrate, a
 *   structure that does not fit), `MISSING_DATA` (naming the radius, volume,
 *   structure or Born exponent missing), `INVALID_ARGUMENT` (bad options)
 */
export function latticeModelPoint(salt: Salt, model: LatticeModel, options: LatticeModelOptions, dataset: Dataset): ModelPoint {
  const point = tryLatticeModelPoint(salt, model, options, dataset, []);
  if (point instanceof PointFailure) throw point.error();
  return point;
}

/**
 * {@link latticeModelPoint} that returns its failure instead of throwing
 * it, and writes its notes into `notes` (none at all when `notes` is
 * undefined: the point's `notes` is then empty). The numbers and sources
 * are the same either way.
 */
export function tryLatticeModelPoint(
  salt: Salt,
  model: LatticeModel,
  options: LatticeModelOptions,
  dataset: Dataset,
  notes: string[] | undefined,
  prepared: PreparedSalt | PointFailure = prepareLatticeSalt(salt, dataset),
): ModelPoint | PointFailure {
  if (prepared instanceof PointFailure) return prepared;
  switch (model) {
    case 'kapustinskii':
      return kapustinskiiPoint(salt, prepared, options, dataset, notes);
    case 'born-lande':
    case 'born-mayer':
      return bornPoint(model, salt, prepared, options, dataset, notes);
    case 'vbt':
      return vbtPoint(salt, prepared, dataset, notes);
  }
}

/**
 * What {@link tryLatticeModelPoint} reads of a salt for every estimator,
 * gathered once (pass it to each call for the same salt); the failure that
 * stops every estimator (a non-electrolyte, a hydrate, an ion the table
 * lacks) otherwise.
 */
export function prepareLatticeSalt(salt: Salt, dataset: Dataset): PreparedSalt | PointFailure {
  const notApplicable = applicable(salt);
  if (notApplicable) return notApplicable;
  const ions = ionsOf(salt, dataset);
  if (ions instanceof PointFailure) return ions;
  if (ions.cations.length === 0 || ions.anions.length === 0) return new PointFailure('NOT_APPLICABLE', () => new IonheatError('NOT_APPLICABLE', `${salt.formula} needs both cations and anions for a lattice`, { text: salt.formula }));
  return { ions, structure: structureOf(salt, {}, dataset), correction: correction(ions) };
}
