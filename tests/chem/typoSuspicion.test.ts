// Issue 12, item 1: formulas that read only through a slip of the keyboard are refused with what was probably
// meant (or computed with a warning where both readings are measured salts); positions in messages count from 1.
import { describe, expect, it } from 'vitest';
import { builtinDataset, createScreener, dissolve, isIonheatError, parseSalt, screen } from '../../src/index.js';

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
