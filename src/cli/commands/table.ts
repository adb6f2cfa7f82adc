/**
 * `hotjunction table <type> --kind ... --from --to --max-error ...`: firmware lookup tables (C header, JSON or
 * CSV) built by the firmware module.
 * @module
 */
import { Option, type Command } from "commander";
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import { _adcBitsMax, _adcBitsMin } from "../../chain/adc.js";
import { firmwareTableFromSpec, type FirmwareTableSpec } from "../../firmware/firmwareTableFromSpec.js";
import { _firmwareTableKinds, type FirmwareTableKind } from "../../firmware/tableFunction.js";
import { thermocoupleTypes } from "../../its90/resolveType.js";
import { isHotjunctionError } from "../../errors.js";
import { CliError, usageExitCode } from "../cliError.js";
import { _emitOutputs, _planCommandOutputs } from "../outputOptions.js";
import { _integerParser, _parseNumber, _parsePositiveNumber } from "../parseArgs.js";
import type { CommandContext } from "../commandContext.js";

interface TableOptions {
  readonly kind: FirmwareTableKind;
  readonly from: number;
  readonly to: number;
  readonly maxError: number;
  readonly format: "c" | "json" | "csv";
  readonly placement?: "adaptive" | "uniform";
  readonly prefix?: string;
  readonly gain?: number;
  readonly fullScaleVolts?: number;
  /** @deprecated The former name of `--full-scale-volts` (accepted until 0.2). */
  readonly referenceVolts?: number;
  readonly bits?: number;
  readonly offsetMv?: number;
  readonly coldJunction?: number;
  readonly maxBreakpoints?: number;
  readonly out?: string;
  readonly force?: boolean;
}

/** The options of an ADC chain, by the spec's key. */
const adcOptionNames = { gain: "--gain", fullScaleVolts: "--full-scale-volts", bits: "--bits" } as const;

/**
 * Words of the firmware module's messages that name its API, and what the `table` command calls them; advice
 * about options the command does not have is replaced by what it offers.
 * @internal
 */
export const _tableVocabulary: readonly (readonly [RegExp, string])[] = [
  [/\(raise the output scale or use a float output\)/g, "(this command stores the output in fixed point: choose a larger --max-error)"],
  [/\braise the cap\b/g, "raise --max-breakpoints"],
  [/\bmaxErrorOutputUnits\b/g, "--max-error"],
  [/\bmaxBreakpoints\b/g, "--max-breakpoints"],
  [/\bminC\b/g, "--from"],
  [/\bmaxC\b/g, "--to"],
  [/\bfullScaleVolts\b/g, "--full-scale-volts"],
  [/\breferenceVolts\b/g, "--full-scale-volts"],
  [/\boffsetMillivolts\b/g, "--offset-mv"],
  [/\bcoldJunctionC\b/g, "--cold-junction"],
];

/** A firmware-module message in the command's own vocabulary. @internal */
export function _inTableVocabulary(message: string): string {
  return _tableVocabulary.reduce((text, [pattern, replacement]) => text.replace(pattern, replacement), message);
}

/**
 * The options with the deprecated `--reference-volts` read as `--full-scale-volts`; both given must agree (else a
 * usage error naming both values).
 */
function withFullScale(options: TableOptions): TableOptions {
  const former = options.referenceVolts;
  if (former === undefined) return options;
  if (options.fullScaleVolts !== undefined && options.fullScaleVolts !== former) {
    throw new CliError(`--full-scale-volts ${options.fullScaleVolts} and the deprecated --reference-volts ${former} differ; give --full-scale-volts only`);
  }
  return { ...options, fullScaleVolts: former };
}

