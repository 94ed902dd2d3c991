// Entry point of every npm script. Plain Node with built-in modules only, because it runs before node_modules exist:
// it installs what is missing, brings up the private PostgreSQL cluster, then hands over to the TypeScript code.
import { spawn, spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, readdirSync, statSync, writeFileSync } from "node:fs";
import { connect } from "node:net";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), "..", "..");
export const PORTS = { app: 3000, postgres: 54329, mail: 2525, vite: 5173, testApp: 3100, testMail: 2625 };
export const DB = { app: "loopwright", test: "loopwright_test" };
const isRoot = process.getuid?.() === 0;
const quiet = process.argv[2] === "cli"; // CLI output is a public contract: progress goes to stderr, only when needed

export function step(message) {
  (quiet ? process.stderr : process.stdout).write(`▸ ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`✗ ${message}\n`);
  process.exit(1);
}

/** Runs a command to completion, failing the whole script with `what` when it exits non-zero. */
export function run(cmd, args, what, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: opts.capture ? "pipe" : quiet ? ["ignore", 2, 2] : "inherit", encoding: "utf8", ...opts });
  if (r.error) fail(`${what}: ${r.error.message}`);
  if (r.status !== 0) fail(`${what} (exit ${r.status})${opts.capture ? `\n${r.stderr || r.stdout}` : ""}`);
  return r.stdout;
}

const asPostgres = (cmd, args) => (isRoot ? ["runuser", ["-u", "postgres", "--", cmd, ...args]] : [cmd, args]);
const hash = (text) => createHash("sha256").update(text).digest("hex");

// ---------- Node modules ----------
function ensureNodeModules() {
  const lock = readFileSync(join(ROOT, "package-lock.json"), "utf8");
  const stamp = join(ROOT, "node_modules", ".loopwright-lock-hash");
  if (existsSync(stamp) && readFileSync(stamp, "utf8") === hash(lock)) return;
  step("Installing node modules (npm ci)…");
  run("npm", ["ci", "--no-audit", "--no-fund"], "npm ci failed: check the network to the npm registry and disk space");
  writeFileSync(stamp, hash(lock));
}

// ---------- Debian packages ----------
let aptUpdated = false;
export function aptInstall(packages, why) {
  if (!isRoot) fail(`${why} is missing. Install it with: sudo apt-get install -y ${packages.join(" ")}`);
  step(`Installing ${packages.join(", ")} (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  if (!aptUpdated) run("apt-get", ["update", "-q"], "apt-get update failed", { env });
  aptUpdated = true;
  run("apt-get", ["install", "-y", "-q", ...packages], `apt-get install ${packages.join(" ")} failed`, { env });
}

function postgresBinDir() {
  const base = "/usr/lib/postgresql";
  const versions = existsSync(base)
    ? readdirSync(base).filter((v) => existsSync(join(base, v, "bin", "initdb"))).sort((a, b) => Number(b) - Number(a))
    : [];
  return versions.length ? join(base, versions[0], "bin") : null;
}

export function ensurePythonReferences() {
  const probe = spawnSync("/usr/bin/python3", ["-c", "import sympy, scipy, numpy"], { stdio: "ignore" });
  if (probe.status !== 0) aptInstall(["python3-sympy", "python3-scipy", "python3-numpy"], "the Python reference libraries for tests");
}

export function ensureChromium() {
  if (!existsSync("/usr/bin/chromium")) aptInstall(["chromium"], "Chromium for browser tests");
}

// ---------- PostgreSQL ----------
function canPostgresReach(dir) {
  if (!isRoot) return true;
  return spawnSync("runuser", ["-u", "postgres", "--", "test", "-x", dir], { stdio: "ignore" }).status === 0;
}

function clusterDir() {
  const local = join(ROOT, ".data");
  mkdirSync(local, { recursive: true });
  if (canPostgresReach(local)) return join(local, "pg");
  // e.g. a clone inside a 0700 home folder: the postgres user cannot enter it.
  const fallback = `/var/tmp/loopwright-${hash(ROOT).slice(0, 12)}`;
  step(`The postgres user cannot reach ${local}; keeping the database in ${fallback} instead`);
  mkdirSync(fallback, { recursive: true, mode: 0o755 });
  return join(fallback, "pg");
}

function portOpen(port) {
  return new Promise((done) => {
    const socket = connect({ host: "127.0.0.1", port });
    socket.once("connect", () => (socket.destroy(), done(true)));
    socket.once("error", () => done(false));
  });
}

/** Makes sure the private cluster runs; returns how to reach it and whether this process started it. */
export async function ensurePostgres() {
  if (process.env.DATABASE_URL) return { external: true, startedHere: false };
  let bin = postgresBinDir();
  if (!bin) {
    aptInstall(["postgresql"], "the PostgreSQL server");
    bin = postgresBinDir() ?? fail("PostgreSQL was installed but no initdb was found under /usr/lib/postgresql");
  }
  const data = clusterDir();
  if (!existsSync(join(data, "PG_VERSION"))) {
    step(`Creating a private PostgreSQL cluster in ${data}…`);
    mkdirSync(data, { recursive: true, mode: 0o700 });
    if (isRoot) run("chown", ["postgres:postgres", data], "could not give the data folder to the postgres user");
    const [cmd, args] = asPostgres(join(bin, "initdb"), ["-D", data, "-U", "postgres", "--auth=trust", "-E", "UTF8", "--locale=C.UTF-8"]);
    run(cmd, args, "initdb failed", { capture: true });
  }
  const [sc, sa] = asPostgres(join(bin, "pg_ctl"), ["-D", data, "status"]);
  const running = spawnSync(sc, sa, { stdio: "ignore" }).status === 0;
  let startedHere = false;
  if (!running) {
    if (await portOpen(PORTS.postgres)) fail(`Port ${PORTS.postgres} is taken by another program; stop it or set DATABASE_URL`);
    step(`Starting PostgreSQL on 127.0.0.1:${PORTS.postgres}…`);
    const opts = `-c listen_addresses=127.0.0.1 -p ${PORTS.postgres} -k ${data}`;
    const [cmd, args] = asPostgres(join(bin, "pg_ctl"), ["-D", data, "-l", join(data, "server.log"), "-w", "-t", "30", "-o", opts, "start"]);
    run(cmd, args, `PostgreSQL did not start; see ${join(data, "server.log")}`, { capture: true });
    startedHere = true;
  }
  const stop = () => {
    const [cmd, args] = asPostgres(join(bin, "pg_ctl"), ["-D", data, "-m", "fast", "-w", "stop"]);
    spawnSync(cmd, args, { stdio: "ignore" });
  };
  return { external: false, startedHere, stop, psql: (db, sql) => psql(bin, data, db, sql) };
}

function psql(bin, data, db, sql) {
  const [cmd, args] = asPostgres(join(bin, "psql"), ["-h", data, "-p", String(PORTS.postgres), "-U", "postgres", "-d", db, "-tAc", sql]);
  return run(cmd, args, `psql failed: ${sql}`, { capture: true }).trim();
}

export const localUrl = (db) => `postgres://postgres@127.0.0.1:${PORTS.postgres}/${db}`;

export function ensureDatabase(pg, name, { fresh = false } = {}) {
  if (pg.external) return;
  if (fresh) pg.psql("postgres", `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  if (pg.psql("postgres", `SELECT 1 FROM pg_database WHERE datname='${name}'`) !== "1") {
    step(`Creating database ${name}…`);
    pg.psql("postgres", `CREATE DATABASE ${name}`);
  }
}

export const tsx = (args, env, stdio = "inherit") =>
  spawnSync(join(ROOT, "node_modules", ".bin", "tsx"), args, { cwd: ROOT, env: { ...process.env, ...env }, stdio });

export function migrate(databaseUrl, { seed = false } = {}) {
  step(seed ? "Migrating and seeding the demo…" : "Migrating…");
  const r = tsx(["server/db/migrateCli.ts", ...(seed ? ["--seed"] : [])], { DATABASE_URL: databaseUrl }, quiet ? ["ignore", 2, 2] : "inherit");
  if (r.status !== 0) fail("Migration failed (see the message above)");
}

function newestMtime(paths) {
  let newest = 0;
  const walk = (p) => {
    if (!existsSync(p)) return;
    const st = statSync(p);
    if (st.isDirectory()) for (const name of readdirSync(p)) walk(join(p, name));
    else newest = Math.max(newest, st.mtimeMs);
  };
  paths.forEach((p) => walk(join(ROOT, p)));
  return newest;
}

export function buildClient(outDir) {
  const marker = join(ROOT, outDir, "index.html");
  const sources = newestMtime(["src", "shared", "index.html", "vite.config.ts", "tailwind.config.ts", "package-lock.json"]);
  if (existsSync(marker) && statSync(marker).mtimeMs >= sources) return;
  step(`Building the client into ${outDir}…`);
  run(join(ROOT, "node_modules", ".bin", "vite"), ["build", "--outDir", outDir, "--emptyOutDir", "--logLevel", "warn"], "The client build failed", { cwd: ROOT });
}

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

async function main() {
  const [mode, ...rest] = process.argv.slice(2);
  const started = Date.now();
  ensureNodeModules();
  if (mode === "cli") {
    const [name, ...args] = rest;
    const r = tsx([join("server", "cli", `${name}.ts`), ...args], {}, "inherit");
    process.exit(r.status ?? 1);
  }
  if (mode === "bench") {
    ensurePythonReferences();
    ensureChromium();
    const pg = await ensurePostgres();
    ensureDatabase(pg, DB.test);
    const r = tsx(["server/bench/runAll.ts", ...rest], { BENCH_DATABASE_URL: process.env.DATABASE_URL ?? localUrl(DB.test) });
    if (pg.startedHere) pg.stop();
    process.exit(r.status ?? 1);
  }
  if (mode === "test") {
    ensurePythonReferences();
    ensureChromium();
    const pg = await ensurePostgres();
    const databaseUrl = process.env.TEST_DATABASE_URL ?? (pg.external ? process.env.DATABASE_URL : localUrl(DB.test));
    ensureDatabase(pg, DB.test, { fresh: true });
    migrate(databaseUrl);
    let code = 1;
    try {
      const { runTests } = await import("./testRun.mjs"); // loaded late: it imports this module back
      code = await runTests({ databaseUrl, started });
    } finally {
      if (pg.startedHere) pg.stop();
    }
    process.exit(code);
  }
  if (mode === "start" || mode === "dev") {
    const pg = await ensurePostgres();
    ensureDatabase(pg, DB.app);
    const databaseUrl = process.env.DATABASE_URL ?? localUrl(DB.app);
    migrate(databaseUrl, { seed: true });
    if (mode === "start") buildClient("dist/client");
    const port = Number(process.env.PORT ?? PORTS.app);
    const url = mode === "dev" ? `http://localhost:${PORTS.vite} (API on :${port})` : `http://localhost:${port}`;
    step(`Ready in ${((Date.now() - started) / 1000).toFixed(1)} s — serving ${url} (Ctrl-C stops)`);
    const env = { DATABASE_URL: databaseUrl, NODE_ENV: process.env.NODE_ENV ?? (mode === "dev" ? "development" : "production") };
    if (mode === "start") return serve(join(ROOT, "node_modules", ".bin", "tsx"), ["server/main.ts"], env, pg);
    return serve(join(ROOT, "node_modules", ".bin", "tsx"), ["server/scripts/dev.ts"], env, pg);
  }
  fail(`Unknown mode "${mode}". Use: start | test | dev | bench | cli <name>`);
}

if (process.argv[1] === fileURLToPath(import.meta.url)) main().catch((e) => fail(e.stack ?? String(e)));
