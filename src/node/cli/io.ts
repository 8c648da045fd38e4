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
  /** Standard input as a stream, for inputs read record by record (optional: commands fall back to readStdin). */
  stdinStream?(): NodeJS.ReadableStream;
}

/** The process's own streams. */
export function processIO(): CliIO {
  return {
    stdout: (t) => void process.stdout.write(t),
    stderr: (t) => void process.stderr.write(t),
    stderrIsTTY: Boolean(process.stderr.isTTY),
    cwd: process.cwd(),
    stdinStream: () => process.stdin,
    readStdin: async () => {
      const chunks: Buffer[] = [];
      for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
      return Buffer.concat(chunks).toString('utf8');
    },
  };
}
