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
import { benchStartup } from './benchStartup.js';
import { benchBundle } from './benchBundle.js';

const sections: { name: string; run: () => string[] | Promise<string[]> }[] = [
  { name: 'start-up', run: () => benchStartup() },
  { name: 'dissolve', run: benchDissolve },
  { name: 'pack', run: benchPack },
  { name: 'lattice', run: benchLattice },
  { name: 'screen', run: benchScreen },
  { name: 'hostile input', run: benchHostile },
  { name: 'memory (slow reader, distinct salts)', run: benchMemory },
  { name: 'browser bundle', run: benchBundle },
];

// `npm run bench -- start-up bundle` runs only the sections named.
const only = process.argv.slice(2);
for (const section of sections.filter((s) => only.length === 0 || only.some((o) => s.name.startsWith(o)))) {
  process.stdout.write(`== ${section.name}\n${(await section.run()).join('\n')}\n\n`);
}
