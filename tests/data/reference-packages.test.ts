// Cross-checks of the atomic and gas-phase tables against two general-purpose
// element packages installed as dev dependencies, plus internal consistency of
// the Born–Haber inputs (atomization enthalpies, bond dissociation enthalpies,
// ionization energies, electron affinities and gaseous ion enthalpies).
//
// Reference packages:
// - `periodic-table` (npm, ISC licence): per element `ionizationEnergy` (kJ/mol,
//   rounded to integers), `electronAffinity` (kJ/mol, NEGATIVE when energy is
//   released, the opposite of our table's sign), `ionRadius` strings such as
//   '102 (+1)' or '78 (+2*)' in pm (Shannon six-coordinate radii; '*' marks the
//   high-spin value).
// - `chemical-elements` (npm, MIT licence): `elementsObject[symbol].mass`, a mean
//   atomic mass computed from its isotope table.
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const require = createRequire(import.meta.url);
const periodicTable = require('periodic-table') as {
  symbols: Record<string, { atomicNumber: number; ionizationEnergy: number | ''; electronAffinity: number | ''; ionRadius: string }>;
};
const chemicalElements = require('chemical-elements') as {
  elementsObject: Record<string, { mass: number | null }>;
};

const dataDir = join(import.meta.dirname, '..', '..', 'data');
const readTable = (file: string): any[] => JSON.parse(readFileSync(join(dataDir, file), 'utf8')).records;

const elements = readTable('elements.json');
const ionization = readTable('ionization-energies.json');
const affinities = readTable('electron-affinities.json');
const atomization = readTable('atomization-enthalpies.json');
const bonds = readTable('bond-dissociation.json');
const gasIons = readTable('ion-formation-gas.json');

const byKey = <T>(rows: T[], key: (r: T) => string) => new Map(rows.map((r) => [key(r), r] as const));
const ie = byKey(ionization, (r) => `${r.element}|${r.stage}`);
const ea = byKey(affinities, (r) => r.element);
const atom = byKey(atomization, (r) => r.element);
const bond = byKey(bonds, (r) => r.molecule);
const gasIon = byKey(gasIons, (r) => r.ion);

/** 5/2 RT at 298.15 K, kJ/mol (R = 8.314462618 J/(mol·K)): the electron-convention term per electron. */
const FIVE_HALVES_RT = (2.5 * 8.314462618 * 298.15) / 1000;

const value = <T extends { value: number }>(map: Map<string, T>, key: string): number => {
  const row = map.get(key);
  if (!row) throw new Error(`missing record ${key}`);
  return row.value;
};

describe('first ionization energies against periodic-table', () => {
  // Source of the reference numbers: periodic-table's `ionizationEnergy`, kJ/mol,
  // rounded to whole numbers; ours are the CRC/NIST ASD eV values converted.
  const knownDisagreements: Record<string, string> = {
    // The package gives 702 kJ/mol (the old 7.28 eV); the NIST ASD value reproduced
    // by the CRC is 7.11938 eV = 686.9 kJ/mol, from laser resonance ionization.
    Tc: 'package keeps the superseded 7.28 eV',
  };

  it('agree within 1 % for every element Z = 1–56 that both give', () => {
    const compared: string[] = [];
    const off: string[] = [];
    for (const row of ionization.filter((r) => r.stage === 1)) {
      const ref = periodicTable.symbols[row.element];
      if (!ref || ref.atomicNumber > 56 || typeof ref.ionizationEnergy !== 'number') continue;
      if (row.element in knownDisagreements) continue;
      compared.push(row.element);
      if (Math.abs(row.value - ref.ionizationEnergy) > 0.01 * row.value) off.push(`${row.element}: ${row.value} vs ${ref.ionizationEnergy}`);
    }
    expect(off).toEqual([]);
    expect(compared.length).toBeGreaterThanOrEqual(50);
  });

  it('still disagree where a disagreement is listed', () => {
    for (const element of Object.keys(knownDisagreements)) {
      const ours = value(ie, `${element}|1`);
      const ref = periodicTable.symbols[element]!.ionizationEnergy as number;
      expect(Math.abs(ours - ref), element).toBeGreaterThan(0.01 * ours);
    }
  });
});

