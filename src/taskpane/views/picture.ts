/**
 * "Picture": a mixture's speciation diagram and titration curve.
 *
 * Where the mixture comes from: inside Excel, the selected cell's AQ formula (excel-selection.ts),
 * read again whenever the selection changes while this view is open; in a plain browser page, or
 * when the selected cell has no usable AQ formula, the Try it panel's mixture.
 */
import { ACTIVITY_MODELS } from "../../chem";
import { el, replaceChildren } from "../dom";
import type { PaneController } from "../controller";
import { pictureOf, titrantOf, type PictureRequest } from "../charts/picture";
import { conditions } from "../charts/summary";
import type { TitrantName } from "../charts/titration";
import type { SelectedMixture, SelectionExcel } from "../excel-selection";
import { SelectionFollower } from "../selection-follower";
import type { TryRow } from "../tryit";
import { curveFigure, metalFigure, speciationFigure } from "./picture-figures";
import { button, field, message, select, textInput } from "./ui";

export interface PictureDeps {
  /** The Try it panel's mixture as it stands. */
  tryMixture(): { rows: TryRow[]; temperature: string };
  /** Excel's API inside Excel, null in a plain browser page. */
  excel: SelectionExcel | null;
}


export class PictureView {
  private titrant: TitrantName | "auto" = "auto";
  private stock = "0.1 M";
  private sample = "10 mL";
  private visible = false;
  private readonly follower: SelectionFollower | null;
  /** The titration an AQ.CURVE / AQ.ADJUST formula set, while the fields still hold it. */
  private fromFormula: { titrant: TitrantName | "auto"; stock: string; sample: string; maxVolume?: string; note: string } | null = null;
  private controls: { titrant: HTMLSelectElement; stock: HTMLInputElement; sample: HTMLInputElement } | null = null;
  private readonly source = el("div", { id: "picture-source" });
  private readonly facts = el("div", { id: "picture-facts" });
  private readonly spec = el("div", { id: "picture-speciation" });
  private readonly curve = el("div", { id: "picture-curve" });

  constructor(
    private readonly root: HTMLElement,
    private readonly ctl: PaneController,
    private readonly deps: PictureDeps,
  ) {
    this.follower = deps.excel
      ? new SelectionFollower(
          deps.excel,
          (s) => {
            this.adopt(s);
            if (this.visible) this.draw();
          },
          (why) => replaceChildren(this.facts, message("warn", `Selection changes cannot be followed in this Excel (${why}): use “Read the selected cell again”.`)),
        )
      : null;
  }

  private get selected(): SelectedMixture | null {
    return this.follower?.latest ?? null;
  }

  render(): void {
    const titrant = select<TitrantName | "auto">(
      this.titrant,
      [
        ["auto", "Automatic"],
        ["NaOH", "NaOH (base)"],
        ["HCl", "HCl (acid)"],
      ],
      (v) => {
        this.titrant = v;
        this.draw();
      },
    );
    titrant.id = "picture-titrant";
    const stock = textInput(this.stock, (v) => (this.stock = v), { id: "picture-stock", inputmode: "decimal" });
    const sample = textInput(this.sample, (v) => (this.sample = v), { id: "picture-sample", inputmode: "decimal" });
    this.controls = { titrant, stock, sample };
    const form = el(
      "form",
      { novalidate: true, "aria-label": "Titration settings", class: "picture-settings" },
      el("div", { class: "row" }, field("Titrant", titrant).wrap, field("Stock", stock).wrap, field("Sample", sample).wrap),
      el("div", { class: "actions" }, el("button", { type: "submit", id: "picture-redraw" }, "Redraw")),
    );
    form.addEventListener("submit", (e) => {
      e.preventDefault();
      this.draw();
    });
    const excelActions = this.deps.excel
      ? el("div", { class: "actions" }, button("Read the selected cell again", () => this.follower?.schedule(0), { id: "picture-reread" }))
      : null;
    replaceChildren(
      this.root,
      el("h2", {}, "Picture of a mixture"),
      el(
        "p",
        { class: "hint" },
        this.deps.excel
          ? "Select a cell with an AQ formula of a mixture (AQ.PH, AQ.BETA, AQ.SPECIES, AQ.CURVE …): the pictures follow the selection. Without one, they show the Try it mixture."
          : "The pictures show the Try it mixture. Inside Excel they follow the selected cell's AQ formula.",
      ),
      this.source,
      excelActions,
      this.facts,
      el("h3", {}, "Speciation"),
      el(
        "p",
        { class: "hint" },
        "Share of each acid–base system in each form, and of each metal ion that forms complexes free and in each complex, at this mixture's temperature and ionic strength (held fixed along the pH axis). The dashed line is the mixture's pH.",
      ),
      this.spec,
      el("h3", {}, "Titration curve"),
      form,
      this.curve,
      el("p", { class: "hint" }, "Estimates: confirm with a calibrated pH meter."),
    );
  }

  /** The Picture tab was opened: follow the selection (in Excel) and draw. */
  show(): void {
    this.visible = true;
    this.draw();
    void this.follower?.start();
  }

