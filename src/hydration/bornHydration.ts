/**
 * The Born estimate of a single-ion hydration enthalpy, for ions the tables
 * lack, with the effective-radius offsets of Latimer, Pitzer and Slansky
 * recalibrated on the ions that do have tabulated values, and an interval
 * from the leave-one-out scatter of that calibration.
 *
 * @module
 */
import { optionsArgument, optionNames } from '../quantity/argumentChecks.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { findIon } from '../chem/ionIndex.js';
import { COULOMB_KJ_ANGSTROM, COVERAGE_95, STANDARD_TEMPERATURE } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { quantile } from '../numeric/quantile.js';
import { goldenSectionMaximum } from '../numeric/goldenSectionMaximum.js';

const BORN_HYDRATION_OPTIONS = optionNames<{ excludeIon?: string }>('bornHydrationEnthalpy', { excludeIon: true });

/**
 * Relative permittivity of water against temperature t (°C), 0–100 °C:
 * ε = 87.740 − 0.40008·t + 9.398·10⁻⁴·t² − 1.410·10⁻⁶·t³.
 * Coefficients recalled from memory, not checked against the paper.
 *
 * @see Malmberg, C. G.; Maryott, A. A. Dielectric constant of water from 0° to 100 °C. J. Res. Natl. Bur. Stand. 56, 1–8 (1956).
 */
const WATER_PERMITTIVITY = [87.74, -0.40008, 9.398e-4, -1.41e-6] as const;

/**
 * The radius offsets Latimer, Pitzer and Slansky added to Pauling crystal
 * radii to make the Born equation fit hydration free energies: 0.85 Å for
 * cations, 0.10 Å for anions (recalled from memory). ionheat starts from
 * these and refits them to tabulated hydration enthalpies.
 *
 * @see Latimer, W. M.; Pitzer, K. S.; Slansky, C. M. The free energy of hydration of gaseous ions, and the absolute potential of the normal calomel electrode. J. Chem. Phys. 7, 108–111 (1939).
 */
export const LPS_OFFSETS = { cation: 0.85, anion: 0.1 } as const;

/** Fewest tabulated ions of one charge that get their own fitted offset. */
const MIN_CLASS_SIZE = 3;

/** ε and T·dε/dT of water at 25 °C from the polynomial above. */
function permittivityAt25(): { epsilon: number; tDepsDt: number } {
  const t = 25;
  const [a, b, c, d] = WATER_PERMITTIVITY;
  const epsilon = a + b * t + c * t * t + d * t * t * t;
  const dEpsDt = b + 2 * c * t + 3 * d * t * t;
  return { epsilon, tDepsDt: STANDARD_TEMPERATURE * dEpsDt };
}

/**
 * The Born enthalpy factor 1 − 1/ε − (T/ε²)·(∂ε/∂T): the hydration enthalpy
 * of a charged sphere is −(N_A e²/8πε₀)·(z²/r)·(this factor). About 1.0045
 * for water at 25 °C (the entropy term outweighs 1/ε).
 */
export function bornEnthalpyFactor(): number {
  const { epsilon, tDepsDt } = permittivityAt25();
  return 1 - 1 / epsilon - tDepsDt / (epsilon * epsilon);
}

/** The radius the Born estimate uses for an ion, and where it comes from. */
export interface BornRadius {
  radius: number;
  /** `shannon` (effective ionic radius, coordination `coordination`) or `thermochemical`. */
  kind: 'shannon' | 'thermochemical';
  coordination?: number;
  source: string;
}

function radiusIndex(dataset: Dataset) {
  return dataset.memo('hydration.bornRadii', () => {
    const shannon = new Map<string, { value: number; coordination: number; source: string }>();
    for (const r of dataset.records('shannon-radii.json')) {
      if (r.spin === 'low') continue;
      const prior = shannon.get(r.ion);
      // Six-coordinate where tabulated, else the coordination nearest six (the lower on a tie).
      const better = !prior || Math.abs(r.coordination - 6) < Math.abs(prior.coordination - 6) || (Math.abs(r.coordination - 6) === Math.abs(prior.coordination - 6) && r.coordination < prior.coordination);
      if (better) shannon.set(r.ion, { value: r.value, coordination: r.coordination, source: r.source });
    }
    const thermochemical = new Map(dataset.records('thermochemical-radii.json').map((r) => [r.ion, r]));
    return { shannon, thermochemical };
  });
}

/**
 * The radius for the Born estimate: the thermochemical radius for a
 * polyatomic ion, Shannon's effective ionic radius (six-coordinate, high
 * spin, where tabulated) for a monatomic one; either as the fallback.
 */
export function bornRadius(ion: string, dataset: Dataset = builtinDataset()): BornRadius | undefined {
  const record = findIon(ion, dataset);
  if (!record || record.charge === 0) return undefined;
  const { shannon, thermochemical } = radiusIndex(dataset);
  const s = shannon.get(ion);
  const t = thermochemical.get(ion);
  const fromShannon = s ? ({ radius: s.value, kind: 'shannon', coordination: s.coordination, source: s.source } as const) : undefined;
  const fromThermo = t ? ({ radius: t.value, kind: 'thermochemical', source: t.source } as const) : undefined;
  return record.kind === 'polyatomic' ? (fromThermo ?? fromShannon) : (fromShannon ?? fromThermo);
}

