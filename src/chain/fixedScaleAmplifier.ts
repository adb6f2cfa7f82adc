/**
 * The fixed-scale thermocouple amplifier element: internal, linear cold-junction compensation α·t_c and a
 * fixed output scale. V_out = S·[(E(t_h) − E(t_c))/α + t_c], read as t = V_out/S; its nonlinearity against
 * ITS-90 is a computed error term that vanishes at t_h = t_c.
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { _invalidChoice, _requireFinite, _requireFiniteResult } from "../errors.js";
import { _compile, type CompiledType } from "../its90/compiled.js";
import { _emfFromTemperature } from "../its90/engine.js";
import { thermocoupleData } from "../its90/resolveType.js";
import { _optionalLimit, _requireObject, _requirePositive, _source, type _SourceContext } from "./_common.js";
import type { ChainErrorSource, FixedScaleAmplifierElement } from "./types.js";

function trimmedMillivoltsPerC(o: Record<string, unknown>, ct: CompiledType, context: string): number {
  if (o["trimmedMicrovoltsPerC"] === undefined) return _emfFromTemperature(ct, 25) / 25;
  return _requirePositive(o["trimmedMicrovoltsPerC"], "trimmedMicrovoltsPerC", "µV/°C", context) / 1000;
}

/**
 * The error of a fixed-scale amplifier's linear reading against ITS-90: t_ind − t_h with
 * t_ind = (E(t_h) − E(t_c))/α + t_c (no other error). Zero at t_h = t_c; grows as the secant slope of E
 * between t_c and t_h departs from α.
 * @param element - fixed-scale amplifier element (its `type` and `trimmedMicrovoltsPerC` are used)
 * @param hotJunctionC - hot-junction temperature, °C
 * @param coldJunctionC - cold-junction (die) temperature, °C
 * @returns nonlinearity error, °C
 * @throws HotjunctionRangeError outside the type's range; HotjunctionTypeError for a bad element
 * @example
 * ```ts
 * import { fixedScaleNonlinearityC } from "hotjunction";
 * const amp = { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, trimmedMicrovoltsPerC: 41.276 } as const;
 * console.log(fixedScaleNonlinearityC(amp, 25, 25)); // 0
 * console.log(fixedScaleNonlinearityC(amp, 1000, 0).toFixed(3)); // "-0.010"
 * ```
 */
export function fixedScaleNonlinearityC(
  element: FixedScaleAmplifierElement,
  hotJunctionC: number,
  coldJunctionC: number,
): number {
  const context = "fixed-scale amplifier";
  const o = _requireObject(element, "fixedScaleAmplifier", context);
  const ct = _compile(thermocoupleData(o["type"] as ThermocoupleType));
  const alpha = trimmedMillivoltsPerC(o, ct, context);
  const th = _requireFinite(hotJunctionC, "hot-junction temperature", "°C", context);
  const tc = _requireFinite(coldJunctionC, "cold-junction temperature", "°C", context);
  if (th === tc) return 0;
  return _requireFiniteResult((_emfFromTemperature(ct, th) - _emfFromTemperature(ct, tc)) / alpha + tc - th, "trimmedMicrovoltsPerC", alpha * 1000, "µV/°C", context);
}

/** @internal The fixed-scale amplifier stage of a compiled chain. */
export interface _FixedScaleStage {
  readonly sources: readonly ChainErrorSource[];
  /** Output scale, mV/°C. */
  readonly millivoltsPerC: number;
  /** Trimmed α, mV/°C. */
  readonly alphaMillivoltsPerC: number;
  /** The part's temperature error (stated accuracy + die-to-terminal difference) for the source values, °C. */
  extraC(x: Readonly<Record<string, number>>): number;
  /** Output, mV, from the thermocouple EMF (mV) and the die's cold-junction temperature (°C). */
  outputMillivolts(x: Readonly<Record<string, number>>, emfMillivolts: number, coldJunctionC: number): number;
  /** Inverse: the thermocouple EMF (mV) that gives an output (mV). */
  emfForOutput(x: Readonly<Record<string, number>>, outputMillivolts: number, coldJunctionC: number): number;
}

/** @internal Builds the stage: sources and transfer function. */
export function _fixedScaleStage(
  element: FixedScaleAmplifierElement,
  ct: CompiledType,
  ctx: _SourceContext,
  context: string,
): _FixedScaleStage {
  const o = _requireObject(element, "fixedScaleAmplifier", context);
  if (o["type"] !== ct.type) {
    return _invalidChoice("fixed-scale amplifier type", o["type"], [ct.type], `${context} (must match the thermocouple)`);
  }
  const scale = _requirePositive(o["millivoltsPerC"], "millivoltsPerC", "mV/°C", context);
  const alpha = trimmedMillivoltsPerC(o, ct, context);
  const accuracy = _optionalLimit(o["accuracyC"], "accuracyC", "°C", context);
  const gradient = _optionalLimit(o["isothermalGradientC"], "isothermalGradientC", "°C", context);
  // Same shape as the cold junction's sensor/gradient sources (deliberate: each element names its own sources).
  const sources: ChainErrorSource[] = [];
  if (accuracy > 0) {
    sources.push(_source(ctx, "fixedScaleAmplifier.accuracy", "fixedScaleAmplifier", "stated accuracy of the part", "°C", accuracy));
  }
  if (gradient > 0) {
    sources.push(
      _source(ctx, "fixedScaleAmplifier.isothermalGradient", "fixedScaleAmplifier", "die-to-terminal temperature difference", "°C", gradient),
    );
  }
  const ha = accuracy > 0;
  const hg = gradient > 0;
  const extraC = (x: Readonly<Record<string, number>>): number =>
    (ha ? (x["fixedScaleAmplifier.accuracy"] as number) : 0) + (hg ? (x["fixedScaleAmplifier.isothermalGradient"] as number) : 0);
  return {
    sources,
    millivoltsPerC: scale,
    alphaMillivoltsPerC: alpha,
    extraC,
    outputMillivolts: (x, emf, tc) => scale * (emf / alpha + tc + extraC(x)),
    emfForOutput: (x, out, tc) => (out / scale - tc - extraC(x)) * alpha,
  };
}
