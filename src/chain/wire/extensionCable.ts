/**
 * The extension or compensating cable: its tolerance statement (IEC 60584-3 classes, ASTM E230 extension-wire
 * limits, or one's own) with the rated cable-temperature range enforced, the tolerance as an EMF at the
 * cable's temperature (not at the tip), and the cable's EMF error ΔE added to the thermocouple's EMF.
 *
 * The tolerance T(t) (± µV) holds for a cable junction at any t of the rated range with the cable's other end
 * at the standard's 0 °C reference. ASTM and custom statements are in °C at the cable's temperature:
 * T(t) = tol·S(t). IEC statements are in µV already. At the tip an EMF error ΔE appears as ΔE/S(t_tip),
 * so a rated ±tol °C maps to about tol·S(t_cable)/S(t_tip).
 *
 * Between the points of the statement two models: `"proportional"`: the cable's EMF is
 * (1 + k)·[E(t_j) − E(t_cj)] with |k| ≤ k_max = min over the rated range of T(t)/|E(t)| (so the deviation from
 * 0 °C stays inside the tolerance everywhere); a cable with both ends at one temperature adds nothing (a
 * homogeneous conductor without a gradient makes no EMF); it rests on that assumption about the deviation's
 * shape. `"envelope"`: |ΔE| ≤ T(t_j) + T(t_cj), which the statement alone guarantees (D(t_j) − D(t_cj) with
 * |D| ≤ T at each end), for any shape of the deviation. The proportional limit never exceeds the envelope
 * (proof: |k|·|E(t_j) − E(t_cj)| ≤ k_max·(|E(t_j)| + |E(t_cj)|) ≤ T(t_j) + T(t_cj), as k_max ≤ T(t)/|E(t)| at
 * every t of the rated range); tests/chain/wireProperties.test.ts checks it over many inputs. The designer's
 * rule tol·S(t_cable)/S(t_tip) lies between the two; the proportional model meets it where the cable spans its
 * rating point from 0 °C. `"envelope"` is the default: a safety band must hold for every cable the
 * statement admits, not only for one whose deviation has the assumed shape.
 * @module
 */
import { astmExtensionWireTolerances, iecCableTolerances, type CableToleranceEntry } from "../../data/cableTolerances.js";
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import { _invalidChoice, _label, _requireFinite, _requireFiniteResult, _requireInRange, _requireOneOf, _requireOrderedPair, HotjunctionRangeError } from "../../errors.js";
import { _compile, type CompiledType } from "../../its90/compiled.js";
import { _emfFromTemperature, _seebeckCoefficient } from "../../its90/engine.js";
import { thermocoupleData } from "../../its90/resolveType.js";
import { _requireNonNegative, _requireObject, type _SourceContext } from "../_common.js";
import type { AmbientRange, WireErrorSource } from "../types.js";
import type { CableMismatchModel, CableTolerance, ExtensionCableElement, TemperatureRangeC } from "../wireTypes.js";
import { _curvatureOver, _emfOver, _mulInterval, _seebeckOver, _subInterval, type _Interval } from "../_intervals.js";
import { _checkRange, _rangeSource, _requireWithin, _wireSource, type _Box, type _Inputs } from "./_wireCommon.js";

/** A resolved cable tolerance statement. */
export interface CableToleranceStatement {
  /** Cable code (`KX`, `KCA` …; `custom` for one's own). */
  readonly code: string;
  readonly grade: "extension" | "compensating";
  /** Rated cable-temperature range, °C. */
  readonly minC: number;
  readonly maxC: number;
  /** The tolerance as an EMF, ± µV (IEC), when so stated. */
  readonly toleranceMicrovolts?: number;
  /** The tolerance in °C at the cable's temperature (ASTM, custom), when so stated. */
  readonly toleranceC?: number;
  /** Where the statement comes from (with `from memory` where it is). */
  readonly source: string;
}

