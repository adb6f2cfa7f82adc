/**
 * Loop resistance of the thermocouple circuit and the offsets the currents through it produce at the
 * amplifier input: the amplifier's bias current (sign unknown, ±I_b·R) and the open-circuit detection
 * current (sign set by its direction: pull-up reads high by I·R, pull-down low).
 *
 * Thermocouple wire resistance per metre from the legs' resistivities at 20 °C (from memory, see
 * `src/data/wireAlloys.ts`): R/m = (ρ_P + ρ_N)/A, A = π·d²/4; AWG diameter d = 0.127 mm·92^((36 − n)/39)
 * (the gauge's defining formula, common practice). Hot wire has more resistance than this; give
 * `thermocoupleOhms` or a `resistanceToleranceFraction` when it matters.
 * @module
 */
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import { thermocoupleLegs } from "../../data/wireAlloys.js";
import { _invalidChoice, _label, _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "../../errors.js";
import { _oneOfTwoKeys, _optionalLimit, _requireFraction, _requireObject, _requirePositive, type _SourceContext } from "../_common.js";
import type { WireErrorSource } from "../types.js";
import type { DetectionDirection, LoopResistanceElement, ThermocoupleWireRun } from "../wireTypes.js";
import { _wireSource, type _Inputs } from "./_wireCommon.js";

/**
 * The diameter of an American Wire Gauge: 0.127 mm·92^((36 − n)/39); n = −3 … 40 (−3 is 4/0, 0 is 1/0).
 * @param awg - gauge number, integer −3 … 40
 * @returns diameter, mm
 * @throws HotjunctionRangeError outside −3 … 40 or not an integer
 * @example
 * ```ts
 * import { awgDiameterMm } from "hotjunction";
 * console.log(awgDiameterMm(20).toFixed(4)); // "0.8118"
 * ```
 */
export function awgDiameterMm(awg: number): number {
  const context = "wire gauge";
  const n = _requireFinite(awg, "awg", "", context);
  if (!Number.isInteger(n) || n < -3 || n > 40) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "awg", value: n, min: -3, max: 40, context, problem: "is not an integer gauge of the table" });
  }
  return 0.127 * 92 ** ((36 - n) / 39);
}

function requireType(type: ThermocoupleType, context: string): void {
  // A non-string (e.g. an object with no string form) cannot be used as a key: refuse it before the lookup.
  if (typeof type !== "string" || !Object.hasOwn(thermocoupleLegs, type)) _invalidChoice("thermocouple type", type, Object.keys(thermocoupleLegs), context);
}

/**
 * Loop resistance per metre of a thermocouple pair (both legs), from the legs' resistivities at 20 °C.
 * @param type - thermocouple type letter
 * @param diameterMm - diameter of each leg, mm (> 0)
 * @returns Ω per metre of pair
 * @throws HotjunctionRangeError for a non-positive diameter or an unknown type
 * @example
 * ```ts
 * import { awgDiameterMm, thermocoupleLoopOhmsPerMetre } from "hotjunction";
 * console.log(thermocoupleLoopOhmsPerMetre("K", awgDiameterMm(20)).toFixed(3)); // "1.932"
 * ```
 */
export function thermocoupleLoopOhmsPerMetre(type: ThermocoupleType, diameterMm: number): number {
  const context = `type ${_label(type)} wire`;
  requireType(type, context);
  const d = _requirePositive(diameterMm, "diameterMm", "mm", context);
  const legs = thermocoupleLegs[type];
  const rho = (legs.positive.resistivityMicroohmCm + legs.negative.resistivityMicroohmCm) * 1e-8; // Ω·m
  const area = (Math.PI * (d * 1e-3) ** 2) / 4; // m²
  return _requireFiniteResult(rho / area, "diameterMm", d, "mm", context);
}

