import { Worker } from "node:worker_threads";
import type { CheckedResult } from "@shared/api/versions";
import type { Problem } from "@shared/diagram/problems";
import { HttpError } from "@server/http/errors";
import type { EngineJob, EngineReply } from "@server/features/versions/checkWorker";

export interface EngineBudget {
  timeMs: number;
  memoryMb: number;
  /** Checks running at once (one warm worker each); more are refused with 503 rather than queued. */
  concurrency: number;
}

export const DEFAULT_BUDGET: EngineBudget = { timeMs: 20_000, memoryMb: 512, concurrency: 2 };

const budgetProblem = (message: string): Problem => ({ severity: "error", code: "engine-budget", message });

/** Idle warm workers per memory budget: starting one costs seconds (it loads the TypeScript engine). */
const idle = new Map<number, Worker[]>();
let running = 0;
let nextId = 1;

function spawnWorker(memoryMb: number): Promise<Worker> {
  const worker = new Worker(new URL("./checkWorkerEntry.mjs", import.meta.url), {
    resourceLimits: { maxOldGenerationSizeMb: memoryMb },
  });
  worker.unref(); // an idle engine worker never keeps the process alive
  return new Promise((resolve, reject) => {
    worker.once("message", () => resolve(worker));
    worker.once("error", reject);
  });
}

/** Starts one worker ahead of the first save, so that save does not wait for the engine to load. */
export async function warmEngine(budget: EngineBudget = DEFAULT_BUDGET): Promise<void> {
  const pool = idle.get(budget.memoryMb) ?? [];
  idle.set(budget.memoryMb, pool);
  if (pool.length === 0) pool.push(await spawnWorker(budget.memoryMb));
}

/**
 * Re-runs the shared reduction engine on a document in a worker thread with a time and memory budget,
 * so one pathological diagram cannot stall or exhaust the server. A worker over budget is terminated.
 */
export async function checkDocument(document: unknown, budget: EngineBudget = DEFAULT_BUDGET): Promise<CheckedResult> {
  if (running >= budget.concurrency)
    throw new HttpError(503, "engine_busy", "The server is checking other diagrams right now. Try saving again in a moment.");
  running++;
  const started = performance.now();
  const elapsed = () => Math.round(performance.now() - started);
  const pool = idle.get(budget.memoryMb) ?? [];
  idle.set(budget.memoryMb, pool);
  let worker: Worker | undefined;
  try {
    worker = pool.pop() ?? (await spawnWorker(budget.memoryMb));
    const w = worker;
    const id = nextId++;
    const outcome = await new Promise<{ checked: CheckedResult; healthy: boolean }>((resolve) => {
      const timer = setTimeout(
        () => done({ healthy: false, checked: { ok: false, engineMs: elapsed(), problems: [budgetProblem(`Checking this diagram took longer than ${budget.timeMs / 1000} s, the server's time budget; simplify it or split it.`)] } }),
        budget.timeMs + 2_000, // the engine's own time limit fires first; this catches anything that ignores it
      );
      const done = (result: { checked: CheckedResult; healthy: boolean }) => {
        clearTimeout(timer);
        w.off("message", onMessage);
        w.off("error", onError);
        resolve(result);
      };
      const onMessage = (reply: EngineReply) => {
        if (reply.id === id) done({ healthy: true, checked: reply.checked });
      };
      const onError = (e: Error) => {
        const memory = (e as { code?: string }).code === "ERR_WORKER_OUT_OF_MEMORY";
        const why = memory ? `Checking this diagram needed more than ${budget.memoryMb} MB, the server's memory budget.` : `The engine failed: ${e.message}`;
        done({ healthy: false, checked: { ok: false, engineMs: elapsed(), problems: [budgetProblem(why)] } });
      };
      w.on("message", onMessage);
      w.on("error", onError);
      w.postMessage({ id, document, timeLimitMs: budget.timeMs } satisfies EngineJob);
    });
    if (outcome.healthy) pool.push(w);
    else void w.terminate();
    return outcome.checked;
  } finally {
    running--;
  }
}
