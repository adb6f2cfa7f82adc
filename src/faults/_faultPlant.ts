/**
 * The fault review's view of a trip chain: the chain's own compiled signal path (`chain/_compileChain`)
 * evaluated with every error source at its nominal value, node by node (thermocouple EMF → compensation →
 * amplifier input → amplifier output → detector, with the reference and threshold), so that a fault can
 * replace any node or transform any stage. What the review adds to the chain is only what a fault needs:
 * the amplifier's rails, resistors that open or short (a changed amplifier gain or divider), an open
 * reference, a dead board, and an ideal converter reading against the (possibly faulted) reference.
 * @module
 * @internal
 */
import {
  _compensationMillivolts,
  _compileChain,
  _frontEndVolts,
  _junctionEmfMillivolts,
  _zeroRecord,
  type _CompiledChain,
} from "../chain/_compileChain.js";
import type { _AdcStage } from "../chain/adc.js";
import type { _AmplifierStage } from "../chain/amplifier.js";
import type { _ComparatorStage } from "../chain/comparator.js";
import type { MeasurementChain, ResistorGain } from "../chain/types.js";
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { HotjunctionRangeError } from "../errors.js";
import type { CompiledType } from "../its90/compiled.js";
import { _emfFromTemperature, _temperatureFromEmf } from "../its90/engine.js";
import type { FaultNodeName, FaultSignals } from "./types.js";

/** @internal A compiled chain with the review's design facts. */
export interface _Plant {
  readonly chain: MeasurementChain;
  readonly compiled: _CompiledChain;
  /** Every source at its nominal value, the cold junction held at `coldJunctionC`. */
  readonly nominal: Readonly<Record<string, number>>;
  readonly type: ThermocoupleType;
  readonly ct: CompiledType;
  readonly minC: number;
  readonly maxC: number;
  readonly coldJunctionC: number;
  readonly coldEmfMillivolts: number;
  /** Whether the chain has an amplifier (none: unity, no rails). */
  readonly hasAmplifier: boolean;
  readonly railLowVolts: number;
  readonly railHighVolts: number;
  readonly referenceVolts: number;
  readonly shuntSeriesOhms: number;
  readonly shuntSupplyVolts: number;
  readonly dividerOhms: readonly number[] | undefined;
  readonly tap: number;
  /** Comparator: switching point above the threshold on the trip edge (hysteresis, offset at nominal), V. */
  readonly edgeVolts: number;
  /** ADC chains: the setpoint the firmware trips at, °C. */
  readonly adcTripC: number;
  readonly outputStage: "energize-to-trip" | "de-energize-to-trip";
}

/** @internal Design facts the plant needs. */
export interface _PlantFacts {
  readonly coldJunctionC: number;
  readonly railLowVolts: number;
  readonly railHighVolts: number;
  readonly tap: number;
  readonly adcTripC: number | undefined;
  readonly outputStage: "energize-to-trip" | "de-energize-to-trip";
  readonly shuntSupplyVolts: number | undefined;
}

/** @internal Structural changes of one fault alternative, resolved from its effects. */
export interface _Mods {
  openMillivolts: number | undefined;
  shortAtC: number | undefined;
  readonly dividerStates: Map<number, "open" | "short">;
  feedback: "open" | "short" | undefined;
  ground: "open" | "short" | undefined;
  referenceOpen: boolean;
  boardLoss: boolean;
  readonly nodeOps: Map<FaultNodeName, ((value: number, signals: Partial<FaultSignals>) => number)[]>;
}

/** @internal No change. */
export function _emptyMods(): _Mods {
  return {
    openMillivolts: undefined,
    shortAtC: undefined,
    dividerStates: new Map(),
    feedback: undefined,
    ground: undefined,
    referenceOpen: false,
    boardLoss: false,
    nodeOps: new Map(),
  };
}

