/**
 * The package as a consumer gets it: `npm pack`, install the tarball into a scratch project from the npm cache
 * (offline), then use it the ways a user would: ESM `import`, CommonJS `require`, TypeScript under
 * `moduleResolution` node16 and bundler, and the `hotjunction` command through `npx`.
 *
 * Check values: type K, 500 °C -> 20.644 mV; type J, 100 °C -> 5.269 mV; type K, 41.276 mV -> 1000 °C
 * (NIST SRD 60 / NIST Monograph 175 reference tables). Beyond the table values, the installed build must give the
 * same numbers as the sources bit for bit.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { emfFromTemperature, HotjunctionRangeError, temperatureFromEmf } from "../../src/index.js";
import { ensureDist, npmCommand, packInto, projectDir } from "./distBuild.js";

const packageVersion = (JSON.parse(readFileSync(join(projectDir, "package.json"), "utf8")) as { version: string })
  .version;

let scratchDir = "";
let consumerDir = "";

function run(command: string, args: string[], cwd = consumerDir): { status: number | null; stdout: string; stderr: string } {
  const result = spawnSync(command, args, { cwd, encoding: "utf8", env: { ...process.env, NO_COLOR: "1" } });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

function node(args: string[]): string {
  const result = run(process.execPath, args);
  if (result.status !== 0) throw new Error(`node ${args.join(" ")} failed:\n${result.stderr}`);
  return result.stdout;
}

/** The values every consumer script prints, as JSON with numbers written exactly (17 significant digits). */
const probe = `
const out = {
  emfK500: hj.emfFromTemperature("K", 500),
  emfJ100: hj.emfFromTemperature("J", 100),
  tK41276: hj.temperatureFromEmf("K", 41.276),
  emfK500cj25: hj.emfFromTemperature("K", 500, { coldJunctionC: 25 }),
  perType: hj.createThermocouple(hj.typeK).emfFromTemperature(500),
  rangeErrorIsFamily: (() => { try { hj.emfFromTemperature("K", 5000); return "no throw"; }
    catch (e) { return e instanceof hj.HotjunctionRangeError && hj.isHotjunctionError(e) ? e.code : String(e); } })(),
};
console.log(JSON.stringify(out, (k, v) => typeof v === "number" ? v.toPrecision(17) : v));
`;

function exact(value: number): string {
  return value.toPrecision(17);
}

beforeAll(() => {
  ensureDist();
  scratchDir = mkdtempSync(join(tmpdir(), "hotjunction-consumer-"));
  const tarball = packInto(scratchDir);
  consumerDir = join(scratchDir, "consumer");
  mkdirSync(consumerDir);
  writeFileSync(
    join(consumerDir, "package.json"),
    JSON.stringify({ name: "consumer", version: "1.0.0", private: true, type: "module" }, null, 2),
  );
  const installArgs = ["install", "--no-audit", "--no-fund", "--no-save", "--ignore-scripts", tarball];
  let install = run(npmCommand, [...installArgs, "--offline"]);
  if (install.status !== 0) {
    // A dependency missing from the npm cache: let npm fetch only what is missing.
    install = run(npmCommand, [...installArgs, "--prefer-offline"]);
  }
  if (install.status !== 0) throw new Error(`npm install of the tarball failed:\n${install.stderr}`);
}, 300_000);

afterAll(() => {
  if (scratchDir !== "") rmSync(scratchDir, { recursive: true, force: true });
});

/** What the sources give for the probe, as the installed build must print it. */
function expectedFromSources(): Record<string, string> {
  let code = "no throw";
  try {
    emfFromTemperature("K", 5000);
  } catch (error) {
    code = error instanceof HotjunctionRangeError ? error.code : String(error);
  }
  return {
    emfK500: exact(emfFromTemperature("K", 500)),
    emfJ100: exact(emfFromTemperature("J", 100)),
    tK41276: exact(temperatureFromEmf("K", 41.276)),
    emfK500cj25: exact(emfFromTemperature("K", 500, { coldJunctionC: 25 })),
    perType: exact(emfFromTemperature("K", 500)),
    rangeErrorIsFamily: code,
  };
}

