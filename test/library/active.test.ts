/**
 * The process-wide library: starts built-in, takes validated user layers, refuses invalid ones
 * without changing anything, tells listeners, and falls back when a stored layer is unreadable.
 */
import {
  getActiveLibrary,
  getLayerProblems,
  onLibraryChange,
  referenceContext,
  reportLayerProblem,
  resetActiveLibrary,
  setLayer,
} from "../../src/library/active";
import { BUILTIN_LIBRARY } from "../../src/library/builtin";
import { createLibrary } from "../../src/library/layers";
import { halvorsenLibrary } from "./helpers";

const BUILTIN_FP = createLibrary({ builtin: BUILTIN_LIBRARY }).fingerprint();

beforeEach(() => resetActiveLibrary());

test("starts as the built-in library", () => {
  expect(getActiveLibrary().fingerprint()).toBe(BUILTIN_FP);
  expect(getActiveLibrary().layers.workbook).toBeNull();
  expect(getActiveLibrary()).toBe(getActiveLibrary());
});

test("setLayer applies a valid layer and notifies listeners once", () => {
  const seen: string[] = [];
  onLibraryChange((lib) => seen.push(lib.fingerprint()));
  const r = setLayer("workbook", halvorsenLibrary());
  expect(r.ok).toBe(true);
  expect(getActiveLibrary().resolve("HBS-7").ok).toBe(true);
  expect(seen).toEqual([getActiveLibrary().fingerprint()]);
  expect(seen[0]).not.toBe(BUILTIN_FP);
});

test("an invalid layer is refused with actionable errors and changes nothing", () => {
  setLayer("workbook", halvorsenLibrary());
  const before = getActiveLibrary();
  const listener = jest.fn();
  onLibraryChange(listener);
  const bad = halvorsenLibrary();
  bad.substances!.push({ ...bad.substances![0], id: "hb-buffer-salt-2", name: "HB buffer salt 2", aliases: ["HBS-7"] });
  const r = setLayer("personal", bad);
  expect(r.ok).toBe(false);
  if (r.ok) return;
  expect(r.code).toBe("invalid");
  expect(r.errors).toContainEqual({ path: "substances[1].aliases[0]", message: "duplicate of 'HBS-7' used by hb-buffer-salt" });
  expect(r.errors).toContainEqual({ path: "substances[1].formula", message: "duplicate of 'C8H17NNaO4S' used by hb-buffer-salt" });
  expect(getActiveLibrary()).toBe(before);
  expect(listener).not.toHaveBeenCalled();
});

test("a user layer may not reference entries of the other user layer: each stands on the built-in layer alone", () => {
  // The workbook travels to computers without this personal library, and the personal library is
  // shared by every workbook: a reference across them would break on one side.
  setLayer("workbook", halvorsenLibrary());
  const uses = {
    format: "protolyte-library",
    schemaVersion: 1,
    name: "mine",
    substances: [
      { id: "hb-acid", name: "HB zwitterion acid", formula: "C8H18NO4S", nature: "weak-acid-base", systems: [{ system: "hb-zwitterion", stoich: 1, protons: 1 }] },
    ],
  };
  const r = setLayer("personal", uses);
  expect(r.ok ? [] : r.errors).toEqual([{ path: "substances[0].systems[0].system", message: expect.stringMatching(/unknown acid–base system 'hb-zwitterion'/) }]);
  expect(getActiveLibrary().resolve("HB zwitterion acid").ok).toBe(false);
  expect(referenceContext("workbook").map((d) => d.name)).toEqual(["Protolyte built-in"]);
  expect(referenceContext("personal").map((d) => d.name)).toEqual(["Protolyte built-in"]);
});

test("setLayer(null) empties the layer", () => {
  setLayer("workbook", halvorsenLibrary());
  setLayer("workbook", null);
  expect(getActiveLibrary().fingerprint()).toBe(BUILTIN_FP);
});

test("a reported storage problem empties that layer and is listed until the layer is set again", () => {
  setLayer("workbook", halvorsenLibrary());
  reportLayerProblem({ layer: "workbook", code: "corrupt", message: "stored workbook library is not valid JSON" });
  expect(getActiveLibrary().fingerprint()).toBe(BUILTIN_FP);
  expect(getLayerProblems()).toEqual([{ layer: "workbook", code: "corrupt", message: "stored workbook library is not valid JSON" }]);
  setLayer("workbook", halvorsenLibrary());
  expect(getLayerProblems()).toEqual([]);
});

test("a throwing listener does not stop the change or the other listeners", () => {
  const second = jest.fn();
  onLibraryChange(() => {
    throw new Error("pane closed");
  });
  onLibraryChange(second);
  expect(setLayer("personal", halvorsenLibrary()).ok).toBe(true);
  expect(second).toHaveBeenCalledTimes(1);
});

test("unsubscribing stops notifications", () => {
  const l = jest.fn();
  const off = onLibraryChange(l);
  off();
  setLayer("personal", halvorsenLibrary());
  expect(l).not.toHaveBeenCalled();
});
