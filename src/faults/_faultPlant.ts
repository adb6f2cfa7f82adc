/**
 * The nominal signal model of a trip chain that the fault review runs: every node of the signal path
 * (thermocouple EMF → amplifier input → amplifier output → detector, with the reference and threshold),
 * evaluated with every error source at its nominal value, so that a fault can replace any node or element.
 * Its healthy signal equals the chain module's nominal reading (checked in tests).
 * @module
 * @internal
 */
import { _compileChain } from "../chain/_compileChain.js";
import type {
  AmplifierElement,
  FixedScaleAmplifierElement,
  MeasurementChain,
  ResistorGain,
} from "../chain/types.js";
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { HotjunctionRangeError } from "../errors.js";
import { _compile, type CompiledType } from "../its90/compiled.js";
import { _emfFromTemperature, _temperatureFromEmf } from "../its90/engine.js";
import { thermocoupleData } from "../its90/resolveType.js";
import { comparatorSwitchingOffsetMillivolts } from "../chain/comparator.js";
import type { FaultNodeName, FaultSignals } from "./types.js";

/** @internal Front end: fixed-scale amplifier, or (optional) hardware compensation plus a voltage amplifier. */
export type _FrontEnd =
  | { readonly kind: "fixed-scale"; readonly millivoltsPerC: number; readonly alphaMillivoltsPerC: number }
  | {
      readonly kind: "amplifier";
      /** Whether there is an amplifier at all (no amplifier: unity, no rails). */
      readonly present: boolean;
      readonly feedbackOhms: number | undefined;
      readonly groundOhms: number | undefined;
      readonly nominalGain: number;
      /** Hardware compensation E(t0) + α(t − t0), or none (software or fixed-scale). */
      readonly hardware: { readonly e0Millivolts: number; readonly alphaMillivoltsPerC: number; readonly matchedAtC: number } | undefined;
    };

/** @internal The detector stage. */
export type _Detector =
  | { readonly kind: "comparator"; readonly edgeVolts: number }
  | { readonly kind: "adc"; readonly codes: number; readonly fullScaleVolts: number; readonly usesReference: boolean; readonly tripC: number };

