/**
 * Monte Carlo sampling in blocks with one jump-ahead stream per block (internal): the part of a run that a
 * worker thread repeats bit for bit.
 * @module
 * @internal
 */
import { _Xoroshiro128Plus } from "./_xoroshiro128plus.js";
import { _standardBoundedQuantile, type _CheckedDistribution } from "./_distribution.js";
import { _erfc } from "./normalCdf.js";
import { _choleskyFactor, _recordFill, type _ModelEvaluator, type _RecordFill } from "./_prepare.js";

const twoPi = 6.283185307179586; // 2π as a literal: no global read at module level (tree-shaking)

type Generator = _Xoroshiro128Plus;

/** @internal State of block 0's stream for a seed (xoroshiro128+ seeded as pure-rand seeds it). */
export function _firstBlockState(seed: number): number[] {
  return new _Xoroshiro128Plus().seed(seed | 0).getState();
}

/** @internal State of the next block's stream: this block's start state advanced by one jump (2⁶⁴ draws). */
export function _nextBlockState(state: readonly number[]): number[] {
  return new _Xoroshiro128Plus().setState(state).jump().getState();
}

/** @internal State of block `block`'s stream (block jumps from block 0). */
export function _blockState(seed: number, block: number): number[] {
  let state = _firstBlockState(seed);
  for (let b = 0; b < block; b++) state = _nextBlockState(state);
  return state;
}

/**
 * @internal Trials per block. Block b of a run draws from its own stream: the generator seeded with the run's
 * seed, advanced by b jumps of 2⁶⁴ steps (xoroshiro128+ jump polynomial), so the streams of blocks never
 * overlap for fewer than 2⁶⁴ draws per block and any block can be drawn without drawing the ones before it.
 * Every block is sampled whole (column by column), so trial t's inputs do not depend on how many trials are run
 * or on who runs the block: a run of N trials is the first N of one fixed sequence.
 */
export const _blockSize = 8192;
const batchSize = _blockSize;

/**
 * @internal Draws input samples batch by batch into preallocated columns (input i at offset i·batchSize).
 * Independent inputs follow JCGM 101:2008 6.4; correlated inputs share a Gaussian copula: correlated standard
 * normals z = L·ε (L the Cholesky factor of the correlation matrix, JCGM 101 6.4.8), then each input is
 * mean + u·z (normal) or its inverse distribution function at Φ(z) (bounded shapes).
 */
export class _Sampler {
  readonly columns: Float64Array;
  private rng: Generator;
  private readonly correlated: number[];
  private readonly lower: Float64Array | undefined;

  constructor(
    private readonly distributions: readonly _CheckedDistribution[],
    correlation: Float64Array | undefined,
    names: readonly string[],
    rng: Generator | undefined,
  ) {
    this.rng = rng ?? new _Xoroshiro128Plus().seed(0);
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

  /** Draws the next fills from the stream with this state (see {@link _blockState}). */
  useStream(state: readonly number[]): void {
    // One generator per sampler, reset for each block (no new object per block).
    this.rng.setState(state);
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
      const radius = Math.sqrt(-2 * Math.log(1 - rng.uniform()));
      const angle = twoPi * rng.uniform();
      col[offset + t] = radius * Math.cos(angle);
      if (t + 1 < count) col[offset + t + 1] = radius * Math.sin(angle);
    }
  }

  /**
   * Fills the first `count` entries of every column with the unit draws that {@link _Sampler.fill} makes from the
   * same generator calls, before the input's location and scale: normal z, rectangular 2r − 1, arcsine sin(2πr),
   * trapezoidal (1 + β)r₁ + (1 − β)r₂. {@link _scaleUnitDraws} of them gives `fill`'s bits. Not for correlated inputs.
   */
  fillUnits(count: number): void {
    for (let i = 0; i < this.distributions.length; i++) this.fillUnitColumn(i, count);
  }

  /** Unit draws of input `i` into its column (JCGM 101 6.4.2–6.4.7). */
  private fillUnitColumn(i: number, count: number): void {
    const col = this.columns;
    const rng = this.rng;
    const d = this.distributions[i] as _CheckedDistribution;
    const offset = i * batchSize;
    switch (d.kindCode) {
      case 0: // normal, 6.4.7
        this.fillStandardNormal(offset, count);
        break;
      case 1: // rectangular, 6.4.2
        for (let t = 0; t < count; t++) col[offset + t] = 2 * rng.uniform() - 1;
        break;
      case 4: // arcsine, 6.4.6
        for (let t = 0; t < count; t++) col[offset + t] = Math.sin(twoPi * rng.uniform());
        break;
      default: {
        // trapezoidal 6.4.3 (triangular 6.4.4 is β = 0): a' + (b' − a')[(1+β)r₁ + (1−β)r₂]/2
        const beta = d.kindCode === 2 ? 0 : d.beta;
        for (let t = 0; t < count; t++) {
          const r1 = rng.uniform();
          const r2 = rng.uniform();
          col[offset + t] = (1 + beta) * r1 + (1 - beta) * r2;
        }
      }
    }
  }

