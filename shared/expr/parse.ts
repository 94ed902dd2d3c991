import { create, parseDependencies, type MathNode } from "mathjs/number";
import type { ExprNode } from "@shared/expr/ast";
import { LIMITS } from "@shared/diagram/schema";
import { decimalToRational, MAX_DECIMAL_EXPONENT } from "@shared/expr/decimal";
import { lexExpression, type Token } from "@shared/expr/lexer";

// Only the parser of mathjs, from its number-only build: the full library would triple the editor's and the
// worker's bundles and add ~80 MB to every Node process that loads the reducer.
const { parse } = create({ parseDependencies });

/**
 * Block expressions: numbers, `s`, declared parameters, + - * / ^, unary minus and plus, parentheses.
 * mathjs builds the tree; we walk it in source order alongside our own tokens, which gives every node a
 * position and its literal text (decimals become exact rationals). Anything mathjs reads beyond that
 * grammar — functions, units, matrices, constants such as pi — is refused.
 * Exponent choice: the exponent must be an integer literal 0..50, optionally in parentheses (`s^(2)`);
 * computed exponents such as `s^(1+1)` are refused rather than evaluated.
 */
export type ParseErrorCode =
  | "empty"
  | "expr-too-long"
  | "syntax"
  | "implicit-multiplication"
  | "ambiguous-product"
  | "function-call"
  | "unknown-name"
  | "s-in-gain"
  | "bad-exponent"
  | "exponent-limit"
  | "division-by-zero"
  | "number-range";

export interface ParseOptions {
  /** False for a gain: its expression may not contain `s`. */
  allowS: boolean;
  /** Where `s` is refused, as the message says it; default "a gain; use a transfer block for expressions in s". */
  sRefusal?: string;
  /** Declared parameter names; any other name is an error. */
  parameters: Iterable<string>;
  /** Size limits; default LIMITS. Printed results are read back (in tests) with wider ones. */
  limits?: { exprLength: number; exponent: number };
}

export interface ParseError {
  code: ParseErrorCode;
  message: string;
  position: number;
}
/**
 * The first error found (as a parser reads left to right) and, in `errors`, every error found, in order of position:
 * the syntax error with every unknown name, `s` in a gain and out-of-range number elsewhere in the text.
 */
export type ParseFailure = { ok: false; errors: ParseError[] } & ParseError;
export type ParseResult = { ok: true; ast: ExprNode } | ParseFailure;

class Refusal extends Error {
  constructor(
    readonly code: ParseErrorCode,
    message: string,
    readonly position: number,
  ) {
    super(message);
  }
}

/**
 * Parse a block expression into an exact tree, or say precisely what is wrong and where.
 * Example: parseExpression("K*(s+2)/s", { allowS: true, parameters: ["K"] }) → { ok: true, ast: div(…) }.
 */
export function parseExpression(text: string, options: ParseOptions): ParseResult {
  const limits = options.limits ?? LIMITS;
  if (text.length > limits.exprLength) {
    return fail("expr-too-long", `The expression is ${text.length} characters long; the limit is ${limits.exprLength}`, limits.exprLength);
  }
  if (text.trim() === "") {
    return fail("empty", "The expression is empty: enter a number, a parameter or an expression in s", 0);
  }
  const lexed = lexExpression(text);
  if ("error" in lexed) return fail(lexed.error.code, lexed.error.message, lexed.error.position);
  const parameters = new Set(options.parameters);
  const alsoWrong = () => tokenRefusals(lexed.tokens, parameters, options.allowS, options.sRefusal);
  let tree: MathNode;
  const masked = maskForMathjs(text, lexed.tokens);
  try {
    tree = parse(masked.text);
  } catch (err) {
    return withOthers(mathjsSyntaxFailure(err, text, lexed.tokens, masked.original), alsoWrong());
  }
  try {
    const walker = new TreeWalker(lexed.tokens, parameters, options.allowS, limits.exponent, options.sRefusal);
    return { ok: true, ast: walker.walkAll(tree) };
  } catch (err) {
    if (err instanceof Refusal) return withOthers(fail(err.code, err.message, err.position), alsoWrong());
    throw err;
  }
}

