import { IonheatError } from '../error.js';

/**
 * JSON.parse that also rejects what JSON.parse lets through silently: a key
 * repeated in one object (the last would win) and the keys `__proto__`,
 * `constructor` and `prototype`, which could reach object prototypes in code
 * that copies the result carelessly.
 *
 * The check is one linear scan over the text (strings skipped by their
 * escapes), so a crafted file cannot make it slow.
 *
 * @param text - the file's content
 * @param label - the file name, for messages
 * @throws IonheatError `INVALID_DATA` naming the file and the line (and for a syntax error the column, counted in
 *   characters from 1)
 * @see ECMA-404, The JSON Data Interchange Syntax, 2nd ed. (2017), and RFC 8259 §4 ("the names within an object
 *   SHOULD be unique"), which this makes a must.
 *
 * @example
 * ```ts
 * parseJsonStrict('{"a": 1, "b": [2, 3]}', 'ok.json'); // { a: 1, b: [2, 3] }
 * let error;
 * try { parseJsonStrict('{\n"a": 1,\n"a": 2\n}', 'twice.json'); } catch (e) { error = e; }
 * error.message; // 'twice.json, line 3: the key "a" appears twice in one object'
 * try { parseJsonStrict('{"__proto__": {}}', 'proto.json'); } catch (e) { error = e; }
 * error.field; // '__proto__'
 * try { parseJsonStrict('[\n  {"formula": "KNO3"},\n  {"formula": "NaCl",}\n]', 'list.json'); } catch (e) { error = e; }
 * error.message; // 'list.json: not valid JSON at line 3, column 22 (expected a quoted key)'
 * ```
 */
export function parseJsonStrict(text: string, label: string): unknown {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    // JSON.parse names a byte offset at best: find the first fault again, to say its line and column.
    const fault = firstSyntaxFault(text);
    const { line, column } = lineAndColumn(text, fault.at);
    throw new IonheatError('INVALID_DATA', `${label}: not valid JSON at line ${line}, column ${column} (${fault.problem})`, { field: label, position: fault.at });
  }
  // Walk the text once, tracking the keys of each open object.
  const stack: (Set<string> | null)[] = [];
  let i = 0;
  let expectKey = false;
  let line = 1;
  while (i < text.length) {
    const c = text[i]!;
    if (c === '\n') line++;
    if (c === '{') {
      stack.push(new Set());
      expectKey = true;
    } else if (c === '[') {
      stack.push(null);
      expectKey = false;
    } else if (c === '}' || c === ']') {
      stack.pop();
      expectKey = false;
    } else if (c === ',') {
      expectKey = stack[stack.length - 1] !== null && stack.length > 0;
    } else if (c === '"') {
      let j = i + 1;
      while (j < text.length && text[j] !== '"') j += text[j] === '\\' ? 2 : 1;
      if (expectKey) {
        const key = JSON.parse(text.slice(i, j + 1)) as string;
        const keys = stack[stack.length - 1];
        if (key === '__proto__' || key === 'constructor' || key === 'prototype') {
          throw new IonheatError('INVALID_DATA', `${label}, line ${line}: the key "${key}" is not allowed`, { field: key });
        }
        if (keys?.has(key)) throw new IonheatError('INVALID_DATA', `${label}, line ${line}: the key "${key}" appears twice in one object`, { field: key });
        keys?.add(key);
        expectKey = false;
      }
      i = j;
    }
    i++;
  }
  return value;
}

/** Line and column (both from 1, the column in UTF-16 units as editors count most characters) of an offset. */
function lineAndColumn(text: string, at: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < at && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: at - lineStart + 1 };
}

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;

/**
 * The first place where `text` is not JSON (ECMA-404), and what was expected
 * there. Used only after JSON.parse has refused the text; one linear scan.
 */
function firstSyntaxFault(text: string): { at: number; problem: string } {
  const open: string[] = [];
  let state: 'value' | 'firstValue' | 'key' | 'firstKey' | 'colon' | 'after' = 'value';
  let i = 0;
  const n = text.length;
  for (;;) {
    while (i < n && (text[i] === ' ' || text[i] === '\t' || text[i] === '\n' || text[i] === '\r')) i++;
    if (i >= n) {
      if (state === 'after' && open.length === 0) return { at: n, problem: 'no fault found' };
      return { at: n, problem: open.length > 0 ? `the text ends with ${open.length} bracket${open.length === 1 ? '' : 's'} still open` : 'the text ends where a value should be' };
    }
    const c = text[i]!;
    if (state === 'after') {
      const top = open[open.length - 1];
      if (top === undefined) return { at: i, problem: 'more text after the end of the JSON value' };
      if (c === ',') state = top === '{' ? 'key' : 'value';
      else if ((c === '}' && top === '{') || (c === ']' && top === '[')) open.pop();
      else return { at: i, problem: `expected "," or "${top === '{' ? '}' : ']'}"` };
      i++;
      continue;
    }
    if (state === 'colon') {
      if (c !== ':') return { at: i, problem: 'expected ":" after the key' };
      state = 'value';
      i++;
      continue;
    }
    if (state === 'key' || state === 'firstKey') {
      if (c === '}' && state === 'firstKey') {
        open.pop();
        state = 'after';
        i++;
        continue;
      }
      if (c !== '"') return { at: i, problem: 'expected a quoted key' };
      const end = stringEnd(text, i);
      if (typeof end !== 'number') return end;
      i = end;
      state = 'colon';
      continue;
    }
    // A value is expected.
    if (c === ']' && state === 'firstValue') {
      open.pop();
      state = 'after';
      i++;
      continue;
    }
    if (c === '{' || c === '[') {
      open.push(c);
      state = c === '{' ? 'firstKey' : 'firstValue';
      i++;
      continue;
    }
    if (c === '"') {
      const end = stringEnd(text, i);
      if (typeof end !== 'number') return end;
      i = end;
    } else if (text.startsWith('true', i) || text.startsWith('null', i)) i += 4;
    else if (text.startsWith('false', i)) i += 5;
    else {
      NUMBER.lastIndex = i;
      if (!NUMBER.test(text)) return { at: i, problem: c === "'" ? 'text must be in double quotes' : 'expected a value: a number, text in double quotes, true, false, null, [ or {' };
      i = NUMBER.lastIndex;
    }
    state = 'after';
  }
}

/** The index after the string that opens at `start`, or the fault inside it. */
function stringEnd(text: string, start: number): number | { at: number; problem: string } {
  for (let i = start + 1; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) return i + 1;
    if (c < 0x20) return { at: i, problem: c === 10 ? 'a line break inside text in quotes (write it as \\n)' : 'a control character inside text in quotes' };
    if (c === 92) {
      const e = text[i + 1];
      if (e === 'u') {
        if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) return { at: i, problem: 'a \\u escape needs four hexadecimal digits' };
        i += 5;
      } else if (e !== undefined && '"\\/bfnrt'.includes(e)) i++;
      else return { at: i, problem: 'an unknown escape after a backslash' };
    }
  }
  return { at: start, problem: 'text in quotes is not closed' };
}
