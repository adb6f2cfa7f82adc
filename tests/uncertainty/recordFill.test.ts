/**
 * The record fill (`_recordFill`): one store site per input name for the first 32 names, a loop for the rest.
 * Property over 1–40 names, strides 1 and 8192 and every offset kind: the record holds exactly
 * `values[i · stride + at]` under name i, and no other key (common practice, no source: a plain copy).
 */
import { describe, expect, it } from "vitest";
import { _recordFill } from "../../src/uncertainty/_prepare.js";

describe("_recordFill", () => {
  it("copies input i from values[i·stride + at] for 1–40 names (past the 32 own store sites too)", () => {
    for (let n = 1; n <= 40; n++) {
      const names = Array.from({ length: n }, (_, i) => `in.${String(i).padStart(2, "0")}`);
      for (const stride of [1, 8192]) {
        const values = Float64Array.from({ length: n * stride }, (_, k) => k * 0.5 - 3);
        const fill = _recordFill(names, stride);
        const record: Record<string, number> = {};
        for (const name of names) record[name] = 0;
        for (const at of stride === 1 ? [0] : [0, 1, 4095, 8191]) {
          fill(record, values, at);
          expect(Object.keys(record)).toEqual(names);
          names.forEach((name, i) => expect(record[name], `${n} names, stride ${stride}, at ${at}, ${name}`).toBe(values[i * stride + at]));
        }
      }
    }
  });
});
