import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { designTrip } from "../../src/trip/designTrip.js";
import { requiredThresholdVolts } from "../../src/chain/tripTemperatureModel.js";
import { emfFromTemperature, temperatureFromEmf } from "../../src/its90/convert.js";
import { HotjunctionRangeError } from "../../src/errors.js";
import type { TripDesign } from "../../src/trip/types.js";

const fast = { monteCarloTrials: 500, seed: 3 } as const;

/** A fixed-scale (5 mV/°C) type K chain with every error but the reference's switched off. */
function railOnly(toleranceFraction: number, tripC: number): TripDesign {
  return {
    setpoints: [{ name: "rail check", tripTemperatureC: tripC, maxNormalOperatingC: tripC - 30, hazardLimitC: tripC + 30 }],
    thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
    amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
    comparator: { kind: "comparator" },
    reference: {
      kind: "element",
      name: "5 V linear regulator",
      element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: toleranceFraction },
    },
    resistors: { series: "E96", toleranceFraction: 0 },
    ambient: { minC: 25, maxC: 25 },
  };
}

/**
 * The fixed-scale amplifier indicates t_ind = [E(t_h) − E(t_c)]/α + t_c with α = E(25 °C)/25 (the chain's default
 * trim, error-budget-checks §7); at t_c = 25 °C this is E(t_h)/α. So indicated ↔ hot junction through ITS-90.
 */
const alphaMillivoltsPerC = emfFromTemperature("K", 25) / 25;
const indicatedC = (hotC: number): number => emfFromTemperature("K", hotC) / alphaMillivoltsPerC;
const hotForIndicatedC = (indicated: number): number => temperatureFromEmf("K", indicated * alphaMillivoltsPerC);

describe("designTrip: hand-checked bands", () => {
  it("250 mV threshold from a 5 V ±4 % rail on a 5 mV/°C amplifier trips between 48 and 52 °C indicated", () => {
    // common practice, no source: 250 mV ±4 % = 240…260 mV; /5 mV/°C = 48…52 °C (indicated by the amplifier).
    // The chain layer asserts this fact (and the 2.00 V → 416 °C one) on the model (tests/chain/tradeFacts);
    // this layer adds the given network, the propagation through designTrip and the hot junction via ITS-90.
    // 5 V regulator ±4 % grade: error-budget-checks §5 (a). Divider 95 kΩ/5 kΩ gives k = 0.05 exactly.
    const r = designTrip(railOnly(0.04, 50), { ...fast, networks: [{ topology: "two-resistor", resistorsOhms: [95000, 5000], totalOhms: 100000, currentMilliamps: 0.05 }] });
    const sp = r.setpoints[0]!;
    expect(sp.realizedThresholdVolts).toBeCloseTo(0.25, 12);
    expect(indicatedC(sp.worstCase.lowC)).toBeCloseTo(48, 6);
    expect(indicatedC(sp.worstCase.highC)).toBeCloseTo(52, 6);
    expect(indicatedC(sp.nominalTripC)).toBeCloseTo(50, 6);
    // through ITS-90 (NIST Monograph 175 reference function) the hot junction is a little lower than indicated
    expect(sp.worstCase.lowC).toBeCloseTo(hotForIndicatedC(48), 6);
  });

  it("the ideal threshold equals the chain's required threshold, and E96 rounding moves the trip < 0.2 °C", () => {
    const design: TripDesign = { ...railOnly(0.04, 400), resistors: { series: "E96", toleranceFraction: 0.01 } };
    const sp = designTrip(design, fast).setpoints[0]!;
    const chain = {
      thermocouple: design.thermocouple,
      amplifier: design.amplifier!,
      reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
      detector: design.comparator,
      ambient: design.ambient,
    } as const;
    expect(sp.idealThresholdVolts).toBeCloseTo(requiredThresholdVolts(chain, 400), 12);
    // E96 ratio steps are ≈2.4 %, the best pair over 1 k…1 MΩ lands far closer (our own bound)
    expect(Math.abs(sp.roundingErrorC)).toBeLessThan(0.2);
    expect(sp.resistorsOhms[0] + sp.resistorsOhms[1]).toBeLessThanOrEqual(1e6);
  });

  it("reports a mid-rail divider of two equal resistors on the same reference with its own error", () => {
    // Hand check (common practice, no source): two equal 1 % resistors on a 5 V rail good to ±4 % give
    // 2.5 V · (1 ± 0.04) · (1 ± 0.01) at the extremes: 2.3760 … 2.6260 V.
    const design: TripDesign = { ...railOnly(0.04, 400), resistors: { series: "E96", toleranceFraction: 0.01 } };
    const mid = designTrip(design, fast).midRail;
    expect(mid.nominalVolts).toBe(2.5);
    expect(mid.worstCaseLowVolts).toBeCloseTo(2.376, 9);
    expect(mid.worstCaseHighVolts).toBeCloseTo(2.626, 9);
  });

  it("places the release below the trip by the hysteresis over the signal slope", () => {
    // 20 mV hysteresis below the threshold on a ~5.2 mV/°C signal near 120 °C → about 3.9 °C (hand calculation)
    const design: TripDesign = { ...railOnly(0.01, 120), comparator: { kind: "comparator", hysteresisMillivolts: 20, hysteresisPlacement: "below" } };
    const sp = designTrip(design, fast).setpoints[0]!;
    const slopeVoltsPerC = (indicatedC(sp.nominalTripC + 0.5) - indicatedC(sp.nominalTripC - 0.5)) * 0.005;
    expect(sp.nominalTripC - sp.nominalReleaseC).toBeCloseTo(0.02 / slopeVoltsPerC, 1);
  });
});

