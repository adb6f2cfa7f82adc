import { _requireProbability } from "./_checks.js";
import { _erfc } from "./normalCdf.js";

// Rational approximations of P. J. Acklam (2003), relative error < 1.15e-9, then refined below.
const a = [-39.69683028665376, 220.9460984245205, -275.9285104469687, 138.357751867269, -30.66479806614716, 2.506628277459239];
const b = [-54.47609879822406, 161.5858368580409, -155.6989798598866, 66.80131188771972, -13.28068155288572];
const c = [-0.007784894002430293, -0.3223964580411365, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
const d = [0.007784695709041462, 0.3224671290700398, 2.445134137142996, 3.754408661907416];
const sqrtTwoPi = 2.5066282746310002;

function acklam(p: number): number {
  const [a0, a1, a2, a3, a4, a5] = a as [number, number, number, number, number, number];
  const [b0, b1, b2, b3, b4] = b as [number, number, number, number, number];
  const [c0, c1, c2, c3, c4, c5] = c as [number, number, number, number, number, number];
  const [d0, d1, d2, d3] = d as [number, number, number, number];
  if (p < 0.02425) {
    const q = Math.sqrt(-2 * Math.log(p));
    return (((((c0 * q + c1) * q + c2) * q + c3) * q + c4) * q + c5) / ((((d0 * q + d1) * q + d2) * q + d3) * q + 1);
  }
  const q = p - 0.5;
  const r = q * q;
  return ((((((a0 * r + a1) * r + a2) * r + a3) * r + a4) * r + a5) * q) / (((((b0 * r + b1) * r + b2) * r + b3) * r + b4) * r + 1);
}

/**
 * Far lower tail (p < 1e-200, x < −30): Newton on log Φ(x) = log p with the asymptotic series of the Mills ratio,
 * Φ(x) = φ(x)/(−x)·(1 − 1/x² + 3/x⁴ − 15/x⁶ + 105/x⁸ − 945/x¹⁰ + …) (Abramowitz & Stegun 26.2.12); at x < −30 the
 * first omitted term is below 2e-14 relative, so x is good to about 1e-15. Works down to the smallest subnormal
 * p = 5e-324, where exp(x²/2) of the Halley step would overflow.
 */
function farTail(p: number, start: number): number {
  const logP = Math.log(p);
  let x = start;
  for (let i = 0; i < 4; i++) {
    const r = 1 / (x * x);
    const series = 1 + r * (-1 + r * (3 + r * (-15 + r * (105 - 945 * r))));
    const logPhi = -0.5 * x * x - Math.log(-x) - 0.9189385332046728 + Math.log(series); // 0.918… = ½·ln 2π
    x -= ((logPhi - logP) * series) / -x;
  }
  return x;
}

/** @internal Quantile of the standard normal for p in (0, 1), no checks. */
export function _normalQuantile(p: number): number {
  // Work in the lower half, where Φ(x) − p has no cancellation; 1 − p is exact for p ≥ 0.5.
  if (p > 0.5) return -_normalQuantile(1 - p);
  if (p < 1e-200) return farTail(p, acklam(p));
  let x = acklam(p);
  // Two Halley steps on Φ(x) − p (Acklam's suggested refinement), with an accurate erfc.
  for (let i = 0; i < 2; i++) {
    const e = 0.5 * _erfc(-x / Math.SQRT2) - p;
    const u = e * sqrtTwoPi * Math.exp((x * x) / 2);
    x = x - u / (1 + (x * u) / 2);
  }
  return x;
}

/**
 * Quantile (inverse distribution function) of the standard normal distribution: the z with Φ(z) = p.
 * Coverage factor of a normal output for coverage p is `normalQuantile((1 + p) / 2)`.
 * Acklam's rational approximation refined by Halley steps; absolute accuracy better than 1e-12. Below p = 1e-200
 * (z < −30) a Newton iteration on log Φ with the asymptotic Mills-ratio series takes over, so every p down to the
 * smallest subnormal (5e-324, z ≈ −38.47) gives a finite z.
 * @param probability - p, strictly between 0 and 1 (any double in the open interval, subnormals included)
 * @returns z (unitless)
 * @throws HotjunctionTypeError for a non-finite p; HotjunctionRangeError for p outside (0, 1)
 * @example
 * ```ts
 * import { normalQuantile } from "hotjunction";
 * console.log(Number(normalQuantile(0.975).toFixed(6))); // 1.959964
 * console.log(Number(normalQuantile(0.995).toFixed(3))); // 2.576
 * ```
 * @see NIST TN 1297 (1994) §6 for coverage factors
 */
export function normalQuantile(probability: number): number {
  return _normalQuantile(_requireProbability(probability, "probability", "normalQuantile"));
}
