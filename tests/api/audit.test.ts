import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AUDIT_KINDS, auditPageSchema, type AuditEventView, type AuditKind } from "@shared/api/audit";
import { AuditEvent } from "@server/db/models/audit";
import { invitationToken, PASSWORD, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";
import { servoDocument } from "./support/servo";

// The team's audit trail through HTTP on the real database: every kind is recorded by doing the thing through
// the API; keyset pagination is checked for gaps and repeats (common practice for cursor pagination).
type Client = ReturnType<TestApp["client"]>;
let t: TestApp;
let owner: Awaited<ReturnType<typeof signedUp>>;
let editor: { client: Client; id: string };
let viewer: { client: Client; id: string };
let stranger: Awaited<ReturnType<typeof signedUp>>;
let teamId: string;
let diagramId: string;

const trail = (query: Record<string, string | number> = {}, who: Client = owner.client) =>
  who.get(`/api/teams/${teamId}/audit`).query(query);

async function events(query: Record<string, string | number> = {}): Promise<AuditEventView[]> {
  const res = await trail({ limit: 100, ...query });
  expect(res.status).toBe(200);
  return auditPageSchema.parse(res.body).events;
}

/** Joins a new account to the team through the real invitation flow. */
async function join(name: string, role: "viewer" | "editor"): Promise<{ client: Client; id: string }> {
  const email = uniqueEmail(name.toLowerCase());
  await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role }).expect(201);
  const client = t.client();
  const id = (await client.post("/api/auth/sign-up").send({ name, email, password: PASSWORD }).expect(201)).body.user.id;
  await client.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
  return { client, id };
}

beforeAll(async () => {
  t = await startTestApp();
  owner = await signedUp(t, "Oda");
  stranger = await signedUp(t, "Stig");
  teamId = (await owner.client.post("/api/teams").send({ name: "Press line" })).body.team.id;
  editor = await join("Ana", "viewer");
  await owner.client.patch(`/api/teams/${teamId}/members/${editor.id}`).send({ role: "editor" }).expect(200);
  viewer = await join("Vik", "viewer");
  diagramId = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Ram position" })).body.diagram.id;
  await editor.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 0, message: "first", document: servoDocument("Ram position") }).expect(201);
  await owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 1, message: "second", document: servoDocument("Ram position") }).expect(201);
  await owner.client.post(`/api/diagrams/${diagramId}/versions/1/restore`).expect(201);
});
afterAll(() => t.close());