/** The first failure with every other error the tokens show on their own, each once, in order of position. */
function withOthers(first: ParseFailure, others: Refusal[]): ParseFailure {
  const all = [first.errors[0], ...others.map(({ code, message, position }) => ({ code, message, position }))];
  const errors = all.filter((e, i) => all.findIndex((o) => o.position === e.position) === i).sort((a, b) => a.position - b.position);
  return { ...first, errors };
}

/** What is wrong with single tokens whatever the syntax around them: names (unknown, `s` in a gain, calls) and numbers. */
function tokenRefusals(tokens: Token[], parameters: Set<string>, allowS: boolean, sRefusal?: string): Refusal[] {
  return tokens.flatMap((token, i) => {
    const refusal = token.kind === "name" ? nameRefusal(tokens, i, parameters, allowS, sRefusal) : token.kind === "num" ? numberRefusal(token) : null;
    return refusal ? [refusal] : [];
  });
}

/** The error of the name token `tokens[i]`, or null when it reads as `s` or a declared parameter. */
function nameRefusal(tokens: Token[], i: number, parameters: Set<string>, allowS: boolean, sRefusal = "a gain; use a transfer block for expressions in s"): Refusal | null {
  const token = tokens[i];
  if (token.text === "s") {
    return allowS ? null : new Refusal("s-in-gain", `\`s\` at position ${token.position} is not allowed in ${sRefusal}`, token.position);
  }
  if (parameters.has(token.text)) return null;
  if (tokens[i + 1]?.implicit && tokens[i + 2]?.kind === "lparen") {
    return new Refusal(
      "function-call",
      `\`${token.text}(\` at position ${token.position} reads as a function call, and expressions have no functions; ` +
        `to multiply, declare ${token.text} as a parameter`,
      token.position,
    );
  }
  const split = splitName(token.text, allowS ? [...parameters, "s"] : [...parameters]);
  const why = split
    ? `it could mean ${split.join("·")}: write ${split.join("*")} (or ${split.join(" ")}), or declare it as a parameter`
    : "declare it as a parameter or fix the spelling (constants such as pi or e are not built in)";
  return new Refusal("unknown-name", `Unknown name \`${token.text}\` at position ${token.position}: ${why}`, token.position);
}

function numberRefusal(token: Token): Refusal | null {
  if (decimalToRational(token.text)) return null;
  return new Refusal(
    "number-range",
    `The number \`${token.text}\` at position ${token.position} has a power of ten beyond ±${MAX_DECIMAL_EXPONENT}`,
    token.position,
  );
}

/**
 * What mathjs gets to read: whitespace as plain spaces (a newline would separate statements), every name
 * as a neutral same-length symbol `x__`, so names mathjs treats as keywords, constants or operators
 * (`not`, `true`, `Infinity`, `mod`) stay plain parameter names, and the `*` of each implicit product written in.
 * `original` maps a position in that text back to the user's (for mathjs's error positions).
 */
function maskForMathjs(text: string, tokens: Token[]): { text: string; original: (at: number) => number } {
  const chars = text.replace(/\s/g, " ").split("");
  for (const t of tokens) if (t.kind === "name") chars.splice(t.position, t.text.length, ..."x".padEnd(t.text.length, "_"));
  const inserted = tokens.filter((t) => t.implicit).map((t) => t.position);
  for (const at of [...inserted].reverse()) chars.splice(at, 0, "*");
  // The k-th inserted `*` (from 0) sits at its token's position + k in the masked text.
  const original = (at: number) => at - inserted.filter((p, k) => p + k < at).length;
  return { text: chars.join(""), original };
}

