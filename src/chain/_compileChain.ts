/**
 * Compiles a chain description once into its element stages and the hot transfer functions the chain
 * models run (allocation-free: they read source values from the record by precomputed names).
 * @module
 * @internal
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { HotjunctionRangeError, _invalidChoice } from "../errors.js";
import { _compile, type CompiledType } from "../its90/compiled.js";
import { _emfFromTemperature, _temperatureFromEmf } from "../its90/engine.js";
import { thermocoupleData } from "../its90/resolveType.js";
import { _numberRecord } from "../uncertainty/_prepare.js";
import { rectangular } from "../uncertainty/rectangular.js";
import { _checkAmbient, _requireObject, _requirePositive, type _SourceContext } from "./_common.js";
import { _adcStage, type _AdcStage } from "./adc.js";
import { _amplifierStage, _unityAmplifierStage, type _AmplifierStage } from "./amplifier.js";
import { _coldJunctionStage, type _ColdJunctionStage } from "./coldJunction.js";
import { _comparatorStage, type _ComparatorStage } from "./comparator.js";
import { _dividerStage, type _DividerStage } from "./divider.js";
import { _fixedScaleStage, type _FixedScaleStage } from "./fixedScaleAmplifier.js";
import { _referenceStage, type _ReferenceStage } from "./reference.js";
import { _checkThermocouple, _thermocoupleSources } from "./thermocouple.js";
import { _wireStage, type _WireStage, type WireDescription } from "./wire/wireStage.js";
import type {
  AdcElement,
  AmbientRange,
  AmplifierElement,
  ChainErrorSource,
  ComparatorElement,
  DividerElement,
  FixedScaleAmplifierElement,
  MeasurementChain,
  ReferenceElement,
  ThermocoupleElement,
} from "./types.js";

/** Name of the ambient (cold-junction temperature) input. */
export const _ambientInputName = "ambient.coldJunctionC";

type Inputs = Readonly<Record<string, number>>;

/** @internal A compiled chain. */
export interface _CompiledChain {
  readonly chain: MeasurementChain;
  readonly context: string;
  readonly type: ThermocoupleType;
  readonly ct: CompiledType;
  readonly thermocouple: ThermocoupleElement;
  readonly ambient: AmbientRange;
  readonly ctx: _SourceContext;
  readonly coldJunction: _ColdJunctionStage | undefined;
  readonly amplifier: _AmplifierStage;
  readonly fixedScale: _FixedScaleStage | undefined;
  readonly reference: _ReferenceStage | undefined;
  readonly divider: _DividerStage | undefined;
  readonly comparator: _ComparatorStage | undefined;
  readonly adc: _AdcStage | undefined;
  /** Nominal ADC full scale, V. */
  readonly adcFullScaleVolts: number;
  /** Whether the ADC's full scale is the chain's reference. */
  readonly adcUsesReference: boolean;
  /** Whether the ambient is an input (range wider than a point). */
  readonly hasAmbientInput: boolean;
  /** Ambient source, when an input. */
  readonly ambientSource: ChainErrorSource | undefined;
  /** Ambient mean (center of the range), °C. */
  readonly ambientCenterC: number;
  /** Every source that does not depend on the hot-junction temperature, in listing order. */
  readonly fixedSources: readonly ChainErrorSource[];
  /** The wire between the probe and the amplifier input, when the chain has one. */
  readonly wire: _WireStage | undefined;
  /**
   * Names of the wire's range sources (a cable junction's or a connector's temperature anywhere in a range):
   * their values are temperatures, not deviations, and nominal records take them at their means.
   */
  readonly wireRangeNames: ReadonlySet<string>;
}

/**
 * @internal Stages already built for the chain's own elements, used instead of building them again (so a
 * source is computed once on its way from the design file to the trip band). A prebuilt stage must come
 * from the same element, ambient and `sourceDistributions` as the chain.
 */
export interface _PrebuiltStages {
  readonly reference?: _ReferenceStage;
}

