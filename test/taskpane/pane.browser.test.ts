/**
 * The task pane in headless Chromium (Debian's /usr/bin/chromium through playwright-core), served
 * from the production build on 127.0.0.1. office.js is routed to the npm copy, or made to fail;
 * every other network request is refused.
 *
 * Scenario: open the pane, add a base by its pKb and a substance form of it, see the try-it pH use
 * it, edit it and see the pH move, duplicate-to-edit a built-in entry, export, delete, re-import,
 * reject a bad file and an oversized one, render script-injection payloads as inert text, survive a
 * reload, and deal with a damaged stored layer. Screenshots go to test-artifacts/.
 */
import * as fs from "fs";
import * as path from "path";
import type { Locator, Page } from "playwright-core";
import { routeOffice, ROOT } from "./support/browser";
import { waitForText, type PageWatch } from "./support/page-watch";
import { NO_PROBLEMS, startPane, type PaneSession } from "./support/pane-session";

jest.setTimeout(120000);

const ARTIFACTS = path.join(ROOT, "test-artifacts");
const WORKBOOK_KEY = "protolyte.workbook-library.browser-page";

async function attr(loc: Locator, name: string): Promise<string | null> {
  return loc.getAttribute(name, { timeout: 5000 });
}

async function focused(loc: Locator): Promise<boolean> {
  return loc.evaluate((el) => el === document.activeElement);
}

async function tab(page: Page, name: string): Promise<void> {
  await page.getByRole("tab", { name }).click();
}

async function tryPH(page: Page, name: string, amount: string): Promise<string> {
  await tab(page, "Try it");
  await page.locator(".try-name").first().fill(name);
  await page.locator(".try-amount").first().fill(amount);
  await page.click("#try-run");
  return (await page.locator("#try-result").innerText()).trim();
}

async function currentPH(page: Page): Promise<number> {
  await tab(page, "Try it");
  return Number(await page.locator("#try-ph").innerText());
}

async function search(page: Page, text: string): Promise<void> {
  await tab(page, "Browse");
  await page.fill("#search", text);
}

function entry(page: Page, kind: string, id: string) {
  return page.locator(`#entries li[data-kind="${kind}"][data-id="${id}"]`);
}

async function chooseFile(page: Page, name: string, content: string | { path: string }, layer = "workbook", mode = "merge"): Promise<void> {
  await tab(page, "Files");
  await page.selectOption("#import-layer", layer);
  await page.selectOption("#import-mode", mode);
  if (typeof content === "string") await page.setInputFiles("#import-file", { name, mimeType: "application/json", buffer: Buffer.from(content) });
  else await page.setInputFiles("#import-file", content.path); // a local path: nothing large goes over the wire
}

const XSS_IMG = '<img src=x onerror="window.__injected.push(\'img\')">';
const XSS_SCRIPT = "<script>window.__injected.push('script')</script>";

