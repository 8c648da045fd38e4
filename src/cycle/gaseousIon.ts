/**
 * The standard enthalpy of formation of a gaseous ion at 298.15 K, and the
 * steps that make it from the element in its standard state.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { exactSum } from '../quantity/exactSum.js';
import { quadrature } from '../quantity/propagate.js';
import type { CycleStep } from './cycleStep.js';
import { ionText } from '../notation/charge.js';
import { thermalElectronEnthalpy } from './thermalElectronEnthalpy.js';

/** A gaseous ion's formation enthalpy with the steps behind it. */
export interface GaseousIon {
  ion: string;
  charge: number;
  /** ΔfH°(ion, g, 298.15 K), kJ/mol, electron convention. */
  value: number;
  /** Standard uncertainty, kJ/mol (the steps' in quadrature). */
  u: number;
  /**
   * `elements`: atomization, ionization energies or electron affinities and
   * the thermal electron term; `table`: the tabulated ΔfH°(ion, g) as a
   * whole (polyatomic ions); `elements+table`: a doubly charged anion whose
   * second electron attachment is taken from the tabulated ion enthalpy.
   */
  route: 'elements' | 'elements+table' | 'table';
  /** Steps for one ion, excluding the thermal electron term (see `electronEnthalpy`). */
  steps: CycleStep[];
  /** The thermal electron term z·5/2·RT included in `value` (0 for the table route, which has it built in). */
  electronEnthalpy: number;
}

/** Elements whose standard state is the diatomic gas, so that atomization is ½D°(X₂) (common practice). */
const DIATOMIC_GASES = new Set(['H', 'N', 'O', 'F', 'Cl']);
/** Standard-state phase of the elements that are not crystalline at 25 °C and 1 bar (common practice). */
const LIQUID_ELEMENTS = new Set(['Br', 'Hg']);

const ORDINAL = ['first', 'second', 'third', 'fourth', 'fifth', 'sixth', 'seventh', 'eighth'];

function step(partial: Omit<CycleStep, 'count' | 'solved'>): CycleStep {
  return { ...partial, count: 1, solved: false };
}

function charged(symbol: string, z: number): string {
  return ionText(`${symbol}[${z === 0 ? '0' : `${Math.abs(z) === 1 ? '' : Math.abs(z)}${z > 0 ? '+' : '-'}`}]`);
}

/** The element steps of the dataset: atomization by element, ionization by `element|stage`, first electron attachment by element. */
export interface ElementSteps {
  atomization: ReadonlyMap<string, CycleStep>;
  ionization: ReadonlyMap<string, CycleStep>;
  affinity: ReadonlyMap<string, CycleStep>;
}

/** The element steps of a dataset (see {@link ElementSteps}), built once per dataset. */
export function elementSteps(dataset: Dataset = builtinDataset()): ElementSteps {
  return dataset.memo('cycle.elementSteps', () => {
    const bonds = new Map(dataset.records('bond-dissociation.json').map((r) => [r.molecule, r]));
    const atomization = new Map<string, CycleStep>();
    for (const r of dataset.records('atomization-enthalpies.json')) {
      const bond = DIATOMIC_GASES.has(r.element) ? bonds.get(`${r.element}2`) : undefined;
      if (bond) {
        const u = dataset.uncertaintyOf('bond-dissociation.json', bond) ?? 0;
        atomization.set(
          r.element,
          step({ kind: 'atomization', label: `½ bond dissociation of ${r.element}₂`, equation: `½${r.element}₂(g) → ${r.element}(g)`, value: exactSum([{ coefficient: 0.5, value: bond.value }]), u: u / 2, source: bond.source, fromMemory: bond.fromMemory }),
        );
        continue;
      }
      const phase = LIQUID_ELEMENTS.has(r.element) ? 'l' : 'cr';
      const diatomic = r.element === 'Br' || r.element === 'I';
      const from = diatomic ? `½${r.element}₂(${phase})` : `${r.element}(${phase})`;
      const label = diatomic || phase === 'l' ? `atomization of ${r.element}` : `sublimation of ${r.element}`;
      atomization.set(
        r.element,
        step({ kind: 'atomization', label, equation: `${from} → ${r.element}(g)`, value: r.value, u: dataset.uncertaintyOf('atomization-enthalpies.json', r) ?? 0, source: r.source, fromMemory: r.fromMemory }),
      );
    }
    const ionization = new Map<string, CycleStep>();
    for (const r of dataset.records('ionization-energies.json')) {
      ionization.set(
        `${r.element}|${r.stage}`,
        step({
          kind: 'ionization',
          label: `${ORDINAL[r.stage - 1]} ionization energy of ${r.element}`,
          equation: `${charged(r.element, r.stage - 1)}(g) → ${charged(r.element, r.stage)}(g) + e⁻`,
          value: r.value,
          u: dataset.uncertaintyOf('ionization-energies.json', r) ?? 0,
          source: r.source,
          fromMemory: r.fromMemory,
        }),
      );
    }
    const affinity = new Map<string, CycleStep>();
    for (const r of dataset.records('electron-affinities.json')) {
      affinity.set(
        r.element,
        step({
          kind: 'electron-attachment',
          label: `first electron affinity of ${r.element} (the step is −EA; EA = ${r.value} kJ/mol released)`,
          equation: `${r.element}(g) + e⁻ → ${charged(r.element, -1)}(g)`,
          value: -r.value,
          u: dataset.uncertaintyOf('electron-affinities.json', r) ?? 0,
          source: r.source,
          fromMemory: r.fromMemory,
        }),
      );
    }
    return { atomization, ionization, affinity };
  });
}

