/**
 * Storage adapters: round trips, typed problems for corrupt or newer blobs (raw text kept, active
 * library back on the built-in layer), size limits, and the Office adapter against a fake Excel.
 */
import { getActiveLibrary, getLayerProblems, resetActiveLibrary, setLayer } from "../../src/library/active";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { createLibrary } from "../../src/library/layers";
import { decodeBlob, encodeBlob, makeBlob } from "../../src/library/storage/blob";
import { loadLayer, saveLayer } from "../../src/library/storage/layer-storage";
import { createLocalStorageStorage, type WebStorageLike } from "../../src/library/storage/local-storage";
import { createMemoryStorage } from "../../src/library/storage/memory";
import { BLOB_VERSION } from "../../src/library/storage/types";
import {
  createWorkbookSettingsStorage,
  findExcelRun,
  WORKBOOK_LIBRARY_KEY,
  type ExcelRun,
  type SettingsContextLike,
} from "../../src/library/storage/workbook-settings";
import type { LibraryDoc } from "../../src/library/types";
import { halvorsenLibrary } from "./helpers";

const BUILTIN_FP = createLibrary({ builtin: BUILTIN_LIBRARY }).fingerprint();
const NOW = new Date("2025-03-14T09:30:00.000Z");
const stored = (doc: LibraryDoc = halvorsenLibrary()): string => encodeBlob(makeBlob(doc, NOW));

beforeEach(() => resetActiveLibrary());

