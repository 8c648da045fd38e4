// Every chart rendered to PNG by headless Chromium (Debian's `chromium` package), so that what a person sees is
// what was checked: each PNG has the drawing's size, and the text boxes the browser lays out in a real font do not
// overlap. Set IONHEAT_PNG_DIR to keep the PNGs (they are written to a temporary folder otherwise). Skipped, saying
// so, where no chromium is installed.
import { execFile, spawnSync } from 'node:child_process';
import { promisify } from 'node:util';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { chartFixtures } from './chartFixtures.js';
import { boxesOverlap } from '../../src/render/textBox.js';

function findChromium(): string | undefined {
  for (const name of ['chromium', 'chromium-browser']) {
    const found = spawnSync('sh', ['-c', `command -v ${name}`], { encoding: 'utf8' });
    if (found.status === 0 && found.stdout.trim()) return found.stdout.trim();
  }
  return undefined;
}

const chromium = findChromium();
if (!chromium) console.warn('chartPng.test.ts skipped: no chromium on PATH (apt-get install -y chromium); the charts were not rendered to PNG');

/** Runs headless Chromium once with a fresh profile; `args` name what to do. */
async function runChromium(args: readonly string[]): Promise<string> {
  const profile = mkdtempSync(join(tmpdir(), 'ionheat-chromium-'));
  try {
    const { stdout } = await promisify(execFile)(
      chromium!,
      ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', `--user-data-dir=${profile}`, '--hide-scrollbars', ...args],
      { encoding: 'utf8', timeout: 60_000, maxBuffer: 64 * 1024 * 1024 },
    );
    return stdout;
  } finally {
    rmSync(profile, { recursive: true, force: true });
  }
}

/** Runs `task` over `items`, `limit` at a time (Chromium spends most of its start-up waiting). */
async function eachLimited<T>(items: readonly T[], limit: number, task: (item: T) => Promise<void>): Promise<void> {
  let next = 0;
  await Promise.all(Array.from({ length: limit }, async () => {
    while (next < items.length) await task(items[next++]!);
  }));
}

/** Width and height of a PNG, from its IHDR chunk. */
function pngSize(file: string): { width: number; height: number } {
  const b = readFileSync(file);
  expect(b.subarray(1, 4).toString('latin1')).toBe('PNG');
  return { width: b.readUInt32BE(16), height: b.readUInt32BE(20) };
}

describe.skipIf(!chromium)('charts rendered by headless Chromium', () => {
  const charts = chartFixtures();
  const dir = process.env.IONHEAT_PNG_DIR ?? mkdtempSync(join(tmpdir(), 'ionheat-png-'));
  mkdirSync(dir, { recursive: true });

  it('renders every chart to a PNG of the drawing’s size', async () => {
    await eachLimited(charts, 4, async ({ name, svg }) => {
      const width = Number(/width="([\d.]+)"/.exec(svg)![1]);
      const height = Number(/height="([\d.]+)"/.exec(svg)![1]);
      const svgFile = join(dir, `${name}.svg`);
      const pngFile = join(dir, `${name}.png`);
      writeFileSync(svgFile, svg);
      await runChromium([`--window-size=${Math.ceil(width)},${Math.ceil(height)}`, `--screenshot=${pngFile}`, `file://${svgFile}`]);
      expect(pngSize(pngFile), name).toEqual({ width: Math.ceil(width), height: Math.ceil(height) });
    });
  }, 240_000);

  it('lays out no two texts on top of each other in a real font', async () => {
    // One page holding every chart; a script writes each text's box (as laid out) into the page, read back from the DOM.
    const page = join(dir, 'all-charts.html');
    const script = `document.body.setAttribute('data-boxes', JSON.stringify([...document.querySelectorAll('svg')].map((s, i) => [...s.querySelectorAll('text')].map((t) => { const r = t.getBoundingClientRect(); return [i, r.left, r.top, r.right, r.bottom, t.textContent]; }))));`;
    writeFileSync(page, `<!doctype html><html><body style="margin:0">${charts.map((c) => `<div>${c.svg}</div>`).join('')}<script>${script}</script></body></html>`);
    const dom = await runChromium(['--dump-dom', `file://${page}`]);
    const raw = /data-boxes="([^"]*)"/.exec(dom)![1]!.replace(/&quot;/g, '"').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>');
    const perChart = JSON.parse(raw) as [number, number, number, number, number, string][][];
    expect(perChart).toHaveLength(charts.length);
    const clashes: string[] = [];
    perChart.forEach((texts, i) => {
      // Glyph boxes include the font's ascent and descent; 1.5 px of shared edge is the leading of adjacent lines.
      const boxes = texts.map(([, x0, y0, x1, y1, content]) => ({ x0, y0, x1, y1, content }));
      for (let a = 0; a < boxes.length; a++)
        for (let b = a + 1; b < boxes.length; b++)
          if (boxesOverlap(boxes[a]!, boxes[b]!, 1.5)) clashes.push(`${charts[i]!.name}: "${boxes[a]!.content}" × "${boxes[b]!.content}"`);
    });
    expect(clashes).toEqual([]);
  }, 120_000);
});
