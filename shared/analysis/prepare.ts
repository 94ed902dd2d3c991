// Everything symbolic an analysis needs, done once per reduction: the chosen pair's transfer, the
// characteristic polynomial, the reducer's hidden modes and the loop gain at the break. Sweeps then only
// substitute values (analyzeAt), which is what keeps a slider update fast. It takes the reducer's exact
// values and never reads printed text back.
import { polyConst, type Poly } from "@shared/algebra/poly";
import { ratDenominator, ratReduceTracked, type RatFn } from "@shared/algebra/ratfn";
import { qOne } from "@shared/algebra/rational";
import type { Problem } from "@shared/diagram/problems";
import { parameterValue, type DiagramDocument } from "@shared/diagram/schema";
import type { ExactCancellation } from "@shared/reduce/modes";
import type { ExactReduction } from "@shared/reduce/reduceDiagram";
import { AnalysisError } from "@shared/analysis/errors";
import { defaultBreak, findBreak, loopGain, type BreakPoint } from "@shared/analysis/loopGain";
import { PADE_DEFAULT, padeTable, polyPade, ratPade } from "@shared/analysis/pade";
import type { DelaySymbol } from "@shared/reduce/blockGains";

export interface PrepareOptions {
  input?: string;
  output?: string;
  /** A wire id or 0-based index into `wires`; default: see defaultBreak. */
  break?: string;
  /** Order of the Padé approximant that stands for each dead time (1–10; default 3). */
  padeOrder?: number;
}

/** The dead times of the diagram and the exact quasi-rational values before their Padé approximation. */
export interface DelayInfo {
  padeOrder: number;
  delays: DelaySymbol[];
  /** The pair's transfer and loop gain with e^(−sT) kept. */
  exactTransfer: RatFn;
  exactL: RatFn | null;
}

export interface PreparedAnalysis {
  doc: DiagramDocument;
  input: string;
  output: string;
  parameters: string[];
  /** Nominal values from the parameter table. */
  nominal: Record<string, number>;
  transfer: RatFn;
  /** Modes the reduction cancelled (factors, symbolic). */
  cancelled: ExactCancellation[];
  characteristic: Poly;
  loop: { breakPoint: BreakPoint; L: RatFn } | null;
  /** Dead times: transfer, χ and L above are their Padé approximations; null without dead times. */
  delay: DelayInfo | null;
  /** Why there is no loop gain, when there is none. */
  loopNote: string | null;
  warnings: Problem[];
}

export type Prepared = { ok: true; prepared: PreparedAnalysis } | { ok: false; problems: Problem[] };

const firstOf = (doc: DiagramDocument, type: "input" | "output"): string | undefined => doc.blocks.find((b) => b.type === type)?.id;

/**
 * The chosen pair (default: the first input and the first output block in `blocks` order) of a reduction,
 * and the loop at the break. A pair the reduction does not hold gives "unknown-pair-id"; an unknown break
 * wire gives "unknown-break-wire". Example: prepareAnalysis(reduction, { break: "w6" }).prepared.loop.L.
 */
export function prepareAnalysis(reduction: ExactReduction, opts: PrepareOptions = {}): Prepared {
  const { doc } = reduction.diagram;
  const input = opts.input ?? firstOf(doc, "input");
  const output = opts.output ?? firstOf(doc, "output");
  const t = reduction.transfers.find((x) => x.input === input && x.output === output);
  if (!t) {
    const message = `The reduction holds no pair ${input ?? "(no input)"} → ${output ?? "(no output)"}: choose an input and an output block of the diagram.`;
    return { ok: false, problems: [{ severity: "error", code: "unknown-pair-id", message }] };
  }
  const parameters = Object.keys(doc.parameters);
  const nominal = Object.fromEntries(Object.entries(doc.parameters).map(([k, v]) => [k, parameterValue(v)]));
  let breakPoint: BreakPoint | null;
  try {
    breakPoint = opts.break !== undefined ? findBreak(doc, opts.break) : defaultBreak(doc, t.input);
  } catch (err) {
    if (!(err instanceof AnalysisError)) throw err;
    return { ok: false, problems: [{ severity: "error", code: err.code, field: "break", message: err.message }] };
  }
  let loop: PreparedAnalysis["loop"] = null;
  let loopNote: string | null = breakPoint ? null : "No break point: the chosen input reaches no summing junction with a minus sign. Pick a wire to break for margins and the Nyquist plot.";
  if (breakPoint) {
    const l = loopGain(reduction, breakPoint);
    if (l.ok) loop = { breakPoint, L: l.L };
    else loopNote = `The loop at ${breakPoint.label} cannot be formed: ${l.problems.filter((p) => p.severity === "error").map((p) => p.message).join("; ")}`;
  }
  const padeOrder = opts.padeOrder ?? PADE_DEFAULT;
  const table = padeTable(reduction.delays, padeOrder);
  const delay: DelayInfo | null = table.length ? { padeOrder, delays: reduction.delays, exactTransfer: t.gain, exactL: loop?.L ?? null } : null;
  return {
    ok: true,
    prepared: {
      doc,
      input: t.input,
      output: t.output,
      parameters,
      nominal,
      transfer: ratPade(t.gain, table),
      cancelled: t.cancelled.map((c) => ({ ...c, factor: polyPade(c.factor, table) })),
      // The denominator of 1/χ: χ in the same normal form as every other denominator.
      characteristic: ratDenominator(ratReduceTracked(polyConst(qOne), polyPade(reduction.characteristic, table)).value),
      loop: loop && { ...loop, L: ratPade(loop.L, table) },
      loopNote,
      delay,
      warnings: reduction.warnings,
    },
  };
}
