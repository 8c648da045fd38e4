/**
 * The bundle section of `npm run bench`: a browser bundle of `dissolve` alone
 * from the public entry (esbuild: platform browser, tree-shaken, minified),
 * its size and its gzipped size against the target, and the largest inputs
 * by their share of the minified output. Target: ≤ 150 KB gzipped.
 */
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

export const BUNDLE_GZIP_TARGET_KB = 150;

const root = fileURLToPath(new URL('../../../', import.meta.url));
const kb = (bytes: number): string => `${(bytes / 1024).toFixed(0)} KB`;

/** Runs the section and returns its report lines. */
export async function benchBundle(): Promise<string[]> {
  const result = await build({
    stdin: { contents: "export { dissolve, parseSalt } from './src/index.ts';", resolveDir: root, loader: 'ts' },
    bundle: true,
    platform: 'browser',
    format: 'esm',
    minify: true,
    treeShaking: true,
    write: false,
    metafile: true,
    logLevel: 'silent',
  });
  const code = result.outputFiles[0]!.contents;
  const gzip = gzipSync(code, { level: 9 }).length;
  const output = Object.values(result.metafile.outputs)[0]!;
  const byPackage = new Map<string, number>();
  for (const [file, { bytesInOutput }] of Object.entries(output.inputs)) {
    const key = file.includes('node_modules/') ? file.replace(/^.*node_modules\/((?:@[^/]+\/)?[^/]+).*$/, '$1') : file.startsWith('src/data/') && file.endsWith('.generated.ts') ? file : file.replace(/\/[^/]+$/, '/');
    byPackage.set(key, (byPackage.get(key) ?? 0) + bytesInOutput);
  }
  const top = [...byPackage].sort((a, b) => b[1] - a[1]).slice(0, 6);
  return [
    `browser bundle of dissolve and parseSalt from src/index.ts (esbuild, minified): ${kb(code.length)}, ${kb(gzip)} gzipped — ${(gzip / 1024 / BUNDLE_GZIP_TARGET_KB).toFixed(2)} × the target of ${BUNDLE_GZIP_TARGET_KB} KB gzipped`,
    `  largest parts (minified): ${top.map(([k, n]) => `${k} ${kb(n)}`).join(', ')}`,
  ];
}
