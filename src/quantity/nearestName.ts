/**
 * The name a misspelt word was probably meant to be, for "did you mean"
 * hints in errors: options, commands, element symbols, source kinds.
 *
 * @module
 */

/** Edits (insert, delete, substitute, swap two neighbours) from `a` to `b`, or `limit + 1` once that many are exceeded. */
export function editDistance(a: string, b: string, limit = Infinity): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  const rows: number[][] = [];
  for (let i = 0; i <= a.length; i++) {
    const row: number[] = [i];
    for (let j = 1; j <= b.length; j++) {
      if (i === 0) {
        row.push(j);
        continue;
      }
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(rows[i - 1]![j]! + 1, row[j - 1]! + 1, rows[i - 1]![j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, rows[i - 2]![j - 2]! + 1);
      row.push(d);
    }
    rows.push(row);
  }
  return rows[a.length]![b.length]!;
}

/**
 * The candidate closest to `word` (case ignored), when it is close enough to
 * be a likely slip: at most one edit in a word of up to four letters, else a
 * third of the word's length; a candidate that starts with the word (three
 * letters at least, `fil` → `fill`) counts as close. Undefined when nothing is.
 */
export function nearestName(word: string, candidates: Iterable<string>): string | undefined {
  const w = word.toLowerCase();
  const limit = w.length <= 4 ? 1 : Math.max(2, Math.floor(w.length / 3));
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const c = candidate.toLowerCase();
    if (c === w) return candidate;
    let d = editDistance(w, c, limit);
    // A prefix counts, but after any true near miss.
    if (d > limit && w.length >= 3 && (c.startsWith(w) || w.startsWith(c))) d = limit + 0.5;
    if (d <= limit + 0.5 && d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  return best;
}

/** ` (did you mean "x"?)`, or nothing when no candidate is close. */
export function didYouMean(word: string, candidates: Iterable<string>, quote = '"'): string {
  const near = nearestName(word, candidates);
  return near === undefined ? '' : ` (did you mean ${quote}${near}${quote}?)`;
}
