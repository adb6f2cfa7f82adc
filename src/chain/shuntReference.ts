/**
 * The shunt voltage reference: initial accuracy, tempco, long-term drift, and the output change through its
 * dynamic impedance as the cathode current swings with supply and load; plus the sizing of its series
 * resistor with the power check.
 * @module
 */
import { _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "../errors.js";
import {
  _optionalLimit,
  _requireFraction,
  _requireObject,
  _requireOrderedPair,
  _requirePositive,
  _source,
  type _SourceContext,
} from "./_common.js";
import { _accuracyAndTempcoSources, _regulationExcursion, longTermDriftPpm } from "./seriesReference.js";
import type { AmbientRange, ChainErrorSource, ShuntReference } from "./types.js";

/** Options of {@link shuntResistorSizing}. */
export interface ShuntResistorSizingOptions {
  /** Reference voltage, V (> 0). */
  readonly referenceVolts: number;
  /** Lowest supply, V (> referenceVolts). */
  readonly supplyMinVolts: number;
  /** Highest supply, V (≥ supplyMinVolts). */
  readonly supplyMaxVolts: number;
  /** Lowest load current, mA (≥ 0). Default 0. */
  readonly loadMinMilliamps?: number;
  /** Highest load current, mA (≥ loadMinMilliamps). */
  readonly loadMaxMilliamps: number;
  /** Least cathode current for regulation, mA (> 0). */
  readonly shuntMinMilliamps: number;
  /** Greatest allowed cathode current, mA. */
  readonly shuntMaxMilliamps: number;
  /** Resistor to check, Ω. Default: the largest allowed value. */
  readonly seriesOhms?: number;
  /** Resistor power rating, W; when given, checked against the worst-case dissipation. */
  readonly resistorPowerRatingWatts?: number;
}

/** Result of {@link shuntResistorSizing}. */
export interface ShuntResistorSizing {
  /** Largest series resistor that keeps the cathode current ≥ its minimum at low supply and full load, Ω. */
  readonly maxSeriesOhms: number;
  /** The resistor checked, Ω. */
  readonly seriesOhms: number;
  /** Cathode current at low supply and full load, mA. */
  readonly shuntCurrentMinMilliamps: number;
  /** Cathode current at high supply and least load, mA. */
  readonly shuntCurrentMaxMilliamps: number;
  /** Resistor dissipation at high supply, (V_s,max − V_ref)²/R, W. */
  readonly resistorPowerWatts: number;
  /** Reference dissipation at high supply and least load, W. */
  readonly shuntPowerWatts: number;
  /** Whether every check passes. */
  readonly ok: boolean;
  /** One sentence per failed check. */
  readonly problems: readonly string[];
}

/**
 * Sizes (or checks) the series resistor of a shunt reference: R ≤ (V_s,min − V_ref)/(I_load,max +
 * I_shunt,min); then the cathode current at V_s,max and least load must stay ≤ I_shunt,max, and the
 * resistor's power (V_s,max − V_ref)²/R within its rating.
 * @param options - see {@link ShuntResistorSizingOptions}
 * @returns the sizing with its checks
 * @throws HotjunctionRangeError / HotjunctionTypeError for non-finite or inconsistent inputs (e.g. a
 *   supply not above the reference)
 * @example
 * ```ts
 * import { shuntResistorSizing } from "hotjunction";
 * const s = shuntResistorSizing({ referenceVolts: 2.5, supplyMinVolts: 4.75, supplyMaxVolts: 5.25,
 *   loadMaxMilliamps: 1, shuntMinMilliamps: 1, shuntMaxMilliamps: 15 });
 * console.log(s.maxSeriesOhms, s.shuntCurrentMaxMilliamps.toFixed(3), s.ok); // 1125 "2.444" true
 * ```
 */
export function shuntResistorSizing(options: ShuntResistorSizingOptions): ShuntResistorSizing {
  const context = "shunt resistor sizing";
  const o = _requireObject(options, "options", context);
  const vRef = _requirePositive(o["referenceVolts"], "referenceVolts", "V", context);
  const [vsMin, vsMax] = _requireOrderedPair(o["supplyMinVolts"], o["supplyMaxVolts"], "supplyMinVolts", "supplyMaxVolts", "V", context);
  // Same error shape as other ordered-value checks (deliberate: supply above reference, its own quantities).
  if (!(vsMin > vRef)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "supplyMinVolts",
      value: vsMin,
      min: vRef,
      unit: "V",
      context,
      problem: "is not above the reference voltage",
    });
  }
  const loadMin = o["loadMinMilliamps"] === undefined ? 0 : _optionalLimit(o["loadMinMilliamps"], "loadMinMilliamps", "mA", context);
  const [, loadMax] = _requireOrderedPair(loadMin, o["loadMaxMilliamps"], "loadMinMilliamps", "loadMaxMilliamps", "mA", context);
  const shuntMin = _requirePositive(o["shuntMinMilliamps"], "shuntMinMilliamps", "mA", context);
  const [, shuntMax] = _requireOrderedPair(shuntMin, o["shuntMaxMilliamps"], "shuntMinMilliamps", "shuntMaxMilliamps", "mA", context);
  // finite inputs near 1e308 can give figures past float64: each figure is checked, naming the input that drives it
  const fig = (x: number, input: string, value: number, unit: string): number => _requireFiniteResult(x, input, value, unit, context);
  const maxSeriesOhms = fig(((vsMin - vRef) / (loadMax + shuntMin)) * 1000, "supplyMinVolts", vsMin, "V");
  const r = o["seriesOhms"] === undefined ? maxSeriesOhms : _requirePositive(o["seriesOhms"], "seriesOhms", "Ω", context);
  const iMin = fig(((vsMin - vRef) / r) * 1000 - loadMax, "supplyMinVolts", vsMin, "V");
  const iMax = fig(((vsMax - vRef) / r) * 1000 - loadMin, "supplyMaxVolts", vsMax, "V");
  const resistorPowerWatts = fig((vsMax - vRef) ** 2 / r, "supplyMaxVolts", vsMax, "V");
  const shuntPowerWatts = fig((vRef * iMax) / 1000, "loadMaxMilliamps", loadMax, "mA");
  const problems: string[] = [];
  // Relative guard: R = maxSeriesOhms lands on I_shunt,min up to rounding.
  if (iMin < shuntMin * (1 - 1e-12)) {
    problems.push(`cathode current ${iMin.toPrecision(4)} mA at low supply and full load is below the minimum ${shuntMin} mA`);
  }
  if (iMax > shuntMax) {
    problems.push(`cathode current ${iMax.toPrecision(4)} mA at high supply and least load exceeds the maximum ${shuntMax} mA`);
  }
  if (o["resistorPowerRatingWatts"] !== undefined) {
    const rating = _requirePositive(o["resistorPowerRatingWatts"], "resistorPowerRatingWatts", "W", context);
    if (resistorPowerWatts > rating) {
      problems.push(`resistor dissipation ${resistorPowerWatts.toPrecision(4)} W exceeds its rating ${rating} W`);
    }
  }
  return {
    maxSeriesOhms,
    seriesOhms: r,
    shuntCurrentMinMilliamps: iMin,
    shuntCurrentMaxMilliamps: iMax,
    resistorPowerWatts,
    shuntPowerWatts,
    ok: problems.length === 0,
    problems,
  };
}

