/**
 * The amplifier element: gain from two resistors (tolerance, tempco) or a fixed gain with its gain error
 * and drift; input offset and its drift over the ambient range; bias current times source resistance.
 * Transfer function: V_out = G·(V_in + V_os), with G = 1 + R_f/R_g for a resistor-set gain.
 * @module
 */
import { _invalidChoice, _requireFiniteResult } from "../errors.js";
import { _ambientFromReferenceC, _optionalLimit, _requireFraction, _requireObject, _requirePositive, _source, type _SourceContext } from "./_common.js";
import type { AmbientRange, AmplifierElement, ChainErrorSource, FixedGain, ResistorGain } from "./types.js";

/**
 * The nominal gain of an amplifier element: 1 + R_f/R_g for a resistor-set gain, or the fixed gain.
 * @param element - amplifier element
 * @returns gain, V/V
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad element
 * @example
 * ```ts
 * import { amplifierGain } from "hotjunction";
 * const amp = { kind: "amplifier", gain: { setBy: "resistors", feedbackOhms: 100000, groundOhms: 1000, toleranceFraction: 0.001 } } as const;
 * console.log(amplifierGain(amp)); // 101
 * ```
 */
export function amplifierGain(element: AmplifierElement): number {
  const context = "amplifier";
  const o = _requireObject(element, "amplifier", context);
  const g = _requireObject(o["gain"], "gain", context);
  if (g["setBy"] === "resistors") {
    const rf = _requirePositive(g["feedbackOhms"], "feedbackOhms", "Ω", context);
    const rg = _requirePositive(g["groundOhms"], "groundOhms", "Ω", context);
    return _requireFiniteResult(1 + rf / rg, "gain from feedbackOhms / groundOhms", rf / rg, undefined, context);
  }
  if (g["setBy"] === "fixed") return _requirePositive(g["gain"], "gain", "V/V", context);
  return _invalidChoice("gain setBy", g["setBy"], ["resistors", "fixed"], context);
}

/** @internal The amplifier stage of a compiled chain. */
export interface _AmplifierStage {
  readonly sources: readonly ChainErrorSource[];
  readonly nominalGain: number;
  /** Actual gain for the source values, V/V. */
  gain(x: Readonly<Record<string, number>>): number;
  /** Input-referred offset (offset + drift + bias·R), mV. */
  inputOffsetMillivolts(x: Readonly<Record<string, number>>): number;
}

/** @internal Unity stage (no amplifier). */
export const _unityAmplifierStage: _AmplifierStage = {
  sources: [],
  nominalGain: 1,
  gain: () => 1,
  inputOffsetMillivolts: () => 0,
};

/** @internal Builds the stage: sources and transfer function. */
export function _amplifierStage(
  element: AmplifierElement,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): _AmplifierStage {
  const o = _requireObject(element, "amplifier", context);
  const nominalGain = amplifierGain(element);
  const fromRefC = _ambientFromReferenceC(ambient);
  const sources: ChainErrorSource[] = [];
  const add = (name: string, description: string, unit: "fraction" | "µV", limit: number): boolean => {
    if (limit > 0) sources.push(_source(ctx, name, "amplifier", description, unit, limit));
    return limit > 0;
  };
  let gain: (x: Readonly<Record<string, number>>) => number;
  const g = o["gain"] as ResistorGain | FixedGain;
  if (g.setBy === "resistors") {
    const tol = _requireFraction(g.toleranceFraction, "gain resistor toleranceFraction", context);
    const tempco = (_optionalLimit(g.tempcoPpmPerC, "gain resistor tempcoPpmPerC", "ppm/°C", context) * fromRefC) / 1e6;
    const ratio = g.feedbackOhms / g.groundOhms;
    const hf = add("amplifier.feedbackTolerance", "feedback resistor tolerance", "fraction", tol);
    const hg = add("amplifier.groundTolerance", "ground resistor tolerance", "fraction", tol);
    const hft = add("amplifier.feedbackTempco", "feedback resistor tempco over the ambient range", "fraction", tempco);
    const hgt = add("amplifier.groundTempco", "ground resistor tempco over the ambient range", "fraction", tempco);
    gain = (x) => {
      const f = 1 + (hf ? (x["amplifier.feedbackTolerance"] as number) : 0) + (hft ? (x["amplifier.feedbackTempco"] as number) : 0);
      const r = 1 + (hg ? (x["amplifier.groundTolerance"] as number) : 0) + (hgt ? (x["amplifier.groundTempco"] as number) : 0);
      return 1 + (ratio * f) / r;
    };
  } else {
    const err = g.gainErrorFraction === undefined ? 0 : _requireFraction(g.gainErrorFraction, "gainErrorFraction", context);
    const drift = (_optionalLimit(g.gainDriftPpmPerC, "gainDriftPpmPerC", "ppm/°C", context) * fromRefC) / 1e6;
    const he = add("amplifier.gainError", "gain error", "fraction", err);
    const hd = add("amplifier.gainDrift", "gain drift over the ambient range", "fraction", drift);
    gain = (x) =>
      nominalGain * (1 + (he ? (x["amplifier.gainError"] as number) : 0) + (hd ? (x["amplifier.gainDrift"] as number) : 0));
  }
  const offset = _optionalLimit(o["offsetMicrovolts"], "offsetMicrovolts", "µV", context);
  const drift = _optionalLimit(o["offsetDriftMicrovoltsPerC"], "offsetDriftMicrovoltsPerC", "µV/°C", context) * fromRefC;
  const biasNa = _optionalLimit(o["biasCurrentNanoamps"], "biasCurrentNanoamps", "nA", context);
  const sourceOhms = _optionalLimit(o["sourceResistanceOhms"], "sourceResistanceOhms", "Ω", context);
  const bias = (biasNa * sourceOhms) / 1000; // nA·Ω = nV; /1000 → µV
  const ho = add("amplifier.offset", "input offset voltage", "µV", offset);
  const hd = add("amplifier.offsetDrift", "input offset drift over the ambient range", "µV", drift);
  const hb = add("amplifier.biasCurrent", "bias current through the source resistance", "µV", bias);
  return {
    sources,
    nominalGain,
    gain,
    inputOffsetMillivolts: (x) =>
      ((ho ? (x["amplifier.offset"] as number) : 0) +
        (hd ? (x["amplifier.offsetDrift"] as number) : 0) +
        (hb ? (x["amplifier.biasCurrent"] as number) : 0)) /
      1000,
  };
}
