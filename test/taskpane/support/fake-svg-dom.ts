/**
 * A small stand-in for the DOM methods the chart renderers use (createElementNS, createTextNode,
 * setAttribute, appendChild), so they can be unit-tested under jest's node environment. It records
 * namespaces and attributes exactly, and answers simple queries for the tests.
 */
import type { SvgDocument } from "../../../src/taskpane/charts/svg";

export class FakeNode {
  readonly childNodes: FakeNode[] = [];
  parentNode: FakeNode | null = null;
  appendChild<T extends FakeNode>(child: T): T {
    child.parentNode = this;
    this.childNodes.push(child);
    return child;
  }
  get textContent(): string {
    return this.childNodes.map((c) => c.textContent).join("");
  }
}

export class FakeText extends FakeNode {
  constructor(readonly data: string) {
    super();
  }
  override get textContent(): string {
    return this.data;
  }
}

export class FakeElement extends FakeNode {
  readonly attributes = new Map<string, string>();
  constructor(
    readonly namespaceURI: string | null,
    readonly tagName: string,
  ) {
    super();
  }
  setAttribute(name: string, value: string): void {
    this.attributes.set(name, String(value));
  }
  getAttribute(name: string): string | null {
    return this.attributes.get(name) ?? null;
  }
  /** Every element below (and including) this one that matches. */
  findAll(match: (e: FakeElement) => boolean): FakeElement[] {
    const out: FakeElement[] = [];
    const walk = (n: FakeNode) => {
      if (n instanceof FakeElement && match(n)) out.push(n);
      n.childNodes.forEach(walk);
    };
    walk(this);
    return out;
  }
  byTag(tag: string): FakeElement[] {
    return this.findAll((e) => e.tagName === tag);
  }
  byClass(cls: string): FakeElement[] {
    return this.findAll((e) => (e.getAttribute("class") ?? "").split(/\s+/).includes(cls));
  }
}

export const fakeDocument = {
  createElementNS: (ns: string | null, tag: string) => new FakeElement(ns, tag),
  createTextNode: (text: string) => new FakeText(text),
} as unknown as SvgDocument;

/** The fake element behind a renderer's result. */
export function fake(node: unknown): FakeElement {
  if (!(node instanceof FakeElement)) throw new Error("not a fake element");
  return node;
}
