/**
 * `hotjunction temp <type> <emf>`: the exact inverse of the ITS-90 reference function, with cold-junction
 * compensation.
 * @module
 */
import { Option, type Command } from "commander";
import { thermocoupleTypes } from "../../its90/resolveType.js";
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import { _integerParser, _parseNumber } from "../parseArgs.js";
import type { CommandContext } from "../commandContext.js";
import { emfUnits, temperatureUnits } from "../temperatureUnits.js";
import { _tempText } from "../conversionText.js";
import { _addConversionOutput } from "../conversionCommand.js";

/** Registers the `temp` command. @internal */
export function registerTempCommand(program: Command, context: CommandContext): Command {
  // Deliberately alike: emf.ts registers the same flags for the other direction and ref-table starts the same
  // way; each command declares its own arguments, order and help.
  const command = program
    .command("temp")
    .description("hot-junction temperature from a measured EMF (exact ITS-90 inverse, cold junction compensated)")
    .addArgument(program.createArgument("<type>", "thermocouple type").choices(thermocoupleTypes))
    .argument("<emf>", "measured EMF, in --emf-unit", _parseNumber)
    .addOption(new Option("--emf-unit <unit>", "unit of the EMF").choices(emfUnits).default("mV"))
    .addOption(new Option("--unit <unit>", "temperature unit of the result and of --cold-junction").choices(temperatureUnits).default("C"))
    .option("--cold-junction <temperature>", "cold-junction temperature, in --unit (default 0 °C)", _parseNumber)
    .option("--decimals <n>", "decimals shown in the text output (default 2)", _integerParser(0, 15))
    .addHelpText(
      "after",
      "\nExamples:\n  hotjunction temp K 19.644 --cold-junction 25\n  hotjunction temp N 41500 --emf-unit uV --json\n",
    );
  return _addConversionOutput(command, context, _tempText);
}
