/**
 * The build sheet of a trip design: what a designer needs to build the circuit (threshold voltages, the
 * resistors by position and standard value, divider currents, release temperatures and their margin, the sized
 * shunt series resistor with a power rating, the mid-rail divider) and the bill of materials. Plain data; the
 * renderers in `report/` print it, the browser workbench shows it.
 * @module
 */
import { _requireInteger } from "../errors.js";
import { nearestStandardResistor } from "./standardResistorValues.js";
import type { PreferredSeriesName } from "../data/preferredSeries.js";
import type { ThermocoupleElement } from "../chain/types.js";
import type { ReferenceRealization, SetpointTripResult, ThresholdNetwork, TripDesign } from "./types.js";
import type { MidRailDivider } from "./midRailDivider.js";

const CONTEXT = "resistor position names";
/** Most resistors in one string (a ladder of the design file's 64 setpoints has 65). */
const maxResistorsInString = 1000;

/**
 * The position names of the resistors of one divider, from the reference end to ground: two resistors are
 * `top` and `bottom`; a ladder of n is `top`, `ladder 1` … `ladder n−2` (in order from the reference), `bottom`.
 * Every report (check, compare, faults, the build sheet) names a threshold resistor so.
 * @param count - number of resistors in the string, integer 1 … 1000 (one resistor alone is `top`)
 * @returns one name per resistor, index 0 at the reference
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a count that is not an integer in 1 … 1000
 * @example
 * ```ts
 * import { resistorPositionNames } from "hotjunction";
 * console.log(resistorPositionNames(4)); // [ 'top', 'ladder 1', 'ladder 2', 'bottom' ]
 * ```
 */
export function resistorPositionNames(count: number): string[] {
  _requireInteger(count, "resistor count", 1, maxResistorsInString, CONTEXT);
  if (count === 1) return ["top"];
  return Array.from({ length: count }, (_, i) => (i === 0 ? "top" : i === count - 1 ? "bottom" : `ladder ${i}`));
}

/**
 * The name of resistor `index` (0 at the reference) of network `networkIndex` when a design has `networkCount`
 * networks: the position name alone for one network, `divider <n> <position>` (n from 1) for several.
 * @param index - integer 0 … count − 1
 * @param count - resistors in the network, integer 1 … 1000
 * @param networkIndex - integer 0 … networkCount − 1
 * @param networkCount - networks of the design, integer 1 … 1000
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for an index or count out of range
 * @example
 * ```ts
 * import { resistorDesignator } from "hotjunction";
 * console.log(resistorDesignator(1, 2, 0, 2)); // "divider 1 bottom"
 * ```
 */
export function resistorDesignator(index: number, count: number, networkIndex = 0, networkCount = 1): string {
  const names = resistorPositionNames(count);
  _requireInteger(index, "resistor index", 0, count - 1, CONTEXT);
  _requireInteger(networkCount, "network count", 1, maxResistorsInString, CONTEXT);
  _requireInteger(networkIndex, "network index", 0, networkCount - 1, CONTEXT);
  const position = names[index] as string;
  return networkCount > 1 ? `divider ${networkIndex + 1} ${position}` : position;
}

/** One resistor of a threshold network on the build sheet. */
export interface BuildSheetResistor {
  /** Position name (see {@link resistorDesignator}). */
  readonly designator: string;
  /** Standard value, Ω. */
  readonly ohms: number;
}

/** One threshold network on the build sheet. */
export interface BuildSheetNetwork {
  readonly topology: ThresholdNetwork["topology"];
  /** From the reference end to ground. */
  readonly resistors: readonly BuildSheetResistor[];
  readonly totalOhms: number;
  /** Divider current at nominal reference voltage, mA. */
  readonly currentMilliamps: number;
}

/** One comparator setpoint on the build sheet. */
export interface BuildSheetSetpoint {
  readonly name: string;
  /** Threshold at the comparator's reference input with nominal parts: ideal and from the standard resistors, V. */
  readonly idealThresholdVolts: number;
  readonly realizedThresholdVolts: number;
  /** realized − ideal, V. */
  readonly thresholdErrorVolts: number;
  /**
   * Worst-case extremes of the threshold voltage, V: the reference at ± its total tolerance and every resistor
   * above the tap at one end of its tolerance (plus tempco over the ambient span from 25 °C) and every one below
   * at the other (exact for the divider ratio; a matched network is bounded by its absolute tolerances here).
   */
  readonly thresholdLowVolts: number;
  readonly thresholdHighVolts: number;
  /** Index into `networks`, and the resistors above and below this setpoint's tap (by designator). */
  readonly networkIndex: number;
  readonly resistorsAbove: readonly BuildSheetResistor[];
  readonly resistorsBelow: readonly BuildSheetResistor[];
  /** Current through this setpoint's divider, mA. */
  readonly dividerCurrentMilliamps: number;
  /** Nominal trip and release (from the hysteresis), °C, and their difference, °C. */
  readonly nominalTripC: number;
  readonly nominalReleaseC: number;
  readonly hysteresisC: number;
  /** Worst-case release band, °C. */
  readonly releaseLowC: number;
  readonly releaseHighC: number;
  /** releaseLowC − highest normal operating temperature, °C (> 0: every unit re-arms at normal operation). */
  readonly releaseMarginToNormalC: number;
}

