/**
 * Monte Carlo in blocks: bit-identical results across worker counts, batch splits and common-draw groups; the
 * seed reproduces; bounded memory above 4,194,304 trials; the work cap; the adaptive stopping rule for the
 * shortest interval against the exact distribution of a sum of rectangulars.
 */
import { describe, expect, it } from "vitest";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import {
  createMonteCarloPool,
  propagate,
  propagateCommonDraws,
  propagateParallel,
  rectangular,
  type PropagationResult,
} from "../../src/uncertainty/index.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";
import { _blockState } from "../../src/uncertainty/_monteCarloStream.js";
import { _OutputSummary } from "../../src/uncertainty/_propagateMonteCarlo.js";
import { m7 } from "../fixtures/uncertaintyChecks.js";
import { chainInputs, chainModel } from "./fixtures/twelveSourceChain.js";

const fixture = new URL("./fixtures/twelveSourceChain.ts", import.meta.url).href;
const chainRef = { module: fixture, exportName: "chainModel" };

function sameBits(a: PropagationResult, b: PropagationResult): void {
  expect(Object.is(a.estimate, b.estimate)).toBe(true);
  expect(Object.is(a.standardUncertainty, b.standardUncertainty)).toBe(true);
  expect(Object.is(a.interval[0], b.interval[0])).toBe(true);
  expect(Object.is(a.interval[1], b.interval[1])).toBe(true);
  expect(a.trials).toBe(b.trials);
}

describe("block streams", () => {
  it("block b's stream is the seeded xoroshiro128+ after b jumps (pure-rand's jump, 2⁶⁴ steps each)", () => {
    for (const seed of [0, 1, 7, 2 ** 32 - 1]) {
      const g = xoroshiro128plus(seed | 0);
      for (let b = 0; b < 5; b++) {
        expect(_blockState(seed, b)).toEqual([...g.getState()]);
        g.jump();
      }
    }
  });

  it("a run of N trials is the first N of one sequence: fixed runs and adaptive runs of the same length agree bit for bit", () => {
    const adaptive = propagate(chainModel, chainInputs, { method: "monte-carlo", seed: 17, adaptive: { significantDigits: 1 } });
    const fixed = propagate(chainModel, chainInputs, { method: "monte-carlo", seed: 17, trials: adaptive.trials as number });
    sameBits(adaptive, fixed);
  });

  it("the reduction gives the same bits however the outputs arrive (one piece, 7-output pieces, odd pieces)", () => {
    const values = Float64Array.from({ length: 50_003 }, (_, i) => Math.sin(i * 0.37) * 3 + (i % 11) * 1e-3);
    const reduce = (piece: number) => {
      const s = new _OutputSummary(values.length, 0.95, true);
      for (let i = 0; i < values.length; i += piece) s.push(values.slice(i, Math.min(i + piece, values.length)));
      return s.finish();
    };
    const whole = reduce(values.length);
    for (const piece of [7, 8192, 12_345]) expect(reduce(piece)).toEqual(whole);
  });
});

