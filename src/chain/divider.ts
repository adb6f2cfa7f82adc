/**
 * The resistor-divider element: two or more resistors from the reference to ground, each with tolerance
 * and tempco, or one matched network (ratio tolerance, tracking tempco). Tap i (0-based) is the node below
 * the (i+1)-th resistor; its ratio is the resistance below it over the total.
 * @module
 */
import { _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "../errors.js";
import type { Distribution, Model } from "../uncertainty/types.js";
import { _ambientFromReferenceC, _checkAmbient, _optionalLimit, _requireFraction, _requireObject, _requirePositive, _source, type _SourceContext } from "./_common.js";
import type { AmbientRange, ChainErrorSource, DividerElement, SourceDistributionOverride } from "./types.js";

function checkResistors(value: unknown, context: string): readonly number[] {
  if (!Array.isArray(value) || value.length < 2) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "resistorsOhms",
      value,
      context,
      problem: "is not an array of at least two resistances",
    });
  }
  // Array.from, not map: a hole ([1, , 3]) is checked as undefined, not kept as a hole that sums to NaN
  return Array.from(value, (r: unknown, i) => _requirePositive(r, `resistorsOhms[${i}]`, "Ω", context));
}

function checkTap(tapIndex: unknown, count: number, context: string): number {
  const tap = _requireFinite(tapIndex, "tap index", undefined, context);
  if (!Number.isInteger(tap) || tap < 0 || tap > count - 2) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "tap index",
      value: tap,
      min: 0,
      max: count - 2,
      context,
      problem: "is not the index of a tap (integer, 0 for the node below the first resistor)",
    });
  }
  return tap;
}

/**
 * The nominal ratio of a divider tap: (R_{i+1} + … + R_{n−1}) / (R_0 + … + R_{n−1}).
 * @param divider - divider element (or any object with `resistorsOhms`)
 * @param tapIndex - tap, 0 … n − 2 (0 = node below the first, top resistor)
 * @returns ratio, V/V
 * @throws HotjunctionRangeError for fewer than two resistors, a non-positive resistance or a bad tap
 * @example
 * ```ts
 * import { dividerTapRatio } from "hotjunction";
 * console.log(dividerTapRatio({ resistorsOhms: [100000, 10000] }, 0).toFixed(7)); // "0.0909091"
 * ```
 */
export function dividerTapRatio(divider: Pick<DividerElement, "resistorsOhms">, tapIndex: number): number {
  const context = "divider";
  const r = checkResistors(_requireObject(divider, "divider", context)["resistorsOhms"], context);
  const tap = checkTap(tapIndex, r.length, context);
  let total = 0;
  let below = 0;
  for (let i = 0; i < r.length; i++) {
    total += r[i] as number;
    if (i > tap) below += r[i] as number;
  }
  return below / _requireFiniteResult(total, "resistorsOhms (sum)", total, "Ω", context);
}

/** @internal The divider stage of a compiled chain. */
export interface _DividerStage {
  readonly sources: readonly ChainErrorSource[];
  readonly resistorCount: number;
  /** Nominal ratio of a tap. */
  nominalRatio(tap: number): number;
  /** Actual ratio of a tap for the source values (allocation-free). */
  ratio(x: Readonly<Record<string, number>>, tap: number): number;
  /** Checks a tap index. */
  checkTap(tap: unknown): number;
}

