// `ionheat pack`: the JSON contract outside scripts rely on, the text report, and bad input.
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cautionSchema, packFinalTemperature } from '../../src/index.js';
import { runCliInMemory } from '../node/runCliInMemory.js';

const run = (args: string[], cwd = process.cwd()) => runCliInMemory(args, { cwd });

describe('pack --json contract', () => {
  it('prints one object with finalTemperature, dissolved, heat and cautions', async () => {
    const { status, out, err } = await run(['pack', '--salt', 'KNO3', '--salt-mass', '200', '--water', '100', '--start', '20', '--json']);
    expect(status).toBe(0);
    expect(err).toBe('');
    const j = JSON.parse(out);
    expect(Object.keys(j.finalTemperature)).toEqual(expect.arrayContaining(['value', 'low', 'high', 'unit']));
    expect(j.finalTemperature.unit).toBe('°C');
    expect(j.finalTemperature.low).toBeLessThanOrEqual(j.finalTemperature.value);
    expect(j.finalTemperature.high).toBeGreaterThanOrEqual(j.finalTemperature.value);
    // the balance of handFills.test.ts: saturated, dissolved mass = 13.64 + 0.772·T g (CRC, 0–10 °C)
    expect(j.finalTemperature.value).toBeGreaterThan(0);
    expect(j.finalTemperature.value).toBeLessThan(10);
    expect(j.dissolved).toHaveLength(1);
    expect(Object.keys(j.dissolved[0])).toEqual(expect.arrayContaining(['formula', 'loadedMass', 'dissolvedMass', 'undissolvedMass']));
    expect(j.dissolved[0]).toMatchObject({ formula: 'KNO3', loadedMass: 200 });
    expect(j.dissolved[0].dissolvedMass).toBeCloseTo(13.64 + 0.772 * j.finalTemperature.value, 1);
    // the contract of issue 11: ice mass, and per solid the integral enthalpy used and the molality reached
    expect(j.iceMass).toBe(0);
    expect(j.dissolved[0].molality).toBeCloseTo((10 * j.dissolved[0].dissolvedMass) / 101.1023, 2);
    expect(Object.keys(j.dissolved[0].integralEnthalpy)).toEqual(expect.arrayContaining(['value', 'low', 'high', 'unit', 'basis', 'method', 'sources']));
    expect(j.dissolved[0].dissolvedMass + j.dissolved[0].undissolvedMass).toBeCloseTo(200, 3);
    expect(j.heat.unit).toBe('kJ');
    expect(j.heat.absorbed).toBeCloseTo((j.dissolved[0].dissolvedMass / 101.1023) * j.dissolved[0].integralEnthalpy.value, 2);
    expect(Array.isArray(j.cautions) && j.cautions.every((c: unknown) => cautionSchema.safeParse(c).success)).toBe(true);
    expect(j.cautions.at(-1).text).toContain('licensed practice');
    expect(j.sources.crcSolubility).toContain('CRC');
  });
  it('takes several solids, one --salt-mass per --salt, one dissolved entry each', async () => {
    const { status, out } = await run(['pack', '--salt', 'NH4Cl', '--salt-mass', '20', '--salt', 'CO(NH2)2', '--salt-mass', '10', '--water', '100', '--json']);
    expect(status).toBe(0);
    const j = JSON.parse(out);
    expect(j.dissolved.map((d: { formula: string }) => d.formula)).toEqual(['NH4Cl', 'CO(NH2)2']);
    expect(j.notes.some((n: string) => n.includes('mixing effects'))).toBe(true);
  });
  it('designs for --target and reports the time course when a band is given', async () => {
    const { out } = await run(['pack', '--salt', 'CaCl2', '--salt-mass', '25', '--water', '100', '--target', '50', '--band', '40:50', '--json']);
    const j = JSON.parse(out);
    expect(j.target.reachable).toBe(true);
    // the design, solved forward, reaches the target
    expect(packFinalTemperature({ solids: [{ formula: 'CaCl2', massG: j.target.design.saltMass }], waterG: 100, startC: 20 }).finalTemperature.value).toBeCloseTo(50, 2);
    expect(j.timeCourse.band.secondsInside).toBeGreaterThan(0);
    expect(j.timeCourse.parameters.tau ?? j.timeCourse.parameters.dissolutionTimeConstantS).toMatchObject({ assumed: true });
    expect(j.cautions[0].text).toMatch(/^Contact-burn risk/);
  });
  it('gives the same Monte Carlo interval for the same seed', async () => {
    const a = JSON.parse((await run(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--monte-carlo', '500', '--seed', '7', '--json'])).out);
    const b = JSON.parse((await run(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--monte-carlo', '500', '--seed', '7', '--json'])).out);
    expect(a.finalTemperature).toEqual(b.finalTemperature);
    expect(a.finalTemperature).toMatchObject({ interval: 'monte-carlo', seed: 7, samples: 500 });
  });
});

describe('pack text report and charts', () => {
  it('prints the temperature, the table of solids, the cautions and the notes', async () => {
    const { status, out } = await run(['pack', '--salt', 'CaCl2', '--salt-mass', '25', '--water', '100']);
    expect(status).toBe(0);
    // 63.449 °C by the hand calculation of handFills.test.ts, printed to the place its uncertainty allows
    expect(out).toContain('final temperature   63.4 °C');
    expect(out).toContain('ΔsolH(m) kJ/mol');
    expect(out).toContain('Cautions:');
    expect(out).toContain('ISO 13732-1');
    expect(out).toContain('Notes:');
  });
  it('writes the curve and time-course charts', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'ionheat-pack-'));
    const { status, out } = await run(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--target', '12', '--curve-svg', 'curve.svg', '--time-svg', 'time.svg', '--points', '30'], dir);
    expect(status).toBe(0);
    expect(out).toContain('chart written to');
    expect(readFileSync(join(dir, 'curve.svg'), 'utf8')).toMatch(/^<svg[\s\S]*<\/svg>\n$/);
    expect(readFileSync(join(dir, 'time.svg'), 'utf8')).toContain('Pack temperature over time');
  });
});

describe('pack bad input: one line on stderr naming the field, exit 2, no stack trace', () => {
  const base = ['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100'];
  const cases: [string, string[], string][] = [
    ['a negative mass', ['pack', '--salt', 'KNO3', '--salt-mass', '-5', '--water', '100'], '--salt-mass'],
    ['a negative mass written with =', ['pack', '--salt', 'KNO3', '--salt-mass=-5', '--water', '100'], '--salt-mass'],
    ['a zero mass', ['pack', '--salt', 'KNO3', '--salt-mass', '0', '--water', '100'], '--salt-mass'],
    ['zero water', ['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '0'], '--water'],
    ['no water', ['pack', '--salt', 'KNO3', '--salt-mass', '10'], '--water'],
    ['an unknown salt', ['pack', '--salt', 'Xyz', '--salt-mass', '10', '--water', '100'], '--salt'],
    ['a salt without an enthalpy of solution', ['pack', '--salt', 'Cs2C2O4', '--salt-mass', '10', '--water', '100'], '--salt'],
    ['a start below liquid water', [...base, '--start', '-5'], '--start'],
    ['a start above liquid water', [...base, '--start', '120'], '--start'],
    ['a mass that is not a number', ['pack', '--salt', 'KNO3', '--salt-mass', 'ten', '--water', '100'], '--salt-mass'],
    ['unpaired salts and masses', ['pack', '--salt', 'KNO3', '--salt', 'NaCl', '--salt-mass', '10', '--water', '100'], '--salt-mass'],
    ['a band the wrong way round', [...base, '--band', '50:40'], '--band'],
    ['a zero dissolution time constant', [...base, '--tau', '0'], '--tau'],
  ];
  it.each(cases)('%s', async (_, args, field) => {
    const { status, out, err } = await run(args);
    expect(status).toBe(2);
    expect(out).toBe('');
    expect(err.endsWith('\n')).toBe(true);
    expect(err.trimEnd().split('\n')).toHaveLength(1);
    expect(err).toMatch(/^ionheat: /);
    expect(err).toContain(field);
    expect(err).not.toMatch(/\n\s+at /);
  });
});
