/**
 * The editor's measured conditions (issue 17 item 3): a pKa typed with the temperature and ionic
 * strength it was measured at is stored converted to 25 °C, I = 0 by the library's conversion, with
 * the measured value kept beside it; the conversion is described live; it is refused at the field
 * where it cannot be made; opening the entry again shows the measured value.
 */
import { BUILTIN_LIBRARY, convertPKa, validateLibraryDoc, LIBRARY_FORMAT } from "../../src/library";
import { emptySystem } from "../../src/taskpane/forms";
import { buildSystem, describeMeasured } from "../../src/taskpane/form-to-record";
import { systemToInput } from "../../src/taskpane/record-to-form";
import { pKaLine } from "../../src/taskpane/describe";

function measuredSystem() {
  const s = emptySystem();
  s.name = "HB sulfonate buffer";
  s.id = "hb-sulfonate";
  s.steps[0].pKa.value = "6.93";
  s.steps[0].measured = { temperature: "37", ionicStrength: "0.15", medium: "KCl", scale: "concentration" };
  s.steps[0].dH.value = "21.1";
  return s;
}

test("37 °C, I = 0.15 mol/L (KCl) with ΔrH°: stored as the library's conversion, measured value kept, conditions written, method and uncertainty in the notes", () => {
  const r = buildSystem(measuredSystem());
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  const pKa = r.record.steps[0].pKa;
  const c = convertPKa({ value: 6.93, temperature: 37, ionicStrength: 0.15, medium: "KCl", scale: "concentration" }, r.record.steps[0], 0, 0);
  expect(c.ok && pKa.value === c.value).toBe(true);
  expect(pKa.measured).toEqual({ value: 6.93, temperature: 37, ionicStrength: 0.15, medium: "KCl", scale: "concentration" });
  expect(pKa.conditions).toBe("converted to 25 °C, I = 0 from 37 °C, I = 0.15 mol/L (KCl), concentration scale");
  expect(r.notes.join(" ")).toMatch(/van 't Hoff with ΔrH° 21\.1 kJ\/mol.*The conversion adds uncertainty/);
  const doc = { format: LIBRARY_FORMAT, schemaVersion: 1, name: "t", systems: [r.record] };
  expect(validateLibraryDoc(doc, [BUILTIN_LIBRARY]).ok).toBe(true);
  expect(describeMeasured(measuredSystem(), 0)).toMatch(/^Stored as pKa 7\.\d+ at 25 °C, I = 0 — converted from 6\.93 at 37 °C/);
});

test("Browse shows the converted value rounded, the method and the added uncertainty; opening it again shows the measured value and conditions", () => {
  const r = buildSystem(measuredSystem());
  if (!r.ok) throw new Error("refused");
  const line = pKaLine("pKa", r.record, 0, () => undefined);
  expect(line.amount).toBe(String(+r.record.steps[0].pKa.value.toFixed(4)));
  expect(line.conversion).toMatch(/converted from 6\.93 at 37 °C, I = 0\.15 mol\/L \(KCl\).*adds uncertainty/);
  const back = systemToInput(r.record);
  expect(back.steps[0].pKa.value).toBe("6.93");
  expect(back.steps[0].measured).toEqual({ temperature: "37", ionicStrength: "0.15", medium: "KCl", scale: "concentration" });
  const again = buildSystem(back);
  expect(again.ok && again.record.steps[0].pKa.value === r.record.steps[0].pKa.value).toBe(true);
});

test("refused at the field: 37 °C without ΔrH°, a decimal comma in the ionic strength, measured conditions with a pKb", () => {
  const noDH = measuredSystem();
  noDH.steps[0].dH.value = "";
  const a = buildSystem(noDH);
  expect(a.ok ? [] : a.issues.map((i) => i.path)).toEqual(["steps[0].pKa.measured.temperature"]);
  expect(a.ok ? "" : a.issues[0].message).toMatch(/no ΔrH°/);
  expect(describeMeasured(noDH, 0)).toMatch(/^Cannot convert: measured at 37 °C, but the step has no ΔrH°/);
  const comma = measuredSystem();
  comma.steps[0].measured.ionicStrength = "0,15";
  const b = buildSystem(comma);
  expect(b.ok ? "" : b.issues[0].message).toMatch(/ionic strength in mol\/L: '0,15' uses a decimal comma/);
  const pkb = measuredSystem();
  pkb.steps[0].enteredAsPkb = true;
  const c = buildSystem(pkb);
  expect(c.ok ? "" : c.issues[0].message).toMatch(/a pKb is taken at 25 °C, I = 0/);
});

test("at 25 °C with only an ionic strength no ΔrH° is needed; clearing the conditions stores the typed value as at 25 °C, I = 0", () => {
  const s = measuredSystem();
  s.steps[0].measured.temperature = "";
  s.steps[0].dH.value = "";
  const r = buildSystem(s);
  expect(r.ok && r.record.steps[0].pKa.measured?.temperature === 25).toBe(true);
  if (!r.ok) return;
  const back = systemToInput(r.record);
  back.steps[0].measured = { temperature: "", ionicStrength: "", medium: "", scale: "concentration" };
  const plain = buildSystem(back);
  expect(plain.ok && plain.record.steps[0].pKa.value).toBe(6.93);
  expect(plain.ok && plain.record.steps[0].pKa.measured).toBeUndefined();
  expect(plain.ok && plain.record.steps[0].pKa.conditions).toBe("25 °C, I = 0");
});

test("a base entered by pKb with the charge left at 0 is warned at once; +1 is not", async () => {
  const { pkbChargeWarning } = await import("../../src/taskpane/form-to-record");
  const s = emptySystem();
  s.steps[0].enteredAsPkb = true;
  expect(pkbChargeWarning(s)).toMatch(/a neutral base B .* charge \+1/);
  s.topCharge = "1";
  expect(pkbChargeWarning(s)).toBeNull();
  s.topCharge = "0";
  s.steps[0].enteredAsPkb = false;
  expect(pkbChargeWarning(s)).toBeNull();
});
