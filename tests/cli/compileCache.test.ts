/**
 * The built CLI's code cache (src/cli/_compileCache.ts): where it lives, when a directory is refused, what a hit,
 * a miss and a refused cache do, and that no state of the cache changes what a command prints. V8's `cachedData`
 * contract (refused when it does not fit, then compiled as usual) is Node's documented `vm.Script` behaviour
 * (Node.js 20 documentation, `vm.Script` options `cachedData` and `cachedDataRejected`).
 */
import { spawnSync } from "node:child_process";
import { chmodSync, existsSync, mkdirSync, readdirSync, readFileSync, symlinkSync, utimesSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { _cacheDirectory, _usableCacheDirectory } from "../../src/cli/_compileCache.js";
import { distDir, ensureDist } from "../package/distBuild.js";
import { projectRoot, tempDir } from "./helpers.js";

const home = (): string => "/home/someone";

describe("where the cache lives", () => {
  it("follows the platform's per-user cache directory, HOTJUNCTION_CACHE_DIR and HOTJUNCTION_NO_CACHE", () => {
    expect(_cacheDirectory({}, "linux", home)).toBe("/home/someone/.cache/hotjunction");
    expect(_cacheDirectory({ XDG_CACHE_HOME: "/var/cache/me" }, "linux", home)).toBe("/var/cache/me/hotjunction");
    // A relative XDG_CACHE_HOME is invalid by the XDG base directory specification: ignored.
    expect(_cacheDirectory({ XDG_CACHE_HOME: "relative" }, "linux", home)).toBe("/home/someone/.cache/hotjunction");
    expect(_cacheDirectory({}, "darwin", home)).toBe("/home/someone/Library/Caches/hotjunction");
    expect(_cacheDirectory({ LOCALAPPDATA: "C:/Users/me/AppData/Local" }, "win32", home)).toBe(join("C:/Users/me/AppData/Local", "hotjunction", "Cache"));
    expect(_cacheDirectory({ HOTJUNCTION_CACHE_DIR: "/opt/c" }, "linux", home)).toBe("/opt/c");
    for (const off of ["1", "true", "yes"]) expect(_cacheDirectory({ HOTJUNCTION_NO_CACHE: off, HOTJUNCTION_CACHE_DIR: "/opt/c" }, "linux", home)).toBeUndefined();
    for (const on of ["", "0"]) expect(_cacheDirectory({ HOTJUNCTION_NO_CACHE: on }, "linux", home)).toBe("/home/someone/.cache/hotjunction");
    expect(_cacheDirectory({}, "linux", () => "")).toBeUndefined();
    expect(
      _cacheDirectory({}, "linux", () => {
        throw new Error("no home");
      }),
    ).toBeUndefined();
  });

  it("uses only a directory of this user that no one else may write to", () => {
    const dir = tempDir();
    const fresh = join(dir, "a", "b");
    expect(_usableCacheDirectory(fresh)).toBe(true);
    if (typeof process.getuid === "function") expect(readdirSync(join(dir, "a")).length).toBe(1);
    const file = join(dir, "file");
    writeFileSync(file, "x");
    expect(_usableCacheDirectory(file)).toBe(false);
    expect(_usableCacheDirectory(join(file, "below"))).toBe(false);
    const link = join(dir, "link");
    symlinkSync(fresh, link);
    expect(_usableCacheDirectory(link)).toBe(false);
    if (typeof process.getuid === "function") {
      const open = join(dir, "open");
      mkdirSync(open);
      chmodSync(open, 0o777);
      expect(_usableCacheDirectory(open)).toBe(false);
      chmodSync(open, 0o775);
      expect(_usableCacheDirectory(open)).toBe(false);
      chmodSync(open, 0o755);
      expect(_usableCacheDirectory(open)).toBe(true);
    }
  });
});

describe("running a CommonJS file through the cache", () => {
  function module(dir: string, body: string): string {
    const file = join(dir, "m.cjs");
    writeFileSync(file, `const { join } = require("node:path");\n${body}\nmodule.exports = { value, here: join(__dirname, "x"), name: __filename };\n`);
    return file;
  }

  interface Run {
    readonly status: string;
    readonly exports: { value: number; here: string; name: string };
    readonly cacheFile: string | null;
  }

  /** One run in a fresh Node process (in this process V8's own in-memory cache would answer the second compile). */
  function runOnce(file: string, cacheName: string, env: Record<string, string>): Run {
    const source = new URL("../../src/cli/_compileCache.ts", import.meta.url).href;
    const script = [
      `import { _runCachedCommonJs } from ${JSON.stringify(source)};`,
      `const m = _runCachedCommonJs(${JSON.stringify(file)}, "m", ${JSON.stringify(cacheName)}, process.env);`,
      "m.keep();",
      "console.log(JSON.stringify({ status: m.status, exports: m.exports, cacheFile: m.cacheFile ?? null }));",
    ].join("\n");
    const env0: Record<string, string | undefined> = { ...process.env };
    delete env0["HOTJUNCTION_CACHE_DIR"];
    const result = spawnSync(process.execPath, ["--import", "tsx", "--input-type=module", "-e", script], { cwd: projectRoot, encoding: "utf8", env: { ...env0, ...env } });
    if (result.status !== 0) throw new Error(result.stderr);
    return JSON.parse(result.stdout) as Run;
  }

  /** A fresh folder for the module and its cache directory below it. */
  function place(): { dir: string; cache: string; env: Record<string, string> } {
    const dir = tempDir();
    const cache = join(dir, "cache");
    return { dir, cache, env: { HOTJUNCTION_CACHE_DIR: cache } };
  }

  it("misses and keeps, then hits with the same exports; a refused cache is compiled as usual and replaced", () => {
    const { dir, cache, env } = place();
    const file = module(dir, "function f(n) { let s = 0; for (let i = 0; i < n; i++) s += i * i; return s; }\nconst value = f(1000);");
    const first = runOnce(file, "run", env);
    expect(first.status).toBe("miss");
    expect(first.exports).toEqual({ value: 332833500, here: join(dir, "x"), name: file });
    expect(readdirSync(cache).filter((f) => f.endsWith(".v8"))).toHaveLength(1);
    expect(readdirSync(cache).filter((f) => f.endsWith(".tmp"))).toEqual([]);
    const second = runOnce(file, "run", env);
    expect(second.status).toBe("hit");
    expect(second.exports).toEqual(first.exports);
    // Bytes that are no code cache: V8 refuses them (its check of magic number, version, flags and source).
    writeFileSync(second.cacheFile as string, Buffer.alloc(4096, 7));
    const refused = runOnce(file, "run", env);
    expect(refused.status).toBe("rejected");
    expect(refused.exports).toEqual(first.exports);
    expect(runOnce(file, "run", env).status).toBe("hit");
  });

  it("keys the cache by the source text; keeps this text's file and the newest other one, removes older ones", () => {
    const { dir, cache, env } = place();
    const file = module(dir, "const value = 1;");
    const a = runOnce(file, "run", env);
    // Same length, other text: V8's own check (the length) would take the old cache; the key does not.
    module(dir, "const value = 2;");
    const b = runOnce(file, "run", env);
    expect(b.status).toBe("miss");
    expect(b.exports.value).toBe(2);
    expect(b.cacheFile).not.toBe(a.cacheFile);
    // Two installs used in turn: both keep their cache.
    expect(existsSync(a.cacheFile as string)).toBe(true);
    module(dir, "const value = 1;");
    expect(runOnce(file, "run", env).status).toBe("hit");
    // A third text: the oldest file goes (by modification time), this one and the newest other stay.
    utimesSync(a.cacheFile as string, new Date(2_000_000_000_000), new Date(2_000_000_000_000));
    utimesSync(b.cacheFile as string, new Date(1_000_000_000_000), new Date(1_000_000_000_000));
    module(dir, "const value = 3;");
    const c = runOnce(file, "run", env);
    expect(c.status).toBe("miss");
    expect(existsSync(a.cacheFile as string)).toBe(true);
    expect(existsSync(b.cacheFile as string)).toBe(false);
    expect(existsSync(c.cacheFile as string)).toBe(true);
    // A file that only looks alike is not ours: it stays.
    const lookalike = join(cache, "m-notahexkey-run.v8");
    writeFileSync(lookalike, "user data");
    module(dir, "const value = 4;");
    expect(runOnce(file, "run", env).status).toBe("miss");
    expect(readFileSync(lookalike, "utf8")).toBe("user data");
    expect(readdirSync(cache).filter((f) => f !== "m-notahexkey-run.v8")).toHaveLength(2);
  });

  it("runs without a cache when it is turned off or its directory cannot be made, and names odd caches `other`", () => {
    const dir = tempDir();
    const file = module(dir, "const value = 3;");
    const off = runOnce(file, "run", { HOTJUNCTION_NO_CACHE: "1", HOTJUNCTION_CACHE_DIR: join(dir, "c") });
    expect([off.status, off.exports.value, off.cacheFile]).toEqual(["off", 3, null]);
    expect(existsSync(join(dir, "c"))).toBe(false);
    const blocked = runOnce(file, "run", { HOTJUNCTION_CACHE_DIR: join(file, "below") });
    expect([blocked.status, blocked.exports.value, blocked.cacheFile]).toEqual(["off", 3, null]);
    const odd = runOnce(file, "../../x", { HOTJUNCTION_CACHE_DIR: join(dir, "c2") });
    expect(odd.cacheFile?.endsWith("-other.v8")).toBe(true);
    expect(existsSync(odd.cacheFile as string)).toBe(true);
  });
});

describe("the built CLI with its cache", () => {
  beforeAll(() => ensureDist(), 300_000);

  function cli(args: readonly string[], env: Record<string, string>): { status: number | null; stdout: string; stderr: string } {
    const result = spawnSync(process.execPath, [join(distDir, "cli.js"), ...args], { cwd: projectRoot, encoding: "utf8", env: { ...process.env, ...env }, timeout: 60_000 });
    return { status: result.status, stdout: result.stdout, stderr: result.stderr };
  }

  it("prints the same with no cache, a fresh one, a kept one and a corrupted one; only a run that did its work keeps one", () => {
    const cache = join(tempDir(), "cache");
    const env = { HOTJUNCTION_CACHE_DIR: cache };
    const args = ["check", "examples/reflow-oven-trip.json", "--trials", "500", "--json"];
    const none = cli(args, { HOTJUNCTION_NO_CACHE: "1", HOTJUNCTION_CACHE_DIR: cache });
    expect(none.status).toBe(0);
    expect(existsSync(cache)).toBe(false);
    const fresh = cli(args, env);
    const files = readdirSync(cache);
    expect(files).toHaveLength(1);
    expect(files[0]).toMatch(/^program-[0-9a-f]{16}-check\.v8$/);
    const kept = cli(args, env);
    const path = join(cache, files[0] as string);
    const bytes = readFileSync(path);
    writeFileSync(path, bytes.subarray(0, bytes.length >> 1));
    const corrupted = cli(args, env);
    for (const run of [fresh, kept, corrupted]) expect(run).toEqual(none);
    expect(readFileSync(path).length).toBeGreaterThan(bytes.length >> 1);
    const failing = cli(["check", join(tempDir(), "missing.json")], env);
    expect(failing.status).toBe(1);
    expect(failing.stderr.split("\n").filter((l) => l.length > 0)).toHaveLength(1);
    expect(readdirSync(cache)).toEqual(files);
  });
});
