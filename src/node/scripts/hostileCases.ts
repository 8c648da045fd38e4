/**
 * The hostile inputs of issue 7, shared by tests/hardening/boundedInput.test.ts (which checks each outcome) and
 * the "hostile input" section of `npm run bench` (which times each against 100 ms).
 */
import { parseSalt } from '../../chem/parseSalt.js';
import { parseSpec } from '../../screen/specParse.js';
import { compileSpec } from '../../screen/compileSpec.js';
import { parseFillSpec } from '../../screen/parseFillSpec.js';

export interface HostileCase {
  name: string;
  /** The IonheatError code expected, or 'ok' for a result. */
  expected: string;
  run: () => unknown;
}

/** Each case builds its text once, outside the timed call. */
export function hostileCases(): HostileCase[] {
  const formula100k = 'NaCl'.repeat(25_000);
  const subscripts100k = 'Na₂'.repeat(33_334).slice(0, 100_000);
  const nested10k = '('.repeat(10_000) + 'NaCl' + ')'.repeat(10_000);
  const nestedShort = '('.repeat(90) + 'Na' + ')'.repeat(90) + 'Cl';
  const spec100k = 'best.low > 0 and '.repeat(6_000).slice(0, 100_000);
  const specNot = 'not '.repeat(240) + 'true';
  const specParens = '('.repeat(490) + 'best.low' + ')'.repeat(490) + ' > 0';
  const specLongFlat = 'best.low' + ' + 1'.repeat(240) + ' > 0';
  const fill100k = '4'.repeat(50_000) + ':80@22' + ' '.repeat(49_994);
  const fillDigits = '1'.repeat(25) + ':80@22';
  return [
    { name: 'a formula of 100 000 characters', expected: 'FORMULA_TOO_LONG', run: () => parseSalt(formula100k) },
    { name: 'a formula of 100 000 subscript characters', expected: 'FORMULA_TOO_LONG', run: () => parseSalt(subscripts100k) },
    { name: 'parentheses nested 10 000 deep', expected: 'FORMULA_TOO_LONG', run: () => parseSalt(nested10k) },
    { name: 'parentheses nested 90 deep within 200 characters', expected: 'NESTING_TOO_DEEP', run: () => parseSalt(nestedShort) },
    { name: 'counts Na999999999Cl999999999', expected: 'BAD_COUNT', run: () => parseSalt('Na999999999Cl999999999') },
    { name: 'a screen spec of 100 000 characters', expected: 'INVALID_EXPRESSION', run: () => parseSpec(spec100k) },
    { name: 'a spec of 240 nested "not"', expected: 'INVALID_EXPRESSION', run: () => parseSpec(specNot) },
    { name: 'a spec in 490 parentheses', expected: 'INVALID_EXPRESSION', run: () => parseSpec(specParens) },
    { name: 'a flat spec of 240 additions, compiled', expected: 'ok', run: () => compileSpec(specLongFlat) },
    { name: 'a fill spec of 100 000 characters', expected: 'INVALID_ARGUMENT', run: () => parseFillSpec(fill100k) },
    { name: 'a fill of 10^25 g of salt', expected: 'INVALID_ARGUMENT', run: () => parseFillSpec(fillDigits) },
  ];
}
