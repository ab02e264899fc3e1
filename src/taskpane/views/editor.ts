/**
 * Add or edit an acid–base system, a substance form or a source. The draft holds the fields as
 * typed; Save hands it to the controller, which validates before anything is stored and returns
 * problems by field. A base may be entered by its pKb (converted with pKw at 25 °C, shown live).
 */
import type { SourceRecord, SystemRecord, IonRecord, UserLayer, ValueStatus } from "../../library";
import { el, replaceChildren, announce, type Child } from "../dom";
import type { EditDraft, PaneController } from "../controller";
import { describePkbConversion, emptySource, emptyStep, emptySubstance, emptySystem, STATUS_LABEL } from "../forms";
import type { FieldIssue, StepInput, SubstanceInput, SystemInput, SourceInput, ValueInput } from "../forms";
import { citation } from "../describe";
import { button, field, message, resultMessage, select, textArea, textInput } from "./ui";

type NewKind = "system" | "substance" | "source";

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

export class EditorView {
  private draft: EditDraft;
  private readonly form = el("form", { id: "editor-form", novalidate: true, "aria-labelledby": "editor-title" });
  private readonly summary = el("div", { id: "editor-errors", tabindex: "-1" });
  private targetLayer: UserLayer = "workbook";

  constructor(
    private readonly root: HTMLElement,
    private readonly ctl: PaneController,
    private readonly status: (node: HTMLElement) => void,
  ) {
    this.draft = this.fresh("system");
    this.form.addEventListener("submit", (e) => {
      e.preventDefault();
      void this.save();
    });
  }

  private fresh(kind: NewKind, layer: UserLayer = this.targetLayer): EditDraft {
    if (kind === "system") return { kind, layer, originalId: null, input: emptySystem(), overrides: false };
    if (kind === "substance") return { kind, layer, originalId: null, input: emptySubstance(), overrides: false };
    return { kind, layer, originalId: null, input: emptySource(), overrides: false };
  }

  /** Open a draft (from Browse: edit or duplicate). */
  open(draft: EditDraft): void {
    this.draft = draft;
    this.render();
    const first = this.form.querySelector<HTMLElement>("input:not([readonly]),select,textarea");
    first?.focus();
  }

  /** Start a new substance form of a system just saved. */
  private newSubstanceOf(systemId: string, name: string): void {
    const input = emptySubstance();
    input.name = name;
    input.systems = [{ system: systemId, stoich: "1", protons: "0" }];
    this.open({ kind: "substance", layer: this.draft.layer, originalId: null, input, overrides: false });
  }

  render(): void {
    const d = this.draft;
    const editing = d.originalId !== null;
    const what = { system: "acid–base system", substance: "substance form", source: "source" }[d.kind];
    const inLayer = editing && this.ctl.library.get(d.originalId as string, d.kind)?.layer === d.layer;
    const title = !editing ? `New ${what}` : inLayer ? `Editing ${what} '${this.nameOf(d)}'` : `Duplicate of the built-in ${what} '${this.nameOf(d)}'`;
    const top: Child[] = [el("h2", { id: "editor-title" }, title)];
    if (!editing) {
      const kind = select<NewKind>(d.kind, [
        ["system", "Acid–base system (pKa values)"],
        ["substance", "Substance form (what is weighed)"],
        ["source", "Source (a citation)"],
      ], (v) => {
        this.draft = this.fresh(v);
        this.render();
      });
      kind.id = "add-kind";
      top.push(field("What to add", kind).wrap);
    }
    if (!editing) {
      const layer = select<UserLayer>(d.layer, [
        ["workbook", "Workbook library"],
        ["personal", "Personal library"],
      ], (v) => {
        this.targetLayer = v;
        this.draft.layer = v;
      });
      layer.id = "target-layer";
      top.push(field("Save into", layer, { hint: `The workbook library (${this.ctl.stores.workbook.where}) travels with the workbook; the personal library (${this.ctl.stores.personal.where}) stays on this computer.` }).wrap);
    } else {
      const over = this.ctl.library.get(d.originalId as string, d.kind);
      const note = inLayer
        ? `Saved in the ${d.layer} library (${this.ctl.stores[d.layer].where}).${over && over.overrides.length ? " It overrides a built-in entry; deleting it reveals the built-in one again." : ""}`
        : `Saving creates a copy in the ${d.layer} library (${this.ctl.stores[d.layer].where}) that overrides the built-in entry '${this.nameOf(d)}'. The built-in entry stays unchanged.`;
      top.push(message("ok", note));
    }
    const body = d.kind === "system" ? this.systemFields(d.input) : d.kind === "substance" ? this.substanceFields(d.input) : this.sourceFields(d.input, editing);
    const save = el("button", { type: "submit", class: "primary", id: "editor-save" }, editing ? "Save changes" : "Save");
    const cancel = button(editing ? "Cancel editing" : "Clear", () => {
      this.draft = this.fresh(editing ? d.kind : d.kind);
      this.render();
    });
    replaceChildren(this.form, ...body, el("div", { class: "actions" }, save, cancel));
    replaceChildren(this.root, ...top, this.summary, this.form);
    replaceChildren(this.summary);
  }

