/**
 * Regressions found by tests/contract: a design-file path that is not a string, and design objects that are
 * missing, are typed errors (they were Node's ERR_INVALID_ARG_TYPE and "Cannot read properties of undefined").
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { HotjunctionRangeError, HotjunctionTypeError, isHotjunctionError } from "../../src/errors.js";
import {
  DesignFileError,
  dynamicsModelFromDesign,
  failureDataFromDesign,
  loadDesignFile,
  measurementChainFromDesign,
  parseDesign,
  referenceOptionFromDesign,
  safeParseDesign,
  secondChannelDesign,
  tripDesignFromDesign,
  validateDesign,
  type DesignFile,
} from "../../src/design/index.js";

function thrown(call: () => unknown): unknown {
  try {
    call();
  } catch (e) {
    return e;
  }
  return undefined;
}

describe("design entry refuses what is not a design", () => {
  it.each([undefined, null, 42, "", {}, ["kiln.json"]])("loadDesignFile(%s) is a typed error naming the path", (path) => {
    const e = thrown(() => loadDesignFile(path as never));
    expect(isHotjunctionError(e), String(e)).toBe(true);
    expect((e as Error).message).toMatch(/design file path .* is not a non-empty string/);
  });

  it.each([
    ["measurementChainFromDesign", () => measurementChainFromDesign(undefined as never)],
    ["measurementChainFromDesign", () => measurementChainFromDesign(null as never)],
    ["tripDesignFromDesign", () => tripDesignFromDesign(undefined as never)],
    ["referenceOptionFromDesign", () => referenceOptionFromDesign(null as never)],
  ])("%s of a missing design is a typed error", (_, call) => {
    const e = thrown(call);
    expect(isHotjunctionError(e), String(e)).toBe(true);
    expect((e as Error).message).toMatch(/(design|reference) .* is not an object/);
  });
});

/**
 * Regressions found by tests/contract (issue "typed-error promise everywhere"): the converters took a design
 * object on trust, so a forged leaf (NaN, a string, null, a missing section) came back as NaN in the result or as
 * a plain TypeError. Each now validates its input once, as validateDesign does, and names the first problem.
 */
