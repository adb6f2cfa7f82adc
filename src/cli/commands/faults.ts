/**
 * `hotjunction faults <design.json>`: single-fault review of a design's trip chain (what each single fault does to
 * the trip: early, late, never; safe, dangerous, degraded or no effect against the healthy worst-case band;
 * detected or not) as a text table, Markdown, CSV or JSON; with the design's `failureData`, the safety figures
 * (λ by class, SFF, DC, PFDavg and PFH for 1oo1, the 1oo2 pair with a second channel) and `--svg`, the chart of
 * PFDavg against the proof-test interval.
 * @module
 */
import { InvalidArgumentError, Option, type Command } from "commander";
import { secondChannelDesign } from "../../design/designToObjects.js";
import { faultsFromJson } from "../../faults/faultsFromJson.js";
import { formatFaultReviewCsv } from "../../faults/formatFaultReviewCsv.js";
import { formatFaultReviewJson } from "../../faults/formatFaultReviewJson.js";
import { formatFaultReviewMarkdown } from "../../faults/formatFaultReviewMarkdown.js";
import { formatFaultReviewText } from "../../faults/formatFaultReviewText.js";
import type { DesignFile } from "../../design/designSchema.js";
import type { FaultDetection, FaultReviewReport, ReviewFaultsOptions } from "../../faults/types.js";
import { pfdAvgChartSvg } from "../../report/pfdAvgChart.js";
import { formatSafetyFiguresCsv } from "../../safety/formatSafetyFiguresCsv.js";
import { formatSafetyFiguresJson } from "../../safety/formatSafetyFiguresJson.js";
import { formatSafetyFiguresMarkdown } from "../../safety/formatSafetyFiguresMarkdown.js";
import { formatSafetyFiguresText } from "../../safety/formatSafetyFiguresText.js";
import { CliError } from "../cliError.js";
import { _addDisplayUnitOption, _loadDesign } from "../designOptions.js";
import { _designSafety, _reviewDesignFaults, type _DesignSafety } from "../../designAnalysis/designSafety.js";
import { _failureDataError } from "../faultSafety.js";
import { _addOutputOptions, _chosenFormat, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "../outputOptions.js";
import { _parseNumber } from "../parseArgs.js";
import { _readInputFile } from "../readInput.js";
import type { CommandContext } from "../commandContext.js";

interface FaultsCommandOptions extends OutputOptionValues {
  /** Display unit of the text, Markdown and CSV review. */
  readonly unit?: "C" | "F" | "K";
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
  readonly noEffectThreshold?: number;
  readonly svg?: string;
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
  const noEffect = o.noEffectThreshold ?? protection.noEffectThresholdC;
  return {
    ...(noEffect !== undefined ? { noEffectThresholdC: noEffect } : {}),
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
    .option(
      "--no-effect-threshold <temperature>",
      "a fault moving the trip by at most this much, inside the limits, is no effect; beyond it degraded, °C (default: the protection section, else 3)",
      _parseNumber,
    )
    .option("--svg <file>", "write the chart of PFDavg against the proof-test interval (1oo1, 1oo2) as SVG (needs failureData with a proofTest)")
    .addHelpText(
      "after",
      "\nWith a failureData section in the design (rates in FIT and mode shares mapped to fault ids, the proof test, an optional\n" +
        "second channel with β and β_D), the report adds the safety figures: λ_SD/λ_SU/λ_DD/λ_DU, SFF, DC, PFDavg and PFH\n" +
        "(IEC 61508-6 Annex B simplified equations, 1oo1 and 1oo2). The rates are yours; no certification is claimed.\n" +
        "\nExamples:\n  hotjunction faults examples/reflow-oven-trip.json\n  hotjunction faults examples/ceramic-kiln-cutout.json --bias pull-up --output-stage de-energize-to-trip --window 0,1350 --markdown --out kiln-faults.md\n" +
        "  hotjunction faults examples/kiln-two-channel-cutout.json --svg kiln-pfd.svg\n",
    );
  _addOutputOptions(command, ["json", "markdown", "csv"], true);
  _addDisplayUnitOption(command, " (command-line temperatures stay in °C)");
  command.action(async (path: string, options: FaultsCommandOptions) => {
    const inputPaths = [path, ...(options.extraFaults !== undefined ? [options.extraFaults] : [])];
    const plan = _planCommandOutputs(context.io, options, inputPaths, options.svg !== undefined ? [options.svg] : []);
    const { design, input } = await _loadDesign(context.io, path);
    if (options.svg !== undefined && design.failureData?.proofTest === undefined) {
      throw new CliError(`${path}: --svg draws PFDavg against the proof-test interval and needs a failureData section with a proofTest`);
    }
    const extraInput = options.extraFaults !== undefined ? [_readInputFile(context.io.cwd, options.extraFaults).identity] : [];
    const reviewOptions = _faultReviewOptions(context.io.cwd, options, design.protection);
    const report = _reviewDesignFaults(design, reviewOptions);
    let safety: _DesignSafety | undefined;
    if (design.failureData !== undefined) {
      // The second channel is reviewed by the same code with its own protection facts (command-line detection
      // options describe the first channel only); sweep step and no-effect threshold apply to both.
      const second = design.failureData.secondChannel === undefined ? undefined : secondChannelDesign(design);
      const secondOptions = _faultReviewOptions(
        context.io.cwd,
        { ...(options.step !== undefined ? { step: options.step } : {}), ...(options.noEffectThreshold !== undefined ? { noEffectThreshold: options.noEffectThreshold } : {}) },
        second?.protection,
      );
      safety = _designSafety(design, report, secondOptions, (problem) => _failureDataError(path, problem));
    }
    const text = _faultsText(_chosenFormat(options), report, safety, options.unit ?? "C");
    const extras =
      options.svg !== undefined && safety !== undefined
        ? [pfdAvgChartSvg({
            title: `PFDavg against the proof-test interval${design.name !== undefined ? `: ${design.name}` : ""}`,
            curves: safety.report.curves,
            ...(safety.statedIntervalHours !== undefined ? { statedIntervalHours: safety.statedIntervalHours } : {}),
            scope: safety.report.scope,
          })]
        : [];
    _emitOutputs(context.io, plan, options, text, extras, [input, ...extraInput]);
  });
  return command;
}

/**
 * The command's main output: the first channel's review, the second channel's review, then the safety figures.
 * JSON: the fault review's object with `secondChannel` (the second channel's review, same format) and
 * `safetyFigures` (the `hotjunction-safety-figures/1` object) added when the design has failure data. CSV: the
 * safety figures when there is failure data, else the fault table.
 * @internal
 */
export function _faultsText(
  format: "text" | "json" | "markdown" | "csv",
  report: FaultReviewReport,
  safety: _DesignSafety | undefined,
  unit: "C" | "F" | "K" = "C",
): string {
  const second = safety?.secondReview;
  const display = { temperatureUnit: unit } as const;
  if (format === "json") {
    // JSON keeps every temperature in °C and records the unit the other forms show.
    const body = { ...(JSON.parse(formatFaultReviewJson(report)) as Record<string, unknown>), temperatureUnit: unit === "C" ? "°C" : unit === "F" ? "°F" : "K" } as Record<string, unknown>;
    if (second !== undefined) body["secondChannel"] = JSON.parse(formatFaultReviewJson(second)) as unknown;
    if (safety !== undefined) body["safetyFigures"] = JSON.parse(formatSafetyFiguresJson(safety.report)) as unknown;
    return `${JSON.stringify(body, null, 2)}\n`;
  }
  if (format === "csv") return safety !== undefined ? formatSafetyFiguresCsv(safety.report) : formatFaultReviewCsv(report, display);
  const render = format === "markdown" ? formatFaultReviewMarkdown : formatFaultReviewText;
  const parts = [render(report, display)];
  if (second !== undefined) parts.push(render(second, display));
  if (safety !== undefined) parts.push(format === "markdown" ? formatSafetyFiguresMarkdown(safety.report) : formatSafetyFiguresText(safety.report));
  return parts.join("\n");
}
