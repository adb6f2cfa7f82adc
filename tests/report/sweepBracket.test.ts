/**
 * The sweep report carries the worst case's bracket at every point, as `check` does for a setpoint: attained
 * (errorLowC/errorHighC), enclosure (enclosureErrorLowC/HighC) and the gaps; the summary gives the largest gap and
 * where. Properties over the ADC example's range and a comparator example: the enclosure contains the attained
 * extremes, every gap is ≥ 0 and within the 1e-9 °C we state for chain models (tests/chain/readingEnclosure.test.ts
 * holds the enclosure), the summary is the rows' maximum, and text, Markdown and CSV print what the JSON holds.
 * A chain with a wire (the furnace) has its bracket too (chain/_wireEnclosure.ts).
 */
import { describe, expect, it } from "vitest";
import { _reportSchema } from "../../src/report/_reportSchema.js";
import { run } from "../cli/helpers.js";

interface Band {
  method: string;
  errorLowC: number;
  errorHighC: number;
  enclosureErrorLowC?: number;
  enclosureErrorHighC?: number;
  enclosureGapLowC?: number;
  enclosureGapHighC?: number;
}
interface Sweep {
  rows: { temperatureC: number; bands: Band[] }[];
  worstCaseBracket?: { points: number; enclosedPoints: number; largestGapC: number; largestGapAtC: number; gapToleranceC: number };
}

async function sweep(design: string, from: number, to: number, step: number, format: string): Promise<string> {
  const out = await run(["sweep", design, "--from", String(from), "--to", String(to), "--step", String(step), "--trials", "200", ...(format === "text" ? [] : [`--${format}`])]);
  expect(out.code, out.stderr).toBe(0);
  return out.stdout;
}

describe("sweep: the worst case's bracket", () => {
  for (const [design, from, to, step] of [
    ["examples/heated-enclosure-adc.json", -30, 340, 10],
    ["examples/reflow-oven-trip.json", 150, 300, 5],
    // a chain with a wire (cable, connector, loop, leakage, ageing): the reading enclosure covers it too
    ["examples/heat-treat-furnace-wire.json", 700, 900, 100],
  ] as const) {
    it(`${design}: attained, enclosure and gap at every point, gap within 1e-9 °C, summary = largest gap`, async () => {
      const text = await sweep(design, from, to, step, "json");
      const json = JSON.parse(text) as Sweep;
      expect(_reportSchema.safeParse(JSON.parse(text)).success).toBe(true);
      let largest = -1;
      let at = Number.NaN;
      for (const row of json.rows) {
        const w = row.bands.find((b) => b.method === "worst-case") as Band;
        const { enclosureErrorLowC: lo, enclosureErrorHighC: hi, enclosureGapLowC: gl, enclosureGapHighC: gh } = w;
        for (const v of [lo, hi, gl, gh]) expect(typeof v).toBe("number");
        expect(lo as number).toBeLessThanOrEqual(w.errorLowC);
        expect(hi as number).toBeGreaterThanOrEqual(w.errorHighC);
        for (const g of [gl as number, gh as number]) {
          expect(g).toBeGreaterThanOrEqual(0);
          expect(g).toBeLessThanOrEqual(1e-9);
        }
        // the gaps are those of the result (attained − enclosure), to the rounding of subtracting the true temperature
        expect(Math.abs((gl as number) - (w.errorLowC - (lo as number)))).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(row.temperatureC)));
        for (const b of row.bands.filter((b) => b.method !== "worst-case")) expect(b.enclosureGapLowC).toBeUndefined();
        const g = Math.max(gl as number, gh as number);
        if (g > largest) [largest, at] = [g, row.temperatureC];
      }
      expect(json.worstCaseBracket).toEqual({ points: json.rows.length, enclosedPoints: json.rows.length, largestGapC: largest, largestGapAtC: at, gapToleranceC: 1e-9 });
      const line = `at ${json.rows.length} of ${json.rows.length} points, largest gap ${largest === 0 ? "0" : largest.toExponential(1)} °C at ${at.toFixed(1)} °C (stated tolerance 1e-9 °C).`;
      expect(await sweep(design, from, to, step, "markdown")).toContain(line);
      const csv = await sweep(design, from, to, step, "csv");
      expect(csv).toContain(`# Worst case over the sweep: attained`);
      expect(csv).toContain("error_high_C,enclosure_error_low_C,enclosure_error_high_C,gap_low_C,gap_high_C\n");
      const first = json.rows[0]?.bands[0] as Band;
      expect(csv).toContain(`,worst-case,${first.errorLowC},${first.errorHighC},${first.enclosureErrorLowC},${first.enclosureErrorHighC},${first.enclosureGapLowC},${first.enclosureGapHighC}\n`);
    }, 120_000);
  }
});
