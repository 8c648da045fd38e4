/**
 * zod schemas for every data table under `data/`: the one source of truth for
 * their shape. Types are inferred from these schemas; the built-in tables and a
 * user's own override tables pass through the same checks.
 *
 * Conventions (see DEVELOPERS.md): 298.15 K and 1 bar; energies in kJ/mol;
 * radii in Å; ion volumes in nm³; masses in g; temperatures in °C for
 * solubility. Every record names its `source` (a key of `data/sources.json`)
 * and says whether its number was entered `fromMemory` rather than checked
 * against a copy of that source.
 *
 * @module
 */
import { z } from 'zod';
import { HAZARD_CLASSES, STRUCTURE_TYPES } from './tableTerms.js';

/** An identifier of an ion, written as formula and bracketed charge: `Na[+]`, `Ca[2+]`, `SO4[2-]`, `CO(NH2)2[0]`. */
export const ionIdSchema = z
  .string()
  .regex(/^[A-Za-z0-9()]{1,40}\[(?:0|[1-9]?[+-])\]$/, 'an ion id looks like Na[+], Ca[2+], SO4[2-] or CO(NH2)2[0]');

/** A formula as a person writes it; resolved by the formula parser when the dataset is built. */
export const formulaTextSchema = z.string().min(1).max(120);

const provenance = {
  /** Key into `data/sources.json`. */
  source: z.string().min(1).max(80),
  /** True where the number was typed from memory and not checked against a copy of the source. */
  fromMemory: z.boolean(),
  /** The open copy the value was matched with, e.g. `tests/reference/chemicals-crc-thermo.json` (see docs/provenance.md); absent where none was. */
  checkedAgainst: z.string().min(1).max(300).optional(),
  note: z.string().max(2000).optional(),
};

const finite = z.number().refine(Number.isFinite, 'must be a finite number');
const positive = finite.refine((v) => v > 0, 'must be greater than zero');
const nonNegative = finite.refine((v) => v >= 0, 'must not be negative');
/** Standard uncertainty; `null` means the table's `defaultUncertainty` applies. */
const uncertainty = nonNegative.nullable();

/** Element symbol → count, e.g. `{ "S": 1, "O": 4 }`. */
export const compositionSchema = z.record(
  z.string().regex(/^[A-Z][a-z]?$/, 'element symbols look like H, Na or Cl'),
  positive,
);

/** Wraps a record schema in the envelope every table file shares. */
function table<T extends z.ZodType>(record: T, extra: z.ZodRawShape = {}) {
  return z.strictObject({
    $schema: z.string().optional(),
    title: z.string().min(1),
    description: z.string().min(1),
    unit: z.string().min(1).optional(),
    defaultUncertainty: nonNegative.optional(),
    defaultUncertaintyNote: z.string().optional(),
    conventions: z.string().optional(),
    ...extra,
    records: z.array(record),
  });
}

export const sourceSchema = z.strictObject({
  citation: z.string().min(1),
  kind: z.enum(['book', 'journal', 'database', 'software', 'standard', 'commonPractice', 'derived', 'invented', 'inHouse']),
  url: z.string().optional(),
  note: z.string().optional(),
});
export const sourcesFileSchema = z.strictObject({
  $schema: z.string().optional(),
  title: z.string(),
  description: z.string(),
  sources: z.record(z.string().min(1).max(80), sourceSchema),
});

export const elementRecordSchema = z.strictObject({
  symbol: z.string().regex(/^[A-Z][a-z]?$/),
  z: z.number().int().min(1).max(118),
  name: z.string().min(1),
  /** Standard atomic weight (conventional value where IUPAC gives an interval), g/mol. */
  value: positive,
  unit: z.literal('g/mol'),
  uncertainty,
  ...provenance,
});

export const ionKindSchema = z.enum(['monatomic', 'polyatomic', 'non-electrolyte']);
export const nobleGasCoreSchema = z.enum(['He', 'Ne', 'Ar', 'Kr', 'Xe']);

