/**
 * Common random numbers: several models evaluated on the same Monte Carlo draws.
 * @module
 */
import { HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _requireOptionsObject, _requireProbability } from "./_checks.js";
import { _firstBlockState, _Sampler, _TrialStream } from "./_monteCarloStream.js";
import { _monteCarloResult, _OutputSummary, _requestSize, _segmentLimit, _usesCopula } from "./_propagateMonteCarlo.js";
import { _choleskyFactor, _correlationMatrix, _meansOf, _ModelEvaluator, _prepareInputs } from "./_prepare.js";
import { _monteCarloSettings, _requireFiniteResult } from "./propagate.js";
import type { Distribution, Model, PropagateOptions, PropagationResult } from "./types.js";

/** Options of {@link propagateCommonDraws}: the Monte Carlo options of `propagate` (no adaptive stopping). */
export type PropagateCommonDrawsOptions<Name extends string = string> = Omit<
  PropagateOptions<Name>,
  "method" | "adaptive" | "normalBoundCoverage"
>;

/** Outputs kept at once over all models of a group (64 MiB). */
const groupValues = 8_388_608;

/**
 * Monte Carlo (JCGM 101) of several models on the same random draws (common random numbers): every model
 * sees the same input values in trial t. Result k is identical, bit for bit, to
 * `propagate(models[k], inputs, { ...options, method: "monte-carlo" })`, so a sweep's or a comparison's curves
 * differ only by the models, not by sampling noise, and the inputs are drawn once per group of models
 * instead of once per model.
 *
 * Work: the inputs of each block of 8192 trials are drawn once and every model of a group evaluated on them; a
 * group holds as many models as fit 8,388,608 kept outputs (e.g. 419 models at 20,000 trials); groups redraw
 * the same blocks. Total work trials × models is capped at 10⁹ model evaluations. Memory is bounded as in
 * `propagate`.
 * @param models - at least one {@link Model}, all reading the same input names
 * @param inputs - record of named {@link Distribution}s
 * @param options - `coverage`, `correlations`, `trials`, `seed`, `interval`, `onProgress` as for `propagate`
 * @returns one {@link PropagationResult} per model, in the order of `models`
 * @throws HotjunctionTypeError for a model that is not a function or an empty list; HotjunctionRangeError
 *   `OUT_OF_RANGE` naming "models × trials" and the limit 10⁹ when the work is too large; the errors of
 *   `propagate` otherwise
 * @example
 * ```ts
 * import { propagate, propagateCommonDraws, rectangular } from "hotjunction";
 * const inputs = { gain: rectangular({ center: 1, halfWidth: 0.002 }), offset: rectangular({ center: 0, halfWidth: 0.3 }) };
 * const atSetpoint = (t: number) => (x: { gain: number; offset: number }) => x.gain * t + x.offset;
 * const results = propagateCommonDraws([200, 400, 600].map(atSetpoint), inputs, { trials: 20000, seed: 3 });
 * const alone = propagate(atSetpoint(400), inputs, { method: "monte-carlo", trials: 20000, seed: 3 });
 * console.log(results.length, results[1]?.interval[1] === alone.interval[1]); // 3 true
 * ```
 */
export function propagateCommonDraws<Name extends string>(
  models: readonly Model<Name>[],
  inputs: Readonly<Record<Name, Distribution>>,
  options?: PropagateCommonDrawsOptions<Name>,
): PropagationResult<Name>[] {
  const context = "propagateCommonDraws";
  if (!Array.isArray(models) || models.length === 0) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "models",
      value: models,
      context,
      problem: "is not a non-empty list of model functions",
    });
  }
  models.forEach((model, k) => {
    if (typeof model !== "function") {
      throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: `models[${k}]`, value: model, context, problem: "is not a function" });
    }
  });
  _requireOptionsObject(options, context, true);
  const o = (options ?? {}) as PropagateOptions<Name>;
  for (const key of ["method", "adaptive", "normalBoundCoverage"] as const) {
    if (o[key] !== undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: key,
        value: o[key],
        context,
        problem: "is not an option of propagateCommonDraws (always Monte Carlo with a fixed number of trials)",
      });
    }
  }
  const coverage = o.coverage === undefined ? 0.95 : _requireProbability(o.coverage, "coverage", context);
  const prepared = _prepareInputs(inputs);
  const correlation = _correlationMatrix(o.correlations, prepared.names);
  if (correlation !== undefined) _choleskyFactor(correlation, prepared.names);
  const evaluators = models.map((model) => new _ModelEvaluator(model as Model, prepared.names));
  const means = _meansOf(prepared.distributions);
  for (const evaluator of evaluators) evaluator.probeNames(means);
  const settings = _monteCarloSettings(o, coverage, models.length, context);
  const { trials, onProgress } = settings;
  const sampler = new _Sampler(prepared.distributions, correlation, prepared.names, undefined);
  const copula = _usesCopula(prepared, sampler, correlation);
  const perModel = Math.min(trials, _segmentLimit);
  const groupSize = Math.max(1, Math.floor(groupValues / perModel));
  const chunk = Math.min(_requestSize, trials);
  const buffers = Array.from({ length: Math.min(groupSize, models.length) }, () => new Float64Array(chunk));
  const results: PropagationResult<Name>[] = [];
  const inner = { ...settings, onProgress: undefined };
  for (let first = 0; first < models.length; first += groupSize) {
    const group = evaluators.slice(first, first + groupSize);
    const summaries = group.map(() => new _OutputSummary(trials, coverage, settings.shortest));
    const stream = new _TrialStream(sampler, group, _firstBlockState(settings.seed));
    let done = 0;
    while (done < trials) {
      const count = Math.min(chunk, trials - done);
      const views = buffers.slice(0, group.length).map((b) => b.subarray(0, count));
      stream.take(count, views, 0);
      summaries.forEach((summary, k) => summary.push(views[k] as Float64Array));
      done += count;
      if (onProgress !== undefined) onProgress((first * trials + group.length * done) / (models.length * trials));
    }
    summaries.forEach((summary, k) => {
      const outcome = { summary: summary.finish(), converged: undefined, batch: undefined };
      results.push(_requireFiniteResult(_monteCarloResult(prepared, group[k] as _ModelEvaluator, correlation, copula, inner, outcome, 1), `${context} models[${first + k}]`) as PropagationResult<Name>);
    });
  }
  return results;
}
