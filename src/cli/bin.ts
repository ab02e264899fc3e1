#!/usr/bin/env node
/**
 * The executable entry of the command line (compiled to dist/cli/protolyte.js by the build; also
 * runs from source with tsx). The process ends by itself once its output is written: no
 * process.exit(), which would cut piped output that is still draining (the exit status is set with
 * process.exitCode). A reader that closes the pipe early (`| head`) ends the run quietly.
 */
import { main } from "./main";

process.stdout.on("error", (error: NodeJS.ErrnoException) => {
  if (error.code === "EPIPE") process.exit(process.exitCode ?? 0);
  process.stderr.write(`protolyte: cannot write the output: ${error.message}\n`);
  process.exit(2);
});

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    // Never a raw stack trace: one line, and the stack only when asked for.
    const message = error instanceof Error ? error.message : String(error);
    process.stderr.write(`protolyte: internal error: ${message.split("\n")[0]}\n`);
    if (process.env.PROTOLYTE_DEBUG && error instanceof Error) process.stderr.write(`${error.stack}\n`);
    process.exitCode = 2;
  },
);
