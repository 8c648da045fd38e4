/**
 * A horizontal reference line across a plot (a start temperature, a
 * threshold, a target) with its label put where no other label or the
 * curve is: above the line at the right, else below it, else at the left.
 *
 * @module
 */
import { el, text } from './svg.js';
import type { LabelPlacer } from './textBox.js';

/** The plotting area, px. */
export interface PlotArea {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** Reserves the path of a polyline (its segments' boxes, widened a little) so that labels keep off the curve. */
export function reserveCurve(placer: LabelPlacer, points: readonly (readonly [number, number])[], pad = 3): void {
  for (let i = 1; i < points.length; i++) {
    const [ax, ay] = points[i - 1]!;
    const [bx, by] = points[i]!;
    placer.reserve({ x0: Math.min(ax, bx) - pad, x1: Math.max(ax, bx) + pad, y0: Math.min(ay, by) - pad, y1: Math.max(ay, by) + pad });
  }
}

/** One reference line: where (px), its label, colour and dash pattern. */
export interface ReferenceLine {
  y: number;
  label: string;
  stroke: string;
  dash: string;
}

/** Marks the lines as taken, so that labels placed before theirs keep off them too. */
export function reserveLines(placer: LabelPlacer, plot: PlotArea, lines: readonly ReferenceLine[]): void {
  for (const l of lines) placer.reserve({ x0: plot.x0, x1: plot.x1, y0: l.y - 1, y1: l.y + 1 });
}

/**
 * The lines and their labels (11 px). Every line is reserved first, so that no label sits on any of them; the labels
 * are then placed in the order given (the most important first).
 */
export function referenceLines(placer: LabelPlacer, plot: PlotArea, lines: readonly ReferenceLine[]): string[] {
  reserveLines(placer, plot, lines);
  const out: string[] = [];
  for (const { y, label, stroke, dash } of lines) {
    const spot = placer.place(label, 11, [
      { x: plot.x1 - 6, y: y - 5, anchor: 'end' },
      { x: plot.x1 - 6, y: y + 14, anchor: 'end' },
      { x: plot.x0 + 6, y: y - 5 },
      { x: plot.x0 + 6, y: y + 14 },
      { x: (plot.x0 + plot.x1) / 2, y: y - 5, anchor: 'middle' },
      { x: (plot.x0 + plot.x1) / 2, y: y + 14, anchor: 'middle' },
      ...[0.25, 0.5, 0.75].flatMap((f) => [
        { x: plot.x0 + f * (plot.x1 - plot.x0), y: y - 5 },
        { x: plot.x0 + f * (plot.x1 - plot.x0), y: y + 14 },
      ]),
      { x: plot.x1 - 6, y: y - 19, anchor: 'end' },
      { x: plot.x1 - 6, y: y + 28, anchor: 'end' },
    ]);
    out.push(el('line', { x1: plot.x0, x2: plot.x1, y1: y, y2: y, stroke, 'stroke-width': 1.2, 'stroke-dasharray': dash }));
    out.push(text(spot.x, spot.y, label, { class: 'small', fill: stroke, ...(spot.anchor === 'start' ? {} : { 'text-anchor': spot.anchor }) }));
  }
  return out;
}
