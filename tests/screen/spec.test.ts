// The specification language of `screen`: a table of expressions with the
// results they must give on one fixed row, and malformed expressions that
// must be refused with a clear error (and a column) before any row is read.
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { compileSpec, isIonheatError } from '../../src/index.js';
import { screenSpecSchema } from '../../src/screen/screenOutputJsonSchema.js';
import { SPEC_MAX_LENGTH } from '../../src/screen/specTokenize.js';
import { parseSpec } from '../../src/screen/specParse.js';

// A row shaped like the JSON output (numbers invented for the grammar test, not chemistry).
const row = {
  line: 4,
  status: 'computed',
  input: { formula: 'CaCl2', pricePerKg: 1.5, note: 'a "quoted" note' },
  formula: 'CaCl2',
  best: { quantity: 'enthalpy of solution', value: -81.3, u: 1.5, low: -84.2, high: -78.4, unit: 'kJ/mol', basis: 'cycle', method: 'formation-enthalpies', sources: ['wagman1982'], notes: [] },
  estimates: [{ quantity: 'enthalpy of solution', value: -81.3, u: 1.5, low: -84.2, high: -78.4, unit: 'kJ/mol', basis: 'cycle', method: 'formation-enthalpies', sources: [], notes: [] }],
  verdict: 'exothermic',
  probabilityEndothermic: 0,
  perGram: { salt: { quantity: 'q', value: -732.5, u: 13.5, low: -759, high: -706, unit: 'J/g', basis: 'cycle', method: 'm', sources: [], notes: [] } },
  hazards: ['irritant'],
  suitability: 'suitable',
};

const schema = screenSpecSchema();
const holds = (text: string) => compileSpec(text, { schema }).test(row);

describe('spec language: what expressions give', () => {
  const table: [string, boolean][] = [
    ['best.high < 0', true],
    ['best.high <= -78.4', true],
    ['best.high < -78.4', false],
    ['best.low > -90 and best.high < -70', true],
    ['best.low > -80 or best.high > 0', false],
    ['best.low > -80 or verdict == "exothermic"', true],
    ['not (verdict == "endothermic")', true],
    ['not not (best.value < 0)', true],
    ['verdict != "undetermined"', true],
    ["verdict == 'exothermic'", true],
    ['"irritant" in hazards', true],
    ['"oxidizer" in hazards', false],
    ['not ("oxidizer" in hazards)', true],
    ['verdict in ["exothermic", "undetermined"]', true],
    ['best.basis in ["measured"]', false],
    ['estimates[0].basis == "cycle"', true],
    ['abs(best.value) > 80', true],
    ['max(best.low, -100) == best.low', true],
    ['min(1, 2, 3) == 1', true],
    ['best.high - best.low > 5', true],
    ['(best.high - best.low) / 2 < 3', true],
    ['best.value * -1 == 81.3', true],
    ['-best.value > 81', true],
    ['2 + 3 * 4 == 14', true],
    ['(2 + 3) * 4 == 20', true],
    ['1e2 == 100', true],
    ['.5 == 0.5', true],
    ['true', true],
    ['false or true and false', false],
    ['line == 4', true],
    ['input.pricePerKg < 2', true],
    ['input.note == "a \\"quoted\\" note"', true],
    ['has(costPerKJ)', false],
    ['not has(costPerKJ) or costPerKJ.high < 0.01', true],
    ['has(input.pricePerKg)', true],
    ['probabilityEndothermic == 0', true],
    ['perGram.salt.value < -700', true],
    ['suitability == "suitable"', true],
  ];
  for (const [text, expected] of table) {
    it(`${text} → ${expected}`, () => expect(holds(text).holds).toBe(expected));
  }

  it('says why a spec does not hold', () => {
    expect(holds('best.high > 0').reason).toBe('best.high is -78.4, not > 0');
    expect(holds('best.low > -80 or best.high > 0').reason).toBe('best.low is -84.2, not > -80, and best.high is -78.4, not > 0');
    expect(holds('verdict == "exothermic" and "oxidizer" in hazards').reason).toBe('"oxidizer" in hazards does not hold');
    expect(holds('costPerKJ.value < 1').reason).toBe('costPerKJ.value is absent for this row');
    expect(holds('has(costPerKJ)').reason).toBe('the row has no costPerKJ');
  });

  it('fails a row, with the reason, when a field the schema leaves open holds the wrong type', () => {
    const loose = compileSpec('fill.finalTemperature.high <= 5', { schema: null });
    expect(loose.test({ fill: { finalTemperature: { high: 'cold' } } })).toEqual({ holds: false, reason: 'fill.finalTemperature.high is "cold", not a number' });
    expect(loose.test({ fill: { finalTemperature: { high: 4.2 } } }).holds).toBe(true);
  });

  it('stops "and"/"or" as soon as the answer is known', () => {
    expect(holds('false and costPerKJ.value < 1').holds).toBe(false);
    expect(holds('true or costPerKJ.value < 1').holds).toBe(true);
  });

  it('lists the fields it reads', () => {
    expect(compileSpec('best.high < 0 and "toxic" in hazards', { schema }).fields).toEqual(['best.high', 'hazards']);
  });

  it('gives no NaN or Infinity: a division by zero fails the row, with the reason', () => {
    const r = holds('best.value / 0 < 1');
    expect(r.holds).toBe(false);
    expect(r.reason).toMatch(/no finite value/);
  });
});

