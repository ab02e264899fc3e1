/**
 * What the browser tests watch on a page: script errors, Content-Security-Policy violations (all but
 * the two office.js is known to cause), and a flag any injected script would set; and small waits.
 */
import type { Locator, Page } from "playwright-core";
import { OFFICE_CDN } from "./browser";

export interface PageWatch {
  errors: string[];
  csp: string[];
  requests: string[];
}

/**
 * office.js (from the CDN) adds, 3 s after loading, a hidden iframe to Microsoft's telemetry proxy
 * with a style attribute. The pane's policy refuses both on purpose (the pane does not need
 * telemetry); these two violations, raised by office.js's own script, are the only ones expected.
 */
export function expectedOfficeViolation(directive: string, blocked: string, source: string): boolean {
  // a refused frame reports no source file; its address is reported as an origin
  if (directive === "frame-src") return blocked === "https://telemetryservice.firstpartyapps.oaspapps.com";
  return directive === "style-src-attr" && blocked === "inline" && source.startsWith(OFFICE_CDN);
}

/** Page errors, CSP violations and console errors, plus a flag that any injected script would set. */
export async function watch(page: Page, requests: string[]): Promise<PageWatch> {
  const w: PageWatch = { errors: [], csp: [], requests };
  page.on("pageerror", (e) => w.errors.push(`pageerror: ${e.message}`));
  page.on("console", (m) => {
    const text = m.text();
    const from = m.location().url ?? "";
    if (/Content Security Policy/i.test(text)) {
      const office = from.startsWith("https://appsforoffice.microsoft.com/");
      if (!(office && (/Framing 'https:\/\/telemetryservice\.firstpartyapps\.oaspapps\.com\/'/.test(text) || /^Applying inline style/.test(text)))) w.csp.push(`${text} (${from})`);
    } else if (m.type() === "error" && !/Failed to load resource/.test(text)) w.errors.push(`console: ${text}`);
  });
  await page.exposeFunction("__expectedOfficeViolation", expectedOfficeViolation);
  await page.addInitScript(() => {
    const g = window as unknown as { __injected: string[]; __csp: string[]; __expectedOfficeViolation(d: string, b: string, s: string): Promise<boolean> };
    g.__injected = [];
    g.__csp = [];
    document.addEventListener("securitypolicyviolation", (e) => {
      const line = `${e.violatedDirective} ${e.blockedURI} ${e.sourceFile}:${e.lineNumber}`;
      void g.__expectedOfficeViolation(e.violatedDirective, e.blockedURI, e.sourceFile).then((expected) => {
        if (!expected) g.__csp.push(line);
      });
    });
  });
  return w;
}

/** Poll a locator's text until it matches (actions are asynchronous: saves go through storage). */
export async function waitForText(loc: Locator, expected: RegExp | string | ((text: string) => boolean), timeout = 8000): Promise<string> {
  const ok = (t: string) => (typeof expected === "string" ? t === expected : typeof expected === "function" ? expected(t) : expected.test(t));
  const end = Date.now() + timeout;
  let last = "";
  for (;;) {
    last = (await loc.innerText({ timeout: 1000 }).catch(() => "")).trim();
    if (ok(last)) return last;
    if (Date.now() > end) throw new Error(`expected ${String(expected)}, found: ${JSON.stringify(last.slice(0, 600))}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** Open the pane and wait until it has started. */
export async function open(page: Page, url: string): Promise<void> {
  await page.goto(`${url}/taskpane.html`);
  await page.waitForSelector("body[data-ready=true]", { timeout: 20000 });
}

/** What went wrong on the page since the last call (then cleared): injected scripts, CSP violations, errors. */
export async function drainProblems(page: Page, w: PageWatch): Promise<{ injected: string[]; csp: string[]; consoleCsp: string[]; errors: string[] }> {
  const seen = await page.evaluate(() => {
    const g = window as unknown as { __injected: string[]; __csp: string[] };
    const out = { injected: [...g.__injected], csp: [...g.__csp] };
    g.__csp.length = 0;
    return out;
  });
  return { ...seen, consoleCsp: w.csp.splice(0), errors: w.errors.splice(0) };
}
