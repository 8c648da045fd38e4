/**
 * Builds the workbench page into dist/workbench/ (run by `npm run build`
 * after tsup): the page script and its worker bundled by esbuild for the
 * browser (a Node built-in reached from either is an error), the HTML, and
 * the style sheet with the chart palette as custom properties, so that the
 * page and the charts use the same colours.
 *
 * @module
 */
import { build } from 'esbuild';
import { copyFileSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import type { Plugin } from 'esbuild';
import { fontStack, palette } from '../../render/palette.js';

const root = join(import.meta.dirname, '..', '..', '..');
const source = join(root, 'src', 'workbench');
const out = join(root, 'dist', 'workbench');
mkdirSync(out, { recursive: true });

/**
 * zod re-exports its messages in some forty languages as `z.locales`, which a bundler cannot leave out (a namespace
 * export); the library speaks English and sets English messages itself. Only English goes into the page: about 40 KB
 * gzipped of the 300 KB budget.
 */
const englishZodOnly: Plugin = {
  name: 'english-zod-messages-only',
  setup(b) {
    b.onResolve({ filter: /locales\/index\.js$/ }, (args) => (args.importer.includes(`${join('node_modules', 'zod')}`) ? { path: 'zod-locales', namespace: 'zod-english', pluginData: join(args.resolveDir, dirname(args.path)) } : undefined));
    b.onLoad({ filter: /.*/, namespace: 'zod-english' }, (args) => ({ contents: "export { default as en } from './en.js';", resolveDir: args.pluginData as string }));
  },
};

const result = await build({
  entryPoints: { page: join(source, 'page.ts'), worker: join(source, 'worker.ts') },
  outdir: out,
  bundle: true,
  format: 'esm',
  platform: 'browser',
  target: 'es2022',
  minify: true,
  legalComments: 'none',
  logLevel: 'warning',
  metafile: true,
  plugins: [englishZodOnly],
});
if (result.errors.length > 0) process.exit(1);

const variables = Object.entries(palette).map(([name, colour]) => `--${name}:${colour}`);
writeFileSync(join(out, 'style.css'), `:root{${variables.join(';')};--font:${fontStack}}\n${readFileSync(join(source, 'style.css'), 'utf8')}`);
copyFileSync(join(source, 'index.html'), join(out, 'index.html'));
