// Everything symbolic an analysis needs, done once per document: the chosen pair's transfer, the
// characteristic polynomial, the engine's hidden modes and the loop gain at the break. Sweeps then only
// substitute values (analyzeAt), which is what keeps a slider update fast.
import { ratDenominator, type RatFn } from "@shared/algebra/ratfn";
import type { Poly } from "@shared/algebra/poly";
import type { Problem } from "@shared/diagram/problems";
import { parameterValue, type DiagramDocument } from "@shared/diagram/schema";
import { reduceDocument } from "@shared/engine/reduceDocument";
import type { Cancellation } from "@shared/reduce/result";
import { AnalysisError } from "@shared/analysis/errors";
import { defaultBreak, findBreak, loopGain, type BreakPoint } from "@shared/analysis/loopGain";
import { parseTransfer } from "@shared/analysis/nominal";

export interface PrepareOptions {
  input?: string;
  output?: string;
  /** A wire id or 0-based index into `wires`; default: see defaultBreak. */
  break?: string;
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
  cancelled: Cancellation[];
  characteristic: Poly;
  loop: { breakPoint: BreakPoint; L: RatFn } | null;
  /** Why there is no loop gain, when there is none. */
  loopNote: string | null;
  warnings: Problem[];
}

export type Prepared = { ok: true; prepared: PreparedAnalysis } | { ok: false; problems: Problem[] };

const firstOf = (doc: unknown, type: "input" | "output"): string | undefined => {
  const blocks = (doc as { blocks?: unknown })?.blocks;
  if (!Array.isArray(blocks)) return undefined;
  const b = blocks.find((x) => (x as { type?: unknown })?.type === type) as { id?: unknown } | undefined;
  return typeof b?.id === "string" ? b.id : undefined;
};

/**
 * Reduces the chosen pair (default: the first input and the first output block in `blocks` order) and the
 * loop at the break. Bad documents give the engine's problems; an unknown break wire gives a problem with
 * code "unknown-break-wire". Example: prepareAnalysis(doc, { break: "w6" }).prepared.loop.L.
 */
export function prepareAnalysis(raw: unknown, opts: PrepareOptions = {}): Prepared {
  const input = opts.input ?? firstOf(raw, "input");
  const output = opts.output ?? firstOf(raw, "output");
  const reduced = reduceDocument(raw, { input, output });
  if (!reduced.ok) return { ok: false, problems: reduced.problems };
  const { doc, result } = reduced;
  const t = result.transfers[0];
  const parameters = Object.keys(doc.parameters ?? {});
  const nominal = Object.fromEntries(Object.entries(doc.parameters ?? {}).map(([k, v]) => [k, parameterValue(v)]));
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
    const l = loopGain(doc, breakPoint);
    if (l.ok) loop = { breakPoint, L: l.L };
    else loopNote = `The loop at ${breakPoint.label} cannot be formed: ${l.problems.filter((p) => p.severity === "error").map((p) => p.message).join("; ")}`;
  }
  const characteristic = ratDenominator(parseTransfer("1", result.characteristic, parameters));
  return {
    ok: true,
    prepared: {
      doc,
      input: t.input,
      output: t.output,
      parameters,
      nominal,
      transfer: parseTransfer(t.numerator, t.denominator, parameters),
      cancelled: t.cancelled,
      characteristic,
      loop,
      loopNote,
      warnings: result.warnings,
    },
  };
}
