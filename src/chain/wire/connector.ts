/**
 * Connectors and terminal blocks of another metal in the thermocouple circuit (law of intermediate metals).
 *
 * Replacing a stretch of leg X by contact metal M between the leg's probe-side contact (t_a) and its
 * instrument-side contact (t_b) changes the loop EMF by (S_M − S_X)·(t_a − t_b) for the positive leg and by
 * (S_X − S_M)·(t_a − t_b) for the negative leg (first order, coefficients at the connector's temperature):
 *
 *   ΔE = −S_P/M·Δt_P + S_N/M·Δt_N,   S_X/M = S_X − S_M.
 *
 * - `"terminates"` (copper runs on to the instrument): the copper stretch spans from the connector (t_conn)
 *   to the terminals (t_cj) in both legs, so exactly ΔE = E(t_cj) − E(t_conn): the connector is the de facto
 *   reference junction and the compensation at t_cj is off by E(t_conn) − E(t_cj). A difference u between the
 *   two legs' contacts (P at t_conn + u/2, N at t_conn − u/2) adds −(S_P/Cu + S_N/Cu)·u/2.
 * - `"inline"` (the alloy continues): each leg adds its own term; a matching alloy (S_X/M = 0) adds nothing,
 *   and so does a connector whose contacts of each leg share one temperature (Δt = 0).
 *
 * The cold-junction element's `isothermalGradientC` (sensor-to-terminal difference δ) is this same model for
 * the instrument's own terminals: a terminating copper connector at t_cj + u is E(t_h) − E(t_cj + u) + E(t_cj),
 * which is the cold-junction mapping E(t_h) − E(t_c) + E(t_c + δ) with t_c = t_cj + u and δ = −u. So a
 * gradient of ±g equals `isothermalGradientAsConnector(g)`; model the terminals one way, not both.
 * @module
 */
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import {
  contactMetals,
  seebeckValidMaxC,
  seebeckValidMinC,
  thermocoupleLegs,
  wireAlloySource,
} from "../../data/wireAlloys.js";
import { _invalidChoice, _label, _requireFinite, HotjunctionRangeError } from "../../errors.js";
import { _compile } from "../../its90/compiled.js";
import { _emfFromTemperature, _seebeckCoefficient } from "../../its90/engine.js";
import { thermocoupleData } from "../../its90/resolveType.js";
import { _oneOfTwoKeys, _optionalLimit, _requireObject, type _SourceContext } from "../_common.js";
import type { AmbientRange } from "../types.js";
import type { WireErrorSource } from "../types.js";
import type { ConnectorElement, ContactMetal, StatedLegSeebeck, TemperatureRangeC } from "../wireTypes.js";
import { _addInterval, _curvatureOver, _divInterval, _emfOver, _mulInterval, _seebeckOver, _subInterval, type _Interval } from "../_intervals.js";
import { _checkRange, _rangeSource, _wireSource, type _Box, type _Inputs } from "./_wireCommon.js";

/** Seebeck coefficients of a type's legs against a contact metal, µV/°C. */
export interface LegSeebeck {
  /** S_P − S_M, µV/°C. */
  readonly positiveMicrovoltsPerC: number;
  /** S_N − S_M, µV/°C. */
  readonly negativeMicrovoltsPerC: number;
  /** Where the values come from. */
  readonly source: string;
}

function metalVsPlatinum(metal: ContactMetal, context: string): number | "matching" {
  if (metal === "matching") return "matching";
  if (typeof metal === "string") {
    // own keys only: "__proto__" or "toString" is not a metal
    const m = Object.hasOwn(contactMetals, metal) ? (contactMetals as Record<string, { seebeckVsPlatinumMicrovoltsPerC: number }>)[metal] : undefined;
    if (m === undefined) return _invalidChoice("contactMetal", metal, ["matching", ...Object.keys(contactMetals), "{ name, seebeckVsPlatinumMicrovoltsPerC }"], context);
    return m.seebeckVsPlatinumMicrovoltsPerC;
  }
  const o = _requireObject(metal, "contactMetal", context);
  return _requireFinite(o["seebeckVsPlatinumMicrovoltsPerC"], "contactMetal.seebeckVsPlatinumMicrovoltsPerC", "µV/°C", context);
}

