// The generated comparator chains of the worst-case tests (tests/trip/worstCaseEnclosure.test.ts,
// tests/trip/worstCaseFastPath.test.ts): invented demo values over the ranges the chain elements accept.
import fc from "fast-check";
import type { MeasurementChain } from "../../src/chain/types.js";

/** A generated comparator chain: type, tolerance, front end, compensation, reference, divider, comparator, ambient, wire. */
export const chainArb = fc
  .record({
    type: fc.constantFrom("K", "N", "J", "E", "T", "R", "S"),
    tcTolerance: fc.double({ min: 0, max: 3, noNaN: true }),
    front: fc.constantFrom("resistors", "fixed", "fixedScale"),
    gain: fc.integer({ min: 20, max: 200 }),
    gainTol: fc.double({ min: 0, max: 0.01, noNaN: true }),
    offsetUv: fc.double({ min: 0, max: 50, noNaN: true }),
    alphaFactor: fc.double({ min: 0.9, max: 1.1, noNaN: true }),
    sensorC: fc.double({ min: 0, max: 2, noNaN: true }),
    refTol: fc.double({ min: 0, max: 0.02, noNaN: true }),
    tapFraction: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
    divTol: fc.double({ min: 0, max: 0.01, noNaN: true }),
    cmpOffsetMv: fc.double({ min: 0, max: 5, noNaN: true }),
    ambientLow: fc.double({ min: -10, max: 30, noNaN: true }),
    ambientSpan: fc.double({ min: 0, max: 40, noNaN: true }),
    connector: fc.boolean(),
    leakage: fc.boolean(),
  })
  .map((p): MeasurementChain => {
    const ambient = { minC: p.ambientLow, maxC: p.ambientLow + p.ambientSpan };
    const seebeckNear25: Record<string, number> = { K: 40.6, N: 26.5, J: 51.7, E: 61, T: 40.7, R: 5.9, S: 5.9 };
    const amplifier =
      p.front === "fixedScale"
        ? ({ kind: "fixedScaleAmplifier", type: p.type, millivoltsPerC: 5, accuracyC: p.sensorC } as const)
        : p.front === "resistors"
          ? ({ kind: "amplifier", gain: { setBy: "resistors", feedbackOhms: (p.gain - 1) * 1000, groundOhms: 1000, toleranceFraction: p.gainTol }, offsetMicrovolts: p.offsetUv } as const)
          : ({ kind: "amplifier", gain: { setBy: "fixed", gain: p.gain, gainErrorFraction: p.gainTol }, offsetMicrovolts: p.offsetUv } as const);
    const chain: Record<string, unknown> = {
      thermocouple: { kind: "thermocouple", type: p.type, tolerance: { standard: "custom", toleranceC: p.tcTolerance } },
      amplifier,
      reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: p.refTol },
      divider: { kind: "divider", resistorsOhms: [Math.round(10000 * (1 - p.tapFraction)), Math.round(10000 * p.tapFraction)], toleranceFraction: p.divTol },
      detector: { kind: "comparator", offsetMillivolts: p.cmpOffsetMv },
      ambient,
    };
    if (p.front !== "fixedScale") {
      chain["coldJunction"] = {
        kind: "coldJunction",
        method: "hardware",
        compensationMicrovoltsPerC: seebeckNear25[p.type] as number * p.alphaFactor,
        matchedAtC: 25,
        sensorAccuracyC: p.sensorC,
      };
    }
    const wire: Record<string, unknown> = {};
    if (p.connector) wire["connectors"] = [{ kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 0, maxC: 3 } }];
    if (p.leakage) wire["leakage"] = { kind: "insulationLeakage", minimumShuntOhms: 50000, loopOhms: 1000 };
    if (Object.keys(wire).length > 0) chain["wire"] = wire;
    return chain as unknown as MeasurementChain;
  });


/**
 * A chain whose trip has an interior extreme in the cold-junction range: hardware compensation at 40.6 µV/°C on
 * type K over 0 … 60 °C, where S(t) − α changes sign (S_K(0 °C) = 39.45 µV/°C, S_K(60 °C) = 41.4 µV/°C, NIST
 * SRD 60 type K table slopes).
 */
export const interiorExtremeChain = {
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
  coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6, matchedAtC: 25, sensorAccuracyC: 0 },
  amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } },
  reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
  divider: { kind: "divider", resistorsOhms: [4990, 5110], toleranceFraction: 0.001 },
  detector: { kind: "comparator" },
  ambient: { minC: 0, maxC: 60 },
} as unknown as MeasurementChain;
