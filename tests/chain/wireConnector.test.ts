/**
 * Connectors and terminal blocks of another metal (law of intermediate metals), and how the cold-junction
 * element's isothermal gradient folds into the same model.
 */
import { describe, expect, it } from "vitest";
import {
  coldJunctionIndicatedC,
  emfFromTemperature,
  isothermalGradientAsConnector,
  legSeebeckVsContact,
  seebeckCoefficient,
  temperatureFromEmf,
  wireEmfMillivolts,
  wireErrorSources,
  type ConnectorElement,
} from "../../src/index.js";
import { _connectorStage } from "../../src/chain/wire/connector.js";

const ctx = { overrides: undefined };

describe("connector / terminal block", () => {
  it("connector.temperature: a copper block at 35 °C with the sensor at 25 °C takes E(35) − E(25) ≈ 0.407 mV off the signal (NIST SRD 60 type K: 1.407 and 1.000 mV)", () => {
    // NIST SRD 60 type K table (reference junction 0 °C): E(25 °C) = 1.000 mV, E(35 °C) = 1.407 mV.
    expect(emfFromTemperature("K", 35)).toBeCloseTo(1.407, 3);
    expect(emfFromTemperature("K", 25)).toBeCloseTo(1.0, 3);
    const block: ConnectorElement = { kind: "connector", arrangement: "terminates", contactMetal: "copper", temperatureC: { minC: 35, maxC: 35 } };
    const stage = _connectorStage(block, "K", { minC: 25, maxC: 25 }, ctx, "test");
    const de = stage.emfErrorMillivolts({}, 25);
    expect(de).toBeCloseTo(-(1.407 - 1.0), 3);
    expect(de).toBe(emfFromTemperature("K", 25) - emfFromTemperature("K", 35));
    // About 10 °C low at the tip (0.407 mV / S(500 °C) ≈ 0.407/42.6 mV/°C … NIST SRD 60 type K).
    const emf = wireEmfMillivolts({ connectors: [block] }, "K", { minC: 25, maxC: 25 }, 500, 25);
    const indicated = temperatureFromEmf("K", emf + emfFromTemperature("K", 25));
    expect(indicated - 500).toBeCloseTo(-0.407 / (seebeckCoefficient("K", 500) / 1000), 1);
    expect(indicated - 500).toBeLessThan(-9);
    expect(indicated - 500).toBeGreaterThan(-10.5);
  });

  it("connector.aboveColdJunction: the relative form gives the same EMF as the absolute one (law of intermediate temperatures)", () => {
    const rel: ConnectorElement = { kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 10, maxC: 10 } };
    const stage = _connectorStage(rel, "K", { minC: 0, maxC: 50 }, ctx, "test");
    for (const tcj of [0, 17, 25, 50]) {
      expect(stage.emfErrorMillivolts({}, tcj)).toBe(emfFromTemperature("K", tcj) - emfFromTemperature("K", tcj + 10));
    }
  });

  it("the isothermal gradient δ folds in: a terminating copper connector at t_cj + u equals the cold-junction mapping with t_c = t_cj + u, δ = −u (reference sheet §6 mapping)", () => {
    const c = isothermalGradientAsConnector(0.8);
    const stage = _connectorStage(c, "K", { minC: 25, maxC: 25 }, ctx, "test");
    expect(stage.sources.map((s) => [s.name, s.limit])).toEqual([["connector.aboveColdJunction", 0.8]]);
    for (const [th, u] of [[500, 0.8], [900, -0.8], [300, 0.3]] as const) {
      const emf = emfFromTemperature("K", th) - emfFromTemperature("K", 25) + stage.emfErrorMillivolts({ "connector.aboveColdJunction": u }, 25);
      const indicated = temperatureFromEmf("K", emf + emfFromTemperature("K", 25));
      // coldJunctionIndicatedC(type, t_h, t_c, δ) with the real junction at the connector and the sensor u below it.
      expect(indicated).toBeCloseTo(coldJunctionIndicatedC("K", th, 25 + u, -u), 9);
    }
  });

  it("connector.positiveLeg / negativeLeg: each leg adds −S_P/Cu·Δt_P + S_N/Cu·Δt_N (law of intermediate metals; leg coefficients vs platinum from memory)", () => {
    const inline: ConnectorElement = {
      kind: "connector",
      arrangement: "inline",
      contactMetal: "copper",
      temperatureC: { minC: 25, maxC: 25 },
      positiveLegDifferenceC: 2,
      negativeLegDifferenceC: 2,
    };
    const stage = _connectorStage(inline, "K", { minC: 25, maxC: 25 }, ctx, "test");
    const legs = legSeebeckVsContact("K", "copper", 25);
    // Chromel vs platinum ≈ +25.8 µV/°C, copper vs platinum ≈ +6.5 µV/°C near 0 °C (from memory): chromel vs copper ≈ 19.3.
    expect(legs.positiveMicrovoltsPerC).toBeCloseTo(19.3, 6);
    expect(stage.emfErrorMillivolts({ "connector.positiveLeg": 2, "connector.negativeLeg": 0 }, 25)).toBeCloseTo(-0.0386, 9);
    // Both legs at one difference d: the copper stretch loses the type's own S·d whatever the tables say (ITS-90 S(25 °C)).
    const both = stage.emfErrorMillivolts({ "connector.positiveLeg": 1.5, "connector.negativeLeg": 1.5 }, 25);
    expect(both).toBeCloseTo((-seebeckCoefficient("K", 25) * 1.5) / 1000, 12);
  });

  it("a connector of matching alloy adds nothing (law of intermediate metals)", () => {
    const m: ConnectorElement = { kind: "connector", arrangement: "inline", contactMetal: "matching", positiveLegDifferenceC: 20, negativeLegDifferenceC: 20 };
    const stage = _connectorStage(m, "K", { minC: 25, maxC: 25 }, ctx, "test");
    expect(stage.sources).toEqual([]);
    expect(stage.emfErrorMillivolts({}, 25)).toBe(0);
  });

  it("connector.legDifference: a terminating block whose two legs' contacts differ by u adds −(S_P/Cu + S_N/Cu)·u/2 (law of intermediate metals)", () => {
    const block: ConnectorElement = { kind: "connector", arrangement: "terminates", contactMetal: "copper", temperatureC: { minC: 30, maxC: 30 }, legDifferenceC: 1 };
    const stage = _connectorStage(block, "K", { minC: 25, maxC: 25 }, ctx, "test");
    const legs = legSeebeckVsContact("K", "copper", 30);
    const base = emfFromTemperature("K", 25) - emfFromTemperature("K", 30);
    expect(stage.emfErrorMillivolts({ "connector.legDifference": 1 }, 25) - base).toBeCloseTo(
      (-(legs.positiveMicrovoltsPerC + legs.negativeMicrovoltsPerC) / 2) / 1000,
      12,
    );
  });

  it("several connectors are named connector1.*, connector2.*", () => {
    const a: ConnectorElement = { kind: "connector", arrangement: "terminates", contactMetal: "copper", temperatureC: { minC: 30, maxC: 40 } };
    const b: ConnectorElement = { kind: "connector", arrangement: "inline", contactMetal: "copper", temperatureC: { minC: 20, maxC: 40 }, positiveLegDifferenceC: 1, negativeLegDifferenceC: 1 };
    const names = wireErrorSources({ connectors: [a, b] }, "K", { minC: 25, maxC: 25 }, 500).map((s) => s.name);
    expect(names).toEqual(["connector1.temperature", "connector2.positiveLeg", "connector2.negativeLeg"]);
  });
});