/** Registers the `table` command. @internal */
export function registerTableCommand(program: Command, context: CommandContext): Command {
  return program
    .command("table")
    .description("firmware lookup table with a proven error bound (C header, JSON or CSV)")
    .addArgument(program.createArgument("<type>", "thermocouple type").choices(thermocoupleTypes))
    .addOption(new Option("--kind <kind>", "what the table converts").choices(_firmwareTableKinds).makeOptionMandatory())
    .requiredOption("--from <C>", "lowest temperature covered, °C", _parseNumber)
    .requiredOption("--to <C>", "highest temperature covered, °C", _parseNumber)
    .requiredOption("--max-error <x>", "largest error allowed, in the output's unit (°C, µV or codes)", _parsePositiveNumber)
    .addOption(new Option("--format <format>", "output format").choices(["c", "json", "csv"]).default("c"))
    .addOption(new Option("--placement <placement>", "breakpoint placement").choices(["adaptive", "uniform"]))
    .option("--prefix <name>", "identifier prefix in the C header")
    .option("--gain <V/V>", "ADC kinds: amplifier gain", _parsePositiveNumber)
    .option("--full-scale-volts <V>", "ADC kinds: ADC full-scale (reference) voltage", _parsePositiveNumber)
    // The former name (one name per quantity: the library, the design file and the firmware chain say fullScaleVolts).
    .addOption(new Option("--reference-volts <V>", "deprecated: --full-scale-volts (until 0.2)").argParser(_parsePositiveNumber).hideHelp())
    .option("--bits <n>", "ADC kinds: resolution", _integerParser(_adcBitsMin, _adcBitsMax))
    .option("--offset-mv <mV>", "ADC kinds: offset added at the ADC input, mV", _parseNumber)
    .option("--cold-junction <C>", "ADC kinds: fixed cold-junction temperature, °C", _parseNumber)
    .option("--max-breakpoints <n>", "cap on breakpoints", _integerParser(2, 65536))
    .option("--out <file>", "write the table to FILE (atomically) instead of standard output")
    .option("--force", "allow --out to replace an existing file")
    .addHelpText(
      "after",
      "\nExamples:\n  hotjunction table K --kind emfToTemperature --from 0 --to 1200 --max-error 0.05 --out tc_k.h\n" +
        "  hotjunction table K --kind adcCodeToTemperature --from 25 --to 400 --max-error 0.1 --gain 100 --full-scale-volts 2.5 --bits 16 --cold-junction 25 --format csv\n" +
        "\n--reference-volts, the former name of --full-scale-volts, is accepted until 0.2.\n",
    )
    .action(async (type: ThermocoupleType, given: TableOptions) => {
      const options = withFullScale(given);
      const adcKind = options.kind === "adcCodeToTemperature" || options.kind === "temperatureToAdcCode";
      const adcGiven = [options.gain, options.fullScaleVolts, options.bits].some((v) => v !== undefined);
      if (!adcKind && (adcGiven || options.offsetMv !== undefined || options.coldJunction !== undefined)) {
        throw new CliError(
          `--gain, --full-scale-volts, --bits, --offset-mv and --cold-junction apply to the ADC kinds only (adcCodeToTemperature, temperatureToAdcCode), not to --kind ${options.kind}`,
        );
      }
      if (adcKind) {
        const missing = (Object.keys(adcOptionNames) as (keyof typeof adcOptionNames)[])
          .filter((key) => options[key] === undefined)
          .map((key) => adcOptionNames[key]);
        if (missing.length > 0) {
          throw new CliError(`--kind ${options.kind} needs --gain, --full-scale-volts and --bits; missing ${missing.join(", ")}`);
        }
      }
      const plan = _planCommandOutputs(context.io, options, []);
      const spec: FirmwareTableSpec = {
        format: options.format,
        type,
        kind: options.kind,
        minC: options.from,
        maxC: options.to,
        maxErrorOutputUnits: options.maxError,
        ...(options.placement !== undefined ? { placement: options.placement } : {}),
        ...(options.prefix !== undefined ? { prefix: options.prefix } : {}),
        ...(options.maxBreakpoints !== undefined ? { maxBreakpoints: options.maxBreakpoints } : {}),
        ...(adcGiven
          ? {
              chain: {
                gain: options.gain as number,
                fullScaleVolts: options.fullScaleVolts as number,
                bits: options.bits as number,
                ...(options.offsetMv !== undefined ? { offsetMillivolts: options.offsetMv } : {}),
                ...(options.coldJunction !== undefined ? { coldJunctionC: options.coldJunction } : {}),
              },
            }
          : {}),
      };
      let text: string;
      try {
        text = firmwareTableFromSpec(spec);
      } catch (error) {
        if (isHotjunctionError(error)) throw new CliError(_inTableVocabulary(error.message), usageExitCode);
        throw error;
      }
      _emitOutputs(context.io, plan, options, text);
    });
}
