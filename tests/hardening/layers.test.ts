// The layer order of DEVELOPERS.md ("Layout and the flow of one question"), read from that file and held against
// every relative import of src/: a module imports only from its own folder, the folders above it in the list, and
// the shared ones the text names.
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const src = join(root, 'src');
const developers = readFileSync(join(root, 'DEVELOPERS.md'), 'utf8');

/** The folders of the layout block, top to bottom. */
function layerOrder(): string[] {
  const section = developers.slice(developers.indexOf('## Layout and the flow of one question'));
  const block = section.slice(section.indexOf('```') + 3, section.indexOf('```', section.indexOf('```') + 3));
  // Each line names its folder in the second column: `data/ tables ──► data/   zod schemas…`.
  return [...block.matchAll(/^(?:.*──► |\s+)([a-z]+)\/\s/gm)].map((m) => m[1]!);
}

/** The folders (and root files) any module may import, from the sentence after the block. */
function sharedNames(): string[] {
  const sentence = /A module imports only from modules above it in this list \(and ([^)]*)\)/.exec(developers);
  if (!sentence) throw new Error('DEVELOPERS.md no longer states the import rule');
  return [...sentence[1]!.matchAll(/`([^`]+)`/g)].map((m) => m[1]!.replace(/\/$/, ''));
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? sourceFiles(join(dir, e.name)) : e.name.endsWith('.ts') ? [join(dir, e.name)] : []));
}

const topOf = (file: string): string => relative(src, file).split(sep)[0]!.replace(/\.js$/, '.ts');

describe('layers', () => {
  const order = layerOrder();
  const shared = new Set(sharedNames());

  it('the layout block lists every folder of src/ once', () => {
    const folders = readdirSync(src, { withFileTypes: true }).filter((e) => e.isDirectory()).map((e) => e.name);
    expect([...order].sort()).toEqual([...folders].sort());
    expect(shared).toContain('error.ts');
  });

  it('no module imports from a layer below its own', () => {
    const wrong: string[] = [];
    for (const file of sourceFiles(src)) {
      const from = topOf(file);
      const rank = order.indexOf(from);
      if (rank < 0) continue; // index.ts, cli.ts, error.ts: the entries and the error type
      for (const m of readFileSync(file, 'utf8').matchAll(/(?:^|\n)\s*(?:import|export)\b[^'"]*?from\s+'(\.[^']+)'/g)) {
        const path = resolve(dirname(file), m[1]!);
        if (relative(src, path).startsWith('..')) continue; // the data tables, bundled by data/builtin.ts
        const target = topOf(path);
        if (target === from || shared.has(target)) continue;
        const targetRank = order.indexOf(target);
        if (targetRank < 0 || targetRank > rank) wrong.push(`${relative(root, file)} imports ${m[1]} (${target}/ is not above ${from}/)`);
      }
    }
    expect(wrong).toEqual([]);
  });
});
