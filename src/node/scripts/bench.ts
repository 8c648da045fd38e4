/**
 * `npm run bench`: speed targets, measured in one run on one core and
 * printed as ratios to their targets. Each section lives in its own file.
 */
import { benchDissolve } from './benchDissolve.js';
import { benchPack } from './benchPack.js';
import { benchLattice } from './benchLattice.js';
import { benchScreen } from './benchScreen.js';
import { benchHostile } from './benchHostile.js';
import { benchMemory } from './benchMemory.js';

const sections: { name: string; run: () => string[] | Promise<string[]> }[] = [
  { name: 'dissolve', run: benchDissolve },
  { name: 'pack', run: benchPack },
  { name: 'lattice', run: benchLattice },
  { name: 'screen', run: benchScreen },
  { name: 'hostile input', run: benchHostile },
  { name: 'memory (slow reader, distinct salts)', run: benchMemory },
];

for (const section of sections) {
  process.stdout.write(`== ${section.name}\n${(await section.run()).join('\n')}\n\n`);
}
