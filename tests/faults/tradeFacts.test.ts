/**
 * What single faults do to a comparator watchdog: trade facts of over-temperature protection
 * (`common practice, no source`), and hand checks of trip temperatures against NIST SRD 60 / Monograph 175
 * type K table values (copied below with their source).
 */
import { describe, expect, it } from "vitest";
import { reviewFaults, type FaultReview, type FaultReviewRow } from "../../src/index.js";
import { enclosureChain, enclosureTrip, kilnChain, kilnTrip, ovenChain, ovenTrip } from "./helpers.js";

function row(review: FaultReview, id: string): FaultReviewRow {
  const r = review.rows.find((x) => x.faultId === id);
  if (r === undefined) throw new Error(`no row ${id}`);
  return r;
}

// NIST SRD 60 (Monograph 175) type K reference table, cold junction 0 °C, mV:
// E(25) = 1.000, E(230) = 9.343, E(240) = 9.747, E(250) = 10.153, E(260) = 10.561.
const nistK = { 25: 1.0, 230: 9.343, 240: 9.747, 250: 10.153, 260: 10.561 } as const;
function interpolateK(emf: number, lo: 230 | 250, hi: 240 | 260): number {
  return lo + ((emf - nistK[lo]) / (nistK[hi] - nistK[lo])) * (hi - lo);
}

describe("hand checks of the healthy and offset trips (NIST SRD 60 type K table)", () => {
  const review = reviewFaults(ovenChain, ovenTrip, { openCircuitBias: "pull-up" });
  it("healthy trip: threshold 2.5 V × 13/25 = 1.3 V = 5 mV/°C × [(E(t) − E(25))/α + 25], α = E(25)/25 = 0.040 mV/°C", () => {
    // (E(t) − 1.000)/0.040 + 25 = 260  =>  E(t) = 10.400 mV  =>  t ≈ 256.05 °C by linear interpolation in the table.
    // Tolerance 0.15 °C: the table rounds to 1 µV and E(25) enters ×10.4 (±5 µV ≈ ±0.13 °C), plus the chord error.
    const expected = interpolateK(10.4, 250, 260);
    expect(Math.abs(review.healthyTripC - expected)).toBeLessThan(0.15);
  });
  it("a +1 mV ground offset at the input trips where E(t) = 10.400 − 1 = 9.400 mV", () => {
    const expected = interpolateK(9.4, 230, 240); // ≈ 231.41 °C
    const r = row(review, "thermocouple.groundOffsetPositive");
    expect(r.effect).toBe("trips-early");
    expect(Math.abs((r.tripC as number) - expected)).toBeLessThan(0.15);
    expect(r.shiftC as number).toBeCloseTo((r.tripC as number) - review.healthyTripC, 9);
    // 231.4 °C is below the highest normal temperature (250 °C): a nuisance trip, a safe failure.
    expect(r.safety).toBe("safe");
  });
});