function describe(t: CableTolerance): string {
  if (t.standard === "IEC 60584-3") return `IEC 60584-3 class ${t.class}${t.variant === undefined ? "" : ` variant ${t.variant}`}`;
  if (t.standard === "ASTM E230") return `ASTM E230 ${t.limits} limits`;
  return "custom cable tolerance";
}

function pick(
  entries: readonly CableToleranceEntry[] | undefined,
  grade: "extension" | "compensating",
  variant: unknown,
  what: string,
  type: ThermocoupleType,
  context: string,
): CableToleranceEntry {
  const ofGrade = (entries ?? []).filter((e) => e.grade === grade);
  // Same error shape as other missing-choice checks (deliberate: this one names the cable grade).
  if (ofGrade.length === 0) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "cable grade",
      value: grade,
      context,
      problem: `is not defined for type ${type} by ${what}`,
      allowed: (entries ?? []).map((e) => `${e.grade} (${e.code})`),
    });
  }
  if (ofGrade.length === 1 && variant === undefined) return ofGrade[0] as CableToleranceEntry;
  const match = ofGrade.find((e) => e.variant === variant);
  if (match === undefined) {
    return _invalidChoice(
      "cable variant",
      variant,
      ofGrade.map((e) => String(e.variant ?? "(none)")),
      `${context} (${what}, type ${type} ${grade})`,
    );
  }
  return match;
}

/**
 * The tolerance statement of a cable for a thermocouple type: code, rated range and tolerance.
 * @param type - thermocouple type letter
 * @param grade - `"extension"` or `"compensating"`
 * @param tolerance - IEC 60584-3 class, ASTM E230 limits, or a custom statement
 * @returns the resolved statement (IEC and ASTM values are from memory; see `src/data/cableTolerances.ts`)
 * @throws HotjunctionRangeError (code `INVALID_OPTION`) for a grade, class or variant the standard does not
 *   define for the type; HotjunctionTypeError / HotjunctionRangeError for a bad custom statement
 * @example
 * ```ts
 * import { cableToleranceStatement } from "hotjunction";
 * const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
 * console.log(s.code, s.toleranceC, s.minC, s.maxC); // KX 2.2 0 200
 * ```
 */
export function cableToleranceStatement(
  type: ThermocoupleType,
  grade: "extension" | "compensating",
  tolerance: CableTolerance,
): CableToleranceStatement {
  const context = `type ${_label(type)} cable`;
  thermocoupleData(type); // an unknown type is refused before the tables are looked up
  if (grade !== "extension" && grade !== "compensating") {
    return _invalidChoice("cable grade", grade, ["extension", "compensating"], context);
  }
  const t = _requireObject(tolerance, "cable tolerance", context);
  switch (t["standard"]) {
    case "IEC 60584-3": {
      const cls = t["class"];
      if (cls !== 1 && cls !== 2) return _invalidChoice("IEC 60584-3 class", cls, ["1", "2"], context);
      // Deliberately alike: the ASTM E230 case below returns the same fields; IEC states the tolerance in µV, ASTM in °C.
      const e = pick(iecCableTolerances.grades[cls][type], grade, t["variant"], `IEC 60584-3 class ${cls}`, type, context);
      return {
        code: e.code,
        grade: e.grade,
        minC: e.minC,
        maxC: e.maxC,
        toleranceMicrovolts: e.toleranceMicrovolts as number,
        source: iecCableTolerances.source,
      };
    }
    case "ASTM E230": {
      const limits = t["limits"];
      if (limits !== "standard" && limits !== "special") {
        return _invalidChoice("ASTM E230 limits", limits, ["standard", "special"], context);
      }
      // Deliberately alike: the IEC 60584-3 case above returns the same fields, its tolerance in µV.
      const e = pick(astmExtensionWireTolerances.grades[limits][type], grade, undefined, `ASTM E230 ${limits} limits`, type, context);
      return {
        code: e.code,
        grade: e.grade,
        minC: e.minC,
        maxC: e.maxC,
        toleranceC: e.toleranceC as number,
        source: astmExtensionWireTolerances.source,
      };
    }
    case "custom": {
      const toleranceC = _requireNonNegative(t["toleranceC"], "custom cable toleranceC", "°C", context);
      const range = _checkRange({ minC: t["minC"], maxC: t["maxC"] }, "custom cable range", context);
      return { code: "custom", grade, minC: range.minC, maxC: range.maxC, toleranceC, source: "stated by the user" };
    }
    default:
      return _invalidChoice("cable tolerance standard", t["standard"], ["IEC 60584-3", "ASTM E230", "custom"], context);
  }
}

