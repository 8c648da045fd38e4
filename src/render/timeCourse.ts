/**
 * Chart of a pack's temperature over time, with the target band, the air and
 * skin temperatures, the adiabatic final temperature and the caution lines.
 *
 * @module
 */
import { drawChecked } from './chartInput.js';
import type { PackTimeCourse } from '../pack/packTimeCourse.js';
import { CONTACT_BURN_THRESHOLD_C } from '../pack/packCautions.js';
import { el, linearScale, niceTicks, svgDocument, text, tickLabel } from './svg.js';
import { palette } from './palette.js';

/** Options of {@link timeCourseSvg}. */
export interface TimeCourseChartOptions {
  /** Chart title (default: "Pack temperature over time"). */
  title?: string;
  /** Words for the fill, shown under the title (e.g. "25 g CaCl2 in 100 g water"). */
  fillLabel?: string;
  width?: number;
  height?: number;
}

const fmt = (x: number, digits = 1): string => tickLabel(Number(x.toFixed(digits)));

/**
 * The time course T(t) as a standalone SVG document. Parameters that took
 * their assumed defaults are listed with an asterisk.
 *
 * @param course - from {@link packTimeCourse}: times in s, temperatures in °C
 * @param options - title, a line naming the fill, width and height in px
 * @returns SVG text
 * @see W3C, Scalable Vector Graphics (SVG) 1.1 (Second Edition), W3C Recommendation, 16 August 2011, for the output format; the
 *   model and its assumed parameters as in {@link packTimeCourse}.
 *
 * @example
 * ```ts
 * const course = packTimeCourse({ solids: [{ formula: 'CaCl2', massG: 25 }], waterG: 100 }, { band: { lowC: 40, highC: 50 }, samples: 50 });
 * timeCourseSvg(course).includes('40–50 °C'); // true
 * ```
 */
export function timeCourseSvg(course: PackTimeCourse, options?: TimeCourseChartOptions): string {
  return drawChecked(course, options, 'course', 'packTimeCourse', draw);
}

