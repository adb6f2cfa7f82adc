/**
 * The IEC 61508-6:2010 Annex B simplified equations (B.3.2.2 PFDavg, B.3.3.2 PFH; `from memory`, the text was
 * not at hand) against values worked by hand in this file from the printed forms, and their limiting cases.
 */
import { describe, expect, it } from "vitest";
import { pfdAvg1oo1, pfdAvg1oo2, pfh1oo1, pfh1oo2 } from "../../src/index.js";

// One channel: λ_DU = 200 FIT = 2e-7 /h, λ_DD = 800 FIT = 8e-7 /h, T1 = 8760 h, MTTR = 8 h, MRT = 24 h.
const rates = { lambdaDuFit: 200, lambdaDdFit: 800 };
const test = { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, meanRepairTimeHours: 24 };

function rel(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

describe("1oo1 (IEC 61508-6:2010 B.3.2.2.1, from memory)", () => {
  it("t_CE = (λ_DU/λ_D)(T1/2 + MRT) + (λ_DD/λ_D)·MTTR and PFDavg = λ_D·t_CE, by hand", () => {
    // λ_D = 1e-6 /h; t_CE = 0.2 × (4380 + 24) + 0.8 × 8 = 880.8 + 6.4 = 887.2 h; PFDavg = 1e-6 × 887.2 = 8.872e-4.
    const r = pfdAvg1oo1(rates, test);
    expect(r.channelDownTimeHours as number).toBeCloseTo(887.2, 9);
    expect(rel(r.pfdAvg, 8.872e-4)).toBeLessThan(1e-12);
    expect(r.simplifiedEquationsValid).toBe(true); // λ_D·T1 = 0.00876
  });
  it("MRT defaults to MTTR: t_CE = 0.2 × (4380 + 8) + 0.8 × 8 = 884.0 h", () => {
    const r = pfdAvg1oo1(rates, { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 });
    expect(r.channelDownTimeHours as number).toBeCloseTo(884, 9);
    expect(r.proofTest.meanRepairTimeHours).toBe(8);
  });
  it("proof-test coverage (derived in src/safety/pfdAvg1oo1.ts from the linear 1oo1 form): PTC·λ_DU·T1/2 + (1 − PTC)·λ_DU·T_M/2 + λ_DD·MTTR", () => {
    // PTC 0.9, T_M = 87 600 h (10 years), MRT = 0: 0.9 × 2e-7 × 4380 + 0.1 × 2e-7 × 43 800 + 8e-7 × 8
    //   = 7.884e-4 + 8.76e-4 + 6.4e-6 = 1.6708e-3.
    const r = pfdAvg1oo1(rates, { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, meanRepairTimeHours: 0, proofTestCoverage: 0.9, missionTimeHours: 87600 });
    expect(rel(r.pfdAvg, 1.6708e-3)).toBeLessThan(1e-12);
    // PTC = 1 gives the Annex B value: 2e-7 × 4380 + 8e-7 × 8 = 8.824e-4.
    const full = pfdAvg1oo1(rates, { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, meanRepairTimeHours: 0, proofTestCoverage: 1, missionTimeHours: 87600 });
    expect(rel(full.pfdAvg, 8.824e-4)).toBeLessThan(1e-12);
  });
  it("PFH = λ_DU (IEC 61508-6:2010 B.3.3.2.1, from memory)", () => {
    const r = pfh1oo1(rates);
    expect(r.pfhPerHour).toBe(2e-7);
    expect(r.pfhFit).toBe(200);
  });
});

describe("1oo2 (IEC 61508-6:2010 B.3.2.2.3 and B.3.3.2.2, from memory)", () => {
  const cc = { beta: 0.1, betaD: 0.05 };
  it("PFDavg = 2((1−β_D)λ_DD + (1−β)λ_DU)²·t_CE·t_GE + β_D·λ_DD·MTTR + β·λ_DU(T1/2 + MRT), by hand", () => {
    // t_CE = 887.2 h (above); t_GE = 0.2 × (2920 + 24) + 0.8 × 8 = 588.8 + 6.4 = 595.2 h.
    // λ' = 0.95 × 8e-7 + 0.9 × 2e-7 = 9.4e-7 /h; 2 λ'² t_CE t_GE = 2 × 8.836e-13 × 887.2 × 595.2 = 9.33190e-7.
    // common cause: 0.05 × 8e-7 × 8 + 0.1 × 2e-7 × 4404 = 3.2e-7 + 8.808e-5 = 8.84e-5.  Sum 8.933319e-5.
    const r = pfdAvg1oo2(rates, cc, test);
    expect(r.channelDownTimeHours as number).toBeCloseTo(887.2, 9);
    expect(r.systemDownTimeHours as number).toBeCloseTo(595.2, 9);
    expect(rel(r.independentPfd, 2 * 8.836e-13 * 887.2 * 595.2)).toBeLessThan(1e-12);
    expect(rel(r.independentPfd, 9.3319e-7)).toBeLessThan(1e-5);
    expect(rel(r.commonCausePfd, 8.84e-5)).toBeLessThan(1e-12);
    expect(rel(r.pfdAvg, 8.84e-5 + 2 * 8.836e-13 * 887.2 * 595.2)).toBeLessThan(1e-12);
  });
  it("PFH = 2((1−β_D)λ_DD + (1−β)λ_DU)(1−β)λ_DU·t_CE + β_D·λ_DD + β·λ_DU, by hand", () => {
    // 2 × 9.4e-7 × 1.8e-7 × 887.2 = 3.002 2848e-10; + 0.05 × 8e-7 + 0.1 × 2e-7 = 6e-8.  Sum 6.03002 2848e-8.
    const r = pfh1oo2(rates, cc, test);
    expect(rel(r.pfhPerHour, 6.030022848e-8)).toBeLessThan(1e-12);
    expect(rel(r.commonCausePfhPerHour, 6e-8)).toBeLessThan(1e-12);
    expect(rel(r.pfhFit, 60.30022848)).toBeLessThan(1e-12);
  });
});

describe("limiting cases (IEC 61508-6:2010 Annex B forms, from memory)", () => {
  it("β = β_D = 1: PFDavg of the pair is exactly one channel's; PFH is λ_DU + λ_DD, never below one channel's λ_DU", () => {
    for (const r of [rates, { lambdaDuFit: 37, lambdaDdFit: 0 }, { lambdaDuFit: 0, lambdaDdFit: 450 }]) {
      expect(rel(pfdAvg1oo2(r, { beta: 1, betaD: 1 }, test).pfdAvg, pfdAvg1oo1(r, test).pfdAvg)).toBeLessThan(1e-12);
      // The β_D·λ_DD term of B.3.3.2.2 counts common-cause detected failures too, so the pair is worse than 1oo1 here.
      const pfh = pfh1oo2(r, { beta: 1, betaD: 1 }, test).pfhPerHour;
      expect(rel(pfh, r.lambdaDuFit / 1e9 + r.lambdaDdFit / 1e9)).toBeLessThan(1e-12);
      expect(pfh).toBeGreaterThanOrEqual(pfh1oo1(r).pfhPerHour);
    }
  });
  it("β = 1: the pair is never better than one channel's undetected term λ_DU(T1/2 + MRT)", () => {
    for (const betaD of [0, 0.02, 0.5, 1]) {
      const pair = pfdAvg1oo2(rates, { beta: 1, betaD }, test).pfdAvg;
      expect(pair).toBeGreaterThanOrEqual(2e-7 * (4380 + 24));
    }
  });
  it("β = 0, no detected failures, MRT = 0: PFDavg(1oo2) = (λ_DU·T1)²/3 exactly; with small λT1 and some λ_DD, ≈", () => {
    const t = { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, meanRepairTimeHours: 0 };
    const du = { lambdaDuFit: 500, lambdaDdFit: 0 };
    expect(rel(pfdAvg1oo2(du, { beta: 0, betaD: 0 }, t).pfdAvg, (5e-7 * 8760) ** 2 / 3)).toBeLessThan(1e-12);
    const some = pfdAvg1oo2({ lambdaDuFit: 500, lambdaDdFit: 5 }, { beta: 0, betaD: 0 }, t).pfdAvg;
    expect(rel(some, (5e-7 * 8760) ** 2 / 3)).toBeLessThan(0.03);
  });
  it("no dangerous failures: PFDavg 0, t_CE null", () => {
    const r = pfdAvg1oo1({ lambdaDuFit: 0, lambdaDdFit: 0 }, test);
    expect(r.pfdAvg).toBe(0);
    expect(r.channelDownTimeHours).toBeNull();
    expect(pfdAvg1oo2({ lambdaDuFit: 0, lambdaDdFit: 0 }, { beta: 0.1, betaD: 0.1 }, test).pfdAvg).toBe(0);
  });
  it("λ_D·T1 above 0.1 is flagged outside the simplified equations (common practice, no source)", () => {
    expect(pfdAvg1oo1({ lambdaDuFit: 20000, lambdaDdFit: 0 }, test).simplifiedEquationsValid).toBe(false); // 2e-5 × 8784 = 0.18
  });
});

describe("1oo2 with proof-test coverage: the form used never falls below the exact mean (derivation in src/safety/pfdAvg1oo2.ts)", () => {
  it("exact mean of (a·(t mod T1) + b·(t mod T_M))² by numeric integration, against the closed form and the form used", () => {
    const lambda = 1e-6;
    const t1 = 1000;
    for (const [ptc, tm] of [
      [0.8, 10000],
      [0.5, 3000],
      [0.95, 20000],
    ] as const) {
      const a = ptc * lambda;
      const b = (1 - ptc) * lambda;
      const n = 400000;
      let sum = 0;
      for (let i = 0; i < n; i++) {
        const t = ((i + 0.5) / n) * tm;
        const u = a * (t % t1) + b * t;
        sum += u * u;
      }
      const numeric = sum / n;
      const closed = (a * a * t1 * t1) / 3 + (b * b * tm * tm) / 3 + 2 * a * b * ((t1 * t1) / 3 + (t1 * (tm - t1)) / 4);
      expect(rel(numeric, closed)).toBeLessThan(1e-6);
      const used = pfdAvg1oo2(
        { lambdaDuFit: lambda * 1e9, lambdaDdFit: 0 },
        { beta: 0, betaD: 0 },
        { proofTestIntervalHours: t1, meanTimeToRestorationHours: 0, meanRepairTimeHours: 0, proofTestCoverage: ptc, missionTimeHours: tm },
      ).pfdAvg;
      expect(used).toBeGreaterThanOrEqual(closed);
      expect(rel(used - closed, (2 * a * b * t1 * (tm - t1)) / 12)).toBeLessThan(1e-9);
    }
  });
});
