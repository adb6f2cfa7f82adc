/**
 * What the `emf` and `temp` commands share under commander: their parsed options, the `--json` output options
 * and the action that prints the conversion text (the start-up fast path prints the same text without commander).
 * @module
 */
import type { Command } from "commander";
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import type { CommandContext } from "./commandContext.js";
import type { ConversionOptions } from "./conversionText.js";
import { _addOutputOptions, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "./outputOptions.js";

/** Parsed options of `emf` and `temp`. @internal */
export type ConversionCommandOptions = OutputOptionValues & ConversionOptions;

/**
 * Adds the output options (`--json`, `--out`, `--force`) and the action that prints `textOf(type, value, options)`.
 * @internal
 */
export function _addConversionOutput(
  command: Command,
  context: CommandContext,
  textOf: (type: ThermocoupleType, value: number, options: ConversionOptions) => string,
): Command {
  _addOutputOptions(command, ["json"]);
  command.action(async (type: ThermocoupleType, value: number, options: ConversionCommandOptions) => {
    const plan = _planCommandOutputs(context.io, options, []);
    const text = textOf(type, value, options);
    _emitOutputs(context.io, plan, options, text);
  });
  return command;
}
