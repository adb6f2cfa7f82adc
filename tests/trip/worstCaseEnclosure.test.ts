/**
 * The worst-case bracket of the chain models: the attained extremes and the interval enclosure meet (gap ≤ the
 * stated 1e-9 °C) for every example design and setpoint and over many generated comparator chains; the
 * enclosure holds every sampled model value; a non-monotone chain (hardware compensation slope crossing the
 * Seebeck coefficient inside the ambient range) has its extreme inside the box and still closes; a toy model
 * the extension cannot close keeps a positive, correct gap. Properties over many inputs (fast-check) and the
 * exact extremes of a toy function (calculus, common practice, no source).
 */
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parseDesign, tripDesignFromDesign } from "../../src/design/index.js";
import { designTrip } from "../../src/trip/designTrip.js";
import { tripTemperatureModel } from "../../src/chain/tripTemperatureModel.js";
import type { MeasurementChain } from "../../src/chain/types.js";
import { chainArb, interiorExtremeChain } from "./_chainArbitrary.js";
import { propagate, rectangular } from "../../src/uncertainty/index.js";
import { formatTripReport, tripReportFromResult } from "../../src/report/index.js";

const tolerance = 1e-9;
const examplesDir = join(import.meta.dirname, "../../examples");

function boxOf(inputs: Readonly<Record<string, { mean: number; halfWidth?: number }>>): Record<string, [number, number]> {
  const box: Record<string, [number, number]> = {};
  for (const [name, d] of Object.entries(inputs)) box[name] = [d.mean - (d.halfWidth ?? 0), d.mean + (d.halfWidth ?? 0)];
  return box;
}

describe("worst-case bracket of the example designs", () => {
  const files = readdirSync(examplesDir).filter((f) => f.endsWith(".json"));
  it.each(files)("%s: every comparator setpoint's bracket closes within the stated tolerance, and the report prints it", (file) => {
    const design = parseDesign(readFileSync(join(examplesDir, file), "utf8"));
    if ((design as { comparator?: unknown }).comparator === undefined) return; // ADC designs have no comparator trip model
    const result = designTrip(tripDesignFromDesign(design), { monteCarloTrials: 200 });
    for (const sp of result.setpoints) {
      const w = sp.worstCase;
      expect(w.enclosureLowC, sp.name).toBeDefined();
      expect(w.enclosureLowC as number).toBeLessThanOrEqual(w.lowC);
      expect(w.enclosureHighC as number).toBeGreaterThanOrEqual(w.highC);
      expect(w.enclosureGapLowC).toBe(w.lowC - (w.enclosureLowC as number));
      expect(w.enclosureGapHighC).toBe((w.enclosureHighC as number) - w.highC);
      expect(w.enclosureGapLowC as number).toBeLessThanOrEqual(tolerance);
      expect(w.enclosureGapHighC as number).toBeLessThanOrEqual(tolerance);
      expect(w.enclosureGapToleranceC).toBe(tolerance);
    }
    const report = tripReportFromResult(result, { methods: ["worst-case", "rss", "monte-carlo"], acceptanceMethod: "worst-case", coverage: 0.95, trials: 200, seed: 1 });
    const text = formatTripReport(report, "text");
    expect(text).toMatch(/Worst case at ".+": attained .+ enclosure .+ gap .+ °C \(stated tolerance 1e-9 °C\)/);
    const json = JSON.parse(formatTripReport(report, "json")) as { setpoints: { bands: { method: string; enclosureGapHighC?: number }[] }[] };
    expect(json.setpoints[0]?.bands.find((b) => b.method === "worst-case")?.enclosureGapHighC).toBeTypeOf("number");
  });
});

