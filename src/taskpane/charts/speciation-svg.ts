/**
 * The speciation diagram of one acid–base system: the percentage of the system in each form over
 * pH 0–14 (one line per form, colour and dash), the mixture's pH as a vertical marker with a dot on
 * every line it crosses, and a legend. A metal ion's distribution (free and in each complex) is
 * drawn the same way, as percentages of the metal's total.
 */
import { axes, chartRoot, plot, SMALL } from "./axes";
import { legend } from "./legend";
import { displayName, INK, seriesStyle } from "./palette";
import { pathData, svgEl, textWidth, type SvgDocument } from "./svg";
import type { MetalDistribution } from "../../chem";
import type { SpeciationData, SystemSpeciation } from "./speciation";
import { metalSummary, metalTitle, speciationSummary, speciationTitle } from "./summary";

/** viewBox width: about the pane's content width (350 px less its padding), so 1 unit ≈ 1 px. */
export const CHART_WIDTH = 320;
const M = { left: 46, right: 16, top: 24, bottom: 40 };
const PLOT_HEIGHT = 150;

/** Below this fraction a line is left out (it would lie on the axis with every other form's). */
export const FRACTION_FLOOR = 0.001;

/**
 * The points of one form's curve that are drawn: those at or above FRACTION_FLOOR and their
 * neighbours (so each piece reaches the axis), with NaN between pieces (a gap in the path).
 */
export function visibleRun(pH: readonly number[], f: readonly number[]): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < pH.length; i++) {
    const near = f[i] >= FRACTION_FLOOR || f[i - 1] >= FRACTION_FLOOR || f[i + 1] >= FRACTION_FLOOR;
    if (near) out.push([pH[i], f[i]]);
    else if (out.length && Number.isFinite(out[out.length - 1][1])) out.push([pH[i], NaN]);
  }
  return out;
}

/** What one fraction chart shows: its lines (share of a total at each pH of the axis), words and class. */
interface FractionChart {
  kind: "speciation" | "metal-distribution";
  /** data-system (an acid–base system's id) or data-metal (a strong ion's id). */
  data: [string, string];
  title: string;
  summary: string;
  yTitle: string;
  series: readonly { name: string; charge: number; fractions: number[]; atMixture: number }[];
}

export function renderSpeciation(doc: SvgDocument, sys: SystemSpeciation, d: SpeciationData): SVGElement {
  const summary = speciationSummary(sys, d);
  return renderFractions(doc, { kind: "speciation", data: ["data-system", sys.id], title: speciationTitle(sys), summary, yTitle: `% of ${sys.name}`, series: sys.species }, d);
}

/** A metal ion free and in each of its complexes, as % of the metal's total, over pH 0–14. */
export function renderMetalDistribution(doc: SvgDocument, m: MetalDistribution, d: SpeciationData): SVGElement {
  const summary = metalSummary(m, d);
  return renderFractions(doc, { kind: "metal-distribution", data: ["data-metal", m.id], title: metalTitle(m), summary, yTitle: `% of ${displayName(m.name, m.charge)}`, series: m.forms }, d);
}

function renderFractions(doc: SvgDocument, c: FractionChart, d: SpeciationData): SVGElement {
  const w = CHART_WIDTH - M.left - M.right;
  const p = plot(M.left, M.top, w, PLOT_HEIGHT, [d.pH[0], d.pH[d.pH.length - 1]], [-0.03, 1.03]);
  const items = c.series.map((s, k) => ({ text: displayName(s.name, s.charge), ...seriesStyle(k) }));
  const leg = legend(doc, items, M.left - 30, M.top + PLOT_HEIGHT + M.bottom, CHART_WIDTH - (M.left - 30) - 4);
  const height = M.top + PLOT_HEIGHT + M.bottom + leg.height + 4;
  const svg = chartRoot(doc, CHART_WIDTH, height, c.title, c.summary, c.summary, c.kind);
  svg.setAttribute(c.data[0], c.data[1]);
  svg.appendChild(
    axes(doc, p, {
      xTicks: [0, 2, 4, 6, 8, 10, 12, 14],
      yTicks: [0, 0.25, 0.5, 0.75, 1],
      yLabels: ["0", "25", "50", "75", "100"],
      xTitle: "pH",
      yTitle: c.yTitle,
    }),
  );
  const lines = svgEl(doc, "g", { class: "series", fill: "none", "stroke-width": 2.2, "stroke-linejoin": "round", "stroke-linecap": "round" });
  c.series.forEach((s, k) => {
    const st = seriesStyle(k);
    const pts = visibleRun(d.pH, s.fractions).map(([x, f]) => [p.sx(x), p.sy(f)] as const);
    lines.appendChild(svgEl(doc, "path", { class: "species-line", "data-species": s.name, d: pathData(pts), stroke: st.stroke, "stroke-dasharray": st.dash }));
  });
  svg.appendChild(lines);
  // the mixture's own pH
  const mx = p.sx(Math.min(Math.max(d.mixturePH, p.x[0]), p.x[1]));
  const marker = svgEl(doc, "g", { class: "mixture-ph", "data-ph": d.mixturePH.toFixed(4) });
  marker.appendChild(svgEl(doc, "line", { x1: mx, x2: mx, y1: M.top - 4, y2: M.top + PLOT_HEIGHT, stroke: INK, "stroke-width": 1.2, "stroke-dasharray": "3 2" }));
  const label = `mixture pH ${d.mixturePH.toFixed(2)}`;
  const half = textWidth(label, SMALL) / 2;
  const lx = Math.min(Math.max(mx, M.left + half), CHART_WIDTH - M.right - half);
  marker.appendChild(svgEl(doc, "text", { x: lx, y: M.top - 8, "text-anchor": "middle", fill: INK, "font-size": SMALL, "font-weight": 600 }, label));
  c.series.forEach((s, k) => {
    if (s.atMixture < 0.005 || s.atMixture > 0.995) return;
    marker.appendChild(svgEl(doc, "circle", { cx: mx, cy: p.sy(s.atMixture), r: 3.2, fill: seriesStyle(k).stroke, stroke: "#fff", "stroke-width": 1.2 }));
  });
  svg.appendChild(marker);
  svg.appendChild(leg.node);
  return svg;
}
