import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { VersionListItem } from "@shared/api/versions";
import { AuditEvent } from "@server/db/models/audit";
import { invitationToken, PASSWORD, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";
import { servoDocument } from "./support/servo";

const servo = servoDocument("Second-order servo");
/** The servo with the plant's expression broken: saved all the same, with one error. */
const broken = { ...servo, blocks: servo.blocks.map((b) => (b.id === "g" ? { ...b, expr: "K/(s*(s+2)" } : b)) };

let t: TestApp;
let owner: Awaited<ReturnType<typeof signedUp>>;
let teamId: string;
let diagramId: string;

const save = async (document: unknown, message: string) => {
  const base = (await owner.client.get(`/api/diagrams/${diagramId}`)).body.diagram.latestVersion ?? 0;
  return owner.client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: base, message, document }).expect(201);
};
const versions = async (): Promise<VersionListItem[]> => (await owner.client.get(`/api/diagrams/${diagramId}/versions`)).body.versions;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signedUp(t, "ines");
  teamId = (await owner.client.post("/api/teams").send({ name: "Winder drives" })).body.team.id;
  diagramId = (await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Unwind tension" })).body.diagram.id;
  await save(servo, "tuned");
  await save(broken, "half-typed");
});
afterAll(() => t.close());

describe("the version table's summary", () => {
  it("gives the default pair's order, verdict, phase margin and overshoot of a checked version", async () => {
    const v1 = (await versions()).find((v) => v.number === 1)!;
    expect(v1).toMatchObject({ ok: true, problemCount: 0, summary: { input: "r", output: "y", order: 2, stable: "stable" } });
    // T = 4/(s^2 + 2s + 4): ωn = 2, ζ = 0.5. Overshoot = 100·exp(−πζ/√(1−ζ²)) (common practice: the standard
    // second-order formula); phase margin of L = 4/(s(s+2)) at |L(jω)| = 1, ω² = −2 + √20 (solved by hand).
    const zeta = 0.5;
    expect(v1.summary!.overshootPercent).toBeCloseTo(100 * Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta ** 2)), 3);
    const wc = Math.sqrt(-2 + Math.sqrt(20));
    expect(v1.summary!.phaseMarginDeg).toBeCloseTo(180 - 90 - (Math.atan(wc / 2) * 180) / Math.PI, 3);
  });

  it("counts the errors of a version saved with problems and gives it no summary", async () => {
    const v2 = (await versions()).find((v) => v.number === 2)!;
    expect(v2).toMatchObject({ ok: false, summary: null, message: "half-typed" });
    expect(v2.problemCount).toBe(1);
  });
});

describe("restoring a version", () => {
  it("saves its document as the next version with the message 'Restored from vN' and records it", async () => {
    const res = await owner.client.post(`/api/diagrams/${diagramId}/versions/1/restore`);
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({ number: 3, message: "Restored from v1", createdBy: "ines" });
    expect(res.body.version.document.blocks).toEqual(servo.blocks);
    expect(res.body.version.result.ok).toBe(true);
    const rows = await AuditEvent.findAll({ where: { diagramId, subject: "3" }, order: [["id", "ASC"]] });
    expect(rows.map((r) => r.kind)).toEqual(["version.saved", "version.restored"]);
    expect(rows[1].detail).toEqual({ from: 1 });
    expect(rows[1].actorId).toBe(owner.user.id);
  });

  it("answers an unknown version with 404 and saves nothing", async () => {
    const before = (await versions()).length;
    const res = await owner.client.post(`/api/diagrams/${diagramId}/versions/99/restore`);
    expect(res.status).toBe(404);
    expect(res.body.error.message).toContain("Version 99");
    expect((await versions()).length).toBe(before);
  });

  it("refuses viewers with 403", async () => {
    const email = uniqueEmail("viewer");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
    const viewer = t.client();
    await viewer.post("/api/auth/sign-up").send({ name: "V", email, password: PASSWORD }).expect(201);
    await viewer.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
    expect((await viewer.post(`/api/diagrams/${diagramId}/versions/1/restore`)).status).toBe(403);
  });
});
