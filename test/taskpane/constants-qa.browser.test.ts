/**
 * Constants a QA reviewer can defend, in the pane as a user meets them (headless Chromium, 350 px
 * wide): a taken id refused at its field, a built-in entry overridden only on purpose, a changed
 * value losing its old citation, the draft kept while a source is added, the workbook deciding
 * over a personal entry, pinning with the change record, and nothing cut at 320 and 350 px.
 * Screenshots go to test-artifacts/ (qa-*.png).
 */
import * as fs from "fs";
import * as path from "path";
import type { Page } from "playwright-core";
import { BUILTIN_LIBRARY } from "../../src/library";
import { routeOffice, ROOT } from "./support/browser";
import { waitForText } from "./support/page-watch";
import { NO_PROBLEMS, startPane, type PaneSession } from "./support/pane-session";

jest.setTimeout(120000);

const ARTIFACTS = path.join(ROOT, "test-artifacts");

async function tab(page: Page, name: string): Promise<void> {
  await page.getByRole("tab", { name }).click();
}

async function tryPH(page: Page, name: string, amount: string): Promise<number> {
  await tab(page, "Try it");
  await page.locator(".try-name").first().fill(name);
  await page.locator(".try-amount").first().fill(amount);
  await page.click("#try-run");
  await waitForText(page.locator("#try-result"), /pH|Unknown/);
  return Number(await page.locator("#try-ph").innerText());
}

function entry(page: Page, kind: string, id: string) {
  return page.locator(`#entries li[data-kind="${kind}"][data-id="${id}"]`);
}

async function open(page: Page, kind: string, id: string, query: string) {
  await tab(page, "Browse");
  await page.fill("#search", query);
  const item = entry(page, kind, id);
  if ((await item.locator(".entry-head").getAttribute("aria-expanded")) !== "true") await item.locator(".entry-head").click();
  return item;
}

/** Elements whose text is wider than their box (cut), and anything wider than the viewport. */
async function overflow(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    const width = document.documentElement.clientWidth;
    for (const el of Array.from(document.querySelectorAll<HTMLElement>("body *"))) {
      if (el.offsetParent === null || el.closest("svg") || el.closest(".visually-hidden")) continue;
      const r = el.getBoundingClientRect();
      const cut = el.scrollWidth > el.clientWidth + 1 && getComputedStyle(el).overflowX !== "auto" && getComputedStyle(el).overflowX !== "scroll" && el.tagName !== "INPUT" && el.tagName !== "TEXTAREA";
      if (r.right > width + 1 || (cut && el.clientWidth > 0)) out.push(`${el.tagName.toLowerCase()}#${el.id}.${el.className} "${(el.innerText || "").slice(0, 40)}" ${Math.round(r.right)}/${width}`);
    }
    return out;
  });
}

