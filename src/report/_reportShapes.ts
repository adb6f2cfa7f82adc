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
  rows: ["array", { temperatureC: n, nominalErrorC: n, bands: ["array", { method, errorLowC: n, errorHighC: n }], largestSources: ["optional", ["array", { source: "string", halfSwingC: n }]] }],
  setpoints: ["optional", ["array", { name: "string", tripTemperatureC: n, maxNormalOperatingC: n, hazardLimitC: n }]],
  notes: strings,
  methods: _methodInfoShape,
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
      maxNormalOperatingC: n,
      hazardLimitC: n,
      marginToNormalC: n,
      marginToHazardC: n,
      pass: "boolean",
      reason: "string",
      errorSources: ["array", { name: "string", description: "string", worstCaseC: n, standardUncertaintyC: n }],
      bandOverService: ["optional", ["array", { hours: n, lowC: n, highC: n }]],
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
