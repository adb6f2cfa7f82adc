/**
 * The probe's own slow errors: insulation leakage at temperature (a shunt across the hot end dividing the EMF
 * with the loop resistance) and ageing (a drift the user states, accumulating over the service life between
 * recalibrations).
 *
 * Caution: insulation resistance of mineral-insulated probes falls steeply with temperature and depends on
 * the sheath, the insulant, the length and the probe's history; the shunt value is design-specific and must
 * come from the probe maker or a measurement. Ageing drift likewise depends on the alloy, the atmosphere and
 * the temperature history; this library does not supply drift rates.
 * @module
 */
import { _invalidChoice, _requireFinite, _requireInRange, _requireInteger, HotjunctionRangeError } from "../../errors.js";
import { _oneOfTwoKeys, _optionalLimit, _requireNonNegative, _requireObject, _requirePositive, type _SourceContext } from "../_common.js";
import type { WireErrorSource } from "../types.js";
import type { AgeingElement, DriftDirection, InsulationLeakageElement } from "../wireTypes.js";
import { _wireSource, type _Inputs } from "./_wireCommon.js";

/**
 * The factor a shunt across the hot end applies to the EMF: 1/(1 + R_loop/R_shunt).
 * @param loopOhms - loop resistance between the shunt and the amplifier, Ω (≥ 0)
 * @param shuntOhms - shunt (insulation) resistance, Ω (> 0)
 * @returns factor (≤ 1)
 * @throws HotjunctionRangeError for a negative loop or non-positive shunt resistance
 * @example
 * ```ts
 * import { leakageScale } from "hotjunction";
 * console.log(leakageScale(100, 1e6) === 1 / (1 + 1e-4)); // true
 * ```
 */
export function leakageScale(loopOhms: number, shuntOhms: number): number {
  const context = "insulation leakage";
  const r = _requireNonNegative(loopOhms, "loopOhms", "Ω", context);
  const s = _requirePositive(shuntOhms, "shuntOhms", "Ω", context);
  return 1 / (1 + r / s);
}

/** @internal The leakage stage: one one-sided source and the EMF factor. */
export interface _LeakageStage {
  readonly sources: readonly WireErrorSource[];
  /** Factor on the thermocouple's EMF (1 + x, x ∈ [−f, 0]). */
  emfScale(x: _Inputs): number;
}

/**
 * @internal Builds the leakage stage. The source `probe.leakage` (fraction) is the relative loss of EMF,
 * anywhere from 0 (perfect insulation) to f = 1 − 1/(1 + R_loop/R_min) at the stated lowest shunt:
 * rectangular on [−f, 0] (center −f/2, limit f/2) unless overridden.
 */
export function _leakageStage(element: InsulationLeakageElement, ctx: _SourceContext, context: string): _LeakageStage {
  const o = _requireObject(element, "insulationLeakage", context);
  if (o["kind"] !== "insulationLeakage") return _invalidChoice("insulationLeakage kind", o["kind"], ["insulationLeakage"], context);
  const shunt = _requirePositive(o["minimumShuntOhms"], "minimumShuntOhms", "Ω", context);
  const loop = _requireNonNegative(o["loopOhms"], "loopOhms", "Ω", context);
  if (o["statedAtC"] !== undefined) _requireFinite(o["statedAtC"], "statedAtC", "°C", context);
  const f = 1 - leakageScale(loop, shunt);
  if (!(f > 0)) return { sources: [], emfScale: () => 1 };
  const at = o["statedAtC"] === undefined ? "" : ` at ${String(o["statedAtC"])} °C`;
  return {
    sources: [
      _wireSource(
        ctx,
        "probe.leakage",
        "probe",
        `EMF lost to insulation leakage, 0 … ${f.toPrecision(3)} (shunt ≥ ${shunt} Ω${at} against a ${loop} Ω loop; design-specific)`,
        "fraction",
        f / 2,
        -f / 2,
      ),
    ],
    emfScale: (x) => 1 + (x["probe.leakage"] as number),
  };
}

interface CheckedAgeing {
  readonly totalC: number;
  readonly serviceHours: number;
  readonly statedAtC: number;
  readonly direction: DriftDirection;
}

/** Longest service life between recalibrations, h (over 1,000 years), and largest total drift, °C. */
const maxServiceHours = 1e7;
const maxTotalDriftC = 1000;

function checkAgeing(element: unknown, context: string): CheckedAgeing {
  const o = _requireObject(element, "ageing", context);
  if (o["kind"] !== "ageing") return _invalidChoice("ageing kind", o["kind"], ["ageing"], context);
  const serviceHours = _requirePositive(o["serviceHours"], "serviceHours", "h", context);
  _requireInRange(serviceHours, "serviceHours", 0, maxServiceHours, "h", context);
  const statedAtC = _requireFinite(o["statedAtC"], "statedAtC", "°C", context);
  const direction = o["direction"];
  if (direction !== "up" && direction !== "down" && direction !== "symmetric") {
    return _invalidChoice("ageing direction", direction, ["up", "down", "symmetric"], context);
  }
  const hasRate = _oneOfTwoKeys(
    o,
    "driftCPer1000Hours",
    "totalDriftC",
    "",
    { both: "are both given; state the drift one way", missing: "is missing: state a rate per 1,000 h or a total over the service life" },
    context,
  );
  // the rate is bounded before it is multiplied, so a huge rate is refused by its own name and value
  const totalC = hasRate
    ? (_requireInRange(_optionalLimit(o["driftCPer1000Hours"], "driftCPer1000Hours", "°C", context), "driftCPer1000Hours", 0, (maxTotalDriftC * 1000) / serviceHours, "°C", context) *
        serviceHours) /
      1000
    : _optionalLimit(o["totalDriftC"], "totalDriftC", "°C", context);
  _requireInRange(totalC, hasRate ? "total drift (driftCPer1000Hours × serviceHours / 1000)" : "totalDriftC", 0, maxTotalDriftC, "°C", context);
  return { totalC, serviceHours, statedAtC, direction };
}

