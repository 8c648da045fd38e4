import { parseSalt } from '../../chem/parseSalt.js';
import { formatSalt } from '../../chem/formatSalt.js';
import { readArgs } from './args.js';
import type { Command } from './command.js';
import { textTable } from './textTable.js';
import { chargeNumber, ionText } from '../../notation/charge.js';

/** `ionheat salt <formula>`: how ionheat reads a formula. */
export const saltCommand: Command = {
  usage: 'ionheat salt <formula> [--json]\n\n  <formula>   e.g. "CaCl2·6H2O", "(NH4)2SO4", "urea"\n  --json      print one JSON object',
  async run(argv, { io, dataset }) {
    const { values, positionals } = readArgs(argv, { json: { type: 'boolean' } }, { min: 1, max: 1, names: 'the formula' });
    const salt = parseSalt(positionals[0]!, dataset);
    if (values.json) {
      io.stdout(JSON.stringify(salt, null, 2) + '\n');
      return 0;
    }
    io.stdout(`${formatSalt(salt, { style: 'unicode' })}  (${salt.kind}, ${salt.molarMass.toFixed(3)} g/mol${salt.water ? `, ${salt.water} H₂O of crystallization` : ''})\n\n`);
    io.stdout(textTable(['ion', 'id', 'charge', 'count'], salt.ions.map((i) => [ionText(i.ion), i.ion, chargeNumber(i.charge), String(i.count)]), new Set([2, 3])));
    return 0;
  },
};
