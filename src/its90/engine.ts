/**
 * Conversion engine over one type's data object: forward, exact inverse, Seebeck coefficient and
 * ranges (bulk variants in `bulk.ts`, the published approximate inverse in `approximateInverse.ts`). Imports
 * no type's data, so a bundle that uses {@link createThermocouple} with one data module carries that type alone.
 * @module
 */
import type { ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { _requireFinite, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _compile, _emf, _slope, type CompiledType } from "./compiled.js";
import { _exactInverse, _exactInverseTables } from "./exactInverse.js";

export type { ApproximateInverseRange } from "../data/thermocoupleData.js";

/** Options of the conversions that take a cold (reference) junction temperature. */
export interface ColdJunctionOptions {
  /**
   * Temperature of the cold (reference) junction, °C, within the type's range. Default 0 °C (the
   * reference tables' convention).
   */
  readonly coldJunctionC?: number;
}

/** The standard's range of a type, in °C and mV. */
export interface ThermocoupleRange {
  readonly type: ThermocoupleType;
  /** Lowest temperature of the reference function, °C. */
  readonly minC: number;
  /** Highest temperature of the reference function, °C (type K: 1372 °C per NIST/ASTM; IEC 60584-1:2013 stops at 1300 °C). */
  readonly maxC: number;
  /** E(minC), mV. */
  readonly minEmfMillivolts: number;
  /** E(maxC), mV. */
  readonly maxEmfMillivolts: number;
  /**
   * Lowest temperature from which the EMF is strictly increasing and the inverse unique, °C: equal to
   * minC except for type B (about 42.13 °C, where E climbs back to 0 mV).
   */
  readonly unambiguousFromC: number;
  /** EMF above which the inverse is unique, mV (inclusive except for type B, where E = 0 mV is ambiguous). */
  readonly lowestEmfMillivolts: number;
}

/** Checks a temperature against the type's range. @internal */
export function _checkTemperature(ct: CompiledType, temperatureC: unknown, quantity: string): number {
  _requireFinite(temperatureC, quantity, "°C", ct.context);
  if ((temperatureC as number) < ct.minC || (temperatureC as number) > ct.maxC) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: temperatureC,
      min: ct.minC,
      max: ct.maxC,
      unit: "°C",
      context: ct.context,
    });
  }
  return temperatureC as number;
}

/**
 * EMFs this close beyond a range end are accepted and map to the end temperature: it is the forward
 * function's own float64 evaluation error (≤ 1e-10 mV), so a forward result always inverts.
 */
export const _EMF_END_TOLERANCE_MV = 1e-10;

/** Checks an EMF against the unambiguous range. @internal */
export function _checkEmf(ct: CompiledType, emfMillivolts: number, quantity: string, context: string): void {
  if (
    emfMillivolts > ct.emfAtMaxC + _EMF_END_TOLERANCE_MV ||
    emfMillivolts < ct.lowestEmf - (ct.lowestEmf === ct.emfAtMinC ? _EMF_END_TOLERANCE_MV : 0)
  ) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: emfMillivolts,
      min: ct.lowestEmf,
      max: ct.emfAtMaxC,
      unit: "mV",
      context,
    });
  }
  if (ct.monotonicFromC > ct.minC && emfMillivolts <= ct.emfAtMinC) {
    throw new HotjunctionRangeError({
      code: "AMBIGUOUS_EMF",
      quantity,
      value: emfMillivolts,
      unit: "mV",
      context,
      problem: `is ambiguous (E dips below ${ct.emfAtMinC} mV up to ${ct.monotonicFromC.toFixed(2)} °C: two temperatures); use an EMF above ${ct.emfAtMinC} mV`,
    });
  }
}

function coldJunctionEmf(ct: CompiledType, options: ColdJunctionOptions | undefined): number {
  if (options === undefined) return 0;
  if (typeof options !== "object" || options === null) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "options",
      value: options,
      problem: "is not an options object",
      context: ct.context,
    });
  }
  const coldC = options.coldJunctionC;
  if (coldC === undefined) return 0;
  return _emf(ct, _checkTemperature(ct, coldC, "cold-junction temperature"));
}

