/**
 * `hotjunction/bulk` refuses what the root entry's bulk functions refuse, with the same typed error naming the
 * element (src/errors.ts; the message format of DEVELOPERS.md), after writing the elements before it; and where
 * WebAssembly (or its SIMD) is missing it runs the JavaScript loops with the same results (simulated by removing
 * or replacing the `WebAssembly` global before the entry is loaded).
 */
import { afterEach, describe, expect, it, vi } from "vitest";
import * as bulk from "../../src/bulk/index.js";
import { _compile } from "../../src/its90/compiled.js";
import { _EMF_END_TOLERANCE_MV } from "../../src/its90/engine.js";
import {
  emfFromTemperatureArray as rootForwardArray,
  temperatureFromEmfArray as rootInverseArray,
  thermocoupleData,
  thermocoupleTypes,
  temperatureRange,
} from "../../src/index.js";

function thrown(f: () => unknown): unknown {
  try {
    f();
  } catch (error) {
    return error;
  }
  throw new Error("did not throw");
}

describe("hotjunction/bulk errors: the root entry's, after the same elements", () => {
  const cases: [string, (n: number) => Float64Array, "forward" | "inverse"][] = [
    ["temperature above the range at element 5,001", (n) => Float64Array.from({ length: n }, (_, i) => (i === 5001 ? 1400 : i % 1372)), "forward"],
    ["NaN temperature at element 3", (n) => Float64Array.from({ length: n }, (_, i) => (i === 3 ? NaN : 20)), "forward"],
    ["EMF above the range at element 4,100", (n) => Float64Array.from({ length: n }, (_, i) => (i === 4100 ? 60 : (i % 50) + 0.5)), "inverse"],
    ["NaN EMF at element 0", (n) => Float64Array.from({ length: n }, (_, i) => (i === 0 ? NaN : 1)), "inverse"],
  ];
  for (const [name, make, direction] of cases) {
    it(name, () => {
      const input = make(8192);
      const ours = new Float64Array(8192).fill(-1);
      const theirs = new Float64Array(8192).fill(-1);
      const f = direction === "forward" ? bulk.emfFromTemperatureArray : bulk.temperatureFromEmfArray;
      const g = direction === "forward" ? rootForwardArray : rootInverseArray;
      const a = thrown(() => f("K", input, ours)) as Error & { code: string; quantity: string };
      const b = thrown(() => g("K", input, theirs)) as Error & { code: string; quantity: string };
      expect(a.constructor).toBe(b.constructor);
      expect([a.message, a.code, a.quantity]).toEqual([b.message, b.code, b.quantity]);
      expect(Array.from(ours)).toEqual(Array.from(theirs));
    });
  }

  it("type B: an EMF at 0 mV is ambiguous, as in the root entry", () => {
    const e = new Float64Array([1, 0]);
    const a = thrown(() => bulk.temperatureFromEmfArray("B", e)) as { code: string; message: string };
    expect(a.code).toBe("AMBIGUOUS_EMF");
    expect(a.message).toBe((thrown(() => rootInverseArray("B", e)) as Error).message);
  });

  it("every type: EMFs at the acceptance window's ends and one float beyond, inside a long array (the kernel's block path), as in the root entry", () => {
    const next = (x: number, up: boolean): number => {
      const b = new BigInt64Array(new Float64Array([x]).buffer);
      if (x === 0) return up ? 5e-324 : -5e-324;
      b[0] = (b[0] as bigint) + ((x > 0) === up ? 1n : -1n);
      return new Float64Array(b.buffer)[0] as number;
    };
    for (const type of thermocoupleTypes) {
      const ct = _compile(thermocoupleData(type));
      const lowOk = ct.monotonicFromC > ct.minC ? ct.emfAtMinC : ct.emfAtMinC - _EMF_END_TOLERANCE_MV;
      const highOk = ct.emfAtMaxC + _EMF_END_TOLERANCE_MV;
      const mid = (ct.emfAtMinC + ct.emfAtMaxC) / 2;
      for (const edge of [lowOk, next(lowOk, true), next(lowOk, false), highOk, next(highOk, true), next(highOk, false)]) {
        // 256 elements just inside the edge's end of the window, the edge at element 37 (inside one of the kernel's
        // blocks, in a run of pairs its fast paths take).
        const near = edge < mid ? next(next(lowOk, true), true) : highOk;
        const input = Float64Array.from({ length: 256 }, (_, i) => (i === 37 ? edge : near));
        const ours = new Float64Array(256).fill(-1);
        const theirs = new Float64Array(256).fill(-1);
        let a: unknown;
        let b: unknown;
        try {
          bulk.temperatureFromEmfArray(type, input, ours);
        } catch (error) {
          a = error;
        }
        try {
          rootInverseArray(type, input, theirs);
        } catch (error) {
          b = error;
        }
        expect([type, edge, (a as Error | undefined)?.message]).toEqual([type, edge, (b as Error | undefined)?.message]);
        for (let i = 0; i < 256; i++) expect(Object.is(ours[i], theirs[i])).toBe(true);
      }
    }
  });

  it("refuses a plain array, a short output array and an unknown type", () => {
    expect(thrown(() => bulk.emfFromTemperatureArray("K", [1, 2] as unknown as Float64Array))).toMatchObject({ code: "INVALID_OPTION", quantity: "temperatures" });
    expect(thrown(() => bulk.temperatureFromEmfArray("K", new Float64Array(3), new Float64Array(2)))).toMatchObject({ code: "INVALID_OPTION", quantity: "output array" });
    expect(thrown(() => bulk.emfFromTemperatureArray("Q" as "K", new Float64Array(1)))).toMatchObject({ code: "UNKNOWN_TYPE" });
  });
});

