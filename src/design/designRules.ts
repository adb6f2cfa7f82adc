/**
 * Rules across fields of a design file that a schema cannot state: orders of limits, exactly one detector,
 * unique names, what a shunt reference needs.
 * @module
 */
import type { DesignFile, DesignReference } from "./designSchema.js";

/** One broken rule. */
export interface DesignRuleProblem {
  readonly path: string;
  readonly problem: string;
}

function checkReference(reference: DesignReference, path: string, out: DesignRuleProblem[]): void {
  if (reference.kind === "ideal") return;
  if (reference.supplyMinVolts !== undefined && reference.supplyMaxVolts !== undefined && reference.supplyMinVolts > reference.supplyMaxVolts) {
    out.push({ path: `${path}.supplyMinVolts`, problem: `is above supplyMaxVolts (${reference.supplyMaxVolts})` });
  }
  if (reference.kind === "regulator-rail") {
    const parts = [
      reference.totalToleranceFraction,
      reference.initialAccuracyFraction,
      reference.initialToleranceFraction,
      reference.lineRegulationFraction,
      reference.loadRegulationFraction,
      reference.temperatureDriftFraction,
    ];
    if (reference.initialAccuracyFraction !== undefined && reference.initialToleranceFraction !== undefined) {
      out.push({ path: `${path}.initialToleranceFraction`, problem: "is the deprecated name of initialAccuracyFraction, which is given too" });
    }
    if (parts.every((p) => p === undefined)) {
      out.push({ path, problem: "no tolerance given: add totalToleranceFraction (or its parts)" });
    }
    return;
  }
  if (reference.loadMinMilliamps !== undefined && reference.loadMaxMilliamps !== undefined && reference.loadMinMilliamps > reference.loadMaxMilliamps) {
    out.push({ path: `${path}.loadMinMilliamps`, problem: `is above loadMaxMilliamps (${reference.loadMaxMilliamps})` });
  }
  if (reference.kind !== "shunt") return;
  if (reference.shuntMinMilliamps !== undefined && reference.shuntMaxMilliamps !== undefined && reference.shuntMinMilliamps >= reference.shuntMaxMilliamps) {
    out.push({ path: `${path}.shuntMinMilliamps`, problem: `must be below shuntMaxMilliamps (${reference.shuntMaxMilliamps})` });
  }
  if (reference.seriesOhms === undefined) {
    const needed = (["supplyMinVolts", "supplyMaxVolts", "shuntMinMilliamps", "shuntMaxMilliamps"] as const).filter(
      (key) => reference[key] === undefined,
    );
    if (needed.length > 0) {
      out.push({ path, problem: `to choose the series resistor the tool needs ${needed.join(", ")} (or give seriesOhms)` });
    }
    if (reference.supplyMinVolts !== undefined && reference.supplyMinVolts <= reference.nominalVolts) {
      out.push({ path: `${path}.supplyMinVolts`, problem: `must be above nominalVolts (${reference.nominalVolts}) to feed a shunt reference` });
    }
  } else if (reference.seriesResistorSeries !== undefined || reference.seriesResistorToleranceFraction !== undefined) {
    out.push({ path: `${path}.seriesOhms`, problem: "give seriesOhms or seriesResistorSeries/seriesResistorToleranceFraction, not both" });
  }
}

/** The `dynamics` section's signal path matches the detector: analog for a comparator, firmware for an ADC. */
function checkDynamicsRules(design: DesignFile, out: DesignRuleProblem[]): void {
  const path = design.dynamics?.signalPath;
  if (design.dynamics === undefined) return;
  if (design.adc !== undefined && design.comparator === undefined && path?.kind !== "firmware") {
    out.push({
      path: "dynamics.signalPath",
      problem: path === undefined
        ? 'required key is missing (an ADC design trips in firmware: give kind "firmware" with samplePeriodSeconds, digitalFilter, debounceSamples)'
        : 'must be kind "firmware" in an ADC design (the trip is decided by sampled firmware)',
    });
  }
  if (design.comparator !== undefined && design.adc === undefined && path?.kind === "firmware") {
    out.push({ path: "dynamics.signalPath.kind", problem: 'must be "analog" in a comparator design (the comparator decides the trip)' });
  }
}

/**
 * Checks the cross-field rules; returns every broken rule (empty when the design is consistent).
 * @internal
 */
