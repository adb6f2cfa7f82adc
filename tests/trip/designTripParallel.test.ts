// designTripParallel (src/trip/designTripParallel.ts): every number of designTrip's result, bit for bit, with
// each setpoint's Monte Carlo on worker threads (the property JCGM 101's procedure needs for a seed to
// reproduce a report: the draws depend on the seed and trial index only, not on the thread), for 1, 2 and 4
// workers, on the examples' comparator designs; a design error before any worker starts.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseDesign } from "../../src/design/parseDesign.js";
import { referenceOptionFromDesign, tripDesignFromDesign } from "../../src/design/designToObjects.js";
import { compareReferences, compareReferencesParallel } from "../../src/trip/compareReferences.js";
import { designTrip } from "../../src/trip/designTrip.js";
import { designTripParallel } from "../../src/trip/designTripParallel.js";
import { HotjunctionRangeError } from "../../src/errors.js";
import { propagateParallel } from "../../src/uncertainty/propagateParallel.js";
import { chunksRunOnPool } from "../_countedPool.js";
import type { TripDesignResult } from "../../src/trip/types.js";

const designOf = (file: string) => tripDesignFromDesign(parseDesign(readFileSync(new URL(`../../examples/${file}`, import.meta.url), "utf8"), { fileName: file }));

/** The result without the Monte Carlo note (it says how many workers ran). */
function numbers(r: TripDesignResult): unknown {
  return JSON.parse(JSON.stringify(r, (key, value: unknown) => (key === "note" ? undefined : value)));
}

describe("designTripParallel", () => {
  it("the kiln (two setpoints) and the furnace: the same result as designTrip for 1, 2 and 4 workers", async () => {
    for (const file of ["ceramic-kiln-cutout.json", "heat-treat-furnace-wire.json"]) {
      const design = designOf(file);
      const options = { monteCarloTrials: 40_000, seed: 11 };
      const plain = numbers(designTrip(design, options));
      for (const workers of [1, 2, 4]) {
        expect(numbers(await designTripParallel(design, { ...options, workers, parallelThreshold: 1 })), `${file}, ${workers} workers`).toEqual(plain);
      }
      // Through a pool, counting the chunks the workers were asked for: the run did leave this thread.
      const chunks = await chunksRunOnPool(async (pool) => {
        expect(numbers(await designTripParallel(design, { ...options, pool, parallelThreshold: 1 }))).toEqual(plain);
      });
      expect(chunks).toBeGreaterThan(0);
    }
  }, 120_000);

  it("below the threshold it is designTrip in this thread", async () => {
    const design = designOf("reflow-oven-trip.json");
    const r = await designTripParallel(design, { monteCarloTrials: 2000, seed: 3 });
    expect(numbers(r)).toEqual(numbers(designTrip(design, { monteCarloTrials: 2000, seed: 3 })));
  });

  it("a bad worker count or design is a typed error before any worker starts", async () => {
    const design = designOf("reflow-oven-trip.json");
    await expect(designTripParallel(design, { workers: 0 })).rejects.toMatchObject({ code: "OUT_OF_RANGE", quantity: "workers", min: 1, max: 64 });
    await expect(designTripParallel({ ...design, setpoints: [] } as never, { parallelThreshold: 1 })).rejects.toBeInstanceOf(HotjunctionRangeError);
  });

  it("a model factory's argument (ModelReference.argument): a bad setpoint is the design's typed error; a factory that returns no function is named", async () => {
    const design = designOf("reflow-oven-trip.json");
    const factory = new URL("../../src/trip/_tripModelFactory.ts", import.meta.url).href;
    const inputs = { x: { kind: "rectangular", mean: 0, halfWidth: 1 } } as never;
    await expect(propagateParallel({ module: factory, exportName: "tripMonteCarloModel", argument: { design, setpoint: 5 } }, inputs, { method: "monte-carlo", trials: 1000 })).rejects.toMatchObject({
      code: "INVALID_DESIGN",
      quantity: "setpoint index",
      value: 5,
    });
    await expect(propagateParallel({ module: "data:text/javascript,export const f = () => 42;", exportName: "f", argument: 1 }, inputs, { method: "monte-carlo", trials: 1000 })).rejects.toMatchObject({
      code: "INVALID_OPTION",
      quantity: "model factory result",
      value: 42,
    });
  });

  it("compareReferencesParallel: the same comparison as compareReferences (the reflow oven's reference options), through workers", async () => {
    const file = "reflow-oven-trip.json";
    const parsed = parseDesign(readFileSync(new URL(`../../examples/${file}`, import.meta.url), "utf8"), { fileName: file });
    const references = [parsed.reference, ...(parsed.referenceAlternatives ?? [])].map(referenceOptionFromDesign);
    expect(references.length).toBeGreaterThan(1);
    const design = tripDesignFromDesign(parsed);
    const options = { monteCarloTrials: 30_000, seed: 4 };
    const plain = compareReferences(design, references, options);
    let progress = 0;
    const parallel = await compareReferencesParallel(design, references, { ...options, workers: 2, parallelThreshold: 1, onProgress: (f) => (progress = f) });
    expect(JSON.parse(JSON.stringify(parallel))).toEqual(JSON.parse(JSON.stringify(plain)));
    expect(progress).toBe(1);
    await expect(compareReferencesParallel(design, references, { parallelThreshold: 0 })).rejects.toMatchObject({ quantity: "parallelThreshold", min: 1 });
  }, 120_000);
});
