/**
 * `npm run --silent protolyte -- …`: runs the compiled command line (dist/cli/protolyte.js, made by
 * `npm run build`). When it has not been built, says so in one line instead of a stack trace.
 */
const { existsSync } = require("node:fs");
const { join } = require("node:path");

const compiled = join(__dirname, "..", "dist", "cli", "protolyte.js");
if (existsSync(compiled)) {
  require(compiled);
} else {
  process.stderr.write(
    "protolyte: the command line is not built yet (dist/cli/protolyte.js is missing): run `npm run build` once;\n" +
      "           or run it from the sources, slower to start: npx tsx src/cli/bin.ts …\n",
  );
  process.exitCode = 2;
}
