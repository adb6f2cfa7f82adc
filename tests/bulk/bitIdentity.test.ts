/**
 * `hotjunction/bulk` gives the scalar path's floats, bit for bit (a property over many inputs, plus every
 * sub-range seam and exact-inverse segment edge of every type, ± a few ulps): the scalar `emfFromTemperature` /
 * `temperatureFromEmf` of the root entry are the reference (NIST Monograph 175 reference functions; their accuracy
 * is tested in tests/its90). Also the kernel's e^x against the engine's Math.exp, and published table values
 * (NIST SRD 60, type K) through the kernel.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { bulkBackend, emfFromTemperatureArray, temperatureFromEmfArray } from "../../src/bulk/index.js";
import { _bulkKernel } from "../../src/bulk/wasmKernel.js";
import {
  emfFromTemperature,
  emfFromTemperatureArray as rootForwardArray,
  temperatureFromEmf,
  temperatureFromEmfArray as rootInverseArray,
  temperatureRange,
  thermocoupleData,
  thermocoupleTypes,
  typeK,
  type ThermocoupleType,
} from "../../src/index.js";
import { _compile } from "../../src/its90/compiled.js";
import { _eagerExactInverse } from "../../src/its90/exactInverse.js";

function nextUp(x: number, steps: number): number {
  const f = new Float64Array([x]);
  const b = new BigInt64Array(f.buffer);
  for (let i = 0; i < Math.abs(steps); i++) {
    const up = steps > 0;
    if (f[0] === 0) f[0] = up ? 5e-324 : -5e-324;
    else b[0] = (b[0] as bigint) + ((f[0] as number) > 0 === up ? 1n : -1n);
  }
  return f[0] as number;
}

function sameBits(a: Float64Array, b: Float64Array): number {
  let differ = 0;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) differ++;
  return differ;
}

/** Lowest EMF the bulk inverse accepts without the end tolerance (above 0 mV for type B). */
function lowEmf(type: ThermocoupleType): number {
  const r = temperatureRange(type);
  return r.unambiguousFromC > r.minC ? nextUp(r.minEmfMillivolts, 1) : r.minEmfMillivolts;
}

describe("hotjunction/bulk: backend", () => {
  it("runs on the WebAssembly SIMD kernel in Node 20 (V8)", () => {
    expect(bulkBackend()).toBe("webassembly-simd");
    expect(_bulkKernel()?.expMatchesEngine).toBe(true);
  });

  it("kernel e^x is Math.exp bit for bit over 2,000,000 arguments (V8: fdlibm e_exp.c)", () => {
    const exp = (_bulkKernel() as NonNullable<ReturnType<typeof _bulkKernel>>).exports.exp;
    let differ = 0;
    let seed = 12345;
    for (let i = 0; i < 2_000_000; i++) {
      seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
      const u = seed / 2 ** 32;
      // Type K's term spans −183.5…0; beyond it up to ±703.
      const x = i % 2 === 0 ? -184 * u : 703 * (2 * u - 1) * u ** 4;
      if (!Object.is(exp(x), Math.exp(x))) differ++;
    }
    expect(differ).toBe(0);
  });
});

