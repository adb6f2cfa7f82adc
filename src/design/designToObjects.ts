/**
 * Turns a validated design file into the library's objects: a `TripDesign` (comparator designs), a
 * `MeasurementChain` (any design: the chain that sweeps and ADC designs evaluate), and the reference options.
 * @module
 */
import type {
  AdcElement,
  AmplifierElement,
  ColdJunctionElement,
  ComparatorElement,
  FixedScaleAmplifierElement,
  MeasurementChain,
  ReferenceElement,
  ThermocoupleElement,
} from "../chain/types.js";
import type { WireDescription } from "../chain/wire/wireStage.js";
import type { ReferenceOption, TripDesign, TripResistors, TripSetpoint } from "../trip/types.js";
import type { DesignFile, DesignReference } from "./designSchema.js";
import { HotjunctionRangeError, _requireChoice } from "../errors.js";
import { _requireDesign, _requireDesignReference } from "./parseDesign.js";
import type { TripDynamicsModel } from "../trip/tripDynamics.js";
import type { ElementFailureData, FailureData, FailureModeShare } from "../safety/types.js";

/** Copies an object without its `undefined` members (exact optional properties). */
function compact<T>(value: Record<string, unknown>): T {
  const out: Record<string, unknown> = {};
  for (const [key, member] of Object.entries(value)) if (member !== undefined) out[key] = member;
  return out as T;
}

function thermocoupleOf(design: DesignFile): ThermocoupleElement {
  return compact<ThermocoupleElement>({ kind: "thermocouple", ...design.thermocouple, tolerance: compact(design.thermocouple.tolerance) });
}

/** The wire of a design file as chain elements (each element gets its `kind`). */
function wireOf(design: DesignFile): WireDescription | undefined {
  const w = design.wire;
  if (w === undefined) return undefined;
  const ranges = (o: Record<string, unknown>): Record<string, unknown> => {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(o)) out[k] = v !== null && typeof v === "object" && !Array.isArray(v) ? compact(v as Record<string, unknown>) : v;
    return out;
  };
  return compact<WireDescription>({
    cable: w.cable === undefined ? undefined : compact(ranges({ kind: "extensionCable", ...w.cable })),
    connectors: w.connectors?.map((c) => compact(ranges({ kind: "connector", ...c }))),
    loop: w.loop === undefined ? undefined : compact(ranges({ kind: "loopResistance", ...w.loop })),
    leakage: w.leakage === undefined ? undefined : compact({ kind: "insulationLeakage", ...w.leakage }),
    ageing: w.ageing === undefined ? undefined : compact({ kind: "ageing", ...w.ageing }),
  });
}

function coldJunctionOf(design: DesignFile): ColdJunctionElement | undefined {
  return design.coldJunction === undefined ? undefined : compact<ColdJunctionElement>({ kind: "coldJunction", ...design.coldJunction });
}

function amplifierOf(design: DesignFile): AmplifierElement | FixedScaleAmplifierElement | undefined {
  const amplifier = design.amplifier;
  if (amplifier === undefined) return undefined;
  if (amplifier.kind === "fixed-scale") {
    const { kind: _kind, ...rest } = amplifier;
    return compact<FixedScaleAmplifierElement>({ kind: "fixedScaleAmplifier", type: design.thermocouple.type, ...rest });
  }
  const { kind: _kind, gain, ...rest } = amplifier;
  return compact<AmplifierElement>({ kind: "amplifier", gain: compact(gain), ...rest });
}

/**
 * The chain element of a reference option, or `undefined` for an ideal reference (or a shunt whose series
 * resistor is still to be chosen).
 * @internal
 */
export function _referenceElementOf(reference: DesignReference): ReferenceElement | undefined {
  switch (reference.kind) {
    case "ideal":
      return undefined;
    case "series": {
      const { kind: _kind, name, cost: _cost, ...rest } = reference;
      return compact<ReferenceElement>({ kind: "reference", variant: "series", label: name, ...rest });
    }
    case "regulator-rail": {
      const { kind: _kind, name, cost: _cost, ...rest } = reference;
      return compact<ReferenceElement>({ kind: "reference", variant: "regulator", label: name, ...rest });
    }
    case "shunt": {
      if (reference.seriesOhms === undefined) return undefined;
      const { kind: _kind, name, cost: _cost, seriesResistorSeries: _s, seriesResistorToleranceFraction: _t, ...rest } = reference;
      return compact<ReferenceElement>({ kind: "reference", variant: "shunt", label: name, ...rest });
    }
  }
}

/**
 * A design file's reference entry as a trip-engine reference option.
 * @param reference - one entry of `reference` or `referenceAlternatives`
 * @returns the option (`ideal`, `element`, or `sized-shunt` when a shunt's series resistor is to be chosen)
 * @example
 * ```ts
 * import { referenceOptionFromDesign } from "hotjunction/design";
 * const option = referenceOptionFromDesign({ kind: "regulator-rail", name: "5 V rail", nominalVolts: 5, totalToleranceFraction: 0.04 });
 * console.log(option.kind); // "element"
 * ```
 */
