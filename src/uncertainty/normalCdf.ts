import { _requireFinite } from "../errors.js";

const twoOverSqrtPi = 1.1283791670955126; // 2/√π
const oneOverSqrtPi = 0.5641895835477563; // 1/√π

/**
 * @internal Complementary error function erfc(x), relative accuracy about 1e-14 or better for x ≥ 0.
 * |x| < 2: erfc = 1 − erf with erf(x) = (2/√π)·e^(−x²)·Σ 2ⁿx^(2n+1)/(1·3·…·(2n+1)) (all terms positive, no
 * cancellation; Abramowitz & Stegun 7.1.6). x ≥ 2: the continued fraction A&S 7.1.14, evaluated by the
 * modified Lentz method.
 */
export function _erfc(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  if (x < 0) return 2 - _erfc(-x);
  if (x < 2) {
    const x2 = x * x;
    let term = x;
    let sum = x;
    for (let n = 1; n < 200; n++) {
      term *= (2 * x2) / (2 * n + 1);
      sum += term;
      if (term < 1e-17 * sum) break;
    }
    return 1 - twoOverSqrtPi * Math.exp(-x2) * sum;
  }
  if (x > 27) return 0; // below the smallest double
  // erfc(x) = e^(−x²)/√π · 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + …))))
  const tiny = 1e-300;
  let f = x;
  let c = x;
  let d = 0;
  for (let n = 1; n < 500; n++) {
    const a = n / 2;
    d = x + a * d;
    d = Math.abs(d) < tiny ? tiny : d;
    c = x + a / c;
    c = Math.abs(c) < tiny ? tiny : c;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return (oneOverSqrtPi * Math.exp(-x * x)) / f;
}

/**
 * Standard normal distribution function Φ(z) = ½·erfc(−z/√2), the probability that a standard normal variable
 * is ≤ z. Relative accuracy about 1e-14, also deep in the lower tail.
 * @param z - standard score (unitless), any finite number
 * @returns probability in [0, 1]
 * @throws HotjunctionTypeError for a non-finite z
 * @example
 * ```ts
 * import { normalCdf } from "hotjunction";
 * console.log(Number(normalCdf(1.959963984540054).toFixed(12))); // 0.975
 * console.log(normalCdf(0)); // 0.5
 * ```
 */
export function normalCdf(z: number): number {
  _requireFinite(z, "standard score", undefined, "normalCdf");
  return 0.5 * _erfc(-z / Math.SQRT2);
}