function toleranceMicrovoltsAt(ct: CompiledType, s: CableToleranceStatement, t: number): number {
  return s.toleranceMicrovolts ?? (s.toleranceC as number) * _seebeckCoefficient(ct, t);
}

function requireRated(s: CableToleranceStatement, t: number, quantity: string, context: string): void {
  if (t < s.minC || t > s.maxC) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: t,
      min: s.minC,
      max: s.maxC,
      unit: "°C",
      context,
      problem: `is outside the range where the ${s.code} cable's tolerance holds`,
    });
  }
}

/** Largest tolerance a statement may state: ± µV and ± °C (far above any cable standard's). */
const maxStatedMicrovolts = 1e5;
const maxStatedC = 1000;

/**
 * Checks a statement passed in (it may be forged) once, at the entry of every function that takes one: an object
 * with a string code, a rated range inside -270 … 1820 °C, and exactly one tolerance (± µV or ± °C), finite and in
 * range. Returns the context text of its messages.
 */
function _checkStatement(type: unknown, statement: CableToleranceStatement): string {
  const o = _requireObject(statement, "cable tolerance statement", "cable");
  const context = `type ${_label(type)} ${_label(o["code"])} cable`;
  if (typeof o["code"] !== "string") _requireObject(undefined, "cable tolerance statement code", context);
  const [minC, maxC] = _requireOrderedPair(o["minC"], o["maxC"], "rated minC", "rated maxC", "°C", context);
  _requireInRange(minC, "rated minC", -270, 1820, "°C", context);
  _requireInRange(maxC, "rated maxC", -270, 1820, "°C", context);
  const uv = o["toleranceMicrovolts"];
  const degrees = o["toleranceC"];
  if ((uv === undefined) === (degrees === undefined)) {
    _requireOneOf(o, [["toleranceMicrovolts"], ["toleranceC"]], context);
  }
  if (uv !== undefined) _requireInRange(uv, "cable toleranceMicrovolts", 0, maxStatedMicrovolts, "µV", context);
  else _requireInRange(degrees, "cable toleranceC", 0, maxStatedC, "°C", context);
  return context;
}

/**
 * The tolerance of a cable as an EMF at a cable temperature, T(t): the µV statement (IEC) or tol·S(t)
 * (ASTM, custom: °C at the cable's temperature through the Seebeck coefficient there, not at the tip).
 * @param type - thermocouple type letter
 * @param statement - a resolved statement ({@link cableToleranceStatement})
 * @param cableTemperatureC - cable temperature, °C, within the rated range
 * @returns ± µV
 * @throws HotjunctionRangeError outside the rated range
 * @example
 * ```ts
 * import { cableToleranceMicrovolts, cableToleranceStatement } from "hotjunction";
 * const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
 * console.log(cableToleranceMicrovolts("K", s, 200).toFixed(1)); // "87.9"
 * ```
 */
export function cableToleranceMicrovolts(
  type: ThermocoupleType,
  statement: CableToleranceStatement,
  cableTemperatureC: number,
): number {
  const context = _checkStatement(type, statement);
  const t = _requireFinite(cableTemperatureC, "cable temperature", "°C", context);
  requireRated(statement, t, "cable temperature", context);
  return toleranceMicrovoltsAt(_compile(thermocoupleData(type)), statement, t);
}

