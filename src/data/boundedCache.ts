/**
 * The one cache shape of ionheat: a map with a bound on its entries, so that
 * memory stays flat however many distinct keys (salts, formulas) a long run
 * brings. Two generations: new entries go into the young one; when it is
 * full the old one is dropped and the young one becomes old; a hit in the
 * old one is moved back into the young one. Entries used again stay, those
 * not used for a while go: close to least-recently-used, at the cost of two
 * map look-ups at most, and no reordering on a hit in the young generation.
 *
 * @module
 */

/** A map holding at most `limit` entries (see the module comment for which ones it keeps). */
export class BoundedCache<K, V> {
  #young = new Map<K, V>();
  #old = new Map<K, V>();
  readonly #half: number;

  /** @param limit - the most entries held at once (at least 2) */
  constructor(readonly limit: number) {
    this.#half = Math.max(1, Math.floor(limit / 2));
  }

  /** The value kept for `key`, or undefined. */
  get(key: K): V | undefined {
    const young = this.#young.get(key);
    if (young !== undefined || this.#young.has(key)) return young;
    if (!this.#old.has(key)) return undefined;
    const value = this.#old.get(key) as V;
    this.#old.delete(key);
    this.set(key, value);
    return value;
  }

  /** Whether a value is kept for `key`. */
  has(key: K): boolean {
    return this.#young.has(key) || this.#old.has(key);
  }

  /** Keeps `value` for `key`, dropping the oldest generation when the young one is full. */
  set(key: K, value: V): void {
    if (!this.#young.has(key) && this.#young.size >= this.#half) {
      this.#old = this.#young;
      this.#young = new Map();
    }
    this.#old.delete(key);
    this.#young.set(key, value);
  }

  /** How many entries are held (never more than `limit`). */
  get size(): number {
    return this.#young.size + this.#old.size;
  }
}
