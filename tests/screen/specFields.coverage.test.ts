// How the specification language reads the field types of a JSON Schema
// (src/screen/specFields.ts): references into $defs and to the root, type
// lists with null, enumerations and constants, and alternatives of mixed
// kinds (which leave the field's type open). The schema is made up for the
// test; the rules are those of JSON Schema 2020-12 (anyOf, $ref, const, enum).
import { describe, expect, it } from 'vitest';
import { compileSpec } from '../../src/screen/compileSpec.js';

const schema = {
  type: 'object',
  properties: {
    a: { $ref: '#/$defs/num' },
    b: { type: ['string', 'null'], enum: ['x', 'y'] },
    c: { anyOf: [{ type: 'string', const: 'p' }, { type: 'string', const: 'q' }] },
    d: { $ref: '#/$defs/missing' },
    e: { anyOf: [{ type: 'number' }, { type: 'string' }] },
    f: { anyOf: [{ type: 'string', const: 'p' }, { type: 'string' }] },
    self: { $ref: '#' },
  },
  $defs: { num: { type: 'number' } },
};

const message = (text: string): string | undefined => {
  try {
    compileSpec(text, { schema });
    return undefined;
  } catch (e) {
    return (e as Error).message;
  }
};

describe('field types from a JSON Schema', () => {
  it('follows a $ref into $defs', () => {
    expect(message('a > 1')).toBeUndefined();
    expect(message('a == "x"')).toBe('spec, column 1: a is a number and "x" is a text; they can never be equal (in: a == "x")');
  });
  it('reads a nullable enumeration as its values', () => {
    expect(message('b == "x"')).toBeUndefined();
    expect(message('b == "z"')).toBe('spec, column 6: b is one of "x", "y"; "z" can never match (in: b == "z")');
  });
  it('joins the constants of string alternatives into one enumeration', () => {
    expect(message('c == "q"')).toBeUndefined();
    expect(message('c == "r"')).toBe('spec, column 6: c is one of "p", "q"; "r" can never match (in: c == "r")');
  });
  it('leaves open a field whose reference goes nowhere, whose alternatives differ in kind, or that allows any text', () => {
    expect(message('d == 3')).toBeUndefined();
    expect(message('e == "w"')).toBeUndefined();
    expect(message('e > 2')).toBeUndefined();
    expect(message('f == "zz"')).toBeUndefined();
  });
  it('follows a reference to the root', () => {
    expect(message('self.a > 1')).toBeUndefined();
    expect(message('self.a == "x"')).toMatch(/self\.a is a number and "x" is a text/);
  });
  it('the compiled spec then reads rows', () => {
    const spec = compileSpec('a > 1 and b == "x"', { schema });
    expect(spec.test({ a: 2, b: 'x' }).holds).toBe(true);
    expect(spec.test({ a: 0.5, b: 'x' }).holds).toBe(false);
  });
});
