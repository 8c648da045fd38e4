/**
 * Wrapping of paragraphs for a terminal or a fixed-width report: words are
 * kept whole (a word longer than the line stands alone), continuation lines
 * are indented under the first line's text.
 *
 * @module
 */

/**
 * Breaks `text` into lines of at most `width` characters (counted as code
 * points), the first line starting with `first`, later ones with `rest`
 * (default: spaces as wide as `first`). Existing line breaks are kept.
 */
export function wrapText(text: string, width: number, first = '', rest = ' '.repeat([...first].length)): string[] {
  const lines: string[] = [];
  let lead = first;
  for (const paragraph of text.split('\n')) {
    if ([...lead].length + [...paragraph].length <= width) {
      // Short enough: kept as written, spacing and all.
      lines.push((lead + paragraph).trimEnd());
      lead = rest;
      continue;
    }
    let line = lead;
    let empty = true;
    for (const word of paragraph.split(' ')) {
      if (word === '') continue;
      const len = [...line].length + (empty ? 0 : 1) + [...word].length;
      if (!empty && len > width) {
        lines.push(line);
        line = rest + word;
      } else line += (empty ? '' : ' ') + word;
      empty = false;
    }
    lines.push(line.trimEnd());
    lead = rest;
  }
  return lines;
}