/** @internal Builds the stage. Names: `divider.resistor<k>.<tolerance|tempco|ratio|tracking>`, k from 1. */
export function _dividerStage(
  element: DividerElement,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): _DividerStage {
  const o = _requireObject(element, "divider", context);
  const r = checkResistors(o["resistorsOhms"], context);
  const n = r.length;
  const fromRefC = _ambientFromReferenceC(ambient);
  let firstName: string;
  let secondName: string;
  let firstLimit: number;
  let secondLimit: number;
  let firstWhat: string;
  let secondWhat: string;
  if (o["matched"] !== undefined) {
    const m = _requireObject(o["matched"], "matched", context);
    // Each resistor within ±r/2 of the common value keeps every pairwise ratio within ±r.
    firstLimit = _requireFraction(m["ratioToleranceFraction"], "ratioToleranceFraction", context) / 2;
    secondLimit = (_optionalLimit(m["trackingPpmPerC"], "trackingPpmPerC", "ppm/°C", context) * fromRefC) / 1e6 / 2;
    firstName = "ratio";
    secondName = "tracking";
    firstWhat = "share of the network's ratio tolerance";
    secondWhat = "share of the network's tracking tempco over the ambient range";
  } else {
    firstLimit = _requireFraction(o["toleranceFraction"], "toleranceFraction", context);
    secondLimit = (_optionalLimit(o["tempcoPpmPerC"], "tempcoPpmPerC", "ppm/°C", context) * fromRefC) / 1e6;
    firstName = "tolerance";
    secondName = "tempco";
    firstWhat = "tolerance";
    secondWhat = "tempco over the ambient range";
  }
  const sources: ChainErrorSource[] = [];
  const names1: string[] = [];
  const names2: string[] = [];
  for (let i = 0; i < n; i++) {
    const a = `divider.resistor${i + 1}.${firstName}`;
    const b = `divider.resistor${i + 1}.${secondName}`;
    if (firstLimit > 0) {
      sources.push(_source(ctx, a, "divider", `resistor ${i + 1} (${r[i]} Ω) ${firstWhat}`, "fraction", firstLimit));
      names1.push(a);
    }
    if (secondLimit > 0) {
      sources.push(_source(ctx, b, "divider", `resistor ${i + 1} (${r[i]} Ω) ${secondWhat}`, "fraction", secondLimit));
      names2.push(b);
    }
  }
  const has1 = firstLimit > 0;
  const has2 = secondLimit > 0;
  const resistorValue = (x: Readonly<Record<string, number>>, i: number): number =>
    (r[i] as number) * (1 + (has1 ? (x[names1[i] as string] as number) : 0) + (has2 ? (x[names2[i] as string] as number) : 0));
  return {
    sources,
    resistorCount: n,
    nominalRatio: (tap) => dividerTapRatio({ resistorsOhms: r }, tap),
    ratio: (x, tap) => {
      let total = 0;
      let below = 0;
      for (let i = 0; i < n; i++) {
        const v = resistorValue(x, i);
        total += v;
        if (i > tap) below += v;
      }
      return below / total;
    },
    checkTap: (tap) => checkTap(tap, n, context),
  };
}

/** Options of {@link dividerRatioModel}. */
export interface DividerRatioModelOptions {
  /** Ambient range for the tempco terms, °C. Default 25 … 25 (no tempco term). */
  readonly ambient?: AmbientRange;
  /** Per-source distribution overrides, by source name. */
  readonly sourceDistributions?: Readonly<Record<string, SourceDistributionOverride>>;
}

/** Result of {@link dividerRatioModel}: a model of a tap ratio (V/V) in the source values. */
export interface DividerRatioModel {
  readonly model: Model;
  readonly inputs: Readonly<Record<string, Distribution>>;
  readonly sources: readonly ChainErrorSource[];
  /** Nominal ratio, V/V. */
  readonly nominalRatio: number;
}

/**
 * The ratio of one divider tap as a model of its resistors' error sources (tolerance and tempco, or ratio
 * tolerance and tracking for a matched network), ready for `propagate(model, inputs, options)`.
 * @param divider - divider element
 * @param tapIndex - tap, 0 … n − 2
 * @param options - ambient range (tempco terms), distribution overrides
 * @returns model (ratio, V/V), inputs, sources, nominalRatio
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad divider, tap or range
 * @example
 * ```ts
 * import { dividerRatioModel, propagate } from "hotjunction";
 * const m = dividerRatioModel({ kind: "divider", resistorsOhms: [100000, 10000], toleranceFraction: 0.01 }, 0);
 * const w = propagate(m.model, m.inputs, { method: "worst-case" });
 * console.log(w.interval.map((k) => k.toFixed(7))); // [ '0.0892696', '0.0925756' ]
 * ```
 */
export function dividerRatioModel(
  divider: DividerElement,
  tapIndex: number,
  options?: DividerRatioModelOptions,
): DividerRatioModel {
  const context = "divider";
  const o = options === undefined ? {} : _requireObject(options, "options", context);
  const ambient = o["ambient"] === undefined ? { minC: 25, maxC: 25 } : _checkAmbient(o["ambient"], context);
  const stage = _dividerStage(divider, ambient, { overrides: options?.sourceDistributions }, context);
  const tap = stage.checkTap(tapIndex);
  const inputs: Record<string, Distribution> = {};
  for (const s of stage.sources) inputs[s.name] = s.distribution;
  return {
    model: (x) => stage.ratio(x, tap),
    inputs,
    sources: stage.sources,
    nominalRatio: stage.nominalRatio(tap),
  };
}