export const ionRecordSchema = z.strictObject({
  id: ionIdSchema,
  /** The formula as it appears inside a salt formula, e.g. `NH4`, `SO4`, `CH3COO`. */
  formula: z.string().min(1).max(40),
  name: z.string().min(1),
  charge: z.number().int().min(-4).max(4),
  kind: ionKindSchema,
  composition: compositionSchema,
  /** Noble-gas configuration whose Pauling Born exponent applies; null for non-electrolytes. */
  bornCore: nobleGasCoreSchema.nullable(),
  /** Other ways the same ion is written inside formulas (`C2H3O2` for acetate). */
  aliases: z.array(z.string().min(1).max(40)).optional(),
  /** `false` where the ion does not survive in water (O²⁻ takes a proton from water to give 2 OH⁻), so no enthalpy of solution to that ion exists. */
  stableInWater: z.boolean().optional(),
  ...provenance,
});

export const radiusRecordSchema = z.strictObject({
  ion: ionIdSchema,
  coordination: z.number().int().min(2).max(14),
  spin: z.enum(['high', 'low']).optional(),
  value: positive,
  unit: z.literal('Å'),
  uncertainty,
  ...provenance,
});

export const ionValueRecordSchema = <U extends string>(unit: U) =>
  z.strictObject({
    ion: ionIdSchema,
    value: finite,
    unit: z.literal(unit),
    uncertainty,
    ...provenance,
  });

export const thermochemicalRadiusRecordSchema = ionValueRecordSchema('Å');
export const ionVolumeRecordSchema = ionValueRecordSchema('nm³');
export const hydrationRecordSchema = ionValueRecordSchema('kJ/mol');

/** Standard enthalpy of formation of an ion (aqueous: conventional scale, ΔfH°(H⁺, aq) = 0; gaseous: ion convention of the source, stated in the table). */
export const ionFormationRecordSchema = ionValueRecordSchema('kJ/mol');
/** Standard partial molar heat capacity of an aqueous ion, conventional scale (Cp°(H⁺, aq) = 0). */
export const ionHeatCapacityRecordSchema = ionValueRecordSchema('J/(mol·K)');

export const phaseSchema = z.enum(['cr', 'l', 'g', 'aq']);
export const compoundFormationRecordSchema = z.strictObject({
  formula: formulaTextSchema,
  phase: phaseSchema,
  value: finite,
  unit: z.literal('kJ/mol'),
  uncertainty,
  ...provenance,
});

export const solutionEnthalpyRecordSchema = z.strictObject({
  /** The solid as dissolved, hydrate included (`MgSO4·7H2O`). */
  formula: formulaTextSchema,
  /** Enthalpy of solution at infinite dilution, 25 °C; positive = endothermic. */
  value: finite,
  unit: z.literal('kJ/mol'),
  uncertainty,
  ...provenance,
});

export const structureTypeSchema = z.enum(STRUCTURE_TYPES);

export const crystalRecordSchema = z.strictObject({
  formula: formulaTextSchema,
  structure: structureTypeSchema.optional(),
  /** Cubic lattice parameter a, Å, where the structure is cubic and it is tabulated. */
  latticeParameter: positive.optional(),
  /** Density at room temperature, g/cm³. */
  density: positive.optional(),
  ...provenance,
});

export const solubilityPointSchema = z.strictObject({
  /** Temperature, °C. */
  t: finite,
  /** Grams of anhydrous salt per 100 g of water at saturation. */
  value: nonNegative,
  /** The equilibrium solid at this point where it is not the record's `solidPhase` (past a transition temperature); the anhydrous salt is written as the record's `formula`. */
  solidPhase: formulaTextSchema.optional(),
});
export const solubilityRecordSchema = z.strictObject({
  /** The salt, anhydrous, whose mass the values count. */
  formula: formulaTextSchema,
  /** The solid in equilibrium with the saturated solution over this range, if it differs. */
  solidPhase: formulaTextSchema.optional(),
  unit: z.literal('g/100 g H2O'),
  points: z.array(solubilityPointSchema).min(2),
  /** Salt–water eutectic, where the source gives one. Its own `source`, `fromMemory` and `note`, where given, replace the record's for the eutectic alone. */
  eutectic: z
    .strictObject({
      temperature: finite,
      massFraction: finite.refine((v) => v > 0 && v < 1, 'a mass fraction lies between 0 and 1'),
      source: provenance.source.optional(),
      fromMemory: z.boolean().optional(),
      note: provenance.note,
    })
    .optional(),
  ...provenance,
});

/**
 * A solubility product at 25 °C from a database of dissolution reactions
 * (llnl.dat): the reaction and log K as the file writes them, and log10 Ksp
 * of the salt dissolving to its own ions.
 */