describe('electron affinities against periodic-table', () => {
  // periodic-table's `electronAffinity` is negative when energy is released; ours is
  // positive when released (the CRC convention), so the reference is negated.
  // Known disagreements, each for a stated reason (checked below to stay true):
  const knownDisagreements: Record<string, string> = {
    // The package gives 154 kJ/mol; the photodetachment value in the CRC table is
    // 1.2621 eV = 121.8 kJ/mol. The package's figure is an outdated estimate.
    C: 'outdated figure in the package',
    // The package gives 7 kJ/mol released; the CRC table marks N− as unbound
    // (negative affinity, about −0.07 eV).
    N: 'N− is unbound; the package keeps an old positive estimate',
  };

  it('agree within 2 % (after fixing the sign) for the anion-forming elements', () => {
    const compared: string[] = [];
    const off: string[] = [];
    for (const row of affinities) {
      if (row.element in knownDisagreements) continue;
      const ref = periodicTable.symbols[row.element]?.electronAffinity;
      if (typeof ref !== 'number') continue;
      const released = -ref;
      compared.push(row.element);
      if (Math.abs(row.value - released) > 0.02 * Math.abs(row.value)) off.push(`${row.element}: ${row.value} vs ${released}`);
    }
    expect(off).toEqual([]);
    expect(compared.sort()).toEqual(['Br', 'Cl', 'F', 'H', 'I', 'O', 'S', 'Se']);
  });

  it('still disagree where a disagreement is listed (so the list does not go stale)', () => {
    for (const element of Object.keys(knownDisagreements)) {
      const ours = value(ea, element);
      const released = -(periodicTable.symbols[element]!.electronAffinity as number);
      expect(Math.abs(ours - released), element).toBeGreaterThan(0.02 * Math.abs(ours));
    }
  });

  it('records nitrogen as unbound (negative)', () => {
    expect(value(ea, 'N')).toBeLessThan(0);
  });
});

describe('six-coordinate ionic radii against periodic-table', () => {
  // Reference: periodic-table's `ionRadius`, e.g. '102 (+1)', pm, Shannon (1976)
  // six-coordinate values; '*' marks the high-spin radius. Ours: data/shannon-radii.json,
  // written separately; skipped per ion where the file or the record is absent.
  const shannonFile = join(dataDir, 'shannon-radii.json');
  const present = existsSync(shannonFile);
  // Ions whose radius depends on spin state: the package's unstarred value is low-spin.
  const spinDependent = new Set(['Cr[2+]', 'Mn[2+]', 'Fe[2+]', 'Co[2+]', 'Mn[3+]', 'Fe[3+]', 'Co[3+]']);
  // The package's Sn entry (112 pm for Sn2+) is not a Shannon six-coordinate radius:
  // Shannon lists none for Sn2+.
  const excluded = new Set(['Sn[2+]']);

  it.runIf(present)('agree within 0.03 Å for every monatomic ion both give', () => {
    const radii: any[] = JSON.parse(readFileSync(shannonFile, 'utf8')).records;
    const compared: string[] = [];
    const off: string[] = [];
    const ions = new Set(radii.map((r) => r.ion as string));
    for (const ion of ions) {
      const m = /^([A-Z][a-z]?)\[(\d?)([+-])\]$/.exec(ion);
      if (!m || excluded.has(ion)) continue;
      const [, symbol, n, sign] = m;
      const charge = (sign === '+' ? 1 : -1) * Number(n || 1);
      const ref = /^([\d.]+) \(([+-]\d+)(\*?)\)$/.exec(periodicTable.symbols[symbol!]?.ionRadius ?? '');
      if (!ref || Number(ref[2]) !== charge) continue;
      const highSpin = ref[3] === '*';
      const six = radii.filter((r) => r.ion === ion && r.coordination === 6);
      const match = spinDependent.has(ion)
        ? six.find((r) => r.spin === (highSpin ? 'high' : 'low'))
        : (six.find((r) => r.spin === undefined) ?? (six.length === 1 ? six[0] : undefined));
      if (!match) continue;
      const refAngstrom = Number(ref[1]) / 100;
      compared.push(ion);
      if (Math.abs(match.value - refAngstrom) > 0.03) off.push(`${ion}: ${match.value} vs ${refAngstrom}`);
    }
    expect(off).toEqual([]);
    expect(compared.length, 'no ion could be compared at all').toBeGreaterThan(0);
  });
});

