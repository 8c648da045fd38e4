/**
 * Reproducible standard normal draws for the Monte Carlo interval: a small
 * seeded generator, so that the same seed gives the same interval on every
 * machine.
 *
 * @module
 */

/**
 * A generator of standard normal deviates from a 32-bit seed: uniform
 * numbers from Tommy Ettinger's Mulberry32, turned normal by the Box–Muller
 * transform. Not for cryptography; for repeatable simulation.
 *
 * @param seed - any integer (taken modulo 2³²)
 * @returns a function giving the next deviate on each call
 * @see Box, G. E. P.; Muller, M. E. A note on the generation of random normal deviates. Ann. Math. Stat. 29, 610–611 (1958).
 * @example
 * ```ts
 * const a = seededNormal(7);
 * const b = seededNormal(7);
 * a() === b(); // true
 * ```
 */
export function seededNormal(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const s = spare;
      spare = undefined;
      return s;
    }
    let u = uniform();
    while (u === 0) u = uniform();
    const v = uniform();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}
