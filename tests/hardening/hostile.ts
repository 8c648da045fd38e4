// Shared pieces of the hostile-input tests: arbitraries of bad values, a deep
// scanner for numbers no result may hold, and the one check every call must
// pass (a result free of NaN, ±Infinity and −0, or an IonheatError with a
// code of errorCodes).
import fc from 'fast-check';
import { expect } from 'vitest';
import { errorCodes, isIonheatError } from '../../src/error.js';

/** Where in a value a NaN, ±Infinity or −0 sits, as paths (`best.low`, `rows[3].fill.heat`); empty when clean. */
export function badNumbers(value: unknown, limit = 5): string[] {
  const found: string[] = [];
  const seen = new WeakSet<object>();
  const walk = (v: unknown, path: string): void => {
    if (found.length >= limit) return;
    if (typeof v === 'number') {
      if (!Number.isFinite(v) || Object.is(v, -0)) found.push(`${path || '(value)'} = ${Object.is(v, -0) ? '-0' : String(v)}`);
      return;
    }
    if (v === null || typeof v !== 'object') return;
    if (seen.has(v)) return;
    seen.add(v);
    if (Array.isArray(v)) v.forEach((x, i) => walk(x, `${path}[${i}]`));
    else if (v instanceof Map) for (const [k, x] of v) walk(x, `${path}<${String(k)}>`);
    else if (v instanceof Set) for (const x of v) walk(x, `${path}{}`);
    else for (const k of Object.keys(v)) walk((v as Record<string, unknown>)[k], path ? `${path}.${k}` : k);
  };
  walk(value, '');
  return found;
}

const codes = new Set<string>(errorCodes);

/** A short description of a thrown value for a failure message. */
function describeThrown(e: unknown): string {
  if (e instanceof Error) return `${e.name}: ${e.message}\n${(e.stack ?? '').split('\n').slice(1, 4).join('\n')}`;
  return String(e);
}

/** A printable form of hostile arguments (symbols, bigints and cycles included). */
export function show(args: unknown): string {
  try {
    const seen = new WeakSet<object>();
    return JSON.stringify(args, (_k, v: unknown) => {
      if (typeof v === 'number' && (!Number.isFinite(v) || Object.is(v, -0))) return Object.is(v, -0) ? '-0' : String(v);
      if (typeof v === 'bigint') return `${v}n`;
      if (typeof v === 'symbol' || typeof v === 'function' || v === undefined) return String(v);
      if (v !== null && typeof v === 'object') {
        if (seen.has(v)) return '[cycle]';
        seen.add(v);
      }
      return v;
    })?.slice(0, 600) ?? String(args);
  } catch {
    return '[unprintable]';
  }
}

/**
 * Runs `call` and checks the outcome: a returned value (awaited, and an async
 * iterator drained) holds no NaN, ±Infinity or −0 anywhere; a thrown value is
 * an IonheatError whose code is one of errorCodes and whose message is text.
 *
 * @returns the value, or undefined when the call threw the typed error
 */
export async function expectTypedOutcome(what: string, call: () => unknown, args?: unknown): Promise<unknown> {
  let value: unknown;
  try {
    value = call();
    if (value instanceof Promise) value = await value;
    if (value !== null && typeof value === 'object' && typeof (value as AsyncIterable<unknown>)[Symbol.asyncIterator] === 'function' && !Array.isArray(value)) {
      const items: unknown[] = [];
      const it = (value as AsyncIterable<unknown>)[Symbol.asyncIterator]();
      for (let k = 0; k < 100_000; k++) {
        const step = await it.next();
        items.push(step.value);
        if (step.done) break;
      }
      value = items;
    }
  } catch (e) {
    const where = `${what}(${args === undefined ? '' : show(args)})`;
    expect(isIonheatError(e), `${where} threw something other than an IonheatError: ${describeThrown(e)}`).toBe(true);
    const err = e as { code: string; message: unknown };
    expect(codes.has(err.code), `${where} threw code ${err.code}, not one of errorCodes`).toBe(true);
    expect(typeof err.message === 'string' && err.message.length > 0, `${where}: the error has no message`).toBe(true);
    return undefined;
  }
  const bad = badNumbers(value);
  expect(bad, `${what}(${args === undefined ? '' : show(args)}) returned non-finite or negative-zero numbers`).toEqual([]);
  return value;
}

