/**
 * Tokens of an Excel formula as `Range.formulas` returns it (the English, A1-style form: "," between
 * arguments and array columns, ";" between array rows). Pure: no Office API, no DOM.
 *
 * What it knows: strings with doubled quotes ("say ""hi"", then"), numbers (1, .5, 2.5E-3), cell and
 * range references with or without $ (A1, $B$2:$B$9, C:C, 3:5), sheet-qualified references
 * (Sheet1!A1, 'My Sheet'!A1:A3, 'Bob''s data'!B2), workbook and 3-D references (recognised so that
 * they can be refused by name), error literals (#N/A), names and functions (AQ.PH, _xldudf_AQ_PH),
 * operators, and the punctuation of calls and inline arrays.
 */
import { leadingDecimal } from "../../chem/number-text";

export type TokenKind =
  | "string"
  | "number"
  | "bool"
  | "error"
  | "ref"
  | "name"
  | "func"
  | "op"
  | "("
  | ")"
  | "{"
  | "}"
  | ","
  | ";";

export interface Token {
  kind: TokenKind;
  /** The source text of the token. */
  text: string;
  /** Strings: the unescaped value; refs and names: the address or name without the sheet and without $. */
  value: string;
  /** Refs and names: the sheet they are qualified with ('' quotes undone), or null. */
  sheet: string | null;
  /** Refs: a qualifier the pane cannot follow ("workbook", "3-D"), or null. */
  unsupported: string | null;
  start: number;
  end: number;
}

export class FormulaSyntaxError extends Error {
  constructor(
    message: string,
    readonly at: number,
  ) {
    super(message);
    this.name = "FormulaSyntaxError";
  }
}

const ERRORS = ["#NULL!", "#DIV/0!", "#VALUE!", "#REF!", "#NAME?", "#NUM!", "#N/A", "#GETTING_DATA", "#SPILL!", "#CALC!", "#BUSY!", "#FIELD!", "#CONNECT!", "#BLOCKED!", "#UNKNOWN!"];

const CELL = String.raw`\$?[A-Za-z]{1,3}\$?\d+`;
const COL = String.raw`\$?[A-Za-z]{1,3}`;
const ROW = String.raw`\$?\d+`;
/** A reference after an optional sheet: a cell or cell range, a column range, a row range; not followed by a name character or "(". */
const REF_RE = new RegExp(String.raw`^(?:${CELL}(?::${CELL})?|${COL}:${COL}|${ROW}:${ROW})(?![\w.(!?\\])`);
const NAME_RE = /^[A-Za-z_\\\u00C0-\uFFFF][\w.\\?\u00C0-\uFFFF]*/;
/** An unquoted sheet (or [book]sheet, or sheet:sheet) before "!". */
const BARE_SHEET_RE = /^(?:\[[^\]]+\])?[^\s'!(),;{}"#+\-*/^&=<>%@:[\]]+(?::[^\s'!(),;{}"#+\-*/^&=<>%@:[\]]+)?!/;
const OPS = ["<=", ">=", "<>", "+", "-", "*", "/", "^", "&", "=", "<", ">", "%", ":", "@"];

/** Excel's cell reference without $ signs, upper case. */
export function plainAddress(text: string): string {
  return text.replace(/\$/g, "").toUpperCase();
}

function sheetQualifier(raw: string): { sheet: string; unsupported: string | null } {
  let name = raw;
  if (name.startsWith("'")) name = name.slice(1, -1).replace(/''/g, "'");
  if (/^\[[^\]]*\]/.test(name)) return { sheet: name, unsupported: "a reference to another workbook" };
  if (name.includes(":")) return { sheet: name, unsupported: "a 3-D reference over several sheets" };
  return { sheet: name, unsupported: null };
}

