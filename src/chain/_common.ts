/**
 * Helpers shared by the chain element modules (internal): the input checks (re-exported from errors.ts), the
 * construction of named error sources, and the ambient spans that drifts are taken over.
 * @module
 * @internal
 */
import {
  _invalidChoice,
  _requireFinite,
  _requireNonNegative,
  _requireObject,
  _requireOrderedPair,
  _requirePositive,
  HotjunctionRangeError,
} from "../errors.js";
import { arcsine } from "../uncertainty/arcsine.js";
import { normalDistribution } from "../uncertainty/normal.js";
import { rectangular } from "../uncertainty/rectangular.js";
import { trapezoidal } from "../uncertainty/trapezoidal.js";
import { triangular } from "../uncertainty/triangular.js";
import type { Distribution } from "../uncertainty/types.js";
import type {
  AmbientRange,
  ChainErrorSource,
  ChainSourceElement,
  ErrorSourceUnit,
  SourceDistributionOverride,
} from "./types.js";

/** Temperature at which data sheets state initial values and from which drifts are counted, °C. */
export const _specReferenceC = 25;

// The checks live in the one validator home, src/errors.ts; re-exported so the element modules keep one import.
export { _requireFraction, _requireNonNegative, _requireObject, _requireOrderedPair, _requirePositive } from "../errors.js";

/** @internal Optional ± limit, default 0. */
export function _optionalLimit(value: unknown, quantity: string, unit: string, context: string): number {
  return value === undefined ? 0 : _requireNonNegative(value, quantity, unit, context);
}

/** @internal Checks an ambient range (finite, min ≤ max, not below absolute zero). */
export function _checkAmbient(ambient: unknown, context: string): AmbientRange {
  return _checkTemperatureRange(ambient, "ambient", "ambient minC", "ambient maxC", context);
}

/**
 * @internal Checks a temperature range object `{ minC, maxC }` (finite, min ≤ max, not below absolute zero); the
 * ambient range and the wire's ranges name their ends their own way (`ambient minC`, `cable.ambient.minC`).
 */
export function _checkTemperatureRange(value: unknown, quantity: string, minName: string, maxName: string, context: string): AmbientRange {
  const o = _requireObject(value, quantity, context);
  const [minC, maxC] = _requireOrderedPair(o["minC"], o["maxC"], minName, maxName, "°C", context);
  if (minC < -273.15) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: minName,
      value: minC,
      min: -273.15,
      unit: "°C",
      context,
      problem: "is below absolute zero",
    });
  }
  return { minC, maxC };
}

/**
 * @internal Tells whether the first of two alternative keys is given; throws (`INVALID_DESIGN`, quantity
 * `prefix+first / prefix+second`) unless exactly one is: `bothProblem` when both are, `missingProblem` when neither.
 */
export function _oneOfTwoKeys(
  o: Record<string, unknown>,
  first: string,
  second: string,
  prefix: string,
  problems: { readonly both: string; readonly missing: string },
  context: string,
): boolean {
  const hasFirst = o[first] !== undefined;
  if (hasFirst === (o[second] !== undefined)) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: `${prefix}${first} / ${prefix}${second}`,
      value: hasFirst ? "both" : undefined,
      context,
      problem: hasFirst ? problems.both : problems.missing,
    });
  }
  return hasFirst;
}

/** @internal Box-method span of the ambient range, °C. */
export function _ambientSpanC(ambient: AmbientRange): number {
  return ambient.maxC - ambient.minC;
}

/** @internal Largest distance of the ambient range from 25 °C, °C. */
export function _ambientFromReferenceC(ambient: AmbientRange): number {
  return Math.max(Math.abs(ambient.maxC - _specReferenceC), Math.abs(ambient.minC - _specReferenceC));
}

/** @internal Context of a source construction. */
export interface _SourceContext {
  readonly overrides: Readonly<Record<string, SourceDistributionOverride>> | undefined;
}

const kinds = ["normal", "rectangular", "triangular", "trapezoidal", "arcsine"] as const;

/** @internal The distribution of a ± limit L about `center`, rectangular unless overridden. */
export function _limitDistribution(
  name: string,
  limit: number,
  center: number,
  override: SourceDistributionOverride | undefined,
): Distribution {
  if (override === undefined) return rectangular({ center, halfWidth: limit });
  const context = `distribution override of ${name}`;
  const o = _requireObject(override, "override", context);
  switch (o["distribution"]) {
    case "rectangular":
      return rectangular({ center, halfWidth: limit });
    case "triangular":
      return triangular({ center, halfWidth: limit });
    case "arcsine":
      return arcsine({ center, halfWidth: limit });
    case "trapezoidal": {
      const beta = o["beta"] === undefined ? 0.5 : _requireFinite(o["beta"], "beta", undefined, context);
      return trapezoidal({ center, halfWidth: limit, beta });
    }
    case "normal": {
      const k = o["coverageFactor"] === undefined ? 2 : _requirePositive(o["coverageFactor"], "coverage factor", "", context);
      return normalDistribution({ mean: center, standardDeviation: limit / k });
    }
    default:
      return _invalidChoice("distribution", o["distribution"], kinds, context);
  }
}

/** @internal Builds one named source (a ± limit about `center`, default 0). */
export function _source(
  ctx: _SourceContext,
  name: string,
  element: ChainSourceElement,
  description: string,
  unit: ErrorSourceUnit,
  limit: number,
  center = 0,
): ChainErrorSource {
  return {
    name,
    element,
    description,
    unit,
    limit,
    distribution: _limitDistribution(name, limit, center, ctx.overrides?.[name]),
  };
}
