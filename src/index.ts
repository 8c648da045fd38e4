/**
 * ionheat: the thermochemistry of dissolving salts, for people who design
 * products that heat or cool by dissolution.
 *
 * This core entry runs anywhere JavaScript runs (Node, a browser, a
 * notebook): no file or network access, the data tables bundled. File
 * loading and the command line live in `ionheat/node`.
 *
 * @packageDocumentation
 */
export { IonheatError, isIonheatError, errorCodes, type ErrorCode, type ErrorContext } from './error.js';

export { makeEstimate, roundEstimate, probabilityPositive, normalCdf, estimateSchema, basisSchema, basisOrder, type Estimate, type EstimateInput, type Basis } from './quantity/estimate.js';
export { roundToUncertainty } from './quantity/rounding.js';
export { exactSum, type Term } from './quantity/exactSum.js';
export { quadrature, linearUncertainty } from './quantity/propagate.js';
export * as constants from './quantity/constants.js';

export { Dataset, type Tables, type TableOverrides } from './data/dataset.js';
export { builtinDataset } from './data/builtin.js';
export * as schemas from './data/schemas.js';
export { tableSchemas, type TableName, type TableRecord, type TableFile, type IonRecord, type SourceEntry, type StructureType, type HazardClass } from './data/schemas.js';

export { parseSalt } from './chem/parseSalt.js';
export { formatSalt } from './chem/formatSalt.js';
export { findIon } from './chem/ionIndex.js';
export { molarMass } from './chem/molarMass.js';
export { dissolve, type DissolveOptions, type DissolveResult } from './solution/dissolve.js';
export { solutionVerdict, type Verdict } from './solution/verdict.js';
export { measuredSolutionEnthalpy } from './solution/measuredSolution.js';
export { solutionEnthalpyFromCycle } from './solution/cycleSolution.js';
export { chargeType, ionsPerFormulaUnit, saltSchema, saltIonSchema, type Salt, type SaltIon } from './chem/salt.js';
export { gaseousIonFormationEnthalpy } from './hydration/gaseousIonFormation.js';
export { ionHydrationEnthalpy, tabulatedHydrationTerm, protonHydration, type HydrationScale, type HydrationTerm, type ProtonScale } from './hydration/ionHydration.js';
export { bornHydrationEnthalpy, bornCalibration, bornRadius, bornEnthalpyFactor, LPS_OFFSETS, type BornCalibration, type BornClass, type BornRadius } from './hydration/bornHydration.js';
export { saltHydrationEnthalpy, saltHydrationTerms, type SaltHydrationOptions } from './hydration/saltHydration.js';
export { hydrateFromParent, hydrateRuleScatter, WATER_OF_CRYSTALLIZATION_ENTHALPY, type HydrateRuleInput, type HydrateRuleScatter } from './solution/hydrateRule.js';
export { solutionHeatCapacity, kirchhoffCorrection, typicalSolutionHeatCapacity, KIRCHHOFF_RANGE_C } from './solution/solutionHeatCapacity.js';
export { heatPerGramOfSalt, heatPerGramOfFill, saturatedFill, solubilityAt25, type SaturatedFill, type Solubility25 } from './solution/heatPerGram.js';
export { widenEstimate } from './solution/widenEstimate.js';
export { latticeEstimate, latticeEstimates, latticeMethods, type LatticeMethod, type LatticeEstimateOptions } from './lattice/latticeEstimate.js';
export { latticeModels, latticeModelPoint, GLASSER_THRESHOLD, type LatticeModel, type LatticeModelOptions, type ModelPoint } from './lattice/latticeModel.js';
export { latticeCalibration, calibrationStats, calibrationGroups, saltCationCore, saltIonKind, calibrationChargeType, MIN_GROUP, type CationCore, type ModelCalibration, type Sums, type LatticeCalibration, type CalibrationResidual, type CalibrationStats, type SaltIonKind } from './lattice/latticeCalibration.js';
export { kapustinskii, KAPUSTINSKII_CONSTANT, KAPUSTINSKII_RHO } from './lattice/kapustinskii.js';
export { bornLande } from './lattice/bornLande.js';
export { bornMayer, BORN_MAYER_RHO } from './lattice/bornMayer.js';
export { vbtLatticeEnergy } from './lattice/vbtLatticeEnergy.js';
export { glasserLatticeEnergy, GLASSER_CONSTANT } from './lattice/glasserLatticeEnergy.js';
export { formulaUnitVolume } from './lattice/formulaUnitVolume.js';
export { latticeEnthalpyCorrection } from './lattice/latticeEnthalpyCorrection.js';
export { shortestDistance, saltStructure, saltStoichiometry, type SaltStructure, type Stoichiometry } from './lattice/latticeStructure.js';
export { studentQuantile975 } from './lattice/studentQuantile.js';
export { cycleLatticeEnthalpy, type CycleLatticeOptions } from './cycle/cycleLatticeEnthalpy.js';
export { gaseousIon, type GaseousIon } from './cycle/gaseousIon.js';
export { thermalElectronEnthalpy } from './cycle/thermalElectronEnthalpy.js';
export { ionText } from './cycle/ionText.js';
export type { CycleStep, CycleStepKind } from './cycle/cycleStep.js';
export type { IonShape } from './lattice/latticeIons.js';
export { anchoredSolutionEnthalpies, anchoredFloor, anchorSets, ANCHOR_NEIGHBOURS, type AnchorSet, type AnchorCombination } from './solution/anchoredSolution.js';
export { anchorIndex, ionDistance, ION_DISTANCE, type AnchorIndex, type AnchorSalt, type Neighbour } from './solution/anchorIndex.js';
export { solutionEnthalpyFromModel } from './solution/modelSolution.js';
