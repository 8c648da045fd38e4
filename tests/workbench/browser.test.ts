// The workbench page in a real browser: Debian's Chromium (/usr/bin/chromium, installed by .ci/run) driven by
// playwright-core (no browser download). Each panel is run on known salts and every number it shows is compared with
// the library's own result; a bad formula and a bad CSV row show their messages; the downloads are the command
// line's; axe-core finds no serious or critical accessibility violation; a PNG of each panel is written to
// IONHEAT_PNG_DIR (default: a folder under the system's temporary directory) to be looked at. Skipped, saying so,
// where Chromium or the built page (npm run build) is missing.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRequire } from 'node:module';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { applyOverrideDocument } from '../../src/node/overrideDocument.js';
import { builtinDataset, dissolve, enumerate, integralEnthalpyOfSolution, latentWarmer } from '../../src/index.js';
import { packResults } from '../../src/workbench/packView.js';
import { startWorkbenchServer, type WorkbenchServer } from '../../src/node/workbenchServer.js';
import { runCliInMemory } from '../node/runCliInMemory.js';
import { mismatches, type Shown } from './shownNumbers.js';

const root = join(import.meta.dirname, '..', '..');
const CHROMIUM = process.env.IONHEAT_CHROMIUM ?? '/usr/bin/chromium';
const built = join(root, 'dist', 'workbench');
const missing = !existsSync(CHROMIUM) ? `no Chromium at ${CHROMIUM} (apt-get install -y chromium)` : !existsSync(join(built, 'index.html')) ? 'the page is not built (npm run build)' : undefined;
if (missing) console.warn(`tests/workbench/browser.test.ts skipped: ${missing}`);

const outDir = process.env.IONHEAT_PNG_DIR ?? join(tmpdir(), 'ionheat-workbench-png');
const dataset = builtinDataset();
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/** The numbers shown in a panel's output, with their paths. */
async function shownIn(page: Page, out: string): Promise<Shown[]> {
  return page.$$eval(`#${out} .num`, (spans) => spans.map((s) => ({ text: s.textContent ?? '', path: s.getAttribute('data-path') ?? '', ...(s.getAttribute('data-magnitude') ? { magnitude: true } : {}) })));
}

/** Opens a panel's tab, fills the form, submits, waits for the answer. */
async function runPanel(page: Page, panel: string, fill: Record<string, string> = {}): Promise<void> {
  await page.click(`#tab-${panel}`);
  for (const [selector, value] of Object.entries(fill)) await page.fill(selector, value);
  const before = Number((await page.getAttribute(`#${panel}-out`, 'data-done')) ?? '0');
  await page.click(`#${panel}-form button[type=submit]`);
  await page.waitForFunction(`Number(document.getElementById('${panel}-out').dataset.done ?? '0') > ${before}`, undefined, { timeout: 60_000 });
}

