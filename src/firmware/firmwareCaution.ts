/**
 * The caution every emitted firmware table carries.
 * @module
 */

/**
 * Caution text carried by every emitted firmware table (C comment, JSON field).
 * @example
 * ```ts
 * import { firmwareTableCaution } from "hotjunction";
 * console.log(firmwareTableCaution.startsWith("CAUTION")); // true
 * ```
 */
export const firmwareTableCaution =
  "CAUTION: this table is not a certified safety function and its numbers certify nothing. " +
  "Keep an independent, non-resettable thermal cutoff, and follow local codes, applicable standards " +
  "and licensed practice.";
