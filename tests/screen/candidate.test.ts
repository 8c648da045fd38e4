import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isIonheatError } from '../../src/index.js';
import { readCandidate } from '../../src/screen/candidate.js';
import { candidateInputSchema } from '../../src/screen/candidate.js';

describe('readCandidate', () => {
  it('reads CSV cells: decimal text for numbers, empty cells absent, text trimmed (notes kept as written)', () => {
    expect(readCandidate({ formula: ' KNO3 ', pricePerKg: '2.50', measuredEnthalpy: '−3.5e1', note: '  as written ', solubility: '' }).input).toEqual({ formula: 'KNO3', pricePerKg: 2.5, measuredEnthalpy: -35, note: '  as written ' });
    expect(readCandidate('NaCl').input).toEqual({ formula: 'NaCl' });
  });

  it('names the field and the problem', () => {
    const cases: [unknown, RegExp][] = [
      [{ formula: 'KCl', pricePerKg: '1,5' }, /^pricePerKg: "1,5" is not a number$/],
      [{ formula: 'KCl', pricePerKg: '0x10' }, /not a number/],
      [{ formula: 'KCl', pricePerKg: 'Infinity' }, /not a number/],
      [{ formula: 'KCl', pricePerKg: -1 }, /^pricePerKg: must not be negative$/],
      [{ formula: 'KCl', solubility: 0 }, /^solubility: must be greater than zero$/],
      [{ formula: 'KCl', measuredUncertainty: 0.2 }, /measuredUncertainty is given without measuredEnthalpy/],
      [{ formula: 'KCl', colour: 'white' }, /unknown field "colour"/],
      [{ pricePerKg: 1 }, /^no formula given$/],
      [{ formula: 'KCl', measuredEnthalpy: Number.NaN }, /measuredEnthalpy/],
      [{ formula: 'K'.repeat(201) }, /^formula: /],
      [null, /a candidate is a formula or an object/],
      [[1], /got a list/],
    ];
    for (const [raw, message] of cases) {
      try {
        readCandidate(raw as never);
        expect.unreachable(JSON.stringify(raw));
      } catch (e) {
        expect(isIonheatError(e), JSON.stringify(raw)).toBe(true);
        expect((e as Error).message, JSON.stringify(raw)).toMatch(message);
      }
    }
  });

  it('gives the same verdict and the same fields as the zod schema, whatever the input', () => {
    const number = fc.oneof(fc.double(), fc.integer({ min: -5, max: 5 }), fc.constantFrom(0, -0, Number.NaN, Infinity, -Infinity, 1e308));
    const text = (max: number) => fc.string({ maxLength: max });
    const candidate = fc.record(
      {
        formula: fc.oneof(text(5).map((s) => `K${s}`), fc.constant('x'.repeat(201)), fc.integer() as fc.Arbitrary<unknown>),
        measuredEnthalpy: number,
        measuredUncertainty: number,
        solubility: number,
        pricePerKg: number,
        source: fc.oneof(text(3).map((s) => `k${s}`), fc.constant('s'.repeat(81))),
        note: fc.oneof(text(10), fc.constant('n'.repeat(2001))),
        extra: fc.string(),
      },
      { requiredKeys: [] },
    );
    fc.assert(
      fc.property(candidate, (raw) => {
        // Leave out what readCandidate drops before checking (absent, null, empty text) and trim text as it does.
        const fields: Record<string, unknown> = {};
        for (const [k, v] of Object.entries(raw)) if (v !== undefined && v !== null && v !== '') fields[k] = typeof v === 'string' && k !== 'note' ? v.trim() : v;
        const reference = candidateInputSchema.safeParse(fields);
        const referenceOk = reference.success && !(reference.data.measuredUncertainty !== undefined && reference.data.measuredEnthalpy === undefined);
        let ours: ReturnType<typeof readCandidate> | undefined;
        try {
          ours = readCandidate(raw);
        } catch (e) {
          if (!isIonheatError(e)) throw e;
        }
        expect(ours !== undefined).toBe(referenceOk);
        if (ours && reference.success) expect(ours.input).toEqual(reference.data);
      }),
      { numRuns: 3000, seed: 6 },
    );
  });
});
