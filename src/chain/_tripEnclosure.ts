/**
 * An interval enclosure of the comparator trip model over a box of its sources (the `modelEnclosure` of worst
 * case, so the bracket's enclosure meets its attained extremes for the chain models).
 *
 * The model is t = E⁻¹(A) − ε − a with the argument
 *
 *   A = (e(t_cj) − W(t_cj)) / s + Ê(t_cj),   e(t_cj) = V_sw·1000/G − V_os − V_comp(t_cj)   (fixed scale: (V_sw·1000/k − t_cj − x)·α)
 *
 * V_sw = V_ref·r + V_cmp the switching voltage, W the wire's added EMF, s its leakage factor, ε the thermocouple
 * tolerance and a the ageing drift. How each part is enclosed, and why it is exact:
 *
 * 1. **Each element's transfer is monotone in each of its own sources, in a direction that does not depend on
 *    the others** (proof by its formula): the reference V·(1 + Σ rel) and every offset, compensation and loop
 *    term are affine; a divider tap ratio below/total rises with every resistor below the tap and falls with
 *    every one above it (∂/∂R = (total − below)/total² or −below/total²) and each resistor R·(1 + tol + tempco)
 *    is affine with R > 0; a resistor-set gain 1 + (R_f/R_g)·f/g rises with f and falls with g; the leakage
 *    factor is affine. So its range over the box is its value at two corners (each source at the end that
 *    raises it, or lowers it; the direction is read off the formula at the box's centre). The corner values are
 *    the float64 values of the model's own code, widened by (16 + 4k) unit roundoffs of their magnitude for the
 *    rounding of a k-source formula inside the box (a rounding count, stated, not machine-checked).
 * 2. **The elements' sources are disjoint**, so the rest is a single-use expression in independent
 *    intervals, and interval arithmetic (outward rounded, in the model's order of operations) gives its exact
 *    range up to rounding — except for the cold-junction temperature t_cj, which appears in V_comp, in Ê(t_cj)
 *    and in the wire.
 * 3. **t_cj by a monotonicity proof, else subdivision.** The t_cj range is cut at the ITS-90 sub-range seams
 *    and then recursively: where an interval enclosure of ∂A/∂t_cj (E′ by interval Horner, see `_intervals.ts`)
 *    has one sign over the piece and the whole box, A is monotone in t_cj there and its range is the union of
 *    the two end values (exact by 2). Otherwise, where an enclosure of ∂²A/∂t_cj² (−W″/s + E″(t_cj): e is affine
 *    in t_cj) has one sign over the piece, ∂A/∂t_cj is monotone there, so its sign at a point proves it on one
 *    side: the turn of A is located on point slopes, the sides of a 2⁻²⁰-wide piece around it are monotone
 *    where the slope at their inner end proves it, and that piece takes the mean-value form. Else (no
 *    curvature sign, or an E(t) term's interval across a seam) the piece is halved, down to 2⁻²⁰ of the range
 *    (or 40 halvings), where the mean-value form A(m) + ∂A/∂t_cj·(t_cj − m) is used. This is where non-monotone
 *    chains (a hardware compensation slope that crosses the Seebeck coefficient inside the ambient range) find
 *    their interior extreme.
 * 4. The argument's enclosure is widened by an allowance for the difference between the model as computed in
 *    float64 and its exact value: 64 unit roundoffs of the sum of its terms' magnitudes plus twice the a-priori
 *    bound of Ê per reference-function evaluation (and the largest seam step where a wire temperature
 *    may cross a seam). The exact inverse is non-decreasing in the EMF (constructed so, `its90/exactInverse.ts`,
 *    tested on every piece edge ± ulps), and float subtraction is monotone, so t's enclosure is E⁻¹ at the two
 *    ends minus ε and a at theirs.
 *
 * What it rests on: the formulas in 1 (proof), outward rounding (proof), the allowance in 1 and 4 (a rounding
 * count) and the exact inverse's monotonicity (construction, tested). The gap it leaves is a few 1e-12 °C.
 * @module
 * @internal
 */
import {
  _addInterval,
  _curvatureOver,
  _divInterval,
  _emfOver,
  _hull,
  _mag,
  _mulInterval,
  _seebeckOver,
  _subInterval,
  type _Interval,
} from "./_intervals.js";
import { _numberRecord } from "../uncertainty/_prepare.js";
import { _ambientInputName, type _CompiledChain } from "./_compileChain.js";
import { _cornerRange, _emfBoundOver, _enclosedInverse, _overColdJunction, _seamsOf, _unitRoundoff, type _Transfer } from "./_coldJunctionRange.js";
import type { _ComparatorStage } from "./comparator.js";
import type { _ReferenceStage } from "./reference.js";

