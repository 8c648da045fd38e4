/**
 * Madelung constants computed by Ewald summation, for any periodic
 * arrangement of point charges.
 *
 * @module
 */
import { IonheatError } from '../error.js';
import { numberArgument, optionsArgument, optionNames } from '../quantity/argumentChecks.js';

const EWALD_OPTIONS = optionNames<EwaldOptions>('ewaldMadelung', { formulaUnits: true, chargeProduct: true, tolerance: true });

/** A vector in Cartesian (lattice vectors) or fractional (positions) coordinates. */
export type Vec3 = readonly [number, number, number];

/** A periodic arrangement of point charges: one cell and its contents. */
export interface PointChargeCell {
  /** The three lattice vectors a, b, c in Cartesian coordinates, any length unit (Å by habit). */
  lattice: readonly [Vec3, Vec3, Vec3];
  /** Every site of the cell: fractional coordinates and charge number. The charges must sum to zero. */
  sites: readonly { position: Vec3; charge: number }[];
}

/** Options of {@link ewaldMadelung}. */
export interface EwaldOptions {
  /** Formula units in the cell; default: the greatest common divisor of the numbers of sites of each charge. */
  formulaUnits?: number;
  /** The |z₊z₋| the constant is divided by; default: that of the nearest cation–anion pair. */
  chargeProduct?: number;
  /** Largest neglected term of either lattice sum, relative (default 1e−12). */
  tolerance?: number;
}

/** What {@link ewaldMadelung} found. */
export interface MadelungResult {
  /** Madelung constant referred to the shortest cation–anion distance and divided by `chargeProduct`. */
  madelung: number;
  /** Coulomb energy of one cell, in units of e²/(4πε₀·L) for the length unit L of the lattice vectors (negative = binding). */
  cellEnergy: number;
  /** Shortest cation–anion distance, length unit of the lattice vectors. */
  shortestDistance: number;
  formulaUnits: number;
  chargeProduct: number;
}

const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const norm = (a: Vec3): number => Math.sqrt(dot(a, a));

/**
 * The complementary error function to about 1e−16 absolute: by the series
 * erf x = (2/√π)e^(−x²) Σ 2ⁿx^(2n+1)/(1·3·…·(2n+1)) below x = 3, by the
 * continued fraction of Laplace above (Abramowitz & Stegun 7.1.6 and 7.1.14).
 *
 * @example
 * ```ts
 * erfc(1); // 0.157299207050285
 * ```
 */
