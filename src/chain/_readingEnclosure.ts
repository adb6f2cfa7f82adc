/**
 * An interval enclosure of the reading model `_indicatedC(cc, t, x)` (the temperature the chain indicates, read
 * through an ADC and the firmware's nominal conversion, or at a comparator chain's detector input) over a box of
 * its sources: the `modelEnclosure` of `evaluateChain`'s worst case. Built from the compiled chain's own stages
 * (the transfers the point model calls), as `_tripEnclosure.ts` is for the comparator.
 *
 * In real arithmetic the reading is a non-decreasing function of one argument A = M·w·F + L′ [+ E(t_cj + δ)]:
 *
 *   voltage front end:  F = s·(E_h − E(t_cj)) + W(t_cj) + α_cj·t_cj + V_comp(0) + V_os,  w = 1/G_nom,  reading E⁻¹(A)
 *   fixed scale:        F = (s·(E_h − E(t_cj)) + W(t_cj))/α + t_cj + x,                  w = 1,        reading A
 *
 * with E_h = E(t + ε + a) the hot junction's EMF (ε the thermocouple tolerance, a the probe's ageing), s the
 * leakage factor, W = ΔE_cable + Σ ΔE_connector + V_loop the wire's added EMF (`_wireEnclosure.ts`; s = 1, W = 0,
 * a = 0 without a wire), M = G·k the product of the front end's gain G (1 for fixed scale) and the ADC's
 * k = g·FS_nom/FS (g when ratiometric: the full scale cancels; k = 1 without an ADC), L′ = (offset + INL +
 * quantisation)·FS_nom/2ᴺ·1000/G_nom (÷S for fixed scale) the ADC's LSB errors, δ the software compensation's
 * sensor error, x the fixed-scale part's temperature error. The ADC's quantisation is a source (±½ LSB,
 * rectangular) in the unrounded code, not a rounding to an integer: the model has no floor or round. How:
 *
 * 1. Each element's transfer (G, V_os, V_comp at 0 °C, δ, x, g, the LSB errors, FS, s, the loop, an envelope
 *    cable, inline connectors) is monotone in each of its own sources (`_tripEnclosure.ts`, note 1; g, the LSB
 *    errors, s and the wire's offsets are affine): its range is `_cornerRange`. The sources are disjoint, so A is
 *    single-use in each element's value except t_cj (in E(t_cj), V_comp, E(t_cj + δ), the fixed scale's t_cj, the
 *    proportional cable's and a terminating connector's E(t_cj), a connector's E(t_cj + r)), M (a factor on F),
 *    s (a factor on E_h − E(t_cj)), the cable's k, r and δ. E_h, E(t_j) of the cable junction and E(t_conn) of a
 *    connector at its own temperature move with no other input: `_emfOver` encloses their float values.
 * 2. By monotonicity, one input at a time (each step holds at every value of the inputs not yet fixed): A is
 *    affine in M, so its extreme is at an end of M's range (the end the sign of F picks where proven over the
 *    box, else both ends are tried); with M·w at that end, A is affine in s with the factor M·w·(E_h − E(t_cj))
 *    and in k with M·w·(E(t_j) − E(t_cj)), so where the sign of the factor is proven each takes the end it
 *    picks; A falls with r (−M·w·E(t_cj + r)) and rises with δ where E′ > 0 over t_cj + r (t_cj + δ): each takes
 *    its end, plus the piecewise E's backward step at a seam inside (`_backwardSeamStep`); elsewhere each stays an
 *    interval. Then t_cj is the only repeated input, and `_overColdJunction` cuts and subdivides it with an
 *    interval enclosure of ∂A/∂t_cj = M·w·∂F/∂t_cj [+ E′(t_cj + δ)], the software form (1 − M·w·s)·E′(t_cj) +
 *    δ·E″(ξ) + M·w·W′ keeping the near-cancelling Seebeck terms out of the widths where no seam lies between
 *    t_cj and t_cj + δ (E′ jumps at a seam: type N's by 2.3e-4 mV/°C at 0 °C, so the mean-value form fails there).
 * 3. The allowance, applied at each end value and again over each piece (`_overColdJunction`), is 64 unit
 *    roundoffs of the sum of A's terms' magnitudes (the float model against A in real arithmetic on the same
 *    float values of Ê) plus the a-priori bound of |Ê − E| of each evaluation that moves with t_cj, times the
 *    factor on it (the monotone and mean-value steps hold for the real E; applied twice it covers Ê at the ends
 *    and inside). E_h and the other evaluations that do not move with t_cj need none: their float values are
 *    inputs of A, enclosed by `_emfOver`. The exact inverse is non-decreasing (`its90/exactInverse.ts`), so the
 *    reading's enclosure is E⁻¹ at the two ends of A.
 *
 * Outward rounded (proof): every interval sum, difference, product and quotient (`_intervals.ts`), and the
 * float64 values of Ê over an interval (`_emfOver`). Over-approximations by a rounding count (stated, not
 * machine-checked): the corner ranges' and the argument's float allowances (1, 3). Rests also on the exact
 * inverse's monotonicity (construction, tested). Where a cold-junction term crosses a seam inside a window of a
 * few ulps (a sensor error δ or a connector r of the order of an ulp of t_cj at the seam), the float model
 * attains the standard's step between its pieces there (type K at 0 °C: 1.97e-9 mV, about 5e-8 °C); the
 * enclosure holds it, the worst case's search does not find such a window, and the gap shows it.
 * @module
 * @internal
 */