/** One setpoint of an ADC (firmware) design on the build sheet. */
export interface BuildSheetAdcSetpoint {
  readonly name: string;
  /** Detector-input voltage at the setpoint with nominal parts, V. */
  readonly signalVolts: number;
  /** Unrounded nominal code at the setpoint, LSB, and the integer code firmware compares against (code ≥ it trips). */
  readonly nominalCode: number;
  readonly thresholdCode: number;
  /** Nominal code slope at the setpoint, LSB/°C. */
  readonly codesPerC: number;
  /** Worst-case band of the code read at the true setpoint temperature, LSB (first order: slope × reading error). */
  readonly codeLow: number;
  readonly codeHigh: number;
}

/** The sized shunt series resistor. */
export interface BuildSheetShuntResistor {
  readonly ohms: number;
  readonly series: PreferredSeriesName;
  readonly toleranceFraction: number;
  /** Worst dissipation, W, and the smallest standard rating with at least 2× that (50 % derating, common practice). */
  readonly powerWatts: number;
  readonly ratingWatts: number;
}

/** The mid-rail divider: two equal resistors (suggested value: the standard value nearest half the first threshold network's total). */
export interface BuildSheetMidRail {
  readonly topOhms: number;
  readonly bottomOhms: number;
  readonly nominalVolts: number;
  readonly worstCaseLowVolts: number;
  readonly worstCaseHighVolts: number;
}

/** One line of the bill of materials. */
export interface BuildSheetPart {
  /** Designators this line covers, comma-separated. */
  readonly designators: string;
  /** `resistor`, `reference`, `thermocouple`. */
  readonly part: string;
  /** Value in `unit` (Ω, V) or, for a thermocouple, the type letter. */
  readonly value: number | string;
  readonly unit: string;
  /** ±fraction (thermocouple: the tolerance in °C at the first setpoint). */
  readonly tolerance: number;
  readonly toleranceUnit: "fraction" | "°C";
  /** ±ppm/°C (0 where not given). */
  readonly tempcoPpmPerC: number;
  readonly count: number;
}

/** The build sheet (a plain, JSON-serializable object; every number a field). */
export interface TripBuildSheet {
  /** Layout version of this object (1). */
  readonly sheetVersion: 1;
  readonly setpoints: readonly BuildSheetSetpoint[];
  readonly adcSetpoints: readonly BuildSheetAdcSetpoint[];
  readonly networks: readonly BuildSheetNetwork[];
  readonly shuntSeriesResistor?: BuildSheetShuntResistor;
  readonly midRail?: BuildSheetMidRail;
  readonly parts: readonly BuildSheetPart[];
}

/** Standard power ratings of resistors, W (common practice, no source). */
const ratingsWatts = [0.0625, 0.1, 0.125, 0.25, 0.5, 1, 2, 3, 5, 10];

/** The smallest standard rating of at least twice the dissipation, W. @internal */
export function _powerRatingWatts(powerWatts: number): number {
  return ratingsWatts.find((r) => r >= 2 * powerWatts) ?? Math.ceil(2 * powerWatts);
}

function networkResistors(n: ThresholdNetwork, index: number, count: number): BuildSheetResistor[] {
  return n.resistorsOhms.map((ohms, i) => ({ designator: resistorDesignator(i, n.resistorsOhms.length, index, count), ohms }));
}

function thresholdExtremes(s: SetpointTripResult, reference: ReferenceRealization, design: TripDesign): { thresholdLowVolts: number; thresholdHighVolts: number } {
  const span = Math.max(Math.abs(design.ambient.minC - 25), Math.abs(design.ambient.maxC - 25));
  const t = design.resistors.toleranceFraction + ((design.resistors.tempcoPpmPerC ?? 0) * 1e-6 * span);
  const [above, below] = s.resistorsOhms;
  const ratio = (a: number, b: number): number => b / (a + b);
  const v = reference.nominalVolts;
  const r = reference.toleranceFraction;
  return {
    thresholdLowVolts: v * (1 - r) * ratio(above * (1 + t), below * (1 - t)),
    thresholdHighVolts: v * (1 + r) * ratio(above * (1 - t), below * (1 + t)),
  };
}

