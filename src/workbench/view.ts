/**
 * What a panel shows, as plain data the worker sends to the page: every
 * number already written (rounded by its uncertainty, true minus signs) and
 * tagged with the path of the library result it came from, so that the page
 * only lays it out and a test can check each number against the library.
 *
 * @module
 */
import type { Estimate } from '../quantity/estimate.js';
import { formatEstimate } from '../quantity/formatEstimate.js';
import { formatNumber } from '../notation/minus.js';
import type { Caution } from '../quantity/caution.js';

/** One number as shown, and where it comes from in the result (`best.value`, `dissolved.0.dissolvedMass`). */
export interface ShownNumber {
  text: string;
  path: string;
  /** Shown without its sign (words beside it say which way the heat goes). */
  magnitude?: boolean;
}

/** A labelled quantity: a value, optionally ± u and a 95 % interval, with its unit. */
export interface Quantity {
  label: string;
  value: ShownNumber;
  u?: ShownNumber;
  low?: ShownNumber;
  high?: ShownNumber;
  unit: string;
  /** Words after the number (`cools`, `your value`). */
  words?: string;
  /** Quantities with `strong` are the panel's answer, shown large. */
  strong?: boolean;
}

/** A table cell: text, or a number with its path. */
export type Cell = string | ShownNumber;

export interface Table {
  caption: string;
  header: string[];
  rows: Cell[][];
  /** Columns whose cells are numbers (right-aligned). */
  numeric: number[];
}

export interface Chart {
  title: string;
  svg: string;
}

/** A whole panel's result. */
export interface PanelView {
  heading: string;
  /** Said first, in a box above everything, in the result's own order: cautions a person must not miss. */
  cautions: Pick<Caution, 'severity' | 'text'>[];
  /** Sentences shown under the heading (a verdict, the basis, a hypothetical hydrate). */
  lines: string[];
  quantities: Quantity[];
  tables: Table[];
  charts: Chart[];
  notes: string[];
}

/** An estimate as shown: value, ± u, and its 95 % interval, each number tagged with `path`. */
export function estimateQuantity(label: string, e: Pick<Estimate, 'value' | 'u' | 'low' | 'high'>, path: string, unit: string, options: { signed?: boolean; words?: string; strong?: boolean } = {}): Quantity {
  const f = formatEstimate(e, { signed: options.signed === true });
  return {
    label,
    value: { text: f.value, path: `${path}.value` },
    u: { text: f.u, path: `${path}.u` },
    low: { text: f.low, path: `${path}.low` },
    high: { text: f.high, path: `${path}.high` },
    unit,
    ...(options.words ? { words: options.words } : {}),
    ...(options.strong ? { strong: true } : {}),
  };
}

/** A plain number shown to `digits` decimals. */
export function shown(x: number, path: string, digits: number): ShownNumber {
  return { text: formatNumber(x, { digits }), path };
}

/** A quantity without an uncertainty. */
export function plainQuantity(label: string, x: number, path: string, digits: number, unit: string, words?: string): Quantity {
  return { label, value: shown(x, path, digits), unit, ...(words ? { words } : {}) };
}

/** An empty panel view, to fill in. */
export function panelView(heading: string): PanelView {
  return { heading, cautions: [], lines: [], quantities: [], tables: [], charts: [], notes: [] };
}
