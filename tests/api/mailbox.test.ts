import { afterAll, beforeAll, expect, it } from "vitest";
import request from "supertest";
import { signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

it("lists caught messages with clickable links on /dev/mailbox while the fake mail service is in use", async () => {
  const owner = await signedUp(t, "mia");
  const teamId = (await owner.client.post("/api/teams").send({ name: "Press section" })).body.team.id;
  const email = uniqueEmail("noor");
  await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" }).expect(201);
  const page = await request(t.app).get("/dev/mailbox");
  expect(page.status).toBe(200);
  expect(page.type).toBe("text/html");
  expect(page.text).toContain(email);
  expect(page.text).toMatch(/<a href="http:\/\/loopwright\.test\/invite\/[A-Za-z0-9_-]+">/);
  const json = await request(t.app).get("/api/dev/mailbox");
  expect(json.body.messages[0]).toMatchObject({ subject: expect.stringContaining("Press section") });
  const config = await request(t.app).get("/api/config");
  expect(config.body.mailbox).toBe(true);
});

it("sends through the configured SMTP server and has no mailbox page when SMTP settings are given", async () => {
  // A second fake stands in for the hosted mail service here: the app must deliver to it over SMTP.
  const { startFakeMailService } = await import("@server/mail/fakeMailService");
  const hosted = await startFakeMailService(0);
  const smtp = await startTestApp({ SMTP_HOST: "127.0.0.1", SMTP_PORT: String(hosted.port) });
  try {
    expect(smtp.mailbox).toBeNull();
    expect((await request(smtp.app).get("/dev/mailbox")).status).toBe(404);
    expect((await request(smtp.app).get("/api/dev/mailbox")).status).toBe(404);
    expect((await request(smtp.app).get("/api/config")).body.mailbox).toBe(false);
    const owner = await signedUp(smtp, "lena");
    const teamId = (await owner.client.post("/api/teams").send({ name: "Winder" })).body.team.id;
    const email = uniqueEmail("omar");
    await owner.client.post(`/api/teams/${teamId}/invitations`).send({ email, role: "editor" }).expect(201);
    expect(hosted.messages.map((m) => m.to)).toEqual([email]);
  } finally {
    await smtp.close();
    await hosted.close();
  }
});
