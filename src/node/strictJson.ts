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
 * @throws IonheatError `INVALID_DATA` naming the file and the line
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
 * ```
 */
export function parseJsonStrict(text: string, label: string): unknown {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    // JSON.parse quotes a piece of the text in its message: keep the message on one line and short.
    const reason = (e instanceof Error ? e.message : String(e)).replace(/\s+/g, ' ');
    throw new IonheatError('INVALID_DATA', `${label}: not valid JSON (${reason.length > 160 ? `${reason.slice(0, 160)}…` : reason})`, { field: label });
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