/**
 * The Seebeck coefficients of a thermocouple type's legs against a contact metal at a temperature: the
 * positive leg's coefficient against platinum from the table (from memory, near 0 °C), the negative leg's as
 * that minus the type's ITS-90 Seebeck coefficient S(t), so that S_P/M − S_N/M = S(t) always.
 * @param type - thermocouple type letter
 * @param metal - contact metal (`"copper"`, `"platinum"`, `"matching"` or `{ name, seebeckVsPlatinumMicrovoltsPerC }`)
 * @param temperatureC - connector temperature, °C, within −20 … 100 °C for the tabulated values
 * @returns the two coefficients, µV/°C
 * @throws HotjunctionRangeError outside the tables' temperature range or for an unknown metal
 * @example
 * ```ts
 * import { legSeebeckVsContact } from "hotjunction";
 * const s = legSeebeckVsContact("K", "copper", 25);
 * console.log((s.positiveMicrovoltsPerC - s.negativeMicrovoltsPerC).toFixed(2)); // "40.52"
 * ```
 */
export function legSeebeckVsContact(type: ThermocoupleType, metal: ContactMetal, temperatureC: number): LegSeebeck {
  const context = `type ${_label(type)} connector`;
  // a string and an own key first: an object without a string form, or "__proto__", is not a type
  const legs = typeof type === "string" && Object.hasOwn(thermocoupleLegs, type) ? thermocoupleLegs[type] : undefined;
  if (legs === undefined) return _invalidChoice("thermocouple type", type, Object.keys(thermocoupleLegs), context);
  const m = metalVsPlatinum(metal, context);
  if (m === "matching") return { positiveMicrovoltsPerC: 0, negativeMicrovoltsPerC: 0, source: "matching alloy" };
  const t = _requireFinite(temperatureC, "connector temperature", "°C", context);
  if (t < seebeckValidMinC || t > seebeckValidMaxC) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "connector temperature",
      value: t,
      min: seebeckValidMinC,
      max: seebeckValidMaxC,
      unit: "°C",
      context,
      problem: "is outside the range of the tabulated leg coefficients; state legSeebeck",
    });
  }
  const sType = _seebeckCoefficient(_compile(thermocoupleData(type)), t);
  const p = legs.positiveSeebeckVsPlatinumMicrovoltsPerC;
  return { positiveMicrovoltsPerC: p - m, negativeMicrovoltsPerC: p - sType - m, source: wireAlloySource };
}

/**
 * The cold-junction element's isothermal gradient ±g as the equivalent terminating copper connector at the
 * instrument's terminals (see the module note): use one or the other for the same terminals.
 * @param gradientC - ± °C (≥ 0)
 * @returns a connector element
 * @example
 * ```ts
 * import { isothermalGradientAsConnector } from "hotjunction";
 * console.log(isothermalGradientAsConnector(0.5).aboveColdJunctionC); // { minC: -0.5, maxC: 0.5 }
 * ```
 */
export function isothermalGradientAsConnector(gradientC: number): ConnectorElement {
  const g = _optionalLimit(gradientC, "isothermalGradientC", "°C", "isothermal gradient as connector");
  return { kind: "connector", arrangement: "terminates", contactMetal: "copper", aboveColdJunctionC: { minC: -g, maxC: g } };
}

/** @internal The connector stage: its sources and its EMF error at the amplifier input. */
export interface _ConnectorStage {
  readonly sources: readonly WireErrorSource[];
  readonly arrangement: "terminates" | "inline";
  /**
   * Terminating connectors: the temperature's range, °C (absolute, or above the cold-junction sensor when
   * `relative`), and the name of its source (there is one only when the range is not a point).
   */
  readonly temperature?: { readonly range: readonly [number, number]; readonly relative: boolean; readonly name: string };
  /** EMF error ΔE the connector adds to the thermocouple's EMF, mV, with the cold-junction sensor at `coldJunctionC`. */
  emfErrorMillivolts(x: _Inputs, coldJunctionC: number): number;
  /**
   * Terminating connectors (the only ones whose error depends on the cold-junction temperature): every value of
   * `emfErrorMillivolts` over a box of the sources and an interval of the cold-junction temperature (outward
   * rounded, in the model's order of operations), and an enclosure of its derivative in that temperature
   * (E′(t_cj) − E′(t_connector) for a connector above the cold junction, E′(t_cj) for one at its own temperature).
   */
  emfErrorOver?(box: _Box, coldJunctionC: _Interval): {
    readonly value: _Interval;
    readonly coldJunctionSlope: _Interval;
    /** Its second derivative in t_cj, undefined where an E(t) term's interval crosses a seam. */
    readonly coldJunctionCurvature: _Interval | undefined;
  };
}

