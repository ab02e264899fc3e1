/**
 * The Picture view in headless Chromium (Debian's /usr/bin/chromium through playwright-core),
 * outside Office: a phosphate mixture entered in Try it, drawn as a speciation diagram and a
 * titration curve at the pane's width (350 px). Checks what is drawn (a line per form, axes with
 * units, the mixture's pH, equivalence markers), that the layout holds at that width in the real
 * browser (nothing overlapping or cut off), the text fallbacks, the settings, and that nothing breaks
 * the Content-Security-Policy. Screenshots: test-artifacts/pane-speciation.png, pane-curve.png.
 *
 * Then the same pane "inside Excel": office.js is replaced by a stand-in whose Excel is the hand
 * mock of the unit tests (support/fake-office.ts), to see the view follow the selected cell's AQ
 * formula, fall back to Try it, and stop following when another tab opens. What Excel returns is
 * the mock's assumption.
 */
import * as fs from "fs";
import * as path from "path";
import type { Locator, Page } from "playwright-core";
import { routeOffice, ROOT } from "./support/browser";
import { waitForText } from "./support/page-watch";
import type { WorkbookModel } from "./support/fake-excel-workbook";
import { routeFakeOffice } from "./support/fake-office";
import { NO_PROBLEMS, startPane, type PaneSession, fillTry } from "./support/pane-session";

jest.setTimeout(120000);

const ARTIFACTS = path.join(ROOT, "test-artifacts");
const PANE_WIDTH = 350;

interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Bounding boxes (page pixels) of the elements a locator matches. */
async function boxes(loc: Locator): Promise<(Box & { text: string })[]> {
  return loc.evaluateAll((els) =>
    els.map((e) => {
      const r = e.getBoundingClientRect();
      return { x: r.x, y: r.y, width: r.width, height: r.height, text: e.textContent ?? "" };
    }),
  );
}

function overlaps(a: Box, b: Box): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/** No two boxes overlap, and each lies inside the frame (with a pixel of slack for antialiasing). */
function expectApartAndInside(label: string, items: (Box & { text: string })[], frame: Box): void {
  for (let i = 0; i < items.length; i++) {
    const a = items[i];
    const inside = a.x >= frame.x - 1 && a.y >= frame.y - 1 && a.x + a.width <= frame.x + frame.width + 1 && a.y + a.height <= frame.y + frame.height + 1;
    expect({ label, text: a.text, inside }).toEqual({ label, text: a.text, inside: true });
    for (let j = i + 1; j < items.length; j++) {
      expect({ label, pair: [a.text, items[j].text], overlap: overlaps(a, items[j]) }).toEqual({ label, pair: [a.text, items[j].text], overlap: false });
    }
  }
}