describe("propagateParallel: same bits for any number of workers", () => {
  it("workers 1, 2 and 4 and the in-process propagate agree bit for bit (12-source chain, 300,000 trials, correlated inputs)", async () => {
    const options = {
      method: "monte-carlo" as const,
      trials: 300_000,
      seed: 29,
      correlations: [["x0", "x5", 0.4] as ["x0", "x5", number], ["x2", "x8", -0.3] as ["x2", "x8", number]],
      parallelThreshold: 1,
    };
    const reference = propagate(chainModel, chainInputs, options);
    for (const workers of [1, 2, 4]) {
      const result = await propagateParallel(chainRef, chainInputs, { ...options, workers });
      sameBits(result, reference);
      expect(result.seed).toBe(29);
      if (workers > 1) expect(result.note).toContain(`run on ${workers} worker threads`);
    }
  }, 120_000);

  it("a reused pool gives the same bits; another seed differs; adaptive runs on the pool stop where in-process runs stop", async () => {
    const pool = await createMonteCarloPool({ workers: 2 });
    expect(pool).toBeDefined();
    try {
      const base = { method: "monte-carlo" as const, parallelThreshold: 1, ...(pool === undefined ? {} : { pool }) };
      const a = await propagateParallel(chainRef, chainInputs, { ...base, trials: 150_000, seed: 3 });
      const b = await propagateParallel(chainRef, chainInputs, { ...base, trials: 150_000, seed: 3 });
      sameBits(a, b);
      sameBits(a, propagate(chainModel, chainInputs, { method: "monte-carlo", trials: 150_000, seed: 3 }));
      const c = await propagateParallel(chainRef, chainInputs, { ...base, trials: 150_000, seed: 4 });
      expect(c.estimate).not.toBe(a.estimate);
      const adaptiveOptions = { method: "monte-carlo" as const, seed: 8, adaptive: { significantDigits: 2 } };
      const onPool = await propagateParallel(chainRef, chainInputs, { ...base, ...adaptiveOptions });
      sameBits(onPool, propagate(chainModel, chainInputs, adaptiveOptions));
      expect(onPool.converged).toBe(true);
    } finally {
      await pool?.close();
    }
  }, 120_000);

  it("a model that fails in a worker rejects with the typed error; a bad module or export is a typed error", async () => {
    const options = { method: "monte-carlo" as const, trials: 200_000, seed: 1, parallelThreshold: 1, workers: 2 };
    const failing = propagateParallel({ module: fixture, exportName: "failingModel" }, chainInputs, options);
    await expect(failing).rejects.toBeInstanceOf(HotjunctionRangeError);
    await expect(failing).rejects.toMatchObject({ code: "MODEL_NOT_FINITE", quantity: "model output" });
    await expect(propagateParallel({ module: fixture, exportName: "chainInputs" }, chainInputs, options)).rejects.toMatchObject({
      code: "INVALID_OPTION",
      quantity: "model export",
      value: "chainInputs",
    });
    await expect(propagateParallel({ module: "file:///nonexistent/model.js" }, chainInputs, options)).rejects.toBeInstanceOf(HotjunctionTypeError);
    await expect(propagateParallel(chainRef, chainInputs, { ...options, workers: 0 })).rejects.toMatchObject({ code: "OUT_OF_RANGE", quantity: "workers", min: 1, max: 64 });
    await expect(propagateParallel(null as never, chainInputs, options)).rejects.toMatchObject({ code: "INVALID_OPTION", quantity: "model" });
  }, 120_000);

  it("a function model runs in the calling thread with the same bits; other methods give propagate's result", async () => {
    const options = { method: "monte-carlo" as const, trials: 40_000, seed: 12 };
    sameBits(await propagateParallel(chainModel, chainInputs, options), propagate(chainModel, chainInputs, options));
    const rss = await propagateParallel(chainRef, chainInputs, { method: "rss" });
    expect(rss).toEqual(propagate(chainModel, chainInputs, { method: "rss" }));
  });
});

describe("bounded memory", () => {
  it("5,000,000 trials: the interval is averaged over 2 segments, with a standard error, near the exact ±0.95·a (rectangular, JCGM 101 6.4.2 / (c))", () => {
    const result = propagate(({ x }) => x, { x: rectangular({ center: 0, halfWidth: 1 }) }, { method: "monte-carlo", trials: 5_000_000, seed: 2 });
    expect(result.intervalSegments).toBe(2);
    const [seLow, seHigh] = result.intervalStandardError as readonly [number, number];
    expect(seLow).toBeGreaterThan(0);
    // exact 95 % interval of U(−1, 1) is ±0.95; a single-segment quantile of 2.5e6 values scatters ~1.9e-4 (c)
    expect(Math.abs(result.interval[0] + 0.95)).toBeLessThan(1e-3);
    expect(Math.abs(result.interval[1] - 0.95)).toBeLessThan(1e-3);
    expect(seHigh).toBeLessThan(1e-3);
    expect(Math.abs(result.standardUncertainty - 1 / Math.sqrt(3))).toBeLessThan(1e-3);
    expect(result.note).toMatch(/averaged over 2 segments/);
  }, 60_000);
});

