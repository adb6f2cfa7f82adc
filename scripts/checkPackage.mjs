#!/usr/bin/env node
/**
 * Checks the package exactly as it would be published.
 *
 * 1. `npm pack` into a fresh temporary directory (never into the project folder), and read the file list.
 * 2. The file list: required build outputs are present; no sources, tests, fixtures, benchmarks, scripts,
 *    CI files, tarballs or secrets are included. `npm publish --dry-run` must list the same files.
 * 3. publint (strict: warnings are errors) on the packed tarball.
 * 4. Are-the-types-wrong (attw) on the packed tarball: every entry point resolves to correct types under
 *    node16 (CJS and ESM) and bundler resolution.
 *
 * Prints details as it goes and ends with one line: `checkPackage: OK ...` or `checkPackage: FAILED: <reason>`
 * (exit code 1). Needs a built `dist/` (`npm run build`); `npm test` builds before it runs this.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, relative } from "node:path";
import { fileURLToPath } from "node:url";

const projectDir = join(dirname(fileURLToPath(import.meta.url)), "..");
const npmCommand = process.platform === "win32" ? "npm.cmd" : "npm";

/** Files the published package must contain. */
const requiredFiles = [
  "package.json",
  "README.md",
  "LICENSE",
  "CHANGELOG.md",
  "dist/index.js",
  "dist/index.cjs",
  "dist/index.d.ts",
  "dist/index.d.cts",
  "dist/design.js",
  "dist/design.cjs",
  "dist/design.d.ts",
  "dist/design.d.cts",
  "dist/report.js",
  "dist/report.cjs",
  "dist/report.d.ts",
  "dist/report.d.cts",
  "dist/bulk.js",
  "dist/bulk.cjs",
  "dist/bulk.d.ts",
  "dist/bulk.d.cts",
  "dist/cli.js",
  "dist/workbench.html",
];

