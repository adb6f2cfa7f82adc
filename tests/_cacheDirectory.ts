/**
 * Vitest set-up: the built CLI's code cache (src/cli/_compileCache.ts) goes to `.tmp/cli-cache` of this checkout,
 * not to the user's cache directory; children spawned by tests inherit it (test files that run at the same time
 * share it safely: the cache is written to a temporary file and renamed into place). Tests of the cache set their own.
 */
import { join } from "node:path";
import { fileURLToPath } from "node:url";

if (process.env["HOTJUNCTION_CACHE_DIR"] === undefined) {
  process.env["HOTJUNCTION_CACHE_DIR"] = join(fileURLToPath(new URL("..", import.meta.url)), ".tmp", "cli-cache");
}
