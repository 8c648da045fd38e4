import { cautionLine } from '../../quantity/caution.js';
import { IonheatError, isIonheatError } from '../../error.js';
import { parseSalt } from '../../chem/parseSalt.js';
import { roundEstimate, type Estimate } from '../../quantity/estimate.js';
import { latentWarmer, type WarmerFill, type WarmerOptions, type WarmerResult } from '../../warmer/latentWarmer.js';
import { warmerCourseSvg } from '../../render/warmerCourse.js';
import { asFlagError, flagTable, joinNegativeValues, numberOption, readArgs } from './args.js';
import type { Command } from './command.js';
import { writeChart } from './writeChart.js';
import { bulletLines } from './paragraphs.js';
import { outputWidth } from './io.js';
import { unsignedZero } from '../../numeric/unsignedZero.js';

const options = {
  salt: { type: 'string' },
  mass: { type: 'string' },
  'extra-water': { type: 'string' },
  start: { type: 'string' },
  container: { type: 'string' },
  ambient: { type: 'string' },
  'g-ambient': { type: 'string' },
  svg: { type: 'string' },
  json: { type: 'boolean' },
} as const;

/** Each flag and the field of the warmer's fill or options it sets; an error about a field is reported under its flag. */
const FIELD_OF_FLAG = {
  salt: 'salt',
  mass: 'massG',
  'extra-water': 'extraWaterG',
  start: 'startC',
  container: 'containerJPerK',
  ambient: 'ambientC',
  'g-ambient': 'ambientConductanceWPerK',
} as const satisfies Partial<Record<keyof typeof options, string>>;

const flagOfField = flagTable(FIELD_OF_FLAG);

/** Options whose value is a number that may be negative (`--start -5`). */
const NUMERIC = new Set(Object.keys(FIELD_OF_FLAG).filter((flag) => flag !== 'salt'));

/** An estimate as the JSON report gives it: rounded by its uncertainty, with its unit. */
function reported(e: Estimate) {
  const r = roundEstimate(e);
  return { value: r.value, low: r.low, high: r.high, unit: r.unit, u: r.u, basis: r.basis, sources: r.sources };
}

const r = (x: number, digits: number): number => {
  const v = Number(x.toFixed(digits));
  return unsignedZero(v);
};

function jsonReport(w: WarmerResult) {
  return {
    fill: w.fill,
    melt: w.melt,
    liquidus: { value: r(w.liquidusC, 3), unit: '°C' },
    plateau: reported(w.plateau),
    crystallisedAtPlateau: reported(w.crystallisedAtPlateau),
    heatReleased: reported(w.heatReleased),
    heatPerGram: reported(w.heatPerGram),
    plateauDuration: reported(w.plateauDuration),
    rechargeTemperature: w.rechargeTemperature ? reported(w.rechargeTemperature) : null,
    secondsAboveBurnThreshold: r(w.secondsAboveBurnThreshold, 1),
    parameters: w.parameters,
    energy: {
      unit: 'J',
      trigger: Object.fromEntries(Object.entries(w.energy.trigger).map(([k, v]) => [k, Number(v.toPrecision(6))])),
      course: Object.fromEntries(Object.entries(w.energy.course).map(([k, v]) => [k, Number(v.toPrecision(6))])),
    },
    points: w.points.map((p) => ({ t: r(p.t, 2), temperature: r(p.temperature, 4), crystallised: r(p.crystallised, 5) })),
    cautions: w.cautions,
    notes: w.notes,
    sources: w.sources,
  };
}

/** "value unit (95 % interval low to high)" of a rounded estimate. */
function line(e: Estimate): string {
  const x = roundEstimate(e);
  return `${x.value} ${x.unit}   (95 % interval ${x.low} to ${x.high})`;
}

