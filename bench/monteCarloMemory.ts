/**
 * Peak memory of one 10⁸-trial Monte Carlo run (bounded-memory reduction): prints the resident set size high-water
 * mark of this process before and after. Run: `npx tsx bench/monteCarloMemory.ts [trials]` (default 1e8). Not a test.
 * @module
 */
import { propagate, rectangular, normal } from "../src/uncertainty/index.js";

const trials = Number(process.argv[2] ?? 1e8);
const before = process.resourceUsage().maxRSS / 1024;
const start = performance.now();
const result = propagate(({ a, b }) => a + 0.5 * b, { a: rectangular({ center: 0, halfWidth: 1 }), b: normal({ mean: 0, standardDeviation: 0.2 }) }, {
  method: "monte-carlo",
  trials,
  seed: 1,
});
const seconds = (performance.now() - start) / 1000;
const after = process.resourceUsage().maxRSS / 1024;
console.log(
  JSON.stringify({
    trials: result.trials,
    seconds: Number(seconds.toFixed(1)),
    peakRssMiBBefore: Math.round(before),
    peakRssMiB: Math.round(after),
    storingAllOutputsWouldNeedMiB: Math.round((trials * 8 * 2) / 2 ** 20),
    intervalSegments: result.intervalSegments,
    interval: result.interval,
    intervalStandardError: result.intervalStandardError,
  }),
);
