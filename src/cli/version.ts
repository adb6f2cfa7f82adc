/**
 * The package version shown by `hotjunction --version` (read from package.json at build time).
 * @module
 */
import packageJson from "../../package.json" with { type: "json" };

/** The package version. */
export const _packageVersion: string = packageJson.version;
