/**
 * Inside Excel: the substance names a workbook's AQ formulas use. Two syncs (plus one for the
 * sheets): every sheet's used range (formulas), then the ranges and names those formulas' name
 * arguments refer to (formula/names-in-formula.ts). Inline names are read from the formula itself.
 * A bounded read: at most MAX_FORMULA_CELLS formula cells and MAX_REFERENCES references.
 */
import type { SelectionExcel } from "./excel-selection";
import type { ArgSource } from "./formula/aq-call";
import { nameSources } from "./formula/names-in-formula";
import type { WorkbookNames } from "./workbook-uses";

export const MAX_FORMULA_CELLS = 20000;
export const MAX_REFERENCES = 2000;

const strings = (values: unknown[][]): string[] => values.flat().filter((v): v is string => typeof v === "string" && v.trim() !== "").map((v) => v.trim());

export async function readWorkbookNames(excel: SelectionExcel): Promise<WorkbookNames> {
  return excel.run(async (ctx) => {
    const sheets = ctx.workbook.worksheets;
    sheets.load("items/name");
    await ctx.sync();
    const used = sheets.items.map((sheet) => {
      const range = sheet.getUsedRangeOrNullObject(true);
      range.load("formulas,address");
      return { sheet, range };
    });
    await ctx.sync();
    const names = new Set<string>();
    const unread: string[] = [];
    const pending: { where: string; source: ArgSource; range: Excel.Range }[] = [];
    let formulas = 0;
    for (const { sheet, range } of used) {
      if (range.isNullObject) continue;
      const origin = /!?\$?([A-Z]+)\$?(\d+)/.exec(range.address.split("!").pop() ?? "");
      const col0 = origin ? [...origin[1]].reduce((n, c) => n * 26 + c.charCodeAt(0) - 64, 0) : 1;
      const row0 = origin ? Number(origin[2]) : 1;
      range.formulas.forEach((row, r) =>
        row.forEach((f, c) => {
          if (typeof f !== "string" || !f.startsWith("=")) return;
          const found = nameSources(f);
          if (found.sources.length === 0 && !found.error) return;
          formulas++;
          if (formulas > MAX_FORMULA_CELLS) return;
          const where = `${sheet.name}!${colName(col0 + c)}${row0 + r}`;
          if (found.error) unread.push(`${where}: ${found.error}`);
          for (const s of found.sources) {
            if (s.kind === "values") strings(s.values).forEach((n) => names.add(n));
            else if (s.kind === "missing") continue;
            else if (s.kind === "unsupported") unread.push(`${where}: ${s.text} is not read (${s.why})`);
            else if (pending.length >= MAX_REFERENCES) unread.push(`${where}: ${s.text} is not read (more than ${MAX_REFERENCES} references)`);
            else if (s.kind === "ref") {
              const target = s.sheet === null ? sheet : sheets.items.find((x) => x.name.toLowerCase() === s.sheet!.toLowerCase());
              if (!target) {
                unread.push(`${where}: ${s.text} names a sheet '${s.sheet}' that the workbook does not have`);
                continue;
              }
              const rg = target.getRange(s.address);
              rg.load("values");
              pending.push({ where, source: s, range: rg });
            } else if (s.kind === "name") {
              const rg = ctx.workbook.names.getItemOrNullObject(s.name).getRangeOrNullObject();
              rg.load("values");
              pending.push({ where, source: s, range: rg });
            }
          }
        }),
      );
    }
    if (formulas > MAX_FORMULA_CELLS) unread.push(`only the first ${MAX_FORMULA_CELLS} of ${formulas} AQ formulas were read`);
    if (pending.length) await ctx.sync();
    for (const p of pending) {
      if (p.range.isNullObject) unread.push(`${p.where}: ${p.source.kind === "name" ? p.source.text : "the reference"} does not refer to a range of the workbook`);
      else strings(p.range.values).forEach((n) => names.add(n));
    }
    return { names: [...names], formulas: Math.min(formulas, MAX_FORMULA_CELLS), unread };
  });
}

function colName(n: number): string {
  let s = "";
  for (let x = n; x > 0; x = Math.floor((x - 1) / 26)) s = String.fromCharCode(65 + ((x - 1) % 26)) + s;
  return s;
}
