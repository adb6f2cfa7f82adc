/**
 * The cold-junction element: software compensation from a sensor (accuracy, isothermal gradient) or
 * hardware compensation with a linear µV/°C stand-in for E(t_cj). An error δ of the cold-junction
 * temperature maps to the hot junction exactly through the ITS-90 functions:
 * t_h' = E⁻¹(E(t_h) − E(t_c) + E(t_c + δ)), to first order δ·S(t_c)/S(t_h).
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { _invalidChoice, _requireFinite as _finite, _requireFiniteResult } from "../errors.js";
import { _compile, type CompiledType } from "../its90/compiled.js";
import { _checkTemperature, _emfFromTemperature, _seebeckCoefficient, _temperatureFromEmf } from "../its90/engine.js";
import { thermocoupleData } from "../its90/resolveType.js";
import {
  _checkAmbient,
  _optionalLimit,
  _requireNonNegative,
  _requireObject,
  _requirePositive,
  _source,
  type _SourceContext,
} from "./_common.js";
import type { AmbientRange, ChainErrorSource, ColdJunctionElement, HardwareColdJunction } from "./types.js";

/**
 * The hot-junction temperature a compensated instrument indicates when its cold-junction temperature is
 * off by δ: E⁻¹(E(t_h) − E(t_c) + E(t_c + δ)) (law of intermediate temperatures; exact, not first order).
 * @param type - thermocouple type letter
 * @param hotJunctionC - true hot-junction temperature, °C, within the type's range
 * @param coldJunctionC - true cold-junction temperature, °C
 * @param coldJunctionErrorC - error of the cold-junction temperature used for compensation, °C
 * @returns indicated hot-junction temperature, °C
 * @throws HotjunctionRangeError when a temperature or the compensated EMF leaves the type's range
 * @example
 * ```ts
 * import { coldJunctionIndicatedC } from "hotjunction";
 * console.log(coldJunctionIndicatedC("K", 500, 25, 1).toFixed(3)); // "500.951"
 * ```
 * @see NIST Monograph 175 (reference functions); law of intermediate temperatures
 */
export function coldJunctionIndicatedC(
  type: ThermocoupleType,
  hotJunctionC: number,
  coldJunctionC: number,
  coldJunctionErrorC: number,
): number {
  const ct = _compile(thermocoupleData(type));
  _finite(coldJunctionErrorC, "cold-junction error", "°C", `type ${type}`);
  const emf =
    _emfFromTemperature(ct, hotJunctionC) -
    _emfFromTemperature(ct, coldJunctionC) +
    _emfFromTemperature(ct, coldJunctionC + coldJunctionErrorC);
  return _temperatureFromEmf(ct, emf);
}

/**
 * First-order ratio of a hot-junction error to the cold-junction error that causes it: S(t_c)/S(t_h).
 * It is 1 only where the Seebeck coefficients at both junctions agree.
 * @param type - thermocouple type letter
 * @param hotJunctionC - hot-junction temperature, °C
 * @param coldJunctionC - cold-junction temperature, °C
 * @returns ratio, °C per °C
 * @throws HotjunctionRangeError outside the type's range
 * @example
 * ```ts
 * import { coldJunctionSensitivity } from "hotjunction";
 * console.log(coldJunctionSensitivity("K", 500, 25).toFixed(4)); // "0.9505"
 * ```
 */
export function coldJunctionSensitivity(type: ThermocoupleType, hotJunctionC: number, coldJunctionC: number): number {
  const ct = _compile(thermocoupleData(type));
  return _seebeckCoefficient(ct, coldJunctionC) / _seebeckCoefficient(ct, hotJunctionC);
}

/**
 * The voltage a hardware compensator adds at a cold-junction temperature: E(t₀) + α·(t − t₀).
 * @param element - the hardware cold-junction element (α = compensationMicrovoltsPerC, t₀ = matchedAtC)
 * @param type - thermocouple type letter
 * @param coldJunctionC - temperature of the compensator, °C
 * @returns compensation voltage, mV
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad element or temperature
 * @example
 * ```ts
 * import { hardwareCompensationMillivolts } from "hotjunction";
 * const cj = { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6 } as const;
 * console.log(hardwareCompensationMillivolts(cj, "K", 35).toFixed(4)); // "1.4062"
 * ```
 */
