/**
 * The one way numbers carry their sign in anything a person reads (text,
 * JSON notes, errors, charts): a true minus sign (U+2212), never the
 * hyphen-minus, and a `+` only where the sign is the message.
 *
 * @module
 */

/** The minus sign used in every text for people. */
export const MINUS = '−';

/**
 * A number as text with a true minus sign: `digits` decimals when given,
 * else as short as JavaScript writes it; `plus` puts `+` before a positive
 * value (enthalpies, changes). Zero is never signed, and −0 reads 0.
 */
export function formatNumber(x: number, options: { digits?: number; plus?: boolean } = {}): string {
  let s = options.digits === undefined ? String(Number(x.toPrecision(12))) : x.toFixed(options.digits);
  if (/^-0(\.0*)?$/.test(s)) s = s.slice(1);
  if (s.startsWith('-')) return MINUS + s.slice(1);
  return options.plus && Number(s) !== 0 ? `+${s}` : s;
}

/**
 * Replaces every hyphen-minus that stands for a minus in `text` (before a
 * digit, at the start or after a space, bracket, `=`, `…` or another sign)
 * by a true minus; hyphens inside words (`born-mayer`, `2-`) are left.
 */
export function withTrueMinus(text: string): string {
  let out = '';
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    const next = text[i + 1] ?? '';
    const prev = i > 0 ? text[i - 1]! : ' ';
    out += c === '-' && next >= '0' && next <= '9' && ' ([{=…,;:/±'.includes(prev) ? MINUS : c;
  }
  return out;
}
