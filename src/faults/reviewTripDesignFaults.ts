/**
 * The single-fault review of every setpoint of a trip design, from the design and its result (the chosen
 * threshold networks and reference).
 * @module
 */
import type { DividerElement, MeasurementChain, ReferenceElement } from "../chain/types.js";
import { _invalidChoice, _requireInRange } from "../errors.js";
import type { ReferenceRealization, SetpointTripResult, ThresholdNetwork, TripDesign } from "../trip/types.js";
import { faultReviewReport } from "./faultReviewReport.js";
import { reviewFaults } from "./reviewFaults.js";
import type { FaultReviewReport, ReviewFaultsOptions } from "./types.js";

/**
 * The parts of a trip-design result the review reads; a `TripDesignResult` from `designTrip` fits as is.
 */
export interface FaultReviewTripResult {
  readonly name?: string;
  readonly networks: readonly Pick<ThresholdNetwork, "resistorsOhms">[];
  readonly reference: Pick<ReferenceRealization, "nominalVolts"> & { readonly element?: ReferenceElement };
  readonly setpoints: readonly (Pick<
    SetpointTripResult,
    "name" | "tripTemperatureC" | "networkIndex" | "tapIndex" | "maxNormalOperatingC" | "hazardLimitC"
  > & {
    /** Healthy worst-case trip band, °C; when present the faults are judged with it (see {@link reviewFaults}). */
    readonly worstCase?: { readonly lowC: number; readonly highC: number };
  })[];
}

/**
 * Reviews every setpoint of a comparator trip design against single faults (see {@link reviewFaults}): the chain
 * of each setpoint is the design's thermocouple, compensation, amplifier and comparator with the result's
 * reference (an ideal reference becomes an error-free series reference of its voltage) and threshold network.
 * The cold junction defaults to the design's `designColdJunctionC`, else the middle of the ambient range. Each
 * setpoint's faults are judged with its healthy worst-case band (`result.setpoints[i].worstCase`) moved by the
 * fault's shift, so a fault that keeps a nominal unit inside the hazard limit but not the worst unit is dangerous.
 * @param design - the trip design (as given to `designTrip`)
 * @param result - its `designTrip` result (or the same fields for a built board)
 * @param options - as for {@link reviewFaults}
 * @returns one review per setpoint (input order), with counts, scope and caution
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad design, result or option (see {@link reviewFaults})
 * @example
 * ```ts
 * import { designTrip, reviewTripDesignFaults, type TripDesign } from "hotjunction";
 * const design: TripDesign = {
 *   setpoints: [{ name: "reflow guard", tripTemperatureC: 262 }],
 *   processLimits: { maxNormalOperatingC: 250, hazardLimitC: 280 },
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   comparator: { kind: "comparator" },
 *   reference: { kind: "ideal", name: "2.5 V", nominalVolts: 2.5 },
 *   resistors: { series: "E96", toleranceFraction: 0.01 },
 *   ambient: { minC: 15, maxC: 50 },
 * };
 * const result = designTrip(design, { monteCarloTrials: 1000 });
 * const report = reviewTripDesignFaults(design, result, { outputStage: "de-energize-to-trip" });
 * const loss = report.reviews[0]?.rows.find((r) => r.faultId === "board.supplyLost");
 * console.log(loss?.effect, loss?.safety); // "trips-immediately" "safe"
 * ```
 */
// Deliberately alike: a public entry's signature with its options default and context line (as midRailDivider).
export function reviewTripDesignFaults(
  design: TripDesign,
  result: FaultReviewTripResult,
  options: ReviewFaultsOptions = {},
): FaultReviewReport {
  const context = "fault review of a trip design";
  if (typeof design !== "object" || design === null) _invalidChoice("design", design, ["a trip design object"], context);
  if (typeof result !== "object" || result === null || !Array.isArray(result.setpoints) || !Array.isArray(result.networks)) {
    _invalidChoice("result", result, ["a trip-design result with networks and setpoints"], context);
  }
  const reference: ReferenceElement = result.reference?.element ?? {
    kind: "reference",
    variant: "series",
    nominalVolts: result.reference?.nominalVolts,
    initialAccuracyFraction: 0,
    label: "ideal reference",
  };
  const coldJunctionC = options.coldJunctionC ?? design.designColdJunctionC;
  const reviews = result.setpoints.map((sp, i) => {
    _requireInRange(sp.networkIndex, `setpoints[${i}].networkIndex`, 0, result.networks.length - 1, undefined, context);
    const network = result.networks[sp.networkIndex] as Pick<ThresholdNetwork, "resistorsOhms">;
    const divider: DividerElement = {
      kind: "divider",
      resistorsOhms: network.resistorsOhms,
      toleranceFraction: design.resistors?.toleranceFraction ?? 0,
    };
    const chain: MeasurementChain = {
      thermocouple: design.thermocouple,
      ...(design.coldJunction !== undefined ? { coldJunction: design.coldJunction } : {}),
      ...(design.amplifier !== undefined ? { amplifier: design.amplifier } : {}),
      reference,
      divider,
      detector: design.comparator,
      ambient: design.ambient,
      ...(design.wire !== undefined ? { wire: design.wire } : {}),
      ...(design.name !== undefined ? { label: design.name } : {}),
    };
    const review = reviewFaults(
      chain,
      {
        name: sp.name,
        tap: sp.tapIndex,
        tripTemperatureC: sp.tripTemperatureC,
        maxNormalOperatingC: sp.maxNormalOperatingC,
        hazardLimitC: sp.hazardLimitC,
        ...(sp.worstCase !== undefined ? { healthyBandC: { lowC: sp.worstCase.lowC, highC: sp.worstCase.highC } } : {}),
      },
      coldJunctionC !== undefined ? { ...options, coldJunctionC } : options,
    );
    // With several networks a resistor's name carries its divider, as on the build sheet (resistorDesignator).
    if (result.networks.length < 2) return review;
    const prefix = `divider ${sp.networkIndex + 1} `;
    return { ...review, rows: review.rows.map((r) => (r.element === "divider" && /^(top|bottom|ladder \d+) resistor/.test(r.description) ? { ...r, description: prefix + r.description } : r)) };
  });
  return faultReviewReport(reviews, design.name ?? result.name);
}
