// Cautions carried by every pack result.
import { describe, expect, it } from 'vitest';
import { builtinDataset, packFinalTemperature, parseSalt, saltHazards } from '../../src/index.js';
import { SCREENING_LINE, packCautions } from '../../src/pack/packCautions.js';

const salts = (...f: string[]) => f.map((x) => parseSalt(x));

describe('thermal cautions', () => {
  it('warns of contact burns above about 44 °C, citing ISO 13732-1 as from memory (source key iso13732)', () => {
    expect(builtinDataset().source('iso13732')?.kind).toBe('standard');
    const list = packCautions({ startC: 20, final: { value: 47, low: 45, high: 49 }, salts: salts('MgSO4') });
    expect(list[0]).toMatch(/^Contact-burn risk/);
    expect(list[0]).toContain('ISO 13732-1');
    expect(list[0]).toContain('from memory');
    expect(list[0]).toContain('longer');
  });
  it('also warns when only the upper end of the interval passes the threshold', () => {
    const list = packCautions({ startC: 20, final: { value: 42, low: 39, high: 45 }, salts: salts('MgSO4') });
    expect(list[0]).toMatch(/^Contact-burn risk/);
  });
  it('gives a milder line for a warm fill below the threshold', () => {
    const list = packCautions({ startC: 20, final: { value: 35, low: 34, high: 36 }, salts: salts('MgSO4') });
    expect(list[0]).toMatch(/^Warm fill/);
  });
  it('warns of cold injury from prolonged direct contact, and of frostbite at or below 0 °C (common practice)', () => {
    const cool = packCautions({ startC: 20, final: { value: 8, low: 7, high: 9 }, salts: salts('KNO3') });
    expect(cool[0]).toMatch(/^Cold injury: prolonged direct contact/);
    expect(cool[0]).not.toContain('frostbite');
    const freezing = packCautions({ startC: 20, final: { value: 1, low: -1, high: 2 }, salts: salts('NH4NO3') });
    expect(freezing[0]).toContain('frostbite');
  });
  it('warns of boiling first when the balance is cut at 100 °C', () => {
    const list = packCautions({ startC: 20, final: { value: 100, low: 100, high: 100 }, clamp: 'boiling', salts: salts('CaCl2') });
    expect(list[0]).toMatch(/^Boiling/);
  });
});

describe('chemical hazards from the hazards table', () => {
  it('names ammonium nitrate as an oxidiser and explosives precursor restricted in some jurisdictions (e.g. EU 2019/1148), with the source', () => {
    const r = packFinalTemperature({ solids: [{ formula: 'NH4NO3', massG: 30 }], waterG: 100 });
    const line = r.cautions.find((c) => c.startsWith('NH4NO3'))!;
    expect(line).toContain('oxidizer');
    expect(line).toContain('explosive-precursor');
    expect(line).toContain('restricted or must be reported in some jurisdictions');
    expect(line).toContain('[eu2019_1148');
  });
  it('finds a hazard that follows an ion (soluble barium) and a hydrate by its anhydrous salt', () => {
    expect(saltHazards('Ba(NO3)2').some((h) => h.classes.includes('toxic'))).toBe(true);
    expect(saltHazards('CuSO4·5H2O')[0]?.subject).toBe('CuSO4');
    expect(saltHazards('KCl')).toEqual([]);
  });
  it('ends every list with the screening line', () => {
    for (const f of ['NaCl', 'CaCl2', 'KNO3']) {
      const r = packFinalTemperature({ solids: [{ formula: f, massG: 20 }], waterG: 100 });
      expect(r.cautions.at(-1)).toBe(SCREENING_LINE);
    }
    expect(SCREENING_LINE).toContain('local codes, product-safety regulation and licensed practice');
  });
});
