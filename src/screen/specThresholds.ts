/**
 * The numbers a specification holds the ranked quantity to, for drawing:
 * `fill.finalTemperature.value < 5` on a fill-temperature screen gives a
 * threshold at 5 °C. Only plain comparisons of the objective's own field
 * (or `objective.value`, `.low`, `.high`) with a number count.
 *
 * @module
 */
import { parseSpec, type SpecNode } from './specParse.js';
import type { ObjectiveName } from './screenRow.js';

/** The field paths (dotted, numbers as they stand) that hold each objective in a row. */
const OBJECTIVE_FIELDS: Record<ObjectiveName, readonly string[]> = {
  enthalpy: ['best'],
  'heat-per-gram': ['perGram.salt'],
  'fill-temperature': ['fill.finalTemperature'],
  'cost-per-kj': ['costPerKJ'],
  'plateau-temperature': ['warmer.plateau'],
  'warmer-heat-per-gram': ['warmer.heatPerGram'],
  'plateau-duration': ['warmer.plateauDuration'],
};

/** One threshold: where, and the comparison as the spec wrote it. */
export interface SpecThreshold {
  at: number;
  label: string;
}

function fieldOfObjective(node: SpecNode, objective: ObjectiveName): string | undefined {
  if (node.kind !== 'field') return undefined;
  const path = node.path.join('.');
  const roots = ['objective', ...OBJECTIVE_FIELDS[objective]];
  return roots.some((r) => path === r || path === `${r}.value` || path === `${r}.low` || path === `${r}.high`) ? path : undefined;
}

function numberOf(node: SpecNode): number | undefined {
  if (node.kind === 'number') return node.value;
  if (node.kind === 'negate' && node.operand.kind === 'number') return -node.operand.value;
  return undefined;
}

/**
 * The thresholds `spec` sets on `objective`, in the objective's unit; none
 * when the spec is absent, cannot be read, or says nothing about it.
 */
export function specThresholds(spec: string | null | undefined, objective: ObjectiveName): SpecThreshold[] {
  if (!spec) return [];
  let tree: SpecNode;
  try {
    tree = parseSpec(spec);
  } catch {
    return [];
  }
  const out: SpecThreshold[] = [];
  const walk = (n: SpecNode): void => {
    if (n.kind === 'logic') {
      walk(n.left);
      walk(n.right);
    } else if (n.kind === 'not') walk(n.operand);
    else if (n.kind === 'compare') {
      const field = fieldOfObjective(n.left, objective) ?? fieldOfObjective(n.right, objective);
      const at = numberOf(n.right) ?? numberOf(n.left);
      if (field !== undefined && at !== undefined && Number.isFinite(at)) out.push({ at, label: `spec: ${spec.slice(n.start, n.end)}` });
    }
  };
  walk(tree);
  return out;
}
