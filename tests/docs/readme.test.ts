// Runs the README, so that what it shows cannot drift from what ionheat does.
// - Each ```console block: a line `$ ionheat …` is a command (run in-process
//   through runCli, from the repository's root); the lines after it, up to
//   the next command, must appear in its output in that order (a line `…`
//   stands for lines left out). A command whose shown output is only
//   `ionheat: …` lines must exit with status 2, any other with 0.
// - Each ```js block runs with the names it imports from 'ionheat' in scope;
//   its lines `expression; // expected` assert, as in the TSDoc examples
//   (tests/docs/exampleAssertions.ts). Names imported from 'ionheat/node'
//   (loadDataset, reading docs/examples/my-values.json) come from that entry.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as ionheat from '../../src/index.js';
import * as ionheatNode from '../../src/node/index.js';
import { runCli } from '../../src/node/cli/main.js';
import { assertion, check } from './exampleAssertions.js';

const root = join(import.meta.dirname, '..', '..');
const readme = readFileSync(join(root, 'README.md'), 'utf8');

/** Splits a command line as a POSIX shell would for plain words and quoted strings (no variables, no escapes). */
function words(line: string): string[] {
  const out: string[] = [];
  let current = '';
  let quote: string | undefined;
  let inWord = false;
  for (const c of line) {
    if (quote) {
      if (c === quote) quote = undefined;
      else current += c;
    } else if (c === '"' || c === "'") {
      quote = c;
      inWord = true;
    } else if (c === ' ') {
      if (inWord) out.push(current);
      current = '';
      inWord = false;
    } else {
      current += c;
      inWord = true;
    }
  }
  if (quote) throw new Error(`unclosed quote in: ${line}`);
  if (inWord) out.push(current);
  return out;
}

interface Session {
  command: string;
  shown: string[];
}

function sessions(): Session[] {
  const blocks = [...readme.matchAll(/```console\n([\s\S]*?)```/g)].map((m) => m[1]!.replace(/\n$/, '').split('\n'));
  const found: Session[] = [];
  for (const lines of blocks) {
    for (const line of lines) {
      if (line.startsWith('$ ')) found.push({ command: line.slice(2), shown: [] });
      else found[found.length - 1]!.shown.push(line);
    }
  }
  return found;
}

async function run(argv: string[]): Promise<{ status: number; lines: string[] }> {
  let text = '';
  const io = {
    stdout: (t: string) => void (text += t),
    stderr: (t: string) => void (text += t),
    stderrIsTTY: false,
    cwd: root,
    readStdin: async () => '',
  };
  const status = await runCli(argv, io);
  return { status, lines: text.split('\n').map((l) => l.trimEnd()) };
}

describe('README.md, the command-line tour', () => {
  const all = sessions();
  it('shows the commands the issue asks for', () => {
    const commands = all.map((s) => s.command);
    expect(commands).toEqual(expect.arrayContaining(['ionheat dissolve NH4NO3', 'ionheat dissolve RbSCN', 'ionheat dissolve CaCl']));
    expect(commands.some((c) => c.includes('CaCl2'))).toBe(true);
  });
  for (const session of all) {
    it(session.command, async () => {
      const argv = words(session.command);
      expect(argv[0]).toBe('ionheat');
      const { status, lines } = await run(argv.slice(1));
      // Each shown line appears in the output, in order.
      let at = 0;
      for (const shown of session.shown) {
        if (shown.trim() === '…') continue;
        const want = shown.trimEnd();
        const found = lines.indexOf(want, at);
        expect(found, `"${want}" is not in the output of ${session.command} (after line ${at}):\n${lines.join('\n')}`).toBeGreaterThanOrEqual(0);
        at = found + 1;
      }
      const errorsOnly = session.shown.filter((l) => l.trim() !== '…').every((l) => l.startsWith('ionheat: '));
      expect(status, `exit status of ${session.command}`).toBe(errorsOnly ? 2 : 0);
    });
  }
});

describe('README.md, the library examples', () => {
  const blocks = [...readme.matchAll(/```js\n([\s\S]*?)```/g)].map((m) => m[1]!);
  it('has examples, one of them reading a file of your own', () => {
    expect(blocks.length).toBeGreaterThanOrEqual(2);
    expect(blocks.some((b) => b.includes("loadDataset(['docs/examples/my-values.json'])"))).toBe(true);
  });
  it('shows the worked override file exactly as it is in docs/examples', () => {
    const shown = /```json\n(\{\n  "description": "The supplier's own calorimetry[\s\S]*?)```/.exec(readme)?.[1];
    expect(shown).toBe(readFileSync(join(root, 'docs/examples/my-values.json'), 'utf8'));
  });
  blocks.forEach((block, index) => {
      it(`block ${index + 1} runs and its values are right`, async () => {
        const names: string[] = [];
        let asserted = 0;
        const body = block
          .split('\n')
          .map((line, n) => {
            const imported = /^import \{([^}]+)\} from 'ionheat(\/node)?';$/.exec(line);
            if (imported) {
              names.push(...imported[1]!.split(',').map((s) => s.trim()));
              return '';
            }
            expect(line, 'only the core entry is imported').not.toMatch(/^import /);
            const a = assertion(line);
            if (!a) return line;
            asserted++;
            return `__check(${a.expr}, ${JSON.stringify(a.expected)}, ${JSON.stringify(`README js block ${index + 1} +${n}`)});`;
          })
          .join('\n');
        const core = { ...(ionheat as Record<string, unknown>), ...(ionheatNode as Record<string, unknown>) };
        for (const n of names) expect(core[n], `ionheat exports ${n}`).toBeDefined();
        const fn = new Function('__check', ...names, `return (async () => {\n${body}\n})();`);
        await fn(check, ...names.map((n) => core[n]));
        expect(asserted, `README js block ${index + 1} asserts nothing`).toBeGreaterThan(0);
      });
    });
});
