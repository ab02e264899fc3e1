/**
 * Fills in the printed results of the examples in docs/functions/*.md: every
 * `$ npm run --silent protolyte -- eval '<formula>'` line gets the lines that command prints, computed
 * in-process with the same evaluator and formatting as the CLI (src/cli). A formula whose function
 * is not registered yet (#NAME?) keeps a "pending" line. test/docs/reference.test.ts checks the
 * pages against the functions, so run this after a deliberate change of results:
 *
 *   npx tsx scripts/docs/update-examples.ts
 */
import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { DOCS_DIR, pageFiles, readPage } from "./pages";
import { printedLines } from "./printed";

let changed = 0;
for (const file of pageFiles()) {
  const page = readPage(file);
  const lines = [...page.lines];
  // Replace from the last example backwards so earlier line numbers stay valid.
  for (const ex of [...page.examples].reverse()) {
    const printed = printedLines(ex.formula);
    if (printed[0]?.startsWith("#NAME?")) continue;
    lines.splice(ex.outputFrom, ex.outputTo - ex.outputFrom, ...printed);
  }
  const text = lines.join("\n");
  if (text !== page.lines.join("\n")) {
    writeFileSync(join(DOCS_DIR, file), text);
    changed++;
    process.stdout.write(`updated ${file}\n`);
  }
}
process.stdout.write(`${changed} page(s) changed\n`);
