/**
 * A hand mock of the parts of Excel the Picture view uses, behaving as office.js does where it
 * matters: requests are queued and run at context.sync(); a property read before it was loaded and
 * synced throws; getItem of a missing sheet fails at sync while getItemOrNullObject gives a null
 * object; APIs a host lacks fail at sync (ApiNotFound); event handlers are registered and removed
 * at sync and fire with the workbook's state at that moment. Counts syncs and reads for the tests.
 *
 * Self-contained (no imports), so charts.browser.test.ts can also transpile it into a stand-in
 * office.js and run the real pane as if inside Excel.
 */

export interface CellModel {
  value?: number | string | boolean;
  formula?: string;
}

export interface NameModel {
  /** A name that refers to a range … */
  range?: { sheet: string; address: string };
  /** … or to a constant. */
  type?: "Double" | "String" | "Boolean" | "Error";
  value?: unknown;
}

export interface SheetModel {
  name: string;
  cells: Record<string, CellModel>;
  names?: Record<string, NameModel>;
  /** Cells inside a spilled table → the anchor cell holding the formula. */
  spills?: Record<string, string>;
}

export interface WorkbookModel {
  sheets: SheetModel[];
  active: { sheet: string; cell: string };
  names?: Record<string, NameModel>;
  /** ExcelApi 1.12 (getSpillParentOrNullObject). Default true. */
  spillApi?: boolean;
  /** ExcelApi 1.9 (worksheets.onSelectionChanged / onActivated). Default true. */
  collectionEvents?: boolean;
  /** Milliseconds each sync takes (to let tests change the selection during a read). */
  syncDelayMs?: number;
}

class ExcelError extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

function notLoaded(prop: string): never {
  throw new ExcelError("PropertyNotLoaded", `The property '${prop}' is not available. Before reading the property's value, call the load method on the containing object and call "context.sync()" on the associated request context.`);
}

function colIndex(col: string): number {
  return [...col].reduce((n, c) => n * 26 + c.charCodeAt(0) - 64, 0);
}

