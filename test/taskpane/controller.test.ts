/**
 * The pane's controller without a DOM: saving validated entries into layers, delete revealing the
 * built-in entry, duplicate-to-edit, the try-it pH through the library in effect.
 */
import { getActiveLibrary, LIBRARY_FORMAT } from "../../src/library";
import type { SystemRecord } from "../../src/library";
import { emptySystem } from "../../src/taskpane/forms";
import { baseSubstance, baseSystemByPkb, freshController } from "./helpers";

describe("saving entries", () => {
  test("a base entered by pKb is stored as its conjugate acid's pKa (pKw 13.995) and used by try-it", async () => {
    const { ctl, memory } = await freshController();
    const sys = await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    expect(sys).toMatchObject({ ok: true, id: "hb-7-amine" });
    if (!sys.ok) return;
    expect(sys.notes.join(" ")).toContain("13.995 − 4.2 = 9.795");
    const stored = getActiveLibrary().get("hb-7-amine", "system")!.record as SystemRecord;
    expect(stored.steps[0].pKa.value).toBeCloseTo(9.795, 9);
    expect(stored.steps[0].pKa.note).toContain("converted from pKb 4.2");
    const sub = await ctl.saveSubstance("workbook", baseSubstance("hb-7-amine"));
    expect(sub.ok).toBe(true);
    // the layer is in storage, as a library file
    const text = memory.workbook.peek();
    expect(JSON.parse(text as string)).toMatchObject({ format: "protolyte-stored-library", library: { format: LIBRARY_FORMAT, schemaVersion: 1 } });
    expect(memory.personal.peek()).toBeNull();
    // 10 mM of a base with pKa(BH+) 9.795: pH ≈ 14 − (pKb + pC)/2 ≈ 10.9
    const r = ctl.tryIt([{ name: "HB7 base", amount: "10 mM" }], "25");
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.pH).toBeGreaterThan(10.7);
    expect(r.pH).toBeLessThan(11.1);
    expect(r.used[0]).toMatchObject({ id: "hb-7-free-base", layer: "workbook" });
  });

  test("editing the pKb moves the try-it pH", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    await ctl.saveSubstance("workbook", baseSubstance("hb-7-amine"));
    const before = ctl.tryIt([{ name: "HB-7 free base", amount: "0.01" }], "25");
    const draft = ctl.editDraft("system", "hb-7-amine");
    expect(draft?.kind).toBe("system");
    if (draft?.kind !== "system") return;
    draft.input.steps[0].enteredAsPkb = true;
    draft.input.steps[0].pKa.value = "5.2";
    const r = await ctl.saveSystem(draft.layer, draft.input, draft.originalId);
    expect(r.ok).toBe(true);
    const after = ctl.tryIt([{ name: "HB-7 free base", amount: "0.01" }], "25");
    if (!before.ok || !after.ok) throw new Error("try-it failed");
    // one pKb unit weaker base: pH drops by about half a unit
    expect(before.pH - after.pH).toBeGreaterThan(0.4);
    expect(before.pH - after.pH).toBeLessThan(0.6);
  });

  test("an invalid entry is not saved and the problems name their fields", async () => {
    const { ctl, memory } = await freshController();
    const s = emptySystem();
    s.name = "broken";
    s.topCharge = "1.5";
    s.steps[0].pKa.value = "abc";
    const r = await ctl.saveSystem("workbook", s);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map((i) => i.path).sort()).toEqual(["steps[0].pKa.value", "topCharge"]);
    expect(memory.workbook.peek()).toBeNull();
    expect(getActiveLibrary().layers.workbook).toBeNull();
  });

  test("validator problems come back at the entry's fields (unknown source)", async () => {
    const { ctl } = await freshController();
    const s = baseSystemByPkb("4.2");
    s.steps[0].pKa.status = "published";
    s.steps[0].pKa.source = "no-such-source";
    const r = await ctl.saveSystem("workbook", s);
    expect(r).toMatchObject({ ok: false, issues: [{ path: "steps[0].pKa.source", message: expect.stringContaining("unknown source") }] });
    expect(getActiveLibrary().layers.workbook).toBeNull();
  });
});

