// One name per threshold resistor, by position (top, ladder 1 … in order from the reference, bottom; "divider n …"
// when a design has several networks), in every report: check's build sheet and bill of materials (text and JSON)
// and faults' text, JSON and CSV. Before, check counted from 1 at the top and faults from 0 ("divider resistor 0
// (…, top)", "middle"). The names come from one function, resistorPositionNames.
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { resistorDesignator, resistorPositionNames } from "../../src/chain/resistorPositions.js";
import { projectRoot, run, tempDir } from "../cli/helpers.js";

const kiln = join(projectRoot, "examples/ceramic-kiln-cutout.json");

interface Names {
  readonly check: string[];
  readonly faultsText: string[];
  readonly faultsJson: string[];
  readonly faultsCsv: string[];
}

/** The resistor names each report prints for one design file (check: bill of materials, build-sheet resistors). */
async function namesOf(path: string, cwd: string): Promise<{ names: Names; checkJson: { buildSheet: { networks: { resistors: { designator: string; ohms: number }[] }[]; parts: { designators: string; part: string }[] } } }> {
  const checkJson = JSON.parse((await run(["check", path, "--json", "--trials", "200", "--report-only"], cwd)).stdout);
  const check = checkJson.buildSheet.networks.flatMap((n: { resistors: { designator: string }[] }) => n.resistors.map((r) => r.designator));
  const text = (await run(["faults", path], cwd)).stdout;
  const json = JSON.parse((await run(["faults", path, "--json"], cwd)).stdout);
  const csv = (await run(["faults", path, "--csv"], cwd)).stdout;
  const named = (description: string): string => (description.match(/^(.*) resistor of the threshold divider/) as RegExpMatchArray)[1] as string;
  const unique = (xs: string[]): string[] => [...new Set(xs)];
  const faultsJson = unique(
    json.reviews.flatMap((rv: { rows: { element: string; description: string }[] }) => rv.rows.filter((r) => r.element === "divider").map((r) => named(r.description))),
  );
  const faultsText = unique([...text.matchAll(/^\s+(.*) resistor of the threshold divider \(/gm)].map((m) => m[1] as string));
  const faultsCsv = unique(csv.split("\n").filter((l) => l.includes(",divider,")).map((l) => named(l.slice(l.lastIndexOf(",") + 1))));
  return { names: { check: unique(check), faultsText, faultsJson, faultsCsv }, checkJson };
}

describe("resistor names by position, the same in check and faults", () => {
  it("the kiln's three-resistor ladder: top, ladder 1, bottom in check (build sheet and bill of materials) and faults text/JSON/CSV", async () => {
    const { names, checkJson } = await namesOf(kiln, projectRoot);
    const expected = resistorPositionNames(3);
    expect(expected).toEqual(["top", "ladder 1", "bottom"]);
    expect(names.check).toEqual(expected);
    expect(names.faultsText).toEqual(expected);
    expect(names.faultsJson).toEqual(expected);
    expect(names.faultsCsv).toEqual(expected);
    const bom = checkJson.buildSheet.parts.filter((p) => p.part === "resistor" && !p.designators.startsWith("mid-rail") && !p.designators.startsWith("shunt")).map((p) => p.designators);
    expect(bom).toEqual(expected);
    // the fault ids keep the index from the reference (0 = top) as their stable key (failure data maps onto it)
    const json = JSON.parse((await run(["faults", kiln, "--json"])).stdout);
    const row = json.reviews[0].rows.find((r: { faultId: string }) => r.faultId === "divider.resistor2.open");
    expect(row.description).toMatch(/^bottom resistor of the threshold divider \(\d+ Ω\) open$/);
  });

  it("a divider per setpoint (two networks): divider 1 top … divider 2 bottom, in check and in each setpoint's fault review", async () => {
    const dir = tempDir();
    const design = JSON.parse(readFileSync(kiln, "utf8"));
    design.resistors.topology = "separate";
    delete design.dynamics;
    writeFileSync(join(dir, "kiln-separate.json"), JSON.stringify(design));
    const { names } = await namesOf("kiln-separate.json", dir);
    const expected = [0, 1].flatMap((n) => [0, 1].map((i) => resistorDesignator(i, 2, n, 2)));
    expect(expected).toEqual(["divider 1 top", "divider 1 bottom", "divider 2 top", "divider 2 bottom"]);
    expect(names.check).toEqual(expected);
    expect(names.faultsText).toEqual(expected);
    expect(names.faultsJson).toEqual(expected);
    expect(names.faultsCsv).toEqual(expected);
  });
});
