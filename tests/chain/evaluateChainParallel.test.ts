// evaluateChainParallel (src/chain/evaluateChainParallel.ts): every number of evaluateChain's result, bit for bit,
// with the Monte Carlo on worker threads (JCGM 101's draws depend on the seed and trial index only, so a seed
// reproduces the result whichever thread ran a block), for 1, 2 and 4 workers and through a counted pool, on the
// heated-enclosure ADC example and a lehr chain with every wire element (tests/fixtures/lehr-adc-wire.json); bad
// input as typed errors before any worker starts.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { evaluateChain } from "../../src/chain/evaluateChain.js";
import { evaluateChainParallel } from "../../src/chain/evaluateChainParallel.js";
import type { ChainEvaluation } from "../../src/chain/types.js";
import { measurementChainFromDesign } from "../../src/design/designToObjects.js";
import { parseDesign } from "../../src/design/parseDesign.js";
import { chunksRunOnPool } from "../_countedPool.js";

const chainOf = (path: string) => measurementChainFromDesign(parseDesign(readFileSync(new URL(path, import.meta.url), "utf8"), { fileName: path }));

/** The evaluation without the bounds' notes (the Monte Carlo note says how many workers ran). */
const numbers = (e: ChainEvaluation): unknown => JSON.parse(JSON.stringify(e, (key, value: unknown) => (key === "note" ? undefined : value)));

describe("evaluateChainParallel", () => {
  it("the ADC example and a wire chain: the same evaluation as evaluateChain for 1, 2 and 4 workers and through a pool", async () => {
    for (const [path, t] of [["../../examples/heated-enclosure-adc.json", 90], ["../fixtures/lehr-adc-wire.json", 580]] as const) {
      const chain = chainOf(path);
      const options = { methods: ["worst-case", "rss", "monte-carlo"] as const, monteCarloTrials: 40_000, seed: 5 };
      const plain = numbers(evaluateChain(chain, t, options));
      for (const workers of [1, 2, 4]) {
        expect(numbers(await evaluateChainParallel(chain, t, { ...options, workers, parallelThreshold: 1 })), `${path}, ${workers} workers`).toEqual(plain);
      }
      const chunks = await chunksRunOnPool(async (pool) => {
        const viaPool = await evaluateChainParallel(chain, t, { ...options, pool, parallelThreshold: 1 });
        expect(numbers(viaPool)).toEqual(plain);
        expect(viaPool.bounds.find((b) => b.method === "monte-carlo")?.note).toContain("2 worker threads");
      });
      expect(chunks).toBeGreaterThan(0);
    }
  }, 120_000);

  it("bad input is evaluateChain's typed error, or names workers, before any worker starts", async () => {
    const chain = chainOf("../../examples/heated-enclosure-adc.json");
    await expect(evaluateChainParallel(chain, Number.NaN, { methods: ["monte-carlo"], parallelThreshold: 1 })).rejects.toMatchObject({ quantity: "hot-junction temperature" });
    await expect(evaluateChainParallel(chain, 90, { workers: 65 })).rejects.toMatchObject({ code: "OUT_OF_RANGE", quantity: "workers", min: 1, max: 64 });
    await expect(evaluateChainParallel({} as never, 90)).rejects.toMatchObject({ name: "HotjunctionTypeError" });
  });
});
