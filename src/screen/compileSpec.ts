/**
 * The specification language of `screen`: a small expression language of
 * its own, read by a hand-written tokenizer and recursive-descent parser,
 * checked against the fields of the output rows before any row is read, and
 * evaluated by walking the tree. Nothing is ever handed to `eval` or
 * `Function`.
 *
 * @module
 */
import { optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import { IonheatError } from '../error.js';
import { specError } from './specTokenize.js';
import { parseSpec, type SpecNode } from './specParse.js';
import { SpecFields, type SpecType } from './specFields.js';
import type { SpecOutcome } from './screenRow.js';
import { screenSpecSchema } from './screenOutputJsonSchema.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

const COMPILE_SPEC_OPTIONS = optionNames<CompileSpecOptions>('compileSpec', { schema: true, unavailable: true });

/** A checked specification, ready to test rows. */
export interface CompiledSpec {
  /** The expression as written. */
  text: string;
  /** The field paths the expression reads, as written (`fill.finalTemperature.high`). */
  fields: string[];
  /** Whether the specification holds for one row, and if not, why. */
  test(row: unknown): SpecOutcome;
}

/** Options of {@link compileSpec}. */
export interface CompileSpecOptions {
  /** The JSON Schema whose fields the expression may read (default: the screen's output rows; `null` reads every field unchecked). */
  schema?: object | null;
  /** Top-level fields that will not be there, with the reason (`fill`: no standard fill was given). */
  unavailable?: Readonly<Record<string, string>>;
}

type Value = number | string | boolean | Value[];

/** A field the row does not have; the spec then does not hold for that row. */
class Absent {
  constructor(readonly path: string) {}
}
/** A value of the wrong type met while reading a row (only for fields the schema leaves open). */
class Mismatch {
  constructor(readonly message: string) {}
}

const pathText = (path: readonly (string | number)[]): string => path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? p : `.${p}`)).join('');

const show = (v: Value): string => {
  if (typeof v === 'number') return String(Number(v.toPrecision(6)));
  if (typeof v === 'string') return JSON.stringify(v);
  if (typeof v === 'boolean') return String(v);
  return `[${v.map(show).join(', ')}]`;
};

const typeName = (t: SpecType): string =>
  t.kind === 'list' ? `a list of ${typeName(t.item).replace(/^an? /, '')}s` : t.kind === 'object' ? 'a group of fields' : t.kind === 'unknown' ? 'a value' : t.kind === 'number' ? 'a number' : t.kind === 'string' ? 'a text' : 'true or false';

/**
 * Reads and checks a specification: a condition on one output row, such as
 * `best.high < 0` or `fill.finalTemperature.high <= 5 and not ("oxidizer" in hazards)`.
 *
 * The language has numbers (`5`, `-0.5`, `1e3`), texts in quotes (`"exothermic"`),
 * `true` and `false`, lists (`["K[+]", "Na[+]"]`), field paths of the JSON output
 * (`best.high`, `estimates[0].basis`), arithmetic (`+ - * /`), comparisons
 * (`< <= > >= == !=`, not chained), `in` (membership of a list), `and`, `or`,
 * `not`, parentheses, and four functions: `abs(x)`, `min(a, b, …)`,
 * `max(a, b, …)` and `has(field)` (true when the row has the field).
 * `and` and `or` stop as soon as the answer is known, so
 * `not has(costPerKJ) or costPerKJ.high < 0.02` reads the cost only where there is one.
 *
 * Every field path is looked up in the schema of the output rows (or the
 * `schema` given) before any row is read: a misspelt field, a comparison of
 * a text with a number, or a text that a field can never take is an error
 * with its column. A field that a row lacks
 * makes the specification fail for that row, with the reason.
 *
 * @param text - the expression, at most 1000 characters, nested at most 32 deep
 * @param options - `schema`: the JSON Schema of the rows the expression reads (e.g. the row schema of
 *   {@link screenOutputJsonSchema}); `unavailable`: top-level fields that will be missing, with the reason
 * @throws IonheatError `INVALID_EXPRESSION` naming the column and what was wrong
 * @see docs/methods.md, "Screening", for the language; the parser's grammar is in src/screen/specParse.ts
 *   (recursive descent: Wirth, N. Algorithms + Data Structures = Programs, Prentice-Hall, 1976, ch. 5).
 *
 * @example
 * ```ts
 * const spec = compileSpec('best.high < 0 and verdict == "exothermic"');
 * spec.test({ best: { high: -12.1 }, verdict: 'exothermic' }).holds; // true
 * spec.test({ best: { high: 3.5 }, verdict: 'undetermined' }).reason; // 'best.high is 3.5, not < 0'
 * ```
 */
