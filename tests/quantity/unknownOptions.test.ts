// Issue 12, item 2: a misspelt or unknown key in any public option object or fill is an error naming the key
// and the nearest valid one, never ignored in favour of the default.
import { describe, expect, it } from 'vitest';
import { bestLatticeEstimate, bornHaberCycle, compileSpec, createScreener, dissolve, enumerate, isIonheatError, latticeEstimate, packFinalTemperature, packRatioCurve, packTimeCourse, parseSalt, saltHydrationEnthalpy, screen } from '../../src/index.js';
import { editDistance, nearestName } from '../../src/quantity/nearestName.js';
import { ewaldMadelung } from '../../src/lattice/ewaldMadelung.js';
import { idealCell } from '../../src/lattice/idealCell.js';

function caught(f: () => unknown): { code: string; field: string | undefined; message: string } {
  try {
    f();
  } catch (e) {
    if (isIonheatError(e)) return { code: e.code, field: e.field, message: e.message };
    throw e;
  }
  throw new Error('expected an IonheatError, got a result');
}

const fill = { solids: [{ formula: 'NH4NO3', massG: 30 }], waterG: 100 };

describe('nearestName', () => {
  it('counts edits, a swap of neighbours as one', () => {
    expect(editDistance('fil', 'fill')).toBe(1);
    expect(editDistance('tempreature', 'temperature')).toBe(1);
    expect(editDistance('abc', 'xyz')).toBe(3);
  });
  it('prefers a true near miss over a prefix, and says nothing when nothing is close', () => {
    expect(nearestName('fil', ['filters', 'fill'])).toBe('fill');
    expect(nearestName('temperature', ['excludeMeasured', 'temperatureC'])).toBe('temperatureC');
    expect(nearestName('zebra', ['excludeMeasured', 'temperatureC'])).toBeUndefined();
  });
});

describe('unknown option keys are INVALID_OPTION with the nearest valid key', () => {
  const cases: [string, () => unknown, string, string][] = [
    ['dissolve', () => dissolve('KNO3', { temperature: 60 } as never), 'temperature', 'temperatureC'],
    ['packFinalTemperature fill', () => packFinalTemperature({ ...fill, start: 5 } as never), 'fill.start', 'startC'],
    ['packFinalTemperature solid', () => packFinalTemperature({ solids: [{ formula: 'NH4NO3', mass: 30 }], waterG: 100 } as never), 'solids[0].mass', 'massG'],
    ['packFinalTemperature options', () => packFinalTemperature(fill, { kirchof: true } as never), 'kirchof', 'kirchhoff'],
    ['packFinalTemperature interval', () => packFinalTemperature(fill, { interval: { method: 'monte-carlo', sample: 50 } } as never), 'interval.sample', 'samples'],
    ['screen', () => screen(['KNO3'], { fil: '30:100@22' } as never), 'fil', 'fill'],
    ['screen fill object', () => createScreener({ fill: { saltMassG: 30, waterMassG: 100, startC: 20, start: 3 } as never }), 'fill.start', 'startC'],
    ['screen filters', () => screen(['KNO3'], { filters: { excludeSalt: ['NaCl'] } } as never), 'filters.excludeSalt', 'excludeSalts'],
    ['enumerate', () => enumerate({ cation: ['Na[+]'] } as never), 'cation', 'cations'],
    ['packRatioCurve', () => packRatioCurve(fill, { target: 5 } as never), 'target', 'targetC'],
    ['packTimeCourse', () => packTimeCourse(fill, { duration: 60 } as never), 'duration', 'durationS'],
    ['packTimeCourse band', () => packTimeCourse(fill, { band: { lowC: 1, highC: 9, high: 3 } } as never), 'band.high', 'highC'],
    ['latticeEstimate', () => latticeEstimate('NaCl', 'kapustinskii', { structur: 'rock salt' } as never), 'structur', 'structure'],
    ['bestLatticeEstimate', () => bestLatticeEstimate('NaCl', { excludeSalts: 'NaCl' } as never), 'excludeSalts', 'excludeSalt'],
    ['bornHaberCycle', () => bornHaberCycle('NaCl', { solv: 'lattice' } as never), 'solv', 'solve'],
    ['saltHydrationEnthalpy', () => saltHydrationEnthalpy(parseSalt('NaCl'), { scales: 'absolute' } as never), 'scales', 'scale'],
    ['ewaldMadelung', () => ewaldMadelung(idealCell('rock-salt'), { tolerence: 1e-8 } as never), 'tolerence', 'tolerance'],
    ['compileSpec', () => compileSpec('best.value > 0', { schemas: null } as never), 'schemas', 'schema'],
  ];
  it.each(cases)('%s', (_, call, field, nearest) => {
    const e = caught(call);
    expect(e.code).toBe('INVALID_OPTION');
    expect(e.field).toBe(field);
    expect(e.message).toContain(`did you mean "${nearest}"?`);
  });
  it('still accepts every valid key (the misspelt key was the only fault)', () => {
    expect(dissolve('KNO3', { temperatureC: 25 }).formula).toBe('KNO3');
    expect(packFinalTemperature({ ...fill, startC: 20 }, { interval: { method: 'monte-carlo', samples: 50, seed: 1 } }).finalTemperature.value).toBeLessThan(20);
  });
});
