/**
 * Numeric form of a type's reference data and the hot evaluation paths (forward, derivative).
 * Built once per data object on first use and cached; nothing runs at import time.
 * @internal
 * @module
 */
import { _checkedData, type _DataStart } from "../data/checkedData.js";
import type { ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";

/** @internal */
export interface CompiledSubrange {
  readonly minC: number;
  readonly maxC: number;
  /** c₀…cₙ, mV/°Cⁱ. */
  readonly c: Float64Array;
  /** Whether type K's exponential term applies in this sub-range. */
  readonly hasExp: boolean;
}

/**
 * One forward sub-range's share of the exact inverse: `count` segments of equal EMF width, each built (edges,
 * interpolant, check) when an EMF first falls in it. @internal
 */
export interface InversePiece {
  readonly range: number;
  /** EMF at the piece's lower end (start of the segment grid), mV. */
  readonly emfStart: number;
  /** EMF width of a segment, mV. */
  readonly width: number;
  readonly perMillivolt: number;
  readonly count: number;
  /** count × 8 monomial coefficients in the local variable s ∈ [−1, 1] (zero until the segment is built). */
  readonly coefficients: Float64Array;
  /** Per segment: 0 not built yet, 1 solved by Newton instead of the interpolant, 2 interpolant. */
  readonly state: Uint8Array;
  /**
   * Temperatures of the count + 1 segment boundaries, °C (NaN until a segment next to it is built); the first and
   * the last, the piece's ends, are set when the piece is made.
   */
  readonly edgesC: Float64Array;
}

/** Exact-inverse tables of one type (built by `exactInverse.ts`; declared here so the two modules do not import each other). @internal */
export interface ExactInverse {
  readonly pieces: readonly InversePiece[];
}

/** @internal */
export interface CompiledType {
  readonly type: ThermocoupleType;
  readonly context: string;
  readonly minC: number;
  readonly maxC: number;
  readonly subranges: readonly CompiledSubrange[];
  /** Type K's exponential term a0·exp(a1·(t − a2)²): a0 in mV (0 for the other types). */
  readonly a0: number;
  /** a1 in 1/°C² (0 for types without the term). */
  readonly a1: number;
  /** a2 in °C (0 for types without the term). */
  readonly a2: number;
  /** E at minC and maxC, mV. */
  readonly emfAtMinC: number;
  readonly emfAtMaxC: number;
  /**
   * Lowest EMF the function reaches over its range (below emfAtMinC only for a non-monotonic start, type B).
   */
  readonly lowestEmf: number;
  /**
   * Temperature above which E is strictly increasing and unique: minC for monotonic types; for type B
   * the upper root of E(t) = E(minC) (about 42.13 °C).
   */
  readonly monotonicFromC: number;
  /**
   * Only where E starts by falling (type B): the problem sentence of an EMF at or below E(minC), which belongs
   * to two temperatures (`AMBIGUOUS_EMF`).
   */
  readonly ambiguity: string | undefined;
  /** Exact-inverse tables, built on first use by `_exactInverseTables`. */
  inverse?: ExactInverse;
}

/**
 * Horner evaluation of Σ cᵢ·xⁱ; with `first` and `last`, of Σ c[first + i]·xⁱ over c[first … last] (an exact-inverse
 * segment's 8 coefficients). @internal
 */
export function _horner(c: Float64Array, x: number, first = 0, last = c.length - 1): number {
  let acc = c[last] as number;
  for (let i = last - 1; i >= first; i--) acc = acc * x + (c[i] as number);
  return acc;
}

/** Horner evaluation of d/dx Σ cᵢ·xⁱ. @internal */
export function _hornerDerivative(c: Float64Array, x: number): number {
  let acc = 0;
  for (let i = c.length - 1; i >= 1; i--) acc = acc * x + i * (c[i] as number);
  return acc;
}

/** Index of the forward sub-range holding t (a shared end point belongs to the higher range). @internal */
export function _subrangeIndex(ct: CompiledType, temperatureC: number): number {
  const ranges = ct.subranges;
  for (let i = ranges.length - 1; i > 0; i--) {
    if (temperatureC >= (ranges[i] as CompiledSubrange).minC) return i;
  }
  return 0;
}

/** E(t) in mV with no range check, using sub-range `index`. @internal */
export function _emfInSubrange(ct: CompiledType, index: number, temperatureC: number): number {
  const sub = ct.subranges[index] as CompiledSubrange;
  let emf = _horner(sub.c, temperatureC);
  if (sub.hasExp) {
    const d = temperatureC - ct.a2;
    emf += ct.a0 * Math.exp(ct.a1 * d * d);
  }
  return emf;
}

/** E(t) in mV with no range check. @internal */
export function _emf(ct: CompiledType, temperatureC: number): number {
  return _emfInSubrange(ct, _subrangeIndex(ct, temperatureC), temperatureC);
}

/** dE/dt in mV/°C with no range check, using sub-range `index`. @internal */
export function _slopeInSubrange(ct: CompiledType, index: number, temperatureC: number): number {
  const sub = ct.subranges[index] as CompiledSubrange;
  let slope = _hornerDerivative(sub.c, temperatureC);
  if (sub.hasExp) {
    const d = temperatureC - ct.a2;
    slope += ct.a0 * Math.exp(ct.a1 * d * d) * 2 * ct.a1 * d;
  }
  return slope;
}

/** dE/dt in mV/°C with no range check. @internal */
export function _slope(ct: CompiledType, temperatureC: number): number {
  return _slopeInSubrange(ct, _subrangeIndex(ct, temperatureC), temperatureC);
}

/**
 * E_index(t) − target by a compensated Horner scheme (error-free transformations: Knuth's TwoSum, Dekker's
 * TwoProduct by splitting; Graillat, Langlois & Louvet, "Compensated Horner scheme", 2005, from memory): the
 * residual is as accurate as if computed in twice the working precision (type K's exponential term is added in
 * plain arithmetic). @internal
 */
export function _residual(ct: CompiledType, index: number, t: number, target: number): number {
  const sub = ct.subranges[index] as CompiledSubrange;
  const c = sub.c;
  const split = 134217729 * t;
  const th = split - (split - t);
  const tl = t - th;
  let s = c[c.length - 1] as number;
  let e = 0;
  for (let i = c.length - 2; i >= 0; i--) {
    const p = s * t;
    const q = 134217729 * s;
    const sh = q - (q - s);
    const sl = s - sh;
    const ci = c[i] as number;
    const sum = p + ci;
    const bb = sum - p;
    e = e * t + (sh * th - p + sh * tl + sl * th + sl * tl + (p - (sum - bb) + (ci - bb)));
    s = sum;
  }
  if (sub.hasExp) {
    const d = t - ct.a2;
    e += ct.a0 * Math.exp(ct.a1 * d * d);
  }
  return s - target + e;
}

/**
 * Solves E_index(t) = target on [lowC, highC] (E increasing there) by safeguarded Newton on compensated
 * residuals (Newton steps kept inside a shrinking bracket, bisection when a step leaves it), then walks by
 * ulps to the float nearest the root: a non-decreasing function of the target (the residual's error, of
 * order u²·Σ|cᵢ||t|ⁱ, is far below the distance between the roots of adjacent targets).
 * @internal
 */
export function _solveInSubrange(ct: CompiledType, index: number, target: number, lowC: number, highC: number): number {
  let lo = lowC;
  let hi = highC;
  const fLo = _residual(ct, index, lo, target);
  const fHi = _residual(ct, index, hi, target);
  if (fLo >= 0) return lo;
  if (fHi <= 0) return hi;
  let t = lo + (hi - lo) * (-fLo / (fHi - fLo));
  let f = 0;
  for (let iteration = 0; iteration < 100; iteration++) {
    f = _residual(ct, index, t, target);
    if (f === 0) return t;
    if (f < 0) lo = t;
    else hi = t;
    let next = t - f / _slopeInSubrange(ct, index, t);
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    const step = Math.abs(next - t);
    t = next;
    if (step <= 2e-16 * (1 + Math.abs(t))) break;
  }
  // The ulp walk: step towards the root until the residual changes sign, keep the float of smaller |residual|.
  f = _residual(ct, index, t, target);
  const direction = f < 0 ? 1 : -1;
  for (let k = 0; k < 64 && f !== 0; k++) {
    // |t|·2⁻⁵³ rounds to the neighbouring float, except up from a power of two (a tie): then |t|·2⁻⁵².
    let next = t + direction * Math.max(Math.abs(t) * 2 ** -53, 2 ** -1074);
    if (next === t) next = t + direction * Math.abs(t) * 2 ** -52;
    if (next < lowC || next > highC) break;
    const g = _residual(ct, index, next, target);
    if (g < 0 !== f < 0 || g === 0) return Math.abs(g) < Math.abs(f) ? next : t;
    t = next;
    f = g;
  }
  return t;
}

/**
 * The numeric form of a checked data object (a generated data module's export or a `defineThermocoupleData`
 * result), built on first use and kept beside its mark; any other object is refused (`UNKNOWN_TYPE`). Neither
 * checks nor searches: the one-type path (`createThermocouple`) reaches only this. @internal
 */
export function _compileChecked(data: ThermocoupleData): CompiledType {
  const start = _checkedData.get(data);
  if (!start) {
    throw new HotjunctionTypeError({
      code: "UNKNOWN_TYPE",
      quantity: "thermocouple data",
      value: data,
      problem: "is not a type's data (typeB … typeT, defineThermocoupleData)",
    });
  }
  return (start.compiled ??= build(data, start)) as CompiledType;
}

const foreign = new WeakMap<ThermocoupleData, CompiledType>();

/**
 * Returns the numeric form of any data object, building it on first use: a checked one as `_compileChecked` does,
 * any other after the full check and the start search (`_compileForeign`; kept per object, so a later change of
 * the object is not seen; the letter-based functions accept such objects). @internal
 */
export function _compile(data: ThermocoupleData): CompiledType {
  if (_checkedData.has(data)) return _compileChecked(data);
  let ct = foreign.get(data);
  if (ct === undefined) foreign.set(data, (ct = _compileForeign(data)));
  return ct;
}

/**
 * Checks a data object: an object with a list of sub-ranges (else `UNKNOWN_TYPE`; so is one whose type or
 * source is not a string), contiguous increasing sub-ranges with finite ends and at least one coefficient each,
 * all finite, a range within the sub-ranges (a widened range would extrapolate a polynomial far outside its
 * sub-range) and a finite exponential term (else `INVALID_OPTION`). Only for data the generator did not write
 * (the generated modules are checked by their tests).
 */
function validate(data: ThermocoupleData): void {
  const subs = data?.forward;
  // Same error shape as other object checks (deliberate: this one names the type data and its own code).
  // A type and source that are not strings (they are the result's `type` and its context's words) are no type's data.
  if (!Array.isArray(subs) || typeof data.type != "string" || typeof data.source != "string") {
    throw new HotjunctionTypeError({
      code: "UNKNOWN_TYPE",
      quantity: "thermocouple data",
      value: data,
      problem: "is not a type's data (typeB … typeT)",
    });
  }
  const e = data.exponential;
  const first: number = subs[0]?.minC as number;
  let end = first;
  // e?.a0: an exponential term that is given must be an object of finite numbers (NaN, 0 or null is not one)
  let ok = [first, data.minC, data.maxC].every(Number.isFinite) && data.minC >= end && data.maxC > data.minC && (e === undefined || [e?.a0, e?.a1, e?.a2].every(Number.isFinite));
  for (const f of subs) {
    const c = f?.coefficients;
    // c[0] makes an empty list fail; every() rejects non-numbers and non-finite values (before any comparison).
    ok &&= f?.minC === end && Array.isArray(c) && [f.maxC, c[0], ...c].every(Number.isFinite) && f.maxC > end;
    end = f?.maxC;
  }
  if (!(ok && data.maxC <= end)) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "thermocouple data range",
      value: [data.minC, data.maxC],
      // the sub-ranges' span only when it is made of numbers (a forged end has no string form to print)
      min: ok ? first : undefined,
      max: ok ? end : undefined,
      unit: "°C",
      problem: "is not valid reference data",
    });
  }
}

