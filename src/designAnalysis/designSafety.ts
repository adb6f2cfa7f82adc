/**
 * The fault review and safety figures of a design file, shared by `faults`, `validate` and the workbench: each
 * channel's single-fault review with its worst-case band, the fault ids of the catalogue, the failure-data checks
 * against them, and the safety-figures report (figures per setpoint and channel, 1oo2 pairs, PFDavg curves).
 * @internal
 * @module
 */
import { evaluateChain } from "../chain/evaluateChain.js";
import type { MeasurementChain } from "../chain/types.js";
import type { DesignFile } from "../design/designSchema.js";
import { failureDataFromDesign, measurementChainFromDesign, secondChannelDesign, tripDesignFromDesign } from "../design/designToObjects.js";
import { HotjunctionRangeError, type HotjunctionError } from "../errors.js";
import { faultCatalogue } from "../faults/faultCatalogue.js";
import { reviewChainFaults } from "../faults/faultReviewReport.js";
import { reviewTripDesignFaults } from "../faults/reviewTripDesignFaults.js";
import type { Fault, FaultReviewReport, ReviewFaultsOptions } from "../faults/types.js";
import { logSpacedHours, pfdAvgCurve } from "../safety/pfdAvgCurve.js";
import { safetyFiguresFromReviews } from "../safety/safetyFiguresFromReviews.js";
import { safetyFiguresReport } from "../safety/safetyFiguresReport.js";
import { twoChannelCutout } from "../safety/twoChannelCutout.js";
import type { PfdAvgCurve, ProofTestParameters, SafetyFiguresReport, SetpointSafetyFigures, TwoChannelCutout } from "../safety/types.js";
import { failureDataProblems } from "../safety/validateFailureData.js";
import { designTrip } from "../trip/designTrip.js";
import { _designAnalysisSettings } from "./designSettings.js";

/** Label of the first channel in the safety figures. */
const firstChannelName = "first channel";

/** The ADC (firmware) trips of a design with their healthy worst-case bands, °C. */
function adcTrips(design: DesignFile, chain: MeasurementChain) {
  return design.setpoints.map((s) => {
    const evaluation = evaluateChain(chain, s.tripTemperatureC, { methods: ["worst-case"] });
    const worst = evaluation.bounds.find((b) => b.method === "worst-case");
    return {
      name: s.name,
      tripTemperatureC: s.tripTemperatureC,
      // Presence was checked when the design was validated.
      maxNormalOperatingC: s.maxNormalOperatingC ?? design.processLimits?.maxNormalOperatingC ?? Number.NaN,
      hazardLimitC: s.hazardLimitC ?? design.processLimits?.hazardLimitC ?? Number.NaN,
      ...(worst !== undefined ? { healthyBandC: { lowC: s.tripTemperatureC - worst.errorHighC, highC: s.tripTemperatureC - worst.errorLowC } } : {}),
    };
  });
}

/**
 * The single-fault review of a design's (first) channel: a comparator design through `designTrip` (each setpoint
 * judged with its worst-case band), an ADC design through its chain (the band from the chain's worst-case
 * reading error at the setpoint). The design's analysis settings (trials, seed, acceptance method) apply. @internal
 */
export function _reviewDesignFaults(design: DesignFile, options: ReviewFaultsOptions): FaultReviewReport {
  if (design.comparator !== undefined) {
    const settings = _designAnalysisSettings(design);
    const trip = tripDesignFromDesign(design);
    const result = designTrip(trip, { acceptanceMethod: settings.acceptanceMethod, monteCarloTrials: settings.trials, seed: settings.seed });
    return reviewTripDesignFaults(trip, result, options);
  }
  const chain = measurementChainFromDesign(design);
  return reviewChainFaults(chain, adcTrips(design, chain), options);
}

