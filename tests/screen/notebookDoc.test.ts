// Runs the cells of docs/notebook.md in order, as a notebook would, with a
// `display` that records what each cell shows.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as ionheat from '../../src/index.js';

const text = readFileSync(join(import.meta.dirname, '..', '..', 'docs', 'notebook.md'), 'utf8');
const cells = [...text.matchAll(/```js\n([\s\S]*?)```/g)].map((m) => m[1]!);

describe('docs/notebook.md', () => {
  it('has its cells in plain JavaScript importing the core entry only', () => {
    expect(cells.length).toBeGreaterThanOrEqual(5);
    expect(cells[0]).toMatch(/^import \{[^}]+\} from 'ionheat';/);
    for (const cell of cells.slice(1)) expect(cell).not.toMatch(/^import /m);
  });

  it('runs every cell, and what they show is right', async () => {
    const shown: unknown[] = [];
    const names = [...cells[0]!.matchAll(/\{([^}]+)\}/g)][0]![1]!.split(',').map((s) => s.trim());
    const scope = Object.fromEntries(names.map((n) => [n, (ionheat as Record<string, unknown>)[n]]));
    for (const n of names) expect(scope[n], n).toBeDefined();
    const body = cells.slice(1).join('\n');
    const run = new Function('display', ...names, `return (async () => {\n${body}\n})();`);
    await run((x: unknown) => shown.push(x), ...names.map((n) => scope[n]));
    const [table, summary, chart] = shown as [Record<string, unknown>[], ionheat.ScreenSummary, { 'image/svg+xml': string }];
    // KNO3 ranks first for cooling: 34.89 kJ/mol (CRC Handbook, in the built-in tables).
    expect(table[0]).toMatchObject({ rank: 1, salt: 'KNO3', 'ΔsolH kJ/mol': 34.89, basis: 'measured', verdict: 'endothermic', 'meets spec': true });
    expect(summary).toMatchObject({ read: 6, computed: 6, failed: 0 });
    expect(chart['image/svg+xml'].startsWith('<svg')).toBe(true);
    expect(shown).toContainEqual(['fill.finalTemperature.high', 'hazards']);
    expect(shown.some((x) => typeof x === 'string' && x.includes('did you mean "high"'))).toBe(true);
    expect(shown.some((x) => typeof x === 'string' && /^\d+ salts of the built-in ions cool/.test(x))).toBe(true);
  });
});