describe("blob encoding", () => {
  test("round trip through memory storage", async () => {
    const s = createMemoryStorage();
    expect(await s.load()).toEqual({ ok: true, blob: null });
    const saved = await s.save(makeBlob(halvorsenLibrary(), NOW));
    expect(saved).toEqual({ ok: true, bytes: Buffer.byteLength(s.peek()!, "utf8"), warnings: [] });
    expect(s.peek()!.includes("\n")).toBe(false);
    const loaded = await s.load();
    expect(loaded).toEqual({ ok: true, blob: { format: "protolyte-stored-library", blobVersion: BLOB_VERSION, savedAt: "2025-03-14T09:30:00.000Z", library: halvorsenLibrary() } });
    await s.clear();
    expect(s.peek()).toBeNull();
  });

  const damaged: [string, string, string, RegExp][] = [
    ["truncated JSON", stored().slice(0, 120), "corrupt", /not valid JSON/],
    ["another program's data", '{"theme":"dark"}', "corrupt", /not a Protolyte library/],
    ["a newer storage version", stored().replace('"blobVersion":1', '"blobVersion":2'), "newer-version", /newer Protolyte \(storage version 2\)/],
    ["a library of a newer schema", stored().replace('"schemaVersion":1', '"schemaVersion":3'), "newer-version", /newer Protolyte/],
    ["a damaged entry", stored().replace('"topCharge":0', '"topCharge":"zero"'), "corrupt", /damaged: HB zwitterion, charge of the fully protonated form: expected an integer/],
    ["an unsafe key", stored().replace('"name":"HB zwitterion"', '"name":"HB zwitterion","__proto__":{}'), "corrupt", /__proto__/],
    ["no save time", stored().replace(/"savedAt":"[^"]*",/, ""), "corrupt", /no save time/],
  ];
  test.each(damaged)("%s → a typed problem with the raw text", (_what, raw, code, message) => {
    const r = decodeBlob(raw);
    expect(r).toMatchObject({ ok: false, code, raw });
    expect(!r.ok && r.message).toMatch(message);
  });
});

describe("loading a layer", () => {
  test("a valid stored layer becomes active", async () => {
    const r = await loadLayer("workbook", createMemoryStorage(stored()));
    expect(r.ok).toBe(true);
    expect(getActiveLibrary().resolve("HBS-7").ok).toBe(true);
    expect(getLayerProblems()).toEqual([]);
  });

  test("a corrupt layer: built-in in effect, the problem reported, the stored text untouched", async () => {
    setLayer("workbook", halvorsenLibrary());
    const raw = `${stored()}garbage`;
    const storage = createMemoryStorage(raw);
    const r = await loadLayer("workbook", storage);
    expect(r).toMatchObject({ ok: false, code: "corrupt", raw });
    expect(getActiveLibrary().fingerprint()).toBe(BUILTIN_FP);
    expect(getLayerProblems()).toEqual([{ layer: "workbook", code: "corrupt", message: expect.stringMatching(/not valid JSON/) }]);
    expect(storage.peek()).toBe(raw);
  });

  test("a newer-version layer is not overwritten or dropped, only set aside", async () => {
    const raw = stored().replace('"blobVersion":1', '"blobVersion":7');
    const storage = createMemoryStorage(raw);
    expect(await loadLayer("personal", storage)).toMatchObject({ ok: false, code: "newer-version", raw });
    expect(getActiveLibrary().layers.personal).toBeNull();
    expect(getLayerProblems().map((p) => p.code)).toEqual(["newer-version"]);
    expect(storage.peek()).toBe(raw);
  });

  test("a stored layer with a dangling reference still loads; that entry is unusable and listed", async () => {
    const doc = halvorsenLibrary();
    doc.substances![0].systems![0].system = "hb-only-in-personal";
    const r = await loadLayer("workbook", createMemoryStorage(stored(doc)));
    expect(r.ok).toBe(true);
    const lib = getActiveLibrary();
    expect(lib.resolve("HBS-7")).toMatchObject({ ok: false, code: "unusable" });
    expect(lib.problems).toContainEqual({ layer: "workbook", severity: "error", path: "substances[0].systems[0].system", message: "unknown acid–base system 'hb-only-in-personal'" });
  });

  test("a read failure is reported, not thrown", async () => {
    const storage = createLocalStorageStorage({
      storage: { getItem: () => { throw new Error("disk on fire"); }, setItem: () => undefined, removeItem: () => undefined },
    });
    expect(await loadLayer("personal", storage)).toEqual({ ok: false, code: "read-failed", message: "could not read the stored library: disk on fire", raw: null });
  });
});

describe("saving a layer", () => {
  test("an invalid library is neither saved nor applied", async () => {
    const storage = createMemoryStorage();
    const bad = halvorsenLibrary();
    bad.substances![0].nature = "buffer" as never;
    const before = getActiveLibrary();
    const r = await saveLayer("workbook", bad, storage);
    expect(r).toMatchObject({ ok: false, code: "invalid" });
    expect(storage.peek()).toBeNull();
    expect(getActiveLibrary()).toBe(before);
  });

  test("a valid library is saved, then applied", async () => {
    const storage = createMemoryStorage();
    const r = await saveLayer("workbook", halvorsenLibrary(), storage, NOW);
    expect(r.ok).toBe(true);
    expect(storage.peek()).toBe(stored());
    expect(getActiveLibrary().resolve("HBS-7").ok).toBe(true);
  });

  const bigLibrary = (n: number): LibraryDoc => ({
    format: "protolyte-library",
    schemaVersion: 1,
    name: "HB excipient catalogue",
    substances: Array.from({ length: n }, (_, i) => ({
      id: `hb-excipient-${i}`,
      name: `HB excipient ${i}`,
      nature: "non-electrolyte" as const,
      neutral: 1,
      molarMass: { value: 300 + i, unit: "g/mol", conditions: "anhydrous", status: "unverified" as const, note: `from memory, unverified ${"·".repeat(1900)}` },
    })),
  });

  test("above 1 MB a save warns; above the adapter's limit it is refused and nothing changes", async () => {
    const doc = bigLibrary(300);
    const warned = await saveLayer("personal", doc, createMemoryStorage());
    expect(warned.ok).toBe(true);
    expect(warned.ok && warned.bytes).toBeGreaterThan(1024 * 1024);
    expect(warned.ok && warned.warnings).toEqual([expect.stringMatching(/above about 1 MB saving may fail/)]);

    resetActiveLibrary();
    const small = createMemoryStorage(null, 1024 * 1024);
    const refused = await saveLayer("personal", doc, small);
    expect(refused).toMatchObject({ ok: false, code: "too-large", message: expect.stringMatching(/holds at most 1\.00 MB/) });
    expect(small.peek()).toBeNull();
    expect(getActiveLibrary().layers.personal).toBeNull();
  });
});

describe("browser storage (personal library)", () => {
  const fakeLocalStorage = (): WebStorageLike & { data: Map<string, string> } => {
    const data = new Map<string, string>();
    return { data, getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v), removeItem: (k) => void data.delete(k) };
  };

  test("round trip under its key", async () => {
    const ls = fakeLocalStorage();
    const s = createLocalStorageStorage({ storage: ls });
    expect((await s.save(makeBlob(halvorsenLibrary(), NOW))).ok).toBe(true);
    expect([...ls.data.keys()]).toEqual(["protolyte.personal-library"]);
    expect(await s.load()).toMatchObject({ ok: true, blob: { library: { name: "Halvorsen Biologics formulation lab" } } });
    await s.clear();
    expect(ls.data.size).toBe(0);
  });

  test("a full store is a write failure, not an exception", async () => {
    const ls = fakeLocalStorage();
    ls.setItem = () => {
      throw new Error("QuotaExceededError");
    };
    expect(await createLocalStorageStorage({ storage: ls }).save(makeBlob(halvorsenLibrary(), NOW))).toEqual({
      ok: false,
      code: "write-failed",
      message: "could not save the library: QuotaExceededError",
    });
  });

  test("without localStorage (Node), calls report 'unavailable'", async () => {
    const s = createLocalStorageStorage({ storage: null });
    expect(await s.load()).toMatchObject({ ok: false, code: "unavailable", raw: null });
    expect(await s.save(makeBlob(halvorsenLibrary(), NOW))).toMatchObject({ ok: false, code: "unavailable" });
    expect(createLocalStorageStorage().kind).toBe("local-storage");
  });
});

