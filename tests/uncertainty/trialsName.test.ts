/**
 * `propagate` names the Monte Carlo trial count `monteCarloTrials`, as the design file, `designTrip` and
 * `evaluateChain` do; `trials` is its deprecated name for one minor version. The same seed and count must give
 * the same result bit for bit under either name (the generator does not see the option's name).
 */
import { describe, expect, it } from "vitest";
import { HotjunctionRangeError, propagate, rectangular, normal } from "../../src/index.js";

const inputs = { a: rectangular({ center: 0, halfWidth: 1 }), b: normal({ mean: 1, standardDeviation: 0.5 }) };
const model = ({ a, b }: Record<"a" | "b", number>): number => a + 2 * b;

describe("Monte Carlo trial count name", () => {
  it("monteCarloTrials and the deprecated trials give the same result", () => {
    const named = propagate(model, inputs, { method: "monte-carlo", monteCarloTrials: 5000, seed: 3 });
    const former = propagate(model, inputs, { method: "monte-carlo", trials: 5000, seed: 3 });
    expect(named.trials).toBe(5000);
    expect(named).toEqual(former);
  });

  it("both names at once are refused", () => {
    expect(() => propagate(model, inputs, { method: "monte-carlo", monteCarloTrials: 5000, trials: 5000 })).toThrow(HotjunctionRangeError);
  });

  it("a bad count names the key that was given", () => {
    expect(() => propagate(model, inputs, { method: "monte-carlo", monteCarloTrials: 2.5 })).toThrow(/monteCarloTrials 2.5/);
    expect(() => propagate(model, inputs, { method: "monte-carlo", trials: 2.5 })).toThrow(/trials 2.5/);
  });
});
