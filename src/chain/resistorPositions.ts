/**
 * Names of the resistors of a threshold divider by position (top, ladder taps in order from the reference,
 * bottom): the one naming function every report uses (the build sheet, `check`'s error sources, the fault review).
 * @module
 */
import { _requireInteger } from "../errors.js";

const CONTEXT = "resistor position names";
/** Most resistors in one string (a ladder of the design file's 64 setpoints has 65). */
const maxResistorsInString = 1000;

/**
 * The position names of the resistors of one divider, from the reference end to ground: two resistors are
 * `top` and `bottom`; a ladder of n is `top`, `ladder 1` … `ladder n−2` (in order from the reference), `bottom`.
 * Every report (check, compare, faults, the build sheet) names a threshold resistor so.
 * @param count - number of resistors in the string, integer 1 … 1000 (one resistor alone is `top`)
 * @returns one name per resistor, index 0 at the reference
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a count that is not an integer in 1 … 1000
 * @example
 * ```ts
 * import { resistorPositionNames } from "hotjunction";
 * console.log(resistorPositionNames(4)); // [ 'top', 'ladder 1', 'ladder 2', 'bottom' ]
 * ```
 */
export function resistorPositionNames(count: number): string[] {
  _requireInteger(count, "resistor count", 1, maxResistorsInString, CONTEXT);
  if (count === 1) return ["top"];
  return Array.from({ length: count }, (_, i) => (i === 0 ? "top" : i === count - 1 ? "bottom" : `ladder ${i}`));
}

/**
 * The name of resistor `index` (0 at the reference) of network `networkIndex` when a design has `networkCount`
 * networks: the position name alone for one network, `divider <n> <position>` (n from 1) for several.
 * @param index - integer 0 … count − 1
 * @param count - resistors in the network, integer 1 … 1000
 * @param networkIndex - integer 0 … networkCount − 1
 * @param networkCount - networks of the design, integer 1 … 1000
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for an index or count out of range
 * @example
 * ```ts
 * import { resistorDesignator } from "hotjunction";
 * console.log(resistorDesignator(1, 2, 0, 2)); // "divider 1 bottom"
 * ```
 */
export function resistorDesignator(index: number, count: number, networkIndex = 0, networkCount = 1): string {
  const names = resistorPositionNames(count);
  _requireInteger(index, "resistor index", 0, count - 1, CONTEXT);
  _requireInteger(networkCount, "network count", 1, maxResistorsInString, CONTEXT);
  _requireInteger(networkIndex, "network index", 0, networkCount - 1, CONTEXT);
  const position = names[index] as string;
  return networkCount > 1 ? `divider ${networkIndex + 1} ${position}` : position;
}
