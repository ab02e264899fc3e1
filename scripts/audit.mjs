#!/usr/bin/env node
/**
 * Supply-chain check of what ships: `npm audit --omit=dev --json`, failing on high or critical
 * advisories. It needs the npm registry's advisory endpoint; when that cannot be used the script
 * says so and exits 2 rather than pass without having checked anything.
 *
 *   npm run audit                 exit 0: no high/critical advisories; 1: some (listed); 2: could not check
 *
 * The first line of the output is the verdict: "AUDIT OK: …", "AUDIT FAILED: …" or
 * "AUDIT NOT RUN: <why>". Addresses in npm's answer are left out of the message (they name the
 * registry this machine is configured with; the reason is enough).
 *
 * PROTOLYTE_AUDIT_REPORT=<file> reads a saved `npm audit --json` answer instead of calling npm (the
 * test checks the script's verdicts on such files without the network).
 *
 * test/robustness/supply-chain.test.ts runs it: advisories fail the test; an audit that could not
 * run is reported as a skipped test whose title gives the reason.
 */
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const root = join(dirname(fileURLToPath(import.meta.url)), "..");
const BLOCKING = ["high", "critical"];

/** npm's answer without the addresses in it (they would name this machine's registry host). */
const withoutAddresses = (text) => String(text).replace(/\b[a-z][a-z0-9+.-]*:\/\/\S+/gi, "(the advisory endpoint)");

function cannotCheck(detail) {
  console.log(
    `AUDIT NOT RUN: ${withoutAddresses(detail)}\n` +
      `  The npm registry's advisory endpoint could not be used, so the production dependencies were not checked.\n` +
      `  Run \`npm run audit\` where that endpoint answers.`,
  );
  process.exit(2);
}

function runAudit() {
  const saved = process.env.PROTOLYTE_AUDIT_REPORT;
  if (saved) return { stdout: readFileSync(saved, "utf8"), stderr: "", status: 1 };
  const npm = process.platform === "win32" ? "npm.cmd" : "npm";
  return spawnSync(npm, ["audit", "--omit=dev", "--json"], { cwd: root, encoding: "utf8", timeout: 120_000 });
}

const r = runAudit();
if (r.error) cannotCheck(`${r.error.message}`);

let report;
try {
  report = JSON.parse(r.stdout);
} catch {
  cannotCheck(`no JSON report (exit ${r.status}): ${(r.stderr || r.stdout).trim().split("\n").slice(-3).join(" | ")}`);
}

const counts = report?.metadata?.vulnerabilities;
if (!counts || typeof counts !== "object") {
  const why = report?.error?.summary || report?.message || (r.stderr || "").trim().split("\n").slice(-2).join(" | ");
  cannotCheck(`${why || "an answer without vulnerability counts"} (exit ${r.status})`);
}

const blocking = Object.values(report.vulnerabilities ?? {}).filter((v) => BLOCKING.includes(v.severity));
const summary = Object.entries(counts)
  .filter(([k]) => k !== "total")
  .map(([k, n]) => `${k} ${n}`)
  .join(", ");
if (blocking.length > 0) {
  console.log(`AUDIT FAILED: ${blocking.length} production package(s) with high or critical advisories (${summary}):`);
  for (const v of blocking) {
    const via = (v.via ?? []).map((x) => (typeof x === "string" ? x : `${x.title ?? ""} ${x.url ?? ""}`.trim())).join("; ");
    console.log(`  ${v.name} (${v.severity}, ${v.range ?? "?"}): ${via}${v.fixAvailable ? " — a fix is available" : ""}`);
  }
  process.exit(1);
}
console.log(`AUDIT OK: no high or critical advisories in production dependencies (${summary}; ${report.metadata.dependencies?.prod ?? "?"} production packages).`);