function colName(i: number): string {
  let s = "";
  for (let n = i; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

/** "B2:C4" → the cell addresses row by row; throws InvalidArgument for anything else. */
export function cellsOf(address: string): string[][] {
  const m = /^([A-Z]{1,3})(\d+)(?::([A-Z]{1,3})(\d+))?$/.exec(address.replace(/\$/g, "").toUpperCase());
  if (!m) throw new ExcelError("InvalidArgument", `The argument is invalid or missing or has an incorrect format (${address}).`);
  const [c0, r0] = [colIndex(m[1]), Number(m[2])];
  const [c1, r1] = m[3] ? [colIndex(m[3]), Number(m[4])] : [c0, r0];
  const rows: string[][] = [];
  for (let r = Math.min(r0, r1); r <= Math.max(r0, r1); r++) {
    const row: string[] = [];
    for (let c = Math.min(c0, c1); c <= Math.max(c0, c1); c++) row.push(`${colName(c)}${r}`);
    rows.push(row);
  }
  return rows;
}

function quoteSheet(name: string): string {
  return /^[A-Za-z_][\w.]*$/.test(name) ? name : `'${name.replace(/'/g, "''")}'`;
}

export class FakeExcel {
  syncs = 0;
  /** getActiveCell calls (one per read of the selection). */
  activeCellReads = 0;
  readonly handlers = new Map<string, ((args: unknown) => Promise<void>)[]>();
  readonly log: string[] = [];
  readonly settings = new Map<string, string>();

  constructor(readonly model: WorkbookModel) {}

  sheet(name: string): SheetModel | undefined {
    return this.model.sheets.find((s) => s.name.toLowerCase() === name.toLowerCase());
  }

  /** The user selects another cell (and perhaps another sheet). */
  select(sheet: string, cell: string): void {
    this.model.active = { sheet, cell };
  }

  /** Excel raises the selection event on every registered handler. */
  async fireSelectionChanged(): Promise<void> {
    const all = [...(this.handlers.get("worksheets.onSelectionChanged") ?? []), ...(this.handlers.get("workbook.onSelectionChanged") ?? [])];
    await Promise.all(all.map((h) => h({ type: "WorksheetSelectionChanged", address: this.model.active.cell })));
  }

  handlerCount(): number {
    return [...this.handlers.values()].reduce((n, l) => n + l.length, 0);
  }

  /** Excel.run(batch) and Excel.run(context, batch). */
  run = async <T>(a: unknown, b?: unknown): Promise<T> => {
    const batch = (typeof a === "function" ? a : b) as (c: unknown) => Promise<T>;
    const ctx = typeof a === "function" ? new Context(this) : (a as Context);
    return batch(ctx);
  };
}

class Context {
  private queue: (() => void)[] = [];
  readonly workbook: Workbook;
  constructor(readonly excel: FakeExcel) {
    this.workbook = new Workbook(this);
  }
  enqueue(op: () => void): void {
    this.queue.push(op);
  }
  async sync(): Promise<void> {
    this.excel.syncs++;
    if (this.excel.model.syncDelayMs) await new Promise((r) => setTimeout(r, this.excel.model.syncDelayMs));
    const ops = this.queue;
    this.queue = [];
    let error: unknown = null;
    for (const op of ops) {
      try {
        op();
      } catch (e) {
        error ??= e;
      }
    }
    if (error) throw error;
  }
}

class Loadable {
  protected readonly loaded = new Map<string, unknown>();
  protected read(prop: string): unknown {
    if (!this.loaded.has(prop)) notLoaded(prop);
    return this.loaded.get(prop);
  }
}

class EventSlot {
  constructor(
    private readonly ctx: Context,
    private readonly key: string,
    private readonly available: boolean,
  ) {}
  add(handler: (args: unknown) => Promise<void>) {
    const { ctx, key } = this;
    const list = () => ctx.excel.handlers.get(key) ?? ctx.excel.handlers.set(key, []).get(key)!;
    ctx.enqueue(() => {
      if (!this.available) throw new ExcelError("ApiNotFound", `${key} is not supported by this version of Excel.`);
      list().push(handler);
      ctx.excel.log.push(`add ${key}`);
    });
    return {
      context: ctx,
      remove() {
        ctx.enqueue(() => {
          const l = list();
          const i = l.indexOf(handler);
          if (i >= 0) l.splice(i, 1);
          ctx.excel.log.push(`remove ${key}`);
        });
      },
    };
  }
}

/** Workbook settings (the pane's workbook library lives there) and recalculation, as the pane's store uses them. */
class Settings {
  constructor(private readonly ctx: Context) {}
  add(key: string, value: string): void {
    this.ctx.enqueue(() => this.ctx.excel.settings.set(key, value));
  }
  getItemOrNullObject(key: string) {
    const ctx = this.ctx;
    const item = {
      isNullObject: true,
      value: undefined as unknown,
      key,
      load() {
        ctx.enqueue(() => {
          item.isNullObject = !ctx.excel.settings.has(key);
          item.value = ctx.excel.settings.get(key);
        });
        return item;
      },
      delete() {
        ctx.enqueue(() => ctx.excel.settings.delete(key));
      },
    };
    return item;
  }
}

class Workbook {
  readonly worksheets: Worksheets;
  readonly names: Names;
  readonly onSelectionChanged: EventSlot;
  readonly settings: Settings;
  readonly application: { calculate(type: string): void };
  constructor(private readonly ctx: Context) {
    this.worksheets = new Worksheets(ctx);
    this.names = new Names(ctx, () => ctx.excel.model.names ?? {});
    this.onSelectionChanged = new EventSlot(ctx, "workbook.onSelectionChanged", true);
    this.settings = new Settings(ctx);
    this.application = { calculate: (type: string) => ctx.enqueue(() => ctx.excel.log.push(`calculate ${type}`)) };
  }
  getActiveCell(): Range {
    this.ctx.excel.activeCellReads++;
    const { sheet, cell } = this.ctx.excel.model.active;
    return new Range(this.ctx, new Worksheet(this.ctx, sheet, "item"), cell);
  }
}

class Worksheets {
  readonly onSelectionChanged: EventSlot;
  readonly onActivated: EventSlot;
  constructor(private readonly ctx: Context) {
    const ok = ctx.excel.model.collectionEvents !== false;
    this.onSelectionChanged = new EventSlot(ctx, "worksheets.onSelectionChanged", ok);
    this.onActivated = new EventSlot(ctx, "worksheets.onActivated", ok);
  }
  getItem(name: string): Worksheet {
    return new Worksheet(this.ctx, name, "item");
  }
  getItemOrNullObject(name: string): Worksheet {
    return new Worksheet(this.ctx, name, "orNull");
  }
}

class Worksheet extends Loadable {
  readonly names: Names;
  constructor(
    private readonly ctx: Context,
    readonly sheetName: string,
    private readonly mode: "item" | "orNull",
  ) {
    super();
    this.names = new Names(ctx, () => this.model()?.names ?? {}, () => this.model());
    if (mode === "orNull") ctx.enqueue(() => this.loaded.set("isNullObject", !this.model()));
  }
  model(): SheetModel | undefined {
    return this.ctx.excel.sheet(this.sheetName);
  }
  /** At sync: the sheet, or ItemNotFound (getItem), or null (a null object's requests do nothing). */
  resolve(): SheetModel | null {
    const m = this.model();
    if (m) return m;
    if (this.mode === "item") throw new ExcelError("ItemNotFound", `The requested resource doesn't exist (sheet '${this.sheetName}').`);
    return null;
  }
  get isNullObject(): boolean {
    return this.read("isNullObject") as boolean;
  }
  get name(): string {
    return this.read("name") as string;
  }
  load(props: string | string[]): this {
    for (const p of [props].flat()) this.ctx.enqueue(() => this.loaded.set(p, p === "name" ? this.resolve()?.name : undefined));
    return this;
  }
  getRange(address: string): Range {
    return new Range(this.ctx, this, address);
  }
}

class Range extends Loadable {
  constructor(
    private readonly ctx: Context,
    readonly worksheet: Worksheet,
    private readonly ref: string,
    private readonly nullIf: () => boolean = () => false,
  ) {
    super();
  }
  get isNullObject(): boolean {
    return this.read("isNullObject") as boolean;
  }
  get address(): string {
    return this.read("address") as string;
  }
  get values(): unknown[][] {
    return this.read("values") as unknown[][];
  }
  get formulas(): unknown[][] {
    return this.read("formulas") as unknown[][];
  }
  load(props: string | string[]): this {
    this.ctx.enqueue(() => {
      this.loaded.set("isNullObject", this.nullIf());
      if (this.nullIf()) return;
      const sheet = this.worksheet.resolve();
      if (!sheet) return;
      const grid = cellsOf(this.ref);
      for (const p of [props].flat()) {
        if (p === "address") this.loaded.set(p, `${quoteSheet(sheet.name)}!${this.ref.replace(/\$/g, "")}`);
        else if (p === "values") this.loaded.set(p, grid.map((r) => r.map((c) => sheet.cells[c]?.value ?? "")));
        else if (p === "formulas") this.loaded.set(p, grid.map((r) => r.map((c) => sheet.cells[c]?.formula ?? sheet.cells[c]?.value ?? "")));
        else throw new Error(`the mock does not load '${p}'`);
      }
    });
    return this;
  }
  getSpillParentOrNullObject(): Range {
    const sheetModel = () => this.worksheet.model();
    const anchor = () => sheetModel()?.spills?.[this.ref];
    if (this.ctx.excel.model.spillApi === false) {
      this.ctx.enqueue(() => {
        throw new ExcelError("ApiNotFound", "getSpillParentOrNullObject is not supported by this version of Excel.");
      });
    }
    return new Range(this.ctx, this.worksheet, anchor() ?? this.ref, () => anchor() === undefined);
  }
}

class Names {
  constructor(
    private readonly ctx: Context,
    private readonly scope: () => Record<string, NameModel>,
    private readonly sheet?: () => SheetModel | undefined,
  ) {}
  getItemOrNullObject(name: string): NamedItem {
    return new NamedItem(this.ctx, () => Object.entries(this.scope()).find(([k]) => k.toLowerCase() === name.toLowerCase())?.[1]);
  }
}

class NamedItem extends Loadable {
  constructor(
    private readonly ctx: Context,
    private readonly model: () => NameModel | undefined,
  ) {
    super();
    ctx.enqueue(() => this.loaded.set("isNullObject", !this.model()));
  }
  get isNullObject(): boolean {
    return this.read("isNullObject") as boolean;
  }
  get type(): string {
    return this.read("type") as string;
  }
  get value(): unknown {
    return this.read("value");
  }
  load(props: string | string[]): this {
    this.ctx.enqueue(() => {
      const m = this.model();
      for (const p of [props].flat()) this.loaded.set(p, m ? (p === "type" ? (m.range ? "Range" : m.type) : m.range ? `=${m.range.sheet}!${m.range.address}` : m.value) : undefined);
    });
    return this;
  }
  getRangeOrNullObject(): Range {
    const m = () => this.model();
    const target = m()?.range;
    return new Range(this.ctx, new Worksheet(this.ctx, target?.sheet ?? "", "orNull"), target?.address ?? "A1", () => !m()?.range);
  }
}
