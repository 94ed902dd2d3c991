import { AlgebraError, DEGREE_LIMIT } from "@shared/algebra/errors";
import { polyDegree, type Poly } from "@shared/algebra/poly";
import { ratField, type RatFn } from "@shared/algebra/ratfn";
import { parseDiagram, type ParsedDiagram } from "@shared/diagram/parseDiagram";
import type { Problem } from "@shared/diagram/problems";
import { parameterValue, type DiagramDocument } from "@shared/diagram/schema";
import { blockGains, type DelaySymbol } from "@shared/reduce/blockGains";
import { cancelledModes, characteristicPolynomial, type ExactCancellation } from "@shared/reduce/modes";
import { selectPairs } from "@shared/reduce/pairs";
import { checkLoops } from "@shared/reduce/loops";
import { weighRat } from "@shared/reduce/ratView";
import { listBlocks } from "@shared/reduce/wellPosed";
import { buildSignalGraph } from "@shared/reduce/build";
import { wellFormedLoopProblems } from "@shared/reduce/wellFormedLoops";
import { createBudget, ReductionLimitError, withinLimits, type Limits } from "@shared/reduce/budget";
import { SingularLoopError } from "@shared/reduce/dense";
import type { SignalFlowGraph } from "@shared/reduce/graph";
import { printReduction } from "@shared/reduce/printReduction";
import { reducePairs } from "@shared/reduce/reduce";
import type { ReductionResult } from "@shared/reduce/result";
import type { TraceStep } from "@shared/reduce/trace";

export interface ReduceOptions {
  /** Only pairs with this input block. */
  input?: string;
  /** Only pairs with this output block. */
  output?: string;
  /** Work limits (defaults: 2,000,000 new edges, 30 s in all, 5 s for each gcd in several variables). */
  limits?: Partial<Limits>;
  /** false: no steps are recorded (steps: []), for callers that need only the values. */
  trace?: boolean;
}

/** One (input, output) pair's closed-loop transfer, exact. */
export interface ExactTransfer {
  input: string;
  output: string;
  gain: RatFn;
  cancelled: ExactCancellation[];
}

/** What the reducer hands the next stages: exact values only; printing is printReduction's job. */
export interface ExactReduction {
  diagram: ParsedDiagram;
  /** The exact gain of every block that scales or delays its input. */
  gains: ReadonlyMap<string, RatFn>;
  /** The dead times: each a symbol standing for e^(−sT) in the gains, transfers, χ and trace (none: []). */
  delays: DelaySymbol[];
  /** The signal-flow graph of the whole diagram, untouched by the reduction (the analysis cuts it at a break). */
  graph: SignalFlowGraph<RatFn>;
  transfers: ExactTransfer[];
  /** χ(s) = Δ(s) · Π block denominators, nothing cancelled. */
  characteristic: Poly;
  steps: TraceStep<RatFn>[];
  warnings: Problem[];
}

export type ExactOutcome = { ok: true; reduction: ExactReduction } | { ok: false; problems: Problem[] };

export type ReduceOutcome =
  | { ok: true; doc: DiagramDocument; result: ReductionResult }
  | { ok: false; problems: Problem[] };

const isError = (p: Problem) => p.severity === "error";

/**
 * The reducer's entry: a parsed diagram to its exact closed-loop transfers. Checks each loop is well-posed,
 * reduces every (input, output) pair with its trace, and forms the characteristic polynomial and each pair's
 * cancelled modes. Never throws for a valid but unreducible diagram: every failure is a Problem with a code.
 * Improper blocks (deg num > deg den, e.g. a PD controller "K*(s+1)") are reduced like any other; a loop whose
 * return difference vanishes as s → ∞ is refused ("improper-loop") only when all its blocks are proper.
 * Refused for a wrong pair id or a gain that cannot be formed, it still names the loop problems of the rest.
 * A reduction that runs past its time limit, even inside one long expansion or gcd, ends with a problem naming it.
 * Example: reduceDiagram(parsed).reduction.transfers[0].gain is K·(s + 2)/(s² + …) for the spindle loop.
 */
export function reduceDiagram(diagram: ParsedDiagram, opts: ReduceOptions = {}): ExactOutcome {
  return withinLimits(opts.limits, () => reduceParsed(diagram, opts));
}

