/**
 * A latent-heat warmer: a supercooled melt of a salt hydrate that, once
 * triggered, crystallises, jumps to a plateau near the hydrate's melting
 * point, holds there while the rest of the melt crystallises against the
 * heat it loses, then cools; recharged by melting it again.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import type { Salt } from '../chem/salt.js';
import { saltRecords, WATER } from '../chem/saltRecords.js';
import { IonheatError } from '../error.js';
import { checkOptionKeys, describeValue, numberArgument, optionNames, optionsArgument } from '../quantity/argumentChecks.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { COVERAGE_95 } from '../quantity/constants.js';
import { parameter, type TimeCourseOptions, type TimeCourseParameter } from '../pack/packTimeCourse.js';
import { fillConstants, type CrystallisingFill, type LiquidusPoint } from './crystallisingFill.js';
import { PLATEAU_BAND_K, runWarmer, type WarmerRun } from './warmerCourse.js';
import { warmerMelt, type WarmerMelt } from './warmerMelt.js';
import type { Caution } from '../quantity/caution.js';
import { warmerCautions } from './warmerCautions.js';
import { PACK_INPUT_RANGES } from '../pack/packInput.js';

/** A warmer fill: the hydrate and its mass, extra water, the start temperature and the container. */
export interface WarmerFill {
  /** The salt hydrate, as a formula or a salt from parseSalt (`NaCH3COO·3H2O`). */
  salt: string | Salt;
  /** Grams of hydrate. */
  massG: number;
  /** Grams of water added beyond the hydrate's own (default 0). */
  extraWaterG?: number;
  /** Temperature of the supercooled fill when it is triggered, °C (default 20). */
  startC?: number;
  /** Heat capacity of the container, thickener or gel, J/K (default 0). */
  containerJPerK?: number;
}

/** How the warmer loses heat, as in {@link packTimeCourse}; each parameter left out takes its assumed value. */
export interface WarmerOptions {
  /** Air temperature, °C (default 22, assumed). */
  ambientC?: number;
  /** Conductance to the air, W/K (default 0.15, assumed). */
  ambientConductanceWPerK?: number;
  /** Skin temperature, °C (default 33, assumed). */
  skinC?: number;
  /** Conductance to the skin, W/K (default 0.25, assumed). */
  skinConductanceWPerK?: number;
  /** Shortest course to follow, s (default 3600); the course runs at least until the plateau has ended and half as long again. */
  durationS?: number;
  /** Points in the returned curve (default 241). */
  samples?: number;
}

/** One point of the warmer's course. */
export interface WarmerPoint {
  /** s since triggering. */
  t: number;
  /** °C. */
  temperature: number;
  /** Fraction of the hydrate crystallised, 0–1. */
  crystallised: number;
}

/** What {@link latentWarmer} returns. */
export interface WarmerResult {
  fill: { formula: string; massG: number; extraWaterG: number; startC: number; containerJPerK: number };
  /** The melt data used, with their sources. */
  melt: {
    formula: string;
    melting: 'congruent' | 'semi-congruent' | 'incongruent';
    solidOnMelting: string | null;
    meltComposition: string;
    consequence: string | null;
    meltingPoint: { value: number; u: number; unit: string; source: string; fromMemory: boolean };
    latentHeat: { value: number; u: number; unit: string; source: string; fromMemory: boolean };
    solidHeatCapacity: { value: number; u: number; unit: string; source: string; fromMemory: boolean };
    meltHeatCapacity: { value: number; u: number; unit: string; source: string; fromMemory: boolean };
  };
  parameters: { ambientC: TimeCourseParameter; ambientConductanceWPerK: TimeCourseParameter; skinC: TimeCourseParameter; skinConductanceWPerK: TimeCourseParameter; durationS: TimeCourseParameter };
  /** Liquidus of the fill's composition, °C: the melting point for the hydrate alone, lower with extra water. */
  liquidusC: number;
  /** Temperature right after triggering, °C. */
  plateau: Estimate;
  /** Fraction of the hydrate that crystallises at once on triggering, 0–1. */
  crystallisedAtPlateau: Estimate;
  /** Heat released when the fill is back at its start temperature, kJ. */
  heatReleased: Estimate;
  /** The same per gram of fill (hydrate and extra water), J/g. */
  heatPerGram: Estimate;
  /** Time from triggering until the fill has crystallised completely or fallen 1 K below its plateau, s. */
  plateauDuration: Estimate;
  /** Temperature at which the fill is all liquid again (recharged), °C; null when heating in water cannot melt it all. */
  rechargeTemperature: Estimate | null;
  points: WarmerPoint[];
  secondsAboveBurnThreshold: number;
  /** The energy balance of the nominal run, J: latent heat released = sensible heat stored (+ heat lost); residuals near zero. */
  energy: WarmerRun['energy'];
  /** Burns at the plateau, recharging, the salt's hazards and the screening line, each `{ kind, severity, text }`. */
  cautions: Caution[];
  notes: string[];
  sources: string[];
}

