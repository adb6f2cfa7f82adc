import { HotjunctionRangeError } from "../errors.js";
import { _requireDegreesOfFreedom, _requireProbability } from "./_checks.js";
import { _normalQuantile } from "./normalQuantile.js";

// Lanczos approximation, g = 7, n = 9 (about 15 significant digits).
const lanczos = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

/** @internal ln Γ(x) for x > 0. */
export function _logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - _logGamma(1 - x);
  const z = x - 1;
  let sum = lanczos[0] as number;
  for (let i = 1; i < 9; i++) sum += (lanczos[i] as number) / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

/** Continued fraction of the incomplete beta function (modified Lentz). */
function betaContinuedFraction(x: number, a: number, b: number): number {
  const tiny = 1e-300;
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 1000; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return h;
}

/** @internal Regularized incomplete beta function I_x(a, b), 0 ≤ x ≤ 1. */
export function _regularizedBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(
    _logGamma(a + b) - _logGamma(a) - _logGamma(b) + a * Math.log(x) + b * Math.log1p(-x),
  );
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(x, a, b)) / a;
  return 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

/** Upper tail P(T > t) of Student's t with ν degrees of freedom, t ≥ 0. */
function upperTail(t: number, nu: number): number {
  return 0.5 * _regularizedBeta(nu / (nu + t * t), nu / 2, 0.5);
}

/** Cornish–Fisher expansion of the t quantile about the normal one (Abramowitz & Stegun 26.7.5). */
function cornishFisher(z: number, nu: number): number {
  const z2 = z * z;
  const g1 = (z * (z2 + 1)) / 4;
  const g2 = (z * ((5 * z2 + 16) * z2 + 3)) / 96;
  const g3 = (z * (((3 * z2 + 19) * z2 + 17) * z2 - 15)) / 384;
  const g4 = (z * ((((79 * z2 + 776) * z2 + 1482) * z2 - 1920) * z2 - 945)) / 92160;
  return z + g1 / nu + g2 / (nu * nu) + g3 / (nu * nu * nu) + g4 / (nu * nu * nu * nu);
}

/** @internal Student t quantile, p in (0, 1), ν > 0 or Infinity; no checks. */
export function _studentTQuantile(p: number, nu: number): number {
  if (p === 0.5) return 0;
  // The tail probability is taken from the side it is on (1 − p is exact for p ≥ 0.5; p itself below), so a
  // tiny lower-tail p keeps its precision.
  if (p < 0.5) return -upperQuantile(p, nu);
  return upperQuantile(1 - p, nu);
}

/** t with P(T > t) = q, q in (0, 0.5). */
function upperQuantile(q: number, nu: number): number {
  if (!Number.isFinite(nu)) return -_normalQuantile(q);
  if (nu === 1) return 1 / Math.tan(Math.PI * q);
  if (nu === 2) return (1 - 2 * q) / Math.sqrt(2 * q * (1 - q));
  const z = -_normalQuantile(q);
  if (nu >= 1e5) return cornishFisher(z, nu); // truncation error of order ν⁻⁵
  const logNorm = _logGamma((nu + 1) / 2) - _logGamma(nu / 2) - 0.5 * Math.log(nu * Math.PI);
  const pdf = (t: number): number => Math.exp(logNorm - ((nu + 1) / 2) * Math.log1p((t * t) / nu));
  // Safeguarded Newton iteration on P(T > t) = q, starting from Cornish–Fisher.
  let lo = 0;
  let hi = Math.max(2 * z, 1);
  while (upperTail(hi, nu) > q) {
    lo = hi;
    hi *= 2;
  }
  let t = cornishFisher(z, nu);
  if (!(t > lo && t < hi)) t = (lo + hi) / 2;
  for (let i = 0; i < 200; i++) {
    const tail = upperTail(t, nu);
    if (tail > q) lo = t;
    else hi = t;
    let next = t + (tail - q) / pdf(t);
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    const step = Math.abs(next - t);
    t = next;
    if (step <= 1e-15 * t) break;
  }
  return t;
}

/**
 * Quantile of Student's t distribution with ν degrees of freedom: the t with P(T ≤ t) = p. The coverage factor
 * for coverage p and effective degrees of freedom ν is `studentTQuantile((1 + p) / 2, ν)` (JCGM 100:2008 G.3,
 * Table G.2). Non-integer ν is used as is (no truncation). Computed from the regularized incomplete beta function
 * by a safeguarded Newton iteration; relative accuracy about 1e-13.
 * @param probability - p, strictly between 0 and 1
 * @param degreesOfFreedom - ν > 0 (unitless); `Infinity` gives the normal quantile
 * @returns t (unitless)
 * @throws HotjunctionTypeError for a non-numeric argument; HotjunctionRangeError for p outside (0, 1) or ν ≤ 0,
 *   and `OVERFLOW` for a p so far in a tail that |t| exceeds the float64 range (e.g. ν = 1, p < 1e-308)
 * @example
 * ```ts
 * import { studentTQuantile } from "hotjunction";
 * console.log(Number(studentTQuantile(0.975, 10).toFixed(3))); // 2.228
 * console.log(Number(studentTQuantile(0.975, Infinity).toFixed(3))); // 1.96
 * ```
 */
export function studentTQuantile(probability: number, degreesOfFreedom: number): number {
  const p = _requireProbability(probability, "probability", "studentTQuantile");
  const nu = _requireDegreesOfFreedom(degreesOfFreedom, "studentTQuantile");
  const t = _studentTQuantile(p, nu);
  if (!Number.isFinite(t)) {
    throw new HotjunctionRangeError({
      code: "OVERFLOW",
      quantity: "probability",
      value: p,
      context: `studentTQuantile (ν = ${nu})`,
      problem: "is so far in a tail that the t quantile is beyond the float64 range",
    });
  }
  return t;
}
