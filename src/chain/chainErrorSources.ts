/**
 * The named error sources of a chain at a hot-junction temperature.
 * @module
 */
import { _requireFinite } from "../errors.js";
import { _compileChain, _sourcesAt } from "./_compileChain.js";
import type { ChainErrorSource, MeasurementChain } from "./types.js";

/**
 * Lists every error source of a chain at a hot-junction temperature, in a fixed order (thermocouple,
 * cold junction, amplifier, reference, divider, detector, ambient) that does not depend on the key order of
 * the description. Each source is a zero-mean deviation in its own unit (°C, µV, mV, fraction, LSB) with
 * its distribution: rectangular over the stated ± limit unless `sourceDistributions` overrides it. The
 * ambient source `"ambient.coldJunctionC"` is the cold-junction temperature itself (rectangular over the
 * ambient range). Sources with a zero limit are left out.
 * @param chain - the chain description
 * @param hotJunctionC - hot-junction temperature, °C (sets the thermocouple tolerance)
 * @returns the sources
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad description (naming the element and field)
 *   or a temperature outside the tolerance statement's range
 * @example
 * ```ts
 * import { chainErrorSources } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5 },
 *   amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100, gainErrorFraction: 0.001 } },
 *   detector: { kind: "adc", bits: 16, fullScaleVolts: 5 },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * console.log(chainErrorSources(chain, 800).map((s) => s.name).join(" ")); // "thermocouple.tolerance coldJunction.sensorAccuracy amplifier.gainError adc.quantization"
 * ```
 */
export function chainErrorSources(chain: MeasurementChain, hotJunctionC: number): ChainErrorSource[] {
  const cc = _compileChain(chain);
  return _sourcesAt(cc, _requireFinite(hotJunctionC, "hot-junction temperature", "°C", cc.context));
}
