/**
 * Excel formula → syntax tree, enough to find a function call and say what each of its arguments
 * is: a constant, an inline array, a reference, a name, another call, or a calculation. Pure.
 *
 * Grammar (precedence climbing, as Excel: comparison < & < + - < * / < ^ < unary < % < range ":"):
 *   expr    := unary (binop unary)*
 *   unary   := ("+" | "-" | "@") unary | postfix
 *   postfix := primary "%"*
 *   primary := number | string | bool | error | ref | name | array | call | "(" expr ")"
 *   call    := func "(" [arg ("," arg)*] ")"   — an empty arg is allowed (AQ.PH(A1:A2,B1:B2,,"ideal"))
 *   array   := "{" const (("," | ";") const)* "}"   — "," separates columns, ";" rows
 * Argument separators: "," (the form Range.formulas gives); ";" is accepted too, as the local form
 * of many European settings writes it. Inside braces ";" always separates rows.
 */
import { FormulaSyntaxError, tokenize, type Token } from "./tokens";

export type ArrayValue = number | string | boolean | { error: string };

export type FormulaNode =
  | { kind: "number"; value: number; start: number; end: number }
  | { kind: "string"; value: string; start: number; end: number }
  | { kind: "bool"; value: boolean; start: number; end: number }
  | { kind: "error"; value: string; start: number; end: number }
  | { kind: "array"; rows: ArrayValue[][]; start: number; end: number }
  | { kind: "ref"; sheet: string | null; address: string; unsupported: string | null; start: number; end: number }
  | { kind: "name"; sheet: string | null; name: string; unsupported: string | null; start: number; end: number }
  | { kind: "call"; name: string; args: FormulaNode[]; start: number; end: number }
  | { kind: "empty"; start: number; end: number }
  | { kind: "unary"; op: string; operand: FormulaNode; start: number; end: number }
  | { kind: "percent"; operand: FormulaNode; start: number; end: number }
  | { kind: "binary"; op: string; left: FormulaNode; right: FormulaNode; start: number; end: number };

export { FormulaSyntaxError } from "./tokens";

const PRECEDENCE: Record<string, number> = { "=": 1, "<": 1, ">": 1, "<=": 1, ">=": 1, "<>": 1, "&": 2, "+": 3, "-": 3, "*": 4, "/": 4, "^": 5, ":": 7 };

class Parser {
  private i = 0;
  constructor(
    private readonly tokens: Token[],
    private readonly length: number,
  ) {}

  private peek(): Token | undefined {
    return this.tokens[this.i];
  }

  private next(): Token {
    const t = this.tokens[this.i++];
    if (!t) throw new FormulaSyntaxError("the formula ends too early", this.length);
    return t;
  }

  private expect(kind: Token["kind"]): Token {
    const t = this.next();
    if (t.kind !== kind) throw new FormulaSyntaxError(`expected '${kind}' but found '${t.text}'`, t.start);
    return t;
  }

  parseAll(): FormulaNode {
    const node = this.expr(0);
    const extra = this.peek();
    if (extra) throw new FormulaSyntaxError(`unexpected '${extra.text}'`, extra.start);
    return node;
  }

  private expr(minPrec: number): FormulaNode {
    let left = this.unary();
    for (;;) {
      const t = this.peek();
      if (!t || t.kind !== "op" || !(t.text in PRECEDENCE)) break;
      const prec = PRECEDENCE[t.text];
      if (prec < minPrec) break;
      this.i++;
      // "^" is left-associative in Excel too (2^3^2 = 64)
      const right = this.expr(prec + 1);
      left = { kind: "binary", op: t.text, left, right, start: left.start, end: right.end };
    }
    return left;
  }

  private unary(): FormulaNode {
    const t = this.peek();
    if (t && t.kind === "op" && (t.text === "+" || t.text === "-" || t.text === "@")) {
      this.i++;
      const operand = t.text === "@" ? this.unary() : this.expr(6);
      return t.text === "@" ? operand : { kind: "unary", op: t.text, operand, start: t.start, end: operand.end };
    }
    return this.postfix();
  }

  private postfix(): FormulaNode {
    let node = this.primary();
    while (this.peek()?.kind === "op" && this.peek()?.text === "%") {
      const t = this.next();
      node = { kind: "percent", operand: node, start: node.start, end: t.end };
    }
    return node;
  }

