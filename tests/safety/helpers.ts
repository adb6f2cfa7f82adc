/**
 * Shared data of the safety-figure tests. The chain and every failure rate here are invented demo figures
 * (a reflow-oven style comparator watchdog); the values checked against them are named in each test.
 */
import type { FailureData, MeasurementChain, SetpointFaultClasses } from "../../src/index.js";

/** Type K, fixed-scale amplifier 5 mV/°C, 2.5 V series reference, divider 12 kΩ over 13 kΩ, cold junction 25 °C. */
export const ovenChain: MeasurementChain = {
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
  reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
  divider: { kind: "divider", resistorsOhms: [12000, 13000], toleranceFraction: 0.01 },
  detector: { kind: "comparator" },
  ambient: { minC: 25, maxC: 25 },
};

export const ovenTrip = { name: "oven", maxNormalOperatingC: 250, hazardLimitC: 280 } as const;

/** Invented rates (FIT) and shares for every element of {@link ovenChain}; drift modes carry an assumed class. */
export const ovenFailureData: FailureData = {
  elements: [
    {
      element: "thermocouple",
      rateFit: 2000,
      rateSource: "invented for the test",
      modes: [
        { mode: "open", share: 0.6, faultId: "thermocouple.open" },
        { mode: "short at terminals", share: 0.1, faultId: "thermocouple.shortAtTerminals" },
        { mode: "short along wire", share: 0.1, faultId: "thermocouple.shortAlongWire" },
        { mode: "drift", share: 0.2, assumed: { safety: "degraded", detected: false } },
      ],
    },
    {
      element: "fixed-scale amplifier",
      rateFit: 100,
      modes: [
        { mode: "output stuck low", share: 0.4, faultId: "fixedScaleAmplifier.outputStuckLow" },
        { mode: "output stuck high", share: 0.4, faultId: "fixedScaleAmplifier.outputStuckHigh" },
        { mode: "loss of supply", share: 0.2, faultId: "fixedScaleAmplifier.supplyLost" },
      ],
    },
    {
      element: "reference",
      rateFit: 30,
      modes: [
        { mode: "open", share: 0.3, faultId: "reference.open" },
        { mode: "short", share: 0.3, faultId: "reference.short" },
        { mode: "drift low", share: 0.2, faultId: "reference.driftedLow" },
        { mode: "drift high", share: 0.2, faultId: "reference.driftedHigh" },
      ],
    },
    ...[0, 1].map((i) => ({
      element: `divider resistor ${i}`,
      rateFit: 2,
      modes: [
        { mode: "open", share: 0.6, faultId: `divider.resistor${i}.open` },
        { mode: "short", share: 0.1, faultId: `divider.resistor${i}.short` },
        { mode: "drift", share: 0.3, assumed: { safety: "no-effect" as const, detected: false } },
      ],
    })),
    {
      element: "comparator",
      rateFit: 20,
      modes: [
        { mode: "output stuck high", share: 0.5, faultId: "comparator.outputStuckHigh" },
        { mode: "output stuck low", share: 0.5, faultId: "comparator.outputStuckLow" },
      ],
    },
  ],
};

/** A small setpoint of four faults with stated classes (for hand sums). */
export const handSetpoint: SetpointFaultClasses = {
  name: "hand",
  faults: [
    { faultId: "a.open", safety: "safe", detected: true, shiftC: null, marginC: null },
    { faultId: "a.short", safety: "dangerous", detected: false, shiftC: null, marginC: null },
    { faultId: "b.stuckLow", safety: "dangerous", detected: true, shiftC: null, marginC: null },
    { faultId: "b.stuckHigh", safety: "safe", detected: false, shiftC: null, marginC: null },
    { faultId: "b.drift", safety: "degraded", detected: false, shiftC: 6, marginC: 10 },
  ],
};

/** Invented rates for {@link handSetpoint}: a = 1000 FIT (open 70 %, short 30 %), b = 200 FIT (25/25/50 %). */
export const handData: FailureData = {
  elements: [
    { element: "a", rateFit: 1000, modes: [{ mode: "open", share: 0.7, faultId: "a.open" }, { mode: "short", share: 0.3, faultId: "a.short" }] },
    {
      element: "b",
      rateFit: 200,
      modes: [
        { mode: "stuck low", share: 0.25, faultId: "b.stuckLow" },
        { mode: "stuck high", share: 0.25, faultId: "b.stuckHigh" },
        { mode: "drift", share: 0.5, faultId: "b.drift" },
      ],
    },
  ],
};
