/**
 * `hotjunction validate <design.json>`: checks a design file and says what it describes.
 * @module
 */
import type { Command } from "commander";
import type { CommandContext } from "../runCli.js";
import { _loadDesign } from "../designOptions.js";

/** Registers the `validate` command. @internal */
export function registerValidateCommand(program: Command, context: CommandContext): Command {
  return program
    .command("validate")
    .description("check a design file against the format (schema and cross-field rules)")
    .argument("<design>", "design file (JSON)")
    .action(async (path: string) => {
      const { design } = await _loadDesign(context.io, path);
      const detector = design.comparator !== undefined ? "comparator (hardware) trip" : "ADC (firmware) trip";
      const count = design.setpoints.length;
      context.io.writeOut(`${path}: valid design, ${detector}, ${count} setpoint${count === 1 ? "" : "s"}\n`);
    });
}
