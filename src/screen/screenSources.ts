/**
 * Source keys that a screen knows besides the dataset's own: for numbers a
 * user gives with a candidate. (The invented numbers of the demonstration
 * cite `inventedDemo`, a key of the built-in sources.)
 *
 * @module
 */
import type { SourceEntry } from '../data/schemas.js';

/** Citations the screen adds to the dataset's sources. */
export const screenSources: Readonly<Record<string, SourceEntry>> = Object.freeze({
  screenInput: {
    citation: 'Value given with the candidate in the screening input (the user’s own measurement or supplier figure).',
    kind: 'derived',
  },
});
