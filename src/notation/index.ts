/**
 * One notation for everything a person reads — text output, JSON notes,
 * errors and charts: charges (`Ca²⁺`), minus signs (`−`), formulas and
 * hydrates (`CaCl₂·6H₂O`, `NaCl·2.5H₂O`), units, and paragraph wrapping.
 * Import from here rather than writing a sign or a subscript by hand.
 *
 * @module
 */
export { MINUS, formatNumber, withTrueMinus } from './minus.js';
export { chargeText, chargeNumber, ionText } from './charge.js';
export { formulaText, formulasInText } from './formula.js';
export { UNIT, withUnit } from './units.js';
export { wrapText } from './wrapText.js';
