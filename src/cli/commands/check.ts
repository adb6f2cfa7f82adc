/**
 * `hotjunction check <design.json>`: runs the trip design (comparator designs: thresholds from standard
 * resistors, trip bands, margins; ADC designs: the chain's reading error at each setpoint) and prints the report.
 * @module
 */
import type { Command } from "commander";
import { evaluateChain, type EvaluateChainOptions } from "../../chain/evaluateChain.js";
import { evaluateChainParallel } from "../../chain/evaluateChainParallel.js";
import type { ChainEvaluation, MeasurementChain } from "../../chain/types.js";
import type { DesignFile } from "../../design/designSchema.js";
import { measurementChainFromDesign, tripDesignFromDesign } from "../../design/designToObjects.js";
import { firmwareTripReport } from "../../report/firmwareTripReport.js";
import { formatPartsCsv, formatTripReport, tripReportFromResult } from "../../report/renderTripReport.js";
import type { TripReport } from "../../report/reportTypes.js";
import type { ReportTemperatureUnit } from "../../report/displayUnit.js";
import { designTrip, type DesignTripOptions } from "../../trip/designTrip.js";
import { designTripParallel } from "../../trip/designTripParallel.js";
import type { CliIo } from "../io.js";
import { _addAnalysisOptions, _addDisplayUnitOption, _addReportOnlyOption, _analysisSettings, _loadDesign, _methodInfo, type AnalysisOptionValues, type AnalysisSettings } from "../designOptions.js";
import { CliError, marginFailExitCode } from "../cliError.js";
import { _addOutputOptions, _chosenFormat, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "../outputOptions.js";
import { _startProgress } from "../progress.js";
import { _integerParser } from "../parseArgs.js";
import type { CommandContext } from "../commandContext.js";
import { _adcBuildSheet, _withAdcFullScale } from "../../designAnalysis/adcBuildSheet.js";
import { _withDesignDynamics } from "../../designAnalysis/dynamicsOfDesign.js";

type CheckOptions = OutputOptionValues &
  AnalysisOptionValues & { readonly reportOnly?: boolean; readonly partsCsv?: string; readonly unit?: ReportTemperatureUnit; readonly workers?: number };

/** The extra output files of `check`, in order: the SVG chart, then the bill of materials. @internal */
function checkExtraPaths(options: CheckOptions): string[] {
  return [...(options.svg !== undefined ? [options.svg] : []), ...(options.partsCsv !== undefined ? [options.partsCsv] : [])];
}

/** The contents of `check`'s extra files, same order as {@link checkExtraPaths}. @internal */
async function checkExtraContents(options: CheckOptions, report: TripReport): Promise<string[]> {
  const out: string[] = [];
  // The chart code (and its d3 scales) loads only when a chart is asked for.
  if (options.svg !== undefined) out.push((await import("../../report/tripBandChart.js")).tripBandChartSvg(report, { temperatureUnit: options.unit ?? "C" }));
  if (options.partsCsv !== undefined) {
    if (report.buildSheet === undefined) throw new CliError("this design has no build sheet to write a bill of materials from");
    out.push(formatPartsCsv(report.buildSheet));
  }
  return out;
}


/** designTrip's options from the analysis settings, with the progress line. */
function tripOptions(settings: AnalysisSettings, progress: ReturnType<typeof _startProgress>): DesignTripOptions {
  return {
    acceptanceMethod: settings.acceptanceMethod,
    coverage: settings.coverage,
    monteCarloTrials: settings.trials,
    seed: settings.seed,
    onProgress: (fraction) => progress.update(fraction),
  };
}

/**
 * The trip report of a design with its Monte Carlo on worker threads from 262,144 trials
 * (`designTripParallel`, or `evaluateChainParallel` at each setpoint of an ADC design: the same numbers as
 * {@link _tripReportOfDesign}). @internal
 */
export async function _tripReportOfDesignOnCores(io: CliIo, design: DesignFile, settings: AnalysisSettings, workers: number | undefined): Promise<TripReport> {
  if (design.comparator === undefined) {
    const chain = measurementChainFromDesign(design);
    const options = _chainOptions(settings);
    const evaluations: ChainEvaluation[] = [];
    const progress = _startProgress(io, "chain at setpoints");
    try {
      for (const [i, s] of design.setpoints.entries()) {
        evaluations.push(await evaluateChainParallel(chain, s.tripTemperatureC, { ...options, ...(workers !== undefined ? { workers } : {}) }));
        progress.update((i + 1) / design.setpoints.length);
      }
    } finally {
      progress.stop();
    }
    return _adcReport(design, settings, chain, evaluations);
  }
  const progress = _startProgress(io, "Monte Carlo");
  try {
    const result = await designTripParallel(tripDesignFromDesign(design), { ...tripOptions(settings, progress), ...(workers !== undefined ? { workers } : {}) });
    return tripReportFromResult(result, _methodInfo(settings));
  } finally {
    progress.stop();
  }
}

/** The trip report of a design (comparator or ADC). @internal */
export function _tripReportOfDesign(io: CliIo, design: DesignFile, settings: AnalysisSettings): TripReport {
  const methods = _methodInfo(settings);
  if (design.comparator !== undefined) {
    const progress = _startProgress(io, "Monte Carlo");
    try {
      return tripReportFromResult(designTrip(tripDesignFromDesign(design), tripOptions(settings, progress)), methods);
    } finally {
      progress.stop();
    }
  }
  const chain = measurementChainFromDesign(design);
  const progress = _startProgress(io, "chain at setpoints");
  try {
    const evaluations = design.setpoints.map((s, i) => {
      const evaluation = evaluateChain(chain, s.tripTemperatureC, _chainOptions(settings));
      progress.update((i + 1) / design.setpoints.length);
      return evaluation;
    });
    return _adcReport(design, settings, chain, evaluations);
  } finally {
    progress.stop();
  }
}

/** evaluateChain's options from the analysis settings. */
function _chainOptions(settings: AnalysisSettings): EvaluateChainOptions {
  return { methods: _methodInfo(settings).methods, coverage: settings.coverage, trials: settings.trials, seed: settings.seed };
}

/** The report of an ADC design from its chain's evaluation at each setpoint. */
function _adcReport(design: DesignFile, settings: AnalysisSettings, chain: MeasurementChain, evaluations: readonly ChainEvaluation[]): TripReport {
  const setpoints = design.setpoints.map((s) => ({
    name: s.name,
    tripTemperatureC: s.tripTemperatureC,
    // Presence was checked when the design was validated.
    maxNormalOperatingC: limitOf(s.maxNormalOperatingC ?? design.processLimits?.maxNormalOperatingC, "maxNormalOperatingC", s.name),
    hazardLimitC: limitOf(s.hazardLimitC ?? design.processLimits?.hazardLimitC, "hazardLimitC", s.name),
  }));
  const reference = design.reference;
  const details = [`Reference: ${reference.name} (${reference.kind}), ${reference.nominalVolts} V.`, `ADC: ${design.adc?.bits ?? "?"} bits.`];
  const report = firmwareTripReport(setpoints, evaluations, _methodInfo(settings), details);
  const buildSheet = _adcBuildSheet(design, chain, report, evaluations);
  return _withAdcFullScale({ ...report, ...(design.name !== undefined ? { designName: design.name } : {}), buildSheet }, design.adc?.bits ?? 0, reference.nominalVolts);
}

/** A setpoint's limit (validated present: a missing one here is a bug, said so rather than carried as NaN). */
function limitOf(value: number | undefined, name: string, setpoint: string): number {
  if (value === undefined) throw new Error(`internal: setpoint "${setpoint}" has no ${name} after validation`);
  return value;
}

/** Registers the `check` command. @internal */
export function registerCheckCommand(program: Command, context: CommandContext): Command {
  // Deliberately alike: sweep (and every design command) starts its registration the same way, each with its own options.
  const command = program
    .command("check")
    .description("design the trip thresholds of a design file and report trip bands and margins")
    .argument("<design>", "design file (JSON)")
    .addHelpText(
      "after",
      "\nExamples:\n  hotjunction check examples/reflow-oven-trip.json\n  hotjunction check kiln.json --method monte-carlo --trials 100000 --seed 7 --markdown --out kiln-report.md --svg kiln-bands.svg\n",
    );
  _addAnalysisOptions(command, "the trip bands");
  _addOutputOptions(command, ["json", "markdown", "csv"], true);
  _addReportOnlyOption(command);
  _addDisplayUnitOption(command);
  command.option("--parts-csv <file>", "also write the bill of materials (every part the design chose: value, tolerance, tempco, count) as CSV");
  command.option(
    "--workers <n>",
    "worker threads for the Monte Carlo from 262,144 trials, 1 to 64 (default: the cores available, at most 8; the same numbers for any count)",
    _integerParser(1, 64),
  );
  command.action(async (path: string, options: CheckOptions) => {
    const plan = _planCommandOutputs(context.io, options, [path], checkExtraPaths(options));
    const { design, input } = await _loadDesign(context.io, path);
    const report = await _tripReportOfDesignOnCores(context.io, design, _analysisSettings(design, options), options.workers);
    const named = _withDesignDynamics(design, design.name !== undefined ? { ...report, designName: design.name } : report);
    const text = formatTripReport(named, _chosenFormat(options), { temperatureUnit: options.unit ?? "C" });
    const extras = await checkExtraContents(options, named);
    _emitOutputs(context.io, plan, options, text, extras, [input]);
    if (!named.pass && options.reportOnly !== true) {
      context.io.writeErr(`hotjunction: ${path}: the design fails its margins (exit ${marginFailExitCode}; --report-only exits 0)\n`);
      if (context.outcome !== undefined) context.outcome.exitCode = marginFailExitCode;
    }
  });
  return command;
}
