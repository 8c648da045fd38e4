/**
 * The one way a formula is written for people: subscript counts
 * (`Ca(NO₃)₂`), a hydrate's water count after the centred dot in normal
 * digits, decimals included (`NaCl·2.5H₂O`, `CaCl₂·6H₂O`).
 *
 * @module
 */

/** The subscript digits ₀–₉, in order: the one table of them. */
export const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';

/** The same text with every subscript digit written as a plain one (`CaCl₂` → `CaCl2`), for reading formulas people typed. */
export function plainDigits(text: string): string {
  let out = '';
  for (const c of text) {
    const sub = SUBSCRIPT_DIGITS.indexOf(c);
    out += sub >= 0 ? String(sub) : c;
  }
  return out;
}

/**
 * Subscript digits of a formula for display, except the leading count of
 * each part after `·` (which may be a decimal such as 2.5). Text already in
 * subscripts, or with no digits, comes back unchanged.
 */
export function formulaText(formula: string): string {
  let out = '';
  let leading = false;
  for (const c of formula) {
    if (c === '·') {
      leading = true;
      out += c;
    } else if ((c >= '0' && c <= '9') || (c === '.' && leading)) {
      out += leading ? c : SUBSCRIPT_DIGITS[Number(c)];
    } else {
      leading = false;
      out += c;
    }
  }
  return out;
}

/**
 * Free text with the formulas in it written for display: each word that
 * starts with a capital letter or a parenthesis and holds a digit is taken
 * for a formula (`40 g CaCl2 in 100 g water` → `40 g CaCl₂ in 100 g water`).
 */
export function formulasInText(text: string): string {
  return text
    .split(' ')
    .map((w) => {
      const m = /^([A-Z(][A-Za-z0-9()·.]*?)([.,;:)]*)$/.exec(w);
      return m && /[0-9]/.test(m[1]!) && /[a-z)]|[A-Z][0-9]/.test(m[1]!) ? formulaText(m[1]!) + m[2]! : w;
    })
    .join(' ');
}
