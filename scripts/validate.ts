/**
 * npm run validate — runs the published reference checks (test/reference/*.json, through scripts/validation/cases.ts) through the
 * AQ functions as a user types them and writes the report for QA:
 *   reports/validation-report.md and reports/validation-report.html (generated, not tracked).
 * Options: --out DIR (instead of reports/), --sample FILE (also write the Markdown there, e.g.
 * docs/validation-report-sample.md). Exit status 1 when a check fails, 0 otherwise.
 */
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { CASES } from "./validation/cases";
import { reportHtml, reportMarkdown } from "./validation/report";
import { runValidation } from "./validation/run";

const root = join(__dirname, "..");

function option(name: string): string | undefined {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

const outDir = option("--out") ?? join(root, "reports");
const sample = option("--sample");
const version = (JSON.parse(readFileSync(join(root, "package.json"), "utf8")) as { version: string }).version;

const run = runValidation(CASES);
const md = reportMarkdown(run, { version, node: process.version, platform: `${process.platform} ${process.arch}`, date: new Date().toISOString() });
mkdirSync(outDir, { recursive: true });
writeFileSync(join(outDir, "validation-report.md"), md);
writeFileSync(join(outDir, "validation-report.html"), reportHtml(md));
if (sample !== undefined) {
  mkdirSync(dirname(sample), { recursive: true });
  writeFileSync(sample, md);
}

for (const r of run.results.filter((x) => x.verdict !== "pass")) {
  process.stdout.write(`${r.verdict === "fail" ? "FAIL" : "known deviation"} ${r.case.id}: ${r.detail ?? ""}\n`);
}
process.stdout.write(`wrote ${join(outDir, "validation-report.md")} and .html (constants ${run.fingerprint})\n`);
process.stdout.write(`${run.passed} passed, ${run.failed} failed (${run.knownDeviations} known deviations)\n`);
process.exit(run.failed > 0 ? 1 : 0);
