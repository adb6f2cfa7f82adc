/**
 * The worst-case bracket of the reading model (src/chain/_readingEnclosure.ts): the attained extremes and the
 * interval enclosure meet (gap ≤ the stated 1e-9 °C) for every example ADC design, the lehr test design with a wire
 * (tests/fixtures/lehr-adc-wire.json) and over many generated ADC chains, with and without a wire, and comparator
 * chains; the enclosure holds every sampled model value and every corner over the whole box and over random
 * sub-boxes (the boxes the branch and bound asks about); an injected wrong enclosure is refused. Properties over many
 * inputs (fast-check); the bracket argument is the module note of src/chain/_readingEnclosure.ts (common practice,
 * no source).
 */
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateChain } from "../../src/chain/evaluateChain.js";
import { chainReadingModel } from "../../src/chain/readingFromChain.js";
import type { ChainModel } from "../../src/chain/types.js";
import { _tripReportOfDesign } from "../../src/cli/commands/check.js";
import { measurementChainFromDesign, parseDesign } from "../../src/design/index.js";
import { formatTripReport } from "../../src/report/index.js";
import { propagate } from "../../src/uncertainty/index.js";
import { chainArb } from "../trip/_chainArbitrary.js";
import { adcChainArb, adcChainNearTopArb, adcWireChainArb, adcWireChainNearTopArb } from "./_adcChainArbitrary.js";

const tolerance = 1e-9;
const examplesDir = join(import.meta.dirname, "../../examples");
const lehrFile = join(import.meta.dirname, "../fixtures/lehr-adc-wire.json");
const quietIo = { writeOut: () => undefined, writeErr: () => undefined, stderrIsTty: false, cwd: "." };

type Box = Record<string, [number, number]>;

function boxOf(m: ChainModel): Box {
  const box: Box = {};
  for (const [name, d] of Object.entries(m.inputs)) {
    const h = d.halfWidth ?? 3 * d.standardUncertainty;
    box[name] = [d.mean - h, d.mean + h];
  }
  return box;
}

/** A small seeded generator (LCG, Knuth's constants as in the trip bracket test). */
function uniforms(seed: number): () => number {
  let state = seed >>> 0;
  return () => (state = (Math.imul(state, 1103515245) + 12345) >>> 0) / 2 ** 32;
}

/** Points of a box, a fifth of the coordinates at either end. */
function samplePoint(box: Box, next: () => number): Record<string, number> {
  const x: Record<string, number> = {};
  for (const [name, [a, b]] of Object.entries(box)) {
    const u = next();
    x[name] = u < 0.2 ? a : u > 0.8 ? b : a + (b - a) * next();
  }
  return x;
}

/** Model of a chain at a temperature, or undefined where the draw leaves the type's range or the ADC's. */
function readingModel(chain: Parameters<typeof chainReadingModel>[0], t: number): ChainModel | undefined {
  try {
    return chainReadingModel(chain, t);
  } catch {
    return undefined;
  }
}

/** The largest gap seen by `checkBracket` (for the closing figures). */
const gaps = { max: 0 };

function checkBracket(m: ChainModel, seed: number, gapTolerance = tolerance): void {
  expect(m.enclosure).toBeDefined();
  const w = propagate(m.model, m.inputs, { method: "worst-case", modelEnclosure: m.enclosure, normalBoundCoverage: 0.9973 });
  const [lo, hi] = w.enclosure as readonly [number, number];
  expect(lo).toBeLessThanOrEqual(w.interval[0]);
  expect(hi).toBeGreaterThanOrEqual(w.interval[1]);
  const [gapLow, gapHigh] = w.enclosureGap as readonly [number, number];
  expect(gapLow).toBeGreaterThanOrEqual(0);
  expect(gapHigh).toBeGreaterThanOrEqual(0);
  // The stated tolerance itself (not widened by the branch and bound's own stopping rule).
  expect(gapLow).toBeLessThanOrEqual(gapTolerance);
  expect(gapHigh).toBeLessThanOrEqual(gapTolerance);
  gaps.max = Math.max(gaps.max, gapLow, gapHigh);
  // The attained extremes are model values at their points.
  expect(m.model(w.attained?.low.at as never)).toBe(w.attained?.low.value);
  expect(m.model(w.attained?.high.at as never)).toBe(w.attained?.high.value);
  const box = boxOf(m);
  const next = uniforms(seed);
  for (let k = 0; k < 150; k++) {
    const v = m.model(samplePoint(box, next));
    expect(v).toBeGreaterThanOrEqual(lo);
    expect(v).toBeLessThanOrEqual(hi);
  }
  // Corners: every one up to 2¹⁰, else 1,024 drawn at random.
  const names = Object.keys(box);
  const count = names.length <= 10 ? 2 ** names.length : 1024;
  for (let c = 0; c < count; c++) {
    const x: Record<string, number> = {};
    names.forEach((name, i) => {
      const [a, b] = box[name] as [number, number];
      x[name] = (names.length <= 10 ? (c >> i) & 1 : next() < 0.5 ? 0 : 1) === 1 ? b : a;
    });
    const v = m.model(x);
    expect(v).toBeGreaterThanOrEqual(lo);
    expect(v).toBeLessThanOrEqual(hi);
  }
  // Random sub-boxes: the enclosure of each holds the model's values in it.
  const enclose = m.enclosure as NonNullable<ChainModel["enclosure"]>;
  for (let k = 0; k < 6; k++) {
    const sub: Box = {};
    for (const [name, [a, b]] of Object.entries(box)) {
      const u = a + (b - a) * next();
      const v = a + (b - a) * next();
      sub[name] = next() < 0.3 ? [u, u] : [Math.min(u, v), Math.max(u, v)];
    }
    const [sl, sh] = enclose(sub);
    for (let j = 0; j < 30; j++) {
      const value = m.model(samplePoint(sub, next));
      expect(value).toBeGreaterThanOrEqual(sl);
      expect(value).toBeLessThanOrEqual(sh);
    }
  }
}

