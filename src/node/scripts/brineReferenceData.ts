/**
 * The published brine data the brine module is checked against, read from
 * their reference copies under tests/reference/ (used by
 * `npm run validate:brine` and by tests/brine/): freezing points of the CRC
 * table of concentrative properties, and Laliberté's (2009) model of the
 * heat capacity of aqueous solutions. Importing this module runs nothing.
 *
 * @module
 */
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const referenceDir = join(dirname(fileURLToPath(import.meta.url)), '../../../tests/reference');

/** One salt's Laliberté heat-capacity parameters. */
export interface LaliberteSalt {
  name: string;
  /** g/mol. */
  molarMass: number;
  /** a1…a6. */
  a: number[];
  /** °C. */
  minT: number;
  maxT: number;
  /** Highest solute mass fraction of the fitted data. */
  maxW: number;
  points: number;
}

/** Laliberté's parameters by formula (tests/reference/brine-laliberte-heat-capacity.json). */
export function laliberteSalts(): Record<string, LaliberteSalt> {
  return (JSON.parse(readFileSync(join(referenceDir, 'brine-laliberte-heat-capacity.json'), 'utf8')) as { salts: Record<string, LaliberteSalt> }).salts;
}

/** CRC freezing-point depressions (K) by solute (tests/reference/brine-crc-freezing-points.json). */
export function crcFreezingPoints(): Record<string, { m: number; depression: number }[]> {
  return (JSON.parse(readFileSync(join(referenceDir, 'brine-crc-freezing-points.json'), 'utf8')) as { solutes: Record<string, { m: number; depression: number }[]> }).solutes;
}

/**
 * Laliberté's apparent specific heat capacity of a solute, J/(g·K):
 * cp,app = a1·exp(α) + a5·w^a6, α = a2·t + a3·exp(0.01·t) + a4·w, with t in °C
 * and w the solute's mass fraction (Laliberté 2009, `laliberte2009`).
 */
export function laliberteApparentSpecificHeat(s: LaliberteSalt, t: number, w: number): number {
  const [a1, a2, a3, a4, a5, a6] = s.a as [number, number, number, number, number, number];
  return a1 * Math.exp(a2 * t + a3 * Math.exp(0.01 * t) + a4 * w) + a5 * w ** a6;
}

/**
 * Laliberté's apparent molar heat capacity φCp, J/(mol·K), at molality m (mol/kg) and t (°C), with w and a
 * standard uncertainty: 0.2 % of the solution's heat capacity (an assumed allowance for the fit of the solution's
 * specific heat) carried over to m moles in (1000 + m·M) g.
 */
export function laliberteMolarHeatCapacity(s: LaliberteSalt, m: number, t = 25): { value: number; w: number; u: number } {
  const w = (m * s.molarMass) / (1000 + m * s.molarMass);
  const cpApp = laliberteApparentSpecificHeat(s, t, w);
  const cpSolution = (1 - w) * 4.18 + w * cpApp;
  return { value: cpApp * s.molarMass, w, u: (0.002 * cpSolution * (1000 + m * s.molarMass)) / m };
}