export const solubilityProductRecordSchema = z.strictObject({
  /** The solid as it dissolves, hydrate water included (`CaSO4·2H2O`). */
  formula: formulaTextSchema,
  /** The phase name in the source (a mineral name, or the formula); unique in the table. */
  mineral: z.string().min(1).max(80),
  /** The dissolution reaction as the source writes it. */
  reaction: z.string().min(1).max(300),
  /** log10 K of that reaction at 25 °C. */
  logK: finite,
  /** The species reactions added to reach the salt's own ions, where the source's reaction uses another form of the anion. */
  conversion: z.string().max(300).optional(),
  /** log10 Ksp in the salt's own ions, mol/kg standard state. */
  value: finite,
  unit: z.literal('log10'),
  uncertainty,
  ...provenance,
});

export const heatCapacityRecordSchema = z.strictObject({
  formula: formulaTextSchema,
  phase: phaseSchema,
  value: positive,
  unit: z.literal('J/(mol·K)'),
  uncertainty,
  ...provenance,
});

/** Coefficients A0…A5 of a Pitzer parameter's temperature function (see data/brine-pitzer.json). */
const pitzerCoefficients = z.array(finite).min(1).max(6);
export const brinePitzerRecordSchema = z.strictObject({
  /** The salt, anhydrous. */
  formula: formulaTextSchema,
  beta0: pitzerCoefficients,
  beta1: pitzerCoefficients,
  beta2: pitzerCoefficients.optional(),
  cphi: pitzerCoefficients,
  alpha1: positive,
  alpha2: positive.optional(),
  /** Highest molality of the fit, mol/kg. */
  maxMolality: positive,
  ...provenance,
});
const waterConstant = z.strictObject({ value: positive, unit: z.string().min(1), ...provenance });

/**
 * A non-electrolyte solute's brine (urea): the osmotic coefficient as a power series in m at a reference
 * temperature, φ − 1 = Σ aᵢ·mⁱ, and the relative apparent molar enthalpy φL = Σ hᵢ·mⁱ, each part with its own source.
 */
export const nonElectrolyteBrineSchema = z.strictObject({
  /** The solute as written in the ion table's non-electrolyte list. */
  formula: formulaTextSchema,
  osmotic: z.strictObject({
    /** a₁, a₂, … of φ − 1 = Σ aᵢ·mⁱ, kg^i/mol^i. */
    coefficients: z.array(finite).min(1).max(5),
    /** K. */
    referenceTemperature: positive,
    /** Highest molality of the fit, mol/kg. */
    maxMolality: positive,
    /** Relative standard uncertainty of φ inside maxMolality (the scatter of the fit). */
    relativeUncertainty: nonNegative,
    ...provenance,
  }),
  enthalpy: z.strictObject({
    /** h₁, h₂, … of φL = Σ hᵢ·mⁱ, J·kg^i/mol^(i+1), taken as independent of temperature. */
    coefficients: z.array(finite).min(1).max(5),
    maxMolality: positive,
    /** Relative standard uncertainty of φL inside maxMolality. */
    relativeUncertainty: nonNegative,
    ...provenance,
  }),
});

export const ionizationRecordSchema = z.strictObject({
  element: z.string().regex(/^[A-Z][a-z]?$/),
  /** 1 for M → M⁺, 2 for M⁺ → M²⁺, … */
  stage: z.number().int().min(1).max(8),
  /** Ionization energy at 0 K as tabulated, kJ/mol. */
  value: positive,
  unit: z.literal('kJ/mol'),
  uncertainty,
  ...provenance,
});

export const electronAffinityRecordSchema = z.strictObject({
  element: z.string().regex(/^[A-Z][a-z]?$/),
  /** Energy released on X(g) + e⁻ → X⁻(g) at 0 K, kJ/mol, positive when released (the tabulating convention). */
  value: finite,
  unit: z.literal('kJ/mol'),
  uncertainty,
  ...provenance,
});

export const atomizationRecordSchema = z.strictObject({
  element: z.string().regex(/^[A-Z][a-z]?$/),
  /** Standard enthalpy of formation of the gaseous atom at 298.15 K, kJ/mol. */
  value: positive,
  unit: z.literal('kJ/mol'),
  uncertainty,
  ...provenance,
});

