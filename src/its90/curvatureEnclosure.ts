/**
 * Interval enclosures of the ITS-90 reference function's derivatives over a temperature interval, with
 * outward rounding, for the firmware tables' interpolation bound; and an a-priori bound on the float64 error
 * of the reference values the breakpoints are computed from.
 *
 * Outward rounding: every interval operation rounds its lower end down and its upper end up by widening the
 * round-to-nearest result by two units in the last place (`down`, `up`), so the exact result of the
 * operation on any points of the operand intervals lies inside (round-to-nearest errs by at most half an ulp).
 * The polynomial's k-th derivative over [a, b] is enclosed in the mean-value form
 * p⁽ᵏ⁾(m) + p⁽ᵏ⁺¹⁾([a, b])·([a, b] − m), m the midpoint, p⁽ᵏ⁺¹⁾([a, b]) by interval Horner (the
 * mean-value theorem; any interval-analysis text, from memory): tight for the short segments of a table,
 * where plain interval Horner over a wide temperature overestimates badly. The coefficients are widened by
 * one ulp each, so the enclosure holds for the standard's decimal coefficients too. Type K's exponential
 * term a₀·exp(a₁(t − a₂)²) is enclosed by plain interval evaluation of its derivatives (exp monotone, its
 * library error widened by 4 ulps).
 * @internal
 * @module
 */
import type { CompiledSubrange, CompiledType } from "./compiled.js";

/** A closed interval [lo, hi]. @internal */
export type _Interval = readonly [number, number];

const ULP = 2.220446049250313e-16; // 2^-52 (a literal: a module-level `**` is kept by every bundle)
const TINY = 9.332636185032189e-302; // 2^-1000

/** x rounded down by two ulps (outward rounding of a lower end). @internal */
export function _down(x: number): number {
  return x - (Math.abs(x) * 2 * ULP + TINY);
}

/** x rounded up by two ulps (outward rounding of an upper end). @internal */
export function _up(x: number): number {
  return x + (Math.abs(x) * 2 * ULP + TINY);
}

/** Outward-rounded interval sum. @internal */
export function _addInterval(a: _Interval, b: _Interval): _Interval {
  return [_down(a[0] + b[0]), _up(a[1] + b[1])];
}

/** Outward-rounded interval product. @internal */
export function _mulInterval(a: _Interval, b: _Interval): _Interval {
  const p0 = a[0] * b[0];
  const p1 = a[0] * b[1];
  const p2 = a[1] * b[0];
  const p3 = a[1] * b[1];
  return [_down(Math.min(p0, p1, p2, p3)), _up(Math.max(p0, p1, p2, p3))];
}

function square(a: _Interval): _Interval {
  if (a[0] >= 0) return [_down(a[0] * a[0]), _up(a[1] * a[1])];
  if (a[1] <= 0) return [_down(a[1] * a[1]), _up(a[0] * a[0])];
  return [0, _up(Math.max(a[0] * a[0], a[1] * a[1]))];
}

/** The derivative coefficient intervals computed so far, per coefficient array and order (they are the same each time). */
const derivativeCache = new WeakMap<Float64Array, _Interval[][]>();

/** Coefficient intervals of the k-th derivative of Σ cᵢ·tⁱ, each widened to hold the decimal coefficient. */
function derivativeCoefficients(c: Float64Array, k: number): readonly _Interval[] {
  let orders = derivativeCache.get(c);
  if (orders === undefined) derivativeCache.set(c, (orders = []));
  return (orders[k] ??= computeDerivativeCoefficients(c, k));
}

function computeDerivativeCoefficients(c: Float64Array, k: number): _Interval[] {
  const out: _Interval[] = [];
  for (let i = k; i < c.length; i++) {
    let factor = 1;
    for (let j = 0; j < k; j++) factor *= i - j;
    const v = factor * (c[i] as number); // factor ≤ 16·15·14: exact; one rounding in the product
    out.push([_down(_down(v)), _up(_up(v))]);
  }
  return out;
}

