/**
 * Monte Carlo propagation of distributions (JCGM 101:2008) (internal part of `propagate`).
 *
 * A run is written once, as a generator that asks for the next model outputs and reduces them; drivers answer
 * it from an in-process {@link _TrialStream} (`propagate`) or from worker threads (`propagateParallel`). Both
 * hand out the same fixed sequence of outputs (one jump-ahead stream per block of trials) and the reduction
 * runs in one place in a fixed order, so every driver and every worker count gives the same bits.
 * @module
 * @internal
 */
import { _coverageIntervalSorted, _symmetricIntervalIndices } from "./_coverageIntervalSorted.js";
import { _selectFloat64, _sortFloat64 } from "./_sortFloat64.js";
import { _studentTQuantile } from "./studentTQuantile.js";
import { _firstBlockState, _Sampler, _TrialStream } from "./_monteCarloStream.js";
import type { _ModelEvaluator, _PreparedInputs } from "./_prepare.js";
import { _linearContributions, _linearise } from "./_propagateRss.js";
import type { PropagationResult } from "./types.js";

/**
 * @internal Outputs kept at once. Up to this many trials every output is kept and the interval comes from all of
 * them (JCGM 101 7.7); above it the run is cut into segments of at most this many trials (32 MiB each, plus
 * as much again for sorting), and the interval is the average of the segments' intervals.
 */
export const _segmentLimit = 4_194_304;
/** @internal Trials per request of a fixed-size run (progress is reported this often). */
export const _requestSize = 131_072;
/** @internal Upper limit of total work: trials × models evaluated by one call. */
export const _maxModelEvaluations = 1e9;

/** @internal Options of the Monte Carlo method after checking. */
export interface _MonteCarloSettings {
  readonly coverage: number;
  readonly trials: number;
  readonly seed: number;
  readonly shortest: boolean;
  readonly adaptive: { readonly significantDigits: number; readonly maxTrials: number } | undefined;
  readonly onProgress: ((fractionDone: number) => void) | undefined;
}

/** @internal Mean and standard deviation (two passes). */
export function _meanAndStandardDeviation(values: ArrayLike<number>, from: number, to: number): [number, number] {
  let sum = 0;
  for (let i = from; i < to; i++) sum += values[i] as number;
  const mean = sum / (to - from);
  let squares = 0;
  for (let i = from; i < to; i++) squares += ((values[i] as number) - mean) ** 2;
  return [mean, to - from > 1 ? Math.sqrt(squares / (to - from - 1)) : 0];
}

interface Segment {
  readonly count: number;
  readonly mean: number;
  /** Sum of squared deviations from the segment mean. */
  readonly squares: number;
  readonly low: number;
  readonly high: number;
}

/** @internal Reduced outputs of a run. */
export interface _Summary {
  readonly trials: number;
  readonly estimate: number;
  readonly standardUncertainty: number;
  readonly low: number;
  readonly high: number;
  /** Segments the interval was averaged over (1: the interval is from all outputs). */
  readonly segments: number;
  /** Standard error of the averaged endpoints, from the spread between segments (segments ≥ 2). */
  readonly intervalStandardError: readonly [number, number] | undefined;
}

/**
 * @internal Takes outputs in order and reduces them with bounded memory: segments of at most `_segmentLimit`
 * outputs; each segment's mean, sum of squares and interval; segments combined in order (Chan et al. 1979
 * pairwise update for the variance). One segment gives exactly the two-pass mean, standard deviation and the
 * JCGM 101 7.7 interval of all outputs.
 */
export class _OutputSummary {
  private buffer: Float64Array;
  private filled = 0;
  private readonly segments: Segment[] = [];
  private readonly segmentSize: number;

  /** @param expected - total outputs when known (segments are then of equal size), else `undefined` */
  constructor(
    expected: number | undefined,
    private readonly coverage: number,
    private readonly shortest: boolean,
  ) {
    if (expected === undefined) {
      this.segmentSize = _segmentLimit;
      this.buffer = new Float64Array(Math.min(_segmentLimit, 65_536));
    } else {
      const count = Math.ceil(expected / _segmentLimit);
      this.segmentSize = Math.ceil(expected / count);
      this.buffer = new Float64Array(this.segmentSize);
    }
  }

