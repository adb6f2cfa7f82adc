/**
 * Option checks of the propagation engine (internal): re-exported from the one validator home,
 * `src/errors.ts`, so the engine's modules keep one short import.
 * @module
 * @internal
 */
export {
  _requireDegreesOfFreedom,
  _requireInteger,
  _requireNonNegative,
  _requireOneOf,
  _requireOptionsObject,
  _requirePositive,
  _requireProbability,
} from "../errors.js";
