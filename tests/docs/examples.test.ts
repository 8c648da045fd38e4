// Runs every @example in the TSDoc of src/ so that the documentation cannot
// drift from the code. Conventions (DEVELOPERS.md, "Documentation that runs"):
// - an example is one ```ts block using names exported by src/index.ts (all
//   of them are in scope; in src/node/ the names of src/node/index.ts too)
//   or by its own module, in plain JavaScript (no type annotations); it runs
//   inside an async function, so `await` and `await import('node:fs')` may
//   be used;
// - a line `expression; // expected` asserts: `expected` starts with a
//   literal (number, 'string', true/false/undefined, [...] or {...});
//   a number matches to the precision written (3.874 means ±0.0005),
//   `≈ 753` means within 1 %; text after the literal is ignored;
// - every example asserts at least one line (tests/docs/apiDocs.test.ts
//   requires one on every exported function).
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { assertion, check } from './exampleAssertions.js';
import * as ionheat from '../../src/index.js';
import * as ionheatNode from '../../src/node/index.js';

const srcDir = join(import.meta.dirname, '..', '..', 'src');
const nodeDir = join(srcDir, 'node');

// Scripts and the CLI's bin file run when imported, so they hold no examples.
const notLibrary = new Set([join(nodeDir, 'scripts'), join(srcDir, 'cli.ts')]);

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (notLibrary.has(path)) return [];
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return name.endsWith('.ts') ? [path] : [];
  });
}

interface Example {
  file: string;
  line: number;
  code: string[];
}

function examplesOf(file: string): Example[] {
  const lines = readFileSync(file, 'utf8').split('\n');
  const found: Example[] = [];
  for (let i = 0; i < lines.length; i++) {
    if (!/^\s*\*\s*@example/.test(lines[i]!)) continue;
    let j = i + 1;
    while (j < lines.length && !/^\s*\*\s*```/.test(lines[j]!)) j++;
    const start = j + 1;
    let k = start;
    while (k < lines.length && !/^\s*\*\s*```/.test(lines[k]!)) k++;
    found.push({ file, line: start + 1, code: lines.slice(start, k).map((l) => l.replace(/^\s*\* ?/, '')) });
    i = k;
  }
  return found;
}

const examples = sourceFiles(srcDir).flatMap(examplesOf);

describe('worked examples in the TSDoc', () => {
  it('exist', () => expect(examples.length).toBeGreaterThan(10));
  for (const example of examples) {
    const where = `${relative(srcDir, example.file)}:${example.line}`;
    it(where, async () => {
      let asserted = 0;
      const body = example.code
        .map((line, n) => {
          const a = assertion(line);
          if (!a) return line;
          asserted++;
          return `__check(${a.expr}, ${JSON.stringify(a.expected)}, ${JSON.stringify(`${where} +${n}`)});`;
        })
        .join('\n');
      // The module's own exports are in scope too, so internal helpers can carry examples.
      const own = (await import(example.file)) as Record<string, unknown>;
      const entry = example.file.startsWith(nodeDir) ? { ...(ionheat as Record<string, unknown>), ...(ionheatNode as Record<string, unknown>) } : (ionheat as Record<string, unknown>);
      const scope: Record<string, unknown> = { ...own, ...entry };
      const names = Object.keys(scope);
      // Code built by `new Function` cannot use import() itself; hand it this module's.
      const code = body.replace(/\bimport\(/g, '__import(');
      const run = new Function('__check', '__import', ...names, `return (async () => {\n${code}\n})();`);
      await run(check, (specifier: string) => import(specifier), ...names.map((n) => scope[n]));
      expect(asserted, `${where} asserts nothing`).toBeGreaterThan(0);
    });
  }
});
