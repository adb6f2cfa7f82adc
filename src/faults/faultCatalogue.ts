/**
 * The built-in fault catalogue: for each element of a chain, its single faults as data.
 * @module
 */
import type { MeasurementChain } from "../chain/types.js";
import { _compile } from "../its90/compiled.js";
import { _emfFromTemperature, _seebeckCoefficient } from "../its90/engine.js";
import { thermocoupleData } from "../its90/resolveType.js";
import { _invalidChoice, _requireFinite, _requireFiniteResult, _requireInRange, _requireObject, _requireShape, HotjunctionRangeError, type _Shape } from "../errors.js";
import { _requireAdcBits } from "../chain/adc.js";
import { detectionOffsetMicrovolts, loopResistanceOhms } from "../chain/wire/loopResistance.js";
import type { Fault, FaultContext } from "./types.js";
import { resistorPositionNames } from "../chain/resistorPositions.js";

/** Options of {@link faultCatalogue} (the same meaning and defaults as in {@link FaultContext}). */
export interface FaultCatalogueOptions {
  /** Temperature at a short along the wire, °C. Default: left to the review (halfway from cold junction to healthy trip). */
  readonly wireShortC?: number;
  /** Ground / common-mode offset seen as differential input, mV (> 0). Default 1. */
  readonly groundOffsetMillivolts?: number;
  /** Stated reference drift, fraction in (0, 1). Default 0.05. */
  readonly referenceDriftFraction?: number;
  /** Comparator output level that means "trip". Default `"high"`. */
  readonly comparatorTripLevel?: FaultContext["comparatorTripLevel"];
}

const context = "fault catalogue";

const mitigationText = {
  open: "bias the open input upward (pull-up burnout bias) so an open thermocouple reads high and trips; add open-thermocouple detection",
  short:
    "supervise plausibility (the reading must rise while the heater runs, or agree with an independent sensor); a second, independent sensor channel",
  reversed: "polarized, colour-coded thermocouple connectors; a range check that flags readings below the cold junction",
  ground: "a differential input with enough common-mode range, the sheath grounded at one point; an out-of-range window",
  compensation: "supervise the compensation voltage; keep margin to the hazard limit",
  low: "a window comparator or supervisory range check that flags a signal below the bottom of the normal range",
  high: "a window comparator to tell a railed signal from a real over-temperature",
  gain: "a supervisory reading or second comparator; a gain network whose likelier failure raises the gain",
  openLoop: "a window comparator to tell a railed signal from a real over-temperature",
  referenceHigh: "a window check of the threshold or reference node; a reference whose likelier failure pulls the threshold low",
  referenceLow: "a window check of the reference node to tell a failed reference from an over-temperature",
  drift: "periodic proof test of the trip point; a supervisory reading compared with the detector state",
  divider: "arrange the divider so the likelier failure pulls the threshold low; a window check of the threshold node",
  comparatorStuck: "periodic proof test with an injected signal; a supervisory check of the detector state against the reading",
  adc: "a firmware range check of the code (the end codes are faults); a hardware comparator beside the firmware trip",
  supply: "a de-energise-to-trip output stage (loss of power trips)",
  cableShort: "route the cable away from heat and abrasion, in conduit; supervise plausibility or a second, independent sensor channel",
  cableReversed: "polarized, colour-coded cable and connectors checked at commissioning; a range check that flags readings below the cold junction",
  connector: "connectors with captive, polarized contacts; open-thermocouple detection (a pull-up detection current trips an open loop)",
  leakage: "a probe whose insulation is rated at the working temperature; a proof test against a reference probe; a second, independent sensor",
  recalibration: "a recalibration schedule with a hard stop (the service life in the design); a proof test against a reference probe",
  detection: "supervise the detection current (a periodic open-loop test); keep margin to the hazard limit for its offset",
} as const;

