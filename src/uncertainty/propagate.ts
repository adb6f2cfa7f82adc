import { HotjunctionRangeError, HotjunctionTypeError, _invalidChoice } from "../errors.js";
import { _requireInteger, _requireOptionsObject, _requireProbability } from "./_checks.js";
import { _minimumTrials } from "./_coverageIntervalSorted.js";
import { _adaptiveBatch, _maxModelEvaluations, _propagateMonteCarlo, type _MonteCarloSettings } from "./_propagateMonteCarlo.js";
import { _propagateRss } from "./_propagateRss.js";
import { _inputBox, _propagateWorstCase, _worstCaseFrom, type _Enclosure, type _WorstCaseBracket } from "./_propagateWorstCase.js";
import { _choleskyFactor, _correlationMatrix, _meansOf, _ModelEvaluator, _prepareInputs } from "./_prepare.js";
import type { Distribution, Model, PropagateOptions, PropagationMethod, PropagationResult } from "./types.js";

const methods: readonly PropagationMethod[] = ["worst-case", "rss", "monte-carlo"];
const intervals = ["symmetric", "shortest"] as const;
const defaultTrials = 1_000_000;
const defaultMaxTrials = 10_000_000;

/**
 * Propagates the uncertainties of named inputs through a model `y = f(x₁, …, xₙ)` to the output.
 *
 * - `"rss"` (default): GUM law of propagation of uncertainty (JCGM 100:2008 5.1–5.2), sensitivity coefficients by
 *   Richardson-extrapolated central differences with steps of u(xᵢ)/100, correlations by Eq. (13); coverage factor
 *   from the normal distribution, or from Student's t with Welch–Satterthwaite ν_eff (G.4) when any input has
 *   finite degrees of freedom.
 * - `"worst-case"`: the extremes of the model over the box of input bounds (bounded shapes: mean ± half-width;
 *   normal inputs: mean ± k·u with k from `normalBoundCoverage`). All 2ⁿ corners are evaluated for n ≤ 16, then a
 *   coordinate-wise grid + golden-section search from the best corner and from the estimates finds interior extremes
 *   of non-monotone models; above 16 inputs the search starts from the corner of per-input extremes. `note` says
 *   which was done. The result's `attained` gives each extreme with a point that reaches it; with
 *   `modelEnclosure` (an interval extension of the model) a branch and bound over the box adds a proven
 *   `enclosure` and the `enclosureGap` between the two. Correlations are not used (the box bounds any dependence).
 * - `"monte-carlo"`: JCGM 101:2008 with a seeded xoroshiro128+ generator (same seed, same result bit for bit),
 *   one jump-ahead stream per block of 8192 trials (so `propagateParallel` reproduces it on any number of
 *   workers), samples per 6.4, probabilistically symmetric (7.7) or shortest interval, optional adaptive
 *   stopping (7.9). JCGM 101's rule 2·s/√h ≤ δ only says that the average of h batch values lies within δ of its
 *   expectation with about 95 % probability, for large h and each result separately; here the factor is
 *   Student's t(0.975, h − 1) and the shortest interval's endpoints count as scattering by s/h^(1/3), so the
 *   rule also holds when it would stop after few batches and for the shortest interval. Memory is bounded:
 *   above 4,194,304 trials the interval is averaged over segments (`intervalSegments`,
 *   `intervalStandardError`). Work is capped at 10⁹ model evaluations.
 *   Correlated inputs: normals via the Cholesky factor of the correlation matrix; bounded inputs through a Gaussian
 *   copula (r applies to the normal scores).
 *
 * Results do not depend on the key order of `inputs`. The model gets one record object that is reused between
 * calls; it must not keep it.
 * @param model - function of a record `{ [name]: value }` (each value in its input's unit) returning the output
 *   (in the output's unit); must return a finite number everywhere the inputs can go
 * @param inputs - record of named {@link Distribution}s (at least one)
 * @param options - {@link PropagateOptions}: `method`, `coverage` in (0, 1) (default 0.95), `correlations`
 *   `[nameA, nameB, r]` with r in [−1, 1], Monte Carlo `monteCarloTrials` (integer ≥ 1/(1 − coverage), default 1e6; `trials` is its deprecated name),
 *   `seed` (integer 0…2³² − 1, default 1), `adaptive` `{ significantDigits: 1–3, maxTrials? (default 1e7) }`,
 *   `interval`, `onProgress`; worst case `normalBoundCoverage` in (0, 1)
 * @returns {@link PropagationResult} in the output's unit (estimate, standard uncertainty, interval, contributions)
 * @throws HotjunctionTypeError / HotjunctionRangeError for bad inputs or options (code `UNKNOWN_NAME` for an
 *   unknown name in `correlations` or a name the model reads that is not an input, `NOT_POSITIVE_DEFINITE` for
 *   contradicting correlations, `MODEL_NOT_FINITE` with the input values when the model returns NaN or ±Infinity,
 *   `INVALID_OPTION` / `OUT_OF_RANGE` otherwise)
 * @example
 * ```ts
 * import { propagate, rectangular, normal } from "hotjunction";
 * const inputs = { a: normal({ mean: 1, standardDeviation: 0.3 }), b: rectangular({ center: 2, halfWidth: 0.5 }) };
 * const rss = propagate(({ a, b }) => a + b, inputs, { method: "rss" });
 * console.log(rss.estimate, Number(rss.standardUncertainty.toFixed(4))); // 3 0.4163
 * const worst = propagate(({ a, b }) => a + b, inputs, { method: "worst-case", normalBoundCoverage: 0.9973 });
 * console.log(worst.interval.map((v) => Number(v.toFixed(3)))); // [ 1.6, 4.4 ]
 * const mc = propagate(({ a, b }) => a + b, inputs, { method: "monte-carlo", monteCarloTrials: 20000, seed: 7 });
 * console.log(mc.trials, Math.abs(mc.standardUncertainty - rss.standardUncertainty) < 0.01); // 20000 true
 * ```
 * @see JCGM 100:2008 (GUM); JCGM 101:2008 (GUM Supplement 1)
 */
