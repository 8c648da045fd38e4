/**
 * A one-line progress bar on a terminal's standard error, redrawn at most
 * ten times a second and cleared at the end. Used only when standard error
 * is a terminal, so logs stay clean.
 *
 * @module
 */

/** A progress bar writing through `write`. */
export interface ProgressBar {
  /** Reports rows done and, when known, the fraction of the input read. */
  update(rows: number, fraction?: number): void;
  /** Clears the line. */
  done(): void;
}

/** A bar that draws nothing. */
export const silentProgress: ProgressBar = { update() {}, done() {} };

/** A bar drawing on a terminal; `now` gives milliseconds (replaceable in tests). */
export function terminalProgress(write: (text: string) => void, now: () => number = () => Date.now()): ProgressBar {
  const started = now();
  let last = -Infinity;
  let drawn = false;
  const WIDTH = 24;
  return {
    update(rows, fraction) {
      const t = now();
      if (t - last < 100 || t - started < 300) return;
      last = t;
      const rate = rows / Math.max(0.001, (t - started) / 1000);
      const bar =
        fraction === undefined
          ? ''
          : `[${'█'.repeat(Math.round(Math.min(1, fraction) * WIDTH)).padEnd(WIDTH, '·')}] ${Math.floor(Math.min(1, fraction) * 100)
              .toString()
              .padStart(3)} % `;
      write(`\r\x1b[2K${bar}${rows.toLocaleString('en-US')} rows, ${Math.round(rate).toLocaleString('en-US')} rows/s`);
      drawn = true;
    },
    done() {
      if (drawn) write('\r\x1b[2K');
    },
  };
}
