/**
 * A stand-in for office.js in the browser tests: the hand mock of Excel (fake-excel-workbook.ts,
 * transpiled as it is) behind `Excel.run`, and an `Office.onReady` that answers "Excel", so the real
 * pane runs as if inside Excel. The test reaches the mock as `window.__fakeExcel` (select a cell,
 * fire the selection event, count handlers). Nothing here is Excel: it is what the mock assumes.
 */
import * as fs from "fs";
import * as path from "path";
import * as ts from "typescript";
import type { BrowserContext, Route } from "playwright-core";
import { OFFICE_CDN } from "./browser";
import type { WorkbookModel } from "./fake-excel-workbook";

export function fakeOfficeScript(model: WorkbookModel): string {
  const source = fs.readFileSync(path.join(__dirname, "fake-excel-workbook.ts"), "utf8");
  const js = ts.transpileModule(source, { compilerOptions: { target: ts.ScriptTarget.ES2020, module: ts.ModuleKind.CommonJS } }).outputText;
  return `(function () {
var exports = {};
${js}
var fake = new exports.FakeExcel(${JSON.stringify(model)});
window.__fakeExcel = fake;
window.Excel = { run: fake.run, CalculationType: { full: "Full" } };
window.Office = {
  onReady: function () { return Promise.resolve({ host: "Excel", platform: "PC" }); },
  context: { requirements: { isSetSupported: function () { return true; } } }
};
})();
`;
}

/** Serve the stand-in at office.js's CDN address; every other outside request is refused. */
export async function routeFakeOffice(context: BrowserContext, model: WorkbookModel, seen: string[] = []): Promise<void> {
  const body = fakeOfficeScript(model);
  await context.route(/^https?:\/\/(?!127\.0\.0\.1)/, async (route: Route) => {
    const url = route.request().url();
    seen.push(url);
    if (url === `${OFFICE_CDN}office.js`) await route.fulfill({ status: 200, contentType: "text/javascript; charset=utf-8", body });
    else await route.abort("internetdisconnected");
  });
}
