import { createHash } from "node:crypto";
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Writable } from "node:stream";
import { pino } from "pino";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AuditEvent } from "@server/db/models/audit";
import { ShareLink } from "@server/db/models/shareLink";
import { Membership } from "@server/db/models/team";
import { createApp } from "@server/app";
import { ORIGIN, signedUp, startTestApp, type TestApp } from "./support/harness";
import { servoDocument } from "./support/servo";

// Share links follow the W3C TAG finding "Good Practices for Capability URLs" (2014): unguessable tokens,
// stored hashed, not logged, not indexed, no Referer leak, revocable and expiring; the rest is common practice.
let t: TestApp;
let owner: Awaited<ReturnType<typeof signedUp>>;
let editor: Awaited<ReturnType<typeof signedUp>>;
let viewer: Awaited<ReturnType<typeof signedUp>>;
let stranger: Awaited<ReturnType<typeof signedUp>>;
let teamId: string;
let diagramId: string;
let otherDiagramId: string;

const anonymous = () => request(t.app);
const tokenOf = (url: string) => url.slice(url.lastIndexOf("/") + 1);
const sha256 = (text: string) => createHash("sha256").update(text).digest("hex");

async function save(id: string, base: number, title: string) {
  const res = await owner.client.post(`/api/diagrams/${id}/versions`).send({ baseVersion: base, message: title, document: servoDocument(title) });
  expect(res.status).toBe(201);
}

async function share(body: unknown, who = editor) {
  return who.client.post(`/api/diagrams/${diagramId}/share-links`).send(body as object);
}

beforeAll(async () => {
  // A built client stand-in, so /s/:token has a page to serve.
  const clientDir = join(mkdtempSync(join(tmpdir(), "lw-share-")), "client");
  mkdirSync(clientDir, { recursive: true });
  writeFileSync(join(clientDir, "index.html"), "<!doctype html><head><title>Loopwright client</title></head>");
  t = await startTestApp({ CLIENT_DIR: clientDir });
  [owner, editor, viewer, stranger] = await Promise.all(["olga", "emil", "vic", "sten"].map((who) => signedUp(t, who)));
  teamId = (await owner.client.post("/api/teams").send({ name: "Dryer loops" })).body.team.id;
  await Membership.bulkCreate([
    { teamId, userId: editor.user.id, role: "editor" },
    { teamId, userId: viewer.user.id, role: "viewer" },
  ]);
  diagramId = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Drum temperature" })).body.diagram.id;
  otherDiagramId = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Secret fan loop" })).body.diagram.id;
  await save(diagramId, 0, "servo v1");
  await save(diagramId, 1, "servo v2");
  await save(otherDiagramId, 0, "other v1");
});
afterAll(() => t.close());

