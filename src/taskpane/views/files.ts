/**
 * Import and export of library files. Export: a download (Blob + link). Import: a chosen file is
 * size-checked, read, validated and previewed (what it adds, overrides, replaces or removes); it is
 * applied only when the user confirms, and a failed import changes nothing.
 */
import type { UserLayer } from "../../library";
import { MAX_LIBRARY_BYTES } from "../../library";
import { el, replaceChildren, announce } from "../dom";
import type { PaneController } from "../controller";
import type { ImportMode } from "../import-preview";
import { button, download, field, message, resultMessage, select } from "./ui";
import { workbookSection } from "./workbook";

export class FilesView {
  private layer: UserLayer = "workbook";
  private mode: ImportMode = "merge";
  private readonly outcome = el("div", { id: "import-outcome" });
  private readonly preview = el("div", { id: "import-preview" });
  private readonly exportNote = el("div", { id: "export-note" });
  private readonly file = el("input", { type: "file", id: "import-file", accept: ".json,application/json" });

  constructor(
    private readonly root: HTMLElement,
    private readonly ctl: PaneController,
    private readonly status: (node: HTMLElement) => void,
    /** Substance names to offer for pinning (the Try it mixture). */
    private readonly names: () => string[] = () => [],
  ) {
    this.file.addEventListener("change", () => void this.chosen());
  }

  render(): void {
    const exports = (["workbook", "personal"] as const).map((layer) => {
      const empty = !this.ctl.library.layers[layer];
      return button(`Export the ${layer} library${empty ? " (empty)" : ""}`, () => this.export(layer), { id: `export-${layer}`, disabled: empty, "aria-describedby": "export-note" });
    });
    const layer = select<UserLayer>(this.layer, [
      ["workbook", "Workbook library"],
      ["personal", "Personal library"],
    ], (v) => (this.layer = v));
    layer.id = "import-layer";
    const mode = select<ImportMode>(this.mode, [
      ["merge", "Add to it (same ids replaced)"],
      ["replace", "Replace it with the file"],
    ], (v) => (this.mode = v));
    mode.id = "import-mode";
    replaceChildren(
      this.root,
      el("h2", {}, "Export"),
      el("p", { class: "hint" }, "A library file (JSON) can be kept with a validation record or given to a colleague."),
      el("div", { class: "actions" }, ...exports, button("Export everything in effect", () => this.export("effective"), { id: "export-effective" })),
      this.exportNote,
      el("h2", {}, "Import"),
      field("Import into", layer, { hint: `Workbook library: ${this.ctl.stores.workbook.where}. Personal library: ${this.ctl.stores.personal.where}.` }).wrap,
      field("How", mode).wrap,
      field("Library file", this.file, { hint: `A Protolyte library file (.json), at most ${(MAX_LIBRARY_BYTES / 1048576).toFixed(0)} MB. You will see what it changes before anything is applied.` }).wrap,
      this.outcome,
      this.preview,
      workbookSection(this.ctl, this.names, this.status),
    );
    this.renderPreview();
  }

  private export(which: UserLayer | "effective"): void {
    const f = this.ctl.exportFile(which);
    if (!f) {
      replaceChildren(this.exportNote, message("warn", `The ${which} library is empty: nothing to export.`));
      return;
    }
    download(f.fileName, f.text);
    replaceChildren(this.exportNote, message("ok", `Downloaded ${f.fileName}.`));
    announce(`Downloaded ${f.fileName}`);
  }

  private async chosen(): Promise<void> {
    const f = this.file.files?.[0];
    if (!f) return;
    replaceChildren(this.outcome);
    const r = await this.ctl.previewImport(this.layer, f.name, f.size, () => f.text(), this.mode);
    this.file.value = "";
    if (!r.ok) {
      replaceChildren(this.outcome, message("error", r.message, r.errors.slice(0, 20).concat(r.errors.length > 20 ? [`… and ${r.errors.length - 20} more`] : [])));
      announce(r.message);
      return;
    }
    this.renderPreview();
    this.preview.querySelector<HTMLElement>("#import-apply")?.focus();
  }

  renderPreview(): void {
    const p = this.ctl.pendingImport;
    if (!p) {
      replaceChildren(this.preview);
      return;
    }
    const counts = new Map<string, number>();
    for (const c of p.changes) counts.set(c.action, (counts.get(c.action) ?? 0) + 1);
    const apply = button("Apply import", async () => {
      const r = await this.ctl.confirmImport();
      replaceChildren(this.outcome, resultMessage(r));
      this.status(resultMessage(r));
      announce(r.message);
    }, { class: "primary", id: "import-apply" });
    const cancel = button("Cancel", () => {
      this.ctl.cancelImport();
      replaceChildren(this.outcome, message("ok", "Import cancelled: nothing changed."));
      this.file.focus();
    }, { id: "import-cancel" });
    replaceChildren(
      this.preview,
      el(
        "div",
        { class: "msg warn", role: "group", "aria-labelledby": "import-preview-title" },
        el("p", { id: "import-preview-title" }, `'${p.fileName}' → ${p.layer} library (${p.mode === "merge" ? "added to it" : "replacing it"}): ${p.changes.length} change${p.changes.length === 1 ? "" : "s"}. Nothing is applied until you confirm.`),
        el("p", { id: "import-stamp" }, p.stamp),
        el("ul", { class: "changes", "aria-label": "Changes" }, ...p.changes.map((c) => el("li", { "data-action": c.action }, el("strong", {}, c.name), ` (${c.id}): ${c.text}`))),
        el("div", { class: "actions" }, apply, cancel),
      ),
    );
  }
}
