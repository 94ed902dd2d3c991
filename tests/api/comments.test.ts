import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import type { ThreadView } from "@shared/api/comments";
import { createApp } from "@server/app";
import { AuditEvent } from "@server/db/models/audit";
import { pinsForVersion } from "@server/features/comments/pins";
import { invitationToken, ORIGIN, PASSWORD, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";
import { servoDocument } from "./support/servo";

// Review comments through HTTP against the real database and the fake mail service (common practice for
// review tools: every member may comment, the diagram's author and the thread's participants hear of it).

type Client = ReturnType<TestApp["client"]>;
type Member = { client: Client; user: { id: string; email: string; name: string } };

let t: TestApp;
let owner: Member;
let editor: Member;
let viewer: Member;
let stranger: Member;
let teamId: string;
let diagramId: string;

async function joined(role: "viewer" | "editor", name: string): Promise<Member> {
  const email = uniqueEmail(name.toLowerCase());
  await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role }).expect(201);
  const client = t.client();
  const res = await client.post("/api/auth/sign-up").send({ name, email, password: PASSWORD }).expect(201);
  await client.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
  return { client, user: res.body.user };
}

const comments = (n = 1) => `/api/diagrams/${diagramId}/versions/${n}/comments`;
const mailsTo = (who: Member) => t.mailbox.messages.filter((m) => m.to.includes(who.user.email));
const link = (commentId: string, version = 1) => `${ORIGIN}/diagrams/${diagramId}?version=${version}&comment=${commentId}`;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signedUp(t, "Odile");
  teamId = (await owner.client.post("/api/teams").send({ name: "Winder tension" })).body.team.id;
  editor = await joined("editor", "Emeric");
  viewer = await joined("viewer", "Vanya");
  stranger = await signedUp(t, "Stellan");
  diagramId = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Dancer arm loop" })).body.diagram.id;
  // The editor saves version 1: the diagram's creator (owner) and the version's author (editor) differ.
  await editor.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 0, document: servoDocument("Dancer arm") }).expect(201);
});
afterAll(() => t.close());

