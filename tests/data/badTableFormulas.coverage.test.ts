// A user's override table whose formula cannot be read as a salt is refused
// when a lookup first needs it, with INVALID_DATA naming the dataset, the
// table, the record and the formula; the built-in tables are untouched.
// (The records below are deliberately broken; their numbers are the built-in
// ones, CRC Handbook and NBS tables, and play no part in the checks.)
import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/recordCheck.js';
import { IonheatError } from '../../src/error.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { measuredSolutionEnthalpy } from '../../src/solution/measuredSolution.js';
import { saltHazards } from '../../src/solution/saltHazards.js';
import { solubilityCurve } from '../../src/pack/solubilityCurve.js';

function refusal(f: () => unknown): IonheatError {
  try {
    f();
  } catch (e) {
    if (e instanceof IonheatError) return e;
    throw e;
  }
  throw new Error('expected an IonheatError');
}

describe('override records whose formula is not a salt', () => {
  it('solution-enthalpies.json: the record number and the parser\'s reason', () => {
    const mine = builtinDataset().withOverrides(
      { 'solution-enthalpies.json': [{ formula: 'NaXy', value: 3.88, unit: 'kJ/mol', uncertainty: 0.1, source: 'crcSolution', fromMemory: true }] },
      'mine.json',
    );
    const e = refusal(() => measuredSolutionEnthalpy(parseSalt('NaCl', mine), mine));
    expect(e.code).toBe('INVALID_DATA');
    expect(e.message).toMatch(/^built-in \+ mine\.json table solution-enthalpies\.json, record \d+ \("NaXy"\): "Xy" at position 3 is not a chemical element$/);
    expect(e.field).toMatch(/^solution-enthalpies\.json\[\d+\]\.formula$/);
    // The built-in table still gives NaCl its CRC value, 3.88 kJ/mol.
    expect(measuredSolutionEnthalpy(parseSalt('NaCl'))?.value).toBe(3.88);
  });

  it('hazards.json: a subject that is neither an ion id nor a salt', () => {
    const mine = builtinDataset().withOverrides({ 'hazards.json': [{ subject: 'NaXy', classes: ['toxic'], statement: 'Toxic.', source: 'supplierSds', fromMemory: true }] }, 'mine.json');
    const e = refusal(() => saltHazards('NaCl', mine));
    expect(e.code).toBe('INVALID_DATA');
    expect(e.message).toBe('built-in + mine.json table hazards.json ("NaXy"): "Xy" at position 3 is not a chemical element');
    expect(e.field).toBe('hazards.json.subject');
    expect(saltHazards('NaCl')).toEqual([]);
  });

  it('solubility.json: a solid phase that cannot be read', () => {
    // KNO3 at 0 and 20 °C, 13.3 and 31.6 g per 100 g water (CRC, from memory); the solid phase is broken on purpose.
    const mine = builtinDataset().withOverrides(
      { 'solubility.json': [{ formula: 'KNO3', unit: 'g/100 g H2O', solidPhase: 'KNO3·Qq', points: [{ t: 0, value: 13.3 }, { t: 20, value: 31.6 }], source: 'crcSolubility', fromMemory: true }] },
      'mine.json',
    );
    const e = refusal(() => solubilityCurve('KNO3', mine));
    expect(e.code).toBe('INVALID_DATA');
    expect(e.message).toMatch(/^built-in \+ mine\.json table solubility\.json, record \d+ solidPhase \("KNO3·Qq"\): /);
    expect(e.field).toMatch(/^solubility\.json\.record \d+ solidPhase$/);
    // The built-in curve is unchanged: 31.93 g per 100 g water at 20 °C (CRC).
    expect(solubilityCurve('KNO3')?.points.find((p) => p.t === 20)?.value).toBe(31.93);
  });
});
