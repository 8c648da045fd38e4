/**
 * Formulas that read only through a slip of the keyboard. `KN03` (a digit
 * zero for the letter O) reads as KN₃, potassium azide; `CaC12` (a one for
 * an l) reads as nothing; `NaNo3` asks for nobelium. A reading is suspect
 * when it needs a count written with a leading zero, or an ion that no salt
 * of the measured tables holds (azide, for one) in a salt no table knows,
 * while an edit gives a salt the tables know. {@link parseSalt} refuses such a
 * reading with what was probably meant, or, where the text is a formula as
 * written (a dropped letter: `KN3` for `KNO3`) or both readings are measured
 * salts, `dissolve` computes and warns naming the other.
 *
 * Slips tried: digit 0 → letter O, digit 1 → l or I, capital I ↔ lower-case l
 * (one at a time, or all of them together in a longer formula such as
 * `KA1(S04)2`); one letter's case flipped, or the letters' case read again
 * from scratch (`nacl`, `KCL`, `NACL`); two neighbours swapped (`KON3`); a
 * character typed twice (`MgSO44`) or left out (`MgSO`, `KN3`); the dot of a
 * hydrate written as a space, comma or `x`, or left out (`CaCl26H2O`). The
 * edits beyond single look-alike substitutions are kept only where they give
 * a salt the tables know, so a real formula typed as meant is not flagged.
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
import { ionText } from '../notation/charge.js';
import type { Salt } from './salt.js';

/**
 * What kind of slip: `look-alike` (0/O, 1/l/I, one at a time), `look-alikes` (several at once), `case`,
 * `swapped`, `doubled`, `stray` (an extra character), `dropped`, `hydrate-dot`, `symbol` (an unknown symbol one edit from a known one).
 */
export type SlipKind = 'look-alike' | 'look-alikes' | 'case' | 'swapped' | 'doubled' | 'stray' | 'dropped' | 'hydrate-dot' | 'symbol';

/** One slip: the text with the slip undone. */
interface Slip {
  kind: SlipKind;
  text: string;
  /** Zero-based position of the slip in the text as typed. */
  position: number;
  typed: string;
  meant: string;
  /** In words, for messages. */
  why: string;
}

