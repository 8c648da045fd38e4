/**
 * The parser of the specification language (see {@link compileSpec}): a
 * recursive-descent parser over the tokens of {@link tokenizeSpec}, with a
 * bound on nesting depth so that no expression can exhaust the stack.
 *
 * Grammar, loosest binding first:
 *
 * ```
 * expr       = or
 * or         = and { "or" and }
 * and        = not { "and" not }
 * not        = "not" not | comparison
 * comparison = sum [ ( "<" | "<=" | ">" | ">=" | "==" | "!=" ) sum | "in" sum ]
 * sum        = product { ( "+" | "-" ) product }
 * product    = unary { ( "*" | "/" ) unary }
 * unary      = "-" unary | primary
 * primary    = number | text | "true" | "false" | list | call | field | "(" expr ")"
 * list       = "[" [ expr { "," expr } ] "]"
 * call       = ( "abs" | "min" | "max" | "has" ) "(" [ expr { "," expr } ] ")"
 * field      = name { "." name | "[" whole number "]" }
 * ```
 *
 * @module
 */
import { specError, tokenizeSpec, type SpecToken } from './specTokenize.js';

/** Deepest nesting of parentheses, lists, calls, `not` and unary minus accepted. */
export const SPEC_MAX_DEPTH = 32;

export type ComparisonOp = '<' | '<=' | '>' | '>=' | '==' | '!=';
export type ArithmeticOp = '+' | '-' | '*' | '/';
export type SpecFunction = 'abs' | 'min' | 'max' | 'has';

/** Where a node's text lies in the expression. */
export interface SpecSpan {
  /** Zero-based offsets of the node's text in the expression. */
  start: number;
  end: number;
}

/** A node of a parsed specification. */
export type SpecNode =
  | (SpecSpan & { kind: 'number'; value: number })
  | (SpecSpan & { kind: 'string'; value: string })
  | (SpecSpan & { kind: 'boolean'; value: boolean })
  | (SpecSpan & { kind: 'field'; path: (string | number)[]; /** Where each step of the path starts. */ steps: number[] })
  | (SpecSpan & { kind: 'list'; items: SpecNode[] })
  | (SpecSpan & { kind: 'not'; operand: SpecNode })
  | (SpecSpan & { kind: 'negate'; operand: SpecNode })
  | (SpecSpan & { kind: 'logic'; op: 'and' | 'or'; left: SpecNode; right: SpecNode })
  | (SpecSpan & { kind: 'compare'; op: ComparisonOp; left: SpecNode; right: SpecNode })
  | (SpecSpan & { kind: 'in'; left: SpecNode; right: SpecNode })
  | (SpecSpan & { kind: 'arithmetic'; op: ArithmeticOp; left: SpecNode; right: SpecNode })
  | (SpecSpan & { kind: 'call'; name: SpecFunction; args: SpecNode[] });

const KEYWORDS = new Set(['and', 'or', 'not', 'in', 'true', 'false']);
const FUNCTIONS = new Set<string>(['abs', 'min', 'max', 'has']);
const COMPARISONS = new Set<string>(['<', '<=', '>', '>=', '==', '!=']);

const describe = (t: SpecToken): string => (t.kind === 'end' ? 'the end of the expression' : `"${t.text}"`);

/**
 * Parses a specification into its syntax tree, or throws an
 * `INVALID_EXPRESSION` error that names the column and what was expected.
 *
 * @param text - the expression, at most 1000 characters, nested at most 32 deep (`SPEC_MAX_DEPTH`)
 * @returns the tree; every node carries its `start`/`end` character positions in `text`
 * @see the grammar in this module's comment; recursive descent as in Wirth, N. Algorithms + Data Structures =
 *   Programs (Prentice-Hall, 1976), ch. 5; docs/methods.md, "Screening".
 *
 * @example
 * ```ts
 * parseSpec('best.high < 0').kind; // 'compare'
 * parseSpec('not (verdict == "exothermic")').kind; // 'not'
 * parseSpec('best.high < 0').left.path; // ['best', 'high']
 * ```
 */
