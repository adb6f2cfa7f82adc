/**
 * `hotjunction faults` with a design's failureData: the safety figures in every format, the JSON validated against
 * its published schema for every example with rates, the PFDavg chart, and bad failure data through the design
 * file (each a one-line error with the path). Hand checks name their formulas (IEC 61508-6:2010 Annex B, from
 * memory where not seen).
 */
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { _safetyFiguresJsonSchemaText, safetyFiguresOutputSchema } from "../../src/design/safetyFiguresJsonSchema.js";
import { measurementChainFromDesign, parseDesign, secondChannelDesign } from "../../src/design/index.js";
import { CAUTION_TEXT, faultCatalogue, twoChannelCutout } from "../../src/index.js";
import { oneLine, projectRoot, run } from "./helpers.js";

const examplesDir = join(projectRoot, "examples");
const withRates = readdirSync(examplesDir)
  .filter((f) => f.endsWith(".json"))
  .filter((f) => (JSON.parse(readFileSync(join(examplesDir, f), "utf8")) as { failureData?: unknown }).failureData !== undefined)
  .sort();
const kilnPath = "examples/kiln-two-channel-cutout.json";
const kilnText = readFileSync(join(projectRoot, kilnPath), "utf8");

interface SafetyJson {
  format: string;
  caution: string;
  scope: string;
  certification: string;
  setpoints: {
    name: string;
    lambdaDuFit: number;
    lambdaDdFit: number;
    lambdaTotalFit: number;
    proofTestCoverage: number | null;
    modes: { rateFit: number }[];
    pfdAvg1oo1: { pfdAvg: number; proofTest: { proofTestIntervalHours: number; meanTimeToRestorationHours: number; meanRepairTimeHours: number; missionTimeHours: number | null } } | null;
  }[];
  twoChannel: { channelA: { name: string }; channelB: { name: string }; pfdAvg1oo2: number; beta: number; betaD: number; commonCauseShare: number | null }[];
  curves: { points: { proofTestIntervalHours: number; pfdAvg1oo1: number; pfdAvg1oo2: number | null }[] }[];
}

function withFailureData(edit: (d: { failureData: Record<string, any> }) => void): string {
  const dir = mkdtempSync(join(tmpdir(), "hotjunction-rates-"));
  const d = JSON.parse(kilnText) as { failureData: Record<string, any>; $schema?: string };
  delete d.$schema;
  edit(d);
  const file = join(dir, "kiln.json");
  writeFileSync(file, JSON.stringify(d, null, 2));
  return file;
}

