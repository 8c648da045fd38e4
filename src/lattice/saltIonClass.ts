/**
 * The ion class of a salt, by which the anchored floors are calibrated and
 * the validation is broken down: what sort of bonding its ions bring, which
 * decides how far the ionic lattice models can be trusted for it.
 *
 * @module
 */
import type { Dataset } from '../data/dataset.js';
import type { Salt } from '../chem/salt.js';

/**
 * - `covalent-prone`: a cation with a d¹⁰ or d¹⁰s² core (Cu⁺, Ag⁺, Zn²⁺, Cd²⁺,
 *   Hg²⁺, Tl⁺, Sn²⁺, Pb²⁺, Ga³⁺, In³⁺): highly polarizing and polarizable, its
 *   lattices carry a covalent excess the ionic models miss;
 * - `transition metal`: any other cation without a noble-gas core (an open d
 *   or f shell: Mn²⁺, Fe²⁺, Co²⁺, Ni²⁺, Cu²⁺, Fe³⁺, Ce³⁺);
 * - `ammonium`: a polyatomic cation (NH₄⁺, N(CH₃)₄⁺), hydrogen-bonded or shaped;
 * - `polyatomic anion`: noble-gas-core cations with an oxoanion or another
 *   polyatomic anion (NO₃⁻, SO₄²⁻, CN⁻, CH₃COO⁻ …);
 * - `monatomic`: noble-gas-core cations with monatomic anions (the alkali and
 *   alkaline-earth halides, oxides, sulfides).
 *
 * A salt takes the first class that applies, in this order.
 */
export type SaltIonClass = 'covalent-prone' | 'transition metal' | 'ammonium' | 'polyatomic anion' | 'monatomic';

/** Every class, in the order a salt is tried against them. */
export const saltIonClasses: readonly SaltIonClass[] = ['covalent-prone', 'transition metal', 'ammonium', 'polyatomic anion', 'monatomic'];

const NOBLE_GAS_CORE = new Set([2, 10, 18, 36, 54, 86]);
/** Electrons left on a cation with a d¹⁰ core (Cu⁺, Ag⁺, Hg²⁺ …) or a d¹⁰s² core (Tl⁺, Sn²⁺, Pb²⁺ …). */
const D10_CORE = new Set([28, 46, 78, 30, 48, 80]);

type CationClass = 'noble-gas' | 'covalent-prone' | 'transition metal' | 'ammonium';

function cationClasses(dataset: Dataset): ReadonlyMap<string, CationClass> {
  return dataset.memo('lattice.cationClasses', () => {
    const z = new Map(dataset.records('elements.json').map((e) => [e.symbol, e.z]));
    const out = new Map<string, CationClass>();
    for (const ion of dataset.records('ions.json')) {
      if (ion.charge <= 0) continue;
      const symbols = Object.keys(ion.composition);
      if (ion.kind !== 'monatomic' || symbols.length !== 1) {
        out.set(ion.id, 'ammonium');
        continue;
      }
      const electrons = (z.get(symbols[0]!) ?? 0) - ion.charge;
      out.set(ion.id, NOBLE_GAS_CORE.has(electrons) ? 'noble-gas' : D10_CORE.has(electrons) ? 'covalent-prone' : 'transition metal');
    }
    return out;
  });
}

/**
 * The class of a salt's ions (see {@link SaltIonClass}); water of
 * crystallization is ignored.
 *
 * @param salt - an ionic salt
 * @param dataset - the ion and element tables
 */
export function saltIonClass(salt: Salt, dataset: Dataset): SaltIonClass {
  const cations = cationClasses(dataset);
  const ions = dataset.index('ions.json');
  const found = new Set<string>();
  for (const i of salt.ions) {
    if (i.charge > 0) found.add(cations.get(i.ion) ?? 'noble-gas');
    else if (i.charge < 0 && ions.get(i.ion)?.kind !== 'monatomic') found.add('polyatomic anion');
  }
  return saltIonClasses.find((c) => found.has(c)) ?? 'monatomic';
}