function wireRunOhms(type: ThermocoupleType, run: ThermocoupleWireRun, context: string, key: string): number {
  const o = _requireObject(run, key, context);
  const length = requireNonNegativeValue(o["lengthMetres"], `${key}.lengthMetres`, "m", context);
  const hasD = _oneOfTwoKeys(
    o,
    "diameterMm",
    "awg",
    `${key}.`,
    { both: "are both given; give the gauge one way", missing: "is missing: give the wire's diameter or AWG" },
    context,
  );
  const d = hasD ? _requirePositive(o["diameterMm"], `${key}.diameterMm`, "mm", context) : awgDiameterMm(o["awg"] as number);
  return _requireFiniteResult(thermocoupleLoopOhmsPerMetre(type, d) * length, `${key}.lengthMetres`, length, "m", context);
}

/** A required finite number ≥ 0 (a length or a resistance). */
function requireNonNegativeValue(value: unknown, quantity: string, unit: string, context: string): number {
  const x = _requireFinite(value, quantity, unit, context);
  if (x < 0) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min: 0, unit, context, problem: "is negative" });
  }
  return x;
}

function nonNegative(value: unknown, quantity: string, unit: string, context: string): number {
  return value === undefined ? 0 : requireNonNegativeValue(value, quantity, unit, context);
}

/** The parts of a loop's resistance, Ω. */
export interface LoopResistance {
  /** Thermocouple pair, Ω. */
  readonly thermocoupleOhms: number;
  /** Cable, Ω. */
  readonly cableOhms: number;
  /** Other series resistance, Ω. */
  readonly otherOhms: number;
  /** Sum, Ω. */
  readonly totalOhms: number;
}

/**
 * The loop resistance of a loop element: thermocouple wire (by gauge and length, or given) + cable (an
 * extension-grade cable by gauge and length, or given) + other.
 * @param element - loop element
 * @param type - thermocouple type letter (for the wire's alloys)
 * @returns the parts and the total, Ω
 * @throws HotjunctionRangeError for a negative length or resistance, a missing or doubled gauge or resistance
 * @example
 * ```ts
 * import { loopResistanceOhms } from "hotjunction";
 * const r = loopResistanceOhms({ kind: "loopResistance", thermocoupleWire: { lengthMetres: 10, awg: 20 }, cableOhms: 3 }, "K");
 * console.log(r.totalOhms.toFixed(2)); // "22.32"
 * ```
 */
export function loopResistanceOhms(element: LoopResistanceElement, type: ThermocoupleType): LoopResistance {
  const context = "loop resistance";
  const o = _requireObject(element, "loopResistance", context);
  if (o["kind"] !== "loopResistance") return _invalidChoice("loopResistance kind", o["kind"], ["loopResistance"], context);
  const hasWire = o["thermocoupleWire"] !== undefined;
  const hasOhms = o["thermocoupleOhms"] !== undefined;
  if (hasWire && hasOhms) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "thermocoupleWire / thermocoupleOhms",
      value: "both",
      context,
      problem: "are both given; give the thermocouple's resistance one way",
    });
  }
  const thermocoupleOhms = hasWire
    ? wireRunOhms(type, o["thermocoupleWire"] as ThermocoupleWireRun, context, "thermocoupleWire")
    : nonNegative(o["thermocoupleOhms"], "thermocoupleOhms", "Ω", context);
  if (o["cableWire"] !== undefined && o["cableOhms"] !== undefined) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "cableWire / cableOhms",
      value: "both",
      context,
      problem: "are both given; give the cable's resistance one way",
    });
  }
  const cableOhms =
    o["cableWire"] !== undefined
      ? wireRunOhms(type, o["cableWire"] as ThermocoupleWireRun, context, "cableWire")
      : nonNegative(o["cableOhms"], "cableOhms", "Ω", context);
  const otherOhms = nonNegative(o["otherOhms"], "otherOhms", "Ω", context);
  const totalOhms = _requireFiniteResult(thermocoupleOhms + cableOhms + otherOhms, "loop resistance (sum of the parts)", thermocoupleOhms, "Ω", context);
  return { thermocoupleOhms, cableOhms, otherOhms, totalOhms };
}

