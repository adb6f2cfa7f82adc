/**
 * Entry of the `hotjunction` binary.
 * @module
 */
import { _processIo } from "./io.js";
import { runCli } from "./runCli.js";

process.exitCode = await runCli(process.argv.slice(2), _processIo());
