/**
 * The failure-modes-effects-and-diagnostics summary: hand sums of λ by class, SFF and DC as defined in
 * IEC 61508-2:2010 Annex C / IEC 61508-4 (`from memory`), the healthy-worst-case-band classification (issue of
 * the project: a shift that crosses the hazard limit for the worst unit is dangerous; `common practice, no
 * source`), and a review of a modelled chain fed through.
 */
import { describe, expect, it } from "vitest";
import {
  classifyFaultShift,
  pfdAvg1oo1,
  reviewFaults,
  safetyFaultClassesFromReview,
  safetyFigures,
  type FailureData,
} from "../../src/index.js";
import { handData, handSetpoint, ovenChain, ovenFailureData, ovenTrip } from "./helpers.js";

describe("rates by class, SFF and DC (hand sums; SFF and DC per IEC 61508-2:2010 Annex C, from memory)", () => {
  const f = safetyFigures(handData, handSetpoint);
  it("λ per class is rate × share summed over the modes in that class", () => {
    // a.open 700 SD; a.short 300 DU; b.stuckLow 50 DD; b.stuckHigh 50 SU; b.drift 100 degraded.
    expect(f.lambdaSdFit).toBeCloseTo(700, 9);
    expect(f.lambdaSuFit).toBeCloseTo(50, 9);
    expect(f.lambdaDdFit).toBeCloseTo(50, 9);
    expect(f.lambdaDuFit).toBeCloseTo(300, 9);
    expect(f.lambdaSafeFit).toBeCloseTo(750, 9);
    expect(f.lambdaDangerousFit).toBeCloseTo(350, 9);
    expect(f.lambdaDegradedFit).toBeCloseTo(100, 9);
    expect(f.lambdaNoEffectFit).toBe(0);
    expect(f.lambdaTotalFit).toBeCloseTo(1200, 9);
  });
  it("SFF = (λ_SD + λ_SU + λ_DD)/(λ_S + λ_D) = 800/1100; DC = λ_DD/λ_D = 50/350; degraded left out of both", () => {
    expect(f.safeFailureFraction as number).toBeCloseTo(800 / 1100, 12);
    expect(f.diagnosticCoverage as number).toBeCloseTo(50 / 350, 12);
    expect(f.notes.join(" ")).toContain("left out of λ_S and λ_D");
  });
  it("degraded counted as dangerous: the drift's 100 FIT joins λ_DU (undetected)", () => {
    const g = safetyFigures(handData, handSetpoint, { countDegradedAsDangerous: true });
    expect(g.lambdaDuFit).toBeCloseTo(400, 9);
    expect(g.safeFailureFraction as number).toBeCloseTo(800 / 1200, 12);
  });
  it("with a proof test: PFDavg and PFH of the setpoint as 1oo1 (Annex B: λ_DU(T1/2 + MRT) + λ_DD·MTTR)", () => {
    const g = safetyFigures(handData, handSetpoint, { proofTest: { proofTestIntervalHours: 4380, meanTimeToRestorationHours: 24 } });
    // 3e-7 × (2190 + 24) + 5e-8 × 24 = 6.642e-4 + 1.2e-6 = 6.654e-4.
    expect(g.pfdAvg1oo1?.pfdAvg as number).toBeCloseTo(6.654e-4, 15);
    expect(g.pfh1oo1?.pfhPerHour as number).toBeCloseTo(3e-7, 18);
    expect(g.proofTestCoverage).toBe(1);
  });
  it("proof-test coverage from the faults the injected-signal test reveals: λ_DU(revealed)/λ_DU", () => {
    const data: FailureData = {
      elements: [
        ...handData.elements,
        { element: "c", rateFit: 100, modes: [{ mode: "stuck", share: 1, faultId: "c.stuck" }] },
      ],
    };
    const setpoint = { ...handSetpoint, faults: [...handSetpoint.faults, { faultId: "c.stuck", safety: "dangerous" as const, detected: false, shiftC: null, marginC: null }] };
    const g = safetyFigures(data, setpoint, {
      proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, missionTimeHours: 87600 },
      proofTestRevealsFaultIds: ["a.short"],
    });
    expect(g.proofTestCoverage as number).toBeCloseTo(300 / 400, 12);
    const expected = pfdAvg1oo1({ lambdaDuFit: 400, lambdaDdFit: 50 }, { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, proofTestCoverage: 0.75, missionTimeHours: 87600 });
    expect(g.pfdAvg1oo1?.pfdAvg as number).toBeCloseTo(expected.pfdAvg, 15);
  });
  it("faults of the review that no mode names are listed as unrated", () => {
    const setpoint = { ...handSetpoint, faults: [...handSetpoint.faults, { faultId: "x.unrated", safety: "dangerous" as const, detected: false, shiftC: null, marginC: null }] };
    const g = safetyFigures(handData, setpoint);
    expect(g.unratedFaultIds).toEqual(["x.unrated"]);
    expect(g.notes[0]).toContain("x.unrated");
  });
});

