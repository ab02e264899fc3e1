/**
 * The editor's fields for each kind of entry: an acid–base system with its steps (a step's pKa may
 * be entered as a pKb, its conversion shown live), a substance form, a source. Each field carries
 * its path in the entry, so that problems found on saving are shown beside it.
 */
import type { IonRecord, Library, SystemRecord } from "../../library";
import { el } from "../dom";
import { describeMeasured, describePkbConversion, pkbChargeWarning } from "../form-to-record";
import { emptyStep, type SourceInput, type StepInput, type SubstanceInput, type SystemInput } from "../forms";
import { button, field, select, textArea, textInput } from "./ui";
import { idField, valueFields } from "./value-fields";

/** What the entry forms need from the editor. */
export interface FieldsContext {
  library: Library;
  /** An existing entry is being edited: its id cannot change. */
  editing: boolean;
  /** Draw the editor again (after a step or a row is added or removed). */
  render: () => void;
  /** The editor's form, to focus a field drawn again. */
  form: HTMLElement;
}

const NATURES = [
  ["weak-acid-base", "weak acid or base (or its salt)"],
  ["strong-acid", "strong acid"],
  ["strong-base", "strong base"],
  ["neutral-salt", "neutral salt"],
  ["non-electrolyte", "non-electrolyte"],
] as const;

const STATES = [
  ["", "(not stated)"],
  ["solid", "solid"],
  ["liquid", "liquid"],
  ["solution", "solution"],
  ["gas", "gas"],
] as const;

/** Name, id, charge, the steps (up to 10), species names and note of an acid–base system. */
export function systemFields(ctx: FieldsContext, input: SystemInput): HTMLElement[] {
  const steps = input.steps.map((s, i) => stepFields(ctx, input, s, i));
  return [
    field("Name", textInput(input.name, (v) => (input.name = v), { required: "" }), { path: "name" }).wrap,
    idField(input, ctx.editing),
    field("Charge of the fully protonated form", textInput(input.topCharge, (v) => {
      input.topCharge = v;
      // the steps' live lines (pKb charge check, measured conversion) depend on the charge
      ctx.form.querySelectorAll("fieldset.step").forEach((f) => f.dispatchEvent(new Event("input")));
    }, { inputmode: "numeric" }), {
      path: "topCharge",
      hint: "0 for an acid HA or H₂A; +1 for a base stored through its conjugate acid BH⁺.",
    }).wrap,
    ...steps,
    el("div", { class: "actions" }, input.steps.length < 10 ? button("Add a step", () => {
      input.steps.push(emptyStep());
      ctx.render();
      ctx.form.querySelector<HTMLElement>(`[data-path="steps[${input.steps.length - 1}].pKa.value"]`)?.focus();
    }) : null),
    field("Species names (optional, one per line, most protonated first)", textArea(input.speciesNames, (v) => (input.speciesNames = v), 2), { path: "speciesNames" }).wrap,
    field("Note (optional)", textArea(input.note, (v) => (input.note = v)), { path: "note" }).wrap,
  ];
}

/** One step: its pKa (or the base's pKb), and optionally ΔrH° and ΔrCp°. */
function stepFields(ctx: FieldsContext, system: SystemInput, s: StepInput, i: number): HTMLElement {
  const p = `steps[${i}]`;
  const conversion = el("p", { class: "conversion", "aria-live": "polite", hidden: !s.enteredAsPkb });
  const showConversion = (): void => {
    conversion.hidden = !s.enteredAsPkb;
    const charge = pkbChargeWarning(system);
    conversion.textContent = s.enteredAsPkb ? `${describePkbConversion(s.pKa.value) ?? "Enter the pKb at 25 °C to see the pKa stored."}${charge ? ` ${charge}` : ""}` : "";
  };
  const pkb = el("input", { type: "checkbox", id: `${p}-pkb` }) as HTMLInputElement;
  pkb.checked = s.enteredAsPkb;
  pkb.addEventListener("change", () => {
    s.enteredAsPkb = pkb.checked;
    showConversion();
  });
  const pkbRow = el("div", {}, el("div", { class: "check" }, pkb, el("label", { for: pkb.id }, "The value is the pKb of the base (25 °C)")), conversion);
  const pKa = valueFields(ctx.library, s.pKa, `${p}.pKa`, "pKa (or pKb)", el("div", {}, pkbRow, measuredFields(s, i)));
  pKa.querySelector<HTMLInputElement>(`[data-path="${p}.pKa.value"]`)?.addEventListener("input", showConversion);
  showConversion();
  const thermo = el(
    "details",
    { open: s.dH.value !== "" || s.dCp.value !== "" },
    el("summary", {}, "ΔrH° and ΔrCp° (optional, for temperature effects)"),
    valueFields(ctx.library, s.dH, `${p}.dH`, "ΔrH°, kJ/mol (dissociation of the acid form)"),
    valueFields(ctx.library, s.dCp, `${p}.dCp`, "ΔrCp°, J/(K·mol)"),
  );
  const converted = pKa.querySelector<HTMLElement>(".measured-conversion");
  const showMeasured = (): void => {
    if (converted) converted.textContent = describeMeasured(system, i) ?? "Without a temperature or ionic strength here, the value is taken at 25 °C, I = 0.";
  };
  showMeasured();
  const remove = system.steps.length > 1 ? button(`Remove step ${i + 1}`, () => {
    system.steps.splice(i, 1);
    ctx.render();
  }) : null;
  const box = el("fieldset", { class: "step" }, el("legend", {}, `Step ${i + 1}`), pKa, thermo, remove ? el("div", { class: "actions" }, remove) : null);
  box.addEventListener("input", showMeasured);
  box.addEventListener("input", showConversion);
  box.addEventListener("change", showMeasured);
  return box;
}

