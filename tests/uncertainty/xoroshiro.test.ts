/**
 * Our resettable xoroshiro128+ against the general-purpose reference library pure-rand 8 (its
 * `xoroshiro128plus`, `xoroshiro128plusFromState`, `jump` and `uniformFloat64`): the same bits, draw for draw,
 * over many seeds, after jumps and after resets. The generator itself is Blackman & Vigna's xoroshiro128+.
 */
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus, xoroshiro128plusFromState } from "pure-rand/generator/xoroshiro128plus";
import { describe, expect, it } from "vitest";
import { _Xoroshiro128Plus } from "../../src/uncertainty/_xoroshiro128plus.js";

const seeds = [0, 1, -1, 3, 5, 42, 2 ** 31 - 1, -(2 ** 31), 123_456_789, 0x7f3a_1c2d];

describe("xoroshiro128+ (own copy) against pure-rand", () => {
  it("seeding, raw draws and uniform doubles are the same bits for many seeds", () => {
    for (const seed of seeds) {
      const ours = new _Xoroshiro128Plus().seed(seed);
      const theirs = xoroshiro128plus(seed);
      expect(ours.getState()).toEqual([...theirs.getState()]);
      for (let i = 0; i < 2000; i++) {
        if (i % 3 === 0) expect(ours.next()).toBe(theirs.next());
        else expect(Object.is(ours.uniform(), uniformFloat64(theirs))).toBe(true);
      }
      expect(ours.getState()).toEqual([...theirs.getState()]);
    }
  });

  it("jumps and resets to a saved state give the same streams", () => {
    for (const seed of seeds) {
      const theirs = xoroshiro128plus(seed);
      const ours = new _Xoroshiro128Plus().seed(seed);
      for (let j = 0; j < 5; j++) {
        theirs.jump();
        ours.jump();
        expect(ours.getState()).toEqual([...theirs.getState()]);
        const saved = ours.getState();
        const reset = new _Xoroshiro128Plus().seed(7).setState(saved);
        const fromState = xoroshiro128plusFromState(saved);
        for (let i = 0; i < 100; i++) expect(Object.is(reset.uniform(), uniformFloat64(fromState))).toBe(true);
      }
    }
  });
});