describe("task pane in Chromium with office.js from the npm copy", () => {
  let session: PaneSession;
  let page: Page;
  let w: PageWatch;
  let phFirst = 0;
  let phEdited = 0;
  let exported = "";

  beforeAll(async () => {
    fs.mkdirSync(ARTIFACTS, { recursive: true });
    session = await startPane({ route: (context, requests) => routeOffice(context, "npm", requests), width: 380 });
    ({ page, w } = session);
  });

  afterAll(async () => {
    await session?.close();
  });

  afterEach(async () => {
    // nothing injected ever ran, nothing broke the policy, no script errors (reported once, then cleared)
    expect(await session.problems()).toEqual(NO_PROBLEMS);
  });

  test("opens outside Office with the fingerprint, version and where the layers live", async () => {
    await waitForText(page.locator("#fingerprint"), /^PL-\d+\.\d+\.\d+-[0-9a-f]{10}$/);
    await waitForText(page.locator("#version"), /built-in library \d+\.\d+\.\d+/);
    const where = await page.locator("#where").innerText();
    expect(where).toMatch(/Not running inside Office/);
    expect(where).toMatch(/browser page \(no workbook\)/);
    expect(w.requests.filter((u) => u.includes("appsforoffice")).length).toBeGreaterThan(0);
    await waitForText(page.locator("#entry-count"), /\d+ entries/);
    await waitForText(page.locator("footer"), /calibrated meter.*corrosive.*pharmacopoeial/s);
  });

  test("adds a base by its pKb (conversion shown) and a substance form of it", async () => {
    expect(await tryPH(page, "HB-7 free base", "10 mM")).toMatch(/Unknown substance/);
    await tab(page, "Add / edit");
    await page.getByLabel("Name", { exact: true }).fill("HB-7 amine");
    await page.getByLabel("Charge of the fully protonated form").fill("1");
    await page.fill('[data-path="steps[0].pKa.value"]', "4.2");
    await page.getByLabel("The value is the pKb of the base (25 °C)").check();
    expect(await waitForText(page.locator(".conversion"), (t) => t.includes("pKa = pKw − pKb = 13.995 − 4.2 = 9.795"))).toBeTruthy();
    await page.selectOption('[data-path="steps[0].pKa.status"]', "unverified");
    await page.fill('[data-path="steps[0].pKa.note"]', "Halvorsen Biologics datasheet value, not yet checked");
    await page.click("#editor-save");
    await waitForText(page.locator("#editor-errors"), /Saved 'HB-7 amine'/);
    await page.getByRole("button", { name: "Add a substance form of 'HB-7 amine'" }).click();
    await page.getByLabel("Name", { exact: true }).fill("HB-7 free base");
    await page.getByLabel("Other names (one per line)").fill("HB7 base");
    await page.getByLabel("Formula of the form weighed").fill("C8H11NO");
    await page.click("#editor-save");
    await waitForText(page.locator("#editor-errors"), /Saved 'HB-7 free base'/);
  });

  test("the browser shows the new entries with their layer, value, status and conversion note", async () => {
    await search(page, "HB-7");
    await entry(page, "system", "hb-7-amine").locator(".entry-head").click();
    const text = await entry(page, "system", "hb-7-amine").innerText();
    expect(text).toMatch(/workbook/);
    expect(text).toMatch(/pKa = 9\.795 \(25 °C, I = 0\)/);
    expect(text).toMatch(/from memory, unverified/);
    expect(text).toMatch(/converted from pKb 4\.2 with pKw 13\.995/);
    expect(await attr(entry(page, "system", "hb-7-amine").locator(".entry-head"), "aria-expanded")).toBe("true");
    await page.screenshot({ path: path.join(ARTIFACTS, "taskpane.png"), fullPage: true });
  });

  test("a built-in system shows the Pitzer model's parameters with source and status, and the rule for species without any (issue 20)", async () => {
    await search(page, "phosphate");
    const item = entry(page, "system", "phosphate");
    if ((await item.locator(".entry-head").getAttribute("aria-expanded")) !== "true") await item.locator(".entry-head").click();
    await item.locator("details.ion-specific summary").click();
    const text = await item.locator("details.ion-specific").innerText();
    expect(text).toMatch(/Pitzer activity \(ion-specific\): \d+ parameter sets/);
    expect(text).toMatch(/Na⁺–H₂PO₄⁻: β0 = −0\.0533, β1 = 0\.0396, Cφ = 0\.00795/);
    expect(text).toMatch(/Source: Pitzer & Mayorga, J\. Phys\. Chem\. 77, 2300 \(1973\)/);
    expect(text).toMatch(/Hershey, Fernandez & Millero/);
    await item.locator("details.ion-specific").screenshot({ path: path.join(ARTIFACTS, "taskpane-pitzer.png") });
    await search(page, "citrate");
    const cit = entry(page, "system", "citrate");
    if ((await cit.locator(".entry-head").getAttribute("aria-expanded")) !== "true") await cit.locator(".entry-head").click();
    await cit.locator("details.ion-specific summary").click();
    expect(await cit.locator("details.ion-specific").innerText()).toMatch(/HCit²⁻ has no published Pitzer parameters here: the parameters of HPO₄²⁻ are used/);
  });

  test("try-it uses the new entry through the library in effect", async () => {
    const result = await tryPH(page, "HB7 base", "10 mM");
    expect(result).toMatch(/HB-7 free base — workbook library/);
    phFirst = await currentPH(page);
    // 10 mM of a base with pKb 4.2: pH ≈ 14 − (4.2 + 2)/2 ≈ 10.9
    expect(phFirst).toBeGreaterThan(10.7);
    expect(phFirst).toBeLessThan(11.1);
    await page.screenshot({ path: path.join(ARTIFACTS, "taskpane-try.png"), fullPage: true });
  });

  test("editing the pKa moves the try-it pH", async () => {
    await search(page, "HB-7 amine");
    const item = entry(page, "system", "hb-7-amine");
    if ((await item.locator(".entry-head").getAttribute("aria-expanded")) !== "true") await item.locator(".entry-head").click();
    await item.getByRole("button", { name: "Edit HB-7 amine" }).click();
    await waitForText(page.locator("#editor-title"), "Editing acid–base system 'HB-7 amine'");
    expect(await page.locator('[data-path="steps[0].pKa.value"]').inputValue()).toBe("9.795");
    await page.fill('[data-path="steps[0].pKa.value"]', "9.0");
    await page.click("#editor-save");
    await waitForText(page.locator("#status"), /Saved 'HB-7 amine'/);
    phEdited = await currentPH(page); // the try-it panel recalculated by itself
    expect(phFirst - phEdited).toBeGreaterThan(0.3);
    expect(phFirst - phEdited).toBeLessThan(0.5);
  });

  test("an invalid save lists what is wrong at which field, and saves nothing", async () => {
    const before = await page.locator("#fingerprint").innerText();
    await tab(page, "Add / edit");
    await page.getByLabel("Name", { exact: true }).fill("Broken");
    await page.getByLabel("Charge of the fully protonated form").fill("0.5");
    await page.fill('[data-path="steps[0].pKa.value"]', "abc");
    await page.click("#editor-save");
    const summary = await page.locator("#editor-errors").innerText();
    expect(summary).toMatch(/Not saved: 2 problems/);
    // fields named in words, not paths (issue 17 item 9)
    expect(summary).toMatch(/charge of the fully protonated form: a whole number/);
    expect(summary).toMatch(/step 1, pKa: 'abc' is not a number/);
    expect(summary).not.toMatch(/steps\[0\]|topCharge/);
    expect(await attr(page.locator('[data-path="steps[0].pKa.value"]'), "aria-invalid")).toBe("true");
    expect(await focused(page.locator("#editor-errors"))).toBe(true);
    expect(await page.locator("#fingerprint").innerText()).toBe(before);
    await page.getByRole("button", { name: "Clear" }).click();
  });

  test("duplicate to edit overrides a built-in entry in the workbook; deleting it reveals the built-in again", async () => {
    await search(page, "acetate");
    await page.selectOption("#kind-filter", "system");
    await entry(page, "system", "acetate").locator(".entry-head").click();
    await waitForText(entry(page, "system", "acetate"), /Built-in entries are read-only/);
    await entry(page, "system", "acetate").getByRole("button", { name: "Override in the workbook: acetate" }).click();
    await waitForText(page.locator("#editor-title"), "Override of the built-in acid–base system 'acetate'");
    await page.fill('[data-path="steps[0].pKa.value"]', "4.80");
    await page.click("#editor-save");
    await search(page, "acetate");
    const over = entry(page, "system", "acetate");
    expect(await attr(over, "data-layer")).toBe("workbook");
    await waitForText(over.locator(".entry-head"), /overrides the built-in entry/);
    if ((await over.locator(".entry-head").getAttribute("aria-expanded")) !== "true") await over.locator(".entry-head").click();
    await over.getByRole("button", { name: "Delete acetate" }).click();
    await page.getByRole("group", { name: "Confirm delete" }).getByRole("button", { name: "Delete", exact: true }).click();
    await waitForText(page.locator("#status"), /built-in entry applies again/);
    expect(await attr(entry(page, "system", "acetate"), "data-layer")).toBe("builtin");
    await page.selectOption("#kind-filter", "all");
  });

  test("exports the workbook library as a file stamped with fingerprint, date and version, in the file and its name", async () => {
    const fp = await page.locator("#fingerprint").innerText();
    await tab(page, "Files");
    const [download] = await Promise.all([page.waitForEvent("download"), page.click("#export-workbook")]);
    expect(download.suggestedFilename()).toMatch(new RegExp(`^protolyte-workbook-library_${fp}_\\d{4}-\\d{2}-\\d{2}T\\d{4}Z\\.json$`));
    exported = fs.readFileSync((await download.path()) as string, "utf8");
    const doc = JSON.parse(exported);
    expect(doc.format).toBe("protolyte-library");
    expect(doc.exported).toMatchObject({ fingerprint: fp, software: expect.stringMatching(/^Protolyte \d+\.\d+\.\d+$/), what: "workbook library" });
    // the change record travels with the export
    expect(doc.changes.map((c: { action: string }) => c.action)).toContain("add");
    expect(doc.substances.map((s: { id: string }) => s.id)).toEqual(["hb-7-free-base"]);
    expect(doc.systems.map((s: { id: string }) => s.id)).toEqual(["hb-7-amine"]);
  });

  test("after deleting, re-importing the exported file (previewed, then confirmed) brings the entry back", async () => {
    await search(page, "HB-7 free base");
    const item = entry(page, "substance", "hb-7-free-base");
    await item.locator(".entry-head").click();
    await item.getByRole("button", { name: "Delete HB-7 free base" }).click();
    await page.getByRole("group", { name: "Confirm delete" }).getByRole("button", { name: "Delete", exact: true }).click();
    await waitForText(page.locator("#status"), /Deleted 'HB-7 free base'/);
    expect(await tryPH(page, "HB7 base", "10 mM")).toMatch(/Unknown substance/);
    const fingerprintBefore = await page.locator("#fingerprint").innerText();
    await chooseFile(page, "halvorsen-lab.json", exported);
    // the file is read asynchronously: wait for its preview (reading at once races a busy machine)
    const preview = await waitForText(page.locator("#import-preview"), /2 changes/);
    // the export stamp is shown before anything is applied
    expect(preview).toMatch(/Exported \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC by Protolyte \d+\.\d+\.\d+ \(workbook library\), constants fingerprint PL-/);
    expect(preview).toMatch(/HB-7 amine \(hb-7-amine\): replaces the workbook acid–base system/);
    expect(preview).toMatch(/HB-7 free base \(hb-7-free-base\): adds a new substance/);
    expect(await page.locator("#fingerprint").innerText()).toBe(fingerprintBefore); // nothing applied yet
    await page.click("#import-apply");
    await waitForText(page.locator("#import-outcome"), /Imported 'halvorsen-lab\.json'/);
    expect(await page.locator("#fingerprint").innerText()).not.toBe(fingerprintBefore);
    await tryPH(page, "HB7 base", "10 mM");
    expect(await currentPH(page)).toBeCloseTo(phEdited, 6);
  });

  test("a bad file is rejected with the reason and nothing changes", async () => {
    const before = { fp: await page.locator("#fingerprint").innerText(), stored: await page.evaluate((k) => localStorage.getItem(k), WORKBOOK_KEY) };
    await chooseFile(page, "broken.json", '{"format": "protolyte-library", "schemaVersion": 1, ');
    await waitForText(page.locator("#import-outcome"), /'broken\.json' was not imported \(nothing changed\): not valid JSON/);
    const invalid = JSON.stringify({ format: "protolyte-library", schemaVersion: 1, name: "x", systems: [{ id: "q", name: "q", topCharge: 0, steps: [{ pKa: { value: 99, unit: "1", conditions: "25 °C", status: "published", source: "goldberg2002" } }] }] });
    await chooseFile(page, "invalid.json", invalid);
    // named in words (the entry, the step, the field), not by its path in the file
    await waitForText(page.locator("#import-outcome"), /'invalid\.json' was not imported \(nothing changed\): invalid library: q, step 1, pKa: must be ≤ 30, found 99/);
    expect(await page.locator("#import-outcome").innerText()).not.toMatch(/systems\[0\]/);
    const huge = path.join(session.browser.profile, "huge.json");
    fs.writeFileSync(huge, Buffer.alloc(5 * 1024 * 1024 + 10, 32));
    await chooseFile(page, "huge.json", { path: huge });
    await waitForText(page.locator("#import-outcome"), /'huge\.json' was not imported: it is 5\.0 MB; library files are limited to 5\.0 MB/);
    expect(await page.locator("#import-preview").innerText()).toBe("");
    expect(await page.locator("#fingerprint").innerText()).toBe(before.fp);
    expect(await page.evaluate((k) => localStorage.getItem(k), WORKBOOK_KEY)).toBe(before.stored);
  });

  test("script-injection payloads in names render as inert text", async () => {
    // through the editor …
    await tab(page, "Add / edit");
    await page.getByLabel("Name", { exact: true }).fill(XSS_IMG);
    await page.fill('[data-path="steps[0].pKa.value"]', "5");
    await page.selectOption('[data-path="steps[0].pKa.status"]', "unverified");
    await page.fill('[data-path="steps[0].pKa.note"]', XSS_SCRIPT);
    await page.click("#editor-save");
    expect(await waitForText(page.locator("#editor-errors"), (t) => t.includes(`Saved '${XSS_IMG}'`))).toBeTruthy();
    // … and through an imported file, whose preview shows the names too
    const file = JSON.stringify({
      format: "protolyte-library",
      schemaVersion: 1,
      name: XSS_SCRIPT,
      ions: [
        { id: "xss-a", name: XSS_SCRIPT, charge: 1 },
        { id: "xss-b", name: XSS_IMG, formula: XSS_IMG, charge: -1 },
      ],
    });
    await chooseFile(page, `${XSS_IMG}.json`, file, "personal");
    expect(await waitForText(page.locator("#import-preview"), (t) => t.includes(XSS_SCRIPT))).toBeTruthy();
    await page.click("#import-apply");
    await search(page, "window.__injected");
    await waitForText(page.locator("#entry-count"), "3 entries");
    for (const li of await page.locator("#entries li .entry-head").all()) await li.click();
    const listText = await page.locator("#entries").innerText();
    expect(listText).toContain(XSS_IMG);
    expect(listText).toContain(XSS_SCRIPT);
    expect(await page.locator("#entries img, #entries script, #import-preview img, #editor-errors img").count()).toBe(0);
    expect(await page.locator("img").count()).toBe(0);
    expect(w.requests.filter((u) => /\/x$/.test(u))).toEqual([]);
  });

  test("entries survive a reload (browser storage)", async () => {
    const fp = await page.locator("#fingerprint").innerText();
    await page.reload();
    await page.waitForSelector("body[data-ready=true]");
    expect(await page.locator("#fingerprint").innerText()).toBe(fp);
    await search(page, "HB-7");
    expect(await attr(entry(page, "system", "hb-7-amine"), "data-layer")).toBe("workbook");
    expect(await attr(entry(page, "substance", "hb-7-free-base"), "data-layer")).toBe("workbook");
    await search(page, "window.__injected");
    expect(await page.locator("#entries li[data-layer=personal]").count()).toBe(2);
    await tryPH(page, "HB-7 free base", "0.01");
    expect(await currentPH(page)).toBeCloseTo(phEdited, 6);
  });

  test("a damaged stored layer is reported, exported as stored, and reset only on request", async () => {
    const damaged = '{"format":"protolyte-stored-library","blobVersion":1,"savedAt":"x","library":{"broken';
    await page.evaluate(([k, v]) => localStorage.setItem(k, v), [WORKBOOK_KEY, damaged]);
    await page.reload();
    await page.waitForSelector("body[data-ready=true]");
    const banner = page.locator('#problems [data-layer="workbook"]');
    await waitForText(banner, /The stored workbook library \(browser page \(no workbook\)\) is damaged/);
    await waitForText(banner, /Nothing has been discarded/);
    // the workbook entries are out of effect, the personal ones still apply, the text is kept
    await search(page, "HB-7");
    await waitForText(page.locator("#entry-count"), "0 entries");
    expect(await page.evaluate((k) => localStorage.getItem(k), WORKBOOK_KEY)).toBe(damaged);
    const [download] = await Promise.all([page.waitForEvent("download"), page.click("#problem-export-workbook")]);
    expect(fs.readFileSync((await download.path()) as string, "utf8")).toBe(damaged);
    await page.screenshot({ path: path.join(ARTIFACTS, "taskpane-damaged.png"), fullPage: false });
    await page.click("#problem-reset-workbook");
    expect(await page.evaluate((k) => localStorage.getItem(k), WORKBOOK_KEY)).toBe(damaged); // asking is not doing
    await page.click("#problem-reset-confirm-workbook");
    await waitForText(page.locator("#problems"), "");
    expect(await page.evaluate((k) => localStorage.getItem(k), WORKBOOK_KEY)).toBeNull();
  });

  test("tabs work from the keyboard", async () => {
    await page.getByRole("tab", { name: "Browse" }).focus();
    await page.keyboard.press("ArrowRight");
    expect(await focused(page.getByRole("tab", { name: "Add / edit" }))).toBe(true);
    expect(await page.locator("#panel-edit").isVisible()).toBe(true);
    await page.keyboard.press("End");
    expect(await attr(page.getByRole("tab", { name: "About" }), "aria-selected")).toBe("true");
    await waitForText(page.locator("#panel-about"), /calibrated pH meter/);
  });
});