  /** Another tab was opened: stop following the selection. */
  hide(): void {
    if (!this.visible) return;
    this.visible = false;
    void this.follower?.stop();
  }

  /** After a library change. */
  refresh(): void {
    if (this.visible) this.draw();
  }

  /**
   * A formula that titrates (AQ.CURVE, AQ.ADJUST) sets the titration fields: its titrant when it is
   * NaOH or HCl, its stock, and for AQ.CURVE the sample and the largest volume. The user may change
   * them; the formula's largest volume applies while the fields still hold the formula's values.
   */
  private adopt(s: SelectedMixture): void {
    const t = s.ok ? s.spec.titration : undefined;
    if (!t) {
      this.fromFormula = null;
      return;
    }
    const titrant = titrantOf(this.ctl.library, t.titrant);
    const parts = [titrant ? `${t.stock ?? this.stock} ${titrant}` : null, t.sample ? `${t.sample} sample` : null, t.maxVolume ? `up to ${t.maxVolume}` : null].filter(Boolean);
    const note = titrant
      ? `Titration as in the formula: ${parts.join(", ")}.`
      : `The formula titrates with ${t.titrant}; the picture titrates with NaOH or HCl${parts.length ? ` (${parts.join(", ")})` : ""}.`;
    this.fromFormula = { titrant: titrant ?? this.titrant, stock: t.stock ?? this.stock, sample: t.sample ?? this.sample, maxVolume: t.maxVolume, note };
    this.titrant = this.fromFormula.titrant;
    this.stock = this.fromFormula.stock;
    this.sample = this.fromFormula.sample;
    if (this.controls) {
      this.controls.titrant.value = this.titrant;
      this.controls.stock.value = this.stock;
      this.controls.sample.value = this.sample;
    }
  }

  /** The mixture to draw and a line saying where it comes from. */
  private request(): { req: PictureRequest; from: HTMLElement[] } | null {
    const s = this.selected;
    const settings = { titrant: this.titrant, stock: this.stock, sample: this.sample };
    if (this.deps.excel && s?.ok) {
      const f = this.fromFormula;
      const same = f !== null && f.titrant === this.titrant && f.stock === this.stock && f.sample === this.sample;
      return {
        req: { ...s.spec, ...settings, maxVolume: same ? f.maxVolume : undefined },
        from: [
          el("p", { class: "source" }, `From the selected cell ${s.address}: `, el("code", { class: "formula" }, s.formula)),
          ...(f ? [el("p", { class: "hint", id: "picture-formula-titration" }, same ? f.note : "Titration settings changed from the formula's.")] : []),
        ],
      };
    }
    const from: HTMLElement[] = [];
    if (this.deps.excel) {
      if (s && !s.ok) {
        const where = s.address ? `The selected cell ${s.address}` : "The selection";
        from.push(message("warn", `${where}: ${s.message}.`, ["Showing the Try it mixture instead."]));
      } else if (!s) from.push(el("p", { class: "source" }, "Reading the selected cell…"));
    }
    const t = this.deps.tryMixture();
    const rows = t.rows.filter((r) => r.name.trim() !== "" || r.amount.trim() !== "");
    if (rows.length === 0) {
      from.push(el("p", { class: "source" }, "No mixture yet: enter one in Try it."));
      replaceChildren(this.source, ...from);
      return null;
    }
    const items = rows.map((r) => `${r.amount.trim() || "?"} ${r.name.trim() || "?"}`);
    from.push(el("p", { class: "source" }, `From the Try it mixture: ${items.join(" + ")}${t.temperature.trim() ? `, ${t.temperature.trim()} °C` : ""}.`));
    return { req: { rows, temperature: t.temperature, ...settings }, from };
  }

  private draw(): void {
    const r = this.request();
    if (!r) {
      replaceChildren(this.facts);
      replaceChildren(this.spec);
      replaceChildren(this.curve);
      return;
    }
    replaceChildren(this.source, ...r.from);
    const pic = pictureOf(this.ctl.library, r.req);
    if (!pic.ok) {
      replaceChildren(this.facts, message("error", "No picture:", pic.issues));
      replaceChildren(this.spec);
      replaceChildren(this.curve);
      return;
    }
    const d = pic.speciation;
    replaceChildren(
      this.facts,
      el("p", { class: "result" }, "pH ", el("span", { class: "ph", id: "picture-ph" }, d.mixturePH.toFixed(2)), ` · ${conditions(d)} · ${ACTIVITY_MODELS[d.activity].label}`),
      d.warnings.length ? message("warn", "Note:", d.warnings) : null,
    );
    replaceChildren(
      this.spec,
      ...(d.systems.length ? d.systems.map((sys) => speciationFigure(sys, d)) : [el("p", {}, "No acid–base system in this mixture: nothing to show here.")]),
      ...d.metals.map((m) => metalFigure(m, d)),
    );
    const t = pic.titration;
    replaceChildren(this.curve, t.ok ? curveFigure(t.data) : message("error", `No titration curve: ${t.message}`), t.ok && t.data.warnings.length ? message("warn", "Note:", t.data.warnings) : null);
  }
}
