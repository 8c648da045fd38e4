/**
 * The syntax of a written formula, before any chemistry: element symbols with
 * counts, parenthesised groups with counts, and water of crystallization after
 * a dot. Knows nothing of ions; {@link parseSalt} does that.
 *
 * Bounded work: the text is capped at {@link MAX_FORMULA_LENGTH} characters
 * and scanned once, left to right, with an explicit stack capped at
 * {@link MAX_NESTING}; no regular expression runs over user text, so no input
 * can make the scan slower than linear.
 *
 * @module
 */
import { IonheatError } from '../error.js';
import { plainDigits } from '../notation/formula.js';

/** Longest formula accepted, in characters (the longest real salt formula is far shorter). */
export const MAX_FORMULA_LENGTH = 200;
/** Deepest parenthesis nesting accepted. */
export const MAX_NESTING = 6;
/** Largest count accepted after a symbol or group. */
export const MAX_COUNT = 999;

/** One element symbol with its count, or a parenthesised group with its count. */
export type FormulaUnit =
  | { kind: 'element'; symbol: string; count: number; start: number; end: number }
  | { kind: 'group'; units: FormulaUnit[]; count: number; start: number; end: number };

export interface FormulaSyntax {
  /** The formula after normalisation (subscript digits made plain, separators unified). */
  text: string;
  /** Units of the part before the first dot. */
  units: FormulaUnit[];
  /** The part before the first dot, as written. */
  mainText: string;
  /** Moles of water of crystallization per formula unit. */
  water: number;
}

/** Characters that separate water of crystallization: middle dot, bullet, dot operator, full stop, asterisk. */
const HYDRATE_SEPARATORS = new Set(['·', '•', '⋅', '∙', '.', '*']);

const isUpper = (c: string): boolean => c >= 'A' && c <= 'Z';
const isLower = (c: string): boolean => c >= 'a' && c <= 'z';
const isDigit = (c: string): boolean => c >= '0' && c <= '9';

/** Replaces subscript digits with plain ones and trims white space. */
export function normalizeFormulaText(raw: string): string {
  return plainDigits(raw.trim());
}

function fail(code: 'UNEXPECTED_CHARACTER' | 'UNMATCHED_PARENTHESIS' | 'NESTING_TOO_DEEP' | 'BAD_COUNT' | 'EMPTY_FORMULA', message: string, text: string, position: number): never {
  throw new IonheatError(code, message, { text, position });
}

/** Reads a run of digits at `i`; returns the count and the index after it. */
function readCount(text: string, i: number, to: number): { count: number; next: number } {
  let j = i;
  while (j < to && isDigit(text[j]!)) j++;
  if (j === i) return { count: 1, next: i };
  const digits = text.slice(i, j);
  if (digits.length > 3 || Number(digits) > MAX_COUNT) fail('BAD_COUNT', `the count ${digits.length > 12 ? digits.slice(0, 12) + '…' : digits} at position ${i + 1} is too large (at most ${MAX_COUNT})`, text, i);
  const count = Number(digits);
  if (count === 0) fail('BAD_COUNT', `a count of zero at position ${i + 1} means the atom or group is absent; leave it out`, text, i);
  return { count, next: j };
}

/**
 * Splits a written formula into its units and its water of crystallization.
 *
 * Accepts element symbols (a capital letter, then an optional lower-case
 * letter), counts up to 999, parentheses or square brackets, subscript digits,
 * and a hydrate part after `·`, `•`, `.` or `*` such as `12H2O` or `0.5H2O`.
 *
 * @throws IonheatError with codes `EMPTY_FORMULA`, `FORMULA_TOO_LONG`,
 *   `UNEXPECTED_CHARACTER`, `UNMATCHED_PARENTHESIS`, `NESTING_TOO_DEEP`, `BAD_COUNT`
 * @example
 * ```ts
 * const s = readFormulaSyntax('KAl(SO4)2·12H2O');
 * s.units.length; // 3  (K, Al, (SO4)2)
 * s.water; // 12
 * ```
 */
export function readFormulaSyntax(raw: string): FormulaSyntax {
  if (typeof raw !== 'string') throw new IonheatError('INVALID_ARGUMENT', `a formula must be text, got ${raw === null ? 'null' : typeof raw}`, {});
  if (raw.length > MAX_FORMULA_LENGTH * 4) {
    throw new IonheatError('FORMULA_TOO_LONG', `the formula is ${raw.length} characters long; at most ${MAX_FORMULA_LENGTH} are accepted`, { text: raw.slice(0, 40) + '…', position: MAX_FORMULA_LENGTH });
  }
  const text = normalizeFormulaText(raw);
  if (text.length === 0) fail('EMPTY_FORMULA', 'the formula is empty', text, 0);
  if (text.length > MAX_FORMULA_LENGTH) {
    throw new IonheatError('FORMULA_TOO_LONG', `the formula is ${text.length} characters long; at most ${MAX_FORMULA_LENGTH} are accepted`, { text: text.slice(0, 40) + '…', position: MAX_FORMULA_LENGTH });
  }
  let split = -1;
  for (let i = 0; i < text.length; i++) {
    if (HYDRATE_SEPARATORS.has(text[i]!)) {
      split = i;
      break;
    }
  }
  const mainText = split < 0 ? text : text.slice(0, split);
  if (mainText.length === 0) fail('EMPTY_FORMULA', 'nothing stands before the dot of the hydrate', text, 0);
  const units = readUnits(text, 0, mainText.length);
  const water = split < 0 ? 0 : readWater(text, split);
  return { text, units, mainText, water };
}

