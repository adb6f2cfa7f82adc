/**
 * Regressions found by tests/contract (issue "typed-error promise everywhere"): faultReviewReport returned the
 * reviews it was given as they are, so `[null]` threw "Cannot read properties of null (reading 'rows')", a row
 * without a category was counted, and a name of NaN was copied into the report. The reviews are now checked as
 * the renderers read them, and free of NaN/±Infinity anywhere; the name is a string.
 */
import { describe, expect, it } from "vitest";
import { typedErrorOf } from "../_typedError.js";
import { faultReviewReport, reviewChainFaults, reviewFaults, type FaultReview } from "../../src/index.js";
import { ovenChain, ovenTrip } from "./helpers.js";


describe("faultReviewReport checks the reviews it returns", () => {
  const review = reviewFaults(ovenChain, ovenTrip);

  it.each([[[null], "reviews[0]"], [[Number.NaN], "reviews[0]"], [[{}], "reviews[0].name"]] as const)("reviews %j names %s", (reviews, quantity) => {
    const e = typedErrorOf(() => faultReviewReport(reviews as never));
    expect(e.code).toBe("INVALID_OPTION");
    expect(e.quantity).toBe(quantity);
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, [Number.NaN]])("a name %s is a typed error naming name", (name) => {
    expect(typedErrorOf(() => faultReviewReport([review], name as never)).quantity).toBe("name");
  });

  it("a row without its category, or a NaN in any field of a review (its context included), is named", () => {
    const noCategory = { ...review, rows: review.rows.map((r, i) => (i === 0 ? { ...r, category: undefined } : r)) } as unknown as FaultReview;
    expect(typedErrorOf(() => faultReviewReport([noCategory])).quantity).toBe("reviews[0].rows[0].category");
    const forgedContext = { ...review, context: { ...review.context, wireShortC: Number.NaN } } as FaultReview;
    const e = typedErrorOf(() => faultReviewReport([forgedContext]));
    expect(e.code).toBe("NOT_A_FINITE_NUMBER");
    expect(e.quantity).toBe("reviews[0].context.wireShortC");
  });

  it("real reviews report as before: counts summed over the reviews", () => {
    const report = faultReviewReport([review, review], "oven");
    expect(report.counts.total).toBe(2 * review.rows.length);
    expect(report.counts.dangerousUndetected).toBe(2 * review.counts.dangerousUndetected);
    expect(report.reviews[0]).toBe(review);
  });
});

describe("reviewChainFaults checks its chain even with no trips (tests/contract, seed 20261202: `[undefined, []]` read `.label` of undefined)", () => {
  it.each([undefined, null, 3])("chain %s is a typed error naming chain", (chain) => {
    const e = typedErrorOf(() => reviewChainFaults(chain as never, []));
    expect(e.quantity).toBe("chain");
  });
});
