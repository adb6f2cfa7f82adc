/**
 * `hotjunction faults <design.json>`: single-fault review of a design's trip chain (what each single fault does to
 * the trip: early, late, never; safe or dangerous; detected or not) as a text table, Markdown or JSON.
 * @module
 */
import { InvalidArgumentError, Option, type Command } from "commander";
import { measurementChainFromDesign, tripDesignFromDesign } from "../../design/designToObjects.js";
import { faultsFromJson } from "../../faults/faultsFromJson.js";
import { reviewChainFaults } from "../../faults/faultReviewReport.js";
import { formatFaultReviewJson } from "../../faults/formatFaultReviewJson.js";
import { formatFaultReviewMarkdown } from "../../faults/formatFaultReviewMarkdown.js";
import { formatFaultReviewText } from "../../faults/formatFaultReviewText.js";
import { reviewTripDesignFaults } from "../../faults/reviewTripDesignFaults.js";
import type { DesignFile } from "../../design/designSchema.js";
import type { FaultDetection, FaultReviewReport, ReviewFaultsOptions } from "../../faults/types.js";
import { designTrip } from "../../trip/designTrip.js";
import { _analysisSettings, _loadDesign } from "../designOptions.js";
import { _addOutputOptions, _chosenFormat, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "../outputOptions.js";
import { _parseNumber } from "../parseArgs.js";
import { _readInputFile } from "../readInput.js";
import type { CommandContext } from "../runCli.js";

interface FaultsCommandOptions extends OutputOptionValues {
  readonly bias?: "pull-up" | "pull-down" | "none";
  readonly outputStage?: "energize-to-trip" | "de-energize-to-trip";
  readonly tripLevel?: "high" | "low";
  readonly rails?: readonly [number, number];
  readonly window?: readonly [number, number];
  readonly windowVolts?: readonly [number, number];
  readonly openDetection?: boolean;
  readonly secondComparator?: number;
  readonly supervisorRange?: readonly [number, number];
  readonly supervisorIndependent?: boolean;
  readonly supervisorTolerance?: number;
  readonly wireShort?: number;
  readonly extraFaults?: string;
  readonly step?: number;
}

/** Parses "a,b" into two numbers. */
function pair(text: string): [number, number] {
  const parts = text.split(",");
  if (parts.length !== 2) throw new InvalidArgumentError(`expected two numbers separated by a comma, found "${text}"`);
  return [_parseNumber(parts[0] as string), _parseNumber(parts[1] as string)];
}

/**
 * The review options: the design file's `protection` section, with the command line overriding it item by item.
 * @internal
 */
export function _faultReviewOptions(cwd: string, o: FaultsCommandOptions, protection: DesignFile["protection"] = {}): ReviewFaultsOptions {
  const fromFile = protection.detection ?? {};
  const supervisorFile = fromFile.supervisoryReading;
  const window =
    o.window !== undefined
      ? { lowC: o.window[0], highC: o.window[1] }
      : o.windowVolts !== undefined
        ? { lowVolts: o.windowVolts[0], highVolts: o.windowVolts[1] }
        : (fromFile.outOfRangeWindowC ?? fromFile.outOfRangeWindowVolts);
  const secondC = o.secondComparator ?? fromFile.secondComparatorC;
  const plausible = o.supervisorRange ?? (supervisorFile ? [supervisorFile.plausibleLowC, supervisorFile.plausibleHighC] : undefined);
  const independent = o.supervisorIndependent === true || supervisorFile?.independentSensor === true;
  const toleranceC = o.supervisorTolerance ?? supervisorFile?.toleranceC;
  const detection: FaultDetection = {
    ...(window !== undefined ? { outOfRangeWindow: window } : {}),
    ...(o.openDetection === true || fromFile.openThermocoupleDetection === true ? { openThermocoupleDetection: true } : {}),
    ...(secondC !== undefined ? { secondComparator: { thresholdC: secondC } } : {}),
    ...(plausible !== undefined || independent || supervisorFile !== undefined
      ? {
          supervisoryReading: {
            ...(plausible?.[0] !== undefined ? { plausibleLowC: plausible[0] } : {}),
            ...(plausible?.[1] !== undefined ? { plausibleHighC: plausible[1] } : {}),
            ...(independent ? { independentSensor: true } : {}),
            ...(toleranceC !== undefined ? { toleranceC } : {}),
          },
        }
      : {}),
  };
  const bias = o.bias ?? protection.openCircuitBias;
  const outputStage = o.outputStage ?? protection.outputStage;
  const tripLevel = o.tripLevel ?? protection.comparatorTripLevel;
  const rails = o.rails !== undefined ? { lowVolts: o.rails[0], highVolts: o.rails[1] } : protection.amplifierRailsVolts;
  return {
    ...(bias !== undefined ? { openCircuitBias: bias } : {}),
    ...(outputStage !== undefined ? { outputStage } : {}),
    ...(tripLevel !== undefined ? { comparatorTripLevel: tripLevel } : {}),
    ...(rails !== undefined ? { amplifierRailsVolts: rails } : {}),
    ...(o.wireShort !== undefined ? { wireShortC: o.wireShort } : {}),
    ...(o.step !== undefined ? { sweepStepC: o.step } : {}),
    ...(o.extraFaults !== undefined ? { extraFaults: faultsFromJson(_readInputFile(cwd, o.extraFaults).text) } : {}),
    detection,
  };
}

/** Registers the `faults` command. @internal */
export function registerFaultsCommand(program: Command, context: CommandContext): Command {
  const command = program
    .command("faults")
    .description("single-fault review of a design's trip chain: what each fault does to the trip, safe or dangerous, detected or not")
    .argument("<design>", "design file (JSON)")
    .addOption(new Option("--bias <bias>", "open-circuit bias of the thermocouple input (default: the design's protection section, else none: floating)").choices(["pull-up", "pull-down", "none"]))
    .addOption(
      new Option("--output-stage <stage>", "output stage on power loss (default: the design's protection section, else energize-to-trip)").choices(["energize-to-trip", "de-energize-to-trip"]),
    )
    .addOption(new Option("--trip-level <level>", "comparator output level that means trip (default high)").choices(["high", "low"]))
    .option("--rails <low,high>", "amplifier output rails, V (default 0,5)", pair)
    .option("--window <low,high>", "out-of-range window on the indicated temperature, °C", pair)
    .option("--window-volts <low,high>", "out-of-range window on the amplifier output, V", pair)
    .option("--open-detection", "the design detects an open thermocouple")
    .option("--second-comparator <temperature>", "a second comparator on the amplifier output tripping at this temperature, °C", _parseNumber)
    .option("--supervisor-range <low,high>", "a supervisory reading flags readings outside this range, °C", pair)
    .option("--supervisor-independent", "the supervisory reading has its own sensor")
    .option("--supervisor-tolerance <temperature>", "disagreement the supervisor tolerates, °C (default 10)", _parseNumber)
    .option("--wire-short <temperature>", "temperature at a short along the wire, °C (default halfway to the trip)", _parseNumber)
    .option("--extra-faults <file>", "JSON file with more faults (an array of { id, element, description, effects })")
    .option("--step <temperature>", "sweep step, °C (default 1)", _parseNumber)
    .addHelpText(
      "after",
      "\nExamples:\n  hotjunction faults examples/reflow-oven-trip.json\n  hotjunction faults examples/ceramic-kiln-cutout.json --bias pull-up --output-stage de-energize-to-trip --window 0,1350 --markdown --out kiln-faults.md\n",
    );
  _addOutputOptions(command, ["json", "markdown"]);
  command.action(async (path: string, options: FaultsCommandOptions) => {
    const inputPaths = [path, ...(options.extraFaults !== undefined ? [options.extraFaults] : [])];
    const plan = _planCommandOutputs(context.io, options, inputPaths);
    const { design, input } = await _loadDesign(context.io, path);
    const extraInput = options.extraFaults !== undefined ? [_readInputFile(context.io.cwd, options.extraFaults).identity] : [];
    const reviewOptions = _faultReviewOptions(context.io.cwd, options, design.protection);
    let report: FaultReviewReport;
    if (design.comparator !== undefined) {
      const settings = _analysisSettings(design, {});
      const trip = tripDesignFromDesign(design);
      const result = designTrip(trip, { acceptanceMethod: settings.acceptanceMethod, monteCarloTrials: settings.trials, seed: settings.seed });
      report = reviewTripDesignFaults(trip, result, reviewOptions);
    } else {
      const trips = design.setpoints.map((s) => ({
        name: s.name,
        tripTemperatureC: s.tripTemperatureC,
        // Presence was checked when the design was validated.
        maxNormalOperatingC: s.maxNormalOperatingC ?? design.processLimits?.maxNormalOperatingC ?? Number.NaN,
        hazardLimitC: s.hazardLimitC ?? design.processLimits?.hazardLimitC ?? Number.NaN,
      }));
      report = reviewChainFaults(measurementChainFromDesign(design), trips, reviewOptions);
    }
    const format = _chosenFormat(options);
    const text =
      format === "json" ? formatFaultReviewJson(report) : format === "markdown" ? formatFaultReviewMarkdown(report) : formatFaultReviewText(report);
    _emitOutputs(context.io, plan, options, text, [], [input, ...extraInput]);
  });
  return command;
}
