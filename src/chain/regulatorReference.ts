/**
 * A linear regulator's output used as the reference: one total tolerance over line, load and temperature,
 * or its parts (initial, line, load, temperature), each a ± fraction of the output.
 * @module
 */
import { HotjunctionRangeError } from "../errors.js";
import { _requireFraction, _source, type _SourceContext } from "./_common.js";
import type { ChainErrorSource, RegulatorReference } from "./types.js";

/** @internal Sources of a regulator used as the reference. */
export function _regulatorReferenceSources(
  element: RegulatorReference,
  ctx: _SourceContext,
  context: string,
): ChainErrorSource[] {
  if (element.initialAccuracyFraction !== undefined && element.initialToleranceFraction !== undefined) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "initialToleranceFraction",
      value: element.initialToleranceFraction,
      context,
      problem: "is the deprecated name of initialAccuracyFraction, which is given too; give initialAccuracyFraction only",
    });
  }
  // The source keeps its published name "reference.initialTolerance" (sourceDistributions overrides key on it).
  const parts = [
    [
      "initialTolerance",
      "initial accuracy at 25 °C",
      element.initialAccuracyFraction ?? element.initialToleranceFraction,
      element.initialToleranceFraction === undefined ? "initialAccuracyFraction" : "initialToleranceFraction",
    ],
    ["lineRegulation", "line regulation over the supply range", element.lineRegulationFraction, "lineRegulationFraction"],
    ["loadRegulation", "load regulation over the load range", element.loadRegulationFraction, "loadRegulationFraction"],
    ["temperatureDrift", "drift over the temperature range", element.temperatureDriftFraction, "temperatureDriftFraction"],
  ] as const;
  const givenParts = parts.filter((p) => p[2] !== undefined);
  if (element.totalToleranceFraction !== undefined) {
    if (givenParts.length > 0) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: "regulator tolerance",
        value: element.totalToleranceFraction,
        context,
        problem: `is given both as a total and as parts (${givenParts.map((p) => p[0]).join(", ")}); give one or the other`,
      });
    }
    const total = _requireFraction(element.totalToleranceFraction, "totalToleranceFraction", context);
    return total > 0 ? [_source(ctx, "reference.totalTolerance", "reference", "total tolerance over line, load and temperature", "fraction", total)] : [];
  }
  // Same error shape as other missing-choice checks (deliberate: this one names the regulator tolerance).
  if (givenParts.length === 0) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "regulator tolerance",
      value: undefined,
      context,
      problem: "is missing: give totalToleranceFraction or its parts",
    });
  }
  const out: ChainErrorSource[] = [];
  for (const [name, description, value, key] of givenParts) {
    const limit = _requireFraction(value, key, context);
    if (limit > 0) out.push(_source(ctx, `reference.${name}`, "reference", description, "fraction", limit));
  }
  return out;
}