describe('atomic weights against chemical-elements', () => {
  // Reference: chemical-elements' `mass`, computed from its isotope abundances.
  // Tolerance: 0.01 g/mol, or the IUPAC uncertainty if larger, or anywhere inside
  // the IUPAC 2021 interval (given in our record's note as 'interval [a, b]').
  const knownDisagreements: Record<string, string> = {
    // The package's isotope table gives 78.959, the pre-2013 standard (78.96(3));
    // IUPAC revised selenium to 78.971(8) in 2013.
    Se: 'package predates the 2013 revision',
  };

  it('agree for every element both give', () => {
    const compared: string[] = [];
    const off: string[] = [];
    for (const row of elements) {
      const ref = chemicalElements.elementsObject[row.symbol]?.mass;
      if (typeof ref !== 'number') continue;
      compared.push(row.symbol);
      const interval = /interval \[([\d.]+), ([\d.]+)\]/.exec(row.note ?? '');
      const inInterval = interval ? ref >= Number(interval[1]) && ref <= Number(interval[2]) : false;
      const tolerance = row.symbol in knownDisagreements ? 0.02 : Math.max(0.01, row.uncertainty ?? 0);
      if (!inInterval && Math.abs(row.value - ref) > tolerance) off.push(`${row.symbol}: ${row.value} vs ${ref}`);
    }
    expect(off).toEqual([]);
    expect(compared.length).toBeGreaterThanOrEqual(80);
  });

  it('covers Z = 1–83 (less Tc and Pm, which have no standard atomic weight) and Th, U', () => {
    const have = new Set(elements.map((r) => r.z as number));
    const missing = [];
    for (let z = 1; z <= 83; z++) if (z !== 43 && z !== 61 && !have.has(z)) missing.push(z);
    if (!have.has(90)) missing.push(90);
    if (!have.has(92)) missing.push(92);
    expect(missing).toEqual([]);
  });
});

describe('atomization enthalpies and bond dissociation enthalpies', () => {
  // Where X2(g) is the standard state, ΔfH°(X, g) = ½D°298(X2). Sources: CODATA
  // (cox1989) for the atoms, the CRC bond-strength table for D.
  it.each(['H', 'N', 'O', 'F', 'Cl'])('ΔfH°(%s, g) equals ½D°298 within 1 kJ/mol', (x) => {
    expect(Math.abs(value(atom, x) - value(bond, `${x}2`) / 2)).toBeLessThan(1);
  });

  // Br2(l) and I2(cr) standard states: ΔfH°(X, g) = ½D°298 + ½ΔfH°(X2, g), with
  // ΔfH°(Br2, g) = 30.91 and ΔfH°(I2, g) = 62.42 kJ/mol (CODATA, cox1989).
  const gaseousDiatomic: Record<string, number> = { Br: 30.91, I: 62.42 };
  it.each(Object.keys(gaseousDiatomic))('ΔfH°(%s, g) equals ½D°298 + ½ΔfH°(X2, g) within 1 kJ/mol', (x) => {
    const viaBond = value(bond, `${x}2`) / 2 + gaseousDiatomic[x]! / 2;
    expect(Math.abs(value(atom, x) - viaBond)).toBeLessThan(1);
  });
});

