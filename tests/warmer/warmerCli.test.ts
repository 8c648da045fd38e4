// `ionheat warmer`: the JSON contract outside scripts rely on (issue 16), the errors, the chart, and the pointer
// from `ionheat pack` to it.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cautionSchema } from '../../src/index.js';
import { runCliInMemory } from '../node/runCliInMemory.js';

const run = (args: string[], cwd = process.cwd()) => runCliInMemory(args, { cwd });

describe('warmer --json contract', () => {
  it('prints one object with plateau, crystallisedAtPlateau, heatReleased and plateauDuration as estimates, and cautions', async () => {
    const { status, out, err } = await run(['warmer', '--salt', 'NaCH3COO·3H2O', '--mass', '100', '--start', '20', '--json']);
    expect(status).toBe(0);
    expect(err).toBe('');
    const j = JSON.parse(out);
    const units = { plateau: '°C', crystallisedAtPlateau: '1', heatReleased: 'kJ', plateauDuration: 's' } as const;
    for (const [key, unit] of Object.entries(units)) {
      expect(Object.keys(j[key])).toEqual(expect.arrayContaining(['value', 'low', 'high', 'unit']));
      expect(j[key].unit).toBe(unit);
      expect(j[key].low).toBeLessThan(j[key].value);
      expect(j[key].high).toBeGreaterThan(j[key].value);
    }
    // Lane 1983 (from memory): 58 °C; the hand calculation of latentWarmer.test.ts: 3.0 × 38 / 264 crystallises at once
    expect(j.plateau.value).toBe(58);
    expect(j.crystallisedAtPlateau.value).toBeCloseTo(0.432, 3);
    expect(j.crystallisedAtPlateau.low).toBeGreaterThanOrEqual(0);
    expect(j.crystallisedAtPlateau.high).toBeLessThanOrEqual(1);
    expect(j.heatReleased.value).toBeCloseTo(22.2, 1);
    expect(Array.isArray(j.cautions) && j.cautions.every((c: unknown) => cautionSchema.safeParse(c).success)).toBe(true);
    expect(j.cautions[0].text).toMatch(/^Contact-burn risk/);
    expect(j.cautions.at(-1).text).toContain('licensed practice');
  });
  it('takes --extra-water, --container, --ambient and --g-ambient, and marks the air as given, not assumed', async () => {
    const { status, out } = await run(['warmer', '--salt', 'NaCH3COO.3H2O', '--mass', '100', '--extra-water', '10', '--container', '15', '--ambient', '5', '--g-ambient', '0.3', '--json']);
    expect(status).toBe(0);
    const j = JSON.parse(out);
    expect(j.fill).toMatchObject({ formula: 'NaCH3COO·3H2O', massG: 100, extraWaterG: 10, containerJPerK: 15 });
    expect(j.parameters.ambientC).toEqual({ value: 5, unit: '°C', assumed: false });
    expect(j.parameters.skinC.assumed).toBe(true);
    expect(j.plateau.value).toBeLessThan(58);
  });
  it('a negative start temperature is read as a number', async () => {
    const { status, out } = await run(['warmer', '--salt', 'CaCl2·6H2O', '--mass', '50', '--start', '-5', '--json']);
    expect(status).toBe(0);
    expect(JSON.parse(out).fill.startC).toBe(-5);
  });
});

describe('warmer errors: one line, exit status 2, naming what is missing', () => {
  const cases: [string[], RegExp][] = [
    [['warmer', '--salt', 'NaCl', '--mass', '100'], /^ionheat: --salt: NaCl is not a salt hydrate/],
    [['warmer', '--salt', 'MgSO4·7H2O', '--mass', '100'], /^ionheat: --salt: no melting point, latent heat of fusion or heat capacities .* for MgSO4·7H2O/],
    [['warmer', '--salt', 'Na2HPO4·12H2O', '--mass', '100', '--extra-water', '5'], /^ionheat: --extra-water: no solubility of Na2HPO4·12H2O/],
    [['warmer', '--salt', 'Na2SO4·10H2O', '--mass', '100', '--start', '40'], /^ionheat: --start: the fill starts at 40 °C, not below its liquidus/],
    [['warmer', '--salt', 'NaCH3COO·3H2O'], /^ionheat: --mass is required/],
    [['warmer', '--mass', '10'], /^ionheat: --salt is required/],
    [['warmer', '--salt', 'NaXy·3H2O', '--mass', '10'], /^ionheat: --salt "NaXy·3H2O": /],
    [['warmer', '--salt', 'NaCH3COO·3H2O', '--mass', '0'], /^ionheat: --mass: the mass of hydrate must be at least 0.001 g/],
  ];
  it.each(cases)('ionheat %j', async (argv, message) => {
    const { status, out, err } = await run(argv);
    expect(status).toBe(2);
    expect(out).toBe('');
    expect(err).toMatch(message);
    expect(err.trim().split('\n')).toHaveLength(1);
  });
});

describe('warmer text and chart', () => {
  it('prints the plateau, the heat and the cautions, and writes the chart with the plateau marked', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ionheat-warmer-'));
    const { status, out } = await run(['warmer', '--salt', 'Na2S2O3·5H2O', '--mass', '50', '--svg', 'w.svg'], dir);
    expect(status).toBe(0);
    expect(out).toMatch(/^plateau {14}48 °C {3}\(95 % interval 47\.02 to 48\.98\)$/m);
    expect(out).toContain('Cautions:');
    expect(out).toContain(`chart written to ${join(dir, 'w.svg')}`);
    const svg = readFileSync(join(dir, 'w.svg'), 'utf8');
    expect(svg).toContain('plateau 48 °C (95 % 47–49)');
    expect(svg).toContain('<polyline');
  });
});

describe('pack points a warmer salt to ionheat warmer', () => {
  it('pack --salt "NaCH3COO·3H2O" says to run ionheat warmer, in text and in JSON', async () => {
    const text = await run(['pack', '--salt', 'NaCH3COO·3H2O', '--salt-mass', '100', '--water', '10']);
    expect(text.status).toBe(0);
    // The note wraps to the width like every note; read it as one line.
    expect(text.out.replace(/\s+/g, ' ')).toContain('For a warmer, run: ionheat warmer --salt "NaCH3COO·3H2O" --mass <g>');
    const json = JSON.parse((await run(['pack', '--salt', 'NaCH3COO·3H2O', '--salt-mass', '100', '--water', '10', '--json'])).out);
    expect(json.notes[0]).toContain('ionheat warmer');
    const plain = JSON.parse((await run(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--json'])).out);
    expect(plain.notes.some((n: string) => n.includes('ionheat warmer'))).toBe(false);
  });
});
