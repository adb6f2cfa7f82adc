/**
 * Runs the propagation methods over a chain model and shapes the results in °C (internal).
 * @module
 * @internal
 */
import { _invalidChoice, _requireFinite } from "../errors.js";
import { normalQuantile } from "../uncertainty/normalQuantile.js";
import type { _SplitModel } from "../uncertainty/_commonDrawsFamily.js";
import type { Distribution, Model, PropagationResult } from "../uncertainty/types.js";
import { propagate } from "../uncertainty/propagate.js";
import { _propagationMethods, type PropagationMethod } from "../uncertainty/types.js";
import { _requireObject } from "./_common.js";
import type { ChainBound, ChainContribution, ChainModel } from "./types.js";

/** Options shared by the chain functions that return bounds. */
export interface ChainBoundsOptions {
  /** Methods to run, in this order. Default `["worst-case", "rss"]`. */
  readonly methods?: readonly PropagationMethod[];
  /** Coverage probability of the rss and Monte Carlo intervals, in (0, 1). Default 0.95. */
  readonly coverage?: number;
  /** Monte Carlo trials (the design file's and `designTrip`'s name). Default 100 000. */
  readonly monteCarloTrials?: number;
  /** @deprecated use `monteCarloTrials` (kept for one minor version; giving both is an error). */
  readonly trials?: number;
  /** Monte Carlo seed (integer 0 … 2³² − 1). Default 1. */
  readonly seed?: number;
  /** Coverage used to bound normal inputs for the worst case (±k·σ). Default 0.9973 (k = 3). */
  readonly normalBoundCoverage?: number;
}

function checkTrials(o: Record<string, unknown>, context: string): number {
  if (o["monteCarloTrials"] !== undefined && o["trials"] !== undefined) {
    _invalidChoice("options", "monteCarloTrials and trials", ["monteCarloTrials (trials is its deprecated name)"], context);
  }
  const given = o["monteCarloTrials"] ?? o["trials"];
  const key = o["monteCarloTrials"] === undefined ? "trials" : "monteCarloTrials";
  return given === undefined ? 100_000 : _requireFinite(given, key, undefined, context);
}

const allMethods: readonly PropagationMethod[] = _propagationMethods;

/** @internal Checked options with defaults filled in. */
export interface _CheckedBoundsOptions {
  readonly methods: readonly PropagationMethod[];
  readonly coverage: number;
  readonly trials: number;
  readonly seed: number;
  readonly normalBoundCoverage: number;
}

/** @internal Checks the options and fills defaults. */
export function _checkBoundsOptions(options: unknown, context: string): _CheckedBoundsOptions {
  if (options === undefined) {
    return { methods: ["worst-case", "rss"], coverage: 0.95, trials: 100_000, seed: 1, normalBoundCoverage: 0.9973 };
  }
  const o = _requireObject(options, "options", context);
  const methods = (o["methods"] ?? ["worst-case", "rss"]) as readonly PropagationMethod[];
  if (!Array.isArray(methods) || methods.length === 0) _invalidChoice("methods", methods, allMethods, context);
  for (const m of methods) if (!allMethods.includes(m)) _invalidChoice("method", m, allMethods, context);
  return {
    methods,
    coverage: o["coverage"] === undefined ? 0.95 : _requireFinite(o["coverage"], "coverage", undefined, context),
    trials: checkTrials(o, context),
    seed: o["seed"] === undefined ? 1 : _requireFinite(o["seed"], "seed", undefined, context),
    normalBoundCoverage:
      o["normalBoundCoverage"] === undefined ? 0.9973 : _requireFinite(o["normalBoundCoverage"], "normalBoundCoverage", undefined, context),
  };
}

/**
 * @internal Where a chain evaluation's Monte Carlo band can come from instead of `propagate`: a sweep's common
 * draws (`_CommonDrawsFamily`) or a run made elsewhere with the same options (on worker threads); undefined
 * when it declines.
 */
