/**
 * The wire (cable, connectors, loop, leakage, ageing) end to end: through a design file, the trip design, the
 * propagation methods and the fault review; properties over the whole chain; bad input through the design file.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseDesign } from "../../src/design/parseDesign.js";
import { measurementChainFromDesign, tripDesignFromDesign } from "../../src/design/designToObjects.js";
import { DesignFileError } from "../../src/design/designFileError.js";
import { HotjunctionRangeError } from "../../src/errors.js";
import {
  designTrip,
  emfFromTemperature,
  faultCatalogue,
  propagate,
  seebeckCoefficient,
  tripTemperatureModel,
  type MeasurementChain,
  type WireDescription,
} from "../../src/index.js";

/** A type K comparator trip at 500 °C, hardware compensation, ambient a single 25 °C (no range source). */
const baseDesign = {
  hotjunctionDesign: 1,
  name: "wire test furnace",
  setpoints: [{ name: "trip", tripTemperatureC: 500, maxNormalOperatingC: 450, hazardLimitC: 550 }],
  thermocouple: { type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
  coldJunction: { method: "hardware", compensationMicrovoltsPerC: 40.6, matchedAtC: 25 },
  amplifier: { kind: "voltage", gain: { setBy: "fixed", gain: 100 } },
  comparator: {},
  reference: { kind: "series", name: "4.096 V", nominalVolts: 4.096, initialAccuracyFraction: 0 },
  resistors: { series: "E96", toleranceFraction: 0.001 },
  ambient: { minC: 25, maxC: 25 },
} as const;

function design(extra: Record<string, unknown>) {
  return parseDesign(JSON.stringify({ ...baseDesign, ...extra }), { fileName: "furnace.json" });
}

function tripWith(wire: Record<string, unknown> | undefined, networks?: Parameters<typeof designTrip>[1]) {
  const d = design(wire === undefined ? {} : { wire });
  return designTrip(tripDesignFromDesign(d), { monteCarloTrials: 2000, seed: 3, ...networks });
}

describe("the wire through a design file and the trip design", () => {
  it("connector.temperature: a copper terminal block at 35 °C, cold-junction sensor at 25 °C, moves a type K trip so that E(t′) − E(t) = E(35 °C) − E(25 °C) ≈ 0.407 mV (NIST SRD 60 type K: 1.407 and 1.000 mV, from memory)", () => {
    const plain = tripWith(undefined);
    const networks = { networks: plain.networks };
    const block = { connectors: [{ arrangement: "terminates", contactMetal: "copper", temperatureC: { minC: 35, maxC: 35 } }] };
    const moved = tripWith(block, networks);
    const t0 = plain.setpoints[0]!.nominalTripC;
    const t1 = moved.setpoints[0]!.nominalTripC;
    // The block reads low by E(35) − E(25): the trip comes later by that EMF at the trip temperature.
    expect(emfFromTemperature("K", t1) - emfFromTemperature("K", t0)).toBeCloseTo(1.407 - 1.0, 3);
    // About 10 °C at 500 °C (0.407 mV / S(500 °C) ≈ 42.6 µV/°C, NIST SRD 60 type K).
    expect(t1 - t0).toBeGreaterThan(9);
    expect(t1 - t0).toBeLessThan(10);
    // A trip designed with the block known compensates it: its nominal trip stays at the target within the
    // resistor rounding of the plain design (common practice, no source: a stated offset belongs in the threshold).
    const designed = tripWith(block);
    expect(Math.abs(designed.setpoints[0]!.nominalTripC - 500)).toBeLessThan(Math.abs(plain.setpoints[0]!.roundingErrorC) + 0.5);
  });

  it("loop.biasOffset: 100 nA through 200 Ω is 20 µV, about 0.5 °C of type K near room temperature, by name in the per-source table (ITS-90 Seebeck coefficient; common practice, no source for the scenario)", () => {
    const d = design({
      setpoints: [{ name: "trip", tripTemperatureC: 60, maxNormalOperatingC: 50, hazardLimitC: 75 }],
      wire: { loop: { thermocoupleOhms: 200, biasCurrentNanoamps: 100 } },
    });
    const r = designTrip(tripDesignFromDesign(d), { monteCarloTrials: 2000, seed: 3 });
    const row = r.setpoints[0]!.errorSources.find((s) => s.name === "loop.biasOffset");
    expect(row).toBeDefined();
    const expected = 20 / seebeckCoefficient("K", r.setpoints[0]!.nominalTripC);
    expect(row!.worstCaseC).toBeCloseTo(expected, 3);
    expect(row!.worstCaseC).toBeGreaterThan(0.45);
    expect(row!.worstCaseC).toBeLessThan(0.5);
    // Worst case ⊇ RSS, and the band's half-width is the sum of the sources' swings (the bias and the two
    // divider resistors; worst case of a model linear to first order, JCGM 100 5.1.2).
    const s = r.setpoints[0]!;
    const sum = s.errorSources.reduce((a, e) => a + e.worstCaseC, 0);
    expect(s.errorSources.map((e) => e.name).sort()).toEqual(["divider.resistor1.tolerance", "divider.resistor2.tolerance", "loop.biasOffset"]);
    expect((s.worstCase.highC - s.worstCase.lowC) / 2).toBeCloseTo(sum, 3);
    expect(s.rss.lowC).toBeGreaterThanOrEqual(s.worstCase.lowC);
    expect(s.rss.highC).toBeLessThanOrEqual(s.worstCase.highC);
  });

  it("every new source appears by name in the trip's per-source table, and the band over time in service widens from the band without ageing to the full band (linear drift; common practice, no source)", () => {
    const wire = {
      cable: {
        grade: "extension",
        tolerance: { standard: "ASTM E230", limits: "standard" },
        runTemperatureC: { minC: 20, maxC: 150 },
        junctionTemperatureC: { minC: 80, maxC: 150 },
        mismatch: "proportional",
      },
      connectors: [{ arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 0, maxC: 4 } }],
      loop: { thermocoupleOhms: 20, cableOhms: 50, biasCurrentNanoamps: 20, detectionCurrentNanoamps: 50, detectionCurrentToleranceFraction: 0.2, detectionDirection: "pullUp" },
      leakage: { minimumShuntOhms: 50000, loopOhms: 20 },
      ageing: { driftCPer1000Hours: 0.5, statedAtC: 900, serviceHours: 4000, direction: "down" },
    };
    const r = tripWith(wire);
    const s = r.setpoints[0]!;
    const names = s.errorSources.map((e) => e.name);
    for (const n of ["cable.tolerance", "cable.junctionTemperature", "connector.aboveColdJunction", "loop.biasOffset", "loop.detectionOffset", "probe.leakage", "probe.ageing"]) {
      expect(names, n).toContain(n);
    }
    const service = s.bandOverService!;
    expect(service.map((p) => p.hours)).toEqual([0, 1000, 2000, 3000, 4000]);
    expect(service[4]!.lowC).toBeCloseTo(s.worstCase.lowC, 9);
    expect(service[4]!.highC).toBeCloseTo(s.worstCase.highC, 9);
    const { ageing: _a, ...rest } = wire;
    const fresh = tripWith(rest).setpoints[0]!.worstCase;
    expect(service[0]!.lowC).toBeCloseTo(fresh.lowC, 9);
    expect(service[0]!.highC).toBeCloseTo(fresh.highC, 9);
    for (let i = 1; i < service.length; i++) {
      expect(service[i]!.lowC).toBeLessThanOrEqual(service[i - 1]!.lowC + 1e-9);
      expect(service[i]!.highC).toBeGreaterThanOrEqual(service[i - 1]!.highC - 1e-9);
    }
    // A drift "down" (reads low) delays the trip: the high end grows by about the 2 °C total.
    expect(service[4]!.highC - service[0]!.highC).toBeGreaterThan(1.9);
    expect(service[4]!.highC - service[0]!.highC).toBeLessThan(2.1);
  });

  it("the fault review gets the wire's faults by id (open contact, shorted and reversed cable, insulation collapse, detection current lost, missed recalibration)", () => {
    const d = parseDesign(
      JSON.stringify({
        ...baseDesign,
        wire: {
          cable: { grade: "extension", tolerance: { standard: "ASTM E230", limits: "standard" }, runTemperatureC: { minC: 20, maxC: 150 }, junctionTemperatureC: { minC: 100, maxC: 100 } },
          connectors: [{ arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 0, maxC: 2 } }],
          loop: { thermocoupleOhms: 100, detectionCurrentNanoamps: 100, detectionDirection: "pullUp" },
          leakage: { minimumShuntOhms: 1e6, loopOhms: 100 },
          ageing: { totalDriftC: 2, statedAtC: 600, serviceHours: 2000, direction: "symmetric" },
        },
      }),
    );
    const faults = faultCatalogue(measurementChainFromDesign(d));
    const ids = faults.map((f) => f.id);
    for (const id of ["cable.shorted", "cable.reversed", "connector.openContact", "probe.insulationCollapse", "loop.detectionCurrentLost", "probe.recalibrationMissed"]) {
      expect(ids, id).toContain(id);
    }
    // Reversed cable: ΔE = −2·[E(100 °C) − E(25 °C)] (law of intermediate temperatures; ITS-90 type K).
    const rev = faults.find((f) => f.id === "cable.reversed")!.effects[0] as { millivolts: number };
    expect(rev.millivolts).toBeCloseTo(-2 * (emfFromTemperature("K", 100) - emfFromTemperature("K", 25)), 12);
    // Detection current lost: the +I·R = 100 nA · 100 Ω = 10 µV offset goes.
    const lost = faults.find((f) => f.id === "loop.detectionCurrentLost")!.effects[0] as { millivolts: number };
    expect(lost.millivolts).toBeCloseTo(-0.01, 12);
  });
});