export function parseSpec(text: string): SpecNode {
  const tokens = tokenizeSpec(text);
  let k = 0;
  let depth = 0;
  const peek = (): SpecToken => tokens[k]!;
  const next = (): SpecToken => tokens[k++]!;
  const isOp = (t: SpecToken, op: string): boolean => t.kind === 'op' && t.text === op;
  const isWord = (t: SpecToken, word: string): boolean => t.kind === 'name' && t.text === word;
  const enter = (at: SpecToken): void => {
    depth++;
    if (depth > SPEC_MAX_DEPTH) specError(`the expression nests deeper than ${SPEC_MAX_DEPTH} levels`, text, at.start);
  };
  const expect = (op: string, what: string, opened?: SpecToken): SpecToken => {
    const t = peek();
    if (!isOp(t, op)) specError(`expected ${what} but found ${describe(t)}${opened ? ` (to close the "${opened.text}" at column ${opened.start + 1})` : ''}`, text, t.start);
    return next();
  };

  const orExpr = (): SpecNode => {
    let left = andExpr();
    while (isWord(peek(), 'or')) {
      next();
      const right = andExpr();
      left = { kind: 'logic', op: 'or', left, right, start: left.start, end: right.end };
    }
    return left;
  };
  const andExpr = (): SpecNode => {
    let left = notExpr();
    while (isWord(peek(), 'and')) {
      next();
      const right = notExpr();
      left = { kind: 'logic', op: 'and', left, right, start: left.start, end: right.end };
    }
    return left;
  };
  const notExpr = (): SpecNode => {
    const t = peek();
    if (isWord(t, 'not')) {
      next();
      enter(t);
      const operand = notExpr();
      depth--;
      return { kind: 'not', operand, start: t.start, end: operand.end };
    }
    return comparison();
  };
  const comparison = (): SpecNode => {
    const left = sum();
    const t = peek();
    let node: SpecNode;
    if (t.kind === 'op' && COMPARISONS.has(t.text)) {
      next();
      const right = sum();
      node = { kind: 'compare', op: t.text as ComparisonOp, left, right, start: left.start, end: right.end };
    } else if (isWord(t, 'in')) {
      next();
      const right = sum();
      node = { kind: 'in', left, right, start: left.start, end: right.end };
    } else return left;
    const after = peek();
    if ((after.kind === 'op' && COMPARISONS.has(after.text)) || isWord(after, 'in')) {
      specError(`comparisons cannot be chained; join them with "and", e.g. a < b and b < c`, text, after.start);
    }
    return node;
  };
  const sum = (): SpecNode => {
    let left = product();
    for (let t = peek(); isOp(t, '+') || isOp(t, '-'); t = peek()) {
      next();
      const right = product();
      left = { kind: 'arithmetic', op: t.text as ArithmeticOp, left, right, start: left.start, end: right.end };
    }
    return left;
  };
  const product = (): SpecNode => {
    let left = unary();
    for (let t = peek(); isOp(t, '*') || isOp(t, '/'); t = peek()) {
      next();
      const right = unary();
      left = { kind: 'arithmetic', op: t.text as ArithmeticOp, left, right, start: left.start, end: right.end };
    }
    return left;
  };
  const unary = (): SpecNode => {
    const t = peek();
    if (isOp(t, '-')) {
      next();
      enter(t);
      const operand = unary();
      depth--;
      if (operand.kind === 'number') return { kind: 'number', value: operand.value === 0 ? 0 : -operand.value, start: t.start, end: operand.end };
      return { kind: 'negate', operand, start: t.start, end: operand.end };
    }
    return primary();
  };
  const commaList = (close: string, opened: SpecToken): SpecNode[] => {
    const items: SpecNode[] = [];
    if (isOp(peek(), close)) return items;
    for (;;) {
      items.push(orExpr());
      if (isOp(peek(), ',')) {
        next();
        continue;
      }
      expect(close, `"," or "${close}"`, opened);
      k--; // leave the closing token for the caller
      return items;
    }
  };
  const primary = (): SpecNode => {
    const t = next();
    if (t.kind === 'number') return { kind: 'number', value: t.value as number, start: t.start, end: t.end };
    if (t.kind === 'string') return { kind: 'string', value: t.value as string, start: t.start, end: t.end };
    if (isOp(t, '(')) {
      enter(t);
      if (isOp(peek(), ')')) specError('empty parentheses: a value or condition is missing', text, peek().start);
      const inner = orExpr();
      const close = expect(')', '")"', t);
      depth--;
      return { ...inner, start: t.start, end: close.end };
    }
    if (isOp(t, '[')) {
      enter(t);
      const items = commaList(']', t);
      const close = next();
      depth--;
      return { kind: 'list', items, start: t.start, end: close.end };
    }
    if (t.kind === 'name') {
      if (t.text === 'true' || t.text === 'false') return { kind: 'boolean', value: t.text === 'true', start: t.start, end: t.end };
      if (KEYWORDS.has(t.text)) specError(`"${t.text}" needs a value before it`, text, t.start);
      if (FUNCTIONS.has(t.text) && isOp(peek(), '(')) {
        const open = next();
        enter(open);
        const args = commaList(')', open);
        const close = next();
        depth--;
        return { kind: 'call', name: t.text as SpecFunction, args, start: t.start, end: close.end };
      }
      const path: (string | number)[] = [t.text];
      const steps = [t.start];
      let end = t.end;
      for (;;) {
        const d = peek();
        if (isOp(d, '.')) {
          next();
          const name = next();
          if (name.kind !== 'name') specError(`expected a field name after "." but found ${describe(name)}`, text, name.start);
          path.push(name.text);
          steps.push(name.start);
          end = name.end;
        } else if (isOp(d, '[')) {
          next();
          const index = next();
          if (index.kind !== 'number' || !Number.isInteger(index.value) || (index.value as number) < 0) {
            specError(`a list position is a whole number from 0, e.g. estimates[0]; found ${describe(index)}`, text, index.start);
          }
          path.push(index.value as number);
          steps.push(index.start);
          end = expect(']', '"]"', d).end;
        } else break;
      }
      return { kind: 'field', path, steps, start: t.start, end };
    }
    if (t.kind === 'end') specError('the expression ends where a value was expected', text, t.start);
    specError(`expected a number, a text in quotes, a field name or "(" but found ${describe(t)}`, text, t.start);
  };

  if (peek().kind === 'end') specError('the spec is empty; write a condition such as best.high < 0', text, 0);
  const tree = orExpr();
  const rest = peek();
  if (rest.kind !== 'end') {
    const hint = rest.kind === 'name' || rest.kind === 'number' || rest.kind === 'string' ? '; join conditions with "and" or "or"' : '';
    specError(`unexpected ${describe(rest)} after a complete condition${hint}`, text, rest.start);
  }
  return tree;
}
