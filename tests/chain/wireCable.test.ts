/**
 * Extension and compensating cable: the tolerance converted through the Seebeck coefficient at the cable's
 * temperature, and how it appears at the tip.
 */
import { describe, expect, it } from "vitest";
import {
  cableMismatchBound,
  cableTipErrorC,
  cableToleranceMicrovolts,
  cableToleranceStatement,
  emfFromTemperature,
  seebeckCoefficient,
  temperatureFromEmf,
  wireEmfMillivolts,
  wireErrorSources,
  type ExtensionCableElement,
} from "../../src/index.js";
import { _extensionCableStage } from "../../src/chain/wire/extensionCable.js";

const kx: ExtensionCableElement = {
  kind: "extensionCable",
  mismatch: "proportional", // the model these checks are about (the default is the conservative envelope)
  grade: "extension",
  tolerance: { standard: "ASTM E230", limits: "standard" },
  runTemperatureC: { minC: 0, maxC: 200 },
  junctionTemperatureC: { minC: 200, maxC: 200 },
};

describe("extension cable tolerance", () => {
  it("ASTM E230 KX standard limits are ±2.2 °C over 0 … 200 °C (ASTM E230 extension-wire limits, from memory)", () => {
    const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
    expect([s.code, s.toleranceC, s.minC, s.maxC]).toEqual(["KX", 2.2, 0, 200]);
    expect(s.source).toMatch(/from memory/);
    const special = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "special" });
    expect(special.toleranceC).toBe(1.1);
  });

  it("IEC 60584-3 KX class 2 is ±100 µV (≈ ±2.5 °C at 900 °C), KCA class 2 holds 0 … 150 °C (IEC 60584-3, from memory)", () => {
    const s = cableToleranceStatement("K", "extension", { standard: "IEC 60584-3", class: 2 });
    expect([s.code, s.toleranceMicrovolts, s.minC, s.maxC]).toEqual(["KX", 100, -25, 200]);
    // The printed °C equivalent is the µV value through S at the measuring junction (ITS-90, NIST Monograph 175).
    expect(100 / seebeckCoefficient("K", 900)).toBeCloseTo(2.5, 0);
    const kca = cableToleranceStatement("K", "compensating", { standard: "IEC 60584-3", class: 2, variant: "A" });
    expect([kca.code, kca.minC, kca.maxC]).toEqual(["KCA", 0, 150]);
  });

  it("a ±2.2 °C tolerance at the cable's temperature is the EMF 2.2·S(t_cable), not 2.2·S(t_tip) (ITS-90 Seebeck, NIST Monograph 175)", () => {
    const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
    for (const t of [0, 50, 120, 200]) {
      expect(cableToleranceMicrovolts("K", s, t)).toBeCloseTo(2.2 * seebeckCoefficient("K", t), 10);
    }
  });

  it("cable.tolerance: ±2.2 °C rated at a 200 °C cable junction maps to the tip as 2.2·S(200 °C)/S(t_tip) (brief's hand check; ITS-90 Seebeck coefficients)", () => {
    const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
    for (const tip of [400, 600, 1000, 1250]) {
      const expected = (2.2 * seebeckCoefficient("K", 200)) / seebeckCoefficient("K", tip);
      expect(cableTipErrorC("K", s, tip, 200, 0)).toBeCloseTo(expected, 8);
      // The exact mapping through the chain's transfer agrees to first order: E⁻¹(E(t_h) − E(0) + ΔE) − t_h.
      const sources = wireErrorSources({ cable: kx }, "K", { minC: 0, maxC: 0 }, tip);
      const limit = sources.find((x) => x.name === "cable.tolerance")?.limit as number;
      const emf = wireEmfMillivolts({ cable: kx }, "K", { minC: 0, maxC: 0 }, tip, 0, { "cable.tolerance": limit });
      expect(temperatureFromEmf("K", emf) - tip).toBeCloseTo(expected, 2);
    }
    // S(200 °C) ≈ 39.9 and S(600 °C) ≈ 42.5 µV/°C for type K, so the 2.2 °C shows as about 2.07 °C at a 600 °C tip (NIST SRD 60 type K).
    expect(cableTipErrorC("K", s, 600, 200, 0)).toBeGreaterThan(2.0);
    expect(cableTipErrorC("K", s, 600, 200, 0)).toBeLessThan(2.15);
  });

  it("cable.tolerance: a type S compensating cable (ASTM SX ±5 °C, from memory) at 200 °C shows as 5·S(200)/S(1400) ≈ 3.6 °C at a 1400 °C tip (ITS-90 Seebeck)", () => {
    const s = cableToleranceStatement("S", "compensating", { standard: "ASTM E230", limits: "standard" });
    const ratio = seebeckCoefficient("S", 200) / seebeckCoefficient("S", 1400);
    expect(cableTipErrorC("S", s, 1400, 200, 0)).toBeCloseTo(5 * ratio, 9);
    expect(5 * ratio).toBeGreaterThan(3.3);
    expect(5 * ratio).toBeLessThan(3.9);
  });

  it("cable.tolerance: the proportional model scales with E(t_junction) − E(t_cj) (law of intermediate temperatures; ITS-90)", () => {
    const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
    const b = cableMismatchBound("K", s);
    expect(b.ratingPointC).toBe(200);
    expect(b.fraction).toBeCloseTo((2.2 * seebeckCoefficient("K", 200)) / (1000 * emfFromTemperature("K", 200)), 12);
    const stage = _extensionCableStage(
      { ...kx, junctionTemperatureC: { minC: 150, maxC: 150 } },
      "K",
      { minC: 25, maxC: 25 },
      { overrides: undefined },
      "test",
    );
    const de = stage.emfErrorMillivolts({ "cable.tolerance": b.toleranceMicrovolts }, 25);
    expect(de).toBeCloseTo(b.fraction * (emfFromTemperature("K", 150) - emfFromTemperature("K", 25)), 12);
  });

  it("cable.tolerance: the envelope model is T(t_junction) + T(t_cj) (what the statement alone guarantees)", () => {
    const stage = _extensionCableStage({ ...kx, mismatch: "envelope", junctionTemperatureC: { minC: 150, maxC: 150 } }, "K", { minC: 25, maxC: 25 }, { overrides: undefined }, "test");
    const src = stage.sources.find((x) => x.name === "cable.tolerance");
    expect(src?.limit).toBeCloseTo(2.2 * (seebeckCoefficient("K", 150) + seebeckCoefficient("K", 25)), 9);
  });

  it("cable.junctionTemperature: a junction range becomes a rectangular source over it", () => {
    const sources = wireErrorSources({ cable: { ...kx, junctionTemperatureC: { minC: 100, maxC: 180 } } }, "K", { minC: 20, maxC: 30 }, 800);
    const j = sources.find((x) => x.name === "cable.junctionTemperature");
    expect(j?.distribution.mean).toBe(140);
    expect(j?.limit).toBe(40);
  });
});
