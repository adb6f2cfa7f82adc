/**
 * Properties of the wire elements over many inputs (fast-check).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { ThermocoupleType } from "../../src/index.js";
import { cableToleranceStatement, type CableTolerance, type ConnectorElement, type ExtensionCableElement } from "../../src/index.js";
import type { WireErrorSource } from "../../src/chain/types.js";
import type { ContactMetal } from "../../src/chain/wireTypes.js";
import { _connectorStage } from "../../src/chain/wire/connector.js";
import { _extensionCableStage } from "../../src/chain/wire/extensionCable.js";
import { _loopStage } from "../../src/chain/wire/loopResistance.js";
import { _ageingStage, _leakageStage } from "../../src/chain/wire/probe.js";

const ctx = { overrides: undefined };
const cableTypes = ["K", "J", "E", "N", "T"] as const;
const tolerances: readonly CableTolerance[] = [
  { standard: "ASTM E230", limits: "standard" },
  { standard: "ASTM E230", limits: "special" },
  { standard: "IEC 60584-3", class: 1 },
  { standard: "IEC 60584-3", class: 2 },
];

/** Support of a source's distribution: [mean − limit, mean + limit]. */
function support(s: WireErrorSource | undefined): [number, number] {
  if (s === undefined) return [0, 0];
  return [s.distribution.mean - s.limit, s.distribution.mean + s.limit];
}
function contains(outer: [number, number], inner: [number, number]): boolean {
  return outer[0] <= inner[0] + 1e-12 && outer[1] >= inner[1] - 1e-12;
}