/** −(N_A e²/8πε₀)·z²/(r + δ)·factor, kJ/mol. */
function bornValue(charge: number, radius: number, offset: number, factor: number): number {
  return (-(COULOMB_KJ_ANGSTROM / 2) * charge * charge * factor) / (radius + offset);
}

interface CalibrationPoint {
  ion: string;
  charge: number;
  radius: number;
  value: number;
}

/** Where the fitted radius offset δ is sought, Å, and in how many golden-section steps (the bracket shrinks to about 1e-16 Å). */
const OFFSET_RANGE_ANGSTROM = { min: -0.5, max: 3 };
const OFFSET_STEPS = 80;

/** The offset δ that minimises Σ((born − tabulated)/tabulated)², by golden-section search on [−0.5, 3] Å. */
function fitOffset(points: readonly CalibrationPoint[], factor: number): number {
  const cost = (d: number) => points.reduce((s, p) => s + ((bornValue(p.charge, p.radius, d, factor) - p.value) / p.value) ** 2, 0);
  // Searched over −δ: the search then settles ties between equal costs towards the larger δ, as the fit always has.
  const { lo, hi } = goldenSectionMaximum((m) => -cost(-m), -OFFSET_RANGE_ANGSTROM.max, -OFFSET_RANGE_ANGSTROM.min, 0, OFFSET_STEPS);
  return -(lo + hi) / 2;
}

/** One group of the calibration: all ions of one sign, or of one sign and charge. */
export interface BornClass {
  /** `+1`, `+2`, `−1`…, or `+` / `−` for the pooled fit of a sign. */
  key: string;
  /** Fitted radius offset δ, Å. */
  offset: number;
  /** Relative standard uncertainty of an estimate, from the leave-one-out residuals. */
  relativeU: number;
  /** Tabulated ions the class was fitted on. */
  ions: string[];
  /** Leave-one-out relative residuals (born − tabulated)/|tabulated|, in the order of `ions`. */
  residuals: number[];
}

/** The whole calibration: per class and pooled per sign. */
export interface BornCalibration {
  factor: number;
  classes: BornClass[];
  /**
   * Factor (≥ 1) applied to every class's RMS so that 95 % of the
   * leave-one-out residuals, each divided by the RMS of the other ions of its class, fall within
   * ±1.96: the normal interval alone covers too few of these heavy-tailed misses.
   */
  coverageFactor: number;
}

function classOf(points: readonly CalibrationPoint[], key: string, factor: number): BornClass {
  const offset = fitOffset(points, factor);
  const residuals = points.map((p, i) => {
    const rest = points.filter((_, j) => j !== i);
    const d = rest.length > 0 ? fitOffset(rest, factor) : offset;
    return (bornValue(p.charge, p.radius, d, factor) - p.value) / Math.abs(p.value);
  });
  const rms = Math.sqrt(residuals.reduce((s, r) => s + r * r, 0) / Math.max(1, residuals.length));
  return { key, offset, relativeU: rms, ions: points.map((p) => p.ion), residuals };
}

const chargeKey = (charge: number): string => `${charge > 0 ? '+' : '−'}${Math.abs(charge)}`;
const signKey = (charge: number): string => (charge > 0 ? '+' : '−');

/**
 * Fits the Born radius offsets to the tabulated single-ion hydration
 * enthalpies (absolute scale) of the dataset: one offset per charge where at
 * least three ions of that charge are tabulated, and one per sign. Built
 * once per dataset. `excludeIon` leaves one ion out (for its own
 * leave-one-out estimate).
 */
