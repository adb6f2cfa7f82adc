/**
 * The safety caution, once, at the ground floor: every report (trip, comparison, sweep, fault review, charts),
 * the firmware table header and JSON, the trip design result and the CLI help carry this text.
 * @module
 */

/**
 * The caution printed with every report, carried by every trip design result and in the CLI help.
 * @example
 * ```ts
 * import { CAUTION_TEXT } from "hotjunction";
 * console.log(CAUTION_TEXT.startsWith("These numbers do not certify")); // true
 * ```
 */
export const CAUTION_TEXT: string =
  "These numbers do not certify a safety function. Keep an independent, non-resettable thermal cutoff " +
  "in every heated system, and follow local codes, the applicable standards and licensed practice.";

/**
 * The caution every emitted firmware table carries (C comment, JSON field): one sentence saying what the table
 * is not, then {@link CAUTION_TEXT}.
 * @example
 * ```ts
 * import { CAUTION_TEXT, firmwareTableCaution } from "hotjunction";
 * console.log(firmwareTableCaution.startsWith("CAUTION"), firmwareTableCaution.endsWith(CAUTION_TEXT)); // true true
 * ```
 */
export const firmwareTableCaution: string = `CAUTION: this table is not a certified safety function. ${CAUTION_TEXT}`;
