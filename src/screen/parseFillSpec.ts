import { IonheatError } from '../error.js';
import { checkOptionKeys, describeValue, numberProblem, optionNames, withinRule } from '../quantity/argumentChecks.js';
import { packInputNumber, PACK_INPUT_RANGES, type PackInputName } from '../pack/packInput.js';
import { unsignedZero } from '../numeric/unsignedZero.js';
import type { FillSpec } from './screenRow.js';

/** Reads a plain decimal number (digits, optional point, optional sign); undefined for anything else. */
function decimal(text: string): number | undefined {
  const s = text.trim();
  if (s.length === 0 || s.length > 30) return undefined;
  let i = s[0] === '-' || s[0] === '+' || s[0] === '−' ? 1 : 0;
  let digits = 0;
  let point = false;
  for (; i < s.length; i++) {
    const c = s[i]!;
    if (c >= '0' && c <= '9') digits++;
    else if (c === '.' && !point) point = true;
    else return undefined;
  }
  return digits > 0 ? Number(s.replace('−', '-')) : undefined;
}

/**
 * Reads a standard fill written `<salt-g>:<water-g>@<start-°C>`, e.g.
 * `40:80@22` for 40 g of salt in 80 g of water starting at 22 °C (a trailing
 * `°C` or `C` is allowed). Masses and the start temperature take the ranges of
 * a pack fill ({@link packFinalTemperature}): a milligram to a tonne, and from
 * 0 °C up to (not including) 100 °C, where water is liquid.
 *
 * @param text - `<salt-g>:<water-g>@<start-°C>`, masses in g, start temperature in °C
 * @returns masses in g and the start temperature in °C
 * @throws IonheatError `INVALID_ARGUMENT` naming the part that is wrong
 * @see docs/methods.md, "Screening", on the standard fill; the fill is then solved as in {@link packFinalTemperature}.
 *
 * @example
 * ```ts
 * parseFillSpec('40:80@22'); // { saltMassG: 40, waterMassG: 80, startC: 22 }
 * parseFillSpec('25.5:100@20 °C').waterMassG; // 100
 * parseFillSpec('40:80@0').startC; // 0
 * ```
 */
export function parseFillSpec(text: string): FillSpec {
  const usage = 'write a fill as <salt-g>:<water-g>@<start-°C>, e.g. 40:80@22';
  if (typeof text !== 'string' || text.length > 60) throw new IonheatError('INVALID_ARGUMENT', `fill: ${usage}`, { field: 'fill' });
  const at = text.indexOf('@');
  const colon = text.indexOf(':');
  if (at < 0 || colon < 0 || colon > at) throw new IonheatError('INVALID_ARGUMENT', `fill "${text}": ${usage}`, { field: 'fill', text });
  let start = text.slice(at + 1).trim();
  for (const suffix of ['°C', 'C', '°']) if (start.endsWith(suffix)) start = start.slice(0, -suffix.length).trim();
  const part = (value: number | undefined, name: PackInputName, words: string): number => {
    if (value === undefined) throw new IonheatError('INVALID_ARGUMENT', `fill "${text}": ${words} must be a number, ${usage}`, { field: 'fill', text });
    if (withinRule(value, PACK_INPUT_RANGES[name])) return unsignedZero(value);
    throw new IonheatError('INVALID_ARGUMENT', `fill "${text}": ${words} ${numberProblem(value, PACK_INPUT_RANGES[name])}`, { field: 'fill', text });
  };
  return {
    saltMassG: part(decimal(text.slice(0, colon).replace(/g$/i, '')), 'massG', 'the salt mass (before ":")'),
    waterMassG: part(decimal(text.slice(colon + 1, at).replace(/g$/i, '')), 'waterG', 'the water mass (between ":" and "@")'),
    startC: part(decimal(start), 'startC', 'the start temperature (after "@")'),
  };
}

const FILL_SPEC_KEYS = optionNames<FillSpec>('a standard fill', { saltMassG: true, waterMassG: true, startC: true });

/**
 * A screen's standard fill as given — an object `{ saltMassG, waterMassG, startC }` or its text `40:80@22` —
 * checked against the ranges of a pack fill, errors naming the key or the part of the text.
 */
export function checkFillSpec(fill: FillSpec | string): FillSpec {
  if (typeof fill === 'string') return parseFillSpec(fill);
  if (fill === null || typeof fill !== 'object') throw new IonheatError('INVALID_ARGUMENT', `fill: a standard fill is { saltMassG, waterMassG, startC } or text such as 40:80@22, got ${describeValue(fill)}`, { field: 'fill' });
  checkOptionKeys(fill, FILL_SPEC_KEYS, 'fill');
  return {
    saltMassG: packInputNumber(fill.saltMassG, 'massG', 'fill.saltMassG', 'the salt of the standard fill'),
    waterMassG: packInputNumber(fill.waterMassG, 'waterG', 'fill.waterMassG', 'the water of the standard fill'),
    startC: packInputNumber(fill.startC, 'startC', 'fill.startC', 'the start temperature of the standard fill'),
  };
}