describe("trade facts of single faults in a comparator watchdog (common practice, no source)", () => {
  it("a thermocouple shorted at the terminals reads the cold junction and never trips: dangerous, undetected", () => {
    for (const [chain, trip] of [
      [ovenChain, ovenTrip],
      [kilnChain, kilnTrip],
    ] as const) {
      const r = row(reviewFaults(chain, trip), "thermocouple.shortAtTerminals");
      expect(r.effect).toBe("never-trips");
      expect(r.category).toBe("dangerous-undetected");
      expect(r.mitigations).toContain("an independent, non-resettable thermal cutoff");
    }
  });

  it("... unless a check exists: an independent supervisory sensor detects the short", () => {
    const review = reviewFaults(ovenChain, ovenTrip, { detection: { supervisoryReading: { independentSensor: true, toleranceC: 10 } } });
    const r = row(review, "thermocouple.shortAtTerminals");
    expect(r.category).toBe("dangerous-detected");
    // The reading stays at 25 °C; the disagreement passes 10 °C once the hot junction passes 35 °C.
    expect(r.detectionText).toBe("supervisory reading (from 36.0 °C)");
  });

  it("a short along the wire reads the temperature at the short: below the trip it never trips", () => {
    const review = reviewFaults(ovenChain, ovenTrip, { wireShortC: 150 });
    expect(row(review, "thermocouple.shortAlongWire").effect).toBe("never-trips");
    // A short in a zone hotter than the trip point trips at once (the reading sits above the threshold).
    const hot = reviewFaults(ovenChain, ovenTrip, { wireShortC: 300 });
    expect(row(hot, "thermocouple.shortAlongWire").effect).toBe("trips-immediately");
  });

  it("an open thermocouple with pull-up bias drives the reading up and trips: safe", () => {
    for (const [chain, trip] of [
      [ovenChain, ovenTrip],
      [kilnChain, kilnTrip],
    ] as const) {
      const r = row(reviewFaults(chain, trip, { openCircuitBias: "pull-up" }), "thermocouple.open");
      expect(r.effect).toBe("trips-immediately");
      expect(r.safety).toBe("safe");
    }
  });

  it("the same with pull-down bias, or with no bias (floating), is dangerous", () => {
    for (const [chain, trip] of [
      [ovenChain, ovenTrip],
      [kilnChain, kilnTrip],
    ] as const) {
      const down = row(reviewFaults(chain, trip, { openCircuitBias: "pull-down" }), "thermocouple.open");
      expect(down.effect).toBe("never-trips");
      expect(down.safety).toBe("dangerous");
      const none = row(reviewFaults(chain, trip, { openCircuitBias: "none" }), "thermocouple.open");
      expect(none.safety).toBe("dangerous");
      expect(none.decidingAlternative).toMatch(/^floating input/);
    }
  });

  it("open-thermocouple detection turns the dangerous open into a detected one", () => {
    const r = row(reviewFaults(ovenChain, ovenTrip, { openCircuitBias: "pull-down", detection: { openThermocoupleDetection: true } }), "thermocouple.open");
    expect(r.category).toBe("dangerous-detected");
    expect(r.detectedBy).toEqual(["open-thermocouple-detection"]);
  });

  it("reversed polarity never trips", () => {
    for (const [chain, trip] of [
      [ovenChain, ovenTrip],
      [kilnChain, kilnTrip],
      [enclosureChain, enclosureTrip],
    ] as const) {
      expect(row(reviewFaults(chain, trip), "thermocouple.reversed").effect).toBe("never-trips");
    }
  });

  it("a lower-leg divider resistor open moves the threshold to the reference rail (never trips: dangerous); shorted, to ground (trips at once: safe)", () => {
    for (const [chain, trip] of [
      [ovenChain, ovenTrip],
      [kilnChain, kilnTrip],
    ] as const) {
      const review = reviewFaults(chain, trip);
      expect(row(review, "divider.resistor1.open").category).toBe("dangerous-undetected");
      expect(row(review, "divider.resistor1.short").effect).toBe("trips-immediately");
      expect(row(review, "divider.resistor1.short").safety).toBe("safe");
      // The upper leg is the mirror image.
      expect(row(review, "divider.resistor0.open").effect).toBe("trips-immediately");
      expect(row(review, "divider.resistor0.short").safety).toBe("dangerous");
    }
  });

  it("a window on the threshold side is not the signal window: a divider fault stays undetected by a signal window", () => {
    const review = reviewFaults(ovenChain, ovenTrip, { detection: { outOfRangeWindow: { lowC: 0, highC: 320 } } });
    expect(row(review, "divider.resistor1.open").detected).toBe(false);
    // ...but an amplifier output stuck at the high rail (5 V = 1000 °C indicated) is outside the window.
    expect(row(review, "fixedScaleAmplifier.outputStuckHigh").category).toBe("safe-detected");
  });

  it("loss of the board supply is safe only for de-energise-to-trip", () => {
    for (const [chain, trip] of [
      [ovenChain, ovenTrip],
      [kilnChain, kilnTrip],
      [enclosureChain, enclosureTrip],
    ] as const) {
      const energize = row(reviewFaults(chain, trip, { outputStage: "energize-to-trip" }), "board.supplyLost");
      expect(energize.category).toBe("dangerous-undetected");
      const deenergize = row(reviewFaults(chain, trip, { outputStage: "de-energize-to-trip" }), "board.supplyLost");
      expect(deenergize.effect).toBe("trips-immediately");
      expect(deenergize.safety).toBe("safe");
    }
  });

  it("comparator output stuck at the trip level trips at once; stuck at the other level never trips (either polarity)", () => {
    const high = reviewFaults(ovenChain, ovenTrip, { comparatorTripLevel: "high" });
    expect(row(high, "comparator.outputStuckHigh").effect).toBe("trips-immediately");
    expect(row(high, "comparator.outputStuckLow").effect).toBe("never-trips");
    const low = reviewFaults(ovenChain, ovenTrip, { comparatorTripLevel: "low" });
    expect(row(low, "comparator.outputStuckHigh").effect).toBe("never-trips");
    expect(row(low, "comparator.outputStuckLow").effect).toBe("trips-immediately");
  });

  it("non-inverting gain: feedback open or ground shorted rails the output (trips); feedback shorted or ground open gives unity gain (never trips)", () => {
    const review = reviewFaults(kilnChain, kilnTrip);
    expect(row(review, "amplifier.feedbackResistorOpen").effect).toBe("trips-immediately");
    expect(row(review, "amplifier.groundResistorShort").effect).toBe("trips-immediately");
    expect(row(review, "amplifier.feedbackResistorShort").effect).toBe("never-trips");
    expect(row(review, "amplifier.groundResistorOpen").effect).toBe("never-trips");
  });

  it("a series reference failing open or shorted pulls the threshold to 0 V (trips); a shunt reference failing open lifts it toward the supply (never trips)", () => {
    expect(row(reviewFaults(ovenChain, ovenTrip), "reference.open").effect).toBe("trips-immediately");
    const shunt = {
      ...ovenChain,
      reference: {
        kind: "reference",
        variant: "shunt",
        nominalVolts: 2.5,
        initialAccuracyFraction: 0.005,
        seriesOhms: 1000,
        supplyMinVolts: 4.75,
        supplyMaxVolts: 5.25,
      },
    } as const;
    const review = reviewFaults(shunt, ovenTrip);
    // Node: 5 V × 25 kΩ / (25 kΩ + 1 kΩ) = 4.81 V; threshold 4.81 × 13/25 = 2.50 V = 500 °C indicated: never within the sweep.
    expect(row(review, "reference.open").category).toBe("dangerous-undetected");
    expect(row(review, "reference.short").effect).toBe("trips-immediately");
  });

  it("a reference drifted high raises the threshold: the trip moves late by the drift over the local slope", () => {
    // 5 % of 1.3 V = 65 mV = 13 °C of the 5 mV/°C scale; the amplifier is linear in its α·t reading, so the trip
    // moves by about 13 °C × α / S(t) with S(256 °C) ≈ 0.0413 mV/°C (NIST type K Seebeck near 256 °C, from memory):
    // about 12.6 °C. Checked loosely (±0.5 °C).
    const r = row(reviewFaults(ovenChain, ovenTrip), "reference.driftedHigh");
    expect(r.effect).toBe("trips-late");
    expect(r.shiftC as number).toBeGreaterThan(12.1);
    expect(r.shiftC as number).toBeLessThan(13.1);
  });

  it("an ADC code stuck at zero never trips in firmware; a firmware range check alone cannot see it with software compensation", () => {
    const review = reviewFaults(enclosureChain, enclosureTrip, { detection: { outOfRangeWindow: { lowC: -20, highC: 150 } } });
    const r = row(review, "adc.codeStuckZero");
    expect(r.effect).toBe("never-trips");
    // Code 0 reads 0 mV, and the firmware adds E(cold junction): the reading is the ambient, inside the window.
    expect(r.category).toBe("dangerous-undetected");
    expect(row(review, "adc.codeStuckFullScale").category).toBe("safe-detected");
  });
});