describe("propagateCommonDraws (common random numbers)", () => {
  const gainOffset = { gain: rectangular({ center: 1, halfWidth: 0.002 }), offset: rectangular({ center: 0, halfWidth: 0.3 }) };
  it("result k is propagate(models[k]) bit for bit; the curve over setpoints is 10× smoother than with independent draws", () => {
    const setpoints = Array.from({ length: 41 }, (_, i) => 100 + 10 * i);
    const models = setpoints.map((t) => (x: { gain: number; offset: number }) => x.gain * t + x.offset + 1e-4 * t * t * (x.gain - 1));
    const shortest = propagateCommonDraws(models, gainOffset, { trials: 20_000, seed: 5, interval: "shortest" });
    for (const k of [0, 17, 40]) {
      sameBits(shortest[k] as PropagationResult, propagate(models[k] as never, gainOffset, { trials: 20_000, seed: 5, interval: "shortest", method: "monte-carlo" }));
    }
    const common = propagateCommonDraws(models, gainOffset, { trials: 20_000, seed: 5 });
    const independent = models.map((model, k) => propagate(model, gainOffset, { method: "monte-carlo", trials: 20_000, seed: 1000 + k }));
    // rms second difference of the upper endpoint along the sweep (a property, (c))
    const roughness = (results: readonly PropagationResult[]): number => {
      let squares = 0;
      for (let k = 1; k + 1 < results.length; k++) {
        const d2 = (results[k + 1] as PropagationResult).interval[1] - 2 * (results[k] as PropagationResult).interval[1] + (results[k - 1] as PropagationResult).interval[1];
        squares += d2 * d2;
      }
      return Math.sqrt(squares / (results.length - 2));
    };
    expect(roughness(common)).toBeLessThan(roughness(independent) / 10);
  });

  it("groups of models that redraw the same blocks give the same bits as one group (500 models × 20,000 trials > one group)", () => {
    const models = Array.from({ length: 500 }, (_, k) => (x: { gain: number; offset: number }) => x.gain * k + x.offset);
    const all = propagateCommonDraws(models, gainOffset, { trials: 20_000, seed: 9 });
    const last = propagateCommonDraws([models[499] as (typeof models)[number]], gainOffset, { trials: 20_000, seed: 9 });
    sameBits(all[499] as PropagationResult, last[0] as PropagationResult);
  });

  it("caps total work with an error naming models × trials and the limit 10⁹; rejects bad models and options", () => {
    const models = Array.from({ length: 2001 }, () => (x: { gain: number; offset: number }) => x.gain);
    expect(() => propagateCommonDraws(models, gainOffset, { trials: 1_000_000 })).toThrow(
      expect.objectContaining({ code: "OUT_OF_RANGE", quantity: "models × trials", value: 2.001e9, max: 1e9 }),
    );
    expect(() => propagateCommonDraws([], gainOffset)).toThrow(HotjunctionTypeError);
    expect(() => propagateCommonDraws([1 as never], gainOffset)).toThrow(expect.objectContaining({ quantity: "models[0]" }));
    expect(() => propagateCommonDraws(models.slice(0, 2), gainOffset, { method: "rss" } as never)).toThrow(
      expect.objectContaining({ code: "INVALID_OPTION", quantity: "method" }),
    );
  });
});

describe("adaptive stopping (JCGM 101 7.9) that holds for the shortest interval", () => {
  // Y = X₁ + … + X₄, Xᵢ rectangular of unit standard deviation: JCGM 101:2008 9.2.3 (from memory (b)); Y/(2√3) + 2
  // has the Irwin–Hall distribution (Irwin 1927, Hall 1927, Biometrika 19), whose 95 % interval is ±3.8794067 (c).
  // With 2 significant digits u(y) = 2.0 gives δ = 0.05 (JCGM 101 7.8.2).
  const r = rectangular({ center: 0, halfWidth: Math.sqrt(3) });
  const inputs = { a: r, b: r, c: r, d: r };
  const sum4 = (x: Readonly<Record<"a" | "b" | "c" | "d", number>>): number => x.a + x.b + x.c + x.d;
  const outside = (interval: "symmetric" | "shortest"): number => {
    let count = 0;
    for (let seed = 1; seed <= 60; seed++) {
      const result = propagate(sum4, inputs, { method: "monte-carlo", seed, interval, adaptive: { significantDigits: 2 } });
      expect(result.converged).toBe(true);
      const delta = 0.05;
      if (Math.abs(result.interval[0] + m7.halfWidth) > delta || Math.abs(result.interval[1] - m7.halfWidth) > delta) count++;
    }
    return count;
  };
  it("symmetric interval: at most 3 of 60 seeds outside δ (95 % rule)", () => {
    expect(outside("symmetric")).toBeLessThanOrEqual(3);
  }, 120_000);
  it("shortest interval: at most 3 of 60 seeds outside δ (was 14 of 60 with 2·s/√h)", () => {
    expect(outside("shortest")).toBeLessThanOrEqual(3);
  }, 300_000);
});