describe("creating share links", () => {
  it("answers 201 with the contract's shape: an absolute URL ending in /s/<token>, the version and the expiry", async () => {
    const before = Date.now();
    const res = await share({ version: 1, expiresInDays: 7 });
    expect(res.status).toBe(201);
    expect(Object.keys(res.body.shareLink).sort()).toEqual(["expiresAt", "id", "url", "version"]);
    const { url, version, expiresAt } = res.body.shareLink;
    expect(url.startsWith(`${ORIGIN}/s/`)).toBe(true);
    expect(version).toBe(1);
    const days = (Date.parse(expiresAt) - before) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThan(7.01);
    const latest = await share({ version: null, expiresInDays: null });
    expect(latest.status).toBe(201);
    expect(latest.body.shareLink).toMatchObject({ version: null, expiresAt: null });
  });

  it("makes tokens of at least 128 random bits (here 256), different every time", async () => {
    const tokens = await Promise.all([0, 1, 2].map(async () => tokenOf((await share({ version: null, expiresInDays: null })).body.shareLink.url)));
    for (const token of tokens) {
      expect(token).toMatch(/^[A-Za-z0-9_-]+$/);
      expect(Buffer.from(token, "base64url").length * 8).toBeGreaterThanOrEqual(128);
    }
    expect(new Set(tokens).size).toBe(3);
  });

  it("stores only the token's SHA-256 hash, never the token", async () => {
    const res = await share({ version: 2, expiresInDays: 30 });
    const token = tokenOf(res.body.shareLink.url);
    const [rows] = (await t.deps.sequelize.query("SELECT * FROM share_links WHERE id = :id", { replacements: { id: res.body.shareLink.id } })) as [Record<string, unknown>[], unknown];
    expect(rows).toHaveLength(1);
    expect(rows[0].token_hash).toBe(sha256(token));
    expect(JSON.stringify(rows[0])).not.toContain(token);
    const [audit] = (await t.deps.sequelize.query("SELECT * FROM audit_events WHERE subject = :id", { replacements: { id: res.body.shareLink.id } })) as [Record<string, unknown>[], unknown];
    expect(JSON.stringify(audit)).not.toContain(token);
  });

  it("refuses bad bodies with 422 naming the field, and a version that does not exist", async () => {
    for (const [body, field] of [
      [{ version: 0, expiresInDays: null }, "version"],
      [{ version: 1.5, expiresInDays: null }, "version"],
      [{ version: "1", expiresInDays: null }, "version"],
      [{ version: null, expiresInDays: 0 }, "expiresInDays"],
      [{ version: null, expiresInDays: 366 }, "expiresInDays"],
    ] as const) {
      const res = await share(body);
      expect(res.status, JSON.stringify(body)).toBe(422);
      expect(res.body.error.fields.map((f: { path: string }) => f.path)).toContain(field);
    }
    const missing = await share({ version: 99, expiresInDays: null });
    expect(missing.status).toBe(422);
    expect(missing.body.error.message).toContain("Version 99 of this diagram does not exist");
    const empty = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Nothing saved" })).body.diagram.id;
    const unsaved = await owner.client.post(`/api/diagrams/${empty}/share-links`).send({ version: null, expiresInDays: null });
    expect(unsaved.status).toBe(422);
    expect(unsaved.body.error.message).toContain("no saved version");
  });

  it("lets editors and owners share; viewers get 403, non-members 404, anonymous 401", async () => {
    expect((await share({ version: null, expiresInDays: null }, owner)).status).toBe(201);
    expect((await share({ version: null, expiresInDays: null }, viewer)).status).toBe(403);
    expect((await share({ version: null, expiresInDays: null }, stranger)).status).toBe(404);
    expect((await t.client().post(`/api/diagrams/${diagramId}/share-links`).send({ version: null, expiresInDays: null })).status).toBe(401);
  });
});

describe("listing and revoking", () => {
  it("lists a diagram's links without tokens, with creator, dates and counts", async () => {
    const created = (await share({ version: 1, expiresInDays: 3 })).body.shareLink;
    const res = await editor.client.get(`/api/diagrams/${diagramId}/share-links`);
    expect(res.status).toBe(200);
    const row = res.body.shareLinks.find((l: { id: string }) => l.id === created.id);
    expect(row).toMatchObject({
      id: created.id,
      version: 1,
      creator: { id: editor.user.id, name: "emil", email: editor.user.email },
      expiresAt: created.expiresAt,
      revokedAt: null,
      lastOpenedAt: null,
      timesOpened: 0,
    });
    expect(Object.keys(row).sort()).toEqual(["createdAt", "creator", "expiresAt", "id", "lastOpenedAt", "revokedAt", "timesOpened", "version"]);
    expect(JSON.stringify(res.body)).not.toContain(tokenOf(created.url));
    expect((await viewer.client.get(`/api/diagrams/${diagramId}/share-links`)).status).toBe(403);
    expect((await stranger.client.get(`/api/diagrams/${diagramId}/share-links`)).status).toBe(404);
  });

  it("lists the team's links with each diagram's title, for editors and owners", async () => {
    const mine = (await owner.client.post(`/api/diagrams/${otherDiagramId}/share-links`).send({ version: null, expiresInDays: null })).body.shareLink;
    const res = await editor.client.get(`/api/teams/${teamId}/share-links`);
    expect(res.status).toBe(200);
    expect(res.body.shareLinks.find((l: { id: string }) => l.id === mine.id)).toMatchObject({
      diagram: { id: otherDiagramId, title: "Secret fan loop" },
      version: null,
      creator: { name: "olga" },
    });
    expect(res.body.shareLinks.some((l: { diagram: { id: string } }) => l.diagram.id === diagramId)).toBe(true);
    expect(JSON.stringify(res.body)).not.toContain(tokenOf(mine.url));
    expect((await viewer.client.get(`/api/teams/${teamId}/share-links`)).status).toBe(403);
    expect((await stranger.client.get(`/api/teams/${teamId}/share-links`)).status).toBe(404);
  });

  it("revokes with 204: the link then answers 410 and the list shows when", async () => {
    const link = (await share({ version: null, expiresInDays: null })).body.shareLink;
    const token = tokenOf(link.url);
    expect((await anonymous().get(`/api/shared/${token}`)).status).toBe(200);
    expect((await viewer.client.delete(`/api/diagrams/${diagramId}/share-links/${link.id}`)).status).toBe(403);
    expect((await editor.client.delete(`/api/diagrams/${diagramId}/share-links/${link.id}`)).status).toBe(204);
    const gone = await anonymous().get(`/api/shared/${token}`);
    expect(gone.status).toBe(410);
    expect(gone.body.error.code).toBe("share_link_revoked");
    const row = (await editor.client.get(`/api/diagrams/${diagramId}/share-links`)).body.shareLinks.find((l: { id: string }) => l.id === link.id);
    expect(row.revokedAt).not.toBeNull();
    // Revoking again is harmless; another diagram's path does not reach this link.
    expect((await editor.client.delete(`/api/diagrams/${diagramId}/share-links/${link.id}`)).status).toBe(204);
    expect((await editor.client.delete(`/api/diagrams/${otherDiagramId}/share-links/${link.id}`)).status).toBe(404);
    expect((await editor.client.delete(`/api/diagrams/${diagramId}/share-links/not-an-id`)).status).toBe(404);
  });
});

