// Entry point of the npm scripts start, test, dev, bench and fuzz. Plain Node with built-in modules only, because it runs
// before node_modules exist: it installs what is missing, brings up the private PostgreSQL cluster, then hands over
// to the TypeScript code (compiled to JavaScript for `npm start`, through tsx for the others).
import { spawn, spawnSync } from "node:child_process";
import { DB, PORTS, ROOT, bin, fail, step } from "./common.mjs";
import { buildClient, buildCompiled, compiledPath } from "./build.mjs";
import { ensureDatabase, ensurePostgres, localUrl, migrate } from "./database.mjs";
import { ensureChromium, ensureNodeModules, ensurePari, ensurePythonReferences } from "./packages.mjs";
import { runTests } from "./testRun.mjs";

/** Runs a long-lived child; Ctrl-C stops it and then the database this process started. */
function serve(cmd, args, env, pg) {
  const child = spawn(cmd, args, { cwd: ROOT, env: { ...process.env, ...env }, stdio: "inherit" });
  let stopping = false;
  const shutdown = () => {
    if (stopping) return;
    stopping = true;
    child.kill("SIGTERM");
  };
  process.on("SIGINT", shutdown);
  process.on("SIGTERM", shutdown);
  child.on("exit", (code) => {
    if (pg.startedHere) {
      step("Stopping PostgreSQL…");
      pg.stop();
    }
    process.exit(stopping ? 0 : (code ?? 1));
  });
}

async function bench(only) {
  ensurePythonReferences();
  ensurePari();
  ensureChromium();
  const pg = await ensurePostgres();
  ensureDatabase(pg, DB.test);
  const r = spawnSync(bin("tsx"), ["tests/bench/runAll.ts", ...only], {
    cwd: ROOT,
    stdio: "inherit",
    env: { ...process.env, BENCH_DATABASE_URL: process.env.DATABASE_URL ?? localUrl(DB.test) },
  });
  if (pg.startedHere) pg.stop();
  return r.status ?? 1;
}

/** The long fuzz run: in-process, so it needs the modules only (no database, no browser). */
function fuzz(only) {
  return spawnSync(bin("tsx"), ["tests/fuzz/runFuzz.ts", ...only], { cwd: ROOT, stdio: "inherit" }).status ?? 1;
}

async function test(started) {
  ensurePythonReferences();
  ensureChromium();
  const pg = await ensurePostgres();
  const databaseUrl = process.env.TEST_DATABASE_URL ?? (pg.external ? process.env.DATABASE_URL : localUrl(DB.test));
  ensureDatabase(pg, DB.test, { fresh: true });
  migrate(databaseUrl);
  try {
    return await runTests({ databaseUrl, started });
  } finally {
    if (pg.startedHere) pg.stop();
  }
}

async function serveApp(mode, started) {
  const pg = await ensurePostgres();
  ensureDatabase(pg, DB.app);
  const databaseUrl = process.env.DATABASE_URL ?? localUrl(DB.app);
  migrate(databaseUrl, { seed: true });
  if (mode === "start") {
    buildClient("dist/client");
    await buildCompiled();
  }
  const port = Number(process.env.PORT ?? PORTS.app);
  const url = mode === "dev" ? `http://localhost:${PORTS.vite} (API on :${port})` : `http://localhost:${port}`;
  step(`Ready in ${((Date.now() - started) / 1000).toFixed(1)} s — serving ${url} (Ctrl-C stops)`);
  const env = { DATABASE_URL: databaseUrl, NODE_ENV: process.env.NODE_ENV ?? (mode === "dev" ? "development" : "production") };
  if (mode === "start") return serve(process.execPath, ["--enable-source-maps", compiledPath("server/main")], env, pg);
  return serve(bin("tsx"), ["server/tools/dev.ts"], env, pg);
}

async function main() {
  const [mode, ...rest] = process.argv.slice(2);
  const started = Date.now();
  ensureNodeModules();
  if (mode === "bench") process.exit(await bench(rest));
  if (mode === "test") process.exit(await test(started));
  if (mode === "fuzz") process.exit(fuzz(rest));
  if (mode === "start" || mode === "dev") return serveApp(mode, started);
  fail(`Unknown mode "${mode}". Use: start | test | dev | bench [name] | fuzz [name]`);
}

main().catch((e) => fail(e.stack ?? String(e)));