describe("hotjunction/bulk forward: same bits as the scalar path", () => {
  for (const type of thermocoupleTypes) {
    const data = thermocoupleData(type);
    const r = temperatureRange(type);
    it(`type ${type}: every sub-range, 200 arrays of random length (property)`, () => {
      fc.assert(
        fc.property(
          fc.array(fc.double({ min: r.minC, max: r.maxC, noNaN: true }), { minLength: 1, maxLength: 300 }),
          fc.integer({ min: 0, max: data.forward.length - 1 }),
          fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 0, maxLength: 40 }),
          (mixed, which, inSub) => {
            const sub = data.forward[which] as (typeof data.forward)[number];
            const lo = Math.max(sub.minC, r.minC);
            const hi = Math.min(sub.maxC, r.maxC);
            // Long runs inside one sub-range (the kernel's blocks of four) and mixed elements (its single steps).
            const values = [...inSub.map((u) => lo + u * (hi - lo)), ...mixed, ...inSub.map((u) => hi - u * (hi - lo))];
            const t = Float64Array.from(values);
            const expected = Float64Array.from(values, (x) => emfFromTemperature(type, x));
            const got = emfFromTemperatureArray(type, t);
            return sameBits(got, expected) === 0 && sameBits(got, rootForwardArray(type, t)) === 0;
          },
        ),
        { numRuns: 200, seed: 16 },
      );
    });

    it(`type ${type}: sub-range seams and range ends ± 8 ulps, and 100,000 grid points`, () => {
      const points: number[] = [];
      const ends = [r.minC, r.maxC, ...data.forward.map((f) => f.minC), ...data.forward.map((f) => f.maxC)];
      for (const e of ends) for (let d = -8; d <= 8; d++) points.push(nextUp(e, d));
      const inRange = points.filter((x) => x >= r.minC && x <= r.maxC);
      for (let i = 0; i <= 100_000; i++) inRange.push(r.minC + ((r.maxC - r.minC) * i) / 100_000);
      const t = Float64Array.from(inRange);
      const expected = Float64Array.from(inRange, (x) => emfFromTemperature(type, x));
      expect(sameBits(emfFromTemperatureArray(type, t), expected)).toBe(0);
    });
  }

  it("type K with a made-up exponential term whose argument leaves the kernel's range: elements go to JavaScript, same bits", () => {
    // Not reference data: a1 = −0.01 makes a1·(t − a2)² reach −15,500, beyond the kernel's |x| < 704.
    const data = { ...typeK, exponential: { ...(typeK.exponential as NonNullable<typeof typeK.exponential>), a1: -0.01 } };
    const values = Array.from({ length: 5000 }, (_, i) => (1372 * i) / 4999);
    const t = Float64Array.from(values);
    expect(sameBits(emfFromTemperatureArray(data, t), rootForwardArray(data, t))).toBe(0);
  });

  it("NIST SRD 60 type K table values through the kernel (0 °C 0.000, 100 °C 4.096, 500 °C 20.644, 1000 °C 41.276 mV)", () => {
    const e = emfFromTemperatureArray("K", new Float64Array([0, 100, 500, 1000]));
    expect(Array.from(e, (x) => x.toFixed(3))).toEqual(["0.000", "4.096", "20.644", "41.276"]);
  });

  it("converts in place (out is the input) like the root entry", () => {
    const values = Array.from({ length: 9000 }, (_, i) => -270 + (1642 * i) / 8999);
    const a = Float64Array.from(values);
    emfFromTemperatureArray("K", a, a);
    expect(sameBits(a, rootForwardArray("K", Float64Array.from(values)))).toBe(0);
  });
});

describe("hotjunction/bulk exact inverse: same bits as the scalar path", () => {
  for (const type of thermocoupleTypes) {
    const r = temperatureRange(type);
    const lo = lowEmf(type);
    it(`type ${type}: 200 arrays of random EMFs over the unambiguous range (property)`, () => {
      fc.assert(
        fc.property(
          fc.array(fc.double({ min: lo, max: r.maxEmfMillivolts, noNaN: true }), { minLength: 1, maxLength: 300 }),
          (values) => {
            const e = Float64Array.from(values);
            const expected = Float64Array.from(values, (x) => temperatureFromEmf(type, x));
            const got = temperatureFromEmfArray(type, e);
            return sameBits(got, expected) === 0 && sameBits(got, rootInverseArray(type, e)) === 0;
          },
        ),
        { numRuns: 200, seed: 16 },
      );
    });

    it(`type ${type}: every segment edge and piece start ± 6 ulps, the range ends' tolerance, and 100,000 grid points`, () => {
      const inv = _eagerExactInverse(_compile(thermocoupleData(type)));
      const points: number[] = [];
      for (const p of inv.pieces) {
        for (let j = 0; j <= p.count; j++) for (let d = -6; d <= 6; d++) points.push(nextUp(p.emfStart + j * p.width, d));
      }
      points.push(r.maxEmfMillivolts + 1e-10, r.maxEmfMillivolts + 5e-11);
      if (r.unambiguousFromC === r.minC) points.push(r.minEmfMillivolts - 1e-10);
      for (let i = 0; i <= 100_000; i++) points.push(lo + ((r.maxEmfMillivolts - lo) * i) / 100_000);
      const inside = points.filter((x) => x >= lo - 1e-10 && x <= r.maxEmfMillivolts + 1e-10 && (r.unambiguousFromC === r.minC || x > 0));
      const e = Float64Array.from(inside);
      const expected = Float64Array.from(inside, (x) => rootInverseArray(type, new Float64Array([x]))[0] as number);
      expect(sameBits(temperatureFromEmfArray(type, e), expected)).toBe(0);
    });
  }
});
