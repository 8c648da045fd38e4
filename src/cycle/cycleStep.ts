/**
 * One step of a thermochemical cycle, as a caller draws or tabulates it.
 *
 * @module
 */

/** What a step does. */
export type CycleStepKind =
  | 'atomization'
  | 'ionization'
  | 'electron-attachment'
  | 'electron-enthalpy'
  | 'ion-formation'
  | 'lattice'
  | 'formation';

/**
 * One step of a Born–Haber cycle: its enthalpy change in the direction
 * elements → gaseous atoms → gaseous ions → crystal (so the lattice step
 * carries −ΔH_L), per formula unit, at 298.15 K.
 */
export interface CycleStep {
  kind: CycleStepKind;
  /** What the step is, in words: `first ionization energy of Na`. */
  label: string;
  /** The change as an equation: `Na(g) → Na⁺(g) + e⁻`. */
  equation: string;
  /** ΔH of the step per formula unit, kJ/mol. */
  value: number;
  /** Standard uncertainty of `value`, kJ/mol. */
  u: number;
  /** Source key of `data/sources.json` (or `solved` for the step the cycle solved for). */
  source: string;
  /** The full citation of `source` (from `data/sources.json`), for legends and reports; absent for a solved or given value. */
  reference?: string;
  /** True where the number behind the step was entered from memory. */
  fromMemory: boolean;
  /** Times the step occurs per formula unit (already included in `value`). */
  count: number;
  /** True for the one step the cycle was solved for. */
  solved: boolean;
}
