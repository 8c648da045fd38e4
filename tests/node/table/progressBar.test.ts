import { describe, expect, it } from 'vitest';
import { terminalProgress } from '../../../src/node/table/progressBar.js';

describe('terminalProgress', () => {
  it('draws at most ten times a second after a short delay, and clears its line at the end', () => {
    let now = 0;
    const drawn: string[] = [];
    const bar = terminalProgress((t) => drawn.push(t), () => now);
    bar.update(100, 0.01); // too early: nothing for the first 300 ms
    now = 400;
    bar.update(4000, 0.4);
    now = 450;
    bar.update(4500, 0.45); // within 100 ms of the last drawing
    now = 800;
    bar.update(8000, 0.8);
    bar.done();
    expect(drawn).toHaveLength(3);
    expect(drawn[0]).toMatch(/^\r\x1b\[2K\[█{10}·{14}\]  40 % 4,000 rows, 10,000 rows\/s$/);
    expect(drawn[1]).toMatch(/ 80 % 8,000 rows/);
    expect(drawn[2]).toBe('\r\x1b[2K');
  });

  it('shows a count without a bar when the size of the input is unknown, and clears nothing it never drew', () => {
    let now = 1000;
    const drawn: string[] = [];
    const bar = terminalProgress((t) => drawn.push(t), () => now);
    now = 2000;
    bar.update(50_000);
    expect(drawn[0]).toBe('\r\x1b[2K50,000 rows, 50,000 rows/s');
    const quiet: string[] = [];
    terminalProgress((t) => quiet.push(t), () => 0).done();
    expect(quiet).toEqual([]);
  });
});
