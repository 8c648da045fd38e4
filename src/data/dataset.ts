/**
 * A `Dataset` is an immutable bundle of data tables (built-in, or built-in with
 * a user's override tables merged over them). Every computing function takes
 * one as an argument, defaulting to the built-in set, so two callers with
 * different tables never see each other's numbers.
 *
 * @module
 */
import { IonheatError } from '../error.js';
import type { SourceEntry, TableFile, TableName, TableRecord } from './schemas.js';
import { tableKeys } from './tableKeys.js';
import { BoundedCache } from './boundedCache.js';
import { decodeSnapshot, encodeSnapshot } from './snapshotCodec.js';

/** What checking one record of a user's table against its table's schema gives: the record as read, or its issues. */
export type RecordCheckResult = { success: true; data: unknown } | { success: false; issues: readonly { path: readonly PropertyKey[]; message: string }[] };

/**
 * The check of a user's records against the table schemas (recordCheck.ts).
 * The schemas are zod's, and zod takes longer to load than the rest of a
 * one-salt command together; so they are installed by the module that holds
 * them, which the public entry and the reading of users' files load, and a
 * start that reads no user table never loads them.
 */
let checkRecord: ((name: TableName, raw: unknown) => RecordCheckResult) | undefined;

/** Installs the record check (called once by recordCheck.ts). @internal */
export function installRecordCheck(check: (name: TableName, raw: unknown) => RecordCheckResult): void {
  checkRecord = check;
}

/** Entries a per-dataset cache holds by default: salts, formulas or results kept per key. */
export const DATASET_CACHE_LIMIT = 4096;
import { didYouMean } from '../quantity/nearestName.js';

/** Every table by file name; a dataset may lack some. */
export type Tables = { [N in TableName]?: TableFile<N> };

/** A user's override set: for each table, records to merge over the base (same shape as the table's records). */
export type TableOverrides = { [N in TableName]?: readonly unknown[] };

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}

/**
 * Immutable tables plus per-dataset lazily built indexes. Get the built-in
 * one from {@link builtinDataset} and a user's variant from
 * {@link Dataset.withOverrides}; every computing function takes a dataset as
 * its last argument.
 *
 * @see data/sources.json for the citation behind every record's `source` key
 *   (read them with {@link Dataset.source}); DEVELOPERS.md, "Data tables".
 *
 * @example
 * ```ts
 * const data = builtinDataset();
 * data.label; // 'built-in'
 * data.source('wagman1982').kind; // 'journal'
 * data.records('solution-enthalpies.json').some((r) => r.formula === 'NH4NO3'); // true
 * ```
 */
export class Dataset {
  readonly #tables: Tables;
  readonly #sources: Readonly<Record<string, SourceEntry>>;
  readonly #memo = new Map<string, unknown>();
  readonly #indexes = new Map<TableName, ReadonlyMap<string, unknown>>();
  /** Which override set gave a user's source key (`source:key`) or record (`table:key`). */
  readonly #origins: ReadonlyMap<string, string>;
  /** Indexes and calibrations computed ahead (when the package was built), by memo key, in the codec's JSON form. */
  readonly #prebuilt: Readonly<Record<string, unknown>> | undefined;
  /** Where the tables came from, for messages: `built-in`, or the override files' names. */
  readonly label: string;

  /**
   * Wraps already-validated tables. Use {@link Dataset.withOverrides} to add
   * user tables; this constructor trusts its input.
   *
   * @param tables - table envelopes by file name (`'ions.json'`…), already valid against their schemas
   * @param sources - citations by source key
   * @param label - where the tables came from, for messages
   * @param origins - which override set gave each user source (`source:key`) and record (`table:key`)
   * @param prebuilt - memo values computed ahead from exactly these tables (see `Dataset.memoSnapshot`); a
   *   dataset with other tables must not be given them
   */
  constructor(tables: Tables, sources: Readonly<Record<string, SourceEntry>>, label = 'built-in', origins: ReadonlyMap<string, string> = new Map(), prebuilt?: Readonly<Record<string, unknown>>) {
    this.#tables = deepFreeze({ ...tables });
    this.#sources = deepFreeze({ ...sources });
    this.label = label;
    this.#origins = origins;
    this.#prebuilt = prebuilt;
  }

