/**
 * A plot area with linear scales, and its axes: light grid lines, tick marks, tick labels, axis
 * lines and axis titles (the x title below, the y title turned along the axis).
 */
import { AXIS, GRID, INK, MUTED } from "./palette";
import { svgEl, type SvgDocument } from "./svg";
import { tickLabels } from "./ticks";

export interface Plot {
  left: number;
  top: number;
  width: number;
  height: number;
  x: [number, number];
  y: [number, number];
  sx(v: number): number;
  sy(v: number): number;
}

export function plot(left: number, top: number, width: number, height: number, x: [number, number], y: [number, number]): Plot {
  const kx = width / (x[1] - x[0] || 1);
  const ky = height / (y[1] - y[0] || 1);
  return {
    left,
    top,
    width,
    height,
    x,
    y,
    sx: (v) => left + (v - x[0]) * kx,
    sy: (v) => top + height - (v - y[0]) * ky,
  };
}

export interface AxesSpec {
  xTicks: number[];
  yTicks: number[];
  xTitle: string;
  yTitle: string;
  /** Tick labels when not the plain numbers (e.g. percentages). */
  yLabels?: string[];
}

export const FONT = 11.5;
export const SMALL = 10.5;

export function axes(doc: SvgDocument, p: Plot, spec: AxesSpec): SVGElement {
  const g = svgEl(doc, "g", { class: "axes" });
  const bottom = p.top + p.height;
  const right = p.left + p.width;
  for (const v of spec.xTicks) {
    const x = p.sx(v);
    g.appendChild(svgEl(doc, "line", { x1: x, x2: x, y1: p.top, y2: bottom, stroke: GRID, "stroke-width": 1 }));
  }
  for (const v of spec.yTicks) {
    const y = p.sy(v);
    g.appendChild(svgEl(doc, "line", { x1: p.left, x2: right, y1: y, y2: y, stroke: GRID, "stroke-width": 1 }));
  }
  g.appendChild(svgEl(doc, "path", { d: `M${p.left} ${p.top}V${bottom}H${right}`, fill: "none", stroke: AXIS, "stroke-width": 1, class: "axis-line" }));
  const xl = tickLabels(spec.xTicks);
  const xAxis = svgEl(doc, "g", { class: "x-axis" });
  spec.xTicks.forEach((v, i) => {
    const x = p.sx(v);
    xAxis.appendChild(svgEl(doc, "line", { x1: x, x2: x, y1: bottom, y2: bottom + 4, stroke: AXIS, "stroke-width": 1 }));
    xAxis.appendChild(svgEl(doc, "text", { x, y: bottom + 15, "text-anchor": "middle", fill: MUTED, "font-size": SMALL }, xl[i]));
  });
  xAxis.appendChild(svgEl(doc, "text", { class: "axis-title", x: p.left + p.width / 2, y: bottom + 31, "text-anchor": "middle", fill: INK, "font-size": FONT, "font-weight": 600 }, spec.xTitle));
  const yl = spec.yLabels ?? tickLabels(spec.yTicks);
  const yAxis = svgEl(doc, "g", { class: "y-axis" });
  spec.yTicks.forEach((v, i) => {
    const y = p.sy(v);
    yAxis.appendChild(svgEl(doc, "line", { x1: p.left - 4, x2: p.left, y1: y, y2: y, stroke: AXIS, "stroke-width": 1 }));
    yAxis.appendChild(svgEl(doc, "text", { x: p.left - 7, y: y + 3.5, "text-anchor": "end", fill: MUTED, "font-size": SMALL }, yl[i]));
  });
  const cx = p.left - 34;
  const cy = p.top + p.height / 2;
  yAxis.appendChild(svgEl(doc, "text", { class: "axis-title", x: cx, y: cy, transform: `rotate(-90 ${cx} ${cy})`, "text-anchor": "middle", fill: INK, "font-size": FONT, "font-weight": 600 }, spec.yTitle));
  g.appendChild(xAxis);
  g.appendChild(yAxis);
  return g;
}

/** The chart's root element: scalable to the pane's width, described for assistive technology. */
export function chartRoot(doc: SvgDocument, width: number, height: number, title: string, desc: string, label: string, cls: string): SVGElement {
  return svgEl(
    doc,
    "svg",
    {
      viewBox: `0 0 ${width} ${height}`,
      width: "100%",
      role: "img",
      "aria-label": label,
      class: `chart ${cls}`,
      "font-family": '"Segoe UI", system-ui, -apple-system, "Helvetica Neue", sans-serif',
    },
    svgEl(doc, "title", {}, title),
    svgEl(doc, "desc", {}, desc),
  );
}
