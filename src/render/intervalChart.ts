/**
 * The ranked interval chart of a screen: one row per candidate, its 95 %
 * interval as a bar, its value as a marker whose shape tells the basis, zero
 * marked, and the candidates whose verdict is undetermined set apart in a
 * band of their own. Laid out to read at ten candidates and at eighty.
 *
 * @module
 */
import { drawChecked } from './chartInput.js';
import type { Basis, Estimate } from '../quantity/estimate.js';
import { formatEstimate, TEMPERATURE_RESOLUTION_K } from '../quantity/formatEstimate.js';
import { focusRange } from './focusRange.js';
import type { Direction, FillSpec, ObjectiveName, ScreenRow, Suitability } from '../screen/screenRow.js';
import { formulaText } from '../notation/formula.js';
import { formatNumber } from '../notation/minus.js';
import { textWidth } from './textBox.js';
import { el, linearScale, niceTicks, num, svgDocument, text, tickLabel } from './svg.js';
import { palette } from './palette.js';

/** A vertical line to draw across the chart, such as a target temperature. */
export interface ChartMark {
  /** Where, in the objective's unit. */
  at: number;
  /** A short label shown at the top of the line. */
  label: string;
}

/** Options of {@link intervalChart}. */
export interface IntervalChartOptions {
  /** The chart's title (default: from the objective and direction). */
  title?: string;
  /** Extra reference lines (a target, a burn threshold). */
  marks?: readonly ChartMark[];
  /** Most candidates drawn (default 100); the rest are counted in the caption. */
  maxRows?: number;
  /** Width in pixels (default 960). */
  width?: number;
}

/** What the chart needs of a screen: its settings and its rows (ranked rows carry `rank`). */
export interface ChartableScreen {
  settings: {
    objective: ObjectiveName;
    direction: Direction;
    fill?: FillSpec | null;
    spec?: string | null;
    /** The numbers the spec holds the objective to (a screen's settings carry them); each is drawn as a line. */
    specThresholds?: readonly ChartMark[];
  };
  rows: readonly ScreenRow[];
  /** The counts of the whole run, when `rows` holds only some of the rows (a streamed screen keeps only the best). */
  summary?: { read: number; computed: number; failed: number; excluded: number };
}

const GROUP_ORDER: readonly Suitability[] = ['suitable', 'undetermined', 'unsuitable'];

const BASIS_LABEL: Record<Basis, string> = {
  measured: 'measured',
  cycle: 'formation-enthalpy cycle',
  anchored: 'anchored on related salts',
  model: 'model estimate',
};

const OBJECTIVE_TITLE: Record<ObjectiveName, string> = {
  enthalpy: 'Enthalpy of solution',
  'heat-per-gram': 'Heat absorbed per gram of salt',
  'fill-temperature': 'Temperature the standard fill reaches',
  'cost-per-kj': 'Cost per kJ of heat',
  'plateau-temperature': 'Plateau temperature of the standard warmer',
  'warmer-heat-per-gram': 'Heat per gram of the standard warmer',
  'plateau-duration': 'Plateau duration of the standard warmer',
};

/** What the screen ran with, in words: the fill and the specification, or that there were none. */
function inputsLine(settings: ChartableScreen['settings']): string {
  const f = settings.fill;
  const fill = f ? `fill: ${formatNumber(f.saltMassG)} g of each salt in ${formatNumber(f.waterMassG)} g water, start ${formatNumber(f.startC)} °C` : 'no standard fill';
  const spec = settings.spec ? `spec: ${settings.spec}` : 'no spec';
  return `Inputs — ${fill}; ${spec}`;
}

/**
 * The lines to draw: the spec's thresholds from the screen's own settings, the start temperature of the standard
 * fill where the chart ranks by the temperature it reaches, then the caller's marks. A line is drawn once per
 * position: a caller's mark where the chart already draws one gives that line its own label (the caller's words
 * for the same threshold), and two automatic lines at one position keep the first.
 */
