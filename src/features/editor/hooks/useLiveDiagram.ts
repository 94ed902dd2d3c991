import { useEffect, useLayoutEffect, useRef, useState } from "react";
import type { AnalysisAnswer, AnalysisQuery, ParameterInfo } from "@shared/analysis/answer";
import type { Problem } from "@shared/diagram/problems";
import { DEFAULT_IMPLEMENT_REQUEST, type ImplementationView, type ImplementRequest } from "@shared/implement/view";
import type { EditorDoc } from "@/features/editor/commands/types";
import { LiveChannel, type LiveChannelResult } from "@/features/editor/worker/liveChannel";
import type { LiveOutcome } from "@/features/editor/worker/liveProtocol";
import LiveWorker from "@/features/editor/worker/live.worker.ts?worker";

const LIVE_DEBOUNCE_MS = 250;

/** What the user sets in the analysis panel; kept in the editor session, never in the document. */
export interface AnalysisSettings {
  /** Wire id chosen as the break point; null: the default break. */
  break: string | null;
  /** Slider values (parameters not named take their nominal value). */
  values: Record<string, number>;
  /** Settling band as a fraction. */
  band: number;
  sweepParameter: string | null;
  /** The sweep tab is open: only then are the root locus and step overlay computed. */
  sweepShown: boolean;
  /** The locus is also drawn over negative gains. */
  sweepNegative: boolean;
  /** Padé order of each dead time; absent: the analysis's default (3). */
  padeOrder?: number;
  /** The Implementation tab's choices (absent: DEFAULT_IMPLEMENT_REQUEST); computed only while it is open. */
  implementation?: ImplementRequest;
  implementationShown?: boolean;
}

export type AnalysisOptions = AnalysisSettings & { input: string | null; output: string | null };

export interface LiveResult {
  /** The latest answer (kept while the next one is computed, so the panel does not flicker). */
  outcome: LiveOutcome | null;
  crash: string | null;
  /** True from a change until the answer for the newest document arrives. */
  pending: boolean;
  ms: number | null;
  /** The document the outcome belongs to. */
  doc: EditorDoc | null;
}

export interface LiveAnalysis {
  /** The latest successful answer (kept while the next one is computed, and beside problems of a later one). */
  result: (AnalysisAnswer & { ok: true }) | null;
  /** Problems of the newest answer when it failed; empty when it succeeded. */
  problems: Problem[];
  /** The parameter table as the worker read it last (kept when an answer fails, so sliders stay usable). */
  parameters: ParameterInfo[];
  /** The Implementation tab's results with the latest answer; null while the tab is closed. */
  implementation: ImplementationView | null;
  crash: string | null;
  /** True from a change until the answer for the newest request arrives. */
  pending: boolean;
  ms: number | null;
}

const NO_RESULT: LiveResult = { outcome: null, crash: null, pending: true, ms: null, doc: null };
const NO_ANALYSIS: LiveAnalysis = { result: null, problems: [], parameters: [], implementation: null, crash: null, pending: true, ms: null };

/** A worker started ahead of the session (it spends a second or more loading the algebra), once it has not failed. */
let spare: { worker: Worker; failed: boolean } | null = null;

/** Starts the editor worker while the diagram is still being fetched; the next session takes it over. */
export function warmLiveWorker(): void {
  if (spare && !spare.failed) return;
  const entry = { worker: new LiveWorker(), failed: false };
  // An error before a channel listens would be lost: remember it, and the channel then starts its own worker.
  entry.worker.addEventListener("error", () => (entry.failed = true), { once: true });
  spare = entry;
}

function takeWorker(): Worker {
  const warm = spare;
  spare = null;
  if (warm && !warm.failed) return warm.worker;
  warm?.worker.terminate();
  return new LiveWorker();
}

const queryOf = (o: AnalysisOptions): AnalysisQuery => ({
  input: o.input,
  output: o.output,
  break: o.break,
  values: o.values,
  settlingBand: o.band,
  sweepParameter: o.sweepParameter,
  withSweep: o.sweepShown,
  negative: o.sweepNegative,
  padeOrder: o.padeOrder,
});