export const bondDissociationRecordSchema = z.strictObject({
  molecule: z.string().regex(/^[A-Z][a-z]?2$/),
  /** Bond dissociation enthalpy at 298.15 K, kJ/mol. */
  value: positive,
  unit: z.literal('kJ/mol'),
  uncertainty,
  ...provenance,
});

export const madelungRecordSchema = z.strictObject({
  structure: structureTypeSchema,
  /** Stoichiometry the constant refers to, cation first. */
  stoichiometry: z.enum(['MX', 'MX2', 'M2X', 'M2X3', 'MX3', 'ABX3']),
  /** Madelung constant referred to the shortest cation–anion distance, for unit charges. */
  value: positive,
  unit: z.literal('1'),
  /** Coordination numbers of cation and anion in the structure. */
  cationCoordination: z.number().int().min(1).max(14),
  anionCoordination: z.number().int().min(1).max(14),
  ...provenance,
});

export const bornExponentRecordSchema = z.strictObject({
  core: nobleGasCoreSchema,
  value: positive,
  unit: z.literal('1'),
  ...provenance,
});

export const volumeCoefficientRecordSchema = z.strictObject({
  /** Charge type as |cation charge|:|anion charge|: `1:1` (NaCl), `2:2` (MgO), `2:1` (CaCl2), `1:2` (K2SO4); `general` for the charge-free form. */
  chargeType: z.enum(['1:1', '2:2', '2:1', '1:2', '3:1', '1:3', '3:2', '2:3', 'general']),
  /** α of U = 2I(α/V^(1/3) + β), kJ·mol⁻¹·nm. */
  alpha: positive,
  /** β of the same equation, kJ/mol. */
  beta: finite,
  ...provenance,
});

export const hazardClassSchema = z.enum(HAZARD_CLASSES);
export const hazardRecordSchema = z.strictObject({
  /** A salt formula, or an ion id where the hazard follows the ion (every chromate). */
  subject: z.string().min(1).max(120),
  /** Empty for an ion checked to add no hazard of its own (so that its salts read "no hazard class", not "no hazard data"). */
  classes: z.array(hazardClassSchema),
  /** A short caution in plain words. */
  statement: z.string().min(1),
  ...provenance,
});

/** One measured property of a salt-hydrate melt, with its own source and a standard uncertainty above zero. */
const meltQuantity = <U extends string>(unit: U) =>
  z.strictObject({
    value: finite,
    unit: z.literal(unit),
    /** Standard uncertainty, never zero: the warmer's intervals are built from it. */
    uncertainty: positive,
    ...provenance,
  });

/** How a salt hydrate melts: to a liquid of its own composition, or leaving another solid behind. */
export const meltingBehaviourSchema = z.enum(['congruent', 'semi-congruent', 'incongruent']);

/** A salt hydrate that can be kept as a supercooled melt and crystallised on demand (a latent-heat warmer). */
export const warmerMeltRecordSchema = z.strictObject({
  /** The hydrate, as a person writes it (`NaCH3COO·3H2O`). */
  formula: formulaTextSchema,
  melting: meltingBehaviourSchema,
  /** The solid that separates on incongruent (or semi-congruent) melting. */
  solidOnMelting: formulaTextSchema.optional(),
  /** The composition of the melt, in words. */
  meltComposition: z.string().min(1),
  /** What incongruent melting does over repeated cycles, in words. */
  consequence: z.string().min(1).optional(),
  /** Melting (or peritectic) temperature, °C. */
  meltingPoint: meltQuantity('°C'),
  /** Latent heat of fusion per gram of hydrate, J/g. */
  latentHeat: meltQuantity('J/g'),
  /** Specific heat capacity of the solid hydrate, J/(g·K). */
  solidHeatCapacity: meltQuantity('J/(g·K)'),
  /** Specific heat capacity of the (supercooled) melt, J/(g·K). */
  meltHeatCapacity: meltQuantity('J/(g·K)'),
  ...provenance,
});

