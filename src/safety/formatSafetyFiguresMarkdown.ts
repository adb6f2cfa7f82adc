/**
 * Markdown rendering of a safety-figures report.
 * @module
 */
import { _checkSafetyReport, _exp, _fit, _hours, _pairEntries, _pct, _rateEntries, _times } from "./_safetyWords.js";
import type { SafetyFiguresReport } from "./types.js";

function cell(text: string): string {
  return text.replace(/\\/g, "\\\\").replace(/\|/g, "\\|").replace(/\r?\n/g, " ");
}

/**
 * The report as Markdown: the caution first; per setpoint a table of the rates by class, SFF, DC, PFDavg and PFH
 * and a table per failure mode; per pair a table of the 1oo2 figures and the β table; per curve a table of its
 * points; then the scope and the no-certification statement.
 * @param input - from {@link safetyFiguresReport}
 * @returns Markdown text ending with a newline
 * @throws HotjunctionRangeError when `input` is not a safety-figures report
 * @example
 * ```ts
 * import { formatSafetyFiguresMarkdown, safetyFiguresReport } from "hotjunction";
 * const md = formatSafetyFiguresMarkdown(safetyFiguresReport({ name: "kiln" }));
 * console.log(md.split("\n")[0]); // "# Safety figures: kiln"
 * ```
 */
export function formatSafetyFiguresMarkdown(input: SafetyFiguresReport): string {
  const report = _checkSafetyReport(input, "formatSafetyFiguresMarkdown");
  const out: string[] = [`# Safety figures${report.name !== undefined ? `: ${cell(report.name)}` : ""}`, "", `> **Caution.** ${report.caution}`, ""];
  for (const s of report.setpoints) {
    out.push(`## Setpoint: ${cell(s.name)}`, "");
    if (s.noEffectThresholdC !== null) out.push(`A trip shift below ${s.noEffectThresholdC} °C counts as no effect.`, "");
    out.push("| Figure | Value |", "| --- | ---: |", ...(_rateEntries(s).map(([k, v]) => `| ${cell(k)} | ${cell(v)} |`)), "");
    if (s.modes.length > 0) {
      out.push("| Element | Mode | Share | Rate (FIT) | Counted as | Fault |", "| --- | --- | ---: | ---: | --- | --- |");
      for (const m of s.modes) {
        out.push(`| ${cell(m.element)} | ${cell(m.mode)} | ${_pct(m.share)} | ${_fit(m.rateFit)} | ${m.counted} | ${m.faultId === null ? "(assumed)" : `\`${cell(m.faultId)}\``} |`);
      }
      out.push("");
    }
    if (s.notes.length > 0) out.push(...s.notes.map((n) => `- ${cell(n)}`), "");
  }
  for (const t of report.twoChannel) {
    out.push(`## Two channels: ${cell(t.channelA.name)} + ${cell(t.channelB.name)} (1oo2)`, "", "| Figure | Value |", "| --- | ---: |");
    out.push(..._pairEntries(t).map(([k, v]) => `| ${cell(k.trim())} | ${cell(v)} |`), "");
    out.push("| β | β_D | PFDavg 1oo2 | PFH 1oo2 (/h) | Second channel buys |", "| ---: | ---: | ---: | ---: | ---: |");
    for (const r of t.betaSensitivity) out.push(`| ${_pct(r.beta)} | ${_pct(r.betaD)} | ${_exp(r.pfdAvg1oo2)} | ${_exp(r.pfh1oo2PerHour)} | ${_times(r.improvementFactor)} |`);
    out.push("", ...t.notes.map((n) => `- ${cell(n)}`), "");
  }
  for (const c of report.curves) {
    out.push(`## PFDavg against the proof-test interval: ${cell(c.channelName)}${c.pairName !== null ? ` and ${cell(c.pairName)}` : ""}`, "");
    out.push("| T1 | PFDavg 1oo1 | PFDavg 1oo2 |", "| ---: | ---: | ---: |");
    for (const p of c.points) out.push(`| ${_hours(p.proofTestIntervalHours)} | ${_exp(p.pfdAvg1oo1)} | ${p.pfdAvg1oo2 === null ? "—" : _exp(p.pfdAvg1oo2)} |`);
    out.push("");
  }
  out.push("## Scope", "", report.scope, "", report.certification, "");
  return out.join("\n");
}
