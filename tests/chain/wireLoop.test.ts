/**
 * Loop resistance with the bias and detection currents, insulation leakage and ageing.
 */
import { describe, expect, it } from "vitest";
import {
  ageingBandAt,
  ageingBandOverService,
  awgDiameterMm,
  detectionOffsetMicrovolts,
  leakageScale,
  loopResistanceOhms,
  seebeckCoefficient,
  thermocoupleLoopOhmsPerMetre,
  wireEmfMillivolts,
  wireErrorSources,
  type AgeingElement,
} from "../../src/index.js";
import { _loopStage } from "../../src/chain/wire/loopResistance.js";
import { _ageingStage, _leakageStage } from "../../src/chain/wire/probe.js";

const ctx = { overrides: undefined };

describe("loop resistance and currents", () => {
  it("loop.biasOffset: 100 nA through 200 Ω is ±20 µV, about 0.5 °C for type K near room temperature (Ohm's law; ITS-90 S(25 °C) = 40.5 µV/°C; common practice, no source for the scenario)", () => {
    const [s] = wireErrorSources({ loop: { kind: "loopResistance", thermocoupleOhms: 200, biasCurrentNanoamps: 100 } }, "K", { minC: 25, maxC: 25 }, 25);
    expect(s?.name).toBe("loop.biasOffset");
    expect(s?.unit).toBe("µV");
    expect(s?.limit).toBe(20);
    const c = (s?.limit as number) / seebeckCoefficient("K", 25);
    expect(c).toBeCloseTo(0.494, 3);
  });

  it("loop.detectionOffset: the detection current's direction sets the sign (pull-up reads high, pull-down low; Ohm's law)", () => {
    expect(detectionOffsetMicrovolts(100, 200, "pullUp")).toBe(20);
    expect(detectionOffsetMicrovolts(100, 200, "pullDown")).toBe(-20);
    const up = _loopStage({ kind: "loopResistance", thermocoupleOhms: 200, detectionCurrentNanoamps: 100, detectionDirection: "pullUp" }, "K", ctx, "t");
    expect(up.offsetMillivolts({})).toBeCloseTo(0.02, 15);
    const spread = _loopStage(
      { kind: "loopResistance", thermocoupleOhms: 200, detectionCurrentNanoamps: 100, detectionDirection: "pullDown", detectionCurrentToleranceFraction: 0.2, resistanceToleranceFraction: 0.1 },
      "K",
      ctx,
      "t",
    );
    // |V|·((1 + 0.1)(1 + 0.2) − 1) = 20·0.32 µV.
    expect(spread.sources.map((s) => [s.name, Number(s.limit.toFixed(12))])).toEqual([["loop.detectionOffset", 6.4]]);
    expect(spread.nominalDetectionMicrovolts).toBe(-20);
  });

  it("AWG 20 is 0.812 mm (AWG definition d = 0.127 mm·92^((36 − n)/39); ASTM B258 tables print 0.0320 in, from memory)", () => {
    expect(awgDiameterMm(20)).toBeCloseTo(0.8128, 2);
    expect(awgDiameterMm(36)).toBeCloseTo(0.127, 12);
    expect(awgDiameterMm(-3)).toBeCloseTo(11.684, 2);
  });

  it("type K 20 AWG is about 1.93 Ω per metre of pair (loop-resistance tables ≈ 0.586 Ω per double foot, from memory; chromel 70.6 + alumel 29.4 µΩ·cm, from memory)", () => {
    const perM = thermocoupleLoopOhmsPerMetre("K", awgDiameterMm(20));
    expect(perM * 0.3048).toBeCloseTo(0.586, 2);
    // Type J 20 AWG ≈ 0.357 Ω per double foot and type T ≈ 0.304 (tables, from memory): within 5 %.
    expect(thermocoupleLoopOhmsPerMetre("J", awgDiameterMm(20)) * 0.3048 / 0.357).toBeGreaterThan(0.95);
    expect(thermocoupleLoopOhmsPerMetre("J", awgDiameterMm(20)) * 0.3048 / 0.357).toBeLessThan(1.05);
    expect(thermocoupleLoopOhmsPerMetre("T", awgDiameterMm(20)) * 0.3048 / 0.304).toBeGreaterThan(0.95);
    expect(thermocoupleLoopOhmsPerMetre("T", awgDiameterMm(20)) * 0.3048 / 0.304).toBeLessThan(1.05);
    const r = loopResistanceOhms({ kind: "loopResistance", thermocoupleWire: { lengthMetres: 10, diameterMm: 0.8128 }, cableOhms: 3, otherOhms: 1 }, "K");
    expect(r.totalOhms).toBeCloseTo(r.thermocoupleOhms + 4, 12);
    expect(r.thermocoupleOhms).toBeCloseTo((10 * (70.6 + 29.4) * 1e-8) / ((Math.PI * 0.8128e-3 ** 2) / 4), 9);
    // An extension-grade cable by gauge: the same alloys, so 20 m of 20 AWG KX is twice 10 m of 20 AWG K wire.
    const c = loopResistanceOhms({ kind: "loopResistance", thermocoupleWire: { lengthMetres: 10, awg: 20 }, cableWire: { lengthMetres: 20, awg: 20 } }, "K");
    expect(c.cableOhms).toBeCloseTo(2 * c.thermocoupleOhms, 12);
  });

  it("a long thin thermocouple makes the detection offset dominate: 30 m of 0.2 mm type K with 1 µA pull-up is > 20 °C (Ohm's law, ITS-90 S)", () => {
    const r = loopResistanceOhms({ kind: "loopResistance", thermocoupleWire: { lengthMetres: 30, diameterMm: 0.2 } }, "K").totalOhms;
    const v = detectionOffsetMicrovolts(1000, r, "pullUp");
    expect(v / seebeckCoefficient("K", 500)).toBeGreaterThan(20);
  });
});