describe("opening a link without a session", () => {
  it("gives exactly the title and the version: the fixed one, or always the latest", async () => {
    const fixed = tokenOf((await share({ version: 1, expiresInDays: null })).body.shareLink.url);
    const latest = tokenOf((await share({ version: null, expiresInDays: null })).body.shareLink.url);
    const one = await anonymous().get(`/api/shared/${fixed}`);
    expect(one.status).toBe(200);
    expect(Object.keys(one.body).sort()).toEqual(["diagram", "version"]);
    expect(one.body.diagram).toEqual({ title: "Drum temperature" });
    expect(Object.keys(one.body.version).sort()).toEqual(["document", "number", "result"]);
    expect(one.body.version.number).toBe(1);
    expect(one.body.version.document.title).toBe("servo v1");
    // T = K/(s^2 + 2s + K) (from memory: Ogata, Modern Control Engineering, the second-order servo).
    expect(one.body.version.result.ok).toBe(true);
    expect(one.body.version.result.result.transfers[0].denominator).toBe("s^2 + 2*s + K");
    const before = (await anonymous().get(`/api/shared/${latest}`)).body.version.number;
    await save(diagramId, before, "servo v3");
    expect((await anonymous().get(`/api/shared/${latest}`)).body.version.number).toBe(before + 1);
    expect((await anonymous().get(`/api/shared/${fixed}`)).body.version.number).toBe(1);
  });

  it("answers 404 for an unknown token and 410 for an expired link", async () => {
    expect((await anonymous().get(`/api/shared/${"A".repeat(43)}`)).status).toBe(404);
    expect((await anonymous().get("/api/shared/short")).status).toBe(404);
    const link = (await share({ version: null, expiresInDays: 1 })).body.shareLink;
    await ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: link.id } });
    const res = await anonymous().get(`/api/shared/${tokenOf(link.url)}`);
    expect(res.status).toBe(410);
    expect(res.body.error.code).toBe("share_link_expired");
  });

  it("counts openings, moves last opened, and records created, opened (counted) and revoked in the audit trail", async () => {
    const link = (await share({ version: 2, expiresInDays: null })).body.shareLink;
    const token = tokenOf(link.url);
    const started = Date.now() - 1000;
    await anonymous().get(`/api/shared/${token}`).expect(200);
    await anonymous().get(`/api/shared/${token}`).expect(200);
    // Loading the page is not an opening of the data.
    await anonymous().get(`/s/${token}`).set("Accept", "text/html").expect(200);
    const row = (await editor.client.get(`/api/diagrams/${diagramId}/share-links`)).body.shareLinks.find((l: { id: string }) => l.id === link.id);
    expect(row.timesOpened).toBe(2);
    expect(Date.parse(row.lastOpenedAt)).toBeGreaterThan(started);
    await editor.client.delete(`/api/diagrams/${diagramId}/share-links/${link.id}`).expect(204);
    const events = await AuditEvent.findAll({ where: { subject: link.id }, order: [["id", "ASC"]] });
    expect(events.map((e) => [e.kind, e.count, e.actorId, e.teamId, e.diagramId])).toEqual([
      ["share_link.created", 1, editor.user.id, teamId, diagramId],
      ["share_link.opened", 2, null, teamId, diagramId],
      ["share_link.revoked", 1, editor.user.id, teamId, diagramId],
    ]);
  });

  it("grants nothing else: no other diagram, version list, team, member list or write", async () => {
    const token = tokenOf((await share({ version: null, expiresInDays: null })).body.shareLink.url);
    const other = await anonymous().get(`/api/shared/${token}`);
    expect(JSON.stringify(other.body)).not.toContain("Secret fan loop");
    expect(JSON.stringify(other.body)).not.toContain(teamId);
    expect(JSON.stringify(other.body)).not.toContain(diagramId);
    // Holding the link opens no session: the team's API stays closed to its reader.
    const reader = t.client();
    await reader.get(`/api/shared/${token}`).expect(200);
    await reader.get(`/s/${token}`).set("Accept", "text/html").expect(200);
    for (const path of [
      `/api/diagrams/${diagramId}`,
      `/api/diagrams/${otherDiagramId}`,
      `/api/diagrams/${diagramId}/versions`,
      `/api/diagrams/${diagramId}/versions/1`,
      `/api/diagrams/${diagramId}/share-links`,
      `/api/teams/${teamId}`,
      `/api/teams/${teamId}/members`,
      `/api/teams/${teamId}/diagrams`,
      `/api/teams/${teamId}/share-links`,
    ])
      expect((await reader.get(path)).status, path).toBe(401);
    const write = await reader.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 3, document: servoDocument("x") });
    expect(write.status).toBe(401);
    // Nothing hangs below the token but what it grants.
    for (const path of ["versions", "versions/1", "team", "members"]) expect((await reader.get(`/api/shared/${token}/${path}`)).status, path).toBe(404);
    for (const method of ["post", "put", "patch", "delete"] as const) expect((await reader[method](`/api/shared/${token}`)).status, method).toBe(404);
  });
});

