/**
 * The Born–Haber cycle as an energy-level diagram (standalone SVG).
 *
 * @module
 */
import { drawChecked } from './chartInput.js';
import type { BornHaberCycle } from '../cycle/bornHaberCycle.js';
import type { CycleStep } from '../cycle/cycleStep.js';
import { el, linearScale, niceTicks, num, svgDocument, text, tickLabel } from './svg.js';
import { palette } from './palette.js';

/** Options of {@link cycleDiagram}. */
export interface CycleDiagramOptions {
  /** Width of the drawing, px (default 960). */
  width?: number;
}

const SUBSCRIPTS = '₀₁₂₃₄₅₆₇₈₉';
/** A formula with subscript digits (CaCl2 → CaCl₂), hydrate counts aside. */
const pretty = (formula: string): string => [...formula].map((c) => (c >= '0' && c <= '9' ? SUBSCRIPTS[Number(c)] : c)).join('');

const CIRCLED = '①②③④⑤⑥⑦⑧⑨⑩⑪⑫⑬⑭⑮⑯⑰⑱⑲⑳';
const mark = (i: number): string => CIRCLED[i] ?? `(${i + 1})`;

function signed(x: number, digits = 1): string {
  const s = Math.abs(x).toFixed(digits);
  return x > 0 ? `+${s}` : x < 0 ? `−${s}` : s;
}

function roundedU(u: number): string {
  if (!(u > 0)) return '0';
  const digits = Math.max(0, 1 - Math.floor(Math.log10(u)));
  return u.toFixed(Math.min(digits, 3));
}

/** A vertical arrow from y0 to y1 with its head at y1. */
function arrow(x: number, y0: number, y1: number, colour: string, dashed: boolean): string {
  const up = y1 < y0;
  const head = Math.min(9, Math.abs(y1 - y0) * 0.45);
  const tip = y1;
  const base = up ? tip + head : tip - head;
  return (
    el('line', { x1: x, y1: y0, x2: x, y2: base, stroke: colour, 'stroke-width': 2.2, 'stroke-dasharray': dashed ? '6 4' : undefined }) +
    el('path', { d: `M${num(x - 5)} ${num(base)} L${num(x + 5)} ${num(base)} L${num(x)} ${num(tip)} Z`, fill: colour })
  );
}

/**
 * Draws a solved Born–Haber cycle as an energy-level diagram: enthalpy
 * (kJ/mol, relative to the elements in their standard states) upwards;
 * one numbered arrow per step, pointing up for an endothermic step and
 * down for an exothermic one, with its value beside it; the level of the
 * gaseous ions and of the crystal marked; the lattice step and the
 * formation step side by side at the right; and a numbered key below the
 * plot with each step's equation, value ± standard uncertainty and source.
 * The step solved for is drawn dashed.
 *
 * @param cycle - from {@link bornHaberCycle}; enthalpies in kJ/mol
 * @param options - `width` of the drawing, px (default 960)
 * @returns a standalone SVG document
 * @see W3C, Scalable Vector Graphics (SVG) 1.1 (Second Edition), W3C Recommendation, 16 August 2011, for the output format; the
 *   steps' values and sources come from the cycle (`wagman1982`, `cox1989`, `crcIonization`, `crcElectronAffinity`…).
 *
 * @example
 * ```ts
 * const svg = cycleDiagram(bornHaberCycle('NaCl'));
 * svg.startsWith('<svg'); // true
 * svg.includes('Born–Haber cycle of NaCl'); // true
 * svg.includes('kJ/mol'); // true
 * ```
 */
export function cycleDiagram(cycle: BornHaberCycle, options?: CycleDiagramOptions): string {
  return drawChecked(cycle, options, 'cycle', 'bornHaberCycle', draw);
}

