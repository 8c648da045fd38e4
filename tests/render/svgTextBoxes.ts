// Reads the text elements of a chart back out of its SVG and estimates their
// boxes with the charts' own metrics, for the "no two labels overlap" checks.
import { boxesOverlap, textBox, type TextBox } from '../../src/render/textBox.js';

export interface DrawnText extends TextBox {
  content: string;
}

const SIZE_OF_CLASS: Record<string, number> = { small: 11, label: 12, heading: 15 };

function unescape(s: string): string {
  return s.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&amp;/g, '&');
}

/** Every text element of `svg` with its estimated box; rotated texts are turned on their side. */
export function drawnTexts(svg: string): DrawnText[] {
  const out: DrawnText[] = [];
  for (const m of svg.matchAll(/<text([^>]*)>([^<]*)<\/text>/g)) {
    const attr = (name: string) => new RegExp(` ${name}="([^"]*)"`).exec(m[1]!)?.[1];
    const x = Number(attr('x'));
    const y = Number(attr('y'));
    const classes = (attr('class') ?? '').split(' ');
    const size = Number(attr('font-size') ?? classes.map((c) => SIZE_OF_CLASS[c]).find((s) => s !== undefined) ?? 14);
    const anchor = (attr('text-anchor') ?? 'start') as 'start' | 'middle' | 'end';
    const content = unescape(m[2]!);
    let box = textBox(x, y, content, size, anchor);
    if (attr('transform')?.startsWith('rotate(-90')) {
      // Rotated about (x, y): width runs up the page.
      const w = box.x1 - box.x0;
      const along = anchor === 'middle' ? w / 2 : anchor === 'end' ? w : 0;
      box = { x0: x - size * 0.8, x1: x + size * 0.25, y0: y - (w - along), y1: y + along };
    }
    out.push({ ...box, content });
  }
  return out;
}

/** Every pair of texts whose boxes overlap, as readable strings. */
export function overlappingTexts(svg: string): string[] {
  const texts = drawnTexts(svg);
  const clashes: string[] = [];
  for (let i = 0; i < texts.length; i++) for (let j = i + 1; j < texts.length; j++) if (boxesOverlap(texts[i]!, texts[j]!)) clashes.push(`"${texts[i]!.content}" × "${texts[j]!.content}"`);
  return clashes;
}

/** Texts that run past the drawing's edges. */
export function textsOutside(svg: string): string[] {
  const width = Number(/width="([\d.]+)"/.exec(svg)![1]);
  const height = Number(/height="([\d.]+)"/.exec(svg)![1]);
  return drawnTexts(svg)
    .filter((t) => t.x0 < -0.5 || t.y0 < -0.5 || t.x1 > width + 0.5 || t.y1 > height + 0.5)
    .map((t) => t.content);
}