describe("reading bracket of the example ADC designs", () => {
  const files = readdirSync(examplesDir).filter((f) => f.endsWith(".json"));
  it.each(files)("%s: every ADC setpoint's bracket closes within the stated tolerance, and the check report prints it", (file) => {
    const design = parseDesign(readFileSync(join(examplesDir, file), "utf8"));
    if ((design as { comparator?: unknown }).comparator !== undefined) return; // comparator designs: tests/trip/worstCaseEnclosure.test.ts
    const report = _tripReportOfDesign(quietIo, design, { acceptanceMethod: "worst-case", coverage: 0.95, trials: 200, seed: 1 });
    const chain = measurementChainFromDesign(design);
    for (const [i, s] of report.setpoints.entries()) {
      const w = s.bands.find((b) => b.method === "worst-case");
      expect(w?.enclosureLowC, s.name).toBeDefined();
      expect(w?.enclosureLowC as number).toBeLessThanOrEqual(w?.lowC as number);
      expect(w?.enclosureHighC as number).toBeGreaterThanOrEqual(w?.highC as number);
      expect(w?.enclosureGapLowC as number).toBeLessThanOrEqual(tolerance);
      expect(w?.enclosureGapHighC as number).toBeLessThanOrEqual(tolerance);
      expect(w?.enclosureGapToleranceC).toBe(tolerance);
      // The chain's own bracket at the setpoint (the band is setpoint − error: the sides swap).
      const e = evaluateChain(chain, design.setpoints[i]?.tripTemperatureC as number, { methods: ["worst-case"] });
      const b = e.bounds[0];
      expect(b?.enclosureGapLowC).toBe(w?.enclosureGapHighC);
      expect(b?.enclosureGapHighC).toBe(w?.enclosureGapLowC);
      expect(b?.enclosureGapLowC).toBe((b?.lowC as number) - (b?.enclosureLowC as number));
      expect(b?.enclosureGapHighC).toBe((b?.enclosureHighC as number) - (b?.highC as number));
    }
    const text = formatTripReport(report, "text");
    expect(text).toMatch(/Worst case at ".+": attained .+ enclosure .+ gap .+ °C \(stated tolerance 1e-9 °C\)/);
    const json = JSON.parse(formatTripReport(report, "json")) as { setpoints: { bands: { method: string; enclosureGapHighC?: number }[] }[] };
    expect(json.setpoints[0]?.bands.find((b) => b.method === "worst-case")?.enclosureGapHighC).toBeTypeOf("number");
  });

  it("heated-enclosure-adc.json: the bracket closes over the working range too (0 … 150 °C)", () => {
    const chain = measurementChainFromDesign(parseDesign(readFileSync(join(examplesDir, "heated-enclosure-adc.json"), "utf8")));
    for (const t of [0, 20, 45, 90, 150]) checkBracket(chainReadingModel(chain, t), t + 1);
  });
});

/** A generated property: the bracket of each drawn chain's reading model; returns how many were checked. */
function checkGenerated(arb: typeof adcChainArb, numRuns: number, seed: number): number {
  let checked = 0;
  fc.assert(
    fc.property(arb, fc.integer({ min: 1, max: 2 ** 31 }), ({ chain, hotJunctionC }, pointSeed) => {
      const m = readingModel(chain, hotJunctionC);
      if (m === undefined || Object.keys(m.inputs).length === 0) return;
      try {
        checkBracket(m, pointSeed);
      } catch (error) {
        // A draw whose box reaches EMFs outside the type's range: the model itself refuses those points.
        if ((error as { code?: string }).code === "OUT_OF_RANGE") return;
        throw error;
      }
      checked++;
    }),
    { numRuns, seed },
  );
  return checked;
}

