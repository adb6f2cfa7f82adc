// Type-level checks of the public shapes: a change to a signature or a result field fails typecheck (`npm run
// typecheck` covers tests/) and this file. Shapes as documented in the JSDoc of each function (no external source).
import { describe, expectTypeOf, it } from "vitest";
import {
  designTrip,
  emfFromTemperature,
  normalDistribution,
  propagate,
  rectangular,
  reviewFaults,
  temperatureFromEmf,
  type FaultDefinition,
  type FaultReview,
  type FaultSafety,
  type InputDistribution,
  type PropagationMethod,
  type PropagationModel,
  type PropagationResult,
  type ThermocoupleType,
  type TripDesignResult,
} from "../../src/index.js";
import { formatTripReport, type ReportDisplayOptions, type ReportFormat, type TripReport } from "../../src/report/index.js";
import { parseDesign, type DesignFile } from "../../src/design/index.js";

describe("public shapes", () => {
  it("conversion functions take a type letter, a number and cold-junction options, and return a number", () => {
    expectTypeOf(emfFromTemperature).parameter(0).toExtend<ThermocoupleType | object>();
    expectTypeOf(emfFromTemperature).parameter(1).toEqualTypeOf<number>();
    expectTypeOf(emfFromTemperature).parameter(2).toEqualTypeOf<{ readonly coldJunctionC?: number } | undefined>();
    expectTypeOf(emfFromTemperature).returns.toEqualTypeOf<number>();
    expectTypeOf(temperatureFromEmf).returns.toEqualTypeOf<number>();
    expectTypeOf<"K">().toExtend<ThermocoupleType>();
    expectTypeOf<"X">().not.toExtend<ThermocoupleType>();
  });

  it("propagate: the result is keyed by the input names, the method is the one union", () => {
    const inputs = { a: normalDistribution({ mean: 0, standardDeviation: 1 }), b: rectangular({ center: 0, halfWidth: 1 }) };
    expectTypeOf(inputs.a).toEqualTypeOf<InputDistribution>();
    const model: PropagationModel<"a" | "b"> = ({ a, b }) => a + b;
    const result = propagate(model, inputs);
    expectTypeOf(result).toEqualTypeOf<PropagationResult<"a" | "b">>();
    expectTypeOf(result.interval).toEqualTypeOf<readonly [number, number]>();
    expectTypeOf(result.contributions).toHaveProperty("a");
    expectTypeOf(result.method).toEqualTypeOf<PropagationMethod>();
    expectTypeOf<PropagationMethod>().toEqualTypeOf<"worst-case" | "rss" | "monte-carlo">();
  });

  it("designTrip: the result carries setpoints with three bands, a pass flag and the caution", () => {
    expectTypeOf(designTrip).returns.toEqualTypeOf<TripDesignResult>();
    expectTypeOf<TripDesignResult["pass"]>().toEqualTypeOf<boolean>();
    expectTypeOf<TripDesignResult["caution"]>().toEqualTypeOf<string>();
    expectTypeOf<TripDesignResult["acceptanceMethod"]>().toEqualTypeOf<PropagationMethod>();
    type Setpoint = TripDesignResult["setpoints"][number];
    expectTypeOf<Setpoint["worstCase"]["method"]>().toEqualTypeOf<PropagationMethod>();
    expectTypeOf<Setpoint["rss"]>().toEqualTypeOf<Setpoint["monteCarlo"]>();
    expectTypeOf<Setpoint["resistorsOhms"]>().toEqualTypeOf<readonly [number, number]>();
  });

  it("reviewFaults: one review with rows classified safe or dangerous; faults are FaultDefinition data", () => {
    expectTypeOf(reviewFaults).returns.toEqualTypeOf<FaultReview>();
    expectTypeOf<FaultReview["rows"][number]["safety"]>().toEqualTypeOf<FaultSafety>();
    expectTypeOf<FaultDefinition>().toHaveProperty("id").toEqualTypeOf<string>();
  });

  it("report and design entries: formatTripReport(report, format, options?) returns text; parseDesign returns a DesignFile", () => {
    // options (the display unit) is optional: every call of formatTripReport(report, format) stays valid.
    expectTypeOf(formatTripReport).parameters.toEqualTypeOf<[TripReport, ReportFormat, (ReportDisplayOptions | undefined)?]>();
    expectTypeOf(formatTripReport).returns.toEqualTypeOf<string>();
    expectTypeOf(parseDesign).returns.toEqualTypeOf<DesignFile>();
  });
});
