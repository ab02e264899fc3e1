/**
 * The pane never replaces an entry silently: a new entry under a taken id is refused at the id
 * field with a free id suggested, an override of a built-in entry is its own action, and a
 * substance that would take another substance's lookup name is refused until the user confirms.
 */
import type { SystemRecord } from "../../src/library";
import { baseSubstance, baseSystemByPkb, freshController } from "./helpers";

describe("taken ids", () => {
  test("a new system under a built-in id is refused at the id field, with a free id, and nothing is stored", async () => {
    const { ctl, memory } = await freshController();
    const s = baseSystemByPkb("4.2");
    s.id = "acetate";
    const r = await ctl.saveSystem("workbook", s);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.issues).toEqual([
      { path: "id", message: expect.stringMatching(/^the id 'acetate' is taken by the built-in acid–base system 'acetate'\. Use a free id such as 'acetate-2'; to override the built-in entry, use 'Override in the workbook'/) },
    ]);
    expect(memory.workbook.peek()).toBeNull();
    expect(ctl.library.get("acetate", "system")?.layer).toBe("builtin");
  });

  test("a new system under an id taken in the workbook does not replace it", async () => {
    const { ctl } = await freshController();
    const first = baseSystemByPkb("4.2");
    first.id = "mopso-hb";
    expect((await ctl.saveSystem("workbook", first)).ok).toBe(true);
    const second = baseSystemByPkb("5.0");
    second.id = "mopso-hb";
    second.name = "MOPSO second try";
    const r = await ctl.saveSystem("workbook", second);
    expect(!r.ok && r.issues[0].message).toMatch(/taken by the workbook acid–base system 'HB-7 amine'.*'mopso-hb-2'.*edit that entry/);
    expect((ctl.library.get("mopso-hb", "system")?.record as SystemRecord).name).toBe("HB-7 amine");
  });

  test("a new source under a taken key is refused; an empty id gets a free one", async () => {
    const { ctl } = await freshController();
    const r = await ctl.saveSource("workbook", { id: "goldberg2002", kind: "", title: "My own", authors: "", container: "", edition: "", volume: "", pages: "", year: "", doi: "", url: "", locators: "", note: "" });
    expect(!r.ok && r.issues[0]).toMatchObject({ path: "id", message: expect.stringMatching(/taken by the built-in source/) });
    const s = baseSystemByPkb("4.2");
    const ok = await ctl.saveSystem("workbook", s);
    expect(ok).toMatchObject({ ok: true, id: "hb-7-amine" });
  });

  test("overriding a built-in entry is the explicit draft from Browse, under its own id", async () => {
    const { ctl } = await freshController();
    const d = ctl.duplicateDraft("system", "acetate");
    expect(d).toMatchObject({ kind: "system", layer: "workbook", originalId: "acetate", overrides: true });
    if (d?.kind !== "system") return;
    d.input.steps[0].pKa.value = "4.80";
    const r = await ctl.saveSystem(d.layer, d.input, d.originalId);
    expect(r.ok).toBe(true);
    expect(ctl.library.get("acetate", "system")).toMatchObject({ layer: "workbook", overrides: ["builtin"] });
  });
});

describe("names taken from other substances", () => {
  test("an alias that means the built-in sodium acetate is refused at the aliases field; AQ.PH's meaning stays", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    const sub = baseSubstance("hb-7-amine");
    sub.aliases = "HB7 base\nsodium acetate";
    const before = ctl.tryIt([{ name: "sodium acetate", amount: "0.1" }], "25");
    const r = await ctl.saveSubstance("workbook", sub);
    expect(!r.ok && r.issues).toEqual([{ path: "aliases[1]", message: expect.stringMatching(/^'sodium acetate' already means the built-in substance 'sodium acetate' \(sodium-acetate\)/) }]);
    const after = ctl.tryIt([{ name: "sodium acetate", amount: "0.1" }], "25");
    expect(before.ok && after.ok && after.pH).toBe(before.ok && before.pH);
  });

  test("confirmed, the name moves to the new entry, and the library warns what it hides", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    const sub = baseSubstance("hb-7-amine");
    sub.aliases = "HB7 base\nsodium acetate";
    sub.takeOverNames = true;
    const r = await ctl.saveSubstance("workbook", sub);
    expect(r.ok).toBe(true);
    expect(r.ok && r.warnings.join(" ")).toMatch(/'sodium acetate' now means hb-7-free-base \(workbook\), hiding sodium-acetate \(builtin\)/);
    expect(ctl.library.ownerOf("sodium acetate")?.id).toBe("hb-7-free-base");
  });

  test("a look-alike name is refused with the reason", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    const r = await ctl.saveSubstance("workbook", baseSubstance("hb-7-amine", "HB-7 fr\u0435e base"));
    expect(!r.ok && r.issues.map((i) => [i.path, i.message])).toEqual([["name", expect.stringMatching(/Cyrillic letter 'е' \(U\+0435\)/)]]);
  });
});