/** @internal The build sheet of a comparator trip design. */
export function _comparatorBuildSheet(
  design: TripDesign,
  networks: readonly ThresholdNetwork[],
  setpoints: readonly SetpointTripResult[],
  reference: ReferenceRealization,
  midRail: MidRailDivider,
  thermocoupleToleranceC: number,
): TripBuildSheet {
  const sheetNetworks: BuildSheetNetwork[] = networks.map((n, i) => ({
    topology: n.topology,
    resistors: networkResistors(n, i, networks.length),
    totalOhms: n.totalOhms,
    currentMilliamps: n.currentMilliamps,
  }));
  const sheetSetpoints: BuildSheetSetpoint[] = setpoints.map((s) => {
    const resistors = (sheetNetworks[s.networkIndex] as BuildSheetNetwork).resistors;
    return {
      name: s.name,
      idealThresholdVolts: s.idealThresholdVolts,
      realizedThresholdVolts: s.realizedThresholdVolts,
      thresholdErrorVolts: s.realizedThresholdVolts - s.idealThresholdVolts,
      ...thresholdExtremes(s, reference, design),
      networkIndex: s.networkIndex,
      resistorsAbove: resistors.slice(0, s.tapIndex + 1),
      resistorsBelow: resistors.slice(s.tapIndex + 1),
      dividerCurrentMilliamps: (networks[s.networkIndex] as ThresholdNetwork).currentMilliamps,
      nominalTripC: s.nominalTripC,
      nominalReleaseC: s.nominalReleaseC,
      hysteresisC: s.nominalTripC - s.nominalReleaseC,
      releaseLowC: s.releaseWorstCase.lowC,
      releaseHighC: s.releaseWorstCase.highC,
      releaseMarginToNormalC: s.releaseMarginToNormalC,
    };
  });
  const series = design.resistors.series;
  const tolerance = design.resistors.toleranceFraction;
  const tempco = design.resistors.tempcoPpmPerC ?? 0;
  const parts: BuildSheetPart[] = [];
  const addResistor = (designator: string, ohms: number, tol: number, tc: number): void => {
    const same = parts.findIndex((p) => p.part === "resistor" && p.value === ohms && p.tolerance === tol && p.tempcoPpmPerC === tc);
    if (same >= 0) {
      const p = parts[same] as BuildSheetPart;
      parts[same] = { ...p, designators: `${p.designators}, ${designator}`, count: p.count + 1 };
    } else {
      parts.push({ designators: designator, part: "resistor", value: ohms, unit: "Ω", tolerance: tol, toleranceUnit: "fraction", tempcoPpmPerC: tc, count: 1 });
    }
  };
  for (const n of sheetNetworks) for (const r of n.resistors) addResistor(r.designator, r.ohms, tolerance, tempco);
  let shuntSeriesResistor: BuildSheetShuntResistor | undefined;
  const element = reference.element;
  if (reference.kind === "sized-shunt" && element?.variant === "shunt" && reference.seriesResistorPowerWatts !== undefined) {
    const option = design.reference.kind === "sized-shunt" ? design.reference : undefined;
    shuntSeriesResistor = {
      ohms: element.seriesOhms,
      series: option?.seriesResistorSeries ?? series,
      toleranceFraction: option?.seriesResistorToleranceFraction ?? tolerance,
      powerWatts: reference.seriesResistorPowerWatts,
      ratingWatts: _powerRatingWatts(reference.seriesResistorPowerWatts),
    };
    addResistor("shunt series", shuntSeriesResistor.ohms, shuntSeriesResistor.toleranceFraction, tempco);
  }
  const first = networks[0];
  let sheetMidRail: BuildSheetMidRail | undefined;
  if (first !== undefined) {
    const half = nearestStandardResistor(series, first.totalOhms / 2);
    sheetMidRail = {
      topOhms: half,
      bottomOhms: half,
      nominalVolts: midRail.nominalVolts,
      worstCaseLowVolts: midRail.worstCaseLowVolts,
      worstCaseHighVolts: midRail.worstCaseHighVolts,
    };
    addResistor("mid-rail top", half, tolerance, tempco);
    addResistor("mid-rail bottom", half, tolerance, tempco);
  }
  if (reference.kind !== "ideal") {
    const tempcoRef = element !== undefined && "tempcoPpmPerC" in element ? (element.tempcoPpmPerC ?? 0) : 0;
    parts.push({ designators: "reference", part: "reference", value: reference.nominalVolts, unit: "V", tolerance: reference.toleranceFraction, toleranceUnit: "fraction", tempcoPpmPerC: tempcoRef, count: 1 });
  }
  parts.push(thermocouplePart(design.thermocouple, thermocoupleToleranceC));
  return {
    sheetVersion: 1,
    setpoints: sheetSetpoints,
    adcSetpoints: [],
    networks: sheetNetworks,
    ...(shuntSeriesResistor !== undefined ? { shuntSeriesResistor } : {}),
    ...(sheetMidRail !== undefined ? { midRail: sheetMidRail } : {}),
    parts,
  };
}

/** @internal The bill-of-materials line of a thermocouple. */
export function thermocouplePart(thermocouple: ThermocoupleElement, toleranceC: number): BuildSheetPart {
  return { designators: "thermocouple", part: "thermocouple", value: `type ${thermocouple.type}`, unit: "", tolerance: toleranceC, toleranceUnit: "°C", tempcoPpmPerC: 0, count: 1 };
}
