// The error a call throws, asserted to be of the hotjunction family (the contract regressions' one helper). A call
// that returns fails the test.
import { expect } from "vitest";
import { isHotjunctionError, type HotjunctionError } from "../src/index.js";

export function typedErrorOf(call: () => unknown): HotjunctionError {
  try {
    call();
  } catch (e) {
    expect(isHotjunctionError(e), String(e)).toBe(true);
    return e as HotjunctionError;
  }
  throw new Error("expected a typed error; the call returned");
}
