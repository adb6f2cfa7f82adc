/**
 * Entry of the CLI's program bundle, `dist/cli/program.cjs`: the commander program, every command and the
 * libraries they use (zod, commander, d3, decimal.js) in one CommonJS file, which `_programLoader.ts` compiles
 * with a V8 code cache. Each command's code still runs only when that command runs (the bundler turns every
 * `import()` into a lazy module start). Failures are reported here, with this bundle's own error classes.
 * @module
 * @internal
 */
import { _reportFailure } from "./cliError.js";
import type { CliIo } from "./io.js";
import { _setModuleImporter } from "../uncertainty/_workerProtocol.js";

/**
 * Runs the commander program and turns a failure into its line and exit code. Never throws. `importModule` is
 * the `import()` of the CLI's ES module entry: this bundle runs as a `node:vm` script without a module loader, and
 * the Monte Carlo host imports model modules (`dist/cli/tripModel.js`) with it. @internal
 */
export async function _runProgramBundle(argv: readonly string[], io: CliIo, importModule?: (specifier: string) => Promise<unknown>): Promise<number> {
  if (importModule !== undefined) _setModuleImporter(importModule);
  try {
    const { _runProgram } = await import("./program.js");
    return await _runProgram(argv, io);
  } catch (error) {
    return _reportFailure(error, io);
  }
}
