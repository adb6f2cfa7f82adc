/**
 * Conversion engine over one type's data object: forward, exact inverse, Seebeck coefficient and
 * ranges (bulk variants in `bulk.ts`, the published approximate inverse in `approximateInverse.ts`). Imports
 * no type's data, so a bundle that uses {@link createThermocouple} with one data module carries that type alone.
 * @module
 */
import { _checkedData } from "../data/checkedData.js";
import { _deepFreeze } from "../data/deepFreeze.js";
import type { ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { _requireFinite, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _compileChecked, _compileForeign, _emf, _slope, _startOf, type CompiledType } from "./compiled.js";
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
    // The end tolerance applies at a range end only, not below type B's dip (`ambiguity`, a sentence, is set
    // exactly where E starts by falling).
    emfMillivolts < ct.lowestEmf - (ct.ambiguity ? 0 : _EMF_END_TOLERANCE_MV)
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
  if (ct.ambiguity && emfMillivolts <= ct.emfAtMinC) {
    throw new HotjunctionRangeError({
      code: "AMBIGUOUS_EMF",
      quantity,
      value: emfMillivolts,
      unit: "mV",
      context,
      problem: ct.ambiguity,
    });
  }
}

function coldJunctionEmf(ct: CompiledType, options: ColdJunctionOptions | undefined): number {
  if (options === undefined) return 0;
  if (typeof options !== "object" || !options) {
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
  // coldJunctionEmf is 0 without options, and x − 0 is x (−0 included).
  return _emf(ct, _checkTemperature(ct, temperatureC, "temperature")) - coldJunctionEmf(ct, options);
}

/** @internal */
export function _temperatureFromEmf(ct: CompiledType, emfMillivolts: number, options?: ColdJunctionOptions): number {
  // Fast path: a plain EMF inside the unambiguous range (NaN fails the comparisons and goes the long way).
  if (!(options === undefined && typeof emfMillivolts === "number" && emfMillivolts > ct.emfAtMinC && emfMillivolts <= ct.emfAtMaxC)) {
    // From here the EMF is the cold-junction-compensated one.
    emfMillivolts = _requireFinite(emfMillivolts, "EMF", "mV", ct.context) + coldJunctionEmf(ct, options);
    _checkEmf(ct, emfMillivolts, options?.coldJunctionC === undefined ? "EMF" : "cold-junction-compensated EMF", ct.context);
  }
  return _exactInverse(ct, _exactInverseTables(ct), emfMillivolts);
}

/** @internal */
export function _seebeckCoefficient(ct: CompiledType, temperatureC: number): number {
  return _slope(ct, _checkTemperature(ct, temperatureC, "temperature")) * 1000;
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
 * It takes checked data only: a data module's export (`typeB` … `typeT`) or a {@link defineThermocoupleData}
 * result. Any other object, a copy of a type's data included, is refused; pass it through
 * {@link defineThermocoupleData} first (which checks it once), or give it to the letter-based functions (which
 * check it on first use).
 * @param data - a type's data module export (`typeB` … `typeT`) or a {@link defineThermocoupleData} result
 * @returns a {@link Thermocouple} converter
 * @throws HotjunctionTypeError (code `UNKNOWN_TYPE`) if `data` is not checked data
 * @example
 * ```ts
 * import { createThermocouple, typeK } from "hotjunction";
 * const k = createThermocouple(typeK);
 * console.log(k.emfFromTemperature(500).toFixed(3)); // "20.644"
 * console.log(k.temperatureFromEmf(20.644).toFixed(3)); // "499.993"
 * ```
 */
export function createThermocouple(data: ThermocoupleData): Thermocouple {
  const ct = _compileChecked(data);
  return {
    type: ct.type,
    data,
    emfFromTemperature: (temperatureC, options) => _emfFromTemperature(ct, temperatureC, options),
    temperatureFromEmf: (emfMillivolts, options) => _temperatureFromEmf(ct, emfMillivolts, options),
    seebeckCoefficient: (temperatureC) => _seebeckCoefficient(ct, temperatureC),
  };
}

/**
 * Checks a data object the package did not generate (a copy of a type's data, a user's own reference function) and
 * returns a checked, deeply frozen copy of it that {@link createThermocouple} accepts. The check: a list of
 * contiguous increasing sub-ranges with finite ends and 1 or more finite coefficients each, a range inside the
 * sub-ranges and a finite exponential term; where the EMF starts by falling (as type B's does), where it becomes
 * unique is found once here. The copy holds `type`, `source`, `minC`, `maxC`, `forward` and `exponential` only.
 * @param data - an object of the {@link ThermocoupleData} shape
 * @returns the checked copy (a data module's export is returned as it is)
 * @throws HotjunctionTypeError (code `UNKNOWN_TYPE`) if `data` has no list of sub-ranges
 * @throws HotjunctionRangeError (code `INVALID_OPTION`) naming the range and the sub-ranges' span if the data is malformed
 * @example
 * ```ts
 * import { createThermocouple, defineThermocoupleData, typeK } from "hotjunction";
 * const copy = defineThermocoupleData(JSON.parse(JSON.stringify(typeK)));
 * console.log(createThermocouple(copy).emfFromTemperature(500).toFixed(3)); // "20.644"
 * ```
 */
export function defineThermocoupleData(data: ThermocoupleData): ThermocoupleData {
  if (_checkedData.has(data)) return data;
  // Copied field by field first (no getter is read twice), then the copy is checked and frozen.
  const d = data as Partial<ThermocoupleData> | null | undefined;
  const forward = d?.forward;
  const e = d?.exponential;
  const copy = {
    type: d?.type,
    source: d?.source,
    minC: d?.minC,
    maxC: d?.maxC,
    forward: Array.isArray(forward)
      ? forward.map((f) => ({
          minC: f?.minC,
          maxC: f?.maxC,
          coefficients: Array.isArray(f?.coefficients) ? [...f.coefficients] : f?.coefficients,
        }))
      : forward,
    // null is kept (and refused by the check): read as "no term" it would give type K without its exponential
    ...(e === undefined ? {} : { exponential: e === null ? (null as never) : { a0: e?.a0, a1: e?.a1, a2: e?.a2 } }),
  } as ThermocoupleData;
  _checkedData.set(_deepFreeze(copy), _startOf(_compileForeign(copy)));
  return copy;
}
