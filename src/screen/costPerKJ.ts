import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import type { Direction } from './screenRow.js';

/**
 * The price of one kJ of heat in the chosen direction,
 *
 *   c = p / h,
 *
 * with p the price of the solid per kg and h the heat per gram of it in the
 * wanted direction (J/g = kJ/kg: the heat absorbed for `cool`, released for
 * `heat`). The 95 % interval maps the interval of h through 1/h, so it is
 * not symmetric: [p/h_high, p/h_low]; u is the first-order p·u(h)/h².
 * Undefined when the interval of h reaches zero or the wrong sign: then no
 * finite cost can be bounded.
 *
 * @param pricePerKg - price of the solid as listed, per kg (any currency)
 * @param perGram - heat absorbed per gram of salt, J/g, positive = cools (`perGram.salt` of {@link dissolve})
 * @param direction - `cool` or `heat`
 * @returns price per kJ, in the currency of the price (unit `price/kJ`)
 * @example
 * ```ts
 * // KNO3: 34.89 kJ/mol (CRC) over 101.10 g/mol = 345.1 J/g; at 2.00 per kg, 2.00 / 345.1 = 0.00580 per kJ
 * const h = dissolve('KNO3').perGram.salt;
 * costPerKJ(2.0, h, 'cool')?.value; // ≈ 0.0058
 * costPerKJ(2.0, h, 'heat'); // undefined (KNO3 does not heat)
 * ```
 */
export function costPerKJ(pricePerKg: number, perGram: Estimate, direction: Direction): Estimate | undefined {
  const sign = direction === 'cool' ? 1 : -1;
  const value = sign * perGram.value;
  const low = Math.min(sign * perGram.low, sign * perGram.high);
  const high = Math.max(sign * perGram.low, sign * perGram.high);
  if (!(low > 0) || !Number.isFinite(pricePerKg) || pricePerKg < 0) return undefined;
  return makeEstimate({
    quantity: `cost per kJ of heat ${direction === 'cool' ? 'absorbed' : 'released'}`,
    value: pricePerKg / value,
    u: (pricePerKg * perGram.u) / (value * value),
    low: pricePerKg / high,
    high: pricePerKg / low,
    unit: 'price/kJ',
    basis: perGram.basis,
    method: 'price-per-heat',
    sources: perGram.sources,
    notes: ['price per kJ in the currency of pricePerKg; the interval maps the heat interval through 1/h'],
  });
}
