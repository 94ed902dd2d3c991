import type { LiveQuery, LiveReply, LiveRequest } from "@/features/editor/worker/liveProtocol";
import { WorkerChannel, type WorkerResult } from "@/features/editor/worker/workerChannel";

export type LiveChannelResult = WorkerResult<LiveQuery, LiveReply>;

/** The editor worker's channel: the payload is the document with the analysis query. */
export class LiveChannel extends WorkerChannel<LiveQuery, LiveRequest, LiveReply> {
  constructor(spawn: () => Worker, onResult: (r: LiveChannelResult) => void, now?: () => number) {
    super(spawn, onResult, { what: "editor", message: (seq, query) => ({ ...query, seq }) }, now);
  }
}
