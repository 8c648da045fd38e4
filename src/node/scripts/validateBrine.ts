/**
 * `npm run validate:brine`: the brine module against published values —
 * freezing points of brines against the Smithsonian table and the CRC table
 * of concentrative properties (urea, KNO3, CaCl2, NH4Cl), the NH4NO3 salt–ice
 * eutectic, apparent molar heat capacities against Laliberté (2009), the
 * enthalpy parameters of pitzer.dat against Silvester & Pitzer, integral
 * enthalpies of solution of the pack salts to a few molalities, and the
 * leave-one-salt-out coverage of the model discrepancy. Writes
 * docs/brine-validation.md.
 */
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseSalt } from '../../chem/parseSalt.js';
import { brineFreezingPoint } from '../../brine/brineFreezingPoint.js';
import { brineCalibration } from '../../brine/brineCalibration.js';
import { brineRecords } from '../../brine/brineParameterSets.js';
import { pitzerSlope } from '../../brine/pitzerTemperature.js';
import { integralEnthalpyOfSolution } from '../../solution/integralEnthalpy.js';
import { brineModel } from '../../brine/brineModel.js';
import { brineHeatCapacity, brineHeatCapacityU } from '../../brine/brineProperties.js';
import { aqueousHeatCapacity } from '../../pack/solidHeatCapacity.js';
import { crcFreezingPoints, laliberteMolarHeatCapacity, laliberteSalts } from './brineReferenceData.js';

const root = join(dirname(fileURLToPath(import.meta.url)), '../../..');

/** Freezing-point lowering, K, at molality m: Smithsonian Physical Tables, 9th ed. (1956), as in the CRC Handbook (checked against a copy). */
const FREEZING: [string, number, number][] = [
  ['NaCl', 0.5, 1.68], ['NaCl', 0.75, 2.6], ['KCl', 1, 3.29], ['KCl', 2, 6.5], ['KCl', 3, 9.77], ['CaCl2', 1, 6.35], ['CaCl2', 2, 15.27],
  ['CaCl2', 3, 28.08], ['KNO3', 1, 2.66], ['NH4Cl', 0.75, 2.55], ['MgSO4', 1, 2.08], ['MgSO4', 1.5, 3.41], ['NaNO3', 1, 3.1], ['LiCl', 0.75, 2.78],
];

/** β⁽⁰⁾ᴸ at 25 °C, per K, of Silvester & Pitzer (1977) (from memory), against pitzer.dat's slope. */
const BETA0L: [string, number][] = [['NaCl', 7.159e-4], ['KCl', 5.794e-4]];

const fmt = (x: number, d: number): string => (Object.is(x, -0) ? 0 : x).toFixed(d);

const lines: string[] = [
  '# Brine validation',
  '',
  'Written by `npm run validate:brine` (src/node/scripts/validateBrine.ts); do not edit by hand.',
  '',
  '## Freezing points',
  '',
  'Freezing point of a single-salt brine from the Pitzer water activity (brineFreezingPoint) against the Smithsonian table (lowering in K; checked against a copy).',
  '',
  '| salt | m (mol/kg) | table (°C) | model (°C) | 95 % interval (°C) | difference (K) |',
  '| --- | --- | --- | --- | --- | --- |',
];
let inside = 0;
for (const [formula, m, lowering] of FREEZING) {
  const e = brineFreezingPoint(parseSalt(formula), m);
  if (e.low <= -lowering && -lowering <= e.high) inside++;
  lines.push(`| ${formula} | ${m} | ${fmt(-lowering, 2)} | ${fmt(e.value, 2)} | ${fmt(e.low, 2)} … ${fmt(e.high, 2)} | ${fmt(e.value + lowering, 2)} |`);
}
lines.push('', `${inside} of ${FREEZING.length} table values lie inside the 95 % interval: inside the fitted range the interval carries only the fit allowance, and below 0 °C the parameters are extrapolated (see docs/methods.md, "Brines").`, '');

