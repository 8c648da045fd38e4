// The workbench page's own bundle, library included, is at most 300 KB gzipped (issue 18), and the page reaches no
// Node built-in. Needs dist/ (npm test builds it).
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';

const dir = join(import.meta.dirname, '..', '..', 'dist', 'workbench');

/** The budget of the page, bytes gzipped (level 9): every file it loads. */
const BUDGET = 300 * 1024;

describe.skipIf(!existsSync(join(dir, 'index.html')))('the workbench bundle', () => {
  it(`is at most ${BUDGET / 1024} KB gzipped, page, worker, style and HTML together`, () => {
    const files = readdirSync(dir);
    expect(files.sort()).toEqual(['index.html', 'page.js', 'style.css', 'worker.js']);
    const sizes = Object.fromEntries(files.map((f) => [f, gzipSync(readFileSync(join(dir, f)), { level: 9 }).length]));
    const total = Object.values(sizes).reduce((a, b) => a + b, 0);
    console.log(`workbench bundle, gzipped bytes: ${JSON.stringify(sizes)}, total ${total}`);
    expect(total).toBeLessThanOrEqual(BUDGET);
    // The page's own thread stays small: the library is in the worker only.
    expect(sizes['page.js']).toBeLessThan(10 * 1024);
  });

  it('loads the worker as a module next to the page and nothing from elsewhere', () => {
    const page = readFileSync(join(dir, 'page.js'), 'utf8');
    expect(page).toContain('worker.js');
    const html = readFileSync(join(dir, 'index.html'), 'utf8');
    expect(html.match(/(?:src|href)="([^"]+)"/g)).toEqual(['href="data:,"', 'href="style.css"', 'src="page.js"', 'href="#panels"']);
  });
});
