// Issue 12, item 3: a target design reports its mass with a 95 % interval and the largest mass whose interval
// stays clear of the contact-burn threshold (hot) or of 0 °C (cold), with a caution when the design crosses it.
// The checks are self-consistency against the pack model itself (packFinalTemperature), solved to 1e-4 g, so the
// temperatures agree to 0.01 K; the burn threshold is ISO 13732-1's 44 °C (from memory, iso13732).
import { describe, expect, it } from 'vitest';
import { CONTACT_BURN_THRESHOLD_C, FROSTBITE_THRESHOLD_C, packDesignMargin, packFinalTemperature } from '../../src/index.js';
import { runCliInMemory } from '../node/runCliInMemory.js';

const at = (formula: string, massG: number) => packFinalTemperature({ solids: [{ formula, massG }], waterG: 100, startC: 20 }).finalTemperature;

describe('hot fill: CaCl2 in 100 g of water from 20 °C', () => {
  const m = packDesignMargin({ solids: [{ formula: 'CaCl2', massG: 1 }], waterG: 100, startC: 20 }, 44);
  it('the designed mass reaches the target, and its interval brackets it', () => {
    expect(m.kind).toBe('hot');
    expect(at('CaCl2', m.design!.saltMassG).value).toBeCloseTo(44, 2);
    expect(m.massInterval!.low).toBeLessThan(m.design!.saltMassG);
    expect(m.massInterval!.high!).toBeGreaterThan(m.design!.saltMassG);
    // the ends of the mass interval are where the far and near edges of the temperature interval touch the target
    expect(at('CaCl2', m.massInterval!.low).high).toBeCloseTo(44, 2);
    expect(at('CaCl2', m.massInterval!.high!).low).toBeCloseTo(44, 2);
  });
  it('the largest safe mass puts the upper bound on the burn threshold', () => {
    expect(m.threshold.kind).toBe('contact-burn');
    expect(m.threshold.temperatureC).toBe(CONTACT_BURN_THRESHOLD_C);
    expect(at('CaCl2', m.threshold.largestSafeMassG!).high).toBeCloseTo(CONTACT_BURN_THRESHOLD_C, 2);
  });
  it('a design whose interval crosses the threshold gets a caution naming the safe mass', () => {
    // the upper end of the design's interval (about 45 °C: the design is at 44 °C with a half-width near 1 K)
    expect(m.design!.finalTemperature.high).toBeGreaterThan(CONTACT_BURN_THRESHOLD_C);
    expect(m.caution?.text).toContain(`Contact-burn margin: the design's 95 % interval reaches ${m.design!.finalTemperature.high.toFixed(2)} °C`);
    expect(m.caution?.text).toContain(`at most ${m.threshold.largestSafeMassG!.toFixed(2)} g`);
  });
  it('a design clear of the threshold has none', () => {
    const low = packDesignMargin({ solids: [{ formula: 'CaCl2', massG: 1 }], waterG: 100, startC: 20 }, 35);
    expect(low.caution).toBeNull();
    expect(low.threshold.largestSafeMassG).toBeCloseTo(m.threshold.largestSafeMassG!, 3);
  });
});

describe('cold fill: NH4NO3 and KNO3', () => {
  it('a design at 0 °C crosses the frostbite line, with the largest mass whose lower bound stays above it', () => {
    const m = packDesignMargin({ solids: [{ formula: 'NH4NO3', massG: 1 }], waterG: 100, startC: 20 }, 0);
    expect(m.kind).toBe('cold');
    expect(m.threshold.kind).toBe('frostbite');
    expect(at('NH4NO3', m.threshold.largestSafeMassG!).low).toBeCloseTo(FROSTBITE_THRESHOLD_C, 2);
    expect(m.caution?.text).toMatch(/^Frostbite margin/);
  });
  it('a fill that cannot reach 0 °C at any mass is safe throughout (null), and an unreachable target says so', () => {
    const m = packDesignMargin({ solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 }, 12);
    expect(m.threshold.largestSafeMassG).toBeNull();
    expect(m.caution).toBeNull();
    const out = packDesignMargin({ solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 }, -10);
    expect(out.reachable).toBe(false);
    expect(out.design).toBeNull();
    expect(out.message).toMatch(/out of reach/);
  });
});

describe('ionheat pack --target', () => {
  it('prints the margin and the caution, and puts both in the JSON', async () => {
    const text = await runCliInMemory(['pack', '--salt', 'CaCl2', '--salt-mass', '10', '--water', '100', '--target', '44']);
    expect(text.status).toBe(0);
    const margin = /margin: (\d+\.\d\d) g of solid \(95 % interval (\d+\.\d\d) to (\d+\.\d\d) g\)/.exec(text.out);
    expect(margin, text.out).not.toBeNull();
    const [designed, low, high] = margin!.slice(1).map(Number) as [number, number, number];
    expect(low).toBeLessThan(designed);
    expect(high).toBeGreaterThan(designed);
    expect(text.out).toMatch(/• Warning — Contact-burn margin/);
    const json = await runCliInMemory(['pack', '--salt', 'CaCl2', '--salt-mass', '10', '--water', '100', '--target', '44', '--json']);
    const j = JSON.parse(json.out) as { target: { margin: { designedMassG: number; massInterval: { low: number }; threshold: { largestSafeMassG: number }; caution: { kind: string; severity: string; text: string } } } };
    expect(j.target.margin.massInterval.low).toBeLessThan(j.target.margin.designedMassG);
    expect(j.target.margin.threshold.largestSafeMassG).toBeLessThan(j.target.margin.designedMassG);
    expect(j.target.margin.caution.text).toMatch(/Contact-burn margin/);
    expect([j.target.margin.caution.kind, j.target.margin.caution.severity]).toEqual(['design-margin', 'warning']);
  });
});
