/**
 * `hotjunction ref-table <type> --from --to --step`: a reference table in the published style (0.001 mV,
 * rounded in decimal arithmetic), as text, CSV, Markdown or JSON.
 * @module
 */
import type { Command } from "commander";
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import {
  formatReferenceTableCsv,
  formatReferenceTableMarkdown,
  referenceTable,
  type ReferenceTable,
} from "../../its90/referenceTable.js";
import { thermocoupleTypes } from "../../its90/resolveType.js";
import { _addOutputOptions, _chosenFormat, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "../outputOptions.js";
import { _integerParser, _parseNumber, _parsePositiveNumber } from "../parseArgs.js";
import type { CommandContext } from "../commandContext.js";
import { _maxOf } from "../../extremes.js";

interface RefTableOptions extends OutputOptionValues {
  readonly from: number;
  readonly to: number;
  readonly step: number;
  readonly decimals: number;
}

/** The reference table as aligned text columns. @internal */
export function _formatReferenceTableText(table: ReferenceTable): string {
  const header = ["temperature °C", "EMF mV"];
  const rows = table.rows.map((r) => [String(r.temperatureC), r.emfText]);
  const width0 = Math.max(header[0]!.length, _maxOf(rows.map((r) => r[0]!.length)));
  const width1 = Math.max(header[1]!.length, _maxOf(rows.map((r) => r[1]!.length)));
  const line = (a: string, b: string): string => `${a.padStart(width0)}  ${b.padStart(width1)}`;
  return [
    `Type ${table.type}, reference junction at 0 °C (ITS-90)`,
    line(header[0]!, header[1]!),
    ...rows.map((r) => line(r[0]!, r[1]!)),
    "",
  ].join("\n");
}

/** Registers the `ref-table` command. @internal */
export function registerRefTableCommand(program: Command, context: CommandContext): Command {
  // Deliberately alike: emf and temp start their registration the same way, each with its own arguments.
  const command = program
    .command("ref-table")
    .description("reference table E(t) of a type, EMF rounded to 0.001 mV in decimal arithmetic")
    .addArgument(program.createArgument("<type>", "thermocouple type").choices(thermocoupleTypes))
    .requiredOption("--from <C>", "first temperature, °C", _parseNumber)
    .requiredOption("--to <C>", "last temperature, °C", _parseNumber)
    .option("--step <C>", "step, °C", _parsePositiveNumber, 1)
    .option("--decimals <n>", "decimal places of the EMF (0-6)", _integerParser(0, 6), 3)
    .addHelpText("after", "\nExample:\n  hotjunction ref-table K --from 0 --to 1300 --step 10 --csv --out typeK.csv\n");
  _addOutputOptions(command, ["json", "markdown", "csv"]);
  command.action(async (type: ThermocoupleType, options: RefTableOptions) => {
    const plan = _planCommandOutputs(context.io, options, []);
    const table = referenceTable(type, {
      fromC: options.from,
      toC: options.to,
      stepC: options.step,
      decimals: options.decimals,
    });
    const format = _chosenFormat(options);
    const text =
      format === "csv"
        ? formatReferenceTableCsv(table)
        : format === "markdown"
          ? formatReferenceTableMarkdown(table)
          : format === "json"
            ? JSON.stringify(table, null, 2)
            : _formatReferenceTableText(table);
    _emitOutputs(context.io, plan, options, text);
  });
  return command;
}
