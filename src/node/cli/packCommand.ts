import type { Dataset } from '../../data/dataset.js';
import { parseSalt } from '../../chem/parseSalt.js';
import { formatSalt } from '../../chem/formatSalt.js';
import { IonheatError, isIonheatError } from '../../error.js';
import { roundToExponent, roundToUncertainty } from '../../quantity/rounding.js';
import type { Estimate } from '../../quantity/estimate.js';
import { packFinalTemperature, type PackResult } from '../../pack/packFinalTemperature.js';
import type { PackFill, PackOptions } from '../../pack/packInput.js';
import { packRatioCurve, type PackDesignPoint, type PackRatioCurve } from '../../pack/packRatioCurve.js';
import { packTimeCourse, type PackTimeCourse, type TimeCourseOptions } from '../../pack/packTimeCourse.js';
import { packCurveSvg } from '../../render/packCurve.js';
import { timeCourseSvg } from '../../render/timeCourse.js';
import { asFlagError, flagTable, joinNegativeValues, numberOption, readArgs } from './args.js';
import { userSourceOf } from '../../solution/userValueCheck.js';
import { packDesignMargin, type PackDesignMargin } from '../../pack/designMargin.js';
import type { Command } from './command.js';
import { textTable } from './textTable.js';
import { bulletLines } from './paragraphs.js';
import { cautionLine } from '../../quantity/caution.js';
import { outputWidth } from './io.js';
import { formatNumber, withTrueMinus } from '../../notation/minus.js';
import { formulaText } from '../../notation/formula.js';
import { wrapText } from '../../notation/wrapText.js';
import { writeChart } from './writeChart.js';
import { warmerSalts } from '../../warmer/warmerMelt.js';
import { unsignedZero } from '../../numeric/unsignedZero.js';

const options = {
  salt: { type: 'string', multiple: true },
  'salt-mass': { type: 'string', multiple: true },
  water: { type: 'string' },
  start: { type: 'string' },
  container: { type: 'string' },
  target: { type: 'string' },
  json: { type: 'boolean' },
  'heat-capacity': { type: 'string' },
  'heat-capacity-u': { type: 'string' },
  kirchhoff: { type: 'boolean' },
  'monte-carlo': { type: 'string' },
  seed: { type: 'string' },
  curve: { type: 'boolean' },
  points: { type: 'string' },
  'curve-svg': { type: 'string' },
  band: { type: 'string' },
  duration: { type: 'string' },
  tau: { type: 'string' },
  ambient: { type: 'string' },
  'g-ambient': { type: 'string' },
  skin: { type: 'string' },
  'g-skin': { type: 'string' },
  'time-svg': { type: 'string' },
} as const;

/**
 * Each numeric flag and the field it sets in the fill, the pack options, the ratio curve or the time course.
 * The library checks every range (the fill's and options' in `PACK_INPUT_RANGES`); an error about a field is
 * reported under the flag that set it.
 */
const NUMBER_FLAGS = {
  'salt-mass': 'massG',
  water: 'waterG',
  start: 'startC',
  container: 'containerJPerK',
  'heat-capacity': 'heatCapacityJPerK',
  'heat-capacity-u': 'heatCapacityUJPerK',
  'monte-carlo': 'samples',
  seed: 'seed',
  target: 'targetC',
  points: 'points',
  duration: 'durationS',
  tau: 'dissolutionTimeConstantS',
  ambient: 'ambientC',
  'g-ambient': 'ambientConductanceWPerK',
  skin: 'skinC',
  'g-skin': 'skinConductanceWPerK',
} as const satisfies Partial<Record<keyof typeof options, string>>;

/** The flag that sets a field of the library's input (`solids[0].massG` → `salt-mass`). */
const flagOfField = flagTable({ ...NUMBER_FLAGS, salt: 'formula' });

/** Options whose value is a number that may be negative (`--start -5` means `--start=-5`). */
const NUMERIC = new Set([...Object.keys(NUMBER_FLAGS), 'band']);

