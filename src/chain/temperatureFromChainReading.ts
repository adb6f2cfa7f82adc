/**
 * The other way round: a raw reading (ADC code or detector-input volts) plus the chain gives the
 * hot-junction temperature with its bounds.
 * @module
 */
import { _requireFinite, HotjunctionRangeError } from "../errors.js";
import type { Distribution } from "../uncertainty/types.js";
import { _chainBounds, _checkBoundsOptions, type ChainBoundsOptions } from "./_chainBounds.js";
import { _requireObject } from "./_common.js";
import {
  _adcFullScale,
  _ambientInputName,
  _coldJunctionC,
  _compileChain,
  _hotFromVolts,
  _indicatedFromVolts,
  _meansRecord,
  _nominalVoltsForCode,
  _sourcesAt,
} from "./_compileChain.js";
import type { _AdcStage } from "./adc.js";
import type { _ColdJunctionStage } from "./coldJunction.js";
import type { ChainTemperatureResult, MeasurementChain } from "./types.js";

/** A raw reading: an ADC code (ADC chains) or the detector-input voltage. */
export type RawChainReading = { readonly code: number } | { readonly volts: number };

/** Options of {@link temperatureFromChainReading}. */
export interface TemperatureFromChainReadingOptions extends ChainBoundsOptions {
  /**
   * Software cold-junction compensation: the cold-junction sensor's reading, °C. Default: the middle of the
   * ambient range.
   */
  readonly coldJunctionSensorC?: number;
}

/**
 * Converts a raw reading into the hot-junction temperature by the chain's nominal conversion, and bounds
 * the true temperature consistent with that reading by each method (the actual chain inverted exactly for
 * every combination of source values; the observed code stands for any value within ±½ LSB).
 * @param chain - the chain description
 * @param reading - `{ code }` (ADC chains, LSB) or `{ volts }` (detector input, V)
 * @param options - coldJunctionSensorC (software compensation), and the bounds options of evaluateChain
 * @returns temperatureC (°C), bounds (°C; errors against temperatureC), contributions
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad chain or reading (a code on a comparator
 *   chain, a code outside 0…2ᴺ − 1, a reading whose EMF leaves the type's range)
 * @example
 * ```ts
 * import { temperatureFromChainReading } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.25 },
 *   amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } },
 *   detector: { kind: "adc", bits: 16, fullScaleVolts: 4.096 },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * const r = temperatureFromChainReading(chain, { code: 31430 }, { coldJunctionSensorC: 25 });
 * console.log(r.temperatureC.toFixed(1)); // "500.0"
 * ```
 */
export function temperatureFromChainReading(
  chain: MeasurementChain,
  reading: RawChainReading,
  options?: TemperatureFromChainReadingOptions,
): ChainTemperatureResult {
  const cc = _compileChain(chain);
  const context = `${cc.context}, reading`;
  const r = _requireObject(reading, "reading", context);
  const opts = _checkBoundsOptions(options, "temperatureFromChainReading");
  const sensorC =
    options?.coldJunctionSensorC === undefined
      ? cc.ambientCenterC
      : _requireFinite(options.coldJunctionSensorC, "coldJunctionSensorC", "°C", context);
  let code: number | undefined;
  let volts: number;
  if (r["code"] !== undefined) {
    const adc = cc.adc;
    if (adc === undefined) {
      throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "reading code", value: r["code"], context, problem: "is given for a chain without an ADC; give { volts }" });
    }
    code = _requireFinite(r["code"], "reading code", "LSB", context);
    if (code < 0 || code > adc.codes - 1) {
      throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "reading code", value: code, min: 0, max: adc.codes - 1, unit: "LSB", context });
    }
    volts = _nominalVoltsForCode(cc, code);
  } else {
    volts = _requireFinite(r["volts"], "reading volts", "V", context);
  }
  const software = cc.coldJunction?.method === "software";
  const nominalC = _indicatedFromVolts(cc, volts, sensorC);
  let sources = _sourcesAt(cc, nominalC);
  // With software compensation the cold junction is known from the sensor; the ambient is not an input.
  if (software) sources = sources.filter((s) => s.name !== _ambientInputName);
  if (code === undefined) sources = sources.filter((s) => s.element !== "adc");
  const inputs: Record<string, Distribution> = {};
  for (const s of sources) inputs[s.name] = s.distribution;
  const adc = cc.adc as _AdcStage | undefined;
  const cj = cc.coldJunction as _ColdJunctionStage | undefined;
  const observedCode = code;
  const model = (x: Readonly<Record<string, number>>): number => {
    const v =
      observedCode !== undefined && adc !== undefined
        ? adc.voltsForCode(x, observedCode, _adcFullScale(cc, x), cc.adcFullScaleVolts)
        : volts;
    const tc = software ? sensorC - (cj as _ColdJunctionStage).errorC(x) : _coldJunctionC(cc, x);
    return _hotFromVolts(cc, v, x, tc);
  };
  const cm = { model, inputs, sources, nominalC: model(_meansRecord(sources)) };
  const { bounds, contributions } = _chainBounds(cm, nominalC, opts);
  return { temperatureC: nominalC, bounds, contributions };
}
