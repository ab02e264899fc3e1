/**
 * The titration curve: pH against the volume of titrant added, the start (the mixture's own pH) as
 * a dot, each equivalence point as a ringed, numbered marker with a dashed drop to the volume axis,
 * and a legend that states the numbers.
 */
import { axes, chartRoot, plot, SMALL } from "./axes";
import { legend, type LegendItem } from "./legend";
import { AXIS, CURVE, INK, MARKER } from "./palette";
import { pathData, svgEl, type SvgDocument } from "./svg";
import { mL, molar, setVolume, titrationSummary, titrationTitle } from "./summary";
import { ticks } from "./ticks";
import type { TitrationData } from "./titration";
import { CHART_WIDTH } from "./speciation-svg";

const M = { left: 46, right: 16, top: 14, bottom: 40 };
const PLOT_HEIGHT = 170;

/** The pH range shown: the curve's range widened to even numbers, at least 4 pH units, within 0–14. */
export function pHWindow(values: readonly number[]): [number, number] {
  let lo = Math.max(0, Math.floor(Math.min(...values) / 2) * 2);
  let hi = Math.min(14, Math.ceil(Math.max(...values) / 2) * 2);
  while (hi - lo < 4) {
    if (lo > 0) lo -= 2;
    if (hi - lo < 4 && hi < 14) hi += 2;
  }
  return [lo, hi];
}

function ring(doc: SvgDocument, x: number, y: number): SVGElement {
  return svgEl(doc, "circle", { cx: x, cy: y, r: 4.6, fill: "#fff", stroke: MARKER, "stroke-width": 2.2 });
}

function dot(doc: SvgDocument, x: number, y: number): SVGElement {
  return svgEl(doc, "circle", { cx: x, cy: y, r: 3.6, fill: INK });
}

export function renderCurve(doc: SvgDocument, t: TitrationData): SVGElement {
  const w = CHART_WIDTH - M.left - M.right;
  const [lo, hi] = pHWindow(t.points.map((q) => q.pH));
  const p = plot(M.left, M.top, w, PLOT_HEIGHT, [0, t.maxML], [lo, hi]);
  const items: LegendItem[] = [
    { text: `start: pH ${t.startPH.toFixed(2)} (the mixture)`, marker: (x, y) => dot(doc, x, y) },
    ...t.equivalence.map((e, i) => ({
      text: `${t.equivalence.length > 1 ? `${i + 1}: ` : ""}equivalence at ${mL(e.mL)} mL, pH ${e.pH.toFixed(2)}`,
      marker: (x: number, y: number) => ring(doc, x, y),
    })),
  ];
  const leg = legend(doc, items, M.left - 30, M.top + PLOT_HEIGHT + M.bottom, CHART_WIDTH - (M.left - 30) - 4);
  const height = M.top + PLOT_HEIGHT + M.bottom + leg.height + 4;
  const summary = titrationSummary(t);
  const svg = chartRoot(doc, CHART_WIDTH, height, titrationTitle(t), summary, summary, "titration");
  svg.setAttribute("data-titrant", t.titrant);
  svg.appendChild(
    axes(doc, p, {
      xTicks: ticks(0, t.maxML, 5),
      yTicks: ticks(lo, hi, hi - lo > 6 ? 7 : hi - lo),
      xTitle: `mL of ${molar(t.stockConc)} ${t.titrant} added to ${setVolume(t.sampleVolumeML)} mL`,
      yTitle: "pH",
    }),
  );
  const bottom = M.top + PLOT_HEIGHT;
  const marks = svgEl(doc, "g", { class: "equivalence" });
  t.equivalence.forEach((e, i) => {
    const x = p.sx(e.mL);
    const y = p.sy(e.pH);
    marks.appendChild(svgEl(doc, "line", { x1: x, x2: x, y1: y + 5, y2: bottom, stroke: AXIS, "stroke-width": 1, "stroke-dasharray": "3 2" }));
    const g = svgEl(doc, "g", { class: "eq-marker", "data-ml": e.mL.toFixed(4), "data-ph": e.pH.toFixed(4) }, ring(doc, x, y));
    if (t.equivalence.length > 1) {
      // the number on the side away from the curve's rise: right of the marker, above when it sits low
      g.appendChild(svgEl(doc, "text", { x: x + 8, y: y + (e.pH < (lo + hi) / 2 ? -6 : 12), fill: MARKER, "font-size": SMALL, "font-weight": 700 }, String(i + 1)));
    }
    marks.appendChild(g);
  });
  svg.appendChild(
    svgEl(doc, "path", {
      class: "curve-line",
      d: pathData(t.points.map((q) => [p.sx(q.mL), p.sy(q.pH)] as const)),
      fill: "none",
      stroke: CURVE,
      "stroke-width": 2.4,
      "stroke-linejoin": "round",
      "stroke-linecap": "round",
    }),
  );
  svg.appendChild(marks);
  svg.appendChild(svgEl(doc, "g", { class: "start" }, dot(doc, p.sx(0), p.sy(t.startPH))));
  svg.appendChild(leg.node);
  return svg;
}
