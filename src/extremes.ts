/**
 * The smallest and the largest of a list of numbers, as `Math.min(...values)` and `Math.max(...values)` give
 * them (NaN if any is NaN, −0 below +0, ±Infinity for an empty list), without spreading the list into call
 * arguments, which throws a stack overflow (`RangeError`) past about 10⁵ values (a reference table of 164,201
 * rows did).
 * @internal
 * @module
 */

/** @internal `Math.min(...values)` for a list of any length. */
export function _minOf(values: ArrayLike<number>): number {
  let m = Infinity;
  for (let i = 0; i < values.length; i++) m = Math.min(m, values[i] as number);
  return m;
}

/** @internal `Math.max(...values)` for a list of any length. */
export function _maxOf(values: ArrayLike<number>): number {
  let m = -Infinity;
  for (let i = 0; i < values.length; i++) m = Math.max(m, values[i] as number);
  return m;
}
