/**
 * Turns a reference option into a chain reference element (sizing a shunt reference's series resistor).
 * @module
 */
import { _invalidChoice, _requireFinite, _requireOptionsObject, HotjunctionRangeError } from "../errors.js";
import type { PreferredSeriesName } from "../data/preferredSeries.js";
import type { AmbientRange, ReferenceElement, SeriesReference, ShuntReference } from "../chain/types.js";
import type { _SourceContext } from "../chain/_common.js";
import { _referenceStage, type _ReferenceStage } from "../chain/reference.js";
import { shuntResistorSizing } from "../chain/shuntReference.js";
import { _indexAtOrBelow, _requireSeries, standardResistorValues } from "./standardResistorValues.js";
import type { ReferenceOption, ReferenceRealization } from "./types.js";

/** Options of {@link realizeReference}. */
export interface RealizeReferenceOptions {
  /** Current the threshold divider draws from the reference at its nominal voltage, mA, ≥ 0. Default 0. */
  readonly dividerCurrentMilliamps?: number;
  /** Series and tolerance used for a sized shunt's series resistor when the option gives none. Default E24, 0.01. */
  readonly resistorSeries?: PreferredSeriesName;
  readonly resistorToleranceFraction?: number;
}

/** A realized reference: the chain element to build the chain with, and the report. */
export interface RealizedReference {
  /** Chain element (the ideal option becomes an error-free series reference). */
  readonly element: ReferenceElement;
  readonly realization: ReferenceRealization;
}

const kinds = ["ideal", "element", "sized-shunt"] as const;

function positive(value: unknown, quantity: string, unit: string, context: string): number {
  const x = _requireFinite(value, quantity, unit, context);
  if (!(x > 0)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min: 0, unit, context, problem: "is not positive" });
  }
  return x;
}

function nonNegative(value: unknown, quantity: string, unit: string, context: string): number {
  const x = _requireFinite(value, quantity, unit, context);
  if (x < 0) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min: 0, unit, context, problem: "is negative" });
  }
  return x;
}

/** @internal A realized reference with its chain stage: the reference's error sources, computed once. */
export interface _RealizedReference extends RealizedReference {
  readonly stage: _ReferenceStage;
}

/**
 * The chain's reference stage of a realized element (its sources through the chain's reference module, so an
 * unknown variant is refused there) and the report: the tolerance figure is the sum of the sources' bounds.
 */
function realized(
  element: ReferenceElement,
  realization: Omit<ReferenceRealization, "toleranceFraction">,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): _RealizedReference {
  const stage = _referenceStage(element, ambient, ctx, context);
  const toleranceFraction = stage.sources.reduce((sum, source) => sum + source.limit, 0);
  // Key order as the report has always printed it: the tolerance figure after the element.
  const { name, kind, nominalVolts, element: used, problems, ...shunt } = realization;
  return {
    element,
    realization: { name, kind, nominalVolts, ...(used !== undefined ? { element: used } : {}), toleranceFraction, ...shunt, problems },
    stage,
  };
}

/**
 * Realizes a reference option for a threshold divider: the ideal option becomes an error-free series
 * reference; an element option is used as given (a shunt element's loads get the divider current added);
 * a sized shunt gets its series resistor: the largest standard value R with
 * R·(1 + t) ≤ (V_s,min − V_ref)/(I_load,max + I_shunt,min) (the bound of `shuntResistorSizing`, with the
 * divider current in the load), then the cathode current at V_s,max and least load with R·(1 − t) is checked
 * against I_shunt,max and the resistor's worst dissipation (V_s,max − V_ref)²/(R·(1 − t)) is reported.
 * @param option - the reference option
 * @param ambient - ambient range of the electronics, °C (for the reference's tolerance figure)
 * @param options - divider current (mA) and the default series resistor series/tolerance
 * @returns the chain element and a report (problems listed, never thrown, when the shunt current is exceeded)
 * @throws HotjunctionRangeError / HotjunctionTypeError for a malformed option, or (code `INVALID_DESIGN`)
 *   a supply too low to feed the shunt at all
 * @example
 * ```ts
 * import { realizeReference } from "hotjunction";
 * const { realization } = realizeReference(
 *   { kind: "sized-shunt", name: "2.5 V shunt", element: { kind: "reference", variant: "shunt", nominalVolts: 2.5,
 *     initialAccuracyFraction: 0.005, supplyMinVolts: 4.75, supplyMaxVolts: 5.25, shuntMinMilliamps: 0.1,
 *     shuntMaxMilliamps: 15 } },
 *   { minC: -20, maxC: 60 },
 *   { dividerCurrentMilliamps: 0.25, resistorSeries: "E24", resistorToleranceFraction: 0.01 },
 * );
 * // R ≤ 2.25 V / 0.35 mA = 6428.6 Ω; 6200 Ω·1.01 = 6262 Ω fits
 * console.log(realization.element?.variant === "shunt" ? realization.element.seriesOhms : 0); // 6200
 * ```
 */