/** The bound of a cable's relative mismatch (the `"proportional"` model). */
export interface CableMismatchBound {
  /** Largest |k|, fraction of E(t_j) − E(t_cj). */
  readonly fraction: number;
  /** Where in the rated range the bound is set (T(t)/|E(t)| least), °C. */
  readonly ratingPointC: number;
  /** T at the rating point, ± µV. */
  readonly toleranceMicrovolts: number;
  /** E at the rating point (0 °C reference), mV. */
  readonly emfMillivolts: number;
}

/**
 * The largest relative mismatch k of a cable consistent with its statement: min over the rated range of
 * T(t)/|E(t)| (E from a 0 °C reference), searched on a 1 °C grid plus the ends (T/|E| falls with |t| away
 * from 0 °C, so the ends set it in practice).
 * @param type - thermocouple type letter
 * @param statement - a resolved statement
 * @returns the bound and its rating point
 * @example
 * ```ts
 * import { cableMismatchBound, cableToleranceStatement } from "hotjunction";
 * const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
 * const b = cableMismatchBound("K", s);
 * console.log(b.ratingPointC, b.toleranceMicrovolts.toFixed(1)); // 200 87.9
 * ```
 */
export function cableMismatchBound(type: ThermocoupleType, statement: CableToleranceStatement): CableMismatchBound {
  const ct = _compile(thermocoupleData(type));
  const context = _checkStatement(type, statement);
  // The search walks the rated range in 1 °C steps: _checkStatement has held it inside -270 … 1820 °C (at most
  // 2,091 steps), so a forged range is refused at once, not walked.
  const [minC, maxC] = _requireOrderedPair(statement.minC, statement.maxC, "rated minC", "rated maxC", "°C", context);
  const steps = Math.max(1, Math.ceil(maxC - minC));
  let best: CableMismatchBound | undefined;
  for (let i = 0; i <= steps; i++) {
    const t = i === steps ? statement.maxC : statement.minC + i;
    const e = _emfFromTemperature(ct, t);
    if (e === 0) continue;
    const tol = toleranceMicrovoltsAt(ct, statement, t);
    const fraction = tol / (1000 * Math.abs(e));
    if (best === undefined || fraction < best.fraction) {
      best = { fraction, ratingPointC: t, toleranceMicrovolts: tol, emfMillivolts: e };
    }
  }
  if (best === undefined) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "cable rated range",
      value: `${statement.minC} to ${statement.maxC}`,
      unit: "°C",
      context,
      problem: "has no temperature where E ≠ 0; use the envelope model",
    });
  }
  return best;
}

/** @internal The cable stage: its sources and its EMF error at the amplifier input. */
export interface _ExtensionCableStage {
  readonly sources: readonly WireErrorSource[];
  readonly statement: CableToleranceStatement;
  readonly mismatch: CableMismatchModel;
  /** The cable junction's (probe head's) temperature range, °C (a point when it is no source). */
  readonly junctionTemperatureC: TemperatureRangeC;
  /** The proportional model's k per µV of `cable.tolerance`, 1/µV (0 for the envelope). */
  readonly mismatchPerMicrovolt: number;
  /** EMF error ΔE the cable adds to the thermocouple's EMF, mV, with the cold end at `coldJunctionC`. */
  emfErrorMillivolts(x: _Inputs, coldJunctionC: number): number;
  /**
   * The proportional model (the only one whose error depends on the cold-junction temperature): every value of
   * `emfErrorMillivolts` over a box of the sources and an interval of the cold-junction temperature (outward
   * rounded, in the model's order of operations), and an enclosure of its derivative in that temperature, −k·E′(t_cj).
   */
  emfErrorOver?(box: _Box, coldJunctionC: _Interval): {
    readonly value: _Interval;
    readonly coldJunctionSlope: _Interval;
    /** Its second derivative in t_cj, undefined where an E(t) term's interval crosses a seam. */
    readonly coldJunctionCurvature: _Interval | undefined;
  };
}