/**
 * The output change of a shunt reference through its dynamic impedance over a current swing: ΔV = Z·ΔI.
 * @param dynamicImpedanceOhms - dynamic impedance, Ω (≥ 0)
 * @param minMilliamps - lowest cathode current, mA
 * @param maxMilliamps - highest cathode current, mA (≥ minMilliamps)
 * @returns output change, mV
 * @throws HotjunctionRangeError for a negative impedance or an inverted range
 * @example
 * ```ts
 * import { shuntDynamicChangeMillivolts } from "hotjunction";
 * console.log(shuntDynamicChangeMillivolts(0.57, 1, 15).toFixed(2)); // "7.98"
 * ```
 */
export function shuntDynamicChangeMillivolts(dynamicImpedanceOhms: number, minMilliamps: number, maxMilliamps: number): number {
  const context = "shunt reference dynamic impedance";
  const z = _optionalLimit(dynamicImpedanceOhms, "dynamicImpedanceOhms", "Ω", context);
  const [lo, hi] = _requireOrderedPair(minMilliamps, maxMilliamps, "minMilliamps", "maxMilliamps", "mA", context);
  return _requireFiniteResult(z * (hi - lo), "dynamicImpedanceOhms", z, "Ω", context);
}

/** @internal Sources of a shunt reference (± fractions of the output). */
export function _shuntReferenceSources(
  element: ShuntReference,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): ChainErrorSource[] {
  const { out, add } = _accuracyAndTempcoSources(element, ambient, ctx, context);
  const vNom = element.nominalVolts;
  const [vsMin, vsMax] = _requireOrderedPair(element.supplyMinVolts, element.supplyMaxVolts, "supplyMinVolts", "supplyMaxVolts", "V", context);
  const r = _requirePositive(element.seriesOhms, "seriesOhms", "Ω", context);
  const loadMin = _optionalLimit(element.loadMinMilliamps, "loadMinMilliamps", "mA", context);
  const [, loadMax] = _requireOrderedPair(loadMin, element.loadMaxMilliamps ?? loadMin, "loadMinMilliamps", "loadMaxMilliamps", "mA", context);
  const iMin = ((vsMin - vNom) / r) * 1000 - loadMax;
  const iMax = ((vsMax - vNom) / r) * 1000 - loadMin;
  const shuntMin = element.shuntMinMilliamps === undefined ? 0 : _optionalLimit(element.shuntMinMilliamps, "shuntMinMilliamps", "mA", context);
  if (iMin < shuntMin || iMin <= 0) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "cathode current at low supply and full load",
      value: iMin,
      min: shuntMin,
      unit: "mA",
      context,
      problem: "is below the least current for regulation (series resistor too large or supply too low)",
    });
  }
  if (element.shuntMaxMilliamps !== undefined && iMax > _requireFinite(element.shuntMaxMilliamps, "shuntMaxMilliamps", "mA", context)) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "cathode current at high supply and least load",
      value: iMax,
      max: element.shuntMaxMilliamps,
      unit: "mA",
      context,
      problem: "exceeds the greatest allowed current (series resistor too small)",
    });
  }
  const z = _optionalLimit(element.dynamicImpedanceOhms, "dynamicImpedanceOhms", "Ω", context);
  const rated = element.ratedCurrentMilliamps === undefined ? undefined : _requireFinite(element.ratedCurrentMilliamps, "ratedCurrentMilliamps", "mA", context);
  // Z (Ω) × ΔI (mA) = mV; / 1000 → V; / V_nom → fraction.
  add("dynamicImpedance", "dynamic impedance × cathode current swing", _regulationExcursion(z, iMin, iMax, rated) / 1000 / vNom);
  const drift = _optionalLimit(element.longTermDriftPpmPer1000h, "longTermDriftPpmPer1000h", "ppm/1000 h", context);
  add("longTermDrift", "long-term drift over the service time", longTermDriftPpm(drift, element.serviceHours ?? 1000, element.driftScaling ?? "sqrt") / 1e6);
  return out;
}
