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
export { screen, type ScreenResult } from './screen/screen.js';
export { screenStream } from './screen/screenStream.js';
export { createScreener, type Screener, type ScreenOptions, type ScreenFilters } from './screen/createScreener.js';
export { enumerate, type EnumerateFilters } from './screen/enumerate.js';
export { compileSpec, type CompiledSpec, type CompileSpecOptions } from './screen/compileSpec.js';
export { parseSpec, type SpecNode } from './screen/specParse.js';
export { rankRows, compareRanked } from './screen/rankRows.js';
export { saltHazards, type SaltHazards } from './screen/saltHazards.js';
export { costPerKJ } from './screen/costPerKJ.js';
export { screenObjective, higherIsBetter, suitabilityOf } from './screen/screenObjective.js';
export { parseFillSpec } from './screen/parseFillSpec.js';
export { readCandidate, candidateInputSchema, candidateFields, type CandidateInput, type CandidateLike } from './screen/candidate.js';
export { screenOutputJsonSchema } from './screen/screenOutputJsonSchema.js';
export { screenSources } from './screen/screenSources.js';
export { screenRowSchema, screenSummarySchema, screenDocumentSchema, screenSettingsSchema, directionSchema, objectiveNameSchema, suitabilitySchema, fillSpecSchema, type ScreenRow, type ScreenSummary, type ScreenDocument, type ScreenSettings, type Direction, type ObjectiveName, type Suitability, type FillSpec, type SpecOutcome } from './screen/screenRow.js';
export { intervalChart, type IntervalChartOptions, type ChartMark, type ChartableScreen } from './render/intervalChart.js';
