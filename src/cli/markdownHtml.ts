/**
 * A self-contained HTML document from one of the library's Markdown reports (the subset they use: headings,
 * paragraphs, block quotes, lists, pipe tables, bold and inline code), with inline styles and no script. Used by
 * the CLI's `--html` output; plain string work, no DOM.
 * @module
 */

function escapeHtml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}

function inline(text: string): string {
  return escapeHtml(text)
    .replace(/`([^`]+)`/g, "<code>$1</code>")
    .replace(/\*\*([^*]+)\*\*/g, "<strong>$1</strong>");
}

function cells(row: string): string[] {
  const body = row.trim().replace(/^\|/, "").replace(/\|$/, "");
  return body.split(/(?<!\\)\|/).map((c) => c.trim().replace(/\\\|/g, "|"));
}

/** The stylesheet of HTML reports: print-friendly, readable without colour. */
export const htmlReportStyle =
  "body{font:15px/1.45 system-ui,sans-serif;margin:2rem auto;max-width:1100px;padding:0 1rem;color:#111;background:#fff}" +
  "h1{font-size:1.6rem}h2{font-size:1.2rem;border-bottom:1px solid #888;padding-bottom:.2rem;margin-top:2rem}" +
  "table{border-collapse:collapse;margin:.6rem 0;width:100%}th,td{border:1px solid #999;padding:.25rem .45rem;text-align:left;vertical-align:top}" +
  "thead th{background:#f0f0f0}blockquote{border:2px solid #111;margin:1rem 0;padding:.5rem .8rem}code{font-size:.92em}" +
  "@media print{body{margin:0}h2{break-after:avoid}}";

/** The body HTML of a Markdown report. */
export function markdownToHtml(markdown: string): string {
  const lines = markdown.replace(/\r\n?/g, "\n").split("\n");
  const out: string[] = [];
  let i = 0;
  while (i < lines.length) {
    const line = lines[i] ?? "";
    if (line.trim() === "") {
      i++;
      continue;
    }
    const heading = /^(#{1,6})\s+(.*)$/.exec(line);
    if (heading !== null) {
      const level = heading[1]?.length ?? 1;
      out.push(`<h${level}>${inline(heading[2] ?? "")}</h${level}>`);
      i++;
      continue;
    }
    if (line.startsWith(">")) {
      const quoted: string[] = [];
      while (i < lines.length && (lines[i] ?? "").startsWith(">")) quoted.push((lines[i++] ?? "").replace(/^>\s?/, ""));
      out.push(`<blockquote><p>${inline(quoted.join(" "))}</p></blockquote>`);
      continue;
    }
    if (/^\s*[-*]\s+/.test(line)) {
      const items: string[] = [];
      while (i < lines.length && /^\s*[-*]\s+/.test(lines[i] ?? "")) items.push(`<li>${inline((lines[i++] ?? "").replace(/^\s*[-*]\s+/, ""))}</li>`);
      out.push(`<ul>${items.join("")}</ul>`);
      continue;
    }
    if (line.trim().startsWith("|") && /^\s*\|?\s*:?-{3,}/.test(lines[i + 1] ?? "")) {
      const head = cells(line);
      i += 2;
      const rows: string[] = [];
      while (i < lines.length && (lines[i] ?? "").trim().startsWith("|")) {
        rows.push(`<tr>${cells(lines[i++] ?? "").map((c) => `<td>${inline(c)}</td>`).join("")}</tr>`);
      }
      out.push(`<table><thead><tr>${head.map((h) => `<th scope="col">${inline(h)}</th>`).join("")}</tr></thead><tbody>${rows.join("")}</tbody></table>`);
      continue;
    }
    const paragraph: string[] = [];
    while (i < lines.length && (lines[i] ?? "").trim() !== "" && !/^(#{1,6}\s|>|\s*[-*]\s|\s*\|)/.test(lines[i] ?? "")) paragraph.push(lines[i++] ?? "");
    if (paragraph.length === 0) paragraph.push(lines[i++] ?? "");
    out.push(`<p>${inline(paragraph.join(" "))}</p>`);
  }
  return out.join("\n");
}

/**
 * A complete HTML document of a Markdown report (title from its first heading), with a restrictive content
 * security policy: styles inline, no scripts, no requests. `extraHtml` (e.g. an SVG chart from src/report) goes
 * after the report.
 */
export function markdownToHtmlDocument(markdown: string, extraHtml = ""): string {
  const title = /^#\s+(.*)$/m.exec(markdown)?.[1] ?? "hotjunction report";
  return (
    `<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n` +
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">\n` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">\n<title>${escapeHtml(title)}</title>\n<style>${htmlReportStyle}</style>\n</head>\n<body>\n` +
    `${markdownToHtml(markdown)}\n${extraHtml}\n</body>\n</html>\n`
  );
}
