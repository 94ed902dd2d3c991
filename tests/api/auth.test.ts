import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { ORIGIN, PASSWORD, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const sessionCookie = (res: request.Response) =>
  ([] as string[]).concat(res.headers["set-cookie"] ?? []).find((c) => c.startsWith("loopwright_session=")) ?? "";

describe("sign-up", () => {
  it("creates the account, signs in with an httpOnly SameSite=Lax cookie and answers /me", async () => {
    const client = t.client();
    const email = uniqueEmail("ada");
    const res = await client.post("/api/auth/sign-up").send({ name: "Ada", email: email.toUpperCase(), password: PASSWORD });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email, name: "Ada" }); // e-mail stored lower-case
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i); // PUBLIC_URL is http here
    const me = await client.get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(email);
  });

  it("refuses a short password and a bad e-mail with 422 naming each field", async () => {
    const res = await t.client().post("/api/auth/sign-up").send({ name: "B", email: "not-an-email", password: "short" });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("validation");
    const paths = res.body.error.fields.map((f: { path: string }) => f.path).sort();
    expect(paths).toEqual(["email", "password"]);
  });

  it("refuses a second account with the same e-mail (409)", async () => {
    const email = uniqueEmail("twice");
    await t.client().post("/api/auth/sign-up").send({ name: "A", email, password: PASSWORD }).expect(201);
    const res = await t.client().post("/api/auth/sign-up").send({ name: "B", email, password: PASSWORD });
    expect(res.status).toBe(409);
  });

  it("marks the cookie Secure when the public URL is https", async () => {
    const secure = await startTestApp({ PUBLIC_URL: "https://loopwright.test" });
    try {
      const res = await request(secure.app)
        .post("/api/auth/sign-up")
        .set("Origin", "https://loopwright.test")
        .send({ name: "S", email: uniqueEmail("secure"), password: PASSWORD });
      expect(res.status).toBe(201);
      expect(sessionCookie(res)).toMatch(/Secure/);
    } finally {
      await secure.close();
    }
  });
});

describe("sign-in and sign-out", () => {
  it("gives the same answer for an unknown e-mail and a wrong password", async () => {
    const { user } = await signedUp(t, "carol");
    const wrong = await t.client().post("/api/auth/sign-in").send({ email: user.email, password: "wrong password!" });
    const unknown = await t.client().post("/api/auth/sign-in").send({ email: uniqueEmail("nobody"), password: PASSWORD });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it("issues a new session id at every sign-in and invalidates the session on the server at sign-out", async () => {
    const { client, user } = await signedUp(t, "dan");
    const first = sessionCookie(await client.post("/api/auth/sign-in").send({ email: user.email, password: PASSWORD }));
    const second = sessionCookie(await client.post("/api/auth/sign-in").send({ email: user.email, password: PASSWORD }));
    expect(first.split(";")[0]).not.toBe(second.split(";")[0]);
    // The replaced session no longer works.
    const stale = await request(t.app).get("/api/auth/me").set("Cookie", first.split(";")[0]);
    expect(stale.status).toBe(401);
    const kept = second.split(";")[0];
    await request(t.app).post("/api/auth/sign-out").set("Origin", ORIGIN).set("Cookie", kept).expect(204);
    // Replaying the old cookie after sign-out fails: the server forgot the session.
    const replay = await request(t.app).get("/api/auth/me").set("Cookie", kept);
    expect(replay.status).toBe(401);
  });
});

describe("request hygiene", () => {
  it("refuses a mutation without our Origin (CSRF) with 403", async () => {
    const noOrigin = await request(t.app).post("/api/teams").send({ name: "x" });
    expect(noOrigin.status).toBe(403);
    expect(noOrigin.body.error.code).toBe("bad_origin");
    const foreign = await request(t.app).post("/api/auth/sign-in").set("Origin", "https://evil.example").send({});
    expect(foreign.status).toBe(403);
  });

  it("answers malformed JSON with 400 and unknown routes with 404, as JSON", async () => {
    const bad = await t.client().post("/api/auth/sign-in").set("Content-Type", "application/json").send("{nope");
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe("malformed_json");
    const missing = await t.client().get("/api/no-such-thing");
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe("not_found");
  });

  it("rate-limits sign-in with a 429 and a message", async () => {
    const limited = await startTestApp({ RATE_LIMIT_AUTH_PER_15_MIN: "3" });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 5; i++) {
        const res = await limited.client().post("/api/auth/sign-in").send({ email: "x@example.test", password: "whatever1234" });
        statuses.push(res.status);
        if (res.status === 429) expect(res.body.error.message).toMatch(/Too many attempts/);
      }
      expect(statuses).toEqual([401, 401, 401, 429, 429]);
    } finally {
      await limited.close();
    }
  });

  it("rate-limits share-link lookups and uploads per client, each with a 429 and its own sentence", async () => {
    const limited = await startTestApp({ RATE_LIMIT_SHARE_PER_MIN: "3", RATE_LIMIT_UPLOADS_PER_15_MIN: "2" });
    try {
      const lookups: number[] = [];
      for (let i = 0; i < 5; i++) {
        const res = await limited.client().get(`/api/shared/${"x".repeat(43)}`);
        lookups.push(res.status);
        if (res.status === 429) expect(res.body.error).toMatchObject({ code: "rate_limited", message: expect.stringMatching(/share-link/) });
      }
      expect(lookups).toEqual([404, 404, 404, 429, 429]);
      const uploads: number[] = [];
      for (let i = 0; i < 4; i++) {
        const res = await limited.client().post("/api/diagrams/00000000-0000-0000-0000-000000000000/versions/import").attach("file", Buffer.from("{}"), "x.json");
        uploads.push(res.status);
      }
      // Signed out, the first two are refused by access (401); the limiter counts them and stops the rest.
      expect(uploads).toEqual([401, 401, 429, 429]);
    } finally {
      await limited.close();
    }
  });
});
