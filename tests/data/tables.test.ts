// Every table under data/ passes its zod schema, names a known source on every
// record, and holds no duplicated key. These checks guard the provenance rule:
// no number enters the dataset without a citation.
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sourcesFileSchema, tableSchemas, type TableName } from '../../src/data/schemas.js';

const dataDir = join(import.meta.dirname, '..', '..', 'data');
const readJson = (file: string): unknown => JSON.parse(readFileSync(join(dataDir, file), 'utf8'));
const sources = sourcesFileSchema.parse(readJson('sources.json')).sources;

/** The fields that make a record unique in each table. */
const keyOf: Record<TableName, (r: any) => string> = {
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
  'heat-capacities.json': (r) => `${r.formula}|${r.phase}`,
  'ionization-energies.json': (r) => `${r.element}|${r.stage}`,
  'electron-affinities.json': (r) => r.element,
  'atomization-enthalpies.json': (r) => r.element,
  'bond-dissociation.json': (r) => r.molecule,
  'madelung-constants.json': (r) => r.structure,
  'born-exponents.json': (r) => r.core,
  'volume-coefficients.json': (r) => r.chargeType,
  'hazards.json': (r) => r.subject,
};

const present = new Set(readdirSync(dataDir));

describe('data tables', () => {
  it('holds only known tables and sources.json', () => {
    const unknown = [...present].filter((f) => f !== 'sources.json' && !(f in tableSchemas));
    expect(unknown).toEqual([]);
  });

  for (const name of Object.keys(tableSchemas) as TableName[]) {
    describe(name, () => {
      it.runIf(present.has(name))('passes its schema, cites known sources, has unique keys', () => {
        const parsed = tableSchemas[name].safeParse(readJson(name));
        if (!parsed.success) throw new Error(`${name}: ${parsed.error.issues.slice(0, 5).map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
        const records = parsed.data.records as any[];
        expect(records.length).toBeGreaterThan(0);
        const unknownSources = records.filter((r) => !(r.source in sources)).map((r) => keyOf[name](r));
        expect(unknownSources, 'records citing a key missing from sources.json').toEqual([]);
        const seen = new Set<string>();
        const duplicates = records.map(keyOf[name]).filter((k) => (seen.has(k) ? true : (seen.add(k), false)));
        expect(duplicates, 'duplicated keys').toEqual([]);
      });
    });
  }
});
