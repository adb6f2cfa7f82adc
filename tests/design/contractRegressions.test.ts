/**
 * Regressions found by tests/contract: a design-file path that is not a string, and design objects that are
 * missing, are typed errors (they were Node's ERR_INVALID_ARG_TYPE and "Cannot read properties of undefined").
 */
import { describe, expect, it } from "vitest";
import { isHotjunctionError } from "../../src/errors.js";
import { loadDesignFile, measurementChainFromDesign, referenceOptionFromDesign, tripDesignFromDesign } from "../../src/design/index.js";

function thrown(call: () => unknown): unknown {
  try {
    call();
  } catch (e) {
    return e;
  }
  return undefined;
}

describe("design entry refuses what is not a design", () => {
  it.each([undefined, null, 42, "", {}, ["kiln.json"]])("loadDesignFile(%s) is a typed error naming the path", (path) => {
    const e = thrown(() => loadDesignFile(path as never));
    expect(isHotjunctionError(e), String(e)).toBe(true);
    expect((e as Error).message).toMatch(/design file path .* is not a non-empty string/);
  });

  it.each([
    ["measurementChainFromDesign", () => measurementChainFromDesign(undefined as never)],
    ["measurementChainFromDesign", () => measurementChainFromDesign(null as never)],
    ["tripDesignFromDesign", () => tripDesignFromDesign(undefined as never)],
    ["referenceOptionFromDesign", () => referenceOptionFromDesign(null as never)],
  ])("%s of a missing design is a typed error", (_, call) => {
    const e = thrown(call);
    expect(isHotjunctionError(e), String(e)).toBe(true);
    expect((e as Error).message).toMatch(/(design|reference) .* is not an object/);
  });
});
