/**
 * Runs a CommonJS file through a V8 code cache: the compiled code of an earlier run (its bytecode, including the
 * functions that run compiled) is read back instead of parsing and compiling the source again. Node 20 has no
 * compile cache of its own for modules; this is `node:vm`'s `cachedData`, which V8 checks (its version, flags
 * and the source's length) and refuses when it does not fit, and then the file is compiled as usual. The cache
 * is a file per source text, Node version, architecture, Node options and cache name, in the user's cache
 * directory; reading or writing it never fails a run: any error leaves the run without a cache. The file must
 * not call `import()` (a `node:vm` script has no module loader; the program bundle is built with every
 * `import()` turned into a lazy `require`).
 * @module
 * @internal
 */
import { createHash, randomBytes } from "node:crypto";
import { lstatSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { homedir } from "node:os";
import { dirname, isAbsolute, join } from "node:path";
import { Script } from "node:vm";

/** What happened to the cache in a run. `off`: no usable cache directory (or turned off). */
export type _CacheStatus = "hit" | "miss" | "rejected" | "off";

/** A CommonJS file run through the cache. @internal */
export interface _CachedModule<T> {
  readonly exports: T;
  readonly status: _CacheStatus;
  /** The cache file of this run, when there is a usable cache directory. */
  readonly cacheFile: string | undefined;
  /**
   * Writes the code compiled so far (call it after the work, so the functions the work ran are in it) when the
   * cache was missing or refused. Atomic (a temporary file renamed into place); errors are ignored. Also removes
   * the older cache files of the same base and cache name (other source texts or Node versions) beyond the
   * newest {@link _keptPerName}.
   */
  keep(): void;
}

type Environment = Readonly<Record<string, string | undefined>>;

/** Cache files kept per base and cache name (this run's and the newest other one). @internal */
export const _keptPerName = 2;

/**
 * The cache directory: `HOTJUNCTION_CACHE_DIR` when set; else the platform's per-user cache directory
 * (`$XDG_CACHE_HOME` or `~/.cache` on Linux and others, `~/Library/Caches` on macOS, `%LOCALAPPDATA%` on
 * Windows) with `hotjunction` under it; undefined when `HOTJUNCTION_NO_CACHE` is set to anything but `0` or
 * empty, or when there is no home directory. @internal
 */
export function _cacheDirectory(env: Environment, platform: string = process.platform, home: () => string = homedir): string | undefined {
  const off = env["HOTJUNCTION_NO_CACHE"];
  if (off !== undefined && off !== "" && off !== "0") return undefined;
  const chosen = env["HOTJUNCTION_CACHE_DIR"];
  if (chosen !== undefined && chosen !== "") return chosen;
  let base: string;
  try {
    base = home();
  } catch {
    return undefined;
  }
  if (platform === "win32") {
    const local = env["LOCALAPPDATA"];
    return local !== undefined && local !== "" ? join(local, "hotjunction", "Cache") : base === "" ? undefined : join(base, "AppData", "Local", "hotjunction", "Cache");
  }
  if (base === "") return undefined;
  if (platform === "darwin") return join(base, "Library", "Caches", "hotjunction");
  const xdg = env["XDG_CACHE_HOME"];
  return join(xdg !== undefined && isAbsolute(xdg) ? xdg : join(base, ".cache"), "hotjunction");
}

/**
 * Creates the directory (mode 700) and accepts it only when it is a directory (not a link) that, on POSIX
 * systems, belongs to this user and no one else may write to: code read from it runs in this process. @internal
 */
export function _usableCacheDirectory(dir: string): boolean {
  try {
    mkdirSync(dir, { recursive: true, mode: 0o700 });
    const stat = lstatSync(dir);
    if (!stat.isDirectory()) return false;
    if (typeof process.getuid === "function" && (stat.uid !== process.getuid() || (stat.mode & 0o022) !== 0)) return false;
    return true;
  } catch {
    return false;
  }
}

/** The key of a compiled text: its SHA-256 with everything else V8's code depends on (16 hex digits). */
function cacheKey(source: Buffer, env: Environment): string {
  const hash = createHash("sha256");
  hash.update(`${process.version}\0${process.arch}\0${process.execArgv.join(" ")}\0${env["NODE_OPTIONS"] ?? ""}\0`);
  hash.update(source);
  return hash.digest("hex").slice(0, 16);
}

/** Reads a file; undefined on any error (a missing cache file is the usual case). */
function readIfThere(file: string): Buffer | undefined {
  try {
    return readFileSync(file);
  } catch {
    return undefined;
  }
}

/**
 * Runs the CommonJS file `file` (its `require` resolves from its own place) and returns its exports, compiling
 * it with the cache `<base>-<key>-<cacheName>.v8` where `cacheName` is `[a-z0-9-]{1,32}` (else `other`). @internal
 */
export function _runCachedCommonJs<T>(file: string, base: string, cacheName: string, env: Environment): _CachedModule<T> {
  const bytes = readFileSync(file);
  const dir = _cacheDirectory(env);
  const usable = dir !== undefined && _usableCacheDirectory(dir);
  const name = /^[a-z0-9-]{1,32}$/.test(cacheName) ? cacheName : "other";
  const key = usable ? cacheKey(bytes, env) : "";
  const cacheFile = usable ? join(dir, `${base}-${key}-${name}.v8`) : undefined;
  const cachedData = cacheFile === undefined ? undefined : readIfThere(cacheFile);
  // The wrapper keeps the file's line numbers (it adds nothing before the first line's text).
  const script = new Script(`(function (exports, require, module, __filename, __dirname) { ${bytes.toString("utf8")}\n})`, {
    filename: file,
    ...(cachedData !== undefined ? { cachedData } : {}),
  });
  const status: _CacheStatus = cacheFile === undefined ? "off" : cachedData === undefined ? "miss" : script.cachedDataRejected === true ? "rejected" : "hit";
  const wrapper = script.runInThisContext() as (exports: object, require: NodeJS.Require, module: { exports: unknown }, filename: string, dirname: string) => void;
  const module: { exports: unknown } = { exports: {} };
  wrapper.call(module.exports, module.exports as object, createRequire(file), module, file, dirname(file));
  let kept = false;
  return {
    exports: module.exports as T,
    status,
    cacheFile,
    keep(): void {
      if (kept || cacheFile === undefined || status === "hit" || dir === undefined) return;
      kept = true;
      const temporary = join(dir, `.${base}-${process.pid}-${randomBytes(6).toString("hex")}.tmp`);
      try {
        writeFileSync(temporary, script.createCachedData(), { flag: "wx", mode: 0o600 });
        renameSync(temporary, cacheFile);
      } catch {
        rmSync(temporary, { force: true });
        return;
      }
      try {
        // Only names this code writes (the base, 16 hex digits, the cache name), newest first; the newest
        // {@link _keptPerName} stay, so two installs used in turn (a project's and a global one) keep theirs.
        const ours = new RegExp(`^${base.replace(/[^a-z0-9]/gi, "")}-[0-9a-f]{16}-${name}\\.v8$`);
        const files = readdirSync(dir)
          .filter((entry) => ours.test(entry))
          .map((entry) => ({ entry, at: entry.startsWith(`${base}-${key}-`) ? Infinity : statSync(join(dir, entry)).mtimeMs }))
          .sort((a, b) => b.at - a.at);
        for (const { entry } of files.slice(_keptPerName)) rmSync(join(dir, entry), { force: true });
      } catch {
        // Stale files stay; the next keep tries again.
      }
    },
  };
}
