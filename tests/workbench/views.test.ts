// The panels of the workbench computed in Node, as its worker computes them in the browser: every number a panel
// shows equals the library's own result for the same input, and the screen's downloads are the command line's,
// byte for byte. (tests/workbench/browser.test.ts checks the page itself in Chromium.)
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { builtinDataset, dissolve, integralEnthalpyOfSolution, latentWarmer } from '../../src/index.js';
import { saltView } from '../../src/workbench/saltView.js';
import { packResults, packView } from '../../src/workbench/packView.js';
import { warmerView } from '../../src/workbench/warmerView.js';
import { screenOutcome } from '../../src/workbench/screenView.js';
import type { PanelView, ShownNumber } from '../../src/workbench/view.js';
import { runCliInMemory } from '../node/runCliInMemory.js';
import { mismatches } from './shownNumbers.js';

const dataset = builtinDataset();

/** Every number of a view, from its quantities and tables. */
function numbersOf(view: PanelView): ShownNumber[] {
  const fromQuantities = view.quantities.flatMap((q) => [q.value, q.u, q.low, q.high].filter((n): n is ShownNumber => n !== undefined));
  const fromTables = view.tables.flatMap((t) => t.rows.flat().filter((c): c is ShownNumber => typeof c !== 'string'));
  return [...fromQuantities, ...fromTables];
}

