/**
 * The one record of objects the library issued (made, froze and may trust when
 * handed back), kept weakly. `chem/issuedSalts.ts` issues salts through it; the
 * snapshot codec reads it so that a salt computed ahead comes back issued,
 * without this layer knowing what a salt is.
 *
 * @module
 */
const issued = new WeakSet<object>();

/** Freezes `value` and everything inside it, and remembers it as issued. @internal */
export function issueObject<T extends object>(value: T): T {
  freezeDeep(value);
  issued.add(value);
  return value;
}

/** Whether the library issued `value` (and, being frozen, nobody changed it since). @internal */
export function wasIssued(value: unknown): value is object {
  return typeof value === 'object' && value !== null && issued.has(value);
}

function freezeDeep(value: unknown): void {
  if (typeof value !== 'object' || value === null || Object.isFrozen(value)) return;
  for (const v of Object.values(value)) freezeDeep(v);
  Object.freeze(value);
}
