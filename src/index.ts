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
export { makeEstimate, roundEstimate, probabilityPositive, type Estimate, type EstimateInput, type Basis } from './quantity/estimate.js';
export { formatEstimate, type FormattedEstimate } from './quantity/formatEstimate.js';
export { roundToUncertainty } from './quantity/rounding.js';
export { cautionLine, type Caution, type CautionKind, type CautionSeverity } from './quantity/caution.js';
export * as constants from './quantity/constants.js';

// Data
export { type Tables, type TableOverrides, type OverrideProblem } from './data/dataset.js';
export { Dataset, builtinDataset } from './data/recordCheck.js';
export type { BoundedCache } from './data/boundedCache.js';
export type { TableName, TableRecord, TableFile, IonRecord, SourceEntry, StructureType, HazardClass, HazardRecord } from './data/schemas.js';

// The salt model
export { parseSalt } from './chem/parseSalt.js';
export { formatSalt } from './chem/formatSalt.js';
export { findIon } from './chem/ionIndex.js';
export { molarMass } from './chem/molarMass.js';
export { chargeType, ionsPerFormulaUnit, type Salt, type SaltIon } from './chem/salt.js';

// Lattice enthalpy
export { latticeEstimate, tryLatticeEstimate, latticeEstimates, latticeMethods, type LatticeMethod, type LatticeEstimateOptions } from './lattice/latticeEstimate.js';
export type { LatticeModel } from './lattice/latticeModel.js';
export { bestLatticeEstimate } from './lattice/bestLatticeEstimate.js';
export { kapustinskii } from './lattice/kapustinskii.js';
export { bornLande } from './lattice/bornLande.js';
export { bornMayer } from './lattice/bornMayer.js';
export { vbtLatticeEnergy } from './lattice/vbtLatticeEnergy.js';
export { glasserLatticeEnergy } from './lattice/glasserLatticeEnergy.js';

// The Born–Haber cycle
export { bornHaberCycle, type BornHaberCycle, type BornHaberOptions, type CycleUnknown, type KnownValue } from './cycle/bornHaberCycle.js';
export type { CycleStep, CycleStepKind } from './cycle/cycleStep.js';

// Hydration
export { saltHydrationEnthalpy, type SaltHydrationOptions } from './hydration/saltHydration.js';
export { ionHydrationEnthalpy, type HydrationScale, type HydrationTerm, type ProtonScale } from './hydration/ionHydration.js';

// Solubility from a solubility product
export { solubilityFromProduct, type SolubilityFromProduct } from './brine/solubilityFromProduct.js';

// The enthalpy of solution
export { brineFreezingPoint } from './brine/brineFreezingPoint.js';
export { dissolve, type DissolveOptions, type DissolveResult } from './solution/dissolve.js';
export type { HypotheticalHydrate, HypotheticalReason } from './solution/knownHydrates.js';
export { integralEnthalpyOfSolution } from './solution/integralEnthalpy.js';
export { solutionVerdict, type Verdict } from './solution/verdict.js';
export { kirchhoffCorrection, solutionHeatCapacity } from './solution/solutionHeatCapacity.js';
export { heatPerGramOfSalt, heatPerGramOfFill, saturatedFill, type SaturatedFill } from './solution/heatPerGram.js';

// Pack design
export { packFinalTemperature, type PackResult, type PackDissolvedSolid, type PackHeat, type PackHeatCapacity, type PackClamp } from './pack/packFinalTemperature.js';
export { DEFAULT_START_C, type PackFill, type PackSolid, type PackOptions, type PackIntervalOptions } from './pack/packInput.js';
export type { TemperatureInterval } from './pack/finalTemperatureInterval.js';
export { packRatioCurve, ratioForTargetTemperature, ratioForLargestChangePerGram, type PackRatioCurve, type PackCurvePoint, type PackDesignPoint, type PackTargetDesign, type PackCurveOptions } from './pack/packRatioCurve.js';
export { packDesignMargin, FROSTBITE_THRESHOLD_C, type PackDesignMargin, type TemperatureBand } from './pack/designMargin.js';
export { packTimeCourse, type PackTimeCourse, type TimeCourseOptions, type TimeCourseParameter, type TimeCoursePoint } from './pack/packTimeCourse.js';
export { CONTACT_BURN_THRESHOLD_C } from './pack/packCautions.js';
export { saltHazards } from './solution/saltHazards.js';
export { solubilityCurve, solubilityAt, type SolubilityCurve, type SolubilityPoint, type SolubilityAt } from './pack/solubilityCurve.js';
export { saltSolubility, type SaltSolubility, type SolubilityStatus } from './pack/saltSolubility.js';
export { freezingPointOfSolution } from './pack/freezingPoint.js';

// Latent-heat warmers (supercooled salt-hydrate melts)
export { latentWarmer, type WarmerFill, type WarmerOptions, type WarmerResult, type WarmerPoint } from './warmer/latentWarmer.js';

// Screening
export { screen, type ScreenResult } from './screen/screen.js';
export { screenStream } from './screen/screenStream.js';
export { createScreener, type Screener, type ScreenOptions, type ScreenFilters } from './screen/createScreener.js';
export { enumerate, type EnumerateFilters } from './screen/enumerate.js';
export { compileSpec, type CompiledSpec, type CompileSpecOptions } from './screen/compileSpec.js';
export { hazardSummary, type HazardSummary } from './screen/hazardSummary.js';
export { parseFillSpec } from './screen/parseFillSpec.js';
export type { CandidateInput, CandidateLike } from './screen/candidate.js';
export { screenOutputJsonSchema } from './screen/screenOutputJsonSchema.js';
export type { ObjectiveSource } from './screen/screenObjective.js';
export type { ScreenRow, ScreenSummary, ScreenDocument, ScreenSettings, Direction, ObjectiveName, Suitability, FillSpec, SpecOutcome } from './screen/screenRow.js';

// Charts (standalone SVG text)
export { cycleDiagram, type CycleDiagramOptions } from './render/cycleDiagram.js';
export { packCurveSvg, type PackCurveChartOptions } from './render/packCurve.js';
export { timeCourseSvg, type TimeCourseChartOptions } from './render/timeCourse.js';
export { warmerCourseSvg, type WarmerChartOptions } from './render/warmerCourse.js';
export { intervalChart, type IntervalChartOptions, type ChartMark, type ChartableScreen } from './render/intervalChart.js';