/** Fault ids of a design's channels from the catalogue (the divider sized by its topology), plus extra faults. @internal */
export function _designFaultIds(design: DesignFile, extraFaults: readonly Fault[] = []): { first: Set<string>; second: Set<string> } {
  const chain = measurementChainFromDesign(design);
  const resistors = design.comparator === undefined ? 0 : design.resistors?.topology === "ladder" ? design.setpoints.length + 1 : 2;
  const firstChain: MeasurementChain =
    resistors === 0 ? chain : { ...chain, divider: { kind: "divider", resistorsOhms: Array.from({ length: resistors }, () => 10_000), toleranceFraction: 0 } };
  const ids = (c: MeasurementChain): Set<string> => new Set([...faultCatalogue(c).map((f) => f.id), ...extraFaults.map((f) => f.id)]);
  const second = design.failureData?.secondChannel === undefined ? new Set<string>() : ids(measurementChainFromDesign(secondChannelDesign(design)));
  return { first: ids(firstChain), second };
}

/**
 * Every failure-data problem of a design against its fault ids (each a typed error naming the path): unknown
 * fault ids in either channel's modes, and proof-test revealed faults that name no fault of either channel.
 * @internal
 */
export function _designFailureDataProblems(design: DesignFile, ids: { readonly first: ReadonlySet<string>; readonly second: ReadonlySet<string> }): HotjunctionError[] {
  const data = design.failureData;
  if (data === undefined) return [];
  const problems = failureDataProblems({ elements: data.elements }, { faultIds: [...ids.first] });
  if (data.secondChannel !== undefined) {
    problems.push(...failureDataProblems({ elements: data.secondChannel.elements }, { faultIds: [...ids.second], path: "failureData.secondChannel" }));
  }
  (data.proofTest?.revealsFaultIds ?? []).forEach((id, i) => {
    if (!ids.first.has(id) && !ids.second.has(id)) {
      const quantity = `failureData.proofTest.revealsFaultIds[${i}]`;
      problems.push(new HotjunctionRangeError({ code: "UNKNOWN_NAME", quantity, value: id, context: "failure data", problem: "names no fault of the catalogue or review" }));
    }
  });
  return problems;
}

/** The safety figures of a design and the second channel's fault review. @internal */
export interface _DesignSafety {
  readonly report: SafetyFiguresReport;
  readonly secondReview: FaultReviewReport | undefined;
  readonly statedIntervalHours: number | undefined;
}

/**
 * The safety figures of a design with failure data: each channel's review → figures per setpoint; with a proof
 * test, PFDavg/PFH (1oo1), and with a second channel the 1oo2 pair per setpoint and the PFDavg curves.
 * @param secondOptions - review options of the second channel (its protection facts)
 * @param problemError - the error thrown for the first failure-data problem (default: the problem itself, a typed
 *   error naming the path; the CLI makes it a one-line error with the file name)
 * @internal
 */
