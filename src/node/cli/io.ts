/** Where a command reads and writes; the real process in use, buffers in tests. */
export interface CliIO {
  /**
   * Writes to standard output. It may return a promise that settles when the
   * text has been handed on; a command writing much waits for it before
   * writing more, so output never piles up in memory, and says nothing more
   * (a summary on stderr) before the output it has written is out.
   */
  stdout(text: string): void | Promise<void>;
  stderr(text: string): void;
  /** Whether stderr is a terminal (progress bars only then). */
  stderrIsTTY: boolean;
  /** All of standard input as text. */
  readStdin(): Promise<string>;
  /** Working directory for relative paths. */
  cwd: string;
  /** Width text output wraps to, in characters (see `outputWidth`); 100 when not given. */
  columns?: number;
  /** Standard input as a stream, for inputs read record by record (optional: commands fall back to readStdin). */
  stdinStream?(): NodeJS.ReadableStream;
  /**
   * Why standard output takes nothing more (`the reader closed it`, or the
   * error that ended it), or undefined while it works. A command then stops
   * formatting output but finishes its work, so that its exit status still
   * tells the truth.
   */
  stdoutGone?(): string | undefined;
  /**
   * The signal (`SIGINT`, `SIGTERM`, `SIGHUP`) that asked the run to stop, or
   * undefined. A long command stops reading, writes what it has computed and
   * ends with 128 + the signal's number; a second signal ends the process at once.
   */
  interrupted?(): NodeJS.Signals | undefined;
}

/** True for the errors a stream gives when its reader has gone away. */
function readerGone(e: NodeJS.ErrnoException): boolean {
  return e.code === 'EPIPE' || e.code === 'ERR_STREAM_DESTROYED' || e.code === 'ECONNRESET';
}

/** An output stream in use by one run: writes that wait for room, and the state of the reader. */
export interface OutputChannel {
  /** Writes; the promise settles once the stream has handed the text on, or has failed. */
  write(text: string): void | Promise<void>;
  /** Settles once everything written so far has been handed to the operating system (or the stream has failed). */
  flush(): Promise<void>;
  /** Why the stream takes nothing more, or undefined. */
  gone(): string | undefined;
  /** The failure of the stream other than its reader going away (a full disk), or undefined. */
  failure(): NodeJS.ErrnoException | undefined;
  /** Removes the listeners this channel put on the stream. */
  release(): void;
}

/**
 * Wraps a writable stream for one run. A write returns a promise settled
 * when the stream has handed the text to the system; a closed reader (EPIPE) or a
 * failure stops the writes (they are dropped from then on) and is recorded,
 * never thrown and never turned into a process exit. The one `error`
 * listener is removed by {@link OutputChannel.release}.
 */
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

export function outputChannel(stream: NodeJS.WritableStream): OutputChannel {
  let stoppedBy: NodeJS.ErrnoException | undefined;
  let waiting: (() => void)[] = [];
  let pending = 0;
  const wakeAll = () => {
    const w = waiting;
    waiting = [];
    for (const resolve of w) resolve();
  };
  const onError = (e: NodeJS.ErrnoException) => {
    stoppedBy ??= e;
    wakeAll();
  };
  stream.on('error', onError);
  return {
    write(text) {
      if (stoppedBy || text === '') return;
      return new Promise<void>((resolve) => {
        pending++;
        // Settled when the stream has handed the text on (or failed): the next piece waits for room.
        const done = (e?: Error | null) => {
          pending--;
          if (e) onError(e as NodeJS.ErrnoException);
          if (pending === 0) wakeAll();
          resolve();
        };
        waiting.push(resolve);
        try {
          stream.write(text, done);
        } catch (e) {
          done(e as Error);
        }
      });
    },
    async flush() {
      while (!stoppedBy && pending > 0) await new Promise<void>((resolve) => waiting.push(resolve));
    },
    gone: () => (stoppedBy ? (readerGone(stoppedBy) ? 'the reader closed it' : (stoppedBy.code ?? stoppedBy.message)) : undefined),
    failure: () => (stoppedBy && !readerGone(stoppedBy) ? stoppedBy : undefined),
    release() {
      stream.removeListener('error', onError);
    },
  };
}

/** The process's own streams, with the channels runCli flushes and releases when the run ends. */
export interface ProcessIO extends CliIO {
  out: OutputChannel;
  err: OutputChannel;
  /** Removes every listener the run put on the process. */
  release(): void;
}

const STOP_SIGNALS: readonly NodeJS.Signals[] = ['SIGINT', 'SIGTERM', 'SIGHUP'];

/**
 * The process's own streams for one run. A reader that stops early
 * (`ionheat screen big.csv | head -1`) closes the pipe: output stops there,
 * quietly, and the run still ends with the status its results call for.
 * The listeners are the run's own: runCli removes them when it returns, so a
 * program that embeds the command line keeps its streams as they were.
 */
export function processIO(): ProcessIO {
  const out = outputChannel(process.stdout);
  const err = outputChannel(process.stderr);
  let interrupted: NodeJS.Signals | undefined;
  // The first signal asks the run to stop and write what it has; the listener goes, so a second one acts at once.
  const onSignal = (signal: NodeJS.Signals) => {
    interrupted = signal;
    for (const s of STOP_SIGNALS) process.removeListener(s, onSignal);
    // A read of standard input that waits for a terminal would never end: end it.
    process.stdin.destroy();
  };
  for (const s of STOP_SIGNALS) process.on(s, onSignal);
  return {
    out,
    err,
    interrupted: () => interrupted,
    release() {
      out.release();
      err.release();
      for (const s of STOP_SIGNALS) process.removeListener(s, onSignal);
    },
    stdout: (t) => out.write(t),
    stderr: (t) => void err.write(t),
    stdoutGone: () => out.gone(),
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