function textReport(w: WarmerResult, width: number): string {
  const f = w.fill;
  const out: string[] = [];
  out.push(`Warmer: ${f.massG} g ${f.formula}${f.extraWaterG > 0 ? ` + ${f.extraWaterG} g extra water` : ''}, supercooled at ${f.startC} °C${f.containerJPerK > 0 ? `, container ${f.containerJPerK} J/K` : ''}`);
  const melts = { congruent: 'congruently', 'semi-congruent': 'semi-congruently', incongruent: 'incongruently' }[w.melt.melting];
  out.push(`melts ${melts} at ${w.melt.meltingPoint.value} °C, latent heat ${w.melt.latentHeat.value} J/g; liquidus of this fill ${r(w.liquidusC, 2)} °C\n`);
  out.push(`plateau              ${line(w.plateau)}`);
  out.push(`crystallised at once ${line({ ...w.crystallisedAtPlateau, unit: 'of the hydrate' })}`);
  out.push(`heat released        ${line(w.heatReleased)}`);
  out.push(`heat per gram        ${line(w.heatPerGram)}`);
  out.push(`plateau duration     ${line(w.plateauDuration)}, until all crystallised or 1 K below the plateau`);
  out.push(`recharge above       ${w.rechargeTemperature ? line(w.rechargeTemperature) : 'not reachable by heating in water (see notes)'}`);
  out.push(`above 44 °C for about ${Math.round(w.secondsAboveBurnThreshold / 60)} min; energy balance closes to ${Math.abs(w.energy.course.residualJ).toExponential(1)} J`);
  out.push('\nCautions:');
  out.push(...bulletLines(w.cautions.map(cautionLine), width, '  • '));
  out.push('\nNotes:');
  out.push(...bulletLines(w.notes, width));
  return out.join('\n') + '\n';
}

function bad(field: string, message: string): IonheatError {
  return new IonheatError('INVALID_ARGUMENT', message, { field });
}

/** `ionheat warmer`: a latent-heat warmer of a supercooled salt-hydrate melt. */
export const warmerCommand: Command = {
  usage: [
    'ionheat warmer --salt <hydrate> --mass <g> [--extra-water <g>] [--start <°C>] [--container <J/K>] [--ambient <°C> --g-ambient <W/K>] [--svg <file>] [--json]',
    '',
    '  --salt          a salt hydrate with melt data, e.g. "NaCH3COO·3H2O" (also NaCH3COO.3H2O)',
    '  --mass          grams of hydrate',
    '  --extra-water   grams of water added beyond the hydrate\'s own (default 0): lowers the plateau and the heat',
    '  --start         temperature of the supercooled fill when triggered, °C (default 20)',
    '  --container     heat capacity of container, thickener or gel, J/K (default 0)',
    '  --ambient       air temperature, °C (22, assumed)     --g-ambient   conductance to the air, W/K (0.15, assumed)',
    '                  the skin side keeps its assumed 33 °C via 0.25 W/K',
    '  --svg           write temperature against time, plateau marked, as an SVG file',
    '  --json          print one JSON object',
  ].join('\n'),
  async run(argv, { io, dataset }) {
    const { values } = readArgs(joinNegativeValues(argv, NUMERIC), options, { min: 0, max: 0, names: '' });
    if (values.salt === undefined) throw bad('salt', '--salt is required: a salt hydrate such as "NaCH3COO·3H2O", with --mass in grams');
    try {
      parseSalt(values.salt, dataset);
    } catch (e) {
      if (isIonheatError(e)) throw new IonheatError(e.code, `--salt "${values.salt}": ${e.message}`, { field: 'salt', text: values.salt });
      throw e;
    }
    const mass = numberOption(values.mass, 'mass');
    if (mass === undefined) throw bad('mass', '--mass is required (grams of hydrate)');
    const number = (name: keyof typeof values) => numberOption(values[name] as string | undefined, name);
    const fill: WarmerFill = {
      salt: values.salt,
      massG: mass,
      ...(values['extra-water'] !== undefined ? { extraWaterG: number('extra-water')! } : {}),
      ...(values.start !== undefined ? { startC: number('start')! } : {}),
      ...(values.container !== undefined ? { containerJPerK: number('container')! } : {}),
    };
    const warmerOptions: WarmerOptions = {
      ...(values.ambient !== undefined ? { ambientC: number('ambient')! } : {}),
      ...(values['g-ambient'] !== undefined ? { ambientConductanceWPerK: number('g-ambient')! } : {}),
    };
    let result: WarmerResult;
    try {
      result = latentWarmer(fill, warmerOptions, dataset);
    } catch (e) {
      throw asFlagError(e, flagOfField);
    }
    const written = values.svg !== undefined ? writeChart(io.cwd, values.svg, warmerCourseSvg(result), 'svg') : undefined;
    if (values.json) {
      io.stdout(JSON.stringify(jsonReport(result), null, 2) + '\n');
      return 0;
    }
    io.stdout(textReport(result, outputWidth(io)));
    if (written) io.stdout(`chart written to ${written}\n`);
    return 0;
  },
};
