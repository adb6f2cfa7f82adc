/**
 * Evaluates a chain at one or many hot-junction temperatures: nominal reading, bounds by each method and
 * the per-source contribution table in °C.
 * @module
 */
import { _requireFinite, _requireWorkWithin, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _maxModelEvaluations } from "../uncertainty/_propagateMonteCarlo.js";
import { _CommonDrawsFamily, type _SplitModel } from "../uncertainty/_commonDrawsFamily.js";
import { _chainBounds, _checkBoundsOptions, type _CheckedBoundsOptions, type _MonteCarloSource, type ChainBoundsOptions } from "./_chainBounds.js";
import {
  _codeForVolts,
  _compileChain,
  _indicatedCFromParts,
  _indicatedParts,
  _meansRecord,
  _signalVolts,
  _sourcesAt,
  type _CompiledChain,
} from "./_compileChain.js";
import { _readingModel } from "./readingFromChain.js";
import type { ChainEvaluation, MeasurementChain } from "./types.js";

/** Most temperatures one {@link evaluateChain} call evaluates (an array longer than this is refused). @internal */
export const _maxChainTemperatures = 10_000;

/**
 * @internal The common draws of a chain evaluated at many temperatures with these options (`undefined` without
 * Monte Carlo): every point's Monte Carlo band is then the one `propagate` gives at that point, with the draws
 * made once.
 */
export function _chainDraws(opts: _CheckedBoundsOptions): _CommonDrawsFamily | undefined {
  return opts.methods.includes("monte-carlo")
    ? new _CommonDrawsFamily({ method: "monte-carlo", coverage: opts.coverage, trials: opts.trials, seed: opts.seed })
    : undefined;
}

/**
 * The reading model at `t` split for common draws (chains without a wire): what does not depend on the temperature
 * (the cold junction's and the sensor's EMF, gain, offset, ADC full scale) once per trial for every point.
 */
function _readingSplit(cc: _CompiledChain, t: number): _SplitModel | undefined {
  if (cc.wire !== undefined) return undefined;
  return {
    key: cc,
    count: 7,
    pointInputs: ["thermocouple.tolerance"], // the only input the parts do not read (it moves the hot junction)
    parts: (x, out, at) => _indicatedParts(cc, x, out, at),
    value: (x, parts, at) => _indicatedCFromParts(cc, t, x, parts, at),
  };
}

/** @internal {@link evaluateChain} at one temperature of a compiled chain (checked options, optional common draws). */
export function _chainEvaluationAt(cc: _CompiledChain, t: number, opts: _CheckedBoundsOptions, draws?: _MonteCarloSource): ChainEvaluation {
  const sources = _sourcesAt(cc, t);
  const x = _meansRecord(sources);
  const volts = _signalVolts(cc, t, x);
  const reading = cc.adc !== undefined ? { volts, code: _codeForVolts(cc, volts, x) } : { volts };
  const cm = _readingModel(cc, t);
  const { bounds, contributions } = _chainBounds(cm, t, opts, draws, draws !== undefined ? _readingSplit(cc, t) : undefined);
  return { hotJunctionC: t, reading, indicatedC: cm.nominalC, bounds, contributions };
}

/** Options of {@link evaluateChain}. */
export type EvaluateChainOptions = ChainBoundsOptions;

/**
 * Evaluates a chain at a hot-junction temperature (or at each of several): the nominal reading (every
 * source at its mean, the ambient mid-range), the temperature it indicates, the interval of the indicated
 * temperature by each method (worst case: true extremes over the source bounds; rss: JCGM 100 with the
 * chosen coverage; monte-carlo: JCGM 101, seeded) with the errors against the true temperature, and the
 * per-source table (sensitivity, swing alone, |c|·u, share of variance).
 * @param chain - the chain description
 * @param hotJunctionC - true hot-junction temperature(s), °C
 * @param options - methods (default worst-case and rss), coverage (0.95), Monte Carlo trials (1e5) and
 *   seed (1), normalBoundCoverage (0.9973)
 * @returns one {@link ChainEvaluation}, or one per temperature for an array
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad chain, a temperature outside the
 *   thermocouple tolerance's range, or bad options; `OUT_OF_RANGE` for an array of more than
 *   10,000 temperatures, or temperatures × Monte Carlo trials above 10⁹ model
 *   evaluations
 * @example
 * ```ts
 * import { evaluateChain } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, trimmedMicrovoltsPerC: 40.96 },
 *   reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
 *   detector: { kind: "comparator" },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * const e = evaluateChain(chain, 100);
 * console.log(e.bounds[0]?.method, e.bounds[0]?.errorLowC.toFixed(2), e.bounds[0]?.errorHighC.toFixed(2)); // "worst-case" "-1.94" "3.11"
 * ```
 */
export function evaluateChain(chain: MeasurementChain, hotJunctionC: number, options?: EvaluateChainOptions): ChainEvaluation;
export function evaluateChain(
  chain: MeasurementChain,
  hotJunctionC: readonly number[],
  options?: EvaluateChainOptions,
): ChainEvaluation[];
export function evaluateChain(
  chain: MeasurementChain,
  hotJunctionC: number | readonly number[],
  options?: EvaluateChainOptions,
): ChainEvaluation | ChainEvaluation[] {
  const cc = _compileChain(chain);
  const opts = _checkBoundsOptions(options, "evaluateChain");
  if (typeof hotJunctionC === "number") return _chainEvaluationAt(cc, _requireFinite(hotJunctionC, "hot-junction temperature", "°C", cc.context), opts);
  if (!Array.isArray(hotJunctionC)) {
    throw new HotjunctionTypeError({
      code: "NOT_A_FINITE_NUMBER",
      quantity: "hot-junction temperature",
      value: hotJunctionC,
      context: cc.context,
      problem: "is neither a number nor an array of numbers",
    });
  }
  if (hotJunctionC.length > _maxChainTemperatures) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "number of hot-junction temperatures", value: hotJunctionC.length, min: 0, max: _maxChainTemperatures, context: cc.context, problem: "is more than one call evaluates" });
  }
  if (opts.methods.includes("monte-carlo")) _requireWorkWithin({ temperatures: hotJunctionC.length, trials: opts.trials }, _maxModelEvaluations, cc.context);
  const draws = _chainDraws(opts);
  return hotJunctionC.map((t, i) => _chainEvaluationAt(cc, _requireFinite(t, `hot-junction temperature [${i}]`, "°C", cc.context), opts, draws));
}
