/**
 * Notes and cautions for a terminal: one bullet each, wrapped to the output
 * width, continuation lines indented under the text, true minus signs, formulas with subscripts.
 *
 * @module
 */
import { withTrueMinus } from '../../notation/minus.js';
import { wrapText } from '../../notation/wrapText.js';
import { formulasInText } from '../../notation/formula.js';

/** Each paragraph as a bullet (`  - `) wrapped to `width` columns. */
export function bulletLines(paragraphs: readonly string[], width: number, bullet = '  - '): string[] {
  return paragraphs.flatMap((p) => wrapText(formulasInText(withTrueMinus(p)), width, bullet));
}
