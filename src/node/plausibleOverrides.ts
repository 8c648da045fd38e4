/**
 * Plausible ranges of a user's override values, checked before they are merged: a value that passes the schema
 * (a positive radius, a finite enthalpy) may still be in the wrong unit — a radius of 1.02e-10 "Å" entered in
 * metres, an enthalpy of 1e9 kJ/mol entered in J. Such a record is refused with a message naming the file, the
 * table, the record and the field. The ranges are wide (an order of magnitude or more around every value of the
 * built-in tables) and are common practice, not published limits.
 *
 * @module
 */
import { IonheatError } from '../error.js';

interface Range {
  min: number;
  max: number;
  unit: string;
}

/** Plausible `value` of a record, per table (common practice: wide bounds around the built-in values). */
const VALUE_RANGES: Record<string, Range> = {
  'atomization-enthalpies.json': { min: 1, max: 5000, unit: 'kJ/mol' },
  'bond-dissociation.json': { min: 1, max: 5000, unit: 'kJ/mol' },
  'born-exponents.json': { min: 1, max: 30, unit: '' },
  'compound-formation.json': { min: -50_000, max: 10_000, unit: 'kJ/mol' },
  'electron-affinities.json': { min: -2000, max: 2000, unit: 'kJ/mol' },
  'elements.json': { min: 0.5, max: 400, unit: 'g/mol' },
  'heat-capacities.json': { min: -5000, max: 10_000, unit: 'J/(mol·K)' },
  'hydration-enthalpies.json': { min: -20_000, max: 1000, unit: 'kJ/mol' },
  'ion-formation-aq.json': { min: -20_000, max: 20_000, unit: 'kJ/mol' },
  'ion-formation-gas.json': { min: -20_000, max: 50_000, unit: 'kJ/mol' },
  'ion-heat-capacities-aq.json': { min: -5000, max: 5000, unit: 'J/(mol·K)' },
  'ion-volumes.json': { min: 1e-4, max: 5, unit: 'nm³' },
  'ionization-energies.json': { min: 100, max: 200_000, unit: 'kJ/mol' },
  'madelung-constants.json': { min: 0.5, max: 100, unit: '' },
  'shannon-radii.json': { min: 0.05, max: 10, unit: 'Å' },
  'solution-enthalpies.json': { min: -2000, max: 2000, unit: 'kJ/mol' },
  'thermochemical-radii.json': { min: 0.05, max: 10, unit: 'Å' },
};

/** Plausible other numeric fields, by table and field (common practice). */
const FIELD_RANGES: Record<string, Record<string, Range>> = {
  'crystals.json': { latticeParameter: { min: 1, max: 100, unit: 'Å' }, density: { min: 0.1, max: 30, unit: 'g/cm³' } },
};

/** How a record is named in messages: its formula, ion, element or id, as the table keys it. */
function recordName(record: Record<string, unknown>): string {
  for (const key of ['formula', 'ion', 'id', 'symbol', 'element', 'subject', 'structure', 'core', 'molecule']) {
    const v = record[key];
    if (typeof v === 'string') return ` (${v.length > 40 ? `${v.slice(0, 40)}…` : v})`;
  }
  return '';
}

function refuse(label: string, table: string, i: number, record: Record<string, unknown>, field: string, value: number, range: Range, what: string): never {
  const unit = range.unit ? ` ${range.unit}` : '';
  throw new IonheatError(
    'INVALID_DATA',
    `${label}: ${table} record ${i + 1}${recordName(record)}, field "${field}": ${value}${unit} is outside the plausible ${what} ${range.min} to ${range.max}${unit}; check the unit`,
    { field: `${table}[${i}].${field}` },
  );
}

/**
 * Refuses override records whose numbers lie far outside what the quantity can be (a unit slip), and
 * uncertainties larger than the whole plausible range.
 *
 * @param tables - records by table file name (`shannon-radii.json`…), as read from the override file
 * @param label - the file name, for messages
 * @throws IonheatError `INVALID_DATA` naming the file, the table, the record (number and formula or ion) and the field
 */
export function checkPlausibleOverrides(tables: Record<string, readonly unknown[]>, label: string): void {
  for (const [table, records] of Object.entries(tables)) {
    const valueRange = VALUE_RANGES[table];
    const fields: Record<string, Range> = { ...(valueRange ? { value: valueRange } : {}), ...(FIELD_RANGES[table] ?? {}) };
    records.forEach((raw, i) => {
      if (raw === null || typeof raw !== 'object') return; // the schema names the problem
      const record = raw as Record<string, unknown>;
      for (const [field, range] of Object.entries(fields)) {
        const v = record[field];
        if (typeof v === 'number' && Number.isFinite(v) && (v < range.min || v > range.max)) refuse(label, table, i, record, field, v, range, 'range');
      }
      const u = record.uncertainty;
      if (valueRange && typeof u === 'number' && Number.isFinite(u) && u > valueRange.max - valueRange.min) {
        refuse(label, table, i, record, 'uncertainty', u, { ...valueRange, min: 0, max: valueRange.max - valueRange.min }, 'uncertainty, from');
      }
    });
  }
}
