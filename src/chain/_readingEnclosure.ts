/**
 * An interval enclosure of the reading model `_indicatedC(cc, t, x)` (the temperature the chain indicates, read
 * through an ADC and the firmware's nominal conversion, or at a comparator chain's detector input) over a box of
 * its sources: the `modelEnclosure` of `evaluateChain`'s worst case. Built from the compiled chain's own stages
 * (the transfers the point model calls), as `_tripEnclosure.ts` is for the comparator.
 *
 * In real arithmetic the reading is a non-decreasing function of one argument A:
 *
 *   voltage front end:  A = M·(N + V_os)/G_nom + L·1000/G_nom [+ E(t_cj + δ)],  reading E⁻¹(A)
 *   fixed scale:        A = M·(N/α + t_cj + x) + L·1000/S,                        reading A
 *
 * with N = E(t + ε) − E(t_cj) [+ V_comp(t_cj)] the EMF at the amplifier input (hardware compensation added),
 * M = G·k the product of the front end's gain G (1 for fixed scale) and the ADC's k = g·FS_nom/FS (g·1 when
 * ratiometric: the full scale cancels; k = 1 without an ADC), L = (offset + INL + quantisation)·FS_nom/2ᴺ the ADC's
 * LSB errors as a voltage, δ the software compensation's sensor error, x the fixed-scale part's temperature error.
 * The ADC's quantisation is a source (±½ LSB, rectangular) in the unrounded code, not a rounding to an integer:
 * the model has no floor or round, so none is enclosed. How it is enclosed:
 *
 * 1. Each element's transfer (G, V_os, V_comp at 0 °C, δ, x, g, the LSB errors, the reference FS) is monotone in
 *    each of its own sources (the proofs of `_tripEnclosure.ts`, note 1; g and the LSB errors are affine): its
 *    range is `_cornerRange` (`_coldJunctionRange.ts`). The sources are disjoint, so A is single-use in each
 *    element's value except t_cj (in E(t_cj), V_comp = V_comp(0) + α·t_cj, E(t_cj + δ), the fixed scale's t_cj),
 *    M (a factor on all of N) and δ.
 * 2. M and δ by monotonicity: A is affine in M at every other point, so its extreme over M is at an end of M's
 *    range: the end the sign of M's factor (N + V_os, or N/α + t_cj + x) picks where that sign is proven over the
 *    box (M > 0), else the better of the two ends (two evaluations). A rises with δ where E′ > 0 over t_cj + δ: for
 *    the high end of A δ takes its high end (a point), for the low end its low one (plus the backward step of Ê
 *    at a seam inside t_cj + δ, if a type's polynomials step back there); elsewhere it stays an interval. Then t_cj is the only repeated input, and `_overColdJunction` cuts and subdivides it with an
 *    interval enclosure of ∂A/∂t_cj = M·(α − E′(t_cj))/G_nom [+ E′(t_cj + δ)] (fixed scale M·(1 − E′/α)).
 * 3. The argument is widened for the difference between the float64 model and the real A: 64 unit roundoffs of
 *    the sum of its terms' magnitudes, plus twice the a-priori bound of Ê per reference-function evaluation (scaled
 *    by the factor on it). The exact inverse is non-decreasing (`its90/exactInverse.ts`), so the reading's
 *    enclosure is E⁻¹ at the two ends of A.
 *
 * Outward rounded (proof): every interval sum, difference, product and quotient (`_intervals.ts`), and the
 * float64 values of Ê over an interval (`_emfOver`). Over-approximations by a rounding count (stated, not
 * machine-checked): the corner ranges' and the argument's float allowances (1, 3). Rests also on the exact
 * inverse's monotonicity (construction, tested). Chains with a wire have no reading enclosure yet (its sources
 * are not accounted for: their worst case prints no bracket).
 * @module
 * @internal
 */
import { _emfInSubrange } from "../its90/compiled.js";
import { _emfEvaluationBound } from "../its90/curvatureEnclosure.js";
import { _addInterval, _divInterval, _emfOver, _mag, _mulInterval, _seebeckOver, _subInterval, type _Interval } from "./_intervals.js";
import { _ambientInputName, type _CompiledChain } from "./_compileChain.js";
import { _cornerRange, _emfBoundOver, _enclosedInverse, _overColdJunction, _seamsOf, _unitRoundoff, type _Transfer } from "./_coldJunctionRange.js";
import type { _ReferenceStage } from "./reference.js";

