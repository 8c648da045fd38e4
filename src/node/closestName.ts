/**
 * "Did you mean …?" for a name the user typed: the known name it differs
 * from only in case, or else by at most two edits (a letter added, dropped
 * or changed).
 *
 * @module
 */

/** Edit distance of two short texts (Levenshtein), giving up above `limit`. */
function editDistance(a: string, b: string, limit: number): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    let best = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current[j] = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
      best = Math.min(best, current[j]!);
    }
    if (best > limit) return limit + 1;
    previous = current;
  }
  return previous[b.length]!;
}

/**
 * The known name closest to `typed`, or undefined when none is close.
 *
 * @param typed - what the user wrote
 * @param known - the names that are accepted
 */
export function closestName(typed: string, known: readonly string[]): string | undefined {
  if (typed.length > 60) return undefined;
  const lower = typed.toLowerCase();
  const sameLetters = known.find((k) => k.toLowerCase() === lower);
  if (sameLetters) return sameLetters;
  let best: string | undefined;
  let bestDistance = 3;
  for (const k of known) {
    const d = editDistance(lower, k.toLowerCase(), 2);
    if (d < bestDistance) {
      best = k;
      bestDistance = d;
    }
  }
  return best;
}
