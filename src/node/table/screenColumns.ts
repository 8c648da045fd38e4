/**
 * The columns of the CSV output of a screen. Each header is the path of the
 * field in the JSON output, so that the same names work in a `--spec`, in
 * the JSON and in a spreadsheet. Columns that could only ever be empty in a
 * run are left out: the fill columns without a fill, the spec columns
 * without a spec, override columns the input does not have, and the
 * objective columns when the objective is the enthalpy (they would repeat best).
 *
 * @module
 */
import type { ScreenRow, ScreenSettings } from '../../screen/screenRow.js';
import { worstSeverity, type Caution } from '../../quantity/caution.js';

type Cell = string | number | boolean | undefined;
export interface Column {
  header: string;
  get(row: ScreenRow): Cell;
}

/** Every caution of a row: the salt's own, the standard fill's and the standard warmer's. */
function rowCautions(r: ScreenRow): Caution[] {
  return [...(r.cautions ?? []), ...(r.fill?.cautions ?? []), ...(r.warmer?.cautions ?? [])];
}

/** The distinct kinds of a row's cautions, space-separated, in order of first appearance. */
function cautionKinds(r: ScreenRow): string | undefined {
  const kinds = [...new Set(rowCautions(r).map((c) => c.kind))];
  return kinds.length > 0 ? kinds.join(' ') : undefined;
}

const OVERRIDES = ['measuredEnthalpy', 'measuredUncertainty', 'solubility', 'source'] as const;

/**
 * The columns for a run with these settings.
 *
 * @param inputColumns - the candidate fields the input can have (a CSV file's header); default all
 */
export function screenColumns(settings: ScreenSettings, inputColumns?: readonly string[]): Column[] {
  const has = (field: string) => inputColumns === undefined || inputColumns.includes(field);
  const columns: Column[] = [
    { header: 'line', get: (r) => r.line },
    { header: 'status', get: (r) => r.status },
    { header: 'input.formula', get: (r) => r.input.formula },
    { header: 'formula', get: (r) => r.formula },
    { header: 'best.value', get: (r) => r.best?.value },
    { header: 'best.u', get: (r) => r.best?.u },
    { header: 'best.low', get: (r) => r.best?.low },
    { header: 'best.high', get: (r) => r.best?.high },
    { header: 'best.basis', get: (r) => r.best?.basis },
    { header: 'verdict', get: (r) => r.verdict },
    { header: 'probabilityEndothermic', get: (r) => r.probabilityEndothermic },
    { header: 'perGram.salt.value', get: (r) => r.perGram?.salt.value },
    { header: 'suitability', get: (r) => r.suitability },
  ];
  // With the enthalpy as objective, the objective columns would repeat best.*.
  if (settings.objective !== 'enthalpy') {
    columns.push(
      { header: 'objective.value', get: (r) => r.objective?.value },
      { header: 'objective.low', get: (r) => r.objective?.low },
      { header: 'objective.high', get: (r) => r.objective?.high },
      { header: 'objective.unit', get: (r) => r.objective?.unit },
    );
  }
  if (settings.fill) {
    columns.push(
      { header: 'fill.finalTemperature.value', get: (r) => r.fill?.finalTemperature.value },
      { header: 'fill.finalTemperature.low', get: (r) => r.fill?.finalTemperature.low },
      { header: 'fill.finalTemperature.high', get: (r) => r.fill?.finalTemperature.high },
    );
  }
  if (has('pricePerKg')) {
    columns.push(
      { header: 'input.pricePerKg', get: (r) => r.input.pricePerKg },
      { header: 'costPerKJ.value', get: (r) => r.costPerKJ?.value },
      { header: 'costPerKJ.low', get: (r) => r.costPerKJ?.low },
      { header: 'costPerKJ.high', get: (r) => r.costPerKJ?.high },
    );
  }
  for (const field of OVERRIDES) if (has(field)) columns.push({ header: `input.${field}`, get: (r) => r.input[field] });
  columns.push({ header: 'hazards', get: (r) => (r.hazards && r.hazards.length > 0 ? r.hazards.join(' ') : r.hazardData) });
  // The JSON's cautions list in two cells: the most serious severity of the row (its fill and warmer included) and the kinds.
  columns.push({ header: 'cautions.severity', get: (r) => worstSeverity(rowCautions(r)) }, { header: 'cautions.kind', get: cautionKinds });
  if (settings.spec !== null) columns.push({ header: 'spec.holds', get: (r) => r.spec?.holds }, { header: 'spec.reason', get: (r) => r.spec?.reason });
  columns.push(
    { header: 'duplicateOf', get: (r) => r.duplicateOf },
    { header: 'error.code', get: (r) => r.error?.code },
    { header: 'error.message', get: (r) => r.error?.message ?? r.excludedBy },
  );
  if (has('note')) columns.push({ header: 'input.note', get: (r) => r.input.note });
  columns.push({ header: 'notes', get: (r) => (r.notes && r.notes.length > 0 ? r.notes.join('; ') : undefined) });
  return columns;
}
