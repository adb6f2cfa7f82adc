/**
 * PFDavg against the proof-test interval, for 1oo1 and 1oo2 (the data of a chart).
 * @module
 */
import { _invalidChoice, _requireShape, HotjunctionRangeError } from "../errors.js";
import { _checkCommonCause, _checkNumber, _checkObject, _checkPositive, _checkProofTest, _checkRates } from "./_safetyChecks.js";
import { pfdAvg1oo1 } from "./pfdAvg1oo1.js";
import { _pairTerms } from "./twoChannelCutout.js";
import type { ChannelRates, CommonCauseBasis, PfdAvgCurve, PfdAvgCurvePoint, ProofTestParameters } from "./types.js";

/** Options of {@link pfdAvgCurve}. */
export interface PfdAvgCurveOptions {
  /** Proof-test intervals of the points, h, each > 0 (e.g. from {@link logSpacedHours}). */
  readonly proofTestIntervalsHours: readonly number[];
  /** Repair times, coverage and mission time; the interval comes from each point. */
  readonly proofTest: Omit<ProofTestParameters, "proofTestIntervalHours">;
  /** With it, each point carries the 1oo2 PFDavg too. */
  readonly pair?: {
    /** The second channel. Default: a second channel identical to the first. */
    readonly secondChannel?: ChannelRates;
    readonly beta: number;
    readonly betaD: number;
    /** Default `"larger"` (see {@link twoChannelCutout}). */
    readonly commonCauseBasis?: CommonCauseBasis;
    /** Label of the pair. Default "1oo2". */
    readonly name?: string;
  };
}

/**
 * `count` intervals from `fromHours` to `toHours`, evenly spaced on a log scale (both ends included).
 * @param fromHours - first interval, h, > 0
 * @param toHours - last interval, h, ≥ fromHours
 * @param count - number of points, integer in [2, 10000]
 * @returns the intervals, h
 * @throws HotjunctionTypeError / HotjunctionRangeError for non-finite or out-of-range values
 * @example
 * ```ts
 * import { logSpacedHours } from "hotjunction";
 * console.log(logSpacedHours(100, 10000, 3).map((h) => Math.round(h))); // [ 100, 1000, 10000 ]
 * ```
 */
export function logSpacedHours(fromHours: number, toHours: number, count: number): number[] {
  const context = "logSpacedHours";
  const from = _checkPositive(fromHours, "fromHours", 1e9, "h", context);
  const to = _checkNumber(toHours, "toHours", from, 1e9, "h", context);
  const n = _checkNumber(count, "count", 2, 10000, undefined, context);
  if (!Number.isInteger(n)) throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "count", value: n, context, problem: "is not an integer" });
  // to / from overflows for a subnormal fromHours (1e-320 h): then the spacing is taken from the logarithms
  const ratio = to / from;
  const wide = !Number.isFinite(ratio);
  const step = (wide ? Math.log(to) - Math.log(from) : Math.log(ratio)) / (n - 1);
  return Array.from({ length: n }, (_, i) => (i === 0 ? from : i === n - 1 ? to : wide ? Math.exp(Math.log(from) + step * i) : from * Math.exp(step * i)));
}

/**
 * PFDavg of one channel (1oo1, {@link pfdAvg1oo1}) and, with `pair`, of a 1oo2 pair ({@link twoChannelCutout}'s
 * forms; IEC 61508-6:2010 Annex B for identical channels) at each proof-test interval. The proof-test coverage
 * is the channel's own (`proofTestCoverage`) or the stated one; below 1 the mission time must be at least every
 * interval.
 * @param channel - λ_DU, λ_DD (FIT), optional name and coverage (e.g. a {@link SetpointSafetyFigures})
 * @param options - intervals (h), repair times, the pair's second channel and β, β_D
 * @returns the points, in the order of the intervals
 * @throws HotjunctionTypeError / HotjunctionRangeError naming the key (an interval above the mission time included)
 * @example
 * ```ts
 * import { pfdAvgCurve } from "hotjunction";
 * const curve = pfdAvgCurve({ name: "kiln", lambdaDuFit: 225, lambdaDdFit: 0 }, { // invented rates
 *   proofTestIntervalsHours: [730, 8760], proofTest: { meanTimeToRestorationHours: 8 }, pair: { beta: 0.05, betaD: 0.02 },
 * });
 * console.log(curve.points.map((p) => p.pfdAvg1oo1.toExponential(2))); // [ '8.39e-5', '9.87e-4' ]
 * console.log(curve.points.map((p) => p.pfdAvg1oo2?.toExponential(2))); // [ '4.20e-6', '5.05e-5' ]
 * ```
 */
export function pfdAvgCurve(channel: ChannelRates, options: PfdAvgCurveOptions): PfdAvgCurve {
  const context = "pfdAvgCurve";
  const a = _checkRates(channel, context, "channel");
  if (typeof options !== "object" || options === null || !Array.isArray(options.proofTestIntervalsHours)) {
    _invalidChoice("proofTestIntervalsHours", options?.proofTestIntervalsHours, ["an array of intervals in hours"], context);
  }
  _checkObject(options.proofTest, "proofTest", context);
  _requireShape(channel.name, ["optional", "string"], "channel.name", context);
  const pair = options.pair;
  let second = a;
  let cc = { beta: 0, betaD: 0 };
  const basis = pair?.commonCauseBasis ?? "larger";
  if (pair !== undefined) {
    cc = _checkCommonCause(pair, context, "pair");
    _requireShape(pair.name, ["optional", "string"], "pair.name", context);
    if (pair.secondChannel !== undefined) second = _checkRates(pair.secondChannel, context, "pair.secondChannel");
    if (basis !== "larger" && basis !== "smaller" && basis !== "geometric-mean") _invalidChoice("pair.commonCauseBasis", basis, ["larger", "smaller", "geometric-mean"], context);
  }
  const coverageA = channel.proofTestCoverage ?? options.proofTest.proofTestCoverage;
  const coverageB = (pair?.secondChannel !== undefined ? pair.secondChannel.proofTestCoverage : channel.proofTestCoverage) ?? options.proofTest.proofTestCoverage;
  const points: PfdAvgCurvePoint[] = options.proofTestIntervalsHours.map((t1, i) => {
    const t = _checkPositive(t1, `proofTestIntervalsHours[${i}]`, 1e9, "h", context);
    const single = pfdAvg1oo1(a, { ...options.proofTest, proofTestIntervalHours: t, ...(coverageA !== undefined ? { proofTestCoverage: coverageA } : {}) });
    let pfd2: number | null = null;
    if (pair !== undefined) {
      const p = _checkProofTest({ ...options.proofTest, proofTestIntervalHours: t }, context);
      const covA = coverageA ?? p.proofTestCoverage;
      const covB = _checkNumber(coverageB ?? p.proofTestCoverage, "pair.secondChannel.proofTestCoverage", 0, 1, undefined, context);
      if (covB < 1 && p.missionTimeHours === null) _invalidChoice("proofTest.missionTimeHours", undefined, ["a mission time when a coverage is below 1"], context);
      const terms = _pairTerms(a, second, cc.beta, cc.betaD, p, basis, covA, covB);
      pfd2 = terms.independentPfd + terms.commonCausePfd;
    }
    return { proofTestIntervalHours: t, pfdAvg1oo1: single.pfdAvg, pfdAvg1oo2: pfd2 };
  });
  return {
    channelName: channel.name ?? "1oo1",
    pairName: pair === undefined ? null : (pair.name ?? "1oo2"),
    beta: pair === undefined ? null : cc.beta,
    betaD: pair === undefined ? null : cc.betaD,
    points,
  };
}
