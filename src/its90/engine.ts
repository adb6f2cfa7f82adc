/**
 * Conversion engine over one type's data object: forward, exact inverse, Seebeck coefficient,
 * ranges, bulk variants; and the published approximate inverse over its own data object. Imports no type's data, so a bundle that uses
 * {@link createThermocouple} with one data module carries that type alone.
 * @module
 */
import type { ApproximateInverseData, ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { _requireFinite, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import {
  _compile,
  _emf,
  _horner,
  _slope,
  _subrangeIndex,
  type CompiledSubrange,
  type CompiledType,
} from "./compiled.js";
import { _exactInverse, _exactInverseTables } from "./exactInverse.js";

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

/** One sub-range of a published approximate inverse, in numbers, with its stated error band. */
export interface ApproximateInverseRange {
  readonly minEmfMillivolts: number;
  readonly maxEmfMillivolts: number;
  readonly minC: number;
  readonly maxC: number;
  /** Lowest stated error t_approx − t90, °C. */
  readonly errorMinC: number;
  /** Highest stated error t_approx − t90, °C. */
  readonly errorMaxC: number;
  /** d₀…dₙ of t = Σ dᵢ·Eⁱ (°C/mVⁱ). */
  readonly coefficients: readonly number[];
}

function checkTemperature(ct: CompiledType, temperatureC: unknown, quantity: string): number {
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
const EMF_END_TOLERANCE_MV = 1e-10;

function checkEmf(ct: CompiledType, emfMillivolts: number, quantity: string, context: string): void {
  if (
    emfMillivolts > ct.emfAtMaxC + EMF_END_TOLERANCE_MV ||
    emfMillivolts < ct.lowestEmf - (ct.lowestEmf === ct.emfAtMinC ? EMF_END_TOLERANCE_MV : 0)
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
  return _emf(ct, checkTemperature(ct, coldC, "cold-junction temperature"));
}

/** @internal */
export function _emfFromTemperature(ct: CompiledType, temperatureC: number, options?: ColdJunctionOptions): number {
  if (options === undefined && typeof temperatureC === "number" && temperatureC >= ct.minC && temperatureC <= ct.maxC) {
    return _emf(ct, temperatureC);
  }
  const t = checkTemperature(ct, temperatureC, "temperature");
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
  checkEmf(ct, total, options?.coldJunctionC === undefined ? "EMF" : "cold-junction-compensated EMF", ct.context);
  return _exactInverse(ct, _exactInverseTables(ct), total);
}

/** @internal */
export function _seebeckCoefficient(ct: CompiledType, temperatureC: number): number {
  const t = checkTemperature(ct, temperatureC, "temperature");
  return _slope(ct, t) * 1000;
}

interface CompiledApproximateInverse {
  readonly minEmfMillivolts: number;
  readonly maxEmfMillivolts: number;
  readonly errorMinC: number;
  readonly errorMaxC: number;
  readonly d: Float64Array;
}

const approximateCache = new WeakMap<ApproximateInverseData, readonly CompiledApproximateInverse[]>();

/** @internal */
export function _approximateTemperatureFromEmf(inverse: ApproximateInverseData, emfMillivolts: number): number {
  const context = `type ${inverse.type} published approximate inverse`;
  _requireFinite(emfMillivolts, "EMF", "mV", context);
  let ranges = approximateCache.get(inverse);
  if (ranges === undefined) {
    ranges = inverse.ranges.map((r) => ({ ...r, d: Float64Array.from(r.coefficients) }));
    approximateCache.set(inverse, ranges);
  }
  // Where published ranges overlap (R and S, 1064 to 1200 °C) take the one with the narrowest stated band.
  let best: CompiledApproximateInverse | undefined;
  let lo = Infinity;
  let hi = -Infinity;
  for (const r of ranges) {
    lo = Math.min(lo, r.minEmfMillivolts);
    hi = Math.max(hi, r.maxEmfMillivolts);
    if (emfMillivolts >= r.minEmfMillivolts && emfMillivolts <= r.maxEmfMillivolts) {
      if (best === undefined || r.errorMaxC - r.errorMinC < best.errorMaxC - best.errorMinC) best = r;
    }
  }
  if (best !== undefined) return _horner(best.d, emfMillivolts);
  throw new HotjunctionRangeError({
    code: "OUT_OF_RANGE",
    quantity: "EMF",
    value: emfMillivolts,
    min: lo,
    max: hi,
    unit: "mV",
    context,
  });
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

/** @internal */
export function _approximateInverseRanges(inverse: ApproximateInverseData): ApproximateInverseRange[] {
  return inverse.ranges.map((r) => ({ ...r, coefficients: [...r.coefficients] }));
}

function checkArrays(input: unknown, out: unknown, quantity: string, context: string): number {
  if (!(input instanceof Float64Array)) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity,
      value: input,
      problem: "is not a Float64Array",
      context,
    });
  }
  if (out !== undefined && (!(out instanceof Float64Array) || out.length < input.length)) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "output array",
      value: out,
      problem: `is not a Float64Array of length at least ${input.length}`,
      context,
    });
  }
  return input.length;
}

