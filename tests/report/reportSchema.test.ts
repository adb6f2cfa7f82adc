// The JSON reports of every example against their versioned schema (schema/hotjunction-report.schema.json).
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { _reportJsonSchemaText, _reportSchema } from "../../src/report/_reportSchema.js";
import { projectRoot, run } from "../cli/helpers.js";

const examples = readdirSync(join(projectRoot, "examples")).filter((f) => f.endsWith(".json"));

describe("schema/hotjunction-report.schema.json", () => {
  it("equals the schema generated from the zod definitions (regenerate: npx tsx scripts/writeReportSchema.ts)", () => {
    const committed = readFileSync(join(projectRoot, "schema/hotjunction-report.schema.json"), "utf8");
    expect(committed).toBe(_reportJsonSchemaText());
  });

  it.each(examples)("check, compare and sweep --json of %s match the schema", async (file) => {
    const path = `examples/${file}`;
    const design = JSON.parse(readFileSync(join(projectRoot, path), "utf8")) as { referenceAlternatives?: unknown[] };
    const outputs = [
      await run(["check", path, "--json", "--trials", "200", "--report-only"]),
      await run(["sweep", path, "--json", "--from", "100", "--to", "150", "--step", "50", "--trials", "100"]),
      ...(design.referenceAlternatives !== undefined ? [await run(["compare", path, "--json", "--trials", "200", "--report-only"])] : []),
    ];
    for (const out of outputs) {
      expect(out.stderr).toBe("");
      const parsed = _reportSchema.safeParse(JSON.parse(out.stdout));
      expect(parsed.success ? "" : JSON.stringify(parsed.error.issues.slice(0, 3))).toBe("");
    }
  });

  it("refuses an unknown key inside a build sheet and a missing version", async () => {
    const out = JSON.parse((await run(["check", "examples/reflow-oven-trip.json", "--json", "--trials", "200"])).stdout);
    expect(_reportSchema.safeParse(out).success).toBe(true);
    expect(_reportSchema.safeParse({ ...out, buildSheet: { ...out.buildSheet, extra: 1 } }).success).toBe(false);
    const { reportSchemaVersion: _v, ...unversioned } = out;
    expect(_reportSchema.safeParse(unversioned).success).toBe(false);
  });
});
