/**
 * Regressions found by tests/contract in the trip module's entry points: options that are not an object, a hole in
 * the target ratios, a forged setpoint or a missing model, and a supply so high that the series resistor's
 * dissipation leaves float64 are typed errors naming the quantity (they were plain TypeErrors, NaN or Infinity).
 */
import { describe, expect, it } from "vitest";
import { typedErrorOf } from "../_typedError.js";
import { realizeReference, selectLadder, tripDynamics } from "../../src/index.js";


describe("trip entry points refuse forged arguments", () => {
  it("selectLadder: missing options and a hole in the target ratios", () => {
    expect(typedErrorOf(() => selectLadder([0.5, 0.25], undefined as never)).quantity).toBe("options");
    expect(typedErrorOf(() => selectLadder([0.5, 0.25], null as never)).quantity).toBe("options");
    // eslint-disable-next-line no-sparse-arrays
    expect(typedErrorOf(() => selectLadder([0.5, , 0.25] as never, { series: "E24", minTotalOhms: 3000, maxTotalOhms: 5000 })).quantity).toBe("target ratio 1");
    // the documented example is unchanged: 1.5 kΩ + 750 Ω + 750 Ω (E24) realizes 1/2 and 1/4 exactly (arithmetic)
    expect(selectLadder([0.5, 0.25], { series: "E24", minTotalOhms: 3000, maxTotalOhms: 5000 }).resistorsOhms).toEqual([1500, 750, 750]);
  });

  it("realizeReference: null options; a 1e308 V supply is OVERFLOW, not an infinite dissipation", () => {
    const element = { kind: "reference", variant: "shunt", nominalVolts: 2.5, initialAccuracyFraction: 0.005, supplyMinVolts: 4.75, supplyMaxVolts: 5.25, shuntMinMilliamps: 0.1, shuntMaxMilliamps: 15 } as const;
    const option = (supplyMaxVolts: number) => ({ kind: "sized-shunt", name: "2.5 V shunt", element: { ...element, supplyMaxVolts } }) as const;
    expect(typedErrorOf(() => realizeReference(option(5.25), { minC: -20, maxC: 60 }, null as never)).quantity).toBe("options");
    expect(typedErrorOf(() => realizeReference(option(1e308), { minC: -20, maxC: 60 })).code).toBe("OVERFLOW");
    // R ≤ (4.75 − 2.5) V / 0.35 mA = 6428.6 Ω; 6200 Ω · 1.01 fits (Ohm's law; the documented example)
    const { realization } = realizeReference(option(5.25), { minC: -20, maxC: 60 }, { dividerCurrentMilliamps: 0.25, resistorSeries: "E24", resistorToleranceFraction: 0.01 });
    expect(realization.element?.variant === "shunt" ? realization.element.seriesOhms : 0).toBe(6200);
  });

  it("tripDynamics: a missing model, a missing setpoint, and non-finite or non-string setpoint figures", () => {
    const model = { runaway: { kind: "constantRate", rateCPerSecond: 1.2 }, sensor: { kind: "firstOrder", timeConstantSeconds: 20 } } as const;
    const setpoint = { name: "bisque", maxNormalOperatingC: 1000, hazardLimitC: 1060, nominalTripC: 1020, bandLowC: 1012, bandHighC: 1028, lowSidePass: true, staticPass: true };
    for (const bad of [undefined, null]) expect(typedErrorOf(() => tripDynamics({ model: bad as never, setpoints: [setpoint] })).quantity).toBe("model");
    expect(typedErrorOf(() => tripDynamics({ model, setpoints: [null as never] })).quantity).toBe("setpoints[0]");
    expect(typedErrorOf(() => tripDynamics({ model, setpoints: [{ ...setpoint, bandLowC: Number.NaN }] })).quantity).toBe("setpoints[0].bandLowC");
    expect(typedErrorOf(() => tripDynamics({ model, setpoints: [{ ...setpoint, staticPass: Number.POSITIVE_INFINITY as never }] })).quantity).toBe("setpoints[0].staticPass");
    expect(typedErrorOf(() => tripDynamics({ model, setpoints: [{ ...setpoint, name: [0, Number.NaN] as never }] })).quantity).toBe("setpoints[0].name");
    expect(typedErrorOf(() => tripDynamics({ model, setpoints: [{ ...setpoint, lowSidePass: Number.NaN as never }] })).quantity).toBe("setpoints[0].lowSidePass");
    expect(tripDynamics({ model, setpoints: [setpoint] }).pass).toBe(true);
  });
});
