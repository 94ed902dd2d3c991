import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { connect } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";
import ports from "@shared/ports.json" with { type: "json" };

/**
 * The real app for benchmarks: the production client built into a temporary folder, the server started on its
 * own ports against the bench database, the database migrated first (bench mode does not migrate). With
 * `compiled`, the server is the JavaScript `npm start` runs (dist/server) instead of the sources through tsx.
 * `stop()` ends the server and removes the build; safe to call twice.
 */
export interface LiveServer {
  baseUrl: string;
  stop(): Promise<void>;
}

const PORT = ports.benchApp;
const FAKE_MAIL_PORT = ports.benchMail;
const bin = (name: string) => join("node_modules", ".bin", name);

function runOrThrow(cmd: string, args: string[], what: string, env: NodeJS.ProcessEnv = process.env): void {
  const r = spawnSync(cmd, args, { stdio: ["ignore", "inherit", "inherit"], env });
  if (r.error) throw new Error(`${what}: ${r.error.message}`);
  if (r.status !== 0) throw new Error(`${what} (exit ${r.status})`);
}

async function waitForHealth(url: string, server: ChildProcess, ms: number): Promise<void> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (server.exitCode !== null) throw new Error(`the server exited (code ${server.exitCode}) before ${url} answered`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not answer within ${ms / 1000} s`);
}

/** Whether something already listens on the port (another run's server would answer our health check). */
const portTaken = (port: number) =>
  new Promise<boolean>((done) => {
    const socket = connect({ host: "127.0.0.1", port });
    socket.once("connect", () => (socket.destroy(), done(true)));
    socket.once("error", () => done(false));
  });

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((done) => {
    const force = setTimeout(() => child.kill("SIGKILL"), 5000);
    child.once("exit", () => (clearTimeout(force), done()));
    child.kill("SIGTERM");
  });
}

/** Builds the client, migrates the database, starts the server and waits for /api/health. */
/**
 * `clientDir`: serve a client built elsewhere (e.g. from an older commit, to compare) instead of building this one.
 */
export async function startLiveServer(databaseUrl: string, { compiled = false, clientDir: prebuilt }: { compiled?: boolean; clientDir?: string } = {}): Promise<LiveServer> {
  for (const port of [PORT, FAKE_MAIL_PORT])
    if (await portTaken(port)) throw new Error(`port ${port} is already in use (another benchmark run?); stop that program first`);
  const clientDir = prebuilt ?? mkdtempSync(join(tmpdir(), "loopwright-bench-client-"));
  const baseUrl = `http://127.0.0.1:${PORT}`;
  let server: ChildProcess | null = null;
  let stopping = false;
  const stop = async () => {
    stopping = true;
    if (server) await stopChild(server);
    if (!prebuilt) rmSync(clientDir, { recursive: true, force: true });
  };
  try {
    // BENCH_NO_MINIFY=1: readable function names in profiles of the benchmarked page.
    if (!prebuilt) runOrThrow(bin("vite"), ["build", ...(process.env.BENCH_NO_MINIFY ? ["--minify", "false"] : []), "--outDir", clientDir, "--emptyOutDir", "--logLevel", "error"], "the client build failed");
    runOrThrow(bin("tsx"), ["server/tools/migrate.ts"], "migrating the bench database failed", { ...process.env, DATABASE_URL: databaseUrl });
    if (compiled) runOrThrow(process.execPath, ["server/tools/bootstrap/compile.mjs"], "compiling the server failed");
    const [cmd, args] = compiled ? [process.execPath, ["dist/server/main.js"]] : [bin("tsx"), ["server/main.ts"]];
    server = spawn(cmd, args, {
      stdio: ["ignore", "ignore", "inherit"],
      env: {
        ...process.env,
        CLIENT_DIR: clientDir,
        PORT: String(PORT),
        FAKE_MAIL_PORT: String(FAKE_MAIL_PORT),
        PUBLIC_URL: baseUrl,
        NODE_ENV: "test",
        LOG_LEVEL: "warn",
        RATE_LIMIT_AUTH_PER_15_MIN: "10000",
        RATE_LIMIT_SHARE_PER_MIN: "100000000", // the load bench reads share pages at 200 connections
        RATE_LIMIT_UPLOADS_PER_15_MIN: "10000",
        DATABASE_URL: databaseUrl,
      },
    });
    server.once("exit", (code, signal) => {
      if (!stopping) console.error(`✗ the bench server exited unexpectedly (code ${code}, signal ${signal})`);
    });
    await waitForHealth(`${baseUrl}/api/health`, server, 60_000);
    return { baseUrl, stop };
  } catch (e) {
    await stop();
    throw e;
  }
}
