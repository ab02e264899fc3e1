/**
 * One task pane in headless Chromium, as every browser test starts it: a snapshot of the production
 * build served on 127.0.0.1, a fresh browser, office.js routed as the test asks, the page watched for
 * errors and policy violations, the pane opened and started.
 */
import type { BrowserContext, Page } from "playwright-core";
import { launch, snapshotDist, type Launched } from "./browser";
import { drainProblems, open, watch, type PageWatch } from "./page-watch";
import { serveDirectory, type StaticServer } from "./static-server";

export interface PaneSession {
  page: Page;
  w: PageWatch;
  browser: Launched;
  server: StaticServer;
  /** Closes the browser and the server and removes the snapshot. */
  close(): Promise<void>;
  /** What went wrong since the last call: injected scripts, CSP violations, errors (then cleared). */
  problems(): ReturnType<typeof drainProblems>;
}

export interface PaneOptions {
  /** Routes office.js (and refuses everything else) for the context, recording requests. */
  route(context: BrowserContext, requests: string[]): Promise<void>;
  /** Viewport width in CSS pixels; the height is 900. */
  width?: number;
  deviceScaleFactor?: number;
}

export const NO_PROBLEMS = { injected: [], csp: [], consoleCsp: [], errors: [] };

export async function startPane(opts: PaneOptions): Promise<PaneSession> {
  const dist = snapshotDist();
  const server = await serveDirectory(dist.dir);
  const browser = await launch(opts.deviceScaleFactor === undefined ? {} : { deviceScaleFactor: opts.deviceScaleFactor });
  const close = async (): Promise<void> => {
    await browser.close();
    await server.close();
    dist.remove();
  };
  try {
    const requests: string[] = [];
    await opts.route(browser.context, requests);
    const page = browser.context.pages()[0] ?? (await browser.context.newPage());
    if (opts.width !== undefined) await page.setViewportSize({ width: opts.width, height: 900 });
    const w = await watch(page, requests);
    await open(page, server.url);
    return { page, w, browser, server, close, problems: () => drainProblems(page, w) };
  } catch (e) {
    await close();
    throw e;
  }
}

/** Fills Try it's rows (adding rows as needed) and its temperature, on the Try it tab. */
export async function fillTry(page: Page, rows: [string, string][], temperature = "25"): Promise<void> {
  await page.getByRole("tab", { name: "Try it" }).click();
  while ((await page.locator(".try-name").count()) < rows.length) await page.click("#try-add-row");
  for (let i = 0; i < rows.length; i++) {
    await page.locator(".try-name").nth(i).fill(rows[i][0]);
    await page.locator(".try-amount").nth(i).fill(rows[i][1]);
  }
  await page.fill("#try-temp", temperature);
}
