/**
 * The sweep's points on worker threads give the same rows, bit for bit, for 1, 2 and 4 workers, and each row is
 * the one `evaluateChain` gives at that temperature alone (the Monte Carlo band with the same seed, so the seed in
 * the report reproduces every point). Properties over two example designs (an ADC chain whose thermocouple
 * tolerance widens inside the sweep, and a comparator chain); the library's own per-point path is the reference.
 * The reading model split for common draws (the parts that do not depend on the temperature once per trial) gives
 * the plain model's bits for every example chain without a wire, over points across the source box.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { evaluateChain } from "../../src/chain/evaluateChain.js";
import { _compileChain, _indicatedC, _indicatedCFromParts, _indicatedParts } from "../../src/chain/_compileChain.js";
import { _readingModel } from "../../src/chain/readingFromChain.js";
import { readdirSync } from "node:fs";
import { sweepChainOfDesign } from "../../src/cli/commands/sweep.js";
import { _sweepRowsOnWorkers } from "../../src/cli/_sweepWorkers.js";
import type { DesignFile } from "../../src/design/designSchema.js";
import { projectRoot, run } from "./helpers.js";

const options = { methods: ["worst-case", "rss", "monte-carlo"] as const, coverage: 0.95, trials: 3_000, seed: 17 };

function design(file: string): DesignFile {
  return JSON.parse(readFileSync(join(projectRoot, "examples", file), "utf8")) as DesignFile;
}

describe("the reading model split for common draws", () => {
  it("gives _indicatedC's bits for every example chain without a wire (2,000 source values across the box × 5 temperatures)", () => {
    const files = readdirSync(join(projectRoot, "examples")).filter((f) => f.endsWith(".json"));
    let checked = 0;
    for (const file of files) {
      const d = design(file);
      const cc = _compileChain(sweepChainOfDesign(d));
      if (cc.wire !== undefined) continue;
      const t0 = d.setpoints[0]?.tripTemperatureC ?? 100;
      for (const t of [t0 - 80, t0 - 10, t0, t0 + 7.5, t0 + 40]) {
        const cm = _readingModel(cc, t);
        const names = Object.keys(cm.inputs);
        const parts = new Float64Array(7 * 3);
        for (let i = 0; i < 2000; i++) {
          const x: Record<string, number> = {};
          names.forEach((name, k) => {
            const dist = cm.inputs[name] as { mean: number; halfWidth?: number; standardUncertainty: number };
            const half = dist.halfWidth ?? 3 * dist.standardUncertainty;
            // ends, mean and a spread of interior values (deterministic)
            const u = i < 3 ? [-1, 0, 1][i]! : Math.sin(1 + i * 12.9898 + k * 78.233);
            x[name] = dist.mean + half * u;
          });
          _indicatedParts(cc, x, parts, 7);
          expect(Object.is(_indicatedCFromParts(cc, t, x, parts, 7), _indicatedC(cc, t, x))).toBe(true);
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThanOrEqual(4 * 5 * 2000);
  });
});

describe("sweep on worker threads", () => {
  for (const [file, from, step] of [
    ["heated-enclosure-adc.json", 100, 2.5], // type T class 1: ±0.5 °C up to 125 °C, then 0.004·t (the tolerance widens)
    ["reflow-oven-trip.json", 220, 1],
  ] as const) {
    it(`${file}: rows identical for 1, 2 and 4 workers and equal to evaluateChain point by point`, async () => {
      const chain = sweepChainOfDesign(design(file));
      const temperatures = Array.from({ length: 24 }, (_, i) => from + i * step);
      const one = await _sweepRowsOnWorkers(chain, temperatures, options, 1);
      for (const workers of [2, 4]) {
        const seen: number[] = [];
        const rows = await _sweepRowsOnWorkers(chain, temperatures, options, workers, (done) => seen.push(done));
        expect(JSON.stringify(rows)).toBe(JSON.stringify(one));
        expect(seen.at(-1)).toBe(temperatures.length);
      }
      temperatures.forEach((t, i) => {
        const alone = evaluateChain(chain, t, options);
        const row = one[i];
        expect(row?.temperatureC).toBe(t);
        alone.bounds.forEach((b, k) => {
          expect(Object.is(row?.bands[k]?.errorLowC, b.errorLowC)).toBe(true);
          expect(Object.is(row?.bands[k]?.errorHighC, b.errorHighC)).toBe(true);
        });
      });
    }, 120_000);
  }

  it("a point outside the thermocouple's range fails with the same typed error on workers as in one thread", async () => {
    const chain = sweepChainOfDesign(design("heated-enclosure-adc.json"));
    const temperatures = [100, 200, 300, 390, 500, 600];
    const error = async (workers: number): Promise<unknown> => _sweepRowsOnWorkers(chain, temperatures, options, workers).then(() => undefined, (e: unknown) => e);
    const inProcess = (await error(1)) as { code?: string; quantity?: string; value?: unknown; message?: string };
    expect(inProcess?.code).toBe("OUT_OF_RANGE");
    const onWorkers = (await error(3)) as typeof inProcess;
    expect([onWorkers?.code, onWorkers?.quantity, onWorkers?.value, onWorkers?.message]).toEqual([inProcess.code, inProcess.quantity, inProcess.value, inProcess.message]);
  }, 120_000);

  it("the CLI's --workers 2 and --workers 1 print the same JSON; --workers 0 is refused", async () => {
    const args = ["sweep", "examples/heated-enclosure-adc.json", "--from", "20", "--to", "120", "--step", "5", "--trials", "2000", "--json"];
    const a = await run([...args, "--workers", "1"]);
    const b = await run([...args, "--workers", "2"]);
    expect(a.code, a.stderr).toBe(0);
    expect(b.stdout).toBe(a.stdout);
    const bad = await run([...args, "--workers", "0"]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain("--workers");
  }, 120_000);
});
