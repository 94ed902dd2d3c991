import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import type { CheckedResult } from "@shared/api/versions";
import { createApp } from "@server/app";
import { createSaveCheck, DEFAULT_BUDGET } from "@server/features/versions/check";
import { invitationToken, ORIGIN, PASSWORD, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";
import { servoDocument } from "./support/servo";

const servo = servoDocument("Winder tension");

let t: TestApp;
let owner: Awaited<ReturnType<typeof signedUp>>;
let viewer: ReturnType<TestApp["client"]>;
let teamId: string;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signedUp(t, "wren");
  teamId = (await owner.client.post("/api/teams").send({ name: "Rewinder" })).body.team.id;
  const email = uniqueEmail("viewer");
  await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
  viewer = t.client();
  await viewer.post("/api/auth/sign-up").send({ name: "viewer", email, password: PASSWORD }).expect(201);
  await viewer.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
});
afterAll(() => t.close());

const file = (content: unknown) => Buffer.from(typeof content === "string" ? content : JSON.stringify(content, null, 2));
const importFile = (client: ReturnType<typeof request.agent>, content: Buffer, filename = "loop.json") =>
  client.post(`/api/teams/${teamId}/diagrams/import`).attach("file", content, { filename, contentType: "application/json" });
const diagramIds = async () =>
  ((await owner.client.get(`/api/teams/${teamId}/diagrams`)).body.diagrams as { id: string }[]).map((d) => d.id).sort();

describe("exporting a version's document", () => {
  it("downloads the stored document as an attachment named after the title and version", async () => {
    const { id } = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: 'Nip load / "draft"' })).body.diagram;
    await owner.client.post(`/api/diagrams/${id}/versions`).send({ baseVersion: 0, document: servo }).expect(201);
    const res = await owner.client.get(`/api/diagrams/${id}/versions/1/document.json`);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^application\/json/);
    expect(res.headers["content-disposition"]).toBe('attachment; filename="Nip load - -draft--v1.json"');
    const stored = (await owner.client.get(`/api/diagrams/${id}/versions/1`)).body.version.document;
    expect(JSON.parse(res.text)).toEqual(stored);
    expect(stored.wires[3].note).toBe("kept: readers keep unknown fields");
  });

  it("lets a viewer download, and answers a missing version with 404", async () => {
    const { id } = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Unwind brake" })).body.diagram;
    await owner.client.post(`/api/diagrams/${id}/versions`).send({ baseVersion: 0, document: servo }).expect(201);
    expect((await viewer.get(`/api/diagrams/${id}/versions/1/document.json`)).status).toBe(200);
    const missing = await owner.client.get(`/api/diagrams/${id}/versions/2/document.json`);
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe("not_found");
  });
});

describe("importing a file as a new diagram", () => {
  it("creates a diagram whose version 1 holds the document with the server's check result", async () => {
    const res = await importFile(owner.client, file(servo));
    expect(res.status).toBe(201);
    expect(res.body.diagram).toMatchObject({ teamId, title: "Winder tension", latestVersion: 1, author: "wren" });
    const version = (await owner.client.get(`/api/diagrams/${res.body.diagram.id}/versions/1`)).body.version;
    expect(version.document).toEqual(servo);
    const checked = version.result as CheckedResult;
    expect(checked.ok).toBe(true);
    if (checked.ok) expect([checked.result.transfers[0].numerator, checked.result.transfers[0].denominator]).toEqual(["K", "s^2 + 2*s + K"]);
    expect(await diagramIds()).toContain(res.body.diagram.id);
  });

  it("takes the file name as the title when the document has none", async () => {
    const { title: _, ...untitled } = servo;
    const res = await importFile(owner.client, file(untitled), "Reel drive.JSON");
    expect(res.status).toBe(201);
    expect(res.body.diagram.title).toBe("Reel drive");
  });

  it("answers JSON that does not parse with 422 naming line and column, and creates nothing", async () => {
    const before = await diagramIds();
    const res = await importFile(owner.client, file('{\n  "format": "loopwright-diagram",\n  "blocks": [1 2]\n}'), "broken.json");
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_json");
    expect(res.body.error.message).toMatch(/broken\.json is not valid JSON at line 3, column 16/);
    expect(await diagramIds()).toEqual(before);
  });

  it("answers a diagram with errors with the invalid_document body naming the block, and creates nothing", async () => {
    const before = await diagramIds();
    const broken = { ...servo, blocks: servo.blocks.map((b) => (b.id === "g" ? { ...b, expr: "K/(s*(s+2)" } : b)) };
    const res = await importFile(owner.client, file(broken));
    expect(res.status).toBe(422);
    expect(res.body.error).toEqual({ code: "invalid_document", message: "This is not a Loopwright diagram document." });
    expect(res.body.problems).toEqual(expect.arrayContaining([expect.objectContaining({ severity: "error", blockId: "g", field: "expr" })]));
    expect(await diagramIds()).toEqual(before);
  });

  it("answers a file that is not a diagram document with the problem naming the field", async () => {
    const before = await diagramIds();
    const res = await importFile(owner.client, file({ blocks: [] }));
    expect(res.status).toBe(422);
    expect(res.body.problems).toEqual([expect.objectContaining({ code: "wrong-format", field: "format" })]);
    expect(await diagramIds()).toEqual(before);
  });

  it("refuses a file over 1 MB with 413, and creates nothing", async () => {
    const before = await diagramIds();
    const big = file({ ...servo, notes: "x".repeat(1024 * 1024) });
    const res = await importFile(owner.client, big);
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({ code: "too_large", message: "The file is larger than the 1 MB limit." });
    expect(await diagramIds()).toEqual(before);
  });

  it("removes the new diagram again when saving its version 1 fails", async () => {
    const before = await diagramIds();
    // A check with no workers answers every save with 503 check_busy, after the import has created the diagram.
    const busy = createApp({ ...t.deps, saveCheck: createSaveCheck({ log: t.deps.log, budget: { ...DEFAULT_BUDGET, concurrency: 0 } }) });
    const client = request.agent(busy).set("Origin", ORIGIN);
    await client.post("/api/auth/sign-in").send({ email: owner.user.email, password: PASSWORD }).expect(200);
    const res = await importFile(client, file(servo));
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe("check_busy");
    expect(await diagramIds()).toEqual(before);
  });

  it("asks for the file when the request has none", async () => {
    const res = await owner.client.post(`/api/teams/${teamId}/diagrams/import`).field("title", "no file");
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("file_missing");
  });

  it("refuses viewers with 403 and non-members with 404, and creates nothing", async () => {
    const before = await diagramIds();
    const asViewer = await importFile(viewer, file(servo));
    expect(asViewer.status).toBe(403);
    expect(asViewer.body.error.code).toBe("forbidden");
    const stranger = await signedUp(t, "stranger");
    expect((await importFile(stranger.client, file(servo))).status).toBe(404);
    expect(await diagramIds()).toEqual(before);
  });
});

