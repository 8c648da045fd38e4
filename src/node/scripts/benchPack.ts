/**
 * The pack section of `npm run bench`: one fill solved in full (data lookup,
 * solubility-limited balance, 95 % interval by bounds, cautions) against a
 * 1 ms target, and the 200-point temperature–ratio sweep (with its 95 % band
 * and designs) against a 50 ms target, the salts in rotation so that each
 * sweep runs after another salt's. Medians after a warm-up, on one core.
 */
import { performance } from 'node:perf_hooks';
import { packFinalTemperature } from '../../pack/packFinalTemperature.js';
import type { PackFill } from '../../pack/packInput.js';
import { packRatioCurve } from '../../pack/packRatioCurve.js';

/** Targets of the issue. */
export const SINGLE_FILL_TARGET_MS = 1;
export const SWEEP_TARGET_MS = 50;

const FILLS: { label: string; fill: PackFill }[] = [
  { label: '10 g KNO3 / 100 g water (dilute, cold)', fill: { solids: [{ formula: 'KNO3', massG: 10 }], waterG: 100, startC: 20 } },
  { label: '200 g KNO3 / 100 g water (saturated)', fill: { solids: [{ formula: 'KNO3', massG: 200 }], waterG: 100, startC: 20 } },
  { label: '25 g CaCl2 / 100 g water (hot)', fill: { solids: [{ formula: 'CaCl2', massG: 25 }], waterG: 100, startC: 20 } },
  { label: '100 g NH4NO3 / 100 g water (eutectic clamp)', fill: { solids: [{ formula: 'NH4NO3', massG: 100 }], waterG: 100, startC: 20 } },
];

/** CPU time of this process (user + system), ms. */
function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}

/**
 * Per-call time of f, ms: medians over `batches` batches of `perBatch` calls
 * after `warm` untimed calls, as wall-clock time and as this process's CPU
 * time (the CPU time is what one core spends, whatever else the machine runs).
 */
function time(f: () => unknown, batches: number, perBatch: number, warm: number): { wall: number; cpu: number; worstWall: number } {
  for (let i = 0; i < warm; i++) f();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let b = 0; b < batches; b++) {
    const w0 = performance.now();
    const c0 = cpuMs();
    for (let i = 0; i < perBatch; i++) f();
    cpu.push((cpuMs() - c0) / perBatch);
    wall.push((performance.now() - w0) / perBatch);
  }
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  return { wall: median(wall), cpu: median(cpu), worstWall: Math.max(...wall) };
}

const ms = (x: number): string => (x < 1 ? `${(x * 1000).toFixed(0)} µs` : `${x.toFixed(2)} ms`);

/** Runs the section and returns its report lines. */
export function benchPack(): string[] {
  const lines: string[] = [`single fill, in full (target < ${SINGLE_FILL_TARGET_MS} ms; medians of 40 batches of 50 calls):`];
  for (const { label, fill } of FILLS) {
    const t = time(() => packFinalTemperature(fill), 40, 50, 500);
    lines.push(`  ${label.padEnd(46)} cpu ${ms(t.cpu).padStart(8)}  wall ${ms(t.wall).padStart(8)} (worst batch ${ms(t.worstWall)})  = ${(t.cpu / SINGLE_FILL_TARGET_MS).toFixed(2)} × target`);
  }
  // The sweeps in rotation, so that each runs right after another salt's: a solver that slows once it has
  // seen fills of several shapes shows here, not in a bench that repeats one salt.
  const sweeps = [FILLS[0]!, FILLS[2]!, FILLS[3]!];
  const rounds = 30;
  lines.push(`200-point ratio sweep with 95 % band and designs (target < ${SWEEP_TARGET_MS} ms; the salts in rotation, each after another; medians of ${rounds} rounds):`);
  for (let r = 0; r < 3; r++) for (const { fill } of sweeps) packRatioCurve(fill, { points: 200 });
  const cpu = sweeps.map(() => [] as number[]);
  const wall = sweeps.map(() => [] as number[]);
  for (let r = 0; r < rounds; r++) {
    sweeps.forEach(({ fill }, i) => {
      const w0 = performance.now();
      const c0 = cpuMs();
      packRatioCurve(fill, { points: 200 });
      cpu[i]!.push(cpuMs() - c0);
      wall[i]!.push(performance.now() - w0);
    });
  }
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  sweeps.forEach(({ label }, i) => {
    const c = median(cpu[i]!);
    lines.push(`  ${label.replace(/^\S+ g /, '').padEnd(46)} cpu ${ms(c).padStart(8)}  wall ${ms(median(wall[i]!)).padStart(8)} (worst ${ms(Math.max(...wall[i]!))})  = ${(c / SWEEP_TARGET_MS).toFixed(2)} × target`);
  });
  return lines;
}
