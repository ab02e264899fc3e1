/**
 * The Picture view's results as DOM: a figure per acid–base system (speciation diagram and its
 * numbers), and the titration figure (curve, why this titrant, its numbers). The SVG comes from
 * src/taskpane/charts; the tables are the text fallback of each picture.
 */
import { el } from "../dom";
import { renderCurve } from "../charts/curve-svg";
import { displayName } from "../charts/palette";
import { renderMetalDistribution, renderSpeciation } from "../charts/speciation-svg";
import type { MetalDistribution } from "../../chem";
import type { SpeciationData, SystemSpeciation } from "../charts/speciation";
import { halfFreePH, mL, pct } from "../charts/summary";
import type { TitrationData } from "../charts/titration";

function numbers(summary: string, table: HTMLTableElement): HTMLElement {
  return el("details", { class: "numbers" }, el("summary", {}, summary), table);
}

function speciesTable(sys: SystemSpeciation, d: SpeciationData): HTMLTableElement {
  const head = el("tr", {}, el("th", { scope: "col" }, "Form"), el("th", { scope: "col" }, `At pH ${d.mixturePH.toFixed(2)}`), el("th", { scope: "col" }, "mol/L"));
  const rows = sys.species.map((s) =>
    el("tr", {}, el("th", { scope: "row" }, displayName(s.name)), el("td", {}, pct(s.atMixture)), el("td", {}, ((s.atMixture * sys.total) / (s.ligands ?? 1)).toPrecision(3))),
  );
  const cross = sys.crossings.map((c, j) =>
    el("tr", { class: "crossing" }, el("th", { scope: "row" }, `${displayName(sys.species[j].name)} = ${displayName(sys.species[j + 1].name)}`), el("td", { colspan: 2 }, `pH ${c.toFixed(2)}`)),
  );
  return el(
    "table",
    { class: "numbers" },
    el("caption", { class: "visually-hidden" }, `Forms of ${sys.name} in the mixture, and the pH at which neighbouring forms are equal`),
    el("thead", {}, head),
    el("tbody", {}, ...rows, ...cross),
  );
}

export function speciationFigure(sys: SystemSpeciation, d: SpeciationData): HTMLElement {
  const fig = el("figure", { class: "chart-figure", "data-system": sys.id });
  fig.appendChild(renderSpeciation(document, sys, d));
  fig.appendChild(numbers(`Numbers for ${sys.name} (${(sys.total * 1000).toPrecision(3)} mmol/L in all)`, speciesTable(sys, d)));
  return fig;
}

function metalTable(m: MetalDistribution, d: SpeciationData): HTMLTableElement {
  const head = el("tr", {}, el("th", { scope: "col" }, "Form"), el("th", { scope: "col" }, `At pH ${d.mixturePH.toFixed(2)}`), el("th", { scope: "col" }, "mol/L"));
  const rows = m.forms.map((f, k) =>
    el("tr", {}, el("th", { scope: "row" }, `${displayName(f.name, f.charge)}${k === 0 ? " (free)" : ""}`), el("td", {}, pct(f.atMixture)), el("td", {}, (f.atMixture * m.total).toPrecision(3))),
  );
  const half = halfFreePH(m, d.pH);
  const tail = half === null ? [] : [el("tr", { class: "crossing" }, el("th", { scope: "row" }, `Half of ${displayName(m.name, m.charge)} free`), el("td", { colspan: 2 }, `pH ${half.toFixed(2)}`))];
  return el(
    "table",
    { class: "numbers" },
    el("caption", { class: "visually-hidden" }, `${m.name} in the mixture, free and in each complex`),
    el("thead", {}, head),
    el("tbody", {}, ...rows, ...tail),
  );
}

/** A metal ion's distribution: free and in each complex against pH, and its numbers. */
export function metalFigure(m: MetalDistribution, d: SpeciationData): HTMLElement {
  const fig = el("figure", { class: "chart-figure", "data-metal": m.id });
  fig.appendChild(renderMetalDistribution(document, m, d));
  fig.appendChild(numbers(`Numbers for ${displayName(m.name, m.charge)} (${(m.total * 1000).toPrecision(3)} mmol/L in all)`, metalTable(m, d)));
  return fig;
}

/** About a dozen rows of the curve, the equivalence points among them in order. */
function curveRows(t: TitrationData): { mL: number; pH: number; eq: number }[] {
  const every = Math.max(1, Math.round((t.points.length - 1) / 10));
  const rows = t.points.filter((_, i) => i % every === 0 || i === t.points.length - 1).map((p) => ({ ...p, eq: 0 }));
  t.equivalence.forEach((e, i) => rows.push({ ...e, eq: i + 1 }));
  return rows.sort((a, b) => a.mL - b.mL || b.eq - a.eq);
}

function curveTable(t: TitrationData): HTMLTableElement {
  return el(
    "table",
    { class: "numbers" },
    el("caption", { class: "visually-hidden" }, `pH against mL of ${t.titrant} added`),
    el("thead", {}, el("tr", {}, el("th", { scope: "col" }, `${t.titrant}, mL`), el("th", { scope: "col" }, "pH"), el("th", { scope: "col" }, ""))),
    el(
      "tbody",
      {},
      ...curveRows(t).map((r) =>
        el("tr", { class: r.eq ? "eq" : null }, el("td", {}, mL(r.mL)), el("td", {}, r.pH.toFixed(2)), el("td", {}, r.eq ? `equivalence${t.equivalence.length > 1 ? ` ${r.eq}` : ""}` : "")),
      ),
    ),
  );
}

export function curveFigure(t: TitrationData): HTMLElement {
  const fig = el("figure", { class: "chart-figure", "data-titrant": t.titrant });
  fig.appendChild(renderCurve(document, t));
  fig.appendChild(el("figcaption", { class: "hint", id: "picture-titrant-reason" }, t.reason));
  fig.appendChild(numbers("Numbers of the curve", curveTable(t)));
  return fig;
}
