/**
 * What the workbench hands back: the report as a self-contained HTML document, Markdown, CSV and the parts list.
 * Each carries the caution, the methods and the seed. Text formats come from the library's renderers; the trip
 * report carries the build sheet and, with a `dynamics` section, the runaway (as `check` prints them).
 * @module
 */
import { CAUTION_TEXT } from "../design/index.js";
import { formatComparisonReport, formatTripReport } from "../report/index.js";
import { formatPartsCsv } from "../report/renderTripReport.js";
import { formatFaultReviewMarkdown } from "../index.js";
import type { WorkbenchAnalysis } from "./analysis.js";
import { cautionBlock, methodsSentence, resultSections } from "./results.js";

/** Markdown: the trip report, the reference comparison and the fault review, as the CLI prints them. */
export function markdownExport(a: WorkbenchAnalysis, designName: string | undefined): string {
  const parts: string[] = [];
  if (a.report !== undefined) parts.push(formatTripReport(a.report, "markdown"));
  if (a.comparison !== undefined) parts.push(formatComparisonReport(a.comparison, "markdown", a.methods, designName));
  if (a.faults !== undefined) parts.push(formatFaultReviewMarkdown(a.faults));
  if (parts.length === 0) parts.push(`# ${designName ?? "Design"}\n\nNo results.\n\n**Caution:** ${CAUTION_TEXT}\n`);
  return parts.join("\n");
}

/** CSV: the trip report's bands (caution and methods as leading `#` lines). */
export function csvExport(a: WorkbenchAnalysis): string {
  if (a.report !== undefined) return formatTripReport(a.report, "csv");
  return `# CAUTION: ${CAUTION_TEXT}\n# ${methodsSentence(a)}\n`;
}

/**
 * The parts list the design chose, as CSV: the report's build-sheet bill of materials exactly as
 * `check --parts-csv` writes it, with the methods and seed as a second `#` line.
 */
export function partsListCsv(a: WorkbenchAnalysis): string | undefined {
  const sheet = a.report?.buildSheet;
  if (sheet === undefined) return undefined;
  const csv = formatPartsCsv(sheet);
  const firstLineEnd = csv.indexOf("\n") + 1;
  return `${csv.slice(0, firstLineEnd)}# ${methodsSentence(a)}\n${csv.slice(firstLineEnd)}`;
}

/** The stylesheet of the exported report (print-friendly, readable without colour). */
const reportCss = `
body{font:15px/1.45 system-ui,sans-serif;margin:2rem auto;max-width:1100px;padding:0 1rem;color:#111;background:#fff}
h1{font-size:1.6rem}h2{font-size:1.2rem;border-bottom:1px solid #888;padding-bottom:.2rem;margin-top:2rem}
table{border-collapse:collapse;margin:.6rem 0;width:100%}caption{text-align:left;font-weight:600;padding:.3rem 0}
th,td{border:1px solid #999;padding:.25rem .45rem;text-align:left;vertical-align:top}td .hj-num,td:has(.hj-num){text-align:right}
.hj-caution{border:2px solid #111;padding:.6rem .8rem;font-weight:500}.hj-pass::before,.hj-fail::before{content:""}
.hj-svg svg{max-width:100%;height:auto}pre{white-space:pre-wrap;background:#f4f4f4;padding:.6rem;border:1px solid #ccc}
@media print{body{margin:0}h2{break-after:avoid}table{break-inside:auto}}
`;

/** A self-contained HTML report (inline styles and charts, the design file at the end, no scripts). */
export function htmlExport(a: WorkbenchAnalysis, design: Record<string, unknown>, designText: string): string {
  const title = `Trip report${typeof design["name"] === "string" ? `: ${design["name"]}` : ""}`;
  const doc = document.implementation.createHTMLDocument(title);
  const meta = doc.createElement("meta");
  meta.setAttribute("charset", "utf-8");
  doc.head.prepend(meta);
  const viewport = doc.createElement("meta");
  viewport.setAttribute("name", "viewport");
  viewport.setAttribute("content", "width=device-width, initial-scale=1");
  doc.head.append(viewport);
  const csp = doc.createElement("meta");
  csp.setAttribute("http-equiv", "Content-Security-Policy");
  csp.setAttribute("content", "default-src 'none'; style-src 'unsafe-inline'; img-src data:");
  doc.head.append(csp);
  const style = doc.createElement("style");
  style.textContent = reportCss;
  doc.head.append(style);
  doc.documentElement.setAttribute("lang", "en");
  const h1 = doc.createElement("h1");
  h1.textContent = title;
  doc.body.append(h1, doc.importNode(cautionBlock(), true));
  const methods = doc.createElement("p");
  methods.textContent = methodsSentence(a);
  doc.body.append(methods);
  for (const s of resultSections(a)) doc.body.append(doc.importNode(s, true));
  const h2 = doc.createElement("h2");
  h2.textContent = "Design file";
  const pre = doc.createElement("pre");
  pre.textContent = designText;
  doc.body.append(h2, pre, doc.importNode(cautionBlock(), true));
  return `<!DOCTYPE html>\n${doc.documentElement.outerHTML}\n`;
}
