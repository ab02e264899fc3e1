/**
 * Reading the function reference (docs/functions/<id>.md): title, summary, sections, the syntax
 * line, the argument table and the examples with their printed results. Used by the docs tests
 * (test/docs/reference.test.ts) and by scripts/docs/update-examples.ts, so both read a page the
 * same way.
 *
 * Page layout: "# AQ.<ID>", a summary paragraph, then "## Syntax", "## Arguments", "## Result",
 * "## Formula", "## Method", "## Notes", "## Errors", "## References", "## Examples". An example is
 * a line `$ npm run --silent protolyte -- eval '<formula>'` inside a ```console block, followed by
 * the lines that command prints (a spilled table as tab-separated rows).
 */
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";

export const DOCS_DIR = join(__dirname, "..", "..", "docs", "functions");

export const REQUIRED_SECTIONS = ["Syntax", "Arguments", "Result", "Formula", "Method", "Notes", "Errors", "References", "Examples"] as const;

export const EVAL_PREFIX = "$ npm run --silent protolyte -- eval '";

export interface Example {
  formula: string;
  /** The printed lines (without the command line). */
  output: string[];
  /** 0-based line numbers in the page: the command line, and the range of output lines [from, to). */
  commandLine: number;
  outputFrom: number;
  outputTo: number;
}

export interface Page {
  file: string;
  /** Upper-case id from the title "# AQ.<ID>". */
  id: string | null;
  summary: string;
  sections: Map<string, string>;
  syntax: { id: string; params: { name: string; optional: boolean }[] } | null;
  /** Names in the first column of the Arguments table, in order. */
  argumentNames: string[];
  examples: Example[];
  lines: string[];
}

export function pageFiles(): string[] {
  return readdirSync(DOCS_DIR)
    .filter((f) => f.endsWith(".md") && f !== "README.md")
    .sort();
}

export function readPage(file: string): Page {
  return parsePage(file, readFileSync(join(DOCS_DIR, file), "utf8"));
}

export function parsePage(file: string, text: string): Page {
  const lines = text.split("\n");
  const title = lines.find((l) => l.startsWith("# "));
  const id = title?.match(/^# AQ\.([A-Z_]+)\s*$/)?.[1] ?? null;
  const sections = new Map<string, string>();
  let current: string | null = null;
  let buf: string[] = [];
  const summaryLines: string[] = [];
  let inFence = false;
  for (const line of lines) {
    if (line.startsWith("```")) inFence = !inFence;
    const h = !inFence ? line.match(/^## (.+?)\s*$/) : null;
    if (h) {
      if (current !== null) sections.set(current, buf.join("\n").trim());
      current = h[1];
      buf = [];
    } else if (current !== null) buf.push(line);
    else if (!line.startsWith("# ")) summaryLines.push(line);
  }
  if (current !== null) sections.set(current, buf.join("\n").trim());

  const syntaxText = sections.get("Syntax") ?? "";
  const m = syntaxText.match(/`AQ\.([A-Z_]+)\(([^`]*)\)`/);
  const syntax = m
    ? {
        id: m[1],
        params: m[2]
          .split(",")
          .map((p) => p.trim())
          .filter((p) => p !== "")
          .map((p) => ({ name: p.replace(/^\[|\]$/g, ""), optional: p.startsWith("[") && p.endsWith("]") })),
      }
    : null;

  const argumentNames: string[] = [];
  for (const row of (sections.get("Arguments") ?? "").split("\n")) {
    const a = row.match(/^\|\s*`([^`]+)`\s*\|/);
    if (a) argumentNames.push(a[1]);
  }

  return { file, id, summary: summaryLines.join("\n").trim(), sections, syntax, argumentNames, examples: examplesOf(lines), lines };
}

function examplesOf(lines: string[]): Example[] {
  const out: Example[] = [];
  let inConsole = false;
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    if (line.startsWith("```")) {
      inConsole = !inConsole && line.trim() === "```console";
      continue;
    }
    if (!inConsole || !line.startsWith(EVAL_PREFIX) || !line.endsWith("'")) continue;
    const formula = line.slice(EVAL_PREFIX.length, -1);
    let j = i + 1;
    while (j < lines.length && !lines[j].startsWith("```") && !lines[j].startsWith("$ ")) j++;
    out.push({ formula, output: lines.slice(i + 1, j), commandLine: i, outputFrom: i + 1, outputTo: j });
  }
  return out;
}

/** Every "AQ.NAME" mentioned in a text (function names). */
export function functionsMentioned(text: string): string[] {
  return [...new Set([...text.matchAll(/\bAQ\.([A-Z][A-Z_]*)\b/g)].map((x) => x[1]))];
}