  push(values: Float64Array): void {
    let from = 0;
    while (from < values.length) {
      if (this.filled === this.buffer.length && this.buffer.length < this.segmentSize) {
        const grown = new Float64Array(Math.min(this.segmentSize, this.buffer.length * 2));
        grown.set(this.buffer);
        this.buffer = grown;
      }
      const room = this.buffer.length - this.filled;
      const take = Math.min(room, values.length - from);
      this.buffer.set(values.subarray(from, from + take), this.filled);
      this.filled += take;
      from += take;
      if (this.filled === this.segmentSize) this.flush();
    }
  }

  /** Outputs taken so far. */
  get count(): number {
    let n = this.filled;
    for (const s of this.segments) n += s.count;
    return n;
  }

  private flush(): void {
    const n = this.filled;
    if (n === 0) return;
    const values = this.buffer.subarray(0, n);
    const [mean, sd] = _meanAndStandardDeviation(values, 0, n);
    let low: number;
    let high: number;
    if (this.shortest) {
      _sortFloat64(values);
      [low, high] = _coverageIntervalSorted(values, this.coverage, true);
    } else {
      // the two order statistics by selection: the sort's values, without the sort
      const [lowIndex, highIndex] = _symmetricIntervalIndices(n, this.coverage);
      [low, high] = _selectFloat64(values, lowIndex, highIndex);
    }
    this.segments.push({ count: n, mean, squares: sd * sd * (n - 1), low, high });
    this.filled = 0;
  }

  finish(): _Summary {
    this.flush();
    this.buffer = new Float64Array(0);
    const segments = this.segments;
    const first = segments[0] as Segment;
    if (segments.length === 1) {
      return {
        trials: first.count,
        estimate: first.mean,
        standardUncertainty: first.count > 1 ? Math.sqrt(first.squares / (first.count - 1)) : 0,
        low: first.low,
        high: first.high,
        segments: 1,
        intervalStandardError: undefined,
      };
    }
    let count = 0;
    let mean = 0;
    let squares = 0;
    let low = 0;
    let high = 0;
    for (const s of segments) {
      const total = count + s.count;
      const delta = s.mean - mean;
      mean += (delta * s.count) / total;
      squares += s.squares + (delta * delta * count * s.count) / total;
      count = total;
      low += s.low * s.count;
      high += s.high * s.count;
    }
    const h = segments.length;
    const spread = (pick: (s: Segment) => number): number =>
      _meanAndStandardDeviation(segments.map(pick), 0, h)[1] / Math.sqrt(h);
    return {
      trials: count,
      estimate: mean,
      standardUncertainty: Math.sqrt(squares / (count - 1)),
      low: low / count,
      high: high / count,
      segments: h,
      intervalStandardError: [spread((s) => s.low), spread((s) => s.high)],
    };
  }
}

/** @internal What a run reduces to, before the result object is made. */
export interface _RunOutcome {
  readonly summary: _Summary;
  readonly converged: boolean | undefined;
  readonly batch: number | undefined;
}

/** @internal JCGM 101 7.9.4 batch size M = max(J, 10⁴), J = ⌈100/(1 − p)⌉. */
export function _adaptiveBatch(coverage: number): number {
  return Math.max(Math.ceil(100 / (1 - coverage) - 1e-9), 10_000);
}

/**
 * @internal One run as a generator: it yields how many next outputs it needs and is resumed with exactly that
 * many (a view it may not keep). Fixed runs ask in requests of `_requestSize`; adaptive runs ask batch by batch.
 */