describe("designTrip: verdicts", () => {
  it("fails with a nuisance-trip sentence when the band reaches normal operation", () => {
    const design: TripDesign = { ...railOnly(0.04, 400), setpoints: [{ name: "kiln", tripTemperatureC: 400, maxNormalOperatingC: 390, hazardLimitC: 450 }] };
    const r = designTrip(design, fast);
    expect(r.pass).toBe(false);
    expect(r.setpoints[0]!.reason).toMatch(/^Setpoint "kiln" trips between .* °C \(worst case\): it can trip .* below the highest normal operating temperature 390 °C \(nuisance trips\)\.$/);
    expect(r.setpoints[0]!.marginToNormalC).toBeLessThan(0);
  });
  it("fails with a hazard sentence when the worst-case band reaches the hazard limit, passes by RSS when asked", () => {
    // Rail ±4 % and two 2 % resistors: the RSS 95 % band is narrower than the worst case (GUM vs arithmetic sum);
    // a hazard limit between the two high ends fails by worst case and passes by RSS.
    const design = (hazardLimitC: number): TripDesign => ({
      ...railOnly(0.04, 400),
      setpoints: [{ name: "kiln", tripTemperatureC: 400, maxNormalOperatingC: 300, hazardLimitC }],
      resistors: { series: "E96", toleranceFraction: 0.02 },
    });
    const probe = designTrip(design(1000), fast).setpoints[0]!;
    expect(probe.rss.highC).toBeLessThan(probe.worstCase.highC - 1);
    const hazard = Math.round((probe.rss.highC + probe.worstCase.highC) / 2);
    const worst = designTrip(design(hazard), fast);
    expect(worst.setpoints[0]!.reason).toMatch(new RegExp(`fail to trip until .* the hazard limit ${hazard} °C\\.$`));
    const rss = designTrip(design(hazard), { ...fast, acceptanceMethod: "rss" });
    expect(rss.setpoints[0]!.pass).toBe(true);
    expect(rss.setpoints[0]!.reason).toMatch(/\(RSS, 95 % coverage\)/);
  });
  it("uses the design's process limits for setpoints without their own", () => {
    const design: TripDesign = {
      ...railOnly(0.001, 400),
      setpoints: [{ name: "a", tripTemperatureC: 400 }],
      processLimits: { maxNormalOperatingC: 380, hazardLimitC: 420 },
    };
    const r = designTrip(design, fast);
    expect(r.setpoints[0]!.hazardLimitC).toBe(420);
    expect(r.pass).toBe(true);
  });
  it("records the Monte Carlo seed and trials", () => {
    const sp = designTrip(railOnly(0.04, 200), { monteCarloTrials: 400, seed: 99 }).setpoints[0]!;
    expect(sp.monteCarlo.seed).toBe(99);
    expect(sp.monteCarlo.trials).toBe(400);
  });
});

describe("designTrip: ladder", () => {
  it("makes three selectable setpoints from one string, each close to its target", () => {
    const design: TripDesign = {
      ...railOnly(0.001, 400),
      setpoints: [
        { name: "bisque", tripTemperatureC: 950 },
        { name: "low fire", tripTemperatureC: 600 },
        { name: "glaze", tripTemperatureC: 1100 },
      ],
      processLimits: { maxNormalOperatingC: 0, hazardLimitC: 1300 },
      amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 2.5 },
      resistors: { series: "E96", toleranceFraction: 0.001, topology: "ladder", minTotalOhms: 10000, maxTotalOhms: 1e6 },
    };
    const r = designTrip(design, fast);
    expect(r.networks).toHaveLength(1);
    expect(r.networks[0]!.resistorsOhms).toHaveLength(4);
    expect(r.setpoints.map((s) => s.tapIndex)).toEqual([1, 2, 0]); // highest threshold (glaze) is tap 0
    for (const sp of r.setpoints) expect(Math.abs(sp.roundingErrorC)).toBeLessThan(8); // E96: < ½ step of 2.4 % on ~1000 °C
  });
});