function reduceParsed(diagram: ParsedDiagram, opts: ReduceOptions): ExactOutcome {
  const { doc } = diagram;
  const selection = selectPairs(doc, opts);
  const found = [...diagram.warnings, ...selection.problems];
  const { gains, delays, problems: gainProblems } = blockGains(doc, diagram.expressions);
  if (found.some(isError) || gainProblems.length > 0) return refuse(doc, gains, [...found, ...gainProblems], opts);
  try {
    return reduceChecked(diagram, gains, delays, selection.pairs, found, opts);
  } catch (err) {
    const problem = reductionProblem(err);
    if (!problem) throw err;
    return { ok: false, problems: [...found, problem] };
  }
}

/**
 * Untrusted input to the exact reduction in one call (parse, reduce): the one entry of the editor, the server's
 * save check and the command-line tools. A document that cannot be reduced gets every independent problem at
 * once: validation, a wrong pair id, gains that cannot be formed and the loop problems of its well-formed part.
 * Example: reduceDocumentExact(json).reduction.transfers[0].gain is K·(s + 2)/(s² + …) for the spindle loop.
 */
export function reduceDocumentExact(raw: unknown, opts: ReduceOptions = {}): ExactOutcome {
  return withinLimits(opts.limits, () => reduceRaw(raw, opts));
}

function reduceRaw(raw: unknown, opts: ReduceOptions): ExactOutcome {
  const parsed = parseDiagram(raw);
  if (parsed.ok) return reduceParsed(parsed.diagram, opts);
  if (!parsed.doc) return { ok: false, problems: parsed.problems };
  // Name a wrong pair id together with the validation problems, as one answer.
  const found = [...parsed.problems, ...selectPairs(parsed.doc, opts).problems];
  // A diagram over the degree limit is refused before any algebra runs, loops included.
  if (found.some((p) => p.code === "degree-limit")) return { ok: false, problems: found };
  const { gains, problems: gainProblems } = blockGains(parsed.doc, parsed.expressions);
  return refuse(parsed.doc, gains, [...found, ...gainProblems], opts);
}

/**
 * Untrusted input to the published result in one call (parse, reduce, print): reduceDocumentExact, printed.
 * Example: reduceDocument(json).result.transfers[0].numerator === "K*s + 2*K".
 */
export function reduceDocument(raw: unknown, opts: ReduceOptions = {}): ReduceOutcome {
  const reduced = reduceDocumentExact(raw, opts);
  return reduced.ok ? { ok: true, doc: reduced.reduction.diagram.doc, result: printReduction(reduced.reduction) } : reduced;
}

/** The refusal of a document with errors: those found and the loop problems of its well-formed part. */
function refuse(doc: DiagramDocument, gains: ReadonlyMap<string, RatFn>, found: Problem[], opts: ReduceOptions): ExactOutcome {
  try {
    return { ok: false, problems: [...found, ...wellFormedLoopProblems(doc, gains, found, createBudget(opts.limits))] };
  } catch (err) {
    // Loops too large to judge within the work limit stay unjudged; the errors found still stand.
    if (!reductionProblem(err)) throw err;
    return { ok: false, problems: found };
  }
}

function reduceChecked(
  diagram: ParsedDiagram,
  gains: Map<string, RatFn>,
  delays: DelaySymbol[],
  pairs: [string, string][],
  found: Problem[],
  opts: ReduceOptions,
): ExactOutcome {
  const { doc } = diagram;
  const graph = buildSignalGraph(doc, gains, ratField);
  const budget = createBudget(opts.limits);
  let reduced: ReturnType<typeof reducePairs<RatFn>>;
  try {
    reduced = reducePairs(graph, ratField, pairs, budget, { determinant: true, weigh: weighRat, trace: opts.trace });
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
  const cache = new Map<string, ExactCancellation[]>();
  return {
    ok: true,
    reduction: {
      diagram,
      gains,
      delays,
      graph,
      transfers: transfers.map(({ input, output, gain }) => ({ input, output, gain, cancelled: cancelledModes(chi, gain, nominal, cache) })),
      characteristic: chi,
      steps,
      warnings: [...found, ...loopIssues],
    },
  };
}

/** The Problem for an error the reducer raises on a valid but unreducible diagram; null for bugs. */
export function reductionProblem(err: unknown): Problem | null {
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
