/**
 * Edits records of a data table in its JSON text, leaving every other byte as
 * it was (2-space indent, key order, number spellings such as `1.0`), so that
 * a diff shows only the fields that changed.
 *
 * Records must be written one field per line at six spaces, as every table
 * under data/ is. A field that exists is replaced on its line; a new field goes
 * after the `after` field when given (else last). The result is parsed again
 * and compared with the intended records, so a formatting surprise fails loudly.
 *
 * @module
 */
import { isDeepStrictEqual } from 'node:util';

/** Fields to set on one record (by its index in `records`), and where a new field goes. */
export interface RecordEdit {
  index: number;
  set: Record<string, unknown>;
  /** A new field is inserted after this one (e.g. `checkedAgainst` after `fromMemory`). */
  after?: Record<string, string>;
  /** Edit the fields of this nested object of the record instead (written one field per line at eight spaces), e.g. `solidHeatCapacity`. */
  field?: string;
}

/** The name of the field a line starts, at the given indent. */
const fieldAt = (line: string, indent: number): string | undefined => new RegExp(`^ {${indent}}"([^"]+)": `).exec(line)?.[1];

/** Applies the edits to a table's JSON text and returns the new text. */
export function editRecords(text: string, edits: readonly RecordEdit[]): string {
  const lines = text.split('\n');
  const start = lines.findIndex((l) => l === '  "records": [');
  if (start < 0) throw new Error('no "records": [ line at two spaces');
  // Line ranges of each record: from "    {" to "    }" / "    },".
  const blocks: { from: number; to: number }[] = [];
  for (let i = start + 1; i < lines.length && !lines[i]!.startsWith('  ]'); i++) {
    if (lines[i] === '    {') {
      const from = i;
      while (!/^ {4}\},?$/.test(lines[i]!)) i++;
      blocks.push({ from, to: i });
    }
  }
  const expected = JSON.parse(text);
  if (blocks.length !== expected.records.length) throw new Error(`found ${blocks.length} record blocks for ${expected.records.length} records`);
  // Later blocks first, so earlier line numbers stay valid.
  const byIndex = [...edits].sort((a, b) => b.index - a.index);
  for (const edit of byIndex) {
    let block = blocks[edit.index]!;
    let indent = 6;
    let target = expected.records[edit.index];
    if (edit.field) {
      // Narrow the block to the nested object: from `      "field": {` to its closing `      }`.
      const from = lines.findIndex((l, i) => i > block.from && i < block.to && l === `      ${JSON.stringify(edit.field)}: {`);
      if (from < 0) throw new Error(`record ${edit.index} has no nested object ${edit.field} on its own lines`);
      let to = from + 1;
      while (to < block.to && !/^ {6}\},?$/.test(lines[to]!)) to++;
      block = { from, to }; // a copy: the record's own range grows below
      indent = 8;
      target = target[edit.field];
    }
    const pad = ' '.repeat(indent);
    for (const [key, value] of Object.entries(edit.set)) {
      target[key] = value;
      const rendered = JSON.stringify(value);
      let at = -1;
      for (let i = block.from + 1; i < block.to; i++) if (fieldAt(lines[i]!, indent) === key) at = i;
      if (at >= 0) {
        const comma = lines[at]!.endsWith(',') ? ',' : '';
        if (lines[at + 1] !== undefined && fieldAt(lines[at + 1]!, indent) === undefined && at + 1 < block.to) throw new Error(`field ${key} spans several lines; not edited`);
        lines[at] = `${pad}${JSON.stringify(key)}: ${rendered}${comma}`;
        continue;
      }
      const anchorKey = edit.after?.[key];
      let anchor = block.to - 1;
      if (anchorKey) for (let i = block.from + 1; i < block.to; i++) if (fieldAt(lines[i]!, indent) === anchorKey) anchor = i;
      const isLast = anchor === block.to - 1;
      if (isLast) lines[anchor] = `${lines[anchor]},`;
      lines.splice(anchor + 1, 0, `${pad}${JSON.stringify(key)}: ${rendered}${isLast ? '' : ','}`);
      block.to++;
      if (edit.field) blocks[edit.index]!.to++;
    }
  }
  const out = lines.join('\n');
  if (!isDeepStrictEqual(JSON.parse(out), expected)) throw new Error('the edited text does not parse to the intended records');
  return out;
}
