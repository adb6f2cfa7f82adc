/**
 * Two-channel cutouts: two channels, each from its own single-fault review, combined as 1oo2 with the
 * common-cause factors β and β_D.
 * @module
 */
import { _invalidChoice, _requireShape } from "../errors.js";
import { _checkCommonCause, _checkNumber, _checkProofTest, _checkRates, _downTimeHours, _perHour, _simplifiedValid, _undetectedDownTimeHours } from "./_safetyChecks.js";
import type { BetaSensitivityRow, ChannelRates, CommonCauseBasis, DangerousRates, ProofTestUsed, TwoChannelCutout, TwoChannelCutoutOptions } from "./types.js";

interface PairTerms {
  readonly independentPfd: number;
  readonly commonCausePfd: number;
  readonly pfhPerHour: number;
  readonly commonCausePfhPerHour: number;
}

function basisRate(a: number, b: number, basis: CommonCauseBasis): number {
  if (basis === "larger") return Math.max(a, b);
  if (basis === "smaller") return Math.min(a, b);
  return Math.sqrt(a * b);
}

/**
 * @internal The 1oo2 terms for two channels with their own rates (FIT) and coverages. For identical channels
 * they are the IEC 61508-6:2010 Annex B forms term by term (see {@link twoChannelCutout}).
 */
export function _pairTerms(
  a: DangerousRates,
  b: DangerousRates,
  beta: number,
  betaD: number,
  p: ProofTestUsed,
  basis: CommonCauseBasis,
  coverageA: number,
  coverageB: number,
): PairTerms {
  const duA = _perHour(a.lambdaDuFit);
  const ddA = _perHour(a.lambdaDdFit);
  const duB = _perHour(b.lambdaDuFit);
  const ddB = _perHour(b.lambdaDdFit);
  const indA = (1 - betaD) * ddA + (1 - beta) * duA;
  const indB = (1 - betaD) * ddB + (1 - beta) * duB;
  const tCeA = _downTimeHours(a, p, 2, coverageA) ?? 0;
  const tGeA = _downTimeHours(a, p, 3, coverageA) ?? 0;
  const tCeB = _downTimeHours(b, p, 2, coverageB) ?? 0;
  const tGeB = _downTimeHours(b, p, 3, coverageB) ?? 0;
  // A common-cause failure is a failure of both channels, so its rate never exceeds the smaller channel's.
  const ccDu = Math.min(beta * basisRate(duA, duB, basis), duA, duB);
  const ccDd = Math.min(betaD * basisRate(ddA, ddB, basis), ddA, ddB);
  const ccCoverage = Math.min(coverageA, coverageB);
  return {
    independentPfd: indA * indB * (tCeA * tGeB + tGeA * tCeB),
    commonCausePfd: ccDd * p.meanTimeToRestorationHours + ccDu * _undetectedDownTimeHours(p, 2, ccCoverage),
    pfhPerHour: indA * tCeA * (1 - beta) * duB + indB * tCeB * (1 - beta) * duA + ccDd + ccDu,
    commonCausePfhPerHour: ccDd + ccDu,
  };
}

function ratio(single: number, pair: number): number | null {
  return pair === 0 ? null : single / pair;
}

