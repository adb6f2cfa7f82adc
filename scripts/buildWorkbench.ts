/**
 * Builds the workbench page: one self-contained HTML file (`dist/workbench.html`) with the bundled script (esbuild,
 * browser IIFE, the same script also runs as the page's web worker), the stylesheet and the example designs of
 * `examples/` inlined. Run by `npm run build` after tsup; `buildWorkbenchPage()` is used by the tests.
 *
 *   npx tsx scripts/buildWorkbench.ts [--out FILE]
 */
import { build } from "esbuild";
import { mkdirSync, readFileSync, readdirSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { initialDesignMarker } from "../src/cli/workbenchPageFile.js";

export { withInitialDesign } from "../src/cli/workbenchPageFile.js";

const projectDir = join(dirname(fileURLToPath(import.meta.url)), "..");

/** Text safe inside a `<script>` element (no `</script`, no `<!--`). */
function scriptSafe(text: string): string {
  return text.replace(/<\/(script)/gi, "<\\/$1").replace(/<!--/g, "<\\!--");
}

/** JSON for a `<script type="application/json">` element. */
function jsonForScript(value: unknown): string {
  return JSON.stringify(value).replace(/</g, "\\u003c").replace(/\u2028/g, "\\u2028").replace(/\u2029/g, "\\u2029");
}

/** The example designs, embedded as their exact file text. */
function examples(): { id: string; title: string; text: string }[] {
  const dir = join(projectDir, "examples");
  return readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((file) => {
      const text = readFileSync(join(dir, file), "utf8");
      const name = (JSON.parse(text) as { name?: unknown }).name;
      return { id: file.replace(/\.json$/, ""), title: typeof name === "string" ? name : file, text };
    });
}

/** Builds the page's HTML text. */
export async function buildWorkbenchPage(): Promise<string> {
  const result = await build({
    entryPoints: [join(projectDir, "src/workbench/main.ts")],
    bundle: true,
    write: false,
    format: "iife",
    platform: "browser",
    target: "es2022",
    minify: true,
    legalComments: "none",
    charset: "utf8",
    logLevel: "warning",
    // The design entry also reads files (loadDesignFile); the page never calls it, and tree-shaking drops it. The
    // page takes two of the CLI's design-file steps (the dynamics fold-in, the ADC build sheet) from modules that
    // also import commander and cli-progress for their commands; those parts are never reached from the page and
    // tree-shaking drops them (the workbench tests check the page's script calls no `require`).
    external: ["node:*", "commander", "cli-progress"],
  });
  const script = result.outputFiles[0]?.text;
  if (script === undefined) throw new Error("buildWorkbench: esbuild produced no output");
  const version = (JSON.parse(readFileSync(join(projectDir, "package.json"), "utf8")) as { version: string }).version;
  const template = readFileSync(join(projectDir, "src/workbench/page.html"), "utf8");
  const style = readFileSync(join(projectDir, "src/workbench/page.css"), "utf8").replace(/<\/style/gi, "<\\/style");
  const parts: Record<string, string> = {
    __VERSION__: version,
    __STYLE__: style,
    __EXAMPLES__: `<script type="application/json" id="hj-examples">${jsonForScript(examples())}</script>`,
    __INITIAL__: initialDesignMarker,
    __SCRIPT__: scriptSafe(script),
  };
  // One pass, so text inside a part is never taken for a placeholder.
  return template.replace(/__(VERSION|STYLE|EXAMPLES|INITIAL|SCRIPT)__/g, (m) => parts[m] ?? m);
}

async function main(): Promise<void> {
  const outIndex = process.argv.indexOf("--out");
  const out = outIndex > 0 ? (process.argv[outIndex + 1] ?? "") : join(projectDir, "dist", "workbench.html");
  const page = await buildWorkbenchPage();
  mkdirSync(dirname(out), { recursive: true });
  writeFileSync(out, page);
  console.log(`buildWorkbench: wrote ${out} (${page.length} bytes)`);
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  main().catch((error: unknown) => {
    console.error(`buildWorkbench: ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  });
}