/** @internal A resolved chain with the review's design facts. */
export interface _Plant {
  readonly chain: MeasurementChain;
  readonly type: ThermocoupleType;
  readonly ct: CompiledType;
  readonly minC: number;
  readonly maxC: number;
  readonly coldJunctionC: number;
  readonly coldEmfMillivolts: number;
  readonly front: _FrontEnd;
  readonly railLowVolts: number;
  readonly railHighVolts: number;
  readonly referenceVolts: number;
  readonly referenceVariant: "series" | "shunt" | "regulator" | "none";
  readonly shuntSeriesOhms: number;
  readonly shuntSupplyVolts: number;
  readonly dividerOhms: readonly number[] | undefined;
  readonly tap: number;
  readonly detector: _Detector;
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

function gainParts(amp: AmplifierElement): { feedbackOhms: number | undefined; groundOhms: number | undefined; gain: number } {
  if (amp.gain.setBy === "resistors") {
    const g = amp.gain as ResistorGain;
    return { feedbackOhms: g.feedbackOhms, groundOhms: g.groundOhms, gain: 1 + g.feedbackOhms / g.groundOhms };
  }
  return { feedbackOhms: undefined, groundOhms: undefined, gain: amp.gain.gain };
}

/** @internal Builds (and validates, through the chain module) the plant of a chain. */
export function _buildPlant(chain: MeasurementChain, facts: _PlantFacts, context: string): _Plant {
  const cc = _compileChain(chain);
  const type = cc.type;
  const ct = _compile(thermocoupleData(type));
  const minC = ct.minC;
  const maxC = ct.maxC;
  const coldJunctionC = facts.coldJunctionC;
  const amp = chain.amplifier;
  let front: _FrontEnd;
  if (amp !== undefined && amp.kind === "fixedScaleAmplifier") {
    const fs = amp as FixedScaleAmplifierElement;
    front = {
      kind: "fixed-scale",
      millivoltsPerC: fs.millivoltsPerC,
      alphaMillivoltsPerC: (cc.fixedScale as NonNullable<typeof cc.fixedScale>).alphaMillivoltsPerC,
    };
  } else {
    const parts = amp === undefined ? { feedbackOhms: undefined, groundOhms: undefined, gain: 1 } : gainParts(amp as AmplifierElement);
    const cj = chain.coldJunction;
    const hardware =
      cj !== undefined && cj.method === "hardware"
        ? {
            matchedAtC: cj.matchedAtC ?? 25,
            e0Millivolts: _emfFromTemperature(ct, cj.matchedAtC ?? 25),
            alphaMillivoltsPerC: cj.compensationMicrovoltsPerC / 1000,
          }
        : undefined;
    front = { kind: "amplifier", present: amp !== undefined, feedbackOhms: parts.feedbackOhms, groundOhms: parts.groundOhms, nominalGain: parts.gain, hardware };
  }
  const ref = chain.reference;
  const det = chain.detector;
  let detector: _Detector;
  if (det.kind === "comparator") {
    detector = { kind: "comparator", edgeVolts: comparatorSwitchingOffsetMillivolts(det, "trip") / 1000 };
  } else {
    if (facts.adcTripC === undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "tripTemperatureC",
        value: undefined,
        context,
        problem: "is missing: an ADC chain trips in firmware at a setpoint the review must be given",
      });
    }
    detector = { kind: "adc", codes: 2 ** det.bits, fullScaleVolts: cc.adcFullScaleVolts, usesReference: cc.adcUsesReference, tripC: facts.adcTripC };
  }
  const dividerOhms = det.kind === "comparator" ? chain.divider?.resistorsOhms : undefined;
  const taps = dividerOhms === undefined ? 1 : dividerOhms.length - 1;
  if (det.kind === "comparator" && !(Number.isInteger(facts.tap) && facts.tap >= 0 && facts.tap < taps)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "tap", value: facts.tap, min: 0, max: taps - 1, context });
  }
  const supplyMid =
    ref?.supplyMinVolts !== undefined && ref.supplyMaxVolts !== undefined ? (ref.supplyMinVolts + ref.supplyMaxVolts) / 2 : facts.railHighVolts;
  return {
    chain,
    type,
    ct,
    minC,
    maxC,
    coldJunctionC,
    coldEmfMillivolts: _emfFromTemperature(ct, coldJunctionC),
    front,
    railLowVolts: facts.railLowVolts,
    railHighVolts: facts.railHighVolts,
    referenceVolts: ref?.nominalVolts ?? 0,
    referenceVariant: ref?.variant ?? "none",
    shuntSeriesOhms: ref !== undefined && ref.variant === "shunt" ? ref.seriesOhms : 0,
    shuntSupplyVolts: facts.shuntSupplyVolts ?? supplyMid,
    dividerOhms,
    tap: facts.tap,
    detector,
    outputStage: facts.outputStage,
  };
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
  const f = p.front;
  if (f.kind === "fixed-scale") return (volts * 1000) / f.millivoltsPerC;
  let emf = (volts * 1000) / f.nominalGain;
  if (f.hardware !== undefined) emf -= f.hardware.e0Millivolts + f.hardware.alphaMillivoltsPerC * (p.coldJunctionC - f.hardware.matchedAtC);
  return _temperatureOrInfinity(p, emf + p.coldEmfMillivolts);
}