export function erfc(x: number): number {
  if (x < 0) return 2 - erfc(-x);
  if (x < 3) {
    let term = x;
    let sum = x;
    for (let n = 0; n < 200 && term > 1e-17 * sum; n++) {
      term *= (2 * x * x) / (2 * n + 3);
      sum += term;
    }
    return 1 - ((2 / Math.sqrt(Math.PI)) * Math.exp(-x * x) * sum);
  }
  if (x > 27) return 0;
  // Modified Lentz evaluation of x + (1/2)/(x + 1/(x + (3/2)/(x + …))).
  const tiny = 1e-300;
  let f = x;
  let c = x;
  let d = 0;
  for (let n = 1; n < 500; n++) {
    const a = n / 2;
    d = x + a * d;
    d = Math.abs(d) < tiny ? tiny : d;
    c = x + a / c;
    c = Math.abs(c) < tiny ? tiny : c;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.exp(-x * x) / (Math.sqrt(Math.PI) * f);
}

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

function check(cell: PointChargeCell): void {
  const bad = (why: string): never => {
    throw new IonheatError('INVALID_ARGUMENT', `Ewald summation: ${why}`, { field: 'cell' });
  };
  const within = (x: unknown, limit: number): boolean => typeof x === 'number' && Number.isFinite(x) && Math.abs(x) <= limit;
  if (!cell || typeof cell !== 'object' || !Array.isArray(cell.lattice) || cell.lattice.length !== 3) bad('the cell needs three lattice vectors');
  for (const v of cell.lattice) {
    if (!Array.isArray(v) || v.length !== 3 || !v.every((x) => within(x, 1e4))) bad('each lattice vector is three finite numbers of at most 10000 length units');
    if (!(norm(v) >= 1e-4)) bad('a lattice vector is too short (below 0.0001 length units)');
  }
  if (!Array.isArray(cell.sites) || cell.sites.length < 2) bad('the cell needs at least two sites');
  if (cell.sites.length > 500) bad('at most 500 sites per cell');
  for (const s of cell.sites) {
    if (s === null || typeof s !== 'object') bad('each site is { position, charge }');
    if (!Array.isArray(s.position) || s.position.length !== 3 || !s.position.every((x) => within(x, 100))) bad('each site position is three finite fractional coordinates (at most 100 in size)');
    if (!within(s.charge, 100)) bad('each site charge is a finite number of at most 100 elementary charges');
  }
  const total = cell.sites.reduce((q, s) => q + s.charge, 0);
  if (Math.abs(total) > 1e-9) bad(`the cell is not neutral (total charge ${total})`);
  const [a1, a2, a3] = cell.lattice;
  if (!(Math.abs(dot(a1, cross(a2, a3))) >= 1e-3 * norm(a1) * norm(a2) * norm(a3))) bad('the lattice vectors are coplanar or nearly so (the cell volume is below 0.001 of the product of their lengths)');
  // Two sites at the same place (up to a lattice translation) would put a zero distance into the sums.
  for (let i = 0; i < cell.sites.length; i++) {
    for (let j = i + 1; j < cell.sites.length; j++) {
      const p = cell.sites[i]!.position;
      const r = cell.sites[j]!.position;
      if ([0, 1, 2].every((c) => Math.abs(p[c]! - r[c]! - Math.round(p[c]! - r[c]!)) < 1e-9)) bad(`sites ${i} and ${j} are at the same position`);
    }
  }
}

/** The most terms the two lattice sums may take together (about a second of work). */
const MAX_TERMS = 2e8;

/**
 * The Madelung constant of a periodic arrangement of point charges by
 * Ewald's method: the Coulomb energy of the cell split into a real-space
 * sum of erfc-screened pair terms, a reciprocal-space sum over the
 * structure factor, and the self term,
 *
 *   E = ½ΣᵢΣⱼΣₙ′ qᵢqⱼ erfc(α|rᵢⱼ + n|)/|rᵢⱼ + n|
 *     + (2π/V) Σ_{k≠0} e^(−k²/4α²)/k² |Σⱼ qⱼ e^(ik·rⱼ)|²  −  (α/√π) Σᵢ qᵢ²
 *
 * (in units of e²/(4πε₀) per length), then A = −(E/Z)·r₀/|z₊z₋| with Z
 * formula units per cell and r₀ the shortest cation–anion distance. Both
 * sums are cut where their terms fall below `tolerance`, so the constant is
 * converged far below 10⁻⁶; the result does not depend on the cell chosen
 * (primitive, conventional or any supercell).
 *
 * @param cell - lattice vectors and the sites with their charges
 * @param options - formula units in the cell, the charge product |z₊z₋| the constant is divided by, and the relative tolerance of the lattice sums (default 1e−12)
 * @returns the constant, the cell energy, r₀, Z and |z₊z₋|
 * @throws IonheatError `INVALID_ARGUMENT` for a malformed or charged cell
 * @see Ewald, P. P. Ann. Phys. 369, 253 (1921); published constants: CRC Handbook, 'Madelung constants'.
 * @example
 * ```ts
 * // Caesium chloride: simple cubic cell, Cs⁺ at the corner, Cl⁻ at the body centre
 * const cell = { lattice: [[1, 0, 0], [0, 1, 0], [0, 0, 1]], sites: [{ position: [0, 0, 0], charge: 1 }, { position: [0.5, 0.5, 0.5], charge: -1 }] };
 * ewaldMadelung(cell).madelung; // 1.762675
 * ```
 */
export function ewaldMadelung(cell: PointChargeCell, options: EwaldOptions = {}): MadelungResult {
  check(cell);
  options = optionsArgument(options, EWALD_OPTIONS);
  if (options.tolerance !== undefined) numberArgument(options.tolerance, 'tolerance', 'the relative tolerance of the lattice sums', { min: 1e-15, max: 0.1 });
  if (options.chargeProduct !== undefined) numberArgument(options.chargeProduct, 'chargeProduct', 'the charge product |z₊·z₋|', { min: 0, above: true, max: 10_000 });
  if (options.formulaUnits !== undefined) numberArgument(options.formulaUnits, 'formulaUnits', 'the number of formula units in the cell', { min: 1, max: 10_000, integer: true });
  const [a1, a2, a3] = cell.lattice;
  const volume = Math.abs(dot(a1, cross(a2, a3)));
  if (!(volume > 0)) throw new IonheatError('INVALID_ARGUMENT', 'Ewald summation: the lattice vectors are coplanar (zero cell volume)', { field: 'cell' });
  const tolerance = options.tolerance ?? 1e-12;
  const cart = cell.sites.map((s): Vec3 => {
    const [u, v, w] = s.position;
    return [u * a1[0] + v * a2[0] + w * a3[0], u * a1[1] + v * a2[1] + w * a3[1], u * a1[2] + v * a2[2] + w * a3[2]];
  });
  const q = cell.sites.map((s) => s.charge);
  const n = q.length;
  // Reciprocal vectors b_i with a_i·b_j = 2πδ_ij.
  const f = (2 * Math.PI) / dot(a1, cross(a2, a3));
  const b = [cross(a2, a3), cross(a3, a1), cross(a1, a2)].map((v): Vec3 => [v[0] * f, v[1] * f, v[2] * f]) as [Vec3, Vec3, Vec3];
  // Interplanar spacings d_i = 2π/|b_i| bound the translations a sphere of radius R needs.
  const spacing = b.map((v) => (2 * Math.PI) / norm(v));

  // Split parameter: balance the two sums for this many charges in this volume.
  const alpha = Math.sqrt(Math.PI) * (n / (volume * volume)) ** (1 / 6);
  const x = Math.sqrt(-Math.log(tolerance));
  const rCut = x / alpha; // erfc(α·rCut) ≈ tolerance
  const kCut = 2 * alpha * x;

  const nMax = spacing.map((d) => Math.ceil(rCut / d) + 1);
  const hMax = cell.lattice.map((v) => Math.ceil((kCut * norm(v)) / (2 * Math.PI)) + 1);
  const terms = n * n * nMax.reduce((p, m) => p * (2 * m + 1), 1) + n * hMax.reduce((p, m) => p * (2 * m + 1), 1);
  if (!(terms <= MAX_TERMS)) throw new IonheatError('INVALID_ARGUMENT', `Ewald summation: the cell is too skewed or holds too many sites for the lattice sums (about ${terms.toPrecision(2)} terms; at most ${MAX_TERMS})`, { field: 'cell' });
  let real = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const dx = cart[j]![0] - cart[i]![0];
      const dy = cart[j]![1] - cart[i]![1];
      const dz = cart[j]![2] - cart[i]![2];
      const qq = q[i]! * q[j]!;
      for (let h = -nMax[0]!; h <= nMax[0]!; h++) {
        for (let k = -nMax[1]!; k <= nMax[1]!; k++) {
          for (let l = -nMax[2]!; l <= nMax[2]!; l++) {
            if (i === j && h === 0 && k === 0 && l === 0) continue;
            const rx = dx + h * a1[0] + k * a2[0] + l * a3[0];
            const ry = dy + h * a1[1] + k * a2[1] + l * a3[1];
            const rz = dz + h * a1[2] + k * a2[2] + l * a3[2];
            const r = Math.sqrt(rx * rx + ry * ry + rz * rz);
            if (r > rCut) continue;
            real += (qq * erfc(alpha * r)) / r;
          }
        }
      }
    }
  }
  real /= 2;

  let reciprocal = 0;
  for (let h = -hMax[0]!; h <= hMax[0]!; h++) {
    for (let k = -hMax[1]!; k <= hMax[1]!; k++) {
      for (let l = -hMax[2]!; l <= hMax[2]!; l++) {
        if (h === 0 && k === 0 && l === 0) continue;
        const kx = h * b[0][0] + k * b[1][0] + l * b[2][0];
        const ky = h * b[0][1] + k * b[1][1] + l * b[2][1];
        const kz = h * b[0][2] + k * b[1][2] + l * b[2][2];
        const k2 = kx * kx + ky * ky + kz * kz;
        if (k2 > kCut * kCut) continue;
        let re = 0;
        let im = 0;
        for (let j = 0; j < n; j++) {
          const phase = kx * cart[j]![0] + ky * cart[j]![1] + kz * cart[j]![2];
          re += q[j]! * Math.cos(phase);
          im += q[j]! * Math.sin(phase);
        }
        reciprocal += (Math.exp(-k2 / (4 * alpha * alpha)) / k2) * (re * re + im * im);
      }
    }
  }
  reciprocal *= (2 * Math.PI) / volume;

  const self = (-alpha / Math.sqrt(Math.PI)) * q.reduce((s, qi) => s + qi * qi, 0);
  const cellEnergy = real + reciprocal + self;

  // Shortest cation–anion distance and the charges of that pair.
  let r0 = Infinity;
  let pairProduct = 0;
  for (let i = 0; i < n; i++) {
    if (!(q[i]! > 0)) continue;
    for (let j = 0; j < n; j++) {
      if (!(q[j]! < 0)) continue;
      for (let h = -2; h <= 2; h++) {
        for (let k = -2; k <= 2; k++) {
          for (let l = -2; l <= 2; l++) {
            const rx = cart[j]![0] - cart[i]![0] + h * a1[0] + k * a2[0] + l * a3[0];
            const ry = cart[j]![1] - cart[i]![1] + h * a1[1] + k * a2[1] + l * a3[1];
            const rz = cart[j]![2] - cart[i]![2] + h * a1[2] + k * a2[2] + l * a3[2];
            const r = Math.sqrt(rx * rx + ry * ry + rz * rz);
            if (r < r0 - 1e-12) {
              r0 = r;
              pairProduct = Math.abs(q[i]! * q[j]!);
            }
          }
        }
      }
    }
  }
  if (!Number.isFinite(r0) || r0 === 0) throw new IonheatError('INVALID_ARGUMENT', 'Ewald summation: the cell needs both cations and anions at distinct positions', { field: 'cell' });

  let formulaUnits = options.formulaUnits;
  if (formulaUnits === undefined) {
    const counts = new Map<number, number>();
    for (const qi of q) counts.set(qi, (counts.get(qi) ?? 0) + 1);
    formulaUnits = [...counts.values()].reduce(gcd);
  }
  if (!(Number.isInteger(formulaUnits) && formulaUnits > 0)) throw new IonheatError('INVALID_ARGUMENT', `Ewald summation: formula units must be a positive whole number, got ${formulaUnits}`, { field: 'formulaUnits' });
  const chargeProduct = options.chargeProduct ?? pairProduct;
  if (!(chargeProduct > 0)) throw new IonheatError('INVALID_ARGUMENT', `Ewald summation: the charge product must be positive, got ${chargeProduct}`, { field: 'chargeProduct' });
  return { madelung: (-cellEnergy / formulaUnits) * (r0 / chargeProduct), cellEnergy, shortestDistance: r0, formulaUnits, chargeProduct };
}
