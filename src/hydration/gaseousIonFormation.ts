/**
 * Standard enthalpies of formation of gaseous ions, on the electron
 * convention of the NBS tables: the tabulated value where there is one, else
 * for a monatomic ion the cycle through the gaseous atom.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import { builtinDataset } from '../data/builtin.js';
import { findIon } from '../chem/ionIndex.js';
import { RT_STANDARD } from '../quantity/constants.js';
import { makeEstimate, type Estimate } from '../quantity/estimate.js';
import { exactSum, type Term } from '../quantity/exactSum.js';
import { quadrature } from '../quantity/propagate.js';

/** The enthalpy a free electron carries at 298.15 K on the electron convention, 5/2·RT, kJ/mol. */
const ELECTRON_THERMAL_ENTHALPY = 2.5 * RT_STANDARD;

interface Indexes {
  gas: ReadonlyMap<string, { value: number; u: number; source: string; fromMemory: boolean }>;
  atomization: ReadonlyMap<string, { value: number; u: number; source: string; fromMemory: boolean }>;
  ionization: ReadonlyMap<string, { value: number; u: number; source: string; fromMemory: boolean }>;
  affinity: ReadonlyMap<string, { value: number; u: number; source: string; fromMemory: boolean }>;
}

function indexes(dataset: Dataset): Indexes {
  return dataset.memo('hydration.gaseousIonIndexes', () => {
    const pick = <R extends { value: number; uncertainty: number | null; source: string; fromMemory: boolean }>(
      name: 'ion-formation-gas.json' | 'atomization-enthalpies.json' | 'ionization-energies.json' | 'electron-affinities.json',
      records: readonly R[],
      key: (r: R) => string,
    ) => new Map(records.map((r) => [key(r), { value: r.value, u: dataset.uncertaintyOf(name, r) ?? 0, source: r.source, fromMemory: r.fromMemory }]));
    return {
      gas: pick('ion-formation-gas.json', dataset.records('ion-formation-gas.json'), (r) => r.ion),
      atomization: pick('atomization-enthalpies.json', dataset.records('atomization-enthalpies.json'), (r) => r.element),
      ionization: pick('ionization-energies.json', dataset.records('ionization-energies.json'), (r) => `${r.element}|${r.stage}`),
      affinity: pick('electron-affinities.json', dataset.records('electron-affinities.json'), (r) => r.element),
    };
  });
}

/**
 * ΔfH°(ion, g) at 298.15 K on the electron convention, kJ/mol.
 *
 * The tabulated value (`ion-formation-gas.json`) where there is one;
 * otherwise, for a monatomic ion, the cycle through the gaseous atom:
 *
 *   cation Mᶻ⁺: ΔfH°(M, g) + Σₖ₌₁..z IEₖ + z·(5/2)RT
 *   anion X⁻:   ΔfH°(X, g) − EA(X) − (5/2)RT
 *
 * (ionization energies and electron affinities are 0 K energies; the 5/2 RT
 * per electron is the enthalpy the free electron carries at 298.15 K on the
 * electron convention). Polyatomic ions and multiply charged anions have no
 * such cycle and are undefined unless tabulated.
 *
 * @param ion - an ion id, e.g. `Mn[2+]`
 * @param dataset - ion-formation-gas.json, atomization enthalpies, ionization energies and electron affinities (default: built-in)
 * @returns kJ/mol; basis `measured` (tabulated) or `cycle` (atom + ionization); undefined when neither is possible
 * @see Wagman et al. 1982, the NBS tables (J. Phys. Chem. Ref. Data 11, Suppl. 2), for the convention and the tabulated ions
 * @example
 * ```ts
 * gaseousIonFormationEnthalpy('Na[+]')?.value; // 609.358 (NBS)
 * // Mn: 280.7 + 717.3 + 1509.0 + 2·6.197 = 2519.4 kJ/mol
 * gaseousIonFormationEnthalpy('Mn[2+]')?.value; // ≈ 2519.4
 * ```
 */
export function gaseousIonFormationEnthalpy(ion: string, dataset: Dataset = builtinDataset()): Estimate | undefined {
  const idx = indexes(dataset);
  const tabulated = idx.gas.get(ion);
  if (tabulated) {
    return makeEstimate({
      quantity: 'enthalpy of formation of the gaseous ion',
      value: tabulated.value,
      u: tabulated.u,
      unit: 'kJ/mol',
      basis: 'measured',
      method: 'table',
      sources: [tabulated.source],
      notes: tabulated.fromMemory ? ['tabulated value entered from memory, not checked against the source'] : [],
    });
  }
  const record = findIon(ion, dataset);
  if (!record || record.kind !== 'monatomic') return undefined;
  const element = Object.keys(record.composition)[0]!;
  const atom = idx.atomization.get(element);
  if (!atom) return undefined;
  const terms: Term[] = [{ coefficient: 1, value: atom.value }];
  const us = [atom.u];
  const sources = [atom.source];
  let memory = atom.fromMemory;
  if (record.charge > 0) {
    for (let stage = 1; stage <= record.charge; stage++) {
      const ie = idx.ionization.get(`${element}|${stage}`);
      if (!ie) return undefined;
      terms.push({ coefficient: 1, value: ie.value });
      us.push(ie.u);
      sources.push(ie.source);
      memory ||= ie.fromMemory;
    }
  } else if (record.charge === -1) {
    const ea = idx.affinity.get(element);
    if (!ea) return undefined;
    terms.push({ coefficient: -1, value: ea.value });
    us.push(ea.u);
    sources.push(ea.source);
    memory ||= ea.fromMemory;
  } else {
    return undefined;
  }
  return makeEstimate({
    quantity: 'enthalpy of formation of the gaseous ion',
    value: exactSum(terms) + record.charge * ELECTRON_THERMAL_ENTHALPY,
    u: quadrature(...us),
    unit: 'kJ/mol',
    basis: 'cycle',
    method: record.charge > 0 ? 'atomization-ionization' : 'atomization-electron-affinity',
    sources,
    notes: [
      `formed from the gaseous atom (electron convention, ${record.charge > 0 ? '+' : ''}${record.charge}·5/2 RT); no tabulated ΔfH°(${ion}, g)`,
      ...(memory ? ['inputs entered from memory, not checked against the source'] : []),
    ],
  });
}
