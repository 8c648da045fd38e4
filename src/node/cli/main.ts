/**
 * The `ionheat` command line: dispatches to one command per file, turns every
 * failure into one line on stderr, and returns the exit status:
 * 0 success, 1 a specification failed, 2 bad input or arguments, 3 a defect.
 *
 * @module
 */
import { withTrueMinus } from '../../notation/minus.js';
import { builtinDataset } from '../../data/builtin.js';
import { isIonheatError } from '../../error.js';
import { didYouMean } from '../../quantity/nearestName.js';
import type { CommandEntry } from './command.js';
import { processIO, type CliIO, type ProcessIO } from './io.js';
import { escapeControls } from '../terminalText.js';
import { version as PACKAGE_VERSION } from '../../../package.json';

/**
 * Every command, in the order `ionheat help` lists them. Each is loaded only when it runs (or its usage is
 * asked for), so a run pays for its own command's modules and no other's.
 */
export const commands: readonly CommandEntry[] = [
  { name: 'demo', summary: 'run the demonstration: screen cold-pack and hand-warmer candidates for a first-aid supplier (prices invented)', load: async () => (await import('./demoCommand.js')).demoCommand },
  { name: 'salt', summary: 'show how a formula is read: its ions, water of crystallization and molar mass', load: async () => (await import('./saltCommand.js')).saltCommand },
  { name: 'lattice', summary: 'estimate the lattice enthalpy of a salt by each model, with calibrated 95 % intervals', load: async () => (await import('./latticeCommand.js')).latticeCommand },
  { name: 'cycle', summary: 'build the Born–Haber cycle of a salt step by step and solve it for one unknown; optionally draw it as SVG', load: async () => (await import('./cycleCommand.js')).cycleCommand },
  { name: 'dissolve', summary: 'enthalpy of solution of a salt: best estimate, every basis, verdict, heat per gram', load: async () => (await import('./dissolveCommand.js')).dissolveCommand },
  { name: 'pack', summary: 'design a hot or cold pack: final temperature (solubility-limited), 95 % interval, inverse design, time course, cautions', load: async () => (await import('./packCommand.js')).packCommand },
  { name: 'warmer', summary: 'a latent-heat warmer (supercooled hydrate melt): plateau, share crystallised at once, heat, plateau duration, recharge, cautions', load: async () => (await import('./warmerCommand.js')).warmerCommand },
  { name: 'screen', summary: 'rank candidate salts for a hot or cold pack and check them against a specification', load: async () => (await import('./screenCommand.js')).screenCommand },
  { name: 'workbench', summary: 'open the workbench in a browser: salts, packs, warmers, screens and your data, computed in the page', load: async () => (await import('./workbenchCommand.js')).workbenchCommand },
];

function overview(): string {
  const width = Math.max(...commands.map((c) => c.name.length));
  return [
    'ionheat — thermochemistry of dissolving salts, for hot- and cold-pack design',
    '',
    'usage: ionheat <command> [arguments] [--data <overrides.json>]…',
    '',
    'commands:',
    ...commands.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    `  ${'help'.padEnd(width)}  show this list, or a command's usage: ionheat help <command>`,
    '',
    '--data <file> merges your own tables (same schemas as the built-in ones) over the built-in data; it may repeat.',
    'Results are screening estimates; they defer to local codes, product-safety regulation and licensed practice.',
    '',
  ].join('\n');
}

/** Pulls every `--data <file>` (or `--data=<file>`) out of the arguments. */
function takeDataFiles(argv: readonly string[]): { files: string[]; rest: string[] } {
  const files: string[] = [];
  const rest: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    if (a === '--data') {
      const next = argv[i + 1];
      if (next === undefined || next.startsWith('--')) throw Object.assign(new Error('--data needs a file name'), { usage: true });
      files.push(next);
      i++;
    } else if (a.startsWith('--data=')) files.push(a.slice('--data='.length));
    else rest.push(a);
  }
  return { files, rest };
}