describe("what the trail records", () => {
  it("records creating a diagram and saving and restoring versions, with who and which diagram", async () => {
    const created = await events({ kind: "diagram.created", diagram: diagramId });
    expect(created).toHaveLength(1);
    expect(created[0]).toMatchObject({ actor: { id: owner.user.id, name: "Oda" }, diagram: { id: diagramId, title: "Ram position" }, detail: { title: "Ram position" } });
    const saved = await events({ kind: "version.saved", diagram: diagramId });
    expect(saved.map((e) => [e.subject, e.actor?.name])).toEqual([["3", "Oda"], ["2", "Oda"], ["1", "Ana"]]);
    const restored = await events({ kind: "version.restored", diagram: diagramId });
    expect(restored.map((e) => [e.subject, e.detail.from])).toEqual([["3", 1]]);
  });

  it("records an import with the file's name, as one row that is not also a plain creation", async () => {
    const file = Buffer.from(JSON.stringify(servoDocument("Cushion pressure")));
    const res = await editor.client.post(`/api/teams/${teamId}/diagrams/import`).attach("file", file, { filename: "cushion.json", contentType: "application/json" });
    expect(res.status).toBe(201);
    const id = res.body.diagram.id;
    const rows = await events({ diagram: id });
    expect(rows.map((e) => e.kind).sort()).toEqual(["diagram.imported", "version.saved"]);
    expect(rows.find((e) => e.kind === "diagram.imported")).toMatchObject({
      actor: { id: editor.id },
      diagram: { id, title: "Cushion pressure" },
      detail: { title: "Cushion pressure", fileName: "cushion.json" },
    });
  });

  it("records a share link made, opened (one row counting the openings) and revoked", async () => {
    const made = await owner.client.post(`/api/diagrams/${diagramId}/share-links`).send({ version: 2, expiresInDays: null });
    const { id, url } = made.body.shareLink;
    for (let i = 0; i < 4; i++) await request(t.app).get(`/api/shared/${url.split("/s/")[1]}`).expect(200);
    await owner.client.delete(`/api/diagrams/${diagramId}/share-links/${id}`).expect(204);
    const rows = (await events({ diagram: diagramId })).filter((e) => e.subject === id);
    expect(rows.map((e) => [e.kind, e.count])).toEqual([["share_link.revoked", 1], ["share_link.opened", 4], ["share_link.created", 1]]);
    expect(rows[1].actor).toBeNull();
  });

  it("records a role change from what to what, naming the member", async () => {
    const [change] = await events({ kind: "member.role_changed", actor: owner.user.id });
    expect(change).toMatchObject({ subject: editor.id, actor: { name: "Oda" }, diagram: null, detail: { name: "Ana", from: "viewer", to: "editor" } });
    // Setting the role a member already has changes nothing and records nothing.
    await owner.client.patch(`/api/teams/${teamId}/members/${editor.id}`).send({ role: "editor" }).expect(200);
    expect(await events({ kind: "member.role_changed" })).toHaveLength(1);
  });

  it("records invitations sent, accepted and revoked, with the invited e-mail", async () => {
    const sent = await events({ kind: "invitation.sent" });
    const accepted = await events({ kind: "invitation.accepted" });
    expect(sent.map((e) => e.detail.role)).toEqual(["viewer", "viewer"]);
    expect(accepted.map((e) => e.actor?.name)).toEqual(["Vik", "Ana"]);
    expect(accepted.map((e) => e.subject)).toEqual(sent.map((e) => e.subject));
    const email = uniqueEmail("later");
    const invitation = (await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "editor" }).expect(201)).body.invitation;
    await owner.client.delete(`/api/teams/${teamId}/invitations/${invitation.id}`).expect(204);
    const [revoked] = await events({ kind: "invitation.revoked" });
    expect(revoked).toMatchObject({ subject: invitation.id, actor: { id: owner.user.id }, detail: { email, role: "editor" } });
  });

  it("records nothing, and keeps the older invitation, when the invitation e-mail cannot be sent", async () => {
    const email = uniqueEmail("unlucky");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
    const before = (await events({ kind: "invitation.sent" })).length;
    const send = t.deps.mailer.send;
    t.deps.mailer.send = () => Promise.reject(new Error("mail server down"));
    try {
      expect((await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "editor" })).status).toBe(502);
    } finally {
      t.deps.mailer.send = send;
    }
    expect(await events({ kind: "invitation.sent" })).toHaveLength(before);
    const pending = (await owner.client.get(`/api/teams/${teamId}/members`)).body.invitations as { email: string; role: string }[];
    expect(pending.filter((i) => i.email === email).map((i) => i.role)).toEqual(["viewer"]);
  });

  it("records a thread resolved and reopened", async () => {
    const thread = (await viewer.client.post(`/api/diagrams/${diagramId}/versions/2/comments`).send({ body: "Stroke limit?" })).body.thread.id;
    await viewer.client.post(`/api/diagrams/${diagramId}/comments/${thread}/resolve`).expect(200);
    await owner.client.post(`/api/diagrams/${diagramId}/comments/${thread}/reopen`).expect(200);
    const rows = (await events({ diagram: diagramId })).filter((e) => e.subject === thread);
    expect(rows.map((e) => [e.kind, e.actor?.name])).toEqual([["comment.reopened", "Oda"], ["comment.resolved", "Vik"]]);
  });

  it("records a member removed by an owner and one who left, keeping who they were", async () => {
    const leaver = await join("Lou", "viewer");
    const removed = await join("Rui", "viewer");
    await leaver.client.delete(`/api/teams/${teamId}/members/${leaver.id}`).expect(204);
    await owner.client.delete(`/api/teams/${teamId}/members/${removed.id}`).expect(204);
    const rows = await events({ kind: "member.removed" });
    expect(rows.map((e) => [e.subject, e.actor?.name, e.detail.name, e.detail.left])).toEqual([
      [removed.id, "Oda", "Rui", false],
      [leaver.id, "Lou", "Lou", true],
    ]);
  });

  it("has by now a row of every kind, newest first", async () => {
    const all = await events();
    expect(new Set(all.map((e) => e.kind))).toEqual(new Set<AuditKind>(AUDIT_KINDS));
    const order = all.map((e) => [Date.parse(e.at), Number(e.id)]);
    expect(order).toEqual([...order].sort((a, b) => b[0] - a[0] || b[1] - a[1]));
  });
});

describe("filters", () => {
  it("filters by person, kind and diagram, alone and together", async () => {
    const byAna = await events({ actor: editor.id });
    expect(byAna.length).toBeGreaterThan(0);
    expect(byAna.every((e) => e.actor?.id === editor.id)).toBe(true);
    const onDiagram = await events({ diagram: diagramId });
    expect(onDiagram.every((e) => e.diagram?.id === diagramId)).toBe(true);
    const both = await events({ actor: editor.id, kind: "version.saved", diagram: diagramId });
    expect(both.map((e) => e.subject)).toEqual(["1"]);
    expect(await events({ actor: stranger.user.id })).toEqual([]);
  });

  it("never shows another team's rows, even for that team's diagram id", async () => {
    const otherTeam = (await stranger.client.post("/api/teams").send({ name: "Other" })).body.team.id;
    const otherDiagram = (await stranger.client.post(`/api/teams/${otherTeam}/diagrams`).send({ title: "Theirs" })).body.diagram.id;
    expect(await events({ diagram: otherDiagram })).toEqual([]);
    expect((await stranger.client.get(`/api/teams/${otherTeam}/audit`)).body.events.map((e: AuditEventView) => e.kind)).toEqual(["diagram.created"]);
  });
});

