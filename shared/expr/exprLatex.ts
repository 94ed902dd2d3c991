import { boundedMemo } from "@shared/expr/boundedMemo";
import { lexExpression } from "@shared/expr/lexer";
import { parseExpression } from "@shared/expr/parse";
import type { ExprNode } from "@shared/expr/ast";
import { GREEK, isGreek, nameLatex, readsAsWord } from "@shared/expr/names";

const isSum = (n: ExprNode) => n.kind === "add" || n.kind === "sub";
const paren = (latex: string) => `\\left(${latex}\\right)`;

/**
 * LaTeX of a block expression as the user wrote it (not expanded): divisions become fractions, sums inside
 * products and powers get parentheses. Example: K*(s+2)/s → \frac{K\left(s + 2\right)}{s}.
 */
export function exprLatex(node: ExprNode): string {
  switch (node.kind) {
    case "num":
      return node.den === 1n ? node.num.toString() : `\\frac{${node.num}}{${node.den}}`;
    case "s":
      return "s";
    case "param":
      return nameLatex(node.name);
    case "add":
      return `${exprLatex(node.left)} + ${exprLatex(node.right)}`;
    case "sub": {
      const right = exprLatex(node.right);
      return `${exprLatex(node.left)} - ${isSum(node.right) || node.right.kind === "neg" ? paren(right) : right}`;
    }
    case "mul":
      return productLatex(node.left, node.right);
    case "div":
      return `\\frac{${exprLatex(node.left)}}{${exprLatex(node.right)}}`;
    case "neg": {
      const arg = exprLatex(node.arg);
      return `-${isSum(node.arg) || node.arg.kind === "neg" ? paren(arg) : arg}`;
    }
    case "pow": {
      const atomic = node.base.kind === "s" || node.base.kind === "param" || (node.base.kind === "num" && node.base.den === 1n);
      const base = exprLatex(node.base);
      return `${atomic ? base : paren(base)}^{${node.exp}}`;
    }
  }
}

function factorLatex(node: ExprNode): string {
  const latex = exprLatex(node);
  return isSum(node) || node.kind === "neg" ? paren(latex) : latex;
}

/** The name a product's factor starts (`first`) or ends with, if it is a name or a power of one. */
function edgeName(node: ExprNode, first: boolean): string | null {
  if (node.kind === "param") return node.name;
  if (node.kind === "pow") return edgeName(node.base, first);
  if (node.kind === "mul") return edgeName(first ? node.left : node.right, first);
  return null;
}

/**
 * A thin space between factors reads as a product, except before a digit or a fraction (2·3 must not read 23)
 * and beside a word-like name (Kp·s must not read Kps), where a centred dot stands.
 */
function productLatex(left: ExprNode, right: ExprNode): string {
  const [l, r] = [factorLatex(left), factorLatex(right)];
  const [ln, rn] = [edgeName(left, false), edgeName(right, true)];
  const needsDot =
    /^[\d-]/.test(r) ||
    r.startsWith("\\frac") ||
    (left.kind === "num" && r.startsWith("\\left")) ||
    (ln !== null && readsAsWord(ln)) ||
    (rn !== null && readsAsWord(rn));
  return needsDot ? `${l} \\cdot ${r}` : `${l}\\,${r}`;
}

/**
 * Plain text of an expression, for the far-zoom drawing of a block where typesetting would not be legible:
 * Greek names as letters, explicit `·` only where juxtaposition would misread. Example: K*(s+2) → K(s + 2), Kd*s → Kd·s.
 */
export function exprText(node: ExprNode): string {
  switch (node.kind) {
    case "num":
      return node.den === 1n ? node.num.toString() : `${node.num}/${node.den}`;
    case "s":
      return "s";
    case "param":
      return node.name.split("_").map((part) => (isGreek(part) ? GREEK[part] : part)).join("_");
    case "add":
      return `${exprText(node.left)} + ${exprText(node.right)}`;
    case "sub": {
      const right = exprText(node.right);
      return `${exprText(node.left)} − ${isSum(node.right) || node.right.kind === "neg" ? `(${right})` : right}`;
    }
    case "mul": {
      const [l, r] = [textFactor(node.left), textFactor(node.right)];
      // Juxtapose only between a closing parenthesis, a number or a one-letter name on the left and a
      // parenthesis or one-letter name on the right: Kd·s, ω_n·s, s^2·s, s·K_p read apart.
      const tail = /[\p{L}\d_^]+$/u.exec(l)?.[0] ?? "";
      const head = /^[\p{L}\d_]+/u.exec(r)?.[0] ?? "";
      const tight = (l.endsWith(")") || /^\d+$/.test(tail) || [...tail].length === 1) && (r.startsWith("(") || /^\p{L}$/u.test(head));
      return tight ? `${l}${r}` : `${l}·${r}`;
    }
    case "div":
      return `${textFactor(node.left)}/${textFactor(node.right, true)}`;
    case "neg": {
      const arg = exprText(node.arg);
      return `−${isSum(node.arg) || node.arg.kind === "neg" ? `(${arg})` : arg}`;
    }
    case "pow": {
      const atomic = node.base.kind === "s" || node.base.kind === "param" || (node.base.kind === "num" && node.base.den === 1n);
      const base = exprText(node.base);
      return `${atomic ? base : `(${base})`}^${node.exp}`;
    }
  }
}

/** A factor in parentheses when it would otherwise bind wrongly; a denominator also when it is a product. */
function textFactor(node: ExprNode, denominator = false): string {
  const text = exprText(node);
  const loose =
    isSum(node) || node.kind === "neg" || node.kind === "div" || (node.kind === "num" && node.den !== 1n) || (denominator && node.kind === "mul");
  return loose ? `(${text})` : text;
}

/** The tree of a block expression as typed; names count whether declared or not (validation reports those). */
const blockExpression = boundedMemo(400, (expr: string): ExprNode | null => {
  const lexed = lexExpression(expr);
  if ("error" in lexed) return null;
  const names = lexed.tokens.flatMap((t) => (t.kind === "name" && t.text !== "s" ? [t.text] : []));
  const parsed = parseExpression(expr, { allowS: true, parameters: names });
  return parsed.ok ? parsed.ast : null;
});

/**
 * LaTeX of an expression as typed, for drawing it on a block; null when it does not parse. Names are
 * accepted whether declared or not — undeclared ones are reported by validation, not hidden here.
 */
export function expressionLatex(expr: string): string | null {
  const ast = blockExpression(expr);
  return ast ? exprLatex(ast) : null;
}

/**
 * LaTeX of a dead-time block e^(−sT) from its T as typed; null when T does not parse.
 * Example: delayLatex("0.2") === "e^{-0.2\\,s}", delayLatex("T_d + 1") === "e^{-\\left(T_{d} + 1\\right)s}".
 */
export function delayLatex(expr: string): string | null {
  const ast = blockExpression(expr);
  if (!ast) return null;
  const t = exprLatex(ast);
  const atom = ast.kind === "num" || ast.kind === "param";
  return atom ? `e^{-${t}\\,s}` : `e^{-\\left(${t}\\right)s}`;
}

/**
 * Numerator and denominator of an expression as plain text (denominator null when the top level is not a
 * division), for the far-zoom drawing; null when it does not parse. Example: "K/(s+2)" → { num: "K", den: "s + 2" }.
 */
export function expressionFraction(expr: string): { num: string; den: string | null } | null {
  const ast = blockExpression(expr);
  if (!ast) return null;
  return ast.kind === "div" ? { num: exprText(ast.left), den: exprText(ast.right) } : { num: exprText(ast), den: null };
}
