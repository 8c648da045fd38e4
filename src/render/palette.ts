/**
 * The colours and type of every ionheat chart, chosen for this data.
 *
 * Heat and cold are the two meanings every chart carries, so they get the
 * two strongest, most separable hues: a deep teal-blue for endothermic /
 * cooling / cold and a burnt orange for exothermic / heating / hot. They
 * differ in lightness as well as hue, so they stay apart for the common
 * red–green deficiencies (protanopia, deuteranopia) and for tritanopia, and
 * in greyscale print. Every other role (the solved step, targets, the
 * specification threshold, undetermined rows) takes a hue that neither of
 * the two uses — plum, olive-gold — at a lightness of its own. Text colours
 * keep a contrast of at least 4.5:1 on white (WCAG 2.1, 1.4.3).
 *
 * The same constant means the same thing in every chart: `cold` is always
 * endothermic and cooling, `hot` always exothermic and heating.
 *
 * @module
 */

/** Colours by what they mean. */
export const palette = {
  /** Endothermic, cooling, cold fills, "cools". */
  cold: '#1b6e8f',
  /** Light tint of `cold` for bands and shading. */
  coldTint: '#d3e7ef',
  /** Exothermic, heating, hot fills, "heats". */
  hot: '#b8541a',
  /** Light tint of `hot`. */
  hotTint: '#f6ddcc',
  /** The step solved for, a design point, a user's target. */
  solved: '#7d3c78',
  /** A limit from outside: the specification threshold, the burn threshold. */
  limit: '#5b3a29',
  /** Undetermined: the 95 % interval spans zero. */
  unsure: '#8a6d00',
  /** Shading of undetermined rows. */
  unsureTint: '#f4ecc8',
  /** Body text. */
  ink: '#1d232a',
  /** Secondary text, axes. */
  muted: '#56606b',
  /** Grid lines, saturated regions. */
  grid: '#e2e5e9',
  /** Zebra shading of rows. */
  zebra: '#f4f6f8',
  /** Neither hot nor cold; works the other way. */
  neutral: '#7a838c',
  /** The target band of a time course. */
  band: '#e3ecd9',
  /** Text on the target band. */
  bandInk: '#3d5c22',
  background: '#ffffff',
} as const;

/**
 * The type of every chart: the platform's own interface sans-serif where
 * there is one, then common free sans-serif families, then the generic
 * family. Chosen for clear digits and a true minus sign.
 */
export const fontStack = "'Noto Sans', 'DejaVu Sans', 'Liberation Sans', Verdana, sans-serif";

/** The colour of a heat effect: cold for endothermic (positive ΔH), hot for exothermic, neutral at zero. */
export function heatColour(endothermic: boolean | undefined): string {
  return endothermic === undefined ? palette.neutral : endothermic ? palette.cold : palette.hot;
}