function chartMarks(settings: ChartableScreen['settings'], extra: readonly ChartMark[]): ChartMark[] {
  const f = settings.fill;
  const start = f && settings.objective === 'fill-temperature' ? [{ at: f.startC, label: `start ${formatNumber(f.startC)} °C (fill ${formatNumber(f.saltMassG)} g salt in ${formatNumber(f.waterMassG)} g water)` }] : [];
  const out: ChartMark[] = [];
  for (const m of [...(settings.specThresholds ?? []), ...start]) {
    if (Number.isFinite(m.at) && !out.some((o) => o.at === m.at)) out.push({ at: m.at, label: m.label });
  }
  for (const m of extra) {
    if (!Number.isFinite(m.at)) continue;
    const same = out.findIndex((o) => o.at === m.at);
    if (same >= 0) out[same] = { at: m.at, label: m.label };
    else out.push({ at: m.at, label: m.label });
  }
  return out;
}

/** A value marker of a given basis, centred on (x, y), of half-size r. */
function marker(basis: Basis, x: number, y: number, r: number, fill: string, stroke: string): string {
  const common = { fill, stroke, 'stroke-width': 1.4 };
  switch (basis) {
    case 'measured':
      return el('circle', { cx: x, cy: y, r, ...common });
    case 'cycle':
      return el('rect', { x: x - r * 0.9, y: y - r * 0.9, width: r * 1.8, height: r * 1.8, ...common });
    case 'anchored':
      return el('path', { d: `M${num(x)} ${num(y - r * 1.25)}L${num(x + r * 1.25)} ${num(y)}L${num(x)} ${num(y + r * 1.25)}L${num(x - r * 1.25)} ${num(y)}Z`, ...common });
    case 'model':
      return el('path', { d: `M${num(x)} ${num(y - r * 1.2)}L${num(x + r * 1.15)} ${num(y + r * 0.85)}L${num(x - r * 1.15)} ${num(y + r * 0.85)}Z`, ...common });
  }
}

/** `34.89 [34.50, 35.28]`, rounded to the uncertainty (two significant digits of u). */
function valueText(e: Estimate): string {
  const f = formatEstimate(e, e.unit === '°C' ? { resolution: TEMPERATURE_RESOLUTION_K } : {});
  return `${f.value}  [${f.low}, ${f.high}]`;
}

/**
 * Draws the ranked interval chart of a screen as a standalone SVG document.
 *
 * Rows are the computed candidates with an objective, in rank order (by
 * `rank` where the rows have one, else as given), grouped: those that suit
 * the direction, then those whose verdict is undetermined (the 95 % interval
 * of ΔsolH spans zero: shaded band, hollow markers, dashed bars), then those
 * that work the other way (greyed). Each row shows the 95 % interval as a
 * bar, the value as a marker whose shape gives the basis (circle measured,
 * square cycle, diamond anchored, triangle model; legend at the top), and the
 * numbers at the right. A vertical line marks zero; dashed lines mark each
 * threshold the screen's spec sets on the objective (`settings.specThresholds`,
 * as {@link screen} returns them), the start temperature of the standard fill
 * when ranking by the temperature it reaches, and any `marks` given.
 * The axis is drawn at the top and the bottom, so eighty rows read as well
 * as ten; with more than ten rows it spans every value but leaves out the
 * widest tenth of the interval ends at each side (such a bar ends in an
 * arrow), so that one wild interval cannot squeeze all the others.
 *
 * @param result - the result of {@link screen} (or its settings with some of its rows); enthalpies in kJ/mol,
 *   heats per gram in J/g, temperatures in °C, as the objective gives them
 * @param options - title, extra reference lines (`marks`, in the objective's unit), most rows drawn, width in px
 * @returns SVG text
 * @see W3C, Scalable Vector Graphics (SVG) 1.1 (Second Edition), W3C Recommendation, 16 August 2011, for the output format; the
 *   intervals drawn are those of the rows (see {@link screen} for their sources).
 *
 * @example
 * ```ts
 * const svg = intervalChart(screen(['KNO3', 'NH4Cl', 'NaCl']));
 * svg.startsWith('<svg'); // true
 * svg.includes('KNO₃'); // true
 * svg.includes('kJ/mol'); // true
 * // a hot-pack screen with a fill and a spec: the spec's threshold and the fill's start are drawn from the result
 * const hot = intervalChart(screen(['CaCl2', 'MgSO4', 'LiCl'], { direction: 'heat', fill: '30:100@20', spec: 'fill.finalTemperature.value > 40' }));
 * hot.includes('spec: fill.finalTemperature.value &gt; 40'); // true
 * hot.includes('start 20 °C'); // true
 * ```
 */
export function intervalChart(result: ChartableScreen, options?: IntervalChartOptions): string {
  return drawChecked(result, options, 'result', 'screen', draw);
}

