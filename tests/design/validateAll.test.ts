// `validate` lists every problem of a file at once, each with its path, what was expected and what was found.
import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { validateDesign } from "../../src/design/parseDesign.js";
import { DesignFileError } from "../../src/design/designFileError.js";
import { starterDesign } from "../../src/design/starterDesigns.js";
import { run, tempDir } from "../cli/helpers.js";

function broken(): Record<string, unknown> {
  const d = structuredClone(starterDesign("divider")) as Record<string, Record<string, unknown>>;
  (d["thermocouple"] as Record<string, unknown>)["type"] = "Q";
  (d["ambient"] as Record<string, unknown>)["minC"] = "cold";
  (d["resistors"] as Record<string, unknown>)["toleranc"] = 1;
  return d;
}

describe("every problem at once", () => {
  it("the error carries all three problems with their paths", () => {
    let caught: unknown;
    try {
      validateDesign(broken(), { fileName: "bad.json" });
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(DesignFileError);
    const problems = (caught as DesignFileError).problems;
    expect(problems.map((p) => p.path).sort()).toEqual(["ambient.minC", "resistors", "thermocouple.type"]);
    expect(problems.find((p) => p.path === "ambient.minC")?.problem).toBe('expected a number, found "cold"');
    expect(problems.find((p) => p.path === "thermocouple.type")?.problem).toMatch(/^expected one of "B", .*found "Q"$/);
  });

  it("validate prints one line per problem, then the summary, and exits 2", async () => {
    const dir = tempDir();
    writeFileSync(join(dir, "bad.json"), JSON.stringify(broken()));
    const r = await run(["validate", "bad.json"], dir);
    expect(r.code).toBe(2);
    const lines = r.stderr.trim().split("\n");
    expect(lines[0]).toBe("hotjunction: bad.json: 3 problems:");
    expect(lines.slice(1, 4).some((l) => l === '  at ambient.minC: expected a number, found "cold"')).toBe(true);
    expect(lines[4]).toMatch(/\(and 2 more problems\)$/);
  });
});
