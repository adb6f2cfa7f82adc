/**
 * Regression found by tests/contract: classifyFaultShift without an input object threw "Cannot read properties
 * of undefined"; it is a typed error naming the options.
 */
import { describe, expect, it } from "vitest";
import { classifyFaultShift, isHotjunctionError } from "../../src/index.js";

describe("classifyFaultShift input", () => {
  it.each([undefined, null, 7, "shift"])("classifyFaultShift(%s) is a typed error", (input) => {
    let error: unknown;
    try {
      classifyFaultShift(input as never);
    } catch (e) {
      error = e;
    }
    expect(isHotjunctionError(error), String(error)).toBe(true);
    expect((error as Error).message).toMatch(/^classifyFaultShift: options .* is not an options object/);
  });
});