describe('gaseous ion enthalpies follow the electron convention', () => {
  // ΔfH°(M+, g) = ΔfH°(M, g) + IE1(0 K) + 5/2 RT. Ion values: NBS (wagman1982);
  // atoms: CODATA (cox1989); IE: CRC/NIST ASD.
  const alkali = ['Li', 'Na', 'K', 'Rb', 'Cs'];
  it.each(alkali)('%s+: atom + IE1 + 5/2 RT within 1 kJ/mol', (m) => {
    const cycle = value(atom, m) + value(ie, `${m}|1`) + FIVE_HALVES_RT;
    expect(Math.abs(value(gasIon, `${m}[+]`) - cycle)).toBeLessThan(1);
  });

  it('the ion convention (no 5/2 RT) would miss every alkali metal by more than 5 kJ/mol', () => {
    for (const m of alkali) {
      const ionConvention = value(atom, m) + value(ie, `${m}|1`);
      expect(Math.abs(value(gasIon, `${m}[+]`) - ionConvention), m).toBeGreaterThan(5);
    }
  });

  // ΔfH°(X−, g) = ΔfH°(X, g) − EA(0 K) − 5/2 RT. EA: CRC (crcElectronAffinity).
  it.each(['F', 'Cl', 'Br'])('%s−: atom − EA − 5/2 RT within 1 kJ/mol', (x) => {
    const cycle = value(atom, x) - value(ea, x) - FIVE_HALVES_RT;
    expect(Math.abs(value(gasIon, `${x}[-]`) - cycle)).toBeLessThan(1);
  });

  // Multiply charged cations: ΔfH°(M^z+, g) = ΔfH°(M, g) + Σ IE + z·5/2 RT. Al3+ is
  // included since its NBS value (built on Al(g) = 326.4) was replaced by the cycle over
  // the CODATA atom (330.0 ± 4.0) of atomization-enthalpies.json.
  it.each([
    ['Mg', 2],
    ['Ca', 2],
    ['Zn', 2],
    ['Cd', 2],
    ['Cu', 2],
    ['Al', 3],
  ] as const)('%s: atom + Σ IE + z·5/2 RT within 2 kJ/mol', (m, z) => {
    let cycle = value(atom, m) + z * FIVE_HALVES_RT;
    for (let stage = 1; stage <= z; stage++) cycle += value(ie, `${m}|${stage}`);
    expect(Math.abs(value(gasIon, `${m}[${z}+]`) - cycle)).toBeLessThan(2);
  });
});

describe('ionization-energy coverage', () => {
  // Every metal of the cation list needs its stages up to the charge it carries.
  const needed: Record<string, number> = {
    H: 1, Li: 1, Na: 1, K: 1, Rb: 1, Cs: 1, Ag: 1, Cu: 2, Tl: 1, Be: 2, Mg: 2, Ca: 2, Sr: 2, Ba: 2, Mn: 2, Fe: 3,
    Co: 3, Ni: 2, Zn: 2, Cd: 2, Hg: 2, Pb: 2, Sn: 2, Al: 3, Cr: 3, Sc: 3, Y: 3, La: 3, Ce: 3, Ga: 3, In: 3, Ti: 4,
  };
  it('has every stage the cation list needs, increasing with stage', () => {
    const missing: string[] = [];
    for (const [el, top] of Object.entries(needed)) {
      for (let s = 1; s <= top; s++) {
        if (!ie.has(`${el}|${s}`)) missing.push(`${el}|${s}`);
        else if (s > 1) expect(value(ie, `${el}|${s}`), `${el} stage ${s}`).toBeGreaterThan(value(ie, `${el}|${s - 1}`));
      }
    }
    expect(missing).toEqual([]);
  });
});
