import type { TableName, TableRecord } from './schemas.js';

/**
 * The fields that make a record unique in each table. A user's override
 * record replaces the built-in record with the same key.
 */
export const tableKeys: { [N in TableName]: (record: TableRecord<N>) => string } = {
  'elements.json': (r) => r.symbol,
  'ions.json': (r) => r.id,
  'shannon-radii.json': (r) => `${r.ion}|${r.coordination}|${r.spin ?? ''}`,
  'thermochemical-radii.json': (r) => r.ion,
  'ion-volumes.json': (r) => r.ion,
  'ion-formation-aq.json': (r) => r.ion,
  'ion-formation-gas.json': (r) => r.ion,
  'ion-heat-capacities-aq.json': (r) => r.ion,
  'compound-formation.json': (r) => `${r.formula}|${r.phase}`,
  'solution-enthalpies.json': (r) => r.formula,
  'hydration-enthalpies.json': (r) => r.ion,
  'crystals.json': (r) => r.formula,
  'solubility.json': (r) => r.formula,
  'solubility-products.json': (r) => r.mineral,
  'heat-capacities.json': (r) => `${r.formula}|${r.phase}`,
  'ionization-energies.json': (r) => `${r.element}|${r.stage}`,
  'electron-affinities.json': (r) => r.element,
  'atomization-enthalpies.json': (r) => r.element,
  'bond-dissociation.json': (r) => r.molecule,
  'madelung-constants.json': (r) => r.structure,
  'born-exponents.json': (r) => r.core,
  'volume-coefficients.json': (r) => r.chargeType,
  'hazards.json': (r) => r.subject,
  'warmer-melts.json': (r) => r.formula,
};
