/**
 * Names of the resistors of a threshold divider by position (top, ladder taps in order from the reference,
 * bottom): the one naming function every report uses (the build sheet, `check`'s error sources, the fault review).
 * @module
 */

/**
 * The position names of the resistors of one divider, from the reference end to ground: two resistors are
 * `top` and `bottom`; a ladder of n is `top`, `ladder 1` … `ladder n−2` (in order from the reference), `bottom`.
 * Every report (check, compare, faults, the build sheet) names a threshold resistor so.
 * @param count - number of resistors in the string, integer ≥ 2
 * @returns one name per resistor, index 0 at the reference
 * @example
 * ```ts
 * import { resistorPositionNames } from "hotjunction";
 * console.log(resistorPositionNames(4)); // [ 'top', 'ladder 1', 'ladder 2', 'bottom' ]
 * ```
 */
export function resistorPositionNames(count: number): string[] {
  if (!Number.isInteger(count) || count < 2) return count === 1 ? ["top"] : [];
  return Array.from({ length: count }, (_, i) => (i === 0 ? "top" : i === count - 1 ? "bottom" : `ladder ${i}`));
}

/**
 * The name of resistor `index` (0 at the reference) of network `networkIndex` when a design has `networkCount`
 * networks: the position name alone for one network, `divider <n> <position>` (n from 1) for several.
 * @example
 * ```ts
 * import { resistorDesignator } from "hotjunction";
 * console.log(resistorDesignator(1, 2, 0, 2)); // "divider 1 bottom"
 * ```
 */
export function resistorDesignator(index: number, count: number, networkIndex = 0, networkCount = 1): string {
  const position = resistorPositionNames(count)[index] ?? `resistor ${index}`;
  return networkCount > 1 ? `divider ${networkIndex + 1} ${position}` : position;
}
