import { parentPort } from "node:worker_threads";
import type { CheckedResult } from "@shared/api/versions";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { Problem } from "@shared/diagram/problems";
import type { ReductionResult } from "@shared/reduce/result";
import type { VersionSummary } from "@shared/analysis/versionSummary";

export type CheckJob = { id: number; document: DiagramDocument; timeLimitMs: number };
/** The check's result, or what it threw: the reducer reports every diagram problem, so a throw is a bug. */
export type CheckReply = { id: number; checked: CheckedResult } | { id: number; crash: { message: string; stack?: string } };

type Reduce = (
  document: DiagramDocument,
  opts: { limits: { timeLimitMs: number } },
) => { ok: true; result: ReductionResult; summary?: VersionSummary | null } | { ok: false; problems: Problem[] };

/** Serves check jobs in this worker thread, one at a time, with `reduce`; posts "ready" once it listens. */
export function serveChecks(reduce: Reduce): void {
  const port = parentPort!;
  port.on("message", ({ id, document, timeLimitMs }: CheckJob) => {
    const started = performance.now();
    try {
      const outcome = reduce(document, { limits: { timeLimitMs } });
      const engineMs = Math.round((performance.now() - started) * 10) / 10;
      const checked: CheckedResult = outcome.ok
        ? { ok: true, result: outcome.result, summary: outcome.summary ?? null, engineMs }
        : { ok: false, problems: outcome.problems, engineMs };
      port.postMessage({ id, checked } satisfies CheckReply);
    } catch (err) {
      const e = err instanceof Error ? err : new Error(String(err));
      port.postMessage({ id, crash: { message: e.message, stack: e.stack } } satisfies CheckReply);
    }
  });
  port.postMessage("ready");
}
