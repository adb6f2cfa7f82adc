/**
 * Monte Carlo of a family of models, each with its own inputs, on draws made once (internal): the engine of a
 * sweep, where the chain at each temperature reads the same sources but some of them (the thermocouple
 * tolerance) widen with the temperature.
 * @module
 * @internal
 */
import { _requireOptionsObject, _requireProbability } from "./_checks.js";
import type { _CheckedDistribution } from "./_distribution.js";
import { _blockSize, _firstBlockState, _nextBlockState, _Sampler, _scaleUnitDraws } from "./_monteCarloStream.js";
import { _monteCarloResult, _OutputSummary } from "./_propagateMonteCarlo.js";
import { _meansOf, _ModelEvaluator, _prepareInputs, _numberRecord, type _PreparedInputs } from "./_prepare.js";
import { _monteCarloSettings, _requireFiniteResult } from "./propagate.js";
import type { Distribution, Model, PropagateOptions, PropagationResult } from "./types.js";

/** Most unit draws (inputs × trials) a family keeps (32 MiB, and as much again in the records). */
const maxDraws = 4_194_304;
/** Most trials a family keeps a record for (one small object each). */
const maxRecords = 524_288;

function sameShape(a: _CheckedDistribution, b: _CheckedDistribution): boolean {
  return a.kindCode === b.kindCode && (a.kindCode !== 3 || a.beta === b.beta);
}

function sameScale(a: _CheckedDistribution, b: _CheckedDistribution): boolean {
  return sameShape(a, b) && a.mean === b.mean && a.halfWidth === b.halfWidth && a.standardUncertainty === b.standardUncertainty;
}

/**
 * @internal A member's model split in two, for a family: `parts(x, out, at)` writes `count` values that depend on
 * the inputs other than `pointInputs` only, the same function for every member with the same `key` (e.g. a chain's
 * cold-junction EMF); `value(x, parts, at)` is then the model's output, bit for bit `model(x)`. The family computes
 * the parts once per trial and recomputes them only when an input outside `pointInputs` changes or the key does.
 */
export interface _SplitModel {
  readonly key: object;
  readonly count: number;
  readonly pointInputs: readonly string[];
  parts(x: Readonly<Record<string, number>>, out: Float64Array, at: number): void;
  value(x: Readonly<Record<string, number>>, parts: Float64Array, at: number): number;
}

/**
 * @internal Monte Carlo of many (model, inputs) pairs that read the same input names with the same shapes (each
 * its own means and widths) on common draws. The unit draws of every trial (the sampler's, before location and
 * scale: {@link _Sampler.fillUnits}) are made once, from the same block streams as `propagate`; each pair scales
 * them by its own distributions with the sampler's arithmetic (an input whose distribution did not change since
 * the last pair is not scaled again) and evaluates its model on them, trial by trial in the same order.
 * `run(model, inputs)` therefore returns, bit for bit, `propagate(model, inputs, { ...options, method:
 * "monte-carlo" })`; it returns `undefined` (the caller runs `propagate`) when the options ask for what the
 * family does not do (correlations, adaptive stopping, progress), when the inputs differ in names or shapes from
 * the first pair's, or when inputs × trials is above 4,194,304 or trials above 524,288. The records are kept
 * from member to member: for models that only read them (the chain models), as `propagate` asks of every model.
 */
export class _CommonDrawsFamily {
  private first: _PreparedInputs | undefined;
  private units: Float64Array | undefined;
  /** One record per trial, kept: an input is stored again only when its distribution changed. */
  private records: Record<string, number>[] = [];
  private column: Float64Array | undefined;
  private scaledBy: (_CheckedDistribution | undefined)[] = [];
  private outputs: Float64Array | undefined;
  /** Parts of a split model per trial, and whose they are (undefined: to be computed). */
  private parts: Float64Array | undefined;
  private partsKey: object | undefined;

  constructor(private readonly options: PropagateOptions) {}

