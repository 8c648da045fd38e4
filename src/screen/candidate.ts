/**
 * One candidate of a screen: a formula, optionally with the user's own
 * numbers for it (a measured enthalpy of solution, a solubility, a price,
 * a note). The same fields are the columns of a candidate CSV file and the
 * keys of a candidate JSON row.
 *
 * @module
 */
import { z } from 'zod';
import type { Salt } from '../chem/salt.js';
import { IonheatError } from '../error.js';

const finite = z.number().refine(Number.isFinite, 'must be a finite number');

/** A candidate as the screen reads it, after checking. */
export const candidateInputSchema = z.strictObject({
  /** The salt as written by the user (`KNO3`, `CaCl2·6H2O`, `urea`). */
  formula: z.string().max(200).describe('the salt as written in the input'),
  /** The user's measured enthalpy of solution at infinite dilution, 25 °C, kJ/mol, positive = endothermic. Used in place of the table value. */
  measuredEnthalpy: finite
    .refine((v) => Math.abs(v) <= 2000, 'must lie between -2000 and 2000 kJ/mol (common practice: no enthalpy of solution comes near; check the unit)')
    .optional()
    .describe('your measured enthalpy of solution, kJ/mol, positive = endothermic (the pack cools)'),
  /** Standard uncertainty of `measuredEnthalpy`, kJ/mol; default the solution-enthalpy table's default uncertainty. */
  measuredUncertainty: finite
    .refine((v) => v >= 0, 'must not be negative')
    .refine((v) => v <= 1000, 'must be at most 1000 kJ/mol (check the unit)')
    .optional().describe('standard uncertainty of measuredEnthalpy, kJ/mol'),
  /** Solubility of the anhydrous salt, g per 100 g of water, taken as the same at every temperature of the fill. */
  solubility: finite
    .refine((v) => v > 0, 'must be greater than zero')
    .refine((v) => v <= 100_000, 'must be at most 100000 g per 100 g of water (check the unit)')
    .optional().describe('g of anhydrous salt per 100 g of water, taken as the same at every temperature'),
  /** Price of the solid as listed, per kg, in any currency (the cost per kJ comes out in the same currency). */
  pricePerKg: finite.refine((v) => v >= 0, 'must not be negative').optional().describe('price of the solid per kg, in your currency'),
  /** Source key for `measuredEnthalpy` and `solubility`: a key of the dataset's sources or of the screen's own (`screenInput`, the default). */
  source: z.string().min(1).max(80).optional().describe('source key for measuredEnthalpy and solubility'),
  /** Free text carried through to the output. */
  note: z.string().max(2000).optional().describe('free text carried through'),
});

/** A checked candidate. */
export type CandidateInput = z.infer<typeof candidateInputSchema>;

/** What a screen accepts as one candidate: a formula, a parsed {@link Salt}, or a row of fields. */
export type CandidateLike = string | Salt | { [field: string]: unknown };

/** The candidate fields in column order. */
export const candidateFields = Object.keys(candidateInputSchema.shape) as (keyof CandidateInput)[];

const numericFields = new Set<string>(['measuredEnthalpy', 'measuredUncertainty', 'solubility', 'pricePerKg']);

/**
 * Reads a decimal number the way a person writes one in a table cell:
 * optional sign, digits with an optional point, optional exponent. Nothing
 * else (no `0x`, no `Infinity`, no thousands separators). One pass, no
 * regular expression over the text.
 */
function decimalCell(text: string): number | undefined {
  const s = text.trim();
  if (s.length === 0 || s.length > 40) return undefined;
  let i = 0;
  if (s[i] === '+' || s[i] === '-' || s[i] === '−') i++;
  let digits = 0;
  while (i < s.length && s[i]! >= '0' && s[i]! <= '9') (i++, digits++);
  if (s[i] === '.') {
    i++;
    while (i < s.length && s[i]! >= '0' && s[i]! <= '9') (i++, digits++);
  }
  if (digits === 0) return undefined;
  if (s[i] === 'e' || s[i] === 'E') {
    i++;
    if (s[i] === '+' || s[i] === '-') i++;
    let exp = 0;
    while (i < s.length && s[i]! >= '0' && s[i]! <= '9') (i++, exp++);
    if (exp === 0) return undefined;
  }
  if (i !== s.length) return undefined;
  const n = Number(s.replace('−', '-'));
  return Number.isFinite(n) ? n : undefined;
}