/**
 * Converts elements from `start` while they stay in [lo, hi) and ≤ maxC, adding type K's exponential term
 * a0·exp(a1·(t − a2)²) when `hasExp`; returns the index it stopped at.
 */
function forwardRun(
  temperaturesC: Float64Array,
  result: Float64Array,
  start: number,
  n: number,
  c: Float64Array,
  degree: number,
  lo: number,
  hi: number,
  maxC: number,
  hasExp: boolean,
  a0: number,
  a1: number,
  a2: number,
): number {
  // Lengths come in as arguments: no property access inside, which keeps the optimised loop stable.
  let i = start;
  for (; i < n; i++) {
    const t = temperaturesC[i] as number;
    if (!(t >= lo && t < hi && t <= maxC)) break;
    let acc = 0;
    for (let k = degree; k >= 0; k--) acc = acc * t + (c[k] as number);
    if (hasExp) {
      const d = t - a2;
      result[i] = acc + a0 * Math.exp(a1 * d * d);
    } else {
      result[i] = acc;
    }
  }
  return i;
}

/**
 * {@link forwardRun} for sub-ranges of at most 10 coefficients (most of them), zero-padded to 10: the Horner
 * scheme unrolled over coefficients held in locals runs faster than a loop over the array. Leading zero
 * coefficients add exact zeros, so the result is bit for bit that of the loop.
 */
function forwardRun10(
  temperaturesC: Float64Array,
  result: Float64Array,
  start: number,
  n: number,
  c: Float64Array,
  lo: number,
  hi: number,
  maxC: number,
  hasExp: boolean,
  a0: number,
  a1: number,
  a2: number,
): number {
  const c0 = c[0] as number, c1 = c[1] as number, c2 = c[2] as number, c3 = c[3] as number, c4 = c[4] as number;
  const c5 = c[5] as number, c6 = c[6] as number, c7 = c[7] as number, c8 = c[8] as number, c9 = c[9] as number;
  let i = start;
  for (; i < n; i++) {
    const t = temperaturesC[i] as number;
    if (!(t >= lo && t < hi && t <= maxC)) break;
    const acc = c0 + t * (c1 + t * (c2 + t * (c3 + t * (c4 + t * (c5 + t * (c6 + t * (c7 + t * (c8 + t * c9))))))));
    if (hasExp) {
      const d = t - a2;
      result[i] = acc + a0 * Math.exp(a1 * d * d);
    } else {
      result[i] = acc;
    }
  }
  return i;
}

const padded10 = new WeakMap<CompiledSubrange, Float64Array>();

