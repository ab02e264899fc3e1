/**
 * Workbooks as Excel writes them: function names spelled for the file format ("_xlfn.IFNA",
 * "_xldudf_AQ_PH") evaluate as the typed names do.
 */
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import ExcelJS from "exceljs";
import { evaluateSheets } from "../../src/cli/evaluate";
import { normaliseFormula, readWorkbook } from "../../src/cli/xlsx";

describe("normaliseFormula", () => {
  test.each([
    ["_xldudf_AQ_PH(A1:A2,B1:B2)", "AQ.PH(A1:A2,B1:B2)"],
    ["_xldudf_AQ_CONSTANTS_ID()", "AQ.CONSTANTS_ID()"],
    ["_xldudf_aq_ph (A1:A2,B1:B2)", "AQ.PH (A1:A2,B1:B2)"],
    ["_xlfn.IFNA(_xldudf_AQ_PH(A1,B1),\"no pH\")", 'IFNA(AQ.PH(A1,B1),"no pH")'],
    ["_xlfn._xlws.SORT(A1:A3)", "SORT(A1:A3)"],
    ["AQ.PH(A1:A2,B1:B2)+1", "AQ.PH(A1:A2,B1:B2)+1"],
    // Text in quotes stays as written, doubled quotes included.
    ['CONCATENATE("_xlfn.",_xlfn.XOR(TRUE,FALSE),"""_xldudf_AQ_PH(""")', 'CONCATENATE("_xlfn.",XOR(TRUE,FALSE),"""_xldudf_AQ_PH(""")'],
    // A defined name that merely starts like the prefix is not a function call.
    ["_xldudf_AQ_PH_TABLE+1", "_xldudf_AQ_PH_TABLE+1"],
  ])("%s → %s", (stored, typed) => {
    expect(normaliseFormula(stored)).toBe(typed);
  });
});

describe("an XLSX with formulas stored by their file-format names", () => {
  let dir = "";
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), "protolyte-xlsx-"));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  test("evaluates as the typed formulas do", async () => {
    const file = join(dir, "stored-names.xlsx");
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet("Batch");
    ws.getCell("A1").value = "acetic acid";
    ws.getCell("A2").value = "sodium acetate";
    ws.getCell("B1").value = 0.05;
    ws.getCell("B2").value = 0.05;
    ws.getCell("C1").value = { formula: "_xldudf_AQ_PH(A1:A2,B1:B2)" } as ExcelJS.CellFormulaValue;
    ws.getCell("C2").value = { formula: "AQ.PH(A1:A2,B1:B2)" } as ExcelJS.CellFormulaValue;
    ws.getCell("C3").value = { formula: '_xlfn.IFNA(_xldudf_AQ_PH(A1:A2,B1:B2,150),"out of range")' } as ExcelJS.CellFormulaValue;
    await wb.xlsx.writeFile(file);

    const sheets = await readWorkbook(file);
    expect(sheets.get("Batch")![0]![2]).toBe("=AQ.PH(A1:A2,B1:B2)");
    const [result] = evaluateSheets(sheets);
    const stored = result.values[0][2];
    expect(typeof stored).toBe("number");
    expect(stored).toBe(result.values[1][2]);
    // 150 °C is outside 0–100 °C: #VALUE!, which IFNA passes on (it catches #N/A only).
    expect(result.values[2][2]).toMatchObject({ error: "#VALUE!" });
  });
});