// Deliberate repetition: faults are data, so each per-element list below is a run of fault literals of one
// shape (id, element, description, effects, mitigation); the duplicate finder sees the shape, not a shared logic.
/** Thermocouple: open, shorts, reversed, ground offsets. */
function thermocoupleFaults(offsetMv: number, wireShortC: number | undefined): Fault[] {
  const faults: Fault[] = [];
  const add = (f: Fault): void => {
    faults.push(f);
  };
  add({
    id: "thermocouple.open",
    element: "thermocouple",
    description: "thermocouple open (broken wire or junction); the input goes where the open-circuit bias drives it",
    effects: [{ kind: "open-thermocouple" }],
    mitigation: mitigationText.open,
  });
  add({
    id: "thermocouple.shortAtTerminals",
    element: "thermocouple",
    description: "thermocouple shorted at the terminals: reads the cold-junction temperature",
    effects: [{ kind: "thermocouple-short" }],
    mitigation: mitigationText.short,
  });
  add({
    id: "thermocouple.shortAlongWire",
    element: "thermocouple",
    description:
      wireShortC === undefined
        ? "thermocouple shorted along the wire: reads the temperature at the short"
        : `thermocouple shorted along the wire at ${wireShortC} °C: reads that temperature`,
    effects: [wireShortC === undefined ? { kind: "thermocouple-short", alongWire: true } : { kind: "thermocouple-short", atC: wireShortC }],
    mitigation: mitigationText.short,
  });
  add({
    id: "thermocouple.reversed",
    element: "thermocouple",
    description: "thermocouple connected with reversed polarity",
    effects: [{ kind: "scale-node", node: "thermocoupleEmf", factor: -1 }],
    mitigation: mitigationText.reversed,
  });
  add({
    id: "thermocouple.groundOffsetPositive",
    element: "thermocouple",
    description: `common-mode or ground offset seen as +${offsetMv} mV of differential input`,
    effects: [{ kind: "offset-node", node: "thermocoupleEmf", millivolts: offsetMv }],
    mitigation: mitigationText.ground,
  });
  add({
    id: "thermocouple.groundOffsetNegative",
    element: "thermocouple",
    description: `common-mode or ground offset seen as −${offsetMv} mV of differential input`,
    effects: [{ kind: "offset-node", node: "thermocoupleEmf", millivolts: -offsetMv }],
    mitigation: mitigationText.ground,
  });

  return faults;
}

/**
 * The wire (when the chain has one): an open connector contact, the extension cable shorted or reversed,
 * the probe's insulation collapsed, the open-circuit detection current lost. Each is data: an effect on a
 * node, computed from the element (the cable's EMF from ITS-90 at its junction and the cold junction's
 * centre temperatures).
 */
function wireFaults(chain: MeasurementChain): Fault[] {
  // Same list prologue as every element's faults (deliberate, see the note at thermocoupleFaults).
  const faults: Fault[] = [];
  const add = (f: Fault): void => {
    faults.push(f);
  };
  const wire = chain.wire;
  if (wire === undefined) return faults;
  const cable = wire.cable;
  if (cable !== undefined) {
    const ct = _compile(thermocoupleData(chain.thermocouple.type));
    const tj = (cable.junctionTemperatureC.minC + cable.junctionTemperatureC.maxC) / 2;
    const tcj = (chain.ambient.minC + chain.ambient.maxC) / 2;
    const cableMv = _emfFromTemperature(ct, tj) - _emfFromTemperature(ct, tcj);
    const hottest = cable.runTemperatureC.maxC;
    add({
      id: "cable.shorted",
      element: "cable",
      description: `extension cable's conductors shorted together at its hottest point (${hottest} °C): reads that temperature`,
      effects: [{ kind: "thermocouple-short", atC: hottest }],
      mitigation: mitigationText.cableShort,
    });
    add({
      id: "cable.reversed",
      element: "cable",
      description: `extension cable connected with reversed polarity: its EMF E(${tj} °C) − E(${tcj} °C) subtracts instead of adding (ΔE = −2·${cableMv.toFixed(4)} mV)`,
      effects: [{ kind: "offset-node", node: "thermocoupleEmf", millivolts: -2 * cableMv }],
      mitigation: mitigationText.cableReversed,
    });
  }
  (wire.connectors ?? []).forEach((c, i, all) => {
    const name = all.length === 1 ? "connector" : `connector${i + 1}`;
    add({
      id: `${name}.openContact`,
      element: "connector",
      description: `${c.label ?? (c.arrangement === "terminates" ? "terminal block" : "connector")}: a contact open; the loop is broken as by an open thermocouple`,
      effects: [{ kind: "open-thermocouple" }],
      mitigation: mitigationText.connector,
    });
  });
  if (wire.leakage !== undefined) {
    add({
      id: "probe.insulationCollapse",
      element: "probe",
      description: "probe insulation collapsed at temperature to the loop's own resistance (R_shunt = R_loop): the EMF at the input halves",
      effects: [{ kind: "scale-node", node: "thermocoupleEmf", factor: 0.5 }],
      mitigation: mitigationText.leakage,
    });
  }
  const ageing = wire.ageing;
  const drift = ageing === undefined ? 0 : (ageing.totalDriftC ?? ((ageing.driftCPer1000Hours ?? 0) * ageing.serviceHours) / 1000);
  if (ageing !== undefined && drift > 0) {
    // A missed recalibration: the drift runs on to twice its total, in its direction (the low side, which
    // delays a trip, for a symmetric drift), as an EMF through S at the temperature the drift is stated at.
    const ct = _compile(thermocoupleData(chain.thermocouple.type));
    const sign = ageing.direction === "up" ? 1 : -1;
    const mv = (sign * 2 * drift * _seebeckCoefficient(ct, ageing.statedAtC)) / 1000;
    add({
      id: "probe.recalibrationMissed",
      element: "probe",
      description: `probe not recalibrated after ${ageing.serviceHours} h: its drift runs on to ${sign > 0 ? "+" : "−"}${+(2 * drift).toPrecision(6)} °C (${(mv * 1000).toPrecision(4)} µV at ${ageing.statedAtC} °C)`,
      effects: [{ kind: "offset-node", node: "thermocoupleEmf", millivolts: mv }],
      mitigation: mitigationText.recalibration,
    });
  }
  const loop = wire.loop;
  if (loop !== undefined && (loop.detectionCurrentNanoamps ?? 0) > 0 && loop.detectionDirection !== undefined) {
    // The nominal detection offset I·R is in the nominal chain; losing the current removes it.
    const ohms = loopResistanceOhms(loop, chain.thermocouple.type).totalOhms;
    const mv = detectionOffsetMicrovolts(loop.detectionCurrentNanoamps ?? 0, ohms, loop.detectionDirection) / 1000;
    add({
      id: "loop.detectionCurrentLost",
      element: "loop",
      description: `open-circuit detection current lost: its ${(mv * 1000).toPrecision(4)} µV offset through the ${ohms.toPrecision(4)} Ω loop disappears, and an open loop is no longer driven to a rail`,
      effects: [{ kind: "offset-node", node: "thermocoupleEmf", millivolts: -mv }],
      mitigation: mitigationText.detection,
    });
  }
  return faults;
}

