/**
 * The Picture view's data and drawings without a browser: speciation over pH 0–14 (identities,
 * the phosphate crossing at pKa2 as the activity model moves it, agreement with the solver), the
 * titration curve (monotone, equivalence points where the stoichiometry puts them, the automatic
 * titrant), and the SVG renderers on a small stand-in DOM.
 */
import { daviesLog10Gamma, debyeHuckelA, solveEquilibrium } from "../../src/chem";
import { getActiveLibrary, resetActiveLibrary } from "../../src/library";
import { renderCurve, pHWindow } from "../../src/taskpane/charts/curve-svg";
import { displayName } from "../../src/taskpane/charts/palette";
import { pictureOf, titrantOf, titrants } from "../../src/taskpane/charts/picture";
import { fractionsAt, speciation, type SpeciationData } from "../../src/taskpane/charts/speciation";
import { renderSpeciation, visibleRun } from "../../src/taskpane/charts/speciation-svg";
import { SVG_NS } from "../../src/taskpane/charts/svg";
import { niceCeil, niceStep, tickLabels, ticks } from "../../src/taskpane/charts/ticks";
import { titratableAmounts, titration, type TitrationData } from "../../src/taskpane/charts/titration";
import { parsePaneMixture, type TryRow } from "../../src/taskpane/tryit";
import { fake, fakeDocument, type FakeElement } from "./support/fake-svg-dom";

const PHOSPHATE: TryRow[] = [
  { name: "sodium dihydrogen phosphate", amount: "10 mM" },
  { name: "disodium hydrogen phosphate", amount: "10 mM" },
];

function mix(rows: TryRow[], temperature = "25") {
  const m = parsePaneMixture(getActiveLibrary(), rows, temperature);
  if (!m.ok) throw new Error(JSON.stringify(m.issues));
  return m;
}

function spec(rows: TryRow[], opts: { temperature?: string; activity?: "davies" | "ideal" | "debye-huckel" } = {}): SpeciationData {
  const m = mix(rows, opts.temperature);
  const s = speciation(m.mix, { temperatureC: m.temperatureC, activity: opts.activity });
  if (!s.ok) throw new Error(s.message);
  return s;
}

function curveOf(rows: TryRow[], titrant: "auto" | "NaOH" | "HCl" = "auto", stockConc?: number): TitrationData {
  const m = mix(rows);
  const t = titration(m.mix, titrants(getActiveLibrary()), spec(rows), { titrant, stockConc });
  if (!t.ok) throw new Error(t.message);
  return t;
}

/** pH where two sampled curves cross (linear interpolation between the samples around the sign change). */
function crossing(pH: number[], a: number[], b: number[]): number {
  for (let i = 1; i < pH.length; i++) {
    const d0 = a[i - 1] - b[i - 1];
    const d1 = a[i] - b[i];
    if (d0 > 0 && d1 <= 0) return pH[i - 1] + ((pH[i] - pH[i - 1]) * d0) / (d0 - d1);
  }
  return NaN;
}

beforeAll(() => resetActiveLibrary());