/** @internal Compiles and checks a chain. */
export function _compileChain(chain: MeasurementChain, prebuilt?: _PrebuiltStages): _CompiledChain {
  const context = "measurement chain";
  const o = _requireObject(chain, "chain", context);
  const thermocouple = _checkThermocouple(o["thermocouple"], `${context}, thermocouple`);
  const type = thermocouple.type;
  const ct = _compile(thermocoupleData(type));
  const ambient = _checkAmbient(o["ambient"], `${context}, ambient`);
  if (o["sourceDistributions"] !== undefined) _requireObject(o["sourceDistributions"], "sourceDistributions", context);
  const ctx: _SourceContext = { overrides: chain.sourceDistributions };

  const amp = o["amplifier"] as AmplifierElement | FixedScaleAmplifierElement | undefined;
  let amplifier = _unityAmplifierStage;
  let fixedScale: _FixedScaleStage | undefined;
  if (amp !== undefined) {
    const kind = _requireObject(amp, "amplifier", context)["kind"];
    if (kind === "amplifier") amplifier = _amplifierStage(amp as AmplifierElement, ambient, ctx, `${context}, amplifier`);
    else if (kind === "fixedScaleAmplifier") {
      fixedScale = _fixedScaleStage(amp as FixedScaleAmplifierElement, ct, ctx, `${context}, fixed-scale amplifier`);
    } else _invalidChoice("amplifier kind", kind, ["amplifier", "fixedScaleAmplifier"], context);
  }

  let coldJunction: _ColdJunctionStage | undefined;
  if (o["coldJunction"] !== undefined) {
    if (fixedScale !== undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "coldJunction",
        value: _requireObject(o["coldJunction"], "coldJunction", context)["method"],
        context,
        problem: "is given with a fixed-scale amplifier, which compensates internally; remove one",
      });
    }
    coldJunction = _coldJunctionStage(chain.coldJunction as NonNullable<MeasurementChain["coldJunction"]>, ct, ctx, `${context}, cold junction`);
  } else if (fixedScale === undefined) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "coldJunction",
      value: undefined,
      context,
      problem: "is missing (required unless the amplifier is a fixed-scale amplifier)",
    });
  }

  const reference =
    o["reference"] === undefined
      ? undefined
      : (prebuilt?.reference ?? _referenceStage(o["reference"] as ReferenceElement, ambient, ctx, `${context}, reference`));

  const { comparator, adc, divider, adcFullScaleVolts, adcUsesReference } = detectorStages(o, reference, coldJunction, ambient, ctx, context);

  const wire = o["wire"] === undefined ? undefined : _wireStage(o["wire"] as WireDescription, type, ambient, ctx, `${context}, wire`);
  if (wire !== undefined) checkWireAgainstChain(o, wire, context);
  const wireRangeNames = new Set<string>();
  for (const s of wire?.fixedSources ?? []) if (/\.(junctionTemperature|temperature|aboveColdJunction)$/.test(s.name)) wireRangeNames.add(s.name);

  const ambientCenterC = (ambient.minC + ambient.maxC) / 2;
  const hasAmbientInput = ambient.maxC > ambient.minC;
  const ambientSource: ChainErrorSource | undefined = hasAmbientInput
    ? {
        name: _ambientInputName,
        element: "ambient",
        description: "cold-junction (terminal) temperature anywhere in the ambient range",
        unit: "°C",
        limit: (ambient.maxC - ambient.minC) / 2,
        distribution: rectangular({ lower: ambient.minC, upper: ambient.maxC }),
      }
    : undefined;
  // Every temperature the cold junction can take must be inside the type's range.
  _emfFromTemperature(ct, ambient.minC);
  _emfFromTemperature(ct, ambient.maxC);

  const fixedSources: ChainErrorSource[] = [
    ...(wire?.fixedSources ?? []),
    ...(coldJunction?.sources ?? []),
    ...amplifier.sources,
    ...(fixedScale?.sources ?? []),
    ...(reference?.sources ?? []),
    ...(divider?.sources ?? []),
    ...(comparator?.sources ?? []),
    ...(adc?.sources ?? []),
  ];
  if (ambientSource !== undefined) fixedSources.push(ambientSource);
  checkOverrideNames(chain, fixedSources, wire?.ageing !== undefined, context);

  return {
    chain,
    context,
    type,
    ct,
    thermocouple,
    ambient,
    ctx,
    coldJunction,
    amplifier,
    fixedScale,
    reference,
    divider,
    comparator,
    adc,
    adcFullScaleVolts,
    adcUsesReference,
    hasAmbientInput,
    ambientSource,
    ambientCenterC,
    fixedSources,
    wire,
    wireRangeNames,
  };
}

