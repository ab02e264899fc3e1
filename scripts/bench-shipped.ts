/**
 * The product's code as it ships, for the benchmark's sheets (part f, scripts/bench-tables.ts).
 *
 * The benchmark runs under tsx, which transpiles every source file into its own CommonJS module:
 * every imported name (DEFAULTS, LN10, the error helpers…) is then read through an export getter, a
 * function call per use. The shipped code has none of these: webpack concatenates the modules of
 * dist/cli/protolyte.js (and of dist/functions.js, which Excel runs) into one scope. Measured on the
 * 10 000-row acetate table (2026-12-03T02:44Z), AQ.PH called directly took 2.8 µs a row from tsx's
 * modules and 2.2 µs bundled; export getters were 12 % of its profile. So the spreadsheet sheets are
 * evaluated by the same sources bundled into one scope by esbuild, with every package (HyperFormula
 * included) left to node_modules as in dist/cli: the Henderson–Hasselbalch sheet and the AQ tables
 * go through the very same engine and the very same evaluateSheets, only compiled as shipped.
 */
import { buildSync } from "esbuild";
import { createRequire } from "node:module";
import { join } from "node:path";
import type { evaluateSheets } from "../src/cli/evaluate";
import type { PH } from "../src/functions/functions";
import type { clearMixtureCache } from "../src/functions/mixture";

export interface ShippedCode {
  evaluateSheets: typeof evaluateSheets;
  PH: typeof PH;
  clearMixtureCache: typeof clearMixtureCache;
}

/** Bundles src/cli/evaluate.ts (with the AQ functions) into one scope and loads it; packages resolve from `root`. */
export function shippedCode(root: string): ShippedCode {
  const contents = [
    `export { evaluateSheets } from "./src/cli/evaluate";`,
    `export { PH } from "./src/functions/functions";`,
    `export { clearMixtureCache } from "./src/functions/mixture";`,
  ].join("\n");
  const result = buildSync({
    stdin: { contents, resolveDir: root, loader: "ts", sourcefile: "bench-shipped-entry.ts" },
    bundle: true,
    platform: "node",
    format: "cjs",
    target: "node20",
    packages: "external",
    write: false,
    logLevel: "warning",
  });
  const file = join(root, "bench-shipped.cjs"); // never written: names the module for require()
  const module = { exports: {} as ShippedCode };
  // eslint-disable-next-line @typescript-eslint/no-implied-eval
  new Function("require", "module", "exports", "__filename", "__dirname", result.outputFiles[0]!.text)(createRequire(file), module, module.exports, file, root);
  return module.exports;
}
