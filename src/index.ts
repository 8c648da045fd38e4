/**
 * ionheat: the thermochemistry of dissolving salts, for people who design
 * products that heat or cool by dissolution.
 *
 * This core entry runs anywhere JavaScript runs (Node, a browser, a
 * notebook): no file or network access, the data tables bundled. File
 * loading and the command line live in `ionheat/node`.
 *
 * The public face, in the order of the flow of one question: errors and
 * the shared result shape; data; the salt model; lattice enthalpies and the
 * Born–Haber cycle; hydration; the enthalpy of solution; pack design;
 * latent-heat warmers; screening; charts.
 *
 * @packageDocumentation
 */

// Errors and the shared result shape
export { IonheatError, isIonheatError, errorCodes, type ErrorCode, type ErrorContext } from './error.js';
export { makeEstimate, roundEstimate, probabilityPositive, basisOrder, type Estimate, type EstimateInput, type Basis } from './quantity/estimate.js';
export { estimateSchema, basisSchema } from './quantity/estimateSchema.js';
export { formatEstimate, type FormattedEstimate } from './quantity/formatEstimate.js';
export { roundToUncertainty } from './quantity/rounding.js';
export { cautionLine, CAUTION_KINDS, CAUTION_SEVERITIES, type Caution, type CautionKind, type CautionSeverity } from './quantity/caution.js';
export { cautionSchema, cautionKindSchema, cautionSeveritySchema } from './quantity/cautionSchema.js';
export * as constants from './quantity/constants.js';

// Data
export { type Tables, type TableOverrides, type OverrideProblem } from './data/dataset.js';
export { Dataset, builtinDataset } from './data/recordCheck.js';
export type { BoundedCache } from './data/boundedCache.js';
export * as schemas from './data/schemas.js';
export { tableSchemas, type TableName, type TableRecord, type TableFile, type IonRecord, type SourceEntry, type StructureType, type HazardClass, type HazardRecord } from './data/schemas.js';

// The salt model
export { parseSalt } from './chem/parseSalt.js';
export { formatSalt } from './chem/formatSalt.js';
export { findIon } from './chem/ionIndex.js';
export { molarMass } from './chem/molarMass.js';
export { chargeType, ionsPerFormulaUnit, type Salt, type SaltIon } from './chem/salt.js';
export { saltSchema, saltIonSchema } from './chem/saltSchema.js';

// Lattice enthalpy
export { latticeEstimate, tryLatticeEstimate, latticeEstimates, latticeMethods, type LatticeMethod, type LatticeEstimateOptions } from './lattice/latticeEstimate.js';
export { bestLatticeEstimate } from './lattice/bestLatticeEstimate.js';
export { latticeCalibration, type LatticeCalibration, type ModelCalibration, type CalibrationResidual, type CalibrationStats, type CationCore, type SaltIonKind, type Sums } from './lattice/latticeCalibration.js';
export type { LatticeModel, LatticeModelOptions, ModelPoint } from './lattice/latticeModel.js';
export type { IonShape } from './lattice/latticeIons.js';
export { kapustinskii, KAPUSTINSKII_CONSTANT, KAPUSTINSKII_RHO } from './lattice/kapustinskii.js';
export { bornLande } from './lattice/bornLande.js';
export { bornMayer, BORN_MAYER_RHO } from './lattice/bornMayer.js';
export { vbtLatticeEnergy } from './lattice/vbtLatticeEnergy.js';
export { glasserLatticeEnergy, GLASSER_CONSTANT } from './lattice/glasserLatticeEnergy.js';
export { latticeEnthalpyCorrection } from './lattice/latticeEnthalpyCorrection.js';
export { formulaUnitVolume } from './lattice/formulaUnitVolume.js';
export { ewaldMadelung, type PointChargeCell, type EwaldOptions, type MadelungResult, type Vec3 } from './lattice/ewaldMadelung.js';
export { idealCell, idealCellTypes } from './lattice/idealCell.js';

// The Born–Haber cycle
export { bornHaberCycle, cycleUnknowns, type BornHaberCycle, type BornHaberOptions, type CycleUnknown, type KnownValue } from './cycle/bornHaberCycle.js';
export { cycleLatticeEnthalpy, type CycleLatticeOptions } from './cycle/cycleLatticeEnthalpy.js';
export { thermalElectronEnthalpy } from './cycle/thermalElectronEnthalpy.js';
export type { CycleStep, CycleStepKind } from './cycle/cycleStep.js';

// Hydration
export { saltHydrationEnthalpy, saltHydrationTerms, type SaltHydrationOptions } from './hydration/saltHydration.js';
export { ionHydrationEnthalpy, type HydrationScale, type HydrationTerm, type ProtonScale } from './hydration/ionHydration.js';
export { bornHydrationEnthalpy, type BornCalibration, type BornClass, type BornRadius } from './hydration/bornHydration.js';
export { gaseousIonFormationEnthalpy } from './hydration/gaseousIonFormation.js';

// Solubility from a solubility product
export { solubilityFromProduct, type SolubilityFromProduct } from './brine/solubilityFromProduct.js';