describe("installed tarball", () => {
  it("works through ESM import, giving NIST table values and the sources' numbers bit for bit", () => {
    writeFileSync(join(consumerDir, "esm.mjs"), `import * as hj from "hotjunction";\n${probe}`);
    const out = JSON.parse(node(["esm.mjs"])) as Record<string, string>;
    // NIST SRD 60, type K at 500 °C: 20.644 mV; type J at 100 °C: 5.269 mV; type K at 41.276 mV: 1000 °C.
    expect(Number(out["emfK500"]).toFixed(3)).toBe("20.644");
    expect(Number(out["emfJ100"]).toFixed(3)).toBe("5.269");
    // The table EMF is rounded to 1 µV, i.e. ±0.5 µV, or ±0.013 °C at the Seebeck coefficient there (≈39 µV/°C).
    expect(Math.abs(Number(out["tK41276"]) - 1000)).toBeLessThan(0.013);
    expect(out["rangeErrorIsFamily"]).toBe("OUT_OF_RANGE");
    expect(out).toEqual(expectedFromSources());
  });

  it("works through CommonJS require with the same numbers and error family", () => {
    writeFileSync(join(consumerDir, "cjs.cjs"), `const hj = require("hotjunction");\n${probe}`);
    writeFileSync(join(consumerDir, "esm.mjs"), `import * as hj from "hotjunction";\n${probe}`);
    const fromRequire = JSON.parse(node(["cjs.cjs"])) as Record<string, string>;
    const fromImport = JSON.parse(node(["esm.mjs"])) as Record<string, string>;
    expect(fromRequire).toEqual(fromImport);
    expect(fromRequire["emfK500"]).toBe(exact(emfFromTemperature("K", 500)));
  });

  it("resolves every subpath entry from both module systems", () => {
    const pkg = JSON.parse(readFileSync(join(projectDir, "package.json"), "utf8")) as {
      exports: Record<string, unknown>;
    };
    const subpaths = Object.keys(pkg.exports)
      .filter((key) => key !== "." && !key.endsWith(".json"))
      .map((key) => `hotjunction/${key.slice(2)}`);
    for (const specifier of ["hotjunction", ...subpaths]) {
      const esmKeys = node(["--input-type=module", "-e", `const m = await import(${JSON.stringify(specifier)}); console.log(Object.keys(m).filter(k => k !== "default").sort().join(","))`]);
      const cjsKeys = node(["-e", `console.log(Object.keys(require(${JSON.stringify(specifier)})).sort().join(","))`]);
      expect(esmKeys.trim().length, specifier).toBeGreaterThan(0);
      expect(cjsKeys, specifier).toBe(esmKeys);
    }
    expect(node(["-e", `console.log(require("hotjunction/package.json").version)`]).trim()).toBe(packageVersion);
  });

  const typeScriptSource = `
import { createThermocouple, emfFromTemperature, HotjunctionRangeError, typeK, type ThermocoupleType } from "hotjunction";
import type * as design from "hotjunction/design";

const type: ThermocoupleType = "K";
const emfMillivolts: number = emfFromTemperature(type, 500, { coldJunctionC: 25 });
const thermocouple = createThermocouple(typeK);
const temperatureC: number = thermocouple.temperatureFromEmf(emfMillivolts);
const error: RangeError = new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "temperature", value: 1 });
// @ts-expect-error the temperature is a number in °C, not a string
emfFromTemperature("K", "500");
// @ts-expect-error "X" is no thermocouple type
emfFromTemperature("X", 500);
type DesignModule = typeof design;
export { error, temperatureC, type DesignModule };
`;

  function typeCheck(name: string, compilerOptions: Record<string, unknown>, files: Record<string, string>): void {
    const dir = join(consumerDir, name);
    mkdirSync(dir, { recursive: true });
    for (const [file, text] of Object.entries(files)) writeFileSync(join(dir, file), text);
    writeFileSync(
      join(dir, "tsconfig.json"),
      JSON.stringify({
        compilerOptions: {
          strict: true,
          noEmit: true,
          target: "ES2022",
          // Type-check the published declarations too, not only their use.
          skipLibCheck: false,
          types: [],
          ...compilerOptions,
        },
        include: Object.keys(files),
      }),
    );
    const tsc = join(projectDir, "node_modules", "typescript", "bin", "tsc");
    const result = run(process.execPath, [tsc, "-p", join(dir, "tsconfig.json")], dir);
    expect(result.stdout + result.stderr, `tsc (${name})`).toBe("");
    expect(result.status).toBe(0);
  }

  it("type-checks under moduleResolution node16 (ESM and CJS files), proving the declarations are real", () => {
    typeCheck(
      "ts-node16",
      { module: "node16", moduleResolution: "node16" },
      {
        "consumer.mts": typeScriptSource,
        "consumer.cts": typeScriptSource.replace(
          'import type * as design from "hotjunction/design";',
          'import type * as design from "hotjunction/design";\nimport hj = require("hotjunction");\nexport const fromRequire: number = hj.emfFromTemperature("K", 100);',
        ),
      },
    );
  });

  it("type-checks under moduleResolution bundler", () => {
    typeCheck("ts-bundler", { module: "esnext", moduleResolution: "bundler" }, { "consumer.ts": typeScriptSource });
  });

  it("a wrong call is caught by the type checker (the @ts-expect-error lines are needed)", () => {
    const dir = join(consumerDir, "ts-negative");
    mkdirSync(dir, { recursive: true });
    writeFileSync(join(dir, "bad.ts"), `import { emfFromTemperature } from "hotjunction";\nemfFromTemperature("K", "500");\n`);
    writeFileSync(
      join(dir, "tsconfig.json"),
      JSON.stringify({
        compilerOptions: { strict: true, noEmit: true, module: "esnext", moduleResolution: "bundler", types: [] },
        include: ["bad.ts"],
      }),
    );
    const tsc = join(projectDir, "node_modules", "typescript", "bin", "tsc");
    const result = run(process.execPath, [tsc, "-p", join(dir, "tsconfig.json")], dir);
    expect(result.status).not.toBe(0);
    expect(result.stdout).toContain("TS2345");
  });

  it("runs the hotjunction command through npx from the tarball install", () => {
    const help = execFileSync("npx", ["--offline", "--no-install", "hotjunction", "--help"], {
      cwd: consumerDir,
      encoding: "utf8",
    });
    expect(help).toMatch(/Usage: hotjunction/);
    expect(help).toMatch(/\bemf\b/);
    const version = execFileSync("npx", ["--offline", "--no-install", "hotjunction", "--version"], {
      cwd: consumerDir,
      encoding: "utf8",
    });
    expect(version.trim()).toContain(packageVersion);
  });
});
