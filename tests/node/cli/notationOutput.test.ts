// Text output in one notation: charges as superscripts, true minus signs, words that agree with the sign, option
// names instead of internal field names, and paragraphs wrapped to the width.
import { describe, expect, it } from 'vitest';
import { runCliInMemory as run } from '../runCliInMemory.js';
import { DEFAULT_COLUMNS, terminalColumns } from '../../../src/node/cli/io.js';

describe('text output notation', () => {
  it('takes the width from COLUMNS, else the terminal, else 100', () => {
    expect(terminalColumns({ COLUMNS: '72' }, 200)).toBe(72);
    expect(terminalColumns({}, 132)).toBe(132);
    expect(terminalColumns({}, undefined)).toBe(DEFAULT_COLUMNS);
    expect(terminalColumns({ COLUMNS: 'wide' }, undefined)).toBe(100);
  });

  it('wraps notes and cautions to the width, indented under their bullet', async () => {
    for (const columns of [60, 100]) {
      const r = await run(['dissolve', 'NH4NO3'], { columns });
      const lines = r.out.split('\n');
      const tableAt = lines.findIndex((l) => l.startsWith('basis'));
      const prose = lines.filter((_, i) => i < tableAt || i > tableAt + 12);
      expect(Math.max(...prose.map((l) => [...l].length))).toBeLessThanOrEqual(columns);
      expect(r.out).toMatch(/\n {4}\S/); // a continuation line under "  - "
    }
  });

  it('says heat released, with a positive number, where the heat per gram is negative (CaCl2, exothermic)', async () => {
    const r = await run(['dissolve', 'CaCl2']);
    expect(r.out).toMatch(/^Heat released per gram of salt: \d+ ± \d+ J\/g \(heats\)$/m);
    expect(r.out).not.toMatch(/absorbed per gram of salt: [−-]/);
  });

  it('writes ions with superscript charges and signed charge numbers in the salt table', async () => {
    const r = await run(['salt', 'CuSO4·5H2O']);
    expect(r.out).toMatch(/^Cu²⁺\s+Cu\[2\+\]\s+\+2\s+1$/m);
    expect(r.out).toMatch(/^SO₄²⁻\s+SO4\[2-\]\s+−2\s+1$/m);
  });

  it('relates the electron affinity and the sign of the solved step (MgO: EA negative, the step positive)', async () => {
    const r = await run(['cycle', 'MgO', '--solve', 'electron-affinity', '--lattice', '3792']);
    expect(r.out).toMatch(/^electron affinity: −\d+(\.\d+)? ± /m);
    expect(r.out).toMatch(/sign: step 6 is −EA = \+\d+(\.\d+)? kJ\/mol \(the electron affinity is the energy released on attachment\)/);
    expect(r.out).toMatch(/second electron affinity of O \(solved; the step is −EA\)/);
  });

  it('names the command-line options, not internal fields, in the time-course notes', async () => {
    const r = await run(['pack', '--salt', 'CaCl2', '--salt-mass', '25', '--water', '100', '--duration', '600']);
    expect(r.out).toMatch(/heat exchange with the air 0\.15 W\/K \(--g-ambient\)/);
    expect(r.out).not.toMatch(/ambientConductanceWPerK|durationS|skinConductanceWPerK/);
  });

  it('writes a hydrate with a decimal count as it is (CaSO4·0.5H₂O, not CaSO4·0.₅H₂O)', async () => {
    const r = await run(['dissolve', 'CaSO4·0.5H2O']);
    expect(r.out.split('\n')[0]).toMatch(/^CaSO₄·0\.5H₂O /);
  });
});
