import { Writable } from "node:stream";
import { pino } from "pino";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "@server/app";
import { Invitation } from "@server/db/models/team";
import { ORIGIN, PASSWORD, invitationToken, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

async function teamOf(who: string) {
  const owner = await signedUp(t, who);
  const team = (await owner.client.post("/api/teams").send({ name: `${who}'s cell` })).body.team;
  return { owner, teamId: team.id as string };
}

describe("invitations", () => {
  it("mails a one-time link that joins the invitee with the invited role", async () => {
    const { owner, teamId } = await teamOf("olga");
    const email = uniqueEmail("pavel");
    const created = await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "editor" });
    expect(created.status).toBe(201);
    const mail = t.mailbox.messages.find((m) => m.to.includes(email))!;
    expect(mail.subject).toContain("olga");
    expect(mail.text).toContain("editor");
    const token = invitationToken(t.mailbox, email);
    // Only the token's hash is stored.
    expect(await Invitation.count({ where: { tokenHash: token } })).toBe(0);

    const preview = await t.client().get(`/api/invitations/${token}`);
    expect(preview.body.invitation).toMatchObject({ email, role: "editor", accountExists: false, invitedBy: "olga" });

    const invitee = t.client();
    await invitee.post("/api/auth/sign-up").send({ name: "Pavel", email, password: PASSWORD }).expect(201);
    const accepted = await invitee.post(`/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body.teamId).toBe(teamId);
    const teams = (await invitee.get("/api/teams")).body.teams;
    expect(teams).toEqual([expect.objectContaining({ id: teamId, role: "editor", memberCount: 2 })]);
    // Used once: the same link is dead now.
    expect((await invitee.post(`/api/invitations/${token}/accept`)).status).toBe(404);
    expect((await t.client().get(`/api/invitations/${token}`)).status).toBe(404);
  });

  it("refuses an invitation for another e-mail, and an expired one with 410", async () => {
    const { owner, teamId } = await teamOf("rhea");
    const email = uniqueEmail("sam");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
    const token = invitationToken(t.mailbox, email);
    const other = await signedUp(t, "mallory");
    const wrong = await other.client.post(`/api/invitations/${token}/accept`);
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.message).toContain(email);
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email } });
    expect((await t.client().get(`/api/invitations/${token}`)).status).toBe(410);
  });

  it("expires links after seven days (common practice for one-time invitation links)", async () => {
    const { owner, teamId } = await teamOf("uma");
    const email = uniqueEmail("vic");
    const res = await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" });
    const days = (Date.parse(res.body.invitation.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);
  });

  it("refuses to invite someone who is already a member (409)", async () => {
    const { owner, teamId } = await teamOf("walt");
    const res = await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email: owner.user.email, role: "viewer" });
    expect(res.status).toBe(409);
  });
});

describe("members", () => {
  it("never removes or demotes the last owner, but allows it once there is another", async () => {
    const { owner, teamId } = await teamOf("xena");
    const self = owner.user.id;
    expect((await owner.client.patch(`/api/teams/${teamId}/members/${self}`).send({ role: "viewer" })).status).toBe(409);
    expect((await owner.client.delete(`/api/teams/${teamId}/members/${self}`)).status).toBe(409);

    const email = uniqueEmail("yuri");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "owner" }).expect(201);
    const second = t.client();
    await second.post("/api/auth/sign-up").send({ name: "Yuri", email, password: PASSWORD }).expect(201);
    await second.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);

    const demoted = await owner.client.patch(`/api/teams/${teamId}/members/${self}`).send({ role: "viewer" });
    expect(demoted.status).toBe(200);
    expect(demoted.body.member.role).toBe("viewer");
    const members = (await second.get(`/api/teams/${teamId}/members`)).body.members;
    expect(members.map((m: { role: string }) => m.role).sort()).toEqual(["owner", "viewer"]);
  });

  it("shows pending invitations to owners only", async () => {
    const { owner, teamId } = await teamOf("zoe");
    const email = uniqueEmail("viewer");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
    const mine = await owner.client.get(`/api/teams/${teamId}/members`);
    expect(mine.body.invitations.map((i: { email: string }) => i.email)).toEqual([email]);
    const viewer = t.client();
    await viewer.post("/api/auth/sign-up").send({ name: "V", email, password: PASSWORD });
    await viewer.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
    expect((await viewer.get(`/api/teams/${teamId}/members`)).body.invitations).toEqual([]);
  });
});

describe("diagrams", () => {
  it("lists, renames, archives and restores a team's diagrams", async () => {
    const { owner, teamId } = await teamOf("ana");
    const created = await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Hopper level", description: "first" });
    expect(created.status).toBe(201);
    expect(created.body.diagram).toMatchObject({ title: "Hopper level", latestVersion: null, author: "ana", archivedAt: null });
    const id = created.body.diagram.id;
    const empty = await owner.client.post(`/api/teams/${teamId}/diagrams`).send({ title: "  " });
    expect(empty.status).toBe(422);
    expect(empty.body.error.fields[0].path).toBe("title");

    await owner.client.patch(`/api/diagrams/${id}`).send({ title: "Hopper level loop" }).expect(200);
    await owner.client.post(`/api/diagrams/${id}/archive`).expect(200);
    expect((await owner.client.get(`/api/teams/${teamId}/diagrams`)).body.diagrams).toEqual([]);
    const archived = (await owner.client.get(`/api/teams/${teamId}/diagrams?archived=1`)).body.diagrams;
    expect(archived).toEqual([expect.objectContaining({ id, title: "Hopper level loop" })]);
    await owner.client.post(`/api/diagrams/${id}/restore`).expect(200);
    const detail = await owner.client.get(`/api/diagrams/${id}`);
    expect(detail.body.diagram).toMatchObject({ title: "Hopper level loop", role: "owner", teamName: "ana's cell", archivedAt: null });
    expect(detail.body.latestVersion).toBeNull();
  });
});

describe("what the request log holds", () => {
  it("never an invitation token, a password or a session id (common practice: credentials stay out of logs)", async () => {
    const lines: string[] = [];
    const sink = new Writable({ write: (chunk, _enc, done) => (lines.push(String(chunk)), done()) });
    const logged = createApp({ ...t.deps, log: pino({ level: "info" }, sink) });
    const { owner, teamId } = await teamOf("rhea");
    const email = uniqueEmail("sami");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
    const token = invitationToken(t.mailbox, email);
    const guest = request.agent(logged).set("Origin", ORIGIN);
    const signUp = await guest.post("/api/auth/sign-up").send({ name: "sami", email, password: PASSWORD }).expect(201);
    await guest.get(`/api/invitations/${token}`).expect(200);
    await guest.post(`/api/invitations/${token}/accept`).expect(200);
    const signIn = await guest.post("/api/auth/sign-in").send({ email, password: PASSWORD }).expect(200);
    const sessionIds = [signUp, signIn].flatMap((r) => ([] as string[]).concat(r.headers["set-cookie"] ?? []).map((c) => c.split(";")[0].split("=")[1]));
    expect(sessionIds.every((id) => id.length > 10)).toBe(true);
    const text = lines.join("");
    for (const secret of [token, PASSWORD, ...sessionIds]) expect(text).not.toContain(secret);
    const paths = lines.map((l) => JSON.parse(l).path);
    expect(paths).toContain("/api/invitations/[token]");
    expect(paths).toContain("/api/invitations/[token]/accept");
  });
});
