/**
 * Renderers of the safety figures: the caution (src/report/caution.ts), the scope and the no-certification
 * statement in every rendering, and every figure of the text also a field of the JSON (the project's rule;
 * `common practice, no source`).
 */
import { describe, expect, it } from "vitest";
import { CAUTION_TEXT } from "../../src/report/caution.js";
import {
  formatSafetyFiguresJson,
  formatSafetyFiguresMarkdown,
  formatSafetyFiguresText,
  logSpacedHours,
  pfdAvgCurve,
  safetyFigures,
  safetyFiguresCertification,
  safetyFiguresJsonFormat,
  safetyFiguresReport,
  safetyFiguresScope,
  twoChannelCutout,
} from "../../src/index.js";
import { handData, handSetpoint } from "./helpers.js";

const proofTest = { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 };
const setpoint = safetyFigures(handData, handSetpoint, { proofTest });
const pair = twoChannelCutout(setpoint, { name: "firmware", lambdaDuFit: 60, lambdaDdFit: 300 }, { beta: 0.05, betaD: 0.02, proofTest });
const curve = pfdAvgCurve(setpoint, { proofTestIntervalsHours: logSpacedHours(730, 87600, 4), proofTest: { meanTimeToRestorationHours: 8 }, pair: { beta: 0.05, betaD: 0.02 } });
const report = safetyFiguresReport({ name: "oven watchdog", setpoints: [setpoint], twoChannel: [pair], curves: [curve] });

describe("safety-figures renderers", () => {
  const text = formatSafetyFiguresText(report);
  const md = formatSafetyFiguresMarkdown(report);
  const json = JSON.parse(formatSafetyFiguresJson(report));
  it("each rendering carries the caution, the scope and the no-certification statement", () => {
    for (const out of [text.replace(/\s+/g, " "), md.replace(/\s+/g, " ")]) {
      expect(out).toContain(CAUTION_TEXT);
      expect(out).toContain(safetyFiguresScope);
      expect(out).toContain(safetyFiguresCertification);
    }
    expect(json.format).toBe(safetyFiguresJsonFormat);
    expect(json.caution).toBe(CAUTION_TEXT);
    expect(json.scope).toBe(safetyFiguresScope);
    expect(json.certification).toContain("no certification");
  });
  it("the printed figures are fields of the JSON: λ by class, SFF, DC, PFDavg, PFH, the pair and the curve", () => {
    const s = json.setpoints[0];
    expect(text).toContain(`λ_DU (dangerous, undetected)`);
    expect(text).toContain(`${+s.lambdaDuFit.toPrecision(4)} FIT`);
    expect(text).toContain(`${(s.safeFailureFraction * 100).toFixed(1)} %`);
    expect(text).toContain(`${(s.diagnosticCoverage * 100).toFixed(1)} %`);
    expect(text).toContain(s.pfdAvg1oo1.pfdAvg.toExponential(2));
    expect(text).toContain(s.pfh1oo1.pfhPerHour.toExponential(2));
    expect(md).toContain(s.pfdAvg1oo1.pfdAvg.toExponential(2));
    const p = json.twoChannel[0];
    expect(text).toContain(p.pfdAvg1oo2.toExponential(2));
    expect(text).toContain(`${(p.commonCauseShare * 100).toFixed(1)} %`);
    expect(md).toContain(`×${p.improvementFactor.toPrecision(3)}`);
    expect(p.betaSensitivity).toHaveLength(6);
    for (const point of json.curves[0].points) {
      expect(text).toContain(point.pfdAvg1oo1.toExponential(2));
      expect(md).toContain(point.pfdAvg1oo2.toExponential(2));
    }
  });
  it("JSON is the report object itself (nothing lost): a round trip equals the report", () => {
    expect(json.setpoints).toEqual(JSON.parse(JSON.stringify(report.setpoints)));
    expect(json.twoChannel).toEqual(JSON.parse(JSON.stringify(report.twoChannel)));
  });
  it("per-mode rows name the element, mode, share, rate and class", () => {
    expect(text).toMatch(/a\s+short\s+30\.0 %\s+300\s+DU\s+a\.short/);
    expect(md).toContain("| a | short | 30.0 % | 300 | DU | `a.short` |");
  });
});
