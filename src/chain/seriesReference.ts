/**
 * The series voltage reference: initial accuracy, box-method tempco over the ambient range, line
 * regulation over the supply range, load regulation over the load range, long-term drift over the
 * service life (linear or √t scaling) and thermal hysteresis. Every source is a ± fraction of the output.
 * @module
 */
import { _invalidChoice, _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "../errors.js";
import {
  _ambientFromReferenceC,
  _ambientSpanC,
  _optionalLimit,
  _requireFraction,
  _requireNonNegative,
  _requireOrderedPair,
  _source,
  type _SourceContext,
} from "./_common.js";
import type { AmbientRange, ChainErrorSource, DriftScaling, SeriesReference, ShuntReference, TempcoMethod } from "./types.js";

/**
 * Box-method temperature coefficient from the extremes of the output over a temperature range:
 * TC = (V_max − V_min)/(V_nom·(T_max − T_min))·10⁶.
 * @param maxVolts - highest output over the range, V
 * @param minVolts - lowest output over the range, V (≤ maxVolts)
 * @param nominalVolts - nominal output, V (> 0)
 * @param minC - low end of the range, °C
 * @param maxC - high end of the range, °C (> minC)
 * @returns tempco, ppm/°C
 * @throws HotjunctionRangeError for an empty range, V_min > V_max or V_nom ≤ 0
 * @example
 * ```ts
 * import { boxMethodTempcoPpmPerC } from "hotjunction";
 * console.log(boxMethodTempcoPpmPerC(2.501, 2.4995, 2.5, -40, 85).toFixed(1)); // "4.8"
 * ```
 */
export function boxMethodTempcoPpmPerC(
  maxVolts: number,
  minVolts: number,
  nominalVolts: number,
  minC: number,
  maxC: number,
): number {
  const context = "box-method tempco";
  const [lo, hi] = _requireOrderedPair(minVolts, maxVolts, "minVolts", "maxVolts", "V", context);
  const [tLo, tHi] = _requireOrderedPair(minC, maxC, "minC", "maxC", "°C", context);
  const vNom = _requireFinite(nominalVolts, "nominalVolts", "V", context);
  if (!(vNom > 0) || tHi === tLo) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: vNom > 0 ? "temperature span" : "nominalVolts",
      value: vNom > 0 ? tHi - tLo : vNom,
      min: 0,
      context,
      problem: "is not positive",
    });
  }
  return _requireFiniteResult(((hi - lo) / (vNom * (tHi - tLo))) * 1e6, "box-method tempco (maxVolts − minVolts)", hi - lo, "V", context);
}

/**
 * The ± excursion a tempco allows over an ambient range: TC·(maxC − minC) by the box method, or
 * TC·largest |t − 25 °C| from 25 °C.
 * @param tempcoPpmPerC - tempco, ppm/°C (≥ 0)
 * @param ambient - ambient range, °C
 * @param method - `"box"` (default) or `"from-25C"`
 * @returns excursion, ppm
 * @throws HotjunctionRangeError for a negative tempco or a bad range or method
 * @example
 * ```ts
 * import { tempcoExcursionPpm } from "hotjunction";
 * console.log(tempcoExcursionPpm(7, { minC: -40, maxC: 85 })); // 875
 * console.log(tempcoExcursionPpm(100, { minC: -40, maxC: 85 }, "from-25C")); // 6500
 * ```
 */
export function tempcoExcursionPpm(tempcoPpmPerC: number, ambient: AmbientRange, method: TempcoMethod = "box"): number {
  const context = "tempco excursion";
  const tc = _requireNonNegative(tempcoPpmPerC, "tempcoPpmPerC", "ppm/°C", context);
  const [minC, maxC] = _requireOrderedPair(ambient?.minC, ambient?.maxC, "ambient minC", "ambient maxC", "°C", context);
  // a finite tempco times a finite span can still leave float64 (7 ppm/°C over −1e308 … 85 °C)
  const excursion = (ppm: number): number => _requireFiniteResult(ppm, "tempcoPpmPerC", tc, "ppm/°C", context);
  if (method === "box") return excursion(tc * _ambientSpanC({ minC, maxC }));
  if (method === "from-25C") return excursion(tc * _ambientFromReferenceC({ minC, maxC }));
  return _invalidChoice("tempco method", method, ["box", "from-25C"], context);
}

/**
 * Long-term drift accumulated over a service time: rate·(t/1000 h) or, common practice, rate·√(t/1000 h).
 * @param ppmPer1000h - drift rate, ppm per 1000 h (≥ 0)
 * @param serviceHours - service time, h (≥ 0)
 * @param scaling - `"sqrt"` (default) or `"linear"`
 * @returns drift, ppm
 * @throws HotjunctionRangeError for negative values or an unknown scaling
 * @example
 * ```ts
 * import { longTermDriftPpm } from "hotjunction";
 * console.log(longTermDriftPpm(50, 10000).toFixed(2)); // "158.11"
 * console.log(longTermDriftPpm(50, 10000, "linear")); // 500
 * ```
 */
