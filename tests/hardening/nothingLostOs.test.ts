/**
 * Issue 13, "Nothing lost": the cases where the operating system is
 * involved, each with bounded waits: a reader that pauses, the process's own
 * stream listeners, and a full disk (a 64 KiB tmpfs, mounted where the test
 * may mount one, skipped with a message where it may not). Spawns the built
 * command (dist/, built by `npm test`).
 */
import { execFileSync, spawn } from 'node:child_process';
import { closeSync, mkdirSync, mkdtempSync, openSync, readdirSync, readFileSync, rmSync, writeFileSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../../src/node/cli/main.js';

const CLI = fileURLToPath(new URL('../../dist/cli.js', import.meta.url));
const NODE_ENTRY = fileURLToPath(new URL('../../dist/node/index.js', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'ionheat-nothing-lost-os-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const formulas = ['NaCl', 'KNO3', 'NH4NO3', 'KCl', 'CaCl2·6H2O'];
writeFileSync(join(dir, 'rows.csv'), `formula\n${Array.from({ length: 2500 }, (_, i) => formulas[i % formulas.length]).join('\n')}\n`);

// Runs the command line from dist/ and reports, on stderr's last line, the most output ever queued in the process.
const wrapper = join(dir, 'queued.mjs');
writeFileSync(
  wrapper,
  [
    `import { runCli } from ${JSON.stringify(pathToFileURL(NODE_ENTRY).href)};`,
    'let queued = 0;',
    'const timer = setInterval(() => { queued = Math.max(queued, process.stdout.writableLength); }, 5);',
    'const status = await runCli(process.argv.slice(2));',
    'clearInterval(timer);',
    "process.stderr.write(JSON.stringify({ status, queued }) + '\\n');",
  ].join('\n'),
);

describe('a reader that pauses', () => {
  it('2,500 JSON rows into a reader that waits 1.5 s: at most about one piece of output queued, every row delivered, the summary after', async () => {
    const child = spawn(process.execPath, [wrapper, 'screen', 'rows.csv', '--format', 'json'], { cwd: dir, stdio: ['ignore', 'pipe', 'pipe'] });
    let err = '';
    child.stderr.setEncoding('utf8').on('data', (t: string) => (err += t));
    const chunks: Buffer[] = [];
    child.stdout.pause();
    setTimeout(() => {
      child.stdout.on('data', (c: Buffer) => chunks.push(c));
      child.stdout.resume();
    }, 1500);
    const status = await new Promise<number | null>((resolve) => child.on('close', resolve));
    const report = JSON.parse(err.trim().split('\n').pop()!) as { status: number; queued: number };
    const output = Buffer.concat(chunks).toString('utf8');
    expect(status).toBe(0);
    expect(report.status).toBe(0);
    // Without waiting for the reader, the whole output (tens of MB) would be queued; with it, one 64 KiB piece at a time.
    expect(output.length).toBeGreaterThan(10 * 2 ** 20);
    expect(report.queued).toBeLessThan(2 ** 20);
    expect((JSON.parse(output) as { rows: unknown[] }).rows).toHaveLength(2500);
    expect(err).toMatch(/^screen: 2500 rows read, 2500 computed, 0 failed\n/);
  }, 30_000);
});

describe('signals', () => {
  it('SIGINT during a screen: the rows computed are written whole, the summary and the reason follow, status 130', async () => {
    const child = spawn(process.execPath, [CLI, 'screen', 'rows.csv', '--format', 'csv'], { cwd: dir, stdio: ['ignore', 'pipe', 'pipe'] });
    let err = '';
    child.stderr.setEncoding('utf8').on('data', (t: string) => (err += t));
    let out = '';
    // Read nothing until the first output is waiting: the command is then held by the pipe, mid-screen, when the signal comes.
    child.stdout.pause();
    child.stdout.once('readable', () => {
      child.kill('SIGINT');
      child.stdout.setEncoding('utf8').on('data', (t: string) => (out += t));
      child.stdout.resume();
    });
    const status = await new Promise<number | null>((resolve) => child.on('close', resolve));
    expect(status).toBe(130);
    expect(err).toMatch(/^screen: (\d+) rows read, \1 computed, 0 failed\nionheat: stopped by SIGINT after \d+ rows; the rows before it were written\n$/);
    const lines = out.split('\n');
    expect(lines.pop()).toBe(''); // ends with a whole record
    expect(lines.length - 1).toBeGreaterThan(0);
    expect(lines.length - 1).toBeLessThan(2500);
    expect(lines.length - 1).toBe(Number(/^screen: (\d+)/.exec(err)![1]));
  }, 30_000);
});

describe('process-wide listeners', () => {
  it('runCli on the process streams leaves no listener behind', async () => {
    const counts = () => [process.stdout.listenerCount('error'), process.stderr.listenerCount('error'), process.stdout.listenerCount('drain'), process.listenerCount('SIGINT'), process.listenerCount('SIGTERM')];
    const before = counts();
    const write = process.stdout.write;
    let printed = '';
    // Keep the version line out of the test report; the stream and its listeners are the real ones.
    process.stdout.write = ((chunk: string, ...rest: unknown[]) => {
      printed += chunk;
      const cb = rest.find((r) => typeof r === 'function') as (() => void) | undefined;
      cb?.();
      return true;
    }) as typeof process.stdout.write;
    try {
      expect(await runCli(['--version'])).toBe(0);
    } finally {
      process.stdout.write = write;
    }
    expect(printed).toMatch(/^\d+\.\d+\.\d+\n$/);
    expect(counts()).toEqual(before);
  });
});

/** Mounts a 64 KiB tmpfs, or says why it cannot. */
function smallDisk(): string | undefined {
  const mount = join(dir, 'full');
  mkdirSync(mount, { recursive: true });
  try {
    execFileSync('mount', ['-t', 'tmpfs', '-o', 'size=64k', 'tmpfs', mount], { stdio: 'ignore' });
  } catch {
    return undefined;
  }
  return mount;
}

/** Fills the disk at `mount` to the last byte. */
function fill(mount: string): void {
  const fd = openSync(join(mount, 'filler'), 'w');
  const block = Buffer.alloc(4096, 120);
  try {
    for (;;) writeSync(fd, block);
  } catch {
    // ENOSPC: full
  } finally {
    closeSync(fd);
  }
}

describe('a full disk', () => {
  const mount = smallDisk();
  afterAll(() => {
    if (mount) execFileSync('umount', [mount]);
  });
  if (!mount) console.warn('skipped: a 64 KiB tmpfs cannot be mounted here (needs root); the full-disk cases are not run');

  it.skipIf(!mount)('a chart that cannot be written leaves the old chart whole, no temporary file, and the spec status (1)', async () => {
    const chart = join(mount!, 'chart.svg');
    writeFileSync(chart, '<svg>old chart</svg>');
    fill(mount!);
    const r = await new Promise<{ status: number | null; err: string }>((resolve) => {
      const child = spawn(process.execPath, [CLI, 'screen', 'rows.csv', '--spec', 'best.low > 1000', '--svg', chart, '--format', 'csv'], { cwd: dir, stdio: ['ignore', 'ignore', 'pipe'] });
      let err = '';
      child.stderr.setEncoding('utf8').on('data', (t: string) => (err += t));
      child.on('close', (status) => resolve({ status, err }));
    });
    expect(r.status).toBe(1);
    expect(r.err).toMatch(/^screen: 2500 rows read.*\nionheat: cannot write the chart to ".*chart\.svg" \(--svg\): ENOSPC; the file there before, if any, is unchanged\n$/);
    expect(readFileSync(chart, 'utf8')).toBe('<svg>old chart</svg>');
    expect(readdirSync(mount!).sort()).toEqual(['chart.svg', 'filler']);
  }, 30_000);

  it.skipIf(!mount)('standard output onto a full disk: status 2 and the reason, not 0', async () => {
    rmSync(join(mount!, 'filler'), { force: true });
    fill(mount!);
    const outFd = openSync(join(mount!, 'chart.svg'), 'w');
    try {
      const r = await new Promise<{ status: number | null; err: string }>((resolve) => {
        const child = spawn(process.execPath, [CLI, 'screen', 'rows.csv', '--format', 'csv'], { cwd: dir, stdio: ['ignore', outFd, 'pipe'] });
        let err = '';
        child.stderr!.setEncoding('utf8').on('data', (t: string) => (err += t));
        child.on('close', (status) => resolve({ status, err }));
      });
      expect(r.status).toBe(2);
      expect(r.err).toMatch(/output stopped early \(ENOSPC\)\nionheat: cannot write the output: ENOSPC\n$/);
    } finally {
      closeSync(outFd);
    }
  }, 30_000);
});
