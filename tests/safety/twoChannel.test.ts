/**
 * Two-channel cutouts: identical channels reproduce the IEC 61508-6:2010 Annex B 1oo2 forms (`from memory`);
 * different channels follow the generalisation documented in src/safety/twoChannelCutout.ts, checked here
 * against hand values and the exact mean λ_A·λ_B·T1²/3 of two linearly rising unavailabilities (derivation:
 * ∫₀^T1 (λ_A t)(λ_B t) dt / T1).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { pfdAvg1oo1, pfdAvg1oo2, pfdAvgCurve, pfh1oo2, twoChannelCutout, logSpacedHours } from "../../src/index.js";

function rel(actual: number, expected: number): number {
  return expected === 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected);
}

const rate = fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 5000, noNaN: true }));
const frac = fc.double({ min: 0, max: 1, noNaN: true });
const hours = fc.double({ min: 10, max: 50000, noNaN: true });

describe("identical channels reproduce Annex B (IEC 61508-6:2010 B.3.2.2.3, B.3.3.2.2; from memory)", () => {
  it("PFDavg and PFH equal pfdAvg1oo2 / pfh1oo2 for every common-cause basis, over many inputs", () => {
    fc.assert(
      fc.property(rate, rate, frac, frac, hours, fc.double({ min: 0, max: 200, noNaN: true }), (du, dd, beta, betaD, t1, mttr) => {
        const proofTest = { proofTestIntervalHours: t1, meanTimeToRestorationHours: mttr };
        const r = { lambdaDuFit: du, lambdaDdFit: dd };
        const annexPfd = pfdAvg1oo2(r, { beta, betaD }, proofTest).pfdAvg;
        const annexPfh = pfh1oo2(r, { beta, betaD }, proofTest).pfhPerHour;
        for (const basis of ["larger", "smaller", "geometric-mean"] as const) {
          const pair = twoChannelCutout(r, r, { beta, betaD, proofTest, commonCauseBasis: basis, betaSensitivity: [] });
          expect(pair.identicalChannels).toBe(true);
          expect(rel(pair.pfdAvg1oo2, annexPfd)).toBeLessThan(1e-12);
          expect(rel(pair.pfh1oo2PerHour, annexPfh)).toBeLessThan(1e-12);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe("different channels (generalisation of src/safety/twoChannelCutout.ts)", () => {
  it("β = 0, λ_DD = 0, MRT = 0: the pair's PFDavg is the exact mean λ_A·λ_B·T1²/3", () => {
    const pair = twoChannelCutout(
      { lambdaDuFit: 300, lambdaDdFit: 0 },
      { lambdaDuFit: 40, lambdaDdFit: 0 },
      { beta: 0, betaD: 0, proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, meanRepairTimeHours: 0 } },
    );
    expect(rel(pair.pfdAvg1oo2, (3e-7 * 4e-8 * 8760 * 8760) / 3)).toBeLessThan(1e-12);
  });
  it("hand values: comparator 225/0 FIT, firmware 60/300 FIT, β 5 %, β_D 2 %, T1 8760 h, MTTR = MRT = 8 h", () => {
    const pair = twoChannelCutout(
      { name: "comparator", lambdaDuFit: 225, lambdaDdFit: 0 },
      { name: "firmware", lambdaDuFit: 60, lambdaDdFit: 300 },
      { beta: 0.05, betaD: 0.02, proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 } },
    );
    // t_CE,A = 4388, t_GE,A = 2928; t_CE,B = (1/6)·4388 + (5/6)·8 = 738, t_GE,B = (1/6)·2928 + (5/6)·8 = 494.666…
    // λ'_A = 0.95 × 2.25e-7 = 2.1375e-7; λ'_B = 0.98 × 3e-7 + 0.95 × 6e-8 = 3.51e-7.
    const independent = 2.1375e-7 * 3.51e-7 * (4388 * (2928 / 6 + 40 / 6) + 2928 * 738);
    // common cause on the larger rates, capped at the smaller channel's: β_D·λ_DD,c = min(0.02 × 3e-7, 0) = 0
    // (the comparator has no detected failures); 0.05 × 2.25e-7 × 4388 = 4.93650e-5.
    const common = 0 * 8 + 0.05 * 2.25e-7 * 4388;
    expect(rel(pair.independentPfd, independent)).toBeLessThan(1e-12);
    expect(rel(pair.commonCausePfd, common)).toBeLessThan(1e-12);
    expect(rel(pair.channelA.pfdAvg1oo1, 2.25e-7 * 4388)).toBeLessThan(1e-12);
    expect(rel(pair.channelB.pfdAvg1oo1, 6e-8 * 4388 + 3e-7 * 8)).toBeLessThan(1e-12);
    expect(rel(pair.improvementFactor as number, (6e-8 * 4388 + 3e-7 * 8) / (independent + common))).toBeLessThan(1e-12);
    expect(rel(pair.commonCauseShare as number, common / (independent + common))).toBeLessThan(1e-12);
    // PFH: λ'_A·t_CE,A·0.95·λ_DU,B + λ'_B·t_CE,B·0.95·λ_DU,A + β_D·λ_DD,c + β·λ_DU,c.
    const pfh = 2.1375e-7 * 4388 * 0.95 * 6e-8 + 3.51e-7 * 738 * 0.95 * 2.25e-7 + 0 + 0.05 * 2.25e-7;
    expect(rel(pair.pfh1oo2PerHour, pfh)).toBeLessThan(1e-12);
    // The smaller-rate basis takes the common cause on 0.05 × 6e-8 and 0.02 × 0 instead.
    const smaller = twoChannelCutout(
      { lambdaDuFit: 225, lambdaDdFit: 0 },
      { lambdaDuFit: 60, lambdaDdFit: 300 },
      { beta: 0.05, betaD: 0.02, commonCauseBasis: "smaller", proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 } },
    );
    expect(rel(smaller.commonCausePfd, 0.05 * 6e-8 * 4388)).toBeLessThan(1e-12);
  });
  it("what the second channel buys shrinks as β grows, and with β = β_D = 1 it buys nothing over the pair's larger rates", () => {
    const pair = twoChannelCutout(
      { lambdaDuFit: 200, lambdaDdFit: 100 },
      { lambdaDuFit: 200, lambdaDdFit: 100 },
      { beta: 0.05, betaD: 0.05, betaSensitivity: [0, 0.01, 0.05, 0.1, 0.5, 1], proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 } },
    );
    const factors = pair.betaSensitivity.map((r) => r.improvementFactor as number);
    for (let i = 1; i < factors.length; i++) expect(factors[i]).toBeLessThanOrEqual(factors[i - 1] as number);
    expect(rel(factors[factors.length - 1] as number, 1)).toBeLessThan(1e-12);
    expect(pair.improvementFactorWithoutCommonCause as number).toBeCloseTo(factors[0] as number, 12);
  });
});

describe("PFDavg against the proof-test interval", () => {
  it("each point is pfdAvg1oo1 / pfdAvg1oo2 at that interval (IEC 61508-6:2010 Annex B forms, from memory)", () => {
    const intervals = logSpacedHours(100, 87600, 25);
    expect(intervals[0]).toBe(100);
    expect(intervals[24]).toBe(87600);
    const curve = pfdAvgCurve({ lambdaDuFit: 150, lambdaDdFit: 350 }, { proofTestIntervalsHours: intervals, proofTest: { meanTimeToRestorationHours: 8 }, pair: { beta: 0.02, betaD: 0.01 } });
    curve.points.forEach((p, i) => {
      const t = { proofTestIntervalHours: intervals[i] as number, meanTimeToRestorationHours: 8 };
      expect(rel(p.pfdAvg1oo1, pfdAvg1oo1({ lambdaDuFit: 150, lambdaDdFit: 350 }, t).pfdAvg)).toBeLessThan(1e-12);
      expect(rel(p.pfdAvg1oo2 as number, pfdAvg1oo2({ lambdaDuFit: 150, lambdaDdFit: 350 }, { beta: 0.02, betaD: 0.01 }, t).pfdAvg)).toBeLessThan(1e-12);
    });
    // log spacing: equal ratios between neighbours
    const ratio = (intervals[1] as number) / (intervals[0] as number);
    expect(rel((intervals[13] as number) / (intervals[12] as number), ratio)).toBeLessThan(1e-12);
  });
  it("without a pair the 1oo2 column is null", () => {
    const curve = pfdAvgCurve({ lambdaDuFit: 150, lambdaDdFit: 0 }, { proofTestIntervalsHours: [1000], proofTest: { meanTimeToRestorationHours: 8 } });
    expect(curve.points[0]?.pfdAvg1oo2).toBeNull();
    expect(curve.pairName).toBeNull();
  });
});

describe("the common-cause rate never exceeds the smaller channel's rate (a common-cause failure fails both; common practice, no source)", () => {
  it("with the larger-rate basis and a large β, the pair is never worse than the better channel alone", () => {
    fc.assert(
      fc.property(rate, rate, rate, rate, frac, frac, (duA, ddA, duB, ddB, beta, betaD) => {
        const pair = twoChannelCutout(
          { lambdaDuFit: duA, lambdaDdFit: ddA },
          { lambdaDuFit: duB, lambdaDdFit: ddB },
          { beta, betaD, betaSensitivity: [], proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 } },
        );
        const better = Math.min(pair.channelA.pfdAvg1oo1, pair.channelB.pfdAvg1oo1);
        // the common-cause term alone is at most the better channel's own 1oo1 PFDavg
        expect(pair.commonCausePfd).toBeLessThanOrEqual(better * (1 + 1e-12) + 1e-300);
      }),
      { numRuns: 300 },
    );
  });
});
