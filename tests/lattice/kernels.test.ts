// The estimator kernels against hand evaluations of their published equations.
import { describe, expect, it } from 'vitest';
import { bornLande, bornMayer, formulaUnitVolume, glasserLatticeEnergy, kapustinskii, latticeEnthalpyCorrection, vbtLatticeEnergy } from '../../src/index.js';
import { shortestDistance } from '../../src/lattice/latticeStructure.js';
import { studentQuantile975 } from '../../src/numeric/studentQuantile.js';
import { RT_STANDARD } from '../../src/quantity/constants.js';

describe('Kapustinskii (1956 form: K = 1.2025e−4 J·m/mol, ρ = 0.345 Å; Kapustinskii, Q. Rev. Chem. Soc. 10, 283)', () => {
  it('evaluates K·ν|z₊z₋|/d·(1 − ρ/d)', () => {
    // NaCl with Shannon (1976) CN 6 radii 1.02 + 1.81 Å: 1202.5·2/2.83·(1 − 0.345/2.83) = 746.22 kJ/mol (hand calculation)
    expect(kapustinskii(2, 2.83)).toBeCloseTo(746.223, 2);
    // MgO: ν|z₊z₋| = 2·4 = 8, d = 0.72 + 1.40 Å
    expect(kapustinskii(8, 2.12)).toBeCloseTo((1202.5 * 8) / 2.12 * (1 - 0.345 / 2.12), 6);
  });
});

describe('Born–Landé and Born–Mayer (Born & Landé 1918; Born & Mayer 1932)', () => {
  it('use N_A e²/(4πε₀) = 1389.35 kJ·Å/mol (CODATA 2018)', () => {
    // NaCl: A = 1.747565 (CRC Madelung table), r₀ = a/2 = 2.8201 Å (a = 5.6402 Å, CRC), n = (7 + 9)/2 (Pauling)
    expect(bornLande(1.747565, 1, 2.8201, 8)).toBeCloseTo(753.338, 2);
    expect(bornMayer(1.747565, 1, 2.8201)).toBeCloseTo(755.632, 2);
  });
});

describe('volume-based thermodynamics (Jenkins et al., Inorg. Chem. 38, 3609, 1999; Glasser 1995)', () => {
  it('V_m = M/(ρN_A)', () => {
    // NaCl: 58.44 g/mol, 2.17 g/cm³ (CRC) → 0.04472 nm³ (hand calculation)
    expect(formulaUnitVolume(58.44, 2.17)).toBeCloseTo(0.04472, 5);
  });
  it('U = 2I(α/V^⅓ + β) and Glasser U = A·I·(2I/V)^⅓', () => {
    expect(vbtLatticeEnergy(1, 0.04472, 117.3, 51.9)).toBeCloseTo(2 * (117.3 / Math.cbrt(0.04472) + 51.9), 9);
    expect(glasserLatticeEnergy(15, 0.04243)).toBeCloseTo(121.39 * 15 * Math.cbrt(30 / 0.04243), 9);
  });
});

describe('lattice energy → enthalpy (Jenkins, J. Chem. Educ. 82, 950, 2005; the CRC lattice-energy table states the same relation)', () => {
  it('gives −RT for MX of monatomic ions, −1.5RT for MX2, and counts polyatomic degrees of freedom', () => {
    expect(latticeEnthalpyCorrection([{ count: 1, shape: 'monatomic' }, { count: 1, shape: 'monatomic' }])).toBeCloseTo(-RT_STANDARD, 9);
    expect(latticeEnthalpyCorrection([{ count: 1, shape: 'monatomic' }, { count: 2, shape: 'monatomic' }])).toBeCloseTo(-1.5 * RT_STANDARD, 9);
    // KNO3: K⁺ (3/2 − 2) + NO3⁻ non-linear (6/2 − 2) = +½
    expect(latticeEnthalpyCorrection([{ count: 1, shape: 'monatomic' }, { count: 1, shape: 'nonlinear' }])).toBeCloseTo(0.5 * RT_STANDARD, 9);
    // KCN: K⁺ (3/2 − 2) + CN⁻ linear (5/2 − 2) = 0
    expect(latticeEnthalpyCorrection([{ count: 1, shape: 'monatomic' }, { count: 1, shape: 'linear' }])).toBeCloseTo(0, 9);
  });
});

describe('geometry and statistics', () => {
  it('gives r₀ of the cubic structures from a (ideal geometry, common practice)', () => {
    expect(shortestDistance('rock-salt', 5.6402)).toBeCloseTo(2.8201, 9);
    expect(shortestDistance('caesium-chloride', 4.123)).toBeCloseTo((4.123 * Math.sqrt(3)) / 2, 9);
    expect(shortestDistance('fluorite', 5.4626)).toBeCloseTo((5.4626 * Math.sqrt(3)) / 4, 9);
    expect(shortestDistance('rutile', 4.59)).toBeUndefined();
  });
  it("matches Student's t quantiles (Abramowitz & Stegun, table 26.10)", () => {
    expect(studentQuantile975(1)).toBeCloseTo(12.706, 3);
    expect(studentQuantile975(2)).toBeCloseTo(4.303, 3);
    expect(studentQuantile975(5)).toBeCloseTo(2.5706, 3);
    expect(studentQuantile975(10)).toBeCloseTo(2.228, 3);
    expect(studentQuantile975(30)).toBeCloseTo(2.042, 3);
    expect(studentQuantile975(1e9)).toBeCloseTo(1.96, 3);
  });
});
