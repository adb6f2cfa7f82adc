/**
 * No import circle in `src/`: the modules form a directed acyclic graph, so every module can be read, tested and
 * bundled from the ground floor up. Every relative module specifier counts: `import`, `import type`,
 * `export … from`, dynamic `import("…")` and `import("…")` type queries, as the TypeScript parser sees them.
 * Common practice, no source.
 */
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";
import { projectDir } from "./distBuild.js";

const srcDir = join(projectDir, "src");

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return entry.name.endsWith(".ts") && !entry.name.endsWith(".d.ts") ? [path] : [];
  });
}

/** Relative module specifiers of a module's source text (static, type-only, re-exports, dynamic, type queries). */
export function moduleSpecifiers(fileName: string, text: string): string[] {
  const file = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, true);
  const found: string[] = [];
  const visit = (node: ts.Node): void => {
    if ((ts.isImportDeclaration(node) || ts.isExportDeclaration(node)) && node.moduleSpecifier !== undefined) {
      if (ts.isStringLiteral(node.moduleSpecifier)) found.push(node.moduleSpecifier.text);
    } else if (ts.isCallExpression(node) && node.expression.kind === ts.SyntaxKind.ImportKeyword) {
      const [argument] = node.arguments;
      if (argument !== undefined && ts.isStringLiteralLike(argument)) found.push(argument.text);
    } else if (ts.isImportTypeNode(node) && ts.isLiteralTypeNode(node.argument) && ts.isStringLiteral(node.argument.literal)) {
      found.push(node.argument.literal.text);
    }
    ts.forEachChild(node, visit);
  };
  visit(file);
  return found.filter((specifier) => specifier.startsWith("."));
}

/** The source file a relative specifier names (`./a.js` → `a.ts`, `./dir/index.js` …), or undefined. */
function resolveSpecifier(fromFile: string, specifier: string): string | undefined {
  const base = resolve(dirname(fromFile), specifier);
  const candidates = [base.replace(/\.js$/, ".ts"), base, `${base}.ts`, join(base, "index.ts")];
  return candidates.find((candidate) => candidate.endsWith(".ts") && existsSync(candidate));
}

/** Every elementary cycle's representative: one circle per strongly connected component of more than one module, or a self-import. */
export function importCircles(graph: ReadonlyMap<string, readonly string[]>): string[][] {
  // Tarjan's strongly connected components (Tarjan 1972), iterative enough for a few hundred modules.
  let index = 0;
  const indexOf = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const circles: string[][] = [];
  const strongConnect = (v: string): void => {
    indexOf.set(v, index);
    low.set(v, index);
    index++;
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!indexOf.has(w)) {
        strongConnect(w);
        low.set(v, Math.min(low.get(v) as number, low.get(w) as number));
      } else if (onStack.has(w)) {
        low.set(v, Math.min(low.get(v) as number, indexOf.get(w) as number));
      }
    }
    if (low.get(v) === indexOf.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop() as string;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1 || (graph.get(v) ?? []).includes(v)) circles.push(component.sort());
    }
  };
  for (const v of [...graph.keys()].sort()) if (!indexOf.has(v)) strongConnect(v);
  return circles;
}

function srcGraph(): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const path of sourceFiles(srcDir)) {
    const targets = moduleSpecifiers(path, readFileSync(path, "utf8"))
      .map((specifier) => resolveSpecifier(path, specifier))
      .filter((target): target is string => target !== undefined && target.startsWith(srcDir));
    graph.set(relative(projectDir, path), [...new Set(targets.map((target) => relative(projectDir, target)))]);
  }
  return graph;
}

describe("import circles", () => {
  it("the parser sees every kind of specifier (static, type-only, re-export, dynamic, type query)", () => {
    const text = [
      'import { a } from "./a.js";',
      'import type { B } from "./b.js";',
      'export { c } from "./c.js";',
      'export type * from "./d.js";',
      'const e = await import("./e.js");',
      'type F = import("./f.js").F;',
      'import { g } from "node:fs";',
      '// import { h } from "./h.js";',
    ].join("\n");
    expect(moduleSpecifiers("probe.ts", text)).toEqual(["./a.js", "./b.js", "./c.js", "./d.js", "./e.js", "./f.js"]);
  });

  it("the circle finder finds a circle of three, a self-import, and none in a tree", () => {
    const withCircle = new Map([["a", ["b"]], ["b", ["c"]], ["c", ["a", "d"]], ["d", []], ["e", ["e"]]]);
    expect(importCircles(withCircle)).toEqual([["a", "b", "c"], ["e"]]);
    expect(importCircles(new Map([["a", ["b", "c"]], ["b", ["c"]], ["c", []]]))).toEqual([]);
  });

  it("src/ has no import circle", () => {
    const graph = srcGraph();
    expect(graph.size).toBeGreaterThan(100);
    expect([...graph.values()].flat().length).toBeGreaterThan(300);
    expect(importCircles(graph)).toEqual([]);
  });

  it("only the CLI imports the CLI, and nothing imports the workbench: the workbench and the library take the design-file steps from src/designAnalysis/", () => {
    const graph = srcGraph();
    const upward = [...graph].flatMap(([from, targets]) =>
      targets
        .filter((to) => (to.startsWith("src/cli/") && !from.startsWith("src/cli/")) || (to.startsWith("src/workbench/") && !from.startsWith("src/workbench/")))
        .map((to) => `${from} -> ${to}`),
    );
    expect(upward).toEqual([]);
    // The check sees the workbench's imports of the shared steps (so the filter above looks at real edges).
    expect(graph.get("src/workbench/analysis.ts")).toContain("src/designAnalysis/dynamicsOfDesign.ts");
    for (const [from, targets] of graph) {
      if (from.startsWith("src/designAnalysis/")) expect(targets.filter((t) => !/^src\/(design|report|trip|chain|dynamics|faults|safety|uncertainty|designAnalysis)\/|^src\/errors\.ts$/.test(t)), from).toEqual([]);
    }
  });
});
