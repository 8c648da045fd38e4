/**
 * A salt as a caller passes it to a public function: formula text, or a
 * {@link Salt} (from {@link parseSalt}), which is read again from its
 * formula so that a hand-edited or damaged object cannot carry wrong counts,
 * masses or charges into a result.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { IonheatError } from '../error.js';
import { describeValue } from '../quantity/argumentChecks.js';
import { isIssuedSalt } from './issuedSalts.js';
import { parseSalt } from './parseSalt.js';
import type { Salt } from './salt.js';

/** Formula texts kept per dataset once read (bounded, so that odd inputs cannot grow the cache without limit). */
const CACHE_LIMIT = 4096;

/**
 * The salt `value` names, parsed with `dataset`: text is parsed; an object's
 * `formula` is parsed again (its other fields are not trusted).
 *
 * @throws IonheatError `INVALID_ARGUMENT` naming `field` when `value` is neither; the parser's errors for a bad formula
 */
export function saltArgument(value: unknown, dataset: Dataset = builtinDataset(), field = 'salt'): Salt {
  // A salt parseSalt made is frozen and can be trusted as it is.
  if (isIssuedSalt(value)) return value;
  const formula = typeof value === 'string' ? value : value !== null && typeof value === 'object' && !Array.isArray(value) ? (value as { formula?: unknown }).formula : undefined;
  if (typeof formula !== 'string') {
    throw new IonheatError('INVALID_ARGUMENT', `${field} must be a formula (such as "KNO3") or a salt from parseSalt, got ${typeof value === 'object' && value !== null && !Array.isArray(value) ? 'an object without a formula' : describeValue(value)}`, { field });
  }
  const cache = dataset.cache<string, Salt>('chem.saltArgument', CACHE_LIMIT);
  let salt = cache.get(formula);
  if (!salt) {
    salt = parseSalt(formula, dataset);
    cache.set(formula, salt);
  }
  // Frozen by parseSalt, so the cached salt can be handed out as it is.
  return salt;
}