export function realizeReference(
  option: ReferenceOption,
  ambient: AmbientRange,
  options: RealizeReferenceOptions = {},
): RealizedReference {
  const { element, realization } = _realizeReference(option, ambient, options, { overrides: undefined });
  return { element, realization };
}

/**
 * @internal {@link realizeReference} with the chain's source context (distribution overrides), returning
 * also the reference stage a trip chain is compiled with (`_compileChain(chain, { reference: stage })`).
 */
export function _realizeReference(
  option: ReferenceOption,
  ambient: AmbientRange,
  options: RealizeReferenceOptions,
  ctx: _SourceContext,
): _RealizedReference {
  const context = `reference option ${typeof option?.name === "string" ? JSON.stringify(option.name) : ""}`.trim();
  if (typeof option !== "object" || option === null) {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "reference option", value: option, context, problem: "is not an object" });
  }
  _requireOptionsObject(options, context, false);
  const dividerMilliamps = nonNegative(options.dividerCurrentMilliamps ?? 0, "dividerCurrentMilliamps", "mA", context);
  if (typeof option.name !== "string") {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "reference option name", value: option.name, context, problem: "is not a string" });
  }
  if (option.cost !== undefined) nonNegative(option.cost, "cost", "", context);
  switch (option.kind) {
    case "ideal": {
      const nominalVolts = positive(option.nominalVolts, "nominalVolts", "V", context);
      const element: SeriesReference = { kind: "reference", variant: "series", nominalVolts, initialAccuracyFraction: 0, label: option.name };
      return realized(element, { name: option.name, kind: "ideal", nominalVolts, problems: [] }, ambient, ctx, context);
    }
    case "element": {
      const given = option.element;
      if (typeof given !== "object" || given === null || given.kind !== "reference") {
        throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "reference element", value: given, context, problem: "is not a reference element" });
      }
      const nominalVolts = positive(given.nominalVolts, "nominalVolts", "V", context);
      const element: ReferenceElement =
        given.variant === "shunt"
          ? {
              ...given,
              loadMinMilliamps: (given.loadMinMilliamps ?? 0) + dividerMilliamps,
              loadMaxMilliamps: (given.loadMaxMilliamps ?? given.loadMinMilliamps ?? 0) + dividerMilliamps,
            }
          : given;
      return realized(element, { name: option.name, kind: "element", nominalVolts, element, problems: [] }, ambient, ctx, context);
    }
    case "sized-shunt":
      return sizeShunt(option, ambient, dividerMilliamps, options, ctx, context);
    default:
      return _invalidChoice("reference option kind", (option as { kind?: unknown }).kind, kinds, context);
  }
}