describe("speciation over pH 0–14", () => {
  const cases: [string, TryRow[], string][] = [
    ["phosphate buffer", PHOSPHATE, "25"],
    ["citrate + phosphate at 37 °C", [{ name: "citric acid", amount: "10 mM" }, { name: "disodium hydrogen phosphate", amount: "20 mM" }], "37"],
    ["histidine (charge +2 at the top)", [{ name: "L-histidine", amount: "25 mM" }, { name: "hydrochloric acid", amount: "10 mM" }], "5"],
  ];

  test.each(cases)("%s: the fractions of every system sum to 1 at every pH, each within 0–1", (_, rows, t) => {
    const d = spec(rows, { temperature: t });
    expect(d.pH.length).toBe(281);
    expect(d.pH[0]).toBe(0);
    expect(d.pH[d.pH.length - 1]).toBe(14);
    for (const sys of d.systems) {
      for (let i = 0; i < d.pH.length; i++) {
        const fs = sys.species.map((s) => s.fractions[i]);
        const sum = fs.reduce((a, b) => a + b, 0);
        if (Math.abs(sum - 1) > 1e-12 || fs.some((f) => !(f >= 0 && f <= 1))) throw new Error(`${sys.id} at pH ${d.pH[i]}: ${fs.join(", ")} (sum ${sum})`);
      }
    }
  });

  test.each(cases)("%s: at the mixture's pH the fractions are the solver's own speciation", (_, rows, t) => {
    const m = mix(rows, t);
    const d = spec(rows, { temperature: t });
    const eq = solveEquilibrium(m.mix, { temperatureC: m.temperatureC });
    if (!eq.ok) throw new Error(eq.message);
    expect(d.mixturePH).toBe(eq.pH);
    for (const sys of d.systems) {
      const solved = eq.species.filter((s) => s.systemId === sys.id);
      expect(sys.species.map((s) => s.name)).toEqual(solved.map((s) => s.name));
      sys.species.forEach((s, k) => {
        expect({ species: s.name, diff: Math.abs(s.atMixture - solved[k].fraction) < 1e-9 * Math.max(1e-300, solved[k].fraction) + 1e-15 }).toEqual({ species: s.name, diff: true });
      });
    }
  });

  test("phosphate: H2PO4- and HPO4^2- cross at pKa2 moved by the Davies term, and at pKa2 itself with ideal activity", () => {
    const d = spec(PHOSPHATE);
    const sys = d.systems.find((s) => s.id === "phosphate")!;
    expect(sys.species.map((s) => s.name)).toEqual(["H3PO4", "H2PO4-", "HPO4^2-", "PO4^3-"]);
    const x = crossing(d.pH, sys.species[1].fractions, sys.species[2].fractions);
    // independent of the chart code: the acid form of step 2 has charge −1, so on the meter scale
    // pKa2' = pKa2 + log10(γ(HPO4²⁻)) − log10(γ(H2PO4⁻)) − … = pKa2 − 3·A·f(I) (Davies)
    const A = debyeHuckelA(25);
    // pKa2 as the built-in library holds it (its source is named in data/systems.json)
    const pKa2 = getActiveLibrary().system("phosphate")!.steps[1].pKa;
    expect(Math.abs(pKa2 - 7.198)).toBeLessThan(0.005); // the textbook value, as a sanity bound
    const expected = pKa2 + 3 * daviesLog10Gamma(1, d.ionicStrength, A);
    expect(Math.abs(x - expected)).toBeLessThan(0.002);
    expect(Math.abs(sys.crossings[1] - expected)).toBeLessThan(1e-9);
    expect(expected).toBeLessThan(7.0); // the ionic strength (0.04 mol/L) lowers it by about 0.24
    const ideal = spec(PHOSPHATE, { activity: "ideal" }).systems[0];
    expect(Math.abs(crossing(d.pH, ideal.species[1].fractions, ideal.species[2].fractions) - pKa2)).toBeLessThan(0.002);
  });

  test("Tris crosses lower at 37 °C than at 25 °C (its pKa falls with temperature)", () => {
    const rows = [{ name: "Tris", amount: "20 mM" }, { name: "Tris HCl", amount: "20 mM" }];
    const at25 = spec(rows, { temperature: "25" }).systems[0].crossings[0];
    const at37 = spec(rows, { temperature: "37" }).systems[0].crossings[0];
    expect(at25 - at37).toBeGreaterThan(0.25);
    expect(at25 - at37).toBeLessThan(0.4);
  });

  test("a mixture without an acid–base system has no curves, and the fraction formula stays finite at the extremes", () => {
    const d = spec([{ name: "sodium chloride", amount: "0.1" }]);
    expect(d.systems).toEqual([]);
    expect(Math.abs(d.mixturePH - 7)).toBeLessThan(0.1);
    const f = fractionsAt([-3, 1.99, 40], 14);
    expect(f.every(Number.isFinite)).toBe(true);
    expect(f.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
    expect(f[2]).toBeGreaterThan(0.999); // pH 14 is far above the first two steps and far below the third
  });
});

describe("titration curve", () => {
  test("with NaOH the pH never falls, with HCl it never rises; the curve starts at the mixture's pH", () => {
    const up = curveOf(PHOSPHATE, "NaOH");
    const down = curveOf(PHOSPHATE, "HCl");
    const start = spec(PHOSPHATE).mixturePH;
    for (const [t, sign] of [[up, 1], [down, -1]] as const) {
      expect(t.points.length).toBe(161);
      expect(Math.abs(t.startPH - start)).toBeLessThan(1e-9);
      for (let i = 1; i < t.points.length; i++) {
        expect(t.points[i].mL).toBeGreaterThan(t.points[i - 1].mL);
        if (sign * (t.points[i].pH - t.points[i - 1].pH) < -1e-9) throw new Error(`not monotone at ${t.points[i].mL} mL`);
      }
    }
    expect(up.points[up.points.length - 1].pH).toBeGreaterThan(11);
    expect(down.points[down.points.length - 1].pH).toBeLessThan(3);
  });

  test("equivalence points where the stoichiometry puts them: 10 mM of H2PO4- in 10 mL takes 1.00 mL of 0.1 M NaOH", () => {
    const up = curveOf(PHOSPHATE, "NaOH");
    expect(up.equivalence.length).toBe(1);
    expect(Math.abs(up.equivalence[0].mL - 1.0)).toBeLessThan(0.01);
    expect(up.equivalence[0].pH).toBeGreaterThan(9);
    expect(up.equivalence[0].pH).toBeLessThan(10);
    expect(up.maxML).toBeGreaterThan(up.equivalence[0].mL);
    const down = curveOf(PHOSPHATE, "HCl");
    expect(Math.abs(down.equivalence[0].mL - 1.0)).toBeLessThan(0.01);
    expect(down.equivalence[0].pH).toBeGreaterThan(4);
    expect(down.equivalence[0].pH).toBeLessThan(5);
    // half the stock concentration, twice the volume
    const dilute = curveOf(PHOSPHATE, "NaOH", 0.05);
    expect(Math.abs(dilute.equivalence[0].mL - 2.0)).toBeLessThan(0.02);
    expect(dilute.stockConc).toBe(0.05);
  });

  test.each([
    ["acetic acid", [{ name: "acetic acid", amount: "0.1" }], "NaOH", /but none of strong acid/],
    ["Tris base", [{ name: "Tris", amount: "20 mM" }], "HCl", /21 mmol\/L of strong acid to reach pH 3, but 0\.99 mmol\/L of strong base/],
    ["an equimolar phosphate buffer", PHOSPHATE, "NaOH", /about as much strong base/],
    ["hydrochloric acid", [{ name: "hydrochloric acid", amount: "10 mM" }], "NaOH", /NaOH:/],
  ] as [string, TryRow[], string, RegExp][])("the automatic titrant for %s is %s, with the reason in numbers", (_, rows, expected, reason) => {
    const t = curveOf(rows);
    expect(t.titrant).toBe(expected);
    expect(t.reason).toMatch(reason);
  });

  test("a stock that cannot reach the usual end (hot, pKw lower) still shows the equivalence point, and says so", () => {
    const m = mix(PHOSPHATE, "90");
    const sp = spec(PHOSPHATE, { temperature: "90" });
    const t = titration(m.mix, titrants(getActiveLibrary()), sp, { titrant: "NaOH" });
    if (!t.ok) throw new Error(t.message);
    expect(t.equivalence.length).toBe(1);
    expect(Math.abs(t.equivalence[0].mL - 1)).toBeLessThan(0.01);
    expect(t.maxML).toBeGreaterThan(2);
    expect(t.warnings.join(" ")).toMatch(/cannot bring this sample to pH 11\.5 at 90 °C: the curve goes to about pH 10\.\d/);
    // a titrant that cannot move the pH the asked way gives a short curve and a warning, not a failure
    const strongBase = mix([{ name: "sodium hydroxide", amount: "0.1" }]);
    const same = titration(strongBase.mix, titrants(getActiveLibrary()), spec([{ name: "sodium hydroxide", amount: "0.1" }]), { titrant: "NaOH" });
    expect(same.ok && same.warnings).toEqual(["A 0.1 mol/L NaOH stock hardly moves this sample's pH: the curve stops at 20.0 mL."]);
  });

  test("titratable amounts: a weak acid's base side is its concentration", () => {
    const a = titratableAmounts(spec([{ name: "acetic acid", amount: "0.1" }]));
    expect(Math.abs(a.base - 0.1)).toBeLessThan(0.002); // + 1 mmol/L of OH⁻ at pH 11, − the free H⁺ at the start
    expect(a.acid).toBe(0);
  });

  test("pictureOf reports unknown substances and unreadable settings, and gives the entries used", () => {
    const lib = getActiveLibrary();
    const bad = pictureOf(lib, { rows: [{ name: "unobtainium", amount: "1" }], temperature: "" });
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.issues.join(" ")).toMatch(/row 1 \(name\)/);
    const stock = pictureOf(lib, { rows: PHOSPHATE, temperature: "", stock: "lots" });
    expect(stock.ok && stock.titration).toMatchObject({ ok: false, message: expect.stringMatching(/titrant stock/) });
    const zero = pictureOf(lib, { rows: PHOSPHATE, temperature: "", sample: "0 mL" });
    expect(zero.ok && zero.titration).toMatchObject({ ok: false, message: "sample volume must be more than 0" });
    const good = pictureOf(lib, { rows: PHOSPHATE, temperature: "37", stock: "50 mM", sample: "20 mL", titrant: "HCl" });
    if (!good.ok || !good.titration.ok) throw new Error("expected a picture");
    expect(good.speciation.temperatureC).toBe(37);
    expect(good.titration.data).toMatchObject({ titrant: "HCl", stockConc: 0.05 });
    expect(good.titration.data.sampleVolumeML).toBeCloseTo(20, 10);
    expect(good.used.map((u) => u.id)).toEqual(["sodium-dihydrogen-phosphate", "disodium-hydrogen-phosphate"]);
  });

  test("an AQ.CURVE formula's range is kept; its titrant names map to NaOH and HCl", () => {
    const lib = getActiveLibrary();
    const p = pictureOf(lib, { rows: PHOSPHATE, temperature: "", titrant: "NaOH", stock: "0.1 M", sample: "25 mL", maxVolume: "30 mL" });
    if (!p.ok || !p.titration.ok) throw new Error("expected a picture");
    expect(p.titration.data.maxML).toBeCloseTo(30, 9);
    expect(p.titration.data.points[p.titration.data.points.length - 1].mL).toBeCloseTo(30, 9);
    expect(Math.abs(p.titration.data.equivalence[0].mL - 2.5)).toBeLessThan(0.02); // 10 mM × 25 mL / 0.1 M
    expect(["NaOH", "sodium hydroxide", "caustic soda", "HCl", "hydrogen chloride", "KOH", "acetic acid", "nothing"].map((n) => titrantOf(lib, n))).toEqual(["NaOH", "NaOH", "NaOH", "HCl", "HCl", null, null, null]);
  });
});

