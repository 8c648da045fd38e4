// Issue 12, item 1: formulas that read only through a slip of the keyboard are refused with what was probably
// meant (or computed with a warning where both readings are measured salts); positions in messages count from 1.
import { describe, expect, it } from 'vitest';
import { builtinDataset, createScreener, dissolve, enumerate, isIonheatError, parseSalt, screen } from '../../src/index.js';
import { typoSuspicion } from '../../src/chem/typoSuspicion.js';

function refusal(formula: string): { code: string; message: string; position: number | undefined } {
  try {
    parseSalt(formula);
  } catch (e) {
    if (isIonheatError(e)) return { code: e.code, message: e.message, position: e.position };
    throw e;
  }
  throw new Error(`${formula} was read`);
}

describe('a reading through a slip is refused with what was probably meant', () => {
  it.each([
    ['KN03', 'SUSPECTED_TYPO', 'did you mean KNO₃?', 2],
    ['NH4N03', 'SUSPECTED_TYPO', 'did you mean NH₄NO₃?', 4],
    ['Ca(N03)2', 'SUSPECTED_TYPO', 'did you mean Ca(NO₃)₂?', 4],
  ])('%s (a digit zero read as a count, giving an azide)', (formula, code, meant, position) => {
    const e = refusal(formula);
    expect(e.code).toBe(code);
    expect(e.message).toContain(meant);
    expect(e.message).toContain(`at position ${position + 1}`); // counted from 1 in the message
    expect(e.position).toBe(position); // zero-based in the error's context
  });
  it.each([
    ['CaC12', 'UNKNOWN_ION', 'did you mean CaCl₂?'],
    ['NaNo3', 'UNKNOWN_ELEMENT', 'did you mean NaNO₃?'],
    ['kno3', 'UNEXPECTED_CHARACTER', 'did you mean KNO₃?'],
    ['Kcl', 'UNEXPECTED_CHARACTER', 'did you mean KCl?'],
    ['NaCI', 'UNKNOWN_ION', 'did you mean NaCl?'],
    ['Na2S04', 'UNBALANCED_CHARGE', 'did you mean Na₂SO₄?'],
    ['MaCl', 'UNKNOWN_ELEMENT', 'did you mean NaCl?'],
  ])('%s does not read, and the message names the salt one slip away', (formula, code, meant) => {
    const e = refusal(formula);
    expect(e.code).toBe(code);
    expect(e.message).toContain(meant);
  });
  it('"No" is an element (nobelium) without data, "Xy" none at all', () => {
    expect(refusal('NaNo3').message).toMatch(/"No" at position 3 is an element ionheat has no data for/);
    expect(refusal('NaXy').message).toBe('"Xy" at position 3 is not a chemical element');
  });
  it('the salts written as meant still read, azides included', () => {
    for (const f of ['KN3', 'NaN3', 'KNO3', 'NH4NO3', 'CaCl2·6H2O', 'Na2CO3·10H2O', 'TlCl', 'KI', 'NaNO₃']) expect(parseSalt(f).formula).toBe(f.replace('₃', '3'));
  });
});

describe('where both readings are measured salts, compute and warn', () => {
  // A user's measured enthalpy of solution for KN3 (a test value, not data) makes the literal reading a measured salt.
  const withAzide = builtinDataset().withOverrides({ 'solution-enthalpies.json': [{ formula: 'KN3', value: 20, unit: 'kJ/mol', uncertainty: 1, source: 'test', fromMemory: false }] }, 'test', { test: { citation: 'invented for this test', kind: 'inHouse' } } as never);
  it('dissolve computes KN03 as KN3 and names KNO3 in a suspected-typo caution and in suspectedTypo', () => {
    const r = dissolve('KN03', {}, withAzide);
    expect(r.formula).toBe('KN3');
    expect(r.suspectedTypo?.suggestion).toBe('KNO3');
    expect(r.cautions[0]).toMatchObject({ kind: 'suspected-typo', severity: 'warning' });
    expect(r.cautions[0]!.text).toContain('KNO₃ is one slip away');
  });
  it('the screen carries the warning in the row and ranks it as undetermined, not silently first', () => {
    const result = screen(['KN03', 'NH4Cl'], {}, withAzide);
    const typo = result.rows.find((r) => r.formula === 'KN3')!;
    expect(typo.suspectedTypo?.suggestion).toBe('KNO3');
    expect(typo.suitability).toBe('undetermined');
    expect(result.rows.find((r) => r.formula === 'NH4Cl')!.rank).toBe(1);
  });
  it('with the built-in tables the screen row fails with SUSPECTED_TYPO and is not ranked', () => {
    const row = createScreener().row('KN03');
    expect(row.status).toBe('failed');
    expect(row.error?.code).toBe('SUSPECTED_TYPO');
    expect(row.rank).toBeUndefined();
  });
});