describe("a changed value loses the old value's provenance", () => {
  test("overriding citrate with pKa 4.761 → 4.80 drops the Goldberg citation and says so", async () => {
    const { ctl } = await freshController();
    const d = ctl.duplicateDraft("system", "citrate");
    if (d?.kind !== "system") throw new Error("no draft");
    const old = d.input.steps[1].pKa.value;
    const cited = d.input.steps[1].pKa.source;
    expect(cited).not.toBe("");
    d.input.steps[1].pKa.value = "4.80";
    const r = await ctl.saveSystem(d.layer, d.input, d.originalId);
    expect(r.ok).toBe(true);
    expect(r.ok && r.notes.join(" ")).toContain(`step 2 ${old} → 4.8: the old value's source '${cited}'`);
    const steps = (ctl.library.get("citrate", "system")!.record as SystemRecord).steps;
    expect(steps[1].pKa).toEqual({ value: 4.8, unit: "1", conditions: "25 °C, I = 0", status: "entered" });
    // the unchanged steps keep their provenance as it was
    expect(steps[0].pKa).toEqual(ctl.library.layers.builtin.systems!.find((s) => s.id === "citrate")!.steps[0].pKa);
  });

  test("an amine entered by pKb and edited to pKa 8.00 no longer says it was converted", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    const d = ctl.editDraft("system", "hb-7-amine");
    if (d?.kind !== "system") throw new Error("no draft");
    expect(d.input.steps[0].pKa.note).toContain("converted from pKb 4.2");
    d.input.steps[0].pKa.value = "8.00";
    expect((await ctl.saveSystem(d.layer, d.input, d.originalId)).ok).toBe(true);
    const pKa = (ctl.library.get("hb-7-amine", "system")!.record as SystemRecord).steps[0].pKa;
    expect(pKa).toEqual({ value: 8, unit: "1", conditions: "25 °C, I = 0", status: "entered" });
  });

  test("re-entered as pKb 5.2, the conversion note is recomputed, not stacked", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    const d = ctl.editDraft("system", "hb-7-amine");
    if (d?.kind !== "system") throw new Error("no draft");
    d.input.steps[0].enteredAsPkb = true;
    d.input.steps[0].pKa.value = "5.2";
    expect((await ctl.saveSystem(d.layer, d.input, d.originalId)).ok).toBe(true);
    const pKa = (ctl.library.get("hb-7-amine", "system")!.record as SystemRecord).steps[0].pKa;
    expect(pKa.value).toBeCloseTo(8.795, 9);
    expect(pKa.status).toBe("entered");
    expect(pKa.note).toMatch(/^converted from pKb 5\.2 with pKw 13\.995/);
    expect(pKa.note).not.toContain("4.2");
  });

  test("a new value starts as 'entered by the user', so a first save needs no source", async () => {
    const { ctl } = await freshController();
    const s = baseSystemByPkb("4.2");
    s.steps[0].pKa.status = "entered";
    s.steps[0].pKa.note = "";
    expect((await ctl.saveSystem("workbook", s)).ok).toBe(true);
  });

  test("a decimal comma is refused with the reason", async () => {
    const { ctl } = await freshController();
    const s = baseSystemByPkb("4,2");
    s.steps[0].enteredAsPkb = false;
    const r = await ctl.saveSystem("workbook", s);
    expect(!r.ok && r.issues).toEqual([{ path: "steps[0].pKa.value", message: "'4,2' uses a decimal comma: write it with a point ('4.2')" }]);
  });
});