/** Numbers that break arithmetic: NaN, ±Infinity, −0, the extremes of float64, denormals, negatives. */
export const hostileNumber: fc.Arbitrary<number> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(Number.NaN, Infinity, -Infinity, -0, 0, 1e308, -1e308, Number.MAX_VALUE, Number.MIN_VALUE, -Number.MIN_VALUE, 2.2250738585072014e-308, 1e-300, Number.MAX_SAFE_INTEGER + 2, -1, -1e9, 1e9, 0.5, 1, 2, 3, 25, 100, 1e-9) },
  { weight: 2, arbitrary: fc.double() },
  { weight: 1, arbitrary: fc.integer({ min: -1_000_000, max: 1_000_000 }) },
);

/** Characters formulas, specs and option values are made of, plus some that have no business there. */
const formulaChars = [...'NaClKCa()[]0123456789·.*•HO SNMgFe+-−^_@:eE,"\'<>=!\\/ \t\n₂₃₄'];

/** Text: arbitrary unicode, formula-like runs, and words that mean something elsewhere. */
export const hostileString: fc.Arbitrary<string> = fc.oneof(
  { weight: 2, arbitrary: fc.string({ maxLength: 40 }) },
  { weight: 1, arbitrary: fc.string({ unit: 'grapheme', maxLength: 20 }) },
  { weight: 2, arbitrary: fc.string({ unit: fc.constantFrom(...formulaChars), maxLength: 30 }) },
  {
    weight: 2,
    arbitrary: fc.constantFrom('', ' ', '__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'NaN', 'Infinity', '-Infinity', '-0', '1e308', '1e-400', '0x10', '\u0000', '\uFEFF', '\uD800', '(((', ')', 'NaCl', 'KNO3', 'CaCl2·6H2O', 'urea', 'H2O', 'Xx', 'Na[+]', 'all', 'cool', 'heat', 'rock-salt', 'lattice', 'Na999999999Cl999999999'),
  },
);

/** Objects with a null prototype or own keys that name prototype members. */
const awkwardObject: fc.Arbitrary<unknown> = fc.constantFrom(
  Object.create(null) as object,
  JSON.parse('{"__proto__": {"polluted": 1}}') as object,
  JSON.parse('{"constructor": {"prototype": {"polluted": 1}}}') as object,
  { toString: 5, valueOf: null },
  { length: 1e9 },
  [],
  [[]],
  new Array(3),
  new Date(Number.NaN),
  new Map([['a', 1]]),
  new Set([1]),
  /x/,
);

/** Any value at all: JSON-ish values, the hostile numbers and strings, awkward objects, bigints and symbols. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 3, arbitrary: hostileNumber },
  { weight: 3, arbitrary: hostileString },
  { weight: 1, arbitrary: fc.constantFrom(undefined, null, true, false, 10n, Symbol('s')) },
  { weight: 1, arbitrary: awkwardObject },
  { weight: 2, arbitrary: fc.anything({ maxDepth: 2, maxKeys: 4, withNullPrototype: true, withBigInt: true, withDate: true, withMap: true, withSet: true, withSparseArray: true, withBoxedValues: true }) },
);

type Path = (string | number)[];

/** Every path to a property or element of a plain value (not into class instances), nearest first. */
function pathsOf(value: unknown, depth = 6): Path[] {
  const out: Path[] = [];
  const walk = (v: unknown, path: Path, d: number): void => {
    if (d > depth || v === null || typeof v !== 'object') return;
    const proto = Object.getPrototypeOf(v);
    if (!Array.isArray(v) && proto !== Object.prototype && proto !== null) return;
    const keys: (string | number)[] = Array.isArray(v) ? v.slice(0, 8).map((_x, i) => i) : Object.keys(v);
    for (const k of keys) {
      out.push([...path, k]);
      walk((v as Record<string | number, unknown>)[k], [...path, k], d + 1);
    }
  };
  walk(value, [], 0);
  return out;
}

/** A copy of a plain value (class instances, such as datasets, kept as they are). */
function copyPlain<T>(v: T): T {
  if (v === null || typeof v !== 'object') return v;
  if (Array.isArray(v)) return v.map(copyPlain) as T;
  const proto = Object.getPrototypeOf(v);
  if (proto !== Object.prototype && proto !== null) return v;
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(v)) out[k] = copyPlain((v as Record<string, unknown>)[k]);
  return out as T;
}

type Mutation = { kind: 'replace'; at: number; value: unknown } | { kind: 'delete'; at: number } | { kind: 'extra'; at: number; key: string; value: unknown } | { kind: 'empty'; at: number } | { kind: 'huge'; at: number };

function applyMutation<T>(sample: T, m: Mutation): T {
  const root = { v: copyPlain(sample) } as Record<string, unknown>;
  const paths = [[], ...pathsOf(root.v)].map((p) => ['v', ...p]);
  const path = paths[m.at % paths.length]!;
  const parentPath = path.slice(0, -1);
  let parent: Record<string | number, unknown> = root;
  for (const k of parentPath) parent = parent[k] as Record<string | number, unknown>;
  const key = path[path.length - 1]!;
  const target = parent[key];
  // A dataset argument is trusted to be a Dataset (see publicApi.test.ts); it is never replaced.
  if (target !== null && typeof target === 'object' && (target as object).constructor?.name === 'Dataset') return root.v as T;
  switch (m.kind) {
    case 'replace':
      parent[key] = m.value;
      break;
    case 'delete':
      if (Array.isArray(parent)) parent.splice(Number(key), 1);
      else if (key !== 'v') delete parent[key];
      else root.v = undefined;
      break;
    case 'extra':
      if (target !== null && typeof target === 'object' && !Array.isArray(target)) Object.defineProperty(target, m.key, { value: m.value, enumerable: true, writable: true, configurable: true });
      else parent[key] = m.value;
      break;
    case 'empty':
      parent[key] = Array.isArray(target) ? [] : typeof target === 'string' ? '' : target !== null && typeof target === 'object' ? {} : 0;
      break;
    case 'huge':
      parent[key] = Array.isArray(target) ? Array.from({ length: 5000 }, (_x, i) => target[i % Math.max(1, target.length)]) : typeof target === 'string' ? target.repeat(Math.ceil(100_000 / Math.max(1, target.length))).slice(0, 100_000) : typeof target === 'number' ? 1e308 : target;
      break;
  }
  return root.v as T;
}

/** Key names to add to objects: prototype members and misspellings of real fields. */
const extraKey = fc.constantFrom('__proto__', 'constructor', 'prototype', 'extra', 'formula ', 'Value', 'toJSON', 'then');

/**
 * Variants of a valid sample: the sample itself, or the sample with one part
 * replaced by a hostile value, removed, given an extra key, emptied or made
 * huge (5000 elements, 100 000 characters, 1e308).
 */
export function variantsOf<T>(sample: T): fc.Arbitrary<T> {
  const at = fc.nat({ max: 10_000 });
  const mutation: fc.Arbitrary<Mutation> = fc.oneof(
    { weight: 5, arbitrary: fc.record({ kind: fc.constant('replace' as const), at, value: hostileValue }) },
    { weight: 2, arbitrary: fc.record({ kind: fc.constant('delete' as const), at }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant('extra' as const), at, key: extraKey, value: hostileValue }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant('empty' as const), at }) },
    { weight: 1, arbitrary: fc.record({ kind: fc.constant('huge' as const), at }) },
  );
  return fc.oneof({ weight: 1, arbitrary: fc.constant(null).map(() => copyPlain(sample)) }, { weight: 8, arbitrary: fc.array(mutation, { minLength: 1, maxLength: 2 }).map((ms) => ms.reduce(applyMutation, sample)) });
}

