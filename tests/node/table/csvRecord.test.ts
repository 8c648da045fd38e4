// csvRecord must write exactly what csv-stringify (default options) writes,
// so that the screen's CSV output did not change when it stopped using the
// library for its records.
import fc from 'fast-check';
import { stringify } from 'csv-stringify/sync';
import { describe, expect, it } from 'vitest';
import { csvRecord } from '../../../src/node/table/csvRecord.js';

describe('csvRecord', () => {
  it('quotes cells with a quote, comma or line break (RFC 4180), as csv-stringify does', () => {
    const cells = ['NaCl', '', '-3.9', 'a, b', 'say "hi"', 'two\nlines', 'cr\r', "'=1+1", ' spaced '];
    expect(csvRecord(cells)).toBe(stringify([cells]));
    expect(csvRecord(cells)).toBe('NaCl,,-3.9,"a, b","say ""hi""","two\nlines","cr\r",\'=1+1, spaced \n');
  });
  it('agrees with csv-stringify on any record of text cells', () => {
    const cell = fc.oneof(fc.string({ maxLength: 12 }), fc.stringMatching(/^[a-z ,"\n\r';=+-]{0,10}$/), fc.string({ unit: 'grapheme', maxLength: 6 }));
    fc.assert(
      fc.property(fc.array(cell, { minLength: 1, maxLength: 8 }), (cells) => {
        expect(csvRecord(cells)).toBe(stringify([cells]));
      }),
      { numRuns: 3000 },
    );
  });
});