function fail(code: ParseErrorCode, message: string, position: number): ParseFailure {
  return { ok: false, code, message, position, errors: [{ code, message, position }] };
}

const FRIENDLY_SYNTAX: [RegExp, string][] = [
  [/^Unexpected end of expression/, "the expression ends where a number, s, a parameter or `(` was expected"],
  [/^Value expected/, "a number, s, a parameter or `(` was expected here"],
  [/^Parenthesis \) expected/, "a closing parenthesis `)` is missing"],
  [/^Unexpected operator \)/, "this `)` has no matching `(`"],
];

function mathjsSyntaxFailure(err: unknown, text: string, tokens: Token[], original: (at: number) => number): ParseFailure {
  if (err instanceof RangeError) {
    return fail("syntax", "The expression is nested too deeply to read; simplify its parentheses", 0);
  }
  const raw = err instanceof Error ? err.message : String(err);
  const char = (err as { char?: unknown }).char;
  const position = typeof char === "number" ? Math.min(Math.max(original(char - 1), 0), text.length) : 0;
  const plain = raw.replace(/\s*\(char \d+\)\s*$/, "");
  const friendly = FRIENDLY_SYNTAX.find(([re]) => re.test(plain))?.[1] ?? plain;
  const token = tokens.find((t) => t.position === position);
  const where = token ? `at \`${token.text}\` (position ${position})` : `at position ${position}`;
  return fail("syntax", `Syntax error ${where}: ${friendly}`, position);
}

/** Walks the mathjs tree in source order, consuming one of our tokens per leaf, operator and parenthesis. */
class TreeWalker {
  private at = 0;

  constructor(
    private readonly tokens: Token[],
    private readonly parameters: Set<string>,
    private readonly allowS: boolean,
    private readonly maxExponent: number,
    private readonly sRefusal?: string,
  ) {}

  walkAll(tree: MathNode): ExprNode {
    const ast = this.walk(tree);
    if (this.at < this.tokens.length) this.refuseHere();
    return ast;
  }

  private walk(node: MathNode): ExprNode {
    const n = node as MathNode & { op?: string; fn?: unknown; args?: MathNode[]; content?: MathNode };
    switch (node.type) {
      case "ParenthesisNode": {
        this.take("lparen");
        const inner = this.walk(n.content as MathNode);
        this.take("rparen");
        return inner;
      }
      case "OperatorNode":
        return n.args?.length === 1 ? this.unary(n.fn, n.args[0]) : this.binary(n.op ?? "", n.args ?? []);
      case "ConstantNode":
      case "SymbolNode": {
        const token = this.take();
        return token.kind === "num" ? this.number(token) : this.name(token);
      }
      default:
        return this.refuseHere();
    }
  }

  private unary(fn: unknown, arg: MathNode): ExprNode {
    if (fn === "unaryMinus") {
      this.take("op", "-");
      return { kind: "neg", arg: this.walk(arg) };
    }
    if (fn === "unaryPlus") {
      this.take("op", "+");
      return this.walk(arg);
    }
    return this.refuseHere();
  }

  private binary(op: string, [leftNode, rightNode]: MathNode[]): ExprNode {
    const left = this.walk(leftNode);
    this.take("op", op);
    const rightStart = this.peek()?.position ?? 0;
    // Judge the exponent's shape before walking into it, so `s^K^2` is refused at its first exponent.
    if (op === "^") {
      const literalAt = this.exponentLiteral(rightNode, rightStart);
      return { kind: "pow", base: left, exp: this.exponent(this.walk(rightNode), literalAt) };
    }
    const right = this.walk(rightNode);
    if (op === "/" && isLiteralZero(right)) {
      throw new Refusal("division-by-zero", `Division by zero at position ${rightStart}: the divisor is the literal 0`, rightStart);
    }
    const kind = ({ "+": "add", "-": "sub", "*": "mul", "/": "div" } as const)[op as "+" | "-" | "*" | "/"];
    if (!kind) return this.refuseHere();
    return { kind, left, right };
  }

