/**
 * Tokens of the expression syntax with their 0-based positions. mathjs builds the tree (precedence,
 * associativity) but keeps no positions and reads more than our grammar, so the lexer refuses stray
 * characters up front, writes out the `*` of a product written by juxtaposition (`2s`, `(s+1)(s+3)`, `K(s+a)`)
 * — or refuses it where it could be read two ways (`1/2s`) — and gives the tree walker a position for every token.
 */
export type TokenKind = "num" | "name" | "op" | "lparen" | "rparen";

export interface Token {
  kind: TokenKind;
  text: string;
  position: number;
  /** A `*` the writer left out (`2s`); its position is that of the factor after it. */
  implicit?: true;
}

export type LexError = { code: "syntax" | "implicit-multiplication" | "ambiguous-product"; message: string; position: number };

// Same shape mathjs reads for a decimal literal; hex/binary literals are refused as implicit multiplication.
const NUMBER = /(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/y;
const NAME = /[A-Za-z][A-Za-z0-9_]*/y;
const OPERATORS = "+-*/^";

/** Split an expression into tokens. Example: lexExpression("2*s") → tokens 2, *, s at positions 0, 1, 2. */
export function lexExpression(text: string): { tokens: Token[] } | { error: LexError } {
  const tokens: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const ch = text[i];
    if (/\s/.test(ch)) {
      i += 1;
      continue;
    }
    const num = matchAt(NUMBER, text, i);
    if (num) {
      const next = text[i + num.length] ?? "";
      if (next === "." || next === "e" || next === "E") {
        return { error: syntax(`The number starting \`${num}${next}\` at position ${i} is malformed`, i) };
      }
      tokens.push({ kind: "num", text: num, position: i });
      i += num.length;
      continue;
    }
    const name = matchAt(NAME, text, i);
    if (name) {
      tokens.push({ kind: "name", text: name, position: i });
      i += name.length;
      continue;
    }
    if (OPERATORS.includes(ch)) tokens.push({ kind: "op", text: ch, position: i });
    else if (ch === "(") tokens.push({ kind: "lparen", text: ch, position: i });
    else if (ch === ")") tokens.push({ kind: "rparen", text: ch, position: i });
    else return { error: syntax(unexpectedCharacter(ch, i), i) };
    i += 1;
  }
  const products = writeOutProducts(tokens, text);
  if ("error" in products) return products;
  const deep = findDeepNesting(products.tokens);
  return deep ? { error: deep } : products;
}

/** Deeper nesting than this is refused with a position instead of overflowing the recursive readers. */
export const MAX_PAREN_DEPTH = 100;

function findDeepNesting(tokens: Token[]): LexError | undefined {
  let depth = 0;
  for (const token of tokens) {
    depth += token.kind === "lparen" ? 1 : token.kind === "rparen" ? -1 : 0;
    if (depth > MAX_PAREN_DEPTH) {
      return syntax(`Parentheses nest more than ${MAX_PAREN_DEPTH} deep at position ${token.position}; simplify the expression`, token.position);
    }
  }
  return undefined;
}

function matchAt(re: RegExp, text: string, at: number): string | undefined {
  re.lastIndex = at;
  return re.exec(text)?.[0];
}

function syntax(message: string, position: number): LexError {
  return { code: "syntax", message, position };
}

function unexpectedCharacter(ch: string, at: number): string {
  const why: Record<string, string> = {
    ",": "there are no functions or lists",
    "!": "factorials are not supported",
    "=": "an expression has no assignments or comparisons",
    "[": "matrices are not supported",
    '"': "strings are not supported",
    "'": "strings are not supported",
    "%": "percentages and modulo are not supported",
  };
  const reason = why[ch] ?? "only numbers, s, parameter names, + - * / ^ and parentheses are allowed";
  return `Unexpected character \`${ch}\` at position ${at}: ${reason}`;
}

const ENDS_OPERAND = new Set<TokenKind>(["num", "name", "rparen"]);
const STARTS_OPERAND = new Set<TokenKind>(["num", "name", "lparen"]);

/** Index of the token opening the operand that ends at `end`: its `(` for a parenthesised one, else itself. */
function operandStart(tokens: Token[], end: number): number {
  if (tokens[end].kind !== "rparen") return end;
  let depth = 0;
  for (let i = end; i >= 0; i -= 1) {
    depth += tokens[i].kind === "rparen" ? 1 : tokens[i].kind === "lparen" ? -1 : 0;
    if (depth === 0) return i;
  }
  return 0;
}

/** Start of the run of factors ending at `end` that binds tighter than `/`: juxtaposed factors and powers (`2s^2`). */
function productStart(tokens: Token[], end: number): number {
  let i = operandStart(tokens, end);
  while (i >= 2 && (tokens[i - 1].implicit || tokens[i - 1].text === "^")) i = operandStart(tokens, i - 2);
  return i;
}

/**
 * Writes out the `*` of factors side by side. A number after another factor (`K 2`, `(s+1)2`) is refused (it reads
 * like a lost operator or exponent), and so is a product right after `/` (`1/2s`, `K/s(s+1)`): it could divide by
 * the first factor only or by the whole product. Example: "2(s+1)" → 2, *, (, s, +, 1, ).
 */
function writeOutProducts(tokens: Token[], text: string): { tokens: Token[] } | { error: LexError } {
  const out: Token[] = [];
  const show = (t: Token) => (t.kind === "lparen" ? "(…)" : t.text);
  for (const b of tokens) {
    const a = out.at(-1);
    if (a && ENDS_OPERAND.has(a.kind) && STARTS_OPERAND.has(b.kind)) {
      if (b.kind === "num") {
        return {
          error: {
            code: "implicit-multiplication",
            message: `A number right after \`${a.text}\` at position ${b.position}: write ${a.kind === "rparen" ? "(…)" : a.text}*${b.text} for a product, or ^${b.text} for a power`,
            position: b.position,
          },
        };
      }
      const start = productStart(out, out.length - 1);
      const before = out[start - 1];
      if (before?.text === "/") {
        const factor = text.slice(out[start].position, a.position + a.text.length);
        return {
          error: {
            code: "ambiguous-product",
            message:
              `\`/${factor}${show(b)}\` at position ${before.position} can be read two ways: divided by ${factor} only, or by the ` +
              `product ${factor}·${show(b)}. Write /(${factor}*${show(b)}) for the product, or /${factor}*${show(b)} for ${factor} only`,
            position: b.position,
          },
        };
      }
      out.push({ kind: "op", text: "*", position: b.position, implicit: true });
    }
    out.push(b);
  }
  return { tokens: out };
}
