// Freezing points of brines against the CRC table of concentrative properties (102nd ed., as transcribed in
// tests/reference/brine-crc-freezing-points.json) and the NH4NO3 salt–ice eutectic of the solubility table.
// Far below 25 °C these test the temperature dependence of φ (and so φL and φJ by Gibbs–Helmholtz).
import { describe, expect, it } from 'vitest';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { brineModel } from '../../src/brine/brineModel.js';
import { brineFreezingPoint } from '../../src/brine/brineFreezingPoint.js';
import { brineOsmotic } from '../../src/brine/brineProperties.js';
import { waterConstants } from '../../src/brine/brineParameterSets.js';
import { iceWaterActivityLn } from '../../src/brine/waterPhases.js';
import { crcFreezingPoints } from '../../src/node/scripts/brineReferenceData.js';

const crc = crcFreezingPoints();

describe.each(['KNO3', 'CaCl2', 'NH4Cl'])('%s against the CRC freezing points', (formula) => {
  const salt = parseSalt(formula);
  it('every point lies inside the 95 % interval (to the table’s rounding of 0.01 K)', () => {
    const outside = crc[formula]!.filter((p) => {
      const e = brineFreezingPoint(salt, p.m);
      return !(e.low - 0.005 <= -p.depression && -p.depression <= e.high + 0.005);
    });
    expect(outside).toEqual([]);
  });
});

describe('the worst cases, said as they are', () => {
  it('KNO3: the 1:1 temperature terms put the freezing point up to 0.25 K too low at 1.1 mol/kg (CRC 2.75 K)', () => {
    const last = crc.KNO3!.at(-1)!;
    const e = brineFreezingPoint(parseSalt('KNO3'), last.m);
    expect(e.value + last.depression).toBeLessThan(-0.15);
    expect(e.value + last.depression).toBeGreaterThan(-0.25);
  });
  it('CaCl2: 3.3 K too cold at 3.17 mol/kg (−29.7 °C in the table), where pitzer.dat is extrapolated far below 0 °C', () => {
    const p = crc.CaCl2!.find((x) => x.m === 3.166)!;
    expect(brineFreezingPoint(parseSalt('CaCl2'), p.m).value + p.depression).toBeCloseTo(-3.3, 0);
  });
});

describe('NH4NO3 at its salt–ice eutectic (−16.9 °C, 42 % by mass; Linke–Seidell, from memory)', () => {
  const salt = parseSalt('NH4NO3');
  const m = (1000 * 0.42) / (0.58 * 80.043); // 9.05 mol/kg
  it('freezes about 5 K colder in the model, and the interval takes in the tabulated eutectic', () => {
    const e = brineFreezingPoint(salt, m);
    expect(e.value).toBeLessThan(-19);
    expect(e.low).toBeLessThan(-16.9);
    expect(e.high).toBeGreaterThan(-16.9);
  });
  it('because φ at −17 °C rises past the 6 mol/kg fit with the 1:1 temperature terms, where the eutectic needs about 0.51', () => {
    const model = brineModel(salt);
    expect(model.basis).toBe('pitzer-with-estimated-temperature-terms');
    expect(model.maxMolality).toBe(6);
    const t = 273.15 - 16.9;
    expect(brineOsmotic(model, m, t)).toBeGreaterThan(brineOsmotic(model, 6, t));
    // φ that puts this brine on the ice line at −16.9 °C: −ln a_w(ice, T) / (2·Mw·m), ln a_w(ice) = −0.1650
    const needed = -iceWaterActivityLn(waterConstants(), t) / (2 * 0.01801528 * m);
    expect(needed).toBeCloseTo(0.506, 2);
    expect(brineOsmotic(model, m, t) - needed).toBeGreaterThan(0.1);
  });
});