function sizeShunt(
  option: Extract<ReferenceOption, { kind: "sized-shunt" }>,
  ambient: AmbientRange,
  dividerMilliamps: number,
  options: RealizeReferenceOptions,
  ctx: _SourceContext,
  context: string,
): _RealizedReference {
  const given = option.element;
  if (typeof given !== "object" || given === null || given.variant !== "shunt") {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "shunt element", value: given, context, problem: "is not a shunt reference element" });
  }
  const vRef = positive(given.nominalVolts, "nominalVolts", "V", context);
  const vsMin = positive(given.supplyMinVolts, "supplyMinVolts", "V", context);
  const vsMax = positive(given.supplyMaxVolts, "supplyMaxVolts", "V", context);
  if (vsMax < vsMin) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "supplyMaxVolts", value: vsMax, min: vsMin, unit: "V", context });
  }
  const shuntMin = positive(given.shuntMinMilliamps, "shuntMinMilliamps", "mA", context);
  const shuntMax = positive(given.shuntMaxMilliamps, "shuntMaxMilliamps", "mA", context);
  if (shuntMax <= shuntMin) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "shuntMaxMilliamps", value: shuntMax, min: shuntMin, unit: "mA", context, problem: "is not above shuntMinMilliamps" });
  }
  const otherMin = nonNegative(given.loadMinMilliamps ?? 0, "loadMinMilliamps", "mA", context);
  const otherMax = nonNegative(given.loadMaxMilliamps ?? otherMin, "loadMaxMilliamps", "mA", context);
  const loadMin = otherMin + dividerMilliamps;
  const loadMax = otherMax + dividerMilliamps;
  const series = _requireSeries(option.seriesResistorSeries ?? options.resistorSeries ?? "E24", context);
  const tol = nonNegative(option.seriesResistorToleranceFraction ?? options.resistorToleranceFraction ?? 0.01, "seriesResistorToleranceFraction", "", context);
  if (tol >= 0.5) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "seriesResistorToleranceFraction", value: tol, min: 0, max: 0.5, context });
  }
  // Same error shape as other ordered-value checks (deliberate: a design's shunt option, code INVALID_DESIGN).
  if (!(vsMin > vRef)) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "supplyMinVolts",
      value: vsMin,
      min: vRef,
      unit: "V",
      context,
      problem: "is not above the reference voltage, so no series resistor can feed the shunt",
    });
  }
  const sizingInput = {
    referenceVolts: vRef,
    supplyMinVolts: vsMin,
    supplyMaxVolts: vsMax,
    loadMinMilliamps: loadMin,
    loadMaxMilliamps: loadMax,
    shuntMinMilliamps: shuntMin,
    shuntMaxMilliamps: shuntMax,
  };
  const { maxSeriesOhms } = shuntResistorSizing(sizingInput);
  // Largest standard value whose high tolerance end still keeps the shunt in regulation.
  const values = standardResistorValues(series, 0.1, Math.max(0.1, maxSeriesOhms));
  const index = _indexAtOrBelow(values, maxSeriesOhms / (1 + tol));
  if (index < 0) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "series resistor bound",
      value: maxSeriesOhms,
      min: 0.1,
      unit: "Ω",
      context,
      problem: "is below the smallest standard resistor",
    });
  }
  const seriesOhms = values[index] as number;
  // The resistor at its low end sets the largest current and dissipation, at its high end the least current.
  const low = shuntResistorSizing({ ...sizingInput, seriesOhms: seriesOhms * (1 - tol) });
  const high = shuntResistorSizing({ ...sizingInput, seriesOhms: seriesOhms * (1 + tol) });
  const shuntCurrentMaxMilliamps = low.shuntCurrentMaxMilliamps;
  const shuntCurrentMinMilliamps = high.shuntCurrentMinMilliamps;
  const seriesResistorPowerWatts = low.resistorPowerWatts;
  const problems = [...new Set([...low.problems, ...high.problems])].map(
    (text) => `Shunt reference with a ${seriesOhms} Ω series resistor: ${text}.`,
  );
  // The cathode-current limit is reported above as a problem; the element keeps only what the error model
  // needs, so that a design with a problem still gets its trip band.
  const { shuntMaxMilliamps: _checkedAbove, ...rest } = given;
  const element: ShuntReference = { ...rest, seriesOhms, loadMinMilliamps: loadMin, loadMaxMilliamps: loadMax };
  return realized(
    element,
    {
      name: option.name,
      kind: "sized-shunt",
      nominalVolts: vRef,
      element,
      shuntCurrentMinMilliamps,
      shuntCurrentMaxMilliamps,
      seriesResistorPowerWatts,
      problems,
    },
    ambient,
    ctx,
    context,
  );
}
