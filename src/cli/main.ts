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

const code = await runCli(process.argv.slice(2), _processIo());
process.exitCode = code;
// End once both streams have taken everything written (a write's callback runs after the writes before it): the
// event loop would otherwise wait for the engine's deferred work, such as the incremental marking of a garbage
// collection, 10–20 ms after a `check`, before the process ends.
process.stdout.write("", () => process.stderr.write("", () => process.exit(code)));
