/**
 * `hotjunction emf <type> <temperature>`: the ITS-90 reference function, E(t) with an optional cold junction.
 * @module
 */
import { Option, type Command } from "commander";
import { thermocoupleTypes } from "../../its90/resolveType.js";
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import { _addOutputOptions, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "../outputOptions.js";
import { _integerParser, _parseNumber } from "../parseArgs.js";
import type { CommandContext } from "../commandContext.js";
import { emfUnits, temperatureUnits, type EmfUnit, type TemperatureUnit } from "../temperatureUnits.js";
import { _emfText } from "../conversionText.js";

interface EmfOptions extends OutputOptionValues {
  readonly unit: TemperatureUnit;
  readonly emfUnit: EmfUnit;
  readonly coldJunction?: number;
  readonly decimals?: number;
}

/** Registers the `emf` command. @internal */
export function registerEmfCommand(program: Command, context: CommandContext): Command {
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
  _addOutputOptions(command, ["json"]);
  command.action(async (type: ThermocoupleType, temperature: number, options: EmfOptions) => {
    const plan = _planCommandOutputs(context.io, options, []);
    const text = _emfText(type, temperature, options);
    _emitOutputs(context.io, plan, options, text);
  });
  return command;
}