type Box = Readonly<Record<string, readonly [number, number]>>;
type Values = Record<string, number>;
type Transfer = _Transfer;

/** @internal The box enclosure of a trip model: box → [low, high] °C. */
export type _TripEnclosure = (box: Box) => readonly [number, number];

/** @internal The enclosure and the source names it accounts for (a box with any other name is not enclosed). */
export interface _TripEnclosureOf {
  readonly enclosure: _TripEnclosure;
  readonly accountsFor: ReadonlySet<string>;
}

const U = _unitRoundoff;

const point = (v: number): _Interval => [v, v];

/** The wire's added EMF, piece by piece in the model's order (cable, connectors, loop). */
type AddedPiece =
  | {
      readonly over: (
        box: Box,
        tc: _Interval,
      ) => { readonly value: _Interval; readonly coldJunctionSlope: _Interval; readonly coldJunctionCurvature: _Interval | undefined };
    }
  | { readonly transfer: Transfer; readonly names: readonly string[] };

/** What an enclosure of one comparator edge needs from the compiled chain, gathered once per edge. */
interface EnclosureSetup {
  readonly cc: _CompiledChain;
  readonly tap: number;
  readonly edgeMillivolts: number;
  readonly ct: _CompiledChain["ct"];
  readonly reference: _ReferenceStage;
  readonly divider: _CompiledChain["divider"];
  readonly comparator: _ComparatorStage;
  readonly fixedScale: _CompiledChain["fixedScale"];
  readonly amplifier: _CompiledChain["amplifier"];
  /** The cold-junction stage when it compensates in hardware (it then acts on the comparator's input). */
  readonly cj: _CompiledChain["coldJunction"];
  readonly wire: _CompiledChain["wire"];
  readonly leakage: NonNullable<_CompiledChain["wire"]>["leakage"] | undefined;
  readonly referenceNames: readonly string[];
  readonly dividerNames: readonly string[];
  readonly comparatorNames: readonly string[];
  readonly frontNames: readonly string[];
  readonly cjNames: readonly string[];
  readonly leakageNames: readonly string[];
  readonly added: readonly AddedPiece[];
  readonly wireEmfEvaluations: number;
  /** The largest step between neighbouring sub-range polynomials, for wire temperatures that may cross a seam. */
  readonly seamStep: number;
  readonly seams: readonly number[];
}

const namesOf = (sources: readonly { readonly name: string }[] | undefined): string[] => (sources ?? []).map((s) => s.name);

function enclosureSetup(cc: _CompiledChain, tap: number, edgeMillivolts: number): EnclosureSetup {
  const ct = cc.ct;
  const fixedScale = cc.fixedScale;
  const amplifier = cc.amplifier;
  const cj = cc.coldJunction?.method === "hardware" ? cc.coldJunction : undefined;
  const wire = cc.wire;
  const added: AddedPiece[] = [];
  let wireEmfEvaluations = 0;
  if (wire !== undefined) {
    for (const piece of [wire.cable, ...wire.connectors]) {
      if (piece === undefined) continue;
      const over = piece.emfErrorOver;
      if (over !== undefined) {
        added.push({ over });
        wireEmfEvaluations += 2;
      } else added.push({ transfer: (x) => piece.emfErrorMillivolts(x, 0), names: namesOf(piece.sources) });
    }
    if (wire.loop !== undefined) {
      const loop = wire.loop;
      added.push({ transfer: (x) => loop.offsetMillivolts(x), names: namesOf(loop.sources) });
    }
  }
  return {
    cc,
    tap,
    edgeMillivolts,
    ct,
    reference: cc.reference as _ReferenceStage,
    divider: cc.divider,
    comparator: cc.comparator as _ComparatorStage,
    fixedScale,
    amplifier,
    cj,
    wire,
    leakage: wire?.leakage,
    referenceNames: namesOf((cc.reference as _ReferenceStage).sources),
    dividerNames: namesOf(cc.divider?.sources),
    comparatorNames: namesOf((cc.comparator as _ComparatorStage).sources),
    frontNames: fixedScale !== undefined ? namesOf(fixedScale.sources) : namesOf(amplifier.sources),
    cjNames: namesOf(cj?.sources),
    leakageNames: namesOf(wire?.leakage?.sources),
    added,
    wireEmfEvaluations,
    ..._seamsOf(ct),
  };
}

