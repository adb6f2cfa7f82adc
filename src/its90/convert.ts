/**
 * The letter-based conversion API: `emfFromTemperature("K", 500)` and friends.
 * These bring all eight types' data (about 5 kB); for one type alone use {@link createThermocouple}.
 * @module
 */
import type { ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { _compile, type CompiledSubrange, type CompiledType } from "./compiled.js";
import { _approximateInverseRanges, _approximateTemperatureFromEmf, type ApproximateInverseRange } from "./approximateInverse.js";
import { _coefficients10, _emfFromTemperatureArray, _temperatureFromEmfArray } from "./bulk.js";
import {
  _emfFromTemperature,
  _seebeckCoefficient,
  _temperatureFromEmf,
  _temperatureRange,
  type ColdJunctionOptions,
  type ThermocoupleRange,
} from "./engine.js";
import { approximateInverseData, thermocoupleData } from "./resolveType.js";

/** A type given by its letter or by its data object. */
export type ThermocoupleTypeInput = ThermocoupleType | ThermocoupleData;

// The last type asked for, its compiled form and its sub-ranges' coefficients zero-padded to 10 (undefined for
// longer ones): a loop over one type skips the lookup entirely and evaluates an unrolled Horner scheme.
let lastInput: ThermocoupleTypeInput | undefined;
let lastCompiled: CompiledType | undefined;
let lastPadded: readonly (Float64Array | undefined)[] = [];
// Built once per type, so code that alternates between types allocates nothing per call.
const paddedByType = new WeakMap<CompiledType, readonly (Float64Array | undefined)[]>();

function compiledFor(type: ThermocoupleTypeInput): CompiledType {
  if (type === lastInput && lastCompiled !== undefined) return lastCompiled;
  const ct = _compile(thermocoupleData(type));
  lastInput = type;
  lastCompiled = ct;
  let padded = paddedByType.get(ct);
  if (padded === undefined) {
    padded = ct.subranges.map((sub) => (sub.c.length <= 10 ? _coefficients10(sub) : undefined));
    paddedByType.set(ct, padded);
  }
  lastPadded = padded;
  return ct;
}

/**
 * E(t) for an in-range temperature of the last compiled type: Horner unrolled over the padded coefficients
 * (leading zeros add exact zeros, so the result is bit for bit that of the generic loop).
 */
function emfUnrolled(ct: CompiledType, t: number): number {
  const subs = ct.subranges;
  let i = subs.length - 1;
  while (i > 0 && t < (subs[i] as CompiledSubrange).minC) i--;
  const c = lastPadded[i];
  if (c === undefined) return _emfFromTemperature(ct, t);
  const e =
    (c[0] as number) +
    t * ((c[1] as number) + t * ((c[2] as number) + t * ((c[3] as number) + t * ((c[4] as number) +
    t * ((c[5] as number) + t * ((c[6] as number) + t * ((c[7] as number) + t * ((c[8] as number) + t * (c[9] as number)))))))));
  if (!(subs[i] as CompiledSubrange).hasExp) return e;
  const d = t - ct.a2;
  return e + ct.a0 * Math.exp(ct.a1 * d * d);
}

/**
 * The ITS-90 reference function E(t): thermocouple EMF in mV with the reference junction at 0 °C, or at
 * `coldJunctionC` when given (then the EMF an instrument sees, E(t) − E(t_cj)). Type K includes its
 * exponential term above 0 °C. At a temperature shared by two sub-ranges the upper sub-range is used.
 * @param type - `"B"`, `"E"`, `"J"`, `"K"`, `"N"`, `"R"`, `"S"`, `"T"` or a data object
 * @param temperatureC - hot-junction temperature, °C, within the type's range (e.g. K: −270 to 1372 °C)
 * @param options - `coldJunctionC`: cold-junction temperature, °C, within the type's range
 * @returns EMF, mV
 * @throws HotjunctionTypeError for a non-finite temperature; HotjunctionRangeError for a temperature
 *   outside the type's range (naming type, quantity, value and range) or an unknown type
 * @example
 * ```ts
 * import { emfFromTemperature } from "hotjunction";
 * console.log(emfFromTemperature("K", 500).toFixed(3)); // "20.644"
 * console.log(emfFromTemperature("K", 500, { coldJunctionC: 25 }).toFixed(3)); // "19.644"
 * ```
 * @see NIST Monograph 175 (1993); IEC 60584-1:2013
 */
export function emfFromTemperature(
  type: ThermocoupleTypeInput,
  temperatureC: number,
  options?: ColdJunctionOptions,
): number {
  const ct = compiledFor(type);
  if (options === undefined && typeof temperatureC === "number" && temperatureC >= ct.minC && temperatureC <= ct.maxC) {
    return emfUnrolled(ct, temperatureC);
  }
  return _emfFromTemperature(ct, temperatureC, options);
}

/**
 * The exact inverse of the reference function: the temperature t with E(t) = `emfMillivolts`, within
 * 1e-9 °C of the true root of the exact polynomial (looser only where the Seebeck coefficient nearly
 * vanishes, by at most 1e-10 mV / S(t)). With `coldJunctionC` the EMF is a measured one: E(t_cj) is added
 * first (cold-junction compensation), then inverted.
 * @param type - `"B"`, `"E"`, `"J"`, `"K"`, `"N"`, `"R"`, `"S"`, `"T"` or a data object
 * @param emfMillivolts - EMF, mV, within E(minC) … E(maxC) of the type (after compensation)
 * @param options - `coldJunctionC`: cold-junction temperature, °C
 * @returns hot-junction temperature, °C
 * @throws HotjunctionTypeError for a non-finite EMF; HotjunctionRangeError for an EMF outside the range,
 *   or (code `AMBIGUOUS_EMF`) a type B EMF at or below 0 mV, where two temperatures share each EMF
 * @example
 * ```ts
 * import { emfFromTemperature, temperatureFromEmf } from "hotjunction";
 * // The NIST table prints E(500 °C) = 20.644 mV, rounded: the exact inverse of that rounded value is 499.993 °C.
 * console.log(temperatureFromEmf("K", 20.644).toFixed(3)); // "499.993"
 * console.log(temperatureFromEmf("K", emfFromTemperature("K", 500)).toFixed(9)); // "500.000000000"
 * console.log(temperatureFromEmf("K", 19.644, { coldJunctionC: 25 }).toFixed(1)); // "500.0"
 * ```
 */
export function temperatureFromEmf(
  type: ThermocoupleTypeInput,
  emfMillivolts: number,
  options?: ColdJunctionOptions,
): number {
  return _temperatureFromEmf(compiledFor(type), emfMillivolts, options);
}

/**
 * The Seebeck coefficient S(t) = dE/dt of the reference function, analytic (derivative of the
 * polynomial and of type K's exponential term).
 * @param type - thermocouple type
 * @param temperatureC - temperature, °C, within the type's range
 * @returns Seebeck coefficient, µV/°C
 * @throws HotjunctionTypeError / HotjunctionRangeError as {@link emfFromTemperature}
 * @example
 * ```ts
 * import { seebeckCoefficient } from "hotjunction";
 * console.log(seebeckCoefficient("K", 25).toFixed(2)); // "40.52"
 * ```
 */
export function seebeckCoefficient(type: ThermocoupleTypeInput, temperatureC: number): number {
  return _seebeckCoefficient(compiledFor(type), temperatureC);
}

/**
 * The published approximate inverse polynomial t = Σ dᵢ·Eⁱ of NIST Monograph 175, as printed. Its error
 * against the reference function is bounded per sub-range by the band in {@link approximateInverseRanges}
 * (e.g. type K 0 to 500 °C: −0.05 to +0.04 °C). Where two published ranges overlap (R and S, 1064 to
 * 1200 °C) the range with the narrower stated error band is used (range 3, ±0.0002 °C). For exact work use {@link temperatureFromEmf}.
 * @param type - thermocouple type
 * @param emfMillivolts - EMF, mV, within the published inverse's EMF range (narrower than the forward
 *   function's: e.g. type K −5.891 to 54.886 mV)
 * @returns temperature, °C
 * @throws HotjunctionRangeError outside the published inverse's EMF range
 * @example
 * ```ts
 * import { approximateTemperatureFromEmf } from "hotjunction";
 * // Published inverse, error band −0.05 to +0.04 °C; the exact inverse of 20.644 mV is 499.993 °C.
 * console.log(approximateTemperatureFromEmf("K", 20.644).toFixed(3)); // "499.980"
 * ```
 */
export function approximateTemperatureFromEmf(type: ThermocoupleTypeInput, emfMillivolts: number): number {
  return _approximateTemperatureFromEmf(approximateInverseData(type), emfMillivolts);
}

/**
 * The published approximate inverse's sub-ranges with their coefficients and stated error bands (data).
 * @param type - thermocouple type
 * @returns the sub-ranges in the published order
 * @example
 * ```ts
 * import { approximateInverseRanges } from "hotjunction";
 * const [first] = approximateInverseRanges("K");
 * console.log(first?.errorMinC, first?.errorMaxC); // -0.02 0.04
 * ```
 */
export function approximateInverseRanges(type: ThermocoupleTypeInput): ApproximateInverseRange[] {
  return _approximateInverseRanges(approximateInverseData(type));
}

/**
 * The standard's range of a type in °C and mV.
 * @param type - thermocouple type
 * @returns the range; see {@link ThermocoupleRange}
 * @example
 * ```ts
 * import { temperatureRange } from "hotjunction";
 * const r = temperatureRange("K");
 * console.log(r.minC, r.maxC, r.maxEmfMillivolts.toFixed(3)); // -270 1372 "54.886"
 * ```
 */
export function temperatureRange(type: ThermocoupleTypeInput): ThermocoupleRange {
  return _temperatureRange(compiledFor(type));
}

/**
 * Bulk forward conversion over a `Float64Array`, into `out` when given (no other allocation).
 * @param type - thermocouple type
 * @param temperaturesC - temperatures, °C, each within the type's range
 * @param out - optional output array of at least the same length
 * @returns EMFs, mV (the `out` array when given)
 * @throws as {@link emfFromTemperature}, naming the first bad element's index
 * @example
 * ```ts
 * import { emfFromTemperatureArray } from "hotjunction";
 * const emf = emfFromTemperatureArray("K", new Float64Array([0, 100]));
 * console.log(emf[1]?.toFixed(3)); // "4.096"
 * ```
 */
export function emfFromTemperatureArray(
  type: ThermocoupleTypeInput,
  temperaturesC: Float64Array,
  out?: Float64Array,
): Float64Array {
  return _emfFromTemperatureArray(compiledFor(type), temperaturesC, out);
}

/**
 * Bulk exact inverse over a `Float64Array`, into `out` when given (no other allocation).
 * @param type - thermocouple type
 * @param emfsMillivolts - EMFs, mV, each within the type's unambiguous EMF range
 * @param out - optional output array of at least the same length
 * @returns temperatures, °C (the `out` array when given)
 * @throws as {@link temperatureFromEmf}, naming the first bad element's index
 * @example
 * ```ts
 * import { temperatureFromEmfArray } from "hotjunction";
 * const t = temperatureFromEmfArray("K", new Float64Array([4.096, 41.276]));
 * console.log(t[0]?.toFixed(1), t[1]?.toFixed(1)); // "100.0" "1000.0"
 * ```
 */
export function temperatureFromEmfArray(
  type: ThermocoupleTypeInput,
  emfsMillivolts: Float64Array,
  out?: Float64Array,
): Float64Array {
  return _temperatureFromEmfArray(compiledFor(type), emfsMillivolts, out);
}
