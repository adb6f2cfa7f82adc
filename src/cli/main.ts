/**
 * Entry of the `hotjunction` binary.
 * @module
 */
import { _processIo } from "./io.js";
import { runCli } from "./runCli.js";

// A reader that stops early (`hotjunction ... | head`) closes the pipe: end quietly instead of a stack trace.
for (const stream of [process.stdout, process.stderr]) {
  stream.on("error", (error: NodeJS.ErrnoException) => {
    if (error.code === "EPIPE") process.exit(process.exitCode ?? 0);
    throw error;
  });
}

process.exitCode = await runCli(process.argv.slice(2), _processIo());