export function _checkDesignRules(design: DesignFile): DesignRuleProblem[] {
  const out: DesignRuleProblem[] = [];
  const hasComparator = design.comparator !== undefined;
  const hasAdc = design.adc !== undefined;
  if (hasComparator === hasAdc) {
    out.push({
      path: "",
      problem: hasComparator
        ? 'give either "comparator" or "adc", not both'
        : 'a detector is missing: give "comparator" (hardware trip) or "adc" (firmware trip)',
    });
  }
  if (hasComparator && design.resistors === undefined) {
    out.push({ path: "resistors", problem: 'required key is missing (a comparator design needs "resistors" for its thresholds)' });
  }
  if (design.amplifier?.kind !== "fixed-scale" && design.coldJunction === undefined) {
    out.push({ path: "coldJunction", problem: "required key is missing (only a fixed-scale amplifier compensates internally)" });
  }
  if (design.amplifier?.kind === "fixed-scale" && design.coldJunction !== undefined) {
    out.push({ path: "coldJunction", problem: "a fixed-scale amplifier compensates internally: remove coldJunction" });
  }
  const ambient = design.ambient;
  if (ambient.minC > ambient.maxC) out.push({ path: "ambient.minC", problem: `is above maxC (${ambient.maxC})` });
  if (design.designColdJunctionC !== undefined && !(design.designColdJunctionC >= ambient.minC && design.designColdJunctionC <= ambient.maxC)) {
    out.push({ path: "designColdJunctionC", problem: `must lie within the ambient range ${ambient.minC} to ${ambient.maxC} °C` });
  }
  const limits = design.processLimits;
  if (limits !== undefined && limits.maxNormalOperatingC >= limits.hazardLimitC) {
    out.push({ path: "processLimits.maxNormalOperatingC", problem: `must be below hazardLimitC (${limits.hazardLimitC})` });
  }
  const names = new Set<string>();
  design.setpoints.forEach((setpoint, i) => {
    const path = `setpoints[${i}]`;
    if (names.has(setpoint.name)) out.push({ path: `${path}.name`, problem: `name ${JSON.stringify(setpoint.name)} is used twice` });
    names.add(setpoint.name);
    const operating = setpoint.maxNormalOperatingC ?? limits?.maxNormalOperatingC;
    const hazard = setpoint.hazardLimitC ?? limits?.hazardLimitC;
    if (operating === undefined || hazard === undefined) {
      out.push({
        path,
        problem: `no ${operating === undefined ? "maxNormalOperatingC" : "hazardLimitC"}: give it here or in processLimits`,
      });
      return;
    }
    if (operating >= hazard) out.push({ path, problem: `maxNormalOperatingC (${operating}) must be below hazardLimitC (${hazard})` });
    else if (!(setpoint.tripTemperatureC > operating && setpoint.tripTemperatureC < hazard)) {
      out.push({
        path: `${path}.tripTemperatureC`,
        problem: `must lie between maxNormalOperatingC (${operating}) and hazardLimitC (${hazard}), found ${setpoint.tripTemperatureC}`,
      });
    }
  });
  const resistors = design.resistors;
  if (resistors?.minTotalOhms !== undefined && resistors.maxTotalOhms !== undefined && resistors.minTotalOhms >= resistors.maxTotalOhms) {
    out.push({ path: "resistors.minTotalOhms", problem: `must be below maxTotalOhms (${resistors.maxTotalOhms})` });
  }
  if (
    resistors?.minDividerCurrentMilliamps !== undefined &&
    resistors.maxDividerCurrentMilliamps !== undefined &&
    resistors.minDividerCurrentMilliamps > resistors.maxDividerCurrentMilliamps
  ) {
    out.push({ path: "resistors.minDividerCurrentMilliamps", problem: `is above maxDividerCurrentMilliamps (${resistors.maxDividerCurrentMilliamps})` });
  }
  checkDynamicsRules(design, out);
  checkReference(design.reference, "reference", out);
  const referenceNames = new Set<string>([design.reference.name]);
  (design.referenceAlternatives ?? []).forEach((reference, i) => {
    const path = `referenceAlternatives[${i}]`;
    if (referenceNames.has(reference.name)) out.push({ path: `${path}.name`, problem: `name ${JSON.stringify(reference.name)} is used twice` });
    referenceNames.add(reference.name);
    checkReference(reference, path, out);
  });
  return out;
}