  /** Fills the first `count` entries of every column: unit draws, then each input's location and scale in place. */
  fill(count: number): void {
    const col = this.columns;
    const correlated = this.correlated;
    for (let i = 0; i < this.distributions.length; i++) {
      const offset = i * batchSize;
      if (correlated.includes(i)) {
        this.fillStandardNormal(offset, count);
        continue;
      }
      this.fillUnitColumn(i, count);
      _scaleUnitDraws(this.distributions[i] as _CheckedDistribution, col, offset, col, offset, count);
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


/**
 * @internal Input values from unit draws (see {@link _Sampler.fillUnits}), with the arithmetic of
 * {@link _Sampler.fill}: mean + u·z (normal), mean + a·w (rectangular, arcsine), (mean − a) + a·w (trapezoidal,
 * triangular); `count` values from `units[from…]` to `out[at…]`.
 */
export function _scaleUnitDraws(d: _CheckedDistribution, units: Float64Array, from: number, out: Float64Array, at: number, count: number): void {
  const mean = d.mean;
  if (d.kindCode === 0) {
    const u = d.standardUncertainty;
    for (let t = 0; t < count; t++) out[at + t] = mean + u * (units[from + t] as number);
  } else if (d.kindCode === 1 || d.kindCode === 4) {
    const a = d.halfWidth;
    for (let t = 0; t < count; t++) out[at + t] = mean + a * (units[from + t] as number);
  } else {
    const a = d.halfWidth;
    const low = mean - a;
    for (let t = 0; t < count; t++) out[at + t] = low + a * (units[from + t] as number);
  }
}

/**
 * @internal The fixed sequence of model outputs of a run, handed out in order: blocks are sampled whole when
 * entered; the model is evaluated only for the trials taken. Several evaluators share the same draws (common
 * random numbers): `take` writes evaluator k's outputs to `outs[k]`.
 */
export class _TrialStream {
  private state: number[];
  /** Trials already taken from the current block (= _blockSize before the first block). */
  private position = _blockSize;
  private readonly fill: _RecordFill;

  constructor(
    private readonly sampler: _Sampler,
    private readonly evaluators: readonly _ModelEvaluator[],
    /** Stream state of the first block this stream hands out. */
    firstState: readonly number[],
  ) {
    this.state = [...firstState];
    this.fill = _recordFill((evaluators[0] as _ModelEvaluator).names, _blockSize);
  }

  /** Evaluates the next `count` trials into `outs[k]` from `offset` on. */
  take(count: number, outs: readonly Float64Array[], offset: number): void {
    const sampler = this.sampler;
    const col = sampler.columns;
    const evaluators = this.evaluators;
    const e0 = evaluators[0] as _ModelEvaluator;
    let done = 0;
    while (done < count) {
      if (this.position === _blockSize) {
        sampler.useStream(this.state);
        sampler.fill(_blockSize);
        this.state = _nextBlockState(this.state);
        this.position = 0;
      }
      const start = this.position;
      const size = Math.min(_blockSize - start, count - done);
      const at = offset + done - start;
      const fill = this.fill;
      if (evaluators.length === 1) {
        const record = e0.record;
        const model = e0.model;
        const out = outs[0] as Float64Array;
        for (let t = start; t < start + size; t++) {
          fill(record, col, t);
          const y = model(record);
          if (typeof y !== "number" || y - y !== 0) e0.fail(y);
          out[at + t] = y;
        }
      } else {
        // Common draws: the record is filled once per trial and every model reads it.
        const record = e0.record;
        const m = evaluators.length;
        for (let t = start; t < start + size; t++) {
          fill(record, col, t);
          for (let k = 0; k < m; k++) {
            const evaluator = evaluators[k] as _ModelEvaluator;
            const y = evaluator.model(record);
            if (typeof y !== "number" || y - y !== 0) {
              Object.assign(evaluator.record, record);
              evaluator.fail(y);
            }
            (outs[k] as Float64Array)[at + t] = y;
          }
        }
      }
      this.position += size;
      done += size;
    }
  }
}
