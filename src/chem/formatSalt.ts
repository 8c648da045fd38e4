import { formulaText } from '../notation/formula.js';
import { checkSaltShape, type Salt, type SaltIon } from './salt.js';

/** Writes ions as a formula: counts after monatomic ions, parentheses round a polyatomic ion that occurs more than once. */
export function formatIons(ions: readonly Pick<SaltIon, 'formula' | 'count'>[]): string {
  return ions
    .map(({ formula, count }) => {
      if (count === 1) return formula;
      const monatomic = /^[A-Z][a-z]?$/.test(formula);
      return monatomic ? `${formula}${count}` : `(${formula})${count}`;
    })
    .join('');
}

/** `·6H2O` for six waters of crystallization, `·H2O` for one, nothing for none. */
export function hydrateSuffix(water: number): string {
  return water > 0 ? `·${water === 1 ? '' : water}H2O` : '';
}

/**
 * The canonical formula of a salt, rebuilt from its ions and water: cations
 * first, then anions, each in the order of the ion table; water after `·`.
 * `style: 'unicode'` writes subscript digits for display (`Ca(NO₃)₂·4H₂O`).
 * Parsing the result gives the same salt back.
 *
 * @param salt - the ions (formula and count) and the moles of water of crystallization per formula unit
 * @param options - `style`: `'plain'` (ASCII digits, the default) or `'unicode'` (subscripts, for display)
 * @see IUPAC, Nomenclature of Inorganic Chemistry (Recommendations 2005), IR-4.4: electropositive
 *   constituents first, polyatomic groups in parentheses, solvates after a centred dot.
 *
 * @example
 * ```ts
 * formatSalt(parseSalt('Na2SO4.10H2O')); // 'Na2SO4·10H2O'
 * formatSalt(parseSalt('Ca(NO3)2·4H2O'), { style: 'unicode' }); // 'Ca(NO₃)₂·4H₂O'
 * ```
 */
export function formatSalt(salt: Pick<Salt, 'ions' | 'water'>, options: { style?: 'plain' | 'unicode' } = {}): string {
  checkSaltShape(salt);
  const anhydrous = formatIons(salt.ions);
  const plain = anhydrous + hydrateSuffix(salt.water);
  return options?.style === 'unicode' ? formulaText(plain) : plain;
}