function bad(field: string, message: string): IonheatError {
  return new IonheatError('INVALID_ARGUMENT', message, { field });
}

const r = (x: number, digits: number): number => {
  const v = Number(x.toFixed(digits));
  return unsignedZero(v);
};

/** An estimate rounded for reporting: u to two significant digits, value and interval to the same place (at most 4 decimals). */
function rounded(e: Estimate): { value: number; low: number; high: number; u: number } {
  if (!(e.u > 0)) return { value: r(e.value, 4), low: r(e.low, 4), high: r(e.high, 4), u: 0 };
  const { value, u, exponent } = roundToUncertainty(e.value, e.u);
  const ex = Math.max(exponent, -4);
  return { value: r(ex === exponent ? value : roundToExponent(e.value, ex), 6), low: r(roundToExponent(e.low, ex), 6), high: r(roundToExponent(e.high, ex), 6), u: r(u, 6) };
}

function design(d: PackDesignPoint) {
  return { ratio: r(d.ratio, 5), saltMass: r(d.saltMass, 3), temperature: r(d.temperature, 3), changePerGram: r(d.changePerGram, 6) };
}

function jsonReport(result: PackResult, curve: PackRatioCurve, course: PackTimeCourse | undefined, withCurve: boolean, dataset: Dataset, margin: PackDesignMargin | undefined) {
  const t = rounded(result.finalTemperature);
  return {
    fill: result.fill,
    finalTemperature: {
      value: t.value,
      low: t.low,
      high: t.high,
      unit: '°C',
      u: t.u,
      basis: result.finalTemperature.basis,
      interval: result.interval.method,
      ...(result.interval.seed !== undefined ? { seed: result.interval.seed, samples: result.interval.samples } : {}),
      description: result.interval.description,
    },
    temperatureChange: { value: r(result.temperatureChange, 4), unit: 'K' },
    dissolved: result.dissolved.map((d) => ({
      formula: d.formula,
      loadedMass: r(d.loadedMass, 4),
      dissolvedMass: r(d.dissolvedMass, 4),
      undissolvedMass: r(d.undissolvedMass, 4),
      undissolvedSolid: d.undissolvedSolid ? { formula: d.undissolvedSolid.formula, mass: r(d.undissolvedSolid.mass, 4) } : null,
      saturated: d.saturated,
      solubilityStatus: d.solubilityStatus,
      // three decimals, or three significant digits for a sparingly soluble salt
      solubility: d.solubility ? { ...d.solubility, value: d.solubility.value < 1 ? Number(d.solubility.value.toPrecision(3)) : r(d.solubility.value, 3) } : null,
      enthalpyOfSolution: { value: d.enthalpyOfSolution.value, u: d.enthalpyOfSolution.u, unit: 'kJ/mol', basis: d.enthalpyOfSolution.basis, sources: d.enthalpyOfSolution.sources },
      integralEnthalpy: { value: r(d.integralEnthalpy.value, 4), low: r(d.integralEnthalpy.low, 4), high: r(d.integralEnthalpy.high, 4), u: r(d.integralEnthalpy.u, 4), unit: 'kJ/mol', basis: d.integralEnthalpy.basis, method: d.integralEnthalpy.method, sources: d.integralEnthalpy.sources },
      molality: r(d.molality, 4),
      heat: r(d.heat, 4),
    })),
    liquidWater: r(result.liquidWater, 4),
    iceMass: r(result.iceMass, 4),
    vaporMass: r(result.vaporMass, 4),
    heat: { ...result.heat, absorbed: r(result.heat.absorbed, 4), dissolution: r(result.heat.dissolution, 4), solidConversion: r(result.heat.solidConversion, 4), iceFormation: r(result.heat.iceFormation, 4), boiling: r(result.heat.boiling, 4), sensible: r(result.heat.sensible, 4), imbalance: Number(result.heat.imbalance.toPrecision(3)) },
    heatCapacity: {
      value: r(result.heatCapacity.value, 2),
      u: r(result.heatCapacity.u, 2),
      unit: 'J/K',
      basis: result.heatCapacity.basis,
      parts: Object.fromEntries(Object.entries(result.heatCapacity.parts).map(([k, v]) => [k, r(v, 2)])),
    },
    clamp: result.clamp ? { ...result.clamp, temperature: r(result.clamp.temperature, 4) } : null,
    design: {
      largestChange: design(curve.largestChange),
      bestPerGram: design(curve.bestPerGram),
      saturationRatio: curve.saturationRatio === null ? null : r(curve.saturationRatio, 5),
    },
    ...(curve.target
      ? { target: { temperature: curve.target.target, reachable: curve.target.reachable, design: curve.target.design ? design(curve.target.design) : null, message: curve.target.message, ...(margin ? { margin: marginJson(margin) } : {}) } }
      : {}),
    ...(withCurve
      ? { curve: curve.points.map((p) => ({ ratio: r(p.ratio, 6), saltMass: r(p.saltMass, 4), temperature: r(p.temperature, 4), ...(p.low !== undefined ? { low: r(p.low, 4), high: r(p.high!, 4) } : {}), undissolvedMass: r(p.undissolvedMass, 4), clamp: p.clamp })) }
      : {}),
    ...(course
      ? {
          timeCourse: {
            parameters: course.parameters,
            extreme: { temperature: r(course.extreme.temperature, 3), timeS: r(course.extreme.timeS, 1) },
            band: course.band ? { ...course.band, secondsInside: r(course.band.secondsInside, 1) } : null,
            secondsAboveBurnThreshold: r(course.secondsAboveBurnThreshold, 1),
            points: course.points.map((p) => ({ t: r(p.t, 2), temperature: r(p.temperature, 4), heatAbsorbed: r(p.heatAbsorbed, 4) })),
            notes: course.notes,
          },
        }
      : {}),
    cautions: course ? course.cautions : result.cautions,
    notes: result.notes,
    sources: Object.fromEntries(result.sources.map((k) => [k, dataset.source(k)?.citation ?? k])),
  };
}