// The enthalpy of solution
export { brineFreezingPoint } from './brine/brineFreezingPoint.js';
export { dissolve, type DissolveOptions, type DissolveResult } from './solution/dissolve.js';
export { integralEnthalpyOfSolution } from './solution/integralEnthalpy.js';
export { solutionVerdict, type Verdict } from './solution/verdict.js';
export { measuredSolutionEnthalpy } from './solution/measuredSolution.js';
export { solutionEnthalpyFromCycle } from './solution/cycleSolution.js';
export { anchoredSolutionEnthalpies, type AnchorSet, type AnchorCombination } from './solution/anchoredSolution.js';
export type { AnchorSalt } from './solution/anchorIndex.js';
export type { SaltIonClass } from './lattice/saltIonClass.js';
export type { HypotheticalHydrate, HypotheticalReason } from './solution/knownHydrates.js';
export { solutionEnthalpyFromModel } from './solution/modelSolution.js';
export { hydrateFromParent, hydrateRuleScatter, WATER_OF_CRYSTALLIZATION_ENTHALPY, type HydrateRuleInput, type HydrateRuleScatter } from './solution/hydrateRule.js';
export { kirchhoffCorrection, solutionHeatCapacity } from './solution/solutionHeatCapacity.js';
export { heatPerGramOfSalt, heatPerGramOfFill, saturatedFill, type SaturatedFill } from './solution/heatPerGram.js';

// Pack design
export { packFinalTemperature, type PackResult, type PackDissolvedSolid, type PackHeat, type PackHeatCapacity, type PackClamp } from './pack/packFinalTemperature.js';
export { DEFAULT_START_C, type PackFill, type PackSolid, type PackOptions, type PackIntervalOptions } from './pack/packInput.js';
export type { TemperatureInterval } from './pack/finalTemperatureInterval.js';
export { packRatioCurve, ratioForTargetTemperature, ratioForLargestChangePerGram, type PackRatioCurve, type PackCurvePoint, type PackDesignPoint, type PackTargetDesign, type PackCurveOptions } from './pack/packRatioCurve.js';
export { packDesignMargin, FROSTBITE_THRESHOLD_C, type PackDesignMargin, type TemperatureBand } from './pack/designMargin.js';
export { packTimeCourse, type PackTimeCourse, type TimeCourseOptions, type TimeCourseParameter, type TimeCoursePoint } from './pack/packTimeCourse.js';
export { packCautions, CONTACT_BURN_THRESHOLD_C, SCREENING_LINE, type CautionInput } from './pack/packCautions.js';
export { saltHazards, hazardCoverage, type HazardCoverage } from './solution/saltHazards.js';
export { solubilityCurve, solubilityAt, type SolubilityCurve, type SolubilityPoint, type SolubilityAt } from './pack/solubilityCurve.js';
export { saltSolubility, type SaltSolubility, type SolubilityStatus } from './pack/saltSolubility.js';
export { freezingPointOfSolution, WATER_CRYOSCOPIC_CONSTANT } from './pack/freezingPoint.js';

// Latent-heat warmers (supercooled salt-hydrate melts)
export { latentWarmer, type WarmerFill, type WarmerOptions, type WarmerResult, type WarmerPoint } from './warmer/latentWarmer.js';

// Screening
export { screen, type ScreenResult } from './screen/screen.js';
export { screenStream } from './screen/screenStream.js';
export { createScreener, type Screener, type ScreenOptions, type ScreenFilters } from './screen/createScreener.js';
export { enumerate, type EnumerateFilters } from './screen/enumerate.js';
export { compileSpec, type CompiledSpec, type CompileSpecOptions } from './screen/compileSpec.js';
export { parseSpec, type SpecNode, type SpecSpan, type ComparisonOp, type ArithmeticOp, type SpecFunction } from './screen/specParse.js';
export { hazardSummary, type HazardSummary } from './screen/hazardSummary.js';
export { parseFillSpec } from './screen/parseFillSpec.js';
export { candidateInputSchema, type CandidateInput, type CandidateLike } from './screen/candidate.js';
export { screenOutputJsonSchema } from './screen/screenOutputJsonSchema.js';
export type { ObjectiveSource } from './screen/screenObjective.js';
export { screenRowSchema, screenSummarySchema, screenDocumentSchema, screenSettingsSchema, specOutcomeSchema, rowErrorSchema, fillResultSchema, directionSchema, objectiveNameSchema, suitabilitySchema, fillSpecSchema, type ScreenRow, type ScreenSummary, type ScreenDocument, type ScreenSettings, type Direction, type ObjectiveName, type Suitability, type FillSpec, type SpecOutcome } from './screen/screenRow.js';

// Charts (standalone SVG text)
export { cycleDiagram, type CycleDiagramOptions } from './render/cycleDiagram.js';
export { packCurveSvg, type PackCurveChartOptions } from './render/packCurve.js';
export { timeCourseSvg, type TimeCourseChartOptions } from './render/timeCourse.js';
export { warmerCourseSvg, type WarmerChartOptions } from './render/warmerCourse.js';
export { intervalChart, type IntervalChartOptions, type ChartMark, type ChartableScreen } from './render/intervalChart.js';