const knownFields = new Set<string>(candidateFields);
const finiteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

/**
 * The common case checked by hand, for speed on long inputs: every field
 * known and of the right kind and range, exactly as {@link candidateInputSchema}
 * requires. Anything else goes through the schema, which says what is wrong
 * (a test holds the two to the same verdicts).
 */
function plainlyValid(fields: Record<string, unknown>): boolean {
  for (const key in fields) if (!knownFields.has(key)) return false;
  const { formula, measuredEnthalpy, measuredUncertainty, solubility, pricePerKg, source, note } = fields;
  if (typeof formula !== 'string' || formula.length > 200) return false;
  if (measuredEnthalpy !== undefined && !(finiteNumber(measuredEnthalpy) && Math.abs(measuredEnthalpy) <= 2000)) return false;
  if (measuredUncertainty !== undefined && !(finiteNumber(measuredUncertainty) && measuredUncertainty >= 0 && measuredUncertainty <= 1000 && measuredEnthalpy !== undefined)) return false;
  if (solubility !== undefined && !(finiteNumber(solubility) && solubility > 0 && solubility <= 100_000)) return false;
  if (pricePerKg !== undefined && !(finiteNumber(pricePerKg) && pricePerKg >= 0)) return false;
  if (source !== undefined && !(typeof source === 'string' && source.length >= 1 && source.length <= 80)) return false;
  if (note !== undefined && !(typeof note === 'string' && note.length <= 2000)) return false;
  return true;
}

function isSalt(x: object): x is Salt {
  return 'ions' in x && 'molarMass' in x && 'anhydrous' in x && typeof (x as Salt).formula === 'string';
}

/**
 * Checks one candidate and returns it as {@link CandidateInput}, with the
 * parsed salt when one was given. Text cells of numeric fields (from CSV)
 * are read as decimal numbers; empty cells count as absent.
 *
 * @throws IonheatError `INVALID_ARGUMENT` naming the field and what was wrong with it
 */
export function readCandidate(raw: CandidateLike): { input: CandidateInput; salt?: Salt } {
  if (typeof raw === 'string') return { input: { formula: raw } };
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    throw new IonheatError('INVALID_ARGUMENT', `a candidate is a formula or an object with a "formula" field, got ${raw === null ? 'null' : Array.isArray(raw) ? 'a list' : typeof raw}`, { field: 'formula' });
  }
  if (isSalt(raw)) return { input: { formula: raw.formula }, salt: raw };
  const fields: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(raw)) {
    if (value === undefined || value === null || value === '') continue;
    if (numericFields.has(key) && typeof value === 'string') {
      const n = decimalCell(value);
      if (n === undefined) throw new IonheatError('INVALID_ARGUMENT', `${key}: "${value.length > 40 ? value.slice(0, 40) + '…' : value}" is not a number`, { field: key, text: value });
      fields[key] = n;
    } else fields[key] = typeof value === 'string' && key !== 'note' ? value.trim() : value;
  }
  if (plainlyValid(fields)) return { input: fields as CandidateInput };
  const parsed = candidateInputSchema.safeParse(fields);
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    const field = issue.path.join('.');
    if (issue.code === 'unrecognized_keys') {
      throw new IonheatError('INVALID_ARGUMENT', `unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.map((k) => `"${k}"`).join(', ')} (a candidate has ${candidateFields.join(', ')})`, { field: issue.keys[0] });
    }
    if (field === 'formula' && fields.formula === undefined) throw new IonheatError('INVALID_ARGUMENT', 'no formula given', { field: 'formula' });
    throw new IonheatError('INVALID_ARGUMENT', `${field}: ${issue.message}`, { field });
  }
  if (parsed.data.measuredUncertainty !== undefined && parsed.data.measuredEnthalpy === undefined) {
    throw new IonheatError('INVALID_ARGUMENT', 'measuredUncertainty is given without measuredEnthalpy', { field: 'measuredUncertainty' });
  }
  return { input: parsed.data };
}
