/**
 * The comparator trip model: the hot-junction temperature at which a comparator chain trips (signal
 * rising through threshold + offset + upper hysteresis part) or releases, as a function of the error
 * sources, with the threshold taken from the reference × divider tap.
 * @module
 */
import { _invalidChoice, _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "../errors.js";
import type { Distribution, Model } from "../uncertainty/types.js";
import { _requireObject } from "./_common.js";
import {
  _coldJunctionC,
  _compileChain,
  _hotFromVolts,
  _meansRecord,
  _signalVolts,
  _sourcesAt,
  _switchingVolts,
  _zeroRecord,
  type _CompiledChain,
  type _PrebuiltStages,
} from "./_compileChain.js";
import type { _ComparatorStage } from "./comparator.js";
import { _comparatorTripEnclosure, type _TripEnclosure } from "./_tripEnclosure.js";
import type { _ReferenceStage } from "./reference.js";
import type { ChainErrorSource, ChainModel, ComparatorEdge, MeasurementChain, NominalTrip } from "./types.js";

/** Options of {@link tripTemperatureModel}. */
export interface TripTemperatureModelOptions {
  /** `"trip"` (default, signal rising) or `"release"` (signal falling). */
  readonly edge?: ComparatorEdge;
}

/**
 * @internal Compiles a chain and checks that its detector is a comparator (the chain of every trip model).
 * `_compileChain`'s `prebuilt` stages pass through (a reference realized once, see `trip/realizeReference`).
 */
export function _compileComparatorChain(
  chain: MeasurementChain,
  context: string,
  prebuilt?: _PrebuiltStages,
): _CompiledChain {
  const cc = _compileChain(chain, prebuilt);
  if (cc.comparator === undefined) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "detector kind",
      value: "adc",
      context,
      problem: "is not a comparator; trip temperatures belong to comparator chains",
    });
  }
  return cc;
}

function checkTap(cc: _CompiledChain, tapIndex: unknown, context: string): number {
  if (cc.divider !== undefined) return cc.divider.checkTap(tapIndex);
  const tap = _requireFinite(tapIndex, "tap index", undefined, context);
  if (tap !== 0) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "tap index", value: tap, min: 0, max: 0, context, problem: "is not 0 (without a divider the reference itself is the only threshold)" });
  }
  return 0;
}

function checkEdge(options: unknown, context: string): ComparatorEdge {
  if (options === undefined) return "trip";
  const edge = _requireObject(options, "options", context)["edge"] ?? "trip";
  if (edge !== "trip" && edge !== "release") return _invalidChoice("edge", edge, ["trip", "release"], context);
  return edge;
}

/** @internal Comparator switching point minus threshold for an edge (hysteresis placement, no offset), mV. */
export function _edgeMillivolts(cc: _CompiledChain, edge: ComparatorEdge): number {
  return (cc.comparator as _ComparatorStage).edgeMillivolts(edge);
}

/**
 * @internal Nominal detector-input voltage at a hot-junction temperature (every source at zero deviation,
 * the cold junction at `coldJunctionC`, default mid-ambient), V.
 */
export function _nominalSignalVolts(cc: _CompiledChain, hotJunctionC: number, coldJunctionC?: number): number {
  return _signalVolts(cc, hotJunctionC, _zeroRecord(cc, cc.fixedSources, coldJunctionC));
}

/**
 * @internal Nominal hot-junction temperature at which a checked tap of a comparator chain switches on an
 * edge (every source at zero deviation, the cold junction at `coldJunctionC`, default mid-ambient), °C.
 */
export function _nominalSwitchingC(cc: _CompiledChain, tap: number, edge: ComparatorEdge, coldJunctionC?: number): number {
  const x = _zeroRecord(cc, cc.fixedSources, coldJunctionC);
  return _hotFromVolts(cc, _switchingVolts(cc, x, tap, _edgeMillivolts(cc, edge)), x, _coldJunctionC(cc, x));
}

/** @internal A trip model without its nominal value: see {@link _comparatorTripModel}. */
export interface _TripModel {
  readonly model: Model;
  readonly inputs: Readonly<Record<string, Distribution>>;
  readonly sources: readonly ChainErrorSource[];
  /** The model's interval enclosure over a box of its inputs (`_tripEnclosure.ts`); absent if a source is not accounted for. */
  readonly enclosure?: _TripEnclosure;
}

/**
 * @internal The model of the hot-junction temperature at which a checked tap switches on an edge, with the
 * thermocouple tolerance taken at `toleranceAtC` and the cold junction anywhere in the ambient range.
 * Allocation-free per call; a zero thermocouple tolerance gives no source and the transfer reads it as 0.
 */
export function _comparatorTripModel(cc: _CompiledChain, tap: number, edge: ComparatorEdge, toleranceAtC: number): _TripModel {
  const edgeMv = _edgeMillivolts(cc, edge);
  const sources = _sourcesAt(cc, toleranceAtC);
  const inputs: Record<string, Distribution> = {};
  for (const s of sources) inputs[s.name] = s.distribution;
  const model: Model = (x) => _hotFromVolts(cc, _switchingVolts(cc, x, tap, edgeMv), x, _coldJunctionC(cc, x));
  const { enclosure, accountsFor } = _comparatorTripEnclosure(cc, tap, edgeMv);
  const complete = sources.every((s) => accountsFor.has(s.name));
  return { model, inputs, sources, ...(complete ? { enclosure } : {}) };
}

