/**
 * manifest.xml checked offline (the online validator is unreachable here): every resid resolves,
 * the shared runtime is wired the same way everywhere, URLs are https on the dev server's origin,
 * the namespace fits Excel's 32-character limit, icons exist at the declared sizes, the id is a GUID.
 */
import { readFileSync, existsSync } from "node:fs";
import { join } from "node:path";

const root = join(__dirname, "..", "..");
const xml = readFileSync(join(root, "manifest.xml"), "utf8");

/** Attribute values of every element with that tag (namespace prefix optional). */
function attrs(tag: string, attr: string): string[] {
  const re = new RegExp(`<(?:\\w+:)?${tag}\\b[^>]*\\b${attr}="([^"]*)"`, "g");
  return [...xml.matchAll(re)].map((m) => m[1] as string);
}

function resource(kind: "Image" | "Url" | "String", id: string): string | undefined {
  const re = new RegExp(`<bt:${kind} id="${id.replace(/\./g, "\\.")}" DefaultValue="([^"]*)"`);
  return xml.match(re)?.[1];
}

function pngSize(file: string): [number, number] {
  const buf = readFileSync(file);
  expect(buf.subarray(1, 4).toString("ascii")).toBe("PNG");
  return [buf.readUInt32BE(16), buf.readUInt32BE(20)];
}

describe("manifest.xml", () => {
  test("is a task pane add-in with the XML schema instance namespace and ReadWriteDocument", () => {
    expect(xml).toMatch(/xsi:type="TaskPaneApp"/);
    expect(xml).toContain('xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"');
    expect(xml).toMatch(/<Permissions>ReadWriteDocument<\/Permissions>/);
  });

  test("has a well-formed GUID as its id", () => {
    const id = xml.match(/<Id>([^<]*)<\/Id>/)?.[1];
    expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-[1-5][0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/i);
  });

  test("declares the shared runtime and custom functions requirement sets", () => {
    expect(xml).toMatch(/<Set Name="SharedRuntime" MinVersion="1\.1"\/>/);
    expect(xml).toMatch(/<Set Name="CustomFunctionsRuntime" MinVersion="1\.1"\/>/);
  });

  test("every resid refers to a defined resource", () => {
    const defined = new Set([...xml.matchAll(/<bt:(?:Image|Url|String) id="([^"]+)"/g)].map((m) => m[1]));
    const used = attrs("[A-Za-z]+", "resid");
    expect(used.length).toBeGreaterThan(10);
    const missing = used.filter((r) => !defined.has(r));
    expect(missing).toEqual([]);
  });

  test("the long-lived runtime, the functions page, the function file and the task pane use one resid", () => {
    const runtime = xml.match(/<Runtime resid="([^"]+)" lifetime="long"\/>/)?.[1];
    expect(runtime).toBeDefined();
    const page = xml.match(/<Page>\s*<SourceLocation resid="([^"]+)"\/>/)?.[1];
    const functionFile = xml.match(/<FunctionFile resid="([^"]+)"\/>/)?.[1];
    const action = xml.match(/<Action xsi:type="ShowTaskpane">\s*<SourceLocation resid="([^"]+)"\/>/)?.[1];
    expect([page, functionFile, action]).toEqual([runtime, runtime, runtime]);
    // and the default page the add-in opens is the same URL
    const defaultPage = xml.match(/<DefaultSettings>\s*<SourceLocation DefaultValue="([^"]+)"\/>/)?.[1];
    expect(defaultPage).toBe(resource("Url", runtime as string));
    // one task pane only: no TaskpaneId
    expect(xml).not.toMatch(/TaskpaneId/);
  });

  test("Runtimes is the first child of the workbook host", () => {
    expect(xml).toMatch(/<Host xsi:type="Workbook">\s*<Runtimes>/);
  });

  test("the namespace is AQ and fits in 32 characters", () => {
    const resid = xml.match(/<Namespace resid="([^"]+)"\/>/)?.[1] as string;
    const ns = resource("String", resid);
    expect(ns).toBe("AQ");
    expect((ns as string).length).toBeLessThanOrEqual(32);
  });

  test("all URLs are https on the development server origin and point at files the build emits", () => {
    const urls = [...xml.matchAll(/DefaultValue="(https?:[^"]*)"/g)].map((m) => m[1] as string);
    expect(urls.length).toBeGreaterThan(5);
    for (const url of urls) expect(url.startsWith("https://localhost:3000/")).toBe(true);
    const appDomain = xml.match(/<AppDomain>([^<]+)<\/AppDomain>/)?.[1];
    expect(appDomain).toBe("https://localhost:3000");
    const paths = urls.map((u) => new URL(u).pathname);
    const emitted = ["/taskpane.html", "/functions.js", "/functions.json"];
    for (const p of emitted) expect(paths).toContain(p);
  });

  test("icon files exist at the sizes Office expects", () => {
    const icons: [string, number][] = [
      [xml.match(/<IconUrl DefaultValue="([^"]+)"/)?.[1] as string, 32],
      [xml.match(/<HighResolutionIconUrl DefaultValue="([^"]+)"/)?.[1] as string, 64],
      [resource("Image", "Icon.16") as string, 16],
      [resource("Image", "Icon.32") as string, 32],
      [resource("Image", "Icon.80") as string, 80],
    ];
    for (const [url, size] of icons) {
      const file = join(root, new URL(url).pathname);
      expect(existsSync(file)).toBe(true);
      expect(pngSize(file)).toEqual([size, size]);
    }
  });
});
