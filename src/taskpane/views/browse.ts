/**
 * Browse and search every entry in effect: its layer, what it overrides, each value with unit,
 * conditions, source (as a citation) and status; edit, duplicate and delete from here.
 */
import type { EntryKind, IonRecord, LayerName, MergedEntry, SourceRecord, SubstanceRecord, SystemRecord } from "../../library";
import { el, replaceChildren, uid, announce } from "../dom";
import type { PaneController, EditDraft } from "../controller";
import { displayName } from "../charts/palette";
import { citation, entryName, entrySummary, filterEntries, KIND_LABEL, LAYER_LABEL, overrideText, valuesOf } from "../describe";
import { button, resultMessage, select } from "./ui";
import { ACTIVITY_MODELS, pitzerCoverage, pitzerRuleText } from "../../chem";

const SHOWN = 120;

export interface BrowseHooks {
  /** Open the editor with a draft (edit or duplicate). */
  edit(draft: EditDraft): void;
  status(node: HTMLElement): void;
}

export class BrowseView {
  private query = "";
  private kind: EntryKind | "all" = "all";
  private layer: LayerName | "all" = "all";
  private readonly open = new Set<string>();
  private readonly list = el("ul", { class: "entries", id: "entries" });
  private readonly count = el("p", { class: "more", id: "entry-count", "aria-live": "polite" });

  constructor(
    private readonly root: HTMLElement,
    private readonly ctl: PaneController,
    private readonly hooks: BrowseHooks,
  ) {
    const search = el("input", { type: "search", id: "search", autocomplete: "off", spellcheck: "false", placeholder: "name, alias, formula, id…" });
    search.addEventListener("input", () => {
      this.query = search.value;
      this.render();
    });
    const kind = select<EntryKind | "all">("all", [
      ["all", "All entries"],
      ["substance", "Substances"],
      ["system", "Acid–base systems"],
      ["ion", "Strong ions"],
      ["source", "Sources"],
      ["atomicWeight", "Atomic weights"],
    ], (v) => {
      this.kind = v;
      this.render();
    });
    kind.id = "kind-filter";
    const layer = select<LayerName | "all">("all", [
      ["all", "All layers"],
      ["builtin", "Built-in"],
      ["workbook", "Workbook"],
      ["personal", "Personal"],
    ], (v) => {
      this.layer = v;
      this.render();
    });
    layer.id = "layer-filter";
    replaceChildren(
      root,
      el("div", { class: "field" }, el("label", { for: "search" }, "Search the library"), search),
      el("div", { class: "row" }, el("div", { class: "field" }, el("label", { for: "kind-filter" }, "Show"), kind), el("div", { class: "field" }, el("label", { for: "layer-filter" }, "Layer"), layer)),
      this.count,
      this.list,
    );
  }

  render(): void {
    const all = this.ctl.library.list();
    const found = filterEntries(all, this.query, this.kind, this.layer);
    this.count.textContent = found.length > SHOWN ? `${found.length} entries match; showing the first ${SHOWN}. Narrow the search to see more.` : `${found.length} entr${found.length === 1 ? "y" : "ies"}`;
    replaceChildren(this.list, ...found.slice(0, SHOWN).map((e) => this.item(e)));
  }

  private item(entry: MergedEntry): HTMLElement {
    const key = `${entry.kind}:${entry.id}`;
    const bodyId = uid("entry");
    const expanded = this.open.has(key);
    const over = overrideText(entry);
    const head = el(
      "button",
      { type: "button", class: "entry-head", "aria-expanded": expanded, "aria-controls": bodyId },
      el("span", { class: "name" }, entryName(entry)),
      el("span", { class: `badge layer-${entry.layer}` }, LAYER_LABEL[entry.layer]),
      over ? el("span", { class: "badge overrides" }, over) : null,
      this.hasFlagged(entry) ? el("span", { class: "badge flag" }, "has unverified values") : null,
      el("span", { class: "summary" }, `${KIND_LABEL[entry.kind]} · ${entrySummary(entry)}`),
    );
    const body = el("div", { class: "entry-body", id: bodyId, hidden: !expanded });
    if (expanded) this.fillBody(body, entry);
    head.addEventListener("click", () => {
      const now = head.getAttribute("aria-expanded") !== "true";
      head.setAttribute("aria-expanded", String(now));
      if (now) {
        this.open.add(key);
        this.fillBody(body, entry);
      } else this.open.delete(key);
      body.hidden = !now;
    });
    return el("li", { class: "entry", "data-kind": entry.kind, "data-id": entry.id, "data-layer": entry.layer }, head, body);
  }