function draw(course: PackTimeCourse, options: TimeCourseChartOptions): string {
  const width = options.width ?? 820;
  const height = options.height ?? 500;
  const margin = { left: 74, right: 28, top: 92, bottom: 64 };
  const plot = { x0: margin.left, x1: width - margin.right, y0: margin.top, y1: height - margin.bottom };
  const title = options.title ?? 'Pack temperature over time';
  const p = course.parameters;
  const star = (q: { assumed: boolean }) => (q.assumed ? '*' : '');
  const line1 = `${options.fillLabel ? `${options.fillLabel}, ` : ''}start ${fmt(course.startC)} °C; lumped model, dissolution time constant ${fmt(p.dissolutionTimeConstantS.value, 0)} s${star(p.dissolutionTimeConstantS)}`;
  const line2 = `air ${fmt(p.ambientC.value)} °C${star(p.ambientC)} via ${p.ambientConductanceWPerK.value} W/K${star(p.ambientConductanceWPerK)}, skin ${fmt(p.skinC.value)} °C${star(p.skinC)} via ${p.skinConductanceWPerK.value} W/K${star(p.skinConductanceWPerK)}${Object.values(p).some((q) => q.assumed) ? '   * assumed value for illustration' : ''}`;

  const pts = course.points;
  const tEnd = pts[pts.length - 1]!.t;
  const minutes = tEnd / 60;
  const cools = course.adiabaticFinal.value < course.startC;
  const colour = cools ? palette.cold : palette.hot;
  const ys = [...pts.map((q) => q.temperature), course.startC, course.adiabaticFinal.value, p.ambientC.value, p.skinC.value];
  if (course.band) ys.push(course.band.lowC, course.band.highC);
  let yLo = Math.min(...ys);
  let yHi = Math.max(...ys);
  const showBurn = !cools && yHi > CONTACT_BURN_THRESHOLD_C - 10;
  if (showBurn) yHi = Math.max(yHi, CONTACT_BURN_THRESHOLD_C + 2);
  const showZero = cools && yLo < 5;
  if (showZero) yLo = Math.min(yLo, -1);
  const yTicks = niceTicks(yLo, yHi, 7);
  const xTicks = niceTicks(0, minutes, 8);
  const x = linearScale([0, minutes], [plot.x0, plot.x1]);
  const y = linearScale(yTicks.domain, [plot.y1, plot.y0]);
  const body: string[] = [];

  body.push(text(margin.left, 28, title, { class: 'heading' }));
  body.push(text(margin.left, 48, line1, { class: 'label muted' }));
  body.push(text(margin.left, 66, line2, { class: 'label muted' }));

  if (course.band) {
    const b = course.band;
    body.push(el('rect', { x: plot.x0, y: y(b.highC), width: plot.x1 - plot.x0, height: y(b.lowC) - y(b.highC), fill: palette.band }));
    body.push(text(plot.x1 - 8, y(b.highC) + 15, `target band ${fmt(b.lowC)}–${fmt(b.highC)} °C: ${fmt(b.secondsInside / 60)} min inside`, { class: 'small', fill: palette.bandInk, 'text-anchor': 'end' }));
  }
  for (const t of yTicks.ticks) {
    body.push(el('line', { x1: plot.x0, x2: plot.x1, y1: y(t), y2: y(t), stroke: palette.grid, 'stroke-width': 1 }));
    body.push(text(plot.x0 - 8, y(t) + 4, tickLabel(t), { class: 'small', 'text-anchor': 'end' }));
  }
  for (const t of xTicks.ticks.filter((v) => v <= minutes * (1 + 1e-9))) {
    body.push(el('line', { x1: x(t), x2: x(t), y1: plot.y1, y2: plot.y1 + 5, stroke: palette.muted }));
    body.push(text(x(t), plot.y1 + 19, tickLabel(t), { class: 'small', 'text-anchor': 'middle' }));
  }
  body.push(el('rect', { x: plot.x0, y: plot.y0, width: plot.x1 - plot.x0, height: plot.y1 - plot.y0, fill: 'none', stroke: palette.muted, 'stroke-width': 1 }));
  body.push(text((plot.x0 + plot.x1) / 2, height - 18, 'time since the salt met the water (min)', { class: 'label', 'text-anchor': 'middle' }));
  body.push(text(18, (plot.y0 + plot.y1) / 2, 'pack temperature (°C)', { class: 'label', 'text-anchor': 'middle', transform: `rotate(-90 18 ${(plot.y0 + plot.y1) / 2})` }));

  const hline = (value: number, stroke: string, dash: string, label: string, below = false) => {
    body.push(el('line', { x1: plot.x0, x2: plot.x1, y1: y(value), y2: y(value), stroke, 'stroke-width': 1.2, 'stroke-dasharray': dash }));
    body.push(text(plot.x1 - 6, y(value) + (below ? 14 : -5), label, { class: 'small', fill: stroke, 'text-anchor': 'end' }));
  };
  const air = p.ambientC.value;
  const skin = p.skinC.value;
  hline(air, palette.neutral, '5 4', `air ${fmt(air)} °C`, air < skin);
  hline(skin, palette.solved, '5 4', `skin ${fmt(skin)} °C`, skin < air);
  hline(course.adiabaticFinal.value, colour, '1 3', `adiabatic final ${fmt(course.adiabaticFinal.value)} °C (no heat exchange)`, !cools);
  if (showBurn) hline(CONTACT_BURN_THRESHOLD_C, palette.hot, '2 3', `${CONTACT_BURN_THRESHOLD_C} °C contact-burn threshold for long contact (ISO 13732-1): ${fmt(course.secondsAboveBurnThreshold / 60)} min above`, true);
  if (showZero) hline(0, palette.cold, '2 3', '0 °C');

  body.push(el('polyline', { points: pts.map((q) => `${x(q.t / 60).toFixed(2)},${y(q.temperature).toFixed(2)}`).join(' '), fill: 'none', stroke: colour, 'stroke-width': 2.4, 'stroke-linejoin': 'round' }));
  const ex = course.extreme;
  const cx = x(ex.timeS / 60);
  const cy = y(ex.temperature);
  body.push(el('circle', { cx, cy, r: 5, fill: palette.background, stroke: colour, 'stroke-width': 2 }));
  const label = `${cools ? 'coldest' : 'hottest'} ${fmt(ex.temperature)} °C after ${fmt(ex.timeS / 60)} min`;
  const right = cx < (plot.x0 + plot.x1) * 0.6;
  body.push(text(right ? cx + 10 : cx - 10, cy + (cools ? 18 : -10), label, { class: 'small', 'text-anchor': right ? 'start' : 'end' }));

  return svgDocument(width, height, title, body, `${line1}. ${line2}. ${label}.`);
}