export function* _monteCarloRun(settings: _MonteCarloSettings): Generator<number, _RunOutcome, Float64Array> {
  const { coverage, shortest, onProgress } = settings;
  if (settings.adaptive === undefined) {
    const trials = settings.trials;
    const summary = new _OutputSummary(trials, coverage, shortest);
    let done = 0;
    while (done < trials) {
      const count = Math.min(_requestSize, trials - done);
      summary.push(yield count);
      done += count;
      if (onProgress !== undefined) onProgress(done / trials);
    }
    return { summary: summary.finish(), converged: undefined, batch: undefined };
  }
  const { significantDigits, maxTrials } = settings.adaptive;
  const batch = _adaptiveBatch(coverage);
  const summary = new _OutputSummary(undefined, coverage, shortest);
  const scratch = new Float64Array(batch);
  const series: number[][] = [[], [], [], []]; // y, u(y), y_low, y_high per batch
  // Running mean and sum of squares of all outputs (pairwise update, in batch order).
  let count = 0;
  let mean = 0;
  let squares = 0;
  let converged = false;
  while (count + batch <= maxTrials) {
    const values = yield batch;
    summary.push(values);
    scratch.set(values);
    const [m, s] = _meanAndStandardDeviation(scratch, 0, batch);
    _sortFloat64(scratch);
    const [lowH, highH] = _coverageIntervalSorted(scratch, coverage, shortest);
    series[0]?.push(m);
    series[1]?.push(s);
    series[2]?.push(lowH);
    series[3]?.push(highH);
    const total = count + batch;
    const delta = m - mean;
    mean += (delta * batch) / total;
    squares += s * s * (batch - 1) + (delta * delta * count * batch) / total;
    count = total;
    if (onProgress !== undefined) onProgress(Math.min(count / maxTrials, 1));
    const h = count / batch;
    if (h < 2) continue;
    const u = Math.sqrt(squares / (count - 1));
    // δ = ½·10^l with u(y) = c·10^l, c an n_dig-digit integer (JCGM 101 7.8.2)
    const l = u > 0 ? Math.floor(Math.log10(u)) - significantDigits + 1 : 0;
    const tolerance = u > 0 ? 0.5 * 10 ** l : 0;
    // JCGM 101 7.9.4 asks 2·s/√h ≤ δ for each result, s the standard deviation of its h batch values: the
    // average of h batch values then lies within δ of its expectation with about 95 % probability, for large h.
    // Two corrections make the rule hold when it stops early and for the shortest interval:
    // - the factor 2 is the large-sample one; s from h values has h − 1 degrees of freedom, so the 95 % factor
    //   is Student's t(0.975, h − 1) (12.7 at h = 2, 2.09 at h = 20), which stops a run that looks stable only
    //   because two or three batches happen to agree;
    // - the mean, u(y) and the quantiles of the symmetric interval converge as 1/√n, so the value from all h·M
    //   outputs scatters as s/√h. The endpoints of the shortest interval converge only as n^(−1/3) (its location
    //   is a cube-root estimator: Kim & Pollard 1990, Ann. Statist. 18, 191–219, the shorth), so for them the
    //   scatter of the all-outputs value is s/h^(1/3), and the rule uses that.
    const factor = _studentTQuantile(0.975, h - 1);
    const ok = series.every((values, k) => {
      const sd = _meanAndStandardDeviation(values, 0, values.length)[1];
      const shrink = shortest && k >= 2 ? Math.cbrt(h) : Math.sqrt(h);
      return factor * (sd / shrink) <= tolerance;
    });
    if (ok) {
      converged = true;
      break;
    }
  }
  return { summary: summary.finish(), converged, batch };
}

/** @internal Answers a run from an in-process stream. */
export function _driveInProcess(run: Generator<number, _RunOutcome, Float64Array>, stream: _TrialStream): _RunOutcome {
  let buffer = new Float64Array(0);
  let step = run.next(buffer);
  while (!step.done) {
    const count = step.value;
    if (buffer.length < count) buffer = new Float64Array(count);
    const view = buffer.subarray(0, count);
    stream.take(count, [view], 0);
    step = run.next(view);
  }
  return step.value;
}