export function propagate<Name extends string>(
  model: Model<Name>,
  inputs: Readonly<Record<Name, Distribution>>,
  options?: PropagateOptions<Name>,
): PropagationResult<Name> {
  const context = "propagate";
  if (typeof model !== "function") {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "model", value: model, context, problem: "is not a function" });
  }
  _requireOptionsObject(options, context, true);
  const o: PropagateOptions<Name> = options ?? {};
  const method = o.method === undefined ? "rss" : o.method;
  if (!methods.includes(method)) _invalidChoice("method", method, methods, context);
  const coverage = o.coverage === undefined ? 0.95 : _requireProbability(o.coverage, "coverage", context);
  const prepared = _prepareInputs(inputs);
  const correlation = _correlationMatrix(o.correlations, prepared.names);
  // Contradicting correlations are an error for every method, not only where the factor is used.
  if (correlation !== undefined) _choleskyFactor(correlation, prepared.names);
  const evaluator = new _ModelEvaluator(model as Model, prepared.names);
  evaluator.probeNames(_meansOf(prepared.distributions));

  let result: PropagationResult;
  if (method === "rss") {
    result = _propagateRss(prepared, evaluator, correlation, coverage);
  } else if (method === "worst-case") {
    const bound =
      o.normalBoundCoverage === undefined
        ? undefined
        : _requireProbability(o.normalBoundCoverage, "normalBoundCoverage", context);
    if (o.modelEnclosure !== undefined && typeof o.modelEnclosure !== "function") {
      throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "modelEnclosure", value: o.modelEnclosure, context, problem: "is not a function" });
    }
    result = _propagateWorstCase(prepared, evaluator, correlation, bound, o.modelEnclosure as _Enclosure | undefined);
  } else {
    result = _propagateMonteCarlo(prepared, evaluator, correlation, _monteCarloSettings(o, coverage, 1, context));
  }
  return _requireFiniteResult(result, context) as PropagationResult<Name>;
}

/**
 * @internal Throws `OVERFLOW` when a number of the result is not finite (a model whose outputs are finite but so
 * large that their sums or squares overflow): never a result with Infinity or NaN in it.
 */
export function _requireFiniteResult<R extends PropagationResult>(result: R, context: string): R {
  const fields: [string, number | undefined][] = [
    ["estimate", result.estimate],
    ["standard uncertainty", result.standardUncertainty],
    ["interval low end", result.interval[0]],
    ["interval high end", result.interval[1]],
    ["coverage factor", result.coverageFactor],
  ];
  for (const [name, c] of Object.entries(result.contributions) as [string, { sensitivity: number; contribution: number; varianceShare: number }][]) {
    fields.push([`sensitivity to ${name}`, c.sensitivity], [`contribution of ${name}`, c.contribution], [`variance share of ${name}`, c.varianceShare]);
  }
  for (const [quantity, value] of fields) {
    if (value !== undefined && !Number.isFinite(value)) {
      throw new HotjunctionRangeError({
        code: "OVERFLOW",
        quantity,
        value,
        min: -Number.MAX_VALUE,
        max: Number.MAX_VALUE,
        context: `${context} (${result.method})`,
        problem: "overflows the float64 range: the model's outputs are too large for this method (rescale the output unit)",
      });
    }
  }
  return result;
}

