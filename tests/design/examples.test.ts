/**
 * Runs the @example blocks of src/design and src/report (TypeScript, stripped by esbuild) and compares each
 * printed line to its `// <expected>` comment (strings shown in double quotes, other values as printed).
 */
import { readdirSync, readFileSync } from "node:fs";
import * as fs from "node:fs";
import { join } from "node:path";
import { transformSync } from "esbuild";
import { describe, expect, it } from "vitest";
import * as design from "../../src/design/index.js";
import * as lib from "../../src/index.js";

const root = join(import.meta.dirname, "..", "..");

function show(value: unknown): string {
  return typeof value === "string" ? JSON.stringify(value) : String(value);
}

for (const area of ["design", "report"]) {
  describe(`JSDoc examples of src/${area}`, () => {
    const dir = join(root, "src", area);
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
          const imports: Record<string, string> = { "hotjunction/design": "__design", hotjunction: "__lib", "node:fs": "__fs" };
          const ts = code.replace(/import \{([^}]*)\} from "([^"]+)";/g, (_, names: string, from: string) => {
            const target = imports[from];
            if (target === undefined) throw new Error(`example imports from ${from}`);
            return `const {${names}} = ${target};`;
          });
          const js = transformSync(ts, { loader: "ts" }).code;
          const printed: string[] = [];
          new Function("__design", "__lib", "__fs", "console", js)(design, lib, fs, {
            log: (...values: unknown[]) => printed.push(values.map(show).join(" ")),
          });
          const expected = [...code.matchAll(/console\.log\(.*\/\/ (.*)$/gm)].map((m) => m[1]);
          expect(expected.length).toBeGreaterThan(0);
          expect(printed).toEqual(expected);
        });
      });
    }
  });
}