  run(model: Model, inputs: Readonly<Record<string, Distribution>>, split?: _SplitModel): PropagationResult | undefined {
    const context = "propagate";
    const o = this.options;
    if (o.correlations !== undefined || o.adaptive !== undefined || o.onProgress !== undefined || typeof model !== "function") return undefined;
    _requireOptionsObject(o, context, true);
    const coverage = o.coverage === undefined ? 0.95 : _requireProbability(o.coverage, "coverage", context);
    const prepared = _prepareInputs(inputs);
    const evaluator = new _ModelEvaluator(model, prepared.names);
    evaluator.probeNames(_meansOf(prepared.distributions));
    const settings = _monteCarloSettings(o, coverage, 1, context);
    const trials = settings.trials;
    const n = prepared.names.length;
    if (n * trials > maxDraws || trials > maxRecords) return undefined;
    if (this.first === undefined) this.draw(prepared, trials, settings.seed);
    const first = this.first as _PreparedInputs;
    if (first.names.length !== n || first.names.some((name, i) => name !== prepared.names[i] || !sameShape(first.distributions[i] as _CheckedDistribution, prepared.distributions[i] as _CheckedDistribution))) {
      return undefined;
    }
    const units = this.units as Float64Array;
    const column = this.column as Float64Array;
    const records = this.records;
    prepared.distributions.forEach((d, i) => {
      const before = this.scaledBy[i];
      if (before !== undefined && sameScale(before, d)) return;
      _scaleUnitDraws(d, units, i * trials, column, 0, trials);
      const name = prepared.names[i] as string;
      store(records, name, column);
      this.scaledBy[i] = d;
      if (split === undefined || !split.pointInputs.includes(name)) this.partsKey = undefined;
    });
    const out = this.outputs as Float64Array;
    if (split === undefined) evaluate(evaluator, records, out);
    else evaluateSplit(evaluator, split, records, this.partsFor(split), out);
    const summary = new _OutputSummary(trials, coverage, settings.shortest);
    summary.push(out);
    const outcome = { summary: summary.finish(), converged: undefined, batch: undefined };
    return _requireFiniteResult(_monteCarloResult(prepared, evaluator, undefined, false, settings, outcome, 1), context);
  }

  /** The split model's parts at every trial's record, computed again only when they may have changed. */
  private partsFor(split: _SplitModel): Float64Array {
    const records = this.records;
    if (this.parts === undefined || this.parts.length !== records.length * split.count) this.parts = new Float64Array(records.length * split.count);
    if (this.partsKey !== split.key) {
      for (let t = 0; t < records.length; t++) split.parts(records[t] as Record<string, number>, this.parts, t * split.count);
      this.partsKey = split.key;
    }
    return this.parts;
  }

  /** Draws the unit draws of every trial, block by block from the run's block streams. */
  private draw(prepared: _PreparedInputs, trials: number, seed: number): void {
    const n = prepared.names.length;
    const sampler = new _Sampler(prepared.distributions, undefined, prepared.names, undefined);
    const units = new Float64Array(n * trials);
    let state = _firstBlockState(seed);
    for (let start = 0; start < trials; start += _blockSize) {
      sampler.useStream(state);
      sampler.fillUnits(_blockSize); // whole blocks, as the stream samples them
      const size = Math.min(_blockSize, trials - start);
      for (let i = 0; i < n; i++) units.set(sampler.columns.subarray(i * _blockSize, i * _blockSize + size), i * trials + start);
      state = _nextBlockState(state);
    }
    this.first = prepared;
    this.units = units;
    this.column = new Float64Array(trials);
    this.scaledBy = [];
    // every record built the same way (names in canonical order), so all have one shape
    this.records = Array.from({ length: trials }, () => _numberRecord(prepared.names));
    this.outputs = new Float64Array(trials);
  }
}

/** {@link evaluate} through a split model: the same outputs, the parts read from `parts`. */
function evaluateSplit(evaluator: _ModelEvaluator, split: _SplitModel, records: readonly Record<string, number>[], parts: Float64Array, out: Float64Array): void {
  const k = split.count;
  for (let t = 0; t < records.length; t++) {
    const record = records[t] as Record<string, number>;
    const y = split.value(record, parts, t * k);
    if (typeof y !== "number" || y - y !== 0) {
      Object.assign(evaluator.record, record);
      evaluator.fail(y);
    }
    out[t] = y;
  }
}

/** Stores one input's values, trial by trial, into the records. */
function store(records: Record<string, number>[], name: string, values: Float64Array): void {
  for (let t = 0; t < records.length; t++) (records[t] as Record<string, number>)[name] = values[t] as number;
}

/** The model at every trial's record, each output checked as the trial stream checks it. */
function evaluate(evaluator: _ModelEvaluator, records: readonly Record<string, number>[], out: Float64Array): void {
  const model = evaluator.model;
  for (let t = 0; t < records.length; t++) {
    const record = records[t] as Record<string, number>;
    const y = model(record);
    if (typeof y !== "number" || y - y !== 0) {
      Object.assign(evaluator.record, record);
      evaluator.fail(y);
    }
    out[t] = y;
  }
}
