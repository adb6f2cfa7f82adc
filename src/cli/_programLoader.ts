/**
 * Runs the commander program: in the built CLI the program bundle `dist/cli/program.cjs` (see `_programBundle.ts`)
 * through the code cache of `_compileCache.ts`, so a command does not parse and compile its code again on every
 * run; from the sources (tests, tsx) the bundle's entry module itself, with no cache.
 * @module
 * @internal
 */
import { appendFileSync, existsSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";
import { _runCachedCommonJs } from "./_compileCache.js";
import type { CliIo } from "./io.js";

/** Set by the CLI build (tsup `define`); undefined when this module runs from its sources. */
declare const __HOTJUNCTION_PROGRAM_BUNDLE__: boolean | undefined;

type ProgramBundle = typeof import("./_programBundle.js");

/** Where the bundle is: beside this code (a chunk in `dist/cli/`) or under `cli/` (this code inlined in `dist/cli.js`). */
function bundlePath(): string {
  for (const candidate of ["./program.cjs", "./cli/program.cjs"]) {
    const path = fileURLToPath(new URL(candidate, import.meta.url));
    if (existsSync(path)) return path;
  }
  throw new Error("the CLI's program bundle dist/cli/program.cjs is missing (run `npm run build`)");
}

/**
 * Runs the program for `argv` and returns its exit code; never throws for a failure of the command (the bundle
 * reports it). A run that ends with exit 0 or 3 (the command did its work) keeps the code cache of its command.
 * @internal
 */
export async function _runProgramOnce(argv: readonly string[], io: CliIo): Promise<number> {
  if (typeof __HOTJUNCTION_PROGRAM_BUNDLE__ === "undefined") {
    // From the sources: a specifier the bundler does not follow (the built CLI never takes this branch).
    const entry = "./_programBundle.js";
    const program = (await import(/* @vite-ignore */ entry)) as ProgramBundle;
    return program._runProgramBundle(argv, io);
  }
  const file = bundlePath();
  const log = process.env["HOTJUNCTION_MODULE_LOG"];
  if (log !== undefined && log !== "") appendFileSync(log, `${pathToFileURL(file).href}\n`);
  const bundle = _runCachedCommonJs<ProgramBundle>(file, "program", argv[0] ?? "", process.env);
  const code = await bundle.exports._runProgramBundle(argv, io, (specifier) => import(/* @vite-ignore */ specifier));
  if (code === 0 || code === 3) bundle.keep();
  return code;
}