  private primary(): FormulaNode {
    const t = this.next();
    switch (t.kind) {
      case "number":
        return { kind: "number", value: Number(t.text), start: t.start, end: t.end };
      case "string":
        return { kind: "string", value: t.value, start: t.start, end: t.end };
      case "bool":
        return { kind: "bool", value: t.value === "TRUE", start: t.start, end: t.end };
      case "error":
        return { kind: "error", value: t.value, start: t.start, end: t.end };
      case "ref":
        return { kind: "ref", sheet: t.sheet, address: t.value, unsupported: t.unsupported, start: t.start, end: t.end };
      case "name":
        return { kind: "name", sheet: t.sheet, name: t.value, unsupported: t.unsupported, start: t.start, end: t.end };
      case "func":
        return this.call(t);
      case "{":
        return this.array(t);
      case "(": {
        const inner = this.expr(0);
        const close = this.expect(")");
        return { ...inner, start: t.start, end: close.end };
      }
      default:
        throw new FormulaSyntaxError(`unexpected '${t.text}'`, t.start);
    }
  }

  private call(name: Token): FormulaNode {
    this.expect("(");
    const args: FormulaNode[] = [];
    const isSeparator = (k: Token["kind"] | undefined) => k === "," || k === ";";
    if (this.peek()?.kind === ")") {
      const close = this.next();
      return { kind: "call", name: name.text, args, start: name.start, end: close.end };
    }
    for (;;) {
      const t = this.peek();
      if (!t) throw new FormulaSyntaxError(`the call of ${name.text} is not closed`, this.length);
      if (isSeparator(t.kind) || t.kind === ")") args.push({ kind: "empty", start: t.start, end: t.start });
      else args.push(this.expr(0));
      const sep = this.next();
      if (sep.kind === ")") return { kind: "call", name: name.text, args, start: name.start, end: sep.end };
      if (!isSeparator(sep.kind)) throw new FormulaSyntaxError(`expected ',' or ')' in the call of ${name.text}, found '${sep.text}'`, sep.start);
    }
  }

  private array(open: Token): FormulaNode {
    const rows: ArrayValue[][] = [[]];
    for (;;) {
      let t = this.next();
      let sign = 1;
      while (t.kind === "op" && (t.text === "-" || t.text === "+")) {
        if (t.text === "-") sign = -sign;
        t = this.next();
      }
      let value: ArrayValue;
      if (t.kind === "number") value = sign * Number(t.text);
      else if (sign !== 1 || (t.kind !== "string" && t.kind !== "bool" && t.kind !== "error")) {
        throw new FormulaSyntaxError(`an inline array holds only numbers, texts, TRUE/FALSE and errors, found '${t.text}'`, t.start);
      } else value = t.kind === "string" ? t.value : t.kind === "bool" ? t.value === "TRUE" : { error: t.value };
      rows[rows.length - 1].push(value);
      const sep = this.next();
      if (sep.kind === "}") {
        const width = rows[0].length;
        if (rows.some((r) => r.length !== width)) throw new FormulaSyntaxError("the rows of an inline array have different lengths", open.start);
        return { kind: "array", rows, start: open.start, end: sep.end };
      }
      if (sep.kind === ";") rows.push([]);
      else if (sep.kind !== ",") throw new FormulaSyntaxError(`expected ',' ';' or '}' in an inline array, found '${sep.text}'`, sep.start);
    }
  }
}

/** The syntax tree of a formula (with or without its leading "="). Throws FormulaSyntaxError. */
export function parseFormula(formula: string): FormulaNode {
  const tokens = tokenize(formula);
  if (tokens.length === 0) throw new FormulaSyntaxError("the formula is empty", 0);
  return new Parser(tokens, formula.length).parseAll();
}

/** Every call in the tree, outermost first, left to right. */
export function calls(node: FormulaNode): Extract<FormulaNode, { kind: "call" }>[] {
  const out: Extract<FormulaNode, { kind: "call" }>[] = [];
  const walk = (n: FormulaNode): void => {
    switch (n.kind) {
      case "call":
        out.push(n);
        n.args.forEach(walk);
        break;
      case "unary":
      case "percent":
        walk(n.operand);
        break;
      case "binary":
        walk(n.left);
        walk(n.right);
        break;
      default:
        break;
    }
  };
  walk(node);
  return out;
}