  /** The records of one table, in table order; empty when the dataset lacks the table. */
  records<N extends TableName>(name: N): readonly TableRecord<N>[] {
    return (this.#tables[name]?.records ?? []) as readonly TableRecord<N>[];
  }

  /** The table envelope (title, description, defaults), or undefined. */
  table<N extends TableName>(name: N): TableFile<N> | undefined {
    return this.#tables[name] as TableFile<N> | undefined;
  }

  /** The full citation of a source key. */
  source(key: string): SourceEntry | undefined {
    return Object.hasOwn(this.#sources, key) ? this.#sources[key] : undefined;
  }

  /** All source keys and citations. */
  get sources(): Readonly<Record<string, SourceEntry>> {
    return this.#sources;
  }

  /**
   * The standard uncertainty of a record: its own, or its table's stated
   * default when the record gives `null`. Undefined when neither is set.
   */
  uncertaintyOf<N extends TableName>(name: N, record: { uncertainty?: number | null }): number | undefined {
    if (typeof record.uncertainty === 'number') return record.uncertainty;
    return this.#tables[name]?.defaultUncertainty;
  }

  /**
   * The records of a table by their key (`tableKeys`: ions by id,
   * formation enthalpies by ion, Madelung constants by structure …), built
   * on first use and kept for the dataset's life. Use it rather than a map
   * of one's own, so that each table is indexed once.
   */
  index<N extends TableName>(name: N): ReadonlyMap<string, TableRecord<N>> {
    let found = this.#indexes.get(name);
    if (!found) {
      const keyOf = tableKeys[name] as (r: TableRecord<N>) => string;
      found = new Map(this.records(name).map((r) => [keyOf(r), r]));
      this.#indexes.set(name, found);
    }
    return found as ReadonlyMap<string, TableRecord<N>>;
  }

  /**
   * A value derived from this dataset's tables, built on first use and kept
   * for the dataset's life (indexes, calibrations). `key` names the builder.
   */
  memo<T>(key: string, build: () => T): T {
    const found = this.#memo.get(key);
    if (found !== undefined || this.#memo.has(key)) return found as T;
    const value = this.#prebuilt !== undefined && Object.hasOwn(this.#prebuilt, key) ? (decodeSnapshot(this.#prebuilt[key], this) as T) : build();
    this.#memo.set(key, value);
    return value;
  }

  /**
   * The memo values under `keys` (those built so far) in the JSON form the
   * constructor's `prebuilt` takes: how `npm run generate` writes the
   * indexes and calibrations of the built-in tables ahead. @internal
   */
  memoSnapshot(keys: readonly string[]): Record<string, unknown> {
    const out: Record<string, unknown> = {};
    const names = Object.keys(this.#tables) as TableName[];
    for (const key of keys) if (this.#memo.has(key)) out[key] = encodeSnapshot(this.#memo.get(key), this, names);
    return out;
  }

  /** The keys of the memo values built so far, in the order they were built. @internal */
  memoKeys(): string[] {
    return [...this.#memo.keys()];
  }

  /**
   * A cache kept for the dataset's life under `key`, holding at most `limit`
   * entries (a `BoundedCache`): per-salt and per-formula results go here,
   * so that memory stays flat however many distinct salts a run brings.
   */
  cache<K, V>(key: string, limit: number = DATASET_CACHE_LIMIT): BoundedCache<K, V> {
    return this.memo(key, () => new BoundedCache<K, V>(limit));
  }

  /**
   * A new dataset with a user's records merged over this one's: a record
   * whose key (formula, ion, element…) matches a built-in record replaces it;
   * others are added. This dataset is not changed.
   *
   * Every record passes the same zod schema as the built-in tables. A bad
   * record is rejected with an `INVALID_DATA` error that names the file
   * (`label`), the table, the record number and the field.
   *
   * @param overrides - records per table
   * @param label - where the records came from (a file name), for messages
   * @param sources - extra citations the records refer to; a built-in source key cannot be redefined, nor a key an
   *   earlier override set gave with another citation
   * @param checks - `problems` the caller already found in the same file (plausibility, file shape), reported
   *   together with these, so that every problem of a file is named in one error; `refuseConflicts`: refuse a
   *   record an earlier override set gave with other values (files read one after another), instead of replacing it
   * @example
   * ```ts
   * const mine = builtinDataset().withOverrides(
   *   { 'solution-enthalpies.json': [{ formula: 'KNO3', value: 34.9, unit: 'kJ/mol', uncertainty: 0.2, source: 'myLab', fromMemory: false }] },
   *   'my-values.json',
   *   { myLab: { citation: 'Our calorimeter, run 12', kind: 'derived' } },
   * );
   * measuredSolutionEnthalpy(parseSalt('KNO3', mine), mine).value; // 34.9
   * measuredSolutionEnthalpy(parseSalt('KNO3')).value; // 34.89 (the built-in table is unchanged)
   * ```
   */
  withOverrides(overrides: TableOverrides, label: string, sources: Record<string, SourceEntry> = {}, checks: { problems?: readonly OverrideProblem[]; refuseConflicts?: boolean } = {}): Dataset {
    if (overrides === null || typeof overrides !== 'object' || Array.isArray(overrides)) {
      throw new IonheatError('INVALID_DATA', `${label}: an override set is an object keyed by table name`, { field: label });
    }
    const found: OverrideProblem[] = [...(checks.problems ?? [])];
    const origins = new Map(this.#origins);
    const mergedSources: Record<string, SourceEntry> = { ...this.#sources };
    for (const [key, entry] of Object.entries(sources)) {
      if (Object.hasOwn(this.#sources, key)) {
        const earlier = this.#origins.get(`source:${key}`);
        if (earlier === undefined) {
          found.push({ field: `sources.${key}`, message: `source key "${key}" is a built-in source (${shortText(this.#sources[key]!.citation)}); give your source a key of its own, such as "${key}Mine"` });
          continue;
        }
        if (JSON.stringify(this.#sources[key]) !== JSON.stringify(entry)) {
          found.push({ field: `sources.${key}`, message: `source key "${key}" is already defined by ${earlier} with another citation; use one key per source across your files` });
          continue;
        }
      }
      mergedSources[key] = entry;
      origins.set(`source:${key}`, label);
    }
    const tables: Tables = { ...this.#tables };
    for (const name of Object.keys(overrides)) {
      if (!Object.hasOwn(tableKeys, name)) {
        found.push({ field: name, message: `"${name}" is not a table ionheat knows${didYouMean(name, Object.keys(tableKeys))} (known: ${Object.keys(tableKeys).join(', ')})` });
        continue;
      }
      const tableName = name as TableName;
      const incoming = overrides[tableName];
      if (!Array.isArray(incoming)) {
        found.push({ field: name, message: `table "${name}" must be a list of records` });
        continue;
      }
      tables[tableName] = mergeTable(tableName, this.#tables[tableName], incoming, label, mergedSources, origins, found, checks.refuseConflicts === true) as never;
    }
    if (found.length > 0) throw overrideError(label, found);
    return new Dataset(tables, mergedSources, this.label === 'built-in' ? `built-in + ${label}` : `${this.label} + ${label}`, origins);
  }

  /**
   * The override set (file name) that gave this source key, or undefined for
   * a built-in source: so that results can say "your value".
   *
   * @param key - a source key of this dataset
   */
  userSource(key: string): string | undefined {
    return this.#origins.get(`source:${key}`);
  }
}

/** One problem of an override set: the field it concerns and what is wrong, without the file name. */
export interface OverrideProblem {
  field: string;
  message: string;
}

/** Most problems listed in one error; the rest are counted. */
const MAX_LISTED_PROBLEMS = 25;

/** One `INVALID_DATA` error naming every problem of an override set at once. @internal */
export function overrideError(label: string, problems: readonly OverrideProblem[]): IonheatError {
  const shown = problems.slice(0, MAX_LISTED_PROBLEMS);
  const more = problems.length - shown.length;
  const text = problems.length === 1 ? problems[0]!.message : `${problems.length} problems: ${shown.map((p, i) => `(${i + 1}) ${p.message}`).join('; ')}${more > 0 ? `; and ${more} more` : ''}`;
  return new IonheatError('INVALID_DATA', `${label}: ${text}`, { field: problems[0]?.field ?? label });
}

const shortText = (text: string): string => (text.length > 60 ? `${text.slice(0, 59)}…` : text);

/** How a record is named in messages: its formula, ion, element or id, as the table keys it. @internal */
export function recordName(record: unknown): string {
  if (record === null || typeof record !== 'object') return '';
  for (const key of ['formula', 'ion', 'id', 'symbol', 'element', 'subject', 'structure', 'core', 'molecule']) {
    const v = (record as Record<string, unknown>)[key];
    if (typeof v === 'string') return ` (${v.length > 40 ? `${v.slice(0, 40)}…` : v})`;
  }
  return '';
}

function mergeTable<N extends TableName>(
  name: N,
  base: TableFile<N> | undefined,
  incoming: readonly unknown[],
  label: string,
  sources: Record<string, SourceEntry>,
  origins: Map<string, string>,
  problems: OverrideProblem[],
  refuseConflicts: boolean,
): TableFile<N> {
  if (!checkRecord) throw new Error('the table schemas are not loaded: import Dataset or builtinDataset from the package entry (or src/data/recordCheck.ts) before merging tables');
  const check = checkRecord;
  const keyOf = tableKeys[name] as (r: TableRecord<N>) => string;
  const seen = new Set<string>();
  const earlier = new Map((base?.records ?? []).map((r) => [keyOf(r as TableRecord<N>), r]));
  const parsed: TableRecord<N>[] = [];
  incoming.forEach((raw, i) => {
    const where = `${name} record ${i + 1}${recordName(raw)}`;
    const result = check(name, raw);
    if (!result.success) {
      const fields = result.issues.map((issue) => `field "${issue.path.join('.') || '(record)'}": ${issue.message}`);
      problems.push({ field: `${name}[${i}].${result.issues[0]!.path.join('.') || '(record)'}`, message: `${where}, ${fields.join(', ')}` });
      return;
    }
    const record = result.data as TableRecord<N>;
    const key = keyOf(record);
    if (seen.has(key)) {
      problems.push({ field: `${name}[${i}]`, message: `${where} repeats the key "${key}" of an earlier record` });
      return;
    }
    seen.add(key);
    if (!Object.hasOwn(sources, record.source)) {
      problems.push({ field: `${name}[${i}].source`, message: `${where} cites source "${record.source}", which is neither built in nor given with the overrides${didYouMean(record.source, Object.keys(sources))}` });
      return;
    }
    const givenBy = origins.get(`${name}:${key}`);
    if (refuseConflicts && givenBy !== undefined && givenBy !== label && JSON.stringify(earlier.get(key)) !== JSON.stringify(record)) {
      problems.push({ field: `${name}[${i}]`, message: `${where} is also given by ${givenBy}, with other values; keep it in one file (a later file would silently win)` });
      return;
    }
    origins.set(`${name}:${key}`, label);
    parsed.push(record);
  });
  const replaced = new Map(parsed.map((r) => [keyOf(r), r]));
  const kept = (base?.records ?? []).filter((r) => !replaced.has(keyOf(r as TableRecord<N>)));
  const envelope = base ?? ({ title: name, description: `records from ${label}` } as TableFile<N>);
  return { ...envelope, records: [...kept, ...parsed] } as TableFile<N>;
}
