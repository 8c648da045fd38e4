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
import { heatColour, palette } from './palette.js';
import { formulaText } from '../notation/formula.js';
import { LabelPlacer } from './textBox.js';
import { referenceLines, reserveCurve, reserveLines, type ReferenceLine } from './referenceLine.js';

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
  const height = options.height ?? 520;
  const margin = { left: 74, right: 28, top: 92, bottom: 64 };
  const plot = { x0: margin.left, x1: width - margin.right, y0: margin.top, y1: height - margin.bottom };
  const solids = curve.base.solids.map((s) => (curve.base.solids.length > 1 ? `${formulaText(s.formula)} ${Math.round(100 * s.share)} %` : formulaText(s.formula))).join(' + ');
  const title = options.title ?? `Final temperature against salt-to-water ratio: ${solids}`;
  const pts = curve.points;
  const last = pts[pts.length - 1]!;
  const t0 = curve.base.startC;
  const cools = curve.largestChange.temperature < t0;
  const threshold = cools ? 'cold-injury limit 0 °C (frostbite at or below)' : `contact-burn threshold ${CONTACT_BURN_THRESHOLD_C} °C (ISO 13732-1)`;
  const subtitle = `Fill: ${solids} in ${fmt(curve.base.waterG)} g water${curve.base.containerJPerK > 0 ? `, container ${fmt(curve.base.containerJPerK)} J/K` : ''}; start ${fmt(t0)} °C${curve.target ? `; target ${fmt(curve.target.target)} °C` : ''}`;
  const subtitle2 = `${threshold[0]!.toUpperCase()}${threshold.slice(1)}; adiabatic (no heat exchange); shaded: the 95 % interval.`;

  const ys = pts.flatMap((p) => [p.temperature, p.low ?? p.temperature, p.high ?? p.temperature]);
  if (curve.target) ys.push(curve.target.target);
  let yLo = Math.min(...ys, t0);
  let yHi = Math.max(...ys, t0);
  // The threshold of the fill's kind is always on the chart: the burn threshold for a hot pack, 0 °C for a cold one.
  const showBurn = !cools;
  if (showBurn) yHi = Math.max(yHi, CONTACT_BURN_THRESHOLD_C + 2);
  const showZero = cools;
  if (showZero) yLo = Math.min(yLo, -1);
  const yTicks = niceTicks(yLo, yHi, 7);
  const xTicks = niceTicks(0, last.ratio, 8);
  const x = linearScale([0, last.ratio], [plot.x0, plot.x1]);
  const y = linearScale(yTicks.domain, [plot.y1, plot.y0]);
  const colour = heatColour(cools);
  const body: string[] = [];
  const placer = new LabelPlacer({ x0: plot.x0 + 2, y0: plot.y0 + 2, x1: plot.x1 - 2, y1: plot.y1 - 2 });

  body.push(text(margin.left, 28, title, { class: 'heading' }));
  body.push(text(margin.left, 48, subtitle, { class: 'label muted' }));
  body.push(text(margin.left, 66, subtitle2, { class: 'label muted' }));

  // Beyond saturation: shade, and say what happens there once the labels that matter more are placed.
  const saturated = curve.saturationRatio !== null && curve.saturationRatio < last.ratio ? x(curve.saturationRatio) : undefined;
  if (saturated !== undefined) body.push(el('rect', { x: saturated, y: plot.y0, width: plot.x1 - saturated, height: plot.y1 - plot.y0, fill: palette.grid, opacity: 0.55 }));

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

  // The curve, its band edges and the design points are reserved before any label is placed.
  const line = pts.map((p) => [x(p.ratio), y(p.temperature)] as const);
  reserveCurve(placer, line);
  const banded = pts.filter((p) => p.low !== undefined && p.high !== undefined);
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
  const d = curve.target?.design;
  if (d && d.ratio > 0) marks.push({ ratio: d.ratio, temperature: d.temperature, label: `target reached at ${fmt(d.ratio, 3)} g/g (${fmt(d.saltMass, 1)} g)`, shape: 'square' });
  for (const m of marks) placer.reserve({ x0: x(m.ratio) - 8, x1: x(m.ratio) + 8, y0: y(m.temperature) - 8, y1: y(m.temperature) + 8 });

  const lines: ReferenceLine[] = [];
  if (showBurn) lines.push({ y: y(CONTACT_BURN_THRESHOLD_C), label: `burn threshold ${CONTACT_BURN_THRESHOLD_C} °C (long contact)`, stroke: palette.limit, dash: '2 3' });
  if (showZero && curve.target?.target !== 0) lines.push({ y: y(0), label: '0 °C: frostbite possible at or below', stroke: palette.limit, dash: '2 3' });
  if (curve.target) lines.push({ y: y(curve.target.target), label: `target ${fmt(curve.target.target)} °C${curve.target.reachable ? '' : ' (out of reach)'}`, stroke: palette.solved, dash: '6 3' });
  lines.push({ y: y(t0), label: `start ${fmt(t0)} °C`, stroke: palette.muted, dash: '5 4' });
  reserveLines(placer, plot, lines);

  // Design labels next to their points (the closest free place), then the reference lines, then the notes.
  const markLabels = marks.map((m) => {
    const cx = x(m.ratio);
    const cy = y(m.temperature);
    const away = cools ? 1 : -1; // below a cold curve's dip, above a hot curve's rise
    const spots = [12, 26, 40, 56, 74, 94].flatMap((dy) => [
      { x: cx + 10, y: cy - away * -dy },
      { x: cx - 10, y: cy - away * -dy, anchor: 'end' as const },
      { x: cx + 10, y: cy + away * -dy + (away > 0 ? 0 : 10) },
      { x: cx - 10, y: cy + away * -dy + (away > 0 ? 0 : 10), anchor: 'end' as const },
    ]);
    return { m, spot: placer.place(m.label, 11, spots) };
  });
  const lineParts = referenceLines(placer, plot, lines);

  if (banded.length > 1) {
    const upper = banded.map((p) => `${x(p.ratio).toFixed(2)},${y(p.high!).toFixed(2)}`);
    const lower = [...banded].reverse().map((p) => `${x(p.ratio).toFixed(2)},${y(p.low!).toFixed(2)}`);
    body.push(el('polygon', { points: [...upper, ...lower].join(' '), fill: cools ? palette.coldTint : palette.hotTint, opacity: 0.8 }));
  }
  body.push(...lineParts);
  body.push(el('polyline', { points: line.map(([a, b]) => `${a.toFixed(2)},${b.toFixed(2)}`).join(' '), fill: 'none', stroke: colour, 'stroke-width': 2.4, 'stroke-linejoin': 'round' }));

  const clamped = pts.find((p) => p.clamp !== null);
  if (clamped) {
    const what = clamped.clamp === 'boiling' ? 'boiling: the brine boils at its raised boiling point' : clamped.clamp === 'eutectic' ? 'salt–ice eutectic: brine freezes out as ice and salt' : 'no balance found in range';
    const cx = x(clamped.ratio);
    const cy = y(clamped.temperature);
    const spot = placer.place(what, 11, [16, 30, 44, 60, 80].flatMap((dy) => [-1, 1].flatMap((side) => [{ x: cx + 8, y: cy + side * dy + 4 }, { x: cx - 8, y: cy + side * dy + 4, anchor: 'end' as const }, { x: cx + 60, y: cy + side * dy + 4 }])));
    body.push(text(spot.x, spot.y, what, { class: 'small', fill: colour, ...(spot.anchor === 'end' ? { 'text-anchor': 'end' } : {}) }));
  }
  if (saturated !== undefined) {
    const words = 'undissolved solid remains';
    const spot = placer.place(words, 11, [
      { x: saturated + 6, y: plot.y0 + 16 },
      { x: saturated + 6, y: plot.y1 - 8 },
      { x: plot.x1 - 6, y: plot.y0 + 16, anchor: 'end' },
      { x: plot.x1 - 6, y: plot.y1 - 8, anchor: 'end' },
      { x: saturated + 6, y: (plot.y0 + plot.y1) / 2 },
    ]);
    body.push(text(spot.x, spot.y, words, { class: 'small muted', ...(spot.anchor === 'end' ? { 'text-anchor': 'end' } : {}) }));
  }

  for (const { m, spot } of markLabels) {
    const cx = x(m.ratio);
    const cy = y(m.temperature);
    const fill = m.shape === 'square' ? palette.solved : colour;
    if (m.shape === 'circle') body.push(el('circle', { cx, cy, r: 5.5, fill: palette.background, stroke: fill, 'stroke-width': 2.2 }));
    else if (m.shape === 'diamond') body.push(el('polygon', { points: `${cx},${cy - 7} ${cx + 7},${cy} ${cx},${cy + 7} ${cx - 7},${cy}`, fill: palette.background, stroke: fill, 'stroke-width': 2 }));
    else body.push(el('rect', { x: cx - 5, y: cy - 5, width: 10, height: 10, fill, stroke: palette.background, 'stroke-width': 1 }));
    body.push(text(spot.x, spot.y, m.label, { class: 'small', fill: palette.ink, ...(spot.anchor === 'end' ? { 'text-anchor': 'end' } : {}) }));
  }

  return svgDocument(width, height, title, body, `${subtitle}. ${subtitle2} ${marks.map((m) => m.label).join('; ')}`);
}
