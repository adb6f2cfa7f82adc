// The worst case's fast path (src/uncertainty/_propagateWorstCase.ts, `_enclosureMetAtCorners`): when the model's
// enclosure meets the per-input-extreme corners, the corner scan and coordinate search are skipped. Checked as
// properties against the full search over generated chains, and the fallback where the two do not meet.
// Sources: the bracket argument of chain/_tripEnclosure.ts (DEVELOPERS.md); x − x² on [0, 1] has its maximum 1/4
// at 1/2 (calculus); the non-monotone chain's slopes are NIST SRD 60 type K table slopes.
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { afterEach, describe, expect, it } from "vitest";
import { tripTemperatureModel } from "../../src/chain/tripTemperatureModel.js";
import { measurementChainFromDesign, tripDesignFromDesign } from "../../src/design/designToObjects.js";
import { designTrip } from "../../src/trip/designTrip.js";
import { parseDesign } from "../../src/design/parseDesign.js";
import type { MeasurementChain } from "../../src/chain/types.js";
import { propagate, rectangular } from "../../src/uncertainty/index.js";
import { _worstCaseBracketFrom } from "../../src/uncertainty/propagate.js";
import { _worstCaseFastPath } from "../../src/uncertainty/_propagateWorstCase.js";
import type { Distribution, PropagationResult } from "../../src/uncertainty/types.js";
import { chainArb, interiorExtremeChain } from "./_chainArbitrary.js";

/** The stated gap tolerance of the chain models' worst case, °C (`_enclosureGapToleranceC`). */
const tolerance = 1e-9;
const skipped = "coordinate-wise search were skipped";

function worstCase(model: (x: Readonly<Record<string, number>>) => number, inputs: never, enclosure: unknown, fast: boolean): PropagationResult {
  _worstCaseFastPath.enabled = fast;
  try {
    return propagate(model, inputs, { method: "worst-case", modelEnclosure: enclosure as never });
  } finally {
    _worstCaseFastPath.enabled = true;
  }
}

afterEach(() => {
  _worstCaseFastPath.enabled = true;
});

describe("worst-case fast path against the full search", () => {
  it("generated chains: the same band within the stated tolerance, attained inside the enclosure, contributions unchanged", () => {
    let fastRuns = 0;
    let compared = 0;
    fc.assert(
      fc.property(chainArb, (chain) => {
        let m: ReturnType<typeof tripTemperatureModel>;
        try {
          m = tripTemperatureModel(chain, 0);
        } catch {
          return; // a threshold outside the type's range for this draw
        }
        if (Object.keys(m.inputs).length === 0) return;
        const fast = worstCase(m.model as never, m.inputs as never, m.enclosure, true);
        const full = worstCase(m.model as never, m.inputs as never, m.enclosure, false);
        if (fast.note?.includes(skipped)) fastRuns++;
        expect(full.note).not.toContain(skipped);
        expect(Math.abs(fast.interval[0] - full.interval[0])).toBeLessThanOrEqual(tolerance);
        expect(Math.abs(fast.interval[1] - full.interval[1])).toBeLessThanOrEqual(tolerance);
        const [lo, hi] = fast.enclosure as readonly [number, number];
        expect(lo).toBeLessThanOrEqual(fast.interval[0]);
        expect(hi).toBeGreaterThanOrEqual(fast.interval[1]);
        // the attained values are model values at the points printed with them
        expect(m.model(fast.attained?.low.at as never)).toBe(fast.attained?.low.value);
        expect(m.model(fast.attained?.high.at as never)).toBe(fast.attained?.high.value);
        const [gapLow, gapHigh] = fast.enclosureGap as readonly [number, number];
        expect(Math.max(gapLow, gapHigh)).toBeLessThanOrEqual(tolerance);
        expect(fast.contributions).toEqual(full.contributions);
        expect(fast.estimate).toBe(full.estimate);
        compared++;
      }),
      { numRuns: 60, seed: 29 },
    );
    expect(compared).toBeGreaterThan(40);
    expect(fastRuns).toBeGreaterThan(30);
  });
});