describe('spec language: malformed expressions get a clear error, never an evaluation', () => {
  const bad: [string, number, RegExp][] = [
    ['', 1, /empty/],
    ['   ', 1, /empty/],
    ['best.high <', 12, /ends where a value was expected/],
    ['best.high = 0', 11, /write ==/],
    ['best.high < 0 && verdict == "x"', 15, /write "and"/],
    ['best.high < 0 || true', 15, /write "or"/],
    ['!true', 1, /write "not"/],
    ['best.high ≤ 0', 11, /write <= instead of ≤/],
    ['(best.high < 0', 15, /expected "\)".*column 1/],
    ['best.high < 0)', 14, /unexpected "\)"/],
    ['best.high < 0 best.low', 15, /join conditions with "and" or "or"/],
    ['1 < 2 < 3', 7, /cannot be chained/],
    ['best.hihg < 0', 6, /no field "hihg"; did you mean "high"\?/],
    ['bestt.high < 0', 1, /no field "bestt"; did you mean "best"\?/],
    ['best < 0', 1, /group of fields/],
    ['best.high', 1, /a spec is a condition/],
    ['best.high < "cold"', 13, /compares numbers/],
    ['verdict == 3', 1, /can never be equal/],
    ['verdict == "endo"', 12, /can never match/],
    ['"poison" in hazards', 1, /can only hold/],
    ['"x" in verdict', 8, /looks for a value in a list/],
    ['hazards == "toxic"', 1, /test membership with "in"/],
    ['not best.value', 5, /"not" applies to a condition/],
    ['best.value and true', 1, /"and" joins two conditions/],
    ['-verdict == 1', 2, /minus sign applies to a number/],
    ['abs(1, 2) < 3', 1, /abs\(…\) takes one number/],
    ['min() < 1', 1, /at least one number/],
    ['has(1)', 1, /has\(…\) takes one field path/],
    ['estimates[x].value > 0', 11, /whole number/],
    ['estimates[-1].value > 0', 11, /whole number/],
    ['verdict[0] == "e"', 9, /not a list/],
    ['best.high.x < 0', 11, /has no field "x"/],
    ['"unclosed < 0', 1, /no closing "/],
    ['"bad \\n escape" == verdict', 6, /backslash/],
    ['5kJ < 3', 2, /neither a number nor a name/],
    ['best.high # 0', 11, /has no meaning/],
    ['rank <= 3', 1, /rank is known only after every row/],
    ['spec.holds', 1, /cannot read its own outcome/],
    ['()', 2, /empty parentheses/],
    ['and', 1, /needs a value before it/],
    ['best.', 6, /expected a field name after "."/],
    ['[1, "a"] == 1', 1, /one type/],
  ];
  for (const [text, column, message] of bad) {
    it(JSON.stringify(text), () => {
      let error: unknown;
      try {
        compileSpec(text, { schema });
      } catch (e) {
        error = e;
      }
      expect(isIonheatError(error), 'an IonheatError').toBe(true);
      const e = error as { code: string; message: string; position?: number };
      expect(e.code).toBe('INVALID_EXPRESSION');
      expect(e.message).toMatch(message);
      expect(e.message).toContain(`column ${column}:`);
      expect(e.position).toBe(column - 1);
    });
  }

  it('refuses a field the run will not have, naming why', () => {
    expect(() => compileSpec('fill.finalTemperature.high <= 5', { schema, unavailable: { fill: 'no standard fill was given' } })).toThrow(/reads fill.finalTemperature.high, but no standard fill was given/);
  });

  it('bounds its work: length and nesting are limited', () => {
    expect(() => compileSpec('1 == 1 and '.repeat(100) + 'true')).toThrow(new RegExp(`at most ${SPEC_MAX_LENGTH} characters`));
    const deep = '('.repeat(40) + 'true' + ')'.repeat(40);
    expect(() => parseSpec(deep)).toThrow(/nests deeper than 32/);
    expect(() => parseSpec('not '.repeat(40) + 'true')).toThrow(/nests deeper than 32/);
    expect(() => parseSpec('-'.repeat(40) + '1 < 0')).toThrow(/nests deeper than 32/);
    // 31 levels are fine.
    expect(parseSpec('('.repeat(31) + 'true' + ')'.repeat(31)).kind).toBe('boolean');
  });

  it('treats JavaScript as text to refuse, not code to run', () => {
    for (const text of ['constructor.constructor("return process")()', 'process.exit(1)', 'this.x == 1', 'globalThis < 1', '__proto__.x == 1', 'best["high"] < 0']) {
      expect(() => compileSpec(text, { schema }), text).toThrow(/spec, column/);
    }
    // Without a schema, unknown fields are read from the row as data only.
    expect(compileSpec('constructor == "x"', { schema: null }).test({}).reason).toBe('constructor is absent for this row');
    expect(compileSpec('__proto__ == "x"', { schema: null }).test({}).reason).toBe('__proto__ is absent for this row');
    // With the default schema (the output rows), they are refused outright.
    expect(() => compileSpec('constructor == "x"')).toThrow(/a row has no field "constructor"/);
  });

  it('the language code uses no eval and no Function constructor', () => {
    const dir = join(import.meta.dirname, '..', '..', 'src', 'screen');
    for (const name of readdirSync(dir).filter((n) => n.startsWith('spec') || n === 'compileSpec.ts')) {
      const code = readFileSync(join(dir, name), 'utf8').replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, '');
      expect(code, name).not.toMatch(/\beval\s*\(|new\s+Function|\bFunction\s*\(/);
    }
  });
});
