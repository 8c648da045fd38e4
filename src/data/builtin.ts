/**
 * The built-in dataset: every table under `data/`, bundled into the package as
 * JSON so that the core entry needs no file access (it runs in a browser or a
 * notebook). Built on first use; the tables are validated by the test suite,
 * not at every start-up, and the indexes and calibrations that take time to
 * build come computed ahead (`builtinSnapshot.generated.ts`, `npm run generate`).
 *
 * @module
 */
import type { SourceEntry } from './schemas.js';
import { Dataset, type Tables } from './dataset.js';
import { builtinSnapshot } from './builtinSnapshot.generated.js';
import sources from '../../data/sources.json';
import elements from '../../data/elements.json';
import ions from '../../data/ions.json';
import shannonRadii from '../../data/shannon-radii.json';
import thermochemicalRadii from '../../data/thermochemical-radii.json';
import ionVolumes from '../../data/ion-volumes.json';
import ionFormationAq from '../../data/ion-formation-aq.json';
import ionFormationGas from '../../data/ion-formation-gas.json';
import ionHeatCapacitiesAq from '../../data/ion-heat-capacities-aq.json';
import compoundFormation from '../../data/compound-formation.json';
import solutionEnthalpies from '../../data/solution-enthalpies.json';
import hydrationEnthalpies from '../../data/hydration-enthalpies.json';
import crystals from '../../data/crystals.json';
import solubility from '../../data/solubility.json';
import solubilityProducts from '../../data/solubility-products.json';
import heatCapacities from '../../data/heat-capacities.json';
import ionizationEnergies from '../../data/ionization-energies.json';
import electronAffinities from '../../data/electron-affinities.json';
import atomizationEnthalpies from '../../data/atomization-enthalpies.json';
import bondDissociation from '../../data/bond-dissociation.json';
import madelungConstants from '../../data/madelung-constants.json';
import bornExponents from '../../data/born-exponents.json';
import volumeCoefficients from '../../data/volume-coefficients.json';
import hazards from '../../data/hazards.json';
import brinePitzer from '../../data/brine-pitzer.json';
import warmerMelts from '../../data/warmer-melts.json';

let builtin: Dataset | undefined;

/**
 * The dataset of built-in tables (the same object on every call; it is
 * immutable). Merge your own tables over it with {@link Dataset.withOverrides}.
 *
 * @see data/sources.json, the full citation of every source key the records name; DEVELOPERS.md, "Data tables".
 *
 * @example
 * ```ts
 * builtinDataset().records('ions.json').length > 60; // true
 * builtinDataset() === builtinDataset(); // true
 * ```
 */
export function builtinDataset(): Dataset {
  builtin ??= new Dataset(
    {
      'elements.json': elements,
      'ions.json': ions,
      'shannon-radii.json': shannonRadii,
      'thermochemical-radii.json': thermochemicalRadii,
      'ion-volumes.json': ionVolumes,
      'ion-formation-aq.json': ionFormationAq,
      'ion-formation-gas.json': ionFormationGas,
      'ion-heat-capacities-aq.json': ionHeatCapacitiesAq,
      'compound-formation.json': compoundFormation,
      'solution-enthalpies.json': solutionEnthalpies,
      'hydration-enthalpies.json': hydrationEnthalpies,
      'crystals.json': crystals,
      'solubility.json': solubility,
      'solubility-products.json': solubilityProducts,
      'heat-capacities.json': heatCapacities,
      'ionization-energies.json': ionizationEnergies,
      'electron-affinities.json': electronAffinities,
      'atomization-enthalpies.json': atomizationEnthalpies,
      'bond-dissociation.json': bondDissociation,
      'madelung-constants.json': madelungConstants,
      'born-exponents.json': bornExponents,
      'volume-coefficients.json': volumeCoefficients,
      'hazards.json': hazards,
      'brine-pitzer.json': brinePitzer,
      'warmer-melts.json': warmerMelts,
    } as unknown as Tables,
    sources.sources as Record<string, SourceEntry>,
    'built-in',
    new Map(),
    builtinSnapshot,
  );
  return builtin;
}
