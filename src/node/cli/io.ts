/** Where a command reads and writes; the real process in use, buffers in tests. */
export interface CliIO {
  stdout(text: string): void;
  stderr(text: string): void;
  /** Whether stderr is a terminal (progress bars only then). */
  stderrIsTTY: boolean;
  /** All of standard input as text. */
  readStdin(): Promise<string>;
  /** Working directory for relative paths. */
  cwd: string;
  /** Width text output wraps to, in characters (see {@link outputWidth}); 100 when not given. */
  columns?: number;
  /** Standard input as a stream, for inputs read record by record (optional: commands fall back to readStdin). */
  stdinStream?(): NodeJS.ReadableStream;
}

/**
 * What to do when an output stream fails. A reader that stops early (`ionheat screen big.csv | head -1`) closes
 * the pipe, and the next write fails with EPIPE: the output is no longer wanted, so the process ends at once,
 * quietly, with status 0 (as other command-line tools do). Any other failure to write (a full disk) ends it with
 * one line on stderr, if stderr still works, and status 2.
 */
function onOutputError(e: NodeJS.ErrnoException): void {
  if (e.code === 'EPIPE' || e.code === 'ERR_STREAM_DESTROYED') process.exit(0);
  try {
    process.stderr.write(`ionheat: cannot write the output: ${e.code ?? e.message}\n`);
  } finally {
    process.exit(2);
  }
}

/** A closed or failing stderr: nothing can be said any more; a closed reader is no failure. */
function onStderrError(e: NodeJS.ErrnoException): void {
  process.exit(e.code === 'EPIPE' || e.code === 'ERR_STREAM_DESTROYED' ? 0 : 2);
}

/** Width of text output when standard output is not a terminal and `COLUMNS` is not set. */
export const DEFAULT_COLUMNS = 100;

/**
 * The width text output wraps to: `COLUMNS` when set to a sensible number, else the terminal's width when standard
 * output is a terminal, else {@link DEFAULT_COLUMNS}.
 */
export function terminalColumns(env: Record<string, string | undefined>, ttyColumns: number | undefined): number {
  const fromEnv = Number(env.COLUMNS);
  if (Number.isInteger(fromEnv) && fromEnv >= 20 && fromEnv <= 1000) return fromEnv;
  return ttyColumns !== undefined && ttyColumns >= 20 ? ttyColumns : DEFAULT_COLUMNS;
}

/** The width a command's text wraps to. */
export function outputWidth(io: Pick<CliIO, 'columns'>): number {
  return io.columns ?? DEFAULT_COLUMNS;
}

/** The process's own streams. */
export function processIO(): CliIO {
  // Attached once per process, however often processIO is called.
  if (!process.stdout.listeners('error').includes(onOutputError)) process.stdout.on('error', onOutputError);
  if (!process.stderr.listeners('error').includes(onStderrError)) process.stderr.on('error', onStderrError);
  return {
    stdout: (t) => void process.stdout.write(t),
    stderr: (t) => void process.stderr.write(t),
    stderrIsTTY: Boolean(process.stderr.isTTY),
    columns: terminalColumns(process.env, process.stdout.isTTY ? process.stdout.columns : undefined),
    cwd: process.cwd(),
    stdinStream: () => process.stdin,
    readStdin: async () => {
      const chunks: Buffer[] = [];
      for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
      return Buffer.concat(chunks).toString('utf8');
    },
  };
}