export function hardwareCompensationMillivolts(
  element: HardwareColdJunction,
  type: ThermocoupleType,
  coldJunctionC: number,
): number {
  const ct = _compile(thermocoupleData(type));
  const checked = checkHardware(element, "hardware cold junction");
  const t = _finite(coldJunctionC, "cold-junction temperature", "°C", "hardware cold junction");
  return _requireFiniteResult(
    _emfFromTemperature(ct, checked.matchedAtC) + (checked.alphaMicrovoltsPerC * (t - checked.matchedAtC)) / 1000,
    "cold-junction temperature",
    t,
    "°C",
    "hardware cold junction",
  );
}

/** Residual of a hardware compensator over an ambient range (compensation − E(t)), µV. */
export interface CompensationResidual {
  /** Lowest residual over the range, µV. */
  readonly minMicrovolts: number;
  /** Highest residual, µV. */
  readonly maxMicrovolts: number;
  /** Where the lowest residual occurs, °C. */
  readonly minAtC: number;
  /** Where the highest residual occurs, °C. */
  readonly maxAtC: number;
  /** Largest |residual| divided by S at the range's midpoint, °C (an equivalent cold-junction error). */
  readonly equivalentC: number;
}

/**
 * The residual of a hardware compensator's linear stand-in against the real E(t) over an ambient range:
 * r(t) = E(t₀) + α·(t − t₀) − E(t), searched on a 0.1 °C grid plus the ends.
 * @param element - hardware cold-junction element
 * @param type - thermocouple type letter
 * @param ambient - ambient range of the compensator, °C
 * @returns min/max residual (µV) and where they occur
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad element or range
 * @example
 * ```ts
 * import { hardwareCompensationResidual } from "hotjunction";
 * const cj = { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6 } as const;
 * const r = hardwareCompensationResidual(cj, "K", { minC: 0, maxC: 50 });
 * console.log(r.minMicrovolts.toFixed(1), r.maxMicrovolts.toFixed(1)); // "-14.8" "0.1"
 * ```
 */
export function hardwareCompensationResidual(
  element: HardwareColdJunction,
  type: ThermocoupleType,
  ambient: AmbientRange,
): CompensationResidual {
  const context = "hardware cold junction";
  const ct = _compile(thermocoupleData(type));
  const checked = checkHardware(element, context);
  const range = _checkAmbient(ambient, context);
  // the residual reads E(t) over the range: both ends within the type's range (this also bounds the grid's steps)
  _checkTemperature(ct, range.minC, "ambient minC");
  _checkTemperature(ct, range.maxC, "ambient maxC");
  const e0 = _emfFromTemperature(ct, checked.matchedAtC);
  const residual = (t: number): number =>
    (e0 + (checked.alphaMicrovoltsPerC * (t - checked.matchedAtC)) / 1000 - _emfFromTemperature(ct, t)) * 1000;
  const steps = Math.max(1, Math.ceil((range.maxC - range.minC) / 0.1));
  let minMicrovolts = Infinity;
  let maxMicrovolts = -Infinity;
  let minAtC = range.minC;
  let maxAtC = range.minC;
  for (let i = 0; i <= steps; i++) {
    const t = i === steps ? range.maxC : range.minC + ((range.maxC - range.minC) * i) / steps;
    const r = residual(t);
    if (r < minMicrovolts) {
      minMicrovolts = r;
      minAtC = t;
    }
    if (r > maxMicrovolts) {
      maxMicrovolts = r;
      maxAtC = t;
    }
  }
  const s = _seebeckCoefficient(ct, (range.minC + range.maxC) / 2);
  // α (finite, unbounded) times a span of the type's range can leave float64
  _requireFiniteResult(minMicrovolts - maxMicrovolts, "compensationMicrovoltsPerC", checked.alphaMicrovoltsPerC, "µV/°C", context);
  return {
    minMicrovolts,
    maxMicrovolts,
    minAtC,
    maxAtC,
    equivalentC: Math.max(Math.abs(minMicrovolts), Math.abs(maxMicrovolts)) / s,
  };
}

interface CheckedHardware {
  readonly alphaMicrovoltsPerC: number;
  readonly matchedAtC: number;
  readonly sensorAccuracyC: number;
  readonly accuracyMicrovolts: number;
  readonly gradientC: number;
}

function checkHardware(element: unknown, context: string): CheckedHardware {
  const o = _requireObject(element, "cold junction", context);
  return {
    alphaMicrovoltsPerC: _requirePositive(o["compensationMicrovoltsPerC"], "compensationMicrovoltsPerC", "µV/°C", context),
    matchedAtC: o["matchedAtC"] === undefined ? 25 : _finite(o["matchedAtC"], "matchedAtC", "°C", context),
    sensorAccuracyC: _optionalLimit(o["sensorAccuracyC"], "sensorAccuracyC", "°C", context),
    accuracyMicrovolts: _optionalLimit(o["compensationAccuracyMicrovolts"], "compensationAccuracyMicrovolts", "µV", context),
    gradientC: _optionalLimit(o["isothermalGradientC"], "isothermalGradientC", "°C", context),
  };
}

