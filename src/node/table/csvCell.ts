/**
 * A value as a CSV cell: numbers stay numbers (finite ones), true/false are
 * written as words, an absent value is an empty cell. Formula injection is
 * neutralised by the CSV writer itself (csv-stringify's `escape_formulas`:
 * a text cell starting with `=`, `+`, `-`, `@`, a tab, a carriage return or
 * their full-width forms gets a leading apostrophe; a negative number does not).
 */
export function csvCell(value: string | number | boolean | undefined): string | number {
  if (value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? value : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  return value;
}
