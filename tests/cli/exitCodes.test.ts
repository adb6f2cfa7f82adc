/**
 * The CLI's exit codes (one table in cliError.ts, printed by --help and in the README) and the regressions of
 * the CLI bugs found by a new user: `table` with half an ADC chain printed "NaN V" (and its ADC full scale is
 * `--full-scale-volts`, the library's name, with `--reference-volts` kept as a deprecated alias), `table` advised options that
 * do not exist, `compare`/`faults` offered `--svg` and then refused it (both draw a chart now), `sweep` accepted steps its output
 * cannot show; and `check`/`compare` exit 3 when the design fails its margins (for CI gates) unless
 * `--report-only`.
 */
import { execFileSync } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { exitCodes, marginFailExitCode } from "../../src/cli/cliError.js";
import { _createProgram } from "../../src/cli/program.js";
import { oneLine, projectRoot, run, tempDir } from "./helpers.js";

const reflow = join(projectRoot, "examples/reflow-oven-trip.json");
const enclosure = join(projectRoot, "examples/heated-enclosure-adc.json");

/** The reflow example with its own reference swapped for the ±4 % 5 V rail (which fails the margins). */
function failingComparatorDesign(dir: string): string {
  const design = JSON.parse(readFileSync(reflow, "utf8"));
  const rail = design.referenceAlternatives.find((r: { name: string }) => r.name.startsWith("5 V regulator"));
  design.referenceAlternatives = [design.reference];
  design.reference = rail;
  const path = join(dir, "failing-oven.json");
  writeFileSync(path, JSON.stringify(design, null, 2));
  return path;
}

/** The enclosure example with the normal limit moved up to 89 °C: the 90 °C firmware trip band reaches below it. */
function failingAdcDesign(dir: string): string {
  const design = JSON.parse(readFileSync(enclosure, "utf8"));
  for (const s of design.setpoints) s.maxNormalOperatingC = 89;
  const path = join(dir, "failing-enclosure.json");
  writeFileSync(path, JSON.stringify(design, null, 2));
  return path;
}

