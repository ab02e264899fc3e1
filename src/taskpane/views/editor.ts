/**
 * Add or edit an acid–base system, a substance form or a source. The draft holds the fields as
 * typed; Save hands it to the controller, which validates before anything is stored and returns
 * problems by field. A base may be entered by its pKb (converted with pKw at 25 °C, shown live).
 * The fields of each kind of entry are in entry-fields.ts.
 */
import type { UserLayer } from "../../library";
import { el, replaceChildren, announce, type Child } from "../dom";
import type { EditDraft, PaneController } from "../controller";
import { emptySource, emptySubstance, emptySystem } from "../forms";
import type { FieldIssue, SubstanceInput, SystemInput, SourceInput } from "../forms";
import { sourceFields, substanceFields, systemFields, type FieldsContext } from "./entry-fields";
import { button, field, message, resultMessage, select, textInput } from "./ui";

type NewKind = "system" | "substance" | "source";

export class EditorView {
  private draft: EditDraft;
  private readonly form = el("form", { id: "editor-form", novalidate: true, "aria-labelledby": "editor-title" });
  private readonly summary = el("div", { id: "editor-errors", tabindex: "-1" });
  private targetLayer: UserLayer = "workbook";
  /** New-entry drafts by kind: switching "What to add" (to add the source a value needs) loses nothing. */
  private readonly drafts = new Map<NewKind, EditDraft>();

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
    const title = !editing ? `New ${what}` : inLayer ? `Editing ${what} '${this.nameOf(d)}'` : `Override of the built-in ${what} '${this.nameOf(d)}'`;
    const top: Child[] = [el("h2", { id: "editor-title" }, title)];
    if (!editing) {
      const kind = select<NewKind>(d.kind, [
        ["system", "Acid–base system (pKa values)"],
        ["substance", "Substance form (what is weighed)"],
        ["source", "Source (a citation)"],
      ], (v) => {
        this.drafts.set(d.kind, d);
        this.draft = this.drafts.get(v) ?? this.fresh(v);
        this.draft.layer = this.targetLayer;
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
        const r = this.form.querySelector<HTMLElement>("#change-reason")?.closest<HTMLElement>(".field");
        if (r) r.hidden = v !== "workbook";
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
    const ctx: FieldsContext = { library: this.ctl.library, editing, render: () => this.render(), form: this.form };
    const body = d.kind === "system" ? systemFields(ctx, d.input) : d.kind === "substance" ? substanceFields(ctx, d.input) : sourceFields(ctx, d.input);
    const reason = field("Reason (for the workbook's change record)", textInput(this.ctl.changeReason, (v) => (this.ctl.changeReason = v), { id: "change-reason" }), {
      hint: "Optional; recorded with who and when when this is saved in the workbook library.",
    }).wrap;
    reason.hidden = d.layer !== "workbook";
    const save = el("button", { type: "submit", class: "primary", id: "editor-save" }, editing ? "Save changes" : "Save");
    const cancel = button(editing ? "Cancel editing" : "Clear", () => {
      this.draft = this.fresh(d.kind);
      this.render();
    });
    replaceChildren(this.form, ...body, reason, el("div", { class: "actions" }, save, cancel));
    replaceChildren(this.root, ...top, this.summary, this.form);
    replaceChildren(this.summary);
  }

  private nameOf(d: EditDraft): string {
    return d.kind === "source" ? (d.input as SourceInput).title : (d.input as SystemInput | SubstanceInput).name;
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
      this.status(resultMessage(r)); // a "Saved" line from before must not stay up beside a failure
      this.summary.scrollIntoView({ block: "start" });
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
    this.drafts.delete(d.kind);
    // Back to a waiting draft of another kind (a value that needed this source), else a fresh form.
    const waiting = d.kind === "source" && d.originalId === null ? [...this.drafts.values()][0] : undefined;
    this.draft = waiting ?? this.fresh(d.kind, d.layer);
    if (waiting) this.drafts.delete(waiting.kind);
    this.render();
    if (waiting) box.appendChild(el("p", {}, `Back to the ${waiting.kind === "system" ? "acid–base system" : "substance form"} you were adding: the new source can now be chosen.`));
    replaceChildren(this.summary, box);
    this.status(resultMessage(r));
    this.summary.scrollIntoView({ block: "start" });
    this.summary.focus();
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
        this.form.querySelector<HTMLElement>(`[data-path="${CSS.escape(`${issue.path}.value`)}"]`) ??
        this.form.querySelector<HTMLElement>(`[data-path="${CSS.escape(issue.path.replace(/\[\d+\]$/, ""))}"]:not(fieldset)`);
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
