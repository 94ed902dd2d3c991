import type { AnalysisQuery, AnalysisReply, AnalysisRequest } from "@shared/analysis/answer";
import { WorkerChannel, type WorkerResult } from "@/features/editor/worker/workerChannel";

export type AnalysisChannelResult = WorkerResult<AnalysisQuery, AnalysisReply>;

/** The analysis worker's channel: the payload is the whole query (document, pair, break, values). */
export class AnalysisChannel extends WorkerChannel<AnalysisQuery, AnalysisRequest, AnalysisReply> {
  constructor(spawn: () => Worker, onResult: (r: AnalysisChannelResult) => void, now?: () => number) {
    super(spawn, onResult, { what: "analysis", message: (seq, query) => ({ ...query, seq }) }, now);
  }
}