/**
 * Where the pKa was measured: temperature, ionic strength, medium and scale. Filled in, the value is
 * stored converted to 25 °C and I = 0 (the library's conversion, shown live with its method).
 */
function measuredFields(s: StepInput, i: number): HTMLElement {
  const m = s.measured;
  const p = `steps[${i}].pKa.measured`;
  const scales = [["concentration", "concentration, [H⁺][B]/[A]"], ["mixed", "mixed, a(H⁺)[B]/[A] (glass electrode)"]] as const;
  return el(
    "details",
    { class: "measured", open: m.temperature !== "" || m.ionicStrength !== "" },
    el("summary", {}, "Measured at another temperature or ionic strength"),
    el(
      "div",
      { class: "row" },
      field("Temperature, °C", textInput(m.temperature, (v) => (m.temperature = v), { inputmode: "decimal", placeholder: "25" }), { path: `${p}.temperature` }).wrap,
      field("Ionic strength, mol/L", textInput(m.ionicStrength, (v) => (m.ionicStrength = v), { inputmode: "decimal", placeholder: "0" }), { path: `${p}.ionicStrength` }).wrap,
    ),
    el(
      "div",
      { class: "row" },
      field("Medium (optional)", textInput(m.medium, (v) => (m.medium = v), { placeholder: "KCl" }), { path: `${p}.medium` }).wrap,
      field("Scale at that ionic strength", select(m.scale, scales, (v) => (m.scale = v)), { path: `${p}.scale` }).wrap,
    ),
    el("p", { class: "hint measured-conversion", "aria-live": "polite" }),
  );
}