export function _designSafety(
  design: DesignFile,
  first: FaultReviewReport,
  secondOptions: ReviewFaultsOptions,
  problemError: (problem: HotjunctionError) => Error = (problem) => problem,
): _DesignSafety | undefined {
  const section = design.failureData;
  const data = failureDataFromDesign(design);
  if (section === undefined || data === undefined) return undefined;
  const secondSection = section.secondChannel;
  const secondReview = secondSection === undefined ? undefined : _reviewDesignFaults(secondChannelDesign(design), secondOptions);
  const ids = {
    first: new Set(first.reviews.flatMap((r) => r.rows.map((row) => row.faultId))),
    second: new Set(secondReview?.reviews.flatMap((r) => r.rows.map((row) => row.faultId)) ?? []),
  };
  const problem = _designFailureDataProblems(design, ids)[0];
  if (problem !== undefined) throw problemError(problem);

  const pt = section.proofTest;
  const proofTest: ProofTestParameters | undefined =
    pt === undefined
      ? undefined
      : {
          proofTestIntervalHours: pt.proofTestIntervalHours,
          meanTimeToRestorationHours: pt.meanTimeToRestorationHours,
          ...(pt.meanRepairTimeHours !== undefined ? { meanRepairTimeHours: pt.meanRepairTimeHours } : {}),
          ...(pt.missionTimeHours !== undefined ? { missionTimeHours: pt.missionTimeHours } : {}),
          ...(pt.proofTestCoverage !== undefined ? { proofTestCoverage: pt.proofTestCoverage } : {}),
        };
  const figuresOf = (reviews: FaultReviewReport, known: ReadonlySet<string>, prefix: string): SetpointSafetyFigures[] =>
    safetyFiguresFromReviews(data === undefined ? { elements: [] } : data, reviews.reviews, {
      ...(proofTest !== undefined ? { proofTest } : {}),
      ...(pt?.revealsFaultIds !== undefined ? { proofTestRevealsFaultIds: pt.revealsFaultIds.filter((id) => known.has(id)) } : {}),
      ...(section.countDegradedAsDangerous !== undefined ? { countDegradedAsDangerous: section.countDegradedAsDangerous } : {}),
    }).map((f) => ({ ...f, name: `${prefix}: ${f.name}` }));
  const firstFigures = figuresOf(first, ids.first, firstChannelName);
  let secondFigures: SetpointSafetyFigures[] = [];
  const twoChannel: TwoChannelCutout[] = [];
  const curves: PfdAvgCurve[] = [];
  if (secondSection !== undefined && secondReview !== undefined) {
    const secondData = failureDataFromDesign(design, "second") ?? { elements: [] };
    secondFigures = safetyFiguresFromReviews(secondData, secondReview.reviews, {
      ...(proofTest !== undefined ? { proofTest } : {}),
      ...(pt?.revealsFaultIds !== undefined ? { proofTestRevealsFaultIds: pt.revealsFaultIds.filter((id) => ids.second.has(id)) } : {}),
      ...(section.countDegradedAsDangerous !== undefined ? { countDegradedAsDangerous: section.countDegradedAsDangerous } : {}),
    }).map((f) => ({ ...f, name: `${secondSection.name}: ${f.name}` }));
  }
  if (proofTest !== undefined) {
    const t1 = proofTest.proofTestIntervalHours;
    const maxHours = Math.max(t1, proofTest.missionTimeHours ?? 87_600);
    const fromHours = Math.min(t1, 720);
    const hours = logSpacedHours(fromHours, Math.min(maxHours, Math.max(87_600, t1)), 25);
    firstFigures.forEach((a, i) => {
      const setpointName = design.setpoints[i]?.name ?? a.name;
      const b = secondFigures[i];
      const channelA = { name: `${setpointName}: ${firstChannelName}`, lambdaDuFit: a.lambdaDuFit, lambdaDdFit: a.lambdaDdFit, proofTestCoverage: a.proofTestCoverage };
      const { proofTestIntervalHours: _t1, ...repair } = proofTest;
      if (b !== undefined && secondSection !== undefined) {
        const channelB = { name: `${setpointName}: ${secondSection.name}`, lambdaDuFit: b.lambdaDuFit, lambdaDdFit: b.lambdaDdFit, proofTestCoverage: b.proofTestCoverage };
        twoChannel.push(twoChannelCutout(channelA, channelB, { beta: secondSection.beta, betaD: secondSection.betaD, proofTest }));
        curves.push({
          ...pfdAvgCurve(channelA, { proofTestIntervalsHours: hours, proofTest: repair, pair: { secondChannel: channelB, beta: secondSection.beta, betaD: secondSection.betaD, name: `1oo2 (${setpointName}: ${firstChannelName} + ${secondSection.name})` } }),
        });
      } else {
        curves.push(pfdAvgCurve(channelA, { proofTestIntervalsHours: hours, proofTest: repair }));
      }
    });
  }
  const name = design.name;
  const report = safetyFiguresReport({ ...(name !== undefined ? { name } : {}), setpoints: [...firstFigures, ...secondFigures], twoChannel, curves });
  return { report, secondReview, statedIntervalHours: proofTest?.proofTestIntervalHours };
}