describe("threads on a version", () => {
  let pinned: ThreadView;

  it("lets a viewer start a thread pinned to a block, and mails the diagram's creator and the version's author, not the writer", async () => {
    const before = t.mailbox.messages.length;
    const res = await viewer.client.post(comments()).send({ body: "  Is K in N/m here?  ", pin: { blockId: "g" } });
    expect(res.status).toBe(201);
    pinned = res.body.thread;
    expect(pinned).toMatchObject({
      number: 1,
      versionNumber: 1,
      body: "Is K in N/m here?",
      pin: { blockId: "g" },
      author: { id: viewer.user.id, name: "Vanya" },
      resolvedAt: null,
      resolvedBy: null,
      replies: [],
    });
    expect(t.mailbox.messages.length - before).toBe(2);
    for (const who of [owner, editor]) {
      const mail = mailsTo(who)[0];
      expect(mail.subject).toBe("Vanya commented on Dancer arm loop v1");
      expect(mail.text).toContain("Is K in N/m here?");
      expect(mail.text).toContain("block g");
      expect(mail.text).toContain(link(pinned.id));
      expect(mail.html).toContain(`href="${link(pinned.id).replace(/&/g, "&#38;")}"`);
    }
    expect(mailsTo(viewer).some((m) => m.text.includes(pinned.id))).toBe(false);
  });

  it("pins to a wire, and refuses a pin naming a block or wire the version does not have, creating nothing", async () => {
    const wire = await owner.client.post(comments()).send({ body: "Feedback sign checked.", pin: { wireId: "w4" } });
    expect(wire.status).toBe(201);
    expect(wire.body.thread).toMatchObject({ number: 2, pin: { wireId: "w4" } });

    const count = (await owner.client.get(comments())).body.threads.length;
    const block = await owner.client.post(comments()).send({ body: "Where?", pin: { blockId: "zz" } });
    expect(block.status).toBe(422);
    expect(block.body.error.code).toBe("unknown_pin_target");
    expect(block.body.error.message).toBe('Version 1 has no block "zz".');
    expect(block.body.error.fields).toEqual([{ path: "pin.blockId", message: 'Version 1 has no block "zz".' }]);
    const missingWire = await owner.client.post(comments()).send({ body: "Where?", pin: { wireId: "w9" } });
    expect(missingWire.status).toBe(422);
    expect(missingWire.body.error.message).toContain('"w9"');
    const both = await owner.client.post(comments()).send({ body: "Where?", pin: { blockId: "g", wireId: "w4" } });
    expect(both.status).toBe(422);
    expect((await owner.client.get(comments())).body.threads.length).toBe(count);
  });

  it("refuses an empty or over-long body naming the field", async () => {
    const empty = await owner.client.post(comments()).send({ body: "   " });
    expect(empty.status).toBe(422);
    expect(empty.body.error.fields[0].path).toBe("body");
    const long = await owner.client.post(comments()).send({ body: "x".repeat(4001) });
    expect(long.status).toBe(422);
    expect(long.body.error.fields[0]).toEqual({ path: "body", message: "Use at most 4000 characters" });
    expect((await owner.client.post(comments()).send({ body: "x".repeat(4000) })).status).toBe(201);
  });

  it("answers 404 for a version that does not exist", async () => {
    expect((await owner.client.get(comments(9))).status).toBe(404);
    expect((await owner.client.post(comments(9)).send({ body: "Hello" })).status).toBe(404);
  });

  it("adds replies, mailing the author and every participant but the writer, with a link to the reply", async () => {
    const before = t.mailbox.messages.length;
    const res = await editor.client.post(`/api/diagrams/${diagramId}/comments/${pinned.id}/replies`).send({ body: "Yes, N/m." });
    expect(res.status).toBe(201);
    expect(res.body.comment).toMatchObject({ body: "Yes, N/m.", author: { name: "Emeric" } });
    expect(res.body.thread.replies.map((r: { id: string }) => r.id)).toEqual([res.body.comment.id]);
    // Owner (creator) and viewer (started the thread); the editor wrote it.
    const sent = t.mailbox.messages.slice(0, t.mailbox.messages.length - before);
    expect(sent.map((m) => m.to).sort()).toEqual([owner.user.email, viewer.user.email].sort());
    expect(sent[0].subject).toBe("Emeric replied on Dancer arm loop v1");
    expect(sent[0].text).toContain(link(res.body.comment.id));

    // A reply to a reply joins the same thread.
    const again = await viewer.client.post(`/api/diagrams/${diagramId}/comments/${res.body.comment.id}/replies`).send({ body: "Thanks." });
    expect(again.status).toBe(201);
    expect(again.body.thread.id).toBe(pinned.id);
  });

  it("lists the version's threads oldest first with their replies", async () => {
    const res = await viewer.client.get(comments());
    expect(res.status).toBe(200);
    const threads = res.body.threads as ThreadView[];
    expect(threads.map((x) => x.number)).toEqual([1, 2, 3]);
    expect(threads[0].id).toBe(pinned.id);
    expect(threads[0].replies.map((r) => r.body)).toEqual(["Yes, N/m.", "Thanks."]);
  });

  it("resolves and reopens a thread for a viewer, recording each in the audit trail once", async () => {
    const url = (action: string) => `/api/diagrams/${diagramId}/comments/${pinned.id}/${action}`;
    const resolved = await viewer.client.post(url("resolve"));
    expect(resolved.status).toBe(200);
    expect(resolved.body.thread).toMatchObject({ id: pinned.id, resolvedBy: { id: viewer.user.id, name: "Vanya" } });
    expect(Date.parse(resolved.body.thread.resolvedAt)).not.toBeNaN();
    expect((await viewer.client.post(url("resolve"))).status).toBe(200); // again: nothing changes
    const reopened = await owner.client.post(url("reopen"));
    expect(reopened.status).toBe(200);
    expect(reopened.body.thread).toMatchObject({ resolvedAt: null, resolvedBy: null });

    const rows = await AuditEvent.findAll({ where: { subject: pinned.id }, order: [["id", "ASC"]] });
    expect(rows.map((r) => [r.kind, r.actorId, r.teamId, r.diagramId])).toEqual([
      ["comment.resolved", viewer.user.id, teamId, diagramId],
      ["comment.reopened", owner.user.id, teamId, diagramId],
    ]);
  });

  it("gives the pins of a version for the export, numbered as the panel numbers threads, resolved ones on request", async () => {
    await owner.client.post(`/api/diagrams/${diagramId}/comments/${pinned.id}/resolve`).expect(200);
    const threads = (await owner.client.get(comments())).body.threads as ThreadView[];
    const wireThread = threads.find((x) => x.pin && "wireId" in x.pin)!;
    expect(await pinsForVersion(diagramId, 1, { includeResolved: false })).toEqual([{ id: wireThread.id, target: { wireId: "w4" }, label: "2" }]);
    expect(await pinsForVersion(diagramId, 1, { includeResolved: true })).toEqual([
      { id: pinned.id, target: { blockId: "g" }, label: "1" },
      { id: wireThread.id, target: { wireId: "w4" }, label: "2" },
    ]);
    await owner.client.post(`/api/diagrams/${diagramId}/comments/${pinned.id}/reopen`).expect(200);
  });
});

