// The generated ADC chains of the reading-enclosure tests (tests/chain/readingEnclosure.test.ts): invented demo
// values over the ranges the chain elements accept; the ADC analogue of tests/trip/_chainArbitrary.ts.
import fc from "fast-check";
import type { MeasurementChain } from "../../src/chain/types.js";

/**
 * A generated ADC chain (type, tolerance, front end, compensation, reference or fixed full scale, ADC, ambient) and a
 * hot-junction temperature, with its place between −20 °C and the type's top drawn from `hotFraction`.
 */
export const adcChainArbOver = (hotFraction: fc.Arbitrary<number>) => fc
  .record({
    type: fc.constantFrom("K", "N", "J", "E", "T", "R", "S"),
    // 0 or at least 0.01 °C: a subnormal tolerance widens the hot junction by ulps and its gap to ~2e-9 °C (see DEVELOPERS.md).
    tcTolerance: fc.oneof(fc.constant(0), fc.double({ min: 0.01, max: 3, noNaN: true })),
    front: fc.constantFrom("resistors", "fixed", "fixedScale"),
    compensation: fc.constantFrom("software", "hardware"),
    gain: fc.integer({ min: 10, max: 200 }),
    gainTol: fc.double({ min: 0, max: 0.01, noNaN: true }),
    offsetUv: fc.double({ min: 0, max: 50, noNaN: true }),
    alphaFactor: fc.double({ min: 0.9, max: 1.1, noNaN: true }),
    // 0 or at least 1e-3 °C: a sensor error of the order of an ulp of t_cj at a seam lets the float model attain the
    // standard's step between its pieces in a window the search does not find (src/chain/_readingEnclosure.ts).
    sensorC: fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 2, noNaN: true })),
    gradientC: fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 1, noNaN: true })),
    refTol: fc.double({ min: 0, max: 0.02, noNaN: true }),
    fullScale: fc.constantFrom("reference", "fixed"),
    ratiometric: fc.boolean(),
    bits: fc.integer({ min: 8, max: 24 }),
    offsetLsb: fc.double({ min: 0, max: 4, noNaN: true }),
    adcGainTol: fc.double({ min: 0, max: 0.005, noNaN: true }),
    inlLsb: fc.double({ min: 0, max: 2, noNaN: true }),
    ambientLow: fc.double({ min: -10, max: 30, noNaN: true }),
    ambientSpan: fc.double({ min: 0, max: 40, noNaN: true }),
    hotFraction,
  })
  .map((p): { chain: MeasurementChain; hotJunctionC: number } => {
    const ambient = { minC: p.ambientLow, maxC: p.ambientLow + p.ambientSpan };
    const seebeckNear25: Record<string, number> = { K: 40.6, N: 26.5, J: 51.7, E: 61, T: 40.7, R: 5.9, S: 5.9 };
    const amplifier =
      p.front === "fixedScale"
        ? ({ kind: "fixedScaleAmplifier", type: p.type, millivoltsPerC: 5, accuracyC: p.sensorC, isothermalGradientC: p.gradientC } as const)
        : p.front === "resistors"
          ? ({ kind: "amplifier", gain: { setBy: "resistors", feedbackOhms: (p.gain - 1) * 1000, groundOhms: 1000, toleranceFraction: p.gainTol }, offsetMicrovolts: p.offsetUv } as const)
          : ({ kind: "amplifier", gain: { setBy: "fixed", gain: p.gain, gainErrorFraction: p.gainTol }, offsetMicrovolts: p.offsetUv } as const);
    // Hot-junction temperatures from below the ambient to where the signal nears the full scale (4.096 V).
    const top: Record<string, number> = { K: 900, N: 900, J: 700, E: 600, T: 380, R: 1600, S: 1600 };
    const hotJunctionC = -20 + p.hotFraction * ((top[p.type] as number) + 20);
    const chain: Record<string, unknown> = {
      thermocouple: { kind: "thermocouple", type: p.type, tolerance: { standard: "custom", toleranceC: p.tcTolerance } },
      amplifier,
      reference: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: p.refTol },
      detector: {
        kind: "adc",
        bits: p.bits,
        offsetLsb: p.offsetLsb,
        gainErrorFraction: p.adcGainTol,
        inlLsb: p.inlLsb,
        ratiometric: p.ratiometric,
        ...(p.fullScale === "fixed" ? { fullScaleVolts: 5 } : {}),
      },
      ambient,
    };
    if (p.front !== "fixedScale") {
      chain["coldJunction"] =
        p.compensation === "software"
          ? { kind: "coldJunction", method: "software", sensorAccuracyC: p.sensorC, isothermalGradientC: p.gradientC }
          : {
              kind: "coldJunction",
              method: "hardware",
              compensationMicrovoltsPerC: (seebeckNear25[p.type] as number) * p.alphaFactor,
              matchedAtC: 25,
              sensorAccuracyC: p.sensorC,
            };
    }
    return { chain: chain as unknown as MeasurementChain, hotJunctionC };
  });