/**
 * @internal Builds the cable stage. Checks: the run lies in the rated range, the junction range and the
 * ambient range (where the cable's cold end sits) lie in the run.
 */
export function _extensionCableStage(
  element: ExtensionCableElement,
  type: ThermocoupleType,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): _ExtensionCableStage {
  // Same prologue as every element's stage builder (deliberate: object and kind checked, each its own element).
  const o = _requireObject(element, "extensionCable", context);
  if (o["kind"] !== "extensionCable") return _invalidChoice("extensionCable kind", o["kind"], ["extensionCable"], context);
  const statement = cableToleranceStatement(type, o["grade"] as "extension", o["tolerance"] as CableTolerance);
  const where = `${context} (${statement.code}, ${describe(o["tolerance"] as CableTolerance)})`;
  const run = _checkRange(o["runTemperatureC"], "runTemperatureC", where);
  const junction = _checkRange(o["junctionTemperatureC"], "junctionTemperatureC", where);
  _requireWithin(run, statement, "runTemperatureC", where, "is outside the range where the cable's tolerance holds");
  _requireWithin(junction, run, "junctionTemperatureC", where, "is outside the cable's run temperature range");
  _requireWithin(ambient, run, "ambient", where, "(the cable's cold end, at the terminals) is outside the cable's run temperature range");
  const mismatch = (o["mismatch"] ?? "envelope") as CableMismatchModel;
  const ct = _compile(thermocoupleData(type));
  const sources: WireErrorSource[] = [];
  if (mismatch === "envelope") {
    const worst = (r: TemperatureRangeC): number =>
      Math.max(toleranceMicrovoltsAt(ct, statement, r.minC), toleranceMicrovoltsAt(ct, statement, r.maxC), peakInside(ct, statement, r));
    const limit = worst(junction) + worst(ambient);
    if (limit > 0) {
      sources.push(
        _wireSource(ctx, "cable.tolerance", "cable", `${statement.code} cable tolerance, envelope T(t_junction) + T(t_cj)`, "µV", limit),
      );
    }
    const has = limit > 0;
    return {
      sources,
      statement,
      mismatch,
      junctionTemperatureC: junction,
      mismatchPerMicrovolt: 0,
      emfErrorMillivolts: (x) => (has ? (x["cable.tolerance"] as number) / 1000 : 0),
    };
  }
  if (mismatch !== "proportional") return _invalidChoice("cable mismatch model", mismatch, ["proportional", "envelope"], where);
  const bound = cableMismatchBound(type, statement);
  const has = bound.toleranceMicrovolts > 0;
  if (has) {
    sources.push(
      _wireSource(
        ctx,
        "cable.tolerance",
        "cable",
        `${statement.code} cable deviation at its rating point ${bound.ratingPointC} °C (0 °C reference), scaled by E(t_junction) − E(t_cj)`,
        "µV",
        bound.toleranceMicrovolts,
      ),
    );
  }
  const junctionVaries = junction.maxC > junction.minC;
  if (has && junctionVaries) {
    sources.push(
      _rangeSource("cable.junctionTemperature", "cable", "cable junction (probe head) temperature anywhere in its range", junction.minC, junction.maxC),
    );
  }
  const perMicrovolt = 1 / (1000 * Math.abs(bound.emfMillivolts)); // k per µV of the source, 1/µV
  const fixedJunctionC = junction.minC;
  return {
    sources,
    statement,
    mismatch,
    junctionTemperatureC: junction,
    mismatchPerMicrovolt: perMicrovolt,
    emfErrorMillivolts: (x, tcj) => {
      if (!has) return 0;
      const tj = junctionVaries ? (x["cable.junctionTemperature"] as number) : fixedJunctionC;
      const k = (x["cable.tolerance"] as number) * perMicrovolt;
      return k * (_emfFromTemperature(ct, tj) - _emfFromTemperature(ct, tcj));
    },
    emfErrorOver: (box, tcj) => {
      if (!has) return { value: [0, 0], coldJunctionSlope: [0, 0], coldJunctionCurvature: [0, 0] };
      const tj: _Interval = junctionVaries ? (box["cable.junctionTemperature"] as _Interval) : [fixedJunctionC, fixedJunctionC];
      const k = _mulInterval(box["cable.tolerance"] as _Interval, [perMicrovolt, perMicrovolt]);
      // Each part computed when read (the subdivision reads the value at points and the slope over pieces).
      return {
        get value(): _Interval {
          return _mulInterval(k, _subInterval(_emfOver(ct, tj), _emfOver(ct, tcj)));
        },
        get coldJunctionSlope(): _Interval {
          const slope = _mulInterval(k, _seebeckOver(ct, tcj));
          return [-slope[1], -slope[0]];
        },
        get coldJunctionCurvature(): _Interval | undefined {
          const atCj = _curvatureOver(ct, tcj);
          if (atCj === undefined) return undefined;
          const c = _mulInterval(k, atCj);
          return [-c[1], -c[0]];
        },
      };
    },
  };
}

