// The suites of `npm test`, one after another, ending with one `N passed, M failed` line over all of them.
// Plain Node (called by the bootstrap); each suite's own runner writes a JSON report that is counted here.
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readFileSync, rmSync } from "node:fs";
import { join } from "node:path";
import { ROOT, PORTS, bin, step } from "./common.mjs";
import { buildClient } from "./build.mjs";

const reports = join(ROOT, ".data", "reports");

function check(name, cmd, args) {
  step(name);
  const r = spawnSync(cmd, args, { cwd: ROOT, stdio: "inherit" });
  return { name, passed: r.status === 0 ? 1 : 0, failed: r.status === 0 ? 0 : 1 };
}

function readJson(file) {
  return existsSync(file) ? JSON.parse(readFileSync(file, "utf8")) : null;
}

function vitest(databaseUrl) {
  step("Unit, algebra, cross-check and API tests (vitest)…");
  const out = join(reports, "vitest.json");
  const r = spawnSync(bin("vitest"), ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${out}`], {
    cwd: ROOT,
    stdio: "inherit",
    env: { ...process.env, DATABASE_URL: databaseUrl, NODE_ENV: "test" },
  });
  const json = readJson(out);
  if (!json) return { name: "vitest", passed: 0, failed: 1 };
  // A file that fails to load counts as a failure even though it ran no test.
  const brokenFiles = json.testResults.filter((f) => f.status === "failed" && f.assertionResults.length === 0).length;
  const failed = json.numFailedTests + brokenFiles + (r.status !== 0 && json.numFailedTests + brokenFiles === 0 ? 1 : 0);
  return { name: "vitest", passed: json.numPassedTests, failed };
}

async function waitFor(url, ms) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return true;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}

async function e2e(databaseUrl) {
  const clientDir = ".data/e2e-client";
  buildClient(clientDir);
  step(`Browser tests (Playwright, Chromium) against a test server on port ${PORTS.testApp}…`);
  const base = `http://127.0.0.1:${PORTS.testApp}`;
  const server = spawn(bin("tsx"), ["server/main.ts"], {
    cwd: ROOT,
    stdio: ["ignore", "ignore", "inherit"],
    env: {
      ...process.env,
      NODE_ENV: "test",
      DATABASE_URL: databaseUrl,
      PORT: String(PORTS.testApp),
      FAKE_MAIL_PORT: String(PORTS.testMail),
      PUBLIC_URL: base,
      CLIENT_DIR: clientDir,
      LOG_LEVEL: "warn",
      RATE_LIMIT_AUTH_PER_15_MIN: "10000", // every e2e test signs people up from one address
      RATE_LIMIT_SHARE_PER_MIN: "10000",
      RATE_LIMIT_UPLOADS_PER_15_MIN: "10000",
    },
  });
  try {
    if (!(await waitFor(`${base}/api/health`, 60_000))) return { name: "e2e", passed: 0, failed: 1 };
    const out = join(reports, "playwright.json");
    spawnSync(bin("playwright"), ["test", "--reporter=list,json"], {
      cwd: ROOT,
      stdio: "inherit",
      env: { ...process.env, E2E_BASE_URL: base, PLAYWRIGHT_JSON_OUTPUT_NAME: out },
    });
    const json = readJson(out);
    if (!json) return { name: "e2e", passed: 0, failed: 1 };
    const { expected = 0, unexpected = 0, flaky = 0 } = json.stats;
    return { name: "e2e", passed: expected + flaky, failed: unexpected };
  } finally {
    server.kill("SIGTERM");
  }
}

export async function runTests({ databaseUrl, started }) {
  rmSync(reports, { recursive: true, force: true });
  mkdirSync(reports, { recursive: true });
  const results = [
    check("Type check (tsc --noEmit)…", bin("tsc"), ["--noEmit", "-p", "tsconfig.json"]),
    check("Type check of shared/ alone: no DOM, no Node types (tsc -p shared/tsconfig.json)…", bin("tsc"), ["--noEmit", "-p", "shared/tsconfig.json"]),
    check("Lint, including the layout's import rules (eslint)…", bin("eslint"), ["."]),
    vitest(databaseUrl),
    await e2e(databaseUrl),
  ];
  const passed = results.reduce((n, r) => n + r.passed, 0);
  const failed = results.reduce((n, r) => n + r.failed, 0);
  for (const r of results) step(`${r.name}: ${r.passed} passed, ${r.failed} failed`);
  step(`Test run took ${((Date.now() - started) / 1000).toFixed(0)} s`);
  console.log(`${passed} passed, ${failed} failed`);
  return failed === 0 ? 0 : 1;
}
