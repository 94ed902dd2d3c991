import { AlgebraError, DEGREE_LIMIT } from "@shared/algebra/errors";
import { polyDegree } from "@shared/algebra/poly";
import { polyToLatex, polyToText } from "@shared/algebra/polytext";
import { ratDenominator, ratField, ratNumerator, ratToLatex, type RatFn } from "@shared/algebra/ratfn";
import type { Problem } from "@shared/diagram/problems";
import { parameterValue, type DiagramDocument } from "@shared/diagram/schema";
import { loadDiagram, validateDiagram } from "@shared/diagram/validate";
import { blockGains } from "@shared/engine/blockGains";
import { cancelledModes, characteristicPolynomial } from "@shared/engine/modes";
import { selectPairs } from "@shared/engine/pairs";
import { checkLoops } from "@shared/engine/loops";
import { showRat, weighRat } from "@shared/engine/ratView";
import { listBlocks } from "@shared/engine/wellPosed";
import { buildSignalGraph } from "@shared/reduce/build";
import { createBudget, ReductionLimitError } from "@shared/reduce/budget";
import { SingularLoopError } from "@shared/reduce/dense";
import { reducePairs } from "@shared/reduce/reduce";
import type { Cancellation, ReductionResult } from "@shared/reduce/result";

export interface ReduceOptions {
  /** Only pairs with this input block. */
  input?: string;
  /** Only pairs with this output block. */
  output?: string;
  /** Work limits (defaults: 2,000,000 new edges, 30 s). */
  limits?: { maxEdges?: number; timeLimitMs?: number };
}

export type ReduceOutcome =
  | { ok: true; doc: DiagramDocument; result: ReductionResult }
  | { ok: false; problems: Problem[] };

const isError = (p: Problem) => p.severity === "error";

/**
 * The whole pipeline for one untrusted document: load, validate (any error fails with every problem
 * found), check each loop is well-posed, reduce every (input, output) pair with its trace, and form the
 * characteristic polynomial and each pair's cancelled modes. Warnings of validation and engine go into
 * `result.warnings`. Never throws for bad input: every failure is a Problem with a code.
 * Improper blocks (deg num > deg den, e.g. a PD controller "K*(s+1)") are allowed and reduced exactly
 * like any other; a loop whose return difference vanishes as s → ∞ is refused ("improper-loop") only
 * when all its blocks are proper, and only warned about when it holds an improper one (see loopProblems).
 * Example: reduceDocument(spindleDoc).result.transfers[0] → { numerator: "K*s + 2*K", … }.
 */
export function reduceDocument(raw: unknown, opts: ReduceOptions = {}): ReduceOutcome {
  const loaded = loadDiagram(raw);
  if (!loaded.doc) return { ok: false, problems: loaded.problems };
  const doc = loaded.doc;
  const validation = validateDiagram(doc);
  const selection = selectPairs(doc, opts);
  const found = [...loaded.problems, ...validation.problems, ...selection.problems];
  if (found.some(isError)) return { ok: false, problems: found };
  try {
    const { gains, problems: gainProblems } = blockGains(doc, validation.expressions);
    if (gainProblems.length > 0) return { ok: false, problems: [...found, ...gainProblems] };
    return reduceChecked(doc, gains, selection.pairs, found, opts);
  } catch (err) {
    const problem = engineProblem(err);
    if (!problem) throw err;
    return { ok: false, problems: [...found, problem] };
  }
}

function reduceChecked(
  doc: DiagramDocument,
  gains: Map<string, RatFn>,
  pairs: [string, string][],
  found: Problem[],
  opts: ReduceOptions,
): ReduceOutcome {
  const graph = buildSignalGraph(doc, gains, ratField);
  const budget = createBudget(opts.limits);
  let reduced: ReturnType<typeof reducePairs<RatFn>>;
  try {
    reduced = reducePairs(graph, ratField, showRat, pairs, budget, { determinant: true, weigh: weighRat });
  } catch (err) {
    // A singular loop on a pair's paths: name it through the loop-by-loop check.
    const named = err instanceof SingularLoopError ? checkLoops(graph, gains, undefined, budget).problems : [];
    if (named.some(isError)) return { ok: false, problems: [...found, ...named] };
    throw err;
  }
  const { transfers, steps } = reduced;
  const first = transfers.find((t) => t.pivots !== null);
  const check = checkLoops(graph, gains, first, budget);
  const loopIssues = check.problems;
  if (loopIssues.some(isError)) return { ok: false, problems: [...found, ...loopIssues] };
  const chi = characteristicPolynomial(check, gains, first);
  if (polyDegree(chi) > DEGREE_LIMIT) {
    throw new AlgebraError("degree-limit", `The characteristic polynomial has degree ${polyDegree(chi)} in s; the limit is ${DEGREE_LIMIT}.`);
  }
  const nominal = Object.fromEntries(Object.entries(doc.parameters).map(([k, v]) => [k, parameterValue(v)]));
  const cache = new Map<string, Cancellation[]>();
  return {
    ok: true,
    doc,
    result: {
      transfers: transfers.map(({ input, output, gain }) => ({
        input,
        output,
        numerator: polyToText(ratNumerator(gain)),
        denominator: polyToText(ratDenominator(gain)),
        latex: ratToLatex(gain),
        cancelled: cancelledModes(chi, gain, nominal, cache),
      })),
      characteristic: polyToText(chi),
      characteristicLatex: polyToLatex(chi),
      steps,
      warnings: [...found, ...loopIssues],
    },
  };
}

/** The Problem for an error the engine raises on a valid but unreducible document; null for bugs. */
function engineProblem(err: unknown): Problem | null {
  if (err instanceof AlgebraError) {
    return { severity: "error", code: err.code, message: err.message };
  }
  if (err instanceof ReductionLimitError) return { severity: "error", code: err.code, message: err.message };
  if (err instanceof SingularLoopError) {
    return {
      severity: "error",
      code: "algebraic-loop",
      blockId: err.nodes[0],
      related: err.nodes,
      message: `Algebraic loop through ${listBlocks(err.nodes)}: the loop equations have no unique solution. Change a gain or sign in the loop, or add dynamics to it.`,
    };
  }
  return null;
}