export function tokenize(formula: string): Token[] {
  const src = formula.startsWith("=") ? formula.slice(1) : formula;
  const offset = formula.length - src.length;
  const out: Token[] = [];
  let i = 0;
  const push = (kind: TokenKind, text: string, extra: Partial<Token> = {}) => {
    out.push({ kind, text, value: text, sheet: null, unsupported: null, start: offset + i, end: offset + i + text.length, ...extra });
    i += text.length;
  };
  while (i < src.length) {
    const rest = src.slice(i);
    const c = src[i];
    if (/\s/.test(c)) {
      i++;
      continue;
    }
    if (c === '"') {
      let j = i + 1;
      let value = "";
      for (;;) {
        if (j >= src.length) throw new FormulaSyntaxError("a text in quotes is not closed", offset + i);
        if (src[j] === '"') {
          if (src[j + 1] === '"') {
            value += '"';
            j += 2;
            continue;
          }
          break;
        }
        value += src[j];
        j++;
      }
      push("string", src.slice(i, j + 1), { value });
      continue;
    }
    // sheet-qualified reference or name: 'My Sheet'!A1, Sheet1!$A$1:$A$3, [Book2]Data!A1, Jan:Mar!B2
    let sheetText: string | null = null;
    if (c === "'") {
      const m = /^'(?:[^']|'')+'!/.exec(rest);
      if (!m) throw new FormulaSyntaxError("a quoted sheet name is not closed or not followed by !", offset + i);
      sheetText = m[0];
    } else {
      const m = BARE_SHEET_RE.exec(rest);
      if (m && !/^\d/.test(m[0]) && !REF_RE.test(rest)) sheetText = m[0];
    }
    if (sheetText !== null) {
      const q = sheetQualifier(sheetText.slice(0, -1));
      const after = rest.slice(sheetText.length);
      const ref = REF_RE.exec(after);
      if (ref) {
        push("ref", sheetText + ref[0], { value: plainAddress(ref[0]), sheet: q.sheet, unsupported: q.unsupported });
        continue;
      }
      if (after.startsWith("#REF!")) {
        push("error", sheetText + "#REF!", { value: "#REF!" });
        continue;
      }
      const name = NAME_RE.exec(after);
      if (name) {
        push("name", sheetText + name[0], { value: name[0], sheet: q.sheet, unsupported: q.unsupported });
        continue;
      }
      throw new FormulaSyntaxError(`nothing usable follows ${sheetText}`, offset + i);
    }
    if (c === "#") {
      const e = ERRORS.find((x) => rest.toUpperCase().startsWith(x));
      if (!e) throw new FormulaSyntaxError("an unknown error value", offset + i);
      push("error", rest.slice(0, e.length), { value: e });
      continue;
    }
    const ref = REF_RE.exec(rest);
    if (ref) {
      push("ref", ref[0], { value: plainAddress(ref[0]) });
      continue;
    }
    // a number literal: decimal text (src/chem/number-text.ts) whose sign, if any, is an operator here
    const num = /^[\d.]/.test(rest) ? leadingDecimal(rest) : null;
    if (num) {
      push("number", rest.slice(0, rest.length - num.rest.length));
      continue;
    }
    const name = NAME_RE.exec(rest);
    if (name) {
      const word = name[0];
      // a structured reference (Table1[Column]) is kept whole, to be refused by name
      if (src[i + word.length] === "[") {
        const close = src.indexOf("]", i + word.length);
        let end = close < 0 ? src.length : close + 1;
        while (src[end] === "]") end++;
        push("name", src.slice(i, end), { value: src.slice(i, end), unsupported: "a table (structured) reference" });
        continue;
      }
      if (src[i + word.length] === "(") push("func", word);
      else if (/^(TRUE|FALSE)$/i.test(word)) push("bool", word, { value: word.toUpperCase() });
      else push("name", word);
      continue;
    }
    if ("(){},;".includes(c)) {
      push(c as TokenKind, c);
      continue;
    }
    const op = OPS.find((o) => rest.startsWith(o));
    if (op) {
      push("op", op);
      continue;
    }
    throw new FormulaSyntaxError(`unexpected character '${c}'`, offset + i);
  }
  return out;
}