describe("the page and the headers", () => {
  const expectCapabilityHeaders = (res: request.Response) => {
    expect(res.headers["x-robots-tag"]).toBe("noindex");
    expect(res.headers["referrer-policy"]).toBe("no-referrer");
    expect(res.headers["cache-control"]).toBe("no-store");
  };

  it("serves the client for a working link, a clear 410 page for a revoked one and a 404 page for an unknown one", async () => {
    const link = (await share({ version: null, expiresInDays: null })).body.shareLink;
    const token = tokenOf(link.url);
    const page = await anonymous().get(`/s/${token}`).set("Accept", "text/html");
    expect(page.status).toBe(200);
    expect(page.text).toContain("Loopwright client");
    expectCapabilityHeaders(page);
    await editor.client.delete(`/api/diagrams/${diagramId}/share-links/${link.id}`).expect(204);
    const gone = await anonymous().get(`/s/${token}`).set("Accept", "text/html");
    expect(gone.status).toBe(410);
    expect(gone.type).toBe("text/html");
    expect(gone.text).toContain("This share link no longer works");
    expect(gone.text).toContain("revoked");
    expectCapabilityHeaders(gone);
    const unknown = await anonymous().get(`/s/${"b".repeat(43)}`).set("Accept", "text/html");
    expect(unknown.status).toBe(404);
    expect(unknown.text).toContain("This share link does not exist");
    expectCapabilityHeaders(unknown);
  });

  it("sends the capability headers on every /api/shared answer", async () => {
    const token = tokenOf((await share({ version: null, expiresInDays: null })).body.shareLink.url);
    expectCapabilityHeaders(await anonymous().get(`/api/shared/${token}`));
    expectCapabilityHeaders(await anonymous().get(`/api/shared/${"c".repeat(43)}`));
  });

  it("never logs a token: /s/ and /api/shared/ paths are logged redacted", async () => {
    const lines: string[] = [];
    const sink = new Writable({ write: (chunk, _enc, done) => (lines.push(String(chunk)), done()) });
    const logged = createApp({ ...t.deps, log: pino({ level: "info" }, sink) });
    const link = (await share({ version: null, expiresInDays: null })).body.shareLink;
    const token = tokenOf(link.url);
    await request(logged).get(`/s/${token}`).set("Accept", "text/html").expect(200);
    await request(logged).get(`/api/shared/${token}`).expect(200);
    await request(logged).get(`/api/shared/${token}?x=1`).expect(200);
    await editor.client.delete(`/api/diagrams/${diagramId}/share-links/${link.id}`).expect(204);
    await request(logged).get(`/api/shared/${token}`).expect(410);
    const paths = lines.map((l) => JSON.parse(l).path);
    expect(paths).toEqual(["/s/[token]", "/api/shared/[token]", "/api/shared/[token]", "/api/shared/[token]"]);
    expect(lines.join("")).not.toContain(token);
  });
});