import { _addInterval, _divInterval, _emfOver, _hull, _mag, _mulInterval, _seebeckOver, _subInterval, type _Interval } from "./_intervals.js";
import { _numberRecord } from "../uncertainty/_prepare.js";
import { _ambientInputName, type _CompiledChain } from "./_compileChain.js";
import { _backwardSeamStep, _cornerRange, _emfBoundOver, _enclosedInverse, _overColdJunction, _seamsOf, _unitRoundoff, type _Transfer } from "./_coldJunctionRange.js";
import { _addedOver, _fixedPieceRanges, _wireNames, _wirePieces, _wireSideBox, type _AddedPiece, type _WireSide } from "./_wireEnclosure.js";
import type { _ReferenceStage } from "./reference.js";

type Box = Readonly<Record<string, readonly [number, number]>>;

/** @internal The reading model's enclosure over a box of its inputs: box → [low, high] °C. */
export type _ReadingEnclosure = (box: Box) => readonly [number, number];

/** @internal The enclosure and the source names it accounts for (a model with any other source gets none). */
export interface _ReadingEnclosureOf {
  readonly enclosure: _ReadingEnclosure;
  readonly accountsFor: ReadonlySet<string>;
}

const point = (v: number): _Interval => [v, v];
const namesOf = (sources: readonly { readonly name: string }[] | undefined): string[] => (sources ?? []).map((s) => s.name);

/** What the enclosure needs from the compiled chain, gathered once. */
interface Setup {
  readonly cc: _CompiledChain;
  readonly hotJunctionC: number;
  readonly software: boolean;
  readonly alphaCj: number;
  readonly names: { readonly front: string[]; readonly cj: string[]; readonly reference: string[]; readonly adc: string[]; readonly leakage: string[] };
  readonly pieces: readonly _AddedPiece[];
  readonly seams: readonly number[];
  readonly seamStep: number;
}

/** The parts of A that do not depend on t_cj or on the side, over a box (module note, 1). */
interface BoxTerms {
  readonly tcRange: _Interval;
  readonly emfHot: _Interval;
  /** M = G·k and its weight w (1/G_nom; 1 for fixed scale): A = M·w·F + L′ [+ Ê(t_cj + δ)]. */
  readonly m: _Interval;
  readonly w: number;
  readonly lsbTerm: _Interval;
  /** 1/α on the EMF terms of F (fixed scale), else 1. */
  readonly emfFactor: number;
  readonly alpha: number;
  readonly inner: _Interval;
  readonly delta: _Interval;
  /** The leakage factor s on E(t + ε + a) − E(t_cj). */
  readonly scale: _Interval;
  readonly fixedPieces: readonly (_Interval | undefined)[];
}

function setupOf(cc: _CompiledChain, hotJunctionC: number): Setup {
  const cj = cc.coldJunction;
  const software = cj?.method === "software";
  return {
    cc,
    hotJunctionC,
    software,
    alphaCj: cj !== undefined && !software ? cj.compensationSlopeMillivoltsPerC : 0,
    names: {
      front: cc.fixedScale !== undefined ? namesOf(cc.fixedScale.sources) : namesOf(cc.amplifier.sources),
      cj: namesOf(cj?.sources),
      reference: namesOf((cc.reference as _ReferenceStage | undefined)?.sources),
      adc: namesOf(cc.adc?.sources),
      leakage: namesOf(cc.wire?.leakage?.sources),
    },
    pieces: _wirePieces(cc),
    ..._seamsOf(cc.ct),
  };
}