/** axe-core over the whole page: the serious and critical violations, as `rule: where`. */
async function seriousViolations(page: Page): Promise<string[]> {
  await page.evaluate(axeSource);
  const result = (await page.evaluate(`axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'] } })`)) as { violations: { id: string; impact: string; nodes: { target: string[] }[] }[] };
  return result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`);
}

/**
 * The places where two outputs differ, other than in the last digits of a number (relative 1e-12): Chromium's V8 and
 * Node's compute a few functions (Math.pow, Math.exp) to within an ulp of each other, and the writers print numbers in
 * full; everything else, every character of the text, must agree.
 */
function sameUpToLastDigits(a: string, b: string): string[] {
  const number = /-?\d+(?:\.\d+)?(?:e[+-]?\d+)?/g;
  const partsA = a.split(number);
  const partsB = b.split(number);
  const numbersA = a.match(number) ?? [];
  const numbersB = b.match(number) ?? [];
  if (partsA.length !== partsB.length || partsA.some((p, i) => p !== partsB[i])) return [`the texts differ beyond their numbers:\n${a.slice(0, 400)}\n---\n${b.slice(0, 400)}`];
  return numbersA.flatMap((x, i) => {
    const y = numbersB[i]!;
    const [u, v] = [Number(x), Number(y)];
    return x === y || Math.abs(u - v) <= 1e-12 * Math.max(Math.abs(u), Math.abs(v)) ? [] : [`${x} against ${y}`];
  });
}

async function screenshot(page: Page, name: string): Promise<string> {
  const file = join(outDir, `workbench-${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  const b = readFileSync(file);
  expect(b.subarray(1, 4).toString('latin1')).toBe('PNG');
  return file;
}

describe.skipIf(missing !== undefined)('the workbench page in Chromium', () => {
  let server: WorkbenchServer;
  let browser: Browser;
  let page: Page;
  const requests: string[] = [];
  const problems: string[] = [];
  const timings: Record<string, number> = {};

  beforeAll(async () => {
    mkdirSync(outDir, { recursive: true });
    server = await startWorkbenchServer({ directory: built });
    browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--no-sandbox', '--disable-gpu'] });
    // The page's policy allows only its own scripts; the test lifts it to add axe-core.
    const context = await browser.newContext({ viewport: { width: 1200, height: 900 }, bypassCSP: true, acceptDownloads: true });
    page = await context.newPage();
    page.on('request', (r) => requests.push(r.url()));
    page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
    page.on('console', (m) => {
      if (m.type() === 'error') problems.push(`console: ${m.text()}`);
    });
    const began = Date.now();
    await page.goto(server.url);
    await page.waitForSelector('body[data-interactive]');
    timings.interactiveMs = Number(await page.getAttribute('body', 'data-interactive'));
    await page.waitForSelector('body[data-ready]', { timeout: 60_000 });
    timings.readyMs = Number(await page.getAttribute('body', 'data-ready'));
    timings.loadWallMs = Date.now() - began;
  }, 120_000);

  afterAll(async () => {
    writeFileSync(join(outDir, 'workbench-timings.json'), JSON.stringify(timings, null, 2) + '\n');
    console.log(`workbench timings (ms): ${JSON.stringify(timings)}; screenshots in ${outDir}`);
    await browser?.close();
    await server?.close();
  });

  it('is interactive soon after load, and asks for nothing but its own files', async () => {
    // Target: interactive within 1 s on a quiet machine; CI shares two cores with other jobs, so the bound here is loose
    // and the measured time is written to workbench-timings.json.
    expect(timings.interactiveMs).toBeLessThan(5_000);
    const response = await page.request.get(server.url);
    expect(response.headers()['content-security-policy']).toContain("default-src 'none'");
    expect(requests.every((u) => u.startsWith(server.url))).toBe(true);
  });

  it('moves between panels with the arrow keys', async () => {
    await page.focus('#tab-salt');
    await page.keyboard.press('ArrowRight');
    expect(await page.getAttribute('#tab-pack', 'aria-selected')).toBe('true');
    expect(await page.isVisible('#panel-pack')).toBe(true);
    expect(await page.evaluate('document.activeElement?.id')).toBe('tab-pack');
    await page.keyboard.press('ArrowLeft');
    expect(await page.isVisible('#panel-salt')).toBe(true);
  });

  it('Salt: KNO3 shows the library’s every number, its chart and cautions; Enter in the formula computes', async () => {
    await page.click('#tab-salt');
    await page.fill('#salt-formula', 'KNO3');
    await page.fill('#salt-molality', '1');
    const before = Number((await page.getAttribute('#salt-out', 'data-done')) ?? '0');
    await page.press('#salt-formula', 'Enter');
    await page.waitForFunction(`Number(document.getElementById('salt-out').dataset.done ?? '0') > ${before}`);
    const r = dissolve('KNO3', { temperatureC: 25 }, dataset);
    const integral = integralEnthalpyOfSolution(r.salt, 1, 25, dataset);
    const shown = await shownIn(page, 'salt-out');
    expect(shown.length).toBeGreaterThan(20);
    expect(mismatches(shown, { ...r, integral })).toEqual([]);
    // KNO3: ΔsolH° = +34.89 kJ/mol (Parker 1965, NSRDS-NBS 2), endothermic.
    expect(await page.textContent('#salt-out')).toContain('Verdict: endothermic');
    expect(await page.locator('#salt-out figure svg').count()).toBe(1);
    expect(await page.textContent('#salt-out .cautions')).toContain('Screening estimate');
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'salt');
  });

  it('Salt: a mistyped formula shows the library’s message', async () => {
    let message = '';
    try {
      dissolve('KN03', {}, dataset);
    } catch (e) {
      message = (e as Error).message;
    }
    expect(message).toContain('did you mean KNO₃');
    await runPanel(page, 'salt', { '#salt-formula': 'KN03' });
    expect(await page.textContent('#salt-out [role="alert"]')).toContain(message);
    await screenshot(page, 'salt-typo');
  });

  it('Pack: NH4NO3 in water with a 5 °C target shows the library’s every number, cautions first and in view', async () => {
    await runPanel(page, 'pack', { '#pack-salt-1': 'NH4NO3', '#pack-mass-1': '30', '#pack-water': '100', '#pack-start': '20', '#pack-container': '0', '#pack-target': '5' });
    const expected = packResults({ fill: { solids: [{ formula: 'NH4NO3', massG: 30 }], waterG: 100, startC: 20, containerJPerK: 0 }, targetC: 5 }, dataset);
    const shown = await shownIn(page, 'pack-out');
    expect(shown.length).toBeGreaterThan(20);
    expect(mismatches(shown, expected)).toEqual([]);
    const cautions = await page.locator('#pack-out .cautions').boundingBox();
    const answer = await page.locator('#pack-out .quantities').boundingBox();
    expect(cautions!.y).toBeLessThan(answer!.y);
    await page.locator('#pack-out').scrollIntoViewIfNeeded();
    expect(await page.locator('#pack-out .cautions').isVisible()).toBe(true);
    expect(await page.locator('#pack-out figure svg').count()).toBe(2);
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'pack');
  });

  it('Pack: two salts, one added by the button', async () => {
    await page.click('#tab-pack');
    await page.click('#pack-add');
    await page.fill('#pack-salt-2', 'NH4Cl');
    await page.fill('#pack-mass-2', '10');
    await runPanel(page, 'pack', { '#pack-target': '' });
    const fill = { solids: [{ formula: 'NH4NO3', massG: 30 }, { formula: 'NH4Cl', massG: 10 }], waterG: 100, startC: 20, containerJPerK: 0 };
    expect(mismatches(await shownIn(page, 'pack-out'), packResults({ fill }, dataset))).toEqual([]);
  });

  it('Warmer: sodium acetate trihydrate shows the library’s every number', async () => {
    await runPanel(page, 'warmer', { '#warmer-salt': 'NaCH3COO·3H2O', '#warmer-mass': '100', '#warmer-water': '0', '#warmer-start': '20', '#warmer-container': '0' });
    const shown = await shownIn(page, 'warmer-out');
    expect(shown.length).toBeGreaterThan(15);
    expect(mismatches(shown, latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, extraWaterG: 0, startC: 20, containerJPerK: 0 }, {}, dataset))).toEqual([]);
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'warmer');
  });

  it('Screen: an uploaded CSV with bad rows shows their errors, keeps the others, and downloads the command line’s files', async () => {
    const csv = 'formula,pricePerKg\nKNO3,0.9\nQq2,1\nNH4Cl,0.5,extra\nurea,0.4\nNH4NO3,0.6\n';
    await page.click('#tab-screen');
    await page.setInputFiles('#screen-file', { name: 'candidates.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.waitForFunction(`document.getElementById('screen-text').value.startsWith('formula,pricePerKg\\nKNO3')`);
    await runPanel(page, 'screen', { '#screen-fill': '40:80@22', '#screen-spec': 'best.low > 0' });
    const rows = await page.$$eval('#screen-out tbody tr', (trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? '')));
    expect(rows).toHaveLength(5);
    const text = await page.textContent('#screen-out');
    expect(text).toContain('Qq2');
    expect(text).toContain('3 fields, but the header names 2 columns');
    // The same files as the command line: fetched through the page's download links.
    const dir = join(outDir, 'screen-input');
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, 'candidates.csv'), csv);
    for (const [link, args] of [
      ['screen.csv', ['--format', 'csv']],
      ['screen.json', ['--json']],
    ] as const) {
      const [download] = await Promise.all([page.waitForEvent('download'), page.click(`#screen-out a[download="${link}"]`)]);
      const got = readFileSync((await download.path())!, 'utf8');
      const cli = await runCliInMemory(['screen', 'candidates.csv', ...args, '--fill', '40:80@22', '--spec', 'best.low > 0'], { cwd: dir });
      expect(sameUpToLastDigits(got, cli.out)).toEqual([]);
    }
    // Sorting by a column reorders the rows and says so to a screen reader.
    await page.click('#screen-out th:nth-child(2) button');
    expect(await page.getAttribute('#screen-out th:nth-child(2)', 'aria-sort')).toBe('ascending');
    const lines = await page.$$eval('#screen-out tbody tr td:nth-child(2)', (tds) => tds.map((td) => Number(td.textContent)));
    expect(lines).toEqual([...lines].sort((a, b) => a - b));
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'screen');
  });

  it('Screen: every built-in salt, enumerated in the worker, while the page keeps responding', async () => {
    await page.click('#tab-screen');
    await page.check('#screen-enumerate');
    await page.fill('#screen-fill', '');
    await page.fill('#screen-spec', '');
    // The longest pause of the page's own thread while the worker screens: timers fire every 10 ms.
    await page.evaluate(`window.gap = 0; window.last = performance.now(); window.timer = setInterval(() => { const now = performance.now(); window.gap = Math.max(window.gap, now - window.last); window.last = now; }, 10)`);
    await runPanel(page, 'screen');
    const gap = (await page.evaluate('clearInterval(window.timer), window.gap')) as number;
    timings.enumerateMs = Number(await page.getAttribute('#screen-out', 'data-ms'));
    timings.enumerateLongestPauseMs = Math.round(gap);
    // Target: within 2 s on a quiet machine, without freezing the page (both written to workbench-timings.json); the
    // bounds here allow for a CI machine shared with other jobs.
    expect(timings.enumerateMs).toBeLessThan(30_000);
    expect(gap).toBeLessThan(1_500);
    // The best hundred rows at first (as many as the chart draws), all of them on request.
    const all = enumerate({}, dataset).length;
    expect(await page.locator('#screen-out tbody tr').count()).toBe(100);
    expect(await page.textContent('#screen-out .show-all')).toBe(`Show all ${all} rows`);
    await screenshot(page, 'screen-enumerated');
    await page.click('#screen-out .show-all');
    expect(await page.locator('#screen-out tbody tr').count()).toBe(all);
  });

  it('Your data: a bad file lists every problem at once; a good one is used by the panels; clearing goes back', async () => {
    const bad = {
      sources: { myLab: { citation: 'Our calorimeter', kind: 'inHouse' } },
      tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 'hot', unit: 'kJ/mol', uncertainty: 0.2, source: 'myLab', fromMemory: false }, { formula: 'NaCl', value: 3.9, unit: 'kJ/mol', uncertainty: 0.2, source: 'theirLab', fromMemory: false }] },
    };
    let message = '';
    try {
      applyOverrideDocument(bad, 'bad.json');
    } catch (e) {
      message = (e as Error).message;
    }
    const count = Number(/(\d+) problems/.exec(message)?.[1]);
    expect(count).toBeGreaterThan(1);
    await page.click('#tab-data');
    await page.setInputFiles('#data-file', { name: 'bad.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(bad)) });
    await page.waitForSelector('#data-out [role="alert"]');
    expect(await page.locator('#data-out .problems li').count()).toBe(count);
    await screenshot(page, 'data-errors');

    const good = { sources: { myLab: { citation: 'Our calorimeter, 2026', kind: 'inHouse' } }, tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 34.9, unit: 'kJ/mol', uncertainty: 0.2, source: 'myLab', fromMemory: false }] } };
    await page.setInputFiles('#data-file', { name: 'my-values.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(good)) });
    await page.waitForSelector('#data-out .ok');
    expect(await page.textContent('#data-label')).toBe('built-in + my-values.json');
    expect(await seriousViolations(page)).toEqual([]);
    await screenshot(page, 'data');
    await runPanel(page, 'salt', { '#salt-formula': 'KNO3' });
    const mine = dissolve('KNO3', { temperatureC: 25 }, applyOverrideDocument(good, 'my-values.json'));
    const shown = await shownIn(page, 'salt-out');
    expect(shown.find((s) => s.path === 'best.value')!.text).toMatch(/^\+34\.90?$/);
    expect(mismatches(shown.filter((s) => !s.path.startsWith('integral')), mine)).toEqual([]);
    expect(await page.textContent('#salt-out')).toContain('your value');
    await page.click('#tab-data');
    await page.click('#data-clear');
    await page.waitForFunction(`document.getElementById('data-label').textContent === 'built-in'`);
  });

  it('made no request beyond its own files and logged no error', () => {
    expect(requests.filter((u) => !u.startsWith(server.url) && !u.startsWith('blob:'))).toEqual([]);
    expect(problems).toEqual([]);
  });
});