describe("workbook settings (Excel)", () => {
  /** A fake of the part of Excel.run used by the adapter, with its settings collection. */
  const fakeExcel = () => {
    const settings = new Map<string, unknown>();
    let syncs = 0;
    const run: ExcelRun = async (batch) => {
      const pending: (() => void)[] = [];
      const context: SettingsContextLike = {
        workbook: {
          settings: {
            getItemOrNullObject: (key) => {
              const item = { isNullObject: true, value: undefined as unknown, load: () => item, delete: () => void pending.push(() => settings.delete(key)) };
              pending.push(() => {
                item.isNullObject = !settings.has(key);
                item.value = settings.get(key);
              });
              return item;
            },
            add: (key, value) => pending.push(() => void settings.set(key, value)),
          },
        },
        sync: async () => {
          syncs++;
          pending.splice(0).forEach((f) => f());
        },
      };
      return batch(context);
    };
    return { run, settings, syncs: () => syncs };
  };

  test("outside Excel the factory returns null and nothing touches Office", () => {
    expect((globalThis as { Excel?: unknown }).Excel).toBeUndefined();
    expect(createWorkbookSettingsStorage()).toBeNull();
    expect(findExcelRun({})).toBeNull();
  });

  test("ExcelApi 1.4 is required; a throwing requirements check (outside Office) means no Excel", () => {
    const run = async () => undefined;
    expect(findExcelRun({ Excel: { run }, Office: { context: { requirements: { isSetSupported: () => false } } } })).toBeNull();
    expect(findExcelRun({ Excel: { run }, Office: { context: { requirements: { isSetSupported: () => { throw new Error("no host"); } } } } })).toBeNull();
    expect(findExcelRun({ Excel: { run }, Office: { context: { requirements: { isSetSupported: () => true } } } })).not.toBeNull();
  });

  test("round trip in the workbook's settings", async () => {
    const excel = fakeExcel();
    const s = createWorkbookSettingsStorage({ run: excel.run })!;
    expect(s.kind).toBe("workbook-settings");
    expect(await s.load()).toEqual({ ok: true, blob: null });
    expect((await s.save(makeBlob(halvorsenLibrary(), NOW))).ok).toBe(true);
    expect(excel.settings.get(WORKBOOK_LIBRARY_KEY)).toBe(stored());
    expect(await loadLayer("workbook", s)).toMatchObject({ ok: true });
    expect(getActiveLibrary().resolve("Halvorsen buffer salt").ok).toBe(true);
    await s.clear();
    expect(excel.settings.has(WORKBOOK_LIBRARY_KEY)).toBe(false);
    expect(await s.load()).toEqual({ ok: true, blob: null });
  });

  test("a setting holding an object (edited by another tool) is read as JSON, and checked", async () => {
    const excel = fakeExcel();
    excel.settings.set(WORKBOOK_LIBRARY_KEY, { format: "protolyte-stored-library", blobVersion: 1, savedAt: "x", library: { format: "nope" } });
    const r = await createWorkbookSettingsStorage({ run: excel.run })!.load();
    expect(r).toMatchObject({ ok: false, code: "corrupt", message: expect.stringMatching(/damaged/) });
  });

  test("a failing Excel call is a read failure, not an exception", async () => {
    const s = createWorkbookSettingsStorage({ run: async () => { throw new Error("RichApi.Error: GeneralException"); } })!;
    expect(await s.load()).toMatchObject({ ok: false, code: "read-failed", message: expect.stringMatching(/GeneralException/) });
    expect(await s.save(makeBlob(halvorsenLibrary(), NOW))).toMatchObject({ ok: false, code: "write-failed" });
  });
});