/** Poll an SVG element's text (SVG elements have no innerText) until it is `expected`. */
async function waitForContent(loc: Locator, expected: string, timeout = 8000): Promise<void> {
  const end = Date.now() + timeout;
  let last: string | null = null;
  while ((last = await loc.textContent({ timeout: 1000 }).catch(() => null)) !== expected) {
    if (Date.now() > end) throw new Error(`expected ${JSON.stringify(expected)}, found ${JSON.stringify(last)}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

describe("Picture view in Chromium at the pane's width", () => {
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

  test("with no mixture yet, the view says where one comes from", async () => {
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), "No mixture yet: enter one in Try it.");
    expect(await page.locator("#panel-picture svg").count()).toBe(0);
  });

  test("a phosphate mixture from Try it: one line per form, labelled axes, the mixture's pH, title, description", async () => {
    await fillTry(page, [
      ["sodium dihydrogen phosphate", "10 mM"],
      ["disodium hydrogen phosphate", "10 mM"],
    ]);
    await page.click("#try-run");
    const tryPH = Number(await page.locator("#try-ph").innerText());
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), /^From the Try it mixture: 10 mM sodium dihydrogen phosphate \+ 10 mM disodium hydrogen phosphate, 25 °C\.$/);
    expect(Number(await page.locator("#picture-ph").innerText())).toBe(tryPH);
    const svg = page.locator("#picture-speciation svg.speciation");
    expect(await svg.count()).toBe(1);
    expect(await svg.getAttribute("data-system")).toBe("phosphate");
    const species = await svg.locator("path.species-line").evaluateAll((ps) => ps.map((p) => ({ name: p.getAttribute("data-species"), length: (p as SVGPathElement).getTotalLength() })));
    expect(species.map((s) => s.name)).toEqual(["H3PO4", "H2PO4-", "HPO4^2-", "PO4^3-"]);
    for (const s of species) expect(s.length).toBeGreaterThan(100); // drawn, not empty
    const titles = await svg.locator(".axis-title").allTextContents();
    expect(titles).toEqual(["pH", "% of phosphate"]);
    expect(await svg.evaluate((e) => [e.namespaceURI, e.firstElementChild?.tagName, e.firstElementChild?.nextElementSibling?.tagName])).toEqual(["http://www.w3.org/2000/svg", "title", "desc"]);
    expect(await svg.getAttribute("role")).toBe("img");
    expect(await svg.getAttribute("aria-label")).toMatch(new RegExp(`^Forms of phosphate from pH 0 to 14 at 25 °C.*At the mixture's pH ${tryPH.toFixed(2).replace(".", "\\.")}:`));
    // the marker sits at the mixture's pH on the axis: between the ticks 6 and 8, in proportion
    const tick = async (label: string) => (await boxes(svg.locator(".x-axis text", { hasText: new RegExp(`^${label}$`) })))[0];
    const [t6, t8] = [await tick("6"), await tick("8")];
    const line = (await boxes(svg.locator(".mixture-ph line")))[0];
    const expectedX = t6.x + t6.width / 2 + ((t8.x + t8.width / 2 - (t6.x + t6.width / 2)) * (tryPH - 6)) / 2;
    expect(Math.abs(line.x + line.width / 2 - expectedX)).toBeLessThan(1.5);
  });

  test("the speciation figure fits 350 px: no overflow, tick labels, legend and marker label apart and inside", async () => {
    const fig = page.locator("#picture-speciation figure").first();
    const svg = fig.locator("svg");
    const frame = (await boxes(svg))[0];
    expect(frame.x).toBeGreaterThanOrEqual(0);
    expect(frame.x + frame.width).toBeLessThanOrEqual(PANE_WIDTH);
    expect(frame.width).toBeGreaterThan(300);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PANE_WIDTH);
    expectApartAndInside("x ticks", await boxes(svg.locator(".x-axis text")), frame);
    expectApartAndInside("y ticks", await boxes(svg.locator(".y-axis text")), frame);
    expectApartAndInside("legend", await boxes(svg.locator(".legend-item")), frame);
    expectApartAndInside("marker label", await boxes(svg.locator(".mixture-ph text")), frame);
    // the legend is below the plot, and readable (text at least 10 px high)
    const plotBottom = Math.max(...(await boxes(svg.locator(".x-axis .axis-title"))).map((b) => b.y + b.height));
    for (const b of await boxes(svg.locator(".legend-item text"))) {
      expect(b.y).toBeGreaterThanOrEqual(plotBottom);
      expect(b.height).toBeGreaterThanOrEqual(10);
    }
    await fig.screenshot({ path: path.join(ARTIFACTS, "pane-speciation.png") });
  });

  test("the titration curve: a line, an equivalence marker at 1.00 mL of 0.1 M NaOH, axes with units, fitting the pane", async () => {
    const svg = page.locator("#picture-curve svg.titration");
    expect(await svg.getAttribute("data-titrant")).toBe("NaOH");
    expect(await svg.locator("path.curve-line").count()).toBe(1);
    expect(await svg.locator("path.curve-line").evaluate((p) => (p as SVGPathElement).getTotalLength())).toBeGreaterThan(200);
    const markers = svg.locator(".eq-marker");
    expect(await markers.count()).toBeGreaterThanOrEqual(1);
    expect(Number(await markers.first().getAttribute("data-ml"))).toBeCloseTo(1.0, 2);
    expect(await svg.locator(".axis-title").allTextContents()).toEqual(["mL of 0.1 M NaOH added to 10 mL", "pH"]);
    expect(await svg.getAttribute("aria-label")).toMatch(/Equivalence point at 1\.00 mL \(pH 9\.\d\d\)\.$/);
    await waitForText(page.locator("#picture-titrant-reason"), /^NaOH: from pH 6\.96 the mixture takes about as much strong base/);
    const frame = (await boxes(svg))[0];
    expect(frame.x + frame.width).toBeLessThanOrEqual(PANE_WIDTH);
    expectApartAndInside("x ticks", await boxes(svg.locator(".x-axis text")), frame);
    expectApartAndInside("y ticks", await boxes(svg.locator(".y-axis text")), frame);
    expectApartAndInside("legend", await boxes(svg.locator(".legend-item")), frame);
    // the ring is on the curve: its centre within a pixel of the path's points near it
    const onCurve = await svg.evaluate((s) => {
      const ring = s.querySelector(".eq-marker circle") as SVGCircleElement;
      const path = s.querySelector("path.curve-line") as SVGPathElement;
      const cx = ring.cx.baseVal.value;
      const cy = ring.cy.baseVal.value;
      let best = Infinity;
      const n = path.getTotalLength();
      for (let l = 0; l <= n; l += 0.25) {
        const p = path.getPointAtLength(l);
        best = Math.min(best, Math.hypot(p.x - cx, p.y - cy));
      }
      return best;
    });
    expect(onCurve).toBeLessThan(1.5);
    await page.locator("#picture-curve figure").first().screenshot({ path: path.join(ARTIFACTS, "pane-curve.png") });
  });

  test("text fallbacks: the numbers behind each picture", async () => {
    await page.locator("#picture-speciation details summary").first().click();
    const spec = await page.locator("#picture-speciation table.numbers").first().innerText();
    expect(spec).toMatch(/H₂PO₄⁻\s+50 %/);
    expect(spec).toMatch(/HPO₄²⁻\s+50 %/);
    expect(spec).toMatch(/H₂PO₄⁻ = HPO₄²⁻\s+pH 6\.96/);
    await page.locator("#picture-curve details summary").first().click();
    const curve = await page.locator("#picture-curve table.numbers").innerText();
    expect(curve).toMatch(/1\.00\s+9\.\d\d\s+equivalence/);
    expect(curve.split("\n").length).toBeGreaterThan(8);
  });

  test("settings: HCl as titrant, a weaker stock doubles the volume, a bad stock is reported", async () => {
    await page.selectOption("#picture-titrant", "HCl");
    const svg = page.locator("#picture-curve svg.titration");
    await waitForText(page.locator("#picture-titrant-reason"), "HCl, as chosen.");
    expect(await svg.getAttribute("data-titrant")).toBe("HCl");
    expect(Number(await svg.locator(".eq-marker").first().getAttribute("data-ph"))).toBeLessThan(5);
    await page.fill("#picture-stock", "50 mM");
    await page.click("#picture-redraw");
    await waitForContent(page.locator("#picture-curve .axis-title").first(), "mL of 50 mM HCl added to 10 mL");
    expect(Number(await svg.locator(".eq-marker").first().getAttribute("data-ml"))).toBeCloseTo(2.0, 2);
    await page.fill("#picture-stock", "plenty");
    await page.click("#picture-redraw");
    await waitForText(page.locator("#picture-curve"), /No titration curve: titrant stock: Cannot read "plenty"/);
    await page.fill("#picture-stock", "0.1 M");
    await page.selectOption("#picture-titrant", "auto");
    await waitForContent(page.locator("#picture-curve .axis-title").first(), "mL of 0.1 M NaOH added to 10 mL");
  });

  test("a mixture of two systems gives two diagrams; an unknown name gives the reason and no picture", async () => {
    await fillTry(page, [
      ["citric acid", "10 mM"],
      ["disodium hydrogen phosphate", "20 mM"],
    ], "37");
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), /37 °C\.$/);
    expect(await page.locator("#picture-speciation svg.speciation").evaluateAll((s) => s.map((e) => e.getAttribute("data-system")))).toEqual(["citrate", "phosphate"]);
    await fillTry(page, [["phosphoric acid", "10 mM"], ["unobtainium", "1 mM"]]);
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-facts"), /No picture:.*row 2 \(name\)/s);
    expect(await page.locator("#panel-picture svg").count()).toBe(0);
    await fillTry(page, [["phosphoric acid", "10 mM"], ["", ""]]);
    await page.getByRole("tab", { name: "Picture" }).click();
    expect(await page.locator("#picture-curve .eq-marker").count()).toBe(2);
    await page.screenshot({ path: path.join(ARTIFACTS, "pane-picture.png"), fullPage: true });
  });

  test("2 M NaOH: Try it and the Picture show the function's refusal beyond the ionic-strength limit, no pH", async () => {
    // the message is =AQ.PH("NaOH",2)'s (test/taskpane/ionic-limit.test.ts compares them); the issue saw pH 14.30 here
    const refusal = /The ionic strength would be 2 mol\/L, beyond the 1 mol\/L limit of the activity models: no pH or pH-derived value is given\./;
    await fillTry(page, [["NaOH", "2"], ["", ""]]);
    await page.click("#try-run");
    await waitForText(page.locator("#try-result"), (t) => /No result:/.test(t) && refusal.test(t));
    expect(await page.locator("#try-ph").count()).toBe(0);
    expect(await page.locator("#try-result").innerText()).not.toMatch(/\b1[45]\.\d/);
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-facts"), (t) => /No picture:/.test(t) && refusal.test(t));
    expect(await page.locator("#picture-ph").count()).toBe(0);
    expect(await page.locator("#panel-picture svg").count()).toBe(0);
    expect(await page.locator("#panel-picture").innerText()).not.toMatch(/\b1[45]\.\d/);
    await page.screenshot({ path: path.join(ARTIFACTS, "pane-ionic-limit.png"), fullPage: true });
    // 1 M NaOH, at the limit, is answered again
    await fillTry(page, [["NaOH", "1"], ["", ""]]);
    await page.click("#try-run");
    await waitForText(page.locator("#try-ph"), /^13\.\d\d$/);
  });

  test("the Picture tab is reached from the keyboard and leaves its panel when another tab opens", async () => {
    await page.getByRole("tab", { name: "Try it" }).focus();
    await page.keyboard.press("ArrowRight");
    expect(await page.getByRole("tab", { name: "Picture" }).getAttribute("aria-selected")).toBe("true");
    expect(await page.locator("#panel-picture").isVisible()).toBe(true);
    await page.keyboard.press("ArrowRight");
    expect(await page.locator("#panel-picture").isVisible()).toBe(false);
  });
});

