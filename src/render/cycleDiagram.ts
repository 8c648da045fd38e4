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
import { formulaText } from '../notation/formula.js';
import { formatNumber } from '../notation/minus.js';
import { wrapText } from '../notation/wrapText.js';
import { LabelPlacer, textBox, textWidth } from './textBox.js';

/** Options of {@link cycleDiagram}. */
export interface CycleDiagramOptions {
  /** Width of the drawing, px (default 960). */
  width?: number;
}

const CIRCLED = '①②③④⑤⑥⑦⑧⑨⑩⑪⑫⑬⑭⑮⑯⑰⑱⑲⑳';
const mark = (i: number): string => CIRCLED[i] ?? `(${i + 1})`;

const signed = (x: number, digits = 1): string => formatNumber(x, { digits, plus: true });

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

  const top = 112;
  const plotHeight = 400;
  const left = 92;
  const right = width - 150;
  const y = linearScale(domain, [top + plotHeight, top]);
  const columns = ordered.length;
  const colW = (right - left) / Math.max(columns, 1);
  const cx = (k: number) => left + (k + 0.5) * colW;
  const body: string[] = [];

  const result = cycle.result;
  const solvedAt = ordered.findIndex((st) => st.solved);
  const step = solvedAt >= 0 ? ` the step drawn, ${mark(solvedAt)}, is ${signed(ordered[solvedAt]!.value)}` : '';
  const plain = (x: number) => formatNumber(x, { digits: 1 });
  const amount = `${plain(result.value)} ± ${roundedU(result.u)} kJ/mol (95 % interval ${plain(result.low)} to ${plain(result.high)})`;
  const what: [string, string] = {
    lattice: [`the lattice enthalpy: ΔH_L = ${amount}`, `ΔH_L is taken in to part the crystal into gaseous ions;${step} = −ΔH_L.`] as [string, string],
    formation: [`the enthalpy of formation: ΔfH° = ${amount}`, `From the elements in their standard states;${step}.`] as [string, string],
    'electron-affinity': [`the electron affinity: EA = ${amount}`, `EA is the energy released when the electron attaches;${step} = −EA.`] as [string, string],
  }[cycle.solve];
  body.push(text(24, 30, `Born–Haber cycle of ${formulaText(cycle.formula)}`, { class: 'heading' }));
  body.push(text(24, 50, `Solved for ${what[0]}`, { class: 'label muted' }));
  body.push(text(24, 66, what[1], { class: 'label muted' }));
  body.push(text(24, 82, 'Inputs: tabulated values at 298.15 K (references below); enthalpies relative to the elements in their standard states.', { class: 'label muted' }));

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

  // Labels of the level lines at the right, every level line and arrow, then each step's label where it is free.
  const placer = new LabelPlacer({ x0: left, y0: top - 14, x1: width - 4, y1: top + plotHeight + 12 });
  const levelLine = (x1: number, x2: number, value: number, strong = false) => {
    placer.reserve({ x0: Math.min(x1, x2), x1: Math.max(x1, x2), y0: y(value) - 1.5, y1: y(value) + 1.5 });
    return el('line', { x1, y1: y(value), x2, y2: y(value), stroke: palette.ink, 'stroke-width': strong ? 2 : 1.2, 'stroke-linecap': 'round' });
  };
  const levelLabels: [number, string][] = [[ions, 'gaseous ions'], [crystal, `${formulaText(cycle.formula)}(s)`], [0, 'elements']];
  for (const [value, words] of levelLabels) placer.reserve(textBox(right + 8, y(value) + 4, words, 11), 'label');

  // Elements level (0) across to the first arrow, and across to the formation arrow.
  body.push(levelLine(left, cx(0) + colW * 0.35, 0, true));
  // Each path step: arrow in its column, level line on to the next column.
  const labelsToPlace: { k: number; x: number; from: number; to: number; colour: string }[] = [];
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
    placer.reserve({ x0: x - 5, x1: x + 5, y0: Math.min(y(from), y(to)), y1: Math.max(y(from), y(to)) });
    labelsToPlace.push({ k, x, from, to, colour });
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
  body.push(text(right + 8, y(crystal) + 4, `${formulaText(cycle.formula)}(s)`, { class: 'small' }));
  if (formation) {
    body.push(el('line', { x1: cx(0) + colW * 0.35, y1: y(0), x2: lastX, y2: y(0), stroke: palette.ink, 'stroke-width': 1.2, 'stroke-dasharray': '2 3' }));
    body.push(text(right + 8, y(0) + 4, 'elements', { class: 'small' }));
  }

  if (formation) placer.reserve({ x0: cx(0) + colW * 0.35, x1: lastX, y0: y(0) - 1.5, y1: y(0) + 1.5 });
  for (const { k, x, from, to, colour } of labelsToPlace) {
    // Beside the arrow's middle, else above or below it, else to its left: the first place free of other labels.
    const label = `${mark(k)} ${signed(ordered[k]!.value)}`;
    const mid = (y(from) + y(to)) / 2 + 4;
    const upper = Math.min(y(from), y(to));
    const lower = Math.max(y(from), y(to));
    const spot = placer.place(label, 12, [
      { x: x + 8, y: mid },
      { x: x + 8, y: upper - 6 },
      { x: x - 8, y: mid, anchor: 'end' },
      { x: x + 8, y: lower + 16 },
      { x: x - 8, y: upper - 6, anchor: 'end' },
      { x: x + 8, y: upper - 22 },
      { x: x + 8, y: lower + 32 },
    ]);
    body.push(text(spot.x, spot.y, label, { class: 'label', fill: colour, ...(spot.anchor === 'end' ? { 'text-anchor': 'end' } : {}) }));
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
  // One line per step: label, equation, value and a numbered reference; a label too long for its column puts the
  // equation on a line of its own below it.
  const refs: string[] = [];
  const refOf = (st: CycleStep): string => {
    if (st.solved) return 'solved';
    if (!st.reference) return st.source;
    if (!refs.includes(st.reference)) refs.push(st.reference);
    return `ref. ${refs.indexOf(st.reference) + 1}`;
  };
  const eqX = Math.min(430, width * 0.45);
  ordered.forEach((st, k) => {
    const value = `${signed(st.value)} ± ${roundedU(st.u)} kJ/mol  [${refOf(st)}]`;
    const label = `${mark(k)} ${st.label}`;
    body.push(text(24, ky, label, { class: 'small' }));
    if (24 + textWidth(label, 11) > eqX - 8) ky += 15;
    body.push(text(eqX, ky, st.equation, { class: 'small muted' }));
    body.push(text(width - 24, ky, value, { class: 'small', 'text-anchor': 'end' }));
    ky += 17;
  });
  if (refs.length > 0) {
    ky += 6;
    body.push(text(24, ky, 'References', { class: 'small', 'font-weight': '600' }));
    ky += 16;
    const chars = Math.floor((width - 48) / (11 * 0.56));
    refs.forEach((r, i) => {
      for (const line of wrapText(r, chars, `${i + 1}. `)) {
        body.push(text(24, ky, line, { class: 'small muted' }));
        ky += 15;
      }
    });
  }
  const height = ky + 14;
  const description = ordered.map((st, k) => `${k + 1}. ${st.label}: ${signed(st.value)} kJ/mol`).join('; ');
  return svgDocument(width, height, `Born–Haber cycle of ${cycle.formula}`, body, description);
}
