/**
 * What the report renderers read of the result objects they are given, as shapes for the shared guard
 * (`_requireShape`, src/errors.ts): each renderer checks its input at its entry, so a forged or truncated result
 * is refused by field name (expected kind and value found) instead of printing NaN or throwing a plain TypeError.
 * Object literals only: nothing here runs at load time.
 * @module
 * @internal
 */
import type { _Shape } from "../errors.js";

const n: _Shape = "number";
const strings: _Shape = ["array", "string"];
const method: _Shape = ["oneOf", ["worst-case", "rss", "monte-carlo"]];

/** @internal Methods, coverage, trials and seed of a report. */
export const _methodInfoShape: _Shape = {
  methods: ["array", method],
  acceptanceMethod: ["optional", method],
  coverage: n,
  trials: ["optional", n],
  seed: ["optional", n],
};

/** @internal An error sweep (formatSweepReport, errorBandChartSvg). */
export const _errorSweepShape: _Shape = {
  title: "string",
  designName: ["optional", "string"],
  rows: [
    "array",
    {
      temperatureC: n,
      nominalErrorC: n,
      bands: ["array", { method, errorLowC: n, errorHighC: n, enclosureErrorLowC: ["optional", n], enclosureErrorHighC: ["optional", n], enclosureGapLowC: ["optional", n], enclosureGapHighC: ["optional", n] }],
      largestSources: ["optional", ["array", { source: "string", halfSwingC: n }]],
    },
  ],
  setpoints: ["optional", ["array", { name: "string", tripTemperatureC: n, maxNormalOperatingC: n, hazardLimitC: n }]],
  worstCaseBracket: ["optional", { points: n, enclosedPoints: n, largestGapC: n, largestGapAtC: n, gapToleranceC: n }],
  notes: strings,
  methods: _methodInfoShape,
};

const optionalNumber: _Shape = ["optional", n];

/** @internal One trip band of a `designTrip` setpoint (every field a trip report copies). */
const tripBandShape: _Shape = {
  method,
  lowC: n,
  highC: n,
  coverage: n,
  standardUncertaintyC: n,
  trials: optionalNumber,
  seed: optionalNumber,
  coverageFactor: optionalNumber,
  coverageFactorRule: ["optional", ["oneOf", ["normal", "rectangular-dominant", "none"]]],
  limitedToWorstCase: ["optional", "boolean"],
  toleranceAtLowC: optionalNumber,
  toleranceAtHighC: optionalNumber,
  iterations: optionalNumber,
  enclosureLowC: optionalNumber,
  enclosureHighC: optionalNumber,
  enclosureGapLowC: optionalNumber,
  enclosureGapHighC: optionalNumber,
  enclosureGapToleranceC: optionalNumber,
};

const resistorShape: _Shape = { designator: "string", ohms: n };

/** @internal The build sheet of a trip design (`TripBuildSheet`), every field (a report copies it whole). */
export const _buildSheetShape: _Shape = {
  sheetVersion: n,
  setpoints: [
    "array",
    {
      name: "string",
      idealThresholdVolts: n,
      realizedThresholdVolts: n,
      thresholdErrorVolts: n,
      thresholdLowVolts: n,
      thresholdHighVolts: n,
      networkIndex: n,
      resistorsAbove: ["array", resistorShape],
      resistorsBelow: ["array", resistorShape],
      dividerCurrentMilliamps: n,
      nominalTripC: n,
      nominalReleaseC: n,
      hysteresisC: n,
      releaseLowC: n,
      releaseHighC: n,
      releaseMarginToNormalC: n,
    },
  ],
  adcSetpoints: ["array", { name: "string", signalVolts: n, nominalCode: n, thresholdCode: n, codesPerC: n, codeLow: n, codeHigh: n }],
  networks: ["array", { topology: ["oneOf", ["two-resistor", "ladder"]], resistors: ["array", resistorShape], totalOhms: n, currentMilliamps: n }],
  shuntSeriesResistor: ["optional", { ohms: n, series: "string", toleranceFraction: n, powerWatts: n, ratingWatts: n }],
  midRail: ["optional", { topOhms: n, bottomOhms: n, nominalVolts: n, worstCaseLowVolts: n, worstCaseHighVolts: n }],
  parts: ["array", { designators: "string", part: "string", value: "any" /* a number (finite: checked by tripReportFromResult) or a type letter */, unit: "string", tolerance: n, toleranceUnit: ["oneOf", ["fraction", "°C"]], tempcoPpmPerC: n, count: n }],
};

/** The verdict fields a setpoint carries in a trip result and in a trip report alike. */
const setpointVerdict = {
  maxNormalOperatingC: n,
  hazardLimitC: n,
  marginToNormalC: n,
  marginToHazardC: n,
  pass: "boolean",
  reason: "string",
  errorSources: ["array", { name: "string", description: "string", worstCaseC: n, standardUncertaintyC: n }],
  bandOverService: ["optional", ["array", { hours: n, lowC: n, highC: n }]],
} satisfies Record<string, _Shape>;

/**
 * @internal What `tripReportFromResult` reads of a `designTrip` result (`TripDesignResult`): every field it copies
 * or prints.
 */
export const _tripResultShape: _Shape = {
  name: ["optional", "string"],
  networks: ["array", { topology: ["oneOf", ["two-resistor", "ladder"]], resistorsOhms: ["array", n], currentMilliamps: n }],
  reference: {
    name: "string",
    kind: ["oneOf", ["ideal", "element", "sized-shunt"]],
    nominalVolts: n,
    toleranceFraction: n,
    shuntCurrentMinMilliamps: optionalNumber,
    shuntCurrentMaxMilliamps: optionalNumber,
    seriesResistorPowerWatts: optionalNumber,
    problems: strings,
  },
  setpoints: [
    "array",
    {
      name: "string",
      tripTemperatureC: n,
      nominalTripC: n,
      worstCase: tripBandShape,
      rss: tripBandShape,
      monteCarlo: tripBandShape,
      ...setpointVerdict,
    },
  ],
  acceptanceMethod: method,
  midRail: { nominalVolts: n, worstCaseLowVolts: n, worstCaseHighVolts: n, worstCaseFraction: n, relativeStandardUncertainty: n },
  buildSheet: ["optional", _buildSheetShape],
  pass: "boolean",
  notes: strings,
};

/** @internal A trip report (formatTripReport, tripBandChartSvg); the build sheet and dynamics sections are checked by their own readers. */
export const _tripReportShape: _Shape = {
  title: "string",
  designName: ["optional", "string"],
  pass: "boolean",
  setpoints: [
    "array",
    {
      name: "string",
      tripTemperatureC: n,
      nominalTripC: n,
      bands: ["array", { method, lowC: n, highC: n, coverage: n, standardUncertaintyC: n }],
      ...setpointVerdict,
    },
  ],
  details: strings,
  notes: strings,
  methods: _methodInfoShape,
};

/** @internal A reference comparison (formatComparisonReport, comparisonChartSvg). */
export const _comparisonShape: _Shape = {
  acceptanceMethod: method,
  recommended: ["nullable", "string"],
  summary: "string",
  options: [
    "array",
    {
      name: "string",
      kind: "string",
      cost: ["nullable", n],
      verdict: ["oneOf", ["adequate", "inadequate"]],
      verdictText: "string",
      setpoints: ["array", { name: "string", lowC: n, highC: n, idealLowC: n, idealHighC: n, extraWidthC: n, marginToNormalC: n, marginToHazardC: n, pass: "boolean" }],
    },
  ],
};