describe("exit codes", () => {
  it("--help prints the table of cliError.ts, and the README carries the same table", async () => {
    const help = (await run(["--help"])).stdout;
    for (const { code, meaning } of exitCodes) expect(help).toContain(`  ${code}  ${meaning}`);
    const readme = readFileSync(join(projectRoot, "README.md"), "utf8");
    const rows = [...readme.matchAll(/^\| (\d) \| (.+) \|$/gm)].map((m) => ({ code: Number(m[1]), meaning: (m[2] as string).replace(/`/g, "") }));
    expect(rows).toEqual(exitCodes.map((e) => ({ code: e.code, meaning: e.meaning })));
    expect(exitCodes.map((e) => e.code)).toEqual([0, 1, 2, 3]);
  });

  it("each code is what the CLI returns: 0 success, 1 unreadable input, 2 usage, 3 margins failed", async () => {
    const dir = tempDir();
    execFileSync("mkfifo", [join(dir, "fifo.json")]);
    expect((await run(["emf", "K", "500"])).code).toBe(0);
    const missing = await run(["check", "nope.json"], dir);
    expect(missing.code).toBe(1);
    expect(oneLine(missing.stderr)).toBe("hotjunction: nope.json: cannot read: no such file");
    expect((await run(["validate", "fifo.json"], dir)).code).toBe(1);
    expect((await run(["emf", "K", "abc"])).code).toBe(2);
    expect((await run(["check", failingComparatorDesign(dir), "--trials", "200"])).code).toBe(marginFailExitCode);
  });

  it("check: a failing comparator or ADC design exits 3 with the report still printed or written; --report-only exits 0", async () => {
    const dir = tempDir();
    for (const path of [failingComparatorDesign(dir), failingAdcDesign(dir)]) {
      const failed = await run(["check", path, "--trials", "200"], dir);
      expect(failed.code, path).toBe(3);
      expect(failed.stdout).toMatch(/— FAIL/);
      expect(failed.stdout).toContain("do not certify a safety function");
      expect(oneLine(failed.stderr)).toBe(`hotjunction: ${path}: the design fails its margins (exit 3; --report-only exits 0)`);
      const reportOnly = await run(["check", path, "--trials", "200", "--report-only"], dir);
      expect(reportOnly.code).toBe(0);
      expect(reportOnly.stdout).toBe(failed.stdout);
      expect(reportOnly.stderr).toBe("");
    }
    const written = await run(["check", failingComparatorDesign(dir), "--trials", "200", "--json", "--out", "r.json"], dir);
    expect(written.code).toBe(3);
    expect(JSON.parse(readFileSync(join(dir, "r.json"), "utf8")).pass).toBe(false);
    // Passing designs exit 0.
    for (const path of [reflow, enclosure]) expect((await run(["check", path, "--trials", "200"])).code).toBe(0);
  });

  it("compare exits 3 when the design's own reference fails, 0 when it passes (alternatives may fail)", async () => {
    const dir = tempDir();
    const failing = await run(["compare", failingComparatorDesign(dir), "--trials", "200"], dir);
    expect(failing.code).toBe(3);
    expect(failing.stdout).toContain("INADEQUATE");
    expect(oneLine(failing.stderr)).toMatch(/the design's own reference \(5 V regulator rail, ±4 %\) fails its margins \(exit 3; --report-only exits 0\)$/);
    expect((await run(["compare", failingComparatorDesign(dir), "--trials", "200", "--report-only"], dir)).code).toBe(0);
    // The reflow example's own 2.5 V shunt reference passes; its 5 V rail alternative does not.
    const passing = await run(["compare", reflow, "--trials", "200"]);
    expect(passing.stdout).toContain("INADEQUATE");
    expect(passing.code).toBe(0);
  });
});

describe("regressions of the CLI bugs", () => {
  it("table with --gain but no --full-scale-volts: one line naming what is missing, never NaN", async () => {
    const base = ["table", "K", "--kind", "adcCodeToTemperature", "--from", "0", "--to", "400", "--max-error", "0.1"];
    const cases: [string[], string][] = [
      [["--gain", "100"], "hotjunction: --kind adcCodeToTemperature needs --gain, --full-scale-volts and --bits; missing --full-scale-volts, --bits"],
      [["--gain", "100", "--bits", "16"], "hotjunction: --kind adcCodeToTemperature needs --gain, --full-scale-volts and --bits; missing --full-scale-volts"],
      [[], "hotjunction: --kind adcCodeToTemperature needs --gain, --full-scale-volts and --bits; missing --gain, --full-scale-volts, --bits"],
    ];
    for (const [extra, message] of cases) {
      const result = await run([...base, ...extra]);
      expect(result.code).toBe(2);
      expect(oneLine(result.stderr)).toBe(message);
      expect(result.stderr).not.toContain("NaN");
    }
    const wrongKind = await run(["table", "K", "--kind", "emfToTemperature", "--from", "0", "--to", "400", "--max-error", "0.1", "--gain", "100"]);
    expect(wrongKind.code).toBe(2);
    expect(oneLine(wrongKind.stderr)).toMatch(/apply to the ADC kinds only/);
    // The complete chain builds (the example of `table --help`; from 25 °C, since the ADC reads no negative EMF).
    const ok = await run(["table", "K", "--kind", "adcCodeToTemperature", "--from", "25", "--to", "400", "--max-error", "0.1", "--gain", "100", "--full-scale-volts", "2.5", "--bits", "16", "--cold-junction", "25", "--format", "csv"]);
    expect(ok.code).toBe(0);
  });

  it("table --reference-volts, the deprecated name of --full-scale-volts, gives the same table until 0.2; both given must agree", async () => {
    const base = ["table", "K", "--kind", "adcCodeToTemperature", "--from", "25", "--to", "400", "--max-error", "0.1", "--gain", "100", "--bits", "16", "--cold-junction", "25", "--format", "csv"];
    const current = await run([...base, "--full-scale-volts", "2.5"]);
    const former = await run([...base, "--reference-volts", "2.5"]);
    const both = await run([...base, "--reference-volts", "2.5", "--full-scale-volts", "2.5"]);
    expect(current.code).toBe(0);
    expect(former.code).toBe(0);
    expect(former.stdout).toBe(current.stdout);
    expect(both.stdout).toBe(current.stdout);
    // A different full scale gives a different table (the option is read, not ignored).
    expect((await run([...base, "--reference-volts", "3.3"])).stdout).not.toBe(current.stdout);
    const conflict = await run([...base, "--reference-volts", "2.5", "--full-scale-volts", "3.3"]);
    expect(conflict.code).toBe(2);
    expect(oneLine(conflict.stderr)).toBe("hotjunction: --full-scale-volts 3.3 and the deprecated --reference-volts 2.5 differ; give --full-scale-volts only");
    const help = await run(["table", "--help"]);
    expect(help.stdout).toMatch(/--full-scale-volts <V>\s+ADC kinds: ADC full-scale \(reference\) voltage/);
    expect(help.stdout).not.toMatch(/^ +--reference-volts/m);
    expect(help.stdout).toContain("--reference-volts, the former name of --full-scale-volts, is accepted until 0.2.");
  });

  it("table's advice names only options the command has", async () => {
    const program = await _createProgram({ writeOut: () => undefined, writeErr: () => undefined, stderrIsTty: false, cwd: projectRoot }, "table");
    const table = program.commands.find((c) => c.name() === "table");
    const known = new Set((table?.options ?? []).map((o) => o.long));
    expect(known.has("--max-breakpoints")).toBe(true);
    const failing = [
      ["table", "K", "--kind", "emfToTemperature", "--from", "0", "--to", "400", "--max-error", "0.000001"],
      ["table", "K", "--kind", "emfToTemperature", "--from", "0", "--to", "400", "--max-error", "0.1", "--max-breakpoints", "2"],
      ["table", "K", "--kind", "emfToTemperature", "--from", "0", "--to", "5000", "--max-error", "0.1"],
    ];
    for (const args of failing) {
      const result = await run(args);
      expect(result.code, args.join(" ")).toBe(2);
      const line = oneLine(result.stderr);
      const named = [...line.matchAll(/--[a-z][a-z-]*/g)].map((m) => m[0]);
      for (const option of named) expect(known.has(option), `${option} in: ${line}`).toBe(true);
      // No names of the library's options objects (camelCase), no advice about output scales the command lacks.
      expect(line).not.toMatch(/\b(maxErrorOutputUnits|maxBreakpoints|minC|maxC|referenceVolts|offsetMillivolts)\b/);
      expect(line).not.toMatch(/output scale|float output/);
    }
  });

  it("compare, check, sweep and faults (the PFDavg chart, with failure data) offer --svg, and compare's works", async () => {
    // compare offered --svg and refused it; it now draws the options' bands (tests/report/comparisonChart.test.ts).
    const dir = tempDir();
    const drawn = await run(["compare", reflow, "--svg", join(dir, "x.svg"), "--trials", "200"]);
    expect(drawn.code).toBe(0);
    expect(readFileSync(join(dir, "x.svg"), "utf8").startsWith("<svg")).toBe(true);
    for (const command of ["compare", "check", "sweep", "faults"]) {
      const help = (await run([command, "--help"])).stdout;
      expect(help, command).toContain("--svg <file>");
      expect(help).toContain("allow --out/--svg to replace");
    }
  });

  it("sweep refuses a step its output cannot show, naming the smallest; steps at the limit print distinct rows up to --to", async () => {
    const tiny = await run(["sweep", enclosure, "--from", "100", "--to", "100.000000001", "--step", "1e-12", "--csv"]);
    expect(tiny.code).toBe(2);
    expect(oneLine(tiny.stderr)).toBe(
      "hotjunction: --step 1e-12 °C is finer than the csv output shows from 100 to 100.000000001 °C; the smallest step is 1e-9 °C",
    );
    const text = await run(["sweep", enclosure, "--from", "20", "--to", "20.5", "--step", "0.05"]);
    expect(text.code).toBe(2);
    expect(oneLine(text.stderr)).toBe("hotjunction: --step 0.05 °C is finer than the text output shows from 20 to 20.5 °C; the smallest step is 0.1 °C");
    // At the smallest step the CSV rows are distinct and end at --to (12 significant digits: 100.000000001 = 100 + 1e-9).
    const edge = await run(["sweep", enclosure, "--from", "100", "--to", "100.000000003", "--step", "1e-9", "--csv", "--trials", "100"]);
    expect(edge.code).toBe(0);
    const temperatures = [...new Set(edge.stdout.split("\n").filter((l) => /^100/.test(l)).map((l) => l.split(",")[0]))];
    expect(temperatures).toEqual(["100", "100.000000001", "100.000000002", "100.000000003"]);
    const tenths = await run(["sweep", enclosure, "--from", "20", "--to", "20.3", "--step", "0.1", "--trials", "100"]);
    expect(tenths.code).toBe(0);
    for (const t of ["20.0", "20.1", "20.2", "20.3"]) expect(tenths.stdout).toMatch(new RegExp(`^\\s*${t.replace(".", "\\.")}\\s`, "m"));
  });
});