describe("faults with failure data: every format", () => {
  it("finds the examples with rates", () => {
    expect(withRates).toContain("kiln-two-channel-cutout.json");
  });

  it("JSON: the safetyFigures member passes the published schema (strict) for every example with rates; the committed schema file is the generated one", async () => {
    const committed = readFileSync(join(projectRoot, "schema/hotjunction-safety-figures.schema.json"), "utf8");
    expect(committed).toBe(_safetyFiguresJsonSchemaText());
    for (const file of withRates) {
      const { code, stdout } = await run(["faults", join("examples", file), "--json", "--step", "2"]);
      expect(code).toBe(0);
      const data = JSON.parse(stdout) as { format: string; safetyFigures: unknown; secondChannel?: { format: string } };
      expect(data.format).toBe("hotjunction-fault-review/1");
      const parsed = safetyFiguresOutputSchema.safeParse(data.safetyFigures);
      expect(parsed.success, JSON.stringify(parsed.error?.issues.slice(0, 3))).toBe(true);
      // A changed field breaks it: the schema is strict.
      expect(safetyFiguresOutputSchema.safeParse({ ...(data.safetyFigures as object), extra: 1 }).success).toBe(false);
    }
  });

  it("JSON figures agree with the Annex B 1oo1 form with proof-test coverage, computed here by hand", async () => {
    const { stdout } = await run(["faults", kilnPath, "--json", "--step", "2"]);
    const s = (JSON.parse(stdout) as { safetyFigures: SafetyJson }).safetyFigures;
    expect(s.setpoints.length).toBe(4); // two setpoints × two channels
    for (const sp of s.setpoints) {
      // Rates by share add up (common practice, no source).
      expect(sp.lambdaTotalFit).toBeCloseTo(sp.modes.reduce((a, m) => a + m.rateFit, 0), 9);
      const pfd = sp.pfdAvg1oo1;
      if (pfd === null) throw new Error("no PFDavg");
      const { proofTestIntervalHours: t1, meanTimeToRestorationHours: mttr, meanRepairTimeHours: mrt, missionTimeHours: tm } = pfd.proofTest;
      const c = sp.proofTestCoverage as number;
      const du = sp.lambdaDuFit / 1e9;
      const dd = sp.lambdaDdFit / 1e9;
      // IEC 61508-6:2010 Annex B 1oo1 (from memory): PFDavg ≈ λ_DU·PTC·(T1/2 + MRT) + λ_DU·(1 − PTC)·(T_M/2 + MRT) + λ_DD·MTTR.
      const hand = du * c * (t1 / 2 + mrt) + du * (1 - c) * ((tm as number) / 2 + mrt) + dd * mttr;
      expect(pfd.pfdAvg / hand).toBeCloseTo(1, 2);
    }
    // The pair is twoChannelCutout of the two channels' figures (the report's numbers are the library's).
    const pair = s.twoChannel[0];
    const a = s.setpoints[0];
    const b = s.setpoints[2];
    if (pair === undefined || a === undefined || b === undefined || a.pfdAvg1oo1 === null) throw new Error("missing pair");
    const again = twoChannelCutout(
      { lambdaDuFit: a.lambdaDuFit, lambdaDdFit: a.lambdaDdFit, proofTestCoverage: a.proofTestCoverage },
      { lambdaDuFit: b.lambdaDuFit, lambdaDdFit: b.lambdaDdFit, proofTestCoverage: b.proofTestCoverage },
      { beta: 0.05, betaD: 0.02, proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8, missionTimeHours: 175200 } },
    );
    expect(pair.pfdAvg1oo2).toBe(again.pfdAvg1oo2);
    expect(pair.pfdAvg1oo2).toBeLessThan(Math.min(a.pfdAvg1oo1.pfdAvg, (b.pfdAvg1oo1 as { pfdAvg: number }).pfdAvg));
    // The curve passes through the stated interval's point, and is monotone in T1 (common practice, no source).
    const points = s.curves[0]?.points ?? [];
    for (let i = 1; i < points.length; i++) expect((points[i] as { pfdAvg1oo1: number }).pfdAvg1oo1).toBeGreaterThanOrEqual((points[i - 1] as { pfdAvg1oo1: number }).pfdAvg1oo1);
    expect(s.caution).toBe(CAUTION_TEXT);
    expect(s.scope).toMatch(/^Single faults of the modelled elements only/);
    expect(s.scope).toMatch(/supplied by the user/);
    expect(s.certification).toMatch(/no certification/);
  });

  it("the second channel's single faults are reviewed by the same review code (its catalogue, its band)", async () => {
    const { stdout } = await run(["faults", kilnPath, "--json", "--step", "2"]);
    const data = JSON.parse(stdout) as { secondChannel: { format: string; reviews: { healthyBandGiven: boolean; rows: { faultId: string }[] }[] } };
    expect(data.secondChannel.format).toBe("hotjunction-fault-review/1");
    const chain = measurementChainFromDesign(secondChannelDesign(parseDesign(kilnText)));
    const ids = faultCatalogue(chain).map((f) => f.id);
    for (const review of data.secondChannel.reviews) {
      expect(review.rows.map((r) => r.faultId)).toEqual(ids);
      expect(review.healthyBandGiven).toBe(true);
    }
  });

  it("text, Markdown and CSV carry the figures, the scope, the no-certification statement and the caution", async () => {
    const text = (await run(["faults", kilnPath, "--step", "2"])).stdout;
    expect(text).toContain("Safety figures: Ceramic kiln cutout with a second, firmware channel");
    expect(text).toContain("Single-fault review: firmware channel");
    expect(text).toMatch(/PFDavg pair \(1oo2\)\s+\d\.\d\de-\d/);
    expect(text).toContain("second channel buys");
    const md = (await run(["faults", kilnPath, "--markdown", "--step", "2"])).stdout;
    const csv = (await run(["faults", kilnPath, "--csv", "--step", "2"])).stdout;
    expect(csv.split("\n")[0]).toBe("section,name,item,quantity,value,unit");
    expect(csv).toMatch(/^pair,stoneware firing: first channel \+ stoneware firing: firmware channel,,pfdAvg1oo2,\d/m);
    const json = JSON.parse((await run(["faults", kilnPath, "--json", "--step", "2"])).stdout) as { safetyFigures: SafetyJson };
    const csvPair = /^pair,stoneware firing: first channel \+ stoneware firing: firmware channel,,pfdAvg1oo2,([^,]+),/m.exec(csv)?.[1];
    expect(Number(csvPair)).toBe(json.safetyFigures.twoChannel[0]?.pfdAvg1oo2);
    for (const out of [text, md, csv]) {
      expect(out.replace(/\s+/g, " ")).toContain("These numbers do not certify a safety function");
      expect(out.replace(/\s+/g, " ")).toContain("no certification");
      expect(out.replace(/\s+/g, " ")).toContain("rates and mode shares are supplied by the user");
    }
  });

  it("--svg writes the PFDavg chart (log axes, 1oo1 and 1oo2, caution); without a proof test it is refused in one line", async () => {
    const dir = mkdtempSync(join(tmpdir(), "hotjunction-pfd-"));
    const svgPath = join(dir, "pfd.svg");
    const { code } = await run(["faults", kilnPath, "--svg", svgPath, "--step", "2"]);
    expect(code).toBe(0);
    const svg = readFileSync(svgPath, "utf8");
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg).toContain("proof-test interval T1, h (log scale)");
    expect(svg).toContain("PFDavg (log scale)");
    expect((svg.match(/class="curve curve-pfdAvg1oo1"/g) ?? []).length).toBe(2);
    expect((svg.match(/class="curve curve-pfdAvg1oo2"/g) ?? []).length).toBe(2);
    expect(svg).toContain("stated T1 = 8760 h");
    expect(svg).toContain("Caution: These numbers do not certify a safety function.");
    const refused = await run(["faults", "examples/reflow-oven-trip.json", "--svg", join(dir, "none.svg")]);
    expect(refused.code).toBe(2);
    expect(oneLine(refused.stderr)).toMatch(/--svg draws PFDavg against the proof-test interval and needs a failureData section with a proofTest/);
  });

  it("without failure data the output is the fault review alone; --csv gives the fault table with the caution", async () => {
    const { stdout } = await run(["faults", "examples/reflow-oven-trip.json", "--csv", "--step", "2"]);
    expect(stdout.split("\n")[0]).toMatch(/^trip,faultId,element,effect,tripC,shiftC,safety,marginC,detected/);
    expect(stdout).toContain("# CAUTION: These numbers do not certify a safety function.");
    expect(stdout).not.toContain("pfdAvg");
  });
});