/**
 * The wire must not state a physical effect the chain already models: the amplifier's bias current through
 * its source resistance is the loop's bias offset, and an isothermal gradient at the instrument's terminals
 * is a terminating connector of copper there. Either is refused with the way to state it once.
 */
function checkWireAgainstChain(o: Record<string, unknown>, wire: _WireStage, context: string): void {
  const amp = o["amplifier"] as Record<string, unknown> | undefined;
  if (wire.loop !== undefined && amp !== undefined && amp["kind"] === "amplifier") {
    const bias = amp["biasCurrentNanoamps"];
    const r = amp["sourceResistanceOhms"];
    if (typeof bias === "number" && bias > 0 && typeof r === "number" && r > 0) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "amplifier.sourceResistanceOhms",
        value: r,
        context,
        problem:
          "is given together with wire.loop: the bias current through the loop is counted once; state it as wire.loop.biasCurrentNanoamps (the loop's resistance is computed there) and drop amplifier.sourceResistanceOhms",
      });
    }
  }
  if (wire.connectors.some((c) => c.arrangement === "terminates")) {
    for (const [slot, el] of [
      ["coldJunction", o["coldJunction"]],
      ["amplifier", o["amplifier"]],
    ] as const) {
      const g = (el as Record<string, unknown> | undefined)?.["isothermalGradientC"];
      if (typeof g === "number" && g > 0) {
        throw new HotjunctionRangeError({
          code: "INVALID_DESIGN",
          quantity: `${slot}.isothermalGradientC`,
          value: g,
          context,
          problem:
            "is given together with a terminating connector in wire.connectors: both describe the temperature of the terminals against the cold-junction sensor; state it once (the connector's aboveColdJunctionC, or the gradient without the connector)",
        });
      }
    }
  }
}

/** The detector's stages (comparator with its divider, or ADC with its full scale), checked against the chain. */
function detectorStages(
  o: Record<string, unknown>,
  reference: _ReferenceStage | undefined,
  coldJunction: _ColdJunctionStage | undefined,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): {
  comparator: _ComparatorStage | undefined;
  adc: _AdcStage | undefined;
  divider: _DividerStage | undefined;
  adcFullScaleVolts: number;
  adcUsesReference: boolean;
} {
  const det = _requireObject(o["detector"], "detector", context);
  let comparator: _ComparatorStage | undefined;
  let adc: _AdcStage | undefined;
  let divider: _DividerStage | undefined;
  let adcFullScaleVolts = Number.NaN;
  let adcUsesReference = false;
  if (det["kind"] === "comparator") {
    comparator = _comparatorStage(det as unknown as ComparatorElement, ctx, `${context}, comparator`);
    if (reference === undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "reference",
        value: undefined,
        context,
        problem: "is missing: a comparator chain takes its threshold from the reference (× divider tap)",
      });
    }
    if (coldJunction?.method === "software") {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "cold-junction method",
        value: "software",
        context,
        problem: "cannot serve a comparator: software compensation happens after an ADC; use hardware compensation or a fixed-scale amplifier",
      });
    }
    if (o["divider"] !== undefined) {
      divider = _dividerStage(o["divider"] as DividerElement, ambient, ctx, `${context}, divider`);
    }
  } else if (det["kind"] === "adc") {
    adc = _adcStage(det as unknown as AdcElement, ctx, `${context}, ADC`);
    if (o["divider"] !== undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "divider",
        value: "divider",
        context,
        problem: "belongs to comparator chains (threshold taps); an ADC chain has none",
      });
    }
    if (det["fullScaleVolts"] !== undefined) {
      adcFullScaleVolts = _requirePositive(det["fullScaleVolts"], "ADC fullScaleVolts", "V", context);
    } else if (reference !== undefined) {
      adcFullScaleVolts = reference.nominalVolts;
      adcUsesReference = true;
    } else {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "ADC full scale",
        value: undefined,
        context,
        problem: "is unknown: give detector.fullScaleVolts or a chain reference",
      });
    }
  } else {
    _invalidChoice("detector kind", det["kind"], ["comparator", "adc"], context);
  }

  return { comparator, adc, divider, adcFullScaleVolts, adcUsesReference };
}