type Box = Readonly<Record<string, readonly [number, number]>>;

/** @internal The reading model's enclosure over a box of its inputs: box → [low, high] °C. */
export type _ReadingEnclosure = (box: Box) => readonly [number, number];

const point = (v: number): _Interval => [v, v];
const namesOf = (sources: readonly { readonly name: string }[] | undefined): string[] => (sources ?? []).map((s) => s.name);

/**
 * @internal The enclosure of `_readingModel(cc, hotJunctionC)`'s model over any box of its inputs (module note),
 * or undefined for a chain with a wire (its sources are not accounted for). Every other source of the chain is:
 * the divider's and the comparator's do not act on the reading, the reference's only through the ADC's full scale.
 */
export function _readingEnclosure(cc: _CompiledChain, hotJunctionC: number): _ReadingEnclosure | undefined {
  if (cc.wire !== undefined) return undefined;
  const { ct, adc, fixedScale, amplifier } = cc;
  const cj = cc.coldJunction;
  const software = cj?.method === "software";
  const alphaCj = cj !== undefined && !software ? cj.compensationSlopeMillivoltsPerC : 0;
  const reference = cc.reference as _ReferenceStage | undefined;
  const frontNames = fixedScale !== undefined ? namesOf(fixedScale.sources) : namesOf(amplifier.sources);
  const names = {
    front: frontNames,
    cj: namesOf(cj?.sources),
    reference: namesOf(reference?.sources),
    adc: namesOf(adc?.sources),
  };
  const { seams, seamStep } = _seamsOf(ct);
  const enclosure = (box: Box): readonly [number, number] => {
    const x: Record<string, number> = {};
    for (const name of Object.keys(box)) {
      const b = box[name] as readonly [number, number];
      x[name] = 0.5 * (b[0] + b[1]);
    }
    const range = (f: _Transfer, list: readonly string[]): _Interval => _cornerRange(f, x, box, list.filter((n) => n in box));
    const tcRange: _Interval = cc.hasAmbientInput ? (box[_ambientInputName] as _Interval) : point(cc.ambient.minC);
    const eps = (box["thermocouple.tolerance"] ?? [0, 0]) as _Interval;
    const hot = _addInterval(point(hotJunctionC), eps);
    const emfHot = _emfOver(ct, hot);
    // M = G·k and the LSB errors as the argument's offset (module note).
    let k: _Interval = point(1);
    let lsb: _Interval = point(0);
    if (adc !== undefined) {
      const g = range((v) => adc.gainFactor(v), names.adc);
      const fs = cc.adcUsesReference ? range((v) => (reference as _ReferenceStage).volts(v), names.reference) : point(cc.adcFullScaleVolts);
      k = adc.ratiometric ? g : _mulInterval(g, _divInterval(point(cc.adcFullScaleVolts), fs));
      lsb = _mulInterval(range((v) => adc.lsbErrors(v), names.adc), point(cc.adcFullScaleVolts / adc.codes));
    }
    const nominalScale = fixedScale !== undefined ? fixedScale.millivoltsPerC : amplifier.nominalGain;
    const lsbTerm = _divInterval(_mulInterval(lsb, point(1000)), point(nominalScale));
    const m = fixedScale !== undefined ? k : _mulInterval(k, range((v) => amplifier.gain(v), names.front));
    const w = fixedScale !== undefined ? 1 : 1 / amplifier.nominalGain;
    const alpha = fixedScale?.alphaMillivoltsPerC ?? 1;
    const inner: _Interval =
      fixedScale !== undefined
        ? range((v) => fixedScale.extraC(v), names.front)
        : cj !== undefined && !software
          ? _addInterval(range((v) => cj.compensationMillivolts(v, 0), names.cj), range((v) => amplifier.inputOffsetMillivolts(v), names.front))
          : range((v) => amplifier.inputOffsetMillivolts(v), names.front);
    const delta = software ? range((v) => cj.errorC(v), names.cj) : point(0);
    // The factor on M: N + V_os (voltage), N/α + t_cj + x (fixed scale), with the t_cj terms at t_cj.
    const factor = (tc: _Interval): _Interval => {
      const n = _subInterval(emfHot, _emfOver(ct, tc));
      if (fixedScale !== undefined) return _addInterval(_addInterval(_divInterval(n, point(alpha)), tc), inner);
      return _addInterval(alphaCj !== 0 ? _addInterval(n, _mulInterval(point(alphaCj), tc)) : n, inner);
    };
    const factorSlope = (tc: _Interval): _Interval => {
      const s = _seebeckOver(ct, tc);
      return fixedScale !== undefined ? _subInterval(point(1), _divInterval(s, point(alpha))) : _subInterval(point(alphaCj), s);
    };
    const whole = factor(tcRange);
    const wm = _mulInterval(m, point(w));
    const sensorRange = _addInterval(tcRange, delta);
    const raisesWithDelta = software && _seebeckOver(ct, sensorRange)[0] > 0;
    // δ at an end assumes Ê(t_cj + δ) non-decreasing in δ: across a seam inside t_cj + δ, Ê may step back by the
    // lower polynomial's excess over the upper one there (with both evaluation bounds); that much is allowed.
    let deltaSeam = 0;
    seams.forEach((t, j) => {
      if (!raisesWithDelta || !(t > sensorRange[0] && t <= sensorRange[1])) return;
      const back = _emfInSubrange(ct, j, t) - _emfInSubrange(ct, j + 1, t) + _emfEvaluationBound(ct, j, [t, t]) + _emfEvaluationBound(ct, j + 1, [t, t]);
      deltaSeam += Math.max(0, back);
    });
    // Ê's a-priori bound over every temperature used, scaled by the factor on it.
    const emfBound = _emfBoundOver(ct, [hot, tcRange, _addInterval(tcRange, delta)]);
    const emfWeight = Math.max(1, _mag(wm) / alpha);
    // A is affine in M at every other point: its extreme over M is at an end of M's range (the one the sign of the
    // factor picks when it is proven over the box, else the better of the two).
    const side = (high: boolean, mEnd: number): number => {
      const mSide = _mulInterval(point(mEnd), point(w));
      const dSide = raisesWithDelta ? point(high ? delta[1] : delta[0]) : delta;
      let magnitude = 0;
      const state = { emfEvaluations: software ? 3 : 2, seamAllowance: 0, pieces: 0 };
      const argument = (tc: _Interval): _Interval => {
        const f = factor(tc);
        let a = _addInterval(_mulInterval(mSide, f), lsbTerm);
        let terms = _mag(mSide) * (_mag(emfHot) + _mag(f) + _mag(tc) + _mag(inner)) + _mag(lsbTerm);
        if (software) {
          const e = _emfOver(ct, _addInterval(tc, dSide));
          terms += _mag(e);
          a = _addInterval(a, e);
        }
        magnitude = Math.max(magnitude, terms);
        return a;
      };
      const slope = (tc: _Interval): _Interval => {
        if (software && dSide[0] === dSide[1]) {
          // E′(t_cj + δ) − c·E′(t_cj) = (1 − c)·E′(t_cj) + δ·E″(ξ), ξ between t_cj and t_cj + δ (mean-value theorem):
          // the two Seebeck terms nearly cancel, and this form keeps the cancellation out of the interval widths.
          const shifted = _addInterval(tc, dSide);
          const curvature = _mulInterval(dSide, _seebeckOver(ct, [Math.min(tc[0], shifted[0]), Math.max(tc[1], shifted[1])], 2));
          return _addInterval(_mulInterval(_subInterval(point(1), mSide), _seebeckOver(ct, tc)), curvature);
        }
        const d = _mulInterval(mSide, factorSlope(tc));
        return software ? _addInterval(d, _seebeckOver(ct, _addInterval(tc, dSide))) : d;
      };
      const allowance = (): number => 64 * _unitRoundoff * magnitude + 2 * state.emfEvaluations * emfBound * emfWeight + state.seamAllowance + deltaSeam;
      const r = _overColdJunction(tcRange, seams, seamStep, software ? [dSide] : [], 1, { argument, slope, allowance, state });
      return high ? r[1] : r[0];
    };
    const ends = (high: boolean): number[] => (whole[0] > 0 ? [high ? m[1] : m[0]] : whole[1] < 0 ? [high ? m[0] : m[1]] : [m[0], m[1]]);
    const lowArg = Math.min(...ends(false).map((e) => side(false, e)));
    const highArg = Math.max(...ends(true).map((e) => side(true, e)));
    return fixedScale !== undefined ? [lowArg, highArg] : [_enclosedInverse(ct, lowArg), _enclosedInverse(ct, highArg)];
  };
  return enclosure;
}
