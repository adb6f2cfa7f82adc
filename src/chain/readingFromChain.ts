/**
 * The deterministic reading of a chain at a hot-junction temperature, and the reading model whose output
 * is the temperature the chain indicates.
 * @module
 */
import { _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "../errors.js";
import type { Distribution } from "../uncertainty/types.js";
import { _requireObject } from "./_common.js";
import {
  _codeForVolts,
  _compileChain,
  _indicatedC,
  _meansRecord,
  _signalVolts,
  _sourcesAt,
  _coldJunctionC,
  type _CompiledChain,
} from "./_compileChain.js";
import { _readingEnclosure } from "./_readingEnclosure.js";
import type { ChainErrorSource, ChainModel, ChainReading, MeasurementChain } from "./types.js";

/** Options of {@link readingFromChain}. */
export interface ReadingFromChainOptions {
  /**
   * Values of named sources (in their units) to use instead of their means, e.g. a fault or a corner:
   * `{ "reference.initialAccuracy": 0.001, "ambient.coldJunctionC": 40 }`.
   */
  readonly sourceValues?: Readonly<Record<string, number>>;
}

/** Result of {@link readingFromChain}. */
export interface ReadingFromChainResult extends ChainReading {
  /** Temperature the chain's nominal conversion indicates for this reading, °C. */
  readonly indicatedC: number;
  /** Cold-junction temperature used, °C. */
  readonly coldJunctionC: number;
}

/** @internal Source values: means, with overrides checked by name. */
export function _sourceValues(
  cc: _CompiledChain,
  sources: readonly ChainErrorSource[],
  overrides: unknown,
): Record<string, number> {
  const x = _meansRecord(sources);
  if (overrides === undefined) return x;
  const o = _requireObject(overrides, "sourceValues", cc.context);
  for (const [name, value] of Object.entries(o)) {
    if (!(name in x)) {
      throw new HotjunctionRangeError({
        code: "UNKNOWN_NAME",
        quantity: "sourceValues key",
        value: name,
        context: cc.context,
        problem: "names no error source of this chain at this temperature",
        allowed: Object.keys(x),
      });
    }
    x[name] = _requireFinite(value, `source ${name}`, undefined, cc.context);
  }
  return x;
}

/**
 * The reading a chain produces at a hot-junction temperature, every source at its mean (the ambient at the
 * middle of its range) unless given in `sourceValues`: the detector-input voltage, the unrounded ADC code
 * (ADC chains), and the temperature the chain's nominal conversion indicates for it.
 * @param chain - the chain description
 * @param hotJunctionC - true hot-junction temperature, °C
 * @param options - `sourceValues` by source name
 * @returns volts (V), code (LSB, ADC chains), indicatedC (°C), coldJunctionC (°C)
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad chain, an unknown source name
 *   (`UNKNOWN_NAME`), or a temperature outside the thermocouple's tolerance range
 * @example
 * ```ts
 * import { readingFromChain } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
 *   detector: { kind: "comparator" },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * const r = readingFromChain(chain, 25);
 * console.log(r.volts.toFixed(3), r.indicatedC.toFixed(2)); // "0.125" "25.00"
 * ```
 */
export function readingFromChain(
  chain: MeasurementChain,
  hotJunctionC: number,
  options?: ReadingFromChainOptions,
): ReadingFromChainResult {
  const cc = _compileChain(chain);
  const t = _requireFinite(hotJunctionC, "hot-junction temperature", "°C", cc.context);
  const sources = _sourcesAt(cc, t);
  const x = _sourceValues(cc, sources, options === undefined ? undefined : _requireObject(options, "options", cc.context)["sourceValues"]);
  // finite stage figures (a gain of 1e308 mV/°C) can still give a signal past float64
  const volts = _requireFiniteResult(_signalVolts(cc, t, x), "hot-junction temperature", t, "°C", cc.context);
  const coldJunctionC = _coldJunctionC(cc, x);
  if (cc.adc !== undefined) {
    const code = _codeForVolts(cc, volts, x);
    return { volts, code, indicatedC: _indicatedC(cc, t, x), coldJunctionC };
  }
  return { volts, indicatedC: _indicatedC(cc, t, x), coldJunctionC };
}

/** @internal Reading model from a compiled chain. */
export function _readingModel(cc: _CompiledChain, hotJunctionC: number): ChainModel {
  const sources = _sourcesAt(cc, hotJunctionC);
  const inputs: Record<string, Distribution> = {};
  for (const s of sources) inputs[s.name] = s.distribution;
  const model = (x: Readonly<Record<string, number>>): number => _indicatedC(cc, hotJunctionC, x);
  // A source the enclosure does not account for (a new element) leaves the model without one.
  const { enclosure, accountsFor } = _readingEnclosure(cc, hotJunctionC);
  const complete = sources.every((s) => accountsFor.has(s.name));
  return { model, inputs, sources, nominalC: model(_meansRecord(sources)), ...(complete ? { enclosure } : {}) };
}

/**
 * The reading model of a chain at a hot-junction temperature: a function of the named source values whose
 * output is the temperature the chain indicates (°C), with the sources' distributions, ready for
 * `propagate(model, inputs, options)`. Allocation-free per call.
 * @param chain - the chain description
 * @param hotJunctionC - true hot-junction temperature, °C
 * @returns {@link ChainModel}: model, inputs, sources, nominalC (°C)
 * @throws as {@link readingFromChain}
 * @example
 * ```ts
 * import { chainReadingModel, propagate } from "hotjunction";
 * const chain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5 },
 *   detector: { kind: "adc", bits: 24, fullScaleVolts: 0.1 },
 *   ambient: { minC: 25, maxC: 25 },
 * } as const;
 * const m = chainReadingModel(chain, 500);
 * const worst = propagate(m.model, m.inputs, { method: "worst-case" });
 * console.log(worst.interval.map((v) => v.toFixed(2))); // [ '497.52', '502.48' ]
 * ```
 */
export function chainReadingModel(chain: MeasurementChain, hotJunctionC: number): ChainModel {
  const cc = _compileChain(chain);
  return _readingModel(cc, _requireFinite(hotJunctionC, "hot-junction temperature", "°C", cc.context));
}