/** The source names an edge's enclosure accounts for (a box with any other name is not enclosed). */
function accountedNames(s: EnclosureSetup): Set<string> {
  const { cc, wire } = s;
  // Software compensation does not act on a comparator's input: its sources leave the trip model unchanged.
  return new Set<string>([
    ...s.referenceNames,
    ...s.dividerNames,
    ...s.comparatorNames,
    ...s.frontNames,
    ...namesOf(cc.coldJunction?.sources),
    ...s.leakageNames,
    ...namesOf(wire?.cable?.sources),
    ...(wire?.connectors ?? []).flatMap((c) => namesOf(c.sources)),
    ...namesOf(wire?.loop?.sources),
    _ambientInputName,
    "thermocouple.tolerance",
    ...(wire !== undefined ? ["probe.ageing"] : []),
  ]);
}

/**
 * @internal The enclosure of `_comparatorTripModel(cc, tap, edge, …)`'s model (any tolerance temperature: the
 * tolerance is a box input like the others) over any box of its inputs. See the module note.
 */
export function _comparatorTripEnclosure(cc: _CompiledChain, tap: number, edgeMillivolts: number): _TripEnclosureOf {
  const setup = enclosureSetup(cc, tap, edgeMillivolts);
  return { enclosure: (box) => enclosureOver(setup, box), accountsFor: accountedNames(setup) };
}

/** The parts of the argument that do not depend on t_cj, each enclosed over a box (module note, 1–2). */
interface FrontOver {
  /** e(t_cj) for a point t_cj (the model's own order) and for an interval (affine in t_cj, slope −α). */
  readonly front: (tc: _Interval) => _Interval;
  readonly frontSlope: number;
  readonly scaleRange: _Interval;
  readonly fixedAdded: readonly (_Interval | undefined)[];
  readonly tcRange: _Interval;
}

function frontOver(s: EnclosureSetup, box: Box): FrontOver {
  const { reference, divider, comparator, fixedScale, amplifier, cj, leakage, cc } = s;
  const names = Object.keys(box);
  const x: Values = _numberRecord(names, (i) => {
    const b = box[names[i] as string] as readonly [number, number];
    return 0.5 * (b[0] + b[1]);
  });
  const present = (list: readonly string[]): string[] => list.filter((n) => n in box);
  const range = (f: Transfer, list: readonly string[]): _Interval => _cornerRange(f, x, box, present(list));
  const vRef = range((v) => reference.volts(v), s.referenceNames);
  const ratio = divider === undefined ? point(1) : range((v) => divider.ratio(v, s.tap), s.dividerNames);
  const vCmp = range((v) => comparator.switchingOffsetVolts(v, s.edgeMillivolts), s.comparatorNames);
  const vSwitch = _addInterval(_mulInterval(vRef, ratio), vCmp);
  const out = _mulInterval(vSwitch, point(1000));

  let front: (tc: _Interval) => _Interval;
  let frontSlope: number;
  if (fixedScale !== undefined) {
    const alpha = fixedScale.alphaMillivoltsPerC;
    const scaled = _divInterval(out, point(fixedScale.millivoltsPerC));
    const extra = range((v) => fixedScale.emfForOutput(v, 0, 0), s.frontNames); // = −x·α
    front = (tc) => _addInterval(_mulInterval(_subInterval(scaled, tc), point(alpha)), extra);
    frontSlope = -alpha;
  } else {
    const gain = range((v) => amplifier.gain(v), s.frontNames);
    const offset = range((v) => amplifier.inputOffsetMillivolts(v), s.frontNames);
    const e0 = _subInterval(_divInterval(out, gain), offset);
    if (cj !== undefined) {
      const alpha = cj.compensationSlopeMillivoltsPerC;
      const compAtZero = range((v) => cj.compensationMillivolts(v, 0), s.cjNames);
      front = (tc) =>
        tc[0] === tc[1]
          ? _subInterval(e0, range((v) => cj.compensationMillivolts(v, tc[0]), s.cjNames))
          : _subInterval(e0, _addInterval(compAtZero, _mulInterval(point(alpha), tc)));
      frontSlope = -alpha;
    } else {
      front = () => e0;
      frontSlope = 0;
    }
  }
  return {
    front,
    frontSlope,
    scaleRange: leakage === undefined ? point(1) : range((v) => leakage.emfScale(v), s.leakageNames),
    fixedAdded: s.added.map((p) => ("transfer" in p ? range(p.transfer, p.names) : undefined)),
    tcRange: cc.hasAmbientInput ? (box[_ambientInputName] as _Interval) : point(cc.ambient.minC),
  };
}

