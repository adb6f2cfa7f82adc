/**
 * {@link evaluateChain} with its Monte Carlo on every core.
 * @module
 */
import { _requireFinite, _requireOptionsObject } from "../errors.js";
import { _parallelSettings, _workerModuleLocation, createMonteCarloPool, propagateParallel, type MonteCarloPool } from "../uncertainty/propagateParallel.js";
import { _checkBoundsOptions } from "./_chainBounds.js";
import { _compileChain } from "./_compileChain.js";
import { _chainEvaluationAt, evaluateChain, type EvaluateChainOptions } from "./evaluateChain.js";
import { _readingModel } from "./readingFromChain.js";
import type { ChainEvaluation, MeasurementChain } from "./types.js";

/** Options of {@link evaluateChainParallel}: those of {@link evaluateChain} plus where the Monte Carlo runs. */
export interface EvaluateChainParallelOptions extends EvaluateChainOptions {
  /** Worker threads, an integer 1–64; default the cores available (at most 8). 1 runs in the calling thread. */
  readonly workers?: number;
  /** A pool from `createMonteCarloPool` to reuse; the caller closes it. */
  readonly pool?: MonteCarloPool;
  /** Fewest Monte Carlo trials for which workers are used; default 262,144 (below, `evaluateChain` in this thread). */
  readonly parallelThreshold?: number;
}

/**
 * The same result as {@link evaluateChain} at one hot-junction temperature, every number to the last bit, with
 * its Monte Carlo run on worker threads when it has at least `parallelThreshold` trials (worst case and RSS stay in
 * this thread). Each worker rebuilds the reading model from the chain description (a function cannot cross
 * threads) and draws the blocks it is given from their own streams, as `propagateParallel` does; only the Monte
 * Carlo bound's `note` says how many workers ran. Where workers cannot start (the CommonJS build, no worker
 * support), or for one worker, it is `evaluateChain` itself.
 * @param chain - the chain description (plain data: it is sent to the workers)
 * @param hotJunctionC - true hot-junction temperature, °C
 * @param options - {@link EvaluateChainParallelOptions}
 * @returns a promise of the {@link ChainEvaluation}
 * @throws (rejects with) the errors of `evaluateChain`; HotjunctionRangeError for `workers` or `parallelThreshold`
 *   out of range
 * @example
 * ```ts no-run
 * import { evaluateChainParallel } from "hotjunction";
 * const e = await evaluateChainParallel(chain, 90, { methods: ["worst-case", "monte-carlo"], monteCarloTrials: 1_000_000 });
 * ```
 */
export async function evaluateChainParallel(
  chain: MeasurementChain,
  hotJunctionC: number,
  options: EvaluateChainParallelOptions = {},
): Promise<ChainEvaluation> {
  const context = "evaluateChainParallel";
  _requireOptionsObject(options, context, true);
  const { workers: _w, pool, parallelThreshold: _t, ...rest } = options;
  const { threshold, workers: count } = _parallelSettings(options, context);
  // The chain's and the options' checks, in evaluateChain's order, before a worker starts.
  const cc = _compileChain(chain);
  const opts = _checkBoundsOptions(rest, "evaluateChain");
  const module = _workerModuleLocation("../chain/_chainModelFactory.ts", "chainModel.js")?.url.href;
  if (module === undefined || count === 1 || !opts.methods.includes("monte-carlo") || opts.trials < threshold) return evaluateChain(chain, hotJunctionC, rest);
  const t = _requireFinite(hotJunctionC, "hot-junction temperature", "°C", cc.context);
  const cm = _readingModel(cc, t);
  if (Object.keys(cm.inputs).length === 0) return evaluateChain(chain, hotJunctionC, rest);
  const usePool = pool ?? (await createMonteCarloPool(count === undefined ? {} : { workers: count }));
  if (usePool === undefined) return evaluateChain(chain, hotJunctionC, rest);
  try {
    const result = await propagateParallel(
      { module, exportName: "chainReadingMonteCarloModel", argument: { chain, hotJunctionC: t } },
      cm.inputs,
      { method: "monte-carlo", coverage: opts.coverage, trials: opts.trials, seed: opts.seed, pool: usePool, parallelThreshold: 1 },
    );
    return _chainEvaluationAt(cc, t, opts, { run: () => result });
  } finally {
    if (pool === undefined) await usePool.close();
  }
}

