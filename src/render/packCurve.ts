/**
 * Chart of a pack's final temperature against its salt-to-water ratio, with
 * the 95 % band, the start temperature, the onset of saturation, the designs
 * (largest change, most change per gram, target) and the caution lines.
 *
 * @module
 */
import { drawChecked } from './chartInput.js';
import type { PackRatioCurve } from '../pack/packRatioCurve.js';
import { CONTACT_BURN_THRESHOLD_C } from '../pack/packCautions.js';
import { el, linearScale, niceTicks, svgDocument, text, tickLabel } from './svg.js';
import { palette } from './palette.js';

/** Options of {@link packCurveSvg}. */
export interface PackCurveChartOptions {
  /** Chart title (default: built from the fill). */
  title?: string;
  width?: number;
  height?: number;
}

const fmt = (x: number, digits = 1): string => tickLabel(Number(x.toFixed(digits)));

/**
 * The temperature–ratio curve as a standalone SVG document.
 *
 * @param curve - from {@link packRatioCurve}: ratios in g solid per g water, temperatures in °C
 * @param options - title, width and height in px
 * @returns SVG text
 * @see W3C, Scalable Vector Graphics (SVG) 1.1 (Second Edition), W3C Recommendation, 16 August 2011, for the output format; the
 *   curve's sources as in {@link packFinalTemperature}.
 *
 * @example
 * ```ts
 * const curve = packRatioCurve({ solids: [{ formula: 'KNO3', massG: 1 }], waterG: 100, startC: 20 }, { points: 40, targetC: 12 });
 * packCurveSvg(curve).startsWith('<svg'); // true
 * packCurveSvg(curve).includes('°C'); // true
 * ```
 */
export function packCurveSvg(curve: PackRatioCurve, options?: PackCurveChartOptions): string {
  return drawChecked(curve, options, 'curve', 'packRatioCurve', draw);
}

