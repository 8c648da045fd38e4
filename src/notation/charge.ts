/**
 * The one way an ion's charge is written for people: superscript digits
 * and sign after the formula (`Na⁺`, `Ca²⁺`, `SO₄²⁻`). Ion ids (`Ca[2+]`) stay
 * the input and data-table spelling; text shows {@link ionText}.
 *
 * @module
 */
import { formulaText } from './formula.js';

const SUPERSCRIPT: Readonly<Record<string, string>> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '+': '⁺', '-': '⁻' };

/** Every superscript character a charge is written with. */
export const SUPERSCRIPT_CHARACTERS = Object.values(SUPERSCRIPT).join('');

/** A charge as a superscript: 1 → `⁺`, −2 → `²⁻`, 0 → `` (a neutral solute shows no charge). */
export function chargeText(charge: number): string {
  if (charge === 0 || !Number.isInteger(charge)) return '';
  const size = Math.abs(charge);
  let out = '';
  for (const c of `${size === 1 ? '' : size}${charge > 0 ? '+' : '-'}`) out += SUPERSCRIPT[c]!;
  return out;
}

/** A charge as a signed number in a column or a sentence: `+2`, `−1`, `0`. */
export function chargeNumber(charge: number): string {
  return charge > 0 ? `+${charge}` : charge < 0 ? `−${-charge}` : '0';
}

/**
 * An ion id written for people: `SO4[2-]` → `SO₄²⁻`, `Na[+]` → `Na⁺`,
 * `CO(NH2)2[0]` → `CO(NH₂)₂`. Text that is not an ion id is returned as is.
 *
 * @example
 * ```ts
 * ionText('SO4[2-]'); // 'SO₄²⁻'
 * ```
 */
export function ionText(id: string): string {
  const open = id.lastIndexOf('[');
  if (open < 0 || !id.endsWith(']')) return id;
  const charge = id.slice(open + 1, -1);
  let sup = '';
  for (const c of charge === '0' ? '' : charge) sup += SUPERSCRIPT[c] ?? c;
  return formulaText(id.slice(0, open)) + sup;
}