function boxTerms(s: Setup, box: Box): BoxTerms {
  const { cc, names } = s;
  const { ct, adc, fixedScale, amplifier } = cc;
  const cj = cc.coldJunction;
  const inBox = Object.keys(box);
  const x = _numberRecord(inBox, (i) => {
    const b = box[inBox[i] as string] as readonly [number, number];
    return 0.5 * (b[0] + b[1]);
  });
  const range = (f: _Transfer, list: readonly string[]): _Interval => _cornerRange(f, x, box, list.filter((n) => n in box));
  const eps = (box["thermocouple.tolerance"] ?? [0, 0]) as _Interval;
  const ageing = (box["probe.ageing"] ?? [0, 0]) as _Interval;
  // the model's order: (t + ε) + a
  const hot = cc.wire !== undefined ? _addInterval(_addInterval(point(s.hotJunctionC), eps), ageing) : _addInterval(point(s.hotJunctionC), eps);
  let k: _Interval = point(1);
  let lsb: _Interval = point(0);
  if (adc !== undefined) {
    const g = range((v) => adc.gainFactor(v), names.adc);
    const fs = cc.adcUsesReference ? range((v) => (cc.reference as _ReferenceStage).volts(v), names.reference) : point(cc.adcFullScaleVolts);
    k = adc.ratiometric ? g : _mulInterval(g, _divInterval(point(cc.adcFullScaleVolts), fs));
    lsb = _mulInterval(range((v) => adc.lsbErrors(v), names.adc), point(cc.adcFullScaleVolts / adc.codes));
  }
  const nominalScale = fixedScale !== undefined ? fixedScale.millivoltsPerC : amplifier.nominalGain;
  const leakage = cc.wire?.leakage;
  return {
    tcRange: cc.hasAmbientInput ? (box[_ambientInputName] as _Interval) : point(cc.ambient.minC),
    emfHot: _emfOver(ct, hot),
    m: fixedScale !== undefined ? k : _mulInterval(k, range((v) => amplifier.gain(v), names.front)),
    w: fixedScale !== undefined ? 1 : 1 / amplifier.nominalGain,
    lsbTerm: _divInterval(_mulInterval(lsb, point(1000)), point(nominalScale)),
    emfFactor: fixedScale !== undefined ? 1 / fixedScale.alphaMillivoltsPerC : 1,
    alpha: fixedScale?.alphaMillivoltsPerC ?? 1,
    inner:
      fixedScale !== undefined
        ? range((v) => fixedScale.extraC(v), names.front)
        : cj !== undefined && !s.software
          ? _addInterval(range((v) => cj.compensationMillivolts(v, 0), names.cj), range((v) => amplifier.inputOffsetMillivolts(v), names.front))
          : range((v) => amplifier.inputOffsetMillivolts(v), names.front),
    delta: s.software && cj !== undefined ? range((v) => cj.errorC(v), names.cj) : point(0),
    scale: leakage === undefined ? point(1) : range((v) => leakage.emfScale(v), names.leakage),
    fixedPieces: _fixedPieceRanges(s.pieces, x, box),
  };
}

/**
 * F at t_cj (the factor on M·w) and its t_cj-slope, for the leakage factor `scale` and the wire's sources in
 * `wireBox`: voltage s·(E_h − E(t_cj)) + W + α_cj·t_cj + inner, fixed scale (s·(E_h − E(t_cj)) + W)/α + t_cj + inner.
 */
