import { fractionText } from "@shared/analysis/loopAnalysis";
import { carriesGain, namedBlock } from "@shared/diagram/blockKinds";
import type { ExactReduction } from "@shared/reduce/reduceDiagram";
import { differenceEquation, type DifferenceEquation } from "@shared/implement/differenceEquation";
import { discretise, type DiscretisationMethod } from "@shared/implement/discretise";
import { discreteResponse, type DiscreteResponse } from "@shared/implement/discreteResponse";
import { ImplementError } from "@shared/implement/errors";
import { descendingFloats } from "@shared/implement/implement";
import { realise, type RealisationForm } from "@shared/implement/realise";
import { samplingAdvice } from "@shared/implement/sampling";
import { selectedTransfer } from "@shared/implement/selection";
import type { FloatTf } from "@shared/implement/ssToTf";
import type { StateSpace } from "@shared/implement/stateSpace";

/** What the editor's Implementation tab asks: a block (null: the analysed pair), Ts, method, pre-warp ω, form. */
export interface ImplementRequest {
  block: string | null;
  ts: number;
  method: DiscretisationMethod;
  /** The pre-warp frequency in rad/s; null: the closed-loop bandwidth when below π/Ts, else π/(2Ts). */
  prewarp: number | null;
  form: RealisationForm;
}

/** The analysed pair the request falls back on, with its closed-loop bandwidth and the slider values. */
export interface ImplementContext {
  input: string;
  output: string;
  bandwidth: number | null;
  values: Record<string, number>;
}

type Failure = { ok: false; code: string; message: string };

const failure = (err: unknown): Failure => {
  if (err instanceof ImplementError) return { ok: false, code: err.code, message: err.message };
  throw err;
};

export type ImplementationView =
  | (Failure & { candidates: { id: string; what: string }[] })
  | {
      ok: true;
      candidates: { id: string; what: string }[];
      subject: { what: string; id: string };
      continuous: { numerator: number[]; denominator: number[]; latex: string };
      discrete:
        | { ok: true; ts: number; method: DiscretisationMethod; prewarp: number | null; tf: FloatTf; equation: DifferenceEquation; response: DiscreteResponse }
        | Failure;
      advice: { ratio: number | null; warning: string | null; bandwidth: number | null; loop: string };
      stateSpace: ({ ok: true; form: RealisationForm; basis: string; hankel: number[] | null; note: string | null } & StateSpace) | Failure;
    };

/** The pre-warp frequency used: the one asked for, else the bandwidth when below Nyquist, else half of Nyquist. */
export const prewarpFor = (asked: number | null, bandwidth: number | null, ts: number): number =>
  asked ?? (bandwidth !== null && bandwidth > 0 && bandwidth < Math.PI / ts ? bandwidth : Math.PI / (2 * ts));

/**
 * Everything the Implementation tab shows, computed in the editor's worker: the transfer, its discrete equivalent
 * with the difference equation and the overlaid frequency responses, the Ts advice against the analysed pair's
 * bandwidth, and the realisation. A discretisation or realisation that cannot be formed is a failure of that part
 * only. Example: implementationView(reduction, { block: "pi", ts: 0.01, method: "tustin", … }, ctx).discrete.tf.
 */
export function implementationView(reduction: ExactReduction, request: ImplementRequest, ctx: ImplementContext): ImplementationView {
  const candidates = reduction.diagram.doc.blocks.filter((b) => carriesGain(b) && reduction.gains.has(b.id)).map((b) => ({ id: b.id, what: namedBlock(b) }));
  const selection = request.block === null ? { input: ctx.input, output: ctx.output } : { block: request.block };
  let picked: ReturnType<typeof selectedTransfer>;
  try {
    picked = selectedTransfer(reduction, selection, ctx.values);
  } catch (err) {
    return { ...failure(err), candidates };
  }
  const { subject, tf } = picked;
  const id = subject.id ?? "controller";
  const prewarp = request.method === "prewarp" ? prewarpFor(request.prewarp, ctx.bandwidth, request.ts) : null;
  let discrete: Extract<ImplementationView, { ok: true }>["discrete"];
  try {
    const d = discretise(tf, { ts: request.ts, method: request.method, prewarp: prewarp ?? undefined }, subject);
    discrete = {
      ok: true,
      ts: request.ts,
      method: request.method,
      prewarp,
      tf: d,
      equation: differenceEquation(d, { ts: request.ts, method: request.method, id, prewarp: prewarp ?? undefined }),
      response: discreteResponse(tf, d, request.ts),
    };
  } catch (err) {
    discrete = failure(err);
  }
  let stateSpace: Extract<ImplementationView, { ok: true }>["stateSpace"];
  try {
    const r = realise(tf, request.form, subject);
    stateSpace = { ok: true, form: r.form, basis: r.basis, hankel: r.hankel, note: r.note, ...r.ss };
  } catch (err) {
    stateSpace = failure(err);
  }
  const loop = `${ctx.input} → ${ctx.output}`;
  const advice = { ...samplingAdvice(request.ts, ctx.bandwidth, loop), bandwidth: ctx.bandwidth, loop };
  const text = fractionText(tf.num, tf.den);
  return {
    ok: true,
    candidates,
    subject: { what: subject.what, id },
    continuous: { numerator: descendingFloats(tf.num), denominator: descendingFloats(tf.den), latex: text.latex },
    discrete,
    advice,
    stateSpace,
  };
}

/** The Implementation tab's first choices: the analysed pair, Tustin at 10 ms, the controllable form. */
export const DEFAULT_IMPLEMENT_REQUEST: ImplementRequest = { block: null, ts: 0.01, method: "tustin", prewarp: null, form: "controllable" };
