/**
 * The mark of checked thermocouple data. A generated data module (`typeB` … `typeT`) and
 * `defineThermocoupleData` record each data object they hand out here, together with what the generator (or the
 * check) worked out about where its EMF becomes unique, so `createThermocouple` neither checks the data nor searches
 * for that start at run time: a one-type bundle carries neither piece of code. A data object that is not recorded
 * (a copy, a user's own object) is checked by `defineThermocoupleData`, or by the letter-based functions on first use.
 * @internal
 * @module
 */
import { _deepFreeze } from "./deepFreeze.js";

/**
 * Where a type's EMF becomes unique, for a type whose EMF starts by falling (type B); empty for every other type.
 * Numbers as the engine computes them (the generator repeats its float operations; tests/its90/checkedData compares).
 * @internal
 */
export interface _DataStart {
  /** Lowest EMF over the range (at the turning point of the first sub-range), mV. */
  readonly lowestEmf?: number;
  /** Upper root of E(t) = E(minC), °C: from here E is strictly increasing. */
  readonly monotonicFromC?: number;
  /**
   * The problem sentence of an EMF at or below E(minC) (`AMBIGUOUS_EMF`: two temperatures), written once here so
   * that the message template is not in every bundle.
   */
  readonly ambiguity?: string;
  /** The engine's numeric form of the data object, built on its first use (its90/compiled.ts `_compileChecked`). */
  compiled?: object;
}

/** Checked data objects (deeply frozen) → their start data. @internal */
export const _checkedData = /* @__PURE__ */ new WeakMap<object, _DataStart>();

/**
 * Deep-freezes a checked data object and records it with its start data; returns it. Call sites are marked
 * `/* @__PURE__ *\/`, so a bundle that never reads a data module drops it together with its mark. @internal
 */
export function _checked<T extends object>(value: T, start: _DataStart = {}): T {
  _checkedData.set(_deepFreeze(value), start);
  return value;
}