  private hasFlagged(entry: MergedEntry): boolean {
    return valuesOf(entry, () => undefined).some((v) => v.flagged);
  }

  private fillBody(body: HTMLElement, entry: MergedEntry): void {
    const sources = (id: string): SourceRecord | undefined => this.ctl.library.get(id, "source")?.record as SourceRecord | undefined;
    const facts: [string, string][] = [["id", entry.id], ["from", `${LAYER_LABEL[entry.layer]} library`]];
    if (entry.overrides.length) facts.push(["hides", entry.overrides.map((l) => `${LAYER_LABEL[l]} entry`).join(", ")]);
    if (entry.kind === "substance") {
      const r = entry.record as SubstanceRecord;
      if (r.aliases?.length) facts.push(["also called", r.aliases.join("; ")]);
      if (r.formula) facts.push(["formula", `${displayName(r.formula)}${r.formulaAlias === false ? " (not a lookup name)" : ""}`]);
      const resolved = this.ctl.library.resolve(entry.id);
      if (resolved.ok && resolved.component.molarMass !== undefined && !r.molarMass) facts.push(["molar mass", `${resolved.component.molarMass.toFixed(3)} g/mol (from the formula)`]);
      if (!resolved.ok) facts.push(["cannot be used", resolved.message]);
      facts.push(["kind", r.nature.replace(/-/g, " ")]);
      for (const s of r.systems ?? []) facts.push(["system", `${s.stoich} × ${this.ctl.library.get(s.system, "system") ? (this.ctl.library.get(s.system, "system")!.record as SystemRecord).name : s.system}, carrying ${s.protons} dissociable H⁺`]);
      for (const s of r.ions ?? []) {
        const ion = this.ctl.library.get(s.ion, "ion")?.record as IonRecord | undefined;
        facts.push(["ion", `${s.stoich} × ${displayName(ion?.formula ?? s.ion, ion?.charge)}`]);
      }
      if (r.neutral) facts.push(["neutral particles", String(r.neutral)]);
      if (r.freeH) facts.push(["H⁺ released", String(r.freeH)]);
      if (r.freeOH) facts.push(["OH⁻ released", String(r.freeOH)]);
    } else if (entry.kind === "system") {
      const r = entry.record as SystemRecord;
      facts.push(["top charge", `${r.topCharge > 0 ? "+" : ""}${r.topCharge}`]);
      if (r.speciesNames) facts.push(["species", r.speciesNames.map(displayName).join(" → ")]);
      if (r.complexes?.length) facts.push(["complexes", r.complexes.map((c) => c.name).join(", ")]);
    } else if (entry.kind === "source") {
      facts.push(["citation", citation(entry.record as SourceRecord, entry.id)]);
      const r = entry.record as SourceRecord;
      if (r.locators) facts.push(["locators", r.locators]);
    } else if (entry.kind === "ion") {
      const r = entry.record as IonRecord;
      facts.push(["charge", String(r.charge)]);
    }
    const note = (entry.record as { note?: string }).note;
    if (note && entry.kind !== "atomicWeight") facts.push(["note", note]);
    const values = valuesOf(entry, sources);
    // Each distinct provenance once, numbered; the values point to it (phosphate's nine values share a few).
    const provs = [...new Set(values.map((v) => v.provenance).filter((p) => p !== ""))];
    const ref = (p: string): string => (provs.length > 1 ? ` [${provs.indexOf(p) + 1}]` : "");
    replaceChildren(
      body,
      el("dl", { class: "facts" }, ...facts.flatMap(([k, v]) => [el("dt", {}, k), el("dd", {}, v)])),
      values.length
        ? el(
            "ul",
            { class: "values", "aria-label": "Values" },
            ...values.map((v) =>
              el(
                "li",
                { class: v.flagged ? "flagged" : "" },
                el("span", {}, `${v.label} = `),
                el("span", { class: "amount" }, v.amount),
                el("span", {}, ` (${v.conditions})`),
                el("span", { class: `badge ${v.flagged ? "flag" : "layer-builtin"}` }, v.statusText),
                v.provenance ? el("span", { class: "ref" }, ref(v.provenance)) : null,
                v.conversion ? el("p", { class: "hint converted" }, v.conversion) : null,
              ),
            ),
          )
        : null,
      provs.length
        ? el("ol", { class: "values prov-list", "aria-label": "Sources and provenance" }, ...provs.map((p) => el("li", { class: "prov" }, provs.length > 1 ? `[${provs.indexOf(p) + 1}] ${p}` : `Source: ${p}`)))
        : null,
      entry.kind === "system" || entry.kind === "ion" ? this.pitzer(entry.kind, entry.id) : null,
      this.actions(entry),
    );
  }

