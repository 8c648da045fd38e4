// Property tests over every function of the public face (src/index.ts):
// called with variants of valid arguments (one part replaced by NaN, ±Infinity,
// −0, 1e308, a denormal, a negative number, an arbitrary string, a wrong type;
// a key removed or added; an array emptied or made 5000 long) and with
// arbitrary values of any type, each call either returns a result holding no
// NaN, ±Infinity or −0 anywhere, or throws an IonheatError with a code of
// errorCodes. Nothing else.
//
// The dataset argument is trusted to be a Dataset (built by builtinDataset or
// withOverrides, which validate every record); the tests pass real datasets
// there, and test Dataset's own methods with hostile arguments separately.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as ionheat from '../../src/index.js';
import { argumentsFor, datasetIndex, expectTypedOutcome, hostileString, hostileValue, show, variantsOf, withTrustedDataset } from './hostile.js';

const {
  builtinDataset,
  parseSalt,
  makeEstimate,
  dissolve,
  bornHaberCycle,
  packRatioCurve,
  packTimeCourse,
  screen,
  saturatedFill,
  idealCell,
  solubilityCurve,
  compileSpec,
  createScreener,
} = ionheat;

const base = builtinDataset();
const mine = base.withOverrides(
  { 'solution-enthalpies.json': [{ formula: 'KNO3', value: 34.9, unit: 'kJ/mol', uncertainty: 0.2, source: 'myLab', fromMemory: false }] },
  'my-values.json',
  { myLab: { citation: 'Our calorimeter, run 12', kind: 'derived' } },
);

