/**
 * Last step of the CLI's program bundle build (tsup `onSuccess` of `dist/cli/program.cjs`):
 * - a test hook: with `HOTJUNCTION_MODULE_LOG` set, every module start inside the bundle (the bundler's lazy
 *   `__esm` and `__commonJS` starters, keyed by the module's path) is appended to that file as `bundle:<path>`,
 *   so tests/cli/startup.test.ts can see which modules a command started. Without the variable nothing changes.
 * - a check that no `import()` is left in the bundle's code (it runs as a node:vm script, without a module loader);
 * - the licence texts of the third-party packages the bundle carries, in `dist/cli/THIRD-PARTY-NOTICES.txt`.
 * Fails the build when the bundle does not have the shape it expects.
 * @module
 */
import { existsSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const marker = "// hotjunction: module-start log (scripts/finishProgramBundle.ts)";

const logHook = `${marker}
var __hotjunctionModuleLog = process.env.HOTJUNCTION_MODULE_LOG;
if (__hotjunctionModuleLog) {
  const logged = (start, name) => {
    let first = true;
    return function () {
      if (first) {
        first = false;
        require("node:fs").appendFileSync(__hotjunctionModuleLog, "bundle:" + name + "\\n");
      }
      return start.apply(this, arguments);
    };
  };
  const esm = __esm;
  const commonJS = __commonJS;
  __esm = (fn, res) => logged(esm(fn, res), Object.getOwnPropertyNames(fn)[0]);
  __commonJS = (cb, mod) => logged(commonJS(cb, mod), Object.getOwnPropertyNames(cb)[0]);
}
`;

/** The packages whose code is in the bundle (from the bundler's `// node_modules/...` and module-key paths). */
export function _bundledPackages(text: string): string[] {
  const names = new Set<string>();
  for (const match of text.matchAll(/(?:^\/\/ |")node_modules\/((?:@[^/"\s]+\/)?[^/"\s]+)/gm)) names.add(match[1] as string);
  return [...names].sort();
}

function noticeOf(name: string): string {
  const dir = join(root, "node_modules", name);
  const pkg = JSON.parse(readFileSync(join(dir, "package.json"), "utf8")) as { version?: string; license?: string };
  const file = readdirSync(dir).find((f) => /^(licen[cs]e|copying)(\.|$)/i.test(f));
  if (file === undefined) throw new Error(`finishProgramBundle: ${name} has no licence file to carry`);
  return `${name} ${pkg.version ?? ""} (${pkg.license ?? "see below"})\n\n${readFileSync(join(dir, file), "utf8").trim()}\n`;
}

/** Adds the module-start hook and writes the notices. */
export async function finishProgramBundle(): Promise<void> {
  const bundle = join(root, "dist", "cli", "program.cjs");
  if (!existsSync(bundle)) throw new Error("finishProgramBundle: dist/cli/program.cjs was not written");
  let text = readFileSync(bundle, "utf8");
  if (!text.includes(marker)) {
    const start = text.search(/^var __commonJS = /m);
    const end = start < 0 ? -1 : text.indexOf("\n};\n", start);
    if (start < 0 || end < 0 || !/^var __esm = /m.test(text.slice(0, start))) {
      throw new Error("finishProgramBundle: the bundler's __esm/__commonJS starters were not found; update the hook");
    }
    text = `${text.slice(0, end + 4)}${logHook}${text.slice(end + 4)}`;
    writeFileSync(bundle, text);
  }
  // The bundle runs as a node:vm script, which has no module loader: no import() may be left in its code (the
  // workers' one-line bootstraps are strings, run by the worker's own loader).
  const imports = text.split("\n").filter((line) => /\bimport\(/.test(line) && !/^\s*(\/\/|\*)/.test(line) && !line.includes("bootstrap = `import("));
  if (imports.length > 0) throw new Error(`finishProgramBundle: import() left in dist/cli/program.cjs: ${imports[0]?.trim()}`);
  const packages = _bundledPackages(text);
  const header =
    "Third-party packages bundled in dist/cli/program.cjs (the hotjunction command-line program), with their licences.\n";
  writeFileSync(join(root, "dist", "cli", "THIRD-PARTY-NOTICES.txt"), [header, ...packages.map(noticeOf)].join("\n" + "-".repeat(78) + "\n\n"));
}
