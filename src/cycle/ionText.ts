/**
 * Display text of an ion id.
 *
 * @module
 */

const SUB = '₀₁₂₃₄₅₆₇₈₉';
const SUP: Readonly<Record<string, string>> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '+': '⁺', '-': '⁻' };

/** Subscript digits of a formula: `NO3` → `NO₃`. */
export function subscriptFormula(formula: string): string {
  let out = '';
  for (const c of formula) out += c >= '0' && c <= '9' ? SUB[Number(c)] : c;
  return out;
}

/**
 * An ion id written for people: `SO4[2-]` → `SO₄²⁻`, `Na[+]` → `Na⁺`.
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
  for (const c of charge === '0' ? '' : charge) sup += SUP[c] ?? c;
  return subscriptFormula(id.slice(0, open)) + sup;
}