/** Valid samples, built once on first use. */
const samples = (() => {
  let made: ReturnType<typeof make> | undefined;
  const make = () => {
    const salt = parseSalt('KNO3');
    const hydrate = parseSalt('CaCl2·6H2O');
    const estimate = makeEstimate({ quantity: 'enthalpy of solution', value: 25.69, u: 0.2, unit: 'kJ/mol', basis: 'measured', method: 'table', sources: ['crcSolution'] });
    const lattice = makeEstimate({ quantity: 'lattice enthalpy', value: 799, u: 5, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii-corrected' });
    const hydration = makeEstimate({ quantity: 'hydration enthalpy of the salt', value: -783.5, u: 1.6, unit: 'kJ/mol', basis: 'cycle', method: 'formation-enthalpies' });
    const cp = makeEstimate({ quantity: 'heat capacity of solution', value: -140.5, u: 3, unit: 'J/(mol·K)', basis: 'cycle', method: 'heat-capacities' });
    const fill = { solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 };
    const hotFill = { solids: [{ formula: 'CaCl2', massG: 25 }], waterG: 100, startC: 20, containerJPerK: 10 };
    const cycle = bornHaberCycle('NaCl');
    const curve = packRatioCurve(fill, { points: 20, targetC: 12 });
    const course = packTimeCourse(hotFill, { band: { lowC: 40, highC: 50 }, samples: 30 });
    const screened = screen(['KNO3', 'NH4Cl', 'Xy'], { fill: '20:80@22' });
    const saturated = saturatedFill(parseSalt('NH4NO3'))!;
    const curveKNO3 = solubilityCurve('KNO3')!;
    const warmer = ionheat.latentWarmer({ salt: 'Na2S2O3·5H2O', massG: 50 }, { samples: 30 });
    return { salt, hydrate, estimate, lattice, hydration, cp, fill, hotFill, cycle, curve, course, screened, saturated, curveKNO3, warmer };
  };
  return () => (made ??= make());
})();

interface Case {
  /** Valid argument lists; variants of these are tried. */
  samples: () => unknown[][];
  /** Arguments before the dataset (or all of them): how many hostile values to try alone. */
  userArgs: number;
  /** Runs of the property (fewer for the slow ones). */
  runs?: number;
}

const s = samples;
/** One case per function exported by src/index.ts. */
const cases: Record<string, Case> = {
  // Errors and the shared result shape
  isIonheatError: { samples: () => [[new ionheat.IonheatError('BAD_COUNT', 'x')], [new Error('x')]], userArgs: 1 },
  makeEstimate: { samples: () => [[{ quantity: 'q', value: 787, u: 10, unit: 'kJ/mol', basis: 'model', method: 'kapustinskii', sources: ['a'], notes: ['n'] }], [{ quantity: 'q', value: 1, u: 0, unit: 'K', basis: 'measured', method: 'm', low: 0, high: 2 }]], userArgs: 1 },
  roundEstimate: { samples: () => [[s().estimate], [s().lattice]], userArgs: 1 },
  probabilityPositive: { samples: () => [[s().estimate], [{ value: 0, u: 0 }]], userArgs: 1 },
  formatEstimate: { samples: () => [[s().estimate, { signed: true }], [s().hydration]], userArgs: 2 },
  cautionLine: { samples: () => [[{ kind: 'screening', severity: 'notice', text: 'Screening estimate.' }], [{ kind: 'contact-burn', severity: 'danger', text: 'Contact-burn risk' }]], userArgs: 1 },
  roundToUncertainty: { samples: () => [[787.3456, 1.2345], [-3.14159, 0.0271]], userArgs: 2 },
  // Data
  builtinDataset: { samples: () => [[]], userArgs: 0 },
  // The salt model
  parseSalt: { samples: () => [['CaCl2·6H2O'], ['(NH4)2SO4', mine], ['urea']], userArgs: 1, runs: 200 },
  formatSalt: { samples: () => [[s().hydrate, { style: 'unicode' }], [s().salt]], userArgs: 2 },
  findIon: { samples: () => [['SO4[2-]'], ['Na[+]', mine]], userArgs: 1 },
  molarMass: { samples: () => [[{ Na: 1, Cl: 1 }], [{ Ca: 1, Cl: 2, H: 12, O: 6 }]], userArgs: 1 },
  chargeType: { samples: () => [[s().salt], [s().hydrate]], userArgs: 1 },
  ionsPerFormulaUnit: { samples: () => [[s().salt], [s().hydrate]], userArgs: 1 },
  // Lattice enthalpy
  latticeEstimate: { samples: () => [['NaCl', 'kapustinskii', {}], [s().salt, 'vbt-corrected', { coordination: 6 }], ['NaCl', 'born-lande', { structure: 'rock-salt', latticeParameter: 5.64 }]], userArgs: 3 },
  tryLatticeEstimate: { samples: () => [['NaCl', 'born-mayer', {}], ['KCl', 'kapustinskii', { excludeSalt: 'NaCl' }]], userArgs: 3 },
  latticeEstimates: { samples: () => [['NaCl', {}], ['CaF2', { structure: 'fluorite' }]], userArgs: 2 },
  bestLatticeEstimate: { samples: () => [['NaCl', {}], [s().salt]], userArgs: 2 },
  latticeCalibration: { samples: () => [[], [base]], userArgs: 0, runs: 5 },
  kapustinskii: { samples: () => [[2, 2.83]], userArgs: 2 },
  bornLande: { samples: () => [[1.7476, 1, 2.82, 8]], userArgs: 4 },
  bornMayer: { samples: () => [[1.7476, 1, 2.82], [1.7476, 1, 2.82, 0.345]], userArgs: 4 },
  vbtLatticeEnergy: { samples: () => [[1, 0.0448, 117.3, 51.9]], userArgs: 4 },
  glasserLatticeEnergy: { samples: () => [[1, 0.0448]], userArgs: 2 },
  latticeEnthalpyCorrection: { samples: () => [[[{ count: 1, shape: 'monatomic' }, { count: 1, shape: 'nonlinear' }]], [[{ count: 2, shape: 'linear' }], 300]], userArgs: 2 },
  formulaUnitVolume: { samples: () => [[58.44, 2.165]], userArgs: 2 },
  ewaldMadelung: { samples: () => [[idealCell('rock-salt'), {}], [idealCell('fluorite'), { tolerance: 1e-8 }]], userArgs: 2, runs: 40 },
  idealCell: { samples: () => [['rock-salt'], ['caesium-chloride']], userArgs: 1 },
  // The Born–Haber cycle
  bornHaberCycle: { samples: () => [['NaCl', { solve: 'lattice' }], ['MgO', { solve: 'formation', latticeEnthalpy: { value: 3850, u: 20, source: 'given' } }], ['NaCl', { solve: 'electron-affinity', latticeEnthalpy: { value: 787, u: 2 } }]], userArgs: 2 },
  cycleLatticeEnthalpy: { samples: () => [['NaCl'], [s().salt, base, { hideCrystal: true }]], userArgs: 1 },
  thermalElectronEnthalpy: { samples: () => [[1], [-2, 298.15]], userArgs: 2 },
  // Hydration
  saltHydrationEnthalpy: { samples: () => [[s().salt, {}], [s().salt, { scale: 'conventional', born: true }]], userArgs: 2 },
  saltHydrationTerms: { samples: () => [[s().salt, { scale: 'absolute' }]], userArgs: 2 },
  ionHydrationEnthalpy: { samples: () => [['Na[+]'], ['SO4[2-]', 'conventional']], userArgs: 2 },
  bornHydrationEnthalpy: { samples: () => [['Na[+]', {}], ['Cl[-]', { excludeIon: 'Cl[-]' }]], userArgs: 2, runs: 40 },
  gaseousIonFormationEnthalpy: { samples: () => [['Na[+]'], ['Cl[-]']], userArgs: 1 },
  solubilityFromProduct: { samples: () => [[-9.7453, 1, 1, 1, 1], [-34.2293, 1, 3, 3, -1]], userArgs: 5 },
  // The enthalpy of solution
  dissolve: { samples: () => [['NH4NO3', {}], ['CaCl2·6H2O', { excludeMeasured: true, temperatureC: 10 }], [s().salt, { temperatureC: 25 }, mine]], userArgs: 2, runs: 80 },
  solutionVerdict: { samples: () => [[s().estimate]], userArgs: 1 },
  measuredSolutionEnthalpy: { samples: () => [[s().salt], [s().salt, mine]], userArgs: 1 },
  solutionEnthalpyFromCycle: { samples: () => [[s().salt], [s().salt, base, { hideCrystal: true }]], userArgs: 1 },
  anchoredSolutionEnthalpies: { samples: () => [[s().salt, { excludeMeasured: true }]], userArgs: 2, runs: 60 },
  solutionEnthalpyFromModel: { samples: () => [[s().lattice, s().hydration]], userArgs: 2 },
  hydrateFromParent: { samples: () => [[s().estimate, { parentFormula: 'CaCl2', parentWater: 0, water: 6, waterFormation: -285.83, scatter: 16.6 }]], userArgs: 2 },
  hydrateRuleScatter: { samples: () => [[{}], [{ excludeFormula: 'CaCl2·6H2O' }]], userArgs: 1, runs: 40 },
  kirchhoffCorrection: { samples: () => [[s().estimate, 40, s().cp, 100], [s().estimate, 10, undefined, 100]], userArgs: 4 },
  solutionHeatCapacity: { samples: () => [[s().salt]], userArgs: 1 },
  integralEnthalpyOfSolution: { samples: () => [[s().salt, 2], [parseSalt('NaCl'), 6, 20]], userArgs: 3, runs: 40 },
  brineFreezingPoint: { samples: () => [[s().salt, 2], [parseSalt('CaCl2'), 1]], userArgs: 2, runs: 40 },
  heatPerGramOfSalt: { samples: () => [[s().estimate, s().salt]], userArgs: 2 },
  heatPerGramOfFill: { samples: () => [[s().estimate, s().saturated]], userArgs: 2 },
  saturatedFill: { samples: () => [[s().salt], [parseSalt('NH4NO3')]], userArgs: 1 },
  // Pack design
  packFinalTemperature: { samples: () => [[s().fill, {}], [s().hotFill, { kirchhoff: true }], [s().fill, { interval: { method: 'monte-carlo', samples: 40, seed: 7 } }], [s().fill, { heatCapacityJPerK: 400, heatCapacityUJPerK: 5 }]], userArgs: 2, runs: 80 },
  packRatioCurve: { samples: () => [[s().fill, { points: 12, targetC: 12 }, {}], [s().hotFill, { points: 8, band: true, maxRatio: 0.5 }]], userArgs: 3, runs: 40 },
  ratioForTargetTemperature: { samples: () => [[s().fill, 12, {}], [s().hotFill, 40]], userArgs: 3, runs: 40 },
  packDesignMargin: { samples: () => [[s().fill, 12, {}], [s().hotFill, 40]], userArgs: 3, runs: 20 },
  ratioForLargestChangePerGram: { samples: () => [[s().fill, {}]], userArgs: 2, runs: 40 },
  packTimeCourse: { samples: () => [[s().hotFill, { band: { lowC: 40, highC: 50 }, samples: 20, durationS: 600 }, {}], [s().fill, { ambientC: 22, skinC: 33, dissolutionTimeConstantS: 30, ambientConductanceWPerK: 0.1, skinConductanceWPerK: 0.2, samples: 10 }]], userArgs: 3, runs: 40 },
  packCautions: { samples: () => [[{ startC: 20, final: { value: 46, low: 44, high: 48 }, salts: [parseSalt('CaCl2')], secondsAboveBurnThreshold: 60 }], [{ startC: 20, final: { value: -5, low: -6, high: -4 }, clamp: 'eutectic', salts: [parseSalt('NH4NO3')] }]], userArgs: 1 },
  saltHazards: { samples: () => [['NH4NO3'], [s().salt]], userArgs: 1 },
  solubilityCurve: { samples: () => [['KNO3'], [s().hydrate]], userArgs: 1 },
  solubilityAt: { samples: () => [[s().curveKNO3, 25], [s().curveKNO3, 80]], userArgs: 2 },
  saltSolubility: { samples: () => [['KNO3', 20], ['AgCl'], ['ScF3', 80], [s().hydrate, 25]], userArgs: 2 },
  freezingPointOfSolution: { samples: () => [[0.2, 100]], userArgs: 2 },
  // Latent-heat warmers
  latentWarmer: { samples: () => [[{ salt: 'Na2S2O3·5H2O', massG: 50, startC: 22 }, { samples: 20 }], [{ salt: 'NaCH3COO·3H2O', massG: 20, extraWaterG: 2, containerJPerK: 5 }, { ambientC: 10, ambientConductanceWPerK: 0.3, skinC: 30, skinConductanceWPerK: 0, durationS: 600, samples: 10 }]], userArgs: 2, runs: 40 },
  // Screening
  screen: { samples: () => [[['NH4NO3', 'KNO3', 'Xy'], { spec: 'best.low > 10' }], [[{ formula: 'KNO3', pricePerKg: 2, measuredEnthalpy: 35, measuredUncertainty: 0.5, solubility: 30 }], { fill: '20:80@22', objective: 'cost-per-kj', direction: 'cool', filters: { excludeSalts: ['NH4NO3'], excludeIons: ['Na[+]'], excludeHazards: ['oxidizer'], minMolarMass: 10, maxMolarMass: 500 } }]], userArgs: 2, runs: 60 },
  screenStream: { samples: () => [[['KNO3', 'NH4Cl'], { spec: 'verdict == "endothermic"' }]], userArgs: 2, runs: 40 },
  createScreener: { samples: () => [[{ spec: 'best.low > 0' }], [{ fill: { saltMassG: 20, waterMassG: 80, startC: 22 }, direction: 'heat' }]], userArgs: 1 },
  enumerate: { samples: () => [[{ cations: ['K[+]'], anionCharges: [2] }], [{ cationCharges: [1, 2], anionKinds: ['polyatomic'], excludeIons: ['NO3[-]'], excludeHazards: ['toxic'], minMolarMass: 50, maxMolarMass: 300 }]], userArgs: 1, runs: 60 },
  compileSpec: { samples: () => [['best.high < 0 and verdict == "exothermic"'], ['not has(costPerKJ) or costPerKJ.high < 0.02', { schema: ionheat.screenOutputJsonSchema() }]], userArgs: 2 },
  parseSpec: { samples: () => [['best.high < 0'], ['min(abs(best.value), 3) * -2 >= estimates[0].low / 4 and "toxic" in hazards']], userArgs: 1 },
  hazardCoverage: { samples: () => [['NH4NO3'], [s().salt]], userArgs: 1 },
  hazardSummary: { samples: () => [[parseSalt('NH4NO3')], [parseSalt('K2CrO4')]], userArgs: 1 },
  parseFillSpec: { samples: () => [['40:80@22'], ['25.5:100@20 °C']], userArgs: 1 },
  screenOutputJsonSchema: { samples: () => [[]], userArgs: 0 },
  // Charts
  cycleDiagram: { samples: () => [[s().cycle, { width: 700 }]], userArgs: 2 },
  packCurveSvg: { samples: () => [[s().curve, { title: 'T', width: 600, height: 400 }]], userArgs: 2 },
  timeCourseSvg: { samples: () => [[s().course, { title: 'T', fillLabel: 'L', width: 600, height: 400 }]], userArgs: 2 },
  warmerCourseSvg: { samples: () => [[s().warmer, { title: 'T', width: 600, height: 400 }]], userArgs: 2 },
  intervalChart: { samples: () => [[s().screened, { title: 'T', marks: [{ at: 5, label: 'five' }], maxRows: 10, width: 700 }]], userArgs: 2 },
};

/** Exports that are not functions of data: classes (tested below) and values. */
const classes = new Set(['Dataset', 'IonheatError']);

describe('every function of the public face is listed here', () => {
  it('has a case for each exported function and no case for a name it does not export', () => {
    const functions = Object.entries(ionheat)
      .filter(([name, v]) => typeof v === 'function' && !classes.has(name))
      .map(([name]) => name)
      .sort();
    expect(Object.keys(cases).sort()).toEqual(functions);
  });
});

describe('hostile arguments: a clean result or a typed error', () => {
  for (const [name, c] of Object.entries(cases)) {
    it(name, async () => {
      const fn = (ionheat as unknown as Record<string, (...a: unknown[]) => unknown>)[name]!;
      const at = datasetIndex(fn);
      await fc.assert(
        fc.asyncProperty(argumentsFor(c.samples(), c.userArgs), async (args) => {
          const list = withTrustedDataset(Array.isArray(args) ? args : [args], at);
          await expectTypedOutcome(name, () => fn(...list), list);
        }),
        { numRuns: c.runs ?? 100 },
      );
    });
  }
});