/** The ageing band after a time in service, °C (deviation of the reading, low and high). */
export interface AgeingBandPoint {
  /** Time in service since the last calibration, h. */
  readonly hours: number;
  /** Lowest deviation, °C (0 for `"up"`). */
  readonly lowC: number;
  /** Highest deviation, °C (0 for `"down"`). */
  readonly highC: number;
}

/**
 * How the ageing band widens with time in service: the band at `hours` is D·hours/1000 (rate) or
 * D_total·hours/serviceHours (total), one-sided or symmetric; linear accumulation.
 * @param element - ageing element
 * @param hours - time in service, h, 0 … serviceHours
 * @returns the band at that time
 * @throws HotjunctionRangeError for hours outside 0 … serviceHours (recalibrate by then) or a bad element
 * @example
 * ```ts
 * import { ageingBandAt } from "hotjunction";
 * const a = { kind: "ageing", driftCPer1000Hours: 0.5, statedAtC: 1000, serviceHours: 4000, direction: "up" } as const;
 * console.log(ageingBandAt(a, 2000)); // { hours: 2000, lowC: 0, highC: 1 }
 * ```
 */
export function ageingBandAt(element: AgeingElement, hours: number): AgeingBandPoint {
  const context = "ageing";
  const a = checkAgeing(element, context);
  const h = _requireFinite(hours, "hours in service", "h", context);
  // Same error shape as the firmware table's ADC-code check (deliberate: each names its own quantity and range).
  if (h < 0 || h > a.serviceHours) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "hours in service",
      value: h,
      min: 0,
      max: a.serviceHours,
      unit: "h",
      context,
      problem: "is outside the service life between recalibrations",
    });
  }
  const d = (a.totalC * h) / a.serviceHours;
  return { hours: h, lowC: a.direction === "up" || d === 0 ? 0 : -d, highC: a.direction === "down" ? 0 : d };
}

/** Most intervals {@link ageingBandOverService} computes (a chart or a table needs far fewer; bounds the work). */
const ageingBandMaxSteps = 10_000;

/**
 * The ageing band at evenly spaced times over the service life (for a chart or a table).
 * @param element - ageing element
 * @param steps - number of intervals (integer 1 … 10,000), default 10
 * @returns steps + 1 points from 0 h to serviceHours
 * @example
 * ```ts
 * import { ageingBandOverService } from "hotjunction";
 * const a = { kind: "ageing", totalDriftC: 3, statedAtC: 900, serviceHours: 6000, direction: "symmetric" } as const;
 * console.log(ageingBandOverService(a, 2).map((p) => p.highC)); // [ 0, 1.5, 3 ]
 * ```
 */
export function ageingBandOverService(element: AgeingElement, steps = 10): AgeingBandPoint[] {
  const a = checkAgeing(element, "ageing");
  _requireInteger(steps, "steps", 1, ageingBandMaxSteps, "ageing");
  const out: AgeingBandPoint[] = [];
  for (let i = 0; i <= steps; i++) out.push(ageingBandAt(element, i === steps ? a.serviceHours : (a.serviceHours * i) / steps));
  return out;
}

/** @internal The ageing stage: its source at a hot-junction temperature and its deviation of the hot junction. */
export interface _AgeingStage {
  /** The source at a hot-junction temperature (refuses one above the drift's stated temperature). */
  sourcesAt(hotJunctionC: number): WireErrorSource[];
  /** Deviation of the thermocouple's EMF expressed in °C at the hot junction (adds to the tolerance ε). */
  deviationC(x: _Inputs): number;
}

/** @internal Builds the ageing stage. */
export function _ageingStage(element: AgeingElement, ctx: _SourceContext, context: string): _AgeingStage {
  const a = checkAgeing(element, context);
  const d = a.totalC;
  const has = d > 0;
  const center = a.direction === "up" ? d / 2 : a.direction === "down" ? -d / 2 : 0;
  const limit = a.direction === "symmetric" ? d : d / 2;
  return {
    sourcesAt: (hotJunctionC) => {
      if (hotJunctionC > a.statedAtC) {
        throw new HotjunctionRangeError({
          code: "OUT_OF_RANGE",
          quantity: "hot-junction temperature",
          value: hotJunctionC,
          max: a.statedAtC,
          unit: "°C",
          context,
          problem: "is above the temperature the ageing drift is stated at; state the drift at the working temperature",
        });
      }
      if (!has) return [];
      const band = a.direction === "up" ? `0 … +${d}` : a.direction === "down" ? `−${d} … 0` : `±${d}`;
      return [
        _wireSource(ctx, "probe.ageing", "probe", `probe ageing drift ${band} °C over ${a.serviceHours} h in service (stated at ${a.statedAtC} °C)`, "°C", limit, center),
      ];
    },
    deviationC: (x) => (has ? (x["probe.ageing"] as number) : 0),
  };
}
