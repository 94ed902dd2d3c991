import { Worker } from "node:worker_threads";
import type { Logger } from "pino";
import { CHECK_BUDGET, CHECK_CRASHED, type CheckedResult } from "@shared/api/versions";
import type { DiagramDocument } from "@shared/diagram/schema";
import { HttpError } from "@server/http/errors";
import type { CheckJob, CheckReply } from "@server/features/versions/serveChecks";

export interface CheckBudget {
  timeMs: number;
  memoryMb: number;
  /** Checks running at once (one warm worker each); more are refused with 503 rather than queued. */
  concurrency: number;
}

export const DEFAULT_BUDGET: CheckBudget = { timeMs: 20_000, memoryMb: 512, concurrency: 2 };

export interface SaveCheckOptions {
  log: Logger;
  budget?: CheckBudget;
  /** The worker thread's entry module (tests give one whose reducer throws). */
  workerEntry?: URL;
}

/** The save-time check of versions: the shared reducer in worker threads, each within a time and memory budget. */
export interface SaveCheck {
  /**
   * Checks a document; never fails for the document's sake (503 `check_busy` only when all workers are busy).
   * A check over budget or crashing is a result saying so; a crash is logged with its stack.
   */
  run(document: DiagramDocument, about: { diagramId: string }): Promise<CheckedResult>;
  /** Starts one worker ahead of the first save, so that save does not wait for the reducer to load. */
  warm(): Promise<void>;
}

type Crash = { message: string; stack?: string };
type Answer =
  | { kind: "checked"; checked: CheckedResult }
  | { kind: "over-budget"; why: string }
  | { kind: "crashed"; crash: Crash };

const overBudget = (engineMs: number, message: string): CheckedResult => ({
  ok: false,
  failure: "over-budget",
  engineMs,
  problems: [{ severity: "error", code: CHECK_BUDGET, message }],
});

const crashed = (engineMs: number): CheckedResult => ({
  ok: false,
  failure: "crashed",
  engineMs,
  problems: [
    {
      severity: "error",
      code: CHECK_CRASHED,
      message:
        "The server's check of this diagram failed (an internal error, logged for the developers); your version is saved.",
    },
  ],
});

const crashOf = (e: unknown): Crash => (e instanceof Error ? { message: e.message, stack: e.stack } : { message: String(e) });

/** A check that keeps warm workers, so one pathological diagram can neither stall nor exhaust the server. */
export function createSaveCheck({ log, budget = DEFAULT_BUDGET, workerEntry = new URL("./checkWorkerEntry.mjs", import.meta.url) }: SaveCheckOptions): SaveCheck {
  // Starting a worker costs seconds (it loads the TypeScript reducer): healthy ones are kept for the next save.
  const idle: Worker[] = [];
  let running = 0;
  let nextId = 1;

  function spawn(): Promise<Worker> {
    const worker = new Worker(workerEntry, { resourceLimits: { maxOldGenerationSizeMb: budget.memoryMb } });
    worker.unref(); // an idle check worker never keeps the process alive
    return new Promise((resolve, reject) => {
      worker.once("message", () => resolve(worker));
      worker.once("error", reject);
    });
  }

  function ask(worker: Worker, job: CheckJob): Promise<Answer> {
    return new Promise((resolve) => {
      const timer = setTimeout(
        () => done({ kind: "over-budget", why: `Checking this diagram took longer than ${budget.timeMs / 1000} s, the server's time budget; simplify it or split it.` }),
        budget.timeMs + 2_000, // the reducer's own time limit fires first; this catches anything that ignores it
      );
      const done = (answer: Answer) => {
        clearTimeout(timer);
        worker.off("message", onMessage).off("error", onError).off("exit", onExit);
        resolve(answer);
      };
      const onMessage = (reply: CheckReply) => {
        if (reply.id === job.id) done("checked" in reply ? { kind: "checked", checked: reply.checked } : { kind: "crashed", crash: reply.crash });
      };
      // An uncaught throw in the worker (outside the reducer's call) arrives here, as does running out of memory.
      const onError = (e: Error) =>
        done(
          (e as { code?: string }).code === "ERR_WORKER_OUT_OF_MEMORY"
            ? { kind: "over-budget", why: `Checking this diagram needed more than ${budget.memoryMb} MB, the server's memory budget.` }
            : { kind: "crashed", crash: crashOf(e) },
        );
      const onExit = (code: number) => done({ kind: "crashed", crash: { message: `The check worker exited with code ${code} during a check.` } });
      worker.on("message", onMessage).on("error", onError).on("exit", onExit);
      worker.postMessage(job);
    });
  }

  async function answerFor(document: DiagramDocument): Promise<Answer> {
    const worker = idle.pop() ?? (await spawn());
    const answer = await ask(worker, { id: nextId++, document, timeLimitMs: budget.timeMs });
    // A worker that crashed or overran may hold broken state: only a clean one serves the next save.
    if (answer.kind === "checked") idle.push(worker);
    else void worker.terminate();
    return answer;
  }

  return {
    async run(document, about) {
      if (running >= budget.concurrency)
        throw new HttpError(503, "check_busy", "The server is checking other diagrams right now. Try saving again in a moment.");
      running++;
      const started = performance.now();
      try {
        const answer = await answerFor(document).catch((e: unknown): Answer => ({ kind: "crashed", crash: crashOf(e) }));
        const engineMs = Math.round(performance.now() - started);
        if (answer.kind === "checked") return answer.checked;
        if (answer.kind === "over-budget") return overBudget(engineMs, answer.why);
        log.error({ err: answer.crash, diagramId: about.diagramId }, "save check crashed");
        return crashed(engineMs);
      } finally {
        running--;
      }
    },
    async warm() {
      if (idle.length === 0) idle.push(await spawn());
    },
  };
}
