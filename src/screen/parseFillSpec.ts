import { IonheatError } from '../error.js';
import type { FillSpec } from './screenRow.js';

/**
 * Masses a standard fill may have, g: a milligram to a tonne (as `ionheat pack` accepts). Outside them the
 * numbers say nothing about a pack.
 */
const MIN_MASS_G = 1e-3;
const MAX_MASS_G = 1e6;

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
 * `°C` or `C` is allowed). Masses must lie between a milligram and a tonne; the start temperature
 * must lie between 0 and 100 °C (liquid water).
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
  const saltMassG = decimal(text.slice(0, colon).replace(/g$/i, ''));
  const waterMassG = decimal(text.slice(colon + 1, at).replace(/g$/i, ''));
  const startC = decimal(start);
  if (saltMassG === undefined || !(saltMassG > 0)) throw new IonheatError('INVALID_ARGUMENT', `fill "${text}": the salt mass (before ":") must be a positive number of grams`, { field: 'fill', text });
  if (waterMassG === undefined || !(waterMassG > 0)) throw new IonheatError('INVALID_ARGUMENT', `fill "${text}": the water mass (between ":" and "@") must be a positive number of grams`, { field: 'fill', text });
  for (const [mass, part] of [[saltMassG, 'the salt mass (before ":")'], [waterMassG, 'the water mass (between ":" and "@")']] as const) {
    if (mass < MIN_MASS_G || mass > MAX_MASS_G) throw new IonheatError('INVALID_ARGUMENT', `fill "${text}": ${part} must lie between ${MIN_MASS_G} g and ${MAX_MASS_G} g`, { field: 'fill', text });
  }
  if (startC === undefined || !(startC > 0 && startC < 100)) throw new IonheatError('INVALID_ARGUMENT', `fill "${text}": the start temperature (after "@") must be a number of °C above 0 and below 100, where water is liquid`, { field: 'fill', text });
  return { saltMassG, waterMassG, startC };
}
