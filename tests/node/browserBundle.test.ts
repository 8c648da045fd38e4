// The core entry must run in a browser or a notebook: bundle src/index.ts for
// the browser platform and fail on any import of a Node built-in.
import { builtinModules } from 'node:module';
import { join } from 'node:path';
import { build } from 'esbuild';
import { describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '..', '..');

describe('the core entry in a browser', () => {
  it('bundles for the browser platform without any Node built-in', async () => {
    const builtins = new Set([...builtinModules, ...builtinModules.map((m) => `node:${m}`)]);
    const reached: string[] = [];
    const result = await build({
      entryPoints: [join(root, 'src', 'index.ts')],
      bundle: true,
      platform: 'browser',
      format: 'esm',
      write: false,
      logLevel: 'silent',
      metafile: true,
      plugins: [
        {
          name: 'refuse-node-builtins',
          setup(b) {
            b.onResolve({ filter: /.*/ }, (args) => {
              if (builtins.has(args.path) || args.path.startsWith('node:')) {
                reached.push(`${args.path} (imported by ${args.importer.replace(root, '.')})`);
                return { path: args.path, external: true };
              }
              return undefined;
            });
          },
        },
      ],
    });
    expect(reached, `Node built-ins reached from src/index.ts:\n${reached.join('\n')}`).toEqual([]);
    expect(result.errors).toEqual([]);
    const output = result.outputFiles[0]!.text;
    expect(output.length).toBeGreaterThan(10_000);
    // The screen and its chart are part of the browser bundle.
    expect(Object.keys(result.metafile.inputs).some((f) => f.endsWith('src/screen/screen.ts'))).toBe(true);
    expect(Object.keys(result.metafile.inputs).some((f) => f.endsWith('src/render/intervalChart.ts'))).toBe(true);
  });
});
