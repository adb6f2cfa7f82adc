/**
 * xoroshiro128+ (Blackman & Vigna) with a resettable state, and 53-bit uniform doubles from it: the same
 * bits as pure-rand 8's `xoroshiro128plus`, `xoroshiro128plusFromState`, `jump` and
 * `uniformFloat64` (state as four signed 32-bit words [s01, s00, s11, s10], seeding `(-1, ~seed, seed | 0, 0)`,
 * a uniform double from two draws: (x₁ & 2²⁶−1)·2⁻²⁶ + (x₂ & 2²⁷−1)·2⁻⁵³). One object per sampler, reset
 * for every block, instead of a new generator per block; tests/uncertainty/xoroshiro.test.ts compares it
 * with pure-rand draw for draw.
 * @internal
 * @module
 */

/** @internal */
export class _Xoroshiro128Plus {
  s01 = 0;
  s00 = 0;
  s11 = 0;
  s10 = 0;

  /** Resets the state to a saved one ([s01, s00, s11, s10]). */
  setState(state: readonly number[]): this {
    this.s01 = (state[0] as number) | 0;
    this.s00 = (state[1] as number) | 0;
    this.s11 = (state[2] as number) | 0;
    this.s10 = (state[3] as number) | 0;
    return this;
  }

  /** The state as [s01, s00, s11, s10]. */
  getState(): number[] {
    return [this.s01, this.s00, this.s11, this.s10];
  }

  /** Seeds as pure-rand's `xoroshiro128plus(seed)`. */
  seed(seed: number): this {
    return this.setState([-1, ~seed, seed | 0, 0]);
  }

  /** The next 32-bit output (signed). */
  next(): number {
    const s00 = this.s00;
    const s01 = this.s01;
    const out = (s00 + this.s10) | 0;
    const a0 = this.s10 ^ s00;
    const a1 = this.s11 ^ s01;
    this.s00 = (s00 << 24) ^ (s01 >>> 8) ^ a0 ^ (a0 << 16);
    this.s01 = (s01 << 24) ^ (s00 >>> 8) ^ a1 ^ ((a1 << 16) | (a0 >>> 16));
    this.s10 = (a1 << 5) ^ (a0 >>> 27);
    this.s11 = (a0 << 5) ^ (a1 >>> 27);
    return out;
  }

  /** A uniform double in [0, 1), a multiple of 2⁻⁵³ (two draws). */
  uniform(): number {
    const high = this.next() & 67108863;
    const low = this.next() & 134217727;
    return high * 1.4901161193847656e-8 + low * 1.1102230246251565e-16;
  }

  /** Advances by 2⁶⁴ draws (the jump polynomial of xoroshiro128+, as four 32-bit words). */
  jump(): this {
    const jumps = [3639956645, 3750757012, 1261568508, 386426335];
    let n01 = 0;
    let n00 = 0;
    let n11 = 0;
    let n10 = 0;
    for (let i = 0; i < 4; i++) {
      const word = jumps[i] as number;
      for (let mask = 1; mask; mask <<= 1) {
        if (word & mask) {
          n01 ^= this.s01;
          n00 ^= this.s00;
          n11 ^= this.s11;
          n10 ^= this.s10;
        }
        this.next();
      }
    }
    this.s01 = n01;
    this.s00 = n00;
    this.s11 = n11;
    this.s10 = n10;
    return this;
  }
}