export function longTermDriftPpm(ppmPer1000h: number, serviceHours: number, scaling: DriftScaling = "sqrt"): number {
  const context = "long-term drift";
  const rate = _requireNonNegative(ppmPer1000h, "longTermDriftPpmPer1000h", "ppm/1000 h", context);
  const hours = _requireNonNegative(serviceHours, "serviceHours", "h", context);
  const drift = (ppm: number): number => _requireFiniteResult(ppm, "longTermDriftPpmPer1000h", rate, "ppm/1000 h", context);
  if (scaling === "sqrt") return drift(rate * Math.sqrt(hours / 1000));
  if (scaling === "linear") return drift((rate * hours) / 1000);
  return _invalidChoice("drift scaling", scaling, ["sqrt", "linear"], context);
}

/**
 * The ± change a regulation spec allows over an operating range: spec·largest distance from the rated
 * point, or spec·span when no rated point is known.
 * @internal
 */
export function _regulationExcursion(
  spec: number,
  min: number,
  max: number,
  rated: number | undefined,
): number {
  if (rated === undefined) return spec * (max - min);
  return spec * Math.max(Math.abs(max - rated), Math.abs(min - rated));
}

/** @internal Adds a reference source `reference.<name>` (± fraction of the output) when its limit is > 0. */
export type _AddReferenceSource = (name: string, description: string, limit: number) => void;

/**
 * @internal The sources every reference variant with a data sheet has (series and shunt): initial accuracy
 * and tempco over the ambient range. Returns the list and its adder for the variant's own sources.
 */
export function _accuracyAndTempcoSources(
  element: SeriesReference | ShuntReference,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): { out: ChainErrorSource[]; add: _AddReferenceSource } {
  const out: ChainErrorSource[] = [];
  const add: _AddReferenceSource = (name, description, limit) => {
    if (limit > 0) out.push(_source(ctx, `reference.${name}`, "reference", description, "fraction", limit));
  };
  add("initialAccuracy", "initial accuracy at 25 °C", _requireFraction(element.initialAccuracyFraction, "initialAccuracyFraction", context));
  const tc = _optionalLimit(element.tempcoPpmPerC, "tempcoPpmPerC", "ppm/°C", context);
  add("tempco", "tempco over the ambient range", tempcoExcursionPpm(tc, ambient, element.tempcoMethod ?? "box") / 1e6);
  return { out, add };
}

/** @internal Sources of a series reference (± fractions of the output). */
export function _seriesReferenceSources(
  element: SeriesReference,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): ChainErrorSource[] {
  const { out, add } = _accuracyAndTempcoSources(element, ambient, ctx, context);
  const line = _optionalLimit(element.lineRegulationPpmPerVolt, "lineRegulationPpmPerVolt", "ppm/V", context);
  if (line > 0) {
    const [lo, hi] = _requireOrderedPair(element.supplyMinVolts, element.supplyMaxVolts, "supplyMinVolts", "supplyMaxVolts", "V", context);
    const rated = element.ratedSupplyVolts === undefined ? undefined : _requireFinite(element.ratedSupplyVolts, "ratedSupplyVolts", "V", context);
    add("lineRegulation", "line regulation over the supply range", _regulationExcursion(line, lo, hi, rated) / 1e6);
  }
  const load = _optionalLimit(element.loadRegulationPpmPerMilliamp, "loadRegulationPpmPerMilliamp", "ppm/mA", context);
  if (load > 0) {
    const [lo, hi] = _requireOrderedPair(element.loadMinMilliamps, element.loadMaxMilliamps, "loadMinMilliamps", "loadMaxMilliamps", "mA", context);
    const rated = element.ratedLoadMilliamps === undefined ? undefined : _requireFinite(element.ratedLoadMilliamps, "ratedLoadMilliamps", "mA", context);
    add("loadRegulation", "load regulation over the load range", _regulationExcursion(load, lo, hi, rated) / 1e6);
  }
  const drift = _optionalLimit(element.longTermDriftPpmPer1000h, "longTermDriftPpmPer1000h", "ppm/1000 h", context);
  add("longTermDrift", "long-term drift over the service time", longTermDriftPpm(drift, element.serviceHours ?? 1000, element.driftScaling ?? "sqrt") / 1e6);
  add("thermalHysteresis", "thermal hysteresis", _optionalLimit(element.thermalHysteresisPpm, "thermalHysteresisPpm", "ppm", context) / 1e6);
  return out;
}