/** Default start temperature of the supercooled fill, °C (room temperature; assumed). */
const DEFAULT_START_C = 20;
/** Relative standard uncertainty of the tabulated solubilities used for the liquidus (the solubility table's note: 1–3 % for most salts). */
const SOLUBILITY_RELATIVE_U = 0.02;
/**
 * Numerical resolution of the model, the floor of every standard uncertainty, so that no interval has zero width where
 * the data happen to have no effect (a fraction pinned at 1): temperature K, fraction, relative heat, time s.
 */
const RESOLUTION = { temperature: 0.01, fraction: 0.001, heat: 1e-4, time: 1 };

/** The data values the model varies for its interval. */
interface DataValues {
  meltingC: number;
  latentJPerG: number;
  solidCpJPerGK: number;
  meltCpJPerGK: number;
  solubilityScale: number;
}

const WARMER_OPTIONS = optionNames<WarmerOptions>('latentWarmer', { ambientC: true, ambientConductanceWPerK: true, skinC: true, skinConductanceWPerK: true, durationS: true, samples: true });
const WARMER_FILL = optionNames<WarmerFill>('a warmer fill', { salt: true, massG: true, extraWaterG: true, startC: true, containerJPerK: true });

function checkFill(fill: WarmerFill): { massG: number; extraWaterG: number; startC: number; containerJPerK: number } {
  if (fill === null || typeof fill !== 'object' || Array.isArray(fill)) throw new IonheatError('INVALID_ARGUMENT', `a warmer fill is { salt, massG, extraWaterG?, startC?, containerJPerK? }, got ${describeValue(fill)}`, { field: 'fill' });
  checkOptionKeys(fill, WARMER_FILL, 'fill');
  return {
    massG: numberArgument(fill.massG, 'massG', 'the mass of hydrate', PACK_INPUT_RANGES.massG),
    extraWaterG: fill.extraWaterG === undefined ? 0 : numberArgument(fill.extraWaterG, 'extraWaterG', 'the extra water in g', { min: 0, max: 1e6 }),
    startC: fill.startC === undefined ? DEFAULT_START_C : numberArgument(fill.startC, 'startC', 'the start temperature in °C', { min: -40, max: 100 }),
    containerJPerK: fill.containerJPerK === undefined ? 0 : numberArgument(fill.containerJPerK, 'containerJPerK', 'the container heat capacity', PACK_INPUT_RANGES.containerJPerK),
  };
}

