/**
 * Plain-text rendering of a safety-figures report.
 * @module
 */
import { _wrapWords } from "../textWrap.js";
import { _checkSafetyReport, _exp, _fit, _hours, _pairEntries, _pct, _rateEntries, _times } from "./_safetyWords.js";
import type { SafetyFiguresReport } from "./types.js";

function wrap(text: string, width: number, indent: string): string[] {
  return _wrapWords(text, width).map((line) => indent + line);
}

function block(entries: [string, string][]): string[] {
  const w = Math.max(...entries.map(([k]) => k.length));
  return entries.map(([k, v]) => `  ${k.padEnd(w)}  ${v}`);
}

/**
 * The report as plain text for a terminal: per setpoint the rates by class, SFF, DC, PFDavg and PFH (1oo1) and
 * the per-mode table; per pair the 1oo2 figures beside each channel alone and the β table; per curve its points;
 * then the scope, the no-certification statement and the safety caution.
 * @param input - from {@link safetyFiguresReport}
 * @returns the text, lines joined with "\n", ending with a newline
 * @throws HotjunctionRangeError when `input` is not a safety-figures report
 * @example
 * ```ts
 * import { formatSafetyFiguresText, safetyFiguresReport } from "hotjunction";
 * const text = formatSafetyFiguresText(safetyFiguresReport({ name: "kiln" }));
 * console.log(text.split("\n")[0]); // "Safety figures: kiln"
 * ```
 */
export function formatSafetyFiguresText(input: SafetyFiguresReport): string {
  const report = _checkSafetyReport(input, "formatSafetyFiguresText");
  const lines: string[] = [`Safety figures${report.name !== undefined ? `: ${report.name}` : ""}`, ""];
  for (const s of report.setpoints) {
    lines.push(`Setpoint "${s.name}"${s.noEffectThresholdC !== null ? ` (no effect below a ${s.noEffectThresholdC} °C shift)` : ""}`, ...block(_rateEntries(s)), "");
    if (s.modes.length > 0) {
      const ew = Math.max(7, ...s.modes.map((m) => m.element.length));
      const mw = Math.max(4, ...s.modes.map((m) => m.mode.length));
      lines.push(`  ${"element".padEnd(ew)}  ${"mode".padEnd(mw)}  ${"share".padStart(7)}  ${"FIT".padStart(10)}  class      fault`);
      for (const m of s.modes) {
        lines.push(
          `  ${m.element.padEnd(ew)}  ${m.mode.padEnd(mw)}  ${_pct(m.share).padStart(7)}  ${_fit(m.rateFit).padStart(10)}  ${m.counted.padEnd(9)}  ${m.faultId ?? "(assumed)"}`,
        );
      }
      lines.push("");
    }
    if (s.notes.length > 0) {
      lines.push("  Notes:");
      for (const n of s.notes) lines.push(...wrap(n, 100, "    "));
      lines.push("");
    }
  }
  for (const t of report.twoChannel) {
    lines.push(`Two channels "${t.channelA.name}" + "${t.channelB.name}" (1oo2)`, ...block(_pairEntries(t)), "", "  β sensitivity:");
    lines.push(`  ${"β".padStart(7)}  ${"β_D".padStart(7)}  ${"PFDavg 1oo2".padStart(11)}  ${"PFH 1oo2 /h".padStart(11)}  buys`);
    for (const r of t.betaSensitivity) {
      lines.push(`  ${_pct(r.beta).padStart(7)}  ${_pct(r.betaD).padStart(7)}  ${_exp(r.pfdAvg1oo2).padStart(11)}  ${_exp(r.pfh1oo2PerHour).padStart(11)}  ${_times(r.improvementFactor)}`);
    }
    lines.push("", "  Notes:");
    for (const n of t.notes) lines.push(...wrap(n, 100, "    "));
    lines.push("");
  }
  for (const c of report.curves) {
    lines.push(`PFDavg against the proof-test interval: ${c.channelName}${c.pairName !== null ? ` and ${c.pairName} (β ${_pct(c.beta)}, β_D ${_pct(c.betaD)})` : ""}`);
    lines.push(`  ${"T1".padStart(12)}  ${"1oo1".padStart(9)}  ${"1oo2".padStart(9)}`);
    for (const p of c.points) {
      lines.push(`  ${_hours(p.proofTestIntervalHours).padStart(12)}  ${_exp(p.pfdAvg1oo1).padStart(9)}  ${(p.pfdAvg1oo2 === null ? "—" : _exp(p.pfdAvg1oo2)).padStart(9)}`);
    }
    lines.push("");
  }
  lines.push(...wrap(`Scope: ${report.scope}`, 100, ""), "", ...wrap(report.certification, 100, ""), "", ...wrap(`CAUTION: ${report.caution}`, 100, ""));
  return `${lines.join("\n")}\n`;
}
