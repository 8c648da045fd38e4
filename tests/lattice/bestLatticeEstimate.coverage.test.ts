// bestLatticeEstimate when no estimator applies: the error names every
// corrected method and why it was skipped (here: lithium formate, whose
// formate ion has neither a Shannon nor a thermochemical radius in the
// built-in tables and whose structure type is not tabulated).
import { describe, expect, it } from 'vitest';
import { bestLatticeEstimate } from '../../src/lattice/bestLatticeEstimate.js';
import { IonheatError } from '../../src/error.js';

describe('bestLatticeEstimate without data', () => {
  it('throws MISSING_DATA listing the skipped corrected methods', () => {
    let error: unknown;
    try {
      bestLatticeEstimate('LiHCOO');
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(IonheatError);
    const e = error as IonheatError;
    expect(e.code).toBe('MISSING_DATA');
    expect(e.message.startsWith('no lattice estimator applies to LiHCOO: kapustinskii-corrected: no radius for HCOO⁻')).toBe(true);
    for (const m of ['born-lande-corrected', 'born-mayer-corrected', 'vbt-corrected']) expect(e.message).toContain(`${m}: `);
    expect(e.text).toBe('LiHCOO');
  });
});
