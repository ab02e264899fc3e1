/**
 * Stored layers that cannot be read (damaged text, a newer storage version): the pane reports them,
 * keeps the stored text untouched, offers it for export, refuses to save over it, and resets only
 * when asked.
 */
import { getActiveLibrary, getLayerProblems, makeBlob, encodeBlob, LIBRARY_FORMAT } from "../../src/library";
import { baseSystemByPkb, freshController } from "./helpers";

const DAMAGED = '{"format":"protolyte-stored-library","blobVersion":1,"savedAt":"2026-01-01T00:00:00Z","library":{"format":"protolyte-lib';

function personalBlob(): string {
  return encodeBlob(
    makeBlob({
      format: LIBRARY_FORMAT,
      schemaVersion: 1,
      name: "Personal",
      ions: [{ id: "hb-cation", name: "Halvorsen test cation", charge: 1 }],
    }),
  );
}

describe("a damaged stored workbook layer", () => {
  test("is reported with its raw text, not applied, and the personal layer still loads", async () => {
    const { ctl, memory } = await freshController({ workbook: DAMAGED, personal: personalBlob() });
    const p = ctl.problems.get("workbook");
    expect(p).toMatchObject({ layer: "workbook", code: "corrupt", raw: DAMAGED });
    expect(p?.message).toMatch(/damaged/);
    expect(getActiveLibrary().layers.workbook).toBeNull();
    expect(getActiveLibrary().get("hb-cation", "ion")?.layer).toBe("personal");
    expect(getLayerProblems().map((x) => x.layer)).toEqual(["workbook"]);
    // nothing discarded silently
    expect(memory.workbook.peek()).toBe(DAMAGED);
  });

  test("saving into it is refused until it is reset; the raw text exports exactly", async () => {
    const { ctl, memory } = await freshController({ workbook: DAMAGED });
    const r = await ctl.saveSystem("workbook", baseSystemByPkb("4.2"));
    expect(r.ok).toBe(false);
    expect(r.ok ? "" : r.message).toMatch(/Export its stored text, then reset it/);
    expect(memory.workbook.peek()).toBe(DAMAGED);
    expect(ctl.exportRaw("workbook")).toEqual({ fileName: "protolyte-workbook-library-as-stored.txt", text: DAMAGED });
    // the personal layer is not blocked
    expect((await ctl.saveSystem("personal", baseSystemByPkb("4.2"))).ok).toBe(true);
  });

  test("reset discards it only when called, then the layer works again", async () => {
    const { ctl, memory } = await freshController({ workbook: DAMAGED });
    const reset = await ctl.resetLayer("workbook");
    expect(reset.ok).toBe(true);
    expect(memory.workbook.peek()).toBeNull();
    expect(ctl.problems.size).toBe(0);
    expect(getLayerProblems()).toEqual([]);
    expect((await ctl.saveSystem("workbook", baseSystemByPkb("4.2"))).ok).toBe(true);
    expect(JSON.parse(memory.workbook.peek() as string).library.systems[0].id).toBe("hb-7-amine");
  });
});

describe("a layer stored by a newer version", () => {
  test("is reported as newer and kept", async () => {
    const newer = JSON.stringify({ format: "protolyte-stored-library", blobVersion: 7, savedAt: "2030-01-01T00:00:00Z", library: { anything: true } });
    const { ctl, memory } = await freshController({ personal: newer });
    expect(ctl.problems.get("personal")).toMatchObject({ code: "newer-version", raw: newer });
    expect(ctl.problems.get("personal")?.message).toMatch(/newer version of Protolyte/);
    expect(memory.personal.peek()).toBe(newer);
    expect(ctl.blocked("personal")).not.toBeNull();
    expect(ctl.blocked("workbook")).toBeNull();
  });

  test("a library file of a newer schema inside a current blob is reported as newer too", async () => {
    const newer = JSON.stringify({ format: "protolyte-stored-library", blobVersion: 1, savedAt: "2030-01-01T00:00:00Z", library: { format: LIBRARY_FORMAT, schemaVersion: 2, name: "x" } });
    const { ctl } = await freshController({ workbook: newer });
    expect(ctl.problems.get("workbook")?.code).toBe("newer-version");
  });
});
