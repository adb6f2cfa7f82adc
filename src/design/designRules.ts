/**
 * Rules across fields of a design file that a schema cannot state: orders of limits, exactly one detector,
 * unique names, what a shunt reference needs.
 * @module
 */
import { failureDataProblems } from "../safety/validateFailureData.js";
import { _connectorStage } from "../chain/wire/connector.js";
import { _extensionCableStage } from "../chain/wire/extensionCable.js";
import { _loopStage } from "../chain/wire/loopResistance.js";
import { _ageingStage, _leakageStage } from "../chain/wire/probe.js";
import type { AgeingElement, ConnectorElement, ExtensionCableElement, InsulationLeakageElement, LoopResistanceElement } from "../chain/wireTypes.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
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

/**
 * The cross-field rules of one reference entry at `path` (as the design's `reference` is checked).
 * @internal
 */
export function _checkReferenceRules(reference: DesignReference, path: string): DesignRuleProblem[] {
  const out: DesignRuleProblem[] = [];
  checkReference(reference, path, out);
  return out;
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
 * The failure-data rules a schema cannot state (the shares of each element sum to 1, exactly one of faultId and
 * assumed per mode), and the second channel's shape. Whether each faultId names a fault of the review needs the
 * fault catalogue: `validate` and `faults` check that (see `_designFailureDataProblems` in the CLI).
 */
function checkFailureData(design: DesignFile, out: DesignRuleProblem[]): void {
  const data = design.failureData;
  if (data === undefined) return;
  const push = (root: string, elements: unknown): void => {
    for (const e of failureDataProblems({ elements }, { path: root })) {
      const prefix = `failure data: ${e.quantity} `;
      out.push({ path: e.quantity, problem: e.message.startsWith(prefix) ? e.message.slice(prefix.length) : e.message });
    }
  };
  push("failureData", data.elements);
  const second = data.secondChannel;
  if (second === undefined) return;
  push("failureData.secondChannel", second.elements);
  if (second.amplifier?.kind !== "fixed-scale" && second.coldJunction === undefined) {
    out.push({ path: "failureData.secondChannel.coldJunction", problem: "required key is missing (only a fixed-scale amplifier compensates internally)" });
  }
  if (second.amplifier?.kind === "fixed-scale" && second.coldJunction !== undefined) {
    out.push({ path: "failureData.secondChannel.coldJunction", problem: "a fixed-scale amplifier compensates internally: remove coldJunction" });
  }
  if (second.tripTemperaturesC !== undefined && second.tripTemperaturesC.length !== design.setpoints.length) {
    out.push({
      path: "failureData.secondChannel.tripTemperaturesC",
      problem: `has ${second.tripTemperaturesC.length} entries; give one per setpoint (${design.setpoints.length})`,
    });
  }
  if (second.reference !== undefined) checkReference(second.reference, "failureData.secondChannel.reference", out);
}

/**
 * Runs an element's checker; a typed error becomes a problem at the element's path (the quantity appended
 * when it is a key of the element), in one line.
 */
function checkElement(path: string, build: () => unknown, out: DesignRuleProblem[]): void {
  try {
    build();
  } catch (e) {
    if (!(e instanceof HotjunctionRangeError || e instanceof HotjunctionTypeError)) throw e;
    const key = /^[A-Za-z][A-Za-z0-9]*(\.[A-Za-z][A-Za-z0-9]*)*$/.test(e.quantity) ? e.quantity.replace(/^connector\d*\./, "") : "";
    const message = e.message.replace(/^[^:]*\([^)]*\)[^:]*: |^[^:]*: /, "");
    out.push({ path: key === "" ? path : `${path}.${key}`, problem: message });
  }
}

/** The wire's elements, each checked by its own checker; and the two physical effects a chain must state once. */
function checkWire(design: DesignFile, out: DesignRuleProblem[]): void {
  const w = design.wire;
  if (w === undefined) return;
  const type = design.thermocouple.type;
  const ambient = { minC: design.ambient.minC, maxC: design.ambient.maxC };
  if (ambient.minC > ambient.maxC) return;
  const ctx = { overrides: undefined };
  const c = w.cable;
  if (c !== undefined) {
    checkElement("wire.cable", () => _extensionCableStage({ kind: "extensionCable", ...c } as ExtensionCableElement, type, ambient, ctx, "cable"), out);
  }
  const connectors = w.connectors ?? [];
  connectors.forEach((k, i) => {
    const name = connectors.length === 1 ? "connector" : `connector${i + 1}`;
    checkElement(`wire.connectors[${i}]`, () => _connectorStage({ kind: "connector", ...k } as ConnectorElement, type, ambient, ctx, "connector", name), out);
  });
  const loop = w.loop;
  if (loop !== undefined) checkElement("wire.loop", () => _loopStage({ kind: "loopResistance", ...loop } as LoopResistanceElement, type, ctx, "loop"), out);
  const leakage = w.leakage;
  if (leakage !== undefined) checkElement("wire.leakage", () => _leakageStage({ kind: "insulationLeakage", ...leakage } as InsulationLeakageElement, ctx, "leakage"), out);
  const ageing = w.ageing;
  if (ageing !== undefined) checkElement("wire.ageing", () => _ageingStage({ kind: "ageing", ...ageing } as AgeingElement, ctx, "ageing"), out);
  const amp = design.amplifier;
  if (loop !== undefined && amp?.kind === "voltage" && (amp.biasCurrentNanoamps ?? 0) > 0 && (amp.sourceResistanceOhms ?? 0) > 0) {
    out.push({
      path: "amplifier.sourceResistanceOhms",
      problem: "is given together with wire.loop: the bias current through the loop is counted once; state it as wire.loop.biasCurrentNanoamps and drop amplifier.sourceResistanceOhms",
    });
  }
  if (connectors.some((k) => k.arrangement === "terminates")) {
    const gradients: [string, number | undefined][] = [
      ["coldJunction.isothermalGradientC", design.coldJunction?.isothermalGradientC],
      ["amplifier.isothermalGradientC", amp?.kind === "fixed-scale" ? amp.isothermalGradientC : undefined],
    ];
    for (const [path, g] of gradients) {
      if (g !== undefined && g > 0) {
        out.push({
          path,
          problem:
            "is given together with a terminating connector in wire.connectors: both state the terminals' temperature against the cold-junction sensor; state it once (the connector's aboveColdJunctionC, or the gradient without the connector)",
        });
      }
    }
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
  checkFailureData(design, out);
  checkReference(design.reference, "reference", out);
  checkWire(design, out);
  const referenceNames = new Set<string>([design.reference.name]);
  (design.referenceAlternatives ?? []).forEach((reference, i) => {
    const path = `referenceAlternatives[${i}]`;
    if (referenceNames.has(reference.name)) out.push({ path: `${path}.name`, problem: `name ${JSON.stringify(reference.name)} is used twice` });
    referenceNames.add(reference.name);
    checkReference(reference, path, out);
  });
  return out;
}
