/**
 * The tokenizer of the specification language of `screen` (see
 * {@link compileSpec}): numbers, quoted strings, names, and the operators
 * `< <= > >= == != + - * / ( ) [ ] , .`. One pass over the text, no regular
 * expression, bounded by {@link SPEC_MAX_LENGTH}.
 *
 * @module
 */
import { IonheatError } from '../error.js';

/** Longest specification accepted, in characters. */
export const SPEC_MAX_LENGTH = 1000;

export type SpecTokenKind = 'number' | 'string' | 'name' | 'op' | 'end';

export interface SpecToken {
  kind: SpecTokenKind;
  /** The token as written (a string token without its quotes is in `value`). */
  text: string;
  /** Numbers: the value; strings: the unescaped text. */
  value?: number | string;
  /** Zero-based offsets into the expression. */
  start: number;
  end: number;
}

/** Throws the one error of the language: what went wrong, at which column (1-based), in the user's words. */
export function specError(message: string, text: string, position: number): never {
  const column = position + 1;
  const shown = text.length > 60 ? `${text.slice(Math.max(0, position - 30), position + 30)}` : text;
  throw new IonheatError('INVALID_EXPRESSION', `spec, column ${column}: ${message} (in: ${shown})`, { text, position, field: 'spec' });
}

const isDigit = (c: string | undefined): boolean => c !== undefined && c >= '0' && c <= '9';
const isNameStart = (c: string | undefined): boolean => c !== undefined && ((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || c === '_');
const isNamePart = (c: string | undefined): boolean => isNameStart(c) || isDigit(c);

const TWO_CHAR = new Set(['<=', '>=', '==', '!=']);
const ONE_CHAR = new Set(['<', '>', '+', '-', '*', '/', '(', ')', '[', ']', ',', '.']);

/** Splits a specification into tokens, ending with an `end` token. */
export function tokenizeSpec(text: string): SpecToken[] {
  if (typeof text !== 'string') throw new IonheatError('INVALID_EXPRESSION', 'a spec is a text expression, such as best.high < 0', { field: 'spec' });
  if (text.length > SPEC_MAX_LENGTH) throw new IonheatError('INVALID_EXPRESSION', `spec: an expression is at most ${SPEC_MAX_LENGTH} characters, this one has ${text.length}`, { field: 'spec' });
  const tokens: SpecToken[] = [];
  let i = 0;
  while (i < text.length) {
    const c = text[i]!;
    if (c === ' ' || c === '\t' || c === '\n' || c === '\r') {
      i++;
      continue;
    }
    const start = i;
    if (isDigit(c) || (c === '.' && isDigit(text[i + 1]))) {
      while (isDigit(text[i])) i++;
      if (text[i] === '.' && isDigit(text[i + 1])) {
        i++;
        while (isDigit(text[i])) i++;
      }
      if ((text[i] === 'e' || text[i] === 'E') && (isDigit(text[i + 1]) || ((text[i + 1] === '+' || text[i + 1] === '-') && isDigit(text[i + 2])))) {
        i += 2;
        while (isDigit(text[i])) i++;
      }
      if (isNameStart(text[i])) specError(`"${text.slice(start, i + 1)}" is neither a number nor a name; put a space or an operator between a number and a name`, text, i);
      const value = Number(text.slice(start, i));
      if (!Number.isFinite(value)) specError(`the number ${text.slice(start, i)} is too large`, text, start);
      tokens.push({ kind: 'number', text: text.slice(start, i), value, start, end: i });
      continue;
    }
    if (isNameStart(c)) {
      while (isNamePart(text[i])) i++;
      tokens.push({ kind: 'name', text: text.slice(start, i), start, end: i });
      continue;
    }
    if (c === '"' || c === "'") {
      let value = '';
      i++;
      for (;;) {
        const d = text[i];
        if (d === undefined) specError(`the text begun here has no closing ${c}`, text, start);
        if (d === c) break;
        if (d === '\\') {
          const e = text[i + 1];
          if (e !== '\\' && e !== '"' && e !== "'") specError('only \\\\, \\" and \\\' may follow a backslash in a text', text, i);
          value += e;
          i += 2;
          continue;
        }
        value += d;
        i++;
      }
      i++;
      tokens.push({ kind: 'string', text: text.slice(start, i), value, start, end: i });
      continue;
    }
    const two = text.slice(i, i + 2);
    if (TWO_CHAR.has(two)) {
      tokens.push({ kind: 'op', text: two, start, end: i + 2 });
      i += 2;
      continue;
    }
    if (two === '&&') specError('write "and" to join two conditions', text, i);
    if (two === '||') specError('write "or" for either of two conditions', text, i);
    if (c === '=') specError('write == to test equality (a single = is not an operator)', text, i);
    if (c === '!') specError('write "not" to negate a condition, or != for "differs from"', text, i);
    if (c === '≤' || c === '≥' || c === '≠') specError(`write ${c === '≤' ? '<=' : c === '≥' ? '>=' : '!='} instead of ${c}`, text, i);
    if (ONE_CHAR.has(c)) {
      tokens.push({ kind: 'op', text: c, start, end: i + 1 });
      i++;
      continue;
    }
    specError(`the character "${c}" has no meaning here`, text, i);
  }
  tokens.push({ kind: 'end', text: '', start: text.length, end: text.length });
  return tokens;
}