function statedLegs(value: unknown, context: string): LegSeebeck {
  const o = _requireObject(value, "legSeebeck", context);
  return {
    positiveMicrovoltsPerC: _requireFinite(o["positiveMicrovoltsPerC"], "legSeebeck.positiveMicrovoltsPerC", "µV/°C", context),
    negativeMicrovoltsPerC: _requireFinite(o["negativeMicrovoltsPerC"], "legSeebeck.negativeMicrovoltsPerC", "µV/°C", context),
    source: "stated by the user",
  };
}

/** Leg coefficients over a connector temperature range: both ends must be in the tables' range; the midpoint's values are used. */
function legsOver(type: ThermocoupleType, metal: ContactMetal, range: TemperatureRangeC, context: string): LegSeebeck {
  void context;
  legSeebeckVsContact(type, metal, range.minC);
  legSeebeckVsContact(type, metal, range.maxC);
  return legSeebeckVsContact(type, metal, (range.minC + range.maxC) / 2);
}

/**
 * @internal Builds a connector stage. `name` is the source prefix (`"connector"`, or `"connector2"` … for
 * several).
 */
export function _connectorStage(
  element: ConnectorElement,
  type: ThermocoupleType,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
  name = "connector",
): _ConnectorStage {
  const o = _requireObject(element, "connector", context);
  if (o["kind"] !== "connector") return _invalidChoice("connector kind", o["kind"], ["connector"], context);
  const ct = _compile(thermocoupleData(type));
  const metal = o["contactMetal"] as ContactMetal;
  if (metal === undefined) return _invalidChoice("contactMetal", metal, ["matching", ...Object.keys(contactMetals), "{ name, seebeckVsPlatinumMicrovoltsPerC }"], context);
  metalVsPlatinum(metal, context);
  const sources: WireErrorSource[] = [];
  const stated = o["legSeebeck"] === undefined ? undefined : statedLegs(o["legSeebeck"] as StatedLegSeebeck, context);

  if (o["arrangement"] === "terminates") {
    const hasAbs = _oneOfTwoKeys(
      o,
      "temperatureC",
      "aboveColdJunctionC",
      `${name}.`,
      {
        both: "are both given; give the connector's temperature one way",
        missing: "is missing: a terminating connector is the de facto reference junction, its temperature is required",
      },
      context,
    );
    const range = hasAbs
      ? _checkRange(o["temperatureC"], "temperatureC", context)
      : _checkRange(o["aboveColdJunctionC"], "aboveColdJunctionC", context);
    const absRange: TemperatureRangeC = hasAbs ? range : { minC: ambient.minC + range.minC, maxC: ambient.maxC + range.maxC };
    _emfFromTemperature(ct, absRange.minC);
    _emfFromTemperature(ct, absRange.maxC);
    const varies = range.maxC > range.minC;
    const tName = hasAbs ? `${name}.temperature` : `${name}.aboveColdJunction`;
    if (varies) {
      sources.push(
        _rangeSource(
          tName,
          "connector",
          hasAbs ? "terminating connector temperature anywhere in its range" : "terminating connector temperature above the cold-junction sensor",
          range.minC,
          range.maxC,
        ),
      );
    }
    const legDifference = _optionalLimit(o["legDifferenceC"], "legDifferenceC", "°C", context);
    let legSum = 0; // (S_P/Cu + S_N/Cu)/2, µV/°C
    if (legDifference > 0) {
      const legs = stated ?? legsOver(type, "copper", absRange, context);
      legSum = (legs.positiveMicrovoltsPerC + legs.negativeMicrovoltsPerC) / 2;
      sources.push(_wireSource(ctx, `${name}.legDifference`, "connector", "difference between the two legs' contact temperatures", "°C", legDifference));
    }
    const fixed = range.minC;
    const hasLeg = legDifference > 0;
    return {
      sources,
      arrangement: "terminates",
      temperature: { range: [range.minC, range.maxC], relative: !hasAbs, name: tName },
      emfErrorMillivolts: (x, tcj) => {
        const r = varies ? (x[tName] as number) : fixed;
        const tConn = hasAbs ? r : tcj + r;
        const leg = hasLeg ? (-legSum * (x[`${name}.legDifference`] as number)) / 1000 : 0;
        return _emfFromTemperature(ct, tcj) - _emfFromTemperature(ct, tConn) + leg;
      },
      emfErrorOver: (box, tcj) => {
        const r: _Interval = varies ? (box[tName] as _Interval) : [fixed, fixed];
        const tConn = hasAbs ? r : _addInterval(tcj, r);
        const leg: _Interval = hasLeg ? _divInterval(_mulInterval([-legSum, -legSum], box[`${name}.legDifference`] as _Interval), [1000, 1000]) : [0, 0];
        // Each part computed when read: the subdivision reads the value at points and the slope over pieces.
        return {
          get value(): _Interval {
            return _addInterval(_subInterval(_emfOver(ct, tcj), _emfOver(ct, tConn)), leg);
          },
          get coldJunctionSlope(): _Interval {
            return hasAbs ? _seebeckOver(ct, tcj) : _subInterval(_seebeckOver(ct, tcj), _seebeckOver(ct, tConn));
          },
          get coldJunctionCurvature(): _Interval | undefined {
            const atCj = _curvatureOver(ct, tcj);
            if (hasAbs || atCj === undefined) return atCj;
            const atConnector = _curvatureOver(ct, tConn);
            return atConnector === undefined ? undefined : _subInterval(atCj, atConnector);
          },
        };
      },
    };
  }
  if (o["arrangement"] === "inline") {
    if (metal === "matching") {
      // Checked even though a matching alloy makes them irrelevant: a negative ± limit is still a typo.
      _optionalLimit(o["positiveLegDifferenceC"], "positiveLegDifferenceC", "°C", context);
      _optionalLimit(o["negativeLegDifferenceC"], "negativeLegDifferenceC", "°C", context);
      return { sources, arrangement: "inline", emfErrorMillivolts: () => 0 };
    }
    if (o["positiveLegDifferenceC"] === undefined && o["negativeLegDifferenceC"] === undefined) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: `${name}.positiveLegDifferenceC / ${name}.negativeLegDifferenceC`,
        value: undefined,
        min: 0,
        unit: "°C",
        context,
        problem: "are missing: an inline connector of another metal needs the temperature difference across each leg's contacts (0 if none)",
      });
    }
    const dp = _optionalLimit(o["positiveLegDifferenceC"], "positiveLegDifferenceC", "°C", context);
    const dn = _optionalLimit(o["negativeLegDifferenceC"], "negativeLegDifferenceC", "°C", context);
    let legs = stated;
    if (legs === undefined) {
      if (o["temperatureC"] === undefined) {
        throw new HotjunctionRangeError({
          code: "INVALID_DESIGN",
          quantity: `${name}.temperatureC`,
          value: undefined,
          min: seebeckValidMinC,
          max: seebeckValidMaxC,
          unit: "°C",
          context,
          problem: "is missing: the tabulated leg coefficients need the connector's temperature (or state legSeebeck)",
        });
      }
      legs = legsOver(type, metal, _checkRange(o["temperatureC"], "temperatureC", context), context);
    }
    const sp = legs.positiveMicrovoltsPerC;
    const sn = legs.negativeMicrovoltsPerC;
    const hp = dp > 0;
    const hn = dn > 0;
    if (hp) sources.push(_wireSource(ctx, `${name}.positiveLeg`, "connector", "temperature difference across the positive leg's contacts", "°C", dp));
    if (hn) sources.push(_wireSource(ctx, `${name}.negativeLeg`, "connector", "temperature difference across the negative leg's contacts", "°C", dn));
    return {
      sources,
      arrangement: "inline",
      emfErrorMillivolts: (x) =>
        ((hp ? -sp * (x[`${name}.positiveLeg`] as number) : 0) + (hn ? sn * (x[`${name}.negativeLeg`] as number) : 0)) / 1000,
    };
  }
  return _invalidChoice("connector arrangement", o["arrangement"], ["terminates", "inline"], context);
}