describe("worst-case bracket of generated comparator chains", () => {
  it("attained ≤ enclosure on both sides, the gap within the stated tolerance, and every sampled value inside", () => {
    let checked = 0;
    fc.assert(
      fc.property(chainArb, fc.integer({ min: 1, max: 2 ** 31 }), (chain, seed) => {
        let m: ReturnType<typeof tripTemperatureModel>;
        try {
          m = tripTemperatureModel(chain, 0);
        } catch {
          return; // a threshold outside the type's range for this draw: no model to bound
        }
        expect(m.enclosure).toBeDefined();
        if (Object.keys(m.inputs).length === 0) return;
        const w = propagate(m.model, m.inputs, { method: "worst-case", modelEnclosure: m.enclosure });
        const [lo, hi] = w.enclosure as readonly [number, number];
        expect(lo).toBeLessThanOrEqual(w.interval[0]);
        expect(hi).toBeGreaterThanOrEqual(w.interval[1]);
        const [gapLow, gapHigh] = w.enclosureGap as readonly [number, number];
        expect(gapLow).toBeLessThanOrEqual(tolerance);
        expect(gapHigh).toBeLessThanOrEqual(tolerance);
        // Random points of the box (and its corners' neighbourhood) stay inside the enclosure.
        const box = boxOf(m.inputs as never);
        let state = seed;
        const next = () => ((state = (Math.imul(state, 1103515245) + 12345) >>> 0) / 2 ** 32);
        for (let k = 0; k < 200; k++) {
          const x: Record<string, number> = {};
          for (const [name, [a, b]] of Object.entries(box)) {
            const u = next();
            x[name] = u < 0.2 ? a : u > 0.8 ? b : a + (b - a) * next();
          }
          const v = m.model(x);
          expect(v).toBeGreaterThanOrEqual(lo);
          expect(v).toBeLessThanOrEqual(hi);
        }
        checked++;
      }),
      { numRuns: 60, seed: 13 },
    );
    expect(checked).toBeGreaterThan(40);
  });

  it("a non-monotone chain: the extreme lies inside the cold-junction range and the bracket still closes", () => {
    // Hardware compensation at 40.6 µV/°C on type K over 0 … 60 °C: S(t) − α changes sign inside (S_K(0 °C) =
    // 39.45 µV/°C, S_K(60 °C) = 41.4 µV/°C, NIST SRD 60 type K table slopes), so t(t_cj) has an interior extreme.
    const chain = interiorExtremeChain;
    const m = tripTemperatureModel(chain, 0);
    const w = propagate(m.model, m.inputs, { method: "worst-case", modelEnclosure: m.enclosure });
    const tcAt = [w.attained?.low.at["ambient.coldJunctionC"], w.attained?.high.at["ambient.coldJunctionC"]] as number[];
    expect(tcAt.some((t) => t > 0.5 && t < 59.5)).toBe(true);
    const [gapLow, gapHigh] = w.enclosureGap as readonly [number, number];
    expect(gapLow).toBeGreaterThanOrEqual(0);
    expect(gapHigh).toBeGreaterThanOrEqual(0);
    expect(Math.max(gapLow, gapHigh)).toBeLessThanOrEqual(tolerance);
    // On the side whose extreme is interior, moving the cold junction to either end of its range loses more
    // than the gap: the corners alone would not find it.
    for (const side of ["low", "high"] as const) {
      const at = w.attained?.[side].at as Record<string, number>;
      const t = at["ambient.coldJunctionC"] as number;
      if (!(t > 0.5 && t < 59.5)) continue;
      for (const end of [0, 60]) {
        const v = m.model({ ...at, "ambient.coldJunctionC": end });
        if (side === "high") expect(v).toBeLessThan((w.attained?.high.value as number) - 10 * tolerance);
        else expect(v).toBeGreaterThan((w.attained?.low.value as number) + 10 * tolerance);
      }
    }
  });
});