describe("hotjunction/bulk without WebAssembly", () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.resetModules();
  });

  async function freshEntry(): Promise<typeof bulk> {
    vi.resetModules();
    return (await import("../../src/bulk/index.js")) as typeof bulk;
  }

  function compareAllTypes(entry: typeof bulk): void {
    for (const type of thermocoupleTypes) {
      const r = temperatureRange(type);
      const t = Float64Array.from({ length: 3001 }, (_, i) => r.minC + ((r.maxC - r.minC) * i) / 3000);
      expect(Array.from(entry.emfFromTemperatureArray(type, t))).toEqual(Array.from(rootForwardArray(type, t)));
      const lo = r.unambiguousFromC > r.minC ? 1e-6 : r.minEmfMillivolts;
      const e = Float64Array.from({ length: 3001 }, (_, i) => lo + ((r.maxEmfMillivolts - lo) * i) / 3000);
      expect(Array.from(entry.temperatureFromEmfArray(type, e))).toEqual(Array.from(rootInverseArray(type, e)));
    }
  }

  it("no WebAssembly global: the JavaScript loops, same results for every type", async () => {
    vi.stubGlobal("WebAssembly", undefined);
    const entry = await freshEntry();
    expect(entry.bulkBackend()).toBe("javascript");
    compareAllTypes(entry);
  });

  it("WebAssembly without SIMD (the module does not validate): the JavaScript loops", async () => {
    vi.stubGlobal("WebAssembly", { ...WebAssembly, validate: () => false });
    const entry = await freshEntry();
    expect(entry.bulkBackend()).toBe("javascript");
    compareAllTypes(entry);
  });

  it("a Math.exp that differs from the kernel's e^x: type K forward on the JavaScript path, same results", async () => {
    const engineExp = Math.exp;
    // A stand-in for an engine whose e^x is not fdlibm's: one ulp up at every argument.
    vi.spyOn(Math, "exp").mockImplementation((x) => {
      const y = engineExp(x);
      return y === 0 ? y : y * (1 + 2 ** -52);
    });
    try {
      const entry = await freshEntry();
      const kernelModule = await import("../../src/bulk/wasmKernel.js");
      expect(entry.bulkBackend()).toBe("webassembly-simd");
      expect(kernelModule._bulkKernel()?.expMatchesEngine).toBe(false);
      const t = Float64Array.from({ length: 2000 }, (_, i) => (1372 * i) / 1999);
      expect(Array.from(entry.emfFromTemperatureArray("K", t))).toEqual(Array.from(rootForwardArray("K", t)));
    } finally {
      vi.restoreAllMocks();
    }
  });
});
