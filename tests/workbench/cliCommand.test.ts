// `hotjunction workbench`: writes the built page, optionally opening with a design (validated first, its text
// embedded so no text of it can close the element); refuses an invalid design and an existing file without --force.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { buildWorkbenchPage } from "../../scripts/buildWorkbench.js";
import { withInitialDesign } from "../../src/cli/workbenchPageFile.js";
import { projectRoot, run, tempDir } from "../cli/helpers.js";

const builtPage = join(projectRoot, "dist", "workbench.html");

describe("workbench command", () => {
  beforeAll(async () => {
    // `npm run build` writes the page; when this file runs alone without a build, build the page only.
    if (!existsSync(builtPage)) {
      mkdirSync(join(projectRoot, "dist"), { recursive: true });
      writeFileSync(builtPage, await buildWorkbenchPage());
    }
  });

  it("writes the page, and with a design embeds that design's text", async () => {
    const dir = tempDir();
    const plain = await run(["workbench", "--out", "page.html"], dir);
    expect(plain.code, plain.stderr).toBe(0);
    expect(plain.stderr).toContain("wrote page.html");
    expect(readFileSync(join(dir, "page.html"), "utf8")).toBe(readFileSync(builtPage, "utf8"));

    const design = readFileSync(join(projectRoot, "examples", "reflow-oven-trip.json"), "utf8");
    writeFileSync(join(dir, "oven.json"), design.replace('"name": "Reflow and curing oven trip"', '"name": "oven </script><b>x</b>"'));
    const withDesign = await run(["workbench", "oven.json", "--out", "oven.html"], dir);
    expect(withDesign.code, withDesign.stderr).toBe(0);
    const page = readFileSync(join(dir, "oven.html"), "utf8");
    const embedded = /<script type="application\/json" id="hj-initial-design" data-name="oven.json">([^<]*)<\/script>/.exec(page);
    expect(embedded).not.toBeNull();
    expect(JSON.parse(embedded?.[1] ?? "")).toEqual(JSON.parse(readFileSync(join(dir, "oven.json"), "utf8")));
    expect(page.match(/<\/script>/g)?.length).toBe(readFileSync(builtPage, "utf8").match(/<\/script>/g)?.length);
  });

  it("builds a page whose script needs nothing outside it: no require, no command-line libraries", async () => {
    // The page takes the CLI's dynamics fold-in and ADC build sheet from modules that also import commander and
    // cli-progress for their commands; the build marks both external, so any part of them that reached the page
    // would show up as a require() call here.
    const page = await buildWorkbenchPage();
    const script = /<script id="hj-script">([\s\S]*)<\/script>/.exec(page)?.[1] ?? "";
    expect(script.length).toBeGreaterThan(100_000);
    expect(script).not.toMatch(/\brequire\(/);
    expect(script).not.toMatch(/cli-progress|commander/);
  });

  it("refuses an invalid design, an existing file without --force, and a page without the design slot", async () => {
    const dir = tempDir();
    writeFileSync(join(dir, "bad.json"), '{ "hotjunctionDesign": 2 }');
    const bad = await run(["workbench", "bad.json", "--out", "bad.html"], dir);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain("bad.json: at hotjunctionDesign: expected 1, found 2");
    expect(existsSync(join(dir, "bad.html"))).toBe(false);
    writeFileSync(join(dir, "taken.html"), "keep");
    const taken = await run(["workbench", "--out", "taken.html"], dir);
    expect(taken.code).not.toBe(0);
    expect(readFileSync(join(dir, "taken.html"), "utf8")).toBe("keep");
    const forced = await run(["workbench", "--out", "taken.html", "--force"], dir);
    expect(forced.code, forced.stderr).toBe(0);
    expect(() => withInitialDesign("<html></html>", "{}", "x")).toThrow("no place for a design");
  });
});