/** A substance form: names, formula or molar mass, nature, the systems and counter-ions it releases. */
export function substanceFields(ctx: FieldsContext, input: SubstanceInput): HTMLElement[] {
  const systems = ctx.library.list("system").map((e) => [e.id, `${(e.record as SystemRecord).name} (${e.id})`] as [string, string]);
  const ions = ctx.library.list("ion").map((e) => [e.id, `${(e.record as IonRecord).formula ?? e.id} — ${(e.record as IonRecord).name}`] as [string, string]);
  const aliasCheck = el("input", { type: "checkbox", id: "formula-alias" }) as HTMLInputElement;
  aliasCheck.checked = input.formulaAlias;
  aliasCheck.addEventListener("change", () => (input.formulaAlias = aliasCheck.checked));
  const takeOver = el("input", { type: "checkbox", id: "take-over-names", "data-path": "takeOverNames" }) as HTMLInputElement;
  takeOver.checked = input.takeOverNames === true;
  takeOver.addEventListener("change", () => (input.takeOverNames = takeOver.checked));
  const sysRows = input.systems.map((row, i) =>
    el(
      "div",
      { class: "row" },
      field(`System ${i + 1}`, select<string>(row.system, [["", "(choose)"], ...systems], (v) => (row.system = v)), { path: `systems[${i}].system` }).wrap,
      field("Units per mole", textInput(row.stoich, (v) => (row.stoich = v), { inputmode: "decimal" }), { path: `systems[${i}].stoich` }).wrap,
      field("Dissociable H⁺ carried", textInput(row.protons, (v) => (row.protons = v), { inputmode: "decimal" }), { path: `systems[${i}].protons` }).wrap,
      button(`Remove system ${i + 1}`, () => {
        input.systems.splice(i, 1);
        ctx.render();
      }),
    ),
  );
  const ionRows = input.ions.map((row, i) =>
    el(
      "div",
      { class: "row" },
      field(`Counter-ion ${i + 1}`, select<string>(row.ion, [["", "(choose)"], ...ions], (v) => (row.ion = v)), { path: `ions[${i}].ion` }).wrap,
      field("Per mole", textInput(row.stoich, (v) => (row.stoich = v), { inputmode: "decimal" }), { path: `ions[${i}].stoich` }).wrap,
      button(`Remove counter-ion ${i + 1}`, () => {
        input.ions.splice(i, 1);
        ctx.render();
      }),
    ),
  );
  return [
    field("Name", textInput(input.name, (v) => (input.name = v), { required: "" }), { path: "name" }).wrap,
    idField(input, ctx.editing),
    field("Other names (one per line)", textArea(input.aliases, (v) => (input.aliases = v)), { path: "aliases" }).wrap,
    field("Formula of the form weighed", textInput(input.formula, (v) => (input.formula = v), { placeholder: "Na2HPO4·7H2O" }), { path: "formula", hint: "Hydrate water included; the molar mass is computed from it." }).wrap,
    el("div", { class: "check" }, aliasCheck, el("label", { for: "formula-alias" }, "The formula is also a name to look it up by")),
    el("div", { class: "check" }, takeOver, el("label", { for: "take-over-names" }, "Take over names used by other entries (formulas using them change to this entry)")),
    el("details", { open: input.formula === "" || input.molarMass.value !== "" }, el("summary", {}, "Molar mass (when there is no formula)"), valueFields(ctx.library, input.molarMass, "molarMass", "Molar mass, g/mol")),
    el("div", { class: "row" }, field("Kind", select(input.nature, NATURES, (v) => (input.nature = v)), { path: "nature" }).wrap, field("State", select(input.state, STATES, (v) => (input.state = v)), { path: "state" }).wrap),
    el("fieldset", {}, el("legend", {}, "Acid–base systems it releases"), el("p", { class: "hint" }, "Dissociable H⁺ carried: protons the weighed form still holds on the system (Na₂HPO₄: 1 of 3; a free base: 0)."), ...sysRows, el("div", { class: "actions" }, button("Add a system", () => {
      input.systems.push({ system: "", stoich: "1", protons: "0" });
      ctx.render();
    }))),
    el("fieldset", {}, el("legend", {}, "Counter-ions"), ...ionRows, el("div", { class: "actions" }, button("Add a counter-ion", () => {
      input.ions.push({ ion: "", stoich: "1" });
      ctx.render();
    }))),
    el(
      "details",
      { open: input.neutral !== "" || input.freeH !== "" || input.freeOH !== "" },
      el("summary", {}, "Strong acids and bases, non-electrolytes"),
      el("div", { class: "row" }, field("H⁺ released outright", textInput(input.freeH, (v) => (input.freeH = v)), { path: "freeH" }).wrap, field("OH⁻ released outright", textInput(input.freeOH, (v) => (input.freeOH = v)), { path: "freeOH" }).wrap, field("Neutral particles", textInput(input.neutral, (v) => (input.neutral = v)), { path: "neutral" }).wrap),
    ),
    field("Note (optional)", textArea(input.note, (v) => (input.note = v)), { path: "note" }).wrap,
  ];
}

/** A source: its citation and how values point into it. */
export function sourceFields(ctx: FieldsContext, input: SourceInput): HTMLElement[] {
  const kinds = [["", "(not stated)"], ["paper", "paper"], ["book", "book"], ["handbook", "handbook"], ["standard", "standard"], ["data-compilation", "data compilation"], ["web", "web page"], ["other", "other"]] as const;
  return [
    field("Title", textInput(input.title, (v) => (input.title = v), { required: "" }), { path: "title" }).wrap,
    idField(input, ctx.editing, "Source key"),
    field("Authors", textInput(input.authors, (v) => (input.authors = v)), { path: "authors" }).wrap,
    el("div", { class: "row" }, field("Year", textInput(input.year, (v) => (input.year = v), { inputmode: "numeric" }), { path: "year" }).wrap, field("Kind", select(input.kind, kinds, (v) => (input.kind = v)), { path: "kind" }).wrap),
    field("Journal, book or series", textInput(input.container, (v) => (input.container = v)), { path: "container" }).wrap,
    el("div", { class: "row" }, field("Edition", textInput(input.edition, (v) => (input.edition = v)), { path: "edition" }).wrap, field("Volume", textInput(input.volume, (v) => (input.volume = v)), { path: "volume" }).wrap, field("Pages", textInput(input.pages, (v) => (input.pages = v)), { path: "pages" }).wrap),
    el("div", { class: "row" }, field("DOI", textInput(input.doi, (v) => (input.doi = v), { placeholder: "10.xxxx/…" }), { path: "doi" }).wrap, field("Web address", textInput(input.url, (v) => (input.url = v), { placeholder: "https://…" }), { path: "url" }).wrap),
    field("How values point into it (optional)", textArea(input.locators, (v) => (input.locators = v)), { path: "locators", hint: "For example: 'Table 3' names the table of pKa values." }).wrap,
    field("Note", textArea(input.note, (v) => (input.note = v)), { path: "note" }).wrap,
  ];
}
