/**
 * The public API surface: the exported names (values and types) of every package entry, pinned in the reviewed
 * file `tests/package/apiSurface.json`. An export added or removed by accident fails here; a deliberate change
 * regenerates the file (`UPDATE_API_SURFACE=1 npx vitest run tests/package/apiSurface.test.ts`), and the diff is
 * reviewed with the CHANGELOG entry that explains it.
 */
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";
import { projectDir } from "./distBuild.js";

/** Package entries and their source modules (package.json `exports`, tsup.config.ts). */
const entries = {
  hotjunction: "src/index.ts",
  "hotjunction/exact": "src/exact.ts",
  "hotjunction/design": "src/design/index.ts",
  "hotjunction/report": "src/report/index.ts",
  "hotjunction/bulk": "src/bulk/index.ts",
} as const;

type Surface = Record<string, { values: string[]; types: string[] }>;

const snapshotPath = join(projectDir, "tests/package/apiSurface.json");

function surfaceFromSources(): Surface {
  const files = Object.values(entries).map((f) => join(projectDir, f));
  const program = ts.createProgram(files, {
    module: ts.ModuleKind.NodeNext,
    moduleResolution: ts.ModuleResolutionKind.NodeNext,
    target: ts.ScriptTarget.ES2022,
    strict: true,
    noEmit: true,
    skipLibCheck: true,
  });
  const checker = program.getTypeChecker();
  const surface: Surface = {};
  for (const [entry, file] of Object.entries(entries)) {
    const source = program.getSourceFile(join(projectDir, file));
    const moduleSymbol = source === undefined ? undefined : checker.getSymbolAtLocation(source);
    if (moduleSymbol === undefined) throw new Error(`no module symbol for ${file}`);
    const values: string[] = [];
    const types: string[] = [];
    for (const symbol of checker.getExportsOfModule(moduleSymbol)) {
      const target = symbol.flags & ts.SymbolFlags.Alias ? checker.getAliasedSymbol(symbol) : symbol;
      ((target.flags & ts.SymbolFlags.Value) !== 0 ? values : types).push(symbol.getName());
    }
    surface[entry] = { values: values.sort(), types: types.sort() };
  }
  return surface;
}

describe("API surface", () => {
  const surface = surfaceFromSources();

  if (process.env["UPDATE_API_SURFACE"] === "1") writeFileSync(snapshotPath, `${JSON.stringify(surface, null, 2)}\n`);
  const pinned = JSON.parse(readFileSync(snapshotPath, "utf8")) as Surface;

  it("every entry exports exactly the reviewed names (tests/package/apiSurface.json)", () => {
    expect(Object.keys(surface)).toEqual(Object.keys(pinned));
    for (const entry of Object.keys(entries)) {
      expect(surface[entry]?.values, `${entry} values`).toEqual(pinned[entry]?.values);
      expect(surface[entry]?.types, `${entry} types`).toEqual(pinned[entry]?.types);
    }
  });

  it("the runtime exports of every entry are the pinned values (what the compiler sees is what loads)", async () => {
    const loaded: Record<string, object> = {
      hotjunction: await import("../../src/index.js"),
      "hotjunction/exact": await import("../../src/exact.js"),
      "hotjunction/design": await import("../../src/design/index.js"),
      "hotjunction/report": await import("../../src/report/index.js"),
      "hotjunction/bulk": await import("../../src/bulk/index.js"),
    };
    for (const [entry, module] of Object.entries(loaded)) expect(Object.keys(module).sort(), entry).toEqual(pinned[entry]?.values);
  });

  it("no name is internal (no `_` prefix) and no barrel uses `export *`", () => {
    for (const [entry, names] of Object.entries(pinned)) {
      expect([...names.values, ...names.types].filter((n) => n.startsWith("_")), entry).toEqual([]);
    }
    for (const file of ["src/index.ts", "src/exact.ts", "src/chain/index.ts", "src/design/index.ts", "src/faults/index.ts", "src/firmware/index.ts", "src/report/index.ts", "src/bulk/index.ts", "src/trip/index.ts", "src/uncertainty/index.ts"]) {
      expect(/export\s+(type\s+)?\*/.test(readFileSync(join(projectDir, file), "utf8")), file).toBe(false);
    }
  });
});
