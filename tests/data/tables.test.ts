// Every table under data/ passes its zod schema, names a known source on every
// record, and holds no duplicated key. These checks guard the provenance rule:
// no number enters the dataset without a citation.
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { sourcesFileSchema, tableSchemas, type TableName } from '../../src/data/schemas.js';
import { tableKeys } from '../../src/data/tableKeys.js';

const keyOf = tableKeys as Record<TableName, (r: unknown) => string>;

const dataDir = join(import.meta.dirname, '..', '..', 'data');
const readJson = (file: string): unknown => JSON.parse(readFileSync(join(dataDir, file), 'utf8'));
const sources = sourcesFileSchema.parse(readJson('sources.json')).sources;


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
