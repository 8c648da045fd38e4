/**
 * The memory section of `npm run bench` (issue 13), each in a child process
 * of its own so that its peak is its own:
 *
 * - `ionheat screen --format json` into a reader that pauses for 3 s before
 *   it reads, against the same run into /dev/null: peak resident memory and
 *   the most output ever queued in the process. Target: the paused run's
 *   peak within 1.25 times the other's (output waits for the reader instead
 *   of piling up).
 * - `screenStream` over 4,000 and over 40,000 distinct salts (each salt of
 *   the enumeration, then its hydrates with 1, 2, 3 … waters): peak resident
 *   memory and the JS heap still held after a full collection. Target: peak
 *   at 40,000 within 2 times the peak at 4,000 (every per-salt cache bounded).
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

/** Peak memory of a screen into a paused reader over the same screen into /dev/null. */
export const PAUSED_READER_RATIO_TARGET = 1.25;
/** Peak memory at 40,000 distinct salts over that at 4,000. */
export const DISTINCT_SALTS_RATIO_TARGET = 2;

const root = fileURLToPath(new URL('../../../', import.meta.url));
const mb = (kb: number): string => `${(kb / 1024).toFixed(1)} MB`;

interface Report {
  status: number;
  maxRssKb: number;
  queued?: number;
  retained?: number;
  rows?: number;
  computed?: number;
}

/** Runs `node wrapper args…`, reading stdout after `pauseMs` (or sending it to /dev/null); the child's report is stderr's last line. */
function runChild(wrapper: string, args: string[], cwd: string, pauseMs: number | undefined): Promise<{ report: Report; bytes: number }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--expose-gc', wrapper, ...args], { cwd, stdio: ['ignore', pauseMs === undefined ? 'ignore' : 'pipe', 'pipe'] });
    let err = '';
    let bytes = 0;
    child.stderr!.setEncoding('utf8').on('data', (t: string) => (err += t));
    if (child.stdout) {
      child.stdout.pause();
      setTimeout(() => {
        child.stdout!.on('data', (c: Buffer) => (bytes += c.length));
        child.stdout!.resume();
      }, pauseMs);
    }
    child.on('error', reject);
    child.on('close', () => resolve({ report: JSON.parse(err.trim().split('\n').pop()!) as Report, bytes }));
  });
}

/** Runs the section and returns its report lines. */
export async function benchMemory(): Promise<string[]> {
  const out: string[] = [];
  const entry = join(root, 'dist', 'node', 'index.js');
  const core = join(root, 'dist', 'index.js');
  if (!existsSync(entry)) return ['dist/ is missing; run npm run build (npm run bench builds first)'];
  const dir = mkdtempSync(join(tmpdir(), 'ionheat-bench-memory-'));
  try {
    const cli = join(dir, 'cli.mjs');
    writeFileSync(
      cli,
      [
        `import { runCli } from ${JSON.stringify(pathToFileURL(entry).href)};`,
        'let queued = 0;',
        'const timer = setInterval(() => { queued = Math.max(queued, process.stdout.writableLength ?? 0); }, 5);',
        'const status = await runCli(process.argv.slice(2));',
        'clearInterval(timer);',
        "process.stderr.write('\\n' + JSON.stringify({ status, queued, maxRssKb: process.resourceUsage().maxRSS }) + '\\n');",
      ].join('\n'),
    );
    const formulas = ['NaCl', 'KNO3', 'NH4NO3', 'KCl', 'CaCl2·6H2O'];
    const rows = 20_000;
    writeFileSync(join(dir, 'rows.csv'), `formula\n${Array.from({ length: rows }, (_, i) => formulas[i % formulas.length]).join('\n')}\n`);
    const args = ['screen', 'rows.csv', '--format', 'json'];
    const free = await runChild(cli, args, dir, undefined);
    const paused = await runChild(cli, args, dir, 3000);
    const ratio = paused.report.maxRssKb / free.report.maxRssKb;
    out.push(`ionheat screen (${rows.toLocaleString('en-US')} rows) --format json: ${(paused.bytes / 2 ** 20).toFixed(0)} MB of output`);
    out.push(`  into /dev/null: peak ${mb(free.report.maxRssKb)}; into a reader that pauses 3 s: peak ${mb(paused.report.maxRssKb)}, at most ${((paused.report.queued ?? 0) / 1024).toFixed(0)} KB queued — ratio ${ratio.toFixed(2)} (target ≤ ${PAUSED_READER_RATIO_TARGET})`);

    const distinct = join(dir, 'distinct.mjs');
    writeFileSync(
      distinct,
      [
        `const { enumerate, screenStream } = await import(${JSON.stringify(pathToFileURL(core).href)});`,
        'const n = Number(process.argv[2]);',
        "const salts = enumerate({}).map((s) => s.formula).filter((f) => !f.includes('·'));",
        'function* formulas() { let k = 0; for (let w = 0; k < n; w++) for (const f of salts) { if (k++ >= n) return; yield w === 0 ? f : `${f}·${w}H2O`; } }',
        'let rows = 0, computed = 0;',
        "for await (const row of screenStream(formulas())) { rows++; if (row.status === 'computed') computed++; }",
        'globalThis.gc();',
        "process.stderr.write(JSON.stringify({ status: 0, rows, computed, retained: process.memoryUsage().heapUsed, maxRssKb: process.resourceUsage().maxRSS }) + '\\n');",
      ].join('\n'),
    );
    const peaks: number[] = [];
    for (const n of [4_000, 40_000]) {
      const t0 = performance.now();
      const child = spawnSync(process.execPath, ['--expose-gc', distinct, String(n)], { encoding: 'utf8', stdio: ['ignore', 'ignore', 'pipe'] });
      const report = JSON.parse(child.stderr.trim().split('\n').pop()!) as Report;
      peaks.push(report.maxRssKb);
      out.push(`screenStream over ${n.toLocaleString('en-US')} distinct salts (${report.computed} computed): peak ${mb(report.maxRssKb)}, JS heap held after a full collection ${((report.retained ?? 0) / 2 ** 20).toFixed(1)} MB, ${((performance.now() - t0) / 1000).toFixed(1)} s`);
    }
    out.push(`  peak at 40,000 over peak at 4,000: ${(peaks[1]! / peaks[0]!).toFixed(2)} (target ≤ ${DISTINCT_SALTS_RATIO_TARGET})`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  return out;
}
