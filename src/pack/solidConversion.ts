/**
 * Whether undissolved solid turns into the equilibrium solid of the
 * solubility table (an anhydrous salt into its hydrate, or a hydrate into a
 * lower one) within the time a pack is used.
 *
 * @module
 */

/**
 * Least solubility, g of anhydrous salt per 100 g of water, at which the
 * conversion of undissolved solid is counted in a fill's final temperature:
 * 1 g per 100 g, the boundary between "sparingly soluble" (1 part in 30–100
 * parts of water) and "slightly soluble" (1 in 100–1000) of the
 * pharmacopoeias' descriptive terms (`pharmacopoeiaSolubilityTerms`, from memory).
 */
export const CONVERSION_MIN_SOLUBILITY = 1;

/**
 * True when undissolved solid of a salt with solubility S is taken to turn
 * into its equilibrium solid within a pack's time.
 *
 * The change runs through the liquid: the loaded solid dissolves, and the
 * equilibrium solid crystallises from a solution supersaturated with
 * respect to it (`solidConversionPractice`). The amount the liquid can carry
 * at a time is S·W/100 grams, so the time to convert a mass M scales as
 * M·100/(S·W): a salt that barely dissolves (anhydrite, CaSO₄ → gypsum;
 * CuF₂ → CuF₂·2H₂O) converts over hours to years, not minutes. The rule:
 *
 *   counted ⇔ S ≥ S_min = 1 g/100 g H₂O
 *
 * Below S_min only the dissolved amount takes part (it stays in solution);
 * the undissolved solid stays as loaded in the final temperature, and the
 * fill's 95 % interval reaches to the temperature with the whole conversion
 * counted (see docs/methods.md, "Pack design").
 *
 * @param solubility - S, grams of anhydrous salt per 100 g of water at the temperature considered
 * @returns true when the conversion is counted in the central value
 * @see `pharmacopoeiaSolubilityTerms` (the boundary, from memory); `solidConversionPractice`; docs/methods.md, "Pack design".
 * @example
 * ```ts
 * convertsWithinPack(0.205); // false (CaSO4 at 25 °C, CRC: anhydrite does not become gypsum in a pack)
 * convertsWithinPack(35.7); // true (MgSO4 at 25 °C, CRC: anhydrous MgSO4 takes up its water)
 * CONVERSION_MIN_SOLUBILITY; // 1
 * ```
 */
export function convertsWithinPack(solubility: number): boolean {
  return solubility >= CONVERSION_MIN_SOLUBILITY;
}
