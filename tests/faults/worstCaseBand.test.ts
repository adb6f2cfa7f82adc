/**
 * The fault review judges each fault with the healthy worst-case band moved by the fault's shift (one rule,
 * classifyFaultShift), with a stated no-effect threshold and a "degraded" class carrying the margin left.
 * Regression: a fault moving the kiln's trip 20–27 °C late, still below the hazard limit for a nominal unit, was
 * reported "no effect".
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseDesign, tripDesignFromDesign } from "../../src/design/index.js";
import { classifyFaultShift, defaultNoEffectThresholdC, designTrip, reviewFaults, reviewTripDesignFaults, type FaultReview } from "../../src/index.js";
import { ovenChain, ovenTrip } from "./helpers.js";

const kiln = parseDesign(readFileSync(new URL("../../examples/ceramic-kiln-cutout.json", import.meta.url), "utf8"));
const kilnTrip = tripDesignFromDesign(kiln);
const kilnResult = designTrip(kilnTrip, { monteCarloTrials: 500 });
const protection = { openCircuitBias: "pull-up", outputStage: "de-energize-to-trip", detection: { outOfRangeWindow: { lowC: 0, highC: 1320 } } } as const;
const banded = reviewTripDesignFaults(kilnTrip, kilnResult, { ...protection, sweepStepC: 2 });
const row = (review: FaultReview | undefined, id: string) => {
  const r = review?.rows.find((x) => x.faultId === id);
  if (r === undefined) throw new Error(`no row ${id}`);
  return r;
};

describe("faults are classified with the healthy worst-case band", () => {
  it("the review carries the design's worst-case band per setpoint and the default 3 °C threshold", () => {
    kilnResult.setpoints.forEach((sp, i) => {
      const review = banded.reviews[i] as FaultReview;
      expect(review.healthyBandGiven).toBe(true);
      expect(review.healthyBandC).toEqual({ lowC: sp.worstCase.lowC, highC: sp.worstCase.highC });
      expect(review.noEffectThresholdC).toBe(3);
    });
    expect(defaultNoEffectThresholdC).toBe(3);
  });

  it("regression: a negative ground offset moves the stoneware trip 20–27 °C late, below the hazard limit, and is dangerous, not no effect", () => {
    const review = banded.reviews[0] as FaultReview;
    const r = row(review, "thermocouple.groundOffsetNegative");
    expect(r.shiftC).toBeGreaterThan(20);
    expect(r.shiftC).toBeLessThan(27.5);
    // Nominal unit still below the hazard limit (the old rule called this "no effect") ...
    expect(r.tripC as number).toBeLessThan(review.hazardLimitC);
    // ... but the worst unit of the moved band is past it.
    expect(review.healthyBandC.highC + (r.shiftC as number)).toBeGreaterThanOrEqual(review.hazardLimitC);
    expect(r.safety).toBe("dangerous");
    expect(r.category).toBe("dangerous-undetected");
    expect(r.marginC as number).toBeCloseTo(review.hazardLimitC - review.healthyBandC.highC - (r.shiftC as number), 9);
    expect(r.effectText).toContain("the worst unit of the moved worst-case band reaches the hazard limit");
  });

  it("regression: lost cold-junction compensation moves the bisque trip about 21 °C late and is degraded with the margin left", () => {
    const review = banded.reviews[1] as FaultReview;
    const r = row(review, "coldJunction.compensationLost");
    expect(r.shiftC).toBeGreaterThan(20);
    expect(r.shiftC).toBeLessThan(27.5);
    expect(r.safety).toBe("degraded");
    expect(r.category).toBe("degraded");
    const margin = Math.min(review.hazardLimitC - (review.healthyBandC.highC + (r.shiftC as number)), review.healthyBandC.lowC + (r.shiftC as number) - review.maxNormalOperatingC);
    expect(r.marginC as number).toBeCloseTo(margin, 9);
    expect(r.marginC as number).toBeGreaterThan(0);
    expect(r.effectText).toMatch(/degraded: the worst unit keeps \d+\.\d °C to the nearer limit/);
    expect(review.counts.degraded).toBeGreaterThanOrEqual(1);
  });

  it("without a band (nominal unit only) such a fault is still not no effect: it is degraded above the 3 °C threshold", () => {
    const kilnSp = kilnResult.setpoints[0];
    if (kilnSp === undefined) throw new Error("no setpoint");
    const nominal = reviewTripDesignFaults(kilnTrip, { ...kilnResult, setpoints: kilnResult.setpoints.map(({ worstCase: _w, ...rest }) => rest) }, { ...protection, sweepStepC: 2 });
    const r = row(nominal.reviews[0], "thermocouple.groundOffsetNegative");
    expect(nominal.reviews[0]?.healthyBandGiven).toBe(false);
    expect(r.safety).toBe("degraded");
    expect(r.safety).not.toBe("no-effect");
  });

  it("the no-effect threshold is an option: a 30 °C threshold turns the degraded bisque fault into no effect", () => {
    const wide = reviewTripDesignFaults(kilnTrip, kilnResult, { ...protection, sweepStepC: 2, noEffectThresholdC: 30 });
    expect(row(wide.reviews[1], "coldJunction.compensationLost").safety).toBe("no-effect");
    expect(wide.reviews[1]?.noEffectThresholdC).toBe(30);
  });

  it("refuses a bad threshold or band with a typed one-line error naming it", () => {
    expect(() => reviewFaults(ovenChain, ovenTrip, { noEffectThresholdC: -1 })).toThrow(/noEffectThresholdC -1 °C is out of range; valid range 0 to 100 °C/);
    expect(() => reviewFaults(ovenChain, { ...ovenTrip, healthyBandC: { lowC: 260, highC: 250 } })).toThrow(/healthyBandC\.highC 250 °C/);
    expect(() => reviewFaults(ovenChain, { ...ovenTrip, healthyBandC: { lowC: Number.NaN, highC: 250 } })).toThrow(/healthyBandC\.lowC NaN/);
  });

  it("every row of a banded review equals classifyFaultShift of its shift (one rule, over every fault of both setpoints)", () => {
    for (const review of banded.reviews) {
      for (const r of review.rows) {
        const c = classifyFaultShift({
          shiftC: r.effect === "never-trips" ? null : r.shiftC,
          tripsImmediately: r.effect === "trips-immediately",
          healthyBandC: review.healthyBandC,
          maxNormalOperatingC: review.maxNormalOperatingC,
          hazardLimitC: review.hazardLimitC,
        });
        expect([r.faultId, r.safety, r.marginC]).toEqual([r.faultId, c.safety, c.marginC]);
      }
    }
  });
});
