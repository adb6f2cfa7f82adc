/**
 * Options shared by the commands that read a design file: analysis method, Monte Carlo trials and seed, and the
 * SVG chart path; and the routine that loads the design with its file name in messages.
 * @module
 */
import { Option, type Command } from "commander";
import type { DesignFile } from "../design/designSchema.js";
import { _defaultDesignTrials, _designAnalysisSettings, type AnalysisSettings } from "../designAnalysis/designSettings.js";
import type { ReportMethodInfo } from "../report/reportTypes.js";
import type { CliIo } from "./io.js";
import { marginFailExitCode } from "./cliError.js";
import { _integerParser } from "./parseArgs.js";
import { _readInputFile, type InputIdentity } from "./readInput.js";
import { _propagationMethods, type PropagationMethod } from "../uncertainty/types.js";

/** Analysis options as parsed. */
export interface AnalysisOptionValues {
  readonly method?: PropagationMethod;
  readonly trials?: number;
  readonly seed?: number;
  readonly svg?: string;
}

export type { AnalysisSettings } from "../designAnalysis/designSettings.js";

/** Default Monte Carlo trials of the CLI (the design-file tools' default; raise with --trials). */
export const defaultCliTrials = _defaultDesignTrials;

/** Adds --method, --trials, --seed and, when `svgWhat` is given, --svg. @internal */
export function _addAnalysisOptions(command: Command, svgWhat: string | undefined): Command {
  command.addOption(
    new Option("--method <method>", "band that decides pass/fail (default: the design's, else worst-case)").choices([
      "worst-case",
      "rss",
      "monte-carlo",
    ]),
  );
  command.option("--trials <n>", `Monte Carlo trials (default: the design's, else ${defaultCliTrials})`, _integerParser(100, 10_000_000));
  command.option("--seed <n>", "Monte Carlo seed, 0 to 4294967295 (default: the design's, else 1)", _integerParser(0, 4_294_967_295));
  if (svgWhat !== undefined) command.option("--svg <file>", `also write ${svgWhat} as an SVG chart to FILE`);
  return command;
}

/** Adds `--unit C|F|K`, the temperature unit a design report shows (the `emf`/`temp` option's name and units). @internal */
export function _addDisplayUnitOption(command: Command, what = ""): Command {
  return command.addOption(
    new Option("--unit <unit>", `temperature unit of the report${what}: text, Markdown, HTML, CSV and SVG (design files and JSON fields stay in °C; JSON records the unit)`)
      .choices(["C", "F", "K"])
      .default("C"),
  );
}

/** Adds `--report-only` to `check` and `compare`. @internal */
export function _addReportOnlyOption(command: Command): Command {
  return command.option(
    "--report-only",
    `exit 0 even when the design fails its margins (default: exit ${marginFailExitCode}, for CI gates)`,
  );
}

/** Command line over design file over defaults. @internal */
export function _analysisSettings(design: DesignFile, values: AnalysisOptionValues): AnalysisSettings {
  const base = _designAnalysisSettings(design);
  return {
    acceptanceMethod: values.method ?? base.acceptanceMethod,
    trials: values.trials ?? base.trials,
    seed: values.seed ?? base.seed,
    coverage: base.coverage,
  };
}

/** The method line of reports for these settings. @internal */
export function _methodInfo(settings: AnalysisSettings): ReportMethodInfo {
  return {
    methods: _propagationMethods,
    acceptanceMethod: settings.acceptanceMethod,
    coverage: settings.coverage,
    trials: settings.trials,
    seed: settings.seed,
  };
}

/** A design file as read: the validated design and the input file's identity. */
export interface LoadedDesign {
  readonly design: DesignFile;
  readonly input: InputIdentity;
}

/**
 * Loads a design file given on the command line (relative to the CLI's working directory): a regular file only
 * (exit 1 otherwise), validated by the design module, which is loaded only here (it brings the schema library).
 * @internal
 */
export async function _loadDesign(io: CliIo, path: string): Promise<LoadedDesign> {
  const file = _readInputFile(io.cwd, path);
  const { parseDesign } = await import("../design/parseDesign.js");
  return { design: parseDesign(file.text, { fileName: path }), input: file.identity };
}

/** Each setpoint's target and limits as the design file states them (per setpoint, else the process limits), °C. @internal */
export function _setpointLimitsOfDesign(design: DesignFile): { name: string; tripTemperatureC: number; maxNormalOperatingC: number; hazardLimitC: number }[] {
  return design.setpoints.map((s) => ({
    name: s.name,
    tripTemperatureC: s.tripTemperatureC,
    // Presence was checked when the design was validated.
    maxNormalOperatingC: s.maxNormalOperatingC ?? design.processLimits?.maxNormalOperatingC ?? Number.NaN,
    hazardLimitC: s.hazardLimitC ?? design.processLimits?.hazardLimitC ?? Number.NaN,
  }));
}
