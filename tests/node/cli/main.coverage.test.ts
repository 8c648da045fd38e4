// The dispatcher of the command line (src/node/cli/main.ts) in-process:
// help topics, --version, --help on a command, --data in both spellings,
// and the exit statuses of README.md and the usage text (0 success, 2 bad
// input or arguments).
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { commands } from '../../../src/node/cli/main.js';
import packageJson from '../../../package.json';
import { runCliInMemory } from '../runCliInMemory.js';

const run = (args: string[], cwd = process.cwd()) => runCliInMemory(args, { cwd });

describe('runCli dispatch', () => {
  it('prints the version of the package', async () => {
    const r = await run(['--version']);
    expect(r.status).toBe(0);
    expect(r.out).toBe(`${packageJson.version}\n`);
  });

  it('with no arguments prints the overview and exits 2 (nothing was asked)', async () => {
    const r = await run([]);
    expect(r.status).toBe(2);
    for (const c of commands) expect(r.out).toContain(`  ${c.name}`);
    expect(r.out).toContain('defer to local codes, product-safety regulation and licensed practice');
  });

  it('help <command> and <command> --help print that command\'s usage', async () => {
    const topic = await run(['help', 'dissolve']);
    expect(topic.status).toBe(0);
    expect(topic.out).toContain('ionheat dissolve <formula>');
    const flag = await run(['pack', '--help']);
    expect(flag.status).toBe(0);
    expect(flag.out).toContain('ionheat pack');
    const short = await run(['lattice', '-h']);
    expect(short.status).toBe(0);
    expect(short.out).toContain('ionheat lattice');
  });

  it('help on a command that does not exist names it and exits 2', async () => {
    const r = await run(['help', 'melt']);
    expect(r.status).toBe(2);
    expect(r.err).toBe('ionheat: no command "melt"; try: ionheat help\n');
  });

  it('--data without a file name is a usage error', async () => {
    const r = await run(['dissolve', 'KNO3', '--data']);
    expect(r.status).toBe(2);
    expect(r.err).toBe('ionheat: --data needs a file name\n');
    expect((await run(['dissolve', 'KNO3', '--data', '--json'])).err).toBe('ionheat: --data needs a file name\n');
  });

  it('--data=<file> merges the file like --data <file>, relative to the working directory', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ionheat-main-'));
    // An invented value, so that the merged record is recognisable.
    writeFileSync(
      join(dir, 'mine.json'),
      JSON.stringify({
        sources: { myLab: { citation: 'Invented for this test', kind: 'derived' } },
        tables: { 'solution-enthalpies': [{ formula: 'KNO3', value: 30.5, unit: 'kJ/mol', uncertainty: 0.5, source: 'myLab', fromMemory: false }] },
      }),
    );
    const r = await run(['dissolve', 'KNO3', '--json', '--data=mine.json'], dir);
    expect(r.status).toBe(0);
    expect(JSON.parse(r.out).best.value).toBe(30.5);
    const absolute = await run(['dissolve', 'KNO3', '--json', '--data', join(dir, 'mine.json')], '/');
    expect(JSON.parse(absolute.out).best.value).toBe(30.5);
    // Without the file, the built-in CRC value (34.89 kJ/mol, crcSolution).
    expect(JSON.parse((await run(['dissolve', 'KNO3', '--json'])).out).best.value).toBe(34.89);
  });
});
