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

export { packFinalTemperature, type PackResult, type PackDissolvedSolid, type PackHeat, type PackHeatCapacity, type PackClamp } from './pack/packFinalTemperature.js';
export { DEFAULT_START_C, type PackFill, type PackSolid, type PackOptions, type PackIntervalOptions } from './pack/packFill.js';
export { DEFAULT_SAMPLES, DEFAULT_SEED, type TemperatureInterval } from './pack/finalTemperatureInterval.js';
export { packRatioCurve, ratioForTargetTemperature, ratioForLargestChangePerGram, type PackRatioCurve, type PackCurvePoint, type PackDesignPoint, type PackTargetDesign, type PackCurveOptions } from './pack/packRatioCurve.js';
export { packTimeCourse, type PackTimeCourse, type TimeCourseOptions, type TimeCourseParameter, type TimeCoursePoint } from './pack/packTimeCourse.js';
export { packCautions, CONTACT_BURN_THRESHOLD_C, SCREENING_LINE, type CautionInput } from './pack/packCautions.js';
export { saltHazards } from './pack/saltHazards.js';
export { solubilityCurve, solubilityAt, type SolubilityCurve, type SolubilityPoint, type SolubilityAt } from './pack/solubilityCurve.js';
export { solidHeatCapacity, waterSpecificHeat, aqueousHeatCapacity, crystalWaterIncrement } from './pack/solidHeatCapacity.js';
export { freezingPointOfSolution, WATER_CRYOSCOPIC_CONSTANT } from './pack/freezingPoint.js';
export { bracketedRoot, type RootResult } from './pack/bracketedRoot.js';
export { goldenSectionMaximum } from './pack/goldenSectionMaximum.js';
export { seededNormal } from './pack/seededNormal.js';
export { packCurveSvg, type PackCurveChartOptions } from './render/packCurve.js';
export { timeCourseSvg, type TimeCourseChartOptions } from './render/timeCourse.js';
