import { parseSalt } from '../../chem/parseSalt.js';
import { formatSalt } from '../../chem/formatSalt.js';
import { IonheatError } from '../../error.js';
import { roundEstimate, type Estimate } from '../../quantity/estimate.js';
import { cycleLatticeEnthalpy } from '../../cycle/cycleLatticeEnthalpy.js';
import { latticeEstimate, latticeEstimates, latticeMethods, type LatticeMethod } from '../../lattice/latticeEstimate.js';
import { latticeModels } from '../../lattice/latticeModel.js';
import { numberOption, readArgs } from './args.js';
import type { Command } from './command.js';
import { textTable } from './textTable.js';

const METHOD_CHOICES = [...latticeModels, 'all'] as const;

function readMethod(value: string | undefined): LatticeMethod | 'all' {
  const m = value ?? 'all';
  if (m === 'all' || (latticeMethods as readonly string[]).includes(m)) return m as LatticeMethod | 'all';
  throw new IonheatError('INVALID_ARGUMENT', `--method must be one of ${METHOD_CHOICES.join(', ')} (or a method with -corrected), got "${m}"`, { field: 'method', text: m });
}

/** The JSON view of an estimate: rounded for reporting, every field kept. */
function view(e: Estimate) {
  const r = roundEstimate(e);
  return { method: r.method, value: r.value, low: r.low, high: r.high, unit: r.unit, u: r.u, quantity: r.quantity, basis: r.basis, sources: r.sources, notes: r.notes };
}

/** `ionheat lattice <formula>`: lattice enthalpy estimates with calibrated intervals. */
export const latticeCommand: Command = {
  usage: [
    'ionheat lattice <formula> [--method kapustinskii|born-lande|born-mayer|vbt|all] [--structure <type>] [--json]',
    '',
    '  <formula>               an anhydrous salt, e.g. NaCl, CaF2, KNO3',
    '  --method <m>            one estimator (also e.g. kapustinskii-corrected), or all (default): each model and its bias-corrected variant',
    '  --structure <type>      crystal structure to assume: rock-salt, caesium-chloride, zinc-blende, wurtzite, fluorite,',
    '                          antifluorite, rutile, cadmium-iodide, cadmium-chloride, corundum, perovskite',
    '  --lattice-parameter <a> cubic lattice parameter in Å, for r₀ of Born–Landé and Born–Mayer',
    '  --coordination <n>      coordination number at which Shannon radii are read',
    '  --json                  print one JSON object: { formula, estimates: [{ method, value, low, high, unit, … }], skipped, cycle }',
    '',
    'Values are lattice enthalpies ΔH_L at 298.15 K in kJ/mol, positive, for crystal → gaseous ions. Each interval comes from',
    "the estimator's leave-one-out scatter against cycle lattice enthalpies of the built-in salts (the salt itself left out).",
  ].join('\n'),
  async run(argv, { io, dataset }) {
    const { values, positionals } = readArgs(
      argv,
      { method: { type: 'string' }, structure: { type: 'string' }, 'lattice-parameter': { type: 'string' }, coordination: { type: 'string' }, json: { type: 'boolean' } },
      { min: 1, max: 1, names: 'the formula' },
    );
    const method = readMethod(values.method);
    const salt = parseSalt(positionals[0]!, dataset);
    const options = {
      ...(values.structure !== undefined ? { structure: values.structure } : {}),
      ...(values['lattice-parameter'] !== undefined ? { latticeParameter: numberOption(values['lattice-parameter'], 'lattice-parameter') } : {}),
      ...(values.coordination !== undefined ? { coordination: numberOption(values.coordination, 'coordination') } : {}),
    };
    let estimates: Estimate[];
    let skipped: { method: string; reason: string }[] = [];
    if (method === 'all') {
      ({ estimates, skipped } = latticeEstimates(salt, options, dataset));
      if (estimates.length === 0) throw new IonheatError('MISSING_DATA', `no lattice estimator applies to ${salt.formula}: ${skipped[0]?.reason ?? 'no data'}`, { text: salt.formula });
    } else {
      estimates = [latticeEstimate(salt, method, options, dataset)];
    }
    const cycle = cycleLatticeEnthalpy(salt, dataset);
    if (values.json) {
      io.stdout(JSON.stringify({ formula: salt.formula, quantity: 'lattice enthalpy', unit: 'kJ/mol', estimates: estimates.map(view), skipped, cycle: cycle ? view(cycle) : null }, null, 2) + '\n');
      return 0;
    }
    io.stdout(`Lattice enthalpy of ${formatSalt(salt, { style: 'unicode' })}, ΔH_L at 298.15 K (crystal → gaseous ions), kJ/mol\n\n`);
    const rows = estimates.map((e) => {
      const r = roundEstimate(e);
      return [r.method, String(r.value), `${r.low} … ${r.high}`, String(r.u)];
    });
    if (cycle) {
      const r = roundEstimate(cycle);
      rows.push(['Born–Haber cycle', String(r.value), `${r.low} … ${r.high}`, String(r.u)]);
    }
    io.stdout(textTable(['method', 'ΔH_L', '95 % interval', 'u'], rows, new Set([1, 2, 3])));
    if (skipped.length > 0) io.stdout(`\nnot applicable: ${skipped.filter((s) => !s.method.endsWith('-corrected')).map((s) => `${s.method} (${s.reason})`).join('; ')}\n`);
    io.stdout('\nIntervals: leave-one-out scatter of each estimator against cycle lattice enthalpies (docs/lattice-calibration.md).\n');
    return 0;
  },
};