describe("axes and names", () => {
  test("round ticks and labels", () => {
    expect(niceStep(2.5, 5)).toBe(0.5);
    expect(niceStep(14, 7)).toBe(2);
    expect(niceStep(15, 5)).toBe(5);
    expect(ticks(0, 2.5, 5)).toEqual([0, 0.5, 1, 1.5, 2, 2.5]);
    expect(ticks(0, 15, 5)).toEqual([0, 5, 10, 15]);
    expect(tickLabels([0, 0.5, 1])).toEqual(["0.0", "0.5", "1.0"]);
    expect(tickLabels([0, 5, 10])).toEqual(["0", "5", "10"]);
    expect([1.15, 11.5, 0.23, 3, 87].map(niceCeil)).toEqual([1.2, 12, 0.25, 3, 100]);
    expect(pHWindow([6.96, 11.6])).toEqual([6, 12]);
    expect(pHWindow([7.0, 7.4])).toEqual([4, 8]);
    expect(pHWindow([0.5, 13.9])).toEqual([0, 14]);
  });

  test("species names as a chemist writes them", () => {
    expect(["H3PO4", "H2PO4-", "HPO4^2-", "PO4^3-", "TrisH+", "CO2(aq)", "H3His^2+", "HEPES (zwitterion)", "phosphate H2L(1-)", "HOCH2CH2NH3+"].map(displayName)).toEqual([
      "H₃PO₄",
      "H₂PO₄⁻",
      "HPO₄²⁻",
      "PO₄³⁻",
      "TrisH⁺",
      "CO₂(aq)",
      "H₃His²⁺",
      "HEPES (zwitterion)",
      "phosphate H₂L(1-)",
      "HOCH₂CH₂NH₃⁺",
    ]);
  });

  test("a form's line leaves out the stretch where it lies on the axis, and reaches the axis at each end", () => {
    const run = visibleRun([0, 1, 2, 3, 4, 5], [0.5, 0.01, 0.0001, 0.0001, 0.0001, 0.2]);
    expect(run.map(([x]) => x)).toEqual([0, 1, 2, 3, 4, 5]);
    expect(run.map(([, f]) => Number.isNaN(f))).toEqual([false, false, false, true, false, false]);
  });
});

