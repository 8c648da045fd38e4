import type { Dataset } from '../../data/dataset.js';
import type { CliIO } from './io.js';

/** What every command receives. */
export interface CommandContext {
  io: CliIO;
  /** The built-in tables, with the user's `--data` files merged over them. */
  dataset: Dataset;
  /** Full paths of the `--data` files of the run (outputs must never be written over them). */
  inputFiles?: readonly string[];
}

/** One subcommand of `ionheat`: what its module exports. */
export interface Command {
  /** The usage block shown by `ionheat help <name>`. */
  usage: string;
  /** Runs with the arguments after the command name; resolves to the exit status. */
  run(argv: readonly string[], context: CommandContext): Promise<number>;
}

/** One line of the command table: what `ionheat help` lists, and how to load the command when it runs. */
export interface CommandEntry {
  name: string;
  /** One line for the command list. */
  summary: string;
  /** Imports the command's module (only the command that runs is loaded). */
  load(): Promise<Command>;
}
