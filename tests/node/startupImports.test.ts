// Start-up (issue 17, item 5): a command over the built-in tables loads only its own modules, and not zod, in the
// ESM and the CommonJS build alike. The test follows the static imports (and requires) of dist/cli.* and of the
// chunk of the dissolve command, the modules a `ionheat dissolve NaCl` run loads before it answers.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';

const dist = join(import.meta.dirname, '..', '..', 'dist');

/** Every file reached from `entries` by static imports and requires, and the packages they name. */
function staticGraph(entries: readonly string[]): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const visit = (file: string): void => {
    if (files.has(file)) return;
    files.add(file);
    const text = readFileSync(file, 'utf8');
    const specifiers = [
      ...[...text.matchAll(/(?:^|[\n;])\s*(?:import|export)\s*(?:[^'";]*?\sfrom\s*)?["']([^"']+)["']/g)].map((m) => m[1]!),
      ...[...text.matchAll(/(?<![.\w])require\(["']([^"']+)["']\)/g)].map((m) => m[1]!),
    ];
    for (const s of specifiers) {
      if (s.startsWith('.')) visit(join(dirname(file), s));
      else packages.add(s.replace(/^((?:@[^/]+\/)?[^/]+).*$/, '$1'));
    }
  };
  for (const e of entries) visit(e);
  return { files, packages };
}

describe('the start-up path of a command', () => {
  for (const ext of ['js', 'cjs']) {
    it(`loads neither zod nor the other commands (${ext === 'js' ? 'ESM' : 'CommonJS'} build)`, () => {
      expect(existsSync(join(dist, `cli.${ext}`)), 'dist/ is built by npm test').toBe(true);
      const dissolveChunk = readdirSync(dist).find((f) => f.startsWith('dissolveCommand-') && f.endsWith(`.${ext}`));
      expect(dissolveChunk, 'the dissolve command is a chunk of its own, loaded when it runs').toBeDefined();
      const { files, packages } = staticGraph([join(dist, `cli.${ext}`), join(dist, dissolveChunk!)]);
      expect([...packages].filter((p) => p === 'zod')).toEqual([]);
      const commands = [...files].map((f) => f.slice(dist.length + 1)).filter((f) => /Command-/.test(f));
      expect(commands).toEqual([dissolveChunk]);
    });
  }

  it('the user-table check, which needs zod, is reached from the reading of --data files', () => {
    const loadChunk = readdirSync(dist).find((f) => f.startsWith('loadDataset-') && f.endsWith('.js'));
    expect(loadChunk).toBeDefined();
    expect(staticGraph([join(dist, loadChunk!)]).packages.has('zod')).toBe(true);
  });
});
