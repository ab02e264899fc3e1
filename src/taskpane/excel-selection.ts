/**
 * Inside Excel: the mixture of the selected cell's formula, and a watch on the selection.
 *
 * readSelectedMixture: one Excel.run. The active cell's formula (ExcelApi 1.7, getActiveCell) is
 * loaded with its address and sheet; a cell inside a spilled table (AQ.SPECIES, AQ.CURVE) is read
 * through its spill's anchor (ExcelApi 1.12, where available). The first AQ function of a mixture in
 * the formula gives its names, amounts, temperature and activity arguments (formula/aq-call.ts);
 * the references among them (same sheet, another sheet, a workbook or sheet name) are loaded in one
 * more sync, and the values become the pane's rows (formula/mixture-values.ts).
 *
 * watchSelection: worksheets.onSelectionChanged and onActivated (ExcelApi 1.9) or, on older hosts,
 * the workbook's onSelectionChanged; the returned function removes the handlers.
 */
import { CALL_ARGS, findAqCall, type AqCall, type ArgSource, type CallArg, type CellValue } from "./formula/aq-call";
import { mixtureFromValues, titrationFromValues, type MixtureSpec } from "./formula/mixture-values";

/** The part of the Excel namespace this module uses (the real `Excel`, or a test double). */
export interface SelectionExcel {
  run<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<T>;
  run<T>(context: OfficeExtension.ClientRequestContext, batch: (context: Excel.RequestContext) => Promise<T>): Promise<T>;
}

export type SelectedMixture =
  | { ok: true; address: string; formula: string; call: AqCall; spec: MixtureSpec }
  | { ok: false; address: string | null; formula: string | null; message: string };