function draw(curve: PackRatioCurve, options: PackCurveChartOptions): string {
  const width = options.width ?? 820;
  const height = options.height ?? 500;
  const margin = { left: 74, right: 28, top: 74, bottom: 64 };
  const plot = { x0: margin.left, x1: width - margin.right, y0: margin.top, y1: height - margin.bottom };
  const solids = curve.base.solids.map((s) => (curve.base.solids.length > 1 ? `${s.formula} ${Math.round(100 * s.share)} %` : s.formula)).join(' + ');
  const title = options.title ?? `Final temperature against salt-to-water ratio: ${solids}`;
  const subtitle = `${curve.base.waterG} g water, start ${fmt(curve.base.startC)} °C${curve.base.containerJPerK > 0 ? `, container ${curve.base.containerJPerK} J/K` : ''}; adiabatic, 95 % band shaded`;

  const pts = curve.points;
  const last = pts[pts.length - 1]!;
  const t0 = curve.base.startC;
  const cools = curve.largestChange.temperature < t0;
  const ys = pts.flatMap((p) => [p.temperature, p.low ?? p.temperature, p.high ?? p.temperature]);
  if (curve.target) ys.push(curve.target.target);
  let yLo = Math.min(...ys, t0);
  let yHi = Math.max(...ys, t0);
  const showBurn = !cools && yHi > CONTACT_BURN_THRESHOLD_C - 10;
  if (showBurn) yHi = Math.max(yHi, CONTACT_BURN_THRESHOLD_C + 2);
  const showZero = cools && yLo < 5;
  if (showZero) yLo = Math.min(yLo, -1);
  const yTicks = niceTicks(yLo, yHi, 7);
  const xTicks = niceTicks(0, last.ratio, 8);
  const x = linearScale([0, last.ratio], [plot.x0, plot.x1]);
  const y = linearScale(yTicks.domain, [plot.y1, plot.y0]);
  const colour = cools ? palette.cold : palette.hot;
  const body: string[] = [];

  body.push(text(margin.left, 28, title, { class: 'heading' }));
  body.push(text(margin.left, 48, subtitle, { class: 'label muted' }));

  // Beyond saturation: shade and say what happens there.
  if (curve.saturationRatio !== null && curve.saturationRatio < last.ratio) {
    const xs = x(curve.saturationRatio);
    body.push(el('rect', { x: xs, y: plot.y0, width: plot.x1 - xs, height: plot.y1 - plot.y0, fill: palette.grid, opacity: 0.55 }));
    body.push(text(xs + 6, plot.y0 + 16, 'undissolved solid remains', { class: 'small muted' }));
  }

  // Grid and axes.
  for (const t of yTicks.ticks) {
    body.push(el('line', { x1: plot.x0, x2: plot.x1, y1: y(t), y2: y(t), stroke: palette.grid, 'stroke-width': 1 }));
    body.push(text(plot.x0 - 8, y(t) + 4, tickLabel(t), { class: 'small', 'text-anchor': 'end' }));
  }
  for (const t of xTicks.ticks.filter((v) => v <= last.ratio * (1 + 1e-9))) {
    body.push(el('line', { x1: x(t), x2: x(t), y1: plot.y1, y2: plot.y1 + 5, stroke: palette.muted }));
    body.push(text(x(t), plot.y1 + 19, tickLabel(t), { class: 'small', 'text-anchor': 'middle' }));
  }
  body.push(el('rect', { x: plot.x0, y: plot.y0, width: plot.x1 - plot.x0, height: plot.y1 - plot.y0, fill: 'none', stroke: palette.muted, 'stroke-width': 1 }));
  body.push(text((plot.x0 + plot.x1) / 2, height - 18, 'ratio: grams of solid per gram of water', { class: 'label', 'text-anchor': 'middle' }));
  body.push(text(18, (plot.y0 + plot.y1) / 2, 'final temperature (°C)', { class: 'label', 'text-anchor': 'middle', transform: `rotate(-90 18 ${(plot.y0 + plot.y1) / 2})` }));

  // Reference lines.
  const hline = (value: number, stroke: string, dash: string, label: string, anchorEnd = true) => {
    body.push(el('line', { x1: plot.x0, x2: plot.x1, y1: y(value), y2: y(value), stroke, 'stroke-width': 1.2, 'stroke-dasharray': dash }));
    body.push(text(anchorEnd ? plot.x1 - 6 : plot.x0 + 6, y(value) - 5, label, { class: 'small', fill: stroke, 'text-anchor': anchorEnd ? 'end' : 'start' }));
  };
  hline(t0, palette.muted, '5 4', `start ${fmt(t0)} °C`);
  if (showBurn) hline(CONTACT_BURN_THRESHOLD_C, palette.hot, '2 3', `${CONTACT_BURN_THRESHOLD_C} °C: contact-burn threshold for long contact (ISO 13732-1)`);
  if (showZero && curve.target?.target !== 0) hline(0, palette.cold, '2 3', '0 °C');

  // Band and curve.
  const banded = pts.filter((p) => p.low !== undefined && p.high !== undefined);
  if (banded.length > 1) {
    const upper = banded.map((p) => `${x(p.ratio).toFixed(2)},${y(p.high!).toFixed(2)}`);
    const lower = [...banded].reverse().map((p) => `${x(p.ratio).toFixed(2)},${y(p.low!).toFixed(2)}`);
    body.push(el('polygon', { points: [...upper, ...lower].join(' '), fill: colour, opacity: 0.16 }));
  }
  body.push(el('polyline', { points: pts.map((p) => `${x(p.ratio).toFixed(2)},${y(p.temperature).toFixed(2)}`).join(' '), fill: 'none', stroke: colour, 'stroke-width': 2.4, 'stroke-linejoin': 'round' }));
  const clamped = pts.find((p) => p.clamp !== null);
  if (clamped) {
    const what = clamped.clamp === 'boiling' ? 'boiling: the balance stops at 100 °C' : clamped.clamp === 'eutectic' ? 'salt–ice eutectic: ice and crystals form' : 'freezing point: ice forms';
    body.push(text(x(clamped.ratio) + 6, y(clamped.temperature) + (cools ? 16 : -8), what, { class: 'small', fill: colour }));
  }

  // Designs.
  const marks: { ratio: number; temperature: number; label: string; shape: 'circle' | 'diamond' | 'square' }[] = [];
  const lc = curve.largestChange;
  const bp = curve.bestPerGram;
  const samePoint = Math.abs(bp.ratio - lc.ratio) <= 0.01 * Math.max(lc.ratio, 1e-9);
  if (lc.ratio > 0 && lc.ratio <= last.ratio) {
    const what = cools ? 'coldest' : 'hottest';
    marks.push({ ratio: lc.ratio, temperature: lc.temperature, label: `${what}${samePoint ? ', and most change per gram of fill' : ''}: ${fmt(lc.temperature)} °C at ${fmt(lc.ratio, 3)} g/g`, shape: 'circle' });
  }
  if (bp.ratio > 0 && bp.ratio <= last.ratio && !samePoint) {
    marks.push({ ratio: bp.ratio, temperature: bp.temperature, label: `most change per gram of fill: ${fmt(bp.ratio, 3)} g/g`, shape: 'diamond' });
  }
  if (curve.target) {
    hline(curve.target.target, palette.solved, '6 3', `target ${fmt(curve.target.target)} °C${curve.target.reachable ? '' : ' (out of reach)'}`, false);
    const d = curve.target.design;
    if (d && d.ratio > 0) marks.push({ ratio: d.ratio, temperature: d.temperature, label: `target reached at ${fmt(d.ratio, 3)} g/g (${fmt(d.saltMass, 1)} g)`, shape: 'square' });
  }
  marks.forEach((m, i) => {
    const cx = x(m.ratio);
    const cy = y(m.temperature);
    const fill = m.shape === 'square' ? palette.solved : colour;
    if (m.shape === 'circle') body.push(el('circle', { cx, cy, r: 5.5, fill: palette.background, stroke: fill, 'stroke-width': 2.2 }));
    else if (m.shape === 'diamond') body.push(el('polygon', { points: `${cx},${cy - 7} ${cx + 7},${cy} ${cx},${cy + 7} ${cx - 7},${cy}`, fill: palette.background, stroke: fill, 'stroke-width': 2 }));
    else body.push(el('rect', { x: cx - 5, y: cy - 5, width: 10, height: 10, fill, stroke: palette.background, 'stroke-width': 1 }));
    // Labels stack in the emptier half of the plot, away from the curve.
    const ly = cools ? plot.y1 - 16 - 18 * i : plot.y1 - 16 - 18 * (marks.length - 1 - i) - (showBurn ? 0 : 0);
    const lx = Math.min(cx + 10, plot.x1 - 6);
    const anchor = cx > (plot.x0 + plot.x1) / 2 ? 'end' : 'start';
    const labelY = cools ? plot.y0 + 34 + 18 * i : ly;
    body.push(el('line', { x1: cx, x2: cx, y1: cy, y2: labelY + (cools ? -12 : 4), stroke: fill, 'stroke-width': 0.8, 'stroke-dasharray': '1 2' }));
    body.push(text(anchor === 'end' ? cx - 6 : lx, labelY, m.label, { class: 'small', fill: palette.ink, 'text-anchor': anchor }));
  });

  return svgDocument(width, height, title, body, `${subtitle}. ${marks.map((m) => m.label).join('; ')}`);
}