describe("the turn of a non-monotone chain anywhere in the cold-junction range", () => {
  // Where A″ has one sign over a piece (here E″_K > 0 near room temperature), the enclosure finds the turn of A
  // on point slopes and proves the two sides monotone (chain/_coldJunctionRange.ts, `oneTurn`). Swept: the
  // compensation slope moves the turn across the range (S_K rises from 39.45 µV/°C at 0 °C to 41.4 µV/°C at
  // 60 °C, NIST SRD 60 type K table slopes), across type K's seam at 0 °C, with and without a connector term.
  it("the bracket closes within the stated tolerance and a dense scan of the cold junction stays inside", () => {
    let interior = 0;
    for (const ambient of [{ minC: 0, maxC: 60 }, { minC: -10, maxC: 30 }]) {
      for (let alpha = 38.9; alpha <= 41.5; alpha += 0.2) {
        for (const connector of [false, true]) {
          const chain = {
            ...interiorExtremeChain,
            coldJunction: { ...(interiorExtremeChain as unknown as { coldJunction: object }).coldJunction, compensationMicrovoltsPerC: alpha },
            ambient,
            ...(connector ? { wire: { connectors: [{ kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: 0, maxC: 3 } }] } } : {}),
          } as unknown as MeasurementChain;
          const m = tripTemperatureModel(chain, 0);
          const w = propagate(m.model, m.inputs, { method: "worst-case", modelEnclosure: m.enclosure });
          const [lo, hi] = w.enclosure as readonly [number, number];
          const [gapLow, gapHigh] = w.enclosureGap as readonly [number, number];
          expect(Math.min(gapLow, gapHigh)).toBeGreaterThanOrEqual(0);
          expect(Math.max(gapLow, gapHigh)).toBeLessThanOrEqual(tolerance);
          for (const side of ["low", "high"] as const) {
            const at = w.attained?.[side].at as Record<string, number>;
            const t = at["ambient.coldJunctionC"] as number;
            if (t > ambient.minC && t < ambient.maxC) interior++;
            for (let k = 0; k <= 1000; k++) {
              const v = m.model({ ...at, "ambient.coldJunctionC": ambient.minC + ((ambient.maxC - ambient.minC) * k) / 1000 });
              expect(v).toBeGreaterThanOrEqual(lo);
              expect(v).toBeLessThanOrEqual(hi);
            }
          }
        }
      }
    }
    expect(interior).toBeGreaterThan(10);
  });
});

describe("a toy model the extension cannot close", () => {
  it("keeps a positive gap that still brackets the exact extreme (x − x² on [0, 1]: max 1/4 at 1/2, calculus)", () => {
    const f = ({ x }: { x: number }) => x - x * x;
    // Natural interval extension with x used twice: overestimates on every box that is not a point.
    const extension = (box: Readonly<Record<"x", readonly [number, number]>>): readonly [number, number] => {
      const [a, b] = box.x;
      const sq = [a * a, b * b];
      return [a - Math.max(...sq) - 1e-15, b - Math.min(...sq) + 1e-15];
    };
    const w = propagate(f, { x: rectangular({ lower: 0, upper: 1 }) }, { method: "worst-case", modelEnclosure: extension });
    const [, gapHigh] = w.enclosureGap as readonly [number, number];
    expect(gapHigh).toBeGreaterThan(0);
    expect(w.interval[1]).toBeLessThanOrEqual(0.25);
    expect((w.enclosure as readonly [number, number])[1]).toBeGreaterThanOrEqual(0.25);
  });

  it("boxes dropped within the tolerance still count: the enclosure never shrinks to the attained value (regression)", () => {
    // f(x) = x on [0, 1] with a true extension that is 1e-13 loose: the enclosure must keep 1 + 1e-13.
    const w = propagate(({ x }: { x: number }) => x, { x: rectangular({ lower: 0, upper: 1 }) }, {
      method: "worst-case",
      modelEnclosure: (box) => [box.x[0] - 1e-13, box.x[1] + 1e-13],
    });
    expect((w.enclosure as readonly [number, number])[1]).toBe(1 + 1e-13);
    expect((w.enclosure as readonly [number, number])[0]).toBe(-1e-13);
  });
});
