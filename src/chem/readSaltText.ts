/**
 * The reading of a written formula as ions, without the typo check that
 * {@link parseSalt} adds: which ions, how many, how much water of
 * crystallization, and the molar mass.
 *
 * @module
 */
import { chargeNumber, chargeText, ionText } from '../notation/charge.js';
import { formulaText } from '../notation/formula.js';
import type { Dataset } from '../data/dataset.js';
import type { IonRecord } from '../data/schemas.js';
import { IonheatError } from '../error.js';
import { readFormulaSyntax, unitComposition, type FormulaUnit } from './formulaSyntax.js';
import { compositionKey, ionIndex, type IonIndex } from './ionIndex.js';
import { isKnownElement, molarMass } from './molarMass.js';
import { ELEMENT_SYMBOLS } from './elementSymbols.js';
import type { Salt, SaltIon } from './salt.js';
import { formatIons, hydrateSuffix } from './formatSalt.js';

/** Longest run of formula units one ion may span (CH3COO is five: C, H3, C, O, O). */
const MAX_UNITS_PER_ION = 8;
/** Ways of reading a formula tried before giving up as ambiguous. */
const MAX_SEGMENTATIONS = 64;
/** Charge assignments tried per reading. */
const MAX_ASSIGNMENTS = 4096;

interface Option {
  ion: IonRecord;
  multiplicity: number;
}
interface Piece {
  start: number;
  end: number;
  options: Option[];
}


/** Ions a run of units [i, j) could be, with how many of each ion the run holds. */
function piecesOf(units: readonly FormulaUnit[], i: number, j: number, index: IonIndex): Option[] {
  const options: Option[] = [];
  const add = (key: string, multiplicity: number) => {
    for (const ion of index.byComposition.get(key) ?? []) options.push({ ion, multiplicity });
  };
  if (j - i === 1) {
    const unit = units[i]!;
    if (unit.kind === 'element') {
      add(`${unit.symbol}${unit.count}`, 1); // N3 as azide
      if (unit.count > 1) add(`${unit.symbol}1`, unit.count); // Cl2 as two chlorides
    } else {
      add(compositionKey(unitComposition(unit.units)), unit.count); // (NO3)2
      if (unit.count > 1) add(compositionKey(unitComposition([unit])), 1);
    }
  } else {
    add(compositionKey(unitComposition(units.slice(i, j))), 1);
  }
  return options;
}

/** All readings of the units as the fewest possible ions (dynamic programming over positions). */
function segmentations(units: readonly FormulaUnit[], index: IonIndex): { readings: Piece[][]; reached: number } {
  const n = units.length;
  const best: number[] = new Array(n + 1).fill(Infinity);
  const into: Piece[][] = Array.from({ length: n + 1 }, () => []);
  best[0] = 0;
  let reached = 0;
  for (let j = 1; j <= n; j++) {
    for (let i = Math.max(0, j - MAX_UNITS_PER_ION); i < j; i++) {
      if (best[i] === Infinity) continue;
      const options = piecesOf(units, i, j, index);
      if (options.length === 0) continue;
      const cost = best[i]! + 1;
      if (cost < best[j]!) {
        best[j] = cost;
        into[j] = [];
      }
      if (cost === best[j]) into[j]!.push({ start: i, end: j, options });
    }
    if (best[j] !== Infinity) reached = j;
  }
  if (best[n] === Infinity) return { readings: [], reached };
  const readings: Piece[][] = [];
  const walk = (j: number, tail: Piece[]) => {
    if (readings.length >= MAX_SEGMENTATIONS) return;
    if (j === 0) {
      readings.push([...tail].reverse());
      return;
    }
    for (const piece of into[j]!) if (best[piece.start] === best[j]! - 1) walk(piece.start, [...tail, piece]);
  };
  walk(n, []);
  return { readings, reached };
}

/** Every choice of one option per piece whose charges sum to zero. */
function balancedAssignments(pieces: readonly Piece[]): Option[][] {
  const found: Option[][] = [];
  let tried = 0;
  const choose = (k: number, chosen: Option[], charge: number) => {
    if (tried > MAX_ASSIGNMENTS) return;
    if (k === pieces.length) {
      tried++;
      const hasCation = chosen.some((o) => o.ion.charge > 0);
      const hasAnion = chosen.some((o) => o.ion.charge < 0);
      if (charge === 0 && hasCation && hasAnion) found.push([...chosen]);
      return;
    }
    for (const option of pieces[k]!.options) {
      chosen.push(option);
      choose(k + 1, chosen, charge + option.ion.charge * option.multiplicity);
      chosen.pop();
    }
  };
  choose(0, [], 0);
  return found;
}