/** The kernel's fill for one set of data values. */
function kernelFill(melt: WarmerMelt, given: ReturnType<typeof checkFill>, v: DataValues, waterCp: number): CrystallisingFill {
  const w0 = melt.anhydrousFraction;
  const liquidus: LiquidusPoint[] = melt.hydrateSolubility.map((p) => ({ t: p.t, s: p.s * v.solubilityScale })).filter((p) => p.t < v.meltingC);
  liquidus.push({ t: v.meltingC, s: w0 / (1 - w0) });
  return {
    hydrateG: given.massG,
    extraWaterG: given.extraWaterG,
    containerJPerK: given.containerJPerK,
    startC: given.startC,
    meltingC: v.meltingC,
    latentJPerG: v.latentJPerG,
    solidCpJPerGK: v.solidCpJPerGK,
    meltCpJPerGK: v.meltCpJPerGK,
    waterCpJPerGK: waterCp,
    anhydrousFraction: w0,
    liquidus,
  };
}

/** Specific heat capacity of liquid water, J/(g·K), from the heat-capacity table. */
function waterHeatCapacity(dataset: Dataset): { value: number; source: string } {
  const record = saltRecords('heat-capacities.json', { formula: WATER }, dataset).find((r) => r.phase === 'l');
  if (!record) throw new IonheatError('MISSING_DATA', `no heat capacity of liquid water (H2O, phase l) in heat-capacities.json of the ${dataset.label} tables`, { field: 'heat-capacities.json' });
  return { value: record.value / 18.015, source: record.source };
}

/**
 * The plateau, the fraction crystallised at once, the heat, the plateau's
 * duration and the recharge temperature of a latent-heat warmer.
 *
 * The fill (m g of hydrate, extra water m_w, container C_c) starts as a
 * supercooled melt at T_s. Its enthalpy relative to that state, with x g
 * crystallised at T, is H = −x·L(T_s) + C(x)·(T − T_s), where
 * C(x) = m·c_l + m_w·c_w + C_c + x·(c_s − c_l) and L(T) = L_m − (c_l − c_s)(T_m − T)
 * (Kirchhoff). The crystals stand in equilibrium with the liquid: by the
 * lever rule on the hydrate's liquidus s(T) (g salt per g water, the
 * solubility table below T_m, ending at the hydrate's own composition at T_m),
 * x = (A − s·W)/(w₀ − s(1 − w₀)); the hydrate alone is solid below T_m. On
 * triggering, H = 0 fixes the plateau T_p and the crystals x₁; for the hydrate
 * alone, T_p = T_m and x₁/m = C(0)·(T_m − T_s)/(m·L_m). Then
 * dH/dt = −G_air(T − T_air) − G_skin(T − T_skin) until the fill has
 * crystallised completely or fallen 1 K below T_p (the plateau's end) and
 * cools on. The heat back at T_s is x(T_s)·L(T_s). The recharge temperature
 * is the fill's liquidus, or where a solid separated on melting, the
 * temperature where its solubility reaches the fill's composition. Each 95 %
 * interval is ±1.96·u with u from the data's standard uncertainties (melting
 * point, latent heat, both heat capacities, 2 % on the solubilities) by
 * central differences, never below the model's numerical resolution.
 * Heats of dilution, supercooling of the crystallising front and the
 * conductances' own uncertainty are left out; the defaults of air and skin
 * are assumed values for illustration.
 *
 * @param fill - the hydrate and its mass (g), extra water (g), start temperature (°C, default 20) and container heat
 *   capacity (J/K)
 * @param options - air and skin temperatures (°C) and conductances (W/K), the shortest course (s), the samples
 * @param dataset - the warmer-melts, solubility, heat-capacity and hazards tables (default: built-in)
 * @returns temperatures in °C, heats in kJ and J/g, times in s, fractions 0–1
 * @throws IonheatError `NOT_APPLICABLE` for a salt that is not a hydrate or a fill that is not supercooled,
 *   `MISSING_DATA` for a hydrate without melt data (or without a liquidus when extra water is given)
 * @see Lane, G. A. Solar Heat Storage: Latent Heat Materials, Vol. I (1983), `lane1983`; Abhat 1983, `abhat1983`;
 *   Zalba et al. 2003, `zalba2003` (melt data); the CRC solubility table, `crcSolubility` (liquidus); Newton's law of
 *   cooling as in {@link packTimeCourse}.
 *
 * @example
 * ```ts
 * const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100, startC: 20 });
 * w.plateau.value; // 58 °C, the melting point
 * w.crystallisedAtPlateau.value; // 0.4318 (3.0 J/(g·K) × 38 K / 264 J/g)
 * w.heatReleased.value; // 22.22 kJ
 * w.rechargeTemperature.value; // 78.1 °C (where the separated anhydrous salt redissolves)
 * ```
 */
