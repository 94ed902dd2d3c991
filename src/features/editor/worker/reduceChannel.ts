import type { EditorDoc } from "@/features/editor/commands/types";
import type { ReduceReply, ReduceRequest } from "@/features/editor/worker/protocol";
import { WorkerChannel, type WorkerResult } from "@/features/editor/worker/workerChannel";

export type ChannelResult = WorkerResult<EditorDoc, ReduceReply>;

/** The reduction worker's channel: the payload is the document to reduce. */
export class ReduceChannel extends WorkerChannel<EditorDoc, ReduceRequest, ReduceReply> {
  constructor(spawn: () => Worker, onResult: (r: ChannelResult) => void, now?: () => number) {
    super(spawn, onResult, { what: "reduction", message: (seq, document) => ({ seq, document }) }, now);
  }
}
