/**
 * Chart of a latent-heat warmer's temperature over time, with its plateau
 * marked (the temperature and the span until it ends), the air and skin
 * temperatures and the long-contact burn threshold.
 *
 * @module
 */
import { drawChecked } from './chartInput.js';
import type { WarmerResult } from '../warmer/latentWarmer.js';
import { CONTACT_BURN_THRESHOLD_C } from '../pack/packCautions.js';
import { el, linearScale, niceTicks, svgDocument, text, tickLabel } from './svg.js';
import { palette } from './palette.js';
import { formulaText } from '../notation/formula.js';
import { LabelPlacer } from './textBox.js';
import { timeChartFrame } from './timeChartFrame.js';
import { referenceLines, reserveCurve, reserveLines, type ReferenceLine } from './referenceLine.js';

/** Options of {@link warmerCourseSvg}. */
export interface WarmerChartOptions {
  /** Chart title (default: "Warmer temperature over time"). */
  title?: string;
  width?: number;
  height?: number;
}

const fmt = (x: number, digits = 1): string => tickLabel(Number(x.toFixed(digits)));

/**
 * The warmer's course T(t) as a standalone SVG document: the curve, a shaded
 * band over the plateau (its temperature with the 95 % interval, from the
 * trigger to its end), and dashed lines for air, skin and the burn threshold.
 * Parameters that took their assumed defaults carry an asterisk.
 *
 * @param warmer - from {@link latentWarmer}: times in s, temperatures in °C
 * @param options - title, width and height in px
 * @returns SVG text
 * @see W3C, Scalable Vector Graphics (SVG) 1.1 (Second Edition), W3C Recommendation, 16 August 2011, for the output
 *   format; the model and its assumed parameters as in {@link latentWarmer}.
 *
 * @example
 * ```ts
 * const w = latentWarmer({ salt: 'NaCH3COO·3H2O', massG: 100 }, { samples: 60 });
 * warmerCourseSvg(w).includes('plateau 58 °C'); // true
 * ```
 */
export function warmerCourseSvg(warmer: WarmerResult, options?: WarmerChartOptions): string {
  return drawChecked(warmer, options, 'warmer', 'latentWarmer', draw);
}

