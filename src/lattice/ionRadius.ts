/**
 * Choosing the radius of an ion for a lattice estimate.
 *
 * @module
 */
import type { LatticeIon } from './latticeIons.js';

/** The radius chosen for an ion, with where it came from. */
export interface ChosenRadius {
  /** Radius, Å. */
  value: number;
  /** Standard uncertainty, Å. */
  u: number;
  scale: 'shannon' | 'thermochemical';
  /** Coordination number of the Shannon radius used (undefined for a thermochemical radius). */
  cn: number | undefined;
  source: string;
  fromMemory: boolean;
  /** Set when the radius is not at the coordination number asked for. */
  substituted: boolean;
}

/** The Shannon radius at `cn`, or at the nearest tabulated coordination number (high spin where both are given). */
function shannonAt(ion: LatticeIon, cn: number): ChosenRadius | undefined {
  let best: (typeof ion.shannon)[number] | undefined;
  let bestGap = Infinity;
  for (const entry of ion.shannon) {
    const gap = Math.abs(entry.cn - cn);
    // Strictly nearer wins; at equal distance the lower coordination number (entries are sorted) and high spin stay.
    if (gap < bestGap) {
      best = entry;
      bestGap = gap;
    }
  }
  if (!best) return undefined;
  return { value: best.value, u: best.u, scale: 'shannon', cn: best.cn, source: best.source, fromMemory: best.fromMemory, substituted: best.cn !== cn };
}

/**
 * The radius of an ion for the Kapustinskii equation or a radius sum:
 * a monatomic ion takes its Shannon effective ionic radius at the
 * coordination number asked for (or the nearest one tabulated, flagged as
 * substituted), else a thermochemical radius; a polyatomic ion takes its
 * thermochemical radius (Roobottom et al. 1999), else a Shannon radius
 * where Shannon lists the ion (NH₄⁺, OH⁻).
 *
 * @param ion - the ion, from {@link latticeIons}
 * @param cn - coordination number wanted
 * @returns the radius in Å, or undefined when no table has one
 */
export function ionRadius(ion: LatticeIon, cn: number): ChosenRadius | undefined {
  if (ion.kind === 'monatomic') return shannonAt(ion, cn) ?? thermochemical(ion);
  return thermochemical(ion) ?? shannonAt(ion, cn);
}

function thermochemical(ion: LatticeIon): ChosenRadius | undefined {
  const t = ion.thermochemicalRadius;
  return t ? { value: t.value, u: t.u, scale: 'thermochemical', cn: undefined, source: t.source, fromMemory: t.fromMemory, substituted: false } : undefined;
}
