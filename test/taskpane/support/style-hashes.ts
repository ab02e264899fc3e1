/**
 * The pane's Content-Security-Policy allows its one inline <style> by hash, not 'unsafe-inline'.
 * The production build minifies that CSS, so the policy lists two hashes: the source's (development
 * build) and the minified one (production build). After editing the CSS, run
 *   npx tsx test/taskpane/support/style-hashes.ts --write
 * which builds, computes both hashes and writes them into src/taskpane/taskpane.html (then builds
 * again so dist/ carries the new policy). test/taskpane/csp.test.ts fails while they are stale.
 */
import { createHash } from "crypto";
import { execSync } from "child_process";
import * as fs from "fs";
import * as path from "path";

export const ROOT = path.resolve(__dirname, "../../..");
export const SOURCE_HTML = path.join(ROOT, "src/taskpane/taskpane.html");
export const DIST_HTML = path.join(ROOT, "dist/taskpane.html");

export function inlineStyles(html: string): string[] {
  return [...html.matchAll(/<style[^>]*>([\s\S]*?)<\/style>/gi)].map((m) => m[1]);
}

export function hashOf(text: string): string {
  return `'sha256-${createHash("sha256").update(text, "utf8").digest("base64")}'`;
}

/** The policy of the page's CSP <meta>, as directive → sources. */
export function cspOf(html: string): Map<string, string[]> {
  const meta = html.match(/<meta\s+http-equiv=["']?Content-Security-Policy["']?\s+content=("([^"]*)"|'([^']*)')/i);
  const policy = meta ? (meta[2] ?? meta[3]) : "";
  const map = new Map<string, string[]>();
  for (const part of policy.split(";")) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) map.set(name.toLowerCase(), sources);
  }
  return map;
}

function build(): void {
  execSync("npx webpack --mode production --stats errors-only", { cwd: ROOT, stdio: "inherit", timeout: 300000 });
}

if (require.main === module) {
  build();
  const source = fs.readFileSync(SOURCE_HTML, "utf8");
  const hashes = [...new Set([...inlineStyles(source), ...inlineStyles(fs.readFileSync(DIST_HTML, "utf8"))].map(hashOf))];
  console.log(`style-src ${hashes.join(" ")}`);
  if (process.argv.includes("--write")) {
    const next = source.replace(/style-src [^;"]*/, `style-src ${hashes.join(" ")}`);
    fs.writeFileSync(SOURCE_HTML, next);
    build();
    console.log("updated src/taskpane/taskpane.html and rebuilt dist/");
  }
}