function dividerRatio(ohms: readonly number[], tap: number, states: ReadonlyMap<number, "open" | "short">): number {
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

  let emf: number;
  if (m.openMillivolts !== undefined) emf = m.openMillivolts;
  else if (m.shortAtC !== undefined) emf = _emfFromTemperature(p.ct, m.shortAtC) - p.coldEmfMillivolts;
  else emf = _emfFromTemperature(p.ct, hotJunctionC) - p.coldEmfMillivolts;
  emf = node("thermocoupleEmf", emf);
  s.thermocoupleEmfMillivolts = emf;

  const f = p.front;
  let input: number;
  let out: number;
  if (f.kind === "fixed-scale") {
    s.compensationMillivolts = node("compensation", 0);
    input = node("amplifierInput", emf);
    out = clip((f.millivoltsPerC * (input / f.alphaMillivoltsPerC + p.coldJunctionC)) / 1000);
  } else {
    let comp = 0;
    if (f.hardware !== undefined) comp = f.hardware.e0Millivolts + f.hardware.alphaMillivoltsPerC * (p.coldJunctionC - f.hardware.matchedAtC);
    comp = node("compensation", comp);
    s.compensationMillivolts = comp;
    input = node("amplifierInput", emf + comp);
    if (!f.present) out = input / 1000;
    else {
      let gain = f.nominalGain;
      if (f.feedbackOhms !== undefined && f.groundOhms !== undefined && (m.feedback !== undefined || m.ground !== undefined)) {
        const rf = m.feedback === "open" ? Infinity : m.feedback === "short" ? 0 : f.feedbackOhms;
        const rg = m.ground === "open" ? Infinity : m.ground === "short" ? 0 : f.groundOhms;
        gain = 1 + rf / rg;
      }
      // Open loop: the output goes to the rail of the input's sign.
      out = gain === Infinity ? (input > 0 ? p.railHighVolts : p.railLowVolts) : clip((gain * input) / 1000);
    }
  }
  s.amplifierInputMillivolts = input;
  if (m.boardLoss) out = 0;
  out = node("amplifierOutput", out);
  s.amplifierOutputVolts = out;

  let ref = p.referenceVolts;
  if (m.referenceOpen) {
    if (p.referenceVariant === "shunt") {
      const load = p.dividerOhms === undefined ? Infinity : p.dividerOhms.reduce((a, b) => a + b, 0);
      ref = load === Infinity ? p.shuntSupplyVolts : (p.shuntSupplyVolts * load) / (load + p.shuntSeriesOhms);
    } else ref = 0;
  }
  if (m.boardLoss) ref = 0;
  ref = node("reference", ref);
  s.referenceVolts = ref;

  let tripped: boolean;
  const d = p.detector;
  if (d.kind === "comparator") {
    const ratio = p.dividerOhms === undefined ? 1 : dividerRatio(p.dividerOhms, p.tap, m.dividerStates);
    const threshold = node("threshold", ref * ratio);
    s.thresholdVolts = threshold;
    s.adcCode = null;
    s.readingC = _readingFromVolts(p, out);
    tripped = out >= threshold + d.edgeVolts;
  } else {
    const fs = d.usesReference ? ref : d.fullScaleVolts;
    let code: number;
    // Without a reference the converter reads any non-negative input as full scale.
    if (!(fs > 0)) code = out >= 0 ? d.codes - 1 : 0;
    else code = Math.min(Math.max(Math.floor((out / fs) * d.codes), 0), d.codes - 1);
    code = node("adcCode", code);
    s.adcCode = code;
    s.thresholdVolts = null;
    s.readingC = _readingFromVolts(p, (code * d.fullScaleVolts) / d.codes);
    tripped = s.readingC >= d.tripC;
  }
  if (m.boardLoss) tripped = false;
  tripped = node("detectorOutput", tripped ? 1 : 0) >= 0.5;
  s.detectorTripped = tripped;
  s.boardPowered = !m.boardLoss;
  s.openThermocouple = m.openMillivolts !== undefined;
  s.outputTripped = m.boardLoss ? p.outputStage === "de-energize-to-trip" : tripped;
  return s as FaultSignals;
}