describe("reading bracket of generated chains", () => {
  it("ADC chains: attained ≤ enclosure, the gap within the stated 1e-9 °C (up to 900 °C), every sampled value and corner inside", () => {
    expect(checkGenerated(adcChainArb, 60, 29)).toBeGreaterThan(45);
  });

  it("ADC chains with a wire (cable, connectors, loop, leakage, ageing): the same bracket, within the stated 1e-9 °C", () => {
    expect(checkGenerated(adcWireChainArb, 60, 37)).toBeGreaterThan(45);
  });

  it("near the top of each type's range (K and N to 900 °C, R and S to 1600 °C), with and without a wire: within the stated 1e-9 °C", () => {
    expect(checkGenerated(adcChainNearTopArb, 40, 41)).toBeGreaterThan(30);
    expect(checkGenerated(adcWireChainNearTopArb, 40, 43)).toBeGreaterThan(30);
  });

  it("comparator chains, with and without a wire: the reading at the detector input has its bracket too", () => {
    let checked = 0;
    fc.assert(
      fc.property(chainArb, fc.double({ min: 0, max: 400, noNaN: true }), fc.integer({ min: 1, max: 2 ** 31 }), (chain, t, seed) => {
        const m = readingModel(chain, t);
        if (m === undefined || Object.keys(m.inputs).length === 0) return;
        try {
          checkBracket(m, seed);
        } catch (error) {
          // A draw whose box reaches EMFs outside the type's range: the model itself refuses those points.
          if ((error as { code?: string }).code === "OUT_OF_RANGE") return;
          throw error;
        }
        checked++;
      }),
      { numRuns: 60, seed: 31 },
    );
    expect(checked).toBeGreaterThan(5);
  });
});

describe("a wrong enclosure is caught", () => {
  const chain = measurementChainFromDesign(parseDesign(readFileSync(join(examplesDir, "heated-enclosure-adc.json"), "utf8")));
  const m = chainReadingModel(chain, 90);
  const enclose = m.enclosure as NonNullable<ChainModel["enclosure"]>;

  it.each([
    ["high end 1e-6 °C short", (r: readonly [number, number]) => [r[0], r[1] - 1e-6] as const, /does not contain the attained maximum/],
    ["low end 1e-6 °C short", (r: readonly [number, number]) => [r[0] + 1e-6, r[1]] as const, /does not contain the attained minimum/],
    ["ends swapped", (r: readonly [number, number]) => [r[1], r[0]] as const, /low ≤ high/],
  ])("%s: propagate refuses it, naming the quantity", (_name, spoil, message) => {
    expect(() => propagate(m.model, m.inputs, { method: "worst-case", modelEnclosure: (box) => spoil(enclose(box)) })).toThrow(message);
  });

  it("the reading model is not changed by its enclosure: same band with and without it", () => {
    const with_ = propagate(m.model, m.inputs, { method: "worst-case", modelEnclosure: enclose });
    const without = propagate(m.model, m.inputs, { method: "worst-case" });
    expect(Math.abs(with_.interval[0] - without.interval[0])).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(with_.interval[1] - without.interval[1])).toBeLessThanOrEqual(tolerance);
    expect(without.enclosure).toBeUndefined();
  });
});

describe("chains with a wire", () => {
  it("heat-treat-furnace-wire.json: the reading has its bracket (300 … 900 °C)", () => {
    const chain = measurementChainFromDesign(parseDesign(readFileSync(join(examplesDir, "heat-treat-furnace-wire.json"), "utf8")));
    for (const t of [300, 600, 860, 900]) checkBracket(chainReadingModel(chain, t), t);
    const b = evaluateChain(chain, 600, { methods: ["worst-case"] }).bounds[0];
    expect(b?.enclosureGapLowC as number).toBeLessThanOrEqual(tolerance);
    expect(b?.note).toMatch(/enclosure \[/);
  });

  it("lehr-adc-wire.json (ADC, software compensation, proportional cable, terminal block, loop, leakage, ageing): check prints the bracket", () => {
    const design = parseDesign(readFileSync(lehrFile, "utf8"));
    const report = _tripReportOfDesign(quietIo, design, { acceptanceMethod: "worst-case", coverage: 0.95, trials: 200, seed: 1 });
    const w = report.setpoints[0]?.bands.find((b) => b.method === "worst-case");
    expect(w?.enclosureLowC as number).toBeLessThanOrEqual(w?.lowC as number);
    expect(w?.enclosureHighC as number).toBeGreaterThanOrEqual(w?.highC as number);
    expect(w?.enclosureGapLowC as number).toBeLessThanOrEqual(tolerance);
    expect(w?.enclosureGapHighC as number).toBeLessThanOrEqual(tolerance);
    const text = formatTripReport(report, "text");
    expect(text).toMatch(/Worst case at "annealing zone limit": attained .+ enclosure .+ gap .+ °C \(stated tolerance 1e-9 °C\)/);
    const chain = measurementChainFromDesign(design);
    for (const t of [400, 500, 560, 580, 600]) checkBracket(chainReadingModel(chain, t), t);
  });
});