describe("pages", () => {
  async function walk(id: string, query: Record<string, string | number>, who: Client): Promise<{ pages: string[][]; all: string[] }> {
    const pages: string[][] = [];
    let before: string | null = null;
    do {
      const res = await who.get(`/api/teams/${id}/audit`).query(before ? { ...query, before } : query);
      expect(res.status).toBe(200);
      pages.push(res.body.events.map((e: AuditEventView) => e.id));
      before = res.body.nextCursor;
    } while (before && pages.length < 20);
    return { pages, all: (await who.get(`/api/teams/${id}/audit`).query({ ...query, limit: 100 })).body.events.map((e: AuditEventView) => e.id) };
  }

  it("walks 7 events 3 at a time with no gap and no repeat, the last page saying there is no next", async () => {
    const fresh = await signedUp(t, "Pia");
    const id = (await fresh.client.post("/api/teams").send({ name: "Pages" })).body.team.id;
    for (let i = 1; i <= 7; i++) await fresh.client.post(`/api/teams/${id}/diagrams`).send({ title: `Loop ${i}` }).expect(201);
    const { pages, all } = await walk(id, { limit: 3 }, fresh.client);
    expect(pages.map((p) => p.length)).toEqual([3, 3, 1]);
    expect(pages.flat()).toEqual(all);
    expect(new Set(all).size).toBe(7);
    const titles = (await fresh.client.get(`/api/teams/${id}/audit`)).body.events.map((e: AuditEventView) => e.detail.title);
    expect(titles).toEqual(["Loop 7", "Loop 6", "Loop 5", "Loop 4", "Loop 3", "Loop 2", "Loop 1"]);
  });

  it("keeps rows stored in the same microsecond apart by id, and pages a filtered trail the same way", async () => {
    const fresh = await signedUp(t, "Ike");
    const id = (await fresh.client.post("/api/teams").send({ name: "Ties" })).body.team.id;
    const at = new Date("2026-11-30T08:00:00.123Z");
    await AuditEvent.bulkCreate(
      [1, 2, 3, 4, 5].map((n) => ({ teamId: id, actorId: fresh.user.id, kind: "version.saved" as const, subject: String(n), at })),
    );
    const { pages, all } = await walk(id, { limit: 2, kind: "version.saved" }, fresh.client);
    expect(pages.map((p) => p.length)).toEqual([2, 2, 1]);
    expect(pages.flat()).toEqual(all);
    expect(new Set(all).size).toBe(5);
  });

  it("answers 50 events when no limit is asked for", async () => {
    const fresh = await signedUp(t, "Max");
    const id = (await fresh.client.post("/api/teams").send({ name: "Many" })).body.team.id;
    await AuditEvent.bulkCreate(Array.from({ length: 51 }, (_, n) => ({ teamId: id, actorId: null, kind: "share_link.revoked" as const, subject: `l${n}` })));
    const res = await fresh.client.get(`/api/teams/${id}/audit`);
    expect(res.body.events).toHaveLength(50);
    expect(res.body.nextCursor).toEqual(expect.any(String));
  });
});

describe("who may read it, and bad queries", () => {
  it("answers 403 to editors and viewers, 404 to a non-member and for a malformed team id", async () => {
    expect((await trail({}, editor.client)).status).toBe(403);
    expect((await trail({}, viewer.client)).status).toBe(403);
    const hidden = await trail({}, stranger.client);
    expect(hidden.status).toBe(404);
    expect(hidden.body.error.code).toBe("not_found");
    expect((await owner.client.get("/api/teams/not-a-team/audit")).status).toBe(404);
    expect((await request(t.app).get(`/api/teams/${teamId}/audit`)).status).toBe(401);
  });

  it.each([
    ["kind", { kind: "version.deleted" }],
    ["kind", { kind: ["version.saved", "version.restored"] }],
    ["limit", { limit: 0 }],
    ["limit", { limit: 101 }],
    ["limit", { limit: "2.5" }],
    ["limit", { limit: "many" }],
    ["before", { before: "not-a-cursor" }],
    ["before", { before: "1764756000123456.4.2" }],
    ["diagram", { diagram: "42" }],
  ])("answers 400 naming %s for %j", async (field, query) => {
    const res = await trail(query as Record<string, string | number>);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("validation");
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual([field]);
    expect(res.body.error.message).toContain(field);
  });
});
