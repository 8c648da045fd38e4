/**
 * A small SVG writer shared by every chart: escaping, elements, a document
 * wrapper with embedded styles, linear scales and "nice" axis ticks. Charts
 * are standalone SVG text, so they work in a browser, a notebook, a file or
 * a PNG converter without any runtime.
 *
 * @module
 */
import { fontStack, palette } from './palette.js';
import { formatNumber } from '../notation/minus.js';
import { unsignedZero } from '../numeric/unsignedZero.js';

/** Escapes text for an SVG (XML) text node or attribute value. */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!);
}

/** Formats a coordinate compactly (two decimals, no trailing zeros). */
export function num(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError(`an SVG coordinate must be finite, got ${x}`);
  const r = Math.round(x * 100) / 100;
  return String(unsignedZero(r));
}

type Attributes = Record<string, string | number | undefined>;

function attrs(a: Attributes): string {
  return Object.entries(a)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => ` ${k}="${typeof v === 'number' ? num(v) : escapeXml(v!)}"`)
    .join('');
}

/** One element; `children` is already-rendered SVG, or text when `text` is true. */
export function el(name: string, attributes: Attributes = {}, children: string | readonly string[] = '', options: { text?: boolean } = {}): string {
  const body = Array.isArray(children) ? children.join('') : (children as string);
  const inner = options.text ? escapeXml(body) : body;
  return inner === '' ? `<${name}${attrs(attributes)}/>` : `<${name}${attrs(attributes)}>${inner}</${name}>`;
}

/** A text element. */
export function text(x: number, y: number, content: string, attributes: Attributes = {}): string {
  return el('text', { x, y, ...attributes }, content, { text: true });
}

/**
 * A complete standalone SVG document with a title (for screen readers and
 * file viewers), a white background and the house styles.
 */
export function svgDocument(width: number, height: number, title: string, body: readonly string[], description = ''): string {
  const style = `text{font-family:${fontStack};fill:${palette.ink}}.muted{fill:${palette.muted}}.small{font-size:11px}.label{font-size:12px}.heading{font-size:15px;font-weight:600}`;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${num(width)}" height="${num(height)}" viewBox="0 0 ${num(width)} ${num(height)}" role="img">` +
    el('title', {}, title, { text: true }) +
    (description ? el('desc', {}, description, { text: true }) : '') +
    el('style', {}, style) +
    el('rect', { x: 0, y: 0, width, height, fill: palette.background }) +
    body.join('') +
    '</svg>\n'
  );
}

/** A linear map from a data interval to a pixel interval. */
export function linearScale(domain: readonly [number, number], range: readonly [number, number]): (x: number) => number {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0 || 1;
  return (x) => r0 + ((x - d0) / span) * (r1 - r0);
}

/**
 * About `count` round tick values covering [lo, hi] (steps of 1, 2 or 5 × 10ⁿ),
 * and the widened domain they span.
 */
export function niceTicks(lo: number, hi: number, count = 6): { ticks: number[]; domain: [number, number] } {
  if (!(hi > lo)) {
    const pad = Math.abs(lo) > 0 ? Math.abs(lo) * 0.1 : 1;
    lo -= pad;
    hi += pad;
  }
  const raw = (hi - lo) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const start = Math.floor(lo / step) * step;
  const end = Math.ceil(hi / step) * step;
  const ticks: number[] = [];
  for (let i = 0; start + i * step <= end + step * 1e-9; i++) ticks.push(Number((start + i * step).toPrecision(12)));
  return { ticks, domain: [start, end] };
}

/** A tick label without floating-point noise (0.30000000000000004 → 0.3). */
export function tickLabel(x: number): string {
  return formatNumber(Number(x.toPrecision(10)));
}