/** The argument A and ∂A/∂t_cj over a t_cj interval, with the float-evaluation allowance (module note, 4). */
interface ArgumentOver {
  /** A over a t_cj interval with the wire's sources from `wireBox` and the leakage factor `scale`. */
  readonly argument: (tc: _Interval, wireBox: Box, scale: _Interval) => _Interval;
  /** An enclosure of ∂A/∂t_cj over a t_cj interval (real derivatives). */
  readonly slope: (tc: _Interval, wireBox: Box, scale: _Interval) => _Interval;
  /** An enclosure of ∂²A/∂t_cj² over a t_cj interval, undefined where a term's interval crosses a seam. */
  readonly curvature: (tc: _Interval, wireBox: Box, scale: _Interval) => _Interval | undefined;
  readonly allowance: () => number;
  /** Counters the allowance and the subdivision read and write. */
  readonly state: { emfEvaluations: number; seamAllowance: number; pieces: number };
}

function argumentOver(s: EnclosureSetup, f: FrontOver, box: Box): ArgumentOver {
  const { ct, wire, added, cc } = s;
  const { front, frontSlope, fixedAdded, tcRange } = f;
  let magnitude = 0;
  const state = { emfEvaluations: 1 + s.wireEmfEvaluations, seamAllowance: 0, pieces: 0 };
  const argument = (tc: _Interval, wireBox: Box, scale: _Interval): _Interval => {
    const e = front(tc);
    const emfCj = _emfOver(ct, tc);
    magnitude = Math.max(magnitude, _mag(e) + _mag(emfCj));
    if (wire === undefined) return _addInterval(e, emfCj);
    let w: _Interval = point(0);
    added.forEach((p, i) => {
      const v = "over" in p ? p.over(wireBox, tc).value : (fixedAdded[i] as _Interval);
      w = i === 0 ? v : _addInterval(w, v);
      magnitude = Math.max(magnitude, _mag(v));
    });
    return _addInterval(_divInterval(_subInterval(e, w), scale), emfCj);
  };
  const slope = (tc: _Interval, wireBox: Box, scale: _Interval): _Interval => {
    let d: _Interval = point(frontSlope);
    for (const p of added) if ("over" in p) d = _subInterval(d, p.over(wireBox, tc).coldJunctionSlope);
    if (wire !== undefined) d = _divInterval(d, scale);
    return _addInterval(d, _seebeckOver(ct, tc));
  };
  // e is affine in t_cj and the fixed pieces do not depend on it: A″ = −W″/s + E″(t_cj).
  const curvature = (tc: _Interval, wireBox: Box, scale: _Interval): _Interval | undefined => {
    const own = _curvatureOver(ct, tc);
    if (own === undefined) return undefined;
    let d: _Interval = point(0);
    for (const p of added) {
      if (!("over" in p)) continue;
      const c = p.over(wireBox, tc).coldJunctionCurvature;
      if (c === undefined) return undefined;
      d = _subInterval(d, c);
    }
    if (wire !== undefined) d = _divInterval(d, scale);
    return _addInterval(d, own);
  };
  // Ê's a-priori bound over every temperature used.
  let temps: _Interval = tcRange;
  for (const name of cc.wireRangeNames) {
    const r = box[name];
    if (r !== undefined) temps = _hull(_hull(temps, r), _addInterval(tcRange, r));
  }
  const emfBound = _emfBoundOver(ct, [temps]);
  const allowance = (): number => 64 * U * magnitude + 2 * state.emfEvaluations * emfBound + state.seamAllowance;
  return { argument, slope, curvature, allowance, state };
}