describe("constants a QA reviewer can defend (pane in Chromium)", () => {
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

  test("a new system under a taken id is refused at the id field with a free id; nothing changes", async () => {
    const fp = await page.locator("#fingerprint").innerText();
    await tab(page, "Add / edit");
    await page.getByLabel("Name", { exact: true }).fill("acetate second try");
    await page.fill('[data-path="id"]', "acetate");
    await page.fill('[data-path="steps[0].pKa.value"]', "4.9");
    await page.click("#editor-save");
    const err = await waitForText(page.locator('[data-path="id"] ~ .field-error'), /taken by the built-in acid–base system 'acetate'/);
    expect(err).toMatch(/Use a free id such as 'acetate-2'/);
    expect(await page.locator('[data-path="id"]').getAttribute("aria-invalid")).toBe("true");
    expect(await page.locator("#fingerprint").innerText()).toBe(fp);
    // the outcome is in view and has the keyboard
    expect(await page.locator("#editor-errors").evaluate((el) => el === document.activeElement)).toBe(true);
    await page.getByRole("button", { name: "Clear" }).click();
  });

  test("the draft is kept while switching to add the source it needs; a new value needs no source", async () => {
    await tab(page, "Add / edit");
    await page.getByLabel("Name", { exact: true }).fill("HB-9 acid");
    await page.fill('[data-path="steps[0].pKa.value"]', "6.10");
    expect(await page.locator('[data-path="steps[0].pKa.status"]').inputValue()).toBe("entered");
    await page.selectOption("#add-kind", "source");
    await page.getByLabel("Title").fill("HB-SOP-220 potentiometric pKa of HB-9");
    await page.fill('[data-path="id"]', "hb-sop-220");
    await page.click("#editor-save");
    await waitForText(page.locator("#editor-errors"), /Back to the acid–base system you were adding/);
    expect(await page.getByLabel("Name", { exact: true }).inputValue()).toBe("HB-9 acid");
    expect(await page.locator('[data-path="steps[0].pKa.value"]').inputValue()).toBe("6.10");
    await page.selectOption('[data-path="steps[0].pKa.status"]', "published");
    await page.selectOption('[data-path="steps[0].pKa.source"]', "hb-sop-220");
    await page.fill('[data-path="steps[0].pKa.locator"]', "Table 1");
    await page.fill("#change-reason", "new in-house buffer");
    await page.click("#editor-save");
    await waitForText(page.locator("#editor-errors"), /Saved 'HB-9 acid'/);
  });

  test("overriding a built-in value is explicit, and the changed value loses the old citation", async () => {
    const item = await open(page, "system", "citrate", "citrate");
    await item.getByRole("button", { name: "Override in the workbook: citrate" }).click();
    await waitForText(page.locator("#editor-title"), "Override of the built-in acid–base system 'citrate'");
    await page.fill('[data-path="steps[1].pKa.value"]', "4.80");
    await page.click("#editor-save");
    const saved = await waitForText(page.locator("#editor-errors"), /Saved 'citrate'/);
    const was = BUILTIN_LIBRARY.systems!.find((x) => x.id === "citrate")!.steps[1].pKa;
    expect(saved).toContain(`step 2 ${was.value} → 4.8: the old value's source '${was.source}' — ${was.locator}`);
    expect(saved).toMatch(/no longer appl(y|ies); now 'entered by the user'/);
    const over = await open(page, "system", "citrate", "citrate");
    const text = await over.innerText();
    expect(text).toMatch(/pKa \(step 2\) = 4\.8 \(25 °C, I = 0\)\s*entered by the user/);
    const first = BUILTIN_LIBRARY.systems!.find((x) => x.id === "citrate")!.steps[0].pKa;
    expect(text).toContain(`pKa (step 1) = ${first.value} (25 °C, I = 0)`); // unchanged, with its own provenance
  });

  test("the workbook decides: a personal entry fills only what the workbook lacks", async () => {
    await tab(page, "Files");
    const file = JSON.stringify({ format: "protolyte-library", schemaVersion: 1, name: "bench", systems: [{ id: "citrate", name: "citrate (bench)", topCharge: 0, steps: [{ pKa: { value: 3.0, unit: "1", conditions: "25 °C", status: "entered" } }, { pKa: { value: 4.5, unit: "1", conditions: "25 °C", status: "entered" } }, { pKa: { value: 6.0, unit: "1", conditions: "25 °C", status: "entered" } }] }] });
    await page.selectOption("#import-layer", "personal");
    await page.setInputFiles("#import-file", { name: "bench.json", mimeType: "application/json", buffer: Buffer.from(file) });
    await waitForText(page.locator("#import-preview"), /but your workbook acid–base system stays in effect/);
    await page.click("#import-apply");
    await waitForText(page.locator("#import-outcome"), /Imported 'bench\.json'/);
    const item = await open(page, "system", "citrate", "citrate");
    expect(await item.getAttribute("data-layer")).toBe("workbook");
    expect(await item.innerText()).toMatch(/overrides the personal and built-in entry/);
  });

  test("pinning copies the constants in use into the workbook, with the change record", async () => {
    await tryPH(page, "sodium acetate", "0.1");
    await tab(page, "Files");
    await waitForText(page.locator("#pin-state"), /Nothing is pinned/);
    await page.fill("#change-who", "K. Halvorsen (QA)");
    expect(await page.locator("#pin-names").inputValue()).toBe("sodium acetate");
    await page.click("#pin-run");
    await waitForText(page.locator("#status"), /Pinned the constants of 1 name/);
    await waitForText(page.locator("#pin-state"), /Pinned .* with built-in library \d+\.\d+\.\d+: \d+ entries.*holds the same values/);
    const record = await page.locator("#change-record").innerText();
    expect(record).toMatch(/K\. Halvorsen \(QA\) · pin/);
    expect(record).toMatch(/pinned \d+ entries .* for sodium acetate/);
    const was = BUILTIN_LIBRARY.systems!.find((x) => x.id === "citrate")!.steps[1].pKa.value;
    expect(record).toMatch(/· add acid–base system citrate \(citrate\)/);
    expect(record).toContain(`steps[1].pKa.value: ${was} → 4.8`);
    expect(record).toMatch(/Reason: new in-house buffer/);
    const item = await open(page, "system", "acetate", "acetate");
    expect(await item.getAttribute("data-layer")).toBe("workbook");
    await page.screenshot({ path: path.join(ARTIFACTS, "qa-files-350.png"), fullPage: true });
  });

  test("Escape closes the delete confirmation", async () => {
    const item = await open(page, "system", "hb-9-acid", "HB-9");
    await item.getByRole("button", { name: "Delete HB-9 acid" }).click();
    const box = page.getByRole("group", { name: "Confirm delete" });
    await box.waitFor();
    await page.keyboard.press("Escape");
    await box.waitFor({ state: "detached" });
    expect(await item.getByRole("button", { name: "Delete HB-9 acid" }).evaluate((el) => el === document.activeElement)).toBe(true);
  });

  test.each([350, 320])("nothing is cut or wider than the pane at %i px (Browse, Add, Files, Try it)", async (width) => {
    await page.setViewportSize({ width, height: 900 });
    const seen: Record<string, string[]> = {};
    await open(page, "system", "phosphate", "phosphate");
    seen.browse = await overflow(page);
    await page.screenshot({ path: path.join(ARTIFACTS, `qa-browse-${width}.png`), fullPage: true });
    await tab(page, "Add / edit");
    seen.add = await overflow(page);
    await page.screenshot({ path: path.join(ARTIFACTS, `qa-add-${width}.png`), fullPage: true });
    await tab(page, "Files");
    seen.files = await overflow(page);
    await tryPH(page, "disodium hydrogen phosphate heptahydrate", "10 mM");
    seen.try = await overflow(page);
    await page.screenshot({ path: path.join(ARTIFACTS, `qa-try-${width}.png`), fullPage: true });
    expect(seen).toEqual({ browse: [], add: [], files: [], try: [] });
  });
});
