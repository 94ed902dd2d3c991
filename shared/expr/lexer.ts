/**
 * Tokens of the expression syntax with their 0-based positions. mathjs builds the tree (precedence,
 * associativity) but keeps no positions and reads more than our grammar, so the lexer refuses stray
 * characters and implicit multiplication up front and gives the tree walker a position for every token.
 */
export type TokenKind = "num" | "name" | "op" | "lparen" | "rparen";

export interface Token {
  kind: TokenKind;
  text: string;
  position: number;
}

export type LexError = { code: "syntax" | "implicit-multiplication" | "function-call"; message: string; position: number };

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
  const problem = findMissingOperator(tokens) ?? findDeepNesting(tokens);
  return problem ? { error: problem } : { tokens };
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

/** Two operands side by side (`2s`, `K s`, `(s+1)(s+2)`) mean a missing `*` — or a function call for `name(`. */
function findMissingOperator(tokens: Token[]): LexError | undefined {
  for (let k = 1; k < tokens.length; k += 1) {
    const [a, b] = [tokens[k - 1], tokens[k]];
    if (!ENDS_OPERAND.has(a.kind) || !STARTS_OPERAND.has(b.kind)) continue;
    if (a.kind === "name" && b.kind === "lparen") {
      return {
        code: "function-call",
        message:
          `\`${a.text}(\` at position ${a.position} reads as a function call, and expressions have no functions; ` +
          `to multiply, write ${a.text}*(…)`,
        position: a.position,
      };
    }
    const show = (t: Token) => (t.kind === "num" || t.kind === "name" ? t.text : "(…)");
    return {
      code: "implicit-multiplication",
      message:
        `Missing \`*\` between \`${a.text}\` and \`${b.text}\` at position ${b.position}: ` +
        `write ${show(a)}*${show(b)}`,
      position: b.position,
    };
  }
  return undefined;
}
