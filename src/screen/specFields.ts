/**
 * Which fields a specification may read, and of what type: looked up in the
 * JSON Schema of the screen's output rows, so that the language reads exactly
 * the fields of the JSON output and a misspelt field is caught before any
 * row is screened.
 *
 * @module
 */

/** The type of a value in a specification. `unknown` is checked when a row is read. */
export type SpecType = { kind: 'number' } | { kind: 'string'; values?: readonly string[] } | { kind: 'boolean' } | { kind: 'list'; item: SpecType } | { kind: 'object' } | { kind: 'unknown' };

/** A JSON Schema node, as far as the lookup needs it. */
interface SchemaNode {
  type?: string | string[];
  properties?: Record<string, SchemaNode>;
  additionalProperties?: boolean | SchemaNode;
  items?: SchemaNode;
  anyOf?: SchemaNode[];
  oneOf?: SchemaNode[];
  enum?: unknown[];
  const?: unknown;
  $ref?: string;
  $defs?: Record<string, SchemaNode>;
}

/** The answer of a field lookup: its type, or why it cannot be read. */
export type FieldLookup = { ok: true; type: SpecType } | { ok: false; at: number; problem: string };

function editDistance(a: string, b: string): number {
  if (Math.abs(a.length - b.length) > 3) return 99;
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  let before = prev;
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) {
      let d = Math.min(prev[j]! + 1, row[j - 1]! + 1, prev[j - 1]! + (a[i - 1]!.toLowerCase() === b[j - 1]!.toLowerCase() ? 0 : 1));
      // a swap of two neighbours counts as one edit
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, before[j - 2]! + 1);
      row.push(d);
    }
    before = prev;
    prev = row;
  }
  return prev[b.length]!;
}

/** The field names of an object node closest to a misspelt one. */
function suggestion(name: string, known: readonly string[]): string {
  const close = known.filter((k) => editDistance(name, k) <= (k.length >= 4 ? 2 : 1)).slice(0, 3);
  return close.length > 0 ? `; did you mean ${close.map((c) => `"${c}"`).join(' or ')}?` : `; the fields here are ${known.map((k) => `"${k}"`).join(', ')}`;
}

/** Looks up field paths in a JSON Schema of the rows. */
export class SpecFields {
  readonly #root: SchemaNode;

  constructor(schema: object) {
    this.#root = schema as SchemaNode;
  }

  #deref(node: SchemaNode): SchemaNode {
    let n = node;
    for (let hops = 0; n.$ref !== undefined && hops < 16; hops++) {
      const name = n.$ref.startsWith('#/$defs/') ? n.$ref.slice('#/$defs/'.length) : undefined;
      const target = name !== undefined ? this.#root.$defs?.[name] : n.$ref === '#' ? this.#root : undefined;
      if (!target) return {};
      n = target;
    }
    return n;
  }

  /** The non-null alternatives of a node (an optional or nullable field is read as its value's type). */
  #alternatives(node: SchemaNode): SchemaNode[] {
    const n = this.#deref(node);
    const alts = n.anyOf ?? n.oneOf;
    if (alts) return alts.flatMap((a) => this.#alternatives(a)).filter((a) => a.type !== 'null');
    return [n];
  }

  #typeOf(node: SchemaNode): SpecType {
    const alts = this.#alternatives(node);
    const kinds = alts.map((a): SpecType => {
      const t = Array.isArray(a.type) ? a.type.filter((x) => x !== 'null')[0] : a.type;
      if (t === 'number' || t === 'integer') return { kind: 'number' };
      if (t === 'string') return a.enum ? { kind: 'string', values: a.enum.map(String) } : typeof a.const === 'string' ? { kind: 'string', values: [a.const] } : { kind: 'string' };
      if (t === 'boolean') return { kind: 'boolean' };
      if (t === 'array') return { kind: 'list', item: a.items ? this.#typeOf(a.items) : { kind: 'unknown' } };
      if (t === 'object') return { kind: 'object' };
      return { kind: 'unknown' };
    });
    const first = kinds[0];
    if (!first || kinds.some((k) => k.kind !== first.kind)) return { kind: 'unknown' };
    if (first.kind === 'string' && kinds.length > 1) {
      const values = kinds.every((k) => k.kind === 'string' && k.values) ? kinds.flatMap((k) => (k.kind === 'string' ? (k.values ?? []) : [])) : undefined;
      return values ? { kind: 'string', values } : { kind: 'string' };
    }
    return first;
  }

  /**
   * The type of the value at `path` (names and list positions), or the first
   * step that does not exist with the fields that do.
   */
  lookup(path: readonly (string | number)[]): FieldLookup {
    let nodes = [this.#root];
    for (let step = 0; step < path.length; step++) {
      const key = path[step]!;
      const here = nodes.flatMap((n) => this.#alternatives(n));
      const shown = path.slice(0, step).map((p) => (typeof p === 'number' ? `[${p}]` : p)).join('.').replace(/\.\[/g, '[');
      if (typeof key === 'number') {
        const lists = here.filter((n) => n.type === 'array');
        if (lists.length === 0) return { ok: false, at: step, problem: `${shown} is not a list, so [${key}] cannot be read` };
        nodes = lists.map((n) => n.items ?? {});
        continue;
      }
      const objects = here.filter((n) => n.type === 'object' || n.properties !== undefined);
      if (objects.length === 0) {
        if (here.some((n) => n.type === undefined)) return { ok: true, type: { kind: 'unknown' } };
        return { ok: false, at: step, problem: `${shown} is a ${this.#typeOf(here[0] ?? {}).kind}, it has no field "${key}"` };
      }
      const found = objects.map((n) => (n.properties && Object.hasOwn(n.properties, key) ? n.properties[key]! : undefined)).filter((n) => n !== undefined);
      if (found.length === 0) {
        if (objects.some((n) => n.additionalProperties !== false)) return { ok: true, type: { kind: 'unknown' } };
        const known = [...new Set(objects.flatMap((n) => Object.keys(n.properties ?? {})))];
        return { ok: false, at: step, problem: `${step === 0 ? 'a row' : shown} has no field "${key}"${suggestion(key, known)}` };
      }
      nodes = found;
    }
    return { ok: true, type: nodes.length === 1 ? this.#typeOf(nodes[0]!) : this.#typeOf({ anyOf: nodes }) };
  }
}