  private nameOf(d: EditDraft): string {
    return d.kind === "source" ? (d.input as SourceInput).title : (d.input as SystemInput | SubstanceInput).name;
  }

  private idField(input: { id: string }, locked: boolean, label = "Id"): HTMLElement {
    const attrs: Record<string, string> = { pattern: "[a-z0-9][a-z0-9._-]*", maxlength: "64" };
    if (locked) attrs.readonly = "";
    return field(label, textInput(input.id, (v) => (input.id = v), attrs), {
      path: "id",
      hint: locked ? "The id cannot change: sheets and other entries refer to it." : "Lower-case letters, digits, '.', '_' or '-'. Left empty, it is made from the name.",
    }).wrap;
  }

  private sourceOptions(): [string, string][] {
    const list = this.ctl.library.list("source").map((e) => [e.id, `${e.id} — ${citation(e.record as SourceRecord, e.id).slice(0, 70)}`] as [string, string]);
    return [["", "(no source)"], ...list];
  }

  /** Value + conditions + status + source + locator + note. */
  private valueFields(v: ValueInput, path: string, legend: string, extra?: HTMLElement): HTMLElement {
    const status = select<ValueStatus>(v.status, (Object.keys(STATUS_LABEL) as ValueStatus[]).map((s) => [s, STATUS_LABEL[s]] as const), (s) => (v.status = s));
    const source = select<string>(v.source, this.sourceOptions(), (s) => (v.source = s));
    return el(
      "fieldset",
      { "data-path": path },
      el("legend", {}, legend),
      el("div", { class: "row" }, field("Value", textInput(v.value, (x) => (v.value = x), { inputmode: "decimal" }), { path: `${path}.value` }).wrap, field("Conditions", textInput(v.conditions, (x) => (v.conditions = x)), { path: `${path}.conditions` }).wrap),
      extra ?? null,
      el("div", { class: "row" }, field("Status", status, { path: `${path}.status` }).wrap, field("Source", source, { path: `${path}.source` }).wrap),
      el("div", { class: "row" }, field("Where in the source", textInput(v.locator, (x) => (v.locator = x), { placeholder: "Table 2" }), { path: `${path}.locator` }).wrap, field("Note", textInput(v.note, (x) => (v.note = x)), { path: `${path}.note` }).wrap),
      el("p", { class: "hint" }, "A published value names its source; a common-practice or unverified one says why in the note."),
    );
  }

  private systemFields(input: SystemInput): HTMLElement[] {
    const editing = this.draft.originalId !== null;
    const steps = input.steps.map((s, i) => this.stepFields(input, s, i));
    return [
      field("Name", textInput(input.name, (v) => (input.name = v), { required: "" }), { path: "name" }).wrap,
      this.idField(input, editing),
      field("Charge of the fully protonated form", textInput(input.topCharge, (v) => (input.topCharge = v), { inputmode: "numeric" }), {
        path: "topCharge",
        hint: "0 for an acid HA or H₂A; +1 for a base stored through its conjugate acid BH⁺.",
      }).wrap,
      ...steps,
      el("div", { class: "actions" }, input.steps.length < 10 ? button("Add a step", () => {
        input.steps.push(emptyStep());
        this.render();
        this.form.querySelector<HTMLElement>(`[data-path="steps[${input.steps.length - 1}].pKa.value"]`)?.focus();
      }) : null),
      field("Species names (optional, one per line, most protonated first)", textArea(input.speciesNames, (v) => (input.speciesNames = v), 2), { path: "speciesNames" }).wrap,
      field("Note (optional)", textArea(input.note, (v) => (input.note = v)), { path: "note" }).wrap,
    ];
  }