function factorOf(s: Setup, t: BoxTerms, scale: _Interval, wireBox: Box) {
  const ct = s.cc.ct;
  const fixedScale = s.cc.fixedScale !== undefined;
  const emfPart = (e: _Interval): _Interval => (fixedScale ? _divInterval(e, point(t.alpha)) : e);
  const value = (tc: _Interval): { readonly f: _Interval; readonly emfCj: _Interval; readonly wire: number } => {
    const emfCj = _emfOver(ct, tc);
    let e = _mulInterval(scale, _subInterval(t.emfHot, emfCj));
    let wire = 0;
    if (s.pieces.length > 0) {
      const w = _addedOver(s.pieces, t.fixedPieces, wireBox, tc);
      e = _addInterval(e, w.value);
      wire = w.magnitude;
    }
    const f = fixedScale ? _addInterval(_addInterval(emfPart(e), tc), t.inner) : _addInterval(s.alphaCj !== 0 ? _addInterval(e, _mulInterval(point(s.alphaCj), tc)) : e, t.inner);
    return { f, emfCj, wire };
  };
  /** The slope of the EMF part without −s·E′(t_cj): the wire's. */
  const wireSlope = (tc: _Interval): _Interval => (s.pieces.length > 0 ? _addedOver(s.pieces, t.fixedPieces, wireBox, tc).slope : point(0));
  const slope = (tc: _Interval): _Interval => {
    const e = _addInterval(_mulInterval(scale, _subInterval(point(0), _seebeckOver(ct, tc))), wireSlope(tc));
    return fixedScale ? _addInterval(emfPart(e), point(1)) : _addInterval(e, point(s.alphaCj));
  };
  return { value, slope, wireSlope, emfPart };
}

/**
 * One end of A over the box with M at `mEnd` (module note, 2–3): the wire's sources, the leakage factor and δ at
 * the ends their proven directions pick, then t_cj by `_overColdJunction`.
 */
function sideOf(s: Setup, t: BoxTerms, box: Box, high: boolean, mEnd: number): number {
  const mSide = _mulInterval(point(mEnd), point(t.w));
  const sign = mSide[0] > 0 ? 1 : mSide[1] < 0 ? -1 : 0;
  // ∂A/∂W = M·w (÷α): W up for the high end where M·w > 0
  const side = _wireSideBox(s.cc, box, t.tcRange, sign === 0 ? undefined : high === sign > 0);
  // A is affine in s with the factor M·w·(E_h − E(t_cj)) (÷α): the end its sign picks where proven, else both ends
  const tip = _subInterval(t.emfHot, _emfOver(s.cc.ct, t.tcRange));
  const tipSign = sign * (tip[0] > 0 ? 1 : tip[1] < 0 ? -1 : 0);
  const scales: _Interval[] = t.scale[0] === t.scale[1] ? [t.scale] : tipSign === 0 ? [point(t.scale[0]), point(t.scale[1])] : [point(high === tipSign > 0 ? t.scale[1] : t.scale[0])];
  const values = scales.flatMap((scale) => side.boxes.map((wireBox) => sideWith(s, t, high, mSide, scale, wireBox, side)));
  return high ? Math.max(...values) : Math.min(...values);
}