describe("worst-case fallback", () => {
  it("without an enclosure the full search runs", () => {
    const f = ({ a, b }: { a: number; b: number }) => a + 2 * b;
    const inputs = { a: rectangular({ lower: 0, upper: 1 }), b: rectangular({ lower: -1, upper: 1 }) };
    const w = propagate(f, inputs, { method: "worst-case" });
    expect(w.note).not.toContain(skipped);
    expect(w.note).toContain("coordinate-wise search (17-point grid");
    expect(w.interval).toEqual([-2, 3]);
  });

  it("an enclosure that does not meet the corners (x − x², max 1/4 at 1/2 inside): the search runs and finds it", () => {
    const f = ({ x }: { x: number }) => x - x * x;
    const extension = (box: Readonly<Record<"x", readonly [number, number]>>): readonly [number, number] => {
      const [a, b] = box.x;
      return [a - Math.max(a * a, b * b) - 1e-15, b - Math.min(a * a, b * b) + 1e-15];
    };
    const w = propagate(f, { x: rectangular({ lower: 0, upper: 1 }) }, { method: "worst-case", modelEnclosure: extension });
    expect(w.note).not.toContain(skipped);
    expect(Math.abs(w.interval[1] - 0.25)).toBeLessThanOrEqual(1e-12);
  });

  it("a chain whose extreme lies inside the cold-junction range: the fast path refines the interior input and meets the enclosure; the band is the full search's within the tolerance", () => {
    // Hardware compensation at 40.6 µV/°C on type K over 0 … 60 °C: S(t) − α changes sign inside (S_K(0 °C) =
    // 39.45 µV/°C, S_K(60 °C) = 41.4 µV/°C, NIST SRD 60 type K table slopes).
    const chain = interiorExtremeChain;
    const m = tripTemperatureModel(chain, 0);
    const fast = worstCase(m.model as never, m.inputs as never, m.enclosure, true);
    const full = worstCase(m.model as never, m.inputs as never, m.enclosure, false);
    expect(fast.note).toContain(skipped);
    expect(Math.abs(fast.interval[0] - full.interval[0])).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(fast.interval[1] - full.interval[1])).toBeLessThanOrEqual(tolerance);
    const [gapLow, gapHigh] = fast.enclosureGap as readonly [number, number];
    expect(Math.max(gapLow, gapHigh)).toBeLessThanOrEqual(tolerance);
    // the attained low or high point has the cold junction strictly inside the ambient range (an interior extreme)
    const ambient = Object.keys(m.inputs).find((name) => name.startsWith("ambient"));
    expect(ambient).toBeDefined();
    const box = [fast.attained?.low.at, fast.attained?.high.at].map((at) => (at as Record<string, number>)[ambient as string] as number);
    const { mean, halfWidth } = (m.inputs as Record<string, { mean: number; halfWidth: number }>)[ambient as string] as { mean: number; halfWidth: number };
    expect(box.some((t) => t > mean - halfWidth && t < mean + halfWidth)).toBe(true);
  });
});

describe("warm-started bracket of a self-consistent edge's iterations (`_worstCaseBracketFrom`)", () => {
  it("generated chains, the tolerance's bounds moved: the band of the full worst case within the tolerance, the attained values model values at their points, the enclosure around them", () => {
    let warm = 0;
    let compared = 0;
    fc.assert(
      fc.property(chainArb, fc.double({ min: 0.9, max: 1.1, noNaN: true }), (chain, factor) => {
        let m: ReturnType<typeof tripTemperatureModel>;
        try {
          m = tripTemperatureModel(chain, 0);
        } catch {
          return;
        }
        const before = m.inputs as Record<string, Distribution>;
        const tol = before["thermocouple.tolerance"];
        if (tol === undefined || m.enclosure === undefined || tol.kind !== "rectangular") return;
        const half = (tol as { halfWidth: number }).halfWidth * factor;
        const after = { ...before, "thermocouple.tolerance": rectangular({ lower: -half, upper: half }) };
        const first = propagate(m.model as never, before as never, { method: "worst-case", modelEnclosure: m.enclosure as never });
        const full = propagate(m.model as never, after as never, { method: "worst-case", modelEnclosure: m.enclosure as never });
        const b = _worstCaseBracketFrom(m.model as never, after, 0.9973, m.enclosure as never, { inputs: before, result: first as never });
        compared++;
        if (b === undefined) return;
        warm++;
        expect(Math.abs(b.interval[0] - full.interval[0])).toBeLessThanOrEqual(tolerance);
        expect(Math.abs(b.interval[1] - full.interval[1])).toBeLessThanOrEqual(tolerance);
        expect(m.model(b.attained.low.at as never)).toBe(b.interval[0]);
        expect(m.model(b.attained.high.at as never)).toBe(b.interval[1]);
        expect(b.enclosure[0]).toBeLessThanOrEqual(b.interval[0]);
        expect(b.enclosure[1]).toBeGreaterThanOrEqual(b.interval[1]);
        expect(Math.max(...b.enclosureGap)).toBeLessThanOrEqual(tolerance);
        // the attained points lie in the new box
        const at = b.attained.high.at["thermocouple.tolerance"] as number;
        expect(Math.abs(at)).toBeLessThanOrEqual(half);
      }),
      { numRuns: 60, seed: 29 },
    );
    expect(compared).toBeGreaterThan(30);
    expect(warm).toBeGreaterThan(20);
  });

  it("different input names: no warm start (undefined), the caller runs the full worst case", () => {
    const f = ({ a, b }: { a: number; b: number }) => a + b;
    const enclosure = (box: Readonly<Record<string, readonly [number, number]>>): readonly [number, number] => [
      (box["a"]?.[0] ?? 0) + (box["b"]?.[0] ?? 0),
      (box["a"]?.[1] ?? 0) + (box["b"]?.[1] ?? 0),
    ];
    const before = { a: rectangular({ lower: -1, upper: 1 }) };
    const first = propagate((({ a }: { a: number }) => a) as never, before as never, { method: "worst-case", modelEnclosure: enclosure });
    const after = { a: rectangular({ lower: -1, upper: 1 }), b: rectangular({ lower: -1, upper: 1 }) };
    expect(_worstCaseBracketFrom(f as never, after, 0.9973, enclosure, { inputs: before, result: first })).toBeUndefined();
    // same names: a + b's corners, exactly
    const again = _worstCaseBracketFrom((({ a }: { a: number }) => a) as never, { a: rectangular({ lower: -2, upper: 2 }) }, 0.9973, enclosure, { inputs: before, result: first });
    expect(again?.interval).toEqual([-2, 2]);
  });
});

