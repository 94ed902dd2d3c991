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
  writeFileSync(join(dir, "index.html"), "<!doctype html><head><title>Loopwright</title></head>");
  // Shaped like Vite's build manifest (its documented fields: file, isEntry, imports, css).
  mkdirSync(join(dir, ".vite"));
  const manifest = {
    "index.html": { file: "assets/index-1.js", isEntry: true, imports: ["_shared-3.js"] },
    "src/app/routes/DiagramRoute.tsx": { file: "assets/DiagramRoute-2.js", isDynamicEntry: true, imports: ["index.html", "_shared-3.js", "_editor-4.js"], css: ["assets/DiagramRoute-2.css"] },
    "_shared-3.js": { file: "assets/shared-3.js" },
    "_editor-4.js": { file: "assets/editor-4.js", imports: ["_shared-3.js"] },
  };
  writeFileSync(join(dir, ".vite", "manifest.json"), JSON.stringify(manifest));
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

it("announces the editor's chunks and the diagram's data in the HTML of a diagram's link, and only there", async () => {
  const id = "4b1e7f3a-9c2d-4e5f-8a6b-1c2d3e4f5a6b";
  const diagram = await request(t.app).get(`/diagrams/${id}`).set("Accept", "text/html");
  expect(diagram.status).toBe(200);
  expect(diagram.text).toContain('<link rel="modulepreload" crossorigin href="/assets/DiagramRoute-2.js">');
  expect(diagram.text).toContain('<link rel="modulepreload" crossorigin href="/assets/editor-4.js">');
  expect(diagram.text).toContain('<link rel="stylesheet" crossorigin href="/assets/DiagramRoute-2.css">');
  expect(diagram.text).toContain(`<link rel="preload" as="fetch" crossorigin="anonymous" href="/api/diagrams/${id}">`);
  expect(diagram.text).toContain('<link rel="preload" as="fetch" crossorigin="anonymous" href="/api/auth/me">');
  // The entry, and what it imports, are already the page's own scripts.
  expect(diagram.text).not.toContain("index-1.js");
  expect(diagram.text).not.toContain("shared-3.js");
  // An id that is not one is never written into the page; the code is still announced.
  const odd = await request(t.app).get('/diagrams/"><script>x').set("Accept", "text/html");
  expect(odd.text).not.toContain("<script>x");
  expect(odd.text).not.toContain('as="fetch"');
  expect(odd.text).toContain("DiagramRoute-2.js");
  const team = await request(t.app).get("/teams/123").set("Accept", "text/html");
  expect(team.text).not.toContain("modulepreload");
  // The manifest itself is not served (dot-folders are not static files; the path gets the plain page).
  expect((await request(t.app).get("/.vite/manifest.json")).text).not.toContain("isEntry");
});

it("sends a Content-Security-Policy that allows only this origin, and no inline script (common practice: CSP Level 3)", async () => {
  const page = await request(t.app).get("/teams/123").set("Accept", "text/html");
  const csp = Object.fromEntries(
    String(page.headers["content-security-policy"]).split(";").map((d) => d.trim().split(/\s+/)).map(([name, ...values]) => [name, values]),
  );
  expect(csp["default-src"]).toEqual(["'self'"]);
  expect(csp["script-src"]).toEqual(["'self'"]);
  expect(csp["script-src-attr"]).toEqual(["'none'"]);
  expect(csp["object-src"]).toEqual(["'none'"]);
  // No other origin anywhere: every source is 'self', a keyword, or data:/blob: for generated images and fonts.
  for (const [name, values] of Object.entries(csp)) {
    for (const v of values as string[]) expect(v, name).toMatch(/^('[a-z-]+'|data:|blob:)$/);
  }
});
