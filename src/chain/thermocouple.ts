/**
 * The thermocouple element: its tolerance (IEC 60584-1 classes, ASTM E230 grades, or a custom statement)
 * with the standards' temperature ranges enforced, and its transfer function E(t_h + ε) − E(t_c).
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { astmE230Tolerances, iecToleranceClasses, type ToleranceBand } from "../data/toleranceClasses.js";
import { _invalidChoice, _label, _requireFinite, HotjunctionRangeError } from "../errors.js";
import { _compile } from "../its90/compiled.js";
import { _emfFromTemperature } from "../its90/engine.js";
import { thermocoupleData, thermocoupleTypes } from "../its90/resolveType.js";
import { _requireNonNegative, _requireObject, _source, type _SourceContext } from "./_common.js";
import type { ChainErrorSource, ThermocoupleElement, ThermocoupleTolerance } from "./types.js";

/** The valid temperature range of a tolerance statement for a type, °C. */
export interface ToleranceRange {
  readonly minC: number;
  readonly maxC: number;
}

function describe(tolerance: ThermocoupleTolerance): string {
  if (typeof tolerance !== "object" || tolerance === null) return "tolerance";
  if (tolerance.standard === "IEC 60584-1") return `IEC 60584-1 class ${_label(tolerance.class)}`;
  if (tolerance.standard === "ASTM E230") return `ASTM E230 ${_label(tolerance.grade)} limits`;
  return "custom tolerance";
}

/** A standard's bands for the type, or the error naming the class or grade the standard does not define for it. */
function definedBands(
  bands: readonly ToleranceBand[] | undefined,
  quantity: string,
  value: number | string,
  problem: string,
  context: string,
): readonly ToleranceBand[] {
  if (bands === undefined) throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity, value, context, problem });
  return bands;
}

function bandsOf(type: ThermocoupleType, tolerance: ThermocoupleTolerance, context: string): readonly ToleranceBand[] {
  const t = _requireObject(tolerance, "tolerance", context);
  switch (t["standard"]) {
    case "IEC 60584-1": {
      const cls = t["class"];
      if (cls !== 1 && cls !== 2 && cls !== 3) return _invalidChoice("IEC 60584-1 class", cls, ["1", "2", "3"], context);
      return definedBands(iecToleranceClasses.grades[cls][type], "IEC 60584-1 class", cls, `is not defined for type ${type} by ${iecToleranceClasses.source}`, context);
    }
    case "ASTM E230": {
      const grade = t["grade"];
      if (grade !== "standard" && grade !== "special") {
        return _invalidChoice("ASTM E230 grade", grade, ["standard", "special"], context);
      }
      return definedBands(astmE230Tolerances.grades[grade][type], "ASTM E230 grade", grade, `is not defined for type ${type}`, context);
    }
    case "custom": {
      const range = thermocoupleData(type);
      const toleranceC = _requireNonNegative(t["toleranceC"], "custom toleranceC", "°C", context);
      const fraction =
        t["fractionOfReading"] === undefined
          ? 0
          : _requireNonNegative(t["fractionOfReading"], "custom fractionOfReading", "fraction", context);
      const typeMin = Number(range.minC);
      const typeMax = Number(range.maxC);
      const minC = t["minC"] === undefined ? typeMin : _requireFinite(t["minC"], "custom minC", "°C", context);
      const maxC = t["maxC"] === undefined ? typeMax : _requireFinite(t["maxC"], "custom maxC", "°C", context);
      if (minC > maxC || minC < typeMin || maxC > typeMax) {
        throw new HotjunctionRangeError({
          code: "OUT_OF_RANGE",
          quantity: "custom tolerance range",
          value: `${minC} to ${maxC}`,
          min: typeMin,
          max: typeMax,
          unit: "°C",
          context,
          problem: "is empty or outside the type's range",
        });
      }
      return [{ minC, maxC, toleranceC, fractionOfReading: fraction }];
    }
    default:
      return _invalidChoice("tolerance standard", t["standard"], ["IEC 60584-1", "ASTM E230", "custom"], context);
  }
}

function checkType(type: unknown, context: string): ThermocoupleType {
  if (typeof type !== "string" || !(thermocoupleTypes as readonly string[]).includes(type)) {
    return _invalidChoice("thermocouple type", type, thermocoupleTypes, context);
  }
  return type as ThermocoupleType;
}

function bandTolerance(band: ToleranceBand, temperatureC: number): number {
  const fixedPart = band.toleranceC + (band.slopePerC ?? 0) * (temperatureC - (band.slopeFromC ?? band.minC));
  return Math.max(fixedPart, band.fractionOfReading * Math.abs(temperatureC));
}

/**
 * The temperature range over which a tolerance statement holds for a type.
 * @param type - thermocouple type letter
 * @param tolerance - the tolerance statement (IEC class, ASTM grade or custom)
 * @returns the range, °C
 * @throws HotjunctionRangeError (code `INVALID_OPTION`) for a class or grade the standard does not define
 *   for the type, or an unknown type
 * @example
 * ```ts
 * import { toleranceRange } from "hotjunction";
 * const r = toleranceRange("K", { standard: "IEC 60584-1", class: 2 });
 * console.log(r.minC, r.maxC); // -40 1200
 * ```
 */