function draw(cycle: BornHaberCycle, options: CycleDiagramOptions): string {
  const width = options.width ?? 960;
  const path = cycle.steps.filter((s) => s.kind !== 'formation' && s.kind !== 'lattice');
  const lattice = cycle.steps.find((s) => s.kind === 'lattice');
  const formation = cycle.steps.find((s) => s.kind === 'formation');
  const ordered: CycleStep[] = [...path, ...(lattice ? [lattice] : []), ...(formation ? [formation] : [])];

  // Levels: 0 for the elements, then the running sum along the path.
  const levels = [0];
  for (const s of path) levels.push(levels[levels.length - 1]! + s.value);
  const ions = levels[levels.length - 1]!;
  const crystal = formation ? formation.value : ions + (lattice?.value ?? 0);
  const all = [...levels, crystal];
  const { ticks, domain } = niceTicks(Math.min(...all), Math.max(...all), 7);

  const top = 78;
  const plotHeight = 400;
  const left = 92;
  const right = width - 150;
  const y = linearScale(domain, [top + plotHeight, top]);
  const columns = ordered.length;
  const colW = (right - left) / Math.max(columns, 1);
  const cx = (k: number) => left + (k + 0.5) * colW;
  const body: string[] = [];

  const result = cycle.result;
  const what = { lattice: 'the lattice enthalpy', formation: 'the enthalpy of formation', 'electron-affinity': 'the electron affinity' }[cycle.solve];
  body.push(text(24, 30, `Born–Haber cycle of ${pretty(cycle.formula)}`, { class: 'heading' }));
  body.push(
    text(24, 50, `solved for ${what}: ${signed(result.value).replace('+', '')} ± ${roundedU(result.u)} kJ/mol (95 % interval ${signed(result.low).replace('+', '')} to ${signed(result.high).replace('+', '')}); 298.15 K, enthalpies relative to the elements`, {
      class: 'label muted',
    }),
  );

  // Axis with ticks and grid.
  for (const t of ticks) {
    const yy = y(t);
    body.push(el('line', { x1: left, y1: yy, x2: right, y2: yy, stroke: palette.grid, 'stroke-width': 1 }));
    body.push(text(left - 8, yy + 4, tickLabel(t), { class: 'small muted', 'text-anchor': 'end' }));
  }
  body.push(el('line', { x1: left, y1: top, x2: left, y2: top + plotHeight, stroke: palette.muted, 'stroke-width': 1 }));
  const axisX = 22;
  const axisY = top + plotHeight / 2;
  body.push(text(axisX, axisY, 'enthalpy, kJ/mol', { class: 'small muted', 'text-anchor': 'middle', transform: `rotate(-90 ${num(axisX)} ${num(axisY)})` }));

  const levelLine = (x1: number, x2: number, value: number, strong = false) =>
    el('line', { x1, y1: y(value), x2, y2: y(value), stroke: palette.ink, 'stroke-width': strong ? 2 : 1.2, 'stroke-linecap': 'round' });

  // Elements level (0) across to the first arrow, and across to the formation arrow.
  body.push(levelLine(left, cx(0) + colW * 0.35, 0, true));
  // Each path step: arrow in its column, level line on to the next column.
  ordered.forEach((s, k) => {
    let from: number;
    let to: number;
    if (s.kind === 'formation') {
      from = 0;
      to = crystal;
    } else if (s.kind === 'lattice') {
      from = ions;
      to = crystal;
    } else {
      from = levels[k]!;
      to = levels[k + 1]!;
    }
    const x = cx(k);
    const colour = s.solved ? palette.solved : s.value > 0 ? palette.cold : s.value < 0 ? palette.hot : palette.neutral;
    if (Math.abs(y(to) - y(from)) >= 1) body.push(arrow(x, y(from), y(to), colour, s.solved));
    else body.push(el('circle', { cx: x, cy: y(to), r: 3, fill: colour }));
    // Beside the arrow's middle, or above a short arrow so that the label does not cross the levels.
    const short = Math.abs(y(to) - y(from)) < 34;
    const mid = short ? Math.min(y(from), y(to)) - 20 : (y(from) + y(to)) / 2;
    body.push(text(x + 8, mid - 2, mark(k), { class: 'label', fill: colour }));
    body.push(text(x + 8, mid + 12, signed(s.value), { class: 'small', fill: colour }));
    if (s.kind !== 'formation' && s.kind !== 'lattice') {
      const nextX = k + 1 < path.length ? cx(k + 1) : cx(k + 1) + colW * 0.35;
      body.push(levelLine(x - colW * 0.35, nextX, to));
    }
  });
  // Gaseous ions, crystal and the formation path back to the elements.
  if (lattice) {
    const k = path.length;
    body.push(levelLine(cx(k) - colW * 0.35, cx(k) + colW * 0.35, ions, true));
    body.push(text(right + 8, y(ions) + 4, 'gaseous ions', { class: 'small' }));
  }
  const lastX = cx(columns - 1) + colW * 0.35;
  body.push(levelLine(cx(Math.max(path.length, 0)) - colW * 0.35, lastX, crystal, true));
  body.push(text(right + 8, y(crystal) + 4, `${pretty(cycle.formula)}(s)`, { class: 'small' }));
  if (formation) {
    body.push(el('line', { x1: cx(0) + colW * 0.35, y1: y(0), x2: lastX, y2: y(0), stroke: palette.ink, 'stroke-width': 1.2, 'stroke-dasharray': '2 3' }));
    body.push(text(right + 8, y(0) + 4, 'elements', { class: 'small' }));
  }

  // Key: arrows' colours, then one line per step.
  let ky = top + plotHeight + 34;
  const key = [
    el('line', { x1: 24, y1: ky - 4, x2: 44, y2: ky - 4, stroke: palette.cold, 'stroke-width': 2.2 }),
    text(50, ky, 'up: endothermic (heat taken in)', { class: 'small' }),
    el('line', { x1: 250, y1: ky - 4, x2: 270, y2: ky - 4, stroke: palette.hot, 'stroke-width': 2.2 }),
    text(276, ky, 'down: exothermic (heat given out)', { class: 'small' }),
    el('line', { x1: 490, y1: ky - 4, x2: 510, y2: ky - 4, stroke: palette.solved, 'stroke-width': 2.2, 'stroke-dasharray': '6 4' }),
    text(516, ky, 'the step solved for', { class: 'small' }),
  ];
  body.push(...key);
  ky += 22;
  ordered.forEach((s, k) => {
    const value = `${signed(s.value)} ± ${roundedU(s.u)} kJ/mol`;
    body.push(text(24, ky, `${mark(k)} ${s.label}`, { class: 'small' }));
    body.push(text(Math.min(430, width * 0.45), ky, s.equation, { class: 'small muted' }));
    body.push(text(width - 24, ky, `${value}  [${s.solved ? 'solved' : s.source}]`, { class: 'small', 'text-anchor': 'end' }));
    ky += 17;
  });
  const height = ky + 14;
  const description = ordered.map((s, k) => `${k + 1}. ${s.label}: ${signed(s.value)} kJ/mol`).join('; ');
  return svgDocument(width, height, `Born–Haber cycle of ${cycle.formula}`, body, description);
}
