/**
 * The "hostile input" section of `npm run bench`: the time of each hostile input of issue 7 (a 100 000-character
 * formula, parentheses 10 000 deep, huge counts, a 100 000-character spec and fill…), answered with a result or a
 * typed error, against the 100 ms target. Each case is timed warm (best of several calls) after one cold call.
 */
import { performance } from 'node:perf_hooks';
import { parseSalt } from '../../chem/parseSalt.js';
import { compileSpec } from '../../screen/compileSpec.js';
import { hostileCases } from './hostileCases.js';

/** Longest time any hostile input may take, ms (issue 7). */
export const HOSTILE_TARGET_MS = 100;

function timeOnce(run: () => unknown): number {
  const t0 = performance.now();
  try {
    run();
  } catch {
    // A typed refusal is an answer; its time is what is measured.
  }
  return performance.now() - t0;
}

export function benchHostile(): string[] {
  // Build the ion table's indexes and the spec's field list first: the cases time the parsers, not that set-up.
  parseSalt('NaCl');
  compileSpec('best.low > 0');
  const out: string[] = [];
  let worst = 0;
  for (const c of hostileCases()) {
    const cold = timeOnce(c.run);
    let best = Infinity;
    for (let i = 0; i < 20; i++) best = Math.min(best, timeOnce(c.run));
    worst = Math.max(worst, cold);
    out.push(`${c.name.padEnd(52)} cold ${cold.toFixed(3).padStart(8)} ms (${(cold / HOSTILE_TARGET_MS).toFixed(4)} × 100 ms), warm ${best.toFixed(3).padStart(8)} ms (${(best / HOSTILE_TARGET_MS).toFixed(4)} × 100 ms)`);
  }
  out.push(`worst cold time ${worst.toFixed(3)} ms = ${(worst / HOSTILE_TARGET_MS).toFixed(4)} × the 100 ms target (${worst <= HOSTILE_TARGET_MS ? 'met' : 'NOT MET'})`);
  return out;
}