/** @internal The cold-junction stage of a compiled chain. */
export interface _ColdJunctionStage {
  readonly sources: readonly ChainErrorSource[];
  readonly method: "software" | "hardware";
  /** Error δ of the temperature the compensation uses (sensor + gradient), °C. */
  errorC(x: Readonly<Record<string, number>>): number;
  /** Hardware: compensation voltage added before the amplifier at cold-junction temperature tc, mV. */
  compensationMillivolts(x: Readonly<Record<string, number>>, coldJunctionC: number): number;
  /** Slope of `compensationMillivolts` in the cold-junction temperature (hardware: α; software: 0), mV/°C. */
  readonly compensationSlopeMillivoltsPerC: number;
}

/** @internal Builds the stage: sources and transfer function. */
export function _coldJunctionStage(
  element: ColdJunctionElement,
  ct: CompiledType,
  ctx: _SourceContext,
  context: string,
): _ColdJunctionStage {
  // Same prologue as every element's stage builder (deliberate: object and kind checked, each its own element).
  const o = _requireObject(element, "coldJunction", context);
  if (o["kind"] !== "coldJunction") return _invalidChoice("coldJunction kind", o["kind"], ["coldJunction"], context);
  // Same shape as the fixed-scale amplifier's accuracy/gradient sources (deliberate: each element names its own sources).
  const sources: ChainErrorSource[] = [];
  if (o["method"] === "software") {
    const sensor = _requireNonNegative(o["sensorAccuracyC"], "sensorAccuracyC", "°C", context);
    const gradient = _optionalLimit(o["isothermalGradientC"], "isothermalGradientC", "°C", context);
    if (sensor > 0) {
      sources.push(_source(ctx, "coldJunction.sensorAccuracy", "coldJunction", "cold-junction sensor accuracy", "°C", sensor));
    }
    if (gradient > 0) {
      sources.push(
        _source(ctx, "coldJunction.isothermalGradient", "coldJunction", "sensor-to-terminal temperature difference", "°C", gradient),
      );
    }
    const hasSensor = sensor > 0;
    const hasGradient = gradient > 0;
    return {
      sources,
      method: "software",
      errorC: (x) =>
        (hasSensor ? (x["coldJunction.sensorAccuracy"] as number) : 0) +
        (hasGradient ? (x["coldJunction.isothermalGradient"] as number) : 0),
      compensationMillivolts: () => 0,
      compensationSlopeMillivoltsPerC: 0,
    };
  }
  if (o["method"] === "hardware") {
    const h = checkHardware(element, context);
    if (h.sensorAccuracyC > 0) {
      sources.push(
        _source(ctx, "coldJunction.sensorAccuracy", "coldJunction", "compensator sensor accuracy", "°C", h.sensorAccuracyC),
      );
    }
    if (h.gradientC > 0) {
      sources.push(
        _source(ctx, "coldJunction.isothermalGradient", "coldJunction", "compensator-to-terminal temperature difference", "°C", h.gradientC),
      );
    }
    if (h.accuracyMicrovolts > 0) {
      sources.push(
        _source(ctx, "coldJunction.compensationAccuracy", "coldJunction", "compensation voltage accuracy", "µV", h.accuracyMicrovolts),
      );
    }
    const hasSensor = h.sensorAccuracyC > 0;
    const hasGradient = h.gradientC > 0;
    const hasAccuracy = h.accuracyMicrovolts > 0;
    const e0 = _emfFromTemperature(ct, h.matchedAtC);
    const alphaMv = h.alphaMicrovoltsPerC / 1000;
    const t0 = h.matchedAtC;
    const errorC = (x: Readonly<Record<string, number>>): number =>
      (hasSensor ? (x["coldJunction.sensorAccuracy"] as number) : 0) +
      (hasGradient ? (x["coldJunction.isothermalGradient"] as number) : 0);
    return {
      sources,
      method: "hardware",
      errorC,
      compensationMillivolts: (x, tc) =>
        e0 + alphaMv * (tc + errorC(x) - t0) + (hasAccuracy ? (x["coldJunction.compensationAccuracy"] as number) / 1000 : 0),
      compensationSlopeMillivoltsPerC: alphaMv,
    };
  }
  return _invalidChoice("cold-junction method", o["method"], ["software", "hardware"], context);
}
