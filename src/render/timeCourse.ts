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
import { heatColour, palette } from './palette.js';
import { formulaText, formulasInText } from '../notation/formula.js';
import { LabelPlacer } from './textBox.js';
import { timeChartFrame } from './timeChartFrame.js';
import { referenceLines, reserveCurve, reserveLines, type ReferenceLine } from './referenceLine.js';

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

/** The fill in words: `40 g CaCl₂ in 100 g water`. */
function fillWords(course: PackTimeCourse): string {
  const f = course.fill;
  const solids = f.solids.map((x) => `${fmt(x.massG)} g ${formulaText(x.formula)}`).join(' + ');
  return `${solids} in ${fmt(f.waterG)} g water${f.containerJPerK > 0 ? `, container ${fmt(f.containerJPerK)} J/K` : ''}`;
}

function draw(course: PackTimeCourse, options: TimeCourseChartOptions): string {
  const width = options.width ?? 820;
  const height = options.height ?? 520;
  const margin = { left: 74, right: 28, top: 116, bottom: 64 };
  const plot = { x0: margin.left, x1: width - margin.right, y0: margin.top, y1: height - margin.bottom };
  const title = options.title ?? 'Pack temperature over time';
  const p = course.parameters;
  const star = (q: { assumed: boolean }) => (q.assumed ? '*' : '');
  const cools = course.adiabaticFinal.value < course.startC;
  const fill = options.fillLabel ? formulasInText(options.fillLabel) : fillWords(course);
  const threshold = cools ? 'cold-injury limit 0 °C (frostbite at or below)' : `contact-burn threshold ${CONTACT_BURN_THRESHOLD_C} °C (ISO 13732-1)`;
  const line1 = `Fill: ${fill}; start ${fmt(course.startC)} °C`;
  const line1b = `${course.band ? `Target band ${fmt(course.band.lowC)}–${fmt(course.band.highC)} °C; ` : 'No target band; '}${threshold}`;
  const line2 = `Lumped model: dissolution time constant ${fmt(p.dissolutionTimeConstantS.value, 0)} s${star(p.dissolutionTimeConstantS)}; air ${fmt(p.ambientC.value)} °C${star(p.ambientC)} via ${fmt(p.ambientConductanceWPerK.value, 3)} W/K${star(p.ambientConductanceWPerK)}; skin ${fmt(p.skinC.value)} °C${star(p.skinC)} via ${fmt(p.skinConductanceWPerK.value, 3)} W/K${star(p.skinConductanceWPerK)}`;
  const line3 = Object.values(p).some((q) => q.assumed) ? '* assumed value for illustration, not a measurement' : '';

  const pts = course.points;
  const tEnd = pts[pts.length - 1]!.t;
  const minutes = tEnd / 60;
  const colour = heatColour(cools);
  const ys = [...pts.map((q) => q.temperature), course.startC, course.adiabaticFinal.value, p.ambientC.value, p.skinC.value];
  if (course.band) ys.push(course.band.lowC, course.band.highC);
  let yLo = Math.min(...ys);
  let yHi = Math.max(...ys);
  // The threshold of the fill's kind is always on the chart: the burn threshold for a hot pack, 0 °C for a cold one.
  const showBurn = !cools;
  if (showBurn) yHi = Math.max(yHi, CONTACT_BURN_THRESHOLD_C + 2);
  const showZero = cools;
  if (showZero) yLo = Math.min(yLo, -1);
  const yTicks = niceTicks(yLo, yHi, 7);
  const xTicks = niceTicks(0, minutes, 8);
  const x = linearScale([0, minutes], [plot.x0, plot.x1]);
  const y = linearScale(yTicks.domain, [plot.y1, plot.y0]);
  const body: string[] = [];
  const placer = new LabelPlacer({ x0: plot.x0 + 2, y0: plot.y0 + 2, x1: plot.x1 - 2, y1: plot.y1 - 2 });

  body.push(text(margin.left, 28, title, { class: 'heading' }));
  body.push(text(margin.left, 48, line1, { class: 'label muted' }));
  body.push(text(margin.left, 64, line1b, { class: 'label muted' }));
  body.push(text(margin.left, 80, line2, { class: 'label muted' }));
  if (line3) body.push(text(margin.left, 96, line3, { class: 'label muted' }));

  if (course.band) {
    const b = course.band;
    body.push(el('rect', { x: plot.x0, y: y(b.highC), width: plot.x1 - plot.x0, height: y(b.lowC) - y(b.highC), fill: palette.band }));
  }
  body.push(...timeChartFrame(plot, x, y, { x: xTicks.ticks, y: yTicks.ticks }, minutes, { x: 'time since the salt met the water (min)', y: 'pack temperature (°C)' }, height));

  // The curve and its extreme first, so that no label is put on them.
  const curve = pts.map((q) => [x(q.t / 60), y(q.temperature)] as const);
  reserveCurve(placer, curve);
  const air = p.ambientC.value;
  const skin = p.skinC.value;
  const lines: ReferenceLine[] = [];
  if (showBurn) lines.push({ y: y(CONTACT_BURN_THRESHOLD_C), label: `burn threshold ${CONTACT_BURN_THRESHOLD_C} °C: ${fmt(course.secondsAboveBurnThreshold / 60)} min above`, stroke: palette.limit, dash: '2 3' });
  if (showZero) lines.push({ y: y(0), label: '0 °C: frostbite possible at or below', stroke: palette.limit, dash: '2 3' });
  if (course.band) {
    const b = course.band;
    lines.push({ y: y(b.highC), label: `target band ${fmt(b.lowC)}–${fmt(b.highC)} °C: ${fmt(b.secondsInside / 60)} min inside`, stroke: palette.bandInk, dash: '1 0' });
  }
  lines.push({ y: y(course.adiabaticFinal.value), label: `adiabatic final ${fmt(course.adiabaticFinal.value)} °C (no heat exchange)`, stroke: colour, dash: '1 3' });
  lines.push({ y: y(skin), label: `skin ${fmt(skin)} °C`, stroke: palette.solved, dash: '5 4' });
  lines.push({ y: y(air), label: `air ${fmt(air)} °C`, stroke: palette.neutral, dash: '5 4' });
  reserveLines(placer, plot, lines);
  const ex = course.extreme;
  const cx = x(ex.timeS / 60);
  const cy = y(ex.temperature);
  placer.reserve({ x0: cx - 6, x1: cx + 6, y0: cy - 6, y1: cy + 6 });
  const exLabel = `${cools ? 'coldest' : 'hottest'} ${fmt(ex.temperature)} °C after ${fmt(ex.timeS / 60)} min`;
  const exSpot = placer.place(exLabel, 11, [
    { x: cx + 10, y: cy + (cools ? 18 : -10) },
    { x: cx + 10, y: cy + (cools ? -10 : 18) },
    { x: cx - 10, y: cy + (cools ? 18 : -10), anchor: 'end' },
    { x: cx + 10, y: cy + (cools ? 32 : -24) },
    { x: cx + 40, y: cy + (cools ? 46 : -38) },
  ]);

  body.push(...referenceLines(placer, plot, lines));

  body.push(el('polyline', { points: curve.map(([a, b]) => `${a.toFixed(2)},${b.toFixed(2)}`).join(' '), fill: 'none', stroke: colour, 'stroke-width': 2.4, 'stroke-linejoin': 'round' }));
  body.push(el('circle', { cx, cy, r: 5, fill: palette.background, stroke: colour, 'stroke-width': 2 }));
  body.push(text(exSpot.x, exSpot.y, exLabel, { class: 'small', ...(exSpot.anchor === 'end' ? { 'text-anchor': 'end' } : {}) }));

  return svgDocument(width, height, title, body, `${line1}. ${line1b}. ${line2}. ${exLabel}.`);
}