function texts(svg: FakeElement, cls: string): string[] {
  return svg.byClass(cls).map((e) => e.textContent);
}

function noStyleOrHandlers(svg: FakeElement): void {
  for (const e of svg.findAll(() => true)) {
    expect(e.namespaceURI).toBe(SVG_NS);
    for (const name of e.attributes.keys()) expect({ tag: e.tagName, name, ok: name !== "style" && !/^on/i.test(name) }).toEqual({ tag: e.tagName, name, ok: true });
  }
}

describe("SVG renderers", () => {
  test("speciation: one path per form with its name, labelled axes, the mixture's pH, title, desc and aria-label", () => {
    const d = spec(PHOSPHATE);
    const svg = fake(renderSpeciation(fakeDocument, d.systems[0], d));
    expect(svg.tagName).toBe("svg");
    expect(svg.getAttribute("role")).toBe("img");
    expect(svg.getAttribute("viewBox")).toMatch(/^0 0 320 \d+/);
    const paths = svg.byClass("species-line");
    expect(paths.map((p) => p.getAttribute("data-species"))).toEqual(["H3PO4", "H2PO4-", "HPO4^2-", "PO4^3-"]);
    for (const p of paths) expect(p.getAttribute("d")).toMatch(/^M[\d.]+ [\d.]+(L[\d.]+ [\d.]+)+/);
    expect(new Set(paths.map((p) => `${p.getAttribute("stroke")} ${p.getAttribute("stroke-dasharray")}`)).size).toBe(4);
    expect(texts(svg, "axis-title")).toEqual(["pH", "% of phosphate"]);
    const xTicks = svg.byClass("x-axis")[0].byTag("text").map((t) => t.textContent);
    expect(xTicks).toEqual(["0", "2", "4", "6", "8", "10", "12", "14", "pH"]);
    const marker = svg.byClass("mixture-ph")[0];
    expect(Number(marker.getAttribute("data-ph"))).toBeCloseTo(d.mixturePH, 3);
    expect(marker.textContent).toBe(`mixture pH ${d.mixturePH.toFixed(2)}`);
    expect(svg.byClass("legend-item").map((e) => e.textContent)).toEqual(["H₃PO₄", "H₂PO₄⁻", "HPO₄²⁻", "PO₄³⁻"]);
    expect(svg.childNodes.slice(0, 2).map((n) => (n as FakeElement).tagName)).toEqual(["title", "desc"]);
    expect(svg.byTag("title")[0].textContent).toBe("Forms of phosphate from pH 0 to 14");
    const label = svg.getAttribute("aria-label") ?? "";
    // an equimolar buffer sits at its crossing: half and half, the two minor forms below 1 % left out
    expect(label).toMatch(/At the mixture's pH 6\.96: (HPO4\^2-|H2PO4-) 50 % and (HPO4\^2-|H2PO4-) 50 %\./);
    expect(label).toMatch(/equal amounts at pH 2\.\d\d, 6\.96 and 11\.\d\d/);
    expect(svg.byTag("desc")[0].textContent).toBe(label);
    noStyleOrHandlers(svg);
  });

  test("speciation paths stay inside the plot area", () => {
    const d = spec(PHOSPHATE);
    const svg = fake(renderSpeciation(fakeDocument, d.systems[0], d));
    const frame = svg.byClass("axis-line")[0].getAttribute("d") ?? ""; // M left top V bottom H right
    const [, left, top, bottom, right] = /^M([\d.]+) ([\d.]+)V([\d.]+)H([\d.]+)$/.exec(frame)!.map(Number);
    for (const p of svg.byClass("species-line")) {
      const nums = (p.getAttribute("d") ?? "").split(/[ML]/).filter(Boolean).map((xy) => xy.split(" ").map(Number));
      for (const [x, y] of nums) {
        expect(x).toBeGreaterThanOrEqual(left);
        expect(x).toBeLessThanOrEqual(right + 1e-9);
        expect(y).toBeGreaterThanOrEqual(top);
        expect(y).toBeLessThanOrEqual(bottom);
      }
    }
  });

  test("titration: one curve, a marker per equivalence point at its volume, axes with units", () => {
    const t = curveOf(PHOSPHATE, "NaOH");
    const svg = fake(renderCurve(fakeDocument, t));
    expect(svg.getAttribute("data-titrant")).toBe("NaOH");
    expect(svg.byClass("curve-line").length).toBe(1);
    expect(svg.byClass("curve-line")[0].getAttribute("d")).toMatch(/^M46 [\d.]+(L[\d.]+ [\d.]+){160}$/);
    const markers = svg.byClass("eq-marker");
    expect(markers.length).toBe(t.equivalence.length);
    expect(Number(markers[0].getAttribute("data-ml"))).toBeCloseTo(t.equivalence[0].mL, 3);
    expect(texts(svg, "axis-title")).toEqual(["mL of 0.1 M NaOH added to 10 mL", "pH"]);
    // the marker sits at its volume on the x axis: 1 mL of 2.5 mL across the plot from x = 46 to 304
    const cx = Number(markers[0].byTag("circle")[0].getAttribute("cx"));
    expect(cx).toBeCloseTo(46 + (258 * t.equivalence[0].mL) / t.maxML, 1);
    expect(svg.byClass("legend-item").map((e) => e.textContent)).toEqual([`start: pH ${t.startPH.toFixed(2)} (the mixture)`, `equivalence at 1.00 mL, pH ${t.equivalence[0].pH.toFixed(2)}`]);
    expect(svg.getAttribute("aria-label")).toMatch(/^Titration of 10 mL of the mixture with 0\.1 M NaOH, 0 to 2\.50 mL: the pH rises from 6\.96 to 11\.\d\d\. Equivalence point at 1\.00 mL \(pH 9\.\d\d\)\.$/);
    noStyleOrHandlers(svg);
  });

  test("titration with two equivalence points numbers them", () => {
    const t = curveOf([{ name: "phosphoric acid", amount: "10 mM" }], "NaOH");
    expect(t.equivalence.length).toBe(2);
    const svg = fake(renderCurve(fakeDocument, t));
    expect(svg.byClass("eq-marker").map((m) => m.byTag("text")[0]?.textContent)).toEqual(["1", "2"]);
    expect(svg.byClass("legend-item")[1].textContent).toMatch(/^1: equivalence at 1\.0\d mL/);
  });
});
