/**
 * The space a label takes, and a placer that keeps labels apart. Widths
 * are estimated from the characters (the charts name a font stack but
 * cannot know which font the viewer has): the estimate leans wide, so that
 * labels kept apart here stay apart in the widest font of the stack.
 *
 * @module
 */
import { SUBSCRIPT_DIGITS } from '../notation/formula.js';
import { SUPERSCRIPT_CHARACTERS } from '../notation/charge.js';

/** A label's box in px: left, top, right, bottom. */
export interface TextBox {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Width of one character as a fraction of the font size (a wide sans-serif such as DejaVu Sans). */
function charWidth(c: string): number {
  if (SUBSCRIPT_DIGITS.includes(c) || SUPERSCRIPT_CHARACTERS.includes(c)) return 0.42;
  if (c === ' ') return 0.33;
  if ('il.,:;\'|!·()[]'.includes(c)) return 0.36;
  if ('mwMW%@'.includes(c)) return 0.95;
  if ('①②③④⑤⑥⑦⑧⑨⑩⑪⑫⑬⑭⑮⑯⑰⑱⑲⑳→←°'.includes(c)) return 0.9;
  if (c >= 'A' && c <= 'Z') return 0.72;
  if (c >= '0' && c <= '9') return 0.64;
  return 0.62;
}

/** Estimated width of `content` at `size` px. */
export function textWidth(content: string, size: number): number {
  let w = 0;
  for (const c of content) w += charWidth(c);
  return w * size;
}

/** The box of a text drawn at (x, y) (y the baseline) with a `text-anchor`. */
export function textBox(x: number, y: number, content: string, size: number, anchor: 'start' | 'middle' | 'end' = 'start'): TextBox {
  const w = textWidth(content, size);
  const x0 = anchor === 'start' ? x : anchor === 'middle' ? x - w / 2 : x - w;
  return { x0, y0: y - size * 0.8, x1: x0 + w, y1: y + size * 0.25 };
}

/** Whether two boxes share more than `slack` px in both directions. */
export function boxesOverlap(a: TextBox, b: TextBox, slack = 0.5): boolean {
  return Math.min(a.x1, b.x1) - Math.max(a.x0, b.x0) > slack && Math.min(a.y1, b.y1) - Math.max(a.y0, b.y0) > slack;
}

/** A text position to try: where, and which way it is anchored. */
export interface LabelSpot {
  x: number;
  y: number;
  anchor?: 'start' | 'middle' | 'end';
}

/**
 * Keeps the labels of one chart apart: every label placed, and any box
 * reserved (a plotted curve's label area, a legend), is remembered; a new
 * label takes the first of its candidate spots whose box is free and inside
 * the bounds, else the last spot.
 */
export class LabelPlacer {
  /** Taken boxes, each with the cost per px² of covering it: a label costs far more than a line or a curve. */
  private readonly taken: { box: TextBox; weight: number }[] = [];

  constructor(private readonly bounds: TextBox) {}

  /** Marks a box as taken: `label` for text (never to be covered), else a line, curve or marker (better not). */
  reserve(box: TextBox, kind: 'label' | 'drawing' = 'drawing'): void {
    this.taken.push({ box, weight: kind === 'label' ? 1000 : 1 });
  }

  /** What covering `box` would cost: 0 when it is free and inside the bounds. */
  private cost(box: TextBox): number {
    const b = this.bounds;
    const outside = box.x0 < b.x0 || box.x1 > b.x1 || box.y0 < b.y0 || box.y1 > b.y1 ? 1e9 : 0;
    let sum = outside;
    for (const t of this.taken) {
      if (!boxesOverlap(t.box, box)) continue;
      const w = Math.min(t.box.x1, box.x1) - Math.max(t.box.x0, box.x0);
      const h = Math.min(t.box.y1, box.y1) - Math.max(t.box.y0, box.y0);
      sum += t.weight * (1 + w * h);
    }
    return sum;
  }

  /** Whether a box is free of every taken box and inside the bounds. */
  fits(box: TextBox): boolean {
    return this.cost(box) === 0;
  }

  /**
   * Picks the first free spot for `content` at `size` px (else the spot that covers least, never another label
   * where that can be helped), reserves it as a label and returns it.
   */
  place(content: string, size: number, spots: readonly LabelSpot[]): Required<LabelSpot> {
    let best: Required<LabelSpot> | undefined;
    let bestCost = Infinity;
    for (const s of spots) {
      const spot = { x: s.x, y: s.y, anchor: s.anchor ?? 'start' };
      const cost = this.cost(textBox(spot.x, spot.y, content, size, spot.anchor));
      if (cost < bestCost) {
        best = spot;
        bestCost = cost;
        if (cost === 0) break;
      }
    }
    const chosen = best!;
    this.reserve(textBox(chosen.x, chosen.y, content, size, chosen.anchor), 'label');
    return chosen;
  }
}
