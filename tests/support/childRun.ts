import { spawn } from "node:child_process";

/** A finished reference process: exit code, output and wall time. */
export interface ChildRun {
  code: number | null;
  stdout: string;
  stderr: string;
  /** Wall time from spawn to exit. */
  ms: number;
}

/**
 * Runs a reference program to its end with a time limit, `input` on stdin (none: an empty stdin). Past the limit the
 * process is killed and the promise rejects with `timeout()`. The one spawn loop of the Python and PARI/GP runners.
 * Example: await runChild("/usr/bin/gp", ["-q", "x.gp"], { timeoutMs: 1000, timeout: () => new Error("slow") }).
 */
export function runChild(
  cmd: string,
  args: string[],
  opts: { input?: string; timeoutMs: number; timeout: () => Error },
): Promise<ChildRun> {
  return new Promise((resolve, reject) => {
    const started = performance.now();
    const child = spawn(cmd, args, { stdio: ["pipe", "pipe", "pipe"] });
    let stdout = "";
    let stderr = "";
    const timer = setTimeout(() => {
      child.kill("SIGKILL");
      reject(opts.timeout());
    }, opts.timeoutMs);
    child.stdout.on("data", (d: Buffer) => (stdout += d.toString()));
    child.stderr.on("data", (d: Buffer) => (stderr += d.toString()));
    child.on("error", (e) => {
      clearTimeout(timer);
      reject(e);
    });
    child.on("close", (code, signal) => {
      clearTimeout(timer);
      if (signal) return; // killed by the timer, already rejected
      resolve({ code, stdout, stderr, ms: performance.now() - started });
    });
    child.stdin.end(opts.input ?? "");
  });
}
