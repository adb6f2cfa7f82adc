/**
 * The wire's sources are ordinary sources: worst case, RSS and Monte Carlo carry them through the wire's
 * transfer (E⁻¹ of the EMF at the amplifier input plus the compensation at t_cj).
 */
import { describe, expect, it } from "vitest";
import { emfFromTemperature, propagate, seebeckCoefficient, type Distribution } from "../../src/index.js";
import { _compile } from "../../src/its90/compiled.js";
import { _emfFromTemperature, _temperatureFromEmf } from "../../src/its90/engine.js";
import { thermocoupleData } from "../../src/its90/resolveType.js";
import { _wireEmfMillivolts, _wireStage, type WireDescription } from "../../src/chain/wire/wireStage.js";

const ct = _compile(thermocoupleData("K"));

function wireModel(wire: WireDescription, th: number, tcj: number) {
  const stage = _wireStage(wire, "K", { minC: tcj, maxC: tcj }, { overrides: undefined }, "test");
  const sources = stage.sourcesAt(th);
  const inputs: Record<string, Distribution> = {};
  for (const s of sources) inputs[s.name] = s.distribution;
  const e0 = _emfFromTemperature(ct, tcj);
  const model = (x: Readonly<Record<string, number>>): number => _temperatureFromEmf(ct, _wireEmfMillivolts(stage, ct, th, tcj, 0, x) + e0) - th;
  return { sources, inputs, model };
}

describe("wire sources through the propagation methods", () => {
  const wire: WireDescription = {
    cable: {
      kind: "extensionCable",
      mismatch: "proportional",
      grade: "extension",
      tolerance: { standard: "ASTM E230", limits: "standard" },
      runTemperatureC: { minC: 0, maxC: 200 },
      junctionTemperatureC: { minC: 200, maxC: 200 },
    },
    loop: { kind: "loopResistance", thermocoupleOhms: 200, biasCurrentNanoamps: 100, detectionCurrentNanoamps: 50, detectionDirection: "pullUp" },
    leakage: { kind: "insulationLeakage", minimumShuntOhms: 1e6, loopOhms: 200 },
    ageing: { kind: "ageing", totalDriftC: 1.5, statedAtC: 1000, serviceHours: 8760, direction: "up" },
  };

  it("worst case ⊇ Monte Carlo extremes ⊇ RSS 95 % interval, and the worst case is the sum of the sources' swings (first order, ITS-90 S)", () => {
    const { inputs, model } = wireModel(wire, 600, 0);
    const wc = propagate(model, inputs, { method: "worst-case" });
    const rss = propagate(model, inputs, { method: "rss" });
    const mc = propagate(model, inputs, { method: "monte-carlo", trials: 20000, seed: 7 });
    expect(wc.interval[0]).toBeLessThanOrEqual(mc.interval[0]);
    expect(wc.interval[1]).toBeGreaterThanOrEqual(mc.interval[1]);
    expect(mc.interval[0]).toBeLessThan(rss.interval[1]);
    const s600 = seebeckCoefficient("K", 600) / 1000; // mV/°C
    const cable = (2.2 * seebeckCoefficient("K", 200)) / 1000; // mV at the full 0 … 200 °C span
    const bias = 0.02; // 100 nA · 200 Ω
    const det = 0.01; // 50 nA · 200 Ω, pull-up: a bias upward
    const leak = (emfFromTemperature("K", 600) * 200) / (1e6 + 200);
    const high = (cable + bias + det) / s600 + 1.5;
    const low = (-cable - bias + det - leak) / s600;
    expect(wc.interval[1]).toBeCloseTo(high, 1);
    expect(wc.interval[0]).toBeCloseTo(low, 1);
    for (const name of ["cable.tolerance", "loop.biasOffset", "probe.leakage", "probe.ageing"]) expect(Object.keys(rss.contributions)).toContain(name);
  });
});
