/**
 * What the pane does to the workbook library as a whole: pin the constants the workbook's formulas
 * use (a snapshot the next Protolyte version cannot change), show where the built-in library now
 * differs from the pin and update it deliberately, and copy a personal entry (with what it uses)
 * into the workbook. Each change goes into the change record. No DOM.
 */
import { dependenciesOf, pinDrift, pinNames, putEntry, updatePin } from "../library";
import type { DriftItem, EntryKind, EntryRef } from "../library";
import { KIND_LABEL } from "./describe";
import { clone, emptyDoc } from "./layer-docs";
import { PaneState, type ActionResult } from "./pane-state";

export class WorkbookActions extends PaneState {
  /** Pin the constants the named substances use (names as typed in formulas). */
  pin(names: readonly string[]): Promise<ActionResult> {
    return this.serial(async () => {
      const wanted = [...new Set(names.map((n) => n.trim()).filter((n) => n !== ""))];
      if (!wanted.length) return { ok: false, message: "Not pinned: no substance names to pin.", issues: [], other: [] };
      const plan = pinNames(this.library, wanted);
      if (plan.unknown.length === wanted.length) return { ok: false, message: `Not pinned: no known substance among ${wanted.map((n) => `'${n}'`).join(", ")}.`, issues: [], other: [] };
      const summary = `pinned ${plan.doc.pin!.entries.length} entries (built-in ${this.library.version}) for ${wanted.join(", ")}; copied now: ${plan.copied.map((r) => `${KIND_LABEL[r.kind]} ${r.id}`).join(", ") || "none"}`;
      const r = await this.commit("workbook", plan.doc, null, `Pinned the constants of ${wanted.length} name${wanted.length === 1 ? "" : "s"} in the workbook library (${plan.copied.length} entries copied).`, [], { action: "pin", summary });
      if (r.ok && plan.unknown.length) r.warnings.push(`Not found, so not pinned: ${plan.unknown.map((n) => `'${n}'`).join(", ")}.`);
      return r;
    });
  }

  /** Pinned entries whose built-in counterpart now differs. */
  drift(): DriftItem[] {
    return pinDrift(this.library);
  }

  /** Replace drifted pinned entries by the built-in values now (the user's deliberate choice). */
  updatePin(): Promise<ActionResult> {
    return this.serial(async () => {
      const plan = updatePin(this.library);
      if (!plan) return { ok: false, message: "The workbook has no pin to update.", issues: [], other: [] };
      const summary = `pin updated to built-in ${this.library.version}: ${plan.updated.map((d) => `${KIND_LABEL[d.kind]} ${d.id} (${d.diff.map((x) => `${x.path} ${x.old ?? "—"} → ${x.new ?? "—"}`).join("; ")})`).join(", ") || "nothing differed"}`;
      return this.commit("workbook", plan.doc, null, `Updated the pin: ${plan.updated.length} entr${plan.updated.length === 1 ? "y" : "ies"} now hold the built-in values.`, [], { action: "pin", summary });
    });
  }

  /** Copy a personal entry into the workbook, with the personal entries it uses (the workbook stands alone). */
  copyToWorkbook(kind: EntryKind, id: string): Promise<ActionResult> {
    return this.serial(async () => {
      const entry = this.library.get(id, kind);
      if (!entry || entry.layer !== "personal") return { ok: false, message: `There is no personal ${KIND_LABEL[kind]} '${id}' to copy.`, issues: [], other: [] };
      const refs: EntryRef[] = kind === "substance" ? dependenciesOf(this.library, id) : [{ kind, id }];
      if (kind === "system") {
        for (const step of (entry.record as { steps: { pKa: { source?: string }; dH?: { source?: string }; dCp?: { source?: string } }[] }).steps) {
          for (const v of [step.pKa, step.dH, step.dCp]) if (v?.source) refs.push({ kind: "source", id: v.source });
        }
      }
      const doc = clone(this.library.layers.workbook ?? emptyDoc("workbook"));
      const copied = refs.filter((r) => this.library.get(r.id, r.kind)?.layer === "personal");
      for (const r of copied) putEntry(doc, r.kind, r.id, clone(this.library.get(r.id, r.kind)!.record));
      const name = (entry.record as { name?: string; title?: string }).name ?? (entry.record as { title?: string }).title ?? id;
      const summary = `copied from the personal library: ${copied.map((r) => `${KIND_LABEL[r.kind]} ${r.id}`).join(", ")}`;
      return this.commit("workbook", doc, null, `Copied '${name}' into the workbook library (${copied.length} entr${copied.length === 1 ? "y" : "ies"}); it now holds on every computer.`, [], { action: "copy", entry: { kind, id }, name, summary });
    });
  }
}
