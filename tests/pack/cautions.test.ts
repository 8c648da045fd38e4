// Cautions carried by every pack result.
import { describe, expect, it } from 'vitest';
import { builtinDataset, cautionLine, cautionSchema, packCautions, packFinalTemperature, parseSalt, saltHazards, SCREENING_LINE } from '../../src/index.js';

const salts = (...f: string[]) => f.map((x) => parseSalt(x));

describe('thermal cautions', () => {
  it('warns of contact burns above about 44 °C, citing ISO 13732-1 as from memory (source key iso13732)', () => {
    expect(builtinDataset().source('iso13732')?.kind).toBe('standard');
    const list = packCautions({ startC: 20, final: { value: 47, low: 45, high: 49 }, salts: salts('MgSO4') });
    expect(list[0]!.text).toMatch(/^Contact-burn risk/);
    expect(list[0]!.text).toContain('ISO 13732-1');
    expect(list[0]!.text).toContain('from memory');
    expect(list[0]!.text).toContain('longer');
  });
  it('also warns when only the upper end of the interval passes the threshold', () => {
    const list = packCautions({ startC: 20, final: { value: 42, low: 39, high: 45 }, salts: salts('MgSO4') });
    expect(list[0]!.text).toMatch(/^Contact-burn risk/);
  });
  it('gives a milder line for a warm fill below the threshold', () => {
    const list = packCautions({ startC: 20, final: { value: 35, low: 34, high: 36 }, salts: salts('MgSO4') });
    expect(list[0]!.text).toMatch(/^Warm fill/);
  });
  it('warns of cold injury from prolonged direct contact, and of frostbite at or below 0 °C (common practice)', () => {
    const cool = packCautions({ startC: 20, final: { value: 8, low: 7, high: 9 }, salts: salts('KNO3') });
    expect(cool[0]!.text).toMatch(/^Cold injury: prolonged direct contact/);
    expect(cool[0]!.text).not.toContain('frostbite');
    const freezing = packCautions({ startC: 20, final: { value: 1, low: -1, high: 2 }, salts: salts('NH4NO3') });
    expect(freezing[0]!.text).toContain('frostbite');
  });
  it('warns of boiling first when the balance is cut at 100 °C', () => {
    const list = packCautions({ startC: 20, final: { value: 100, low: 100, high: 100 }, clamp: 'boiling', salts: salts('CaCl2') });
    expect(list[0]!.text).toMatch(/^Boiling/);
  });
});

describe('chemical hazards from the hazards table', () => {
  it('names ammonium nitrate as an oxidiser and explosives precursor restricted in some jurisdictions (e.g. EU 2019/1148), with the source', () => {
    const r = packFinalTemperature({ solids: [{ formula: 'NH4NO3', massG: 30 }], waterG: 100 });
    const line = r.cautions.find((c) => c.kind === 'hazard-class' && c.text.startsWith('NH4NO3'))!;
    expect(line.severity).toBe('warning');
    expect(line.text).toContain('oxidizer');
    expect(line.text).toContain('explosive-precursor');
    expect(line.text).toContain('[eu2019_1148');
    const restricted = r.cautions.find((c) => c.kind === 'restricted-salt')!;
    expect(restricted.text).toContain('restricted or must be reported in some jurisdictions');
  });
  it('makes a toxic salt (soluble barium, hazards table) a danger, and an unknown ion "no hazard data", never silence', () => {
    const barium = packCautions({ startC: 20, final: { value: 20, low: 20, high: 20 }, salts: salts('BaCl2') });
    expect(barium.find((c) => c.kind === 'hazard-class')?.severity).toBe('danger');
    const none = packCautions({ startC: 20, final: { value: 20, low: 20, high: 20 }, salts: salts('NaCl') });
    expect(none.map((c) => [c.kind, c.severity])).toEqual([
      ['no-hazard-class', 'notice'],
      ['screening', 'notice'],
    ]);
  });
  it('finds a hazard that follows an ion (soluble barium) and a hydrate by its anhydrous salt', () => {
    expect(saltHazards('Ba(NO3)2').some((h) => h.classes.includes('toxic'))).toBe(true);
    expect(saltHazards('CuSO4·5H2O')[0]?.subject).toBe('CuSO4');
    expect(saltHazards('KCl')).toEqual([]);
  });
  it('ends every list with the screening line', () => {
    for (const f of ['NaCl', 'CaCl2', 'KNO3']) {
      const r = packFinalTemperature({ solids: [{ formula: f, massG: 20 }], waterG: 100 });
      expect(r.cautions.at(-1)?.text).toBe(SCREENING_LINE);
    }
    expect(SCREENING_LINE).toContain('local codes, product-safety regulation and licensed practice');
  });
});

describe('every caution is { kind, severity, text }', () => {
  it('grades a burn the value passes as danger, one only the interval reaches as a warning, a warm fill as a notice', () => {
    const at = (value: number, low: number, high: number) => packCautions({ startC: 20, final: { value, low, high }, salts: salts('MgSO4') })[0]!;
    expect([at(47, 45, 49).kind, at(47, 45, 49).severity]).toEqual(['contact-burn', 'danger']);
    expect([at(42, 39, 45).kind, at(42, 39, 45).severity]).toEqual(['contact-burn', 'warning']);
    expect([at(35, 34, 36).kind, at(35, 34, 36).severity]).toEqual(['warm-contact', 'notice']);
  });
  it('grades frostbite as a warning and mild cold as a notice; boiling is a danger', () => {
    const cold = (value: number, low: number) => packCautions({ startC: 20, final: { value, low, high: value + 1 }, salts: salts('KNO3') })[0]!;
    expect([cold(8, 7).kind, cold(8, 7).severity]).toEqual(['cold-injury', 'notice']);
    expect([cold(1, -1).kind, cold(1, -1).severity]).toEqual(['cold-injury', 'warning']);
    const boil = packCautions({ startC: 20, final: { value: 100, low: 100, high: 100 }, clamp: 'boiling', salts: salts('CaCl2') })[0]!;
    expect([boil.kind, boil.severity]).toEqual(['boiling', 'danger']);
  });
  it('says when salt stays undissolved (60 g KNO3 in 100 g water from 20 °C: far above its solubility, CRC Handbook)', () => {
    const r = packFinalTemperature({ solids: [{ formula: 'KNO3', massG: 60 }], waterG: 100, startC: 20 });
    expect(r.dissolved[0]!.undissolvedMass).toBeGreaterThan(20);
    const u = r.cautions.find((c) => c.kind === 'undissolved-salt')!;
    expect(u.severity).toBe('notice');
    expect(u.text).toMatch(/^Undissolved salt: about \d+\.\d g of KNO3 stays solid/);
  });
  it('every pack, time-course and warmer caution passes the one schema, and text output leads with the severity', () => {
    const r = packFinalTemperature({ solids: [{ formula: 'CaCl2', massG: 30 }], waterG: 100, startC: 20 });
    for (const c of r.cautions) expect(cautionSchema.parse(c)).toEqual(c);
    expect(cautionLine(r.cautions[0]!)).toMatch(/^DANGER — Contact-burn risk/);
    expect(cautionLine(r.cautions.at(-1)!)).toBe(`Note — ${SCREENING_LINE}`);
  });
});
