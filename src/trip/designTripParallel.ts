/**
 * {@link designTrip} with each setpoint's Monte Carlo on every core.
 * @module
 */
import { _requireOptionsObject } from "../errors.js";
import { _parallelSettings, _workerModuleLocation, createMonteCarloPool, propagateParallel, type MonteCarloPool } from "../uncertainty/propagateParallel.js";
import type { PropagationResult } from "../uncertainty/types.js";
import { _checkTripArguments, _designTripWith, _setpointMonteCarloModels, designTrip, type DesignTripOptions } from "./designTrip.js";
import type { TripDesign, TripDesignResult } from "./types.js";

/** Options of {@link designTripParallel}: those of {@link designTrip} plus where the Monte Carlo runs. */
export interface DesignTripParallelOptions extends DesignTripOptions {
  /** Worker threads, an integer 1–64; default the cores available (at most 8). 1 runs in the calling thread. */
  readonly workers?: number;
  /** A pool from `createMonteCarloPool` to reuse; the caller closes it. */
  readonly pool?: MonteCarloPool;
  /** Fewest Monte Carlo trials for which workers are used; default 262,144 (below, `designTrip` in this thread). */
  readonly parallelThreshold?: number;
}


/**
 * The same result as {@link designTrip}, to the last bit of every number, with each setpoint's Monte Carlo run
 * on worker threads when the run has at least `parallelThreshold` trials (the worst case, RSS and the rest stay
 * in this thread). Each worker rebuilds the setpoint's model from the design (a function cannot cross threads)
 * and draws the blocks it is given from their own streams, as `propagateParallel` does; only the Monte Carlo
 * note says how many workers ran. Where workers cannot start (the CommonJS build, no worker support), or for
 * one worker, it is `designTrip` itself.
 * @param design - the trip design (plain data: it is sent to the workers)
 * @param options - {@link DesignTripParallelOptions}
 * @returns a promise of the {@link TripDesignResult}
 * @throws (rejects with) the errors of `designTrip`; HotjunctionRangeError for `workers` or `parallelThreshold`
 *   out of range
 * @example
 * ```ts no-run
 * import { designTripParallel } from "hotjunction";
 * const result = await designTripParallel(design, { monteCarloTrials: 1_000_000, seed: 7 });
 * ```
 */
export async function designTripParallel(design: TripDesign, options: DesignTripParallelOptions = {}): Promise<TripDesignResult> {
  const context = "designTripParallel";
  _requireOptionsObject(options, context, true);
  const { workers: _w, pool, parallelThreshold: _t, ...tripOptions } = options;
  const { threshold, workers: count } = _parallelSettings(options, context);
  const trials = tripOptions.monteCarloTrials ?? 100_000;
  const module = _workerModuleLocation("../trip/_tripModelFactory.ts", "tripModel.js")?.url.href;
  if (module === undefined || count === 1 || typeof trials !== "number" || trials < threshold) return designTrip(design, tripOptions);
  // designTrip's checks (its arguments, then the design while planning the networks) run before a worker starts.
  _checkTripArguments(design, tripOptions);
  const models = _setpointMonteCarloModels(design, tripOptions.networks);
  if (models.length === 0) return designTrip(design, tripOptions);
  const usePool = pool ?? (await createMonteCarloPool(count === undefined ? {} : { workers: count }));
  if (usePool === undefined) return designTrip(design, tripOptions);
  try {
    const results: (PropagationResult | undefined)[] = [];
    for (const [setpoint, m] of models.entries()) {
      if (Object.keys(m.inputs).length === 0) {
        results.push(undefined);
        continue;
      }
      results.push(
        await propagateParallel(
          { module, exportName: "tripMonteCarloModel", argument: { design, setpoint, networks: tripOptions.networks } },
          m.inputs,
          { method: "monte-carlo", coverage: tripOptions.coverage ?? 0.95, trials, seed: tripOptions.seed ?? 1, pool: usePool, parallelThreshold: 1 },
        ),
      );
      tripOptions.onProgress?.((setpoint + 1) / models.length);
    }
    return _designTripWith(design, tripOptions, results);
  } finally {
    if (pool === undefined) await usePool.close();
  }
}