export function referenceOptionFromDesign(reference: DesignReference): ReferenceOption {
  return optionOf(_requireDesignReference(reference, "referenceOptionFromDesign"));
}

/** The option of a validated reference entry. */
function optionOf(reference: DesignReference): ReferenceOption {
  const cost = reference.cost;
  if (reference.kind === "ideal") {
    return compact<ReferenceOption>({ kind: "ideal", name: reference.name, nominalVolts: reference.nominalVolts, cost });
  }
  if (reference.kind === "shunt" && reference.seriesOhms === undefined) {
    const { kind: _kind, name, cost: _cost, seriesResistorSeries, seriesResistorToleranceFraction, seriesOhms: _ohms, ...rest } = reference;
    return compact<ReferenceOption>({
      kind: "sized-shunt",
      name,
      cost,
      element: compact({ kind: "reference", variant: "shunt", label: name, ...rest }),
      seriesResistorSeries,
      seriesResistorToleranceFraction,
    });
  }
  const element = _referenceElementOf(reference);
  return compact<ReferenceOption>({ kind: "element", name: reference.name, cost, element });
}

/**
 * The trip-engine input of a comparator design file.
 * @param design - a validated design with a `comparator`
 * @returns the `TripDesign`
 * @throws DesignFileError (code `INVALID_DESIGN`, `quantity` the path of the first problem) for a value that
 *   `validateDesign` refuses; HotjunctionRangeError (code `INVALID_DESIGN`) when the design has no comparator (an
 *   ADC design has no divider to design)
 * @example
 * ```ts
 * import { tripDesignFromDesign, parseDesign } from "hotjunction/design";
 * import { readFileSync } from "node:fs";
 * const design = parseDesign(readFileSync("examples/reflow-oven-trip.json", "utf8"));
 * console.log(tripDesignFromDesign(design).setpoints.length); // 1
 * ```
 */
export function tripDesignFromDesign(design: DesignFile): TripDesign {
  design = _requireDesign(design, "tripDesignFromDesign");
  if (design.comparator === undefined || design.resistors === undefined) {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "comparator", value: undefined, context: "tripDesignFromDesign", problem: "is missing: an ADC design has no comparator thresholds to design; use the chain instead" });
  }
  const setpoints = design.setpoints.map((s) => compact<TripSetpoint>({ ...s }));
  return compact<TripDesign>({
    name: design.name,
    setpoints,
    thermocouple: thermocoupleOf(design),
    coldJunction: coldJunctionOf(design),
    amplifier: amplifierOf(design),
    comparator: compact<ComparatorElement>({ kind: "comparator", ...design.comparator }),
    reference: optionOf(design.reference),
    resistors: compact<TripResistors>({
      ...design.resistors,
      matched: design.resistors.matched === undefined ? undefined : compact(design.resistors.matched),
    }),
    ambient: { minC: design.ambient.minC, maxC: design.ambient.maxC },
    wire: wireOf(design),
    designColdJunctionC: design.designColdJunctionC,
    processLimits: design.processLimits === undefined ? undefined : { ...design.processLimits },
    sourceDistributions: design.sourceDistributions === undefined ? undefined : Object.fromEntries(
      Object.entries(design.sourceDistributions).map(([k, v]) => [k, compact(v)]),
    ),
  });
}

/**
 * The measurement chain of a design file: thermocouple, cold junction, amplifier, reference and detector (the
 * comparator with the reference directly, or the ADC). Used for error sweeps over temperature and for ADC designs.
 * @param design - a validated design
 * @param reference - which reference option to use (default the design's `reference`)
 * @returns the chain
 * @example
 * ```ts
 * import { measurementChainFromDesign, parseDesign } from "hotjunction/design";
 * import { readFileSync } from "node:fs";
 * const design = parseDesign(readFileSync("examples/heated-enclosure-adc.json", "utf8"));
 * console.log(measurementChainFromDesign(design).detector.kind); // "adc"
 * ```
 */
export function measurementChainFromDesign(design: DesignFile, reference?: DesignReference): MeasurementChain {
  design = _requireDesign(design, "measurementChainFromDesign");
  const chosen = reference === undefined ? design.reference : _requireDesignReference(reference, "measurementChainFromDesign");
  const referenceElement = _referenceElementOf(chosen);
  let detector: ComparatorElement | AdcElement;
  if (design.adc !== undefined) {
    const fullScaleVolts = design.adc.fullScaleVolts ?? (referenceElement === undefined ? chosen.nominalVolts : undefined);
    detector = compact<AdcElement>({ kind: "adc", ...design.adc, fullScaleVolts });
  } else {
    detector = compact<ComparatorElement>({ kind: "comparator", ...design.comparator });
  }
  return compact<MeasurementChain>({
    thermocouple: thermocoupleOf(design),
    coldJunction: coldJunctionOf(design),
    amplifier: amplifierOf(design),
    reference: referenceElement,
    detector,
    ambient: { minC: design.ambient.minC, maxC: design.ambient.maxC },
    wire: wireOf(design),
    sourceDistributions: design.sourceDistributions === undefined ? undefined : Object.fromEntries(
      Object.entries(design.sourceDistributions).map(([k, v]) => [k, compact(v)]),
    ),
    label: design.name,
  });
}