export function toleranceRange(type: ThermocoupleType, tolerance: ThermocoupleTolerance): ToleranceRange {
  const context = `type ${_label(type)} ${describe(tolerance)}`;
  const bands = bandsOf(checkType(type, context), tolerance, context);
  return { minC: (bands[0] as ToleranceBand).minC, maxC: (bands[bands.length - 1] as ToleranceBand).maxC };
}

/**
 * The tolerance of a thermocouple at a temperature: the ± limit of its deviation from the ITS-90 reference
 * function, per IEC 60584-1:2013 (classes 1, 2, 3), ASTM E230 Table 1 (standard or special limits) or a
 * custom statement (larger of ±toleranceC and fractionOfReading·|t|). At a break point shared by two
 * bands the larger of the two applies.
 * @param type - thermocouple type letter
 * @param tolerance - the tolerance statement
 * @param temperatureC - temperature, °C, within the statement's range (see {@link toleranceRange})
 * @returns the tolerance, ± °C
 * @throws HotjunctionRangeError outside the statement's range (naming it) or for a class the standard does
 *   not define for the type; HotjunctionTypeError for a non-finite temperature
 * @example
 * ```ts
 * import { thermocoupleToleranceC } from "hotjunction";
 * console.log(thermocoupleToleranceC("K", { standard: "IEC 60584-1", class: 1 }, 800)); // 3.2
 * console.log(thermocoupleToleranceC("K", { standard: "ASTM E230", grade: "standard" }, 500)); // 3.75
 * ```
 * @see IEC 60584-1:2013; ASTM E230 Table 1
 */
export function thermocoupleToleranceC(
  type: ThermocoupleType,
  tolerance: ThermocoupleTolerance,
  temperatureC: number,
): number {
  const context = `type ${_label(type)} ${describe(tolerance)}`;
  const bands = bandsOf(checkType(type, context), tolerance, context);
  const t = _requireFinite(temperatureC, "temperature", "°C", context);
  const first = bands[0] as ToleranceBand;
  const last = bands[bands.length - 1] as ToleranceBand;
  if (t < first.minC || t > last.maxC) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "temperature",
      value: t,
      min: first.minC,
      max: last.maxC,
      unit: "°C",
      context,
      problem: "is outside the range where the tolerance is defined",
    });
  }
  let result = -1;
  for (const band of bands) {
    if (t >= band.minC && t <= band.maxC) result = Math.max(result, bandTolerance(band, t));
  }
  // Rounding guard: a value like 0.004·800 prints 3.2 only after this.
  return Number(result.toPrecision(12));
}

/** @internal Checks a thermocouple element; returns it typed. */
export function _checkThermocouple(element: unknown, context: string): ThermocoupleElement {
  const o = _requireObject(element, "thermocouple", context);
  if (o["kind"] !== "thermocouple") return _invalidChoice("thermocouple kind", o["kind"], ["thermocouple"], context);
  const type = checkType(o["type"], context);
  bandsOf(type, o["tolerance"] as ThermocoupleTolerance, `${context}, type ${type} tolerance`);
  return element as ThermocoupleElement;
}

/**
 * @internal The thermocouple's sources at a hot-junction temperature: its tolerance (°C), rectangular by
 * default (common practice: a class tolerance is a rectangular bound).
 */
export function _thermocoupleSources(
  element: ThermocoupleElement,
  hotJunctionC: number,
  ctx: _SourceContext,
): ChainErrorSource[] {
  const limit = thermocoupleToleranceC(element.type, element.tolerance, hotJunctionC);
  if (limit === 0) return [];
  return [
    _source(
      ctx,
      "thermocouple.tolerance",
      "thermocouple",
      `thermocouple tolerance (${describe(element.tolerance)}) at ${hotJunctionC} °C`,
      "°C",
      limit,
    ),
  ];
}

/**
 * The thermocouple's EMF at the terminals: E(t_h + ε) − E(t_c), where ε is its deviation from the reference
 * function expressed in °C. The same function as `emfFromTemperature(type, hotJunctionC + deviationC,
 * { coldJunctionC })`, bit for bit.
 * @deprecated use `emfFromTemperature(type, hotJunctionC + deviationC, { coldJunctionC })`; kept for one minor
 *   version.
 * @param type - thermocouple type letter
 * @param hotJunctionC - hot-junction temperature, °C
 * @param coldJunctionC - terminal (cold-junction) temperature, °C
 * @param deviationC - deviation of the thermocouple from the reference function, °C (default 0)
 * @returns EMF, mV
 * @throws HotjunctionRangeError when t_h + ε or t_c leaves the type's range
 * @example
 * ```ts
 * import { emfFromTemperature, thermocoupleEmfMillivolts } from "hotjunction";
 * console.log(thermocoupleEmfMillivolts("K", 500, 25).toFixed(3)); // "19.644"
 * console.log(emfFromTemperature("K", 500, { coldJunctionC: 25 }) === thermocoupleEmfMillivolts("K", 500, 25)); // true
 * ```
 */
export function thermocoupleEmfMillivolts(
  type: ThermocoupleType,
  hotJunctionC: number,
  coldJunctionC: number,
  deviationC = 0,
): number {
  const ct = _compile(thermocoupleData(type));
  // each term checked before the sum: undefined + 0 would reach the engine as NaN
  const hot = _requireFinite(hotJunctionC, "hot-junction temperature", "°C", ct.context) + _requireFinite(deviationC, "deviation (deviationC)", "°C", ct.context);
  return _emfFromTemperature(ct, hot, { coldJunctionC });
}
