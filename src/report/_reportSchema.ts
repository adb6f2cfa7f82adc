/**
 * The zod schema of the JSON reports (`check`, `compare`, `sweep` with `--json`), version 1, and the JSON Schema
 * generated from it (`schema/hotjunction-report.schema.json`; regenerate with `npx tsx scripts/writeReportSchema.ts`).
 * Not part of any entry: tests and the script import it, so no report bundle pulls zod in. Objects of this package
 * are strict (unknown keys refused); the top level of a report stays open for sections other commands add (e.g.
 * `dynamics`), and chain elements echoed inside a realization are open objects.
 * @module
 */
import * as z from "zod";
import { _propagationMethods } from "../uncertainty/types.js";

/** The report layout version every JSON report carries as `reportSchemaVersion`. */
export const reportSchemaVersion = 1;

const num = z.number();
const method = z.enum(_propagationMethods);
const methodInfo = z.strictObject({
  methods: z.array(method),
  acceptanceMethod: method.optional(),
  coverage: num,
  trials: num.optional(),
  seed: num.optional(),
});
const band = z.strictObject({
  method,
  lowC: num,
  highC: num,
  coverage: num,
  standardUncertaintyC: num,
  trials: num.optional(),
  seed: num.optional(),
  coverageFactor: num.optional(),
  coverageFactorRule: z.enum(["normal", "rectangular-dominant", "none"]).optional(),
  limitedToWorstCase: z.boolean().optional(),
  toleranceAtLowC: num.optional(),
  toleranceAtHighC: num.optional(),
  iterations: num.optional(),
  enclosureLowC: num.optional(),
  enclosureHighC: num.optional(),
  enclosureGapLowC: num.optional(),
  enclosureGapHighC: num.optional(),
  enclosureGapToleranceC: num.optional(),
});
const errorSource = z.strictObject({ name: z.string(), description: z.string(), worstCaseC: num, standardUncertaintyC: num });
const resistor = z.strictObject({ designator: z.string(), ohms: num });
const buildSheet = z.strictObject({
  sheetVersion: z.literal(1),
  setpoints: z.array(
    z.strictObject({
      name: z.string(),
      idealThresholdVolts: num,
      realizedThresholdVolts: num,
      thresholdErrorVolts: num,
      thresholdLowVolts: num,
      thresholdHighVolts: num,
      networkIndex: num,
      resistorsAbove: z.array(resistor),
      resistorsBelow: z.array(resistor),
      dividerCurrentMilliamps: num,
      nominalTripC: num,
      nominalReleaseC: num,
      hysteresisC: num,
      releaseLowC: num,
      releaseHighC: num,
      releaseMarginToNormalC: num,
    }),
  ),
  adcSetpoints: z.array(
    z.strictObject({ name: z.string(), signalVolts: num, nominalCode: num, thresholdCode: num, codesPerC: num, codeLow: num, codeHigh: num }),
  ),
  networks: z.array(z.strictObject({ topology: z.enum(["two-resistor", "ladder"]), resistors: z.array(resistor), totalOhms: num, currentMilliamps: num })),
  shuntSeriesResistor: z.strictObject({ ohms: num, series: z.string(), toleranceFraction: num, powerWatts: num, ratingWatts: num }).optional(),
  midRail: z.strictObject({ topOhms: num, bottomOhms: num, nominalVolts: num, worstCaseLowVolts: num, worstCaseHighVolts: num }).optional(),
  parts: z.array(
    z.strictObject({
      designators: z.string(),
      part: z.string(),
      value: z.union([num, z.string()]),
      unit: z.string(),
      tolerance: num,
      toleranceUnit: z.enum(["fraction", "°C"]),
      tempcoPpmPerC: num,
      count: num,
    }),
  ),
});
const common = {
  reportSchemaVersion: z.literal(reportSchemaVersion),
  caution: z.string().regex(/do not certify a safety function/),
  method: methodInfo,
  designName: z.string().optional(),
  temperatureUnit: z.enum(["°C", "°F", "K"]).optional(),
};
const tripReport = z.looseObject({
  report: z.literal("trip"),
  ...common,
  title: z.string(),
  pass: z.boolean(),
  setpoints: z.array(
    z.strictObject({
      name: z.string(),
      tripTemperatureC: num,
      nominalTripC: num,
      bands: z.array(band),
      maxNormalOperatingC: num,
      hazardLimitC: num,
      marginToNormalC: num,
      marginToHazardC: num,
      pass: z.boolean(),
      reason: z.string(),
      errorSources: z.array(errorSource),
      bandOverService: z.array(z.strictObject({ hours: num, lowC: num, highC: num })).optional(),
    }),
  ),
  details: z.array(z.string()),
  notes: z.array(z.string()),
  methods: methodInfo,
  buildSheet: buildSheet.optional(),
});
const realization = z.looseObject({ name: z.string(), kind: z.string(), nominalVolts: num, toleranceFraction: num, problems: z.array(z.string()) });
const network = z.strictObject({ topology: z.enum(["two-resistor", "ladder"]), resistorsOhms: z.array(num), totalOhms: num, currentMilliamps: num });
const comparisonReport = z.looseObject({
  report: z.literal("reference-comparison"),
  ...common,
  acceptanceMethod: method,
  options: z.array(
    z.looseObject({
      name: z.string(),
      kind: z.string(),
      cost: num.nullable(),
      reference: realization,
      networks: z.array(network),
      setpoints: z.array(
        z.looseObject({ name: z.string(), lowC: num, highC: num, idealLowC: num, idealHighC: num, extraWidthC: num, marginToNormalC: num, marginToHazardC: num, pass: z.boolean() }),
      ),
      verdict: z.enum(["adequate", "inadequate"]),
      verdictText: z.string(),
    }),
  ),
  recommended: z.string().nullable(),
  summary: z.string(),
});
const sweepReport = z.looseObject({
  report: z.literal("error-sweep"),
  ...common,
  title: z.string(),
  rows: z.array(
    z.strictObject({
      temperatureC: num,
      nominalErrorC: num,
      bands: z.array(
        z.strictObject({
          method,
          errorLowC: num,
          errorHighC: num,
          enclosureErrorLowC: num.optional(),
          enclosureErrorHighC: num.optional(),
          enclosureGapLowC: num.optional(),
          enclosureGapHighC: num.optional(),
        }),
      ),
      largestSources: z.array(z.strictObject({ source: z.string(), halfSwingC: num })).optional(),
    }),
  ),
  setpoints: z.array(z.strictObject({ name: z.string(), tripTemperatureC: num, maxNormalOperatingC: num, hazardLimitC: num })).optional(),
  worstCaseBracket: z.strictObject({ points: num, enclosedPoints: num, largestGapC: num, largestGapAtC: num, gapToleranceC: num }).optional(),
  notes: z.array(z.string()),
  methods: methodInfo,
});

/** Every JSON report of the CLI, by its `report` field. @internal */
export const _reportSchema = z.discriminatedUnion("report", [tripReport, comparisonReport, sweepReport]);

/** The JSON Schema text of the reports (2-space JSON, final newline). @internal */
export function _reportJsonSchemaText(): string {
  const schema = z.toJSONSchema(_reportSchema, { target: "draft-2020-12", io: "input" }) as Record<string, unknown>;
  return `${JSON.stringify({ $schema: schema["$schema"], $id: "hotjunction-report/1", title: "hotjunction JSON report, version 1", ...schema }, null, 2)}\n`;
}