/** Copies plain JSON data without `undefined` members, at every depth. */
function compactDeep(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(compactDeep);
  if (typeof value !== "object" || value === null) return value;
  const out: Record<string, unknown> = {};
  for (const [key, member] of Object.entries(value)) if (member !== undefined) out[key] = compactDeep(member);
  return out;
}

/**
 * The response-time model of a design file's `dynamics` section (the same keys as the library's `DynamicsModel`;
 * the noise slope may be left out, to be taken from the chain at each setpoint by `chainSignalSlope`).
 * @param design - a validated design
 * @returns the model, or `undefined` when the design states no dynamics
 * @example
 * ```ts
 * import { dynamicsModelFromDesign, parseDesign } from "hotjunction/design";
 * import { readFileSync } from "node:fs";
 * const design = parseDesign(readFileSync("examples/ceramic-kiln-cutout.json", "utf8"));
 * console.log(dynamicsModelFromDesign(design)?.sensor?.kind); // "twoLags"
 * ```
 */
export function dynamicsModelFromDesign(design: DesignFile): TripDynamicsModel | undefined {
  design = _requireDesign(design, "dynamicsModelFromDesign");
  return design.dynamics === undefined ? undefined : (compactDeep(design.dynamics) as TripDynamicsModel);
}

/**
 * The failure data of a design file's `failureData` section (first channel, or with `channel: "second"` the
 * second channel's) as the safety figures take it, or `undefined` when the design has none.
 * @param design - a validated design
 * @param channel - `"first"` (default) or `"second"`
 * @returns the failure data (per element a rate in FIT and the mode shares), or undefined
 * @example
 * ```ts
 * import { failureDataFromDesign, parseDesign } from "hotjunction/design";
 * import { readFileSync } from "node:fs";
 * const design = parseDesign(readFileSync("examples/kiln-two-channel-cutout.json", "utf8"));
 * console.log(failureDataFromDesign(design)?.elements[0]?.element); // "thermocouple (kiln roof)"
 * ```
 */
export function failureDataFromDesign(design: DesignFile, channel: "first" | "second" = "first"): FailureData | undefined {
  design = _requireDesign(design, "failureDataFromDesign");
  _requireChoice(channel, "channel", ["first", "second"], "failureDataFromDesign");
  const section = design.failureData;
  const elements = channel === "first" ? section?.elements : section?.secondChannel?.elements;
  if (elements === undefined) return undefined;
  return {
    elements: elements.map((e) =>
      compact<ElementFailureData>({
        element: e.element,
        rateFit: e.rateFit,
        rateSource: e.rateSource,
        modes: e.modes.map((m) => compact<FailureModeShare>({ mode: m.mode, share: m.share, faultId: m.faultId, assumed: m.assumed === undefined ? undefined : { ...m.assumed } })),
      }),
    ),
  };
}

/**
 * The design file of the second channel alone (`failureData.secondChannel`): its own thermocouple (default a
 * second probe like the first channel's), cold junction, amplifier, ADC and reference (default the first
 * channel's), the firmware trips (default the setpoints'), and its protection facts (default the first
 * channel's), so that it can be reviewed and evaluated like any ADC design.
 * @param design - a validated design with a second channel
 * @returns a design file describing the second channel as an ADC (firmware-trip) design
 * @throws HotjunctionRangeError (code `INVALID_DESIGN`) when the design has no second channel
 * @example
 * ```ts
 * import { parseDesign, secondChannelDesign } from "hotjunction/design";
 * import { readFileSync } from "node:fs";
 * const design = parseDesign(readFileSync("examples/kiln-two-channel-cutout.json", "utf8"));
 * console.log(secondChannelDesign(design).adc?.bits); // 12
 * ```
 */
export function secondChannelDesign(design: DesignFile): DesignFile {
  design = _requireDesign(design, "secondChannelDesign");
  const second = design.failureData?.secondChannel;
  if (second === undefined) {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "failureData.secondChannel", value: undefined, context: "secondChannelDesign", problem: "is missing" });
  }
  const { comparator: _comparator, resistors: _resistors, referenceAlternatives: _alternatives, failureData: _failureData, coldJunction: _cj, amplifier: _amp, ...rest } = design;
  return compact<DesignFile>({
    ...rest,
    name: second.name,
    setpoints: design.setpoints.map((s, i) => ({ ...s, tripTemperatureC: second.tripTemperaturesC?.[i] ?? s.tripTemperatureC })),
    thermocouple: second.thermocouple ?? design.thermocouple,
    coldJunction: second.coldJunction,
    amplifier: second.amplifier,
    adc: second.adc,
    reference: second.reference ?? design.reference,
    protection: second.protection ?? design.protection,
  });
}
