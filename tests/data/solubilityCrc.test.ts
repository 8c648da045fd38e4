// Every solubility curve that says it was checked against the CRC table is compared, point by point,
// with the open transcription of that table kept in tests/reference/crc-solubility.json (CRC Handbook,
// 98th ed., 'Aqueous solubility of inorganic compounds at various temperatures', mass percent w;
// github.com/chicolucio/solutions, commit 9bd5e07). Our curves hold r = 100w/(100 − w) g per 100 g water.
import { describe, expect, it } from 'vitest';
import crc from '../reference/crc-solubility.json';
import solubility from '../../data/solubility.json';

// The table file itself: the running library carries the records without their notes and checks.
const records = solubility.records as { formula: string; fromMemory: boolean; source: string; checkedAgainst?: string; note?: string; points: { t: number; value: number }[] }[];
const table = crc.salts as Record<string, Record<string, number>>;
/** The CRC file writes sodium acetate as NaC2H3O2. */
const crcName = (formula: string): string => (formula === 'NaCH3COO' ? 'NaC2H3O2' : formula);
/** Mass percent is given to 3–4 significant digits; r = 100w/(100 − w) amplifies its rounding by 1/(1 − w) ≤ 10. */
const RELATIVE_TOLERANCE = 0.003;

describe('solubility.json against the CRC transcription', () => {
  const checked = records.filter((r) => r.checkedAgainst !== undefined);

  it('marks at least 60 curves as checked, each not from memory and citing the CRC table', () => {
    expect(checked.length).toBeGreaterThanOrEqual(60);
    for (const r of checked) {
      expect(r.fromMemory, r.formula).toBe(false);
      expect(r.source, r.formula).toBe('crcSolubility');
      expect(r.checkedAgainst).toContain('crc-solubility.json');
    }
  });

  it('matches every point of a checked curve within 0.3 %', () => {
    for (const r of checked) {
      const row = table[crcName(r.formula)];
      expect(row, r.formula).toBeDefined();
      for (const p of r.points) {
        const w = row![String(p.t)];
        expect(w, `${r.formula} at ${p.t} °C`).toBeDefined();
        const expected = (100 * w!) / (100 - w!);
        expect(Math.abs(p.value - expected) / expected, `${r.formula} at ${p.t} °C: ${p.value} against ${expected.toFixed(3)}`).toBeLessThanOrEqual(RELATIVE_TOLERANCE);
      }
    }
  });

  it('explains on the record where a curve from another source differs from the CRC row (KH2PO4, up to 4.6 % at 0 °C)', () => {
    const kh2po4 = records.find((r) => r.formula === 'KH2PO4')!;
    expect(kh2po4.source).toBe('vogel1963Phosphates');
    expect(kh2po4.note).toContain('4.6 %');
    const w0 = table.KH2PO4!['0']!;
    expect(Math.abs(kh2po4.points[0]!.value / ((100 * w0) / (100 - w0)) - 1)).toBeLessThanOrEqual(0.047);
  });
});