/** Cold junction: a hardware compensation lost. */
function coldJunctionFaults(chain: MeasurementChain): Fault[] {
  const faults: Fault[] = [];
  const add = (f: Fault): void => {
    faults.push(f);
  };
  if (chain.coldJunction?.method === "hardware") {
    add({
      id: "coldJunction.compensationLost",
      element: "coldJunction",
      description: "hardware cold-junction compensation voltage lost (0 V)",
      effects: [{ kind: "override-node", node: "compensation", millivolts: 0 }],
      mitigation: mitigationText.compensation,
    });
  }

  return faults;
}

/** Amplifier (either kind): output stuck, supply lost, gain resistors open or shorted. */
function amplifierFaults(chain: MeasurementChain): Fault[] {
  // Same list prologue as every element's faults (deliberate, see the note at thermocoupleFaults).
  const faults: Fault[] = [];
  const add = (f: Fault): void => {
    faults.push(f);
  };
  const amp = chain.amplifier;
  if (amp !== undefined) {
    const el = amp.kind;
    const words = el === "fixedScaleAmplifier" ? "fixed-scale amplifier" : "amplifier";
    add({
      id: `${el}.outputStuckLow`,
      element: el,
      description: `${words} output stuck at its low rail`,
      effects: [{ kind: "override-node", node: "amplifierOutput", rail: "low" }],
      mitigation: mitigationText.low,
    });
    add({
      id: `${el}.outputStuckHigh`,
      element: el,
      description: `${words} output stuck at its high rail`,
      effects: [{ kind: "override-node", node: "amplifierOutput", rail: "high" }],
      mitigation: mitigationText.high,
    });
    add({
      id: `${el}.supplyLost`,
      element: el,
      description: `${words} supply lost: output falls to 0 V`,
      effects: [{ kind: "override-node", node: "amplifierOutput", volts: 0 }],
      mitigation: mitigationText.low,
    });
    if (amp.kind === "amplifier" && amp.gain.setBy === "resistors") {
      for (const resistor of ["feedback", "ground"] as const) {
        for (const state of ["open", "short"] as const) {
          const openLoop = (resistor === "feedback") === (state === "open");
          add({
            id: `amplifier.${resistor}Resistor${state === "open" ? "Open" : "Short"}`,
            element: "amplifier",
            description: `gain ${resistor} resistor ${state === "open" ? "open" : "shorted"}: ${openLoop ? "open loop" : "unity gain"}`,
            effects: [{ kind: "resistor-fault", element: "amplifier", resistor, state }],
            mitigation: openLoop ? mitigationText.openLoop : mitigationText.gain,
          });
        }
      }
    }
  }

  return faults;
}

