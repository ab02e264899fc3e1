/**
 * "Try it": names and amounts (and temperature) → pH through the library in effect and the same
 * engine as the sheet functions. It recalculates when the library changes, so an entry just added
 * or edited is seen at work.
 */
import { el, replaceChildren, uid } from "../dom";
import type { PaneController } from "../controller";
import { LAYER_LABEL } from "../describe";
import { appliedHeading, appliedStepLine } from "../applied";
import { bufferingText, type TryRow } from "../tryit";
import { button, field, message, textInput } from "./ui";

export class TryView {
  private rows: TryRow[] = [
    { name: "", amount: "" },
    { name: "", amount: "" },
  ];
  private temperature = "25";
  private ran = false;
  private readonly result = el("div", { id: "try-result", class: "result", "aria-live": "polite" });
  private readonly table = el("tbody");
  private readonly names = el("datalist", { id: "substance-names" });

  constructor(
    private readonly root: HTMLElement,
    private readonly ctl: PaneController,
  ) {}

  render(): void {
    const temp = textInput(this.temperature, (v) => (this.temperature = v), { id: "try-temp", inputmode: "decimal" });
    const run = el("button", { type: "submit", class: "primary", id: "try-run" }, "Calculate pH");
    const form = el(
      "form",
      { novalidate: true, "aria-label": "Try a mixture" },
      el("p", { class: "hint" }, "Concentrations in the final solution: mol/L, or with a unit (25 mM, 2.1 g/L, 0.9 % w/v). Any name or alias in the library in effect."),
      el("table", { class: "try" }, el("thead", {}, el("tr", {}, el("th", { scope: "col" }, "Substance"), el("th", { scope: "col" }, "Amount"), el("th", {}, el("span", { class: "visually-hidden" }, "Remove")))), this.table),
      el("div", { class: "actions" }, button("Add a row", () => {
        this.rows.push({ name: "", amount: "" });
        this.renderRows();
        this.table.querySelector<HTMLInputElement>(`tr:last-child input`)?.focus();
      }, { id: "try-add-row" })),
      field("Temperature, °C", temp, { path: "temperature" }).wrap,
      el("div", { class: "actions" }, run),
      this.result,
      this.names,
    );
    form.addEventListener("submit", (e) => {
      e.preventDefault();
      this.ran = true;
      this.calculate();
    });
    replaceChildren(this.root, el("h2", {}, "Try a mixture"), form);
    this.renderRows();
    this.refresh();
  }

  /** The mixture as entered now (calculated or not): for the Picture view. */
  mixture(): { rows: TryRow[]; temperature: string } {
    return { rows: this.rows.map((r) => ({ ...r })), temperature: this.temperature };
  }

  /** After a library change: new names for the list, and the last calculation again. */
  refresh(): void {
    const names = new Set<string>();
    for (const e of this.ctl.library.list("substance")) names.add((e.record as { name: string }).name);
    replaceChildren(this.names, ...[...names].sort((a, b) => a.localeCompare(b)).map((n) => el("option", { value: n })));
    if (this.ran) this.calculate();
  }

  private renderRows(): void {
    replaceChildren(
      this.table,
      ...this.rows.map((row, i) => {
        const nameId = uid("try-name");
        const amountId = uid("try-amount");
        const name = textInput(row.name, (v) => (row.name = v), { id: nameId, list: "substance-names", "data-row": String(i), class: "try-name" });
        const amount = textInput(row.amount, (v) => (row.amount = v), { id: amountId, inputmode: "decimal", "data-row": String(i), class: "try-amount" });
        name.setAttribute("aria-label", `Substance ${i + 1}`);
        amount.setAttribute("aria-label", `Amount of substance ${i + 1}`);
        const remove = button("✕", () => {
          this.rows.splice(i, 1);
          if (this.rows.length === 0) this.rows.push({ name: "", amount: "" });
          this.renderRows();
        }, { "aria-label": `Remove row ${i + 1}` });
        return el("tr", {}, el("td", {}, name), el("td", {}, amount), el("td", {}, remove));
      }),
    );
  }

  private calculate(): void {
    const r = this.ctl.tryIt(this.rows, this.temperature);
    if (!r.ok) {
      replaceChildren(
        this.result,
        message("error", "No result:", r.issues.map((i) => (i.row >= 0 ? `row ${i.row + 1} (${i.field}): ${i.message}` : i.message))),
      );
      return;
    }
    const used = r.used.map((u) => `${u.name} — ${LAYER_LABEL[u.layer]} library${u.overrides.length ? ` (overrides ${u.overrides.map((l) => LAYER_LABEL[l]).join(", ")})` : ""}`);
    const applied = r.applied.map((s) =>
      el("li", { "data-system": s.id }, el("span", { class: "applied-head" }, appliedHeading(s)), el("ul", {}, ...s.steps.map((_, k) => el("li", {}, appliedStepLine(s, k, r.temperatureC))))),
    );
    replaceChildren(
      this.result,
      el("p", {}, "pH ", el("span", { class: "ph", id: "try-ph" }, r.pH.toFixed(2)), ` at ${r.temperatureC} °C`),
      el("p", { class: "hint", id: "try-facts" }, `p[H] ${r.pcH.toFixed(3)} (−log10 of the H⁺ concentration in mol/L; pH is −log10 of its activity, what a meter reads) · ionic strength ${r.ionicStrength.toPrecision(3)} mol/L · `, el("span", { id: "try-buffering" }, bufferingText(r.buffering)), ` · constants ${this.ctl.library.fingerprint()}`),
      el("p", { class: "hint" }, "Entries used:"),
      el("ul", { class: "hint", id: "try-used" }, ...used.map((u) => el("li", {}, u))),
      applied.length ? el("p", { class: "hint" }, "Constants applied (the values in effect, with their sources):") : null,
      applied.length ? el("ul", { class: "hint", id: "try-applied" }, ...applied) : null,
      r.warnings.length ? message("warn", "Note:", r.warnings) : null,
      el("p", { class: "hint" }, "An estimate: confirm with a calibrated pH meter."),
    );
  }
}