export function latentWarmer(fill: WarmerFill, options: WarmerOptions = {}, dataset: Dataset = builtinDataset()): WarmerResult {
  options = optionsArgument(options, WARMER_OPTIONS);
  const given = checkFill(fill);
  const melt = warmerMelt(fill.salt, dataset);
  const asCourse = options as TimeCourseOptions;
  const parameters = {
    ambientC: parameter(asCourse, 'ambientC', (v) => v > -60 && v < 100, 'must lie between −60 and 100 °C'),
    ambientConductanceWPerK: parameter(asCourse, 'ambientConductanceWPerK', (v) => v >= 0 && v <= 1e6, 'must be from 0 to 1000000 W/K'),
    skinC: parameter(asCourse, 'skinC', (v) => v > 0 && v < 60, 'must lie between 0 and 60 °C'),
    skinConductanceWPerK: parameter(asCourse, 'skinConductanceWPerK', (v) => v >= 0 && v <= 1e6, 'must be from 0 to 1000000 W/K'),
    durationS: parameter(asCourse, 'durationS', (v) => v > 0 && v <= 7 * 86400, 'must be a time from above 0 s to 7 days'),
  };
  const samples = options.samples === undefined ? 241 : numberArgument(options.samples, 'samples', 'the number of points', { min: 2, max: 100_000, integer: true });
  const r = melt.record;
  const salt = melt.salt.formula;
  if (given.extraWaterG > 0 && melt.hydrateSolubility.length === 0) {
    throw new IonheatError('MISSING_DATA', `no solubility of ${salt} below its melting point in solubility.json of the ${dataset.label} tables, so the liquidus of a fill with extra water is unknown; leave out the extra water`, { field: 'extraWaterG', text: salt });
  }
  const water = waterHeatCapacity(dataset);
  const nominal: DataValues = { meltingC: r.meltingPoint.value, latentJPerG: r.latentHeat.value, solidCpJPerGK: r.solidHeatCapacity.value, meltCpJPerGK: r.meltHeatCapacity.value, solubilityScale: 1 };
  const nominalFill = kernelFill(melt, given, nominal, water.value);
  const liquidusC = fillConstants(nominalFill).liquidusC;
  if (!(given.startC < liquidusC - 0.05)) {
    throw new IonheatError(
      'NOT_APPLICABLE',
      `the fill starts at ${given.startC} °C, not below its liquidus of ${liquidusC.toFixed(1)} °C (the melting point of ${salt}${given.extraWaterG > 0 ? `, lowered by ${given.extraWaterG} g of extra water` : ''}): it is not supercooled, so nothing crystallises`,
      { field: 'startC' },
    );
  }
  const loss = { ambientC: parameters.ambientC.value, ambientConductanceWPerK: parameters.ambientConductanceWPerK.value, skinC: parameters.skinC.value, skinConductanceWPerK: parameters.skinConductanceWPerK.value };
  const gTotal = loss.ambientConductanceWPerK + loss.skinConductanceWPerK;
  const surroundings = gTotal > 0 ? (loss.ambientConductanceWPerK * loss.ambientC + loss.skinConductanceWPerK * loss.skinC) / gTotal : Number.NaN;
  const run = (v: DataValues): WarmerRun => {
    const out = runWarmer(kernelFill(melt, given, v, water.value), loss, { durationS: parameters.durationS.value, samples, separated: melt.separatedSolubility.map((p) => ({ t: p.t, s: p.s * v.solubilityScale })) });
    if (!Number.isFinite(out.plateauDurationS)) {
      throw new IonheatError(
        'NOT_APPLICABLE',
        gTotal > 0
          ? `the surroundings (air and skin together act as ${surroundings.toFixed(1)} °C) are not cold enough to end the plateau near ${out.plateauC.toFixed(1)} °C within 7 days; a warmer of ${salt} does not work against them`
          : 'with both conductances zero the warmer loses no heat and its plateau never ends; give a conductance to the air or the skin',
        { field: gTotal > 0 ? 'ambientC' : 'ambientConductanceWPerK' },
      );
    }
    return out;
  };
  const base = run(nominal);

  // Central differences over each uncertain datum.
  const usesSolubility = given.extraWaterG > 0 || melt.separatedSolubility.length > 0;
  const steps: [keyof DataValues, number][] = [
    ['meltingC', r.meltingPoint.uncertainty],
    ['latentJPerG', r.latentHeat.uncertainty],
    ['solidCpJPerGK', r.solidHeatCapacity.uncertainty],
    ['meltCpJPerGK', r.meltHeatCapacity.uncertainty],
    ...(usesSolubility ? [['solubilityScale', SOLUBILITY_RELATIVE_U] as [keyof DataValues, number]] : []),
  ];
  const totalG = given.massG + given.extraWaterG;
  const outputs = (w: WarmerRun) => [w.plateauC, w.crystalAtOnceG / given.massG, w.heatReleasedJ / 1000, w.plateauDurationS, w.rechargeC ?? Number.NaN];
  // A side whose melting point falls to the start temperature leaves no supercooled fill: use the other side alone.
  const supercooled = (v: DataValues) => given.startC < fillConstants(kernelFill(melt, given, v, water.value)).liquidusC - 0.05;
  const centre = outputs(base);
  const sensitivity = steps.map(([key, u]) => {
    const upValues = { ...nominal, [key]: nominal[key] + u };
    const downValues = { ...nominal, [key]: nominal[key] - u };
    const up = supercooled(upValues) ? outputs(run(upValues)) : undefined;
    const down = supercooled(downValues) ? outputs(run(downValues)) : undefined;
    return centre.map((x, i) => (up && down ? (up[i]! - down[i]!) / 2 : up ? up[i]! - x : down ? x - down[i]! : 0));
  });
  const uOf = (i: number, floor: number) => Math.max(floor, Math.hypot(...sensitivity.map((s) => (Number.isFinite(s[i]!) ? s[i]! : 0))));
  const sources = [r.source, r.meltingPoint.source, r.latentHeat.source, r.solidHeatCapacity.source, r.meltHeatCapacity.source, ...(usesSolubility && melt.solubilitySource ? [melt.solubilitySource] : []), ...(given.extraWaterG > 0 ? [water.source] : [])];
  const estimate = (quantity: string, value: number, u: number, unit: string, bounds: { min?: number; max?: number } = {}): Estimate => {
    const low = Math.max(bounds.min ?? -Infinity, value - COVERAGE_95 * u);
    const high = Math.min(bounds.max ?? Infinity, value + COVERAGE_95 * u);
    return makeEstimate({ quantity, value, u, low: Math.min(low, value), high: Math.max(high, value), unit, basis: 'model', method: 'latent-warmer', sources });
  };
  const out = centre;
  const heatU = uOf(2, RESOLUTION.heat * out[2]!);
  const plateau = estimate('plateau temperature after triggering', out[0]!, uOf(0, RESOLUTION.temperature), '°C');
  const crystallised = estimate('fraction of the hydrate crystallised at once', out[1]!, uOf(1, RESOLUTION.fraction), '1', { min: 0, max: 1 });
  const heatReleased = estimate('heat released back to the start temperature', out[2]!, heatU, 'kJ', { min: 0 });
  const heatPerGram = estimate('heat released per gram of fill', (out[2]! * 1000) / totalG, (heatU * 1000) / totalG, 'J/g', { min: 0 });
  const plateauDuration = estimate('plateau duration', out[3]!, uOf(3, RESOLUTION.time), 's', { min: 0 });
  const rechargeTemperature = base.rechargeC === null ? null : estimate('recharge temperature (all liquid again)', base.rechargeC, uOf(4, RESOLUTION.temperature), '°C');

  const notes: string[] = [
    `lumped model: one temperature for the whole fill, the hydrate crystals in equilibrium with the liquid at every moment, linear heat loss to air and skin; the plateau ends when the fill has crystallised completely or fallen ${PLATEAU_BAND_K} K below the plateau temperature`,
    'the supercooled melt is taken to keep the heat capacity of the melt; heats of dilution of the remaining liquid, a lower crystal form and the time the crystals take to grow are left out',
    `${salt}: ${r.meltComposition}`,
  ];
  if (r.consequence) notes.push(r.consequence);
  const assumed = Object.entries(parameters).filter(([, p]) => p.assumed).map(([k, p]) => `${k} = ${p.value} ${p.unit}`);
  if (assumed.length > 0) notes.push(`assumed values for illustration, not measurements: ${assumed.join(', ')}${fill.startC === undefined ? `, startC = ${DEFAULT_START_C} °C` : ''}; give your own for a real warmer`);
  if (given.extraWaterG > 0) {
    const lowest = melt.hydrateSolubility[0]!;
    notes.push(`${given.extraWaterG} g of extra water lowers the fill's liquidus from ${r.meltingPoint.value} °C to ${liquidusC.toFixed(1)} °C (linear between the solubility table's points of ${salt} and its own composition at the melting point)`);
    if (given.startC < lowest.t || liquidusC < lowest.t) notes.push(`the fill reaches below the lowest tabulated solubility of ${salt} (${lowest.t} °C); the liquidus was extended linearly there`);
  }
  if (base.crystalAtOnceG >= given.massG * (1 - 1e-9)) notes.push(`the fill starts so cold that all of it crystallises at once, below the melting point: there is no plateau to speak of`);
  if (base.rechargeC === null) notes.push(`the ${r.solidOnMelting ?? 'separated solid'} that separates on melting does not redissolve below 100 °C at this composition (solubility table), so heating alone cannot recharge the fill completely`);
  else if (r.solidOnMelting && melt.separatedSolubility.length === 0) notes.push(`no solubility data for ${r.solidOnMelting}, which can separate on melting: the recharge temperature is the liquidus; heat a few kelvin above it and check that the melt is clear`);

  const cautions = warmerCautions(
    { salt: melt.salt, record: r, startC: given.startC, plateau, plateauDurationS: out[3]!, secondsAboveBurnThreshold: base.secondsAboveBurnThreshold, rechargeC: base.rechargeC },
    dataset,
  );
  const quantity = (q: { value: number; uncertainty: number; unit: string; source: string; fromMemory: boolean }) => ({ value: q.value, u: q.uncertainty, unit: q.unit, source: q.source, fromMemory: q.fromMemory });
  return {
    fill: { formula: salt, massG: given.massG, extraWaterG: given.extraWaterG, startC: given.startC, containerJPerK: given.containerJPerK },
    melt: {
      formula: salt,
      melting: r.melting,
      solidOnMelting: r.solidOnMelting ?? null,
      meltComposition: r.meltComposition,
      consequence: r.consequence ?? null,
      meltingPoint: quantity(r.meltingPoint),
      latentHeat: quantity(r.latentHeat),
      solidHeatCapacity: quantity(r.solidHeatCapacity),
      meltHeatCapacity: quantity(r.meltHeatCapacity),
    },
    parameters,
    liquidusC,
    plateau,
    crystallisedAtPlateau: crystallised,
    heatReleased,
    heatPerGram,
    plateauDuration,
    rechargeTemperature,
    points: base.points,
    secondsAboveBurnThreshold: base.secondsAboveBurnThreshold,
    energy: base.energy,
    cautions,
    notes,
    sources: [...new Set(sources)].sort(),
  };
}
