/**
 * The start-up section of `npm run bench`: whole processes, each command run
 * in turn with a bare `node -e 0` (interleaved, so that the machine's load
 * weighs on both alike), medians of wall-clock and CPU time (user + system)
 * of the child. Targets, as ratios to the bare Node start measured in the
 * same run:
 *
 * - a one-salt command (`ionheat dissolve NaCl --json`) ≤ 2 ×;
 * - `ionheat screen --enumerate` (every charge-balanced salt of the built-in
 *   ions, CSV to /dev/null) ≤ 3 ×.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';

export const ONE_SALT_STARTUP_TARGET = 2;
export const ENUMERATE_STARTUP_TARGET = 3;

const root = fileURLToPath(new URL('../../../', import.meta.url));

interface Timing {
  wallMs: number;
  cpuMs: number;
}

/** Runs node with these arguments, output to /dev/null; wall time and the child's CPU time (from its own report). */
function run(args: readonly string[]): Timing {
  // The child reports its own CPU time on exit, so that the time of the spawn itself is not counted as its CPU.
  const report = "process.on('exit',()=>{const u=process.resourceUsage();process.stderr.write('\\n'+(u.userCPUTime+u.systemCPUTime)+'\\n')})";
  const t0 = performance.now();
  const child = spawnSync(process.execPath, ['--import', `data:text/javascript,${encodeURIComponent(report)}`, ...args], { cwd: root, stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' });
  const wallMs = performance.now() - t0;
  // 2 is the screen's status when some rows could not be computed (the enumeration holds such salts).
  if (child.status !== 0 && child.status !== 2) throw new Error(`node ${args.join(' ')} exited with ${child.status}: ${child.stderr}`);
  const cpuUs = Number(child.stderr.trim().split('\n').pop());
  return { wallMs, cpuMs: cpuUs / 1000 };
}

const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** Runs the section and returns its report lines. */
export function benchStartup(rounds = 9): string[] {
  const cli = join(root, 'dist', 'cli.js');
  if (!existsSync(cli)) return ['dist/ is missing; run npm run build (npm run bench builds first)'];
  const cases = [
    { label: 'node -e 0 (bare Node start)', args: ['-e', '0'], target: undefined },
    { label: 'ionheat dissolve NaCl --json', args: [cli, 'dissolve', 'NaCl', '--json'], target: ONE_SALT_STARTUP_TARGET },
    { label: 'ionheat screen --enumerate --format csv', args: [cli, 'screen', '--enumerate', '--format', 'csv'], target: ENUMERATE_STARTUP_TARGET },
  ];
  const timings = cases.map(() => [] as Timing[]);
  for (const c of cases) run(c.args); // warm the file cache
  for (let r = 0; r < rounds; r++) cases.forEach((c, i) => timings[i]!.push(run(c.args)));
  const wall = timings.map((t) => median(t.map((x) => x.wallMs)));
  const cpu = timings.map((t) => median(t.map((x) => x.cpuMs)));
  const lines = [`whole processes, each in turn with a bare Node start (medians of ${rounds} rounds; ratios to the bare start of the same run)`];
  cases.forEach((c, i) => {
    const ratio = c.target === undefined ? '' : `  wall ${(wall[i]! / wall[0]!).toFixed(2)} ×, CPU ${(cpu[i]! / cpu[0]!).toFixed(2)} × bare Node (target ≤ ${c.target} ×)`;
    lines.push(`  ${c.label.padEnd(42)} wall ${wall[i]!.toFixed(0).padStart(5)} ms  CPU ${cpu[i]!.toFixed(0).padStart(5)} ms${ratio}`);
  });
  return lines;
}
