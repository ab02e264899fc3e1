/**
 * Issue 17, second round, in the pane as a user meets it (headless Chromium, 350 px wide): a pKa
 * measured at 37 °C and I = 0.15 mol/L (KCl) converted to 25 °C, I = 0 with its method and the
 * uncertainty it adds, and refused without ΔrH°. Screenshots go to test-artifacts/ (qa2-*.png).
 */
import * as fs from "fs";
import * as path from "path";
import type { Page } from "playwright-core";
import { BUILTIN_LIBRARY, convertPKa } from "../../src/library";
import { routeOffice, ROOT } from "./support/browser";
import { waitForText } from "./support/page-watch";
import { NO_PROBLEMS, startPane, type PaneSession } from "./support/pane-session";

jest.setTimeout(120000);

const ARTIFACTS = path.join(ROOT, "test-artifacts");

async function tab(page: Page, name: string): Promise<void> {
  await page.getByRole("tab", { name }).click();
}

async function open(page: Page, kind: string, id: string, query: string) {
  await tab(page, "Browse");
  await page.fill("#search", query);
  const item = page.locator(`#entries li[data-kind="${kind}"][data-id="${id}"]`);
  if ((await item.locator(".entry-head").getAttribute("aria-expanded")) !== "true") await item.locator(".entry-head").click();
  return item;
}

