// The assertion convention of worked examples (TSDoc @example blocks and the
// README's code): a line `expression; // expected` checks `expression`
// against the literal that starts the comment; see tests/docs/examples.test.ts.
import { expect } from 'vitest';

/** Splits `expr; // expected …` into its parts, or undefined when the comment asserts nothing. */
export function assertion(line: string): { expr: string; expected: string } | undefined {
  const m = /^(.*?);\s*\/\/\s*(.+)$/.exec(line);
  if (!m) return undefined;
  const expected = m[2]!.trim();
  if (!/^(≈\s*)?[-−]?\d|^'|^"|^true\b|^false\b|^undefined\b|^null\b|^\[|^\{/.test(expected)) return undefined;
  return { expr: m[1]!, expected };
}

/** Reads the literal at the start of an expected-value comment; returns it and its tolerance. */
function expectedValue(text: string): { value: unknown; tolerance?: number; approx?: boolean } {
  const approx = text.startsWith('≈');
  const t = text.replace(/^≈\s*/, '').replace(/^−/, '-');
  const number = /^-?\d+(\.\d+)?(e[-+]?\d+)?/i.exec(t);
  if (number) {
    const decimals = number[1] ? number[1].length - 1 : 0;
    return { value: Number(number[0]), tolerance: number[2] ? Math.abs(Number(number[0])) * 1e-6 : 0.5 * 10 ** -decimals, approx };
  }
  for (let end = t.length; end > 0; end--) {
    const head = t.slice(0, end);
    try {
      // eslint-disable-next-line no-new-func
      return { value: new Function(`return (${head});`)() };
    } catch {
      /* try a shorter prefix */
    }
  }
  throw new Error(`cannot read the expected value "${text}"`);
}

export function check(actual: unknown, expectedText: string, where: string): void {
  const { value, tolerance, approx } = expectedValue(expectedText);
  if (typeof value === 'number') {
    expect(typeof actual, `${where}: expected a number`).toBe('number');
    const limit = approx ? Math.abs(value) * 0.01 : tolerance!;
    expect(Math.abs((actual as number) - value), `${where}: ${actual} vs ${expectedText}`).toBeLessThanOrEqual(limit + 1e-12);
  } else {
    expect(actual, where).toEqual(value);
  }
}
