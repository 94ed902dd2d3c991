import { spawn } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

/** How the command-line tests run a Loopwright command as a real process and feed it files. */
export interface CliRun {
  code: number | null;
  stdout: string;
  stderr: string;
}

const TSX = join(process.cwd(), "node_modules", ".bin", "tsx");

// Each run starts node + tsx (about a second, much more on a busy machine).
export const SPAWN_TIMEOUT = 120_000;
export const STACK_TRACE = /\n\s+at .+:\d+:\d+/;

/** Runs `server/tools/cli/<command>.ts` with the given arguments. */
export function runCli(command: string, ...args: string[]): Promise<CliRun> {
  return new Promise((resolve, reject) => {
    const child = spawn(TSX, [`server/tools/cli/${command}.ts`, ...args], { cwd: process.cwd() });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d: Buffer) => (stdout += d.toString()));
    child.stderr.on("data", (d: Buffer) => (stderr += d.toString()));
    child.on("error", reject);
    child.on("close", (code) => resolve({ code, stdout, stderr }));
  });
}

/** A fresh temp folder and a writer of input files in it: objects are written as JSON, strings as they are. */
export function tempFiles(prefix: string): { dir: string; file: (name: string, content: unknown) => string } {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  const file = (name: string, content: unknown) => {
    const path = join(dir, name);
    writeFileSync(path, typeof content === "string" ? content : JSON.stringify(content, null, 2));
    return path;
  };
  return { dir, file };
}
