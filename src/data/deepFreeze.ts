/**
 * Deep freezing of exported reference data, so that no module can change a coefficient, a series or a
 * tolerance band under every later result. Call sites are marked `/* @__PURE__ *\/`, so a bundle that never
 * reads a data module drops it together with its freeze.
 * @internal
 * @module
 */

/** Freezes `value` and every object or array reachable from it; returns `value`. @internal */
export function _deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value) Object.values(Object.freeze(value)).forEach(_deepFreeze);
  return value;
}
