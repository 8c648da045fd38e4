/**
 * Formulas that read only through a slip of the keyboard. `KN03` (a digit
 * zero for the letter O) reads as KN₃, potassium azide; `CaC12` (a one for
 * an l) reads as nothing; `NaNo3` asks for nobelium. A reading is suspect
 * when it needs a count written with a leading zero or an ion that no salt
 * of the measured tables holds (azide, for one) while a single slip-edit
 * gives a salt the tables measure. {@link parseSalt} refuses such a reading
 * with what was probably meant, or, where both readings are measured salts,
 * `dissolve` computes and warns naming the other.
 *
 * Slips tried, one at a time: digit 0 → letter O, digit 1 → l or I, capital
 * I ↔ lower-case l, one letter's case flipped, and the whole text in capitals
 * (`kno3`). Substitutions only: a missing letter (KN3 for KNO3) is a real
 * formula typed as meant.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { formatSalt } from './formatSalt.js';
import { MAX_FORMULA_LENGTH, normalizeFormulaText } from './formulaSyntax.js';
import { ionIndex } from './ionIndex.js';
import { ELEMENT_SYMBOLS } from './elementSymbols.js';
import { isKnownElement } from './molarMass.js';
import { editDistance } from '../quantity/nearestName.js';
import { readSaltText } from './readSaltText.js';
import type { Salt } from './salt.js';

/** One slip: the text with one character replaced (or all letters capitalised). */
interface Slip {
  text: string;
  /** Zero-based position of the replaced character. */
  position: number;
  typed: string;
  meant: string;
  /** In words, for messages. */
  why: string;
}

/** What a suspect formula was probably meant to be, and what to do about it. */
export interface TypoSuspicion {
  /** `refuse` when the typed reading is no measured salt; `warn` when both readings are. */
  action: 'refuse' | 'warn';
  /** The formula as typed (normalised). */
  text: string;
  /** Zero-based position of the probable slip in `text`. */
  position: number;
  /** The salt the text reads as. */
  typedAs: string;
  /** The salt probably meant, canonical (`KNO3`). */
  suggestion: string;
  /** A sentence for people. */
  message: string;
}

const isUpper = (c: string): boolean => c >= 'A' && c <= 'Z';
const isLower = (c: string): boolean => c >= 'a' && c <= 'z';
const isDigit = (c: string): boolean => c >= '0' && c <= '9';
const show = (salt: Salt): string => formatSalt(salt, { style: 'unicode' });

/** Anhydrous formulas of the salts the tables measure: an enthalpy of solution or a solubility curve. */
function measuredSalts(dataset: Dataset): ReadonlySet<string> {
  return dataset.memo('chem.measuredSalts', () => {
    const out = new Set<string>();
    for (const table of ['solution-enthalpies.json', 'solubility.json'] as const) {
      for (const record of dataset.records(table)) {
        try {
          out.add(readSaltText(record.formula, dataset).anhydrous);
        } catch {
          // A table formula that does not read is reported by the table checks, not here.
        }
      }
    }
    return out;
  });
}

/** Ion ids that stand in at least one measured salt; the others are rarely met in practice. */
function measuredIons(dataset: Dataset): ReadonlySet<string> {
  return dataset.memo('chem.measuredIons', () => {
    const out = new Set<string>();
    for (const formula of measuredSalts(dataset)) {
      try {
        for (const ion of readSaltText(formula, dataset).ions) out.add(ion.ion);
      } catch {
        // as above
      }
    }
    return out;
  });
}

function slip(text: string, i: number, meant: string, why: string): Slip {
  return { text: text.slice(0, i) + meant + text.slice(i + 1), position: i, typed: text[i]!, meant, why };
}

/** The one-character slips of `text`; `caseFlips` adds the letter-case ones (for text that does not read). */
function slipsOf(text: string, caseFlips: boolean): Slip[] {
  const out: Slip[] = [];
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === '0') out.push(slip(text, i, 'O', 'a digit zero where the letter O fits'));
    else if (c === '1') out.push(slip(text, i, 'l', 'a digit one where the letter l fits'), slip(text, i, 'I', 'a digit one where the letter I fits'));
    else if (c === 'I') out.push(slip(text, i, 'l', 'a capital I where a lower-case l fits'));
    else if (c === 'l') out.push(slip(text, i, 'I', 'a lower-case l where a capital I fits'));
    else if (caseFlips && isLower(c)) out.push(slip(text, i, c.toUpperCase(), `a lower-case "${c}" where the element symbol ${c.toUpperCase()} fits`));
    else if (caseFlips && isUpper(c) && i > 0 && isUpper(text[i - 1]!)) out.push(slip(text, i, c.toLowerCase(), `a capital "${c}" where a two-letter symbol's lower-case letter fits`));
  }
  if (caseFlips) {
    const upper = text.toUpperCase();
    if (upper !== text) out.push({ text: upper, position: 0, typed: text, meant: upper, why: 'element symbols start with a capital letter' });
  }
  return out;
}

/** Salts that one slip of `text` reads as, measured salts first, each once. */
function slipReadings(text: string, caseFlips: boolean, dataset: Dataset): { slip: Slip; salt: Salt; measured: boolean }[] {
  const measured = measuredSalts(dataset);
  const seen = new Set<string>();
  const found: { slip: Slip; salt: Salt; measured: boolean }[] = [];
  for (const s of slipsOf(text, caseFlips)) {
    let salt: Salt;
    try {
      salt = readSaltText(s.text, dataset);
    } catch {
      continue;
    }
    if (seen.has(salt.formula)) continue;
    seen.add(salt.formula);
    found.push({ slip: s, salt, measured: measured.has(salt.anhydrous) });
  }
  return found.sort((a, b) => Number(b.measured) - Number(a.measured));
}

