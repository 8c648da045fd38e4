/**
 * Inputs built to make the parsers slow or deep (issue 7): each is answered
 * with a result or a typed IonheatError. The time each takes is measured by
 * the "hostile input" section of `npm run bench`, not here.
 *
 * How each parser bounds its work:
 * - Formulas (src/chem/formulaSyntax.ts): text over 4 × 200 characters is refused before it is even normalised, and
 *   over 200 after; one left-to-right scan with an explicit stack, not recursion, refusing nesting deeper than 6;
 *   a count is read digit by digit and refused past 3 digits or above 999; no regular expression. parseSalt
 *   (src/chem/parseSalt.ts) then caps the units per ion (8), the segmentations (64) and the charge assignments
 *   tried (4096), and uses no regular expression over the formula.
 * - Specifications (src/screen/specTokenize.ts, specParse.ts): text over 1000 characters is refused before it is
 *   tokenised; one scan without regular expressions; recursive descent with a depth counter refusing more than 32
 *   nested levels (parentheses, "not", unary minus), so the stack stays small.
 * - Fills (src/screen/parseFillSpec.ts): text over 60 characters is refused first; numbers are read by a digit scan
 *   capped at 30 characters; its only regular expression, /g$/i, is anchored to one character and cannot backtrack.
 * - Every other regular expression in these files runs over the program's own messages, not over user text.
 */
import { describe, expect, it } from 'vitest';
import { isIonheatError, parseSalt } from '../../src/index.js';
import { parseFillSpec } from '../../src/screen/parseFillSpec.js';
import { compileSpec } from '../../src/screen/compileSpec.js';
import { hostileCases } from '../../src/node/scripts/hostileCases.js';
import { parseSpec } from '../../src/screen/specParse.js';

/** The error code of `f`, or 'ok' when it returns. */
function outcome(f: () => unknown): string {
  try {
    f();
    return 'ok';
  } catch (e) {
    if (!isIonheatError(e)) throw e;
    return e.code;
  }
}

describe('hostile inputs to the parsers are answered, with a typed error where they are refused', () => {
  it.each(hostileCases().map((c) => [c.name, c] as const))('%s', (_, c) => {
    expect(outcome(c.run)).toBe(c.expected);
  });

  it('parentheses nested 6 deep are read, 7 refused', () => {
    expect(outcome(() => parseSalt('((((((NH4))))))2SO4'))).not.toBe('NESTING_TOO_DEEP');
    expect(outcome(() => parseSalt('(((((((NH4)))))))2SO4'))).toBe('NESTING_TOO_DEEP');
  });

  it('a count of 999 is read; 1000 and longer digit runs are refused without building the number', () => {
    expect(outcome(() => parseSalt('Na999Cl999'))).toBe('ok');
    expect(outcome(() => parseSalt('Na1000Cl1000'))).toBe('BAD_COUNT');
    expect(outcome(() => parseSalt('Na' + '9'.repeat(150) + 'Cl'))).toBe('BAD_COUNT');
  });

  it('a spec nested 32 deep is accepted, 33 refused; a long flat spec within 1000 characters compiles', () => {
    expect(parseSpec('('.repeat(31) + 'best.low' + ')'.repeat(31) + ' > 0').kind).toBe('compare');
    expect(outcome(() => parseSpec('('.repeat(33) + 'best.low' + ')'.repeat(33) + ' > 0'))).toBe('INVALID_EXPRESSION');
    expect(compileSpec('best.low' + ' + 1'.repeat(240) + ' > 0').text.length).toBeLessThanOrEqual(1000);
  });

  it('fill masses are bounded: a milligram to a tonne', () => {
    expect(parseFillSpec('0.001:1000000@22')).toEqual({ saltMassG: 0.001, waterMassG: 1e6, startC: 22 });
    expect(outcome(() => parseFillSpec('0.0000000000000000000000001:80@22'))).toBe('INVALID_ARGUMENT');
    expect(outcome(() => parseFillSpec('9999999999999999999999999:80@22'))).toBe('INVALID_ARGUMENT');
  });
});
