/** The validation report for QA, as Markdown and as a standalone HTML page. */
import { marked } from "marked";
import type { ValidationCase } from "./cases";
import { constantsStatusMarkdown } from "./constants-status";
import type { CaseResult, ValidationRun } from "./run";

export interface ReportContext {
  /** package.json version. */
  version: string;
  node: string;
  platform: string;
  /** ISO 8601 date and time of the run. */
  date: string;
}

export const SUPPORT_STATEMENT =
  "This report supports, and does not replace, the user's own validation: a workbook that uses these functions must be validated under the user's own quality system before GMP use.";

const CAUTIONS = [
  "A calculated pH is an estimate: confirm it with a calibrated pH meter.",
  "Strong acids and bases are corrosive, and diluting concentrated acids and bases releases heat.",
  "Validated procedures, pharmacopoeial methods and local regulations govern product and release decisions.",
  SUPPORT_STATEMENT,
];

function digitsFor(c: ValidationCase): number {
  return Math.min(12, Math.max(3, Math.ceil(-Math.log10(c.tolerance.value)) + 2));
}

function cell(text: string): string {
  return text.replace(/\|/g, "\\|").replace(/\n/g, " ");
}

function what(c: ValidationCase): string {
  if (c.formula !== undefined) return `\`${c.formula}\``;
  if (c.sheet !== undefined) {
    const cells: string[] = [];
    c.sheet.rows.forEach((row, r) =>
      row.forEach((v, col) => {
        if (v !== null) cells.push(`${String.fromCharCode(65 + col)}${r + 1}: \`${String(v)}\``);
      }),
    );
    return `sheet ${cells.join("; ")}; checked cell ${c.sheet.cell}`;
  }
  if (c.engine !== undefined) return `\`pKw(${c.engine.temperatureC})\` — the engine's value, imported from src/chem/water.ts (there is no AQ function for pKw)`;
  return "—";
}

function fmt(x: number | null, digits: number, signed = false): string {
  if (x === null) return "—";
  // A deviation too small to show at this precision is shown in exponent form rather than as ±0.
  const s = x !== 0 && Math.abs(x) < 0.5 * Math.pow(10, -digits) ? x.toExponential(1) : x.toFixed(digits);
  return signed && x >= 0 ? `+${s}` : s;
}

function verdictText(r: CaseResult): string {
  if (r.verdict === "pass") return "pass";
  if (r.verdict === "known deviation") return "known deviation";
  return "**FAIL**";
}

function groupTable(results: CaseResult[]): string[] {
  const reasons: string[] = [];
  const mark = (reason: string) => {
    let i = reasons.indexOf(reason);
    if (i < 0) i = reasons.push(reason) - 1;
    return String.fromCharCode(97 + i);
  };
  const equations: string[] = [];
  const eq = (text: string) => {
    let i = equations.indexOf(text);
    if (i < 0) i = equations.push(text) - 1;
    return `eq. ${i + 1}`;
  };
  const out = [
    "| id | source | conditions | formula | expected | computed | deviation | tolerance | result |",
    "| --- | --- | --- | --- | --- | --- | --- | --- | --- |",
  ];
  for (const r of results) {
    const c = r.case;
    const d = digitsFor(c);
    const expected = c.expectedFrom ? `${fmt(c.expected, d)} ${c.unit} (${eq(c.expectedFrom)})` : `${c.printed ?? String(c.expected)} ${c.unit}`;
    const status = c.status === "identity" ? "" : ` [${c.status}]`;
    out.push(
      `| ${[c.id, `${c.source}${status}`, c.conditions, what(c), expected, fmt(r.computed, d), fmt(r.deviation, d, true), `±${c.tolerance.value} (${mark(c.tolerance.reason)})`, verdictText(r)].map(cell).join(" | ")} |`,
    );
  }
  if (equations.length > 0) {
    out.push("", "Expected values computed from the published equations:", "");
    equations.forEach((text, i) => out.push(`- (eq. ${i + 1}) ${text}.`));
  }
  out.push("", "Tolerances:", "");
  reasons.forEach((reason, i) => out.push(`- (${String.fromCharCode(97 + i)}) ${reason}.`));
  return out;
}