/** Merges repeated ions and orders them cations first, then anions, each in table order. */
function collect(options: readonly Option[], index: IonIndex): SaltIon[] {
  const counts = new Map<string, number>();
  for (const o of options) counts.set(o.ion.id, (counts.get(o.ion.id) ?? 0) + o.multiplicity);
  return [...counts.entries()]
    .map(([id, count]) => {
      const ion = index.byId.get(id)!;
      return { ion: id, formula: ion.formula, charge: ion.charge, count };
    })
    .sort((a, b) => Number(b.charge > 0) - Number(a.charge > 0) || index.order.get(a.ion)! - index.order.get(b.ion)!);
}

function checkElements(units: readonly FormulaUnit[], text: string, dataset: Dataset): void {
  for (const unit of units) {
    if (unit.kind === 'group') checkElements(unit.units, text, dataset);
    else if (!isKnownElement(unit.symbol, dataset)) {
      const what = ELEMENT_SYMBOLS.has(unit.symbol) ? 'is an element ionheat has no data for' : 'is not a chemical element';
      throw new IonheatError('UNKNOWN_ELEMENT', `"${unit.symbol}" at position ${unit.start + 1} ${what}`, { text, position: unit.start });
    }
  }
}

function describeOptions(pieces: readonly Piece[]): string {
  return pieces
    .map((p) => {
      const charges = [...new Set(p.options.map((o) => o.ion.charge))];
      const o = p.options[0]!;
      const total = charges.map((c) => chargeNumber(c * o.multiplicity)).join(' or ');
      return `${o.multiplicity > 1 ? o.multiplicity + ' × ' : ''}${formulaText(o.ion.formula)}${charges.map(chargeText).join('/')} (${total})`;
    })
    .join(', ');
}

/** Builds the salt from its ions and water. */
function buildSalt(kind: Salt['kind'], ions: SaltIon[], water: number, index: IonIndex, dataset: Dataset): Salt {
  const composition = new Map<string, number>();
  for (const { ion, count } of ions) {
    for (const [el, n] of Object.entries(index.byId.get(ion)!.composition)) composition.set(el, (composition.get(el) ?? 0) + n * count);
  }
  if (water > 0) {
    composition.set('H', (composition.get('H') ?? 0) + 2 * water);
    composition.set('O', (composition.get('O') ?? 0) + water);
  }
  const sorted = Object.fromEntries([...composition.entries()].sort(([a], [b]) => (a < b ? -1 : 1)));
  const anhydrous = formatIons(ions);
  return {
    formula: anhydrous + hydrateSuffix(water),
    anhydrous,
    kind,
    ions,
    water,
    composition: sorted,
    molarMass: molarMass(sorted, dataset),
  };
}

/**
 * The salt a formula text reads as, with the parser's errors; no typo check and not frozen.
 * @internal
 */
export function readSaltText(formula: string, dataset: Dataset): Salt {
  const index = ionIndex(dataset);
  const byName = typeof formula === 'string' ? index.soluteNames.get(formula.trim().toLowerCase()) : undefined;
  if (byName) return buildSalt('non-electrolyte', [{ ion: byName.id, formula: byName.formula, charge: 0, count: 1 }], 0, index, dataset);
  const syntax = readFormulaSyntax(formula);
  checkElements(syntax.units, syntax.text, dataset);
  const solute = index.soluteForms.get(syntax.mainText);
  if (solute) return buildSalt('non-electrolyte', [{ ion: solute.id, formula: solute.formula, charge: 0, count: 1 }], syntax.water, index, dataset);

  const { readings, reached } = segmentations(syntax.units, index);
  if (readings.length === 0) {
    const at = syntax.units[reached]!;
    const rest = syntax.text.slice(at.start, syntax.mainText.length);
    const hint = at.kind === 'element' && at.symbol === 'H' && reached === 0 ? ' (an acid is not a salt; ionheat handles salts)' : '';
    throw new IonheatError('UNKNOWN_ION', `no ion in the table accounts for "${rest}" at position ${at.start + 1} of "${syntax.text}"${hint}`, { text: syntax.text, position: at.start });
  }
  const candidates = new Map<string, SaltIon[]>();
  for (const reading of readings) {
    for (const assignment of balancedAssignments(reading)) {
      const ions = collect(assignment, index);
      candidates.set(ions.map((i) => `${i.count}${i.ion}`).join(' '), ions);
    }
  }
  if (candidates.size === 0) {
    const reading = readings[0]!;
    const single = reading.length === 1 ? ' — a salt needs both a cation and an anion' : '';
    throw new IonheatError('UNBALANCED_CHARGE', `the charges in "${syntax.mainText}" do not balance: ${describeOptions(reading)}${single}`, { text: syntax.text, position: 0 });
  }
  if (candidates.size > 1) {
    throw new IonheatError('AMBIGUOUS_FORMULA', `"${syntax.mainText}" can be read as ${[...candidates.values()].map((ions) => formatIons(ions) + ' (' + ions.map((i) => i.count + ' ' + ionText(i.ion)).join(' + ') + ')').join(' or ')}; write the ions unambiguously`, { text: syntax.text, position: 0 });
  }
  const ions = [...candidates.values()][0]!;
  return buildSalt('ionic', ions, syntax.water, index, dataset);
}
