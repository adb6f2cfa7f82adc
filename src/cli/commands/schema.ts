/**
 * `hotjunction schema`: prints the JSON Schema of design files.
 * @module
 */
import type { Command } from "commander";
import { _designJsonSchemaText } from "../../design/designJsonSchema.js";
import { _emitOutputs, _planCommandOutputs } from "../outputOptions.js";
import type { CommandContext } from "../commandContext.js";

/** Registers the `schema` command. @internal */
export function registerSchemaCommand(program: Command, context: CommandContext): Command {
  return program
    .command("schema")
    .description("print the JSON Schema of design files")
    .option("--out <file>", "write it to FILE (atomically) instead of standard output")
    .option("--force", "allow --out to replace an existing file")
    .action(async (options: { out?: string; force?: boolean }) => {
      const plan = _planCommandOutputs(context.io, options, []);
      _emitOutputs(context.io, plan, options, _designJsonSchemaText());
    });
}