/** Largest T(t) inside a range on a 1 °C grid (T = tol·S(t) need not peak at an end). */
function peakInside(ct: CompiledType, s: CableToleranceStatement, r: TemperatureRangeC): number {
  let m = 0;
  const steps = Math.ceil(r.maxC - r.minC);
  for (let i = 1; i < steps; i++) m = Math.max(m, toleranceMicrovoltsAt(ct, s, r.minC + i));
  return m;
}

/**
 * The first-order error at the tip of a cable's limit: the cable's EMF limit divided by S(t_tip). With the
 * `"proportional"` model the limit is k_max·|E(t_j) − E(t_cj)|, with `"envelope"` T(t_j) + T(t_cj).
 * @param type - thermocouple type letter
 * @param statement - a resolved cable statement
 * @param tipC - hot-junction temperature, °C
 * @param junctionC - cable junction temperature, °C (rated range)
 * @param coldJunctionC - cable cold end (terminals), °C (rated range)
 * @param mismatch - default `"proportional"` (the designer's rule; the cable element defaults to `"envelope"`)
 * @returns ± °C at the tip
 * @throws HotjunctionRangeError when a cable temperature is outside the rated range or a temperature outside the type's range
 * @example
 * ```ts
 * import { cableTipErrorC, cableToleranceStatement } from "hotjunction";
 * const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
 * console.log(cableTipErrorC("K", s, 600, 200, 0).toFixed(3)); // "2.069"
 * ```
 */
export function cableTipErrorC(
  type: ThermocoupleType,
  statement: CableToleranceStatement,
  tipC: number,
  junctionC: number,
  coldJunctionC: number,
  mismatch: CableMismatchModel = "proportional",
): number {
  const context = _checkStatement(type, statement);
  const ct = _compile(thermocoupleData(type));
  const tj = _requireFinite(junctionC, "cable junction temperature", "°C", context);
  const tc = _requireFinite(coldJunctionC, "cable cold-end temperature", "°C", context);
  requireRated(statement, tj, "cable junction temperature", context);
  requireRated(statement, tc, "cable cold-end temperature", context);
  const tip = _requireFinite(tipC, "hot-junction temperature (tipC)", "°C", context);
  if (mismatch !== "envelope" && mismatch !== "proportional") _invalidChoice("cable mismatch model", mismatch, ["envelope", "proportional"], context);
  const sTip = _seebeckCoefficient(ct, tip);
  const errorMicrovolts =
    mismatch === "envelope"
      ? toleranceMicrovoltsAt(ct, statement, tj) + toleranceMicrovoltsAt(ct, statement, tc)
      : cableMismatchBound(type, statement).fraction * 1000 * Math.abs(_emfFromTemperature(ct, tj) - _emfFromTemperature(ct, tc));
  return _requireFiniteResult(errorMicrovolts / sTip, "hot-junction temperature (tipC)", tip, "°C", context);
}
