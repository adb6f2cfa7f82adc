// Property tests: whatever the input, the parser returns a design or throws one DesignFileError whose message is
// one line starting with the file name; it never throws anything else and never changes its input.
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { DesignFileError, parseDesign, validateDesign } from "../../src/design/index.js";

const examples = ["ceramic-kiln-cutout", "reflow-oven-trip", "heated-enclosure-adc"].map(
  (name) => JSON.parse(readFileSync(new URL(`../../examples/${name}.json`, import.meta.url), "utf8")) as unknown,
);

function expectCleanOutcome(run: () => unknown): void {
  try {
    run();
  } catch (error) {
    if (!(error instanceof DesignFileError)) throw error;
    const message = error.message;
    expect(message.startsWith("fuzz.json: ")).toBe(true);
    expect(message).not.toMatch(/[\r\n]/);
    expect(message.length).toBeLessThan(600);
  }
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Paths to every value inside a JSON value. */
function pathsOf(value: unknown, prefix: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  out.push(prefix);
  if (Array.isArray(value)) value.forEach((v, i) => pathsOf(v, [...prefix, i], out));
  else if (value !== null && typeof value === "object") for (const [k, v] of Object.entries(value)) pathsOf(v, [...prefix, k], out);
  return out;
}

function setAt(root: Json, path: readonly (string | number)[], replacement: Json | undefined): Json {
  if (path.length === 0) return replacement ?? null;
  const copy = structuredClone(root) as any;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key];
  const last = path[path.length - 1]!;
  if (replacement === undefined) {
    if (Array.isArray(node)) node.splice(Number(last), 1);
    else delete node[last];
  } else node[last] = replacement;
  return copy as Json;
}

const examplePaths = examples.map((e) => pathsOf(e));
const hostileKeys = fc.constantFrom("__proto__", "constructor", "prototype", "toString", "", "kind", "name", "x".repeat(300));
const hostileValues: fc.Arbitrary<Json> = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>,
  fc.constantFrom<Json>("NaN", "Infinity", "-0", "1e999", -0, 1e308, -1e308, 5e-324, Number.MAX_SAFE_INTEGER + 2, "", " 1"),
  fc.double() .filter(Number.isFinite) as fc.Arbitrary<Json>,
  fc.dictionary(hostileKeys, fc.jsonValue({ maxDepth: 1 }) as fc.Arbitrary<Json>) as fc.Arbitrary<Json>,
);

describe("design-file fuzzing", () => {
  it("random text never crashes the parser (5000 cases)", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: "binary", maxLength: 200 }), fc.json(), fc.string({ maxLength: 50 })), (text) => {
        expectCleanOutcome(() => parseDesign(text, { fileName: "fuzz.json" }));
      }),
      { numRuns: 5000, seed: 20260101 },
    );
  });

  it("token soup of JSON punctuation never crashes the parser (5000 cases)", () => {
    const token = fc.constantFrom("{", "}", "[", "]", ",", ":", '"', '"a"', "1", "-", "e", ".", "true", "nul", " ", "\n", "\\", '"\\u12"', "NaN");
    fc.assert(
      fc.property(fc.array(token, { maxLength: 60 }), (tokens) => {
        expectCleanOutcome(() => parseDesign(tokens.join(""), { fileName: "fuzz.json" }));
      }),
      { numRuns: 5000, seed: 7 },
    );
  });

  it("mutated example designs (replace, delete, add keys) give a design or one clean error (1500 cases)", () => {
    const mutation = fc
      .integer({ min: 0, max: examples.length - 1 })
      .chain((which) =>
        fc.tuple(
          fc.constant(which),
          fc.array(
            fc.tuple(
              fc.integer({ min: 0, max: examplePaths[which]!.length - 1 }),
              fc.oneof(hostileValues, fc.constant(undefined)),
              fc.option(hostileKeys),
            ),
            { minLength: 1, maxLength: 4 },
          ),
        ),
      );
    fc.assert(
      fc.property(mutation, ([which, changes]) => {
        let design = examples[which] as Json;
        for (const [pathIndex, value, extraKey] of changes) {
          const paths = pathsOf(design);
          const path = paths[pathIndex % paths.length]!;
          let node: unknown = design;
          for (const key of path) node = (node as Record<string | number, unknown>)[key];
          const isObject = node !== null && typeof node === "object" && !Array.isArray(node);
          design =
            extraKey !== null && value !== undefined && isObject
              ? setAt(design, [...path, extraKey], value)
              : setAt(design, path, value);
        }
        const before = JSON.stringify(design);
        expectCleanOutcome(() => validateDesign(design, { fileName: "fuzz.json" }));
        expect(JSON.stringify(design)).toBe(before);
        expectCleanOutcome(() => parseDesign(JSON.stringify(design), { fileName: "fuzz.json" }));
      }),
      { numRuns: 1500, seed: 42 },
    );
  });

  it("arbitrary values given to validateDesign never crash it (3000 cases)", () => {
    fc.assert(
      fc.property(fc.anything({ withNullPrototype: true, withObjectString: true, withBigInt: true, withMap: true }), (value) => {
        expectCleanOutcome(() => validateDesign(value, { fileName: "fuzz.json" }));
      }),
      { numRuns: 3000, seed: 3 },
    );
  });
});