/** @internal Builds (and validates, through the chain module) the plant of a chain. */
export function _buildPlant(chain: MeasurementChain, facts: _PlantFacts, context: string): _Plant {
  const cc = _compileChain(chain);
  const coldJunctionC = facts.coldJunctionC;
  if (cc.adc !== undefined && facts.adcTripC === undefined) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "tripTemperatureC",
      value: undefined,
      context,
      problem: "is missing: an ADC chain trips in firmware at a setpoint the review must be given",
    });
  }
  const dividerOhms = cc.divider === undefined ? undefined : (chain.divider?.resistorsOhms as readonly number[]);
  const taps = dividerOhms === undefined ? 1 : dividerOhms.length - 1;
  if (cc.comparator !== undefined && !(Number.isInteger(facts.tap) && facts.tap >= 0 && facts.tap < taps)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "tap", value: facts.tap, min: 0, max: taps - 1, context });
  }
  const nominal = _zeroRecord(cc, cc.fixedSources, coldJunctionC);
  const ref = chain.reference;
  const supplyMid =
    ref?.supplyMinVolts !== undefined && ref.supplyMaxVolts !== undefined ? (ref.supplyMinVolts + ref.supplyMaxVolts) / 2 : facts.railHighVolts;
  const comparator = cc.comparator as _ComparatorStage | undefined;
  return {
    chain,
    compiled: cc,
    nominal,
    type: cc.type,
    ct: cc.ct,
    minC: cc.ct.minC,
    maxC: cc.ct.maxC,
    coldJunctionC,
    coldEmfMillivolts: _emfFromTemperature(cc.ct, coldJunctionC),
    hasAmplifier: chain.amplifier !== undefined,
    railLowVolts: facts.railLowVolts,
    railHighVolts: facts.railHighVolts,
    referenceVolts: cc.reference === undefined ? 0 : cc.reference.volts(nominal),
    shuntSeriesOhms: ref !== undefined && ref.variant === "shunt" ? ref.seriesOhms : 0,
    shuntSupplyVolts: facts.shuntSupplyVolts ?? supplyMid,
    dividerOhms,
    tap: facts.tap,
    edgeVolts: comparator === undefined ? 0 : comparator.switchingOffsetVolts(nominal, comparator.edgeMillivolts("trip")),
    adcTripC: facts.adcTripC ?? Number.NaN,
    outputStage: facts.outputStage,
  };
}

/**
 * The chain a fault alternative leaves: the compiled chain with a resistor fault's amplifier gain put in
 * (feedback or ground resistor open or short), or the chain itself.
 */
function faultedChain(p: _Plant, m: _Mods): _CompiledChain {
  const amp = p.chain.amplifier;
  if ((m.feedback === undefined && m.ground === undefined) || amp?.kind !== "amplifier" || amp.gain.setBy !== "resistors") return p.compiled;
  const g = amp.gain as ResistorGain;
  const rf = m.feedback === "open" ? Infinity : m.feedback === "short" ? 0 : g.feedbackOhms;
  const rg = m.ground === "open" ? Infinity : m.ground === "short" ? 0 : g.groundOhms;
  const gain = 1 + rf / rg;
  const amplifier: _AmplifierStage = { ...p.compiled.amplifier, gain: () => gain };
  return { ...p.compiled, amplifier };
}

/** @internal Temperature for an EMF against 0 °C, ±Infinity beyond the type's range. */
export function _temperatureOrInfinity(p: _Plant, emfMillivolts: number): number {
  // Type B: E = 0 mV is ambiguous (two temperatures); below the unambiguous range counts as "below".
  if (emfMillivolts < p.ct.lowestEmf || (p.type === "B" && emfMillivolts <= p.ct.lowestEmf)) return -Infinity;
  if (emfMillivolts > p.ct.emfAtMaxC) return Infinity;
  return _temperatureFromEmf(p.ct, emfMillivolts);
}

/** @internal The temperature the chain's nominal conversion indicates for an amplifier output, °C. */
export function _readingFromVolts(p: _Plant, volts: number): number {
  const cc = p.compiled;
  if (cc.fixedScale !== undefined) return (volts * 1000) / cc.fixedScale.millivoltsPerC;
  const emf = (volts * 1000) / cc.amplifier.nominalGain - _compensationMillivolts(cc, p.nominal, p.coldJunctionC);
  return _temperatureOrInfinity(p, emf + p.coldEmfMillivolts);
}

/** Tap ratio with divider resistors open or shorted (an open above the tap leaves it at ground). */
function faultedDividerRatio(ohms: readonly number[], tap: number, states: ReadonlyMap<number, "open" | "short">): number {
  let above = 0;
  let below = 0;
  ohms.forEach((r, i) => {
    const state = states.get(i);
    const value = state === "open" ? Infinity : state === "short" ? 0 : r;
    if (i <= tap) above += value;
    else below += value;
  });
  if (above === Infinity) return 0; // no current: the tap sits at the ground end
  if (below === Infinity) return 1; // the tap sits at the reference end
  return below / (above + below);
}

