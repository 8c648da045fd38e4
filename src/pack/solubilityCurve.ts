/**
 * Solubility against temperature from the solubility table: how many grams of
 * anhydrous salt 100 g of water holds at saturation, and which solid is in
 * equilibrium with the saturated solution there.
 *
 * @module
 */
import { describeValue, numberArgument } from '../quantity/argumentChecks.js';
import { saltArgument } from '../chem/saltArgument.js';
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { parseSalt } from '../chem/parseSalt.js';
import type { Salt } from '../chem/salt.js';
import { IonheatError, isIonheatError } from '../error.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/** One point of a solubility curve, with its equilibrium solid. */
export interface SolubilityPoint {
  /** Temperature, °C. */
  t: number;
  /** Grams of anhydrous salt per 100 g of water at saturation. */
  value: number;
  /** Canonical formula of the solid in equilibrium with the saturated solution. */
  phase: string;
  /** Water of crystallization of that solid per formula unit (0 for the anhydrous salt). */
  phaseWater: number;
  /** True for the salt–ice eutectic added below the tabulated points. */
  eutectic: boolean;
}

/** A salt's solubility curve as the pack model uses it. */
export interface SolubilityCurve {
  /** Canonical anhydrous formula. */
  formula: string;
  /** Sorted by temperature; the eutectic (when given and below the table) comes first. */
  points: SolubilityPoint[];
  /** Range of the tabulated points, °C (the eutectic not counted). */
  tableRange: [number, number];
  /** Salt–ice eutectic: temperature (°C) and mass fraction of anhydrous salt in the liquid. */
  eutectic?: { temperature: number; massFraction: number; source: string; fromMemory: boolean };
  source: string;
  fromMemory: boolean;
}

/** Curves built here from the tables, frozen: trusted without a check (solubilityAt sits inside the fill solver's loop). */
const builtCurves = new WeakSet<object>();

/** The points of a curve a caller passes: at least two, temperatures rising, finite values. */
function checkCurve(curve: SolubilityCurve): void {
  if (typeof curve === 'object' && curve !== null && builtCurves.has(curve)) return;
  const bad = (why: string): never => {
    throw new IonheatError('INVALID_ARGUMENT', `curve must be a solubility curve from solubilityCurve: ${why}`, { field: 'curve' });
  };
  if (curve === null || typeof curve !== 'object' || !Array.isArray(curve.points) || curve.points.length < 2) bad('it needs a list of at least two points');
  let last = -Infinity;
  curve.points.forEach((p, i) => {
    if (p === null || typeof p !== 'object') bad(`points[${i}] is not a point`);
    if (typeof p.t !== 'number' || !(p.t > last) || !(Math.abs(p.t) <= 1000)) bad(`points[${i}].t must be a temperature in °C above the one before, got ${describeValue(p.t)}`);
    if (typeof p.value !== 'number' || !(p.value >= 0 && p.value <= 1e6)) bad(`points[${i}].value must be grams per 100 g of water (0 to 1000000), got ${describeValue(p.value)}`);
    if (typeof p.phase !== 'string' || typeof p.phaseWater !== 'number' || !Number.isFinite(p.phaseWater)) bad(`points[${i}] needs its solid phase and its water`);
    last = p.t;
  });
}

/** Solubility at one temperature. */
export interface SolubilityAt {
  /** Grams of anhydrous salt per 100 g of water. */
  value: number;
  /** Canonical formula of the equilibrium solid. */
  phase: string;
  phaseWater: number;
  /** True when the temperature lies outside the table (and its eutectic) and the end segment was extended. */
  extrapolated: boolean;
}

interface RawPoint {
  t: number;
  value: number;
  solidPhase?: string;
}
interface RawEutectic {
  temperature: number;
  massFraction: number;
  source?: string;
  fromMemory?: boolean;
}

function readPhase(formula: string, where: string, dataset: Dataset): { phase: string; phaseWater: number } {
  try {
    const salt = parseSalt(formula, dataset);
    return { phase: salt.formula, phaseWater: salt.water };
  } catch (e) {
    const why = isIonheatError(e) ? e.message : String(e);
    throw new IonheatError('INVALID_DATA', `${dataset.label} table solubility.json, ${where} ("${formula}"): ${why}`, { field: `solubility.json.${where}` });
  }
}