describe("the sweep's per-source table", () => {
  it("evaluateChain on the heat-treat furnace example lists every wire source by name, the cable largest (the sweep's largest-sources column; common practice, no source)", async () => {
    const { readFileSync } = await import("node:fs");
    const { evaluateChain } = await import("../../src/index.js");
    const chain = measurementChainFromDesign(parseDesign(readFileSync("examples/heat-treat-furnace-wire.json", "utf8")));
    const e = evaluateChain(chain, 850, { methods: ["worst-case"] });
    const names = e.contributions.map((c) => c.source);
    // The envelope model (the default) takes the junction's worst temperature itself: no junction-range source.
    for (const n of ["cable.tolerance", "connector.aboveColdJunction", "loop.biasOffset", "loop.detectionOffset", "probe.leakage", "probe.ageing"]) {
      expect(names, n).toContain(n);
    }
    expect(names).not.toContain("cable.junctionTemperature");
    const largest = [...e.contributions].sort((a, b) => b.worstCaseSwingC - a.worstCaseSwingC)[0]!;
    expect(largest.source).toBe("cable.tolerance");
    // Envelope of ASTM E230 KX standard limits (±2.2 °C at the cable's temperature, from memory): the largest
    // 2.2·S(t) over the junction's range 80…150 °C plus over the terminals' 20…45 °C, through S at 850 °C
    // (ITS-90 Seebeck coefficients), to first order.
    const maxS = (lo: number, hi: number): number => {
      let m = 0;
      for (let t = lo; t <= hi; t += 0.5) m = Math.max(m, seebeckCoefficient("K", t));
      return m;
    };
    const expected = (2.2 * (maxS(80, 150) + maxS(20, 45))) / seebeckCoefficient("K", 850);
    expect(largest.worstCaseSwingC / 2).toBeCloseTo(expected, 1);
  });
});