describe("classification with the healthy worst-case band (common practice, no source)", () => {
  const limits = { healthyBandC: { lowC: 252, highC: 259 }, maxNormalOperatingC: 250, hazardLimitC: 280 };
  it("a trip moved 20–27 °C late stays below the hazard limit for the nominal unit but not for the worst unit: dangerous", () => {
    // Nominal 255.5 °C + 24 °C = 279.5 °C < 280 °C; worst unit 259 + 24 = 283 °C ≥ 280 °C.
    expect(classifyFaultShift({ ...limits, healthyBandC: { lowC: 255.5, highC: 255.5 }, shiftC: 24 }).safety).toBe("degraded");
    const worst = classifyFaultShift({ ...limits, shiftC: 24 });
    expect(worst.safety).toBe("dangerous");
    expect(worst.marginC as number).toBeCloseTo(-3, 12);
  });
  it("a shift above the threshold that keeps the band inside is degraded with the margin left; below it, no effect", () => {
    const d = classifyFaultShift({ ...limits, shiftC: 10 });
    expect(d.safety).toBe("degraded");
    expect(d.marginC as number).toBeCloseTo(11, 12); // 280 − 269
    expect(classifyFaultShift({ ...limits, shiftC: 2.9 }).safety).toBe("no-effect");
    expect(classifyFaultShift({ ...limits, shiftC: 2.9, noEffectThresholdC: 2 }).safety).toBe("degraded");
  });
  it("a band reaching normal operation is a nuisance (safe) trip; never tripping is dangerous", () => {
    expect(classifyFaultShift({ ...limits, shiftC: -2 }).safety).toBe("safe"); // 252 − 2 = 250 ≤ 250
    expect(classifyFaultShift({ ...limits, shiftC: null }).safety).toBe("dangerous");
    expect(classifyFaultShift({ ...limits, shiftC: -300, tripsImmediately: true }).safety).toBe("safe");
  });
});

describe("a modelled chain's review fed through (invented rates; trade facts of comparator watchdogs, common practice, no source)", () => {
  const review = reviewFaults(ovenChain, ovenTrip, { openCircuitBias: "pull-up" });
  const classes = safetyFaultClassesFromReview(review, { healthyBandC: { lowC: review.healthyTripC - 4, highC: review.healthyTripC + 4 } });
  const f = safetyFigures(ovenFailureData, classes, { proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 } });
  it("a shorted thermocouple and a comparator stuck low never trip: dangerous, and with no detection methods undetected", () => {
    const short = f.modes.find((m) => m.faultId === "thermocouple.shortAtTerminals");
    expect(short?.counted).toBe("DU");
    expect(f.modes.find((m) => m.faultId === "comparator.outputStuckLow")?.counted).toBe("DU");
  });
  it("pull-up burnout bias: an open thermocouple trips at once, a safe failure", () => {
    expect(f.modes.find((m) => m.faultId === "thermocouple.open")?.safety).toBe("safe");
  });
  it("no diagnostics: DC = 0 and λ_DD = 0", () => {
    expect(f.lambdaDdFit).toBe(0);
    expect(f.diagnosticCoverage).toBe(0);
    expect(f.lambdaSdFit).toBe(0);
  });
  it("faults the data gives no rate (wiring mistakes, the board supply) are listed as unrated; λ_total is the sum of the element rates", () => {
    expect([...f.unratedFaultIds].sort()).toEqual(["board.supplyLost", "thermocouple.groundOffsetNegative", "thermocouple.groundOffsetPositive", "thermocouple.reversed"]);
    expect(f.lambdaTotalFit).toBeCloseTo(2000 + 100 + 30 + 2 + 2 + 20, 9);
  });
});

describe("every setpoint from its review in one call (the same failure data, classes per setpoint)", () => {
  it("safetyFiguresFromReviews equals classes-then-figures per review, bands in order", async () => {
    const { safetyFiguresFromReviews } = await import("../../src/index.js");
    const low = reviewFaults(ovenChain, { name: "low", maxNormalOperatingC: 250, hazardLimitC: 280 }, { openCircuitBias: "pull-up" });
    const tight = reviewFaults(ovenChain, { name: "tight", maxNormalOperatingC: 250, hazardLimitC: 262 }, { openCircuitBias: "pull-up" });
    const bands = [undefined, { lowC: tight.healthyTripC - 5, highC: tight.healthyTripC + 5 }];
    const proofTest = { proofTestIntervalHours: 4380, meanTimeToRestorationHours: 24 };
    const all = safetyFiguresFromReviews(ovenFailureData, [low, tight], { healthyBandsC: bands, proofTest });
    const byHand = [
      safetyFigures(ovenFailureData, safetyFaultClassesFromReview(low), { proofTest }),
      safetyFigures(ovenFailureData, safetyFaultClassesFromReview(tight, { healthyBandC: bands[1] as { lowC: number; highC: number } }), { proofTest }),
    ];
    expect(all).toEqual(byHand);
    // The reference drifting high moves the trip about 12.7 °C late: inside a 280 °C hazard limit (degraded), past 262 °C (dangerous).
    expect(all[0]?.modes.find((m) => m.faultId === "reference.driftedHigh")?.counted).toBe("degraded");
    expect(all[1]?.modes.find((m) => m.faultId === "reference.driftedHigh")?.counted).toBe("DU");
    expect(all[1]?.lambdaDuFit as number).toBeGreaterThan(all[0]?.lambdaDuFit as number);
  });
});
