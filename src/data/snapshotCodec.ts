/**
 * Writing an index or calibration of a dataset as JSON and reading it back
 * as the same structure, so that those of the built-in tables can be computed
 * once when the package is built (`npm run generate`, into
 * `builtinSnapshot.generated.ts`) instead of at every start.
 *
 * Plain objects, arrays, strings, booleans and null are written as they are;
 * everything JSON cannot say is a one-key object whose key starts with `$`:
 * numbers that are not finite or are −0 (`$n`), undefined (`$u`), maps
 * (`$m`), sets (`$s`), arrays of float64 (`$f64`), a record of the dataset's own tables (`$r`: table and
 * position, read back as the same frozen record), a salt issued by
 * `parseSalt` (`$salt`, read back issued) and an object met more than once
 * (`$id` where it is first written, `$ref` after), so that shared objects stay
 * shared. Anything else (a class instance, a function) cannot be written.
 *
 * @module
 */
import { issueObject, wasIssued } from './issuedObjects.js';
import type { TableName } from './schemas.js';

/** What the codec needs of a dataset: its tables' records. */
export interface SnapshotTables {
  records(name: TableName): readonly unknown[];
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

const isPlainObject = (v: object): boolean => {
  const proto = Object.getPrototypeOf(v) as unknown;
  return proto === Object.prototype || proto === null;
};

/** The JSON form of `value`; throws a plain Error (a defect of the generator) on anything it cannot write. */
export function encodeSnapshot(value: unknown, tables: SnapshotTables, tableNames: readonly TableName[]): Json {
  const recordAt = new Map<object, [TableName, number]>();
  for (const name of tableNames) tables.records(name).forEach((r, i) => recordAt.set(r as object, [name, i]));
  const seen = new Map<object, number>();
  const count = (v: unknown): void => {
    if (typeof v !== 'object' || v === null || recordAt.has(v)) return;
    const n = seen.get(v) ?? 0;
    seen.set(v, n + 1);
    if (n > 0) return;
    if (v instanceof Map) for (const [k, x] of v) (count(k), count(x));
    else if (v instanceof Set || Array.isArray(v)) for (const x of v) count(x);
    else for (const x of Object.values(v)) count(x);
  };
  count(value);
  const ids = new Map<object, number>();
  const write = (v: unknown, path: string): Json => {
    if (v === undefined) return { $u: 1 };
    if (typeof v === 'number') return Number.isFinite(v) && !Object.is(v, -0) ? v : { $n: Object.is(v, -0) ? '-0' : String(v) };
    if (v === null || typeof v === 'string' || typeof v === 'boolean') return v;
    if (typeof v !== 'object') throw new Error(`snapshot: cannot write a ${typeof v} at ${path}`);
    const record = recordAt.get(v);
    if (record) return { $r: record };
    const id = ids.get(v);
    if (id !== undefined) return { $ref: id };
    let body: Json;
    const shared = (seen.get(v) ?? 0) > 1;
    if (shared) ids.set(v, ids.size);
    if (v instanceof Float64Array) body = { $f64: [...v].map((x) => write(x, path)) };
    else if (v instanceof Map) body = { $m: [...v].map(([k, x], i) => [write(k, `${path}<key ${i}>`), write(x, `${path}.get(${String(k)})`)]) };
    else if (v instanceof Set) body = { $s: [...v].map((x, i) => write(x, `${path}[${i}]`)) };
    else if (Array.isArray(v)) body = v.map((x, i) => write(x, `${path}[${i}]`));
    else if (!isPlainObject(v)) throw new Error(`snapshot: cannot write an instance of ${(v as object).constructor?.name ?? 'a class'} at ${path}`);
    else {
      const fields: Record<string, Json> = {};
      for (const [k, x] of Object.entries(v)) {
        if (k.startsWith('$')) throw new Error(`snapshot: a key starting with $ (${k}) at ${path}`);
        fields[k] = write(x, `${path}.${k}`);
      }
      body = wasIssued(v) ? { $salt: fields } : fields;
    }
    return shared ? { $id: ids.get(v)!, $v: body } : body;
  };
  return write(value, '(value)');
}

/** Reads back what {@link encodeSnapshot} wrote, with the records of `tables`. */
export function decodeSnapshot(json: unknown, tables: SnapshotTables): unknown {
  const byId: unknown[] = [];
  const read = (j: unknown): unknown => {
    if (typeof j !== 'object' || j === null) return j;
    if (Array.isArray(j)) return j.map(read);
    const o = j as Record<string, unknown>;
    const keys = Object.keys(o);
    if (keys.length === 0 || keys[0]!.charCodeAt(0) !== 36 /* $ */) {
      const out: Record<string, unknown> = {};
      for (const k of keys) out[k] = read(o[k]);
      return out;
    }
    if ('$u' in o) return undefined;
    if ('$n' in o) return o.$n === '-0' ? -0 : Number(o.$n);
    if ('$r' in o) {
      const [name, i] = o.$r as [TableName, number];
      return tables.records(name)[i];
    }
    if ('$ref' in o) return byId[o.$ref as number];
    if ('$id' in o) {
      const v = read(o.$v);
      byId[o.$id as number] = v;
      return v;
    }
    if ('$f64' in o) return Float64Array.from((o.$f64 as unknown[]).map(read) as number[]);
    if ('$m' in o) return new Map((o.$m as [unknown, unknown][]).map(([k, x]) => [read(k), read(x)]));
    if ('$s' in o) return new Set((o.$s as unknown[]).map(read));
    if ('$salt' in o) return issueObject(read(o.$salt) as object);
    throw new Error(`snapshot: unknown tag ${keys[0]}`);
  };
  return read(json);
}