/** Every table the dataset knows, by file name under `data/`. */
export const tableSchemas = {
  'elements.json': table(elementRecordSchema),
  'ions.json': table(ionRecordSchema),
  'shannon-radii.json': table(radiusRecordSchema),
  'thermochemical-radii.json': table(thermochemicalRadiusRecordSchema),
  'ion-volumes.json': table(ionVolumeRecordSchema),
  'ion-formation-aq.json': table(ionFormationRecordSchema),
  'ion-formation-gas.json': table(ionFormationRecordSchema),
  'ion-heat-capacities-aq.json': table(ionHeatCapacityRecordSchema),
  'compound-formation.json': table(compoundFormationRecordSchema),
  'solution-enthalpies.json': table(solutionEnthalpyRecordSchema),
  'hydration-enthalpies.json': table(hydrationRecordSchema, {
    /** The absolute hydration enthalpy of H⁺ the single-ion values assume, kJ/mol. */
    protonHydrationEnthalpy: finite,
    protonSource: z.string(),
  }),
  'crystals.json': table(crystalRecordSchema),
  'solubility.json': table(solubilityRecordSchema),
  'solubility-products.json': table(solubilityProductRecordSchema),
  'heat-capacities.json': table(heatCapacityRecordSchema),
  'ionization-energies.json': table(ionizationRecordSchema),
  'electron-affinities.json': table(electronAffinityRecordSchema),
  'atomization-enthalpies.json': table(atomizationRecordSchema),
  'bond-dissociation.json': table(bondDissociationRecordSchema),
  'madelung-constants.json': table(madelungRecordSchema),
  'born-exponents.json': table(bornExponentRecordSchema),
  'volume-coefficients.json': table(volumeCoefficientRecordSchema),
  'hazards.json': table(hazardRecordSchema),
  'brine-pitzer.json': table(brinePitzerRecordSchema, {
    /** Constants of water and ice the brine module needs. */
    water: z.strictObject({
      fusionEnthalpy: waterConstant,
      fusionHeatCapacity: waterConstant,
      iceSpecificHeat: waterConstant,
      vaporizationEnthalpy: waterConstant,
      molarMass: waterConstant,
    }),
    /** Non-electrolyte solutes with an osmotic coefficient and φL of their own. */
    nonElectrolytes: z.array(nonElectrolyteBrineSchema).optional(),
  }),
  'warmer-melts.json': table(warmerMeltRecordSchema),
} as const;

export type TableName = keyof typeof tableSchemas;
export type TableFile<N extends TableName> = z.infer<(typeof tableSchemas)[N]>;
export type TableRecord<N extends TableName> = TableFile<N>['records'][number];

export type SourceEntry = z.infer<typeof sourceSchema>;
export type ElementRecord = z.infer<typeof elementRecordSchema>;
export type IonRecord = z.infer<typeof ionRecordSchema>;
export type RadiusRecord = z.infer<typeof radiusRecordSchema>;
export type IonValueRecord = z.infer<typeof thermochemicalRadiusRecordSchema>;
export type IonFormationRecord = z.infer<typeof ionFormationRecordSchema>;
export type CompoundFormationRecord = z.infer<typeof compoundFormationRecordSchema>;
export type SolutionEnthalpyRecord = z.infer<typeof solutionEnthalpyRecordSchema>;
export type CrystalRecord = z.infer<typeof crystalRecordSchema>;
export type SolubilityRecord = z.infer<typeof solubilityRecordSchema>;
export type SolubilityProductRecord = z.infer<typeof solubilityProductRecordSchema>;
export type HeatCapacityRecord = z.infer<typeof heatCapacityRecordSchema>;
export type BrinePitzerRecord = z.infer<typeof brinePitzerRecordSchema>;
export type NonElectrolyteBrineRecord = z.infer<typeof nonElectrolyteBrineSchema>;
export type IonizationRecord = z.infer<typeof ionizationRecordSchema>;
export type ElectronAffinityRecord = z.infer<typeof electronAffinityRecordSchema>;
export type AtomizationRecord = z.infer<typeof atomizationRecordSchema>;
export type BondDissociationRecord = z.infer<typeof bondDissociationRecordSchema>;
export type MadelungRecord = z.infer<typeof madelungRecordSchema>;
export type BornExponentRecord = z.infer<typeof bornExponentRecordSchema>;
export type VolumeCoefficientRecord = z.infer<typeof volumeCoefficientRecordSchema>;
export type HazardRecord = z.infer<typeof hazardRecordSchema>;
export type HazardClass = z.infer<typeof hazardClassSchema>;
export type StructureType = z.infer<typeof structureTypeSchema>;
export type NobleGasCore = z.infer<typeof nobleGasCoreSchema>;
export type IonKind = z.infer<typeof ionKindSchema>;
export type WarmerMeltRecord = z.infer<typeof warmerMeltRecordSchema>;
