/**
 * `npm run validate:brine`: the brine module against published values —
 * freezing points of brines against the Smithsonian/CRC table, the
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

lines.push('## Enthalpy parameters: two independent sets', '', '| salt | β⁽⁰⁾ᴸ pitzer.dat (1/K) | β⁽⁰⁾ᴸ Silvester & Pitzer 1977 (1/K, from memory) | ratio |', '| --- | --- | --- | --- |');
for (const [formula, sp] of BETA0L) {
  const r = brineRecords().find((x) => x.formula === formula)!;
  const s = pitzerSlope(r.pitzer.beta0, 298.15);
  lines.push(`| ${formula} | ${s.toExponential(3)} | ${sp.toExponential(3)} | ${fmt(s / sp, 3)} |`);
}
lines.push('');

lines.push('## Integral enthalpies of solution', '', 'ΔsolH(m, 25 °C) = ΔsolH°(∞) + φL(m) for the pack salts (kJ/mol of the formula as written); method says whether the salt\'s own Pitzer parameters or the charge-type estimate give φL. Published integral heats to compare with were not available to this script: the check of φL against data is the leave-one-salt-out table below and the two-set comparison above.', '', '| salt | ∞ | 1 mol/kg | 3 mol/kg | 6 mol/kg | method |', '| --- | --- | --- | --- | --- | --- |');
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