/** @internal Every node at a hot-junction temperature under the structural changes `m`. */
export function _evaluateSignals(p: _Plant, m: _Mods, hotJunctionC: number): FaultSignals {
  const s: { -readonly [K in keyof FaultSignals]?: FaultSignals[K] } = { hotJunctionC, coldJunctionC: p.coldJunctionC };
  const node = (name: FaultNodeName, value: number): number => {
    const ops = m.nodeOps.get(name);
    if (ops === undefined) return value;
    let v = value;
    for (const op of ops) v = op(v, s);
    return v;
  };
  const clip = (v: number): number => Math.min(Math.max(v, p.railLowVolts), p.railHighVolts);
  const cc = faultedChain(p, m);
  const x = p.nominal;
  const tc = p.coldJunctionC;

  let emf: number;
  if (m.openMillivolts !== undefined) emf = m.openMillivolts;
  else emf = _junctionEmfMillivolts(cc, m.shortAtC ?? hotJunctionC, x, tc);
  emf = node("thermocoupleEmf", emf);
  s.thermocoupleEmfMillivolts = emf;

  // A fixed-scale amplifier compensates inside: its compensation node is reported, not added.
  const comp = node("compensation", _compensationMillivolts(cc, x, tc));
  s.compensationMillivolts = comp;
  const input = node("amplifierInput", cc.fixedScale !== undefined ? emf : emf + comp);
  let out: number;
  if (!p.hasAmplifier) out = _frontEndVolts(cc, input, x, tc);
  else if (cc.fixedScale === undefined && cc.amplifier.gain(x) === Infinity) {
    // Open loop: the output goes to the rail of the input's sign.
    out = input > 0 ? p.railHighVolts : p.railLowVolts;
  } else out = clip(_frontEndVolts(cc, input, x, tc));
  s.amplifierInputMillivolts = input;
  if (m.boardLoss) out = 0;
  out = node("amplifierOutput", out);
  s.amplifierOutputVolts = out;

  let ref = p.referenceVolts;
  if (m.referenceOpen) {
    if (p.chain.reference?.variant === "shunt") {
      const load = p.dividerOhms === undefined ? Infinity : p.dividerOhms.reduce((a, b) => a + b, 0);
      ref = load === Infinity ? p.shuntSupplyVolts : (p.shuntSupplyVolts * load) / (load + p.shuntSeriesOhms);
    } else ref = 0;
  }
  if (m.boardLoss) ref = 0;
  ref = node("reference", ref);
  s.referenceVolts = ref;

  let tripped: boolean;
  if (cc.comparator !== undefined) {
    let ratio = 1;
    if (cc.divider !== undefined) {
      ratio = m.dividerStates.size === 0 ? cc.divider.ratio(x, p.tap) : faultedDividerRatio(p.dividerOhms as readonly number[], p.tap, m.dividerStates);
    }
    const threshold = node("threshold", ref * ratio);
    s.thresholdVolts = threshold;
    s.adcCode = null;
    s.readingC = _readingFromVolts(p, out);
    tripped = out >= threshold + p.edgeVolts;
  } else {
    const adc = cc.adc as _AdcStage;
    const fs = cc.adcUsesReference ? ref : cc.adcFullScaleVolts;
    let code: number;
    // An ideal converter against the (possibly faulted) full scale; without a reference it reads any
    // non-negative input as full scale.
    if (!(fs > 0)) code = out >= 0 ? adc.codes - 1 : 0;
    else code = Math.min(Math.max(Math.floor((out / fs) * adc.codes), 0), adc.codes - 1);
    code = node("adcCode", code);
    s.adcCode = code;
    s.thresholdVolts = null;
    s.readingC = _readingFromVolts(p, (code * cc.adcFullScaleVolts) / adc.codes);
    tripped = s.readingC >= p.adcTripC;
  }
  if (m.boardLoss) tripped = false;
  tripped = node("detectorOutput", tripped ? 1 : 0) >= 0.5;
  s.detectorTripped = tripped;
  s.boardPowered = !m.boardLoss;
  s.openThermocouple = m.openMillivolts !== undefined;
  s.outputTripped = m.boardLoss ? p.outputStage === "de-energize-to-trip" : tripped;
  return s as FaultSignals;
}
