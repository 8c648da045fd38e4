// The command line run in-process with its output caught: what the CLI tests share.
import { runCli } from '../../src/node/cli/main.js';
import type { CliIO } from '../../src/node/cli/io.js';

export interface CaughtRun {
  status: number;
  out: string;
  err: string;
}

/** Runs `ionheat <args>` in this process, with `stdin` as standard input and `cwd` as the folder. */
export async function runCliInMemory(args: readonly string[], options: { stdin?: string; cwd?: string; columns?: number } = {}): Promise<CaughtRun> {
  let out = '';
  let err = '';
  const stdin = options.stdin ?? '';
  const io: CliIO = { stdout: (t) => void (out += t), stderr: (t) => void (err += t), stderrIsTTY: false, readStdin: async () => stdin, cwd: options.cwd ?? process.cwd(), ...(options.columns !== undefined ? { columns: options.columns } : {}) };
  const status = await runCli([...args], io);
  return { status, out, err };
}
