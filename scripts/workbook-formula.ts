// A small parser and evaluator for the worksheet formulas the demo workbook uses: numbers, text in double quotes,
// A1 cell references on the same sheet, + − * /, comparisons, parentheses, IF() and calls of the add-in's
// functions (REDOX.NAME). The spreadsheet's own rules that matter here are kept: an error in an operand of
// arithmetic is passed on; an error cell reaches an add-in function as an argument (functions.json sets
// allowErrorForDataTypeAny), which answers for it; text that is not a number in arithmetic gives #VALUE!; a blank cell
// counts as 0 in arithmetic and as "" in a comparison. Used by the demo workbook generator (cached results) and its test.

export type Node =
  | { kind: "number"; value: number }
  | { kind: "text"; value: string }
  | { kind: "ref"; column: string; row: number }
  | { kind: "call"; name: string; args: Node[] }
  | { kind: "binary"; op: string; left: Node; right: Node }
  | { kind: "negate"; operand: Node }
  /** An argument left out: REDOX.TOSHE(G3, "AgCl-sat", H3, , "mV"). */
  | { kind: "omitted" };

export class FormulaSyntaxError extends Error {}

type Token = { type: "number" | "text" | "name" | "ref" | "op" | "(" | ")" | ","; text: string };

function tokenize(source: string): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  while (i < source.length) {
    const rest = source.slice(i);
    let m: RegExpExecArray | null;
    if (/^\s/.test(rest)) i++;
    else if ((m = /^(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?/.exec(rest))) {
      tokens.push({ type: "number", text: m[0] });
      i += m[0].length;
    } else if ((m = /^"((?:[^"]|"")*)"/.exec(rest))) {
      tokens.push({ type: "text", text: m[1].replace(/""/g, '"') });
      i += m[0].length;
    } else if ((m = /^\$?([A-Z]{1,3})\$?(\d+)(?![A-Za-z0-9_.(])/.exec(rest))) {
      tokens.push({ type: "ref", text: `${m[1]}${m[2]}` });
      i += m[0].length;
    } else if ((m = /^[A-Za-z_][A-Za-z0-9_.]*(?=\s*\()/.exec(rest))) {
      tokens.push({ type: "name", text: m[0] });
      i += m[0].length;
    } else if ((m = /^(<>|<=|>=|[-+*/=<>&])/.exec(rest))) {
      tokens.push({ type: "op", text: m[0] });
      i += m[0].length;
    } else if (rest[0] === "(" || rest[0] === ")" || rest[0] === ",") {
      tokens.push({ type: rest[0] as "(" | ")" | ",", text: rest[0] });
      i++;
    } else throw new FormulaSyntaxError(`unexpected "${rest.slice(0, 10)}" in ${source}`);
  }
  return tokens;
}

/** Parses a formula (with or without the leading "="). */
export function parseFormula(formula: string): Node {
  const source = formula.replace(/^=/, "");
  const tokens = tokenize(source);
  let p = 0;
  const peek = (): Token | undefined => tokens[p];
  const expect = (type: Token["type"]): Token => {
    const t = tokens[p++];
    if (!t || t.type !== type) throw new FormulaSyntaxError(`expected ${type} in ${source}`);
    return t;
  };
  const comparison = (): Node => {
    let left = additive();
    while (peek()?.type === "op" && ["=", "<>", "<", ">", "<=", ">="].includes(peek()!.text)) {
      const op = tokens[p++].text;
      left = { kind: "binary", op, left, right: additive() };
    }
    return left;
  };
  const additive = (): Node => {
    let left = term();
    while (peek()?.type === "op" && ["+", "-", "&"].includes(peek()!.text)) {
      const op = tokens[p++].text;
      left = { kind: "binary", op, left, right: term() };
    }
    return left;
  };
  const term = (): Node => {
    let left = unary();
    while (peek()?.type === "op" && ["*", "/"].includes(peek()!.text)) {
      const op = tokens[p++].text;
      left = { kind: "binary", op, left, right: unary() };
    }
    return left;
  };
  const unary = (): Node => {
    if (peek()?.type === "op" && peek()!.text === "-") {
      p++;
      return { kind: "negate", operand: unary() };
    }
    if (peek()?.type === "op" && peek()!.text === "+") {
      p++;
      return unary();
    }
    return primary();
  };
  const primary = (): Node => {
    const t = tokens[p++];
    if (!t) throw new FormulaSyntaxError(`unexpected end of ${source}`);
    if (t.type === "number") return { kind: "number", value: Number(t.text) };
    if (t.type === "text") return { kind: "text", value: t.text };
    if (t.type === "ref") {
      const m = /^([A-Z]+)(\d+)$/.exec(t.text)!;
      return { kind: "ref", column: m[1], row: Number(m[2]) };
    }
    if (t.type === "(") {
      const inner = comparison();
      expect(")");
      return inner;
    }
    if (t.type === "name") {
      expect("(");
      const args: Node[] = [];
      if (peek()?.type !== ")") {
        for (;;) {
          const next = peek()?.type;
          args.push(next === "," || next === ")" ? { kind: "omitted" } : comparison());
          if (peek()?.type === ",") p++;
          else break;
        }
      }
      expect(")");
      return { kind: "call", name: t.text.toUpperCase(), args };
    }
    throw new FormulaSyntaxError(`unexpected "${t.text}" in ${source}`);
  };
  const node = comparison();
  if (p !== tokens.length) throw new FormulaSyntaxError(`unexpected "${tokens[p].text}" in ${source}`);
  return node;
}

