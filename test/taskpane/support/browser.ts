/**
 * Debian's Chromium driven by playwright-core (never a downloaded browser), with the flags that
 * work as root on these machines and a fresh profile per launch. The office.js CDN address is
 * routed to the npm copy, or made to fail, so no test touches the network.
 */
import * as fs from "fs";
import * as os from "os";
import * as path from "path";
import { execSync } from "child_process";
import { chromium, type BrowserContext, type Page, type Route } from "playwright-core";

export const ROOT = path.resolve(__dirname, "../../..");
export const DIST = path.join(ROOT, "dist");
export const OFFICE_CDN = "https://appsforoffice.microsoft.com/lib/1/hosted/";
const OFFICE_NPM = path.join(ROOT, "node_modules/@microsoft/office-js/dist");

/**
 * Build dist/ (`npx webpack --mode production`) when it is missing. `npm test` builds before jest;
 * after editing the pane, rebuild before `npx jest test/taskpane` (webpack leaves unchanged files
 * untouched, so file times cannot tell a stale build reliably).
 */
export function ensureBuilt(): void {
  if (fs.existsSync(path.join(DIST, "taskpane.html")) && fs.existsSync(path.join(DIST, "taskpane.js"))) return;
  execSync("npx webpack --mode production --stats errors-only", { cwd: ROOT, stdio: "pipe", timeout: 240000 });
}

/**
 * A private copy of dist/ for one test file: other builds in the same working tree clean and rewrite
 * dist/ at any moment, and a page must not load half of one build and half of another.
 */
export function snapshotDist(): { dir: string; remove(): void } {
  ensureBuilt();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "protolyte-dist-"));
  fs.cpSync(DIST, dir, { recursive: true });
  if (!fs.existsSync(path.join(dir, "taskpane.html"))) throw new Error("dist/ changed while it was copied; run the test again");
  return { dir, remove: () => fs.rmSync(dir, { recursive: true, force: true }) };
}

export interface Launched {
  context: BrowserContext;
  profile: string;
  close(): Promise<void>;
}

/**
 * A browser with a fresh profile directory (playwright takes the --user-data-dir as the persistent
 * context's directory rather than as a flag). `deviceScaleFactor` 2 gives sharp screenshots.
 */
export async function launch(opts: { deviceScaleFactor?: number } = {}): Promise<Launched> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), "protolyte-chromium-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    acceptDownloads: true,
    // 2 for sharp screenshots of the charts; the default 1 elsewhere
    deviceScaleFactor: opts.deviceScaleFactor,
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  return {
    context,
    profile,
    async close() {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Serve CDN office.js files from the npm copy; anything else on the network is refused. */
export async function routeOffice(context: BrowserContext | Page, mode: "npm" | "fail", seen: string[] = []): Promise<void> {
  await context.route(/^https?:\/\/(?!127\.0\.0\.1)/, async (route: Route) => {
    const url = route.request().url();
    seen.push(url);
    if (mode === "npm" && url.startsWith(OFFICE_CDN)) {
      const rel = decodeURIComponent(url.slice(OFFICE_CDN.length).split(/[?#]/)[0]);
      const file = path.resolve(OFFICE_NPM, rel);
      if (file.startsWith(OFFICE_NPM + path.sep) && fs.existsSync(file) && fs.statSync(file).isFile()) {
        await route.fulfill({ status: 200, contentType: "text/javascript; charset=utf-8", body: fs.readFileSync(file, "utf8") });
        return;
      }
      await route.fulfill({ status: 404, body: "" });
      return;
    }
    await route.abort("internetdisconnected");
  });
}