/** Every `sourceDistributions` key must name a source of the chain (or the thermocouple tolerance). */
function checkOverrideNames(chain: MeasurementChain, fixedSources: readonly ChainErrorSource[], hasAgeing: boolean, context: string): void {
  const seen = new Set<string>();
  for (const s of fixedSources) seen.add(s.name);
  if (hasAgeing) seen.add("probe.ageing");
  for (const name of Object.keys(chain.sourceDistributions ?? {})) {
    if (!seen.has(name) && name !== "thermocouple.tolerance") {
      throw new HotjunctionRangeError({
        code: "UNKNOWN_NAME",
        quantity: "sourceDistributions key",
        value: name,
        context,
        problem: "names no error source of this chain",
        allowed: ["thermocouple.tolerance", ...seen],
      });
    }
  }

}

/** @internal All sources at a hot-junction temperature, in listing order. */
export function _sourcesAt(cc: _CompiledChain, hotJunctionC: number): ChainErrorSource[] {
  return [
    ..._thermocoupleSources(cc.thermocouple, hotJunctionC, cc.ctx),
    ...(cc.wire?.ageing?.sourcesAt(hotJunctionC) ?? []),
    ...cc.fixedSources,
  ];
}

/** @internal Record of every source's mean. */
export function _meansRecord(sources: readonly ChainErrorSource[]): Record<string, number> {
  return _numberRecord(
    sources.map((s) => s.name),
    (i) => (sources[i] as ChainErrorSource).distribution.mean,
  );
}

/**
 * @internal Record of every source at 0 deviation, the ambient (when an input) at `coldJunctionC` (default
 * the center of its range) and the wire's range sources (a cable junction's or a connector's temperature:
 * values, not deviations) at their means: for nominal designs. The wire's known effects (a connector at a
 * stated temperature, the nominal detection-current offset) are thus in the nominal chain; its tolerances,
 * leakage and ageing are not.
 */
export function _zeroRecord(
  cc: _CompiledChain,
  sources: readonly ChainErrorSource[],
  coldJunctionC: number = cc.ambientCenterC,
): Record<string, number> {
  return _numberRecord(
    sources.map((s) => s.name),
    (i) => {
      const s = sources[i] as ChainErrorSource;
      return s.name === _ambientInputName ? coldJunctionC : cc.wireRangeNames.has(s.name) ? s.distribution.mean : 0;
    },
  );
}

/**
 * @internal The probe's ageing drift (°C at the hot junction) when it is a source; read with `in` like the
 * tolerance (a nominal record made from the fixed sources has none).
 */
function ageingValue(x: Inputs): number {
  return "probe.ageing" in x ? (x["probe.ageing"] as number) : 0;
}

/**
 * @internal The thermocouple's deviation (°C) when it is a source. Checked with `in` so that a model that
 * has no tolerance source never reads the name (propagate flags reads of unknown names).
 */
export function _toleranceValue(x: Inputs): number {
  return "thermocouple.tolerance" in x ? (x["thermocouple.tolerance"] as number) : 0;
}

/** @internal Cold-junction temperature for the source values, °C. */
export function _coldJunctionC(cc: _CompiledChain, x: Inputs): number {
  return cc.hasAmbientInput ? (x[_ambientInputName] as number) : cc.ambient.minC;
}

/** @internal Actual ADC full scale for the source values, V. */
export function _adcFullScale(cc: _CompiledChain, x: Inputs): number {
  return cc.adcUsesReference ? (cc.reference as _ReferenceStage).volts(x) : cc.adcFullScaleVolts;
}

/**
 * @internal First node of the signal path: the EMF at the amplifier input. Without a wire it is the
 * thermocouple's, E(t_h + ε) − E(t_c), with ε the thermocouple tolerance in the source values (0 when it is
 * no source). With a wire: s·[E(t_h + ε + a) − E(t_c)] + ΔE_cable + ΣΔE_connector + V_loop, with a the
 * ageing drift and s the leakage factor (see `chain/wire/wireStage.ts`), mV.
 */
