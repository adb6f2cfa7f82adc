/**
 * Runs the @example blocks of src/faults and compares each printed line to its `// <expected>` comment
 * (strings shown in double quotes, other values as util.inspect prints them).
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { inspect } from "node:util";
import { describe, expect, it } from "vitest";
import * as lib from "../../src/index.js";

const dir = join(import.meta.dirname, "..", "..", "src", "faults");

function show(value: unknown): string {
  return typeof value === "string" ? JSON.stringify(value) : inspect(value);
}

describe("JSDoc examples of src/faults", () => {
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".ts")).sort()) {
    const text = readFileSync(join(dir, file), "utf8");
    const blocks = [...text.matchAll(/```ts\n([\s\S]*?)```/g)].map((m) =>
      (m[1] as string)
        .split("\n")
        .map((l) => l.replace(/^\s*\* ?/, ""))
        .join("\n"),
    );
    blocks.forEach((code, k) => {
      it(`${file} example ${k + 1}`, () => {
        const js = code
          .replace(/import \{([^}]*)\} from "hotjunction";/, "const {$1} = lib;")
          .replace(/ as const;/g, ";");
        const printed: string[] = [];
        new Function("lib", "console", js)(lib, {
          log: (...values: unknown[]) => printed.push(values.map(show).join(" ")),
        });
        const expected = [...code.matchAll(/console\.log\(.*\/\/ (.*)$/gm)].map((m) => m[1]);
        expect(expected.length).toBeGreaterThan(0);
        expect(printed).toEqual(expected);
      });
    });
  }
});
