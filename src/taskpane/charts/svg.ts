/**
 * Building SVG with the DOM: elements in the SVG namespace, presentation attributes (fill, stroke …;
 * the pane's Content-Security-Policy refuses style attributes), text only as text nodes.
 * The document is a parameter so that the renderers run on any DOM (the page's, or a test's).
 */

export const SVG_NS = "http://www.w3.org/2000/svg";

/** The DOM methods the renderers use (a real Document, or a small stand-in in unit tests). */
export type SvgDocument = Pick<Document, "createElementNS" | "createTextNode">;

export type SvgAttrs = Record<string, string | number | null | undefined>;
export type SvgChild = Node | string | null | undefined | false;

export function svgEl(doc: SvgDocument, tag: string, attrs: SvgAttrs = {}, ...children: SvgChild[]): SVGElement {
  const node = doc.createElementNS(SVG_NS, tag) as SVGElement;
  for (const [name, value] of Object.entries(attrs)) {
    if (value === null || value === undefined) continue;
    node.setAttribute(name, typeof value === "number" ? fmt(value) : value);
  }
  for (const c of children) {
    if (c === null || c === undefined || c === false) continue;
    node.appendChild(typeof c === "string" ? doc.createTextNode(c) : c);
  }
  return node;
}

/** A coordinate with at most two decimals (short path data, no "1e-7"). */
export function fmt(v: number): string {
  const r = Math.round(v * 100) / 100;
  return Object.is(r, -0) ? "0" : String(r);
}

/** Path data through the points, a new subpath after a gap (non-finite y). */
export function pathData(points: readonly (readonly [number, number])[]): string {
  let d = "";
  let pen = false;
  for (const [x, y] of points) {
    if (!Number.isFinite(x) || !Number.isFinite(y)) {
      pen = false;
      continue;
    }
    d += `${pen ? "L" : "M"}${fmt(x)} ${fmt(y)}`;
    pen = true;
  }
  return d;
}

/** Rough width of a text in the chart's font at `size` units (no layout engine: an estimate for placing labels). */
export function textWidth(text: string, size: number): number {
  let w = 0;
  for (const ch of text) w += /[\u2080-\u2089\u00B2\u00B3\u00B9\u2070-\u207F]/.test(ch) ? 0.42 : /[il.,:;'|!()\s]/.test(ch) ? 0.3 : /[MWmw%]/.test(ch) ? 0.85 : /[A-Z]/.test(ch) ? 0.66 : 0.55;
  return w * size;
}