/**
 * Where the EMF of a compiled type becomes unique: empty when E rises from minC; for a type whose E starts by
 * falling (type B) the slope's sign change in the first sub-range (bisection), E there (the lowest EMF) and the
 * upper root of E(t) = E(minC). scripts/generateTypeData.py repeats these operations for the generated modules.
 */
function monotoneStart(ct: CompiledType): _DataStart {
  if (_slopeInSubrange(ct, 0, ct.minC) > 0) return {};
  const top = ct.subranges[0]?.maxC as number;
  let lo = ct.minC;
  let hi = top;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (_slopeInSubrange(ct, 0, mid) <= 0) lo = mid;
    else hi = mid;
  }
  const turnC = 0.5 * (lo + hi);
  const fromC = _solveInSubrange(ct, 0, ct.emfAtMinC, turnC, top);
  return {
    lowestEmf: _emfInSubrange(ct, 0, turnC),
    monotonicFromC: fromC,
    ambiguity: `is ambiguous (E dips below ${ct.emfAtMinC} mV up to ${fromC.toFixed(2)} °C: two temperatures); use an EMF above ${ct.emfAtMinC} mV`,
  };
}

/** The full check and the start search of a data object the generator did not write. @internal */
export function _compileForeign(data: ThermocoupleData): CompiledType {
  validate(data);
  // The term's three numbers only: any other key of a forged `exponential` (a `minC`, an `inverse` …) would
  // otherwise land in the compiled type and replace its range or tables.
  const e = data.exponential;
  const clean: ThermocoupleData = { ...data, ...(e && { exponential: { a0: e.a0, a1: e.a1, a2: e.a2 } }) };
  return build(clean, monotoneStart(build(clean, {})));
}