/** Reference: open (a shunt rises toward the supply), shorted, drifted. */
function referenceFaults(chain: MeasurementChain, drift: number): Fault[] {
  const faults: Fault[] = [];
  const add = (f: Fault): void => {
    faults.push(f);
  };
  const ref = chain.reference;
  if (ref !== undefined) {
    const shunt = ref.variant === "shunt";
    add({
      id: "reference.open",
      element: "reference",
      description: shunt
        ? "shunt reference open: its node rises toward the supply through the series resistor"
        : "reference output open: the node falls to 0 V",
      effects: [{ kind: "reference-open" }],
      mitigation: shunt ? mitigationText.referenceHigh : mitigationText.referenceLow,
    });
    add({
      id: "reference.short",
      element: "reference",
      description: "reference output shorted to ground (0 V)",
      effects: [{ kind: "override-node", node: "reference", volts: 0 }],
      mitigation: mitigationText.referenceLow,
    });
    const pct = `${+(drift * 100).toPrecision(6)} %`;
    add({
      id: "reference.driftedLow",
      element: "reference",
      description: `reference drifted ${pct} low, to ${+(ref.nominalVolts * (1 - drift)).toPrecision(6)} V`,
      effects: [{ kind: "override-node", node: "reference", volts: ref.nominalVolts * (1 - drift) }],
      mitigation: mitigationText.drift,
    });
    add({
      id: "reference.driftedHigh",
      element: "reference",
      description: `reference drifted ${pct} high, to ${+(ref.nominalVolts * (1 + drift)).toPrecision(6)} V`,
      effects: [{ kind: "override-node", node: "reference", volts: ref.nominalVolts * (1 + drift) }],
      mitigation: mitigationText.drift,
    });
  }

  return faults;
}

/** Divider and detector: resistors open or shorted, comparator output stuck; ADC code stuck. */
function detectorFaults(chain: MeasurementChain, level: "high" | "low"): Fault[] {
  const faults: Fault[] = [];
  const add = (f: Fault): void => {
    faults.push(f);
  };
  const det = chain.detector;
  if (det?.kind === "comparator") {
    const ohms = chain.divider?.resistorsOhms ?? [];
    // Named by position as every report names them (top, ladder 1 … from the reference, bottom); the id keeps the
    // index from the reference (0 = top) as its stable key, which failure data maps onto.
    // A comparator straight on the reference (no divider) has no threshold resistor to name.
    const positions = ohms.length > 0 ? resistorPositionNames(ohms.length) : [];
    ohms.forEach((r, index) => {
      for (const state of ["open", "short"] as const) {
        add({
          id: `divider.resistor${index}.${state}`,
          element: "divider",
          description: `${positions[index] ?? `resistor ${index}`} resistor of the threshold divider (${r} Ω) ${state === "open" ? "open" : "shorted"}`,
          effects: [{ kind: "resistor-fault", element: "divider", index, state }],
          mitigation: mitigationText.divider,
        });
      }
    });
    for (const stuck of ["high", "low"] as const) {
      const tripped = stuck === level;
      add({
        id: `comparator.outputStuck${stuck === "high" ? "High" : "Low"}`,
        element: "comparator",
        description: `comparator output stuck ${stuck} (${tripped ? "trip asserted" : "trip never asserted"})`,
        effects: [{ kind: "override-node", node: "detectorOutput", tripped }],
        mitigation: tripped ? mitigationText.high : mitigationText.comparatorStuck,
      });
    }
  } else if (det?.kind === "adc") {
    add({
      id: "adc.codeStuckZero",
      element: "adc",
      description: "ADC code stuck at zero",
      effects: [{ kind: "override-node", node: "adcCode", code: 0 }],
      mitigation: mitigationText.adc,
    });
    add({
      id: "adc.codeStuckFullScale",
      element: "adc",
      description: "ADC code stuck at full scale",
      effects: [{ kind: "override-node", node: "adcCode", code: 2 ** det.bits - 1 }],
      mitigation: mitigationText.adc,
    });
  } else {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "detector", value: det, context, problem: "is missing or of unknown kind" });
  }

  return faults;
}