/** @internal Monte Carlo fields of the result from a run's outcome. */
export function _monteCarloResult(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  correlation: Float64Array | undefined,
  copula: boolean,
  settings: _MonteCarloSettings,
  outcome: _RunOutcome,
  workers: number,
): PropagationResult {
  const lin = _linearise(prepared, evaluator, correlation);
  const { coverage, shortest } = settings;
  const { summary, converged, batch } = outcome;
  const { trials, estimate, standardUncertainty, low, high } = summary;
  const adaptive = settings.adaptive;
  const adaptiveNote =
    adaptive === undefined
      ? ""
      : converged === true
        ? `; adaptive (JCGM 101 7.9${shortest ? ", endpoint scatter taken as s/h^(1/3) for the shortest interval" : ""}) with ${adaptive.significantDigits} significant digit(s): stopped after ${trials / (batch as number)} batches of ${batch as number}`
        : `; adaptive (JCGM 101 7.9) with ${adaptive.significantDigits} significant digit(s) did NOT reach its tolerance within maxTrials = ${adaptive.maxTrials}`;
  const dof = prepared.distributions.some((d) => Number.isFinite(d.degreesOfFreedom));
  const result: { -readonly [K in keyof PropagationResult]: PropagationResult[K] } = {
    method: "monte-carlo",
    estimate,
    standardUncertainty,
    interval: [low, high],
    coverage,
    contributions: _linearContributions(prepared, lin),
    trials,
    seed: settings.seed,
    note:
      `Monte Carlo (JCGM 101) with ${trials} trials, xoroshiro128+ seeded with ${settings.seed}, one jump-ahead stream per block of 8192 trials` +
      (workers > 1 ? ` (run on ${workers} worker threads; same bits as in one thread)` : "") +
      `; ${shortest ? "shortest" : "probabilistically symmetric"} ${(coverage * 100).toPrecision(4)} % interval ` +
      (summary.segments === 1
        ? "from the sorted outputs (JCGM 101 7.7)"
        : `averaged over ${summary.segments} segments of about ${Math.round(trials / summary.segments)} sorted outputs each (bounded memory; standard error of the endpoints ${(summary.intervalStandardError as readonly [number, number]).map((v) => v.toPrecision(2)).join(" / ")} from the spread between segments)`) +
      (correlation !== undefined
        ? copula
          ? "; correlated inputs drawn through a Gaussian copula (r applies to the normal scores; for bounded inputs the resulting correlation differs slightly from r except at r = 0 and ±1)"
          : "; correlated normal inputs drawn through the Cholesky factor of the correlation matrix"
        : "") +
      adaptiveNote +
      (dof ? "; input degrees of freedom are not used by Monte Carlo" : "") +
      "; contributions are first-order (GUM) sensitivities at the estimates.",
  };
  if (!shortest && standardUncertainty > 0) result.coverageFactor = (high - low) / (2 * standardUncertainty);
  if (converged !== undefined) result.converged = converged;
  if (summary.intervalStandardError !== undefined) {
    result.intervalSegments = summary.segments;
    result.intervalStandardError = summary.intervalStandardError;
  }
  return result;
}

/** @internal Whether any bounded input is drawn through the Gaussian copula. */
export function _usesCopula(prepared: _PreparedInputs, sampler: _Sampler, correlation: Float64Array | undefined): boolean {
  return correlation !== undefined && prepared.distributions.some((d, i) => d.kindCode !== 0 && sampler.isCorrelated(i));
}

/** @internal In-process Monte Carlo (the default path of `propagate`). */
export function _propagateMonteCarlo(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  correlation: Float64Array | undefined,
  settings: _MonteCarloSettings,
): PropagationResult {
  const sampler = new _Sampler(prepared.distributions, correlation, prepared.names, undefined);
  const stream = new _TrialStream(sampler, [evaluator], _firstBlockState(settings.seed));
  const outcome = _driveInProcess(_monteCarloRun(settings), stream);
  return _monteCarloResult(prepared, evaluator, correlation, _usesCopula(prepared, sampler, correlation), settings, outcome, 1);
}
