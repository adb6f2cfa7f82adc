/**
 * `hotjunction validate <design.json>`: checks a design file and says what it describes.
 * @module
 */
import type { Command } from "commander";
import type { CommandContext } from "../runCli.js";
import { _loadDesign } from "../designOptions.js";

/**
 * Loads a design; when it is invalid, lists every problem found on standard error (one line each: path, what was
 * expected and found) before the one-line summary the error itself prints. @internal
 */
async function _loadDesignListingProblems(context: CommandContext, path: string): ReturnType<typeof _loadDesign> {
  try {
    return await _loadDesign(context.io, path);
  } catch (error) {
    const problems = (error as { problems?: readonly { path: string; problem: string }[] }).problems;
    if (problems !== undefined && problems.length > 1) {
      context.io.writeErr(`hotjunction: ${path}: ${problems.length} problems:\n`);
      for (const p of problems) context.io.writeErr(`  ${p.path.length > 0 ? `at ${p.path}` : "(file)"}: ${p.problem}\n`);
    }
    throw error;
  }
}

/** Registers the `validate` command. @internal */
export function registerValidateCommand(program: Command, context: CommandContext): Command {
  return program
    .command("validate")
    .description("check a design file against the format (schema and cross-field rules)")
    .argument("<design>", "design file (JSON)")
    .action(async (path: string) => {
      const { design } = await _loadDesignListingProblems(context, path);
      const detector = design.comparator !== undefined ? "comparator (hardware) trip" : "ADC (firmware) trip";
      const count = design.setpoints.length;
      context.io.writeOut(`${path}: valid design, ${detector}, ${count} setpoint${count === 1 ? "" : "s"}\n`);
    });
}