function hornerInterval(ci: readonly _Interval[], x: _Interval): _Interval {
  if (ci.length === 0) return [0, 0];
  let acc = ci[ci.length - 1] as _Interval;
  for (let i = ci.length - 2; i >= 0; i--) acc = _addInterval(_mulInterval(acc, x), ci[i] as _Interval);
  return acc;
}

/** Enclosure of the k-th derivative (k = 1 or 2) of type K's exponential term over t. */
function exponentialDerivative(ct: CompiledType, k: 1 | 2, t: _Interval): _Interval {
  const d: _Interval = [_down(t[0] - ct.a2), _up(t[1] - ct.a2)];
  const d2 = square(d);
  // a1 < 0 for type K: exp(a1·d²) decreases in d²; for a1 ≥ 0 it increases.
  const arg = _mulInterval([ct.a1, ct.a1], d2);
  const widen = 4 * ULP;
  const g: _Interval = [Math.exp(arg[0]) * (1 - widen), Math.exp(arg[1]) * (1 + widen)];
  const a0g = _mulInterval([ct.a0, ct.a0], g);
  if (k === 1) return _mulInterval(a0g, _mulInterval([2 * ct.a1, 2 * ct.a1], d));
  // g'' = a0·g·(2a1 + 4a1²·d²)
  const a1sq = _up(4 * ct.a1 * ct.a1);
  return _mulInterval(a0g, _addInterval([2 * ct.a1, 2 * ct.a1], _mulInterval([_down(4 * ct.a1 * ct.a1), a1sq], d2)));
}

/**
 * Enclosure of E⁽ᵏ⁾(t), k = 1 (Seebeck coefficient, mV/°C) or 2 (mV/°C²), over t ∈ [lo, hi], with the
 * polynomial of sub-range `index` (no range check). @internal
 */
export function _encloseEmfDerivative(ct: CompiledType, index: number, k: 1 | 2, t: _Interval): _Interval {
  const sub = ct.subranges[index] as CompiledSubrange;
  const m = 0.5 * (t[0] + t[1]);
  const atMid = hornerInterval(derivativeCoefficients(sub.c, k), [m, m]);
  const next = hornerInterval(derivativeCoefficients(sub.c, k + 1), t);
  let result = _addInterval(atMid, _mulInterval(next, [_down(t[0] - m), _up(t[1] - m)]));
  if (sub.hasExp) result = _addInterval(result, exponentialDerivative(ct, k, t));
  return result;
}

/** Largest magnitude in an interval. @internal */
export function _magnitude(a: _Interval): number {
  return Math.max(Math.abs(a[0]), Math.abs(a[1]));
}

/**
 * A-priori bound (mV) on |Ê(t) − E(t)| for t ∈ [lo, hi] in sub-range `index`: the float64 Horner evaluation
 * of the library against the standard's decimal polynomial, γ₂ₙ₊₂·Σ|cᵢ|·|t|ⁱ with n the degree (Horner's
 * rounding error analysis, Higham, Accuracy and Stability of Numerical Algorithms, §5.1, from memory; the
 * extra 2 covers the coefficients' own decimal-to-binary rounding and the exact input), plus 8 ulps of type
 * K's exponential term. @internal
 */
export function _emfEvaluationBound(ct: CompiledType, index: number, t: _Interval): number {
  const sub = ct.subranges[index] as CompiledSubrange;
  const x = Math.max(Math.abs(t[0]), Math.abs(t[1]));
  let sum = 0;
  for (let i = sub.c.length - 1; i >= 0; i--) sum = sum * x + Math.abs(sub.c[i] as number);
  const u = ULP / 2;
  const k = 2 * sub.c.length + 2;
  let bound = ((k * u) / (1 - k * u)) * sum * 1.01;
  if (sub.hasExp) bound += 8 * u * Math.abs(ct.a0);
  return bound;
}