/** Start data of a checked copy (`defineThermocoupleData`): the start search's result. @internal */
export function _startOf(ct: CompiledType): _DataStart {
  // A fresh object: its `compiled` slot is the copy's own.
  return ct.ambiguity === undefined ? {} : { lowestEmf: ct.lowestEmf, monotonicFromC: ct.monotonicFromC, ambiguity: ct.ambiguity };
}

function build(data: ThermocoupleData, start: _DataStart): CompiledType {
  const x = data.exponential;
  // The EMF fields are set below, once the evaluation has what it reads (sub-ranges and the exponential term).
  const ct = {
    type: data.type,
    context: `type ${data.type}`,
    minC: data.minC,
    maxC: data.maxC,
    subranges: data.forward.map((f) => ({
      minC: f.minC,
      maxC: f.maxC,
      c: Float64Array.from(f.coefficients),
      hasExp: x !== undefined && f.minC >= 0,
    })),
    a0: 0,
    a1: 0,
    a2: 0,
    ...x,
    monotonicFromC: start.monotonicFromC ?? data.minC,
    ambiguity: start.ambiguity,
  } as Partial<CompiledType> as { -readonly [K in keyof CompiledType]: CompiledType[K] };
  ct.emfAtMinC = _emf(ct, ct.minC);
  ct.lowestEmf = start.lowestEmf ?? ct.emfAtMinC;
  ct.emfAtMaxC = _emf(ct, ct.maxC);
  return ct;
}