/** Paths that must never be published, with the reason given on failure. */
const forbiddenPaths = [
  [/^src\//, "TypeScript sources"],
  [/^tests?\//, "tests"],
  [/(^|\/)fixtures?\//, "test fixtures"],
  [/\.test\.[cm]?[jt]s$/, "test files"],
  [/^bench\//, "benchmarks"],
  [/^scripts\//, "build scripts"],
  [/^examples\//, "examples (they live in the repository)"],
  [/^docs\//, "docs (they live in the repository)"],
  [/^\.ci\//, "CI files"],
  [/^coverage\//, "coverage output"],
  [/(^|\/)node_modules\//, "node_modules"],
  [/\.tgz$/, "tarballs"],
  [/(^|\/)\.tmp\//, "scratch files"],
  [/\.map$/, "source maps"],
  [/(^|\/)\.env(\.|$)/, "environment files (secrets)"],
  [/(^|\/)\.npmrc$/, "npm configuration (tokens)"],
  [/\.(pem|key|p12|pfx|crt)$/, "keys or certificates"],
  [/(^|\/)id_(rsa|ed25519|ecdsa)/, "SSH keys"],
];

/** Content that looks like a secret. */
const secretPatterns = [
  [/-----BEGIN [A-Z ]*PRIVATE KEY-----/, "a private key"],
  [/\bnpm_[A-Za-z0-9]{36}\b/, "an npm token"],
  [/\bgh[pousr]_[A-Za-z0-9]{36,}\b/, "a GitHub token"],
  [/\bAKIA[0-9A-Z]{16}\b/, "an AWS access key"],
];

let tempDir;

function fail(reason) {
  if (tempDir) rmSync(tempDir, { recursive: true, force: true });
  console.error(`checkPackage: FAILED: ${reason}`);
  process.exit(1);
}

function npmJson(args) {
  const result = spawnSync(npmCommand, args, { cwd: projectDir, encoding: "utf8", maxBuffer: 64 * 1024 * 1024 });
  if (result.status !== 0) {
    process.stderr.write(result.stderr ?? "");
    fail(`\`npm ${args.join(" ")}\` exited with ${result.status}`);
  }
  // npm may print lifecycle noise before the JSON, which is the rest of stdout (an array for `pack`, an object
  // keyed by package name for `publish`).
  const start = result.stdout.search(/^[[{]/m);
  if (start < 0) fail(`\`npm ${args.join(" ")}\` printed no JSON`);
  return { json: JSON.parse(result.stdout.slice(start)), stderr: result.stderr ?? "" };
}

/** Every file path named in an `exports` or `bin` field (strings at any depth). */
function collectPaths(field) {
  if (typeof field === "string") return [field];
  if (field === null || typeof field !== "object") return [];
  return Object.values(field).flatMap(collectPaths);
}

function listFiles(dir, base = dir) {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? listFiles(path, base) : [relative(base, path).split("\\").join("/")];
  });
}

async function main() {
  if (!existsSync(join(projectDir, "dist", "index.js"))) {
    fail("dist/ is missing; run `npm run build` first");
  }
  const packageJson = JSON.parse(readFileSync(join(projectDir, "package.json"), "utf8"));

  // 1. Pack into a temporary directory, outside the project.
  tempDir = mkdtempSync(join(tmpdir(), "hotjunction-check-"));
  const {
    json: [packed],
  } = npmJson(["pack", "--json", "--ignore-scripts", "--pack-destination", tempDir]);
  const tarball = join(tempDir, packed.filename);
  const packedFiles = packed.files.map((f) => f.path).sort();
  console.log(`packed ${packed.filename}: ${packedFiles.length} files, ${packed.size} bytes (unpacked ${packed.unpackedSize})`);

  // 2. File list.
  const referenced = [...collectPaths(packageJson.exports), ...collectPaths(packageJson.bin)].map((p) =>
    p.replace(/^\.\//, ""),
  );
  const missing = [...new Set([...requiredFiles, ...referenced])].filter((f) => !packedFiles.includes(f));
  if (missing.length > 0) fail(`tarball lacks ${missing.join(", ")}`);
  for (const file of packedFiles) {
    for (const [pattern, what] of forbiddenPaths) {
      if (pattern.test(file)) fail(`tarball contains ${what}: ${file}`);
    }
  }
  const extractDir = join(tempDir, "extract");
  execFileSync("mkdir", ["-p", extractDir]);
  execFileSync("tar", ["-xzf", tarball, "-C", extractDir]);
  const extractedRoot = join(extractDir, "package");
  const extractedFiles = listFiles(extractedRoot).sort();
  if (JSON.stringify(extractedFiles) !== JSON.stringify(packedFiles)) {
    fail("the tarball's contents differ from the file list npm reported");
  }
  for (const file of extractedFiles) {
    const text = readFileSync(join(extractedRoot, file), "utf8");
    for (const [pattern, what] of secretPatterns) {
      if (pattern.test(text)) fail(`${file} contains what looks like ${what}`);
    }
  }
  const cliText = readFileSync(join(extractedRoot, "dist", "cli.js"), "utf8");
  if (!cliText.startsWith("#!/usr/bin/env node")) fail("dist/cli.js does not start with `#!/usr/bin/env node`");
  const changelog = readFileSync(join(extractedRoot, "CHANGELOG.md"), "utf8");
  if (!changelog.includes(`[${packageJson.version}]`)) {
    fail(`CHANGELOG.md has no section for version ${packageJson.version}`);
  }

  // `npm publish --dry-run` (scripts ignored: prepublishOnly would run the whole test suite again) must
  // publish exactly the packed files.
  const { json: dryRun, stderr: dryRunLog } = npmJson(["publish", "--dry-run", "--json", "--ignore-scripts", "--tag", "check"]);
  if (/auto-corrected|errors corrected/.test(dryRunLog)) {
    process.stderr.write(dryRunLog);
    fail("npm would auto-correct package.json on publish (run `npm pkg fix` and review)");
  }
  const dryRunEntry = Array.isArray(dryRun) ? dryRun[0] : (dryRun[packageJson.name] ?? dryRun);
  const dryRunFiles = (dryRunEntry?.files ?? []).map((f) => f.path).sort();
  if (JSON.stringify(dryRunFiles) !== JSON.stringify(packedFiles)) {
    fail("`npm publish --dry-run` would publish a different file list than `npm pack`");
  }
  console.log("file list: required files present; no sources, tests, fixtures, bench, scripts or secrets");

  // 3. publint, strict, on the tarball itself.
  const { publint } = await import("publint");
  const { formatMessage } = await import("publint/utils");
  const tarballBytes = readFileSync(tarball);
  const lint = await publint({
    // Files inside an npm tarball sit under `package/`.
    pkgDir: "package",
    strict: true,
    pack: { tarball: tarballBytes.buffer.slice(tarballBytes.byteOffset, tarballBytes.byteOffset + tarballBytes.byteLength) },
  });
  for (const message of lint.messages) {
    console.log(`publint ${message.type}: ${formatMessage(message, lint.pkg, { color: false })}`);
  }
  const lintProblems = lint.messages.filter((m) => m.type !== "suggestion");
  if (lintProblems.length > 0) fail(`publint reported ${lintProblems.length} problem(s) (listed above)`);
  console.log(`publint: no errors or warnings (${lint.messages.length} suggestion(s))`);

  // 4. attw on the tarball (no registry look-ups). Profile node16: node10 resolution ("moduleResolution": "node")
  // predates `exports` and cannot see subpath entries; TypeScript 6 deprecates it and the package needs Node >= 20.
  const attwBin = join(projectDir, "node_modules", ".bin", process.platform === "win32" ? "attw.cmd" : "attw");
  const attw = spawnSync(attwBin, [tarball, "--profile", "node16", "--no-definitely-typed", "--format", "table", "--no-color", "--no-emoji"], {
    cwd: tempDir,
    encoding: "utf8",
  });
  if (attw.status !== 0) {
    process.stdout.write(attw.stdout ?? "");
    process.stderr.write(attw.stderr ?? "");
    fail("attw found type resolution problems (table above)");
  }
  console.log("attw: types resolve under node16 (CJS and ESM) and bundler for every entry point");

  rmSync(tempDir, { recursive: true, force: true });
  console.log(`checkPackage: OK ${packed.filename} (${packedFiles.length} files, ${packed.size} bytes packed)`);
}

main().catch((error) => fail(error instanceof Error ? error.message : String(error)));