/** @internal */
export function _emfFromTemperature(ct: CompiledType, temperatureC: number, options?: ColdJunctionOptions): number {
  if (options === undefined && typeof temperatureC === "number" && temperatureC >= ct.minC && temperatureC <= ct.maxC) {
    return _emf(ct, temperatureC);
  }
  const t = _checkTemperature(ct, temperatureC, "temperature");
  const emf = _emf(ct, t);
  return options === undefined ? emf : emf - coldJunctionEmf(ct, options);
}

/** @internal */
export function _temperatureFromEmf(ct: CompiledType, emfMillivolts: number, options?: ColdJunctionOptions): number {
  if (
    options === undefined &&
    typeof emfMillivolts === "number" &&
    emfMillivolts > ct.emfAtMinC &&
    emfMillivolts <= ct.emfAtMaxC
  ) {
    // Fast path: a plain EMF inside the unambiguous range (NaN fails the comparisons and goes the long way).
    return _exactInverse(ct, _exactInverseTables(ct), emfMillivolts);
  }
  _requireFinite(emfMillivolts, "EMF", "mV", ct.context);
  const coldEmf = coldJunctionEmf(ct, options);
  const total = emfMillivolts + coldEmf;
  _checkEmf(ct, total, options?.coldJunctionC === undefined ? "EMF" : "cold-junction-compensated EMF", ct.context);
  return _exactInverse(ct, _exactInverseTables(ct), total);
}

/** @internal */
export function _seebeckCoefficient(ct: CompiledType, temperatureC: number): number {
  const t = _checkTemperature(ct, temperatureC, "temperature");
  return _slope(ct, t) * 1000;
}

/** @internal */
export function _temperatureRange(ct: CompiledType): ThermocoupleRange {
  return {
    type: ct.type,
    minC: ct.minC,
    maxC: ct.maxC,
    minEmfMillivolts: ct.emfAtMinC,
    maxEmfMillivolts: ct.emfAtMaxC,
    unambiguousFromC: ct.monotonicFromC,
    lowestEmfMillivolts: ct.lowestEmf,
  };
}

/**
 * A converter bound to one type's data: the scalar conversions of the letter-based functions, with no lookup
 * per call, and a bundle that carries only this type's coefficients (under 3 kB min+gzip). For bulk work and
 * ranges use {@link emfFromTemperatureArray}, {@link temperatureFromEmfArray} and {@link temperatureRange},
 * which accept the same data object.
 */
export interface Thermocouple {
  readonly type: ThermocoupleType;
  readonly data: ThermocoupleData;
  /** E(t) in mV (reference junction at `coldJunctionC`, default 0 °C). See {@link emfFromTemperature}. */
  emfFromTemperature(temperatureC: number, options?: ColdJunctionOptions): number;
  /** Exact inverse, °C. See {@link temperatureFromEmf}. */
  temperatureFromEmf(emfMillivolts: number, options?: ColdJunctionOptions): number;
  /** dE/dt in µV/°C. See {@link seebeckCoefficient}. */
  seebeckCoefficient(temperatureC: number): number;
}

/**
 * Binds the conversions to one type's data object. Use it when a bundle must carry one type only:
 * `import { createThermocouple, typeK } from "hotjunction"` pulls type K's coefficients and no other's.
 * @param data - a type's data module export (`typeB` … `typeT`)
 * @returns a {@link Thermocouple} converter
 * @throws HotjunctionTypeError if `data` is not a thermocouple data object
 * @example
 * ```ts
 * import { createThermocouple, typeK } from "hotjunction";
 * const k = createThermocouple(typeK);
 * console.log(k.emfFromTemperature(500).toFixed(3)); // "20.644"
 * console.log(k.temperatureFromEmf(20.644).toFixed(3)); // "499.993"
 * ```
 */
export function createThermocouple(data: ThermocoupleData): Thermocouple {
  // _compile checks the data object (UNKNOWN_TYPE when it is not one, INVALID_OPTION when it is malformed).
  const ct = _compile(data);
  return {
    type: ct.type,
    data,
    emfFromTemperature: (temperatureC, options) => _emfFromTemperature(ct, temperatureC, options),
    temperatureFromEmf: (emfMillivolts, options) => _temperatureFromEmf(ct, emfMillivolts, options),
    seebeckCoefficient: (temperatureC) => _seebeckCoefficient(ct, temperatureC),
  };
}
