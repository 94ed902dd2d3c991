import { useEffect, useRef, useState } from "react";
import type { Problem } from "@shared/diagram/problems";
import type { EditorDoc } from "@/features/editor/commands/types";
import type { AnalysisAnswer, AnalysisQuery, ParameterInfo } from "@shared/analysis/answer";
import { AnalysisChannel } from "@/features/editor/worker/analysisChannel";
import AnalysisWorker from "@/features/editor/worker/analysis.worker.ts?worker";

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
}

export type AnalysisOptions = AnalysisSettings & { input: string | null; output: string | null };

export interface LiveAnalysis {
  /** The latest successful answer (kept while the next one is computed, and beside problems of a later one). */
  result: (AnalysisAnswer & { ok: true }) | null;
  /** Problems of the newest answer when it failed; empty when it succeeded. */
  problems: Problem[];
  /** The parameter table as the worker read it last (kept when an answer fails, so sliders stay usable). */
  parameters: ParameterInfo[];
  crash: string | null;
  /** True from a change until the answer for the newest request arrives. */
  pending: boolean;
  ms: number | null;
}

const EMPTY: LiveAnalysis = { result: null, problems: [], parameters: [], crash: null, pending: true, ms: null };

/**
 * Analyses the chosen pair in a Web Worker once `ready` (the closed-loop result is known): the first time at once,
 * then ~250 ms after the last document change, and at once when a slider, the pair, the break, the band or the
 * swept parameter changes (the worker's queue of one keeps that live).
 */
export function useLiveAnalysis(doc: EditorDoc, opts: AnalysisOptions, ready: boolean): LiveAnalysis {
  const [state, setState] = useState<LiveAnalysis>(EMPTY);
  const channel = useRef<AnalysisChannel | null>(null);
  const latest = useRef({ doc, opts });
  latest.current = { doc, opts };
  const debouncing = useRef(false);

  useEffect(() => {
    // The worker too starts only then: loading its engine would compete with the reduction for the CPU.
    if (!ready) return;
    const c = new AnalysisChannel(
      () => new AnalysisWorker(),
      (r) =>
        setState((s) => {
          if ("failure" in r) return { ...s, pending: false, crash: r.failure };
          const { reply, waiting } = r;
          const pending = waiting || debouncing.current;
          if ("crash" in reply) return { ...s, crash: reply.crash, pending, ms: reply.ms };
          if (!reply.ok) return { ...s, problems: reply.problems, parameters: reply.parameters.length ? reply.parameters : s.parameters, crash: null, pending, ms: reply.ms };
          return { result: reply, problems: [], parameters: reply.parameters, crash: null, pending, ms: reply.ms };
        }),
    );
    channel.current = c;
    return () => c.dispose();
  }, [ready]);

  const send = () => {
    const { doc: d, opts: o } = latest.current;
    const query: AnalysisQuery = {
      document: d,
      input: o.input,
      output: o.output,
      break: o.break,
      values: o.values,
      settlingBand: o.band,
      sweepParameter: o.sweepParameter,
      withSweep: o.sweepShown,
    };
    channel.current?.request(query);
  };

  const { input, output, break: brk, values, band, sweepParameter, sweepShown } = opts;
  const sentFirst = useRef(false);
  useEffect(() => {
    // Option changes go straight through, once the first request is out (declared first: it skips that commit).
    if (!sentFirst.current) return;
    setState((s) => (s.pending ? s : { ...s, pending: true }));
    send();
  }, [input, output, brk, values, band, sweepParameter, sweepShown]);

  useEffect(() => {
    // Nothing before the closed-loop result is known: on two cores the analysis would slow it down.
    if (!ready) return;
    setState((s) => (s.pending ? s : { ...s, pending: true }));
    if (!sentFirst.current) {
      sentFirst.current = true;
      send();
      return;
    }
    debouncing.current = true;
    const timer = window.setTimeout(() => {
      debouncing.current = false;
      send();
    }, LIVE_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [doc, ready]);

  return state;
}