describe("who may comment", () => {
  it("hides every comment route from a non-member behind 404, and asks the signed-out to sign in", async () => {
    const calls = (c: Client) => [
      c.get(comments()),
      c.post(comments()).send({ body: "Let me in" }),
      c.post(`/api/diagrams/${diagramId}/comments/${"0".repeat(8)}-0000-4000-8000-${"0".repeat(12)}/replies`).send({ body: "x" }),
    ];
    for (const res of await Promise.all(calls(stranger.client))) expect(res.status).toBe(404);
    for (const res of await Promise.all(calls(t.client()))) expect(res.status).toBe(401);
  });

  it("answers 404 for a comment of another diagram", async () => {
    const other = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Other loop" })).body.diagram.id;
    const thread = (await owner.client.get(comments())).body.threads[0] as ThreadView;
    const res = await owner.client.post(`/api/diagrams/${other}/comments/${thread.id}/resolve`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe("not_found");
  });

  it("keeps the comment when its mail cannot be sent", async () => {
    const broken = createApp({ ...t.deps, mailer: { send: () => Promise.reject(new Error("smtp down")) } });
    const client = request.agent(broken).set("Origin", ORIGIN);
    await client.post("/api/auth/sign-in").send({ email: viewer.user.email, password: PASSWORD }).expect(200);
    const res = await client.post(comments()).send({ body: "Mail is down, the comment is not." });
    expect(res.status).toBe(201);
    const threads = (await owner.client.get(comments())).body.threads as ThreadView[];
    expect(threads.at(-1)?.body).toBe("Mail is down, the comment is not.");
  });
});

describe("pins in the exported figure", () => {
  const text = (req: request.Test) => req.buffer(true).parse((r, cb) => {
    let s = "";
    r.on("data", (c) => (s += c));
    r.on("end", () => cb(null, s));
  });
  const figure = async (client: Client, query = "") => {
    const res = await text(client.get(`/api/diagrams/${diagramId}/versions/1/export.svg${query}`));
    expect(res.status).toBe(200);
    return res.body as string;
  };
  const markers = (svg: string) => svg.match(/<g class="pin"/g)?.length ?? 0;

  it("draws the open pinned threads with their labels only when asked with ?comments=1", async () => {
    const asked = await figure(viewer.client, "?comments=1");
    expect(markers(asked)).toBe(2);
    expect(asked).toContain("Comment 1 on block g");
    expect(asked).toContain("Comment 2 on wire w4");
    const plain = await figure(viewer.client);
    expect(markers(plain)).toBe(0);
    expect(plain).not.toContain("Comment 1 on");
  });

  it("leaves a resolved thread out and keeps the other's own number in its marker", async () => {
    const first = (await owner.client.get(comments())).body.threads[0] as ThreadView;
    await owner.client.post(`/api/diagrams/${diagramId}/comments/${first.id}/resolve`).expect(200);
    const svg = await figure(owner.client, "?comments=1");
    expect(markers(svg)).toBe(1);
    expect(svg).not.toContain("Comment 1 on");
    expect(svg).toMatch(/<g class="pin"[^>]*><title>Comment 2 on wire w4<\/title>.*>2<\/text><\/g>/);
    await owner.client.post(`/api/diagrams/${diagramId}/comments/${first.id}/reopen`).expect(200);
  });

  it("never reveals comments through a share link's figure", async () => {
    const link = await owner.client.post(`/api/diagrams/${diagramId}/share-links`).send({ version: null, expiresInDays: null });
    expect(link.status).toBe(201);
    const token = String(link.body.shareLink.url).split("/s/")[1];
    const res = await text(request(t.app).get(`/api/shared/${token}/export.svg?comments=1`));
    expect(res.status).toBe(200);
    expect(markers(res.body as string)).toBe(0);
    expect(res.body as string).not.toContain("Comment 1 on");
  });
});