describe("properties of the wire through the whole chain", () => {
  const chainOf = (wire: WireDescription | undefined, ambient = { minC: 20, maxC: 30 }): MeasurementChain => {
    const d = design({ ambient });
    const c = measurementChainFromDesign(d);
    return {
      ...c,
      divider: { kind: "divider", resistorsOhms: [6200, 1000], toleranceFraction: 0.001 },
      ...(wire !== undefined ? { wire } : {}),
    };
  };
  const worst = (chain: MeasurementChain): [number, number] => {
    const m = tripTemperatureModel(chain, 0);
    const r = propagate(m.model, m.inputs, { method: "worst-case" });
    return [r.interval[0], r.interval[1]];
  };

  it("widening any new source never narrows the worst-case trip band (property over generated wires; common practice, no source)", () => {
    fc.assert(
      fc.property(
        fc.record({
          tolC: fc.double({ min: 0.1, max: 3, noNaN: true }),
          above: fc.double({ min: 0, max: 5, noNaN: true }),
          bias: fc.double({ min: 1, max: 200, noNaN: true }),
          shunt: fc.double({ min: 1e4, max: 1e7, noNaN: true }),
          drift: fc.double({ min: 0.1, max: 5, noNaN: true }),
          widen: fc.double({ min: 1, max: 3, noNaN: true }),
          which: fc.integer({ min: 0, max: 4 }),
        }),
        (p) => {
          const make = (k: number[]): WireDescription => ({
            cable: {
              kind: "extensionCable",
              grade: "extension",
              tolerance: { standard: "custom", toleranceC: p.tolC * (k[0] ?? 1), minC: 0, maxC: 200 },
              runTemperatureC: { minC: 10, maxC: 150 },
              junctionTemperatureC: { minC: 60, maxC: 120 },
            },
            connectors: [{ kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 0, maxC: p.above * (k[1] ?? 1) } }],
            loop: { kind: "loopResistance", thermocoupleOhms: 100, biasCurrentNanoamps: p.bias * (k[2] ?? 1) },
            leakage: { kind: "insulationLeakage", minimumShuntOhms: p.shunt / (k[3] ?? 1), loopOhms: 100 },
            ageing: { kind: "ageing", totalDriftC: p.drift * (k[4] ?? 1), statedAtC: 800, serviceHours: 1000, direction: "symmetric" },
          });
          const k = [1, 1, 1, 1, 1];
          const [lo0, hi0] = worst(chainOf(make(k)));
          k[p.which] = p.widen;
          const [lo1, hi1] = worst(chainOf(make(k)));
          // The connector's range widens about a fixed lower end, so its centre moves; the band still holds.
          expect(lo1).toBeLessThanOrEqual(lo0 + 1e-6);
          expect(hi1).toBeGreaterThanOrEqual(hi0 - 1e-6);
        },
      ),
      { numRuns: 25, seed: 17 },
    );
  });

  it("a cable run entirely at the cold-junction temperature adds nothing to the trip band (proportional model: a homogeneous conductor without a gradient makes no EMF; law of homogeneous circuits)", () => {
    for (const t of [0, 25, 40]) {
      const ambient = { minC: t, maxC: t };
      const cable: WireDescription = {
        cable: {
          kind: "extensionCable",
          grade: "extension",
          tolerance: { standard: "ASTM E230", limits: "standard" },
          runTemperatureC: { minC: t, maxC: t },
          junctionTemperatureC: { minC: t, maxC: t },
          mismatch: "proportional",
        },
      };
      const [lo0, hi0] = worst(chainOf(undefined, ambient));
      const [lo1, hi1] = worst(chainOf(cable, ambient));
      expect(lo1).toBeCloseTo(lo0, 9);
      expect(hi1).toBeCloseTo(hi0, 9);
    }
  });

  it("the envelope model (the default) is never narrower than the proportional one through the whole chain (proof in chain/wire/extensionCable.ts; checked here over junction temperatures)", () => {
    for (const tj of [40, 90, 150, 200]) {
      const cable = (mismatch: "envelope" | "proportional"): WireDescription => ({
        cable: {
          kind: "extensionCable",
          grade: "extension",
          tolerance: { standard: "ASTM E230", limits: "standard" },
          runTemperatureC: { minC: 20, maxC: 200 },
          junctionTemperatureC: { minC: tj, maxC: tj },
          mismatch,
        },
      });
      const [lp, hp] = worst(chainOf(cable("proportional")));
      const [le, he] = worst(chainOf(cable("envelope")));
      expect(le).toBeLessThanOrEqual(lp + 1e-9);
      expect(he).toBeGreaterThanOrEqual(hp - 1e-9);
    }
  });
});

