/**
 * Remembers which rows came before, by a fingerprint of their text, in flat
 * typed arrays (open addressing, linear probing), so that spotting a
 * repeated row costs 16 bytes per distinct row and no garbage.
 *
 * @module
 */

/**
 * A 53-bit fingerprint of a text. Two polynomial hashes over the UTF-16 code
 * units with different odd multipliers (the golden-ratio constant 2³²/φ and
 * a second arbitrary odd number), each finished by an xor-shift, give
 * 21 + 32 bits. Two different texts share a fingerprint with a chance of
 * about n²/2⁵⁴ among n distinct texts.
 */
export function fingerprint(text: string): number {
  let a = text.length;
  let b = ~text.length;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    a = Math.imul(a + c, 0x9e3779b1);
    b = Math.imul(b ^ c, 0x2c1b3c6d) + (b >>> 11);
  }
  a ^= a >>> 15;
  a = Math.imul(a, 0x2c1b3c6d);
  a ^= a >>> 13;
  b ^= b >>> 16;
  b = Math.imul(b, 0x9e3779b1);
  b ^= b >>> 15;
  return (b & 0x1fffff) * 4294967296 + (a >>> 0);
}

/** The first line on which each distinct text was seen, up to a limit of distinct texts. */
export class RepeatIndex {
  #keys = new Float64Array(1024);
  #lines = new Float64Array(1024);
  #size = 0;

  constructor(readonly limit: number) {}

  /** How many distinct texts are remembered. */
  get size(): number {
    return this.#size;
  }

  /**
   * The line of an earlier text with the same fingerprint, or undefined
   * (and then `line` is remembered for it, while under the limit).
   */
  firstLine(text: string, line: number): number | undefined {
    // Fingerprint 0 marks an empty slot, so shift every fingerprint by one.
    const key = fingerprint(text) + 1;
    const mask = this.#keys.length - 1;
    let i = (key % 4294967296) & mask;
    for (;;) {
      const k = this.#keys[i]!;
      if (k === 0) break;
      if (k === key) return this.#lines[i];
      i = (i + 1) & mask;
    }
    if (this.#size >= this.limit) return undefined;
    this.#keys[i] = key;
    this.#lines[i] = line;
    this.#size++;
    if (this.#size * 2 > this.#keys.length) this.#grow();
    return undefined;
  }

  #grow(): void {
    const keys = this.#keys;
    const lines = this.#lines;
    this.#keys = new Float64Array(keys.length * 2);
    this.#lines = new Float64Array(keys.length * 2);
    const mask = this.#keys.length - 1;
    for (let j = 0; j < keys.length; j++) {
      const key = keys[j]!;
      if (key === 0) continue;
      let i = (key % 4294967296) & mask;
      while (this.#keys[i] !== 0) i = (i + 1) & mask;
      this.#keys[i] = key;
      this.#lines[i] = lines[j]!;
    }
  }
}
