/**
 * Monte Carlo propagation of distributions (JCGM 101:2008) (internal part of `propagate`).
 * @module
 * @internal
 */
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { _standardBoundedQuantile, type _CheckedDistribution } from "./_distribution.js";
import { _coverageIntervalSorted } from "./_coverageIntervalSorted.js";
import { _erfc } from "./normalCdf.js";
import { _sortFloat64 } from "./_sortFloat64.js";
import { _choleskyFactor, type _ModelEvaluator, type _PreparedInputs } from "./_prepare.js";
import { _linearContributions, _linearise } from "./_propagateRss.js";
import type { PropagationResult } from "./types.js";

/** Trials per sampling batch (column buffers of this length per input). */
const batchSize = 8192;
const twoPi = 6.283185307179586; // 2π as a literal: no global read at module level (tree-shaking)

type Generator = ReturnType<typeof xoroshiro128plus>;

/**
 * @internal Draws input samples batch by batch into preallocated columns (input i at offset i·batchSize).
 * Independent inputs follow JCGM 101:2008 6.4; correlated inputs share a Gaussian copula: correlated standard
 * normals z = L·ε (L the Cholesky factor of the correlation matrix, JCGM 101 6.4.8), then each input is
 * mean + u·z (normal) or its inverse distribution function at Φ(z) (bounded shapes).
 */
export class _Sampler {
  readonly columns: Float64Array;
  private readonly correlated: number[];
  private readonly lower: Float64Array | undefined;

  constructor(
    private readonly distributions: readonly _CheckedDistribution[],
    correlation: Float64Array | undefined,
    names: readonly string[],
    private readonly rng: Generator,
  ) {
    const n = distributions.length;
    this.columns = new Float64Array(n * batchSize);
    this.correlated = [];
    if (correlation !== undefined) {
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          if (i !== j && correlation[i * n + j] !== 0) {
            this.correlated.push(i);
            break;
          }
        }
      }
      const m = this.correlated.length;
      const sub = new Float64Array(m * m);
      for (let a = 0; a < m; a++) {
        for (let b = 0; b < m; b++) {
          sub[a * m + b] = correlation[(this.correlated[a] as number) * n + (this.correlated[b] as number)] as number;
        }
      }
      this.lower = _choleskyFactor(sub, this.correlated.map((i) => names[i] as string));
    } else {
      this.lower = undefined;
    }
  }

  /** Whether input `i` (canonical order) is drawn through the copula. */
  isCorrelated(i: number): boolean {
    return this.correlated.includes(i);
  }

  private fillStandardNormal(offset: number, count: number): void {
    const col = this.columns;
    const rng = this.rng;
    // Box–Muller (JCGM 101:2008 6.4.7.2); 1 − r keeps the logarithm's argument in (0, 1].
    for (let t = 0; t < count; t += 2) {
      const radius = Math.sqrt(-2 * Math.log(1 - uniformFloat64(rng)));
      const angle = twoPi * uniformFloat64(rng);
      col[offset + t] = radius * Math.cos(angle);
      if (t + 1 < count) col[offset + t + 1] = radius * Math.sin(angle);
    }
  }

  /** Fills the first `count` entries of every column. */
  fill(count: number): void {
    const col = this.columns;
    const rng = this.rng;
    const correlated = this.correlated;
    for (let i = 0; i < this.distributions.length; i++) {
      const d = this.distributions[i] as _CheckedDistribution;
      const offset = i * batchSize;
      if (correlated.includes(i)) {
        this.fillStandardNormal(offset, count);
        continue;
      }
      const mean = d.mean;
      const a = d.halfWidth;
      switch (d.kindCode) {
        case 0: {
          this.fillStandardNormal(offset, count);
          const u = d.standardUncertainty;
          for (let t = 0; t < count; t++) col[offset + t] = mean + u * (col[offset + t] as number);
          break;
        }
        case 1: // rectangular, 6.4.2
          for (let t = 0; t < count; t++) col[offset + t] = mean + a * (2 * uniformFloat64(rng) - 1);
          break;
        case 4: // arcsine, 6.4.6
          for (let t = 0; t < count; t++) col[offset + t] = mean + a * Math.sin(twoPi * uniformFloat64(rng));
          break;
        default: {
          // trapezoidal 6.4.3 (triangular 6.4.4 is β = 0): a' + (b' − a')[(1+β)r₁ + (1−β)r₂]/2
          const beta = d.kindCode === 2 ? 0 : d.beta;
          const low = mean - a;
          for (let t = 0; t < count; t++) {
            const r1 = uniformFloat64(rng);
            const r2 = uniformFloat64(rng);
            col[offset + t] = low + a * ((1 + beta) * r1 + (1 - beta) * r2);
          }
        }
      }
    }
    const lower = this.lower;
    if (lower === undefined) return;
    const m = correlated.length;
    for (let t = 0; t < count; t++) {
      // z = L·ε in place, last row first (row a uses ε₀…ε_a, not yet overwritten).
      for (let a = m - 1; a >= 0; a--) {
        let z = 0;
        for (let b = 0; b <= a; b++) z += (lower[a * m + b] as number) * (col[(correlated[b] as number) * batchSize + t] as number);
        col[(correlated[a] as number) * batchSize + t] = z;
      }
    }
    for (const i of correlated) {
      const d = this.distributions[i] as _CheckedDistribution;
      const offset = i * batchSize;
      if (d.kindCode === 0) {
        for (let t = 0; t < count; t++) col[offset + t] = d.mean + d.standardUncertainty * (col[offset + t] as number);
      } else {
        for (let t = 0; t < count; t++) {
          const probability = 0.5 * _erfc(-(col[offset + t] as number) / Math.SQRT2);
          col[offset + t] = d.mean + d.halfWidth * _standardBoundedQuantile(d.kindCode, d.beta, probability);
        }
      }
    }
  }
}

