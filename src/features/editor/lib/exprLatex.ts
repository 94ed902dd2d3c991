import { lexExpression } from "@shared/expr/lexer";
import { parseExpression } from "@shared/expr/parse";
import type { ExprNode } from "@shared/expr/ast";

const GREEK = new Set([
  "alpha", "beta", "gamma", "delta", "epsilon", "zeta", "eta", "theta", "iota", "kappa", "lambda", "mu", "nu", "xi",
  "pi", "rho", "sigma", "tau", "upsilon", "phi", "chi", "psi", "omega", "Gamma", "Delta", "Theta", "Lambda", "Xi",
  "Pi", "Sigma", "Phi", "Psi", "Omega",
]);

/** A parameter name as engineers write it: `tau` → τ, `K_p` → K with subscript p, `Kp` upright-italic as one symbol. */
export function nameLatex(name: string): string {
  const cut = name.indexOf("_");
  const [base, sub] = cut > 0 ? [name.slice(0, cut), name.slice(cut + 1)] : [name, ""];
  const head = GREEK.has(base) ? `\\${base}` : base.length > 1 ? `\\mathit{${base}}` : base;
  return sub ? `${head}_{${sub.replaceAll("_", "\\_")}}` : head;
}

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

/** Juxtaposition reads as a product except before a digit or a fraction, where a dot keeps 2·3 from reading 23. */
function productLatex(left: ExprNode, right: ExprNode): string {
  const [l, r] = [factorLatex(left), factorLatex(right)];
  const needsDot = /^[\d-]/.test(r) || r.startsWith("\\frac") || (left.kind === "num" && r.startsWith("\\left"));
  return needsDot ? `${l} \\cdot ${r}` : `${l}\\,${r}`;
}

/**
 * LaTeX of an expression as typed, for drawing it on a block; null when it does not parse. Names are
 * accepted whether declared or not — undeclared ones are reported by validation, not hidden here.
 */
export function expressionLatex(expr: string): string | null {
  const lexed = lexExpression(expr);
  if ("error" in lexed) return null;
  const names = lexed.tokens.flatMap((t) => (t.kind === "name" && t.text !== "s" ? [t.text] : []));
  const parsed = parseExpression(expr, { allowS: true, parameters: names });
  return parsed.ok ? exprLatex(parsed.ast) : null;
}