/** A sub-range's coefficients zero-padded to 10 (built once per sub-range). @internal */
export function _coefficients10(sub: CompiledSubrange): Float64Array {
  let c = padded10.get(sub);
  if (c === undefined) {
    c = new Float64Array(10);
    c.set(sub.c);
    padded10.set(sub, c);
  }
  return c;
}

/** Throws the error that names a bad element of a bulk call (kept out of the hot function). */
function badElement(ct: CompiledType, temperatureC: number, index: number): never {
  checkTemperature(ct, temperatureC, `temperature [${index}]`);
  throw new Error("unreachable: the element passed the check it failed");
}

/** @internal */
export function _emfFromTemperatureArray(
  ct: CompiledType,
  temperaturesC: Float64Array,
  out?: Float64Array,
): Float64Array {
  const n = checkArrays(temperaturesC, out, "temperatures", ct.context);
  const result = out ?? new Float64Array(n);
  const minC = ct.minC;
  const maxC = ct.maxC;
  const subs = ct.subranges;
  const last = subs.length - 1;
  const a0 = ct.a0;
  const a1 = ct.a1;
  const a2 = ct.a2;
  // Runs of elements in one sub-range go through a tight loop with that sub-range's coefficients and
  // exponential flag hoisted: per element the same Horner pass as a hand-written loop plus three comparisons.
  let i = 0;
  while (i < n) {
    const first = temperaturesC[i] as number;
    // NaN fails the comparisons, so it also takes the slow path, which names the element.
    if (!(first >= minC && first <= maxC)) badElement(ct, first, i);
    const index = _subrangeIndex(ct, first);
    const sub = subs[index] as CompiledSubrange;
    const c = sub.c;
    const lo = index === 0 ? minC : sub.minC;
    const hi = index === last ? Infinity : (subs[index + 1] as CompiledSubrange).minC;
    const next =
      c.length <= 10
        ? forwardRun10(temperaturesC, result, i, n, _coefficients10(sub), lo, hi, maxC, sub.hasExp, a0, a1, a2)
        : forwardRun(temperaturesC, result, i, n, c, c.length - 1, lo, hi, maxC, sub.hasExp, a0, a1, a2);
    // The first element lies in its own sub-range, so a run always converts at least one element.
    i = next;
  }
  return result;
}

/** @internal */
export function _temperatureFromEmfArray(
  ct: CompiledType,
  emfsMillivolts: Float64Array,
  out?: Float64Array,
): Float64Array {
  const n = checkArrays(emfsMillivolts, out, "EMFs", ct.context);
  const result = out ?? new Float64Array(n);
  const inv = _exactInverseTables(ct);
  // Fast acceptance test: inside (E at the unambiguous start, E(maxC)]; anything else is checked in full.
  const lowOk = ct.monotonicFromC > ct.minC ? ct.emfAtMinC : ct.emfAtMinC - EMF_END_TOLERANCE_MV;
  const highOk = ct.emfAtMaxC + EMF_END_TOLERANCE_MV;
  for (let i = 0; i < n; i++) {
    const e = emfsMillivolts[i] as number;
    if (!(e > lowOk && e <= highOk)) {
      _requireFinite(e, `EMF [${i}]`, "mV", ct.context);
      checkEmf(ct, e, `EMF [${i}]`, ct.context);
    }
    result[i] = _exactInverse(ct, inv, e);
  }
  return result;
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
  if (typeof data !== "object" || data === null || !Array.isArray(data.forward)) {
    throw new HotjunctionTypeError({
      code: "UNKNOWN_TYPE",
      quantity: "thermocouple data",
      value: data,
      problem: "is not a type's data (typeB … typeT)",
    });
  }
  const ct = _compile(data);
  return {
    type: ct.type,
    data,
    emfFromTemperature: (temperatureC, options) => _emfFromTemperature(ct, temperatureC, options),
    temperatureFromEmf: (emfMillivolts, options) => _temperatureFromEmf(ct, emfMillivolts, options),
    seebeckCoefficient: (temperatureC) => _seebeckCoefficient(ct, temperatureC),
  };
}