/** What a suspect formula was probably meant to be, and what to do about it. */
export interface TypoSuspicion {
  /** `refuse` when the typed reading is no measured salt and came through a look-alike character; else `warn`. */
  action: 'refuse' | 'warn';
  /** The formula as typed (normalised). */
  text: string;
  /** Zero-based position of the probable slip in `text`. */
  position: number;
  /** The kind of slip. */
  slip: SlipKind;
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

/** Edits beyond single look-alikes are tried on texts up to this long (a real salt formula is far shorter). */
const MAX_EDITED_LENGTH = 32;
/** Look-alike characters changed together: at most this many positions. */
const MAX_JOINT_POSITIONS = 6;
/** Re-readings of the letters' case tried: at most this many. */
const MAX_RECASINGS = 64;
/** Characters typed in place of a hydrate's dot. */
const WRONG_DOTS = new Set([' ', ',', 'x', 'X', '+', '-', '_', ':', ';', '/']);
/** Separators of a hydrate's water that the parser accepts. */
const DOTS = new Set(['·', '•', '⋅', '∙', '.', '*']);

/** Anhydrous formulas of the salts the tables measure: an enthalpy of solution or a solubility curve. */
function measuredSalts(dataset: Dataset): ReadonlySet<string> {
  return dataset.memo('chem.measuredSalts', () => readAll(dataset, [...dataset.records('solution-enthalpies.json'), ...dataset.records('solubility.json')].map((r) => r.formula)));
}

/** Anhydrous formulas of every salt a table names: measured, with a crystal formation enthalpy, a hazard or a warmer melt. */
function knownSalts(dataset: Dataset): ReadonlySet<string> {
  return dataset.memo('chem.knownSalts', () => {
    const formulas = [
      ...dataset.records('compound-formation.json').map((r) => r.formula),
      ...dataset.records('hazards.json').map((r) => r.subject).filter((f) => !f.endsWith(']')),
      ...dataset.records('warmer-melts.json').map((r) => r.formula),
    ];
    return new Set([...measuredSalts(dataset), ...readAll(dataset, formulas)]);
  });
}

function readAll(dataset: Dataset, formulas: readonly string[]): Set<string> {
  const out = new Set<string>();
  for (const formula of formulas) {
    try {
      out.add(readSaltText(formula, dataset).anhydrous);
    } catch {
      // A table formula that does not read (water, an element) is no salt, or is reported by the table checks.
    }
  }
  return out;
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

function replaced(kind: SlipKind, text: string, i: number, meant: string, why: string): Slip {
  return { kind, text: text.slice(0, i) + meant + text.slice(i + 1), position: i, typed: text[i]!, meant, why };
}

/** The look-alike characters at one position and what each could have been. */
function lookAlikes(c: string): readonly [string, string][] {
  if (c === '0') return [['O', 'a digit zero where the letter O fits']];
  if (c === '1')
    return [
      ['l', 'a digit one where the letter l fits'],
      ['I', 'a digit one where the letter I fits'],
    ];
  if (c === 'I') return [['l', 'a capital I where a lower-case l fits']];
  if (c === 'l') return [['I', 'a lower-case l where a capital I fits']];
  return [];
}

/** Single look-alike substitutions; with `caseFlips`, single case flips and the whole text in capitals too. */
function substitutionSlips(text: string, caseFlips: boolean): Slip[] {
  const out: Slip[] = [];
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    const alike = lookAlikes(c);
    for (const [meant, why] of alike) out.push(replaced('look-alike', text, i, meant, why));
    if (alike.length > 0 || !caseFlips) continue;
    if (isLower(c)) out.push(replaced('case', text, i, c.toUpperCase(), `a lower-case "${c}" where the element symbol ${c.toUpperCase()} fits`));
    else if (isUpper(c) && i > 0 && isUpper(text[i - 1]!)) out.push(replaced('case', text, i, c.toLowerCase(), `a capital "${c}" where a two-letter symbol's lower-case letter fits`));
  }
  if (caseFlips) {
    const upper = text.toUpperCase();
    if (upper !== text) out.push({ kind: 'case', text: upper, position: 0, typed: text, meant: upper, why: 'element symbols start with a capital letter' });
  }
  return out;
}

/** Every look-alike at once, in each combination of two or more (`KA1(S04)2` → `KAl(SO4)2`); bounded. */
function jointLookAlikes(text: string): Slip[] {
  const at: number[] = [];
  for (let i = 0; i < text.length; i++) if (lookAlikes(text[i]!).length > 0) at.push(i);
  if (at.length < 2 || at.length > MAX_JOINT_POSITIONS) return [];
  const out: Slip[] = [];
  const choose = (k: number, chars: string[], changed: number[]) => {
    if (k === at.length) {
      if (changed.length >= 2) {
        const where = changed.map((i) => `"${text[i]}" at position ${i + 1}`).join(', ');
        out.push({ kind: 'look-alikes', text: chars.join(''), position: changed[0]!, typed: text, meant: chars.join(''), why: `look-alike characters (${where})` });
      }
      return;
    }
    const i = at[k]!;
    choose(k + 1, chars, changed);
    for (const [meant] of lookAlikes(text[i]!)) {
      const next = [...chars];
      next[i] = meant;
      choose(k + 1, next, [...changed, i]);
    }
  };
  choose(0, [...text], []);
  return out;
}

/**
 * The letters' case read again from scratch: each run of letters split into element symbols (a capital, then
 * perhaps one lower-case letter) in every way that gives known symbols (`nacl` → `NaCl`, `KCL` → `KCl`).
 */
function recasings(text: string, dataset: Dataset): Slip[] {
  const out: string[] = [''];
  for (let i = 0; i < text.length && out.length > 0 && out.length <= MAX_RECASINGS; ) {
    const c = text[i]!;
    if (!isUpper(c) && !isLower(c)) {
      for (let k = 0; k < out.length; k++) out[k] += c;
      i++;
      continue;
    }
    let j = i;
    while (j < text.length && (isUpper(text[j]!) || isLower(text[j]!))) j++;
    const splits = letterSplits(text.slice(i, j).toLowerCase(), dataset);
    const grown: string[] = [];
    for (const head of out) for (const tail of splits) if (grown.length < MAX_RECASINGS) grown.push(head + tail);
    out.splice(0, out.length, ...grown);
    i = j;
  }
  return out
    .filter((t) => t !== text)
    .map((t) => ({ kind: 'case' as const, text: t, position: 0, typed: text, meant: t, why: 'element symbols are a capital letter, then perhaps one lower-case letter' }));
}

/** The ways a run of lower-case letters splits into known element symbols, written with their case. */
function letterSplits(run: string, dataset: Dataset): string[] {
  const ways: string[][] = Array.from({ length: run.length + 1 }, () => []);
  ways[0] = [''];
  for (let i = 0; i < run.length; i++) {
    if (ways[i]!.length === 0) continue;
    for (const width of [1, 2]) {
      if (i + width > run.length) continue;
      const symbol = run[i]!.toUpperCase() + run.slice(i + 1, i + width);
      if (!isKnownElement(symbol, dataset)) continue;
      for (const head of ways[i]!) if (ways[i + width]!.length < MAX_RECASINGS) ways[i + width]!.push(head + symbol);
    }
  }
  return ways[run.length]!;
}

/** The spellings of the salts the tables name (canonical and as written), each with its tier: 0 measured, 1 known. */
function tableSpellings(dataset: Dataset): readonly { text: string; tier: number }[] {
  return dataset.memo('chem.tableSpellings', () => {
    const measured = measuredSalts(dataset);
    const out = new Map<string, number>();
    const tables = [
      ...dataset.records('solution-enthalpies.json').map((r) => r.formula),
      ...dataset.records('solubility.json').map((r) => r.formula),
      ...dataset.records('compound-formation.json').map((r) => r.formula),
      ...dataset.records('hazards.json').map((r) => r.subject).filter((f) => !f.endsWith(']')),
      ...dataset.records('warmer-melts.json').map((r) => r.formula),
    ];
    for (const formula of tables) {
      try {
        const salt = readSaltText(formula, dataset);
        if (salt.kind !== 'ionic') continue;
        const tier = measured.has(salt.anhydrous) ? 0 : 1;
        for (const text of [normalizeFormulaText(formula), salt.formula, salt.anhydrous]) out.set(text, Math.min(out.get(text) ?? tier, tier));
      } catch {
        // not a salt (water, an element), or reported by the table checks
      }
    }
    return [...out.entries()].map(([text, tier]) => ({ text, tier }));
  });
}

/** How `typed` is one slip from `meant`: two neighbours swapped, a character doubled or one left out; else undefined. */
function oneSlip(typed: string, meant: string): Slip | undefined {
  let i = 0;
  while (i < typed.length && i < meant.length && typed[i] === meant[i]) i++;
  if (typed.length === meant.length) {
    if (i + 1 < typed.length && typed[i] === meant[i + 1] && typed[i + 1] === meant[i] && typed.slice(i + 2) === meant.slice(i + 2)) {
      return { kind: 'swapped', text: meant, position: i, typed: typed.slice(i, i + 2), meant: meant.slice(i, i + 2), why: `"${typed.slice(i, i + 2)}" typed for "${meant.slice(i, i + 2)}"` };
    }
    return undefined;
  }
  if (typed.length === meant.length + 1 && typed.slice(i + 1) === meant.slice(i)) {
    // An extra character: a doubled one when it repeats a neighbour (MgSO44), else a stray one.
    const c = typed[i]!;
    const doubled = typed[i - 1] === c || typed[i + 1] === c;
    return { kind: doubled ? 'doubled' : 'stray', text: meant, position: i, typed: c, meant: '', why: doubled ? `"${c}" typed twice` : `a stray "${c}"` };
  }
  if (typed.length + 1 === meant.length && typed.slice(i) === meant.slice(i + 1)) {
    return { kind: 'dropped', text: meant, position: i, typed: '', meant: meant[i]!, why: `"${meant[i]}" left out` };
  }
  return undefined;
}

/** Table spellings one swap, doubling, stray or dropped character away from the text (string comparison only). */
function editNeighbours(text: string, dataset: Dataset): Slip[] {
  const out: Slip[] = [];
  for (const { text: meant } of tableSpellings(dataset)) {
    if (Math.abs(meant.length - text.length) > 1) continue;
    const s = oneSlip(text, meant);
    if (s) out.push(s);
  }
  return out;
}

/** A hydrate's dot written as another character (`CaCl2 6H2O`, `CaCl2,6H2O`) or left out (`CaCl26H2O`). */
function hydrateDots(text: string): Slip[] {
  if (!text.endsWith('H2O') || text.length <= 3) return [];
  for (const c of text) if (DOTS.has(c)) return [];
  const out: Slip[] = [];
  const water = text.length - 3;
  let start = water;
  while (start > 0 && (isDigit(text[start - 1]!) || text[start - 1] === '.')) start--;
  const before = start - 1;
  if (before > 0 && WRONG_DOTS.has(text[before]!)) {
    out.push({ kind: 'hydrate-dot', text: text.slice(0, before) + '·' + text.slice(before + 1), position: before, typed: text[before]!, meant: '·', why: `"${text[before]}" where the dot of a hydrate belongs` });
  }
  for (let j = start; j <= water; j++) {
    if (j === 0) continue;
    out.push({ kind: 'hydrate-dot', text: text.slice(0, j) + '·' + text.slice(j), position: j, typed: '', meant: '·', why: 'the dot before the water of crystallization left out' });
  }
  return out;
}

/** One reading of an edited text. */
interface Reading {
  slip: Slip;
  salt: Salt;
  /** 0: a measured salt; 1: one the tables know otherwise; 2: neither. */
  tier: number;
}

/** Order of slip kinds when readings tie: the commonest slips first. */
const KIND_ORDER: Readonly<Record<SlipKind, number>> = { 'look-alike': 0, case: 1, 'hydrate-dot': 2, symbol: 3, 'look-alikes': 4, swapped: 5, doubled: 6, dropped: 7, stray: 8 };

/** Salts the slips read as, best first (measured, then known, then the rest; common slips first), each once. */
function readingsOf(slips: readonly Slip[], dataset: Dataset, exclude?: string): Reading[] {
  const measured = measuredSalts(dataset);
  const known = knownSalts(dataset);
  const seen = new Set<string>(exclude === undefined ? [] : [exclude]);
  const found: Reading[] = [];
  for (const s of slips) {
    let salt: Salt;
    try {
      salt = readSaltText(s.text, dataset);
    } catch {
      continue;
    }
    if (seen.has(salt.formula)) continue;
    seen.add(salt.formula);
    const tier = measured.has(salt.anhydrous) ? 0 : known.has(salt.anhydrous) ? 1 : 2;
    // Edits beyond a single look-alike or case flip reach too many formulas: only a salt the tables know counts.
    if (tier === 2 && s.kind !== 'look-alike' && s.kind !== 'case' && s.kind !== 'symbol') continue;
    found.push({ slip: s, salt, tier });
  }
  return found.sort((a, b) => a.tier - b.tier || KIND_ORDER[a.slip.kind] - KIND_ORDER[b.slip.kind]);
}

/** The edits beyond single substitutions, for a text short enough to try them on. */
function furtherSlips(text: string, dataset: Dataset): Slip[] {
  if (text.length > MAX_EDITED_LENGTH) return [];
  return [...hydrateDots(text), ...recasings(text, dataset), ...jointLookAlikes(text), ...editNeighbours(text, dataset)];
}

/**
 * What a formula that does not read was probably meant to be (`CaC12` →
 * `CaCl₂`, `nacl` → `NaCl`, `MgSO` → `MgSO₄`), as display text, or undefined
 * when no slip gives a salt.
 * @internal
 */
export function typoSuggestion(formula: string, dataset: Dataset, unknownSymbol?: { symbol: string; position: number }): string | undefined {
  if (formula.length > MAX_FORMULA_LENGTH) return undefined;
  const text = normalizeFormulaText(formula);
  let readings = readingsOf(substitutionSlips(text, true), dataset);
  if (readings.length === 0 && unknownSymbol) readings = symbolReadings(text, unknownSymbol, dataset);
  // Further edits only where the single ones found no salt the tables know.
  if (!readings.some((r) => r.tier < 2)) readings = [...readings, ...readingsOf(furtherSlips(text, dataset), dataset)];
  readings.sort((a, b) => a.tier - b.tier || KIND_ORDER[a.slip.kind] - KIND_ORDER[b.slip.kind]);
  const names = [...new Set(readings.filter((r) => r.tier === readings[0]?.tier).map((r) => show(r.salt)))].slice(0, 3);
  return names.length === 0 ? undefined : names.join(names.length > 2 ? ', ' : ' or ').replace(/, ([^,]*)$/, ' or $1');
}

/** Salts read when an unknown symbol (`Ma`) is replaced by a known one a single edit away (`Na`, `Mg`). */
function symbolReadings(text: string, unknown: { symbol: string; position: number }, dataset: Dataset): Reading[] {
  if (text.slice(unknown.position, unknown.position + unknown.symbol.length) !== unknown.symbol) return [];
  const slips: Slip[] = [];
  for (const symbol of ELEMENT_SYMBOLS) {
    if (!isKnownElement(symbol, dataset) || editDistance(symbol.toLowerCase(), unknown.symbol.toLowerCase(), 1) > 1) continue;
    const edited = text.slice(0, unknown.position) + symbol + text.slice(unknown.position + unknown.symbol.length);
    slips.push({ kind: 'symbol', text: edited, position: unknown.position, typed: unknown.symbol, meant: symbol, why: `the symbol ${symbol}` });
  }
  return readingsOf(slips, dataset);
}

/** Zero-based position of the first count written with a leading zero (`N03`), or −1. */
function leadingZeroCount(text: string): number {
  for (let i = 0; i + 1 < text.length; i++) {
    const c = text[i]!;
    if (DOTS.has(c)) return -1; // the hydrate part has its own rules
    if (text[i + 1] === '0' && (isUpper(c) || isLower(c) || c === ')' || c === ']') && !isDigit(c)) return i + 1;
  }
  return -1;
}

/** Where a slip is, for a message: the characters and their position counted from 1. */
function slipPlace(s: Slip): string {
  if (s.kind === 'case' || s.kind === 'look-alikes') return s.why;
  if (s.kind === 'dropped') return `"${s.meant}" left out at position ${s.position + 1}`;
  if (s.kind === 'doubled' || s.kind === 'stray') return `${s.why} at position ${s.position + 1}`;
  if (s.kind === 'hydrate-dot' && s.typed === '') return `${s.why}, at position ${s.position + 1}`;
  return `"${s.typed}" at position ${s.position + 1}: ${s.why}`;
}

/**
 * Whether `salt`, the reading of `formula`, came through a likely slip, and
 * what was probably meant; undefined for an ordinary reading. Results are
 * kept per text in the dataset's bounded cache.
 * @internal
 */
export function typoSuspicion(formula: string, salt: Salt, dataset: Dataset): TypoSuspicion | undefined {
  if (typeof formula !== 'string' || salt.kind !== 'ionic') return undefined;
  // Cheap tests first: a count with a leading zero, or an ion no measured salt holds in a salt no table knows.
  const ions = measuredIons(dataset);
  const rare = salt.ions.find((i) => !ions.has(i.ion));
  let hasZero = false;
  for (let i = 0; i < formula.length && !hasZero; i++) hasZero = formula[i] === '0' || formula[i] === '₀';
  if (rare === undefined && !hasZero) return undefined;
  const text = normalizeFormulaText(formula);
  const zeroAt = hasZero ? leadingZeroCount(text) : -1;
  if (zeroAt < 0 && (rare === undefined || knownSalts(dataset).has(salt.anhydrous))) return undefined;
  const cache = dataset.cache<string, TypoSuspicion | null>('chem.typoSuspicion', 4096);
  const kept = cache.get(text);
  if (kept !== undefined) return kept ?? undefined;
  const found = suspicionOf(text, salt, zeroAt, rare, dataset) ?? null;
  cache.set(text, found);
  return found ?? undefined;
}

function suspicionOf(text: string, salt: Salt, zeroAt: number, rare: Salt['ions'][number] | undefined, dataset: Dataset): TypoSuspicion | undefined {
  const substitutions = substitutionSlips(text, false);
  let other = readingsOf(substitutions, dataset, salt.formula).find((r) => r.tier < 2 || zeroAt >= 0);
  // A formula valid as written is flagged through a further edit only where that edit spells the other salt as it is
  // written (`LiN3` + O = `LiNO3`), not where it merely adds up to its atoms (`CaSO3` + O read as CaSO₄).
  if (!other) other = readingsOf(furtherSlips(text, dataset), dataset, salt.formula).find((r) => (r.tier === 0 || (zeroAt >= 0 && r.tier === 1)) && r.slip.kind !== 'stray' && r.slip.text === r.salt.formula);
  if (!other) return undefined;
  const typedAs = show(salt);
  const meant = show(other.salt);
  const at = slipPlace(other.slip);
  let countEnd = zeroAt;
  while (countEnd >= 0 && countEnd < text.length && isDigit(text[countEnd]!)) countEnd++;
  const reason =
    zeroAt >= 0
      ? `the count "${text.slice(zeroAt, countEnd)}" at position ${zeroAt + 1}, written with a leading zero`
      : `${ionText(rare!.ion)} (${ionIndex(dataset).byId.get(rare!.ion)?.name ?? rare!.ion}), an ion that no salt of the measured tables holds`;
  const base = { text, position: other.slip.position, slip: other.slip.kind, typedAs: salt.formula, suggestion: other.salt.formula };
  const measured = measuredSalts(dataset).has(salt.anhydrous);
  // A look-alike character (or a leading zero) is refused; a formula valid as written (a dropped letter) is computed with a warning.
  const refuse = !measured && (zeroAt >= 0 || other.slip.kind === 'look-alike' || other.slip.kind === 'look-alikes');
  if (!refuse) {
    const both = measured ? 'both are real salts' : `${typedAs} is rarely met and no table knows it`;
    return { action: 'warn', ...base, message: `"${text}" is read as ${typedAs} through ${reason}, but ${meant} is one slip away (${at}); ${both}, so check which you meant` };
  }
  return { action: 'refuse', ...base, message: `"${text}" reads as ${typedAs} only through ${reason}; did you mean ${meant}? (${at}). If ${typedAs} is meant, write it as ${salt.formula}` };
}
