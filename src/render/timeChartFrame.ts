/**
 * The parts every chart of a temperature against time shares: the grid with
 * its tick labels, the frame and axis titles, a labelled horizontal mark, and
 * the line naming the air and skin the model exchanges heat with.
 *
 * @module
 */
import { el, text, theme, tickLabel } from './svg.js';

/** The plot area, px. */
export interface PlotBox {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

const fmt = (x: number, digits = 1): string => tickLabel(Number(x.toFixed(digits)));

/** The grid and tick labels of temperature (°C, `yTicks`) and time (min, `xTicks` up to `minutes`), the frame and the axis titles. */
export function timeChartFrame(plot: PlotBox, x: (v: number) => number, y: (v: number) => number, ticks: { x: readonly number[]; y: readonly number[] }, minutes: number, titles: { x: string; y: string }, height: number): string[] {
  const body: string[] = [];
  for (const t of ticks.y) {
    body.push(el('line', { x1: plot.x0, x2: plot.x1, y1: y(t), y2: y(t), stroke: theme.grid, 'stroke-width': 1 }));
    body.push(text(plot.x0 - 8, y(t) + 4, tickLabel(t), { class: 'small', 'text-anchor': 'end' }));
  }
  for (const t of ticks.x.filter((v) => v <= minutes * (1 + 1e-9))) {
    body.push(el('line', { x1: x(t), x2: x(t), y1: plot.y1, y2: plot.y1 + 5, stroke: theme.muted }));
    body.push(text(x(t), plot.y1 + 19, tickLabel(t), { class: 'small', 'text-anchor': 'middle' }));
  }
  body.push(el('rect', { x: plot.x0, y: plot.y0, width: plot.x1 - plot.x0, height: plot.y1 - plot.y0, fill: 'none', stroke: theme.muted, 'stroke-width': 1 }));
  body.push(text((plot.x0 + plot.x1) / 2, height - 18, titles.x, { class: 'label', 'text-anchor': 'middle' }));
  body.push(text(18, (plot.y0 + plot.y1) / 2, titles.y, { class: 'label', 'text-anchor': 'middle', transform: `rotate(-90 18 ${(plot.y0 + plot.y1) / 2})` }));
  return body;
}

/** A dashed line across the plot at one temperature, labelled at its right end (below the line when `below`). */
export function horizontalMark(plot: PlotBox, y: (v: number) => number, value: number, stroke: string, dash: string, label: string, below = false): string[] {
  return [
    el('line', { x1: plot.x0, x2: plot.x1, y1: y(value), y2: y(value), stroke, 'stroke-width': 1.2, 'stroke-dasharray': dash }),
    text(plot.x1 - 6, y(value) + (below ? 14 : -5), label, { class: 'small', fill: stroke, 'text-anchor': 'end' }),
  ];
}

/** A parameter as the time-course models report it. */
interface Parameter {
  value: number;
  assumed: boolean;
}

/** "air 22 °C* via 0.15 W/K*, skin 33 °C* via 0.25 W/K*", an asterisk on each assumed value and the key when any is. */
export function surroundingsLine(p: { ambientC: Parameter; ambientConductanceWPerK: Parameter; skinC: Parameter; skinConductanceWPerK: Parameter }, anyAssumed: boolean): string {
  const star = (q: Parameter) => (q.assumed ? '*' : '');
  return `air ${fmt(p.ambientC.value)} °C${star(p.ambientC)} via ${p.ambientConductanceWPerK.value} W/K${star(p.ambientConductanceWPerK)}, skin ${fmt(p.skinC.value)} °C${star(p.skinC)} via ${p.skinConductanceWPerK.value} W/K${star(p.skinConductanceWPerK)}${anyAssumed ? '   * assumed value for illustration' : ''}`;
}