describe("bad wire input through the design file: one line, with the path", () => {
  const fails = (wire: unknown, extra: Record<string, unknown> = {}): DesignFileError => {
    try {
      design({ wire, ...extra });
    } catch (e) {
      expect(e).toBeInstanceOf(DesignFileError);
      expect((e as Error).message).not.toContain("\n");
      return e as DesignFileError;
    }
    throw new Error("the design was accepted");
  };
  const cable = (run: { minC: number; maxC: number }) => ({
    grade: "extension",
    tolerance: { standard: "ASTM E230", limits: "standard" },
    runTemperatureC: run,
    junctionTemperatureC: { minC: 60, maxC: 60 },
  });

  it("a cable run outside its rated range (ASTM E230 type KX extension wire: 0 to 200 °C, from memory)", () => {
    const e = fails({ cable: cable({ minC: 20, maxC: 260 }) });
    expect(e.path).toBe("wire.cable.runTemperatureC.maxC");
    expect(e.message).toMatch(/furnace\.json: at wire\.cable\.runTemperatureC\.maxC: .*260.*outside the range where the cable's tolerance holds.*200/);
  });

  it("a negative length or resistance", () => {
    expect(fails({ loop: { thermocoupleWire: { lengthMetres: -3, diameterMm: 0.5 } } }).path).toBe("wire.loop.thermocoupleWire.lengthMetres");
    expect(fails({ loop: { thermocoupleOhms: -1 } }).path).toBe("wire.loop.thermocoupleOhms");
    expect(fails({ leakage: { minimumShuntOhms: -5, loopOhms: 10 } }).path).toBe("wire.leakage.minimumShuntOhms");
  });

  it("a connector with no temperature (difference) given", () => {
    const t = fails({ connectors: [{ arrangement: "terminates", contactMetal: "copper" }] });
    expect(t.path).toBe("wire.connectors[0]");
    expect(t.message).toMatch(/temperature is required/);
    const i = fails({ connectors: [{ arrangement: "inline", contactMetal: "copper", temperatureC: { minC: 30, maxC: 30 } }] });
    expect(i.path).toBe("wire.connectors[0]");
    expect(i.message).toMatch(/temperature difference across each leg's contacts/);
  });

  it("the same physics stated twice: the amplifier's bias through its source resistance with a loop, an isothermal gradient with a terminating connector", () => {
    const amp = { kind: "voltage", gain: { setBy: "fixed", gain: 100 }, biasCurrentNanoamps: 10, sourceResistanceOhms: 100 };
    expect(fails({ loop: { thermocoupleOhms: 100, biasCurrentNanoamps: 10 } }, { amplifier: amp }).path).toBe("amplifier.sourceResistanceOhms");
    const cj = { method: "hardware", compensationMicrovoltsPerC: 40.6, isothermalGradientC: 0.5 };
    const block = { connectors: [{ arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 0, maxC: 1 } }] };
    expect(fails(block, { coldJunction: cj }).path).toBe("coldJunction.isothermalGradientC");
    // The chain API refuses the same, with a typed error.
    const d = design({});
    const chain = { ...measurementChainFromDesign(d), coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6, isothermalGradientC: 0.5 }, wire: { connectors: [{ kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 0, maxC: 1 } }] } } as MeasurementChain;
    expect(() => tripTemperatureModel({ ...chain, divider: { kind: "divider", resistorsOhms: [6200, 1000], toleranceFraction: 0.001 } }, 0)).toThrow(HotjunctionRangeError);
    expect(() => tripTemperatureModel({ ...chain, divider: { kind: "divider", resistorsOhms: [6200, 1000], toleranceFraction: 0.001 } }, 0)).toThrow(/state it once/);
  });
});
