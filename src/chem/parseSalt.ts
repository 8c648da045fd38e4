/**
 * From a written formula to a {@link Salt}: which ions, how many, how much
 * water of crystallization, and the molar mass; a formula that reads only
 * through a likely slip of the keyboard is refused with what was probably meant.
 *
 * @module
 */
import { issueSalt } from './issuedSalts.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { IonheatError, isIonheatError } from '../error.js';
import type { Salt } from './salt.js';
import { readSaltText } from './readSaltText.js';
import { typoSuggestion, typoSuspicion } from './typoSuspicion.js';

/**
 * Reads a salt formula and decomposes it into the ions of the dataset.
 *
 * Accepts `NaCl`, `CaCl2`, `(NH4)2SO4`, `Ca(NO3)2`, `CH3COONa`,
 * `KAl(SO4)2·12H2O` (hydrate water after `·`, `.` or `*`), subscript digits
 * (`Na₂SO₄`), and the non-electrolyte solutes of the ion table by formula or
 * name (`CO(NH2)2`, `urea`). The formula is read as the fewest ions of the
 * table that account for every atom; where an ion can carry several charges
 * (Fe²⁺, Fe³⁺) the one that balances the formula is chosen.
 *
 * A formula that reads only through a likely typo (a digit 0 where an O fits,
 * `1` for `l`, a lower-case letter where a symbol fits, an ion rarely met such
 * as azide) while one such edit gives a salt the tables measure is refused
 * with `SUSPECTED_TYPO` and the salt probably meant (`KN03`: did you mean
 * KNO₃?); a formula that does not read at all names what it probably meant
 * (swapped, doubled or dropped characters, letter case, several look-alikes,
 * a hydrate's dot written as a space or left out: `MgOS4`, `nacl`,
 * `CaCl26H2O`). A formula valid as written that is probably a slip (`LiN3`,
 * an azide, for `LiNO3`) reads, and `dissolve` carries the suspicion.
 *
 * Never throws anything but {@link IonheatError}: codes `EMPTY_FORMULA`,
 * `FORMULA_TOO_LONG`, `UNEXPECTED_CHARACTER`, `UNMATCHED_PARENTHESIS`,
 * `NESTING_TOO_DEEP`, `BAD_COUNT`, `UNKNOWN_ELEMENT`, `UNKNOWN_ION`,
 * `UNBALANCED_CHARGE`, `AMBIGUOUS_FORMULA`, `SUSPECTED_TYPO`.
 *
 * @param formula - the formula as written
 * @param dataset - ion and element tables (default: built-in)
 * @see IUPAC, Nomenclature of Inorganic Chemistry (Recommendations 2005), IR-4 (formulae); molar masses from the
 *   standard atomic weights of Prohaska et al. (2022), source key `iupac2021`.
 *
 * @example
 * ```ts
 * const s = parseSalt('Ca(NO3)2·4H2O');
 * s.ions.map((i) => `${i.count} ${i.ion}`); // ['1 Ca[2+]', '2 NO3[-]']
 * s.water; // 4
 * s.molarMass; // 236.15 g/mol
 * ```
 */
export function parseSalt(formula: string, dataset: Dataset = builtinDataset()): Salt {
  try {
    return issueSalt(parseSaltUnchecked(formula, dataset));
  } catch (e) {
    if (isIonheatError(e)) throw e;
    // A defect, not a user error; still keep the promise of one error class.
    throw new IonheatError('INVALID_ARGUMENT', `could not read the formula: ${e instanceof Error ? e.message : String(e)}`, { text: String(formula) });
  }
}

function parseSaltUnchecked(formula: string, dataset: Dataset): Salt {
  let salt: Salt;
  try {
    salt = readSaltText(formula, dataset);
  } catch (e) {
    if (!isIonheatError(e) || typeof formula !== 'string') throw e;
    const unknownSymbol = e.code === 'UNKNOWN_ELEMENT' && e.position !== undefined ? { symbol: /"([^"]+)"/.exec(e.message)?.[1] ?? '', position: e.position } : undefined;
    const meant = typoSuggestion(formula, dataset, unknownSymbol);
    if (meant === undefined) throw e;
    throw new IonheatError(e.code, `${e.message}; did you mean ${meant}?`, { ...(e.text !== undefined ? { text: e.text } : {}), ...(e.position !== undefined ? { position: e.position } : {}) });
  }
  const suspicion = typoSuspicion(formula, salt, dataset);
  if (suspicion?.action === 'refuse') throw new IonheatError('SUSPECTED_TYPO', suspicion.message, { text: suspicion.text, position: suspicion.position });
  return salt;
}
