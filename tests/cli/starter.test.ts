// `starter` writes a design file per topology that validates and checks, with a note for every section it fills.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { run, tempDir } from "./helpers.js";

describe("hotjunction starter", () => {
  it.each(["divider", "ladder", "adc"])("--topology %s: passes validate and check, every section has a note", async (topology) => {
    const dir = tempDir();
    const written = await run(["starter", "--topology", topology, "--out", "d.json"], dir);
    expect(written.code).toBe(0);
    const design = JSON.parse(readFileSync(join(dir, "d.json"), "utf8")) as Record<string, unknown> & { sectionNotes: Record<string, string> };
    const sections = Object.keys(design).filter((k) => !["$schema", "hotjunctionDesign", "name", "notes", "sectionNotes", "processLimits"].includes(k));
    for (const s of sections) expect(typeof design.sectionNotes[s], `note for ${s}`).toBe("string");
    const validated = await run(["validate", "d.json"], dir);
    expect(validated.code).toBe(0);
    expect(validated.stdout).toMatch(/valid design/);
    const checked = await run(["check", "d.json", "--trials", "300", "--json"], dir);
    expect(checked.stderr).toBe("");
    expect(checked.code).toBe(0);
    expect(JSON.parse(checked.stdout).pass).toBe(true);
    if (topology === "ladder") expect(JSON.parse(checked.stdout).buildSheet.networks[0].resistors).toHaveLength(4);
  });

  it("refuses an unknown topology with the choices", async () => {
    const r = await run(["starter", "--topology", "bridge"]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/divider, ladder, adc/);
  });
});