/**
 * Combines two channels (e.g. the comparator path and the firmware ADC path, or two thermocouples with their own
 * detectors), each summarized from its own single-fault review, as a 1oo2 cutout: the pair fails to trip only
 * when both channels fail dangerously.
 *
 * Identical channels: the IEC 61508-6:2010 Annex B 1oo2 forms ({@link pfdAvg1oo2}, {@link pfh1oo2}, `from memory`).
 * Different channels (our generalisation, reducing to Annex B term by term when the channels are equal):
 * - independent term: λ'_A·λ'_B·(t_CE,A·t_GE,B + t_GE,A·t_CE,B), with λ'_X = (1 − β_D)·λ_DD,X + (1 − β)·λ_DU,X and
 *   each channel's own t_CE, t_GE (Annex B forms with its own rates). For two channels whose unavailabilities
 *   rise as λ_X·t between proof tests it is the exact mean λ_A·λ_B·T1²/3 of their product;
 * - common-cause term: β_D·λ_DD,c·MTTR + β·λ_DU,c·(T1/2 + MRT), where λ_c is the larger of the two channels' rates
 *   (`commonCauseBasis`, default, the higher PFDavg), the smaller, or their geometric mean, capped at the smaller
 *   channel's rate (a common-cause failure fails both channels); with proof-test coverage the lower of the two
 *   channels' coverages; the independent parts keep (1 − β)·λ of each channel, as in Annex B;
 * - PFH: λ'_A·t_CE,A·(1 − β)·λ_DU,B + λ'_B·t_CE,B·(1 − β)·λ_DU,A + β_D·λ_DD,c + β·λ_DU,c.
 * The pair shares one proof test and repair (T1, MTTR, MRT, T_M). What the second channel buys is
 * `improvementFactor` (better single channel / pair), set against `commonCauseShare` and a table over β.
 * @param channelA - first channel: name, λ_DU, λ_DD (FIT), optional proof-test coverage (e.g. a {@link SetpointSafetyFigures})
 * @param channelB - second channel, the same
 * @param options - β, β_D in [0, 1], the proof test, the common-cause basis, the β values of the sensitivity table
 * @returns the pair's figures beside each channel's 1oo1 figures
 * @throws HotjunctionTypeError / HotjunctionRangeError naming the key
 * @example
 * ```ts
 * import { twoChannelCutout } from "hotjunction";
 * // Invented rates: a comparator channel and a firmware ADC channel.
 * const pair = twoChannelCutout(
 *   { name: "comparator", lambdaDuFit: 225, lambdaDdFit: 0 },
 *   { name: "firmware", lambdaDuFit: 60, lambdaDdFit: 300 },
 *   { beta: 0.05, betaD: 0.02, proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 } },
 * );
 * console.log(pair.channelA.pfdAvg1oo1.toExponential(2), pair.pfdAvg1oo2.toExponential(2)); // "9.87e-4" "4.97e-5"
 * console.log(pair.commonCauseShare?.toFixed(2), pair.improvementFactor?.toFixed(1)); // "0.99" "5.3"
 * ```
 */
