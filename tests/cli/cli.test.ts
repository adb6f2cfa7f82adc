import { copyFileSync, existsSync, linkSync, readdirSync, readFileSync, symlinkSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { projectRoot, run, spawnCli, tempDir } from "./helpers.js";

const reflow = join(projectRoot, "examples/reflow-oven-trip.json");

function expectOneLineError(stderr: string): void {
  expect(stderr.endsWith("\n")).toBe(true);
  expect(stderr.trimEnd().split("\n")).toHaveLength(1);
  expect(stderr.startsWith("hotjunction: ")).toBe(true);
}

describe("hotjunction CLI (in-process)", () => {
  it("emf and temp convert per ITS-90 (NIST Monograph 175, type K: 500 °C = 20.644 mV; 25 °C = 1.000 mV)", async () => {
    expect((await run(["emf", "K", "500"])).stdout).toBe("type K at 500 °C, cold junction 0 °C: 20.644 mV\n");
    const json = JSON.parse((await run(["emf", "K", "500", "--cold-junction", "25", "--json"])).stdout);
    expect(json.emfMillivolts).toBeCloseTo(19.644, 3); // 20.644 − 1.000 (NIST Monograph 175 type K table)
    expect((await run(["temp", "K", "19.644", "--cold-junction", "25"])).stdout).toBe(
      "type K, 19.644 mV with cold junction 25 °C: 500.00 °C\n",
    );
    // 212 °F = 100 °C; type J at 100 °C is 5.269 mV (NIST Monograph 175 type J table).
    expect((await run(["emf", "J", "212", "--unit", "F"])).stdout).toBe("type J at 212 °F, cold junction 0 °C: 5.269 mV\n");
    expect((await run(["emf", "K", "-100"])).stdout).toBe("type K at -100 °C, cold junction 0 °C: -3.554 mV\n"); // NIST: −3.554 mV
  });

  it("ref-table prints the published 0.001 mV values (NIST Monograph 175 type K: 100 °C 4.096, 1000 °C 41.276)", async () => {
    const csv = (await run(["ref-table", "K", "--from", "0", "--to", "1000", "--step", "100", "--csv"])).stdout;
    expect(csv.split("\n")).toContain("100,4.096");
    expect(csv.split("\n")).toContain("1000,41.276");
  });

  it("ref-table prints a long table whole (164,201 rows; NIST Monograph 175 type K: −270 °C −6.458 mV, 1372 °C 54.886 mV)", async () => {
    // The text table's column widths were Math.max(...rows): past about 10⁵ rows the call overflowed the stack.
    const text = await run(["ref-table", "K", "--from", "-270", "--to", "1372", "--step", "0.01"]);
    expect(text.code).toBe(0);
    const lines = text.stdout.split("\n");
    expect(lines).toHaveLength(2 + 164_201 + 1);
    expect(lines[2]?.trim().split(/\s+/)).toEqual(["-270", "-6.458"]);
    expect(lines.at(-2)?.trim().split(/\s+/)).toEqual(["1372", "54.886"]);
    // Above the row limit: a typed error with the count and the valid range.
    const tooMany = await run(["ref-table", "K", "--from", "-270", "--to", "1372", "--step", "0.001"]);
    expect(tooMany.code).toBe(2);
    expect(tooMany.stderr).toBe("hotjunction: type K reference table: row count 1642001 is too large; valid range 1 to 200000\n");
  });

  it("usage errors exit 2 with one line", async () => {
    for (const args of [
      [],
      ["bogus"],
      ["emf", "X", "5"],
      ["emf", "K", "abc"],
      ["emf", "K", "NaN"],
      ["emf", "K", "5", "--unit", "R"],
      ["emf", "K", "5000"],
      ["emf", "K", "5", "extra"],
      ["check"],
      ["check", reflow, "--json", "--csv"],
      ["check", reflow, "--trials", "1.5"],
      ["sweep", reflow, "--from", "300", "--to", "200"],
    ]) {
      const result = await run(args);
      expect(result.code, args.join(" ")).toBe(2);
      expect(result.stdout).toBe("");
      expectOneLineError(result.stderr);
    }
  });

  it("an out-of-range value names quantity, value and range", async () => {
    expect((await run(["emf", "K", "5000"])).stderr).toBe(
      "hotjunction: type K: temperature 5000 °C is out of range; valid range -270 to 1372 °C\n",
    );
  });

  it("invalid design files give one line with the path in the file, exit 2", async () => {
    const dir = tempDir();
    const cases: [string, string][] = [
      ["{", "bad.json: not valid JSON at line 1, column 2: expected a key in double quotes, found the end of the file"],
      ['{"__proto__": {}}', 'bad.json: not valid JSON at line 1, column 2: key "__proto__" is not allowed'],
      [readFileSync(reflow, "utf8").replace('"tempcoPpmPerC": 50', '"tempcoPpmPerC": "abc"'), 'bad.json: at reference.tempcoPpmPerC: expected a number, found "abc"'],
    ];
    for (const [text, message] of cases) {
      writeFileSync(join(dir, "bad.json"), text);
      const result = await run(["check", "bad.json"], dir);
      expect(result.code).toBe(2);
      expect(result.stderr).toBe(`hotjunction: ${message}\n`);
    }
    const missing = await run(["check", "nope.json"], dir);
    expect(missing.stderr).toBe("hotjunction: nope.json: cannot read: no such file\n");
  });

  it("--out writes the file, refuses to overwrite without --force, replaces with --force", async () => {
    const dir = tempDir();
    const first = await run(["emf", "K", "500", "--out", "emf.txt"], dir);
    expect(first.code).toBe(0);
    expect(first.stdout).toBe("");
    expect(readFileSync(join(dir, "emf.txt"), "utf8")).toBe("type K at 500 °C, cold junction 0 °C: 20.644 mV\n");
    writeFileSync(join(dir, "keep.txt"), "precious\n");
    const refused = await run(["emf", "K", "500", "--out", "keep.txt"], dir);
    expect(refused.code).toBe(2);
    expect(refused.stderr).toBe("hotjunction: refusing to overwrite keep.txt: it exists (add --force to replace it)\n");
    expect(readFileSync(join(dir, "keep.txt"), "utf8")).toBe("precious\n");
    expect((await run(["emf", "K", "500", "--out", "keep.txt", "--force"], dir)).code).toBe(0);
    expect(readFileSync(join(dir, "keep.txt"), "utf8")).toContain("20.644");
    // Atomic write leaves no temporary files behind.
    expect(readdirSync(dir).sort()).toEqual(["emf.txt", "keep.txt"]);
  });

  it("never writes over an input file, even with --force, through ../, symlinks or hard links", async () => {
    const dir = tempDir();
    copyFileSync(reflow, join(dir, "oven.json"));
    symlinkSync(join(dir, "oven.json"), join(dir, "link.json"));
    linkSync(join(dir, "oven.json"), join(dir, "hard.json"));
    const before = readFileSync(join(dir, "oven.json"), "utf8");
    for (const out of ["oven.json", "./oven.json", `../${dir.split("/").pop()}/oven.json`, "link.json", "hard.json"]) {
      for (const flag of ["--out", "--svg"]) {
        const result = await run(["check", "oven.json", flag, out, "--force", "--trials", "200"], dir);
        expect(result.code, `${flag} ${out}`).toBe(2);
        expect(result.stderr).toBe(`hotjunction: refusing to write ${out}: it is the input file oven.json; choose another output path\n`);
      }
    }
    const same = await run(["check", "oven.json", "--out", "r.txt", "--svg", "./r.txt", "--trials", "200"], dir);
    expect(same.stderr).toBe("hotjunction: refusing to write ./r.txt: the same file is also given as r.txt\n");
    expect(readFileSync(join(dir, "oven.json"), "utf8")).toBe(before);
    expect(existsSync(join(dir, "r.txt"))).toBe(false);
  });

  it("check writes the report and the SVG chart; stderr stays free of progress output off a terminal", async () => {
    const dir = tempDir();
    const result = await run(["check", reflow, "--markdown", "--out", "r.md", "--svg", "bands.svg", "--trials", "500", "--seed", "5"], dir);
    expect(result.code).toBe(0);
    expect(result.stderr).toBe("hotjunction: wrote r.md\nhotjunction: wrote bands.svg\n");
    const markdown = readFileSync(join(dir, "r.md"), "utf8");
    expect(markdown).toContain("do not certify a safety function");
    expect(markdown).toContain("500 trials, seed 5");
    expect(readFileSync(join(dir, "bands.svg"), "utf8").startsWith("<svg")).toBe(true);
  });

  it("every design report format carries the caution and the seed", async () => {
    for (const command of ["check", "compare"]) {
      for (const format of [[], ["--json"], ["--markdown"], ["--csv"]]) {
        const result = await run([command, reflow, "--trials", "300", "--seed", "11", ...format]);
        expect(result.code, `${command} ${format.join(" ")}`).toBe(0);
        expect(result.stdout).toContain("do not certify a safety function");
        expect(result.stdout).toMatch(/seed 11|"seed": 11/);
      }
    }
  });

  it("--help and --version exit 0", async () => {
    const help = await run(["--help"]);
    expect(help.code).toBe(0);
    expect(help.stdout).toContain("Caution: These numbers do not certify a safety function");
    for (const command of ["emf", "temp", "ref-table", "table", "validate", "check", "compare", "sweep", "schema"]) {
      const sub = await run([command, "--help"]);
      expect(sub.code, command).toBe(0);
      expect(sub.stdout).toContain(`Usage: hotjunction ${command}`);
    }
    expect((await run(["--version"])).stdout).toBe(`${JSON.parse(readFileSync(join(projectRoot, "package.json"), "utf8")).version}\n`);
  });

  it("table builds a firmware table through the firmware module; sweep writes its chart", async () => {
    const csv = await run(["table", "K", "--kind", "emfToTemperature", "--from", "0", "--to", "100", "--max-error", "0.5", "--format", "csv"]);
    expect(csv.code).toBe(0);
    expect(csv.stdout.split("\n")[0]).toBe("index,input_stored,output_stored,input_microvolts,output_celsius");
    const dir = tempDir();
    const sweep = await run(
      ["sweep", join(projectRoot, "examples/heated-enclosure-adc.json"), "--from", "20", "--to", "100", "--step", "40", "--csv", "--svg", "e.svg", "--trials", "300"],
      dir,
    );
    expect(sweep.code).toBe(0);
    expect(sweep.stdout.split("\n").filter((l) => l.startsWith("60,"))).toHaveLength(3);
    expect(readFileSync(join(dir, "e.svg"), "utf8")).toContain("true hot-junction temperature, °C");
  });

  it("the schema command prints the committed JSON Schema", async () => {
    expect((await run(["schema"])).stdout).toBe(readFileSync(join(projectRoot, "schema/hotjunction-design.schema.json"), "utf8"));
  });
});

describe("hotjunction binary (child process)", () => {
  it("exit codes and one-line errors through the real entry", () => {
    const ok = spawnCli(["emf", "K", "500"]);
    expect(ok.code).toBe(0);
    expect(ok.stdout).toBe("type K at 500 °C, cold junction 0 °C: 20.644 mV\n");
    const bad = spawnCli(["emf", "K", "5000"]);
    expect(bad.code).toBe(2);
    expectOneLineError(bad.stderr);
    const usage = spawnCli(["check"]);
    expect(usage.code).toBe(2);
    expect(usage.stderr).toBe("hotjunction: missing required argument 'design'\n");
  });

  it("a few fuzzed bad design files through the binary: exit 2, one line, file unchanged", () => {
    const dir = tempDir();
    const texts = ["", "\u0000", "[".repeat(5000), '{"hotjunctionDesign": 1e999}', '{"setpoints": [{"name": "a", "name": "b"}]}'];
    texts.forEach((text, i) => {
      const file = join(dir, `f${i}.json`);
      writeFileSync(file, text);
      const result = spawnCli(["validate", file]);
      expect(result.code).toBe(2);
      expectOneLineError(result.stderr);
      expect(readFileSync(file, "utf8")).toBe(text);
    });
  });
});
