/**
 * Calibration of the model discrepancy of the charge-type estimate, leave
 * one salt out: each salt with data in turn is predicted from the others of
 * its charge type, on a grid of molalities up to its fitted range, at 25 °C.
 * The residual ratios |r|/(c·m) (c = ν|zMzX|/2) of the salts give the scale
 * s (standard uncertainty per mol/kg, the 95th percentile divided by 1.96);
 * the coverage is the share of each left-out salt's residuals inside
 * ±1.96·s·c·m with s taken from the other salts only.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import { REFERENCE_K } from './debyeHuckelSlopes.js';
import { brineRecords, chargeScaleOf, chargeTypeEstimate, type BrineRecordParameters } from './brineParameterSets.js';
import { osmoticCoefficient, relativeApparentEnthalpy, relativeApparentHeatCapacity, type PitzerParameters } from './pitzerBrine.js';
import type { DiscrepancyScales } from './brineModel.js';

/** Molalities of the calibration grid, mol/kg (each salt up to its fitted range). */
export const CALIBRATION_MOLALITIES = [0.5, 1, 2, 3, 4, 5, 6] as const;

type Quantity = keyof DiscrepancyScales;
const QUANTITIES: readonly Quantity[] = ['osmotic', 'enthalpy', 'heatCapacity'];

/** One left-out residual. */
export interface BrineResidual {
  formula: string;
  quantity: Quantity;
  molality: number;
  /** Own value − estimate (φ dimensionless, φL J/mol, φJ J/(mol·K)). */
  residual: number;
  /** |residual|/(c·m). */
  ratio: number;
}

/** What the calibration gives. */
export interface BrineCalibration {
  scales: DiscrepancyScales;
  residuals: BrineResidual[];
  /** Leave-one-salt-out coverage of the ±1.96·u intervals, per quantity (0–1), and the count of residuals. */
  coverage: Record<Quantity, { covered: number; total: number; share: number }>;
}

function value(q: Quantity, p: PitzerParameters, m: number): number {
  if (q === 'osmotic') return osmoticCoefficient(p, m, REFERENCE_K);
  if (q === 'enthalpy') return relativeApparentEnthalpy(p, m, REFERENCE_K);
  return relativeApparentHeatCapacity(p, m, REFERENCE_K);
}

function has(q: Quantity, r: BrineRecordParameters): boolean {
  return q === 'osmotic' ? true : q === 'enthalpy' ? r.hasEnthalpy : r.hasHeatCapacity;
}

/** The 95th percentile of a list (linear interpolation), 0 when empty. */
function percentile95(values: readonly number[]): number {
  if (values.length === 0) return 0;
  const s = [...values].sort((a, b) => a - b);
  const pos = 0.95 * (s.length - 1);
  const lo = Math.floor(pos);
  const hi = Math.min(s.length - 1, lo + 1);
  return s[lo]! + (s[hi]! - s[lo]!) * (pos - lo);
}

function calibrate(dataset: Dataset): BrineCalibration {
  const records = brineRecords(dataset);
  const residuals: BrineResidual[] = [];
  for (const r of records) {
    const { pitzer } = chargeTypeEstimate(r.pitzer, records, r.formula);
    const c = chargeScaleOf(r.pitzer);
    for (const q of QUANTITIES) {
      if (!has(q, r)) continue;
      for (const m of CALIBRATION_MOLALITIES) {
        if (m > r.record.maxMolality) continue;
        const residual = value(q, r.pitzer, m) - value(q, pitzer, m);
        residuals.push({ formula: r.formula, quantity: q, molality: m, residual, ratio: Math.abs(residual) / (c * m) });
      }
    }
  }
  const scaleOf = (q: Quantity, exclude?: string): number =>
    percentile95(residuals.filter((x) => x.quantity === q && x.formula !== exclude).map((x) => x.ratio)) / COVERAGE_95;
  const scales: DiscrepancyScales = { osmotic: scaleOf('osmotic'), enthalpy: scaleOf('enthalpy'), heatCapacity: scaleOf('heatCapacity') };
  const coverage = {} as BrineCalibration['coverage'];
  for (const q of QUANTITIES) {
    const mine = residuals.filter((x) => x.quantity === q);
    let covered = 0;
    for (const x of mine) if (x.ratio <= COVERAGE_95 * scaleOf(q, x.formula)) covered++;
    coverage[q] = { covered, total: mine.length, share: mine.length ? covered / mine.length : 1 };
  }
  return { scales, residuals, coverage };
}

/**
 * The leave-one-salt-out calibration of the brine model's discrepancy (kept
 * per dataset): for each of φ, φL and φJ, the scale s such that
 * u = s·(ν|zMzX|/2)·m, with s = P95(|own − estimate|/(c·m))/1.96 over the
 * salts with data, and the share of each left-out salt's residuals inside
 * ±1.96·u when s comes from the others only.
 *
 * @param dataset - the Pitzer table (default: built-in)
 * @see pitzerDat (parameters); docs/methods.md, "Brines"
 * @example
 * ```ts
 * brineCalibration().coverage.enthalpy.share >= 0.9; // true
 * ```
 */
export function brineCalibration(dataset: Dataset = builtinDataset()): BrineCalibration {
  return dataset.memo('brine.calibration', () => calibrate(dataset));
}

/** The calibrated scales alone. */
export function discrepancyScalesOf(dataset: Dataset = builtinDataset()): { scales: DiscrepancyScales } {
  return { scales: dataset.memo('brine.discrepancyScales', () => brineCalibration(dataset).scales) };
}