  private stepFields(system: SystemInput, s: StepInput, i: number): HTMLElement {
    const p = `steps[${i}]`;
    const conversion = el("p", { class: "conversion", "aria-live": "polite", hidden: !s.enteredAsPkb });
    const showConversion = (): void => {
      conversion.hidden = !s.enteredAsPkb;
      conversion.textContent = s.enteredAsPkb ? describePkbConversion(s.pKa.value) ?? "Enter the pKb at 25 °C to see the pKa stored." : "";
    };
    const pkb = el("input", { type: "checkbox", id: `${p}-pkb` }) as HTMLInputElement;
    pkb.checked = s.enteredAsPkb;
    pkb.addEventListener("change", () => {
      s.enteredAsPkb = pkb.checked;
      showConversion();
    });
    const pkbRow = el("div", {}, el("div", { class: "check" }, pkb, el("label", { for: pkb.id }, "The value is the pKb of the base (25 °C)")), conversion);
    const pKa = this.valueFields(s.pKa, `${p}.pKa`, "pKa at 25 °C, I = 0 (or pKb)", pkbRow);
    pKa.querySelector<HTMLInputElement>(`[data-path="${p}.pKa.value"]`)?.addEventListener("input", showConversion);
    showConversion();
    const thermo = el(
      "details",
      { open: s.dH.value !== "" || s.dCp.value !== "" },
      el("summary", {}, "ΔrH° and ΔrCp° (optional, for temperature effects)"),
      this.valueFields(s.dH, `${p}.dH`, "ΔrH°, kJ/mol (dissociation of the acid form)"),
      this.valueFields(s.dCp, `${p}.dCp`, "ΔrCp°, J/(K·mol)"),
    );
    const remove = system.steps.length > 1 ? button(`Remove step ${i + 1}`, () => {
      system.steps.splice(i, 1);
      this.render();
    }) : null;
    return el("fieldset", { class: "step" }, el("legend", {}, `Step ${i + 1}`), pKa, thermo, remove ? el("div", { class: "actions" }, remove) : null);
  }