function draw(result: ChartableScreen, options: IntervalChartOptions): string {
  const { objective, direction } = result.settings;
  const maxRows = Math.max(1, Math.floor(options.maxRows ?? 100));
  const width = Math.max(640, options.width ?? 960);
  const ranked = result.rows.filter((r) => r.status === 'computed' && r.objective !== undefined && r.suitability !== undefined);
  const ordered = ranked.every((r) => r.rank !== undefined) ? [...ranked].sort((a, b) => a.rank! - b.rank!) : [...ranked];
  const shown = ordered.slice(0, maxRows);
  const failed = result.summary?.failed ?? result.rows.filter((r) => r.status === 'failed').length;
  const excluded = result.summary?.excluded ?? result.rows.filter((r) => r.status === 'excluded').length;
  const computed = result.summary?.computed ?? result.rows.filter((r) => r.status === 'computed').length;
  const noObjective = result.summary ? 0 : result.rows.filter((r) => r.status === 'computed' && r.objective === undefined).length;
  const notShownRanked = (result.summary ? computed : ordered.length) - shown.length;
  const unit = shown[0]?.objective!.unit ?? '';
  const n = shown.length;

  // Row geometry: generous at ten rows, compact but legible at eighty.
  const rowH = n <= 15 ? 26 : n <= 40 ? 20 : 16;
  const font = n <= 40 ? 12 : 11;
  const markerR = rowH <= 16 ? 4 : 5;
  const labels = shown.map((r) => `${r.rank !== undefined ? `${r.rank}. ` : ''}${formulaText(r.formula ?? r.input.formula)}`);
  const labelW = Math.min(260, Math.max(90, ...labels.map((l) => textWidth(l, font) + 24)));
  const valueTexts = shown.map((r) => valueText(r.objective!));
  const valueW = Math.max(120, ...valueTexts.map((v) => textWidth(v, font) + 16));
  const left = labelW;
  const right = width - valueW - 16;

  const marks = chartMarks(result.settings, options.marks ?? []);
  // Domain: the values that matter, zero and every mark, and the interval ends near them. A wild value or interval
  // is clipped at the axis (an arrow, and its numbers stand whole at the right), so one exotic model row cannot
  // squeeze every other row into a few pixels.
  const [lo, hi] = focusRange(
    shown.map((r) => r.objective!.value),
    shown.flatMap((r) => [r.objective!.low, r.objective!.high]),
    [0, ...marks.map((m) => m.at)],
  );
  const { ticks, domain } = niceTicks(lo, hi, width > 800 ? 8 : 6);
  const x = linearScale(domain, [left, right]);

  const title = options.title ?? `${OBJECTIVE_TITLE[objective]} — candidates ranked for ${direction === 'cool' ? 'a cold pack' : 'a hot pack'}`;
  const subtitle = `${unit ? `${unit}; ` : ''}bars are 95 % intervals, markers the values${objective === 'enthalpy' ? '; positive = endothermic (cools)' : objective === 'heat-per-gram' ? '; positive = heat absorbed (cools)' : ''}`;

  // Header: title, subtitle, legend.
  const parts: string[] = [];
  let y = 26;
  parts.push(text(16, y, title, { class: 'heading' }));
  y += 20;
  parts.push(text(16, y, subtitle, { class: 'muted label' }));
  y += 18;
  parts.push(text(16, y, inputsLine(result.settings), { class: 'muted label' }));
  y += 22;
  const bases = [...new Set(shown.map((r) => r.objective!.basis))];
  const legendBases: Basis[] = (['measured', 'cycle', 'anchored', 'model'] as const).filter((b) => bases.includes(b) || bases.length === 0);
  let lx = 16;
  parts.push(text(lx, y + 4, 'Basis:', { class: 'label' }));
  lx += 48;
  for (const b of legendBases) {
    parts.push(marker(b, lx + 5, y, 5, palette.ink, palette.ink));
    parts.push(text(lx + 15, y + 4, BASIS_LABEL[b], { class: 'label' }));
    lx += 28 + textWidth(BASIS_LABEL[b], 12);
  }
  lx += 10;
  parts.push(el('rect', { x: lx, y: y - 6, width: 26, height: 12, fill: palette.unsureTint, stroke: palette.unsure, 'stroke-dasharray': '3 2' }));
  parts.push(text(lx + 32, y + 4, 'undetermined: interval spans zero', { class: 'label' }));
  y += 22;

  const axisTop = y + 30 + 14 * marks.length;
  const axis = (at: number, below: boolean): string[] =>
    ticks.map((t) => text(x(t), below ? at + 14 : at - 4, tickLabel(t), { class: 'small muted', 'text-anchor': 'middle' }));

  // Body rows, grouped.
  const body: string[] = [];
  const shading: string[] = [];
  let rowY = axisTop + 6;
  const bands: { y0: number; y1: number }[] = [];
  const cool = direction === 'cool';
  const groupTitle: Record<Suitability, string> = {
    suitable: cool ? 'Cools (endothermic) — ranked' : 'Heats (exothermic) — ranked',
    undetermined: 'Undetermined — the 95 % interval of ΔsolH spans zero: measure before relying on these',
    unsuitable: cool ? 'Works the other way (heats)' : 'Works the other way (cools)',
  };
  let index = 0;
  let clippedValues = 0;
  for (const group of GROUP_ORDER) {
    const rows = shown.map((r, i) => ({ r, i })).filter(({ r }) => r.suitability === group);
    if (rows.length === 0) continue;
    rowY += 6;
    body.push(text(12, rowY + 12, groupTitle[group], { class: 'label', 'font-weight': '600', fill: group === 'undetermined' ? palette.unsure : palette.ink }));
    rowY += 20;
    const y0 = rowY;
    for (const { r, i } of rows) {
      const e = r.objective!;
      const cy = rowY + rowH / 2;
      if (group === 'undetermined') shading.push(el('rect', { x: 4, y: rowY, width: width - 8, height: rowH, fill: palette.unsureTint }));
      else if (index % 2 === 1) shading.push(el('rect', { x: 4, y: rowY, width: width - 8, height: rowH, fill: palette.zebra }));
      const colour = group === 'suitable' ? (cool ? palette.cold : palette.hot) : group === 'undetermined' ? palette.unsure : palette.neutral;
      body.push(text(left - 10, cy + font * 0.36, labels[i]!, { 'text-anchor': 'end', 'font-size': font, ...(group === 'unsuitable' ? { class: 'muted' } : {}), ...(group === 'undetermined' ? { 'font-style': 'italic' } : {}) }));
      const x0 = Math.max(left, Math.min(right, x(e.low)));
      const x1 = Math.max(left, Math.min(right, x(e.high)));
      body.push(el('line', { x1: x0, y1: cy, x2: Math.max(x1, x0 + 1), y2: cy, stroke: colour, 'stroke-width': rowH <= 16 ? 3 : 4, 'stroke-linecap': 'butt', ...(group === 'undetermined' ? { 'stroke-dasharray': '5 3' } : {}), ...(group === 'unsuitable' ? { opacity: 0.6 } : {}) }));
      const h = rowH * 0.25;
      for (const [end, clipped, dir] of [[x0, x(e.low) < left, -1], [x1, x(e.high) > right, 1]] as const) {
        if (clipped) body.push(el('path', { d: `M${num(end)} ${num(cy)}L${num(end - dir * 8)} ${num(cy - h - 1)}L${num(end - dir * 8)} ${num(cy + h + 1)}Z`, fill: colour }));
        else body.push(el('line', { x1: end, y1: cy - h, x2: end, y2: cy + h, stroke: colour, 'stroke-width': 1.2 }));
      }
      const hollow = group === 'undetermined';
      const vx = x(e.value);
      if (vx < left || vx > right) {
        // The value itself lies beyond the axis: a double chevron at the edge, pointing out.
        const edge = vx < left ? left : right;
        const d = vx < left ? -1 : 1;
        const w = markerR * 1.2;
        body.push(el('path', { d: `M${num(edge - d * 2 * w)} ${num(cy - w)}L${num(edge - d * w)} ${num(cy)}L${num(edge - d * 2 * w)} ${num(cy + w)}M${num(edge - d * w)} ${num(cy - w)}L${num(edge)} ${num(cy)}L${num(edge - d * w)} ${num(cy + w)}`, fill: 'none', stroke: colour === palette.neutral ? palette.muted : colour, 'stroke-width': 2 }));
        clippedValues++;
      } else body.push(marker(e.basis, vx, cy, markerR, hollow ? palette.background : colour, group === 'suitable' ? palette.ink : colour));
      body.push(text(right + 12, cy + font * 0.36, valueTexts[i]!, { 'font-size': font, class: group === 'unsuitable' ? 'muted' : '' }));
      rowY += rowH;
      index++;
    }
    bands.push({ y0, y1: rowY });
  }
  const bodyBottom = rowY + 6;

  // Grid, zero and marks, drawn under the rows' markers but over the shading.
  const grid: string[] = ticks.map((t) => el('line', { x1: x(t), y1: axisTop, x2: x(t), y2: bodyBottom, stroke: palette.grid, 'stroke-width': 1 }));
  const overlay: string[] = [];
  const hintY = axisTop - 20;
  if (domain[0] <= 0 && domain[1] >= 0) {
    overlay.push(el('line', { x1: x(0), y1: axisTop - 2, x2: x(0), y2: bodyBottom, stroke: palette.ink, 'stroke-width': 1.5 }));
    if (objective === 'enthalpy' || objective === 'heat-per-gram') {
      const heats = '← heats (exothermic)';
      const cools = 'cools (endothermic) →';
      if (x(0) - left > textWidth(heats, 11) + 8) overlay.push(text(x(0) - 6, hintY, heats, { class: 'small', 'text-anchor': 'end', fill: palette.hot }));
      if (right - x(0) > textWidth(cools, 11) + 8) overlay.push(text(x(0) + 6, hintY, cools, { class: 'small', fill: palette.cold }));
    } else overlay.push(text(x(0) + 4, hintY, objective === 'fill-temperature' ? '0 °C' : 'zero', { class: 'small', 'font-weight': '600' }));
  }
  // Each mark's label on a line of its own above the zero hints, the rightmost lowest: a line then runs down only past
  // labels that start to its right, never through one. A label that would run off the chart turns to the left.
  [...marks].sort((a, b) => b.at - a.at).forEach((m, i) => {
    const ly = hintY - 14 * (i + 1);
    const leftward = x(m.at) + 4 + textWidth(m.label, 11) > width - 8;
    overlay.push(el('line', { x1: x(m.at), y1: ly + 3, x2: x(m.at), y2: bodyBottom, stroke: palette.limit, 'stroke-width': 1.5, 'stroke-dasharray': '6 3' }));
    overlay.push(text(x(m.at) + (leftward ? -4 : 4), ly, m.label, { class: 'small', fill: palette.limit, ...(leftward ? { 'text-anchor': 'end' } : {}) }));
  });

  // Footer: axis title, what is not shown, the caution.
  let footY = bodyBottom + 18;
  const footer: string[] = [...axis(bodyBottom, true)];
  footY += 12;
  footer.push(text((left + right) / 2, footY, `${OBJECTIVE_TITLE[objective]}${unit ? ` (${unit})` : ''}`, { class: 'label', 'text-anchor': 'middle' }));
  const missing: string[] = [];
  const total = result.summary?.read ?? result.rows.length;
  if (notShownRanked > 0) missing.push(`${notShownRanked} more computed candidate${notShownRanked === 1 ? '' : 's'} not drawn`);
  if (failed > 0) missing.push(`${failed} could not be computed`);
  if (excluded > 0) missing.push(`${excluded} left out by filters`);
  if (noObjective > 0) missing.push(`${noObjective} without ${objective === 'cost-per-kj' ? 'a price' : 'a value to rank by'}`);
  footY += 22;
  if (shown.some((r) => x(r.objective!.low) < left || x(r.objective!.high) > right)) {
    footer.push(text(16, footY, 'An arrow at the end of a bar marks an interval that runs past the axis; the numbers at the right give it whole.', { class: 'small muted' }));
    footY += 16;
  }
  if (clippedValues > 0) {
    footer.push(text(16, footY, `» at the edge: ${clippedValues} value${clippedValues === 1 ? '' : 's'} beyond the axis, left out of its range so that the others can be read.`, { class: 'small muted' }));
    footY += 16;
  }
  footer.push(text(16, footY, `${n} of ${total} candidate${total === 1 ? '' : 's'} drawn${missing.length > 0 ? `; ${missing.join(', ')}` : ''}.`, { class: 'small muted' }));
  footY += 16;
  footer.push(text(16, footY, 'Screening estimates: confirm by measurement, and defer to local codes, product-safety regulation and licensed practice.', { class: 'small muted' }));
  const height = footY + 16;

  const description = `${n} candidates ranked by ${objective}; ${bands.length} groups`;
  return svgDocument(width, height, title, [...parts, ...shading, ...grid, ...axis(axisTop, false), ...overlay, ...body, ...footer], description);
}
