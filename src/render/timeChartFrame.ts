/**
 * The parts every chart of a temperature against time shares: the grid with
 * its tick labels, the frame and the axis titles (labelled lines are drawn by
 * `referenceLine.ts`, clear of other labels).
 *
 * @module
 */
import { el, text, tickLabel } from './svg.js';
import { palette } from './palette.js';

/** The plot area, px. */
export interface PlotBox {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** The grid and tick labels of temperature (°C, `yTicks`) and time (min, `xTicks` up to `minutes`), the frame and the axis titles. */
export function timeChartFrame(plot: PlotBox, x: (v: number) => number, y: (v: number) => number, ticks: { x: readonly number[]; y: readonly number[] }, minutes: number, titles: { x: string; y: string }, height: number): string[] {
  const body: string[] = [];
  for (const t of ticks.y) {
    body.push(el('line', { x1: plot.x0, x2: plot.x1, y1: y(t), y2: y(t), stroke: palette.grid, 'stroke-width': 1 }));
    body.push(text(plot.x0 - 8, y(t) + 4, tickLabel(t), { class: 'small', 'text-anchor': 'end' }));
  }
  for (const t of ticks.x.filter((v) => v <= minutes * (1 + 1e-9))) {
    body.push(el('line', { x1: x(t), x2: x(t), y1: plot.y1, y2: plot.y1 + 5, stroke: palette.muted }));
    body.push(text(x(t), plot.y1 + 19, tickLabel(t), { class: 'small', 'text-anchor': 'middle' }));
  }
  body.push(el('rect', { x: plot.x0, y: plot.y0, width: plot.x1 - plot.x0, height: plot.y1 - plot.y0, fill: 'none', stroke: palette.muted, 'stroke-width': 1 }));
  body.push(text((plot.x0 + plot.x1) / 2, height - 18, titles.x, { class: 'label', 'text-anchor': 'middle' }));
  body.push(text(18, (plot.y0 + plot.y1) / 2, titles.y, { class: 'label', 'text-anchor': 'middle', transform: `rotate(-90 18 ${(plot.y0 + plot.y1) / 2})` }));
  return body;
}
