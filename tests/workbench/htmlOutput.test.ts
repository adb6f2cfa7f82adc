// `--html` of check, compare and faults: the command's Markdown report as a self-contained HTML document (inline
// style, restrictive content security policy, no script), carrying the caution and the methods with the seed; every
// table cell of the Markdown appears in the document's tables; text from the design file is escaped.
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { CAUTION_TEXT } from "../../src/design/index.js";
import { markdownToHtml, markdownToHtmlDocument } from "../../src/cli/markdownHtml.js";
import { projectRoot, run, tempDir } from "../cli/helpers.js";

const example = join(projectRoot, "examples", "reflow-oven-trip.json");

function tableCells(markdown: string): string[] {
  return markdown
    .split("\n")
    .filter((l) => l.trim().startsWith("|") && !/^\|\s*-{3}/.test(l.trim()))
    .flatMap((l) => l.trim().replace(/^\||\|$/g, "").split(/(?<!\\)\|/).map((c) => c.trim()));
}

function escaped(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

describe("--html output", () => {
  for (const [command, args] of [
    ["check", ["--trials", "500"]],
    ["compare", ["--trials", "500"]],
    ["faults", []],
  ] as const) {
    it(`${command} --html is the Markdown report as a document with the caution and the seed`, async () => {
      const html = await run([command, example, "--html", ...args]);
      expect(html.code, html.stderr).toBe(0);
      const markdown = await run([command, example, "--markdown", ...args]);
      expect(html.stdout.startsWith("<!DOCTYPE html>")).toBe(true);
      expect(html.stdout).toContain(escaped(CAUTION_TEXT));
      expect(html.stdout).toContain("default-src 'none'");
      expect(html.stdout).not.toMatch(/<script/i);
      if (command !== "faults") expect(html.stdout).toMatch(/seed 260/);
      expect(html.stdout).toBe(markdownToHtmlDocument(markdown.stdout));
      for (const cell of tableCells(markdown.stdout)) {
        const shown = escaped(cell.replace(/\\\|/g, "|")).replace(/`([^`]+)`/g, "<code>$1</code>").replace(/\*\*([^*]+)\*\*/g, "<strong>$1</strong>");
        expect(html.stdout, cell).toMatch(new RegExp(`<t[dh][^>]*>${shown.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}</t[dh]>`));
      }
    });
  }

  it("refuses --html with another format and writes it with --out", async () => {
    const both = await run(["check", example, "--html", "--json"]);
    expect(both.code).toBe(2);
    const dir = tempDir();
    const written = await run(["check", example, "--html", "--trials", "500", "--out", "report.html"], dir);
    expect(written.code, written.stderr).toBe(0);
    expect(readFileSync(join(dir, "report.html"), "utf8")).toContain(escaped(CAUTION_TEXT));
  });

  it("escapes text from the design file", async () => {
    const dir = tempDir();
    const design = readFileSync(example, "utf8").replace('"name": "Reflow and curing oven trip"', '"name": "oven <script>alert(1)</script> & co"');
    writeFileSync(join(dir, "oven.json"), design);
    const html = await run(["check", "oven.json", "--html", "--trials", "500"], dir);
    expect(html.code, html.stderr).toBe(0);
    expect(html.stdout).not.toMatch(/<script/i);
    expect(html.stdout).toContain("oven &lt;script&gt;alert(1)&lt;/script&gt; &amp; co");
    expect(markdownToHtml("# a\n\n| x | y |\n| --- | --- |\n| 1 \\| 2 | `c` |\n\n- **b**\n> q")).toBe(
      "<h1>a</h1>\n<table><thead><tr><th scope=\"col\">x</th><th scope=\"col\">y</th></tr></thead><tbody><tr><td>1 | 2</td><td><code>c</code></td></tr></tbody></table>\n<ul><li><strong>b</strong></li></ul>\n<blockquote><p>q</p></blockquote>",
    );
  });
});