describe("issue 17, second round (pane in Chromium)", () => {
  let session: PaneSession;
  let page: Page;

  beforeAll(async () => {
    fs.mkdirSync(ARTIFACTS, { recursive: true });
    session = await startPane({ route: (context, requests) => routeOffice(context, "npm", requests), width: 350 });
    ({ page } = session);
  });

  afterAll(async () => {
    await session?.close();
  });

  afterEach(async () => {
    expect(await session.problems()).toEqual(NO_PROBLEMS);
  });

  test("a pKa measured at 37 °C, I = 0.15 M (KCl): refused without ΔrH°, then converted with its method and the uncertainty it adds", async () => {
    await tab(page, "Add / edit");
    await page.getByLabel("Name", { exact: true }).fill("HB sulfonate buffer");
    await page.fill('[data-path="steps[0].pKa.value"]', "6.93");
    await page.getByText("Measured at another temperature or ionic strength").click();
    await page.fill('[data-path="steps[0].pKa.measured.temperature"]', "37");
    await page.fill('[data-path="steps[0].pKa.measured.ionicStrength"]', "0.15");
    await page.fill('[data-path="steps[0].pKa.measured.medium"]', "KCl");
    await waitForText(page.locator(".measured-conversion").first(), /Cannot convert: measured at 37 °C, but the step has no ΔrH°/);
    await page.click("#editor-save");
    const err = await waitForText(page.locator('[data-path="steps[0].pKa.measured.temperature"] ~ .field-error'), /no ΔrH°/);
    expect(err).toMatch(/give ΔrH°/);
    await page.getByText("ΔrH° and ΔrCp° (optional, for temperature effects)").click();
    await page.fill('[data-path="steps[0].dH.value"]', "21.1");
    const c = convertPKa({ value: 6.93, temperature: 37, ionicStrength: 0.15, medium: "KCl", scale: "concentration" }, { dH: { value: 21.1, unit: "kJ/mol", conditions: "", status: "entered" } }, 0, 0);
    if (!c.ok) throw new Error(c.message);
    const live = await waitForText(page.locator(".measured-conversion").first(), /Stored as pKa/);
    expect(live).toContain(`Stored as pKa ${+c.value.toFixed(4)} at 25 °C, I = 0`);
    expect(live).toMatch(/The conversion adds uncertainty/);
    await page.click("#editor-save");
    const saved = await waitForText(page.locator("#editor-errors"), /Saved 'HB sulfonate buffer'/);
    expect(saved).toMatch(/van 't Hoff with ΔrH° 21\.1 kJ\/mol/);
    const item = await open(page, "system", "hb-sulfonate-buffer", "HB sulfonate");
    const text = await item.innerText();
    expect(text).toContain(`pKa = ${+c.value.toFixed(4)} (converted to 25 °C, I = 0 from 37 °C, I = 0.15 mol/L (KCl), concentration scale)`);
    expect(text).toMatch(/Davies activity coefficients for the pair of charges 0\/−1.*The conversion adds uncertainty/s);
    // (a full-page screenshot resizes the page for a moment: taken after the clicks, not before)
    await page.screenshot({ path: path.join(ARTIFACTS, "qa2-measured-350.png"), fullPage: true });
    await item.getByRole("button", { name: /^Edit/ }).first().click();
    expect(await page.locator('[data-path="steps[0].pKa.value"]').inputValue()).toBe("6.93");
    expect(await page.locator('[data-path="steps[0].pKa.measured.temperature"]').inputValue()).toBe("37");
    await page.getByRole("button", { name: "Cancel editing" }).click();
  });

  test("Try it shows the layer, the system and each pKa and ΔrH° applied with its source: a personal phosphate is seen as personal; plain acetic acid is not 'buffered'; p[H] is explained", async () => {
    const phosphate = JSON.parse(JSON.stringify(BUILTIN_LIBRARY.systems!.find((x) => x.id === "phosphate")));
    phosphate.steps[1].pKa = { value: 7.0, unit: "1", conditions: "25 °C, I = 0", status: "entered" };
    const file = JSON.stringify({ format: "protolyte-library", schemaVersion: 1, name: "bench phosphate", systems: [phosphate] });
    await tab(page, "Files");
    await page.selectOption("#import-layer", "personal");
    await page.setInputFiles("#import-file", { name: "bench-phosphate.json", mimeType: "application/json", buffer: Buffer.from(file) });
    await page.click("#import-apply");
    await waitForText(page.locator("#import-outcome"), /Imported 'bench-phosphate\.json'/);
    await tab(page, "Try it");
    await page.locator(".try-name").nth(0).fill("sodium dihydrogen phosphate monohydrate");
    await page.locator(".try-amount").nth(0).fill("10 mM");
    await page.locator(".try-name").nth(1).fill("disodium hydrogen phosphate heptahydrate");
    await page.locator(".try-amount").nth(1).fill("10 mM");
    await page.click("#try-run");
    const applied = await waitForText(page.locator("#try-applied"), /phosphate — personal library \(overrides built-in\)/);
    expect(applied).toMatch(/step 2: pKa 7 \[entered by the user\]/);
    expect(applied).toMatch(/step 1: pKa [\d.]+ \[(?!entered)/);
    expect(await page.locator("#try-used").innerText()).toMatch(/built-in library/); // the substances themselves are built-in
    expect(await page.locator("#try-facts").innerText()).toMatch(/p\[H\] [\d.]+ \(−log10 of the H⁺ concentration/);
    await page.screenshot({ path: path.join(ARTIFACTS, "qa2-try-applied-350.png"), fullPage: true });
    await page.locator(".try-name").nth(0).fill("acetic acid");
    await page.locator(".try-amount").nth(0).fill("0.1");
    await page.locator(".try-name").nth(1).fill("");
    await page.locator(".try-amount").nth(1).fill("");
    await page.click("#try-run");
    const verdict = await waitForText(page.locator("#try-buffering"), /buffer/);
    expect(verdict).not.toMatch(/^buffered/);
  });

  test("Files: the entries the workbook's formulas use — in a browser page the reader is off and says why; nothing cut at 320 px", async () => {
    await tab(page, "Files");
    const read = page.locator("#uses-read");
    expect(await read.isDisabled()).toBe(true);
    expect(await page.locator("#workbook-section").innerText()).toMatch(/Inside Excel this reads the workbook's AQ formulas and lists the entries they use; this browser page has no workbook/);
  });

  test.each([350, 320])("the tabs fit on one row at %i px, none cut", async (width) => {
    await page.setViewportSize({ width, height: 900 });
    const boxes = await page.locator("[role=tab]").evaluateAll((tabs) => tabs.map((t) => { const r = t.getBoundingClientRect(); return { top: Math.round(r.top), right: r.right, cut: t.scrollWidth > t.clientWidth + 1 }; }));
    const list = await page.locator("[role=tablist]").evaluate((l) => ({ right: l.getBoundingClientRect().right, scroll: l.scrollWidth > l.clientWidth + 1 }));
    expect(new Set(boxes.map((b) => b.top)).size).toBe(1);
    expect(boxes.filter((b) => b.cut)).toEqual([]);
    expect(list.scroll).toBe(false); // all six visible without scrolling
    await page.screenshot({ path: path.join(ARTIFACTS, `qa2-tabs-${width}.png`), clip: { x: 0, y: 0, width, height: 260 } });
  });

  test("species and formulas in Browse are written with subscripts and superscripts, as the charts write them", async () => {
    await page.setViewportSize({ width: 350, height: 900 });
    const sys = await open(page, "system", "phosphate", "phosphate");
    expect(await sys.innerText()).toContain("H₃PO₄ → H₂PO₄⁻ → HPO₄²⁻ → PO₄³⁻");
    const salt = await open(page, "substance", "disodium-hydrogen-phosphate-heptahydrate", "disodium hydrogen phosphate heptahydrate");
    const text = await salt.innerText();
    expect(text).toContain("Na₂HPO₄·7H₂O");
    expect(text).toContain("2 × Na⁺");
  });
});