function draw(w: WarmerResult, options: WarmerChartOptions): string {
  const width = options.width ?? 820;
  const height = options.height ?? 500;
  const margin = { left: 74, right: 28, top: 100, bottom: 64 };
  const plot = { x0: margin.left, x1: width - margin.right, y0: margin.top, y1: height - margin.bottom };
  const title = options.title ?? 'Warmer temperature over time';
  const p = w.parameters;
  const star = (q: { assumed: boolean }) => (q.assumed ? '*' : '');
  const f = w.fill;
  const line1 = `Fill: ${fmt(f.massG, 3)} g ${formulaText(f.formula)}${f.extraWaterG > 0 ? ` + ${fmt(f.extraWaterG, 3)} g extra water` : ''}${f.containerJPerK > 0 ? `, container ${fmt(f.containerJPerK, 1)} J/K` : ''}, supercooled at ${fmt(f.startC)} °C, triggered at 0 min`;
  const line2 = `Air ${fmt(p.ambientC.value)} °C${star(p.ambientC)} via ${p.ambientConductanceWPerK.value} W/K${star(p.ambientConductanceWPerK)}, skin ${fmt(p.skinC.value)} °C${star(p.skinC)} via ${p.skinConductanceWPerK.value} W/K${star(p.skinConductanceWPerK)}; contact-burn threshold ${CONTACT_BURN_THRESHOLD_C} °C (ISO 13732-1)`;
  const line3 = Object.values(p).some((q) => q.assumed) ? '* assumed value for illustration, not a measurement' : '';

  const pts = w.points;
  const tEnd = pts[pts.length - 1]!.t;
  const minutes = tEnd / 60;
  const ys = [...pts.map((q) => q.temperature), f.startC, p.ambientC.value, p.skinC.value, w.plateau.high, CONTACT_BURN_THRESHOLD_C];
  const yTicks = niceTicks(Math.min(...ys) - 2, Math.max(...ys) + 2, 7);
  const xTicks = niceTicks(0, minutes, 8);
  const x = linearScale([0, minutes], [plot.x0, plot.x1]);
  const y = linearScale(yTicks.domain, [plot.y1, plot.y0]);
  const body: string[] = [];

  body.push(text(margin.left, 28, title, { class: 'heading' }));
  body.push(text(margin.left, 48, line1, { class: 'label muted' }));
  body.push(text(margin.left, 64, line2, { class: 'label muted' }));
  if (line3) body.push(text(margin.left, 80, line3, { class: 'label muted' }));
  const placer = new LabelPlacer({ x0: plot.x0 + 2, y0: plot.y0 + 2, x1: plot.x1 - 2, y1: plot.y1 - 2 });

  body.push(...timeChartFrame(plot, x, y, { x: xTicks.ticks, y: yTicks.ticks }, minutes, { x: 'time since triggering (min)', y: 'fill temperature (°C)' }, height));

  // The plateau: its 95 % band of temperature, from the trigger to its end.
  const plateauEndMin = Math.min(minutes, w.plateauDuration.value / 60);
  const band = { x: plot.x0, y: y(w.plateau.high), width: Math.max(1, x(plateauEndMin) - plot.x0), height: Math.max(2, y(w.plateau.low) - y(w.plateau.high)) };
  body.push(el('rect', { ...band, fill: palette.hotTint }));
  body.push(el('line', { x1: x(plateauEndMin), x2: x(plateauEndMin), y1: plot.y0, y2: plot.y1, stroke: palette.hot, 'stroke-width': 1, 'stroke-dasharray': '3 3' }));
  const plateauLabel = `plateau ${fmt(w.plateau.value)} °C (95 % ${fmt(w.plateau.low)}–${fmt(w.plateau.high)}) for about ${fmt(w.plateauDuration.value / 60)} min; ${fmt(100 * w.crystallisedAtPlateau.value, 0)} % crystallised at once`;

  // The curve, the lines and the trigger point are reserved first; then the labels, most important first.
  const curve = [{ t: 0, temperature: f.startC }, ...pts].map((q) => [x(q.t / 60), y(q.temperature)] as const);
  reserveCurve(placer, curve);
  placer.reserve({ x0: x(plateauEndMin) - 1, x1: x(plateauEndMin) + 1, y0: plot.y0, y1: plot.y1 });
  const air = p.ambientC.value;
  const skin = p.skinC.value;
  const lines: ReferenceLine[] = [
    { y: y(CONTACT_BURN_THRESHOLD_C), label: `burn threshold ${CONTACT_BURN_THRESHOLD_C} °C: ${fmt(w.secondsAboveBurnThreshold / 60)} min above`, stroke: palette.limit, dash: '2 3' },
    { y: y(skin), label: `skin ${fmt(skin)} °C`, stroke: palette.solved, dash: '5 4' },
    { y: y(air), label: `air ${fmt(air)} °C`, stroke: palette.neutral, dash: '5 4' },
  ];
  reserveLines(placer, plot, lines);
  const px = x(plateauEndMin);
  const pTop = y(w.plateau.high);
  const plateauSpot = placer.place(plateauLabel, 11, [
    { x: px + 8, y: pTop - 8 },
    { x: px - 8, y: pTop - 8, anchor: 'end' },
    { x: px + 8, y: pTop - 22 },
    { x: px - 8, y: pTop - 22, anchor: 'end' },
    { x: plot.x1 - 6, y: pTop - 8, anchor: 'end' },
    { x: px + 8, y: y(w.plateau.low) + 16 },
  ]);
  body.push(text(plateauSpot.x, plateauSpot.y, plateauLabel, { class: 'small', fill: palette.hot, ...(plateauSpot.anchor === 'end' ? { 'text-anchor': 'end' } : {}) }));
  const triggerLabel = `triggered at ${fmt(f.startC)} °C`;
  const triggerSpot = placer.place(triggerLabel, 11, [
    { x: x(0) + 8, y: y(f.startC) + 4 },
    { x: x(0) + 8, y: y(f.startC) + 18 },
    { x: x(0) + 8, y: y(f.startC) - 10 },
  ]);
  body.push(...referenceLines(placer, plot, lines));

  // The jump at the trigger: a vertical rise from the start temperature to the plateau.
  body.push(el('polyline', { points: curve.map(([a, b]) => `${a.toFixed(2)},${b.toFixed(2)}`).join(' '), fill: 'none', stroke: palette.hot, 'stroke-width': 2.4, 'stroke-linejoin': 'round' }));
  body.push(el('circle', { cx: x(0), cy: y(f.startC), r: 4, fill: palette.background, stroke: palette.hot, 'stroke-width': 2 }));
  body.push(text(triggerSpot.x, triggerSpot.y, triggerLabel, { class: 'small' }));

  return svgDocument(width, height, title, body, `${line1}. ${line2}. ${plateauLabel}.`);
}