describe("designTrip: properties", () => {
  const base = (): TripDesign => ({
    setpoints: [{ name: "oven", tripTemperatureC: 250, maxNormalOperatingC: 200, hazardLimitC: 300 }],
    thermocouple: { kind: "thermocouple", type: "J", tolerance: { standard: "IEC 60584-1", class: 2 } },
    amplifier: { kind: "fixedScaleAmplifier", type: "J", millivoltsPerC: 10, accuracyC: 1.5 },
    comparator: { kind: "comparator", offsetMillivolts: 3, hysteresisMillivolts: 10 },
    reference: { kind: "element", name: "series", element: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.002, tempcoPpmPerC: 20 } },
    resistors: { series: "E96", toleranceFraction: 0.01, tempcoPpmPerC: 100 },
    ambient: { minC: 10, maxC: 40 },
  });
  const widen = (d: TripDesign, which: number, factor: number): TripDesign => {
    switch (which) {
      case 0:
        return { ...d, resistors: { ...d.resistors, toleranceFraction: d.resistors.toleranceFraction * factor } };
      case 1:
        return { ...d, comparator: { ...d.comparator, offsetMillivolts: 3 * factor } };
      case 2:
        return { ...d, amplifier: { kind: "fixedScaleAmplifier", type: "J", millivoltsPerC: 10, accuracyC: 1.5 * factor } };
      case 3:
        return { ...d, thermocouple: { kind: "thermocouple", type: "J", tolerance: { standard: "custom", toleranceC: 2.5 * factor } } };
      default:
        return { ...d, reference: { kind: "element", name: "series", element: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.002 * factor, tempcoPpmPerC: 20 } } };
    }
  };

  it("the bands contain the nominal trip, and widening any tolerance never narrows a band", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 4 }), fc.double({ min: 1, max: 5, noNaN: true }), fc.integer({ min: 120, max: 350 }), (which, factor, tripC) => {
        const d0: TripDesign = { ...base(), setpoints: [{ name: "oven", tripTemperatureC: tripC, maxNormalOperatingC: 100, hazardLimitC: 500 }] };
        const narrow = designTrip(widen(d0, which, 1), fast).setpoints[0]!;
        const wide = designTrip(widen(d0, which, factor), fast).setpoints[0]!;
        for (const sp of [narrow, wide]) {
          expect(sp.worstCase.lowC).toBeLessThanOrEqual(sp.nominalTripC);
          expect(sp.worstCase.highC).toBeGreaterThanOrEqual(sp.nominalTripC);
          expect(sp.rss.lowC).toBeLessThanOrEqual(sp.nominalTripC);
          expect(sp.rss.highC).toBeGreaterThanOrEqual(sp.nominalTripC);
        }
        expect(wide.nominalTripC).toBeCloseTo(narrow.nominalTripC, 9);
        expect(wide.worstCase.lowC).toBeLessThanOrEqual(narrow.worstCase.lowC + 1e-9);
        expect(wide.worstCase.highC).toBeGreaterThanOrEqual(narrow.worstCase.highC - 1e-9);
        expect(wide.rss.standardUncertaintyC).toBeGreaterThanOrEqual(narrow.rss.standardUncertaintyC - 1e-12);
      }),
      { seed: 424242, numRuns: 12 },
    );
  });

  it("a tighter reference never widens the band", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 0.05, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (loose, share) => {
        const tight = loose * share;
        const withRef = (a: number): TripDesign => ({
          ...base(),
          reference: { kind: "element", name: "regulator", element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: a } },
        });
        const l = designTrip(withRef(loose), fast).setpoints[0]!;
        const t = designTrip(withRef(tight), fast).setpoints[0]!;
        expect(t.worstCase.highC - t.worstCase.lowC).toBeLessThanOrEqual(l.worstCase.highC - l.worstCase.lowC + 1e-9);
        expect(t.rss.highC - t.rss.lowC).toBeLessThanOrEqual(l.rss.highC - l.rss.lowC + 1e-9);
      }),
      { seed: 5150, numRuns: 10 },
    );
  });
});

