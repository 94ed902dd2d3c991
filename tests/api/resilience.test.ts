import { afterAll, beforeAll, expect, it } from "vitest";
import { createServer, connect, type Server, type Socket } from "node:net";
import { startTestApp, type TestApp } from "./support/harness";

// A TCP relay in front of the real test database that can be cut and restored, to show the API answers
// 503 while PostgreSQL is unreachable and recovers by itself when it is back.
const target = new URL(process.env.DATABASE_URL!);
let relay: Server;
let sockets: Socket[] = [];
let port = 0;

function openRelay(): Promise<void> {
  relay = createServer((client) => {
    const upstream = connect(Number(target.port), target.hostname);
    sockets.push(client, upstream);
    client.pipe(upstream).pipe(client);
    const drop = () => (client.destroy(), upstream.destroy());
    client.on("error", drop);
    upstream.on("error", drop);
  });
  return new Promise((resolve) => relay.listen(port, "127.0.0.1", () => {
    port = (relay.address() as { port: number }).port;
    resolve();
  }));
}

function cutRelay(): Promise<void> {
  sockets.forEach((s) => s.destroy());
  sockets = [];
  return new Promise((resolve) => relay.close(() => resolve()));
}

let t: TestApp;
beforeAll(async () => {
  await openRelay();
  const url = new URL(process.env.DATABASE_URL!);
  url.port = String(port);
  url.hostname = "127.0.0.1";
  t = await startTestApp({ DATABASE_URL: url.toString() });
});
afterAll(async () => {
  await t.close();
  relay.close();
});

it("answers 503 while the database is down and recovers when it returns", async () => {
  const client = t.client();
  expect((await client.get("/api/health")).status).toBe(200);
  await cutRelay();
  const down = await client.get("/api/health");
  expect(down.status).toBe(503);
  expect(down.body.error.code).toBe("database_unavailable");
  const signIn = await client.post("/api/auth/sign-in").send({ email: "a@example.test", password: "whatever1234" });
  expect(signIn.status).toBe(503);
  await openRelay();
  let status = 0;
  for (let i = 0; i < 20 && status !== 200; i++) {
    status = (await client.get("/api/health")).status;
    if (status !== 200) await new Promise((r) => setTimeout(r, 250));
  }
  expect(status).toBe(200);
});