export function bornCalibration(options: { excludeIon?: string } = {}, dataset: Dataset = builtinDataset()): BornCalibration {
  const excludeIon = options.excludeIon;
  const build = (): BornCalibration => {
    const factor = bornEnthalpyFactor();
    const points: CalibrationPoint[] = [];
    for (const r of dataset.records('hydration-enthalpies.json')) {
      if (r.ion === excludeIon || r.ion === 'H[+]') continue;
      const ion = findIon(r.ion, dataset);
      const radius = bornRadius(r.ion, dataset);
      if (!ion || !radius || ion.charge === 0) continue;
      points.push({ ion: r.ion, charge: ion.charge, radius: radius.radius, value: r.value });
    }
    points.sort((a, b) => (a.ion < b.ion ? -1 : a.ion > b.ion ? 1 : 0)); // independent of table order
    const classes: BornClass[] = [];
    for (const sign of [1, -1]) {
      const ofSign = points.filter((p) => Math.sign(p.charge) === sign);
      if (ofSign.length === 0) continue;
      classes.push(classOf(ofSign, signKey(sign), factor));
      const charges = [...new Set(ofSign.map((p) => p.charge))].sort((a, b) => Math.abs(a) - Math.abs(b));
      for (const z of charges) {
        const ofCharge = ofSign.filter((p) => p.charge === z);
        if (ofCharge.length >= MIN_CLASS_SIZE) classes.push(classOf(ofCharge, chargeKey(z), factor));
      }
    }
    // Each ion's residual scaled by the RMS of the class it is estimated from.
    const scaled: number[] = [];
    for (const cls of classes) {
      const isPool = cls.key === '+' || cls.key === '−';
      cls.ions.forEach((ion, i) => {
        const p = points.find((q) => q.ion === ion)!;
        const own = classes.some((c) => c.key === chargeKey(p.charge));
        if (isPool === own) return; // count each ion once, in the class it uses
        // The RMS without this ion's own residual, as its leave-one-out estimate would see it.
        const n = cls.residuals.length;
        const rest = n > 1 ? Math.sqrt((cls.relativeU ** 2 * n - cls.residuals[i]! ** 2) / (n - 1)) : 0;
        if (rest > 0) scaled.push(Math.abs(cls.residuals[i]!) / rest);
      });
    }
    scaled.sort((a, b) => a - b);
    const coverageFactor = Math.max(1, quantile(scaled, 0.95) / COVERAGE_95);
    return { factor, classes, coverageFactor };
  };
  return excludeIon === undefined ? dataset.memo('hydration.bornCalibration', build) : build();
}

/**
 * Born estimate of the absolute hydration enthalpy of one ion, kJ/mol:
 *
 *   ΔhydH° ≈ −(N_A e²/8πε₀)·z²/(r + δ)·[1 − 1/ε − (T/ε²)(∂ε/∂T)]
 *
 * with r the ion's radius (Shannon six-coordinate for a monatomic ion,
 * thermochemical for a polyatomic one), ε the permittivity of water at
 * 25 °C, and δ the Latimer–Pitzer–Slansky offset refitted to the tabulated
 * ions of the same charge (or the same sign, where fewer than three of that
 * charge are tabulated). The standard uncertainty is the leave-one-out RMS
 * relative residual of the fit times |ΔhydH°|, widened by the calibration's
 * coverage factor so that 95 % of the leave-one-out misses fall inside the
 * 95 % interval; where the charge lies outside
 * the calibration, the largest leave-one-out residual of the sign is used
 * instead, and the result says so. Always flagged as an estimate.
 *
 * @param ion - an ion id, e.g. `SO4[2-]`
 * @param options - calibration choices
 * @param options.excludeIon - leave this ion out of the calibration (to test the estimate on a tabulated ion)
 * @param dataset - radii (Å) and the tabulated hydration enthalpies (kJ/mol) the offset δ is fitted to (default: built-in)
 * @returns basis `model`, method `born-lps`, on the absolute scale; undefined when no radius is known
 * @see Latimer, Pitzer and Slansky, J. Chem. Phys. 7, 108 (1939); Born, M. Z. Phys. 1, 45 (1920)
 * @example
 * ```ts
 * const e = bornHydrationEnthalpy('SO4[2-]');
 * e?.value; // ≈ -1040 kJ/mol (Marcus tabulates about −1035, from memory)
 * e?.basis; // 'model'
 * ```
 */
export function bornHydrationEnthalpy(ion: string, options: { excludeIon?: string } = {}, dataset: Dataset = builtinDataset()): Estimate | undefined {
  options = optionsArgument(options, BORN_HYDRATION_OPTIONS);
  const record = findIon(ion, dataset);
  const radius = bornRadius(ion, dataset);
  if (!record || !radius || record.charge === 0) return undefined;
  const calibration = bornCalibration(options, dataset);
  const own = calibration.classes.find((c) => c.key === chargeKey(record.charge));
  const pooled = calibration.classes.find((c) => c.key === signKey(record.charge));
  const cls = own ?? pooled;
  if (!cls) return undefined;
  const relativeU = own ? own.relativeU * calibration.coverageFactor : Math.max(cls.relativeU * calibration.coverageFactor, ...cls.residuals.map(Math.abs));
  const value = bornValue(record.charge, radius.radius, cls.offset, calibration.factor);
  const radiusText = radius.kind === 'shannon' ? `Shannon radius ${radius.radius} Å (CN ${radius.coordination})` : `thermochemical radius ${radius.radius} Å`;
  return makeEstimate({
    quantity: 'hydration enthalpy',
    value,
    u: relativeU * Math.abs(value),
    unit: 'kJ/mol',
    basis: 'model',
    method: 'born-lps',
    sources: [radius.source, 'latimer1939', 'malmberg1956'],
    notes: [
      `Born estimate (no tabulated value): ${radiusText} + offset ${cls.offset.toFixed(3)} Å fitted on ${cls.ions.length} tabulated ions (${own ? `charge ${cls.key}` : `all ${cls.key === '+' ? 'cations' : 'anions'}; none of charge ${chargeKey(record.charge)} is tabulated, so the interval uses the largest leave-one-out miss`}); absolute scale`,
    ],
  });
}