/**
 * The nominal trip and release temperatures of one comparator threshold (every source at zero deviation,
 * the ambient mid-range).
 * @param chain - a comparator chain (reference, optional divider)
 * @param tapIndex - divider tap, 0 … n − 2 (0 without a divider)
 * @returns threshold (V), tap ratio, tripC and releaseC (°C)
 * @throws HotjunctionRangeError for an ADC chain (`INVALID_DESIGN`), a bad tap, or a threshold outside the
 *   thermocouple's EMF range
 * @example
 * ```ts
 * import { nominalTripTemperature } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
 *   divider: { kind: "divider", resistorsOhms: [95000, 5000], toleranceFraction: 0.01 },
 *   detector: { kind: "comparator", hysteresisMillivolts: 10, hysteresisPlacement: "below" },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * const n = nominalTripTemperature(chain, 0);
 * console.log(n.thresholdVolts, n.tripC.toFixed(2), n.releaseC.toFixed(2)); // 0.25 "49.45" "47.51"
 * ```
 */
export function nominalTripTemperature(chain: MeasurementChain, tapIndex: number): NominalTrip {
  const context = "nominalTripTemperature";
  const cc = _compileComparatorChain(chain, context);
  const tap = checkTap(cc, tapIndex, context);
  const ref = (cc.reference as _ReferenceStage).nominalVolts;
  const tapRatio = cc.divider === undefined ? 1 : cc.divider.nominalRatio(tap);
  return {
    thresholdVolts: ref * tapRatio,
    tapRatio,
    tripC: _nominalSwitchingC(cc, tap, "trip"),
    releaseC: _nominalSwitchingC(cc, tap, "release"),
  };
}

/**
 * The trip model of a comparator chain: a function of the named source values returning the hot-junction
 * temperature (°C) at which the comparator trips (or releases), with the sources' distributions, ready for
 * `propagate(model, inputs, options)`. The thermocouple tolerance is taken at the nominal trip temperature.
 * Allocation-free per call. `enclosure` is the model's interval enclosure over a box of its inputs: give it to
 * worst case as `modelEnclosure` and the bracket's enclosure meets the attained extremes (gap of a few
 * 1e-12 °C; how it is built and what it rests on: DEVELOPERS.md, "Worst case of the chain models").
 * @param chain - a comparator chain
 * @param tapIndex - divider tap, 0 … n − 2 (0 without a divider)
 * @param options - `edge`: `"trip"` (default) or `"release"`
 * @returns {@link ChainModel}: model, inputs, sources, nominalC (°C)
 * @throws as {@link nominalTripTemperature}
 * @example
 * ```ts
 * import { tripTemperatureModel, propagate } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
 *   divider: { kind: "divider", resistorsOhms: [95000, 5000], toleranceFraction: 0 },
 *   detector: { kind: "comparator" },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * const m = tripTemperatureModel(chain, 0);
 * const w = propagate(m.model, m.inputs, { method: "worst-case" });
 * console.log(w.interval.map((t) => t.toFixed(1))); // [ '47.5', '51.4' ]
 * ```
 */
// Same deliberate prologue as requiredThresholdVolts below (see the note there).
export function tripTemperatureModel(
  chain: MeasurementChain,
  tapIndex: number,
  options?: TripTemperatureModelOptions,
): ChainModel {
  const context = "tripTemperatureModel";
  const cc = _compileComparatorChain(chain, context);
  const tap = checkTap(cc, tapIndex, context);
  const edge = checkEdge(options, context);
  const { model, inputs, sources, enclosure } = _comparatorTripModel(cc, tap, edge, _nominalSwitchingC(cc, tap, edge));
  return { model, inputs, sources, nominalC: model(_meansRecord(sources)), ...(enclosure !== undefined ? { enclosure } : {}) };
}

/**
 * The threshold voltage a comparator chain needs so that it trips (or releases) at a hot-junction
 * temperature, nominally: the signal at that temperature minus the hysteresis part of the edge.
 * @param chain - a comparator chain
 * @param hotJunctionC - wanted trip (or release) temperature, °C
 * @param options - `edge`: `"trip"` (default) or `"release"`
 * @returns threshold voltage at the comparator's reference input, V
 * @throws HotjunctionRangeError for an ADC chain or a temperature outside the type's range
 * @example
 * ```ts
 * import { requiredThresholdVolts } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
 *   detector: { kind: "comparator" },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * console.log(requiredThresholdVolts(chain, 50).toFixed(4)); // "0.2528"
 * ```
 */
// The public entry points share a deliberate prologue (compile as a comparator chain, check tap and edge):
// each validates its own arguments with its own context before reaching the internal API above.
export function requiredThresholdVolts(
  chain: MeasurementChain,
  hotJunctionC: number,
  options?: TripTemperatureModelOptions,
): number {
  const context = "requiredThresholdVolts";
  const cc = _compileComparatorChain(chain, context);
  const t = _requireFinite(hotJunctionC, "hot-junction temperature", "°C", context);
  const edge = checkEdge(options, context);
  return _requireFiniteResult(_nominalSignalVolts(cc, t) - _edgeMillivolts(cc, edge) / 1000, "hot-junction temperature", t, "°C", context);
}
