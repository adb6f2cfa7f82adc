/**
 * Ascending sort of a Float64Array without NaN (internal): LSD radix sort on the IEEE-754 bit patterns,
 * four passes of 16 bits. Faster than `Float64Array.prototype.sort` from about 10⁵ values warm and 10⁶ in a
 * fresh process (its 65,536-entry counts cost more than a native sort below that: 20,000 values 18 ms cold,
 * 3.7 ms warm, against 1.4 ms; 3 Dec 2026), so shorter arrays take the native sort (the same order: numeric,
 * −0 before +0).
 * @module
 * @internal
 */

/** @internal Sorts `values` in place (no NaN allowed; −0 sorts before +0). */
export function _sortFloat64(values: Float64Array): void {
  const n = values.length;
  if (n < 131_072) {
    values.sort();
    return;
  }
  const words = new Uint32Array(values.buffer, values.byteOffset, 2 * n);
  // Map to unsigned keys whose order is the numeric order: negative → invert all bits, positive → flip the sign bit.
  // Little-endian doubles: word 2i is the low half, 2i + 1 the high half.
  const little = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;
  const loOff = little ? 0 : 1;
  const hiOff = little ? 1 : 0;
  for (let i = 0; i < n; i++) {
    const hi = words[2 * i + hiOff] as number;
    if (hi & 0x80000000) {
      words[2 * i + hiOff] = ~hi >>> 0;
      words[2 * i + loOff] = ~(words[2 * i + loOff] as number) >>> 0;
    } else {
      words[2 * i + hiOff] = (hi | 0x80000000) >>> 0;
    }
  }
  let source: Uint32Array = words;
  let target: Uint32Array = new Uint32Array(2 * n);
  const counts = new Uint32Array(65536);
  for (let pass = 0; pass < 4; pass++) {
    const wordOff = pass < 2 ? loOff : hiOff;
    const shift = (pass & 1) * 16;
    counts.fill(0);
    for (let i = 0; i < n; i++) {
      const digit = ((source[2 * i + wordOff] as number) >>> shift) & 0xffff;
      counts[digit] = (counts[digit] as number) + 1;
    }
    let total = 0;
    for (let b = 0; b < 65536; b++) {
      const c = counts[b] as number;
      counts[b] = total;
      total += c;
    }
    for (let i = 0; i < n; i++) {
      const lo = source[2 * i] as number;
      const hi = source[2 * i + 1] as number;
      const digit = ((wordOff === 0 ? lo : hi) >>> shift) & 0xffff;
      const at = counts[digit] as number;
      counts[digit] = at + 1;
      target[2 * at] = lo;
      target[2 * at + 1] = hi;
    }
    const swap = source;
    source = target;
    target = swap;
  }
  // After four passes the sorted keys are back in `words` (an even number of swaps).
  for (let i = 0; i < n; i++) {
    const hi = words[2 * i + hiOff] as number;
    if (hi & 0x80000000) {
      words[2 * i + hiOff] = (hi & 0x7fffffff) >>> 0;
    } else {
      words[2 * i + hiOff] = ~hi >>> 0;
      words[2 * i + loOff] = ~(words[2 * i + loOff] as number) >>> 0;
    }
  }
}