export interface _MonteCarloSource {
  run(model: Model, inputs: Readonly<Record<string, Distribution>>, split?: _SplitModel): PropagationResult | undefined;
}

/**
 * @internal Bounds per method and the contribution table of a chain model; `trueC` is the value errors are
 * taken against (the true hot-junction temperature, or the nominal result). With `family` (a sweep's common
 * draws, made with this call's Monte Carlo options; `split`: the model split for it) the Monte Carlo band
 * comes from it: the same bits as `propagate`, which runs when the family declines.
 */
export function _chainBounds(
  cm: ChainModel,
  trueC: number,
  options: _CheckedBoundsOptions,
  family?: _MonteCarloSource,
  split?: _SplitModel,
): { bounds: ChainBound[]; contributions: ChainContribution[] } {
  const names = Object.keys(cm.inputs);
  if (names.length === 0) {
    const point = cm.nominalC;
    const bounds = options.methods.map(
      (method): ChainBound => ({
        method,
        estimateC: point,
        lowC: point,
        highC: point,
        errorLowC: point - trueC,
        errorHighC: point - trueC,
        standardUncertaintyC: 0,
        coverage: method === "worst-case" ? 1 : options.coverage,
        note: "no error source: the chain is exact",
      }),
    );
    return { bounds, contributions: [] };
  }
  const bounds: ChainBound[] = [];
  let rssResult: ReturnType<typeof propagate> | undefined;
  for (const method of options.methods) {
    const r =
      (method === "monte-carlo" ? family?.run(cm.model, cm.inputs, split) : undefined) ??
      propagate(cm.model, cm.inputs, {
        method,
        coverage: options.coverage,
        ...(method === "monte-carlo" ? { trials: options.trials, seed: options.seed } : {}),
        ...(method === "worst-case" ? { normalBoundCoverage: options.normalBoundCoverage, modelEnclosure: cm.enclosure } : {}),
      });
    if (method === "rss") rssResult = r;
    bounds.push({
      method,
      estimateC: r.estimate,
      lowC: r.interval[0],
      highC: r.interval[1],
      errorLowC: r.interval[0] - trueC,
      errorHighC: r.interval[1] - trueC,
      standardUncertaintyC: r.standardUncertainty,
      coverage: r.coverage,
      note: r.note,
      ...(r.enclosure !== undefined && r.enclosureGap !== undefined
        ? { enclosureLowC: r.enclosure[0], enclosureHighC: r.enclosure[1], enclosureGapLowC: r.enclosureGap[0], enclosureGapHighC: r.enclosureGap[1] }
        : {}),
    });
  }
  // the same call as the rss band's (deterministic): run once
  const rss = rssResult ?? propagate(cm.model, cm.inputs, { method: "rss", coverage: options.coverage });
  const k = normalQuantile(0.5 + options.normalBoundCoverage / 2);
  const x: Record<string, number> = {};
  for (const s of cm.sources) x[s.name] = s.distribution.mean;
  const contributions = cm.sources.map((s): ChainContribution => {
    const d = s.distribution;
    const half = d.halfWidth ?? k * d.standardUncertainty;
    const mean = d.mean;
    x[s.name] = mean - half;
    const lo = cm.model(x);
    x[s.name] = mean + half;
    const hi = cm.model(x);
    x[s.name] = mean;
    const mid = cm.model(x);
    const c = rss.contributions[s.name];
    return {
      source: s.name,
      element: s.element,
      description: s.description,
      unit: s.unit,
      limit: s.limit,
      sensitivityCPerUnit: c?.sensitivity ?? 0,
      worstCaseSwingC: Math.max(lo, hi, mid) - Math.min(lo, hi, mid),
      standardUncertaintyC: c?.contribution ?? 0,
      varianceShare: c?.varianceShare ?? 0,
    };
  });
  return { bounds, contributions };
}