describe("design converters validate the design they are given", () => {
  const read = (file: string): Record<string, unknown> => JSON.parse(readFileSync(join(import.meta.dirname, "../../examples", file), "utf8")) as Record<string, unknown>;
  /** A deep copy of an example design with one leaf replaced (or deleted when `value` is `deleted`). */
  const deleted = Symbol("deleted");
  const forged = (file: string, path: readonly (string | number)[], value: unknown): DesignFile => {
    const copy = read(file);
    let node = copy as Record<string | number, unknown>;
    for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
    const last = path[path.length - 1]!;
    if (value === deleted) delete node[last];
    else node[last] = value;
    return copy as unknown as DesignFile;
  };
  const cases: [string, (d: DesignFile) => unknown, string, readonly (string | number)[], unknown, string][] = [
    ["tripDesignFromDesign", tripDesignFromDesign, "reflow-oven-trip.json", ["reference", "nominalVolts"], Number.NaN, "design.reference.nominalVolts"],
    ["tripDesignFromDesign", tripDesignFromDesign, "reflow-oven-trip.json", ["amplifier"], "K", "design.amplifier"],
    ["tripDesignFromDesign", tripDesignFromDesign, "reflow-oven-trip.json", ["setpoints"], {}, "design.setpoints"],
    ["tripDesignFromDesign", tripDesignFromDesign, "reflow-oven-trip.json", ["ambient"], deleted, "design.ambient"],
    ["measurementChainFromDesign", measurementChainFromDesign, "heated-enclosure-adc.json", ["thermocouple", "tolerance"], null, "design.thermocouple.tolerance"],
    ["measurementChainFromDesign", measurementChainFromDesign, "heated-enclosure-adc.json", ["adc"], null, "design.adc"],
    ["dynamicsModelFromDesign", dynamicsModelFromDesign, "ceramic-kiln-cutout.json", ["dynamics", "sensor"], Number.POSITIVE_INFINITY, "design.dynamics.sensor"],
    ["failureDataFromDesign", failureDataFromDesign, "kiln-two-channel-cutout.json", ["failureData", "elements", 0, "modes"], -1e308, "design.failureData.elements[0].modes"],
    ["failureDataFromDesign", failureDataFromDesign, "kiln-two-channel-cutout.json", ["failureData", "elements", 0, "rateFit"], Number.NaN, "design.failureData.elements[0].rateFit"],
    ["secondChannelDesign", secondChannelDesign, "kiln-two-channel-cutout.json", ["setpoints"], 0.5, "design.setpoints"],
    ["secondChannelDesign", secondChannelDesign, "kiln-two-channel-cutout.json", ["failureData", "secondChannel"], null, "design.failureData.secondChannel"],
  ];
  it.each(cases)("%s of %s with %s forged is INVALID_DESIGN naming %s", (name, convert, file, path, value, quantity) => {
    const e = thrown(() => convert(forged(file, path, value)));
    expect(e, String(e)).toBeInstanceOf(DesignFileError);
    const error = e as DesignFileError;
    expect(error.code).toBe("INVALID_DESIGN");
    expect(error.quantity).toBe(quantity);
    expect(error.value).toBe(value === deleted ? undefined : value);
    expect(error.message.startsWith(`${name}: at ${quantity.slice("design.".length)}: `), error.message).toBe(true);
  });

  it("the valid range of a bounded leaf is named: resistors.toleranceFraction 0.9 (schema: at most 0.5)", () => {
    const e = thrown(() => tripDesignFromDesign(forged("reflow-oven-trip.json", ["resistors", "toleranceFraction"], 0.9))) as DesignFileError;
    expect(e.quantity).toBe("design.resistors.toleranceFraction");
    expect(e.value).toBe(0.9);
    expect(e.max).toBe(0.5);
    expect(e.message).toMatch(/expected a number ≤ 0\.5, found 0\.9/);
  });

  it("a broken cross-field rule names its path and the value there (ambient.minC above maxC)", () => {
    const e = thrown(() => measurementChainFromDesign(forged("heated-enclosure-adc.json", ["ambient", "minC"], 500))) as DesignFileError;
    expect(e.code).toBe("INVALID_DESIGN");
    expect(e.quantity).toBe("design.ambient.minC");
    expect(e.value).toBe(500);
  });

  it("a reference entry is checked like the design's reference (referenceOptionFromDesign, measurementChainFromDesign's second argument)", () => {
    const bad = { kind: "regulator-rail", name: "5 V rail", nominalVolts: Number.POSITIVE_INFINITY, totalToleranceFraction: 0.04 } as never;
    for (const call of [() => referenceOptionFromDesign(bad), () => measurementChainFromDesign(read("heated-enclosure-adc.json") as unknown as DesignFile, bad)]) {
      const e = thrown(call) as DesignFileError;
      expect(e).toBeInstanceOf(DesignFileError);
      expect(e.quantity).toBe("reference.nominalVolts");
      expect(e.value).toBe(Number.POSITIVE_INFINITY);
    }
    const rule = thrown(() => referenceOptionFromDesign({ kind: "regulator-rail", name: "5 V rail", nominalVolts: 5 } as never)) as DesignFileError;
    expect(rule.quantity).toBe("reference");
    expect(rule.message).toMatch(/no tolerance given/);
  });

  it("failureDataFromDesign's channel is one of first, second", () => {
    const e = thrown(() => failureDataFromDesign(read("kiln-two-channel-cutout.json") as unknown as DesignFile, "third" as never)) as HotjunctionRangeError;
    expect(e.code).toBe("INVALID_OPTION");
    expect(e.quantity).toBe("channel");
    expect(e.allowed).toEqual(["first", "second"]);
  });

  it("a valid design converts as before (the validated copy has the same content)", () => {
    const design = parseDesign(readFileSync(join(import.meta.dirname, "../../examples/kiln-two-channel-cutout.json"), "utf8"));
    expect(failureDataFromDesign(design)?.elements[0]?.element).toBe("thermocouple (kiln roof)");
    expect(secondChannelDesign(design).adc?.bits).toBe(12);
    expect(() => validateDesign(secondChannelDesign(design))).not.toThrow();
  });
});

describe("parse options and text that are not what they should be", () => {
  it.each([null, 3, "kiln.json"])("options %s is a typed INVALID_OPTION error naming options", (options) => {
    for (const call of [() => parseDesign("{}", options as never), () => validateDesign({}, options as never), () => safeParseDesign("{}", options as never)]) {
      const e = thrown(call) as HotjunctionTypeError;
      expect(e).toBeInstanceOf(HotjunctionTypeError);
      expect(e.code).toBe("INVALID_OPTION");
      expect(e.quantity).toBe("options");
    }
  });

  it("a fileName that is not a string is a typed error naming options.fileName", () => {
    const e = thrown(() => validateDesign({}, { fileName: Object.create(null) as string })) as HotjunctionTypeError;
    expect(e).toBeInstanceOf(HotjunctionTypeError);
    expect(e.quantity).toBe("options.fileName");
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY])("safeParseDesign(%s) fails without quoting the number in its returned text", (text) => {
    const result = safeParseDesign(text as never);
    expect(result.success).toBe(false);
    if (!result.success) {
      expect(result.error.problem).toBe("expected the file's text, found a number");
      expect(JSON.stringify(result.error)).not.toMatch(/NaN|Infinity/);
    }
  });
});