/**
 * Runs the command line with these arguments (without `node` and the script).
 *
 * @param argv - the arguments, e.g. `['dissolve', 'KNO3']`; `--data <file>` may appear anywhere and repeat
 * @param io - where to read and write (default: the process's streams, attached for this run only: no listener is
 *   left on them afterwards); tests and embedding tools pass buffers
 * @returns the exit status: 0 success, 1 a specification failed, 2 bad input or arguments (or output that could not
 *   be written, unless a specification failed), 3 a defect. A reader that closes the pipe early does not change it.
 * @see README.md, "The command line", for a tour; `ionheat help <command>` for each command's usage.
 *
 * @example
 * ```ts
 * let out = '';
 * let err = '';
 * const io = { stdout: (t) => { out += t; }, stderr: (t) => { err += t; }, stderrIsTTY: false, cwd: '.', readStdin: async () => '' };
 * await runCli(['salt', 'NaCl'], io); // 0
 * out.includes('58.44'); // true (g/mol)
 * await runCli(['salt', 'NaXy'], io); // 2
 * err; // 'ionheat: "Xy" at position 3 is not a chemical element\n'
 * ```
 */
export async function runCli(argv: readonly string[], io?: CliIO): Promise<number> {
  // The process's streams are attached for this run only and let go of when it ends.
  const own: ProcessIO | undefined = io ? undefined : processIO();
  const cli: CliIO = io ?? own!;
  const status = await dispatch(argv, cli);
  if (!own) return status;
  await own.out.flush();
  const failure = own.out.failure();
  if (failure) own.stderr(`ionheat: cannot write the output: ${failure.code ?? failure.message}\n`);
  await own.err.flush();
  own.release();
  return failure && status !== 1 ? 2 : status;
}

/** Runs one command and turns every failure into one line on stderr and an exit status. */
async function dispatch(argv: readonly string[], io: CliIO): Promise<number> {
  try {
    const { files, rest } = takeDataFiles(argv);
    const [name, ...args] = rest;
    if (name === undefined || name === 'help' || name === '--help' || name === '-h') {
      const topic = name === 'help' ? commands.find((c) => c.name === args[0]) : undefined;
      if (name === 'help' && args[0] !== undefined && !topic) {
        io.stderr(`ionheat: no command "${escapeControls(args[0])}"${didYouMean(args[0], commands.map((c) => c.name))}; try: ionheat help\n`);
        return 2;
      }
      io.stdout(topic ? `${topic.summary}\n\n${(await topic.load()).usage}\n` : overview());
      return name === undefined ? 2 : 0;
    }
    if (name === '--version') {
      io.stdout(`${PACKAGE_VERSION}\n`);
      return 0;
    }
    const command = commands.find((c) => c.name === name);
    if (!command) {
      io.stderr(`ionheat: no command "${escapeControls(name)}"${didYouMean(name, [...commands.map((c) => c.name), 'help'])}; the commands are ${commands.map((c) => c.name).join(', ')} (ionheat help)\n`);
      return 2;
    }
    const loaded = await command.load();
    if (args.includes('--help') || args.includes('-h')) {
      io.stdout(`${command.summary}\n\n${loaded.usage}\n`);
      return 0;
    }
    const inputFiles = files.map((f) => (f.startsWith('/') ? f : `${io.cwd}/${f}`));
    // Your own tables need the schemas (zod) to be checked; the built-in ones were checked by the tests.
    const dataset = files.length > 0 ? (await import('../loadDataset.js')).loadDataset(inputFiles) : builtinDataset();
    return await loaded.run(args, { io, dataset, inputFiles });
  } catch (e) {
    // Messages may quote the user's text: control characters are shown, never sent to the terminal.
    if (isIonheatError(e)) {
      io.stderr(`ionheat: ${withTrueMinus(escapeControls(e.message))}\n`);
      return 2;
    }
    if (e instanceof Error && (e as { usage?: boolean }).usage) {
      io.stderr(`ionheat: ${withTrueMinus(escapeControls(e.message))}\n`);
      return 2;
    }
    // A defect in ionheat itself: say so in one line, without a stack trace.
    io.stderr(`ionheat: internal error (please report it): ${escapeControls(e instanceof Error ? e.message : String(e))}\n`);
    return 3;
  }
}