  private badExponent(position: number, why: string): never {
    const shown = this.tokens.find((t) => t.position === position)?.text ?? "";
    throw new Refusal("bad-exponent", `The exponent starting \`${shown}\` at position ${position} ${why}`, position);
  }

  /** Only a number literal, optionally in parentheses, may follow `^`; returns the literal's position. */
  private exponentLiteral(node: MathNode, position: number): number {
    let inner = node as MathNode & { content?: MathNode; fn?: unknown };
    let depth = 0;
    for (; inner.type === "ParenthesisNode" && inner.content; depth += 1) inner = inner.content;
    if (inner.type === "OperatorNode" && inner.fn === "unaryMinus") this.badExponent(position, "is negative; write 1/(…)^n instead");
    const literal = this.tokens[this.at + depth];
    if (inner.type !== "ConstantNode" || literal?.kind !== "num") {
      this.badExponent(position, "must be a whole number written out, such as 2 (not a parameter, s or a calculation)");
    }
    return literal.position;
  }

  private exponent(exp: ExprNode, position: number): number {
    if (exp.kind !== "num" || exp.den !== 1n) return this.badExponent(position, "is not a whole number");
    if (exp.num > BigInt(this.maxExponent)) {
      throw new Refusal("exponent-limit", `The exponent ${exp.num} at position ${position} is above the limit of ${this.maxExponent}`, position);
    }
    return Number(exp.num);
  }

  private number(token: Token): ExprNode {
    const value = decimalToRational(token.text);
    if (!value) throw numberRefusal(token)!;
    return { kind: "num", num: value.num, den: value.den };
  }

  private name(token: Token): ExprNode {
    if (token.kind !== "name") return this.refuseAt(token);
    // `take` has moved past the name: it is the token before `at`.
    const refusal = nameRefusal(this.tokens, this.at - 1, this.parameters, this.allowS, this.sRefusal);
    if (refusal) throw refusal;
    return token.text === "s" ? { kind: "s" } : { kind: "param", name: token.text };
  }

  private peek(): Token | undefined {
    return this.tokens[this.at];
  }

  private take(kind?: Token["kind"], text?: string): Token {
    const token = this.peek();
    if (!token || (kind && token.kind !== kind) || (text !== undefined && token.text !== text)) return this.refuseHere();
    this.at += 1;
    return token;
  }

  private refuseHere(): never {
    const token = this.peek();
    if (!token) throw new Refusal("syntax", "The expression ends too early", this.tokens.at(-1)?.position ?? 0);
    return this.refuseAt(token);
  }

  private refuseAt(token: Token): never {
    throw new Refusal(
      "syntax",
      `\`${token.text}\` at position ${token.position} is not part of the expression syntax ` +
        "(numbers, s, parameters, + - * / ^ and parentheses)",
      token.position,
    );
  }
}

/**
 * A name read as known names written together, fewest parts first: `Kps` with Kp and s → ["Kp", "s"]; null when
 * none fits. One name is one token, so such a product needs its `*` or a space; this only says what it could mean.
 */
export function splitName(name: string, known: string[]): string[] | null {
  const best: (string[] | null)[] = new Array(name.length + 1).fill(null);
  best[0] = [];
  for (let i = 0; i < name.length; i += 1) {
    const head = best[i];
    if (!head) continue;
    for (const k of known) {
      if (!name.startsWith(k, i)) continue;
      const next = [...head, k];
      const at = i + k.length;
      if (!best[at] || best[at]!.length > next.length) best[at] = next;
    }
  }
  const found = best[name.length];
  return found && found.length > 1 ? found : null;
}

function isLiteralZero(node: ExprNode): boolean {
  if (node.kind === "neg") return isLiteralZero(node.arg);
  return node.kind === "num" && node.num === 0n;
}
