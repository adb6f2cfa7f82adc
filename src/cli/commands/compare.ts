/**
 * `hotjunction compare <design.json>`: the design's reference and its `referenceAlternatives`, each on its own
 * standard resistors, against the design's margins; recommends the cheapest adequate one.
 * @module
 */
import type { Command } from "commander";
import { referenceOptionFromDesign, tripDesignFromDesign } from "../../design/designToObjects.js";
import { formatComparisonReport } from "../../report/renderComparisonReport.js";
import type { ReportTemperatureUnit } from "../../report/displayUnit.js";
import { compareReferencesParallel, type compareReferences } from "../../trip/compareReferences.js";
import { _startProgress } from "../progress.js";
import { CliError, marginFailExitCode } from "../cliError.js";
import { _addAnalysisOptions, _addDisplayUnitOption, _addReportOnlyOption, _analysisSettings, _loadDesign, _methodInfo, _setpointLimitsOfDesign, type AnalysisOptionValues } from "../designOptions.js";
import { _addOutputOptions, _chosenFormat, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "../outputOptions.js";
import type { CommandContext } from "../commandContext.js";
import type { CliIo } from "../io.js";
import type { AnalysisSettings } from "../designOptions.js";
import type { DesignFile, DesignReference } from "../../design/designSchema.js";
import type { ReferenceComparison, ReferenceComparisonEntry, TripBand } from "../../trip/types.js";
import type { TripReport, TripReportSetpoint } from "../../report/reportTypes.js";
import { _tripReportOfDesignOnCores } from "./check.js";

type CompareOptions = OutputOptionValues & AnalysisOptionValues & { readonly reportOnly?: boolean; readonly unit?: ReportTemperatureUnit };



/** The ± total tolerance a design-file reference states, fraction (0 for an ideal one). */
function statedToleranceFraction(reference: DesignReference): number {
  if (reference.kind === "ideal") return 0;
  if (reference.kind === "regulator-rail") return reference.totalToleranceFraction ?? 0;
  return reference.initialAccuracyFraction ?? 0;
}

/**
 * The reference comparison of an ADC (firmware-trip) design: each option's firmware trip bands (the chain
 * evaluated at each setpoint with that reference as the converter's full scale), beside an ideal reference of
 * the same voltage; recommended is the cheapest adequate option (missing costs after the costed ones, ties by
 * input order). @internal
 */
export async function _adcComparison(io: CliIo, design: DesignFile, settings: AnalysisSettings): Promise<ReferenceComparison> {
  const all = [design.reference, ...(design.referenceAlternatives ?? [])];
  // each option as the design's one reference (a valid design of its own: its name may be an alternative's)
  const { referenceAlternatives: _alternatives, ...single } = design;
  // each report's Monte Carlo on every core from 262,144 trials (the same numbers as in one thread)
  const reports: (readonly [TripReport, TripReport])[] = [];
  for (const reference of all) {
    const ideal = { ...single, reference: { kind: "ideal" as const, name: `ideal ${reference.nominalVolts} V`, nominalVolts: reference.nominalVolts } };
    reports.push([await _tripReportOfDesignOnCores(io, { ...single, reference }, settings, undefined), await _tripReportOfDesignOnCores(io, ideal, settings, undefined)]);
  }
  const options: ReferenceComparisonEntry[] = all.map((reference, k) => {
    const [report, ideal] = reports[k] as readonly [TripReport, TripReport];
    const acceptance = settings.acceptanceMethod;
    const setpoints = report.setpoints.map((s, i) => {
      const b = s.bands.find((x) => x.method === acceptance) ?? (s.bands[0] as TripBand);
      const iSp = ideal.setpoints[i] as TripReportSetpoint;
      const ib = iSp.bands.find((x) => x.method === acceptance) ?? (iSp.bands[0] as TripBand);
      return {
        name: s.name,
        lowC: b.lowC,
        highC: b.highC,
        idealLowC: ib.lowC,
        idealHighC: ib.highC,
        extraWidthC: Math.max(0, b.highC - b.lowC - (ib.highC - ib.lowC)),
        marginToNormalC: s.marginToNormalC,
        marginToHazardC: s.marginToHazardC,
        pass: s.pass,
      };
    });
    const adequate = setpoints.every((s) => s.pass);
    return {
      name: reference.name,
      kind: referenceOptionFromDesign(reference).kind,
      cost: reference.cost ?? null,
      reference: { name: reference.name, kind: referenceOptionFromDesign(reference).kind, nominalVolts: reference.nominalVolts, toleranceFraction: statedToleranceFraction(reference), problems: [] },
      networks: [],
      setpoints,
      verdict: adequate ? "adequate" : "inadequate",
      verdictText: adequate
        ? `With ${reference.name} every setpoint's ${acceptance} firmware trip band stays above normal operation and below the hazard limit.`
        : `With ${reference.name} at least one setpoint's ${acceptance} firmware trip band reaches normal operation or the hazard limit.`,
    };
  });
  const ranked = options
    .map((o, i) => ({ o, i }))
    .filter(({ o }) => o.verdict === "adequate")
    .sort((a, b) => (a.o.cost ?? Number.POSITIVE_INFINITY) - (b.o.cost ?? Number.POSITIVE_INFINITY) || a.i - b.i);
  const recommended = ranked[0]?.o.name ?? null;
  return {
    acceptanceMethod: settings.acceptanceMethod,
    options,
    recommended,
    summary:
      recommended === null
        ? `None of the ${options.length} reference options keeps the firmware trip inside the margins.`
        : `${ranked.length} of ${options.length} reference options keep the firmware trip inside the margins; the cheapest is ${recommended}.`,
  };
}

/** Registers the `compare` command. @internal */
export function registerCompareCommand(program: Command, context: CommandContext): Command {
  const command = program
    .command("compare")
    .description("compare the reference options of a design file (reference and referenceAlternatives)")
    .argument("<design>", "design file (JSON): comparator thresholds or an ADC with firmware trip")
    .addHelpText("after", "\nExamples:\n  hotjunction compare examples/reflow-oven-trip.json --markdown\n  hotjunction compare examples/reflow-oven-trip.json --svg oven-references.svg\n");
  _addAnalysisOptions(command, "the options' trip bands side by side against the normal and hazard limits");
  _addOutputOptions(command, ["json", "markdown", "csv"], true);
  _addReportOnlyOption(command);
  _addDisplayUnitOption(command);
  command.action(async (path: string, options: CompareOptions) => {
    const plan = _planCommandOutputs(context.io, options, [path], options.svg !== undefined ? [options.svg] : []);
    const { design, input } = await _loadDesign(context.io, path);
    const settings = _analysisSettings(design, options);
    const references = [design.reference, ...(design.referenceAlternatives ?? [])].map(referenceOptionFromDesign);
    const progress = _startProgress(context.io, "Monte Carlo");
    let comparison: ReturnType<typeof compareReferences>;
    try {
      comparison = design.comparator === undefined ? await _adcComparison(context.io, design, settings) : await compareReferencesParallel(tripDesignFromDesign(design), references, {
        acceptanceMethod: settings.acceptanceMethod,
        coverage: settings.coverage,
        monteCarloTrials: settings.trials,
        seed: settings.seed,
        onProgress: (fraction) => progress.update(fraction),
      });
    } finally {
      progress.stop();
    }
    const methods = _methodInfo(settings);
    const unit = { temperatureUnit: options.unit ?? "C" } as const;
    // The chart code (and its d3 scales) loads only when a chart is asked for.
    const extras = options.svg !== undefined ? [(await import("../../report/comparisonChart.js")).comparisonChartSvg({ comparison, methods, setpoints: _setpointLimitsOfDesign(design), ...(design.name !== undefined ? { designName: design.name } : {}) }, unit)] : [];
    _emitOutputs(context.io, plan, options, formatComparisonReport(comparison, _chosenFormat(options), methods, design.name, unit), extras, [input]);
    // The design as drawn is its own reference (the first option); the alternatives failing is what a comparison shows.
    const own = comparison.options[0];
    if (own !== undefined && own.verdict !== "adequate" && options.reportOnly !== true) {
      context.io.writeErr(
        `hotjunction: ${path}: the design's own reference (${own.name}) fails its margins (exit ${marginFailExitCode}; --report-only exits 0)\n`,
      );
      if (context.outcome !== undefined) context.outcome.exitCode = marginFailExitCode;
    }
  });
  return command;
}