/** The design margin in the JSON report: masses in g, temperatures in °C, rounded for reading. */
function marginJson(m: PackDesignMargin) {
  const band = (b: { value: number; low: number; high: number }) => ({ value: r(b.value, 3), low: r(b.low, 3), high: r(b.high, 3) });
  return {
    kind: m.kind,
    designedMassG: m.design ? r(m.design.saltMassG, 3) : null,
    massInterval: m.massInterval ? { low: r(m.massInterval.low, 3), high: m.massInterval.high === null ? null : r(m.massInterval.high, 3) } : null,
    finalTemperature: m.design ? band(m.design.finalTemperature) : null,
    threshold: { kind: m.threshold.kind, temperatureC: m.threshold.temperatureC, largestSafeMassG: m.threshold.largestSafeMassG === null ? null : r(m.threshold.largestSafeMassG, 3) },
    caution: m.caution,
    message: m.message,
  };
}

function textReport(result: PackResult, curve: PackRatioCurve, course: PackTimeCourse | undefined, dataset: Dataset, margin: PackDesignMargin | undefined, width: number): string {
  const out: string[] = [];
  const f = result.fill;
  const solids = f.solids.map((s) => `${r(s.massG, 3)} g ${formatSalt(parseSalt(s.formula, dataset), { style: 'unicode' })}`).join(' + ');
  out.push(`Pack: ${solids} in ${f.waterG} g water, start ${f.startC} °C${f.containerJPerK > 0 ? `, container ${f.containerJPerK} J/K` : ''}\n`);
  const t = rounded(result.finalTemperature);
  out.push(`final temperature   ${t.value} °C   (95 % interval ${t.low} to ${t.high} °C, ${result.interval.method === 'bounds' ? 'bounds' : `Monte Carlo, ${result.interval.samples} draws, seed ${result.interval.seed}`})`);
  out.push(`change              ${formatNumber(r(result.temperatureChange, 2), { plus: true })} K${result.clamp ? `   (${result.clamp.kind} clamp)` : ''}\n`);
  out.push(
    textTable(
      ['solid', 'loaded g', 'dissolved g', 'undissolved g', 'mol/kg', 'ΔsolH(m) kJ/mol', 'heat kJ'],
      result.dissolved.map((d) => [
        formulaText(d.formula),
        d.loadedMass.toFixed(2),
        d.dissolvedMass.toFixed(2),
        d.undissolvedMass.toFixed(2) + (d.undissolvedSolid && d.undissolvedSolid.formula !== d.formula ? ` (as ${d.undissolvedSolid.formula})` : ''),
        d.molality.toFixed(2),
        `${d.integralEnthalpy.value.toFixed(2)} ± ${d.integralEnthalpy.u.toPrecision(2)} (∞: ${d.enthalpyOfSolution.value.toFixed(2)}${userSourceOf(d.enthalpyOfSolution as Estimate, dataset) ? ', your value' : ''})`,
        d.heat.toFixed(3),
      ]),
      new Set([1, 2, 3, 4, 6]),
    ),
  );
  const h = result.heat;
  out.push(`heat ${h.direction === 'released' ? 'released' : 'absorbed'} by dissolution ${Math.abs(h.absorbed).toFixed(3)} kJ; heat capacity ${result.heatCapacity.value.toFixed(1)} ± ${result.heatCapacity.u.toPrecision(2)} J/K (${result.heatCapacity.basis === 'parts' ? 'from the parts' : 'your value'}); ${result.liquidWater.toFixed(2)} g of liquid water${result.iceMass > 0 ? ` and ${result.iceMass.toFixed(2)} g of ice` : ''} at the end`);
  const lc = curve.largestChange;
  const bp = curve.bestPerGram;
  out.push(`\ndesign (this water and start): ${lc.temperature < f.startC ? 'coldest' : 'hottest'} ${lc.temperature.toFixed(2)} °C at ${lc.ratio.toFixed(4)} g solid per g water (${lc.saltMass.toFixed(2)} g); most change per gram of fill at ${bp.ratio.toFixed(4)} g/g (${bp.temperature.toFixed(2)} °C)`);
  if (curve.target) out.push(`target ${curve.target.target} °C: ${curve.target.message}`);
  if (margin) out.push(`margin: ${margin.message}`);
  if (course) {
    const b = course.band;
    out.push(
      `\ntime course over ${Math.round(course.parameters.durationS.value / 60)} min: ${course.extreme.temperature < course.startC ? 'coldest' : 'hottest'} ${course.extreme.temperature.toFixed(1)} °C after ${(course.extreme.timeS / 60).toFixed(1)} min` +
        (b ? `; ${(b.secondsInside / 60).toFixed(1)} min inside ${b.lowC}–${b.highC} °C` : '') +
        (course.secondsAboveBurnThreshold > 0 ? `; ${(course.secondsAboveBurnThreshold / 60).toFixed(1)} min above 44 °C` : ''),
    );
    out.push(...bulletLines(course.notes.slice(0, 2), width, '  '));
  }
  out.push('\nCautions:');
  out.push(...bulletLines([...(margin?.caution ? [margin.caution] : []), ...(course ? course.cautions : result.cautions)].map(cautionLine), width, '  • '));
  out.push('\nNotes:');
  out.push(...bulletLines(result.notes, width));
  // Sentences wrap to the width; the table (one entry of several lines) and the bullets (wrapped already) stay as they are.
  const wrapped = out.map((entry) => (entry.trim().includes('\n') ? entry : entry.split('\n').flatMap((l) => wrapText(l, width, '', '  ')).join('\n')));
  return withTrueMinus(wrapped.join('\n')) + '\n';
}

