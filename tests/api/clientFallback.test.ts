import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import request from "supertest";
import { afterAll, beforeAll, expect, it } from "vitest";
import { startTestApp, type TestApp } from "./support/harness";

// The built client may live under a dot-folder (the test run builds into .data/): it must still be served.
let t: TestApp;
beforeAll(async () => {
  const dir = join(mkdtempSync(join(tmpdir(), "lw-")), ".data", "client");
  mkdirSync(join(dir, "assets"), { recursive: true });
  writeFileSync(join(dir, "index.html"), "<!doctype html><title>Loopwright</title>");
  writeFileSync(join(dir, "assets", "app.js"), "console.log(1)");
  t = await startTestApp({ CLIENT_DIR: dir });
});
afterAll(() => t.close());

it("serves the client for app routes, its assets, and JSON 404s under /api", async () => {
  const page = await request(t.app).get("/teams/123").set("Accept", "text/html");
  expect(page.status).toBe(200);
  expect(page.text).toContain("<title>Loopwright</title>");
  expect((await request(t.app).get("/assets/app.js")).status).toBe(200);
  const api = await request(t.app).get("/api/nothing").set("Accept", "text/html");
  expect(api.status).toBe(404);
  expect(api.body.error.code).toBe("not_found");
});
