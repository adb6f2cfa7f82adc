/**
 * Checked data: the generated modules carry what the engine would otherwise compute at run time (type B's lowest
 * EMF, the start of its unique range and the sentence of its ambiguity refusal), and those numbers are the run-time
 * search's bit for bit; the generator's output is the committed modules byte for byte; defineThermocoupleData checks
 * a foreign object once and hands out a frozen copy. Type B's dip: NIST SRD 60 type_b.tab prints E = −0.003 mV at
 * 20 °C and 0.000 mV at 40 °C and 0.003 mV at 50 °C (so E(t) = 0 again between 40 and 50 °C).
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import * as hj from "../../src/index.js";
import { createThermocouple, defineThermocoupleData, temperatureRange, typeB, typeK, type ThermocoupleData } from "../../src/index.js";
import { _checkedData } from "../../src/data/checkedData.js";
import { _compile, _compileForeign } from "../../src/its90/compiled.js";

const projectDir = join(__dirname, "..", "..");

function python3(): string | undefined {
  for (const name of ["python3", "python"]) {
    try {
      execFileSync(name, ["--version"], { stdio: "ignore" });
      return name;
    } catch {
      // try the next name
    }
  }
  return undefined;
}

describe("the generated data modules", () => {
  const python = python3();
  // CI must run this check; a machine without Python skips it only outside CI.
  it.skipIf(python === undefined && process.env["CI"] !== "true")("scripts/generateTypeData.py writes the committed src/data/type?.ts byte for byte", () => {
    expect(python, "python3 is needed to run the generator").toBeDefined();
    const out = mkdtempSync(join(tmpdir(), "hj-typedata-"));
    try {
      execFileSync(python as string, [join(projectDir, "scripts", "generateTypeData.py"), join(projectDir, "scripts", "its90", "coefficients.json"), out], {
        stdio: "pipe",
      });
      for (const letter of hj.thermocoupleTypes) {
        const name = `type${letter}.ts`;
        expect(readFileSync(join(out, name), "utf8"), name).toBe(readFileSync(join(projectDir, "src", "data", name), "utf8"));
      }
    } finally {
      rmSync(out, { recursive: true, force: true });
    }
  });

  it("every type's data is marked checked; only type B carries start data", () => {
    for (const letter of hj.thermocoupleTypes) {
      const start = _checkedData.get(hj[`type${letter}`]);
      expect(start, letter).toBeDefined();
      expect(start?.monotonicFromC !== undefined, letter).toBe(letter === "B");
    }
  });

  it("type B's precomputed start equals the run-time search on an unchecked copy, bit for bit", () => {
    const built = _compile(typeB);
    const searched = _compileForeign(JSON.parse(JSON.stringify(typeB)) as ThermocoupleData);
    expect(Object.is(built.lowestEmf, searched.lowestEmf)).toBe(true);
    expect(Object.is(built.monotonicFromC, searched.monotonicFromC)).toBe(true);
    expect(built.ambiguity).toBe(searched.ambiguity);
    // NIST type_b.tab: −0.003 mV at 20 °C (rounded to 3 decimals), back to 0.000 mV between 40 and 50 °C.
    expect(built.lowestEmf).toBeCloseTo(-0.003, 3);
    expect(built.monotonicFromC).toBeGreaterThan(40);
    expect(built.monotonicFromC).toBeLessThan(50);
    // For every other type the search finds nothing: E rises from minC.
    for (const letter of hj.thermocoupleTypes.filter((l) => l !== "B")) {
      const foreign = _compileForeign(JSON.parse(JSON.stringify(hj[`type${letter}`])) as ThermocoupleData);
      expect(foreign.monotonicFromC, letter).toBe(foreign.minC);
      expect(foreign.lowestEmf, letter).toBe(foreign.emfAtMinC);
      expect(foreign.ambiguity, letter).toBeUndefined();
    }
  });

  it("type B through a checked copy refuses the same EMFs with the same message as the built-in data", () => {
    const copy = createThermocouple(defineThermocoupleData(JSON.parse(JSON.stringify(typeB)) as ThermocoupleData));
    const builtIn = createThermocouple(typeB);
    for (const emf of [0, -0.001, -0.0025, -0.003]) {
      const message = (f: () => unknown): string => {
        try {
          f();
        } catch (error) {
          return String((error as Error).message);
        }
        return "no error";
      };
      expect(message(() => copy.temperatureFromEmf(emf))).toBe(message(() => builtIn.temperatureFromEmf(emf)));
    }
    expect(copy.temperatureFromEmf(1e-6)).toBe(builtIn.temperatureFromEmf(1e-6));
    expect(temperatureRange(copy.data)).toEqual(temperatureRange(typeB));
  });
});

describe("defineThermocoupleData", () => {
  it("returns a data module's export as it is", () => {
    expect(defineThermocoupleData(typeK)).toBe(typeK);
  });

  it("returns a deeply frozen copy of the known fields, unaffected by later changes of the input", () => {
    const input = JSON.parse(JSON.stringify(typeK)) as { forward: { coefficients: number[] }[]; extra?: number } & ThermocoupleData;
    input.extra = 1;
    const checked = defineThermocoupleData(input);
    expect(checked).not.toBe(input);
    expect(Object.keys(checked).sort()).toEqual(["exponential", "forward", "maxC", "minC", "source", "type"]);
    expect(Object.isFrozen(checked) && Object.isFrozen(checked.forward) && Object.isFrozen(checked.forward[1]?.coefficients)).toBe(true);
    const before = createThermocouple(checked).emfFromTemperature(500);
    (input.forward[1] as { coefficients: number[] }).coefficients[1] = 1;
    expect(createThermocouple(checked).emfFromTemperature(500)).toBe(before);
    expect(before).toBe(hj.emfFromTemperature("K", 500));
  });

  it("checks once: the same copy passed again is returned as it is", () => {
    const checked = defineThermocoupleData(JSON.parse(JSON.stringify(typeK)) as ThermocoupleData);
    expect(defineThermocoupleData(checked)).toBe(checked);
  });
});