/** `ionheat pack`: the temperature a hot- or cold-pack fill reaches. */
export const packCommand: Command = {
  usage: [
    'ionheat pack --salt <formula> --salt-mass <g> --water <g> [--start <°C>] [--container <J/K>] [--target <°C>] [--json]',
    '',
    '  --salt, --salt-mass   a solid and its mass in grams; repeat both for several solids',
    '  --water               grams of liquid water',
    '  --start               start temperature, °C (default 20; 0 to below 100)',
    '  --container           heat capacity of container or gel, J/K (default 0)',
    '  --target              a final temperature to design for: the salt-to-water ratio that reaches it',
    '  --json                print one JSON object',
    '',
    'model options:',
    '  --heat-capacity <J/K> [--heat-capacity-u <J/K>]   your own heat capacity of the whole fill',
    '  --kirchhoff           correct ΔsolH from 25 °C to the start temperature (infinite-dilution ΔCp)',
    '  --monte-carlo <n> [--seed <s>]   95 % interval by n seeded Monte Carlo draws (default: bounds)',
    '  --curve [--points <n>] [--curve-svg <file>]   the temperature–ratio curve as data and as a chart',
    '',
    'time course (defaults are assumed values for illustration):',
    '  --band <low>:<high>   target band, °C      --duration <s>   (3600)   --tau <s> dissolution time constant (60)',
    '  --ambient <°C> (22)   --g-ambient <W/K> (0.15)   --skin <°C> (33)   --g-skin <W/K> (0.25)   --time-svg <file>',
  ].join('\n'),
  async run(argv, { io, dataset }) {
    const { values } = readArgs(joinNegativeValues(argv, NUMERIC), options, { min: 0, max: 0, names: '' }, {
      seed: { anyOf: ['monte-carlo'], why: 'the seed belongs to the Monte Carlo interval (e.g. --monte-carlo 2000 --seed 7); the default interval is by bounds and draws nothing' },
      points: { anyOf: ['curve', 'curve-svg'], why: 'it sets how many points the ratio curve has (--curve with --json, or --curve-svg <file>)' },
      'heat-capacity-u': { anyOf: ['heat-capacity'], why: 'it is the uncertainty of your own heat capacity of the fill' },
    });
    if (values.curve === true && values.json !== true && values['curve-svg'] === undefined) {
      throw bad('curve', '--curve has no effect in text output: the curve\'s points are written with --json, or drawn with --curve-svg <file>');
    }
    const saltsGiven = values.salt ?? [];
    const massesGiven = values['salt-mass'] ?? [];
    if (saltsGiven.length === 0) throw bad('salt', '--salt is required, with its --salt-mass (e.g. --salt KNO3 --salt-mass 10 --water 100)');
    if (saltsGiven.length !== massesGiven.length) {
      throw bad('salt-mass', `--salt is given ${saltsGiven.length} time(s) but --salt-mass ${massesGiven.length} time(s); give one --salt-mass per --salt, in the same order`);
    }
    const solids = saltsGiven.map((formula, i) => {
      try {
        parseSalt(formula, dataset);
      } catch (e) {
        if (isIonheatError(e)) throw new IonheatError(e.code, `--salt "${formula}": ${e.message}`, { field: 'salt', text: formula });
        throw e;
      }
      return { formula, massG: numberOption(massesGiven[i], 'salt-mass')! };
    });
    if (values.water === undefined) throw bad('water', '--water is required (g)');
    const water = numberOption(values.water, 'water')!;
    const start = numberOption(values.start, 'start');
    const container = numberOption(values.container, 'container');
    const target = numberOption(values.target, 'target');
    const heatCapacity = numberOption(values['heat-capacity'], 'heat-capacity');
    const heatCapacityU = numberOption(values['heat-capacity-u'], 'heat-capacity-u');
    const draws = numberOption(values['monte-carlo'], 'monte-carlo');
    const seed = numberOption(values.seed, 'seed');
    const points = numberOption(values.points, 'points');

    const fill: PackFill = { solids, waterG: water, ...(start !== undefined ? { startC: start } : {}), ...(container !== undefined ? { containerJPerK: container } : {}) };
    const packOptions: PackOptions = {
      ...(heatCapacity !== undefined ? { heatCapacityJPerK: heatCapacity, heatCapacityUJPerK: heatCapacityU ?? 0 } : {}),
      ...(values.kirchhoff ? { kirchhoff: true } : {}),
      ...(draws !== undefined ? { interval: { method: 'monte-carlo' as const, samples: draws, ...(seed !== undefined ? { seed } : {}) } } : {}),
    };

    let band: TimeCourseOptions['band'];
    if (values.band !== undefined) {
      const parts = values.band.split(/[:,]/);
      const lo = parts.length === 2 ? numberOption(parts[0], 'band') : undefined;
      const hi = parts.length === 2 ? numberOption(parts[1], 'band') : undefined;
      if (lo === undefined || hi === undefined || !(lo < hi)) throw bad('band', `--band needs <low>:<high> in °C with low below high, e.g. --band 40:50; got "${values.band}"`);
      band = { lowC: lo, highC: hi };
    }
    const timeKeys = ['duration', 'tau', 'ambient', 'g-ambient', 'skin', 'g-skin'] as const;
    const wantsCourse = band !== undefined || values['time-svg'] !== undefined || timeKeys.some((k) => values[k] !== undefined);
    const courseOptions: TimeCourseOptions = {
      ...(band ? { band } : {}),
      ...(values.duration !== undefined ? { durationS: numberOption(values.duration, 'duration')! } : {}),
      ...(values.tau !== undefined ? { dissolutionTimeConstantS: numberOption(values.tau, 'tau')! } : {}),
      ...(values.ambient !== undefined ? { ambientC: numberOption(values.ambient, 'ambient')! } : {}),
      ...(values['g-ambient'] !== undefined ? { ambientConductanceWPerK: numberOption(values['g-ambient'], 'g-ambient')! } : {}),
      ...(values.skin !== undefined ? { skinC: numberOption(values.skin, 'skin')! } : {}),
      ...(values['g-skin'] !== undefined ? { skinConductanceWPerK: numberOption(values['g-skin'], 'g-skin')! } : {}),
    };

    let result: PackResult;
    let curve: PackRatioCurve;
    let course: PackTimeCourse | undefined;
    let margin: PackDesignMargin | undefined;
    const withCurve = values.curve === true || values['curve-svg'] !== undefined;
    try {
      result = packFinalTemperature(fill, packOptions, dataset);
      curve = packRatioCurve(fill, { ...(target !== undefined ? { targetC: target } : {}), points: points ?? (withCurve ? 200 : 40), band: withCurve }, packOptions, dataset);
      course = wantsCourse ? packTimeCourse(fill, courseOptions, packOptions, dataset) : undefined;
      margin = target !== undefined ? packDesignMargin(fill, target, packOptions, dataset) : undefined;
    } catch (e) {
      throw asFlagError(e, flagOfField);
    }

    const written: string[] = [];
    if (values['curve-svg'] !== undefined) written.push(writeChart(io.cwd, values['curve-svg'], packCurveSvg(curve), 'curve-svg'));
    if (values['time-svg'] !== undefined && course) {
      const label = `${fill.solids.map((s) => `${s.massG} g ${s.formula}`).join(' + ')} in ${fill.waterG} g water`;
      written.push(writeChart(io.cwd, values['time-svg'], timeCourseSvg(course, { fillLabel: label }), 'time-svg'));
    }
    // A hydrate that also makes a latent-heat warmer: say so, rather than let the dissolving pack pass for its use.
    const warmerSalt = new Set(warmerSalts(dataset));
    const hints = fill.solids
      .map((s) => parseSalt(s.formula, dataset).formula)
      .filter((f) => warmerSalt.has(f))
      .map((f) => `${f} can also serve as a supercooled melt that crystallises on demand (a latent-heat warmer); this pack only dissolves it in water. For a warmer, run: ionheat warmer --salt "${f}" --mass <g>`);
    if (hints.length > 0) result = { ...result, notes: [...hints, ...result.notes] };
    if (values.json) {
      io.stdout(JSON.stringify(jsonReport(result, curve, course, withCurve, dataset, margin), null, 2) + '\n');
      return 0;
    }
    io.stdout(textReport(result, curve, course, dataset, margin, outputWidth(io)));
    for (const w of written) io.stdout(`chart written to ${w}\n`);
    return 0;
  },
};
