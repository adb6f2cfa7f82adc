// Every JSON block of docs/guides/design-file.md is valid: each block's sections, put onto a starter file of the
// matching detector, pass validateDesign.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { validateDesign } from "../../src/design/parseDesign.js";
import { starterDesign } from "../../src/design/starterDesigns.js";

const guide = readFileSync(new URL("../../docs/guides/design-file.md", import.meta.url), "utf8");
const blocks = [...guide.matchAll(/```json\n([\s\S]*?)```/g)].map((m) => m[1] as string);

describe("docs/guides/design-file.md JSON blocks", () => {
  it("has a block for every section kind", () => {
    const keys = new Set(blocks.flatMap((b) => Object.keys(JSON.parse(b) as object)));
    for (const k of ["setpoints", "thermocouple", "coldJunction", "amplifier", "comparator", "reference", "resistors", "ambient", "analysis"]) {
      expect(keys.has(k), k).toBe(true);
    }
  });

  it.each(blocks.map((b, i) => [i, b] as const))("block %i validates on a starter file", (_i, block) => {
    const sections = JSON.parse(block) as Record<string, unknown>;
    const amplifier = sections["amplifier"] as { kind?: string } | undefined;
    const base = starterDesign(amplifier?.kind === "voltage" || sections["coldJunction"] !== undefined ? "ladder" : "divider") as Record<string, unknown>;
    expect(() => validateDesign({ ...base, ...sections })).not.toThrow();
  });
});
