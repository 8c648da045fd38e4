import { parseSalt } from '../../chem/parseSalt.js';
import { formatSalt } from '../../chem/formatSalt.js';
import { measuredSolutionEnthalpy } from '../../solution/measuredSolution.js';
import { solutionEnthalpyFromCycle } from '../../solution/cycleSolution.js';
import { roundEstimate, type Estimate } from '../../quantity/estimate.js';
import { readArgs } from './args.js';
import type { Command } from './command.js';
import { textTable } from './textTable.js';

/** A handful of salts from the cold- and hot-pack trade. */
const DEMO_SALTS = ['NH4NO3', 'NH4Cl', 'KNO3', 'CO(NH2)2', 'NaCl', 'CaCl2', 'MgSO4', 'NaCH3COO·3H2O', 'Na2S2O3·5H2O'];

const show = (e: Estimate | undefined): string => {
  if (!e) return '—';
  const r = roundEstimate(e);
  return `${r.value > 0 ? '+' : ''}${r.value} ± ${r.u}`;
};

/** `ionheat demo`: the built-in demonstration. */
export const demoCommand: Command = {
  name: 'demo',
  summary: 'run the built-in demonstration: enthalpies of solution of common pack salts',
  usage: 'ionheat demo',
  async run(argv, { io, dataset }) {
    readArgs(argv, {}, { min: 0, max: 0, names: '' });
    const rows = DEMO_SALTS.map((f) => {
      const salt = parseSalt(f, dataset);
      const measured = measuredSolutionEnthalpy(salt, dataset);
      const cycle = solutionEnthalpyFromCycle(salt, dataset);
      const best = measured ?? cycle;
      const perGram = best ? (best.value * 1000) / salt.molarMass : undefined;
      const effect = !best ? '' : best.low > 0 ? 'cools' : best.high < 0 ? 'heats' : 'undecided';
      return [formatSalt(salt, { style: 'unicode' }), salt.molarMass.toFixed(2), show(measured), show(cycle), perGram === undefined ? '—' : perGram.toFixed(0), effect];
    });
    io.stdout('Enthalpy of solution at infinite dilution, 25 °C (kJ/mol; + = endothermic, the pack cools)\n\n');
    io.stdout(textTable(['salt', 'M g/mol', 'measured', 'from ΔfH° cycle', 'J/g', 'effect'], rows, new Set([1, 2, 3, 4])));
    io.stdout('\nmeasured: CRC Handbook table of electrolytes; cycle: Σν·ΔfH°(ions, aq) − ΔfH°(crystal), NBS tables. ± is one standard uncertainty.\n');
    return 0;
  },
};