/**
 * Argument lists for a function: variants of its valid samples, or up to
 * `userArgs` hostile values of any type (the dataset argument that may follow
 * is left at its default).
 */
export function argumentsFor(samples: readonly unknown[][], userArgs: number): fc.Arbitrary<unknown[]> {
  return fc.oneof(
    { weight: 4, arbitrary: fc.oneof(...samples.map((s) => variantsOf(s))) },
    { weight: 1, arbitrary: fc.array(hostileValue, { maxLength: userArgs }) },
  );
}

/**
 * The position of a function's `dataset` parameter, read from its parameter
 * list (defaults may hold brackets, so the list is split at top-level commas),
 * or −1 when it has none.
 */
export function datasetIndex(fn: (...a: never[]) => unknown): number {
  const text = fn.toString();
  const open = text.indexOf('(');
  const params: string[] = [];
  let depth = 0;
  let current = '';
  for (let i = open + 1; i < text.length; i++) {
    const c = text[i]!;
    if (depth === 0 && c === ')') break;
    if ('([{'.includes(c)) depth++;
    else if (')]}'.includes(c)) depth--;
    if (depth === 0 && c === ',') {
      params.push(current.trim());
      current = '';
    } else current += c;
  }
  params.push(current.trim());
  return params.findIndex((p) => /^dataset\b/.test(p));
}

/**
 * The argument list with the dataset position kept trustworthy: a value
 * there that is not a Dataset (moved in by a removed argument, or the list
 * made long) is replaced by undefined, so the default dataset is used.
 */
export function withTrustedDataset(list: unknown[], at: number): unknown[] {
  if (at < 0 || list.length <= at) return list;
  const v = list[at];
  if (v === undefined || (v !== null && typeof v === 'object' && (v as object).constructor?.name === 'Dataset')) return list;
  const out = [...list];
  out[at] = undefined;
  return out;
}
