/**
 * The safety caution every report carries. It lives here, once; renderers and the CLI import it.
 * @module
 */

/**
 * The caution printed with every trip, comparison and sweep report, and in the CLI help.
 * @example
 * ```ts
 * import { CAUTION_TEXT } from "hotjunction/design";
 * console.log(CAUTION_TEXT.startsWith("These numbers do not certify")); // true
 * ```
 */
export const CAUTION_TEXT: string =
  "These numbers do not certify a safety function. Keep an independent, non-resettable thermal cutoff " +
  "in every heated system, and follow local codes, the applicable standards and licensed practice.";
