/**
 * The comparator element: input offset and hysteresis. With a rising signal it trips at threshold +
 * offset + the upper part of the hysteresis band, and releases at threshold + offset − the lower part.
 * @module
 */
import { _invalidChoice } from "../errors.js";
import { _optionalLimit, _requireObject, _source, type _SourceContext } from "./_common.js";
import type { ChainErrorSource, ComparatorEdge, ComparatorElement, HysteresisPlacement } from "./types.js";

/**
 * Where a comparator switches relative to its threshold, from the hysteresis and its placement.
 * @param element - comparator element
 * @param edge - `"trip"` (signal rising) or `"release"` (signal falling)
 * @returns switching point minus threshold (no offset), mV
 * @throws HotjunctionRangeError for a bad element, placement or edge
 * @example
 * ```ts
 * import { comparatorSwitchingOffsetMillivolts } from "hotjunction";
 * const c = { kind: "comparator", hysteresisMillivolts: 10 } as const;
 * console.log(comparatorSwitchingOffsetMillivolts(c, "trip"), comparatorSwitchingOffsetMillivolts(c, "release")); // 5 -5
 * ```
 */
export function comparatorSwitchingOffsetMillivolts(element: ComparatorElement, edge: ComparatorEdge): number {
  const context = "comparator";
  const o = _requireObject(element, "comparator", context);
  const h = _optionalLimit(o["hysteresisMillivolts"], "hysteresisMillivolts", "mV", context);
  const placement = (o["hysteresisPlacement"] ?? "centered") as HysteresisPlacement;
  let up: number;
  switch (placement) {
    case "centered":
      up = h / 2;
      break;
    case "above":
      up = h;
      break;
    case "below":
      up = 0;
      break;
    default:
      return _invalidChoice("hysteresis placement", placement, ["centered", "above", "below"], context);
  }
  if (edge === "trip") return up;
  if (edge === "release") return up - h;
  return _invalidChoice("edge", edge, ["trip", "release"], context);
}

/** @internal The comparator stage of a compiled chain. */
export interface _ComparatorStage {
  readonly sources: readonly ChainErrorSource[];
  /** Switching point minus threshold for an edge, V, including the offset source. */
  switchingOffsetVolts(x: Readonly<Record<string, number>>, edgeMillivolts: number): number;
  edgeMillivolts(edge: ComparatorEdge): number;
}

/** @internal Builds the stage. */
export function _comparatorStage(element: ComparatorElement, ctx: _SourceContext, context: string): _ComparatorStage {
  const o = _requireObject(element, "comparator", context);
  const offset = _optionalLimit(o["offsetMillivolts"], "offsetMillivolts", "mV", context);
  const sources = offset > 0 ? [_source(ctx, "comparator.offset", "comparator", "input offset voltage", "mV", offset)] : [];
  const has = offset > 0;
  comparatorSwitchingOffsetMillivolts(element, "trip");
  return {
    sources,
    switchingOffsetVolts: (x, edgeMv) => (edgeMv + (has ? (x["comparator.offset"] as number) : 0)) / 1000,
    edgeMillivolts: (edge) => comparatorSwitchingOffsetMillivolts(element, edge),
  };
}