// Every CRC point is compared; the table shows about six per solute, the count line all of them.
lines.push('### CRC table of concentrative properties', '', 'Freezing-point depressions of the CRC Handbook (102nd ed., table of concentrative properties; `crcConcentrative`, checked against the transcription in tests/reference/brine-crc-freezing-points.json). The table has no ammonium nitrate. Far below 25 °C these points test the temperature dependence of φ, and so φL and φJ through the Gibbs–Helmholtz relation.', '', '| solute | m (mol/kg) | table (°C) | model (°C) | 95 % interval (°C) | difference (K) |', '| --- | --- | --- | --- | --- | --- |');
const crcCount: string[] = [];
for (const [formula, points] of Object.entries(crcFreezingPoints())) {
  const salt = parseSalt(formula);
  let covered = 0;
  let worst = 0;
  const step = Math.max(1, Math.floor(points.length / 6));
  points.forEach((p, i) => {
    const e = brineFreezingPoint(salt, p.m);
    // the table's rounding to 0.01 K counts as inside
    if (e.low - 0.005 <= -p.depression && -p.depression <= e.high + 0.005) covered++;
    worst = Math.max(worst, Math.abs(e.value + p.depression));
    if (i % step === 0 || i === points.length - 1) lines.push(`| ${formula} | ${p.m} | ${fmt(-p.depression, 2)} | ${fmt(e.value, 2)} | ${fmt(e.low, 2)} … ${fmt(e.high, 2)} | ${fmt(e.value + p.depression, 2)} |`);
  });
  crcCount.push(`${formula}: ${covered} of ${points.length} inside, largest difference ${fmt(worst, 2)} K (${points[0]!.m}–${points.at(-1)!.m} mol/kg)`);
}
lines.push('', ...crcCount.map((c) => `- ${c}`), '');

// NH4NO3: the salt–ice eutectic of the solubility table (−16.9 °C, 42 % by mass, from memory) is the only
// freezing point of a concentrated NH4NO3 brine in reach; the model's freezing point of that brine is compared.
const eutecticM = (1000 * 0.42) / (0.58 * 80.043);
const nh4no3 = brineFreezingPoint(parseSalt('NH4NO3'), eutecticM);
lines.push('### NH4NO3 at its salt–ice eutectic', '', `The brine of the tabulated eutectic (42 % by mass, ${fmt(eutecticM, 2)} mol/kg; −16.9 °C, Linke–Seidell, from memory) freezes in the model at ${fmt(nh4no3.value, 2)} °C (95 % interval ${fmt(nh4no3.low, 2)} … ${fmt(nh4no3.high, 2)} °C). Its 25 °C Pitzer parameters (Pitzer & Mayorga, fitted to 6 mol/kg) are extrapolated, and its temperature terms are those of the 1:1 salts: with them φ at −17 °C rises past 6 mol/kg (0.65 at 6, 0.66 at 9 mol/kg) where the tabulated eutectic needs about 0.51. The interval, which carries the model discrepancy past 6 mol/kg, takes in the tabulated value; see docs/methods.md, "Brines", failure cases.`, '');

lines.push('## Apparent molar heat capacities', '', 'φCp = φCp° + φJ at 25 °C against the model of Laliberté (2009) for the heat capacity of aqueous solutions (`laliberte2009`; parameters as carried by the chemicals package 1.5.2, in tests/reference/brine-laliberte-heat-capacity.json), J/(mol·K). Salts with their own heat-capacity terms and Cp° for all their ions, 1–6 mol/kg within both fits; the reference carries 0.2 % of the solution\'s heat capacity (assumed).', '', '| salt | m (mol/kg) | Laliberté | model | model 95 % interval | difference |', '| --- | --- | --- | --- | --- | --- |');
let cpInside = 0;
let cpTotal = 0;
const lal = laliberteSalts();
for (const formula of Object.keys(lal).sort()) {
  const salt = parseSalt(formula);
  const model = brineModel(salt);
  const aq = aqueousHeatCapacity(salt);
  if (!aq || !model.own.heatCapacity) continue;
  for (const m of [1, 2, 3, 4, 5, 6]) {
    const ref = laliberteMolarHeatCapacity(lal[formula]!, m);
    if (ref.w > lal[formula]!.maxW || m > model.maxMolality) continue;
    const value = aq.value + brineHeatCapacity(model, m, 298.15);
    const u = Math.hypot(aq.u, brineHeatCapacityU(model, m, 298.15));
    cpTotal++;
    if (Math.abs(value - ref.value) <= 1.96 * Math.hypot(u, ref.u)) cpInside++;
    lines.push(`| ${formula} | ${m} | ${fmt(ref.value, 1)} | ${fmt(value, 1)} | ${fmt(value - 1.96 * u, 1)} … ${fmt(value + 1.96 * u, 1)} | ${fmt(value - ref.value, 1)} |`);
  }
}
lines.push('', `${cpInside} of ${cpTotal} points agree within 1.96 times the combined uncertainty of model and reference.`, '');

