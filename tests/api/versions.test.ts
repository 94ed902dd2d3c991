import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CheckedResult } from "@shared/api/versions";
import { createApp } from "@server/app";
import { ladderDiagram } from "../bench/diagrams";
import { createSaveCheck } from "@server/features/versions/check";
import { invitationToken, PASSWORD, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";
import { servoDocument } from "./support/servo";

const servo = servoDocument("Second-order servo");

let t: TestApp;
let owner: Awaited<ReturnType<typeof signedUp>>;
let teamId: string;
let diagramId: string;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signedUp(t, "vera");
  teamId = (await owner.client.post("/api/teams").send({ name: "Calender stack" })).body.team.id;
  diagramId = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Nip load" })).body.diagram.id;
});
afterAll(() => t.close());

describe("saving versions", () => {
  it("stores version 1 with the check's result and keeps unknown fields", async () => {
    const res = await owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 0, message: "first", document: servo });
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({ number: 1, message: "first", createdBy: "vera" });
    const checked = res.body.version.result as CheckedResult;
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    const pair = checked.result.transfers[0];
    expect([pair.numerator, pair.denominator]).toEqual(["K", "s^2 + 2*s + K"]);
    expect(res.body.version.document.wires[3].note).toBe("kept: readers keep unknown fields");
    const detail = await owner.client.get(`/api/diagrams/${diagramId}`);
    expect(detail.body.diagram.latestVersion).toBe(1);
    expect(detail.body.latestVersion.number).toBe(1);
    // The page gets the document without the stored result (it can run to megabytes); the version itself keeps it.
    expect(detail.body.latestVersion.document.wires[3].note).toBe("kept: readers keep unknown fields");
    expect(detail.body.latestVersion).not.toHaveProperty("result");
    const stored = await owner.client.get(`/api/diagrams/${diagramId}/versions/1`);
    expect(stored.body.version.result).toEqual(checked);
  });

  it("gives the parameters back in the order they were declared (common practice: a table keeps its author's order)", async () => {
    const ordered = { ...servo, parameters: { Kpos: 3, T: 0.5, K: 4, a: 1 } };
    const id = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Order kept" })).body.diagram.id;
    await owner.client.post(`/api/diagrams/${id}/versions`).send({ baseVersion: 0, document: ordered }).expect(201);
    const stored = await owner.client.get(`/api/diagrams/${id}/versions/1`).expect(200);
    expect(Object.keys(stored.body.version.document.parameters)).toEqual(["Kpos", "T", "K", "a"]);
    const page = await owner.client.get(`/api/diagrams/${id}`).expect(200);
    expect(Object.keys(page.body.latestVersion.document.parameters)).toEqual(["Kpos", "T", "K", "a"]);
  });

  it("answers a stale base version with 409 and the version that won, overwriting nothing", async () => {
    const base = (await owner.client.get(`/api/diagrams/${diagramId}`)).body.latestVersion.number as number;
    const winner = await owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: base, message: "teammate", document: servo });
    expect(winner.status).toBe(201);
    const loser = await owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: base, message: "mine", document: servo });
    expect(loser.status).toBe(409);
    expect(loser.body.error.code).toBe("stale_version");
    expect(loser.body.latest).toMatchObject({ number: base + 1, message: "teammate" });
    const list = (await owner.client.get(`/api/diagrams/${diagramId}/versions`)).body.versions;
    expect(list.map((v: { message: string }) => v.message)).not.toContain("mine");
  });

  it("lists only the newest version with ?limit=1 (what an open editor polls), and refuses a bad limit naming it", async () => {
    const all = (await owner.client.get(`/api/diagrams/${diagramId}/versions`)).body.versions;
    const newest = await owner.client.get(`/api/diagrams/${diagramId}/versions?limit=1`);
    expect(newest.status).toBe(200);
    expect(newest.body.versions).toEqual([all[0]]);
    expect(all[0].number).toBe(Math.max(...all.map((v: { number: number }) => v.number)));
    const bad = await owner.client.get(`/api/diagrams/${diagramId}/versions?limit=0`);
    expect(bad.status).toBe(422);
    expect(JSON.stringify(bad.body.error)).toContain("limit");
  });

  it("lets exactly one of two simultaneous saves on the same base win", async () => {
    const base = (await owner.client.get(`/api/diagrams/${diagramId}`)).body.latestVersion.number as number;
    const [a, b] = await Promise.all(
      ["left", "right"].map((message) => owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: base, message, document: servo })),
    );
    expect([a.status, b.status].sort()).toEqual([201, 409]);
  });

  it("refuses a document that is not a Loopwright document with 422 and its problems", async () => {
    const res = await owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 99, document: { ...servo, version: 7 } });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_document");
    expect(res.body.problems[0].code).toBe("unsupported-version");
  });

  it("refuses a malformed block with 422 naming the block and the field, before looking at the base version", async () => {
    const blocks = servo.blocks.map((b) => (b.id === "e" ? { ...b, signs: ["+", "*"] } : b));
    const res = await owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 99, document: { ...servo, blocks } });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_document");
    expect(res.body.problems).toEqual([expect.objectContaining({ code: "invalid-field", blockId: "e", field: "signs[1]" })]);
  });

  it("keeps an unfinished diagram, with its problems naming the block as the result", async () => {
    const d = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Unfinished" })).body.diagram.id;
    const unfinished = { ...servo, wires: servo.wires.slice(0, 3) }; // the sum's minus port is unwired
    const res = await owner.client.post(`/api/diagrams/${d}/versions`).send({ baseVersion: 0, document: unfinished });
    expect(res.status).toBe(201);
    const checked = res.body.version.result as CheckedResult;
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.problems).toContainEqual(expect.objectContaining({ code: "unwired-port", blockId: "e" }));
  });

  it("refuses viewers with 403 and lets them read versions", async () => {
    const email = uniqueEmail("viewer");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
    const viewer = t.client();
    await viewer.post("/api/auth/sign-up").send({ name: "V", email, password: PASSWORD }).expect(201);
    await viewer.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
    expect((await viewer.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 0, document: servo })).status).toBe(403);
    expect((await viewer.get(`/api/diagrams/${diagramId}/versions/1`)).body.version.number).toBe(1);
    expect((await viewer.get(`/api/diagrams/${diagramId}/versions/999`)).status).toBe(404);
  });

  it("stops the check at the server's time budget and says so", async () => {
    const deps = appDepsOf(t);
    const tight = createApp({ ...deps, saveCheck: createSaveCheck({ log: deps.log, budget: { timeMs: 1, memoryMb: 256, concurrency: 2 } }) });
    const { default: request } = await import("supertest");
    const client = request.agent(tight).set("Origin", "http://loopwright.test");
    await client.post("/api/auth/sign-in").send({ email: owner.user.email, password: PASSWORD }).expect(200);
    const d = (await client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Big ladder" })).body.diagram.id;
    const res = await client.post(`/api/diagrams/${d}/versions`).send({ baseVersion: 0, document: ladderDiagram(500) });
    expect(res.status).toBe(201);
    const checked = res.body.version.result as CheckedResult;
    expect(checked.ok).toBe(false);
    if (checked.ok) return;
    expect(checked.problems[0].message).toMatch(/time|budget|limit/i);
  });
});

function appDepsOf(app: TestApp) {
  return app.deps;
}