/** One end of A over the box with M·w, s and the wire's sources as chosen by `sideOf`. */
function sideWith(s: Setup, t: BoxTerms, high: boolean, mSide: _Interval, scale: _Interval, wireBox: Box, side: _WireSide): number {
  const { cc, software } = s;
  const ct = cc.ct;
  const sensorRange = _addInterval(t.tcRange, t.delta);
  const raisesWithDelta = software && _seebeckOver(ct, sensorRange)[0] > 0;
  const dSide = raisesWithDelta ? point(high ? t.delta[1] : t.delta[0]) : t.delta;
  const f = factorOf(s, t, scale, wireBox);
  const eWeight = _mag(mSide) * t.emfFactor; // the factor on each EMF inside F
  let magnitude = 0;
  const argument = (tc: _Interval): _Interval => {
    const v = f.value(tc);
    let a = _addInterval(_mulInterval(mSide, v.f), t.lsbTerm);
    // t_cj is a term of F in the fixed scale (°C), and through α_cj·t_cj with hardware compensation (mV)
    const tcTerm = cc.fixedScale !== undefined ? _mag(tc) : Math.abs(s.alphaCj) * _mag(tc);
    let terms = eWeight * (_mag(t.emfHot) + _mag(v.emfCj) + v.wire) + _mag(mSide) * (_mag(v.f) + tcTerm + _mag(t.inner)) + _mag(t.lsbTerm);
    if (software) {
      const e = _emfOver(ct, _addInterval(tc, dSide));
      terms += _mag(e);
      a = _addInterval(a, e);
    }
    magnitude = Math.max(magnitude, terms);
    return a;
  };
  const slope = (tc: _Interval): _Interval => {
    const shifted = _addInterval(tc, dSide);
    const around = _hull(tc, shifted);
    if (software && dSide[0] === dSide[1] && !s.seams.some((z) => z > around[0] && z <= around[1])) {
      // E′(t_cj + δ) − c·E′(t_cj) = (1 − c)·E′(t_cj) + δ·E″(ξ), ξ between t_cj and t_cj + δ (mean-value theorem, on one
      // polynomial: E′ may jump at a seam), c = M·w·s: the two Seebeck terms nearly cancel, and this form keeps the
      // cancellation out of the interval widths.
      const curvature = _mulInterval(dSide, _seebeckOver(ct, around, 2));
      const c = _mulInterval(mSide, scale);
      return _addInterval(_addInterval(_mulInterval(_subInterval(point(1), c), _seebeckOver(ct, tc)), curvature), _mulInterval(mSide, f.wireSlope(tc)));
    }
    const d = _mulInterval(mSide, f.slope(tc));
    return software ? _addInterval(d, _seebeckOver(ct, shifted)) : d;
  };
  // Ê's a-priori bound for each evaluation that moves with t_cj, by the factor on it (module note, 3).
  const wire = cc.wire;
  const cjTerms = _mag(scale) + (wire?.cable !== undefined ? _mag(wireBox["cable.tolerance"] ?? [0, 0]) * wire.cable.mismatchPerMicrovolt : 0) + (wire?.connectors.filter((c) => c.temperature !== undefined).length ?? 0);
  let emfSum = eWeight * cjTerms * _emfBoundOver(ct, [t.tcRange]);
  for (const r of side.offsets) emfSum += eWeight * _emfBoundOver(ct, [_addInterval(t.tcRange, r)]);
  if (software) emfSum += _emfBoundOver(ct, [_addInterval(t.tcRange, dSide)]);
  // δ and r at an end: the piecewise E may step back across a seam inside t_cj + δ (t_cj + r) by so much.
  const stepBack = (raisesWithDelta ? _backwardSeamStep(ct, sensorRange) : 0) + eWeight * side.backStep;
  const state = { emfEvaluations: 1, seamAllowance: 0, pieces: 0 };
  const allowance = (): number => 64 * _unitRoundoff * magnitude + state.emfEvaluations * emfSum + state.seamAllowance + stepBack;
  const offsets = [...(software ? [dSide] : []), ...side.offsets];
  const r = _overColdJunction(t.tcRange, s.seams, s.seamStep, offsets, Math.max(1, eWeight), { argument, slope, allowance, state });
  return high ? r[1] : r[0];
}

/** The reading's enclosure over a box, °C: A at its two ends (M at an end of its range), through E⁻¹ (module note). */
function enclosureOver(s: Setup, box: Box): readonly [number, number] {
  const t = boxTerms(s, box);
  // The sign of M's factor F over the whole box picks M's end; else both ends are tried.
  const whole = factorOf(s, t, t.scale, box).value(t.tcRange).f;
  const { m } = t;
  const ends = (high: boolean): number[] => (whole[0] > 0 ? [high ? m[1] : m[0]] : whole[1] < 0 ? [high ? m[0] : m[1]] : [m[0], m[1]]);
  const lowArg = Math.min(...ends(false).map((e) => sideOf(s, t, box, false, e)));
  const highArg = Math.max(...ends(true).map((e) => sideOf(s, t, box, true, e)));
  return s.cc.fixedScale !== undefined ? [lowArg, highArg] : [_enclosedInverse(s.cc.ct, lowArg), _enclosedInverse(s.cc.ct, highArg)];
}

/**
 * @internal The enclosure of `_readingModel(cc, hotJunctionC)`'s model over any box of its inputs (module note),
 * and the names it accounts for: every source of the chain. The divider's and the comparator's do not act on the
 * reading, the reference's only through the ADC's full scale.
 */
export function _readingEnclosure(cc: _CompiledChain, hotJunctionC: number): _ReadingEnclosureOf {
  const s = setupOf(cc, hotJunctionC);
  const accountsFor = new Set<string>([
    ...s.names.front,
    ...namesOf(cc.coldJunction?.sources),
    ...s.names.reference,
    ...s.names.adc,
    ...namesOf(cc.divider?.sources),
    ...namesOf(cc.comparator?.sources),
    ..._wireNames(cc),
    _ambientInputName,
    "thermocouple.tolerance",
  ]);
  return { enclosure: (box) => enclosureOver(s, box), accountsFor };
}
