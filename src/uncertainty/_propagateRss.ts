/**
 * GUM law of propagation of uncertainty (internal part of `propagate`).
 * @module
 * @internal
 */
import { _normalQuantile } from "./normalQuantile.js";
import { _studentTQuantile } from "./studentTQuantile.js";
import { _meansOf, _sensitivities, type _ModelEvaluator, type _PreparedInputs } from "./_prepare.js";
import type { Contribution, PropagationResult } from "./types.js";

/** @internal Linearised combination shared by rss, worst case (for u) and Monte Carlo (for contributions). */
export interface _Linearisation {
  readonly estimate: number;
  readonly sensitivities: Float64Array;
  /** cᵢ·u(xᵢ), signed. */
  readonly terms: Float64Array;
  readonly standardUncertainty: number;
  /** Σ (cᵢuᵢ)², without correlation terms. */
  readonly uncorrelatedVariance: number;
}

/** @internal */
export function _linearise(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  correlation: Float64Array | undefined,
): _Linearisation {
  const means = _meansOf(prepared.distributions);
  const estimate = evaluator.evaluate(means);
  const sensitivities = _sensitivities(evaluator, means, prepared.distributions);
  const n = means.length;
  const terms = new Float64Array(n);
  let uncorrelatedVariance = 0;
  for (let i = 0; i < n; i++) {
    const term = (sensitivities[i] as number) * (prepared.distributions[i]?.standardUncertainty as number);
    terms[i] = term;
    uncorrelatedVariance += term * term;
  }
  let variance = uncorrelatedVariance;
  if (correlation !== undefined) {
    // JCGM 100:2008 5.2.2, Eq. (13)
    for (let i = 0; i < n; i++) {
      for (let j = i + 1; j < n; j++) {
        variance += 2 * (terms[i] as number) * (terms[j] as number) * (correlation[i * n + j] as number);
      }
    }
    // Rounding can leave a tiny negative value when r = −1 terms cancel exactly.
    if (variance < 0) variance = 0;
  }
  return { estimate, sensitivities, terms, standardUncertainty: Math.sqrt(variance), uncorrelatedVariance };
}

/** @internal Contributions record in the caller's key order. */
export function _contributionsRecord(
  prepared: _PreparedInputs,
  make: (index: number) => Contribution,
): Record<string, Contribution> {
  const byName = new Map<string, Contribution>();
  prepared.names.forEach((name, i) => byName.set(name, make(i)));
  const record: Record<string, Contribution> = {};
  for (const name of prepared.callerOrder) record[name] = byName.get(name) as Contribution;
  return record;
}

/** @internal Linear contributions (rss and Monte Carlo). */
export function _linearContributions(prepared: _PreparedInputs, lin: _Linearisation): Record<string, Contribution> {
  return _contributionsRecord(prepared, (i) => {
    const term = lin.terms[i] as number;
    return {
      sensitivity: lin.sensitivities[i] as number,
      contribution: Math.abs(term),
      varianceShare: lin.uncorrelatedVariance > 0 ? (term * term) / lin.uncorrelatedVariance : 0,
    };
  });
}

/** @internal */
export function _propagateRss(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  correlation: Float64Array | undefined,
  coverage: number,
): PropagationResult {
  const lin = _linearise(prepared, evaluator, correlation);
  const u = lin.standardUncertainty;
  const finiteDof = prepared.distributions.some((d) => Number.isFinite(d.degreesOfFreedom));
  let effectiveDegreesOfFreedom: number | undefined;
  let kNote: string;
  let k: number;
  if (finiteDof) {
    // Welch–Satterthwaite, JCGM 100:2008 G.4.1 (Eq. G.2b)
    let denominator = 0;
    prepared.distributions.forEach((d, i) => {
      if (Number.isFinite(d.degreesOfFreedom)) denominator += (lin.terms[i] as number) ** 4 / d.degreesOfFreedom;
    });
    effectiveDegreesOfFreedom = denominator > 0 ? u ** 4 / denominator : Number.POSITIVE_INFINITY;
    k = _studentTQuantile((1 + coverage) / 2, effectiveDegreesOfFreedom);
    kNote = `k = ${k.toPrecision(4)} from Student's t with Welch–Satterthwaite effective degrees of freedom ${effectiveDegreesOfFreedom.toPrecision(4)} (JCGM 100 G.4)${correlation !== undefined ? ", which ignores the correlations" : ""}`;
  } else {
    k = _normalQuantile((1 + coverage) / 2);
    kNote = `k = ${k.toPrecision(4)} from the normal distribution`;
  }
  const result: {
    -readonly [K in keyof PropagationResult]: PropagationResult[K];
  } = {
    method: "rss",
    estimate: lin.estimate,
    standardUncertainty: u,
    interval: [lin.estimate - k * u, lin.estimate + k * u],
    coverage,
    coverageFactor: k,
    contributions: _linearContributions(prepared, lin),
    note:
      `RSS by the GUM law of propagation of uncertainty (JCGM 100 5.1${correlation !== undefined ? " and 5.2, Eq. 13, with correlations" : ""}), ` +
      `first order, sensitivity coefficients by Richardson-extrapolated central differences with steps of u(xᵢ)/100; ` +
      `${kNote} for ${(coverage * 100).toPrecision(4)} % coverage.`,
  };
  if (effectiveDegreesOfFreedom !== undefined) result.effectiveDegreesOfFreedom = effectiveDegreesOfFreedom;
  return result;
}