/** Every function call in a formula, depth first. */
export function calls(node: Node): Array<{ name: string; argCount: number }> {
  switch (node.kind) {
    case "call":
      return [{ name: node.name, argCount: node.args.length }, ...node.args.flatMap(calls)];
    case "binary":
      return [...calls(node.left), ...calls(node.right)];
    case "negate":
      return calls(node.operand);
    default:
      return [];
  }
}

/** A spreadsheet error value as the evaluator carries it (the bundle's own error objects have the same shape). */
export interface ErrorLike {
  readonly code: string;
  readonly message?: string;
}

export type Value = number | string | boolean | null | ErrorLike;

export function isError(v: unknown): v is ErrorLike {
  return typeof v === "object" && v !== null && typeof (v as ErrorLike).code === "string";
}

export interface EvaluationContext {
  /** The value of a cell (a formula cell is evaluated by the caller). */
  cell(column: string, row: number): Value;
  /** Calls an add-in function with single-cell arguments (undefined: left out); returns its single result. */
  callAddin(name: string, args: (Value | undefined)[]): Value;
}

function toNumber(v: Value): number | ErrorLike {
  if (isError(v)) return v;
  if (v === null || v === "") return 0;
  if (typeof v === "number") return v;
  if (typeof v === "boolean") return v ? 1 : 0;
  const t = v.trim();
  if (/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return Number(t);
  return { code: "#VALUE!", message: `text "${v}" in arithmetic` };
}

export function evaluate(node: Node, ctx: EvaluationContext): Value {
  switch (node.kind) {
    case "omitted":
      return null;
    case "number":
      return node.value;
    case "text":
      return node.value;
    case "ref":
      return ctx.cell(node.column, node.row);
    case "negate": {
      const x = toNumber(evaluate(node.operand, ctx));
      return isError(x) ? x : -x;
    }
    case "binary": {
      const l = evaluate(node.left, ctx);
      const r = evaluate(node.right, ctx);
      if (isError(l)) return l;
      if (isError(r)) return r;
      if (["=", "<>", "<", ">", "<=", ">="].includes(node.op)) {
        const a = l === null ? (typeof r === "number" ? 0 : "") : l;
        const b = r === null ? (typeof l === "number" ? 0 : "") : r;
        const cmp =
          typeof a === "string" && typeof b === "string"
            ? a.toLowerCase().localeCompare(b.toLowerCase())
            : a === b
              ? 0
              : (a as number) < (b as number)
                ? -1
                : 1;
        return { "=": cmp === 0, "<>": cmp !== 0, "<": cmp < 0, ">": cmp > 0, "<=": cmp <= 0, ">=": cmp >= 0 }[
          node.op
        ]!;
      }
      if (node.op === "&") return `${l ?? ""}${r ?? ""}`;
      const a = toNumber(l);
      const b = toNumber(r);
      if (isError(a)) return a;
      if (isError(b)) return b;
      if (node.op === "/" && b === 0) return { code: "#DIV/0!" };
      return node.op === "+" ? a + b : node.op === "-" ? a - b : node.op === "*" ? a * b : a / b;
    }
    case "call": {
      if (node.name === "IF") {
        const test = evaluate(node.args[0], ctx);
        if (isError(test)) return test;
        const truth = typeof test === "boolean" ? test : typeof test === "number" ? test !== 0 : false;
        const branch = truth ? node.args[1] : node.args[2];
        return branch === undefined ? truth : evaluate(branch, ctx);
      }
      // with allowErrorForDataTypeAny the spreadsheet hands error cells to the function, which names them
      return ctx.callAddin(
        node.name,
        node.args.map((a) => (a.kind === "omitted" ? undefined : evaluate(a, ctx))),
      );
    }
  }
}