describe("a proportional cable (W = k·(E(t_junction) − E(t_cj)), linear in its relative mismatch k)", () => {
  // The cable's tolerance statement (ASTM E230 type KX extension, standard limits) and the law of intermediate
  // temperatures give the model (src/chain/wire/extensionCable.ts); that A falls with k where
  // E(t_junction) > E(t_cj) over the box is its derivative −(E(t_j) − E(t_cj))/s with s > 0 (calculus).
  const furnace = JSON.parse(readFileSync(new URL("../../examples/heat-treat-furnace-wire.json", import.meta.url), "utf8")) as {
    wire: { cable: Record<string, unknown> };
    ambient: { minC: number; maxC: number };
  };
  const chainWith = (junction: { minC: number; maxC: number }, ambient: { minC: number; maxC: number }): MeasurementChain => {
    const d = structuredClone(furnace);
    d.wire.cable = { ...d.wire.cable, mismatch: "proportional", runTemperatureC: { minC: 0, maxC: 200 }, junctionTemperatureC: junction };
    d.ambient = ambient;
    const parsed = parseDesign(JSON.stringify(d), { fileName: "furnace-proportional.json" });
    // the threshold divider the trip design finds for this design (E96, the design's tolerance)
    const [network] = designTrip(tripDesignFromDesign(parsed), { monteCarloTrials: 1000, seed: 1 }).networks;
    const chain = measurementChainFromDesign(parsed);
    return { ...chain, divider: { kind: "divider", resistorsOhms: network?.resistorsOhms ?? [], toleranceFraction: parsed.resistors?.toleranceFraction ?? 0 } };
  };

  it("junction above the cold junction over the box: the enclosure meets the attained band at once (the cable's ends), within the stated tolerance, at every junction and ambient range", () => {
    let runs = 0;
    for (const junction of [{ minC: 80, maxC: 150 }, { minC: 60, maxC: 60 }, { minC: 120, maxC: 190 }]) {
      for (const ambient of [{ minC: 20, maxC: 45 }, { minC: 0, maxC: 10 }]) {
        const m = tripTemperatureModel(chainWith(junction, ambient), 0);
        const fast = worstCase(m.model as never, m.inputs as never, m.enclosure, true);
        // the enclosure meets at once: the fast path, or a branch and bound that closes the gap in a few calls
        // (before the cable's ends were taken per side it spent its 4,096 calls per side)
        const calls = Number(/\((\d+) enclosure calls/.exec(fast.note ?? "")?.[1] ?? 0);
        expect(fast.note?.includes(skipped) || calls <= 16).toBe(true);
        const [gapLow, gapHigh] = fast.enclosureGap as readonly [number, number];
        expect(Math.max(gapLow, gapHigh)).toBeLessThanOrEqual(tolerance);
        expect(m.model(fast.attained?.low.at as never)).toBe(fast.attained?.low.value);
        expect(m.model(fast.attained?.high.at as never)).toBe(fast.attained?.high.value);
        // the worst case moves the cable's mismatch to an end of its range at both edges (linear in k)
        const k = (m.inputs as Record<string, { mean: number; halfWidth: number }>)["cable.tolerance"] as { halfWidth: number };
        for (const at of [fast.attained?.low.at, fast.attained?.high.at]) {
          expect(Math.abs(Math.abs((at as Record<string, number>)["cable.tolerance"] as number) - k.halfWidth)).toBeLessThanOrEqual(1e-12 * k.halfWidth);
        }
        runs++;
      }
    }
    expect(runs).toBe(6);
  });

  it("the fast path's band is the full search's within the stated tolerance (one junction range)", () => {
    const m = tripTemperatureModel(chainWith({ minC: 80, maxC: 150 }, { minC: 20, maxC: 45 }), 0);
    const fast = worstCase(m.model as never, m.inputs as never, m.enclosure, true);
    const full = worstCase(m.model as never, m.inputs as never, m.enclosure, false);
    expect(Math.abs(fast.interval[0] - full.interval[0])).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(fast.interval[1] - full.interval[1])).toBeLessThanOrEqual(tolerance);
  });
});