describe("designTrip: bad input", () => {
  it("throws INVALID_DESIGN for a threshold beyond the reference", () => {
    // 5 mV/°C at 1200 °C is ≈ 6 V, above a 5 V rail
    expect(() => designTrip(railOnly(0.04, 1200), fast)).toThrow(HotjunctionRangeError);
    expect(() => designTrip(railOnly(0.04, 1200), fast)).toThrow(
      expect.objectContaining({ code: "INVALID_DESIGN", quantity: 'threshold of setpoint "rail check"', max: 5, unit: "V" }),
    );
    expect(() => designTrip(railOnly(0.04, 1200), fast)).toThrow(/is not within the reference voltage, so no divider can make it/);
  });
  it("throws for missing process limits, a hazard limit not above normal, no setpoints", () => {
    const d = railOnly(0.04, 400);
    expect(() => designTrip({ ...d, setpoints: [{ name: "x", tripTemperatureC: 400 }] }, fast)).toThrow(/maxNormalOperatingC/);
    expect(() => designTrip({ ...d, setpoints: [{ name: "x", tripTemperatureC: 400, maxNormalOperatingC: 420, hazardLimitC: 410 }] }, fast)).toThrow(/hazardLimitC/);
    expect(() => designTrip({ ...d, setpoints: [] }, fast)).toThrow(/non-empty/);
    expect(() => designTrip(d, { ...fast, acceptanceMethod: "typical" as never })).toThrow(HotjunctionRangeError);
  });
  it("throws when the current bounds leave no resistance", () => {
    const d = railOnly(0.04, 400);
    expect(() => designTrip({ ...d, resistors: { series: "E24", toleranceFraction: 0.01, minDividerCurrentMilliamps: 1, maxTotalOhms: 1e6, minTotalOhms: 10000 } }, fast)).toThrow(/are empty/);
  });
  it("does not mutate its input", () => {
    const d = railOnly(0.04, 400);
    const copy = JSON.parse(JSON.stringify(d));
    designTrip(d, fast);
    expect(d).toEqual(copy);
  });
});

describe("designTrip: an ideal design", () => {
  it("with every error source at zero, each band is the nominal trip itself (no error to propagate)", () => {
    const design: TripDesign = { ...railOnly(0.04, 400), reference: { kind: "ideal", name: "perfect 5 V", nominalVolts: 5 } };
    const sp = designTrip(design, fast).setpoints[0]!;
    for (const b of [sp.worstCase, sp.rss, sp.monteCarlo]) {
      expect(b.lowC).toBe(sp.nominalTripC);
      expect(b.highC).toBe(sp.nominalTripC);
    }
  });
});

describe("designTrip and compareReferences: progress", () => {
  it("report Monte Carlo progress as non-decreasing fractions in [0, 1] that reach 1", async () => {
    const { compareReferences } = await import("../../src/trip/compareReferences.js");
    const design: TripDesign = {
      ...railOnly(0.04, 400),
      setpoints: [
        { name: "low", tripTemperatureC: 300, maxNormalOperatingC: 250, hazardLimitC: 350 },
        { name: "high", tripTemperatureC: 400, maxNormalOperatingC: 350, hazardLimitC: 450 },
      ],
    };
    for (const run of [
      (onProgress: (f: number) => void) => designTrip(design, { monteCarloTrials: 20_000, seed: 1, onProgress }),
      (onProgress: (f: number) => void) =>
        compareReferences(design, [design.reference, { kind: "ideal", name: "perfect 5 V", nominalVolts: 5 }], { monteCarloTrials: 20_000, seed: 1, onProgress }),
    ]) {
      const seen: number[] = [];
      run((f) => seen.push(f));
      expect(seen.length).toBeGreaterThan(1);
      for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThanOrEqual(seen[i - 1] as number);
      expect(Math.min(...seen)).toBeGreaterThanOrEqual(0);
      expect(seen[seen.length - 1]).toBeCloseTo(1, 12);
    }
  });
});

describe("tripDesignFromDesign: an ADC design has no thresholds", () => {
  it("throws a typed INVALID_DESIGN error (was a plain Error)", async () => {
    const { readFileSync } = await import("node:fs");
    const { parseDesign } = await import("../../src/design/parseDesign.js");
    const { tripDesignFromDesign } = await import("../../src/design/designToObjects.js");
    const design = parseDesign(readFileSync("examples/heated-enclosure-adc.json", "utf8"));
    expect(() => tripDesignFromDesign(design)).toThrow(HotjunctionRangeError);
    expect(() => tripDesignFromDesign(design)).toThrow(expect.objectContaining({ code: "INVALID_DESIGN", quantity: "comparator" }));
    expect(() => tripDesignFromDesign(design)).toThrow(/an ADC design has no comparator thresholds to design/);
  });
});
