/**
 * What the lattice estimators need to know about each ion, gathered once per
 * dataset: charge and kind, Shannon radii by coordination number, the
 * thermochemical radius, the ion volume, the Born exponent of its noble-gas
 * core, and its shape (for the lattice energy → enthalpy correction).
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { IonKind } from '../data/schemas.js';
import { ionText } from '../notation/charge.js';

/** A tabulated ion property with its provenance. */
export interface SourcedValue {
  value: number;
  /** Standard uncertainty (the record's own or its table's default; 0 when neither is stated). */
  u: number;
  source: string;
  fromMemory: boolean;
}

/** One Shannon radius: coordination number, spin state where it matters, value in Å. */
export interface ShannonEntry extends SourcedValue {
  cn: number;
  spin: 'high' | 'low' | undefined;
}

/**
 * The shape class of an ion, for the degrees of freedom in
 * ΔH_L = U + Σ nᵢ(sᵢ/2 − 2)RT: 3 for a monatomic ion, 5 for a linear
 * polyatomic ion, 6 for a non-linear one.
 */
export type IonShape = 'monatomic' | 'linear' | 'nonlinear';

export interface LatticeIon {
  id: string;
  /** The ion written for people: `NO₃⁻`. */
  text: string;
  formula: string;
  charge: number;
  kind: IonKind;
  /** Shannon radii sorted by coordination number (high spin before low at one CN). */
  shannon: readonly ShannonEntry[];
  /** Thermochemical radius, Å. */
  thermochemicalRadius: SourcedValue | undefined;
  /** Single-ion volume, nm³. */
  volume: SourcedValue | undefined;
  /** Pauling's Born exponent of the ion's noble-gas core. */
  bornExponent: SourcedValue | undefined;
  /** The noble-gas core named in ions.json. */
  bornCore: string | null;
  shape: IonShape;
}

/**
 * Polyatomic ions with a linear geometry (a fact of the trade from VSEPR:
 * every diatomic ion, and the triatomic azide, thiocyanate and cyanate).
 * Every other polyatomic ion of the list is non-linear.
 */
const LINEAR_TRIATOMIC = new Set(['N3[-]', 'SCN[-]', 'OCN[-]']);

function shapeOf(id: string, kind: IonKind, composition: Readonly<Record<string, number>>): IonShape {
  if (kind === 'monatomic') return 'monatomic';
  const atoms = Object.values(composition).reduce((a, b) => a + b, 0);
  if (atoms <= 2 || LINEAR_TRIATOMIC.has(id)) return 'linear';
  return 'nonlinear';
}

/** The lattice view of every ion of the dataset, by id; built once per dataset. */
export function latticeIons(dataset: Dataset): ReadonlyMap<string, LatticeIon> {
  return dataset.memo('lattice.ions', () => {
    const out = new Map<string, LatticeIon>();
    const born = new Map(dataset.records('born-exponents.json').map((r) => [r.core, r]));
    const shannon = new Map<string, ShannonEntry[]>();
    for (const r of dataset.records('shannon-radii.json')) {
      const list = shannon.get(r.ion) ?? [];
      list.push({ cn: r.coordination, spin: r.spin, value: r.value, u: dataset.uncertaintyOf('shannon-radii.json', r) ?? 0, source: r.source, fromMemory: r.fromMemory });
      shannon.set(r.ion, list);
    }
    const single = <N extends 'thermochemical-radii.json' | 'ion-volumes.json'>(name: N) =>
      new Map(
        dataset.records(name).map((r) => [r.ion, { value: r.value, u: dataset.uncertaintyOf(name, r) ?? 0, source: r.source, fromMemory: r.fromMemory } satisfies SourcedValue]),
      );
    const thermo = single('thermochemical-radii.json');
    const volumes = single('ion-volumes.json');
    for (const ion of dataset.records('ions.json')) {
      const radii = (shannon.get(ion.id) ?? []).sort((a, b) => a.cn - b.cn || (a.spin === 'low' ? 1 : 0) - (b.spin === 'low' ? 1 : 0));
      const b = ion.bornCore ? born.get(ion.bornCore) : undefined;
      out.set(ion.id, {
        id: ion.id,
        text: ionText(ion.id),
        formula: ion.formula,
        charge: ion.charge,
        kind: ion.kind,
        shannon: radii,
        thermochemicalRadius: thermo.get(ion.id),
        volume: volumes.get(ion.id),
        bornExponent: b ? { value: b.value, u: 0, source: b.source, fromMemory: b.fromMemory } : undefined,
        bornCore: ion.bornCore,
        shape: shapeOf(ion.id, ion.kind, ion.composition),
      });
    }
    return out;
  });
}