export function reportMarkdown(run: ValidationRun, ctx: ReportContext): string {
  const lines: string[] = [
    "# Protolyte validation report",
    "",
    `Generated ${ctx.date} by \`npm run validate\` (scripts/validate.ts; the published cases with their sources and tolerances are in test/reference/*.json, described in docs/references.md; the identity checks in scripts/validation/cases.ts).`,
    "",
    `> ${SUPPORT_STATEMENT}`,
    "",
    "## Summary",
    "",
    `**${run.passed} passed, ${run.failed} failed** of ${run.results.length} checks` +
      (run.knownDeviations > 0 ? `; ${run.knownDeviations} known deviation(s), documented below with their reasons, are counted neither as passed nor as failed.` : "."),
    "",
    "## Environment",
    "",
    "| item | value |",
    "| --- | --- |",
    `| software | Protolyte ${ctx.version} |`,
    `| constants library in effect (\`AQ.CONSTANTS_ID()\`) | \`${run.fingerprint}\` |`,
    `| Node.js | ${ctx.node} |`,
    `| platform | ${ctx.platform} |`,
    `| date | ${ctx.date} |`,
    "",
    "## Status of the built-in constants",
    "",
    "How many built-in values were read in the source they cite, are common practice, or are recalled from memory (scripts/validation/constants-status.ts):",
    "",
    ...constantsStatusMarkdown(),
    "",
    "## How the checks are run",
    "",
    "Each check types the formula shown into a cell of the embedded spreadsheet engine (HyperFormula, the engine of `protolyte eval`) and compares the value with the published one; identities are small sheets whose results feed other functions. Defaults apply unless the formula says otherwise: 25 °C and the Davies activity model. The one exception is pKw, for which there is no AQ function: the engine's own pKw is imported from src/chem/water.ts. Compositions tabulated in mol/kg are typed as mol/L (below 0.001 pH at these dilutions). A check passes when |computed − expected| ≤ tolerance; every tolerance gives its reason. A known deviation is a documented disagreement with a published table, checked to stay within its stated bound; it is listed, never skipped. Beside each source, [V] means the value was seen in the published source (or a faithful copy of it) and [X] that it was cross-checked against an independent measurement or compilation; values the team could not verify are not used as checks.",
    "",
    "## Cautions",
    "",
    ...CAUTIONS.map((c) => `- ${c}`),
    "",
    "## Checks",
    "",
  ];
  const groups = [...new Set(run.results.map((r) => r.case.group))];
  for (const g of groups) {
    lines.push(`### ${g}`, "", ...groupTable(run.results.filter((r) => r.case.group === g)), "");
  }
  const notable = run.results.filter((r) => r.verdict !== "pass");
  lines.push("## Known deviations and failures", "");
  if (notable.length === 0) lines.push("None.", "");
  for (const r of notable) lines.push(`- **${r.case.id}** (${r.verdict}): ${r.detail ?? ""}`);
  if (notable.length > 0) lines.push("");
  lines.push("---", "", `${run.passed} passed, ${run.failed} failed. ${SUPPORT_STATEMENT}`, "");
  return lines.join("\n");
}

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c] as string);
}

export function reportHtml(markdown: string, title = "Protolyte validation report"): string {
  const body = marked.parse(markdown, { async: false }) as string;
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>
  body { font: 14px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif; margin: 2rem; color: #1d2a30; }
  h1, h2, h3 { color: #124e66; }
  table { border-collapse: collapse; margin: 1em 0; font-size: 12.5px; }
  th, td { border: 1px solid #c9d7dc; padding: .25em .5em; text-align: left; vertical-align: top; }
  th { background: #eef4f6; }
  code { font-family: ui-monospace, Consolas, monospace; background: #eef4f6; padding: 0 .2em; border-radius: 3px; word-break: break-all; }
  blockquote { border-left: 4px solid #c8553d; margin: 1em 0; padding: .2em .8em; background: #fbf1ee; }
  @media print { body { margin: 0; } table { font-size: 10px; } }
</style>
</head>
<body>
${body}
</body>
</html>
`;
}
