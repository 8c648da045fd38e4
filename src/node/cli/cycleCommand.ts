import { writeFileSync } from 'node:fs';
import { isAbsolute, join } from 'node:path';
import { parseSalt } from '../../chem/parseSalt.js';
import { formatSalt } from '../../chem/formatSalt.js';
import { IonheatError } from '../../error.js';
import { roundEstimate } from '../../quantity/estimate.js';
import { roundToUncertainty } from '../../quantity/rounding.js';
import { bornHaberCycle, cycleUnknowns, type CycleUnknown, type KnownValue } from '../../cycle/bornHaberCycle.js';
import { bestLatticeEstimate } from '../../lattice/bestLatticeEstimate.js';
import { cycleDiagram } from '../../render/cycleDiagram.js';
import { numberOption, readArgs } from './args.js';
import type { Command } from './command.js';
import { textTable } from './textTable.js';
import { bulletLines } from './paragraphs.js';
import { outputWidth } from './io.js';
import { formatNumber } from '../../notation/minus.js';

function readSolve(value: string | undefined): CycleUnknown {
  const s = value ?? 'lattice';
  if ((cycleUnknowns as readonly string[]).includes(s)) return s as CycleUnknown;
  throw new IonheatError('INVALID_ARGUMENT', `--solve must be one of ${cycleUnknowns.join(', ')}, got "${s}"`, { field: 'solve', text: s });
}

const rounded = (value: number, u: number) => roundToUncertainty(value, u > 0 ? u : 0.05);

/** `ionheat cycle <formula>`: the Born–Haber cycle, step by step. */
export const cycleCommand: Command = {
  usage: [
    'ionheat cycle <formula> [--solve lattice|formation|electron-affinity] [--svg <file>] [--json]',
    '',
    '  <formula>            an anhydrous salt, e.g. NaCl, MgO, KNO3',
    '  --solve <unknown>    lattice (default): the lattice enthalpy; formation: ΔfH° of the crystal;',
    '                       electron-affinity: the last electron affinity of the anion (X⁻, or X²⁻ for O, S, Se)',
    '  --lattice <kJ/mol>   lattice enthalpy to use when solving for the formation enthalpy or an electron affinity',
    '                       (default: the most precise bias-corrected model estimate, the salt left out of its calibration)',
    '  --lattice-u <kJ/mol> standard uncertainty of --lattice (default 1 % of it)',
    '  --formation <kJ/mol> ΔfH° of the crystal to use instead of the tabulated one',
    '  --svg <file>         write the energy-level diagram as a standalone SVG file',
    '  --json               print one JSON object: { formula, solve, steps: [ … ], result: { quantity, value, low, high, unit, … } }',
    '',
    'Steps are enthalpy changes at 298.15 K in kJ/mol along elements → gaseous atoms → gaseous ions → crystal (the lattice',
    'step is −ΔH_L); ionization energies and electron affinities are the tabulated 0 K values with the 5/2·RT electron term apart.',
  ].join('\n'),
  async run(argv, { io, dataset }) {
    const { values, positionals } = readArgs(
      argv,
      { solve: { type: 'string' }, lattice: { type: 'string' }, 'lattice-u': { type: 'string' }, formation: { type: 'string' }, svg: { type: 'string' }, json: { type: 'boolean' } },
      { min: 1, max: 1, names: 'the formula' },
      { 'lattice-u': { anyOf: ['lattice'], why: 'it is the uncertainty of the lattice enthalpy you give' } },
    );
    const solve = readSolve(values.solve);
    const salt = parseSalt(positionals[0]!, dataset);
    const given = numberOption(values.lattice, 'lattice');
    const givenU = numberOption(values['lattice-u'], 'lattice-u');
    if (givenU !== undefined && givenU < 0) throw new IonheatError('INVALID_ARGUMENT', `--lattice-u cannot be negative, got ${givenU}`, { field: 'lattice-u' });
    const formation = numberOption(values.formation, 'formation');
    let latticeEnthalpy: KnownValue | undefined;
    if (given !== undefined) latticeEnthalpy = { value: given, u: givenU ?? Math.abs(given) * 0.01, source: 'given' };
    else if (solve !== 'lattice') latticeEnthalpy = bestLatticeEstimate(salt, {}, dataset);
    const cycle = bornHaberCycle(
      salt,
      { solve, ...(latticeEnthalpy ? { latticeEnthalpy } : {}), ...(formation !== undefined ? { formationEnthalpy: { value: formation, u: 0, source: 'given' } } : {}) },
      dataset,
    );
    let svgPath: string | undefined;
    if (values.svg !== undefined) {
      if (values.svg.trim() === '') throw new IonheatError('INVALID_ARGUMENT', '--svg needs a file name', { field: 'svg' });
      svgPath = isAbsolute(values.svg) ? values.svg : join(io.cwd, values.svg);
      try {
        writeFileSync(svgPath, cycleDiagram(cycle), 'utf8');
      } catch (e) {
        throw new IonheatError('INVALID_ARGUMENT', `cannot write the diagram to ${values.svg}: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`, { field: 'svg' });
      }
    }
    const result = roundEstimate(cycle.result);
    if (values.json) {
      const steps = cycle.steps.map((s) => ({ ...s }));
      io.stdout(
        JSON.stringify(
          {
            formula: cycle.formula,
            solve: cycle.solve,
            steps,
            result: { quantity: result.quantity, value: result.value, low: result.low, high: result.high, unit: result.unit, u: result.u, basis: result.basis, method: result.method, sources: result.sources, notes: result.notes },
            ...(svgPath ? { svg: svgPath } : {}),
          },
          null,
          2,
        ) + '\n',
      );
      return 0;
    }
    io.stdout(`Born–Haber cycle of ${formatSalt(salt, { style: 'unicode' })}, 298.15 K, kJ/mol\n\n`);
    const rows = cycle.steps.map((s, i) => {
      const r = rounded(s.value, s.u);
      return [String(i + 1), s.label, s.equation, formatNumber(r.value, { plus: true }), String(r.u), s.solved ? 'solved' : s.source];
    });
    io.stdout(textTable(['#', 'step', 'equation', 'ΔH', 'u', 'source'], rows, new Set([0, 3, 4])));
    io.stdout(`\n${result.quantity}: ${formatNumber(result.value)} ± ${result.u} kJ/mol (95 % interval ${formatNumber(result.low)} … ${formatNumber(result.high)}; basis ${result.basis})\n`);
    // Say how the result and the solved step's sign relate, so that −EA beside +ΔH of the step reads as one fact.
    const solvedAt = cycle.steps.findIndex((s) => s.solved);
    if (solvedAt >= 0 && cycle.solve !== 'formation') {
      const symbol = cycle.solve === 'lattice' ? 'ΔH_L' : 'EA';
      io.stdout(`  sign: step ${solvedAt + 1} is −${symbol} = ${formatNumber(rounded(cycle.steps[solvedAt]!.value, cycle.steps[solvedAt]!.u).value, { plus: true })} kJ/mol (${cycle.solve === 'lattice' ? 'the lattice enthalpy is taken in to part the crystal' : 'the electron affinity is the energy released on attachment'})\n`);
    }
    io.stdout(bulletLines(result.notes, outputWidth(io), '  note: ').join('\n') + (result.notes.length > 0 ? '\n' : ''));
    if (svgPath) io.stdout(`diagram written to ${svgPath}\n`);
    return 0;
  },
};