/** @internal Runs `count` trials into `out` starting at `outOffset`. */
function runTrials(
  sampler: _Sampler,
  evaluator: _ModelEvaluator,
  out: Float64Array,
  outOffset: number,
  count: number,
  onBatch?: (done: number) => void,
): void {
  const names = evaluator.names;
  const n = names.length;
  const record = evaluator.record;
  const model = evaluator.model;
  const col = sampler.columns;
  let done = 0;
  while (done < count) {
    const size = Math.min(batchSize, count - done);
    sampler.fill(size);
    for (let t = 0; t < size; t++) {
      for (let i = 0; i < n; i++) record[names[i] as string] = col[i * batchSize + t] as number;
      const y = model(record);
      if (typeof y !== "number" || y - y !== 0) evaluator.fail(y);
      out[outOffset + done + t] = y;
    }
    done += size;
    if (onBatch !== undefined) onBatch(done);
  }
}

function meanAndStandardDeviation(values: Float64Array, from: number, to: number): [number, number] {
  let sum = 0;
  for (let i = from; i < to; i++) sum += values[i] as number;
  const mean = sum / (to - from);
  let squares = 0;
  for (let i = from; i < to; i++) squares += ((values[i] as number) - mean) ** 2;
  return [mean, to - from > 1 ? Math.sqrt(squares / (to - from - 1)) : 0];
}

/** @internal Options of the Monte Carlo method after checking. */
export interface _MonteCarloSettings {
  readonly coverage: number;
  readonly trials: number;
  readonly seed: number;
  readonly shortest: boolean;
  readonly adaptive: { readonly significantDigits: number; readonly maxTrials: number } | undefined;
  readonly onProgress: ((fractionDone: number) => void) | undefined;
}

/** @internal */
export function _propagateMonteCarlo(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  correlation: Float64Array | undefined,
  settings: _MonteCarloSettings,
): PropagationResult {
  const lin = _linearise(prepared, evaluator, correlation);
  const rng = xoroshiro128plus(settings.seed | 0);
  const sampler = new _Sampler(prepared.distributions, correlation, prepared.names, rng);
  const { coverage, shortest, onProgress } = settings;
  let values: Float64Array;
  let trials: number;
  let adaptiveNote = "";
  let converged: boolean | undefined;
  if (settings.adaptive === undefined) {
    trials = settings.trials;
    values = new Float64Array(trials);
    runTrials(sampler, evaluator, values, 0, trials, onProgress && ((done) => onProgress(done / trials)));
  } else {
    // JCGM 101:2008 7.9.4: batches of M = max(J, 10⁴), J = ⌈100/(1 − p)⌉.
    const { significantDigits, maxTrials } = settings.adaptive;
    const batch = Math.max(Math.ceil(100 / (1 - coverage) - 1e-9), 10_000);
    let capacity = Math.min(maxTrials, batch * 16);
    values = new Float64Array(capacity);
    const scratch = new Float64Array(batch);
    const batchStats: number[][] = [[], [], [], []]; // y, u(y), y_low, y_high per batch
    trials = 0;
    converged = false;
    while (trials + batch <= maxTrials) {
      if (trials + batch > capacity) {
        capacity = Math.min(maxTrials, capacity * 2);
        const grown = new Float64Array(capacity);
        grown.set(values.subarray(0, trials));
        values = grown;
      }
      runTrials(sampler, evaluator, values, trials, batch);
      scratch.set(values.subarray(trials, trials + batch));
      trials += batch;
      scratch.sort();
      const [m, s] = meanAndStandardDeviation(scratch, 0, batch);
      const [lowH, highH] = _coverageIntervalSorted(scratch, coverage, shortest);
      batchStats[0]?.push(m);
      batchStats[1]?.push(s);
      batchStats[2]?.push(lowH);
      batchStats[3]?.push(highH);
      if (onProgress !== undefined) onProgress(Math.min(trials / maxTrials, 1));
      const h = trials / batch;
      if (h < 2) continue;
      const u = meanAndStandardDeviation(values, 0, trials)[1];
      // δ = ½·10^l with u(y) = c·10^l, c an n_dig-digit integer (JCGM 101 7.8.2)
      const l = u > 0 ? Math.floor(Math.log10(u)) - significantDigits + 1 : 0;
      const tolerance = u > 0 ? 0.5 * 10 ** l : 0;
      const ok = batchStats.every((series) => {
        const [, sd] = meanAndStandardDeviation(Float64Array.from(series), 0, series.length);
        return 2 * (sd / Math.sqrt(h)) <= tolerance;
      });
      if (ok) {
        converged = true;
        break;
      }
    }
    values = values.subarray(0, trials);
    adaptiveNote = converged
      ? `; adaptive (JCGM 101 7.9) with ${significantDigits} significant digit(s): stopped after ${trials / batch} batches of ${batch}`
      : `; adaptive (JCGM 101 7.9) with ${significantDigits} significant digit(s) did NOT reach its tolerance within maxTrials = ${maxTrials}`;
  }
  const [estimate, standardUncertainty] = meanAndStandardDeviation(values, 0, trials);
  _sortFloat64(values);
  const [low, high] = _coverageIntervalSorted(values, coverage, shortest);
  const copula = correlation !== undefined && prepared.distributions.some((d, i) => d.kindCode !== 0 && sampler.isCorrelated(i));
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
      `Monte Carlo (JCGM 101) with ${trials} trials, xoroshiro128+ generator seeded with ${settings.seed}; ` +
      `${shortest ? "shortest" : "probabilistically symmetric"} ${(coverage * 100).toPrecision(4)} % interval from the sorted outputs (JCGM 101 7.7)` +
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
  return result;
}
