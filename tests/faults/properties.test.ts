/**
 * Properties of the fault review over the example designs and over random detection sets (fast-check, seeded).
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateChain } from "../../src/chain/evaluateChain.js";
import { measurementChainFromDesign, parseDesign, tripDesignFromDesign } from "../../src/design/index.js";
import { _buildPlant, _emptyMods, _evaluateSignals } from "../../src/faults/_faultPlant.js";
import {
  classifyFaultShift,
  designTrip,
  faultCatalogue,
  reviewChainFaults,
  reviewFaults,
  reviewTripDesignFaults,
  type FaultDetection,
  type FaultReviewReport,
} from "../../src/index.js";
import { enclosureChain, enclosureTrip, kilnChain, kilnTrip, ovenChain, ovenTrip } from "./helpers.js";

const examplesDir = join(import.meta.dirname, "..", "..", "examples");
const exampleFiles = readdirSync(examplesDir).filter((f) => f.endsWith(".json")).sort();
const categories = ["safe-detected", "safe-undetected", "dangerous-detected", "dangerous-undetected", "degraded", "no-effect"];

function reviewExample(file: string, options = {}): FaultReviewReport {
  const design = parseDesign(readFileSync(join(examplesDir, file), "utf8"));
  if (design.comparator !== undefined) {
    const trip = tripDesignFromDesign(design);
    const result = designTrip(trip, { monteCarloTrials: 500 });
    return reviewTripDesignFaults(trip, result, { sweepStepC: 2, ...options });
  }
  const chain = measurementChainFromDesign(design);
  const trips = design.setpoints.map((s) => ({
    name: s.name,
    tripTemperatureC: s.tripTemperatureC,
    maxNormalOperatingC: (s.maxNormalOperatingC ?? design.processLimits?.maxNormalOperatingC) as number,
    hazardLimitC: (s.hazardLimitC ?? design.processLimits?.hazardLimitC) as number,
  }));
  return reviewChainFaults(chain, trips, { sweepStepC: 2, ...options });
}

describe("every fault of the catalogue is classified for every example design", () => {
  it("finds the example designs", () => {
    expect(exampleFiles.length).toBeGreaterThanOrEqual(3);
  });
  for (const file of exampleFiles) {
    it(file, () => {
      const report = reviewExample(file);
      expect(report.reviews.length).toBeGreaterThan(0);
      for (const review of report.reviews) {
        expect(review.rows.length).toBeGreaterThan(10);
        const ids = new Set(review.rows.map((r) => r.faultId));
        expect(ids.size).toBe(review.rows.length);
        for (const r of review.rows) {
          expect(categories).toContain(r.category);
          // The category is the safety class and the detection flag, never anything else.
          // Degraded and no-effect rows are not split by detection (common practice, no source).
          expect(r.category).toBe(r.safety === "no-effect" || r.safety === "degraded" ? r.safety : `${r.safety}-${r.detected ? "detected" : "undetected"}`);
          // One rule: the row's class is classifyFaultShift of its shift with the review's band and threshold.
          expect(r.safety).toBe(
            classifyFaultShift({
              shiftC: r.effect === "never-trips" ? null : r.shiftC,
              tripsImmediately: r.effect === "trips-immediately",
              healthyBandC: review.healthyBandC,
              maxNormalOperatingC: review.maxNormalOperatingC,
              hazardLimitC: review.hazardLimitC,
              noEffectThresholdC: review.noEffectThresholdC,
            }).safety,
          );
          expect(r.detected).toBe(r.detectedBy.length > 0);
          if (r.effect === "never-trips") expect(r.safety).toBe("dangerous");
          if (r.effect === "trips-immediately") expect(r.safety).toBe("safe");
          if (r.tripC !== null) expect(Number.isFinite(r.tripC)).toBe(true);
        }
        const c = review.counts;
        expect(c.safeDetected + c.safeUndetected + c.dangerousDetected + c.dangerousUndetected + c.degraded + c.noEffect).toBe(c.total);
        expect(c.total).toBe(review.rows.length);
      }
      expect(report.counts.total).toBe(report.reviews.reduce((a, r) => a + r.rows.length, 0));
      expect(report.caution).toMatch(/non-resettable thermal cutoff/);
      expect(report.scope).toMatch(/^Single faults of the modelled elements only/);
    });
  }
});

describe("the healthy signal equals the chain module's nominal reading", () => {
  const cases = [
    { chain: ovenChain, coldJunctionC: 25, lo: 0, hi: 1000 },
    { chain: kilnChain, coldJunctionC: 32.5, lo: 0, hi: 999 },
    { chain: enclosureChain, coldJunctionC: 25, lo: 0, hi: 150 },
  ];
  for (const [i, c] of cases.entries()) {
    it(`chain ${i}: amplifier output at random temperatures (seeded)`, () => {
      const plant = _buildPlant(
        c.chain,
        { coldJunctionC: c.coldJunctionC, railLowVolts: -100, railHighVolts: 100, tap: 0, adcTripC: 90, outputStage: "energize-to-trip", shuntSupplyVolts: undefined },
        "test",
      );
      fc.assert(
        fc.property(fc.double({ min: c.lo, max: c.hi, noNaN: true }), (t) => {
          const mine = _evaluateSignals(plant, _emptyMods(), t).amplifierOutputVolts;
          const theirs = evaluateChain(c.chain, t, { methods: ["worst-case"] }).reading.volts;
          expect(Math.abs(mine - theirs)).toBeLessThan(1e-9 * Math.max(1, Math.abs(theirs)));
        }),
        { seed: 7001 + i, numRuns: 40 },
      );
    });
  }
});

const detectionArb = (maxC: number): fc.Arbitrary<FaultDetection> => fc.record(
  {
    outOfRangeWindow: fc.oneof(
      fc.record({ lowC: fc.integer({ min: -50, max: 40 }), highC: fc.integer({ min: 200, max: 1400 }) }),
      fc.record({ lowVolts: fc.double({ min: -1, max: 0.2, noNaN: true }), highVolts: fc.double({ min: 1.5, max: 6, noNaN: true }) }),
    ),
    openThermocoupleDetection: fc.boolean(),
    secondComparator: fc.record({ thresholdC: fc.integer({ min: 60, max: maxC }), sharesReference: fc.boolean() }),
    supervisoryReading: fc.record(
      {
        plausibleLowC: fc.integer({ min: -50, max: 20 }),
        plausibleHighC: fc.integer({ min: 100, max: 1400 }),
        checksDetector: fc.boolean(),
        independentSensor: fc.boolean(),
        toleranceC: fc.integer({ min: 2, max: 50 }),
      },
      { requiredKeys: [] },
    ),
  },
  { requiredKeys: [] },
);
const methodKeys = ["outOfRangeWindow", "openThermocoupleDetection", "secondComparator", "supervisoryReading"] as const;

describe("adding a detection method never turns a detected fault into an undetected one", () => {
  const chains = [
    { chain: ovenChain, trip: ovenTrip, maxC: 1300 },
    { chain: kilnChain, trip: kilnTrip, maxC: 1300 },
    { chain: enclosureChain, trip: enclosureTrip, maxC: 400 },
  ];
  for (const [i, { chain, trip, maxC }] of chains.entries()) {
    it(`chain ${i} (seeded)`, () => {
      fc.assert(
        fc.property(detectionArb(maxC), fc.constantFrom(...methodKeys), fc.constantFrom("pull-up", "pull-down", "none"), (full, dropped, bias) => {
          fc.pre(full[dropped] !== undefined);
          const fewer: Record<string, unknown> = { ...full };
          delete fewer[dropped];
          const options = { openCircuitBias: bias, sweepStepC: 5, outputStage: "de-energize-to-trip" } as const;
          const a = reviewFaults(chain, trip, { ...options, detection: fewer as FaultDetection });
          const b = reviewFaults(chain, trip, { ...options, detection: full });
          a.rows.forEach((ra, k) => {
            const rb = b.rows[k];
            expect(rb?.faultId).toBe(ra.faultId);
            if (ra.detected) expect(rb?.detected).toBe(true);
            for (const m of ra.detectedBy) expect(rb?.detectedBy).toContain(m);
          });
        }),
        { seed: 4242 + i, numRuns: 12 },
      );
    });
  }
});

describe("the catalogue follows the chain's elements", () => {
  it("one open and one short per divider resistor, gain-resistor faults only for a resistor gain", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 100, max: 1_000_000 }), { minLength: 2, maxLength: 8 }), (ohms) => {
        const chain = { ...kilnChain, divider: { kind: "divider", resistorsOhms: ohms, toleranceFraction: 0.01 } } as const;
        const ids = faultCatalogue(chain).map((f) => f.id);
        expect(ids.filter((id) => id.startsWith("divider.")).length).toBe(2 * ohms.length);
        expect(ids.filter((id) => id.startsWith("amplifier.") && id.includes("Resistor")).length).toBe(4);
      }),
      { seed: 99, numRuns: 30 },
    );
    expect(faultCatalogue(enclosureChain).some((f) => f.id.includes("Resistor"))).toBe(false);
  });
});
