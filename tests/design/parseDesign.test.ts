import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  DesignFileError,
  designFileMaxBytes,
  parseDesign,
  safeParseDesign,
  validateDesign,
} from "../../src/design/index.js";

const exampleText = readFileSync(new URL("../../examples/reflow-oven-trip.json", import.meta.url), "utf8");
const example = JSON.parse(exampleText) as Record<string, unknown>;

function messageOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(DesignFileError);
    expect((error as DesignFileError).code).toBe("INVALID_DESIGN");
    return (error as Error).message;
  }
  throw new Error("expected a DesignFileError");
}

function withChange(change: (d: Record<string, any>) => void): string {
  const copy = structuredClone(example) as Record<string, any>;
  change(copy);
  return JSON.stringify(copy, null, 2);
}

describe("parseDesign", () => {
  it("accepts each example design", () => {
    for (const name of ["ceramic-kiln-cutout", "reflow-oven-trip", "heated-enclosure-adc"]) {
      const text = readFileSync(new URL(`../../examples/${name}.json`, import.meta.url), "utf8");
      expect(parseDesign(text, { fileName: name }).hotjunctionDesign).toBe(1);
    }
  });

  it("names path, expectation and finding in one line for a string where a number belongs", () => {
    const text = withChange((d) => (d.referenceAlternatives[1].tempcoPpmPerC = "abc"));
    expect(messageOf(() => parseDesign(text, { fileName: "oven.json" }))).toBe(
      'oven.json: at referenceAlternatives[1].tempcoPpmPerC: expected a number, found "abc"',
    );
  });

  it("refuses an unknown (misspelt) key, naming it", () => {
    const text = withChange((d) => (d.reference.tempcoPPMPerC = 5));
    expect(messageOf(() => parseDesign(text, { fileName: "oven.json" }))).toBe(
      'oven.json: at reference: unknown key "tempcoPPMPerC" (keys are case-sensitive; see the JSON Schema)',
    );
  });

  it("reports a missing key, a bad choice and a bad discriminator", () => {
    expect(messageOf(() => parseDesign(withChange((d) => delete d.ambient.maxC)))).toBe(
      "design: at ambient.maxC: required key is missing (expected a number)",
    );
    expect(messageOf(() => parseDesign(withChange((d) => (d.resistors.series = "E97"))))).toBe(
      'design: at resistors.series: expected one of "E6", "E12", "E24", "E48", "E96", "E192", found "E97"',
    );
    expect(messageOf(() => parseDesign(withChange((d) => (d.reference.kind = "zener"))))).toBe(
      'design: at reference.kind: expected one of "ideal", "series", "shunt", "regulator-rail", found "zener"',
    );
  });

  it("counts further problems without printing them", () => {
    const text = withChange((d) => {
      d.ambient.minC = "x";
      d.ambient.maxC = "y";
    });
    expect(messageOf(() => parseDesign(text))).toBe('design: at ambient.minC: expected a number, found "x" (and 1 more problem)');
  });

  it("gives line and column of a JSON syntax error", () => {
    expect(messageOf(() => parseDesign('{\n  "hotjunctionDesign": 1,\n  "name": tru\n}', { fileName: "k.json" }))).toBe(
      'k.json: not valid JSON at line 3, column 11 (at name): expected a value, found "t"',
    );
    expect(messageOf(() => parseDesign("{", { fileName: "k.json" }))).toBe(
      'k.json: not valid JSON at line 1, column 2: expected a key in double quotes, found the end of the file',
    );
    expect(messageOf(() => parseDesign(""))).toBe("design: not valid JSON at line 1, column 1: the file is empty");
  });

  it("refuses NaN, Infinity and numbers that overflow", () => {
    expect(messageOf(() => parseDesign('{"a": NaN}'))).toContain("NaN and Infinity are not JSON numbers");
    expect(messageOf(() => parseDesign('{"a": 1e999}'))).toContain("number 1e999 is too large");
    expect(messageOf(() => parseDesign(withChange((d) => (d.ambient.minC = "NaN"))))).toBe(
      'design: at ambient.minC: expected a number, found "NaN"',
    );
  });

  it("validateDesign refuses __proto__, constructor and prototype keys as parseDesign does: typed error, key and path", () => {
    for (const key of ["__proto__", "constructor", "prototype"]) {
      // JSON.parse makes "__proto__" an own key, the way a caller's parsed value reaches validateDesign.
      const hostile = JSON.parse(`{"ambient": {"minC": 0, "maxC": 40, "${key}": {"polluted": true}}}`) as unknown;
      const viaValue = messageOf(() => validateDesign({ ...example, ambient: (hostile as { ambient: unknown }).ambient }));
      const viaText = messageOf(() => parseDesign(JSON.stringify({ ...example, ambient: { minC: 0, maxC: 40 } }).replace('"maxC":40', `"maxC":40,"${key}":{"polluted":true}`)));
      expect(viaValue).toBe(`design: at ambient: key "${key}" is not allowed`);
      expect(viaText).toMatch(new RegExp(`^design: not valid JSON at line 1, column \\d+ \\(at ambient\\): key "${key}" is not allowed$`));
      const deep = JSON.parse(`{"setpoints": [{"name": "a"}, {"${key}": 1}]}`) as unknown;
      expect(messageOf(() => validateDesign(deep))).toBe(`design: at setpoints[1]: key "${key}" is not allowed`);
    }
    expect(({} as Record<string, unknown>)["polluted"]).toBeUndefined();
    const cyclic: Record<string, unknown> = { ...example };
    cyclic["self"] = cyclic;
    expect(messageOf(() => validateDesign(cyclic))).toMatch(/unknown key "self"/);
  });

  it("refuses __proto__, constructor and prototype keys and duplicate keys anywhere", () => {
    for (const key of ["__proto__", "constructor", "prototype"]) {
      expect(messageOf(() => parseDesign(`{"ambient": {"${key}": {"polluted": true}}}`))).toBe(
        `design: not valid JSON at line 1, column 14 (at ambient): key "${key}" is not allowed`,
      );
    }
    expect(({} as Record<string, unknown>)["polluted"]).toBeUndefined();
    expect(messageOf(() => parseDesign('{"name": "a", "name": "b"}'))).toBe(
      'design: not valid JSON at line 1, column 15: key "name" appears twice',
    );
  });

  it("caps nesting depth before building anything", () => {
    const deep = `${"[".repeat(100_000)}${"]".repeat(100_000)}`;
    expect(messageOf(() => parseDesign(deep))).toBe(
      `design: not valid JSON at line 1, column 33 (at ${"[0]".repeat(32)}): nesting deeper than 32 levels`,
    );
  });

  it("caps the size at 1 MiB", () => {
    const big = `{"notes": "${"x".repeat(designFileMaxBytes)}"}`;
    expect(messageOf(() => parseDesign(big))).toBe("design: file is larger than 1048576 bytes (1 MiB)");
    // Multi-byte characters count as bytes, not as UTF-16 units.
    const wide = `{"notes": "${"é".repeat(designFileMaxBytes / 2 + 10)}"}`;
    expect(messageOf(() => parseDesign(wide))).toBe("design: file is larger than 1048576 bytes (1 MiB)");
  });

  it("checks cross-field rules with paths", () => {
    expect(messageOf(() => parseDesign(withChange((d) => (d.setpoints[0].tripTemperatureC = 290))))).toBe(
      "design: at setpoints[0].tripTemperatureC: must lie between maxNormalOperatingC (250) and hazardLimitC (280), found 290",
    );
    expect(messageOf(() => parseDesign(withChange((d) => (d.adc = { bits: 12 }))))).toBe(
      'design: give either "comparator" or "adc", not both',
    );
    expect(
      messageOf(() => parseDesign(withChange((d) => (d.referenceAlternatives[0].name = d.reference.name)))),
    ).toBe('design: at referenceAlternatives[0].name: name "2.5 V shunt reference, 0.5 %" is used twice');
    expect(messageOf(() => parseDesign(withChange((d) => delete d.reference.shuntMaxMilliamps)))).toBe(
      "design: at reference: to choose the series resistor the tool needs shuntMaxMilliamps (or give seriesOhms)",
    );
  });

  it("refuses the wrong format version and non-objects", () => {
    expect(messageOf(() => validateDesign({ ...example, hotjunctionDesign: 2 }, { fileName: "x" }))).toBe(
      "x: at hotjunctionDesign: expected 1, found 2",
    );
    expect(messageOf(() => parseDesign("[]"))).toBe("design: expected an object, found an array of 0 items");
    expect(messageOf(() => parseDesign("null"))).toBe("design: expected an object, found null");
  });

  it("safeParseDesign returns the error instead of throwing", () => {
    const result = safeParseDesign("[]");
    expect(result.success).toBe(false);
    if (!result.success) expect(result.error.message).toBe("design: expected an object, found an array of 0 items");
    expect(safeParseDesign(exampleText).success).toBe(true);
  });

  it("does not change the input object", () => {
    const copy = structuredClone(example);
    validateDesign(copy);
    expect(copy).toEqual(example);
  });
});