/** Parses text[from, to) into units with an explicit stack (no recursion, depth capped). */
function readUnits(text: string, from: number, to: number): FormulaUnit[] {
  type Frame = { units: FormulaUnit[]; open: string; start: number };
  const stack: Frame[] = [{ units: [], open: '', start: from }];
  let i = from;
  while (i < to) {
    const c = text[i]!;
    const top = stack[stack.length - 1]!;
    if (isUpper(c)) {
      const symbolEnd = i + 1 < to && isLower(text[i + 1]!) ? i + 2 : i + 1;
      const symbol = text.slice(i, symbolEnd);
      const { count, next } = readCount(text, symbolEnd, to);
      top.units.push({ kind: 'element', symbol, count, start: i, end: next });
      i = next;
    } else if (c === '(' || c === '[') {
      if (stack.length > MAX_NESTING) fail('NESTING_TOO_DEEP', `parentheses are nested more than ${MAX_NESTING} deep at position ${i + 1}`, text, i);
      stack.push({ units: [], open: c, start: i });
      i++;
    } else if (c === ')' || c === ']') {
      const expected = c === ')' ? '(' : '[';
      if (stack.length === 1 || top.open !== expected) {
        fail('UNMATCHED_PARENTHESIS', `the "${c}" at position ${i + 1} closes nothing${stack.length > 1 ? ` (the "${top.open}" at position ${top.start + 1} is still open)` : ''}`, text, i);
      }
      if (top.units.length === 0) fail('UNMATCHED_PARENTHESIS', `the parentheses at position ${top.start + 1} enclose nothing`, text, top.start);
      stack.pop();
      const { count, next } = readCount(text, i + 1, to);
      stack[stack.length - 1]!.units.push({ kind: 'group', units: top.units, count, start: top.start, end: next });
      i = next;
    } else if (isDigit(c)) {
      fail('UNEXPECTED_CHARACTER', i === from ? `a formula cannot start with a count ("${c}" at position ${i + 1}); write one formula unit` : `the count at position ${i + 1} follows nothing it could multiply`, text, i);
    } else if (isLower(c)) {
      fail('UNEXPECTED_CHARACTER', `element symbols start with a capital letter ("${c}" at position ${i + 1})`, text, i);
    } else if (c === '+' || c === '-' || c === '−' || c === '^') {
      fail('UNEXPECTED_CHARACTER', `charges are not written in a salt formula ("${c}" at position ${i + 1}); write the neutral salt, e.g. NaCl`, text, i);
    } else {
      fail('UNEXPECTED_CHARACTER', `unexpected character "${c}" at position ${i + 1}`, text, i);
    }
  }
  if (stack.length > 1) {
    const open = stack[stack.length - 1]!;
    fail('UNMATCHED_PARENTHESIS', `the "${open.open}" at position ${open.start + 1} is never closed`, text, open.start);
  }
  return stack[0]!.units;
}

/** Reads one or more `·nH2O` parts starting at the separator at `at`. */
function readWater(text: string, at: number): number {
  let total = 0;
  let i = at;
  while (i < text.length) {
    if (!HYDRATE_SEPARATORS.has(text[i]!)) fail('UNEXPECTED_CHARACTER', `expected a dot before the water at position ${i + 1}`, text, i);
    i++;
    const start = i;
    while (i < text.length && (isDigit(text[i]!) || text[i] === '.')) i++;
    const numberText = text.slice(start, i);
    let n = 1;
    if (numberText.length > 0) {
      n = Number(numberText);
      if (!Number.isFinite(n) || numberText.length > 6 || numberText.split('.').length > 2) fail('BAD_COUNT', `"${numberText}" at position ${start + 1} is not a count of water molecules`, text, start);
      if (n <= 0) fail('BAD_COUNT', `a hydrate needs a positive count of water, got ${numberText} at position ${start + 1}`, text, start);
      if (n > 100) fail('BAD_COUNT', `${numberText} waters of crystallization at position ${start + 1} is more than any real hydrate holds (at most 100)`, text, start);
    }
    if (text.slice(i, i + 3) !== 'H2O') {
      fail('UNEXPECTED_CHARACTER', `only water of crystallization (H2O) may follow the dot, at position ${i + 1}`, text, i);
    }
    i += 3;
    total += n;
  }
  return total;
}

/** Element counts of a list of units, groups multiplied out. */
export function unitComposition(units: readonly FormulaUnit[], into: Map<string, number> = new Map(), factor = 1): Map<string, number> {
  for (const unit of units) {
    if (unit.kind === 'element') into.set(unit.symbol, (into.get(unit.symbol) ?? 0) + unit.count * factor);
    else unitComposition(unit.units, into, factor * unit.count);
  }
  return into;
}