function buildCurves(dataset: Dataset): ReadonlyMap<string, SolubilityCurve> {
  const curves = new Map<string, SolubilityCurve>();
  dataset.records('solubility.json').forEach((record, i) => {
    const anhydrous = readPhase(record.formula, `record ${i + 1}`, dataset);
    const recordPhase = record.solidPhase ? readPhase(record.solidPhase, `record ${i + 1} solidPhase`, dataset) : anhydrous;
    const raw = [...(record.points as readonly RawPoint[])].sort((a, b) => a.t - b.t);
    const points: SolubilityPoint[] = raw.map((p, k) => ({
      t: p.t,
      value: p.value,
      ...(p.solidPhase ? readPhase(p.solidPhase, `record ${i + 1} point ${k + 1}`, dataset) : recordPhase),
      eutectic: false,
    }));
    const tableRange: [number, number] = [points[0]!.t, points[points.length - 1]!.t];
    const rawEutectic = record.eutectic as RawEutectic | undefined;
    let eutectic: SolubilityCurve['eutectic'];
    if (rawEutectic) {
      eutectic = {
        temperature: rawEutectic.temperature,
        massFraction: rawEutectic.massFraction,
        source: rawEutectic.source ?? record.source,
        fromMemory: rawEutectic.fromMemory ?? record.fromMemory,
      };
      // The eutectic liquid is saturated too: it is the low end of the solubility curve.
      if (rawEutectic.temperature < tableRange[0]) {
        const first = points[0]!;
        const w = rawEutectic.massFraction;
        points.unshift({ t: rawEutectic.temperature, value: (100 * w) / (1 - w), phase: first.phase, phaseWater: first.phaseWater, eutectic: true });
      }
    }
    const curve: SolubilityCurve = { formula: anhydrous.phase, points, tableRange, ...(eutectic ? { eutectic } : {}), source: record.source, fromMemory: record.fromMemory };
    for (const p of points) Object.freeze(p);
    Object.freeze(points);
    Object.freeze(tableRange);
    if (eutectic) Object.freeze(eutectic);
    builtCurves.add(Object.freeze(curve));
    curves.set(anhydrous.phase, curve);
  });
  return curves;
}

/**
 * The solubility curve of a salt (looked up by its anhydrous formula, so a
 * hydrate finds its salt's curve), or undefined when the table has none.
 *
 * @param salt - a formula or a parsed salt; its water of crystallization is ignored
 * @param dataset - the solubility table (default: built-in)
 * @returns points in °C and g anhydrous salt per 100 g water, with the equilibrium solid of each
 * @see the CRC table, source key `crcSolubility`; Seidell (1941), `seidell1941`, for the organic solutes.
 *
 * @example
 * ```ts
 * solubilityCurve('Na2S2O3·5H2O')?.points[0]?.phase; // 'Na2S2O3·5H2O'
 * solubilityCurve('KNO3').points[2]; // { t: 10, value: 21.36, phase: 'KNO3', phaseWater: 0, eutectic: false }
 * ```
 */
export function solubilityCurve(salt: string | Salt, dataset: Dataset = builtinDataset()): SolubilityCurve | undefined {
  const parsed = saltArgument(salt, dataset);
  return dataset.memo('pack.solubilityCurves', () => buildCurves(dataset)).get(parsed.anhydrous);
}

/**
 * Solubility at temperature t by linear interpolation between the table's
 * points (the salt–ice eutectic, where given, is the lowest point). Outside
 * that range the end segment is extended and the result says so; it never
 * goes below zero. The equilibrium solid is that of the nearer point.
 *
 * @param curve - from {@link solubilityCurve}
 * @param t - temperature, °C
 * @returns grams of anhydrous salt per 100 g of water, and the equilibrium solid
 * @see CRC Handbook of Chemistry and Physics, 'Aqueous solubility of inorganic compounds at various temperatures'
 * @example
 * ```ts
 * solubilityAt(solubilityCurve('KNO3'), 15).value; // 26.645 (halfway between 21.36 at 10 °C and 31.93 at 20 °C, CRC)
 * ```
 */
export function solubilityAt(curve: SolubilityCurve, t: number): SolubilityAt {
  checkCurve(curve);
  t = numberArgument(t, 't', 'the temperature in °C', { min: -273.15, max: 1000 });
  const pts = curve.points;
  const n = pts.length;
  let k: number;
  if (t <= pts[0]!.t) k = 0;
  else if (t >= pts[n - 1]!.t) k = n - 2;
  else {
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (pts[mid]!.t <= t) lo = mid;
      else hi = mid;
    }
    k = lo;
  }
  const p = pts[k]!;
  const q = pts[k + 1]!;
  const value = Math.max(0, p.value + ((q.value - p.value) * (t - p.t)) / (q.t - p.t));
  const near = t - p.t <= q.t - t ? p : q;
  return { value: unsignedZero(value), phase: near.phase, phaseWater: unsignedZero(near.phaseWater), extrapolated: t < pts[0]!.t || t > pts[n - 1]!.t };
}

/**
 * A curve with the same solubility at every temperature a pack can reach
 * (−100 to 200 °C), frozen and trusted like the table's curves: for a
 * solubility estimated at one temperature, a user's single value, or the
 * ends of a solubility's range in the interval of a fill.
 * @internal
 */
export function constantSolubilityCurve(formula: string, value: number, phase: string, phaseWater: number, source: string, fromMemory: boolean): SolubilityCurve {
  const points = [-100, 200].map((t) => Object.freeze({ t, value, phase, phaseWater, eutectic: false }));
  const tableRange: [number, number] = Object.freeze([-100, 200]) as [number, number];
  const curve: SolubilityCurve = Object.freeze({ formula, points: Object.freeze(points) as SolubilityPoint[], tableRange, source, fromMemory });
  builtCurves.add(curve);
  return curve;
}
