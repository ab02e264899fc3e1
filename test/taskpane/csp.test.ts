/**
 * The page's Content-Security-Policy and the "text only" rule, checked on the source and on the
 * production build: only our own scripts and the office.js CDN, no inline script, no eval, the one
 * inline <style> allowed by hash; office.js in <head> before the bundles; no HTML injection APIs
 * anywhere in src/taskpane.
 */
import * as fs from "fs";
import * as path from "path";
import { ensureBuilt } from "./support/browser";
import { cspOf, DIST_HTML, hashOf, inlineStyles, ROOT, SOURCE_HTML } from "./support/style-hashes";

const OFFICE_JS = "https://appsforoffice.microsoft.com/lib/1/hosted/office.js";

function checkPolicy(html: string, label: string): void {
  const csp = cspOf(html);
  expect({ label, directives: [...csp.keys()].sort() }).toEqual({
    label,
    directives: ["base-uri", "connect-src", "default-src", "form-action", "img-src", "object-src", "script-src", "style-src"],
  });
  expect(csp.get("default-src")).toEqual(["'none'"]);
  expect(csp.get("script-src")).toEqual(["'self'", "https://appsforoffice.microsoft.com"]);
  expect(csp.get("object-src")).toEqual(["'none'"]);
  expect(csp.get("base-uri")).toEqual(["'none'"]);
  const all = [...csp.values()].flat();
  for (const forbidden of ["'unsafe-inline'", "'unsafe-eval'", "'wasm-unsafe-eval'", "*", "data:", "blob:", "http:", "https:"]) {
    expect({ label, forbidden, present: all.includes(forbidden) }).toEqual({ label, forbidden, present: false });
  }
  // every inline <style> is allowed by its hash
  const styles = inlineStyles(html);
  expect(styles.length).toBe(1);
  const allowed = csp.get("style-src") ?? [];
  for (const s of styles) {
    const hash = hashOf(s);
    if (!allowed.includes(hash)) {
      throw new Error(`${label}: the inline <style> hash ${hash} is not in style-src (${allowed.join(" ")}). Run: npx tsx test/taskpane/support/style-hashes.ts --write`);
    }
  }
  // the policy comes first, then office.js in <head>, and no inline scripts at all
  const head = html.slice(0, html.search(/<\/head>/i));
  const metaAt = head.search(/Content-Security-Policy/i);
  const officeAt = head.indexOf(OFFICE_JS);
  expect({ label, metaBeforeOffice: metaAt > -1 && officeAt > metaAt }).toEqual({ label, metaBeforeOffice: true });
  const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
  for (const [, attrs, body] of scripts) {
    expect({ label, attrs, inline: body.trim() }).toEqual({ label, attrs, inline: "" });
    expect(attrs).toMatch(/\ssrc=/);
  }
  // no inline event handlers or style attributes in the markup
  expect(html).not.toMatch(/\son[a-z]+\s*=/i);
  expect(html).not.toMatch(/\sstyle\s*=/i);
}

test("source taskpane.html: a strict policy, office.js first", () => {
  checkPolicy(fs.readFileSync(SOURCE_HTML, "utf8"), "source");
});

test("built taskpane.html: the same policy, and office.js before functions.js and taskpane.js", () => {
  ensureBuilt();
  const html = fs.readFileSync(DIST_HTML, "utf8");
  checkPolicy(html, "dist");
  const order = [OFFICE_JS, "functions.js", "taskpane.js"].map((s) => html.indexOf(s));
  expect(order.every((i) => i > -1)).toBe(true);
  expect([...order].sort((a, b) => a - b)).toEqual(order);
});

test("no HTML-injection API is used anywhere in the pane's code", () => {
  const dir = path.join(ROOT, "src/taskpane");
  const files: string[] = [];
  const walk = (d: string) => {
    for (const f of fs.readdirSync(d, { withFileTypes: true })) {
      if (f.isDirectory()) walk(path.join(d, f.name));
      else if (f.name.endsWith(".ts")) files.push(path.join(d, f.name));
    }
  };
  walk(dir);
  expect(files.length).toBeGreaterThan(5);
  for (const file of files) {
    const code = fs.readFileSync(file, "utf8").replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, "");
    for (const api of [/\.innerHTML\b/, /\.outerHTML\b/, /insertAdjacentHTML/, /document\.write/, /createContextualFragment/, /\beval\(/, /new Function\(/, /setAttribute\(\s*["']on/, /setAttribute\(\s*["']style/]) {
      expect({ file: path.relative(ROOT, file), api: String(api), used: api.test(code) }).toEqual({ file: path.relative(ROOT, file), api: String(api), used: false });
    }
  }
});
