// Named cases of the failures the hostile-input property tests found (issue 7):
// each bad input now gives an IonheatError with the code shown, or a result
// without −0, NaN or Infinity. Before the fix each of these threw a TypeError
// (or a DecimalError or RangeError), hung, or returned a bad number.
import { describe, expect, it } from 'vitest';
import * as ionheat from '../../src/index.js';
import { badNumbers } from './hostile.js';

const { parseSalt, makeEstimate } = ionheat;

/** The code of the IonheatError `call` throws (fails when it throws anything else or nothing). */
function codeOf(call: () => unknown): string {
  try {
    call();
  } catch (e) {
    expect(ionheat.isIonheatError(e), String(e)).toBe(true);
    const err = e as ionheat.IonheatError;
    expect(err.message.length).toBeGreaterThan(0);
    return err.code;
  }
  throw new Error('no error was thrown');
}

const estimate = () => makeEstimate({ quantity: 'enthalpy of solution', value: 25.69, u: 0.2, unit: 'kJ/mol', basis: 'measured', method: 'table' });
const fill = { solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 };
/** An object whose conversion to text throws (String(x) and `${x}` fail). */
const unprintable = { toString: 5, valueOf: null };

describe('estimates and rounding', () => {
  it('makeEstimate of a list (no fields) is INVALID_ARGUMENT, not a TypeError', () => expect(codeOf(() => makeEstimate([] as never))).toBe('INVALID_ARGUMENT'));
  it('roundEstimate(undefined) is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.roundEstimate(undefined as never))).toBe('INVALID_ARGUMENT'));
  it('probabilityPositive of a huge value over a denormal u is 1, not an error', () => expect(ionheat.probabilityPositive({ value: 1e308, u: 5e-324 })).toBe(1));
  it('formatEstimate([]) is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.formatEstimate([] as never))).toBe('INVALID_ARGUMENT'));
  it('roundToUncertainty(undefined, 0.0271) is INVALID_ARGUMENT, not a DecimalError', () => expect(codeOf(() => ionheat.roundToUncertainty(undefined as never, 0.0271))).toBe('INVALID_ARGUMENT'));
  it('roundToUncertainty(-3.14159, 1e308) rounds to 0, not −0', () => expect(Object.is(ionheat.roundToUncertainty(-3.14159, 1e308).value, 0)).toBe(true));
  it('makeEstimate turns −0 into 0 in every number', () => expect(badNumbers(makeEstimate({ quantity: 'q', value: -0, u: -0, unit: 'K', basis: 'model', method: 'm' }))).toEqual([]));
});

describe('the salt model', () => {
  it('molarMass(undefined) is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.molarMass(undefined as never))).toBe('INVALID_ARGUMENT'));
  it('molarMass with a count of NaN is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.molarMass({ Na: Number.NaN }))).toBe('INVALID_ARGUMENT'));
  it('ionsPerFormulaUnit of an object without ions is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.ionsPerFormulaUnit({} as never))).toBe('INVALID_ARGUMENT'));
  it('a salt with a damaged field is read again from its formula', () => {
    const salt = { ...parseSalt('KNO3'), water: new Map() } as never;
    const fillOf = ionheat.saturatedFill(salt);
    expect(badNumbers(fillOf)).toEqual([]); // before: massPerMole = NaN
  });
  it('a salt object with a symbol for its formula is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.anchoredSolutionEnthalpies({ ...parseSalt('KNO3'), formula: Symbol('s') } as never))).toBe('INVALID_ARGUMENT'));
  it('tryLatticeEstimate(undefined) is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.tryLatticeEstimate(undefined as never, 'kapustinskii'))).toBe('INVALID_ARGUMENT'));
});

describe('lattice kernels and cells', () => {
  it('kapustinskii with a zero distance is INVALID_ARGUMENT, not Infinity', () => expect(codeOf(() => ionheat.kapustinskii(2, 0))).toBe('INVALID_ARGUMENT'));
  it('vbtLatticeEnergy with a NaN volume is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.vbtLatticeEnergy(1, Number.NaN, 117.3, 51.9))).toBe('INVALID_ARGUMENT'));
  it('idealCell(Symbol) is INVALID_ARGUMENT, and an unknown name too', () => {
    expect(codeOf(() => ionheat.idealCell(Symbol('s') as never))).toBe('INVALID_ARGUMENT');
    expect(codeOf(() => ionheat.idealCell('Xx' as never))).toBe('INVALID_ARGUMENT');
  });
  it('ewaldMadelung with a site at 1e308 is INVALID_ARGUMENT, not NaN', () => {
    const cell = ionheat.idealCell('rock-salt');
    const bad = { ...cell, sites: cell.sites.map((s, i) => (i === 7 ? { ...s, position: [1e308, 0.75, 0.25] as [number, number, number] } : s)) };
    expect(codeOf(() => ionheat.ewaldMadelung(bad))).toBe('INVALID_ARGUMENT');
  });
  it('ewaldMadelung with two sites at one place is INVALID_ARGUMENT, not Infinity', () => {
    const cell = { lattice: ionheat.idealCell('caesium-chloride').lattice, sites: [{ position: [0, 0, 0] as [number, number, number], charge: 1 }, { position: [1, 0, 0] as [number, number, number], charge: 1 }, { position: [0.5, 0.5, 0.5] as [number, number, number], charge: -2 }] };
    expect(codeOf(() => ionheat.ewaldMadelung(cell))).toBe('INVALID_ARGUMENT');
  });
  it('thermalElectronEnthalpy(-2, 5e-324) is 0, not −0', () => expect(Object.is(ionheat.thermalElectronEnthalpy(-2, 5e-324), 0)).toBe(true));
});

describe('the cycle, hydration and solution', () => {
  it('bornHaberCycle with a symbol for the lattice enthalpy is INVALID_ARGUMENT, not a DecimalError', () => expect(codeOf(() => ionheat.bornHaberCycle('NaCl', { solve: 'electron-affinity', latticeEnthalpy: Symbol('s') as never }))).toBe('INVALID_ARGUMENT'));
  it('bornHaberCycle with a known lattice enthalpy of 0 has no −0 step', () => expect(badNumbers(ionheat.bornHaberCycle('MgO', { solve: 'formation', latticeEnthalpy: { value: 0, u: 20, source: 'given' } }))).toEqual([]));
  it('latticeEstimate with a symbol for the structure is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.latticeEstimate('NaCl', 'born-lande', { structure: Symbol('s') as never }))).toBe('INVALID_ARGUMENT'));
  it('tryLatticeEstimate with no method is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.tryLatticeEstimate('KCl', undefined as never))).toBe('INVALID_ARGUMENT'));
  it('kirchhoffCorrection of an empty estimate is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.kirchhoffCorrection({} as never, 40, undefined, 100))).toBe('INVALID_ARGUMENT'));
  it('dissolve at −0 °C reports 0 °C', () => expect(badNumbers(ionheat.dissolve('CaCl2·6H2O', { excludeMeasured: true, temperatureC: -0 }))).toEqual([]));
  it('dissolve with an unprintable temperature is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.dissolve('KNO3', { temperatureC: unprintable as never }))).toBe('INVALID_ARGUMENT'));
  it('freezingPointOfSolution(0, 100) is 0, not −0', () => expect(Object.is(ionheat.freezingPointOfSolution(0, 100), 0)).toBe(true));
  it('solubilityAt of an empty curve is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.solubilityAt({ points: [] } as never, 25))).toBe('INVALID_ARGUMENT'));
});

describe('packs', () => {
  it('a fill of 1e308 g is INVALID_ARGUMENT (it used to run without end)', () => expect(codeOf(() => ionheat.packFinalTemperature({ ...fill, solids: [{ formula: 'CaCl2', massG: 1e308 }] }))).toBe('INVALID_ARGUMENT'));
  it('a fill of 5e-324 g is INVALID_ARGUMENT (it used to report 100 °C)', () => expect(codeOf(() => ionheat.packFinalTemperature({ ...fill, solids: [{ formula: 'CaCl2', massG: 5e-324 }] }))).toBe('INVALID_ARGUMENT'));
  it('a ratio curve up to maxRatio 1e308 is INVALID_ARGUMENT (it used to run without end)', () => expect(codeOf(() => ionheat.packRatioCurve(fill, { points: 8, maxRatio: 1e308 }))).toBe('INVALID_ARGUMENT'));
  it('1e308 Monte Carlo draws are INVALID_ARGUMENT, not a RangeError', () => expect(codeOf(() => ionheat.packFinalTemperature(fill, { interval: { method: 'monte-carlo', samples: 1e308 } }))).toBe('INVALID_ARGUMENT'));
  it('a seed of −0 is reported as 0', () => expect(badNumbers(ionheat.packFinalTemperature(fill, { interval: { method: 'monte-carlo', samples: 40, seed: -0 } }))).toEqual([]));
  it('a start of −0 °C is reported as 0', () => expect(badNumbers(ionheat.packFinalTemperature({ ...fill, startC: -0 }))).toEqual([]));
  it('an unprintable start temperature is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.packFinalTemperature({ ...fill, startC: unprintable as never }))).toBe('INVALID_ARGUMENT'));
  it('a hole in the list of solids is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.packFinalTemperature({ ...fill, solids: new Array(1) }))).toBe('INVALID_ARGUMENT'));
  it('a time course with a null band is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.packTimeCourse(fill, { band: null as never }))).toBe('INVALID_ARGUMENT'));
  it('packCautions with no final temperature is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.packCautions({ startC: 20, salts: [] } as never))).toBe('INVALID_ARGUMENT'));
});

describe('screening and charts', () => {
  it('screen(undefined) is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.screen(undefined as never))).toBe('INVALID_ARGUMENT'));
  it('screenStream(undefined) rejects with INVALID_ARGUMENT', async () => {
    await expect(ionheat.screenStream(undefined as never).next()).rejects.toMatchObject({ code: 'INVALID_ARGUMENT' });
  });
  it('screen with excludeSalts not a list is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.screen(['KNO3'], { filters: { excludeSalts: Symbol('s') as never } }))).toBe('INVALID_ARGUMENT'));
  it('createScreener with an object for the salt mass is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.createScreener({ fill: { saltMassG: {} as never, waterMassG: 80, startC: 22 } }))).toBe('INVALID_ARGUMENT'));
  it('enumerate with excludeIons: 0 is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.enumerate({ excludeIons: 0 as never }))).toBe('INVALID_ARGUMENT'));
  it('compileSpec with null options is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.compileSpec('best.low > 0', null as never))).toBe('INVALID_ARGUMENT'));
  it('cycleDiagram(undefined) is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.cycleDiagram(undefined as never))).toBe('INVALID_ARGUMENT'));
  it('intervalChart of a result with a NaN is INVALID_ARGUMENT', () => {
    const result = ionheat.screen(['KNO3']);
    const bad = { ...result, rows: result.rows.map((r) => ({ ...r, line: Number.NaN })) };
    expect(codeOf(() => ionheat.intervalChart(bad as never))).toBe('INVALID_ARGUMENT');
  });
});

describe('solubility curves', () => {
  it('solubilityAt of a curve whose point has phaseWater −0 reports 0', () => {
    const curve = ionheat.solubilityCurve('KNO3')!;
    const bad = { ...curve, points: curve.points.map((p) => ({ ...p, phaseWater: -0 })) };
    expect(badNumbers(ionheat.solubilityAt(bad, 25))).toEqual([]);
  });
});

describe('hydration', () => {
  it('saltHydrationEnthalpy with an object for the scale is INVALID_ARGUMENT', () => expect(codeOf(() => ionheat.saltHydrationEnthalpy(parseSalt('KNO3'), { scale: {} as never }))).toBe('INVALID_ARGUMENT'));
});
