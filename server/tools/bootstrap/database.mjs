// The private PostgreSQL cluster on loopback, its databases and their migrations. Plain Node with built-in
// modules only (the migration step itself runs the TypeScript migrator with tsx).
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readdirSync } from "node:fs";
import { connect } from "node:net";
import { join } from "node:path";
import { PORTS, ROOT, bin, childStdio, fail, run, step } from "./common.mjs";
import { aptInstall, hash, isRoot } from "./packages.mjs";

const asPostgres = (cmd, args) => (isRoot ? ["runuser", ["-u", "postgres", "--", cmd, ...args]] : [cmd, args]);

function postgresBinDir() {
  const base = "/usr/lib/postgresql";
  const versions = existsSync(base)
    ? readdirSync(base).filter((v) => existsSync(join(base, v, "bin", "initdb"))).sort((a, b) => Number(b) - Number(a))
    : [];
  return versions.length ? join(base, versions[0], "bin") : null;
}

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
  let pgBin = postgresBinDir();
  if (!pgBin) {
    aptInstall(["postgresql"], "the PostgreSQL server");
    pgBin = postgresBinDir() ?? fail("PostgreSQL was installed but no initdb was found under /usr/lib/postgresql");
  }
  const data = clusterDir();
  if (!existsSync(join(data, "PG_VERSION"))) {
    step(`Creating a private PostgreSQL cluster in ${data}…`);
    mkdirSync(data, { recursive: true, mode: 0o700 });
    if (isRoot) run("chown", ["postgres:postgres", data], "could not give the data folder to the postgres user");
    const [cmd, args] = asPostgres(join(pgBin, "initdb"), ["-D", data, "-U", "postgres", "--auth=trust", "-E", "UTF8", "--locale=C.UTF-8"]);
    run(cmd, args, "initdb failed", { capture: true });
  }
  const [sc, sa] = asPostgres(join(pgBin, "pg_ctl"), ["-D", data, "status"]);
  const running = spawnSync(sc, sa, { stdio: "ignore" }).status === 0;
  let startedHere = false;
  if (!running) {
    if (await portOpen(PORTS.postgres)) fail(`Port ${PORTS.postgres} is taken by another program; stop it or set DATABASE_URL`);
    step(`Starting PostgreSQL on 127.0.0.1:${PORTS.postgres}…`);
    const opts = `-c listen_addresses=127.0.0.1 -p ${PORTS.postgres} -k ${data}`;
    const [cmd, args] = asPostgres(join(pgBin, "pg_ctl"), ["-D", data, "-l", join(data, "server.log"), "-w", "-t", "30", "-o", opts, "start"]);
    run(cmd, args, `PostgreSQL did not start; see ${join(data, "server.log")}`, { capture: true });
    startedHere = true;
  }
  const stop = () => {
    const [cmd, args] = asPostgres(join(pgBin, "pg_ctl"), ["-D", data, "-m", "fast", "-w", "stop"]);
    spawnSync(cmd, args, { stdio: "ignore" });
  };
  return { external: false, startedHere, stop, psql: (db, sql) => psql(pgBin, data, db, sql) };
}

function psql(pgBin, data, db, sql) {
  const [cmd, args] = asPostgres(join(pgBin, "psql"), ["-h", data, "-p", String(PORTS.postgres), "-U", "postgres", "-d", db, "-tAc", sql]);
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

/** Applies pending migrations (and the demo seed) with the TypeScript migrator. */
export function migrate(databaseUrl, { seed = false } = {}) {
  step(seed ? "Migrating and seeding the demo…" : "Migrating…");
  const r = spawnSync(bin("tsx"), ["server/tools/migrate.ts", ...(seed ? ["--seed"] : [])], {
    cwd: ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl },
    stdio: childStdio(),
  });
  if (r.status !== 0) fail("Migration failed (see the message above)");
}
