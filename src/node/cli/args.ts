import { parseArgs, type ParseArgsConfig } from 'node:util';
import { IonheatError } from '../../error.js';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;

/** The result of {@link readArgs}: option values by name, then the positionals. */
export interface ParsedArgs<O extends OptionSpec> {
  values: { [K in keyof O]?: O[K] extends { type: 'boolean' } ? (O[K] extends { multiple: true } ? boolean[] : boolean) : O[K] extends { multiple: true } ? string[] : string };
  positionals: string[];
}

/**
 * Parses a command's arguments strictly: an unknown option, a missing value
 * or a stray positional becomes an `INVALID_ARGUMENT` error naming it.
 */
export function readArgs<O extends OptionSpec>(argv: readonly string[], options: O, positionals: { min: number; max: number; names: string }): ParsedArgs<O> {
  let parsed: ParsedArgs<O>;
  try {
    parsed = parseArgs({ args: [...argv], options, strict: true, allowPositionals: true, allowNegative: false }) as unknown as ParsedArgs<O>;
  } catch (e) {
    const message = e instanceof Error ? e.message.split('\n')[0]!.replace(/^[A-Z_]+: /, '') : String(e);
    throw new IonheatError('INVALID_ARGUMENT', message.replace(/\. To specify a positional argument.*$/, ''), {});
  }
  const n = parsed.positionals.length;
  if (n < positionals.min) throw new IonheatError('INVALID_ARGUMENT', `missing ${positionals.names}`, {});
  if (n > positionals.max) throw new IonheatError('INVALID_ARGUMENT', `unexpected argument "${parsed.positionals[positionals.max]}"`, {});
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
