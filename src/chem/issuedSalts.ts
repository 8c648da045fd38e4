/**
 * Salts made by {@link parseSalt}: frozen, and remembered (weakly) as issued,
 * so that a public function handed one back can trust it without reading the
 * formula again, while any other object still goes through the full check.
 *
 * @module
 */
import type { Salt } from './salt.js';
import { issueObject, wasIssued } from '../data/issuedObjects.js';

/** Freezes `salt` (its ions and composition too) and remembers it as issued. @internal */
export function issueSalt(salt: Salt): Salt {
  return issueObject(salt);
}

/** Whether `value` is a salt that {@link parseSalt} made (and, being frozen, nobody changed since). @internal */
export function isIssuedSalt(value: unknown): value is Salt {
  return wasIssued(value);
}
