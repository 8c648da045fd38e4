import { parseArgs, type ParseArgsConfig } from 'node:util';
import { IonheatError, isIonheatError } from '../../error.js';
import { didYouMean } from '../../quantity/nearestName.js';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

/** The result of {@link readArgs}: option values by name, then the positionals. */
export interface ParsedArgs<O extends OptionSpec> {
  values: { [K in keyof O]?: O[K] extends { type: 'boolean' } ? (O[K] extends { multiple: true } ? boolean[] : boolean) : O[K] extends { multiple: true } ? string[] : string };
  positionals: string[];
}

/**
 * Options that do nothing without another: each key names an option, its
 * value the options of which at least one must be given with it, and why.
 */
export type OptionNeeds<O extends OptionSpec> = Partial<Record<keyof O & string, { anyOf: readonly (keyof O & string)[]; why: string }>>;

/** `--name`, with a did-you-mean among the command's options. */
function unknownOption(message: string, options: OptionSpec): string {
  const m = /'(-{1,2}[^'=]+)/.exec(message);
  if (!m) return message;
  const typed = m[1]!;
  const names = Object.keys(options).map((k) => `--${k}`);
  return `unknown option ${typed}${didYouMean(typed, names, '')}; this command takes ${names.join(', ')} (and --data, --help)`;
}

/**
 * Parses a command's arguments strictly: an unknown option (with the nearest
 * known one), a missing value, a stray positional, or an option given without
 * the one it needs becomes an `INVALID_ARGUMENT` error naming it.
 */
export function readArgs<O extends OptionSpec>(argv: readonly string[], options: O, positionals: { min: number; max: number; names: string }, needs: OptionNeeds<O> = {}): ParsedArgs<O> {
  let parsed: ParsedArgs<O>;
  try {
    parsed = parseArgs({ args: [...argv], options, strict: true, allowPositionals: true, allowNegative: false }) as unknown as ParsedArgs<O>;
  } catch (e) {
    const message = e instanceof Error ? e.message.split('\n')[0]!.replace(/^[A-Z_]+: /, '') : String(e);
    const code = (e as { code?: unknown }).code;
    if (code === 'ERR_PARSE_ARGS_UNKNOWN_OPTION') throw new IonheatError('INVALID_ARGUMENT', unknownOption(message, options), {});
    throw new IonheatError('INVALID_ARGUMENT', message.replace(/\. To specify a positional argument.*$/, ''), {});
  }
  const n = parsed.positionals.length;
  if (n < positionals.min) throw new IonheatError('INVALID_ARGUMENT', `missing ${positionals.names}`, {});
  if (n > positionals.max) {
    const extra = parsed.positionals[positionals.max]!;
    const asOption = extra.startsWith('—') || extra.startsWith('–') ? ` (write options with two hyphens: --${extra.slice(1)})` : '';
    throw new IonheatError('INVALID_ARGUMENT', `unexpected argument "${extra}"${asOption}`, {});
  }
  for (const [name, need] of Object.entries(needs) as [string, { anyOf: readonly string[]; why: string }][]) {
    const given = (parsed.values as Record<string, unknown>)[name];
    if (given === undefined) continue;
    if (need.anyOf.some((other) => (parsed.values as Record<string, unknown>)[other] !== undefined)) continue;
    throw new IonheatError('INVALID_ARGUMENT', `--${name} has no effect without ${need.anyOf.map((o) => `--${o}`).join(' or ')}: ${need.why}`, { field: name });
  }
  return parsed;
}

/** A number option: finite, with the option's name in the error. */
export function numberOption(value: string | undefined, name: string): number | undefined {
  if (value === undefined) return undefined;
  const trimmed = value.trim();
  const n = trimmed === '' ? Number.NaN : Number(trimmed);
  if (!Number.isFinite(n)) throw new IonheatError('INVALID_ARGUMENT', `--${name} needs a number, got "${value}"`, { field: name });
  return n;
}

/** Joins `--name -5` into `--name=-5` for the numeric options named, so negative values reach the range checks. */
export function joinNegativeValues(argv: readonly string[], numeric: ReadonlySet<string>): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!;
    const next = argv[i + 1];
    if (a.startsWith('--') && !a.includes('=') && numeric.has(a.slice(2)) && next !== undefined && /^-[\d.]/.test(next)) {
      out.push(`${a}=${next}`);
      i++;
    } else out.push(a);
  }
  return out;
}

/**
 * From a table of flags and the library fields they set (`{ water: 'waterG' }`), the flag of a field as the
 * library names it in an error: its last part (`solids[0].massG` → `massG`, `interval.seed` → `seed`).
 */
export function flagTable(flags: Readonly<Record<string, string>>): (field: string) => string | undefined {
  const byField = new Map(Object.entries(flags).map(([flag, field]) => [field, flag]));
  return (field) => byField.get(field.slice(Math.max(field.lastIndexOf('.'), field.lastIndexOf(']')) + 1));
}

/**
 * A library error about a field, told under the flag the user typed: `--water: the water must be at least…`
 * rather than `the water (waterG) must be…`. Errors about no known field pass unchanged.
 */
export function asFlagError(e: unknown, flagOf: (field: string) => string | undefined): unknown {
  if (!isIonheatError(e) || !e.field || e.message.startsWith('--')) return e;
  const flag = flagOf(e.field);
  if (flag === undefined) return e;
  const list = /^([A-Za-z]+)\[\d+\]/.exec(e.field)?.[1];
  let message = e.message.split(` (${e.field})`).join('');
  if (list) message = message.replace(new RegExp(` \\(${list}\\[\\d+\\]\\)`, 'g'), '');
  message = message.startsWith(`${e.field} `) ? `--${flag} ${message.slice(e.field.length + 1)}` : `--${flag}: ${message}`;
  return new IonheatError(e.code, message, { field: flag, ...(e.text !== undefined ? { text: e.text } : {}) });
}