describe('the workbench panels, computed in Node', () => {
  it('Salt: every number of KNO3 at 25 °C and 1 mol/kg is the library’s dissolve and integral enthalpy', () => {
    const view = saltView({ formula: 'KNO3', temperatureC: 25, molality: 1 }, dataset);
    const r = dissolve('KNO3', { temperatureC: 25 }, dataset);
    const integral = integralEnthalpyOfSolution(r.salt, 1, 25, dataset);
    const numbers = numbersOf(view);
    expect(numbers.length).toBeGreaterThan(20);
    expect(mismatches(numbers, { ...r, integral })).toEqual([]);
    // KNO3 dissolves endothermically (Parker 1965, NSRDS-NBS 2: ΔsolH° = +34.89 kJ/mol): the verdict says it cools.
    expect(view.lines.some((l) => l.startsWith('Verdict: endothermic'))).toBe(true);
    expect(view.cautions).toEqual(r.cautions);
    expect(view.charts[0]!.svg).toContain('<svg');
  });

  it('Salt: a formula that reads only through a slip is named first, with the salt probably meant', () => {
    // A user's measured value for KN3 (a test value, not data) makes both readings of KN03 measured salts: computed, warned.
    const withAzide = dataset.withOverrides({ 'solution-enthalpies.json': [{ formula: 'KN3', value: 20, unit: 'kJ/mol', uncertainty: 1, source: 'test', fromMemory: false }] }, 'test', { test: { citation: 'invented for this test', kind: 'inHouse' } } as never);
    const view = saltView({ formula: 'KN03' }, withAzide);
    expect(view.cautions[0]!.severity).toBe('warning');
    expect(view.cautions[0]!.text).toMatch(/^Suspected typo: .*KNO₃ is one slip away/);
    expect(view.notes.some((n) => n.includes('one slip away'))).toBe(false);
  });

  it('Salt: an exothermic salt says it heats', () => {
    const view = saltView({ formula: 'CaCl2' }, dataset);
    expect(view.lines.some((l) => l.startsWith('Verdict: exothermic'))).toBe(true);
    expect(view.quantities.find((q) => q.label.startsWith('Heat released per gram'))).toBeDefined();
  });

  it('Pack: every number of 30 g NH4NO3 in 100 g water with a 5 °C target is the library’s', () => {
    const request = { fill: { solids: [{ formula: 'NH4NO3', massG: 30 }], waterG: 100, startC: 20 }, targetC: 5 };
    const view = packView(request, dataset);
    expect(mismatches(numbersOf(view), packResults(request, dataset))).toEqual([]);
    expect(view.cautions.length).toBeGreaterThan(0);
    expect(view.charts.map((c) => c.svg.slice(0, 4))).toEqual(['<svg', '<svg']);
  });

  it('Warmer: every number of 100 g sodium acetate trihydrate is the library’s', () => {
    const fill = { salt: 'NaCH3COO·3H2O', massG: 100 };
    const view = warmerView(fill, dataset);
    expect(mismatches(numbersOf(view), latentWarmer(fill, {}, dataset))).toEqual([]);
    expect(view.cautions.some((c) => c.severity === 'danger' && c.text.includes('burn'))).toBe(true);
  });

  describe('Screen', () => {
    const dir = mkdtempSync(join(tmpdir(), 'ionheat-workbench-'));
    afterAll(() => rmSync(dir, { recursive: true, force: true }));
    const csv = 'formula,pricePerKg\nKNO3,0.9\nQq2,1\n\nNH4Cl,0.5,extra\nurea,0.4\n"CaCl2,0.3\n';
    writeFileSync(join(dir, 'candidates.csv'), csv);

    for (const [name, options] of [
      ['enthalpy', {}],
      ['a fill and a spec', { fill: '40:80@22', spec: 'best.low > 0' }],
      ['cost per kJ, heating', { objective: 'cost-per-kj', direction: 'heat' }],
    ] as const) {
      it(`CSV and JSON downloads are the command line's, byte for byte (${name}), bad rows kept`, async () => {
        const o = await screenOutcome({ source: { kind: 'text', text: csv, name: 'candidates.csv' }, ...options }, dataset);
        const flags = [...('objective' in options ? ['--objective', options.objective] : []), ...('direction' in options ? ['--direction', options.direction] : []), ...('fill' in options ? ['--fill', options.fill] : []), ...('spec' in options ? ['--spec', options.spec] : [])];
        const cliCsv = await runCliInMemory(['screen', 'candidates.csv', '--format', 'csv', ...flags], { cwd: dir });
        const cliJson = await runCliInMemory(['screen', 'candidates.csv', '--json', ...flags], { cwd: dir });
        expect(o.csv).toBe(cliCsv.out);
        expect(o.json).toBe(cliJson.out);
        // Five rows: the unknown formula, the row with a field too many and the unclosed quote fail; the others computed.
        expect(o.summary.read).toBe(5);
        expect(o.summary.failed).toBe(3);
        expect(o.view.tables[0]!.rows).toHaveLength(5);
      });
    }

    it('a JSON candidate list, with a row that is neither a formula nor an object, as the command line reads it', async () => {
      const list = '[\n  "KNO3",\n  {"formula": "NaCl", "note": "table salt"},\n  5\n]\n';
      writeFileSync(join(dir, 'list.json'), list);
      const o = await screenOutcome({ source: { kind: 'text', text: list, name: 'list.json' } }, dataset);
      expect(o.json).toBe((await runCliInMemory(['screen', 'list.json', '--json'], { cwd: dir })).out);
      expect(o.csv).toBe((await runCliInMemory(['screen', 'list.json', '--format', 'csv'], { cwd: dir })).out);
      expect(o.summary.failed).toBe(1);
    });

    it('every built-in salt, enumerated, as the command line enumerates them', async () => {
      const ticks: number[] = [];
      const o = await screenOutcome({ source: { kind: 'enumerate' } }, dataset, (done) => ticks.push(done));
      const cli = await runCliInMemory(['screen', '--enumerate', '--format', 'csv'], { cwd: dir });
      expect(o.csv).toBe(cli.out);
      expect(ticks.length).toBeGreaterThan(3);
      expect(o.view.charts).toHaveLength(1);
    });

    it('refuses cost per kJ for the enumerated salts, which have no prices', async () => {
      await expect(screenOutcome({ source: { kind: 'enumerate' }, objective: 'cost-per-kj' }, dataset)).rejects.toThrow(/pricePerKg/);
    });
  });
});
