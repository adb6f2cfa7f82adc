/**
 * Worker-side model factory of {@link evaluateChainParallel}: a worker thread imports this file by URL and calls
 * `chainReadingMonteCarloModel({ chain, hotJunctionC })` for the reading model at that temperature, rebuilt from
 * the chain description as `evaluateChain` builds it (a function cannot cross threads; the chain can). Its own
 * build entry (`dist/chainModel.js`, and `dist/cli/chainModel.js` for the CLI).
 * @module
 * @internal
 */
import { _requireFinite, _requireObject } from "../errors.js";
import type { Model } from "../uncertainty/types.js";
import { _compileChain } from "./_compileChain.js";
import { _readingModel } from "./readingFromChain.js";
import type { MeasurementChain } from "./types.js";

/**
 * @internal The reading model of `chain` at `hotJunctionC` (°C).
 * @throws HotjunctionTypeError / HotjunctionRangeError for an argument that is not such an object, and the
 *   chain's own errors
 */
export function chainReadingMonteCarloModel(argument: unknown): Model {
  const context = "chainReadingMonteCarloModel";
  const a = _requireObject(argument, "argument", context);
  const t = _requireFinite(a["hotJunctionC"], "hot-junction temperature", "°C", context);
  return _readingModel(_compileChain(a["chain"] as MeasurementChain), t).model as Model;
}