  private substanceFields(input: SubstanceInput): HTMLElement[] {
    const editing = this.draft.originalId !== null;
    const systems = this.ctl.library.list("system").map((e) => [e.id, `${(e.record as SystemRecord).name} (${e.id})`] as [string, string]);
    const ions = this.ctl.library.list("ion").map((e) => [e.id, `${(e.record as IonRecord).formula ?? e.id} — ${(e.record as IonRecord).name}`] as [string, string]);
    const aliasCheck = el("input", { type: "checkbox", id: "formula-alias" }) as HTMLInputElement;
    aliasCheck.checked = input.formulaAlias;
    aliasCheck.addEventListener("change", () => (input.formulaAlias = aliasCheck.checked));
    const sysRows = input.systems.map((row, i) =>
      el(
        "div",
        { class: "row" },
        field(`System ${i + 1}`, select<string>(row.system, [["", "(choose)"], ...systems], (v) => (row.system = v)), { path: `systems[${i}].system` }).wrap,
        field("Units per mole", textInput(row.stoich, (v) => (row.stoich = v), { inputmode: "decimal" }), { path: `systems[${i}].stoich` }).wrap,
        field("Dissociable H⁺ carried", textInput(row.protons, (v) => (row.protons = v), { inputmode: "decimal" }), { path: `systems[${i}].protons` }).wrap,
        button(`Remove system ${i + 1}`, () => {
          input.systems.splice(i, 1);
          this.render();
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
          this.render();
        }),
      ),
    );
    return [
      field("Name", textInput(input.name, (v) => (input.name = v), { required: "" }), { path: "name" }).wrap,
      this.idField(input, editing),
      field("Other names (one per line)", textArea(input.aliases, (v) => (input.aliases = v)), { path: "aliases" }).wrap,
      field("Formula of the form weighed", textInput(input.formula, (v) => (input.formula = v), { placeholder: "Na2HPO4·7H2O" }), { path: "formula", hint: "Hydrate water included; the molar mass is computed from it." }).wrap,
      el("div", { class: "check" }, aliasCheck, el("label", { for: "formula-alias" }, "The formula is also a name to look it up by")),
      el("details", { open: input.formula === "" || input.molarMass.value !== "" }, el("summary", {}, "Molar mass (when there is no formula)"), this.valueFields(input.molarMass, "molarMass", "Molar mass, g/mol")),
      el("div", { class: "row" }, field("Kind", select(input.nature, NATURES, (v) => (input.nature = v)), { path: "nature" }).wrap, field("State", select(input.state, STATES, (v) => (input.state = v)), { path: "state" }).wrap),
      el("fieldset", {}, el("legend", {}, "Acid–base systems it releases"), el("p", { class: "hint" }, "Dissociable H⁺ carried: protons the weighed form still holds on the system (Na₂HPO₄: 1 of 3; a free base: 0)."), ...sysRows, el("div", { class: "actions" }, button("Add a system", () => {
        input.systems.push({ system: "", stoich: "1", protons: "0" });
        this.render();
      }))),
      el("fieldset", {}, el("legend", {}, "Counter-ions"), ...ionRows, el("div", { class: "actions" }, button("Add a counter-ion", () => {
        input.ions.push({ ion: "", stoich: "1" });
        this.render();
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

  private sourceFields(input: SourceInput, editing: boolean): HTMLElement[] {
    const kinds = [["", "(not stated)"], ["paper", "paper"], ["book", "book"], ["handbook", "handbook"], ["standard", "standard"], ["data-compilation", "data compilation"], ["web", "web page"], ["other", "other"]] as const;
    return [
      field("Title", textInput(input.title, (v) => (input.title = v), { required: "" }), { path: "title" }).wrap,
      this.idField(input, editing, "Source key"),
      field("Authors", textInput(input.authors, (v) => (input.authors = v)), { path: "authors" }).wrap,
      el("div", { class: "row" }, field("Year", textInput(input.year, (v) => (input.year = v), { inputmode: "numeric" }), { path: "year" }).wrap, field("Kind", select(input.kind, kinds, (v) => (input.kind = v)), { path: "kind" }).wrap),
      field("Journal, book or series", textInput(input.container, (v) => (input.container = v)), { path: "container" }).wrap,
      el("div", { class: "row" }, field("Edition", textInput(input.edition, (v) => (input.edition = v)), { path: "edition" }).wrap, field("Volume", textInput(input.volume, (v) => (input.volume = v)), { path: "volume" }).wrap, field("Pages", textInput(input.pages, (v) => (input.pages = v)), { path: "pages" }).wrap),
      el("div", { class: "row" }, field("DOI", textInput(input.doi, (v) => (input.doi = v), { placeholder: "10.xxxx/…" }), { path: "doi" }).wrap, field("Web address", textInput(input.url, (v) => (input.url = v), { placeholder: "https://…" }), { path: "url" }).wrap),
      field("How values point into it (optional)", textArea(input.locators, (v) => (input.locators = v)), { path: "locators", hint: "For example: 'Table 3' names the table of pKa values." }).wrap,
      field("Note", textArea(input.note, (v) => (input.note = v)), { path: "note" }).wrap,
    ];
  }

  private async save(): Promise<void> {
    const d = this.draft;
    const saveButton = this.form.querySelector<HTMLButtonElement>("#editor-save");
    if (saveButton) saveButton.disabled = true;
    const r =
      d.kind === "system"
        ? await this.ctl.saveSystem(d.layer, d.input, d.originalId)
        : d.kind === "substance"
          ? await this.ctl.saveSubstance(d.layer, d.input, d.originalId)
          : await this.ctl.saveSource(d.layer, d.input, d.originalId);
    if (saveButton) saveButton.disabled = false;
    if (!r.ok) {
      this.showIssues(r.issues);
      replaceChildren(this.summary, resultMessage(r));
      this.summary.focus();
      announce(r.message);
      return;
    }
    const box = resultMessage(r);
    if (d.kind === "system" && r.id) {
      const id = r.id;
      const name = d.input.name;
      box.appendChild(el("div", { class: "actions" }, button(`Add a substance form of '${name}'`, () => this.newSubstanceOf(id, name))));
    }
    this.draft = this.fresh(d.kind, d.layer);
    this.render();
    replaceChildren(this.summary, box);
    this.status(resultMessage(r));
    announce(r.message);
  }

  private showIssues(issues: FieldIssue[]): void {
    for (const c of Array.from(this.form.querySelectorAll<HTMLElement>("[aria-invalid]"))) c.removeAttribute("aria-invalid");
    for (const e of Array.from(this.form.querySelectorAll<HTMLElement>(".field-error"))) {
      e.hidden = true;
      e.textContent = "";
    }
    let first: HTMLElement | null = null;
    for (const issue of issues) {
      const control =
        this.form.querySelector<HTMLElement>(`[data-path="${CSS.escape(issue.path)}"]:not(fieldset)`) ??
        this.form.querySelector<HTMLElement>(`[data-path="${CSS.escape(`${issue.path}.value`)}"]`);
      if (!control) continue;
      control.setAttribute("aria-invalid", "true");
      const err = document.getElementById(`${control.id}-err`);
      if (err) {
        err.textContent = err.textContent ? `${err.textContent} ${issue.message}` : issue.message;
        err.hidden = false;
      }
      first ??= control;
    }
  }
}