describe("insulation leakage", () => {
  it("probe.leakage: 1 MΩ against a 100 Ω loop scales the EMF by 1/(1 + 1e-4) (voltage divider)", () => {
    expect(leakageScale(100, 1e6)).toBe(1 / (1 + 1e-4));
    const stage = _leakageStage({ kind: "insulationLeakage", minimumShuntOhms: 1e6, loopOhms: 100 }, ctx, "t");
    const [s] = stage.sources;
    expect(s?.name).toBe("probe.leakage");
    const worst = (s?.distribution.mean as number) - (s?.limit as number);
    expect(stage.emfScale({ "probe.leakage": worst })).toBeCloseTo(1 / (1 + 1e-4), 15);
    expect(stage.emfScale({ "probe.leakage": (s?.distribution.mean as number) + (s?.limit as number) })).toBeCloseTo(1, 15);
    expect(s?.description).toMatch(/design-specific/);
    const emf = wireEmfMillivolts({ leakage: { kind: "insulationLeakage", minimumShuntOhms: 1e6, loopOhms: 100 } }, "K", { minC: 0, maxC: 0 }, 1000, 0, { "probe.leakage": worst });
    expect(emf).toBeCloseTo(41.276 / (1 + 1e-4), 3); // E(1000 °C) = 41.276 mV, NIST SRD 60 type K
  });
});

describe("ageing", () => {
  const up: AgeingElement = { kind: "ageing", driftCPer1000Hours: 0.5, statedAtC: 1000, serviceHours: 4000, direction: "up" };

  it("probe.ageing: 0.5 °C per 1,000 h over 4,000 h is a one-sided 0 … +2 °C source (linear accumulation)", () => {
    const stage = _ageingStage(up, ctx, "t");
    const [s] = stage.sourcesAt(900);
    expect(s?.name).toBe("probe.ageing");
    expect((s?.distribution.mean as number) - (s?.limit as number)).toBe(0);
    expect((s?.distribution.mean as number) + (s?.limit as number)).toBe(2);
    expect(stage.deviationC({ "probe.ageing": 1.25 })).toBe(1.25);
  });

  it("the band widens linearly with time in service up to the recalibration", () => {
    expect(ageingBandAt(up, 0)).toEqual({ hours: 0, lowC: 0, highC: 0 });
    expect(ageingBandAt(up, 1000)).toEqual({ hours: 1000, lowC: 0, highC: 0.5 });
    const sym: AgeingElement = { kind: "ageing", totalDriftC: 3, statedAtC: 900, serviceHours: 6000, direction: "symmetric" };
    const band = ageingBandOverService(sym, 4);
    expect(band.map((p) => [p.hours, p.lowC, p.highC])).toEqual([[0, 0, 0], [1500, -0.75, 0.75], [3000, -1.5, 1.5], [4500, -2.25, 2.25], [6000, -3, 3]]);
    const down = _ageingStage({ ...sym, direction: "down" }, ctx, "t").sourcesAt(800)[0];
    expect([(down?.distribution.mean as number) - (down?.limit as number), (down?.distribution.mean as number) + (down?.limit as number)]).toEqual([-3, 0]);
  });

  it("probe.ageing enters at the hot junction like the tolerance: E(t_h + ε + a) (ITS-90)", () => {
    const emf = wireEmfMillivolts({ ageing: up }, "K", { minC: 0, maxC: 0 }, 800, 0, { "probe.ageing": 2 });
    const plain = wireEmfMillivolts({}, "K", { minC: 0, maxC: 0 }, 802, 0);
    expect(emf).toBe(plain);
  });
});
