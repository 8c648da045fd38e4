import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../../src/node/cli/main.js';
import type { CliIO } from '../../../src/node/cli/io.js';
import { demoCandidatesCsv, demoParts, runDemoPart } from '../../../src/node/cli/demoCommand.js';

const examples = join(import.meta.dirname, '..', '..', '..', 'docs', 'examples');

describe('ionheat demo', () => {
  it('prints both ranked tables and writes the charts, tables and candidate lists', async () => {
    const out = mkdtempSync(join(tmpdir(), 'ionheat-demo-test-'));
    let text = '';
    const io: CliIO = { stdout: (t) => void (text += t), stderr: () => {}, stderrIsTTY: false, readStdin: async () => '', cwd: out };
    expect(await runCli(['demo', '--out', out], io)).toBe(0);
    expect(text).toMatch(/Single-use cold pack without ammonium nitrate/);
    expect(text).toMatch(/Hand warmer that stays under the contact-burn threshold/);
    expect(text).toMatch(/invented for the demo/);
    expect(text).toMatch(/ruled out: NH4NO3 is on the list of salts to leave out/);
    expect(text).toMatch(/Caution — Cold injury/);
    for (const name of ['cold-pack.svg', 'hand-warmer.svg', 'cold-pack-candidates.csv', 'hand-warmer-candidates.csv', 'results.md']) {
      expect(existsSync(join(out, name)), name).toBe(true);
    }
  });

  it('runs the scenario in docs/examples: the candidate lists there are the demo’s own', () => {
    for (const part of demoParts) {
      expect(readFileSync(join(examples, `${part.name}-candidates.csv`), 'utf8'), part.name).toBe(demoCandidatesCsv(part));
    }
  });

  it('labels every invented number: every price and the one measurement cite the demo', () => {
    for (const part of demoParts) {
      for (const c of part.candidates) {
        if (c.pricePerKg !== undefined) expect(c.note, c.formula).toMatch(/invented for the demo/);
        if (c.measuredEnthalpy !== undefined) expect(c.source).toBe('inventedDemo');
      }
    }
  });

  it('finds cold packs without ammonium nitrate that meet the target, and hand warmers under the burn threshold', () => {
    const [cold, warm] = demoParts.map((p) => runDemoPart(p).result);
    const passing = (rows: NonNullable<typeof cold>['rows']) => rows.filter((r) => r.spec?.holds).map((r) => r.formula);
    expect(passing(cold!.rows).length).toBeGreaterThan(0);
    expect(passing(cold!.rows)).not.toContain('NH4NO3');
    expect(cold!.rows.find((r) => r.input.formula === 'NH4NO3')!.status).toBe('excluded');
    for (const r of warm!.rows.filter((x) => x.spec?.holds)) expect(r.fill!.finalTemperature.high).toBeLessThan(44);
  });
});
