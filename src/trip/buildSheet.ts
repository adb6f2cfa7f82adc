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
import type {
  BuildSheetMidRail,
  BuildSheetNetwork,
  BuildSheetPart,
  BuildSheetResistor,
  BuildSheetSetpoint,
  BuildSheetShuntResistor,
  ReferenceRealization,
  SetpointTripResult,
  ThresholdNetwork,
  TripBuildSheet,
  TripDesign,
} from "./types.js";
import type { MidRailDivider } from "./midRailDivider.js";

// The one naming function of threshold resistors lives in the chain layer (faults/ uses it too).
export { resistorDesignator, resistorPositionNames } from "../chain/resistorPositions.js";
import { resistorDesignator } from "../chain/resistorPositions.js";


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