export function _junctionEmfMillivolts(cc: _CompiledChain, hotJunctionC: number, x: Inputs, coldJunctionC: number): number {
  const w = cc.wire;
  if (w === undefined) return _emfFromTemperature(cc.ct, hotJunctionC + _toleranceValue(x)) - _emfFromTemperature(cc.ct, coldJunctionC);
  const tip = _emfFromTemperature(cc.ct, hotJunctionC + _toleranceValue(x) + ageingValue(x)) - _emfFromTemperature(cc.ct, coldJunctionC);
  return w.emfScale(x) * tip + w.addedEmfMillivolts(x, coldJunctionC);
}

/** @internal Second node: the hardware compensation voltage added before the amplifier (0 without one), mV. */
export function _compensationMillivolts(cc: _CompiledChain, x: Inputs, coldJunctionC: number): number {
  const cj = cc.coldJunction;
  return cj !== undefined && cj.method === "hardware" ? cj.compensationMillivolts(x, coldJunctionC) : 0;
}

/**
 * @internal Third node: the front end's output for its input (thermocouple EMF, plus the compensation before
 * a voltage amplifier), with the amplifier's gain and offset or the fixed-scale transfer; no rails, V.
 */
export function _frontEndVolts(cc: _CompiledChain, inputMillivolts: number, x: Inputs, coldJunctionC: number): number {
  if (cc.fixedScale !== undefined) return cc.fixedScale.outputMillivolts(x, inputMillivolts, coldJunctionC) / 1000;
  return (cc.amplifier.gain(x) * (inputMillivolts + cc.amplifier.inputOffsetMillivolts(x))) / 1000;
}

/** @internal Detector-input voltage at a hot-junction temperature for the source values, V. */
export function _signalVolts(cc: _CompiledChain, hotJunctionC: number, x: Inputs): number {
  const tc = _coldJunctionC(cc, x);
  let emf = _junctionEmfMillivolts(cc, hotJunctionC, x, tc);
  if (cc.coldJunction?.method === "hardware") emf += cc.coldJunction.compensationMillivolts(x, tc);
  return _frontEndVolts(cc, emf, x, tc);
}

/** @internal Unrounded ADC code for a detector-input voltage. */
export function _codeForVolts(cc: _CompiledChain, volts: number, x: Inputs): number {
  const adc = cc.adc as _AdcStage;
  return adc.code(x, volts, _adcFullScale(cc, x), cc.adcFullScaleVolts);
}

/**
 * @internal The temperature the chain's nominal conversion indicates for a detector-input voltage: the
 * firmware or user inverts the nominal chain (fixed-scale: V/S; software compensation adds E of the
 * sensor's reading `sensorC`).
 */
export function _indicatedFromVolts(cc: _CompiledChain, volts: number, sensorC: number): number {
  if (cc.fixedScale !== undefined) return (volts * 1000) / cc.fixedScale.millivoltsPerC;
  const emf = (volts * 1000) / cc.amplifier.nominalGain;
  const cj = cc.coldJunction as _ColdJunctionStage;
  if (cj.method === "software") return _temperatureFromEmf(cc.ct, emf + _emfFromTemperature(cc.ct, sensorC));
  return _temperatureFromEmf(cc.ct, emf);
}

/** @internal Nominal voltage for an ADC code (inverse of an ideal ADC). */
export function _nominalVoltsForCode(cc: _CompiledChain, code: number): number {
  return (code * cc.adcFullScaleVolts) / (cc.adc as _AdcStage).codes;
}

/** @internal Reading model: indicated temperature for a true hot-junction temperature and source values. */
export function _indicatedC(cc: _CompiledChain, hotJunctionC: number, x: Inputs): number {
  let volts = _signalVolts(cc, hotJunctionC, x);
  if (cc.adc !== undefined) volts = _nominalVoltsForCode(cc, _codeForVolts(cc, volts, x));
  const sensorC = cc.coldJunction?.method === "software" ? _coldJunctionC(cc, x) + cc.coldJunction.errorC(x) : 0;
  return _indicatedFromVolts(cc, volts, sensorC);
}