describe("wire properties", () => {
  it("cable.tolerance: a cable run entirely at the cold-junction temperature adds no thermoelectric error (homogeneous conductor, no gradient)", () => {
    fc.assert(
      fc.property(fc.constantFrom(...cableTypes), fc.constantFrom(...tolerances), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), (type, tol, f, u) => {
        const s = cableToleranceStatement(type, "extension", tol);
        const t = Math.max(0, s.minC) + f * (s.maxC - Math.max(0, s.minC));
        const cable: ExtensionCableElement = { kind: "extensionCable", grade: "extension", tolerance: tol, runTemperatureC: { minC: t, maxC: t }, junctionTemperatureC: { minC: t, maxC: t }, mismatch: "proportional" };
        const stage = _extensionCableStage(cable, type, { minC: t, maxC: t }, ctx, "p");
        const limit = stage.sources.find((x) => x.name === "cable.tolerance")?.limit ?? 0;
        expect(Math.abs(stage.emfErrorMillivolts({ "cable.tolerance": u * limit }, t))).toBe(0);
      }),
      { numRuns: 300 },
    );
  });

  it("cable.tolerance: the envelope model's EMF limit contains the proportional model's for every junction and cold-end temperature (|k·ΔE| ≤ T(t_j) + T(t_cj))", () => {
    fc.assert(
      fc.property(fc.constantFrom(...cableTypes), fc.constantFrom(...tolerances), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (type, tol, f, g) => {
        const s = cableToleranceStatement(type, "extension", tol);
        const lo = Math.max(0, s.minC);
        const tj = lo + f * (s.maxC - lo);
        const tc = lo + g * (s.maxC - lo);
        const build = (mismatch: "proportional" | "envelope") =>
          _extensionCableStage(
            { kind: "extensionCable", grade: "extension", tolerance: tol, runTemperatureC: { minC: lo, maxC: s.maxC }, junctionTemperatureC: { minC: tj, maxC: tj }, mismatch },
            type,
            { minC: tc, maxC: tc },
            ctx,
            "p",
          );
        const prop = build("proportional");
        const env = build("envelope");
        const pLim = prop.sources.find((x) => x.name === "cable.tolerance")?.limit ?? 0;
        const eLim = env.sources.find((x) => x.name === "cable.tolerance")?.limit ?? 0;
        const worstProp = Math.abs(prop.emfErrorMillivolts({ "cable.tolerance": pLim }, tc)) * 1000;
        expect(worstProp).toBeLessThanOrEqual(eLim * (1 + 1e-12));
      }),
      { numRuns: 300 },
    );
  });

  it("connector.*: a zero temperature difference across a connector adds none (law of intermediate metals)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom<ThermocoupleType>("K", "J", "E", "N", "T", "R", "S"),
        fc.constantFrom<ContactMetal>("copper", "platinum", { name: "brass", seebeckVsPlatinumMicrovoltsPerC: 3 }),
        fc.double({ min: 0, max: 60, noNaN: true }),
        (type, metal, tcj) => {
          const inline: ConnectorElement = { kind: "connector", arrangement: "inline", contactMetal: metal, temperatureC: { minC: 0, maxC: 90 }, positiveLegDifferenceC: 0, negativeLegDifferenceC: 0 };
          const a = _connectorStage(inline, type, { minC: 0, maxC: 60 }, ctx, "p");
          expect(a.sources).toEqual([]);
          expect(Math.abs(a.emfErrorMillivolts({}, tcj))).toBe(0);
          const term: ConnectorElement = { kind: "connector", arrangement: "terminates", contactMetal: metal, aboveColdJunctionC: { minC: 0, maxC: 0 } };
          expect(Math.abs(_connectorStage(term, type, { minC: 0, maxC: 60 }, ctx, "p").emfErrorMillivolts({}, tcj))).toBe(0);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("loop.*: the loop-resistance offset flips sign with the detection current's direction", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        (nA, ohms, tol, u) => {
          const base = { kind: "loopResistance", thermocoupleOhms: ohms, detectionCurrentNanoamps: nA, detectionCurrentToleranceFraction: tol } as const;
          const up = _loopStage({ ...base, detectionDirection: "pullUp" }, "K", ctx, "p");
          const down = _loopStage({ ...base, detectionDirection: "pullDown" }, "K", ctx, "p");
          const lim = up.sources[0]?.limit ?? 0;
          const xUp = lim > 0 ? { "loop.detectionOffset": u * lim } : {};
          const xDown = lim > 0 ? { "loop.detectionOffset": -u * lim } : {};
          // === (not Object.is): a zero offset may come out as −0 on one side.
          expect(down.offsetMillivolts(xDown) === -up.offsetMillivolts(xUp)).toBe(true);
          if (up.nominalDetectionMicrovolts > 0) expect(down.nominalDetectionMicrovolts).toBeLessThan(0);
          expect(up.nominalDetectionMicrovolts).toBeGreaterThanOrEqual(0);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("widening any wire source never narrows its limit (cable, connector, loop, leakage, ageing)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        fc.double({ min: 1, max: 1e9, noNaN: true }),
        fc.double({ min: 0, max: 1e4, noNaN: true }),
        (a, extra, shunt, ohms) => {
          const b = a + extra;
          const cable = (tol: number, env: boolean) =>
            _extensionCableStage(
              { kind: "extensionCable", grade: "extension", tolerance: { standard: "custom", toleranceC: tol, minC: 0, maxC: 200 }, runTemperatureC: { minC: 0, maxC: 200 }, junctionTemperatureC: { minC: 150, maxC: 150 }, mismatch: env ? "envelope" : "proportional" },
              "K",
              { minC: 20, maxC: 40 },
              ctx,
              "p",
            ).sources.find((s) => s.name === "cable.tolerance");
          for (const env of [false, true]) expect(contains(support(cable(b, env)), support(cable(a, env)))).toBe(true);
          const conn = (d: number) =>
            _connectorStage({ kind: "connector", arrangement: "inline", contactMetal: "copper", temperatureC: { minC: 20, maxC: 40 }, positiveLegDifferenceC: d, negativeLegDifferenceC: d }, "K", { minC: 20, maxC: 40 }, ctx, "p").sources[0];
          expect(contains(support(conn(b)), support(conn(a)))).toBe(true);
          const block = (d: number) =>
            _connectorStage({ kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: -d, maxC: d } }, "K", { minC: 20, maxC: 40 }, ctx, "p").sources[0];
          expect(contains(support(block(b)), support(block(a)))).toBe(true);
          const loop = (nA: number, r: number) => _loopStage({ kind: "loopResistance", thermocoupleOhms: r, biasCurrentNanoamps: nA }, "K", ctx, "p").sources[0];
          expect(contains(support(loop(b, ohms)), support(loop(a, ohms)))).toBe(true);
          expect(contains(support(loop(a, ohms + extra)), support(loop(a, ohms)))).toBe(true);
          const leak = (s: number, r: number) => _leakageStage({ kind: "insulationLeakage", minimumShuntOhms: s, loopOhms: r }, ctx, "p").sources[0];
          expect(contains(support(leak(shunt / (1 + extra), ohms)), support(leak(shunt, ohms)))).toBe(true);
          expect(contains(support(leak(shunt, ohms + extra)), support(leak(shunt, ohms)))).toBe(true);
          for (const direction of ["up", "down", "symmetric"] as const) {
            const age = (d: number) => _ageingStage({ kind: "ageing", totalDriftC: d, statedAtC: 1000, serviceHours: 1000, direction }, ctx, "p").sourcesAt(500)[0];
            expect(contains(support(age(b)), support(age(a)))).toBe(true);
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});
