/**
 * `hotjunction emf <type> <temperature>`: the ITS-90 reference function, E(t) with an optional cold junction.
 * @module
 */
import { Option, type Command } from "commander";
import { thermocoupleTypes } from "../../its90/resolveType.js";
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import { _integerParser, _parseNumber } from "../parseArgs.js";
import type { CommandContext } from "../commandContext.js";
import { emfUnits, temperatureUnits } from "../temperatureUnits.js";
import { _emfText } from "../conversionText.js";
import { _addConversionOutput } from "../conversionCommand.js";

/** Registers the `emf` command. @internal */
export function registerEmfCommand(program: Command, context: CommandContext): Command {
  // Deliberately alike: temp.ts registers the same flags for the other direction and ref-table starts the same
  // way; each command declares its own arguments, order and help.
  const command = program
    .command("emf")
    .description("thermocouple EMF at a hot-junction temperature (ITS-90 reference function)")
    .addArgument(program.createArgument("<type>", "thermocouple type").choices(thermocoupleTypes))
    .argument("<temperature>", "hot-junction temperature, in --unit", _parseNumber)
    .addOption(new Option("--unit <unit>", "temperature unit").choices(temperatureUnits).default("C"))
    .addOption(new Option("--emf-unit <unit>", "EMF unit of the result").choices(emfUnits).default("mV"))
    .option("--cold-junction <temperature>", "cold-junction temperature, in --unit (default 0 °C)", _parseNumber)
    .option("--decimals <n>", "decimals shown in the text output", _integerParser(0, 15))
    .addHelpText(
      "after",
      "\nExamples:\n  hotjunction emf K 500\n  hotjunction emf N 1250 --cold-junction 30\n  hotjunction emf J 212 --unit F --json\n",
    );
  return _addConversionOutput(command, context, _emfText);
}