/**
 * The nominal offset of the detection current across the loop, µV: +I·R for a pull-up, −I·R for a pull-down.
 * @param detectionCurrentNanoamps - nA (≥ 0)
 * @param loopOhms - Ω (≥ 0)
 * @param direction - `"pullUp"` or `"pullDown"`
 * @returns µV at the amplifier input (positive reads high)
 * @example
 * ```ts
 * import { detectionOffsetMicrovolts } from "hotjunction";
 * console.log(detectionOffsetMicrovolts(100, 200, "pullUp"), detectionOffsetMicrovolts(100, 200, "pullDown")); // 20 -20
 * ```
 */
export function detectionOffsetMicrovolts(detectionCurrentNanoamps: number, loopOhms: number, direction: DetectionDirection): number {
  const context = "detection current offset";
  const i = requireNonNegativeValue(detectionCurrentNanoamps, "detectionCurrentNanoamps", "nA", context);
  const r = requireNonNegativeValue(loopOhms, "loopOhms", "Ω", context);
  if (direction !== "pullUp" && direction !== "pullDown") return _invalidChoice("detectionDirection", direction, ["pullUp", "pullDown"], context);
  return _requireFiniteResult(((direction === "pullUp" ? 1 : -1) * i * r) / 1000, "loopOhms", r, "Ω", context); // nA·Ω = nV
}

/** @internal The loop stage: its sources and its offset at the amplifier input. */
export interface _LoopStage {
  readonly sources: readonly WireErrorSource[];
  readonly resistance: LoopResistance;
  /** Nominal detection-current offset (a known bias, not a source), µV. */
  readonly nominalDetectionMicrovolts: number;
  /** Offset at the amplifier input (bias + detection), mV. */
  offsetMillivolts(x: _Inputs): number;
}

/** @internal Builds the loop stage. */
export function _loopStage(element: LoopResistanceElement, type: ThermocoupleType, ctx: _SourceContext, context: string): _LoopStage {
  const resistance = loopResistanceOhms(element, type);
  const o = element as unknown as Record<string, unknown>;
  const rTol = o["resistanceToleranceFraction"] === undefined ? 0 : _requireFraction(o["resistanceToleranceFraction"], "resistanceToleranceFraction", context);
  const bias = _optionalLimit(o["biasCurrentNanoamps"], "biasCurrentNanoamps", "nA", context);
  const det = nonNegative(o["detectionCurrentNanoamps"], "detectionCurrentNanoamps", "nA", context);
  const iTol = o["detectionCurrentToleranceFraction"] === undefined ? 0 : _requireFraction(o["detectionCurrentToleranceFraction"], "detectionCurrentToleranceFraction", context);
  let nominal = 0;
  if (det > 0) {
    if (o["detectionDirection"] === undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "detectionDirection",
        value: undefined,
        context,
        problem: "is missing: the detection current's direction sets the sign of its offset",
        allowed: ["pullUp", "pullDown"],
      });
    }
    nominal = detectionOffsetMicrovolts(det, resistance.totalOhms, o["detectionDirection"] as DetectionDirection);
  }
  const r = resistance.totalOhms;
  const biasLimit = (bias * r * (1 + rTol)) / 1000;
  const detLimit = Math.abs(nominal) * ((1 + rTol) * (1 + iTol) - 1);
  const sources: WireErrorSource[] = [];
  const hb = biasLimit > 0;
  const hd = detLimit > 0;
  if (hb) sources.push(_wireSource(ctx, "loop.biasOffset", "loop", `amplifier bias current through the ${r.toPrecision(4)} Ω loop`, "µV", biasLimit));
  if (hd) {
    sources.push(
      _wireSource(ctx, "loop.detectionOffset", "loop", "spread of the detection-current offset (current and resistance tolerances)", "µV", detLimit),
    );
  }
  return {
    sources,
    resistance,
    nominalDetectionMicrovolts: nominal,
    offsetMillivolts: (x) =>
      (nominal + (hb ? (x["loop.biasOffset"] as number) : 0) + (hd ? (x["loop.detectionOffset"] as number) : 0)) / 1000,
  };
}