function why(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

type ArgName = CallArg;
const OPTIONAL = new Set<CallArg>(["titrant", "titrantConc", "volume", "maxVolume"]);
const LABEL: Record<CallArg, string> = {
  names: "names",
  amounts: "amounts",
  temperature: "temperature",
  activity: "activity",
  titrant: "titrant",
  titrantConc: "titrant_conc",
  volume: "volume",
  maxVolume: "max_titrant_volume",
};

type Loaded = { ok: true; values: CellValue[][] | null } | { ok: false; message: string };

interface Pending {
  arg: ArgName;
  source: ArgSource;
  range?: Excel.Range;
  /** A sheet named in the formula (getItemOrNullObject: its isNullObject is read after sync). */
  namedSheet?: Excel.Worksheet;
  item?: Excel.NamedItem;
}

function asCells(values: unknown[][]): CellValue[][] {
  return values.map((r) => r.map((v) => (typeof v === "number" || typeof v === "string" || typeof v === "boolean" ? v : null)));
}

function loaded(p: Pending): Loaded {
  const s = p.source;
  const label = `the ${LABEL[p.arg]} argument (${"text" in s ? s.text : ""})`;
  switch (s.kind) {
    case "missing":
      return { ok: true, values: null };
    case "values":
      return { ok: true, values: s.values };
    case "unsupported":
      return { ok: false, message: `${label.replace(/ \(\)$/, "")} cannot be used: ${s.why}` };
    case "ref":
      if (p.namedSheet?.isNullObject) return { ok: false, message: `${label} names a sheet '${s.sheet}' that the workbook does not have` };
      return { ok: true, values: asCells(p.range!.values) };
    case "name": {
      const item = p.item!;
      if (item.isNullObject) return { ok: false, message: `${label}: the workbook has no name '${s.name}'` };
      if (p.range && !p.range.isNullObject) return { ok: true, values: asCells(p.range.values) };
      if (["Double", "Integer", "String", "Boolean"].includes(String(item.type))) return { ok: true, values: asCells([[item.value]]) };
      return { ok: false, message: `${label}: the name '${s.name}' does not refer to a range or a value` };
    }
  }
}

/** The mixture of the AQ formula in the active cell. Never throws: every problem is a message. */
export async function readSelectedMixture(excel: SelectionExcel): Promise<SelectedMixture> {
  try {
    return await excel.run(async (ctx) => {
      const cell = ctx.workbook.getActiveCell();
      cell.load(["address", "formulas"]);
      await ctx.sync();
      let address = cell.address;
      let formula: unknown = cell.formulas?.[0]?.[0];
      let home: Excel.Worksheet = cell.worksheet;
      if (typeof formula !== "string" || !formula.startsWith("=")) {
        // inside a spilled table the formula lives in the anchor cell
        try {
          const parent = cell.getSpillParentOrNullObject();
          parent.load(["address", "formulas"]);
          await ctx.sync();
          if (!parent.isNullObject) {
            formula = parent.formulas?.[0]?.[0];
            address = `${parent.address} (spilling into ${address.replace(/^.*!/, "")})`;
            home = parent.worksheet;
          }
        } catch {
          // ExcelApi 1.12 missing: keep the cell itself
        }
      }
      const found = findAqCall(formula);
      if (!found.ok) return { ok: false as const, address, formula: typeof formula === "string" ? formula : null, message: found.message };
      const call = found.call;
      const pending: Pending[] = CALL_ARGS.map((arg) => {
        const source = call[arg];
        const p: Pending = { arg, source };
        if (source.kind === "ref") {
          if (source.sheet !== null) p.namedSheet = ctx.workbook.worksheets.getItemOrNullObject(source.sheet);
          p.range = (p.namedSheet ?? home).getRange(source.address);
          p.range.load("values");
        } else if (source.kind === "name") {
          p.item = source.sheet === null ? ctx.workbook.names.getItemOrNullObject(source.name) : ctx.workbook.worksheets.getItem(source.sheet).names.getItemOrNullObject(source.name);
          p.item.load(["type", "value"]);
          p.range = p.item.getRangeOrNullObject();
          p.range.load("values");
        }
        return p;
      });
      if (pending.some((p) => p.range)) {
        try {
          await ctx.sync();
        } catch (e) {
          const refs = pending.filter((p) => p.range).map((p) => ("text" in p.source ? p.source.text : p.arg));
          return { ok: false as const, address, formula: formula as string, message: `Excel could not read ${refs.join(", ")}: ${why(e)}` };
        }
      }
      const values = {} as Record<ArgName, CellValue[][] | null>;
      for (const p of pending) {
        const v = loaded(p);
        // the mixture's arguments must be read; the titration's are a bonus (the view keeps its own settings)
        if (!v.ok && OPTIONAL.has(p.arg)) values[p.arg] = null;
        else if (!v.ok) return { ok: false as const, address, formula: formula as string, message: v.message };
        else values[p.arg] = v.values;
      }
      if (!values.names || !values.amounts) return { ok: false as const, address, formula: formula as string, message: `${call.text} has no names or amounts argument` };
      const spec = mixtureFromValues(values.names, values.amounts, values.temperature, values.activity);
      if (!spec.ok) return { ok: false as const, address, formula: formula as string, message: `${call.text}: ${spec.message}` };
      const titration = titrationFromValues(call.fn.id, values.titrant, values.titrantConc, values.volume, values.maxVolume);
      return { ok: true as const, address, formula: formula as string, call, spec: titration ? { ...spec.spec, titration } : spec.spec };
    });
  } catch (e) {
    return { ok: false, address: null, formula: null, message: `Excel could not read the selected cell: ${why(e)}` };
  }
}

/**
 * Calls onChange when the selection (or the active sheet) changes; resolves to a function that
 * stops it. The worksheet collection's events need ExcelApi 1.9; where registering them fails, the
 * workbook's onSelectionChanged (ExcelApi 1.2) is used.
 */
export async function watchSelection(excel: SelectionExcel, onChange: () => void): Promise<() => Promise<void>> {
  const fire = async (): Promise<void> => onChange();
  let handlers: OfficeExtension.EventHandlerResult<unknown>[];
  try {
    handlers = await excel.run(async (ctx) => {
      const sheets = ctx.workbook.worksheets;
      const out = [sheets.onSelectionChanged.add(fire), sheets.onActivated.add(fire)];
      await ctx.sync();
      return out;
    });
  } catch {
    handlers = await excel.run(async (ctx) => {
      const out = [ctx.workbook.onSelectionChanged.add(fire)];
      await ctx.sync();
      return out;
    });
  }
  let stopped = false;
  return async () => {
    if (stopped) return;
    stopped = true;
    await excel.run(handlers[0].context, async (ctx) => {
      for (const h of handlers) h.remove();
      await ctx.sync();
    });
  };
}