  /** The "pitzer" activity model's parameters for this system's species or this ion, each with its source and status, and the rule for species without any. */
  private pitzer(kind: "system" | "ion", id: string): HTMLElement {
    const c = pitzerCoverage(kind, id);
    const count = c.lines.length === 1 ? "1 parameter set" : `${c.lines.length} parameter sets`;
    return el(
      "details",
      { class: "ion-specific" },
      el("summary", {}, `${ACTIVITY_MODELS.pitzer.label}: ${count}${c.rules.length ? ", fallback rule" : ""}`),
      c.lines.length
        ? el(
            "ul",
            { class: "values", "aria-label": "Pitzer parameters" },
            ...c.lines.map((l) =>
              el(
                "li",
                { class: l.flagged ? "flagged" : "" },
                el("span", {}, `${l.ions.map(displayName).join(l.kind === "binary" ? "–" : ", ")}: `),
                el("span", { class: "amount" }, l.values),
                el("span", { class: `badge ${l.flagged ? "flag" : "layer-builtin"}` }, l.statusText),
                el("p", { class: "prov" }, `Source: ${l.source}`),
              ),
            ),
          )
        : null,
      ...c.rules.map((r) => el("p", { class: "hint" }, pitzerRuleText(r, displayName))),
    );
  }

  private actions(entry: MergedEntry): HTMLElement {
    const editable = entry.kind === "system" || entry.kind === "substance" || entry.kind === "source";
    const bar = el("div", { class: "actions" });
    const name = entryName(entry);
    if (editable && entry.layer !== "builtin") {
      bar.appendChild(button("Edit", () => {
        const d = this.ctl.editDraft(entry.kind as "system", entry.id);
        if (d) this.hooks.edit(d);
      }, { "aria-label": `Edit ${name}` }));
    }
    if (editable) {
      const label = entry.layer === "builtin" ? "Override in the workbook…" : "Duplicate";
      bar.appendChild(button(label, () => {
        const d = this.ctl.duplicateDraft(entry.kind as "system", entry.id);
        if (d) this.hooks.edit(d);
      }, { "aria-label": `${label.replace("…", "")}: ${name}` }));
    }
    if (entry.layer === "personal" && entry.kind !== "atomicWeight") {
      bar.appendChild(button("Copy into the workbook", async () => {
        const r = await this.ctl.copyToWorkbook(entry.kind, entry.id);
        this.hooks.status(resultMessage(r));
        announce(r.message);
      }, { "aria-label": `Copy into the workbook: ${name}` }));
    }
    if (entry.layer !== "builtin") {
      const layer = entry.layer;
      const del = button("Delete…", () => {
        const confirmBox = el(
          "div",
          { class: "msg warn", role: "group", "aria-label": "Confirm delete" },
          el("p", {}, `Delete '${name}' from the ${layer} library?${entry.overrides.length ? " The entry it overrides applies again." : ""}`),
        );
        if (layer === "workbook") {
          const why = el("input", { type: "text", id: "delete-reason", autocomplete: "off" }) as HTMLInputElement;
          why.addEventListener("input", () => (this.ctl.changeReason = why.value));
          confirmBox.appendChild(el("div", { class: "field" }, el("label", { for: "delete-reason" }, "Reason (for the change record, optional)"), why));
        }
        const yes = button("Delete", async () => {
          const r = await this.ctl.deleteEntry(layer, entry.kind, entry.id);
          this.hooks.status(resultMessage(r));
          announce(r.message);
          // the entry's row is gone after a delete: keep the keyboard in the list's search box
          if (r.ok) document.getElementById("search")?.focus();
        }, { class: "danger" });
        const no = button("Keep", () => {
          confirmBox.remove();
          del.focus();
        });
        confirmBox.appendChild(el("div", { class: "actions" }, yes, no));
        confirmBox.addEventListener("keydown", (e) => {
          if (e.key !== "Escape") return;
          e.preventDefault();
          confirmBox.remove();
          del.focus();
        });
        bar.after(confirmBox);
        yes.focus();
      }, { class: "danger", "aria-label": `Delete ${name}` });
      bar.appendChild(del);
    }
    const readOnly = entry.layer === "builtin" ? el("p", { class: "hint" }, editable ? "Built-in entries are read-only. 'Override in the workbook' opens a copy under the same id; saving it puts it in the workbook library, where it replaces the built-in values for this workbook on every computer." : "Built-in entries are read-only.") : null;
    return el("div", {}, readOnly, bar.childNodes.length ? bar : null);
  }
}
