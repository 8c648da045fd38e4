// The closure check (issue: foundation). For every salt with a crystal
// formation enthalpy, formation enthalpies of all its aqueous ions and a
// measured enthalpy of solution, the cycle
//   ΔsolH = Σν·ΔfH°(ion, aq) + n_w·ΔfH°(H2O, l) − ΔfH°(salt·n_wH2O, cr)
// must agree with the tabulated ΔsolH within 1 kJ/mol. The formation values
// are the NBS tables (Wagman et al. 1982), the solution enthalpies the CRC
// table after Parker (1965), which were derived from one another: a miss
// means a number was mis-entered. Fix the data, never the tolerance.
import { describe, expect, it } from 'vitest';
import { builtinDataset } from '../../src/data/builtin.js';
import { parseSalt } from '../../src/chem/parseSalt.js';
import { solutionEnthalpyFromCycle } from '../../src/solution/cycleSolution.js';

const dataset = builtinDataset();
const measured = dataset.records('solution-enthalpies.json');

const closable = measured
  .map((record) => ({ record, salt: parseSalt(record.formula, dataset) }))
  .map(({ record, salt }) => ({ record, salt, cycle: solutionEnthalpyFromCycle(salt, dataset) }))
  .filter((x) => x.cycle !== undefined);

describe('closure of the formation-enthalpy cycle against measured enthalpies of solution', () => {
  it('has enough salts to mean something', () => {
    expect(closable.length).toBeGreaterThanOrEqual(50);
  });
  it.each(closable.map((x) => [x.salt.formula, x] as const))('%s closes within 1 kJ/mol', (_name, { record, cycle }) => {
    expect(Math.abs(cycle!.value - record.value)).toBeLessThanOrEqual(1);
  });
});
