/**
 * What the chart functions accept: a result of the function that makes it
 * (bornHaberCycle, packRatioCurve, packTimeCourse, screen), whole. A
 * damaged one — not an object, a number that is not finite, a field of the
 * wrong kind — gives an `INVALID_ARGUMENT` error naming the argument, never
 * a chart with NaN in it or a stray TypeError.
 *
 * @module
 */
import { IonheatError, isIonheatError } from '../error.js';
import { describeValue } from '../quantity/argumentChecks.js';

/** Where in `value` (a plain result) a number is not finite, or undefined. */
function nonFinite(value: unknown, path: string, depth: number, seen: Set<object>): string | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : `${path} = ${String(value)}`;
  if (value === null || typeof value !== 'object' || depth > 8 || seen.has(value)) return undefined;
  seen.add(value);
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const hit = nonFinite(value[i], `${path}[${i}]`, depth + 1, seen);
      if (hit) return hit;
    }
    return undefined;
  }
  for (const k of Object.keys(value)) {
    const hit = nonFinite((value as Record<string, unknown>)[k], `${path}.${k}`, depth + 1, seen);
    if (hit) return hit;
  }
  return undefined;
}

/**
 * Draws `input` with `draw` after checking it is an object holding only
 * finite numbers; any failure of a malformed input inside `draw` becomes an
 * `INVALID_ARGUMENT` error naming `field` and what made it (`made`).
 */
export function drawChecked<T, O>(input: T, options: O | undefined, field: string, made: string, draw: (input: T, options: O) => string): string {
  if (input === null || typeof input !== 'object') throw new IonheatError('INVALID_ARGUMENT', `${field} must be the result of ${made}, got ${describeValue(input)}`, { field });
  if (options !== undefined && (options === null || typeof options !== 'object')) throw new IonheatError('INVALID_ARGUMENT', `the chart options are an object, got ${describeValue(options)}`, { field: 'options' });
  const bad = nonFinite(input, field, 0, new Set()) ?? nonFinite(options, 'options', 0, new Set());
  if (bad) throw new IonheatError('INVALID_ARGUMENT', `cannot draw a number that is not finite: ${bad}`, { field: bad.split(' ')[0] });
  try {
    return draw(input, (options ?? {}) as O);
  } catch (e) {
    if (isIonheatError(e)) throw e;
    throw new IonheatError('INVALID_ARGUMENT', `${field} is not a whole result of ${made} (${e instanceof Error ? e.message : 'malformed'})`, { field });
  }
}