describe("built-in entries", () => {
  test("duplicate to edit overrides the built-in entry in the workbook; deleting it reveals the built-in again", async () => {
    const { ctl } = await freshController();
    const builtin = getActiveLibrary().get("acetate", "system")!.record as SystemRecord;
    const draft = ctl.duplicateDraft("system", "acetate");
    expect(draft).toMatchObject({ kind: "system", layer: "workbook", originalId: "acetate", overrides: true });
    if (draft?.kind !== "system") return;
    draft.input.steps[0].pKa.value = "4.80";
    const saved = await ctl.saveSystem(draft.layer, draft.input, draft.originalId);
    expect(saved.ok).toBe(true);
    const entry = getActiveLibrary().get("acetate", "system")!;
    expect(entry).toMatchObject({ layer: "workbook", overrides: ["builtin"] });
    expect((entry.record as SystemRecord).steps[0].pKa.value).toBe(4.8);
    const del = await ctl.deleteEntry("workbook", "system", "acetate");
    expect(del).toMatchObject({ ok: true, message: expect.stringContaining("built-in entry applies again") });
    const back = getActiveLibrary().get("acetate", "system")!;
    expect(back.layer).toBe("builtin");
    expect((back.record as SystemRecord).steps[0].pKa.value).toBe(builtin.steps[0].pKa.value);
    // no constants are left in the workbook, only the change record of the override and its deletion
    const wb = getActiveLibrary().layers.workbook!;
    expect(wb.systems).toBeUndefined();
    expect(wb.changes!.map((c) => [c.action, c.entry?.id, c.summary])).toEqual([["add", "acetate", "overrides the built-in entry"], ["delete", "acetate", undefined]]);
    expect(wb.changes![0].diff).toContainEqual({ path: "steps[0].pKa.value", old: String(builtin.steps[0].pKa.value), new: "4.8" });
  });

  test("built-in entries cannot be opened for editing in place", async () => {
    const { ctl } = await freshController();
    expect(ctl.editDraft("system", "acetate")).toBeNull();
  });

  test("a system used by a substance cannot be deleted", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    await ctl.saveSubstance("workbook", baseSubstance("hb-7-amine"));
    const r = await ctl.deleteEntry("workbook", "system", "hb-7-amine");
    expect(r.ok).toBe(false);
    expect(getActiveLibrary().get("hb-7-amine", "system")?.layer).toBe("workbook");
  });
});

describe("duplicating a user entry", () => {
  test("a substance copy gets its own id and name, and its formula is not a second lookup name", async () => {
    const { ctl } = await freshController();
    await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    const sub = baseSubstance("hb-7-amine");
    sub.formula = "C8H11NO";
    sub.molarMass = { value: "", conditions: "as weighed", status: "published", source: "", locator: "", note: "" };
    expect((await ctl.saveSubstance("workbook", sub)).ok).toBe(true);
    const draft = ctl.duplicateDraft("substance", "hb-7-free-base");
    expect(draft).toMatchObject({ kind: "substance", layer: "workbook", originalId: null, overrides: false });
    if (draft?.kind !== "substance") return;
    expect(draft.input).toMatchObject({ name: "HB-7 free base (copy)", id: "hb-7-free-base-copy", aliases: "", formula: "C8H11NO", formulaAlias: false });
    const r = await ctl.saveSubstance(draft.layer, draft.input, draft.originalId);
    expect(r).toMatchObject({ ok: true, id: "hb-7-free-base-copy", warnings: [] });
    // the original keeps its names
    const found = ctl.library.resolve("C8H11NO");
    expect(found.ok && found.entry.id).toBe("hb-7-free-base");
  });
});
