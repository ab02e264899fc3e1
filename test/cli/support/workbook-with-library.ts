/**
 * XLSX files that carry a Protolyte constants library the way the add-in stores it: the settings
 * text is produced by the add-in's own storage code (createWorkbookSettingsStorage with a stand-in
 * for Excel.run that records what `settings.add` receives), then placed in a web-extension part as
 * Office describes it ([MS-OWEXML] 2.2.2, 2.2.5, 2.2.7: `<we:reference id>` = manifest Id,
 * `<we:property name value>` = the JSON-serialised setting). Excel itself was not available to
 * confirm the layout against a file it saved.
 */
import ExcelJS from "exceljs";
import { createWorkbookSettingsStorage, makeBlob, type SettingsContextLike } from "../../../src/library";
import type { LibraryDoc } from "../../../src/library/types";
import { ADDIN_ID } from "../../../src/cli/workbook-library";
import { readParts, writeParts } from "./zip-parts";

/** The text the add-in's storage code hands to `workbook.settings.add` for this library. */
export async function storedSettingText(doc: LibraryDoc): Promise<{ key: string; text: string }> {
  let captured: { key: string; text: string } | null = null;
  const context: SettingsContextLike = {
    workbook: {
      settings: {
        getItemOrNullObject: () => ({ isNullObject: true, value: null, load: () => undefined, delete: () => undefined }),
        add: (key: string, text: string) => {
          captured = { key, text };
        },
      },
    },
    sync: async () => undefined,
  };
  const storage = createWorkbookSettingsStorage({ run: (batch) => batch(context) })!;
  const saved = await storage.save(makeBlob(doc, new Date("2026-11-30T09:00:00Z")));
  if (!saved.ok || captured === null) throw new Error(`the storage code did not save: ${JSON.stringify(saved)}`);
  return captured;
}

const escapeXml = (s: string): string => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

export function webExtensionPart(addinId: string, settings: Record<string, string>): string {
  const properties = Object.entries(settings)
    .map(([name, value]) => `<we:property name="${escapeXml(name)}" value="${escapeXml(JSON.stringify(value))}"/>`)
    .join("");
  return (
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n' +
    '<we:webextension xmlns:we="http://schemas.microsoft.com/office/webextensions/webextension/2010/11" id="{5B2C7A10-3E4D-4B8A-9C61-2F0D8E7A1B33}">' +
    `<we:reference id="${addinId}" version="0.1.0.0" store="developer" storeType="Registry"/>` +
    "<we:alternateReferences/>" +
    `<we:properties>${properties}</we:properties>` +
    "<we:bindings/>" +
    '<we:snapshot xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships"/>' +
    "</we:webextension>"
  );
}

const TASKPANES =
  '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n' +
  '<wetp:taskpanes xmlns:wetp="http://schemas.microsoft.com/office/webextensions/taskpanes/2010/11">' +
  '<wetp:taskpane dockstate="right" visibility="0" width="350" row="0"><wetp:webextensionref xmlns:r="http://schemas.openxmlformats.org/officeDocument/2006/relationships" r:id="rId1"/></wetp:taskpane>' +
  "</wetp:taskpanes>";

/** Adds web-extension parts (one per entry of `parts`, in order) to an XLSX made by exceljs. */
export async function addWebExtensions(xlsx: Buffer, parts: string[]): Promise<Buffer> {
  const zip = readParts(xlsx);
  const text = (name: string): string => zip.get(name)!.toString("utf8");
  const overrides = parts
    .map((_, i) => `<Override PartName="/xl/webextensions/webextension${i + 1}.xml" ContentType="application/vnd.ms-office.webextension+xml"/>`)
    .join("");
  zip.set(
    "[Content_Types].xml",
    Buffer.from(text("[Content_Types].xml").replace("</Types>", `${overrides}<Override PartName="/xl/webextensions/taskpanes.xml" ContentType="application/vnd.ms-office.webextensiontaskpanes+xml"/></Types>`)),
  );
  zip.set(
    "_rels/.rels",
    Buffer.from(text("_rels/.rels").replace("</Relationships>", '<Relationship Id="rIdWe1" Type="http://schemas.microsoft.com/office/2011/relationships/webextensiontaskpanes" Target="xl/webextensions/taskpanes.xml"/></Relationships>')),
  );
  const added = new Map<string, Buffer | string>(zip);
  added.set("xl/webextensions/taskpanes.xml", TASKPANES);
  added.set(
    "xl/webextensions/_rels/taskpanes.xml.rels",
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n<Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">' +
      parts.map((_, i) => `<Relationship Id="rId${i + 1}" Type="http://schemas.microsoft.com/office/2011/relationships/webextension" Target="webextension${i + 1}.xml"/>`).join("") +
      "</Relationships>",
  );
  parts.forEach((xml, i) => added.set(`xl/webextensions/webextension${i + 1}.xml`, xml));
  return writeParts(added);
}

/** A one-sheet workbook: rows of values and "=…" formulas. */
export async function workbookBuffer(sheets: Record<string, (string | number)[][]>): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  for (const [name, rows] of Object.entries(sheets)) {
    const ws = wb.addWorksheet(name);
    rows.forEach((row, r) =>
      row.forEach((v, c) => {
        ws.getCell(r + 1, c + 1).value = typeof v === "string" && v.startsWith("=") ? ({ formula: v.slice(1) } as ExcelJS.CellFormulaValue) : v;
      }),
    );
  }
  return Buffer.from(await wb.xlsx.writeBuffer());
}

export { ADDIN_ID };
