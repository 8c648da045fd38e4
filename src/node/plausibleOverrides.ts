/**
 * Plausible ranges of a user's override values, by quantity, checked before they are merged: a value that passes
 * the schema (a positive radius, a finite enthalpy) may still be in the wrong unit — a radius in pm or nm entered
 * as Å, an enthalpy in J/mol entered as kJ/mol. Such a record is refused with a message naming the file, the
 * table, the record and the field, instead of failing later inside a computation. The ranges bracket every value
 * of the built-in tables with room to spare (the bounds of each quantity are in the table below); they are common
 * practice, not published limits.
 *
 * @module
 */
import { recordName, type OverrideProblem } from '../data/dataset.js';

interface Range {
  min: number;
  max: number;
  unit: string;
  /** The quantity in words, for messages. */
  quantity: string;
}

/**
 * Plausible `value` of a record, per table (common practice). Built-in extremes, for comparison: Shannon radii
 * 0.16–2.2 Å, thermochemical radii 1.3–2.6 Å, ion volumes 0.002–0.09 nm³, enthalpies of solution −64 to +57
 * kJ/mol, hydration enthalpies −4731 to −246 kJ/mol, solid heat capacities 47–550 J/(mol·K).
 */
const VALUE_RANGES: Record<string, Range> = {
  'atomization-enthalpies.json': { min: 1, max: 5000, unit: 'kJ/mol', quantity: 'atomization enthalpy' },
  'bond-dissociation.json': { min: 1, max: 5000, unit: 'kJ/mol', quantity: 'bond dissociation enthalpy' },
  'born-exponents.json': { min: 1, max: 30, unit: '', quantity: 'Born exponent' },
  'compound-formation.json': { min: -50_000, max: 10_000, unit: 'kJ/mol', quantity: 'formation enthalpy' },
  'electron-affinities.json': { min: -2000, max: 2000, unit: 'kJ/mol', quantity: 'electron affinity' },
  'elements.json': { min: 0.5, max: 400, unit: 'g/mol', quantity: 'atomic weight' },
  'heat-capacities.json': { min: 5, max: 5000, unit: 'J/(mol·K)', quantity: 'molar heat capacity' },
  'hydration-enthalpies.json': { min: -20_000, max: 0, unit: 'kJ/mol', quantity: 'hydration enthalpy' },
  'ion-formation-aq.json': { min: -20_000, max: 20_000, unit: 'kJ/mol', quantity: 'formation enthalpy of an aqueous ion' },
  'ion-formation-gas.json': { min: -20_000, max: 50_000, unit: 'kJ/mol', quantity: 'formation enthalpy of a gaseous ion' },
  'ion-heat-capacities-aq.json': { min: -2000, max: 2000, unit: 'J/(mol·K)', quantity: 'heat capacity of an aqueous ion' },
  'ion-volumes.json': { min: 5e-4, max: 2, unit: 'nm³', quantity: 'ion volume' },
  'ionization-energies.json': { min: 100, max: 200_000, unit: 'kJ/mol', quantity: 'ionization energy' },
  'madelung-constants.json': { min: 0.5, max: 100, unit: '', quantity: 'Madelung constant' },
  'shannon-radii.json': { min: 0.05, max: 3, unit: 'Å', quantity: 'Shannon ionic radius' },
  'solution-enthalpies.json': { min: -600, max: 600, unit: 'kJ/mol', quantity: 'enthalpy of solution' },
  'thermochemical-radii.json': { min: 0.3, max: 6, unit: 'Å', quantity: 'thermochemical radius' },
};

/** Plausible other numeric fields, by table and field (common practice). */
const FIELD_RANGES: Record<string, Record<string, Range>> = {
  'crystals.json': {
    latticeParameter: { min: 1, max: 100, unit: 'Å', quantity: 'lattice parameter' },
    density: { min: 0.3, max: 25, unit: 'g/cm³', quantity: 'crystal density' },
  },
};

const article = (word: string): string => (/^[aeiou]/i.test(word) ? 'an' : 'a');

/** Hints for the slips a value outside its range most often is. */
function slipHint(value: number, range: Range): string {
  if (range.unit === 'Å' && value > range.max) return value > 10 * range.max ? ' (a radius in pm? 1 Å = 100 pm)' : ' (a diameter, or a radius in another unit?)';
  if (range.unit === 'Å' && value < range.min) return ' (a radius in nm or m? 1 Å = 0.1 nm)';
  if (range.unit === 'kJ/mol' && Math.abs(value) > 1000 * Math.max(Math.abs(range.min), Math.abs(range.max)) / 100) return ' (a value in J/mol? 1 kJ/mol = 1000 J/mol)';
  return '';
}

/**
 * Every override record whose numbers lie outside what the quantity can be (a unit slip), and every uncertainty
 * larger than the whole plausible range, as problems naming the table, the record and the field.
 *
 * @param tables - records by table file name (`shannon-radii.json`…), as read from the override file
 */
export function implausibleOverrides(tables: Record<string, readonly unknown[]>): OverrideProblem[] {
  const problems: OverrideProblem[] = [];
  for (const [table, records] of Object.entries(tables)) {
    if (!Array.isArray(records)) continue; // the merge names the problem
    const valueRange = VALUE_RANGES[table];
    const fields: Record<string, Range> = { ...(valueRange ? { value: valueRange } : {}), ...(FIELD_RANGES[table] ?? {}) };
    records.forEach((raw: unknown, i) => {
      if (raw === null || typeof raw !== 'object') return; // the schema names the problem
      const record = raw as Record<string, unknown>;
      const where = `${table} record ${i + 1}${recordName(record)}`;
      for (const [field, range] of Object.entries(fields)) {
        const v = record[field];
        if (typeof v !== 'number' || !Number.isFinite(v) || (v >= range.min && v <= range.max)) continue;
        const unit = range.unit ? ` ${range.unit}` : '';
        problems.push({ field: `${table}[${i}].${field}`, message: `${where}, field "${field}": ${v}${unit} is outside the plausible range of ${article(range.quantity)} ${range.quantity}, ${range.min} to ${range.max}${unit}; check the unit${slipHint(v, range)}` });
      }
      const u = record.uncertainty;
      if (valueRange && typeof u === 'number' && Number.isFinite(u) && u > valueRange.max - valueRange.min) {
        const unit = valueRange.unit ? ` ${valueRange.unit}` : '';
        problems.push({ field: `${table}[${i}].uncertainty`, message: `${where}, field "uncertainty": ${u}${unit} is larger than the whole plausible range of ${article(valueRange.quantity)} ${valueRange.quantity} (${valueRange.max - valueRange.min}${unit}); check the unit` });
      }
    });
  }
  return problems;
}