lines.push('## Enthalpy parameters: two independent sets', '', '| salt | β⁽⁰⁾ᴸ pitzer.dat (1/K) | β⁽⁰⁾ᴸ Silvester & Pitzer 1977 (1/K, from memory) | ratio |', '| --- | --- | --- | --- |');
for (const [formula, sp] of BETA0L) {
  const r = brineRecords().find((x) => x.formula === formula)!;
  const s = pitzerSlope(r.pitzer.beta0, 298.15);
  lines.push(`| ${formula} | ${s.toExponential(3)} | ${sp.toExponential(3)} | ${fmt(s / sp, 3)} |`);
}
lines.push('');

lines.push('## Integral enthalpies of solution', '', 'ΔsolH(m, 25 °C) = ΔsolH°(∞) + φL(m) for the pack salts (kJ/mol of the formula as written); method says whether the salt\'s own Pitzer parameters or the charge-type estimate give φL. No copy of Parker (1965) or of the NBS tables of enthalpies at finite dilution was available to this script, so no published integral heat is compared here: the checks of φL against data are the two-set comparison above, the freezing points far below 25 °C (Gibbs–Helmholtz) and the leave-one-salt-out table below. Urea takes φL from Gucker & Pickard (1940, from memory).', '', '| salt | ∞ | 1 mol/kg | 3 mol/kg | 6 mol/kg | method |', '| --- | --- | --- | --- | --- | --- |');
for (const formula of ['NaCl', 'KCl', 'NaNO3', 'KNO3', 'NH4NO3', 'NH4Cl', 'CaCl2', 'CaCl2·6H2O', 'MgCl2', 'MgSO4', 'Na2SO4', 'CO(NH2)2']) {
  const salt = parseSalt(formula);
  const at = (m: number) => integralEnthalpyOfSolution(salt, m);
  const cell = (m: number) => {
    const e = at(m);
    return `${fmt(e.value, 2)} (${fmt(e.low, 2)} … ${fmt(e.high, 2)})`;
  };
  lines.push(`| ${formula} | ${fmt(at(0).value, 2)} | ${cell(1)} | ${cell(3)} | ${cell(6)} | ${at(1).method} |`);
}
lines.push('');

const cal = brineCalibration();
lines.push('## Leave-one-salt-out coverage of the model discrepancy', '', 'Each salt with Pitzer data is predicted from the others of its charge type at 0.5–6 mol/kg (up to its fitted range), 25 °C; u = s·(ν|z₊z₋|/2)·m with s from the other salts only.', '');
lines.push('<!-- brine coverage -->', '| quantity | scale s (per mol/kg) | residuals | inside ±1.96·u | coverage |', '| --- | --- | --- | --- | --- |');
const unit = { osmotic: '', enthalpy: ' J/mol', heatCapacity: ' J/(mol·K)' } as const;
for (const q of ['osmotic', 'enthalpy', 'heatCapacity'] as const) {
  const c = cal.coverage[q];
  lines.push(`| ${q === 'osmotic' ? 'φ' : q === 'enthalpy' ? 'φL' : 'φJ'} | ${cal.scales[q].toPrecision(3)}${unit[q]} | ${c.total} | ${c.covered} | ${(100 * c.share).toFixed(1)} % |`);
}
lines.push('');
writeFileSync(join(root, 'docs/brine-validation.md'), lines.join('\n'));
process.stdout.write(`wrote docs/brine-validation.md\n`);
