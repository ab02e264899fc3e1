/** A legend under a plot: a line sample (colour and dash) or a marker, then the name; items wrap into rows. */
import { INK } from "./palette";
import { svgEl, textWidth, type SvgDocument } from "./svg";
import { SMALL } from "./axes";

export interface LegendItem {
  text: string;
  /** A line sample … */
  stroke?: string;
  dash?: string | null;
  /** … or a marker drawn by the caller at (x, y), the middle of the sample. */
  marker?: (x: number, y: number) => SVGElement;
}

export const LEGEND_ROW = 17;

/** The legend's group and its height, laid out from (left, top) within `width`. */
export function legend(doc: SvgDocument, items: LegendItem[], left: number, top: number, width: number): { node: SVGElement; height: number } {
  const g = svgEl(doc, "g", { class: "legend" });
  let x = left;
  let row = 0;
  for (const item of items) {
    const w = 30 + textWidth(item.text, SMALL + 0.5);
    if (x > left && x + w > left + width) {
      row++;
      x = left;
    }
    const y = top + row * LEGEND_ROW + 8;
    const entry = svgEl(doc, "g", { class: "legend-item" });
    if (item.marker) entry.appendChild(item.marker(x + 11, y));
    else entry.appendChild(svgEl(doc, "line", { x1: x, x2: x + 22, y1: y, y2: y, stroke: item.stroke ?? INK, "stroke-width": 2.4, "stroke-dasharray": item.dash ?? null, "stroke-linecap": "butt" }));
    entry.appendChild(svgEl(doc, "text", { x: x + 27, y: y + 3.8, fill: INK, "font-size": SMALL + 0.5 }, item.text));
    g.appendChild(entry);
    x += w + 10;
  }
  return { node: g, height: items.length ? (row + 1) * LEGEND_ROW : 0 };
}