export function compileSpec(text: string, options: CompileSpecOptions = {}): CompiledSpec {
  options = optionsArgument(options, COMPILE_SPEC_OPTIONS);
  const tree = parseSpec(text);
  const schema = options.schema === undefined ? screenSpecSchema() : options.schema;
  const fields = schema ? new SpecFields(schema) : undefined;
  const paths = new Set<string>();
  const src = (n: SpecNode): string => text.slice(n.start, n.end).trim();

  const check = (n: SpecNode): SpecType => {
    switch (n.kind) {
      case 'number':
        return { kind: 'number' };
      case 'string':
        return { kind: 'string' };
      case 'boolean':
        return { kind: 'boolean' };
      case 'field': {
        const head = String(n.path[0]);
        paths.add(pathText(n.path));
        if (head === 'rank') specError('rank is known only after every row has been screened; a spec reads one row at a time', text, n.start);
        if (head === 'spec') specError('a spec cannot read its own outcome', text, n.start);
        const why = options.unavailable && Object.hasOwn(options.unavailable, head) ? options.unavailable[head] : undefined;
        if (why !== undefined) specError(`the spec reads ${pathText(n.path)}, but ${why}`, text, n.start);
        if (!fields) return { kind: 'unknown' };
        const found = fields.lookup(n.path);
        if (!found.ok) specError(found.problem, text, n.steps[found.at] ?? n.start);
        return found.type;
      }
      case 'list': {
        const items = n.items.map(check);
        const kinds = new Set(items.map((t) => t.kind).filter((k) => k !== 'unknown'));
        if (kinds.size > 1) specError('a list holds values of one type (all numbers or all texts)', text, n.start);
        for (const [i, t] of items.entries()) if (t.kind === 'list' || t.kind === 'object') specError('a list holds numbers, texts or true/false', text, n.items[i]!.start);
        return { kind: 'list', item: items.find((t) => t.kind !== 'unknown') ?? { kind: 'unknown' } };
      }
      case 'not':
        want(n.operand, 'boolean', '"not" applies to a condition');
        return { kind: 'boolean' };
      case 'negate':
        want(n.operand, 'number', 'a minus sign applies to a number');
        return { kind: 'number' };
      case 'logic':
        want(n.left, 'boolean', `"${n.op}" joins two conditions`);
        want(n.right, 'boolean', `"${n.op}" joins two conditions`);
        return { kind: 'boolean' };
      case 'arithmetic':
        want(n.left, 'number', `"${n.op}" works on numbers`);
        want(n.right, 'number', `"${n.op}" works on numbers`);
        return { kind: 'number' };
      case 'compare': {
        const l = check(n.left);
        const r = check(n.right);
        for (const [side, t] of [[n.left, l], [n.right, r]] as const) {
          if (t.kind === 'object' || t.kind === 'list') specError(t.kind === 'object' ? `${src(side)} is ${typeName(t)}; compare one of its fields, e.g. ${src(side)}.value` : `${src(side)} is ${typeName(t)}; test membership with "in", e.g. "toxic" in ${src(side)}`, text, side.start);
        }
        if (n.op !== '==' && n.op !== '!=') {
          for (const [side, t] of [[n.left, l], [n.right, r]] as const) {
            if (t.kind !== 'number' && t.kind !== 'unknown') specError(`"${n.op}" compares numbers, but ${src(side)} is ${typeName(t)}`, text, side.start);
          }
        } else if (l.kind !== 'unknown' && r.kind !== 'unknown' && l.kind !== r.kind) {
          specError(`${src(n.left)} is ${typeName(l)} and ${src(n.right)} is ${typeName(r)}; they can never be equal`, text, n.start);
        }
        checkChoice(n.left, l, n.right);
        checkChoice(n.right, r, n.left);
        return { kind: 'boolean' };
      }
      case 'in': {
        const l = check(n.left);
        const r = check(n.right);
        if (r.kind !== 'list' && r.kind !== 'unknown') specError(`"in" looks for a value in a list, but ${src(n.right)} is ${typeName(r)}`, text, n.right.start);
        if (l.kind === 'object' || l.kind === 'list') specError(`${src(n.left)} is ${typeName(l)}; "in" looks for a number or a text`, text, n.left.start);
        if (r.kind === 'list' && r.item.kind !== 'unknown' && l.kind !== 'unknown' && r.item.kind !== l.kind) {
          specError(`${src(n.left)} is ${typeName(l)} but ${src(n.right)} holds ${typeName(r.item).replace(/^an? /, '')}s`, text, n.start);
        }
        if (r.kind === 'list' && r.item.kind === 'string' && r.item.values && n.left.kind === 'string' && !r.item.values.includes(n.left.value)) {
          specError(`${src(n.right)} can only hold ${r.item.values.map((v) => JSON.stringify(v)).join(', ')}`, text, n.left.start);
        }
        if (n.right.kind === 'list' && l.kind === 'string' && l.values) {
          for (const item of n.right.items) if (item.kind === 'string' && !l.values.includes(item.value)) specError(`${src(n.left)} is one of ${l.values.map((v) => JSON.stringify(v)).join(', ')}; ${JSON.stringify(item.value)} can never match`, text, item.start);
        }
        return { kind: 'boolean' };
      }
      case 'call': {
        if (n.name === 'has') {
          if (n.args.length !== 1 || n.args[0]!.kind !== 'field') specError('has(…) takes one field path, e.g. has(costPerKJ)', text, n.start);
          check(n.args[0]!);
          return { kind: 'boolean' };
        }
        if (n.name === 'abs' && n.args.length !== 1) specError('abs(…) takes one number', text, n.start);
        if (n.args.length === 0) specError(`${n.name}(…) takes at least one number`, text, n.start);
        for (const a of n.args) want(a, 'number', `${n.name}(…) works on numbers`);
        return { kind: 'number' };
      }
    }
  };
  const want = (n: SpecNode, kind: 'number' | 'boolean', rule: string): void => {
    const t = check(n);
    if (t.kind !== kind && t.kind !== 'unknown') specError(`${rule}, but ${src(n)} is ${typeName(t)}`, text, n.start);
  };
  const checkChoice = (side: SpecNode, t: SpecType, other: SpecNode): void => {
    if (t.kind === 'string' && t.values && other.kind === 'string' && !t.values.includes(other.value)) {
      specError(`${src(side)} is one of ${t.values.map((v) => JSON.stringify(v)).join(', ')}; ${JSON.stringify(other.value)} can never match`, text, other.start);
    }
  };

  const top = check(tree);
  if (top.kind !== 'boolean' && top.kind !== 'unknown') {
    specError(`a spec is a condition that holds or not, but ${src(tree)} is ${typeName(top)}${top.kind === 'number' ? `; compare it, e.g. ${src(tree)} < 0` : ''}`, text, tree.start);
  }

  const read = (row: unknown, path: readonly (string | number)[]): unknown => {
    let v: unknown = row;
    for (const p of path) {
      if (v === null || typeof v !== 'object') return undefined;
      if (typeof p === 'number') v = Array.isArray(v) ? v[p] : undefined;
      else v = !Array.isArray(v) && Object.hasOwn(v, p) ? (v as Record<string, unknown>)[p] : undefined;
    }
    return v;
  };
  const asValue = (v: unknown, where: string): Value => {
    if (typeof v === 'number' || typeof v === 'string' || typeof v === 'boolean') return v;
    if (Array.isArray(v)) return v.map((x) => asValue(x, where));
    throw new Mismatch(`${where} is not a number, a text or true/false`);
  };
  const num = (v: Value, n: SpecNode): number => {
    if (typeof v !== 'number') throw new Mismatch(`${src(n)} is ${show(v)}, not a number`);
    return v;
  };
  const bool = (v: Value, n: SpecNode): boolean => {
    if (typeof v !== 'boolean') throw new Mismatch(`${src(n)} is ${show(v)}, not true or false`);
    return v;
  };
  const finite = (x: number, n: SpecNode): number => {
    if (!Number.isFinite(x)) throw new Mismatch(`${src(n)} has no finite value (a division by zero?)`);
    return unsignedZero(x);
  };

  const evaluate = (n: SpecNode, row: unknown): Value => {
    switch (n.kind) {
      case 'number':
      case 'string':
      case 'boolean':
        return n.value;
      case 'field': {
        const v = read(row, n.path);
        if (v === undefined || v === null) throw new Absent(pathText(n.path));
        return asValue(v, pathText(n.path));
      }
      case 'list':
        return n.items.map((i) => evaluate(i, row));
      case 'not':
        return !bool(evaluate(n.operand, row), n.operand);
      case 'negate':
        return finite(-num(evaluate(n.operand, row), n.operand), n);
      case 'logic': {
        const l = bool(evaluate(n.left, row), n.left);
        if (n.op === 'and' ? !l : l) return l;
        return bool(evaluate(n.right, row), n.right);
      }
      case 'arithmetic': {
        const l = num(evaluate(n.left, row), n.left);
        const r = num(evaluate(n.right, row), n.right);
        return finite(n.op === '+' ? l + r : n.op === '-' ? l - r : n.op === '*' ? l * r : l / r, n);
      }
      case 'compare': {
        const l = evaluate(n.left, row);
        const r = evaluate(n.right, row);
        if (n.op === '==' || n.op === '!=') {
          if (typeof l !== typeof r || Array.isArray(l) || Array.isArray(r)) throw new Mismatch(`${src(n.left)} is ${show(l)} and ${src(n.right)} is ${show(r)}; they cannot be compared`);
          return n.op === '==' ? l === r : l !== r;
        }
        const a = num(l, n.left);
        const b = num(r, n.right);
        return n.op === '<' ? a < b : n.op === '<=' ? a <= b : n.op === '>' ? a > b : a >= b;
      }
      case 'in': {
        const l = evaluate(n.left, row);
        const r = evaluate(n.right, row);
        if (!Array.isArray(r)) throw new Mismatch(`${src(n.right)} is ${show(r)}, not a list`);
        return r.some((x) => x === l);
      }
      case 'call': {
        if (n.name === 'has') {
          const field = n.args[0] as Extract<SpecNode, { kind: 'field' }>;
          const v = read(row, field.path);
          return v !== undefined && v !== null;
        }
        const xs = n.args.map((a) => num(evaluate(a, row), a));
        return finite(n.name === 'abs' ? Math.abs(xs[0]!) : n.name === 'min' ? Math.min(...xs) : Math.max(...xs), n);
      }
    }
  };

  /** Why a condition that came out false is false, in words. */
  const explain = (n: SpecNode, row: unknown): string => {
    try {
      if (n.kind === 'compare' || n.kind === 'in') {
        const l = evaluate(n.left, row);
        const literal = n.left.kind === 'number' || n.left.kind === 'string' || n.left.kind === 'boolean';
        const op = n.kind === 'in' ? 'in' : n.op;
        return literal ? `${src(n)} does not hold` : `${src(n.left)} is ${show(l)}, not ${op} ${src(n.right)}`;
      }
      if (n.kind === 'logic' && n.op === 'and') {
        return evaluate(n.left, row) === false ? explain(n.left, row) : explain(n.right, row);
      }
      if (n.kind === 'logic' && n.op === 'or') return `${explain(n.left, row)}, and ${explain(n.right, row)}`;
      if (n.kind === 'not') return `${src(n.operand)} holds`;
      if (n.kind === 'call' && n.name === 'has') return `the row has no ${src(n.args[0]!)}`;
    } catch {
      /* fall through to the plain statement */
    }
    return `${src(n)} is false`;
  };

  return {
    text,
    fields: [...paths],
    test(row: unknown): SpecOutcome {
      try {
        const v = evaluate(tree, row);
        if (typeof v !== 'boolean') return { holds: false, reason: `the spec gives ${show(v)}, not true or false` };
        return v ? { holds: true } : { holds: false, reason: explain(tree, row) };
      } catch (e) {
        if (e instanceof Absent) return { holds: false, reason: `${e.path} is absent for this row` };
        if (e instanceof Mismatch) return { holds: false, reason: e.message };
        if (e instanceof IonheatError) throw e;
        throw e;
      }
    },
  };
}
