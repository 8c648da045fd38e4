import { describe, expect, it } from 'vitest';
import { MINUS, formatNumber, withTrueMinus } from '../../src/notation/minus.js';
import { chargeNumber, chargeText, ionText } from '../../src/notation/charge.js';
import { formulaText } from '../../src/notation/formula.js';
import { withUnit } from '../../src/notation/units.js';
import { wrapText } from '../../src/notation/wrapText.js';

describe('notation: one way to write signs, charges, formulas and units', () => {
  it('writes a true minus and signs only where asked', () => {
    expect(formatNumber(-930, { digits: 0 })).toBe(`${MINUS}930`);
    expect(formatNumber(930, { digits: 0, plus: true })).toBe('+930');
    expect(formatNumber(-0.0001, { digits: 1, plus: true })).toBe('0.0');
    expect(formatNumber(0.1 + 0.2)).toBe('0.3');
    expect(withTrueMinus('interval -35 … +72, born-mayer, SO4[2-], x=-1')).toBe('interval −35 … +72, born-mayer, SO4[2-], x=−1');
  });

  it('writes charges one way: superscripts after the formula', () => {
    expect(chargeText(1)).toBe('⁺');
    expect(chargeText(-2)).toBe('²⁻');
    expect(chargeText(0)).toBe('');
    expect(chargeNumber(-2)).toBe('−2');
    expect(chargeNumber(3)).toBe('+3');
    expect(ionText('Ca[2+]')).toBe('Ca²⁺');
    expect(ionText('K[+]')).toBe('K⁺');
    expect(ionText('SO4[2-]')).toBe('SO₄²⁻');
    expect(ionText('CO(NH2)2[0]')).toBe('CO(NH₂)₂');
  });

  it('keeps a hydrate count, decimal or not, in normal digits', () => {
    expect(formulaText('NaCl·2.5H2O')).toBe('NaCl·2.5H₂O');
    expect(formulaText('CaCl2·6H2O')).toBe('CaCl₂·6H₂O');
    expect(formulaText('Ca(NO3)2·4H2O')).toBe('Ca(NO₃)₂·4H₂O');
    expect(formulaText('KNO₃')).toBe('KNO₃');
  });

  it('puts a space between a number and its unit', () => {
    expect(withUnit('22', '°C')).toBe('22 °C');
    expect(withUnit('3', '')).toBe('3');
  });

  it('wraps paragraphs to a width, indenting continuation lines', () => {
    const lines = wrapText('one two three four five six seven', 12, '  • ');
    expect(lines).toEqual(['  • one two', '    three', '    four', '    five six', '    seven']);
    expect(lines.every((l) => l.length <= 12)).toBe(true);
    expect(wrapText('averyveryverylongword x', 8)).toEqual(['averyveryverylongword', 'x']);
    expect(wrapText('a\nb', 80, '- ')).toEqual(['- a', '  b']);
  });
});

describe('formulas inside free text', () => {
  it('writes the formulas of a sentence with subscripts and leaves other words alone', async () => {
    const { formulasInText } = await import('../../src/notation/formula.js');
    expect(formulasInText('40 g CaCl2 in 100 g water')).toBe('40 g CaCl₂ in 100 g water');
    expect(formulasInText('KNO3 (oxidizer): see ISO 13732-1, NH4[+] and CaCl2·6H2O.')).toBe('KNO₃ (oxidizer): see ISO 13732-1, NH4[+] and CaCl₂·6H₂O.');
    expect(formulasInText('ΔsolH of NaCl, 2 H2O')).toBe('ΔsolH of NaCl, 2 H₂O');
  });
});