/** ADC chains anywhere from −20 °C to the type's top. */
export const adcChainArb = adcChainArbOver(fc.double({ min: 0, max: 1, noNaN: true }));

/** ADC chains in the top 2 % of their range (type N and K at 882 … 900 °C, where Ê's bound is largest). */
export const adcChainNearTopArb = adcChainArbOver(fc.double({ min: 0.98, max: 1, noNaN: true }));

/**
 * A generated wire for an ADC chain (invented demo values): an extension cable (ASTM E230 standard limits, envelope or
 * proportional, probe head up to 60 °C above the terminals), a terminating copper connector above the cold junction
 * or at its own temperature, an inline connector, a loop with bias and detection currents, leakage and ageing, each
 * present or not. Software compensation's terminal gradient is dropped when a terminating connector states it.
 */
export const adcWireChainArbOver = (base: typeof adcChainArb) => fc
  .record({
    base,
    cable: fc.constantFrom("none", "envelope", "proportional"),
    headAboveC: fc.double({ min: 0, max: 60, noNaN: true }),
    headSpanC: fc.double({ min: 0, max: 40, noNaN: true }),
    connector: fc.constantFrom("none", "above", "absolute", "inline"),
    connectorLowC: fc.double({ min: -2, max: 2, noNaN: true }),
    connectorSpanC: fc.double({ min: 0, max: 5, noNaN: true }),
    loop: fc.boolean(),
    biasNa: fc.double({ min: 0, max: 50, noNaN: true }),
    detectionNa: fc.double({ min: 0, max: 100, noNaN: true }),
    leakage: fc.boolean(),
    shuntOhms: fc.double({ min: 2e4, max: 1e6, noNaN: true }),
    ageing: fc.constantFrom("none", "up", "down", "symmetric"),
    driftC: fc.double({ min: 0.01, max: 1, noNaN: true }),
  })
  .map((p): { chain: MeasurementChain; hotJunctionC: number } => {
    const chain = { ...(p.base.chain as unknown as Record<string, unknown>) };
    const ambient = chain["ambient"] as { minC: number; maxC: number };
    const type = (chain["thermocouple"] as { type: string }).type;
    const wire: Record<string, unknown> = {};
    // ASTM E230 extension wire exists for E, J, K, N, T (not for R and S: their compensating cables only).
    if (p.cable !== "none" && ["E", "J", "K", "N", "T"].includes(type) && ambient.minC >= 0) {
      const head = { minC: ambient.minC + p.headAboveC, maxC: ambient.maxC + p.headAboveC + p.headSpanC };
      if (head.maxC <= 200) {
        wire["cable"] = {
          kind: "extensionCable",
          grade: "extension",
          tolerance: { standard: "ASTM E230", limits: "standard" },
          runTemperatureC: { minC: ambient.minC, maxC: head.maxC },
          junctionTemperatureC: head,
          mismatch: p.cable,
        };
      }
    }
    const low = p.connectorLowC;
    const high = p.connectorLowC + p.connectorSpanC;
    if (p.connector === "above") wire["connectors"] = [{ kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: low, maxC: high } }];
    if (p.connector === "absolute") {
      wire["connectors"] = [{ kind: "connector", arrangement: "terminates", contactMetal: "copper", temperatureC: { minC: ambient.minC + low, maxC: ambient.maxC + high } }];
    }
    if (p.connector === "inline") {
      wire["connectors"] = [
        { kind: "connector", arrangement: "inline", contactMetal: "copper", temperatureC: { minC: 20, maxC: 40 }, positiveLegDifferenceC: p.connectorSpanC, negativeLegDifferenceC: p.connectorSpanC / 2 },
      ];
    }
    if (p.connector === "above" || p.connector === "absolute") {
      const cj = chain["coldJunction"] as Record<string, unknown> | undefined;
      if (cj !== undefined && cj["isothermalGradientC"] !== undefined) chain["coldJunction"] = { ...cj, isothermalGradientC: 0 };
    }
    if (p.loop) {
      wire["loop"] = {
        kind: "loopResistance",
        thermocoupleOhms: 40,
        otherOhms: 1000,
        resistanceToleranceFraction: 0.05,
        biasCurrentNanoamps: p.biasNa,
        detectionCurrentNanoamps: p.detectionNa,
        detectionCurrentToleranceFraction: 0.2,
        detectionDirection: "pullUp",
      };
    }
    if (p.leakage) wire["leakage"] = { kind: "insulationLeakage", minimumShuntOhms: p.shuntOhms, loopOhms: 1040 };
    if (p.ageing !== "none") wire["ageing"] = { kind: "ageing", totalDriftC: p.driftC, statedAtC: 1700, serviceHours: 1000, direction: p.ageing };
    chain["wire"] = wire;
    return { chain: chain as unknown as MeasurementChain, hotJunctionC: p.base.hotJunctionC };
  });

/** ADC chains with a wire, anywhere in their range. */
export const adcWireChainArb = adcWireChainArbOver(adcChainArb);

/** ADC chains with a wire in the top 2 % of their range. */
export const adcWireChainNearTopArb = adcWireChainArbOver(adcChainNearTopArb);