describe("task pane when office.js cannot load at all", () => {
  test("works offline against browser storage", async () => {
    const session = await startPane({ route: (context, requests) => routeOffice(context, "fail", requests) });
    const { page, w } = session;
    const requests = w.requests;
    try {
      expect(requests.some((u) => u.endsWith("/office.js"))).toBe(true);
      await waitForText(page.locator("#where"), /The Office library \(office\.js\) did not load/);
      await waitForText(page.locator("#fingerprint"), /^PL-/);
      expect(await tryPH(page, "acetic acid", "0.1")).toMatch(/pH/);
      const pH = Number(await page.locator("#try-ph").innerText());
      // 0.1 M acetic acid, pKa 4.756: pH ≈ 2.88
      expect(pH).toBeGreaterThan(2.8);
      expect(pH).toBeLessThan(2.95);
      await tab(page, "Add / edit");
      await page.getByLabel("Name", { exact: true }).fill("Halvorsen offline acid");
      await page.fill('[data-path="steps[0].pKa.value"]', "3.5");
      await page.selectOption('[data-path="steps[0].pKa.status"]', "common-practice");
      await page.fill('[data-path="steps[0].pKa.note"]', "offline check");
      await page.click("#editor-save");
      await waitForText(page.locator("#editor-errors"), /Saved 'Halvorsen offline acid'/);
      expect(w.errors).toEqual([]);
      expect(w.csp).toEqual([]);
    } finally {
      await session.close();
    }
  });
});