/**
 * What a formula that does not read was probably meant to be (`CaC12` →
 * `CaCl₂`), as display text, or undefined when no single slip gives a salt.
 * @internal
 */
export function typoSuggestion(formula: string, dataset: Dataset, unknownSymbol?: { symbol: string; position: number }): string | undefined {
  if (formula.length > MAX_FORMULA_LENGTH) return undefined;
  const text = normalizeFormulaText(formula);
  let readings = slipReadings(text, true, dataset);
  if (readings.length === 0 && unknownSymbol) readings = symbolReadings(text, unknownSymbol, dataset);
  const best = readings.filter((r) => r.measured === readings[0]?.measured).slice(0, 3);
  return best.length === 0 ? undefined : best.map((r) => show(r.salt)).join(best.length > 2 ? ', ' : ' or ').replace(/, ([^,]*)$/, ' or $1');
}

/** Salts read when an unknown symbol (`Ma`) is replaced by a known one a single edit away (`Na`, `Mg`). */
function symbolReadings(text: string, unknown: { symbol: string; position: number }, dataset: Dataset): { slip: Slip; salt: Salt; measured: boolean }[] {
  const measured = measuredSalts(dataset);
  const found: { slip: Slip; salt: Salt; measured: boolean }[] = [];
  if (text.slice(unknown.position, unknown.position + unknown.symbol.length) !== unknown.symbol) return found;
  for (const symbol of ELEMENT_SYMBOLS) {
    if (!isKnownElement(symbol, dataset) || editDistance(symbol.toLowerCase(), unknown.symbol.toLowerCase(), 1) > 1) continue;
    const edited = text.slice(0, unknown.position) + symbol + text.slice(unknown.position + unknown.symbol.length);
    try {
      const salt = readSaltText(edited, dataset);
      found.push({ slip: { text: edited, position: unknown.position, typed: unknown.symbol, meant: symbol, why: `the symbol ${symbol}` }, salt, measured: measured.has(salt.anhydrous) });
    } catch {
      // not a salt either way
    }
  }
  return found.sort((a, b) => Number(b.measured) - Number(a.measured));
}

/** Zero-based position of the first count written with a leading zero (`N03`), or −1. */
function leadingZeroCount(text: string): number {
  for (let i = 0; i + 1 < text.length; i++) {
    const c = text[i]!;
    if (c === '·' || c === '.' || c === '*' || c === '•' || c === '⋅' || c === '∙') return -1; // the hydrate part has its own rules
    if (text[i + 1] === '0' && (isUpper(c) || isLower(c) || c === ')' || c === ']') && !isDigit(c)) return i + 1;
  }
  return -1;
}

/**
 * Whether `salt`, the reading of `formula`, came through a likely slip, and
 * what was probably meant; undefined for an ordinary reading.
 * @internal
 */
export function typoSuspicion(formula: string, salt: Salt, dataset: Dataset): TypoSuspicion | undefined {
  if (typeof formula !== 'string' || salt.kind !== 'ionic') return undefined;
  // Cheap tests first: only texts with a character a slip could have made are worth a second look.
  let hasSlipCharacter = false;
  for (let i = 0; i < formula.length && !hasSlipCharacter; i++) {
    const c = formula[i];
    hasSlipCharacter = c === '0' || c === '1' || c === 'I' || c === 'l';
  }
  if (!hasSlipCharacter) return undefined;
  const text = normalizeFormulaText(formula);
  const zeroAt = leadingZeroCount(text);
  const ions = measuredIons(dataset);
  const rare = salt.ions.find((i) => !ions.has(i.ion));
  if (zeroAt < 0 && rare === undefined) return undefined;
  const measured = measuredSalts(dataset);
  const other = slipReadings(text, false, dataset).find((r) => r.measured && r.salt.formula !== salt.formula);
  if (!other) return undefined;
  const typedAs = show(salt);
  const meant = show(other.salt);
  const at = `"${other.slip.typed}" at position ${other.slip.position + 1}`;
  let countEnd = zeroAt;
  while (countEnd < text.length && isDigit(text[countEnd]!)) countEnd++;
  const reason =
    zeroAt >= 0
      ? `the count "${text.slice(zeroAt, countEnd)}" at position ${zeroAt + 1}, written with a leading zero`
      : `${rare!.formula}${rare!.charge > 0 ? '+' : '−'} (${ionIndex(dataset).byId.get(rare!.ion)?.name ?? rare!.ion}), an ion that no salt of the measured tables holds`;
  if (measured.has(salt.anhydrous)) {
    return {
      action: 'warn',
      text,
      position: other.slip.position,
      typedAs: salt.formula,
      suggestion: other.salt.formula,
      message: `"${text}" is read as ${typedAs} through ${reason}, but ${meant} is one slip away (${at}: ${other.slip.why}); both are real salts, so check which you meant`,
    };
  }
  return {
    action: 'refuse',
    text,
    position: other.slip.position,
    typedAs: salt.formula,
    suggestion: other.salt.formula,
    message: `"${text}" reads as ${typedAs} only through ${reason}; did you mean ${meant}? (${at}: ${other.slip.why}). If ${typedAs} is meant, write it as ${salt.formula}`,
  };
}