const WORKBOOK: WorkbookModel = {
  sheets: [
    {
      name: "Sheet1",
      cells: {
        A1: { value: "substance" },
        A2: { value: "sodium dihydrogen phosphate" },
        A3: { value: "disodium hydrogen phosphate" },
        B2: { value: 0.01 },
        B3: { value: "10 mM" },
        C1: { value: 25 },
        D2: { formula: "=AQ.PH(A2:A3,B2:B3,C1)", value: 6.96 },
        D3: { formula: "=ROUND(AQ.BETA('Acetate buffer'!$A$2:$A$3,'Acetate buffer'!$B$2:$B$3,37),4)", value: 0.05 },
        D4: { value: 7 },
        D5: { formula: '=AQ.CURVE(A2:A3,B2:B3,"NaOH",0.1,0.025,0.03,61)', value: 0 },
      },
    },
    { name: "Acetate buffer", cells: { A2: { value: "acetic acid" }, A3: { value: "sodium acetate" }, B2: { value: 0.1 }, B3: { value: 0.1 } } },
  ],
  active: { sheet: "Sheet1", cell: "D2" },
};

describe("Picture view inside Excel (a stand-in office.js over the hand mock of Excel)", () => {
  let session: PaneSession;
  let page: Page;

  const fakeExcel = <T>(fn: string, ...args: unknown[]): Promise<T> =>
    page.evaluate(([f, a]) => {
      const x = (window as unknown as { __fakeExcel: Record<string, (...v: unknown[]) => unknown> }).__fakeExcel;
      return x[f as string](...(a as unknown[])) as T;
    }, [fn, args] as const);
  const reads = () => page.evaluate(() => (window as unknown as { __fakeExcel: { activeCellReads: number } }).__fakeExcel.activeCellReads);

  beforeAll(async () => {
    session = await startPane({ route: (context, requests) => routeFakeOffice(context, WORKBOOK, requests), width: PANE_WIDTH, deviceScaleFactor: 2 });
    page = session.page;
  });

  afterAll(async () => {
    await session?.close();
  });

  afterEach(async () => {
    expect(await session.problems()).toEqual(NO_PROBLEMS);
  });

  test("the pane knows it is in Excel, and follows nothing until the Picture tab opens", async () => {
    await waitForText(page.locator("#where"), /^In Excel\./);
    expect(await fakeExcel<number>("handlerCount")).toBe(0);
    expect(await reads()).toBe(0);
  });

  test("opening the Picture tab reads the selected cell's formula and draws its mixture", async () => {
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), "From the selected cell Sheet1!D2: =AQ.PH(A2:A3,B2:B3,C1)");
    expect(await page.locator("#picture-speciation svg.speciation").getAttribute("data-system")).toBe("phosphate");
    expect(await page.locator("#picture-ph").innerText()).toBe("6.96");
    expect(await fakeExcel<number>("handlerCount")).toBe(2); // worksheets.onSelectionChanged and onActivated
    await page.locator("#panel-picture").screenshot({ path: path.join(ARTIFACTS, "pane-excel-selection.png") });
  });

  test("selecting another AQ cell redraws with its mixture: ranges on another sheet, the temperature inline", async () => {
    await fakeExcel("select", "Sheet1", "D3");
    await fakeExcel("fireSelectionChanged");
    await waitForText(page.locator("#picture-source"), "From the selected cell Sheet1!D3: =ROUND(AQ.BETA('Acetate buffer'!$A$2:$A$3,'Acetate buffer'!$B$2:$B$3,37),4)");
    expect(await page.locator("#picture-speciation svg.speciation").getAttribute("data-system")).toBe("acetate");
    await waitForText(page.locator("#picture-facts"), /^pH 4\.\d\d · 37 °C/);
  });

  test("a cell without an AQ formula: the reason, then the Try it mixture", async () => {
    await fakeExcel("select", "Sheet1", "D4");
    await fakeExcel("fireSelectionChanged");
    await waitForText(page.locator("#picture-source"), /The selected cell Sheet1!D4: the cell holds a value, not a formula\.\s+Showing the Try it mixture instead\.\s+No mixture yet: enter one in Try it\./);
    await fillTry(page, [["Tris", "20 mM"], ["Tris HCl", "20 mM"]]);
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), /From the Try it mixture: 20 mM Tris \+ 20 mM Tris HCl, 25 °C\.$/);
    expect(await page.locator("#picture-speciation svg.speciation").getAttribute("data-system")).toBe("tris");
  });

  test("an AQ.CURVE cell: the picture titrates as the formula does, until the settings are changed", async () => {
    await fakeExcel("select", "Sheet1", "D5");
    await fakeExcel("fireSelectionChanged");
    await waitForText(page.locator("#picture-formula-titration"), "Titration as in the formula: 0.1 M NaOH, 25 mL sample, up to 30 mL.");
    const svg = page.locator("#picture-curve svg.titration");
    await waitForContent(svg.locator(".axis-title").first(), "mL of 0.1 M NaOH added to 25 mL");
    expect((await svg.locator(".x-axis text").allTextContents()).slice(-2)).toEqual(["30", "mL of 0.1 M NaOH added to 25 mL"]);
    expect(Number(await svg.locator(".eq-marker").first().getAttribute("data-ml"))).toBeCloseTo(2.5, 2);
    expect(await page.locator("#picture-sample").inputValue()).toBe("25 mL");
    await page.fill("#picture-sample", "10 mL");
    await page.click("#picture-redraw");
    await waitForText(page.locator("#picture-formula-titration"), "Titration settings changed from the formula's.");
    await waitForContent(svg.locator(".axis-title").first(), "mL of 0.1 M NaOH added to 10 mL");
    expect(Number(await svg.locator(".eq-marker").first().getAttribute("data-ml"))).toBeCloseTo(1.0, 2);
  });

  test("leaving the tab removes the handlers: selection changes are no longer read; coming back reads again", async () => {
    await page.getByRole("tab", { name: "Browse" }).click();
    for (let i = 0; (await fakeExcel<number>("handlerCount")) !== 0; i++) {
      if (i > 100) throw new Error("the selection handlers were not removed");
      await new Promise((r) => setTimeout(r, 20));
    }
    const before = await reads();
    await fakeExcel("select", "Sheet1", "D2");
    await fakeExcel("fireSelectionChanged");
    await new Promise((r) => setTimeout(r, 400));
    expect(await reads()).toBe(before);
    await page.getByRole("tab", { name: "Picture" }).click();
    await waitForText(page.locator("#picture-source"), "From the selected cell Sheet1!D2: =AQ.PH(A2:A3,B2:B3,C1)");
    expect(await fakeExcel<number>("handlerCount")).toBe(2);
    expect(await reads()).toBe(before + 1);
  });
});