/** A over t_cj ∈ [tcLow, tcHigh] (module note, 3; `_coldJunctionRange.ts`), cut where a reference-function evaluation changes polynomial. */
function argumentOverColdJunction(s: EnclosureSetup, f: FrontOver, a: ArgumentOver, wireBox: Box, scale: _Interval): _Interval {
  // E(t_cj + r) of a connector above the cold junction changes polynomial near seam − r.
  const offsets: _Interval[] = [];
  for (const name of s.cc.wireRangeNames) {
    const r = wireBox[name];
    if (name.endsWith(".aboveColdJunction") && r !== undefined) offsets.push(r);
  }
  return _overColdJunction(f.tcRange, s.seams, s.seamStep, offsets, 1 / Math.min(1, scale[0] > 0 ? scale[0] : 1), {
    argument: (tc) => a.argument(tc, wireBox, scale),
    slope: (tc) => a.slope(tc, wireBox, scale),
    curvature: (tc) => a.curvature(tc, wireBox, scale),
    allowance: a.allowance,
    state: a.state,
  });
}

/**
 * A with a wire: the leakage factor and a terminating connector's temperature couple with t_cj. Each takes the
 * end that raises (or lowers) A when its direction is proven over the whole box: A falls with s when its
 * numerator e − W is positive over the box (rises when negative), and rises with a connector's temperature
 * where E′ > 0 over the connector's temperatures (−W holds +E(t_connector), s > 0); A is linear in a proportional
 * cable's relative mismatch k and takes its end where the sign of E(t_junction) − E(t_cj) is proven over the box.
 */
const cableTolerance = "cable.tolerance";

function argumentWithWire(s: EnclosureSetup, f: FrontOver, a: ArgumentOver, box: Box): _Interval {
  const { ct, cc, added } = s;
  const { front, fixedAdded, tcRange, scaleRange } = f;
  const cableOver = s.wire?.cable?.emfErrorOver;
  const numerator = _subInterval(
    front(tcRange),
    added.reduce<_Interval>((w, p, i) => {
      const v = "over" in p ? p.over(box, tcRange).value : (fixedAdded[i] as _Interval);
      return i === 0 ? v : _addInterval(w, v);
    }, point(0)),
  );
  const sideBox = (high: boolean): Box => {
    const b: Record<string, readonly [number, number]> = { ...box };
    for (const name of cc.wireRangeNames) {
      const r = box[name];
      if (r === undefined || name === "cable.junctionTemperature") continue;
      const relative = name.endsWith(".aboveColdJunction");
      const slopeThere = _seebeckOver(ct, relative ? _addInterval(tcRange, r) : r);
      if (slopeThere[0] > 0 && scaleRange[0] > 0) b[name] = high ? [r[1], r[1]] : [r[0], r[0]];
    }
    // The proportional cable: W = k·(E(t_junction) − E(t_cj)) is linear in k, so A falls with k where the
    // bracket is positive over the whole box (its sign read off W's enclosure at k = 1) and rises where negative.
    const k = box[cableTolerance];
    if (cableOver !== undefined && k !== undefined && scaleRange[0] > 0) {
      const perUnit = cableOver({ ...box, [cableTolerance]: [1, 1] }, tcRange).value;
      const rising = perUnit[1] < 0;
      if (perUnit[0] > 0 || rising) b[cableTolerance] = high === rising ? [k[1], k[1]] : [k[0], k[0]];
    }
    return b;
  };
  const sideScale = (high: boolean): _Interval => {
    if (!(scaleRange[0] > 0)) return scaleRange;
    if (numerator[0] > 0) return high ? point(scaleRange[0]) : point(scaleRange[1]);
    if (numerator[1] < 0) return high ? point(scaleRange[1]) : point(scaleRange[0]);
    return scaleRange;
  };
  return [argumentOverColdJunction(s, f, a, sideBox(false), sideScale(false))[0], argumentOverColdJunction(s, f, a, sideBox(true), sideScale(true))[1]];
}

/** The enclosure of one edge's trip temperature over a box, °C (module note). */
function enclosureOver(s: EnclosureSetup, box: Box): readonly [number, number] {
  const { ct, wire } = s;
  const f = frontOver(s, box);
  const a = argumentOver(s, f, box);
  const arg = wire === undefined ? argumentOverColdJunction(s, f, a, box, f.scaleRange) : argumentWithWire(s, f, a, box);
  const inverse = (emf: number): number => _enclosedInverse(ct, emf);
  const eps = (box["thermocouple.tolerance"] ?? [0, 0]) as _Interval;
  const ageing = (box["probe.ageing"] ?? [0, 0]) as _Interval;
  let low = inverse(arg[0]) - eps[1];
  let high = inverse(arg[1]) - eps[0];
  if (wire !== undefined) {
    low -= ageing[1];
    high -= ageing[0];
  }
  return [low, high];
}
