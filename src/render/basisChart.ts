/**
 * Every basis of one salt's enthalpy of solution as a row: its 95 % interval
 * as a bar, its value as a tick, zero marked. The colour of a row says what
 * the interval says: `cold` when the whole interval is endothermic, `hot`
 * when it is exothermic, `unsure` when it spans zero; the best estimate is
 * drawn first and named so.
 *
 * @module
 */
import type { Estimate } from '../quantity/estimate.js';
import { formatEstimate } from '../quantity/formatEstimate.js';
import { formulaText } from '../notation/formula.js';
import { formatNumber } from '../notation/minus.js';
import { focusRange } from './focusRange.js';
import { palette } from './palette.js';
import { textWidth } from './textBox.js';
import { el, linearScale, niceTicks, svgDocument, text, tickLabel } from './svg.js';

/** What the chart needs: the salt, the best estimate and every basis (kJ/mol). */
export interface BasisChartInput {
  formula: string;
  best: Estimate;
  estimates: readonly Estimate[];
  temperature: { celsius: number };
}

const ROW = 34;
const TOP = 58;
const BOTTOM = 46;
const RIGHT = 24;

function colourOf(e: Pick<Estimate, 'low' | 'high'>): string {
  return e.low > 0 ? palette.cold : e.high < 0 ? palette.hot : palette.unsure;
}

/**
 * The bases of a dissolve result as an SVG chart.
 *
 * @param result - `dissolve`'s result, or its formula, best and estimates
 * @param width - pixels (default 720)
 */
export function basisChart(result: BasisChartInput, width = 720): string {
  const rows = [{ label: `best (${result.best.basis})`, e: result.best }, ...result.estimates.map((e) => ({ label: `${e.basis}, ${e.method}`, e }))];
  const labels = rows.map((r) => (r.label.length > 44 ? `${r.label.slice(0, 43)}…` : r.label));
  const left = Math.min(width * 0.45, Math.max(...labels.map((l) => textWidth(l, 12))) + 20);
  const height = TOP + rows.length * ROW + BOTTOM;
  const [lo, hi] = focusRange(rows.map((r) => r.e.value), rows.flatMap((r) => [r.e.low, r.e.high]), [0]);
  const { ticks, domain } = niceTicks(lo, hi, 6);
  const x = linearScale(domain, [left, width - RIGHT]);
  const body: string[] = [];
  const title = `Enthalpy of solution of ${formulaText(result.formula)} at ${formatNumber(result.temperature.celsius)} °C, every basis`;
  body.push(text(12, 22, title, { class: 'heading' }));
  body.push(text(12, 40, '95 % intervals; + = endothermic (cools), − = exothermic (heats)', { class: 'small muted' }));
  const plotBottom = TOP + rows.length * ROW;
  for (let i = 1; i < rows.length; i += 2) body.push(el('rect', { x: 0, y: TOP + i * ROW, width, height: ROW, fill: palette.zebra }));
  for (const t of ticks) {
    body.push(el('line', { x1: x(t), x2: x(t), y1: TOP - 6, y2: plotBottom, stroke: t === 0 ? palette.muted : palette.grid, 'stroke-width': t === 0 ? 1.5 : 1 }));
    body.push(text(x(t), plotBottom + 16, tickLabel(t), { class: 'small muted', 'text-anchor': 'middle' }));
  }
  body.push(text((left + width - RIGHT) / 2, plotBottom + 36, 'ΔsolH°, kJ/mol', { class: 'label muted', 'text-anchor': 'middle' }));
  const clip = (v: number) => Math.min(width - RIGHT, Math.max(left, x(v)));
  rows.forEach((r, i) => {
    const y = TOP + i * ROW + ROW / 2;
    const colour = colourOf(r.e);
    const f = formatEstimate(r.e, { signed: true });
    const parts = [el('title', {}, `${r.label}: ${f.value} kJ/mol, 95 % interval ${f.low} to ${f.high}`, { text: true })];
    parts.push(text(12, y + 4, labels[i]!, { class: 'label', 'font-weight': i === 0 ? 600 : undefined }));
    parts.push(el('line', { x1: clip(r.e.low), x2: clip(r.e.high), y1: y, y2: y, stroke: colour, 'stroke-width': 6, 'stroke-linecap': 'butt' }));
    parts.push(el('line', { x1: clip(r.e.value), x2: clip(r.e.value), y1: y - 9, y2: y + 9, stroke: palette.ink, 'stroke-width': 2 }));
    body.push(el('g', {}, parts));
  });
  return svgDocument(width, height, title, body, `One row per basis: the bar is the 95 % interval, the tick the value. ${rows.length} rows.`);
}