describe("importing a file as a new version of a diagram", () => {
  let diagramId: string;
  const importVersion = (client: ReturnType<typeof request.agent>, content: Buffer, filename = "retuned.json") =>
    client.post(`/api/diagrams/${diagramId}/versions/import`).attach("file", content, { filename, contentType: "application/json" });
  const versionNumbers = async () =>
    ((await owner.client.get(`/api/diagrams/${diagramId}/versions`)).body.versions as { number: number }[]).map((v) => v.number);

  beforeAll(async () => {
    diagramId = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Dancer arm" })).body.diagram.id;
    await owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 0, document: servo }).expect(201);
  });

  it("stores the file as the next version with the server's check, answering as a save does", async () => {
    const retuned = { ...servo, parameters: { K: 7 } };
    const res = await importVersion(owner.client, file(retuned), "dancer retune.json");
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({ number: 2, message: "Imported from dancer retune.json", createdBy: "wren" });
    expect(res.body.version.document).toEqual(retuned);
    expect((res.body.version.result as CheckedResult).ok).toBe(true);
    const stored = (await owner.client.get(`/api/diagrams/${diagramId}/versions/2`)).body.version;
    expect(stored.document).toEqual(retuned);
    expect((await owner.client.get(`/api/diagrams/${diagramId}`)).body.diagram.latestVersion).toBe(2);
  });

  it("answers JSON that does not parse with 422 naming line and column, and stores nothing", async () => {
    const before = await versionNumbers();
    const res = await importVersion(owner.client, file('{\n  "format": "loopwright-diagram",\n  "wires": [,]\n}'), "typo.json");
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_json");
    expect(res.body.error.message).toMatch(/typo\.json is not valid JSON at line 3, column 13/);
    expect(await versionNumbers()).toEqual(before);
  });

  it("answers a document with a broken block with the problem naming the block and field, and stores nothing", async () => {
    const before = await versionNumbers();
    const broken = { ...servo, blocks: servo.blocks.map((b) => (b.id === "g" ? { ...b, expr: "K/(s*(s+2)" } : b)) };
    const res = await importVersion(owner.client, file(broken));
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("invalid_document");
    expect(res.body.problems).toEqual(expect.arrayContaining([expect.objectContaining({ severity: "error", blockId: "g", field: "expr" })]));
    expect(await versionNumbers()).toEqual(before);
  });

  it("refuses a file over 1 MB with 413 and a missing file with 422, and stores nothing", async () => {
    const before = await versionNumbers();
    const big = await importVersion(owner.client, file({ ...servo, notes: "x".repeat(1024 * 1024) }));
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe("too_large");
    const none = await owner.client.post(`/api/diagrams/${diagramId}/versions/import`).field("note", "no file");
    expect(none.status).toBe(422);
    expect(none.body.error.code).toBe("file_missing");
    expect(await versionNumbers()).toEqual(before);
  });

  it("refuses viewers with 403 and non-members with 404, and stores nothing", async () => {
    const before = await versionNumbers();
    const asViewer = await importVersion(viewer, file(servo));
    expect(asViewer.status).toBe(403);
    expect(asViewer.body.error.code).toBe("forbidden");
    const stranger = await signedUp(t, "outsider");
    expect((await importVersion(stranger.client, file(servo))).status).toBe(404);
    expect(await versionNumbers()).toEqual(before);
  });
});
