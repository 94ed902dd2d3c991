import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { DOMParser } from "@xmldom/xmldom";
import { invitationToken, PASSWORD, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";
import { servoDocument } from "./support/servo";

let t: TestApp;
let owner: Awaited<ReturnType<typeof signedUp>>;
let viewer: ReturnType<TestApp["client"]>;
let id: string;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signedUp(t, "ossian");
  const teamId = (await owner.client.post("/api/teams").send({ name: "Kiln" })).body.team.id;
  const email = uniqueEmail("viewer");
  await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
  viewer = t.client();
  await viewer.post("/api/auth/sign-up").send({ name: "viewer", email, password: PASSWORD }).expect(201);
  await viewer.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
  id = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Kiln <draft>" })).body.diagram.id;
  await owner.client.post(`/api/diagrams/${id}/versions`).send({ baseVersion: 0, document: servoDocument("Kiln") }).expect(201);
});
afterAll(() => t.close());

describe("exporting a version as SVG and PNG", () => {
  it("serves image/svg+xml that parses, with no foreignObject, to a viewer (common practice: SVG 1.1 is XML)", async () => {
    const res = await viewer.get(`/api/diagrams/${id}/versions/1/export.svg?download=1`).buffer(true).parse((r, cb) => { let s = ""; r.on("data", (c) => (s += c)); r.on("end", () => cb(null, s)); });
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/^image\/svg\+xml/);
    expect(res.headers["content-disposition"]).toBe('attachment; filename="Kiln -draft--v1.svg"');
    const svg = res.body as string;
    expect(svg).not.toContain("foreignObject");
    expect(new DOMParser().parseFromString(svg, "image/svg+xml").getElementsByTagName("title").length).toBeGreaterThan(4);
  });
  it("answers non-members with 404 and the signed-out with 401", async () => {
    const stranger = await signedUp(t, "stranger");
    expect((await stranger.client.get(`/api/diagrams/${id}/versions/1/export.svg`)).status).toBe(404);
    expect((await request(t.app).get(`/api/diagrams/${id}/versions/1/export.svg`)).status).toBe(401);
  });
  it("renders a PNG at twice the SVG's size (PNG signature and IHDR, from the PNG specification)", async () => {
    const svg = (await owner.client.get(`/api/diagrams/${id}/versions/1/export.svg`).buffer(true).parse((r, cb) => { let s = ""; r.on("data", (c) => (s += c)); r.on("end", () => cb(null, s)); })).body as string;
    const width = Number(/width="([\d.]+)"/.exec(svg)![1]);
    const res = await owner.client.get(`/api/diagrams/${id}/versions/1/export.png`).buffer(true);
    expect(res.headers["content-type"]).toBe("image/png");
    const png = res.body as Buffer;
    expect(png.subarray(0, 8).toString("hex")).toBe("89504e470d0a1a0a");
    expect(png.readUInt32BE(16)).toBe(Math.ceil(width * 2));
  });
});