/** The board: supply lost. */
function boardFaults(): Fault[] {
  const faults: Fault[] = [];
  const add = (f: Fault): void => {
    faults.push(f);
  };
  add({
    id: "board.supplyLost",
    element: "board",
    description: "board supply lost: every circuit unpowered; the output stage does what its polarity gives",
    effects: [{ kind: "board-supply-loss" }],
    mitigation: mitigationText.supply,
  });
  return faults;
}

/**
 * Checks the parts of a chain that go into the catalogue's ids, words and effects (an element's kind, the
 * reference's voltage, the divider's resistances, the ADC's bits), so that no id or description can carry a
 * forged value ("NaN Ω", "-Infinity.outputStuckLow") and no effect a non-finite number.
 */
const cataloguedParts: _Shape = {
  amplifier: ["optional", { kind: ["oneOf", ["amplifier", "fixedScaleAmplifier"]] }],
  reference: ["optional", { nominalVolts: "positive" }],
  divider: ["optional", { resistorsOhms: ["array", "positive"] }],
};

function checkCataloguedParts(chain: MeasurementChain): void {
  _requireShape(chain, cataloguedParts, "chain", context);
  const volts = chain.reference?.nominalVolts;
  // the drifted-high fault's voltage (at most twice the nominal) must stay finite
  if (volts !== undefined) _requireFiniteResult(volts * 2, "chain.reference.nominalVolts", volts, "V", context);
  if (chain.amplifier?.kind === "amplifier") _requireObject(chain.amplifier.gain, "chain.amplifier.gain", context);
  if (chain.detector?.kind === "adc") _requireAdcBits(chain.detector.bits, context, "chain.detector.bits");
}

/**
 * The built-in single-fault catalogue of a chain, as data: thermocouple open, shorted at the terminals, shorted
 * along the wire, reversed, ground offset of either sign; hardware cold-junction compensation lost; amplifier
 * output stuck at either rail, supply lost, each gain resistor open or shorted (resistor gain only); fixed-scale
 * amplifier stuck at either rail, supply lost; reference open, shorted, drifted low and high; each divider
 * resistor open or shorted; comparator output stuck high or low (ADC chains: code stuck at zero or full scale);
 * board supply lost. Where an open input goes, the rails and the output-stage polarity are design facts the
 * review takes from its {@link FaultContext}.
 * @param chain - the chain (comparator or ADC detector); read for its elements only
 * @param options - wire-short temperature °C, ground offset mV (> 0, default 1), reference drift fraction (0…1,
 *   default 0.05), comparator trip level (default "high")
 * @returns the faults, in signal-path order
 * @throws HotjunctionTypeError / HotjunctionRangeError for bad options or a chain without a thermocouple or detector
 * @example
 * ```ts
 * import { faultCatalogue, type MeasurementChain } from "hotjunction";
 * const chain: MeasurementChain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
 *   divider: { kind: "divider", resistorsOhms: [10000, 10000], toleranceFraction: 0.01 },
 *   detector: { kind: "comparator" },
 *   ambient: { minC: 15, maxC: 50 },
 * };
 * const faults = faultCatalogue(chain);
 * console.log(faults.length); // 20
 * console.log(faults[0]?.id, faults[0]?.effects[0]?.kind); // "thermocouple.open" "open-thermocouple"
 * ```
 */
export function faultCatalogue(chain: MeasurementChain, options: FaultCatalogueOptions = {}): Fault[] {
  if (typeof chain !== "object" || chain === null) {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "chain", value: chain, context, problem: "is not an object" });
  }
  _requireObject(options, "options", context);
  checkCataloguedParts(chain);
  const offsetMv =
    options.groundOffsetMillivolts === undefined ? 1 : _requireInRange(options.groundOffsetMillivolts, "groundOffsetMillivolts", 1e-6, 1e4, "mV", context);
  const drift =
    options.referenceDriftFraction === undefined ? 0.05 : _requireInRange(options.referenceDriftFraction, "referenceDriftFraction", 1e-9, 0.999, undefined, context);
  const level = options.comparatorTripLevel ?? "high";
  if (level !== "high" && level !== "low") _invalidChoice("comparatorTripLevel", level, ["high", "low"], context);
  const wireShortC = options.wireShortC === undefined ? undefined : _requireFinite(options.wireShortC, "wireShortC", "°C", context);

  return [
    ...thermocoupleFaults(offsetMv, wireShortC),
    ...wireFaults(chain),
    ...coldJunctionFaults(chain),
    ...amplifierFaults(chain),
    ...referenceFaults(chain, drift),
    ...detectorFaults(chain, level),
    ...boardFaults(),
  ];
}

