import { parentPort } from "node:worker_threads";
import { reduceDocument } from "@shared/engine/reduceDocument";
import type { CheckedResult } from "@shared/api/versions";

export type EngineJob = { id: number; document: unknown; timeLimitMs: number };
export type EngineReply = { id: number; checked: CheckedResult };

// A long-lived worker: runs the shared engine on one document at a time, off the request thread.
parentPort!.on("message", ({ id, document, timeLimitMs }: EngineJob) => {
  const started = performance.now();
  const outcome = reduceDocument(document, { limits: { timeLimitMs } });
  const engineMs = Math.round((performance.now() - started) * 10) / 10;
  const checked: CheckedResult = outcome.ok
    ? { ok: true, result: outcome.result, engineMs }
    : { ok: false, problems: outcome.problems, engineMs };
  parentPort!.postMessage({ id, checked } satisfies EngineReply);
});
parentPort!.postMessage("ready");
