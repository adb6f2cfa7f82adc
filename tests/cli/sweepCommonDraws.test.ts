/**
 * A sweep draws the same random numbers at every temperature (common random numbers): every point runs the
 * seeded Monte Carlo with the same seed, every block of trials draws from the same jump-ahead stream, and each
 * input is sampled by the same transform of the same uniforms (JCGM 101 6.4: mean + a·(2r − 1), mean + u·z …),
 * so neighbouring points differ by the model's change, not by sampling noise. Property over 40 steps of two
 * example designs (an ADC enclosure and a comparator oven), with a yardstick: the same points drawn with a
 * different seed each (independent draws) scatter far more. Bounds are common practice, no source: the band
 * edges of a smooth chain move by a small fraction of the band width per 0.5 °C.
 */
import { describe, expect, it } from "vitest";
import { run } from "./helpers.js";

interface SweepJson {
  readonly rows: readonly { readonly temperatureC: number; readonly bands: readonly { readonly method: string; readonly errorLowC: number; readonly errorHighC: number }[] }[];
}

async function monteCarloEdges(design: string, from: number, seed: (i: number) => number, count: number): Promise<[number, number][]> {
  const edges: [number, number][] = [];
  // One sweep with one seed (common draws), or one single-point sweep per temperature with its own seed.
  const points = seed(0) === seed(1) ? [{ from, to: from + (count - 1) * 0.5, seed: seed(0) }] : Array.from({ length: count }, (_, i) => ({ from: from + i * 0.5, to: from + i * 0.5, seed: seed(i) }));
  for (const p of points) {
    const result = await run(["sweep", design, "--from", String(p.from), "--to", String(p.to), "--step", "0.5", "--trials", "2000", "--seed", String(p.seed), "--json"]);
    expect(result.code, result.stderr).toBe(0);
    for (const row of (JSON.parse(result.stdout) as SweepJson).rows) {
      const band = row.bands.find((b) => b.method === "monte-carlo");
      if (band === undefined) throw new Error("the sweep has no Monte Carlo band");
      edges.push([band.errorLowC, band.errorHighC]);
    }
  }
  return edges;
}

function largestStepShare(edges: readonly [number, number][]): number {
  let largest = 0;
  for (let i = 1; i < edges.length; i++) {
    const [low, high] = edges[i] as [number, number];
    const [lowBefore, highBefore] = edges[i - 1] as [number, number];
    const width = high - low;
    largest = Math.max(largest, Math.abs(low - lowBefore) / width, Math.abs(high - highBefore) / width);
  }
  return largest;
}

describe("sweep: common random numbers at every temperature", () => {
  for (const [design, from] of [
    ["examples/heated-enclosure-adc.json", 60],
    ["examples/reflow-oven-trip.json", 230],
  ] as const) {
    it(`${design}: Monte Carlo band edges move by under 1 % of the band width per 0.5 °C step (independent draws: over 2 %)`, async () => {
      const count = 21;
      const common = await monteCarloEdges(design, from, () => 7, count);
      const independent = await monteCarloEdges(design, from, (i) => 7 + i, count);
      expect(common).toHaveLength(count);
      expect(independent).toHaveLength(count);
      expect(largestStepShare(common)).toBeLessThan(0.01);
      expect(largestStepShare(independent)).toBeGreaterThan(0.02);
    }, 300_000);
  }
});
