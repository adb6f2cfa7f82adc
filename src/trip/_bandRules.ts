/**
 * Two rules of the trip bands: the coverage factor of the RSS interval when a bounded (rectangular) source
 * dominates, and the self-consistent worst case (the thermocouple tolerance taken at the trip temperature the
 * chain produces, not at the setpoint).
 * @module
 */
import { normalCdf } from "../uncertainty/normalCdf.js";
import { normalQuantile } from "../uncertainty/normalQuantile.js";
import type { InputDistribution } from "../uncertainty/types.js";

// 1/√(2π) as the float 1 / Math.sqrt(2 * Math.PI) evaluates to (the same bits), written as a literal: a module-level
// division of a call's result stays in every bundle of the root entry (the one-type one too), pure mark or not.
const invSqrt2Pi = 0.3989422804014327;

/** Antiderivative of Φ: G(z) = z·Φ(z) + φ(z). */
function phiIntegral(z: number): number {
  return z * normalCdf(z) + invSqrt2Pi * Math.exp(-0.5 * z * z);
}

/**
 * P(|U + N| ≤ x) for U rectangular on [−a, a] and N normal with standard deviation σ:
 * F(x) = (σ/2a)·[G((x + a)/σ) − G((x − a)/σ)], P = 2F(x) − 1 (the convolution written with the antiderivative
 * of Φ; σ = 0 gives x/a, a = 0 the normal).
 */
function rectangularNormalCoverage(x: number, a: number, sigma: number): number {
  if (a === 0) return 2 * normalCdf(x / sigma) - 1;
  if (sigma === 0) return Math.min(1, x / a);
  const f = (sigma / (2 * a)) * (phiIntegral((x + a) / sigma) - phiIntegral((x - a) / sigma));
  return 2 * f - 1;
}

/** The coverage factor of an RSS interval and how it was chosen. */
export interface _RssCoverageFactor {
  /** k with the interval estimate ± k·u_c. */
  readonly k: number;
  /** Which rule gave k. */
  readonly rule: "normal" | "rectangular-dominant";
}

/**
 * The coverage factor of the RSS interval: the coverage quantile of the convolution of the largest rectangular
 * term (half-width √3·|c|u) with a normal of the remaining variance, divided by u_c (JCGM 100 G.2.3 and
 * G.6.5–G.6.6: k = 2 presumes an approximately normal output, which a dominant rectangular term is not; a lone
 * rectangular term gives k = p·√3, 1.65 at 95 %). Without a rectangular term, the normal quantile (1.96 at 95 %).
 * @param terms - |c_i|·u_i of each input and its distribution
 * @param coverage - coverage probability in (0, 1)
 */
export function _rssCoverageFactor(
  terms: readonly { readonly contribution: number; readonly distribution: InputDistribution }[],
  coverage: number,
): _RssCoverageFactor {
  const total = Math.sqrt(terms.reduce((s, t) => s + t.contribution * t.contribution, 0));
  const normalK = normalQuantile(0.5 + coverage / 2);
  let dominant = 0;
  for (const t of terms) if (t.distribution.kind === "rectangular" && t.contribution > dominant) dominant = t.contribution;
  if (!(total > 0) || dominant === 0) return { k: normalK, rule: "normal" };
  const a = Math.sqrt(3) * dominant;
  const sigma = Math.sqrt(Math.max(0, total * total - dominant * dominant));
  let lo = 0;
  let hi = a + 10 * sigma;
  for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (rectangularNormalCoverage(mid, a, sigma) < coverage) lo = mid;
    else hi = mid;
  }
  const k = hi / total;
  return k < normalK ? { k, rule: "rectangular-dominant" } : { k: normalK, rule: "normal" };
}

/** A worst-case edge found by fixed-point iteration. */
export interface _SelfConsistentEdge {
  /** The edge, °C. */
  readonly edgeC: number;
  /** Iterations until the tolerance temperature and the edge agreed. */
  readonly iterations: number;
}

/**
 * The self-consistent worst-case edge: t = edge(tolerance at t), solved by fixed-point iteration from the
 * setpoint. The map is a contraction for every tolerance class of IEC 60584-1 / ASTM E230 (the tolerance's
 * slope in °C per °C is at most 0.0075, so each step shrinks the change at least a hundredfold); the loop stops
 * when successive edges agree within 1e-9 °C (or after 60 steps, then the last edge is kept, never the setpoint's).
 * @param edgeAt - the worst-case edge with the thermocouple tolerance taken at a temperature, °C
 * @param startC - first tolerance temperature (the setpoint), °C
 */
export function _selfConsistentEdge(edgeAt: (toleranceAtC: number) => number, startC: number): _SelfConsistentEdge {
  let t = startC;
  for (let i = 1; i <= 60; i++) {
    const next = edgeAt(t);
    if (Math.abs(next - t) <= 1e-9 * Math.max(1, Math.abs(next)) || i === 60) return { edgeC: next, iterations: i };
    t = next;
  }
  return { edgeC: t, iterations: 60 };
}
