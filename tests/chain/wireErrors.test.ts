/**
 * Bad input of the wire elements: one-line typed errors naming the quantity, the value and the valid range.
 */
import { describe, expect, it } from "vitest";
import { HotjunctionRangeError, HotjunctionTypeError, loopResistanceOhms, wireErrorSources, type ExtensionCableElement } from "../../src/index.js";

function caught(f: () => unknown): HotjunctionRangeError | HotjunctionTypeError {
  try {
    f();
  } catch (e) {
    if (e instanceof HotjunctionRangeError || e instanceof HotjunctionTypeError) return e;
    throw e;
  }
  throw new Error("did not throw");
}

const kx: ExtensionCableElement = {
  kind: "extensionCable",
  grade: "extension",
  tolerance: { standard: "ASTM E230", limits: "standard" },
  runTemperatureC: { minC: 0, maxC: 200 },
  junctionTemperatureC: { minC: 150, maxC: 150 },
};
const amb = { minC: 20, maxC: 30 };

describe("wire bad input", () => {
  it("a cable run outside its rated range is refused with the rated range", () => {
    const e = caught(() => wireErrorSources({ cable: { ...kx, runTemperatureC: { minC: 0, maxC: 250 } } }, "K", amb, 800));
    expect(e).toBeInstanceOf(HotjunctionRangeError);
    expect([e.code, e.quantity, e.value, e.min, e.max, e.unit]).toEqual(["OUT_OF_RANGE", "runTemperatureC.maxC", 250, 0, 200, "°C"]);
    expect(e.message).toBe(
      "wire, cable (KX, ASTM E230 standard limits): runTemperatureC.maxC 250 °C is outside the range where the cable's tolerance holds; valid range 0 to 200 °C",
    );
    expect(e.message).not.toMatch(/\n/);
  });

  it("a cable whose cold end (the ambient) or junction is outside its run is refused", () => {
    const e = caught(() => wireErrorSources({ cable: { ...kx, runTemperatureC: { minC: 25, maxC: 200 } } }, "K", amb, 800));
    expect([e.quantity, e.value, e.min, e.max]).toEqual(["ambient.minC", 20, 25, 200]);
    const j = caught(() => wireErrorSources({ cable: { ...kx, runTemperatureC: { minC: 0, maxC: 120 } } }, "K", amb, 800));
    expect([j.quantity, j.value, j.min, j.max]).toEqual(["junctionTemperatureC.minC", 150, 0, 120]);
  });

  it("a cable grade the standard does not define for the type is refused", () => {
    const e = caught(() => wireErrorSources({ cable: { ...kx, grade: "compensating" } }, "K", amb, 800));
    expect([e.code, e.quantity, e.value]).toEqual(["INVALID_OPTION", "cable grade", "compensating"]);
    const v = caught(() => wireErrorSources({ cable: { ...kx, grade: "compensating", tolerance: { standard: "IEC 60584-3", class: 2 } } }, "K", amb, 800));
    expect([v.code, v.quantity]).toEqual(["INVALID_OPTION", "cable variant"]);
  });

  it("a negative length or resistance is refused with its valid minimum", () => {
    const l = caught(() => loopResistanceOhms({ kind: "loopResistance", thermocoupleWire: { lengthMetres: -2, awg: 24 } }, "K"));
    expect([l.code, l.quantity, l.value, l.min, l.unit]).toEqual(["OUT_OF_RANGE", "thermocoupleWire.lengthMetres", -2, 0, "m"]);
    expect(l.message).toBe("loop resistance: thermocoupleWire.lengthMetres -2 m is negative; valid range 0 to Infinity m");
    const r = caught(() => loopResistanceOhms({ kind: "loopResistance", thermocoupleOhms: 10, cableOhms: -5 }, "K"));
    expect([r.quantity, r.value, r.min, r.unit]).toEqual(["cableOhms", -5, 0, "Ω"]);
    const s = caught(() => wireErrorSources({ leakage: { kind: "insulationLeakage", minimumShuntOhms: 0, loopOhms: 100 } }, "K", amb, 800));
    expect([s.quantity, s.value, s.min]).toEqual(["minimumShuntOhms", 0, 0]);
    const g = caught(() => loopResistanceOhms({ kind: "loopResistance", thermocoupleWire: { lengthMetres: 2, awg: 24.5 } }, "K"));
    expect([g.quantity, g.value, g.min, g.max]).toEqual(["awg", 24.5, -3, 40]);
  });

  it("a connector with no temperature given is refused", () => {
    const e = caught(() => wireErrorSources({ connectors: [{ kind: "connector", arrangement: "terminates", contactMetal: "copper" }] }, "K", amb, 800));
    expect([e.code, e.quantity]).toEqual(["INVALID_DESIGN", "connector.temperatureC / connector.aboveColdJunctionC"]);
    expect(e.message).toMatch(/^wire, connector 1: connector\.temperatureC \/ connector\.aboveColdJunctionC undefined is missing/);
    const d = caught(() => wireErrorSources({ connectors: [{ kind: "connector", arrangement: "inline", contactMetal: "copper", temperatureC: { minC: 20, maxC: 30 } }] }, "K", amb, 800));
    expect([d.code, d.quantity]).toEqual(["INVALID_DESIGN", "connector.positiveLegDifferenceC / connector.negativeLegDifferenceC"]);
    const t = caught(() => wireErrorSources({ connectors: [{ kind: "connector", arrangement: "inline", contactMetal: "copper", positiveLegDifferenceC: 1, negativeLegDifferenceC: 1 }] }, "K", amb, 800));
    expect([t.code, t.quantity, t.min, t.max]).toEqual(["INVALID_DESIGN", "connector.temperatureC", -20, 100]);
    const neg = caught(() => wireErrorSources({ connectors: [{ kind: "connector", arrangement: "inline", contactMetal: "matching", positiveLegDifferenceC: -1 }] }, "K", amb, 800));
    expect([neg.code, neg.quantity, neg.value, neg.min]).toEqual(["OUT_OF_RANGE", "positiveLegDifferenceC", -1, 0]);
    const hot = caught(() => wireErrorSources({ connectors: [{ kind: "connector", arrangement: "inline", contactMetal: "copper", temperatureC: { minC: 20, maxC: 150 }, positiveLegDifferenceC: 1, negativeLegDifferenceC: 1 }] }, "K", amb, 800));
    expect([hot.code, hot.quantity, hot.value, hot.min, hot.max]).toEqual(["OUT_OF_RANGE", "connector temperature", 150, -20, 100]);
  });

  it("a detection current without its direction, and ageing above its stated temperature, are refused", () => {
    const e = caught(() => wireErrorSources({ loop: { kind: "loopResistance", thermocoupleOhms: 10, detectionCurrentNanoamps: 50 } }, "K", amb, 800));
    expect([e.code, e.quantity, e.allowed]).toEqual(["INVALID_DESIGN", "detectionDirection", ["pullUp", "pullDown"]]);
    const a = caught(() =>
      wireErrorSources({ ageing: { kind: "ageing", driftCPer1000Hours: 1, statedAtC: 700, serviceHours: 2000, direction: "up" } }, "K", amb, 800),
    );
    expect([a.code, a.quantity, a.value, a.max]).toEqual(["OUT_OF_RANGE", "hot-junction temperature", 800, 700]);
    const n = caught(() =>
      wireErrorSources({ ageing: { kind: "ageing", driftCPer1000Hours: Number.NaN, statedAtC: 900, serviceHours: 2000, direction: "up" } }, "K", amb, 800),
    );
    expect(n).toBeInstanceOf(HotjunctionTypeError);
    expect(n.quantity).toBe("driftCPer1000Hours");
  });
});