/**
 * @internal Checks the Monte Carlo options of `propagate` and its relatives; `models` is how many models share
 * the trials (total work trials × models is capped at {@link _maxModelEvaluations}).
 */
export function _monteCarloSettings(o: PropagateOptions, coverage: number, models: number, context: string): _MonteCarloSettings {
  const interval = o.interval === undefined ? "symmetric" : o.interval;
  if (!intervals.includes(interval)) _invalidChoice("interval", interval, intervals, context);
  const minimum = _minimumTrials(coverage);
  const seed = o.seed === undefined ? 1 : _requireInteger(o.seed, "seed", 0, 2 ** 32 - 1, context);
  // `trials` is the deprecated name of `monteCarloTrials` (one minor version); both at once are refused.
  if (o.monteCarloTrials !== undefined && o.trials !== undefined) {
    _invalidChoice("options", "monteCarloTrials and trials", ["monteCarloTrials (trials is its deprecated name)"], context);
  }
  const trialsKey = o.monteCarloTrials === undefined ? "trials" : "monteCarloTrials";
  const givenTrials = o.monteCarloTrials ?? o.trials;
  let adaptive: { significantDigits: number; maxTrials: number } | undefined;
  if (o.adaptive !== undefined) {
    _requireOptionsObject(o.adaptive, `${context} adaptive`, false);
    if (givenTrials !== undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: trialsKey,
        value: givenTrials,
        context,
        problem: "cannot be given together with adaptive (give adaptive.maxTrials instead)",
      });
    }
    const significantDigits = _requireInteger(o.adaptive.significantDigits, "significantDigits", 1, 3, `${context} adaptive`);
    const batch = _adaptiveBatch(coverage);
    const maxTrials =
      o.adaptive.maxTrials === undefined
        ? Math.max(defaultMaxTrials, 2 * batch)
        : _requireInteger(o.adaptive.maxTrials, "maxTrials", 2 * batch, 1e9, `${context} adaptive`);
    adaptive = { significantDigits, maxTrials };
  }
  const trials =
    givenTrials === undefined ? Math.max(defaultTrials, minimum) : _requireInteger(givenTrials, trialsKey, minimum, 1e9, context);
  const planned = adaptive === undefined ? trials : adaptive.maxTrials;
  if (planned * models > _maxModelEvaluations) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: models > 1 ? "models × trials" : adaptive === undefined ? "trials" : "adaptive maxTrials",
      value: planned * models,
      max: _maxModelEvaluations,
      context,
      problem: `is more work than one call may do (${models > 1 ? `${models} models × ${planned} trials` : `${planned} model evaluations`}); split the work or use fewer trials`,
    });
  }
  if (o.onProgress !== undefined && typeof o.onProgress !== "function") {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "onProgress", value: o.onProgress, context, problem: "is not a function" });
  }
  return { coverage, trials, seed, shortest: interval === "shortest", adaptive, onProgress: o.onProgress };
}

/**
 * @internal The worst-case bracket of `model` over `inputs`, warm-started from an earlier worst case of the same
 * model over other bounds of the same input names (`_worstCaseFrom`): undefined when the names differ or when the
 * enclosure does not meet the attained values there (the caller then runs `propagate`). For the fixed-point
 * iterations of a self-consistent edge, where one input's bounds move a little from step to step.
 */
export function _worstCaseBracketFrom(
  model: Model,
  inputs: Readonly<Record<string, Distribution>>,
  normalBoundCoverage: number,
  enclosure: _Enclosure,
  earlier: { readonly inputs: Readonly<Record<string, Distribution>>; readonly result: PropagationResult },
): _WorstCaseBracket | undefined {
  const prepared = _prepareInputs(inputs);
  const before = _prepareInputs(earlier.inputs);
  const attained = earlier.result.attained;
  if (attained === undefined || before.names.length !== prepared.names.length || before.names.some((name, i) => name !== prepared.names[i])) return undefined;
  const { lower, upper } = _inputBox(before, normalBoundCoverage);
  const point = (at: Readonly<Record<string, number>>) => Float64Array.from(prepared.names, (name) => at[name] as number);
  const evaluator = new _ModelEvaluator(model, prepared.names);
  return _worstCaseFrom(prepared, evaluator, normalBoundCoverage, enclosure, { lower, upper, high: point(attained.high.at), low: point(attained.low.at) });
}
