/**
 * No function, method, accessor or arrow function in `src/` has a body longer than 150 lines: a function that long
 * does several jobs (split it by job), or is a table written as code (make it data). Counted from the body's
 * opening to its closing brace, inclusive, as the TypeScript parser sees them. Common practice, no source.
 */
import { readdirSync, readFileSync } from "node:fs";
import { join, relative } from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";
import { projectDir } from "./distBuild.js";

const maxBodyLines = 150;
const srcDir = join(projectDir, "src");

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(entry.name) && !entry.name.endsWith(".d.ts") ? [path] : [];
  });
}

function nameOf(node: ts.Node, file: ts.SourceFile): string {
  const named = node as { name?: ts.Node };
  if (named.name !== undefined) return named.name.getText(file);
  const parent = node.parent;
  if (ts.isVariableDeclaration(parent) || ts.isPropertyAssignment(parent)) return parent.name.getText(file);
  return "(anonymous)";
}

/** `file:line name lines` for every function-like body over `limit` lines, from source texts by file name. */
export function longFunctions(sources: readonly (readonly [name: string, text: string])[], limit: number): string[] {
  const found: string[] = [];
  for (const [name, text] of sources) {
    const file = ts.createSourceFile(name, text, ts.ScriptTarget.Latest, true);
    const visit = (node: ts.Node): void => {
      if (ts.isFunctionLike(node) && "body" in node && node.body !== undefined) {
        const body = node.body as ts.Node;
        const first = file.getLineAndCharacterOfPosition(body.getStart(file)).line;
        const last = file.getLineAndCharacterOfPosition(body.getEnd()).line;
        const lines = last - first + 1;
        if (lines > limit) found.push(`${name}:${first + 1} ${nameOf(node, file)} ${lines} lines`);
      }
      ts.forEachChild(node, visit);
    };
    visit(file);
  }
  return found;
}

describe("function length", () => {
  const files = sourceFiles(srcDir);

  it("reads the sources (the walk sees src/)", () => {
    expect(files.length).toBeGreaterThan(100);
  });

  it("the check finds a long function, method or arrow (a 151-line body is reported, a 150-line one is not)", () => {
    const lines = (n: number): string => "  x++;\n".repeat(n - 2);
    const probe = [
      `function ok() {\n${lines(150)}}\n`,
      `function long() {\n${lines(151)}}\n`,
      `class C {\n  method() {\n${lines(151)}  }\n}\n`,
      `const arrow = () => {\n${lines(152)}};\n`,
    ].join("");
    expect(longFunctions([["probe.ts", probe]], maxBodyLines)).toEqual([
      "probe.ts:151 long 151 lines",
      "probe.ts:303 method 151 lines",
      "probe.ts:455 arrow 152 lines",
    ]);
  });

  it(`no function body in src/ is over ${maxBodyLines} lines`, () => {
    const sources = files.map((path) => [relative(projectDir, path), readFileSync(path, "utf8")] as const);
    expect(longFunctions(sources, maxBodyLines)).toEqual([]);
  });
});
