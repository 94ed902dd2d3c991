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