function sumOf(steps: readonly CycleStep[], electron: number): { value: number; u: number } {
  return { value: exactSum([...steps.map((s) => ({ coefficient: 1, value: s.value })), { coefficient: 1, value: electron }]), u: quadrature(...steps.map((s) => s.u)) };
}

function build(dataset: Dataset): ReadonlyMap<string, GaseousIon> {
  const { atomization, ionization, affinity } = elementSteps(dataset);
  const tabulated = new Map(dataset.records('ion-formation-gas.json').map((r) => [r.ion, r]));
  const out = new Map<string, GaseousIon>();
  for (const ion of dataset.records('ions.json')) {
    if (ion.kind === 'non-electrolyte' || ion.charge === 0) continue;
    const table = tabulated.get(ion.id);
    const tableStep = table
      ? step({ kind: 'ion-formation', label: `formation of gaseous ${ionText(ion.id)}`, equation: `elements → ${ionText(ion.id)}(g)`, value: table.value, u: dataset.uncertaintyOf('ion-formation-gas.json', table) ?? 0, source: table.source, fromMemory: table.fromMemory })
      : undefined;
    let found: GaseousIon | undefined;
    const symbols = Object.keys(ion.composition);
    if (ion.kind === 'monatomic' && symbols.length === 1 && ion.composition[symbols[0]!] === 1) {
      const el = symbols[0]!;
      const atom = atomization.get(el);
      const z = ion.charge;
      if (atom && z > 0) {
        const ies: CycleStep[] = [];
        for (let k = 1; k <= z; k++) {
          const ie = ionization.get(`${el}|${k}`);
          if (ie) ies.push(ie);
        }
        if (ies.length === z) {
          const steps = [atom, ...ies];
          const electron = thermalElectronEnthalpy(z);
          found = { ion: ion.id, charge: z, ...sumOf(steps, electron), route: 'elements', steps, electronEnthalpy: electron };
        }
      } else if (atom && z < 0) {
        const ea = affinity.get(el);
        if (ea && z === -1) {
          const electron = thermalElectronEnthalpy(-1);
          found = { ion: ion.id, charge: -1, ...sumOf([atom, ea], electron), route: 'elements', steps: [atom, ea], electronEnthalpy: electron };
        } else if (ea && z === -2 && table && tableStep) {
          // No second electron affinity is measurable (X²⁻ is unbound in the gas): take it as the balance of the tabulated ion enthalpy.
          const electron = thermalElectronEnthalpy(-2);
          const second = exactSum([
            { coefficient: 1, value: table.value },
            { coefficient: -1, value: atom.value },
            { coefficient: -1, value: ea.value },
            { coefficient: -1, value: electron },
          ]);
          const ea2 = step({
            kind: 'electron-attachment',
            label: `second electron affinity of ${el} (the step is −EA; from the tabulated ΔfH° of gaseous ${ionText(ion.id)})`,
            equation: `${charged(el, -1)}(g) + e⁻ → ${ionText(ion.id)}(g)`,
            value: second,
            u: tableStep.u,
            source: table.source,
            fromMemory: table.fromMemory,
          });
          const steps = [atom, ea, ea2];
          found = { ion: ion.id, charge: -2, value: table.value, u: quadrature(atom.u, ea.u, ea2.u), route: 'elements+table', steps, electronEnthalpy: electron };
        }
      }
    }
    if (!found && table && tableStep) found = { ion: ion.id, charge: ion.charge, value: table.value, u: tableStep.u, route: 'table', steps: [tableStep], electronEnthalpy: 0 };
    if (found) out.set(ion.id, found);
  }
  return out;
}

/**
 * ΔfH°(ion, g) at 298.15 K on the electron convention, with the steps that
 * make the ion from its element. A monatomic ion is built from its element
 * (atomization or ½D°(X₂), successive ionization energies or the first
 * electron affinity, and the thermal electron term of
 * {@link thermalElectronEnthalpy}); O²⁻, S²⁻ and Se²⁻ take the second
 * electron attachment as the balance of their tabulated ion enthalpy;
 * polyatomic ions (and monatomic ions whose element data are incomplete) use
 * the tabulated ΔfH°(ion, g) of ion-formation-gas.json.
 *
 * @param ion - ion id, `Na[+]`
 * @returns undefined when no route has the data
 * @see Wagman et al. 1982 (NBS tables); Cox et al. 1989 (CODATA); CRC ionization-energy and electron-affinity tables.
 * @example
 * ```ts
 * // Na(s) → Na(g) 107.5, IE 495.8, + 5/2 RT
 * gaseousIon('Na[+]')?.value; // 609.497
 * ```
 */
export function gaseousIon(ion: string, dataset: Dataset = builtinDataset()): GaseousIon | undefined {
  return dataset.memo('cycle.gaseousIons', () => build(dataset)).get(ion);
}