describe("bad failure data through the design file: one line with the path", () => {
  const cases: [string, (d: { failureData: Record<string, any> }) => void, RegExp][] = [
    ["a negative rate", (d) => { d.failureData.elements[2].rateFit = -3; }, /at failureData\.elements\[2\]\.rateFit: expected a number ≥ 0, found -3$/],
    ["a rate above 1e9 FIT", (d) => { d.failureData.elements[0].rateFit = 2e9; }, /at failureData\.elements\[0\]\.rateFit: expected a number ≤ 1000000000, found 2000000000$/],
    ["shares that do not sum to one", (d) => { d.failureData.elements[1].modes[0].share = 0.9; }, /at failureData\.elements\[1\]\.modes\[\*\]\.share: 0\.9 is the sum of the shares, not 1; valid range 0\.9999 to 1\.0001$/],
    ["a mode naming a fault that does not exist", (d) => { d.failureData.elements[0].modes[0].faultId = "thermocouple.opn"; }, /at failureData\.elements\[0\]\.modes\[0\]\.faultId: "thermocouple\.opn" names no fault of the catalogue or review$/],
    ["a second-channel mode naming a first-channel-only fault", (d) => { d.failureData.secondChannel.elements[2].modes[0].faultId = "divider.resistor0.open"; }, /at failureData\.secondChannel\.elements\[2\]\.modes\[0\]\.faultId: "divider\.resistor0\.open" names no fault/],
    ["a proof test revealing a fault that does not exist", (d) => { d.failureData.proofTest.revealsFaultIds = ["comparator.stuck"]; }, /at failureData\.proofTest\.revealsFaultIds\[0\]: "comparator\.stuck" names no fault/],
    ["a mode with both faultId and assumed", (d) => { d.failureData.elements[0].modes[0].assumed = { safety: "safe", detected: true }; }, /at failureData\.elements\[0\]\.modes\[0\]: .*needs exactly one of faultId and assumed$/],
    ["β above 1", (d) => { d.failureData.secondChannel.beta = 1.5; }, /at failureData\.secondChannel\.beta: expected a number ≤ 1, found 1\.5$/],
    ["a trip list of the wrong length", (d) => { d.failureData.secondChannel.tripTemperaturesC = [1255]; }, /at failureData\.secondChannel\.tripTemperaturesC: has 1 entries; give one per setpoint \(2\)$/],
  ];
  for (const [what, edit, message] of cases) {
    it(`${what}: faults and validate refuse it with exit 2`, async () => {
      const file = withFailureData(edit);
      for (const command of ["faults", "validate"]) {
        const { code, stderr, stdout } = await run([command, file, "--step", "2"].slice(0, command === "faults" ? 4 : 2));
        expect(code, `${command}: ${stderr}`).toBe(2);
        expect(stdout).toBe("");
        expect(oneLine(stderr)).toMatch(message);
      }
    });
  }

  it("a non-finite rate (1e999 in the file) is refused at its path", async () => {
    const file = withFailureData((d) => { d.failureData.elements[2].rateFit = 123456789; });
    writeFileSync(file, readFileSync(file, "utf8").replace("123456789", "1e999"));
    const { code, stderr } = await run(["validate", file]);
    expect(code).toBe(2);
    expect(oneLine(stderr)).toMatch(/\(at failureData\.elements\[2\]\.rateFit\): number 1e999 is too large$/);
  });

  it("validate lists every fault-id problem at once, each with its path", async () => {
    const file = withFailureData((d) => {
      d.failureData.elements[0].modes[0].faultId = "thermocouple.opn";
      d.failureData.elements[4].modes[1].faultId = "reference.shrt";
    });
    const { code, stderr } = await run(["validate", file]);
    expect(code).toBe(2);
    const lines = stderr.trim().split("\n");
    expect(lines.length).toBe(2);
    expect(lines[0]).toMatch(/at failureData\.elements\[4\]\.modes\[1\]\.faultId: "reference\.shrt" names no fault/);
    expect(lines[1]).toMatch(/at failureData\.elements\[0\]\.modes\[0\]\.faultId: "thermocouple\.opn" names no fault.*\(and 1 more failure-data problem above\)$/);
    const ok = await run(["validate", kilnPath]);
    expect(ok.stdout).toBe(`${kilnPath}: valid design, comparator (hardware) trip, 2 setpoints, failure data for 14 elements in two channels\n`);
  });
});
