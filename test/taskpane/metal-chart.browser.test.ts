/**
 * The Picture view's metal distribution in headless Chromium (Debian's /usr/bin/chromium through
 * playwright-core), outside Office, at the pane's width (350 px): calcium in a citrate buffer entered
 * in Try it is drawn free and in each complex against pH, beside the citrate diagram, fitting the
 * pane, with its numbers as text, within the Content-Security-Policy; Browse writes the metal's charge
 * the same way. Screenshot:
 * test-artifacts/pane-metal-distribution.png.
 */
import * as fs from "fs";
import * as path from "path";
import type { Locator, Page } from "playwright-core";
import { routeOffice, ROOT } from "./support/browser";
import { waitForText } from "./support/page-watch";
import { NO_PROBLEMS, startPane, type PaneSession, fillTry } from "./support/pane-session";

jest.setTimeout(120000);

const ARTIFACTS = path.join(ROOT, "test-artifacts");
const PANE_WIDTH = 350;

interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
  text: string;
}

async function boxes(loc: Locator): Promise<Box[]> {
  return loc.evaluateAll((els) =>
    els.map((e) => {
      const r = e.getBoundingClientRect();
      return { x: r.x, y: r.y, width: r.width, height: r.height, text: e.textContent ?? "" };
    }),
  );
}

/** No two boxes overlap, and each lies inside the frame (a pixel of slack for antialiasing). */
function expectApartAndInside(label: string, items: Box[], frame: Box): void {
  for (let i = 0; i < items.length; i++) {
    const a = items[i];
    const inside = a.x >= frame.x - 1 && a.y >= frame.y - 1 && a.x + a.width <= frame.x + frame.width + 1 && a.y + a.height <= frame.y + frame.height + 1;
    expect({ label, text: a.text, inside }).toEqual({ label, text: a.text, inside: true });
    for (let j = i + 1; j < items.length; j++) {
      const b = items[j];
      const overlap = a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
      expect({ label, pair: [a.text, b.text], overlap }).toEqual({ label, pair: [a.text, b.text], overlap: false });
    }
  }
}

describe("Picture view: a metal's distribution in Chromium at the pane's width", () => {
  let session: PaneSession;
  let page: Page;

  beforeAll(async () => {
    fs.mkdirSync(ARTIFACTS, { recursive: true });
    session = await startPane({ route: (context, requests) => routeOffice(context, "npm", requests), width: PANE_WIDTH, deviceScaleFactor: 2 });
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  afterEach(async () => {
    expect(await session.problems()).toEqual(NO_PROBLEMS);
  });

  test("calcium in citrate: the citrate diagram and Ca²⁺ free and in each complex, a line per form, fitting 350 px", async () => {
    await fillTry(page, [
      ["trisodium citrate dihydrate", "10 mM"],
      ["calcium chloride dihydrate", "4 mM"],
    ]);
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), /^From the Try it mixture: 10 mM trisodium citrate dihydrate \+ 4 mM calcium chloride dihydrate, 25 °C\.$/);
    expect(await page.locator("#picture-speciation svg.speciation").evaluateAll((s) => s.map((e) => e.getAttribute("data-system")))).toEqual(["citrate"]);
    // the citrate diagram shows its bound share too
    expect(await page.locator("#picture-speciation svg.speciation path.species-line").evaluateAll((ps) => ps.map((p) => p.getAttribute("data-species")))).toEqual(expect.arrayContaining(["Cit^3-", "CaCit-"]));
    const svg = page.locator("#picture-speciation svg.metal-distribution");
    expect(await svg.count()).toBe(1);
    expect(await svg.getAttribute("data-metal")).toBe("ca");
    const lines = await svg.locator("path.species-line").evaluateAll((ps) => ps.map((p) => ({ name: p.getAttribute("data-species"), length: (p as SVGPathElement).getTotalLength() })));
    expect(lines.map((l) => l.name)).toEqual(expect.arrayContaining(["Ca2+", "CaCit-", "CaHCit"]));
    expect(lines[0].name).toBe("Ca2+");
    for (const l of lines) expect(l.length).toBeGreaterThan(50);
    expect(await svg.locator(".axis-title").allTextContents()).toEqual(["pH", "% of Ca²⁺"]);
    expect(await svg.getAttribute("aria-label")).toMatch(/^Ca2\+ free and in complexes from pH 0 to 14 at 25 °C.*Half of it is free at pH \d\.\d\d\.$/);
    // the free ion's line starts at the height of the 100 tick (100 % at pH 0), in page pixels
    const start = await svg.locator('path.species-line[data-species="Ca2+"]').evaluate((p) => {
      const path = p as SVGPathElement;
      const a = path.getPointAtLength(0).matrixTransform(path.getScreenCTM()!);
      return { x: a.x, y: a.y };
    });
    const ticks = await boxes(svg.locator(".y-axis text", { hasText: /^100$/ }));
    expect(Math.abs(start.y - (ticks[0].y + ticks[0].height / 2))).toBeLessThan(3);
    const frame = (await boxes(svg))[0];
    expect(frame.x + frame.width).toBeLessThanOrEqual(PANE_WIDTH);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PANE_WIDTH);
    expectApartAndInside("x ticks", await boxes(svg.locator(".x-axis text")), frame);
    expectApartAndInside("y ticks", await boxes(svg.locator(".y-axis text")), frame);
    expectApartAndInside("legend", await boxes(svg.locator(".legend-item")), frame);
    expectApartAndInside("marker label", await boxes(svg.locator(".mixture-ph text")), frame);
    await page.locator('#picture-speciation figure[data-metal="ca"]').screenshot({ path: path.join(ARTIFACTS, "pane-metal-distribution.png") });
    await page.locator('#picture-speciation figure[data-system="citrate"]').screenshot({ path: path.join(ARTIFACTS, "pane-citrate-with-calcium.png") });
  });

  test("its numbers as text: the free ion and the complexes at the mixture's pH, and where half is free", async () => {
    const fig = page.locator('#picture-speciation figure[data-metal="ca"]');
    await fig.locator("details summary").click();
    const table = await fig.locator("table.numbers").innerText();
    expect(table).toMatch(/Ca²⁺ \(free\)\s+\d/);
    expect(table).toMatch(/CaCit⁻\s+\d+ %/);
    expect(table).toMatch(/Half of Ca²⁺ free\s+pH \d\.\d\d/);
    expect(await fig.locator("details summary").innerText()).toBe("Numbers for Ca²⁺ (4.00 mmol/L in all)");
  });

  test("Browse writes a metal ion's charge as the charts do: calcium chloride dihydrate carries 1 × Ca²⁺", async () => {
    await page.getByRole("tab", { name: "Browse" }).click();
    await page.fill("#search", "calcium chloride dihydrate");
    const item = page.locator('#entries li[data-kind="substance"][data-id="calcium-chloride-dihydrate"]');
    if ((await item.locator(".entry-head").getAttribute("aria-expanded")) !== "true") await item.locator(".entry-head").click();
    const text = await item.innerText();
    expect(text).toContain("1 × Ca²⁺");
    expect(text).toContain("2 × Cl⁻");
  });

  test("a mixture without a complexing metal draws no metal picture", async () => {
    await fillTry(page, [
      ["sodium dihydrogen phosphate", "10 mM"],
      ["disodium hydrogen phosphate", "10 mM"],
    ]);
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), /10 mM disodium hydrogen phosphate, 25 °C\.$/);
    expect(await page.locator("#picture-speciation svg.speciation").count()).toBe(1);
    expect(await page.locator("#picture-speciation svg.metal-distribution").count()).toBe(0);
  });
});
