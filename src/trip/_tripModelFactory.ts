/**
 * Worker-side model factory of {@link designTripParallel}: a worker thread imports this file by URL and calls
 * `tripMonteCarloModel({ design, setpoint, networks })` for the Monte Carlo model of one setpoint, rebuilt from
 * the design as `designTrip` builds it (a function cannot cross threads; the design can). Its own build entry
 * (`dist/tripModel.js`, and `dist/cli/tripModel.js` for the CLI), so a worker loads only this and the trip code.
 * @module
 * @internal
 */
import { _requireInteger, _requireObject } from "../errors.js";
import type { Model } from "../uncertainty/types.js";
import { _setpointMonteCarloModel } from "./designTrip.js";
import type { ThresholdNetwork, TripDesign } from "./types.js";

/**
 * @internal The Monte Carlo model of setpoint `setpoint` of `design` (with `networks` when designTrip was given them).
 * @throws HotjunctionTypeError / HotjunctionRangeError for an argument that is not such an object, and the
 *   design's own errors
 */
export function tripMonteCarloModel(argument: unknown): Model {
  const context = "tripMonteCarloModel";
  const a = _requireObject(argument, "argument", context);
  const setpoint = _requireInteger(a["setpoint"], "setpoint", 0, 10_000, context);
  const networks = a["networks"] as readonly ThresholdNetwork[] | undefined;
  return _setpointMonteCarloModel(a["design"] as TripDesign, setpoint, networks).model as Model;
}
