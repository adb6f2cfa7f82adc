/**
 * The schema of the safety-figures JSON output (`formatSafetyFiguresJson`, and the `safetyFigures` member of
 * `hotjunction faults --json` when the design has failure data), as zod definitions and as the published JSON
 * Schema `schema/hotjunction-safety-figures.schema.json` (draft 2020-12), versioned by its `format` tag.
 * @module
 */
import * as z from "zod";

const num = z.number();
const nonNeg = z.number().min(0);
const frac = z.number().min(0).max(1);
const safety = z.enum(["safe", "dangerous", "degraded", "no-effect"]);

const proofTestUsed = z.strictObject({
  proofTestIntervalHours: num.positive(),
  meanTimeToRestorationHours: nonNeg,
  meanRepairTimeHours: nonNeg,
  proofTestCoverage: frac,
  missionTimeHours: num.positive().nullable(),
});

const pfd1oo1 = z.strictObject({
  architecture: z.literal("1oo1"),
  pfdAvg: nonNeg,
  channelDownTimeHours: nonNeg.nullable(),
  lambdaDuFit: nonNeg,
  lambdaDdFit: nonNeg,
  proofTest: proofTestUsed,
  simplifiedEquationsValid: z.boolean(),
});

const pfh = z.strictObject({
  architecture: z.enum(["1oo1", "1oo2"]),
  pfhPerHour: nonNeg,
  pfhFit: nonNeg,
  commonCausePfhPerHour: nonNeg,
});

const modeRow = z.strictObject({
  element: z.string(),
  mode: z.string(),
  faultId: z.string().nullable(),
  share: frac,
  rateFit: nonNeg,
  safety,
  detected: z.boolean(),
  counted: z.enum(["SD", "SU", "DD", "DU", "degraded", "no-effect"]),
  assumed: z.boolean(),
});

const setpoint = z.strictObject({
  name: z.string(),
  lambdaSdFit: nonNeg,
  lambdaSuFit: nonNeg,
  lambdaDdFit: nonNeg,
  lambdaDuFit: nonNeg,
  lambdaSafeFit: nonNeg,
  lambdaDangerousFit: nonNeg,
  lambdaDegradedFit: nonNeg,
  lambdaNoEffectFit: nonNeg,
  lambdaTotalFit: nonNeg,
  safeFailureFraction: frac.nullable(),
  diagnosticCoverage: frac.nullable(),
  proofTestCoverage: frac.nullable(),
  countDegradedAsDangerous: z.boolean(),
  noEffectThresholdC: nonNeg.nullable(),
  modes: z.array(modeRow),
  unratedFaultIds: z.array(z.string()),
  pfdAvg1oo1: pfd1oo1.nullable(),
  pfh1oo1: pfh.nullable(),
  notes: z.array(z.string()),
});

const channel = z.strictObject({ name: z.string(), lambdaDuFit: nonNeg, lambdaDdFit: nonNeg, pfdAvg1oo1: nonNeg, pfh1oo1PerHour: nonNeg });

const pair = z.strictObject({
  channelA: channel,
  channelB: channel,
  beta: frac,
  betaD: frac,
  commonCauseBasis: z.enum(["larger", "smaller", "geometric-mean"]),
  identicalChannels: z.boolean(),
  pfdAvg1oo2: nonNeg,
  independentPfd: nonNeg,
  commonCausePfd: nonNeg,
  commonCauseShare: frac.nullable(),
  pfh1oo2PerHour: nonNeg,
  commonCausePfhPerHour: nonNeg,
  improvementFactor: nonNeg.nullable(),
  improvementFactorWithoutCommonCause: nonNeg.nullable(),
  betaSensitivity: z.array(
    z.strictObject({ beta: frac, betaD: frac, pfdAvg1oo2: nonNeg, pfh1oo2PerHour: nonNeg, improvementFactor: nonNeg.nullable() }),
  ),
  proofTest: proofTestUsed,
  simplifiedEquationsValid: z.boolean(),
  notes: z.array(z.string()),
});

const curve = z.strictObject({
  channelName: z.string(),
  pairName: z.string().nullable(),
  beta: frac.nullable(),
  betaD: frac.nullable(),
  points: z.array(z.strictObject({ proofTestIntervalHours: num.positive(), pfdAvg1oo1: nonNeg, pfdAvg1oo2: nonNeg.nullable() })),
});

/** The safety-figures JSON output, format 1 (zod; every object strict). */
export const safetyFiguresOutputSchema = z
  .strictObject({
    format: z.literal("hotjunction-safety-figures/1").describe("format tag; a new major number for incompatible changes"),
    caution: z.string().min(1).describe("the safety caution"),
    certification: z.string().min(1).describe("states that no certification is claimed"),
    scope: z.string().min(1).describe("single faults of the modelled elements, rates supplied by the user"),
    name: z.string().optional(),
    setpoints: z.array(setpoint).describe("per setpoint and channel: λ by class (FIT), SFF, DC, PFDavg and PFH (1oo1)"),
    twoChannel: z.array(pair).describe("per setpoint: the 1oo2 pair with β, β_D"),
    curves: z.array(curve).describe("PFDavg against the proof-test interval, 1oo1 and 1oo2"),
  })
  .describe("hotjunction safety figures (IEC 61508-6 Annex B simplified equations; no certification claimed)");

/**
 * The JSON Schema of the safety-figures JSON output (what `schema/hotjunction-safety-figures.schema.json` holds).
 * @returns a JSON Schema object (draft 2020-12); unknown keys are refused (`additionalProperties: false`)
 * @example
 * ```ts
 * import { safetyFiguresJsonSchema } from "hotjunction/design";
 * console.log(safetyFiguresJsonSchema().title); // "hotjunction safety figures, format 1"
 * ```
 */
export function safetyFiguresJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(safetyFiguresOutputSchema, { target: "draft-2020-12", io: "output" }) as Record<string, unknown>;
  return { $schema: schema["$schema"], title: "hotjunction safety figures, format 1", ...schema };
}

/** The schema as the committed file's text (2-space JSON, final newline). @internal */
export function _safetyFiguresJsonSchemaText(): string {
  return `${JSON.stringify(safetyFiguresJsonSchema(), null, 2)}\n`;
}
