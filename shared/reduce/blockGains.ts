import { AlgebraError } from "@shared/algebra/errors";
import { polyConst, polyParam } from "@shared/algebra/poly";
import { qOne, qSign } from "@shared/algebra/rational";
import { ratFromExpr, ratOne, ratReduceTracked, ratToLatex, ratToText, type RatFn } from "@shared/algebra/ratfn";
import type { Problem } from "@shared/diagram/problems";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { ExprNode } from "@shared/expr/ast";
import { delaySymbol } from "@shared/expr/names";
import { carriesGain, kindOf } from "@shared/diagram/blockKinds";

/** A dead time of the diagram: the symbol that stands for e^(−sT) in the exact algebra, its T and its blocks. */
export interface DelaySymbol {
  symbol: string;
  /** The dead time T in seconds, exact (parameters allowed, no s). */
  T: RatFn;
  blocks: string[];
}

/**
 * Exact gain of every block that scales or delays its input (roles "scale" and "delay") of a validated
 * document, from its parsed expression or its kind's fixed transfer; a dead time's gain is its symbol
 * e^(−sT) (T = 0 gives 1). An expression whose value cannot be formed (a divisor that is identically zero,
 * such as "1/(s - s)") or a negative dead time is a problem naming the block and its `expr` field.
 * Example: blockGains(doc, expressions).gains.get("c") is K·(s + 2)/s.
 */
export function blockGains(
  doc: DiagramDocument,
  expressions: ReadonlyMap<string, ExprNode>,
): { gains: Map<string, RatFn>; delays: DelaySymbol[]; problems: Problem[] } {
  const gains = new Map<string, RatFn>();
  const delays = new Map<string, DelaySymbol>();
  const problems: Problem[] = [];
  const refuse = (blockId: string, code: string, message: string) =>
    problems.push({ severity: "error", code, blockId, field: "expr", message: `Block ${blockId}: ${message}` });
  for (const block of doc.blocks) {
    const kind = kindOf(block);
    if (!carriesGain(block)) continue;
    const ast = kind.fixedTransfer ?? expressions.get(block.id);
    if (!ast) continue;
    try {
      const value = ratFromExpr(ast);
      if (kind.role === "scale") gains.set(block.id, value);
      else {
        const delay = delayGain(value);
        if (delay === "negative") refuse(block.id, "negative-delay", `a dead time cannot be negative (T = ${ratToText(value)} s). Give T ≥ 0 in seconds.`);
        else if (delay === null) gains.set(block.id, ratOne);
        else {
          gains.set(block.id, delay.gain);
          const known = delays.get(delay.symbol);
          if (known) known.blocks.push(block.id);
          else delays.set(delay.symbol, { symbol: delay.symbol, T: value, blocks: [block.id] });
        }
      }
    } catch (err) {
      if (!(err instanceof AlgebraError)) throw err;
      refuse(block.id, err.code, err.message);
    }
  }
  return { gains, delays: [...delays.values()], problems };
}

/** e^(−sT) as a symbol; null for T = 0 (no delay); "negative" for a negative constant T. */
function delayGain(T: RatFn): { symbol: string; gain: RatFn } | null | "negative" {
  const constant = T.n === 1n && T.d === 1n;
  if (constant && qSign(T.k) < 0) return "negative";
  if (constant && qSign(T.k) === 0) return null;
  const symbol = delaySymbol(ratToText(T), ratToLatex(T));
  return { symbol, gain: ratReduceTracked(polyParam(symbol), polyConst(qOne)).value };
}