function analysisFrom(s: LiveAnalysis, answer: AnalysisAnswer, implementation: ImplementationView | null, pending: boolean, ms: number): LiveAnalysis {
  if (!answer.ok) return { ...s, problems: answer.problems, parameters: answer.parameters.length ? answer.parameters : s.parameters, implementation, crash: null, pending, ms };
  return { result: answer, problems: [], parameters: answer.parameters, implementation, crash: null, pending, ms };
}

/**
 * The closed-loop result and the analysis of the chosen pair, from one Web Worker that reduces each change
 * once: the opened document at once, later edits ~250 ms after the last one, and analysis settings (sliders,
 * pair, break, band, swept parameter) at once — the reduction is then reused and only the analysis runs.
 */
export function useLiveDiagram(doc: EditorDoc, opts: AnalysisOptions): { result: LiveResult; analysis: LiveAnalysis } {
  const [result, setResult] = useState<LiveResult>(NO_RESULT);
  const [analysis, setAnalysis] = useState<LiveAnalysis>(NO_ANALYSIS);
  const channel = useRef<LiveChannel | null>(null);
  const latest = useRef({ doc, opts });
  latest.current = { doc, opts };
  const debouncing = useRef(false);

  const onReply = (r: LiveChannelResult) => {
    if ("failure" in r) {
      setResult((s) => ({ ...s, pending: false, crash: r.failure }));
      setAnalysis((s) => ({ ...s, pending: false, crash: r.failure }));
      return;
    }
    const { reply, payload, waiting } = r;
    const older = payload.document !== latest.current.doc;
    const analysisPending = waiting || debouncing.current || !reply.final;
    if (reply.stage === "result") setResult({ outcome: reply.outcome, crash: null, pending: older, ms: reply.ms, doc: payload.document });
    else if (reply.stage === "analysis") setAnalysis((s) => analysisFrom(s, reply.answer, reply.implementation, analysisPending, reply.ms));
    else if (reply.during === "result") setResult({ outcome: null, crash: reply.crash, pending: older, ms: reply.ms, doc: payload.document });
    else setAnalysis((s) => ({ ...s, crash: reply.crash, pending: analysisPending, ms: reply.ms }));
  };
  const onReplyRef = useRef(onReply);
  onReplyRef.current = onReply;

  // Layout effects: the first request leaves before the browser paints the freshly rendered canvas.
  useLayoutEffect(() => {
    const c = new LiveChannel(takeWorker, (r) => onReplyRef.current(r));
    channel.current = c;
    return () => c.dispose();
  }, []);

  const send = () => {
    const { doc: d, opts: o } = latest.current;
    channel.current?.request({ document: d, analysis: queryOf(o), implementation: o.implementationShown ? (o.implementation ?? DEFAULT_IMPLEMENT_REQUEST) : null });
  };

  const { input, output, break: brk, values, band, sweepParameter, sweepShown, sweepNegative, padeOrder, implementation, implementationShown } = opts;
  const optionsSeen = useRef(false);
  useEffect(() => {
    // Option changes go straight through; the first run is the opening request's, which the document sends.
    if (!optionsSeen.current) {
      optionsSeen.current = true;
      return;
    }
    setAnalysis((s) => (s.pending ? s : { ...s, pending: true }));
    send();
  }, [input, output, brk, values, band, sweepParameter, sweepShown, sweepNegative, padeOrder, implementation, implementationShown]);

  const opened = useRef(false);
  useLayoutEffect(() => {
    setResult((s) => (s.pending ? s : { ...s, pending: true }));
    setAnalysis((s) => (s.pending ? s : { ...s, pending: true }));
    if (!opened.current) {
      opened.current = true;
      send();
      return;
    }
    debouncing.current = true;
    const timer = window.setTimeout(() => {
      debouncing.current = false;
      send();
    }, LIVE_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [doc]);

  return { result, analysis };
}
