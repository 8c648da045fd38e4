// One range table for a fill and its options (src/pack/packInput.ts): the library, a screen's standard fill (object
// and text) and the command line accept and refuse the same numbers, and each error names what its caller typed.
import { describe, expect, it } from 'vitest';
import { createScreener, isIonheatError, packFinalTemperature, parseFillSpec } from '../../src/index.js';
import { PACK_INPUT_RANGES } from '../../src/pack/packInput.js';
import { runCliInMemory } from '../node/runCliInMemory.js';

const fill = (waterG: number, startC: number, massG = 10) => ({ solids: [{ formula: 'KNO3', massG }], waterG, startC });

/** The error of a call, or undefined when it returns. */
function errorOf(call: () => unknown): { code: string; message: string; field?: string } | undefined {
  try {
    call();
    return undefined;
  } catch (e) {
    if (!isIonheatError(e)) throw e;
    return { code: e.code, message: e.message, ...(e.field !== undefined ? { field: e.field } : {}) };
  }
}

/** Whether each entry point accepts the fill of `saltG` g of KNO3 in `waterG` g of water at `startC` °C. */
async function accepted(saltG: number, waterG: number, startC: number) {
  const cli = await runCliInMemory(['pack', '--salt', 'KNO3', '--salt-mass', String(saltG), '--water', String(waterG), '--start', String(startC), '--json']);
  return {
    library: errorOf(() => packFinalTemperature(fill(waterG, startC, saltG))) === undefined,
    screenObject: errorOf(() => createScreener({ fill: { saltMassG: saltG, waterMassG: waterG, startC } })) === undefined,
    screenText: errorOf(() => createScreener({ fill: `${saltG}:${waterG}@${startC}` })) === undefined,
    cli: cli.status === 0,
  };
}

describe('one range table for every entry point', () => {
  it.each([
    [10, 100, 20, true],
    [40, 80, 0, true], // a start at 0 °C: the text form refused it once while the object passed
    [10, 100, 99.5, true],
    [10, 100, 100, false],
    [10, 100, -0.5, false],
    [0.001, 100, 20, true],
    [0.0009, 100, 20, false],
    [10, 1e6, 20, true],
    [10, 1.1e6, 20, false],
  ])('%s g KNO3 in %s g water at %s °C: accepted everywhere = %s', async (saltG, waterG, startC, ok) => {
    const got = await accepted(saltG, waterG, startC);
    expect(got).toEqual({ library: ok, screenObject: ok, screenText: ok, cli: ok });
  });

  it('the text form of a fill at 0 °C reads as the object does', () => {
    expect(parseFillSpec('40:80@0')).toEqual({ saltMassG: 40, waterMassG: 80, startC: 0 });
  });

  it('the table states each range once, with its unit', () => {
    expect(PACK_INPUT_RANGES.startC).toMatchObject({ min: 0, max: 100, below: true, unit: '°C' });
    expect(PACK_INPUT_RANGES.samples).toMatchObject({ min: 20, max: 100_000, integer: true });
  });
});

describe('errors name the option the caller used', () => {
  it('--monte-carlo 200000 is refused by the command under its own flag, not the library field', async () => {
    const r = await runCliInMemory(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--monte-carlo', '200000']);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/^ionheat: --monte-carlo: the number of Monte Carlo draws must be at least 20 draws and at most 100000 draws, got 200000 draws/);
    expect(r.err).not.toContain('interval.samples');
  });

  it('the library names interval.samples for the same number', () => {
    const e = errorOf(() => packFinalTemperature(fill(100, 20), { interval: { method: 'monte-carlo', samples: 200_000 } }));
    expect(e).toMatchObject({ code: 'INVALID_ARGUMENT', field: 'interval.samples' });
    expect(e!.message).toMatch(/interval\.samples/);
  });

  it('--seed 1.5 is refused under --seed (the library takes whole-number seeds only)', async () => {
    const r = await runCliInMemory(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--monte-carlo', '50', '--seed', '1.5']);
    expect(r.status).toBe(2);
    expect(r.err).toMatch(/^ionheat: --seed: the Monte Carlo seed must be a whole number, got 1\.5/);
  });

  it('a start of 100 °C says why, under --start, fill.startC or the text part', async () => {
    const r = await runCliInMemory(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--water', '100', '--start', '100']);
    expect(r.err).toMatch(/^ionheat: --start: the start temperature must be at least 0 °C and less than 100 °C, where water is liquid at 1 bar, got 100 °C/);
    expect(errorOf(() => createScreener({ fill: { saltMassG: 40, waterMassG: 80, startC: 100 } }))).toMatchObject({ field: 'fill.startC' });
    expect(errorOf(() => parseFillSpec('40:80@100'))!.message).toMatch(/^fill "40:80@100": the start temperature \(after "@"\) must be at least 0 °C and less than 100 °C/);
  });

  it('a second solid of the wrong mass is named by its flag and formula', async () => {
    const r = await runCliInMemory(['pack', '--salt', 'KNO3', '--salt-mass', '10', '--salt', 'NH4Cl', '--salt-mass', '0', '--water', '100']);
    expect(r.err).toMatch(/^ionheat: --salt-mass: the mass of NH4Cl must be at least 0\.001 g/);
  });
});