export function twoChannelCutout(channelA: ChannelRates, channelB: ChannelRates, options: TwoChannelCutoutOptions): TwoChannelCutout {
  const context = "twoChannelCutout";
  const a = _checkRates(channelA, context, "channelA");
  const b = _checkRates(channelB, context, "channelB");
  _requireShape(channelA.name, ["optional", "string"], "channelA.name", context);
  _requireShape(channelB.name, ["optional", "string"], "channelB.name", context);
  if (typeof options !== "object" || options === null) _invalidChoice("options", options, ["an object with beta, betaD and proofTest"], context);
  const { beta, betaD } = _checkCommonCause(options, context);
  const p = _checkProofTest(options.proofTest, context);
  const basis = options.commonCauseBasis ?? "larger";
  if (basis !== "larger" && basis !== "smaller" && basis !== "geometric-mean") _invalidChoice("commonCauseBasis", basis, ["larger", "smaller", "geometric-mean"], context);
  const coverageOf = (c: ChannelRates, path: string): number =>
    c.proofTestCoverage === undefined || c.proofTestCoverage === null ? p.proofTestCoverage : _checkNumber(c.proofTestCoverage, path, 0, 1, undefined, context);
  const covA = coverageOf(channelA, "channelA.proofTestCoverage");
  const covB = coverageOf(channelB, "channelB.proofTestCoverage");
  if (Math.min(covA, covB) < 1 && p.missionTimeHours === null) {
    _invalidChoice("proofTest.missionTimeHours", undefined, ["a mission time ≥ the proof-test interval when a coverage is below 1"], context);
  }
  const single = (r: DangerousRates, cov: number): number =>
    _perHour(r.lambdaDuFit) * _undetectedDownTimeHours(p, 2, cov) + _perHour(r.lambdaDdFit) * p.meanTimeToRestorationHours;
  const pfdA = single(a, covA);
  const pfdB = single(b, covB);
  const better = Math.min(pfdA, pfdB);
  const terms = _pairTerms(a, b, beta, betaD, p, basis, covA, covB);
  const pfdPair = terms.independentPfd + terms.commonCausePfd;
  const free = _pairTerms(a, b, 0, 0, p, basis, covA, covB);

  const betas = options.betaSensitivity ?? [0, 0.01, 0.02, 0.05, 0.1, 0.2];
  if (!Array.isArray(betas)) _invalidChoice("betaSensitivity", betas, ["an array of β values in [0, 1]"], context);
  const betaDRatio = beta === 0 ? null : betaD / beta;
  const betaSensitivity: BetaSensitivityRow[] = betas.map((value, i) => {
    const rowBeta = _checkNumber(value, `betaSensitivity[${i}]`, 0, 1, undefined, context);
    // β_D/β is Infinity for a subnormal β (1e-320): a row at β = 0 then keeps β_D = 0, not 0·Infinity = NaN
    const rowBetaD = betaDRatio === null ? betaD : rowBeta === 0 ? 0 : Math.min(1, rowBeta * betaDRatio);
    const t = _pairTerms(a, b, rowBeta, rowBetaD, p, basis, covA, covB);
    const pfd = t.independentPfd + t.commonCausePfd;
    return { beta: rowBeta, betaD: rowBetaD, pfdAvg1oo2: pfd, pfh1oo2PerHour: t.pfhPerHour, improvementFactor: ratio(better, pfd) };
  });

  const identical = a.lambdaDuFit === b.lambdaDuFit && a.lambdaDdFit === b.lambdaDdFit && covA === covB;
  const notes: string[] = [
    identical
      ? "Identical channels: the IEC 61508-6 Annex B 1oo2 equations as printed."
      : `Different channels: each channel's own λ and t_CE, t_GE; the common-cause share applies to the ${basis === "geometric-mean" ? "geometric mean of the" : basis} channel rate${basis === "geometric-mean" ? "s" : ""}.`,
    "Both channels share one proof test and repair (T1, MTTR, MRT).",
  ];
  if (beta === 0 && betaD === 0) notes.push("β = β_D = 0 claims fully independent channels; the standards' common-cause scoring rarely supports less than a few per cent.");
  const channel = (c: ChannelRates, r: DangerousRates, pfd: number, fallback: string) => ({
    name: c.name ?? fallback,
    lambdaDuFit: r.lambdaDuFit,
    lambdaDdFit: r.lambdaDdFit,
    pfdAvg1oo1: pfd,
    pfh1oo1PerHour: _perHour(r.lambdaDuFit),
  });
  return {
    channelA: channel(channelA, a, pfdA, "channel A"),
    channelB: channel(channelB, b, pfdB, "channel B"),
    beta,
    betaD,
    commonCauseBasis: basis,
    identicalChannels: identical,
    pfdAvg1oo2: pfdPair,
    independentPfd: terms.independentPfd,
    commonCausePfd: terms.commonCausePfd,
    commonCauseShare: pfdPair === 0 ? null : terms.commonCausePfd / pfdPair,
    pfh1oo2PerHour: terms.pfhPerHour,
    commonCausePfhPerHour: terms.commonCausePfhPerHour,
    improvementFactor: ratio(better, pfdPair),
    improvementFactorWithoutCommonCause: ratio(better, free.independentPfd + free.commonCausePfd),
    betaSensitivity,
    proofTest: p,
    simplifiedEquationsValid: _simplifiedValid(a, p) && _simplifiedValid(b, p),
    notes,
  };
}
