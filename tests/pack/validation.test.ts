// Bad fills are refused with an IonheatError naming the field.
import { describe, expect, it } from 'vitest';
import { isIonheatError, packFinalTemperature, type PackFill } from '../../src/index.js';

function errorOf(fill: PackFill, options = {}) {
  try {
    packFinalTemperature(fill, options);
  } catch (e) {
    if (isIonheatError(e)) return e;
    throw e;
  }
  throw new Error('no error');
}

const ok: PackFill = { solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 };

describe('validation', () => {
  it.each([
    ['a negative mass', { ...ok, solids: [{ formula: 'KNO3', massG: -5 }] }, 'solids[0].massG'],
    ['a zero mass', { ...ok, solids: [{ formula: 'KNO3', massG: 0 }] }, 'solids[0].massG'],
    ['zero water', { ...ok, waterG: 0 }, 'waterG'],
    ['no solids', { ...ok, solids: [] }, 'solids'],
    ['a start below liquid water', { ...ok, startC: -1 }, 'startC'],
    ['a start at boiling', { ...ok, startC: 100 }, 'startC'],
    ['a negative container', { ...ok, containerJPerK: -1 }, 'containerJPerK'],
    ['the same salt twice', { ...ok, solids: [{ formula: 'CaCl2', massG: 1 }, { formula: 'CaCl2·6H2O', massG: 1 }] }, 'solids[1].formula'],
  ] as [string, PackFill, string][])('refuses %s', (_, fill, field) => {
    const e = errorOf(fill);
    expect(e.code).toBe('INVALID_ARGUMENT');
    expect(e.field).toBe(field);
    expect(e.message).toContain(field.replace(/\[\d\]\.formula$/, ''));
  });
  it('refuses an unknown salt with the parser code and the field', () => {
    const e = errorOf({ ...ok, solids: [{ formula: 'XyZ', massG: 1 }] });
    expect(e.field).toBe('solids[0].formula');
    expect(e.message).toMatch(/^solids\[0\]\.formula "XyZ": /);
  });
  it('refuses a non-positive override heat capacity', () => {
    expect(errorOf(ok, { heatCapacityJPerK: 0 }).field).toBe('heatCapacityJPerK');
  });
});