// More kinds of slip (issue 12): each suspicion names what was probably meant. The "meant" salts are the tables' own
// measured salts (CRC Handbook enthalpies and solubilities, sources in data/); the typos are ones people make.
describe('more kinds of slip: swapped, doubled, dropped, case, several look-alikes, the hydrate dot', () => {
  it.each([
    ['KON3', 'KNO₃'], // two neighbours swapped
    ['MgOS4', 'MgSO₄'],
    ['NHN4O3', 'NH₄NO₃'],
    ['Ca(ON3)2', 'Ca(NO₃)₂'],
    ['KNO33', 'KNO₃'], // a character typed twice
    ['MgSO44', 'MgSO₄'],
    ['NaCCl', 'NaCl'],
    ['NaCll', 'NaCl'],
    ['MgSO', 'MgSO₄'], // a character left out
    ['K2CO', 'K₂CO₃'],
    ['NaHCO', 'NaHCO₃'],
    ['Ca(NO3)', 'Ca(NO₃)₂'],
    ['nacl', 'NaCl'], // letter case
    ['NACL', 'NaCl'],
    ['KCL', 'KCl'],
    ['Nacl', 'NaCl'],
    ['MgCL2', 'MgCl₂'],
    ['nh4no3', 'NH₄NO₃'],
    ['KA1(S04)2·12H2O', 'KAl(SO₄)₂·12H₂O'], // several look-alikes at once in a longer formula
    ['MgS04·7H20', 'MgSO₄·7H₂O'],
    ['CaCl2 6H2O', 'CaCl₂·6H₂O'], // the hydrate's dot
    ['CaCl2,6H2O', 'CaCl₂·6H₂O'],
    ['CaCl2x6H2O', 'CaCl₂·6H₂O'],
    ['CaCl26H2O', 'CaCl₂·6H₂O'],
  ])('%s is refused with "did you mean %s?"', (formula, meant) => {
    const e = refusal(formula);
    expect(e.message).toMatch(new RegExp(`did you mean ([^?]*, |[^?]* or )?${meant.replace(/[()]/g, '\\$&')}[ ,?]`));
  });
  it('a leading-zero count is refused even where the salt meant has no measured value, only a formation enthalpy (Mg(NO3)2)', () => {
    const e = refusal('Mg(N03)2');
    expect(e.code).toBe('SUSPECTED_TYPO');
    expect(e.message).toContain('did you mean Mg(NO₃)₂?');
  });
  it.each([
    ['LiN3', 'LiNO3'],
    ['NH4N3', 'NH4NO3'],
    ['Ba(N3)2', 'Ba(NO3)2'],
  ])('%s, valid as written but a rarely met azide no table knows, computes with a warning naming %s', (formula, meant) => {
    const r = dissolve(formula);
    expect(r.formula).toBe(formula);
    expect(r.suspectedTypo?.suggestion).toBe(meant);
    const c = r.cautions.find((x) => x.kind === 'suspected-typo')!;
    expect(c.severity).toBe('warning');
    expect(c.text).toContain('left out at position');
    expect(c.text).toContain('azide');
  });
  it('dissolve --json carries suspectedTypo and the caution; the text says it before the numbers', async () => {
    const { runCliInMemory } = await import('../node/runCliInMemory.js');
    const json = JSON.parse((await runCliInMemory(['dissolve', 'LiN3', '--json'])).out);
    expect(json.suspectedTypo.suggestion).toBe('LiNO3');
    expect(json.cautions[0].kind).toBe('suspected-typo');
    const text = (await runCliInMemory(['dissolve', 'LiN3'])).out.split('\n');
    expect(text[1]).toMatch(/^Suspected typo: "LiN3" is read as LiN₃/);
  });
  it('the screen ranks such a row as undetermined, with the caution in the row', () => {
    const result = screen(['LiN3', 'KNO3']);
    const row = result.rows.find((r) => r.formula === 'LiN3')!;
    expect(row.suitability).toBe('undetermined');
    expect(row.suspectedTypo?.suggestion).toBe('LiNO3');
    expect(row.cautions?.[0]?.kind).toBe('suspected-typo');
    expect(result.rows.find((r) => r.formula === 'KNO3')!.rank).toBe(1);
  });
});

describe('real formulas are not flagged (a false alarm is a defect)', () => {
  const ds = builtinDataset();
  it('no formula any table names is refused or warned about, in any accepted spelling', () => {
    const formulas = new Set<string>();
    for (const t of ['solution-enthalpies.json', 'solubility.json', 'compound-formation.json', 'warmer-melts.json'] as const) for (const r of ds.records(t)) formulas.add(r.formula);
    for (const r of ds.records('hazards.json')) if (!r.subject.endsWith(']')) formulas.add(r.subject);
    formulas.delete('H2O'); // water is in the formation table, and is no salt
    expect(formulas.size).toBeGreaterThan(200);
    for (const f of formulas) {
      for (const spelling of [f, f.replace('·', '.'), f.replace('·', '*')]) {
        const salt = parseSalt(spelling);
        expect(typoSuspicion(spelling, salt, ds), spelling).toBeUndefined();
      }
    }
  });
  it.each(['KCl', 'KCN', 'KOCN', 'KSCN', 'NaN3', 'KN3', 'TlCl', 'CdCl2', 'Li2Se', 'NaBF4', 'K2CrO4', 'KBrO3', 'Na2S2O3', 'CsCl', 'NaOH', 'Ca(OH)2', 'CaSO3', 'Li2SO3', 'Cu2SO4', 'NH4HCOO', 'Na₂SO₄·10H₂O', 'CaSO4·0.5H2O', 'KAl(SO4)2·12H2O'])('%s reads with no suspicion', (f) => {
    expect(typoSuspicion(f, parseSalt(f), ds)).toBeUndefined();
  });
  it('of the salts the enumeration writes, only azides of a salt whose nitrate is measured are warned about, and none is refused', () => {
    const warned: string[] = [];
    for (const s of enumerate()) {
      const t = typoSuspicion(s.formula, parseSalt(s.formula), ds);
      if (t) {
        expect(t.action).toBe('warn');
        expect(s.formula).toContain('N3');
        warned.push(s.formula);
      }
    }
    expect(warned.length).toBeLessThanOrEqual(10);
  });
});