/**
 * @internal The parts of {@link _indicatedC} that do not depend on the hot-junction temperature, for a chain without
 * a wire, into `out[at…at + 6]`: cold junction °C, its EMF, hardware compensation mV, gain, input offset mV, ADC full
 * scale V, EMF of the sensor's reading. {@link _indicatedCFromParts} then gives `_indicatedC`'s bits at any
 * temperature (the same operations on the same values).
 */
export function _indicatedParts(cc: _CompiledChain, x: Inputs, out: Float64Array, at: number): void {
  const tc = _coldJunctionC(cc, x);
  const cj = cc.coldJunction;
  out[at] = tc;
  out[at + 1] = _emfFromTemperature(cc.ct, tc);
  out[at + 2] = cj !== undefined && cj.method === "hardware" ? cj.compensationMillivolts(x, tc) : 0;
  out[at + 3] = cc.fixedScale === undefined ? cc.amplifier.gain(x) : 0;
  out[at + 4] = cc.fixedScale === undefined ? cc.amplifier.inputOffsetMillivolts(x) : 0;
  out[at + 5] = cc.adc !== undefined ? _adcFullScale(cc, x) : 0;
  out[at + 6] = cc.fixedScale === undefined && cj !== undefined && cj.method === "software" ? _emfFromTemperature(cc.ct, tc + cj.errorC(x)) : 0;
}

/** @internal {@link _indicatedC} of a chain without a wire from its {@link _indicatedParts} (at `parts[at…]`). */
export function _indicatedCFromParts(cc: _CompiledChain, hotJunctionC: number, x: Inputs, parts: Float64Array, at: number): number {
  const cj = cc.coldJunction;
  let emf = _emfFromTemperature(cc.ct, hotJunctionC + _toleranceValue(x)) - (parts[at + 1] as number);
  if (cj?.method === "hardware") emf += parts[at + 2] as number;
  let volts =
    cc.fixedScale !== undefined
      ? cc.fixedScale.outputMillivolts(x, emf, parts[at] as number) / 1000
      : ((parts[at + 3] as number) * (emf + (parts[at + 4] as number))) / 1000;
  const adc = cc.adc;
  if (adc !== undefined) volts = (adc.code(x, volts, parts[at + 5] as number, cc.adcFullScaleVolts) * cc.adcFullScaleVolts) / adc.codes;
  if (cc.fixedScale !== undefined) return (volts * 1000) / cc.fixedScale.millivoltsPerC;
  const e = (volts * 1000) / cc.amplifier.nominalGain;
  return _temperatureFromEmf(cc.ct, cj?.method === "software" ? e + (parts[at + 6] as number) : e);
}

/**
 * @internal Inverse of the actual chain: the true hot-junction temperature that gives a detector-input
 * voltage for the source values, with the cold junction at `coldJunctionC`.
 */
export function _hotFromVolts(cc: _CompiledChain, volts: number, x: Inputs, coldJunctionC: number): number {
  let emf: number;
  if (cc.fixedScale !== undefined) emf = cc.fixedScale.emfForOutput(x, volts * 1000, coldJunctionC);
  else {
    emf = (volts * 1000) / cc.amplifier.gain(x) - cc.amplifier.inputOffsetMillivolts(x);
    const cj = cc.coldJunction as _ColdJunctionStage;
    if (cj.method === "hardware") emf -= cj.compensationMillivolts(x, coldJunctionC);
  }
  const eps = _toleranceValue(x);
  const w = cc.wire;
  if (w === undefined) return _temperatureFromEmf(cc.ct, emf + _emfFromTemperature(cc.ct, coldJunctionC)) - eps;
  const tip = (emf - w.addedEmfMillivolts(x, coldJunctionC)) / w.emfScale(x);
  return _temperatureFromEmf(cc.ct, tip + _emfFromTemperature(cc.ct, coldJunctionC)) - eps - ageingValue(x);
}

/** @internal Actual switching voltage of a comparator tap (threshold + offset + hysteresis part), V. */
export function _switchingVolts(cc: _CompiledChain, x: Inputs, tap: number, edgeMillivolts: number): number {
  const ref = (cc.reference as _ReferenceStage).volts(x);
  const k = cc.divider === undefined ? 1 : cc.divider.ratio(x, tap);
  return ref * k + (cc.comparator as _ComparatorStage).switchingOffsetVolts(x, edgeMillivolts);
}
