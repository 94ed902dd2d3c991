import { Writable } from "node:stream";
import { pino } from "pino";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CHECK_CRASHED } from "@shared/api/versions";
import { createApp } from "@server/app";
import { createSaveCheck } from "@server/features/versions/check";
import { ORIGIN, PASSWORD, signedUp, startTestApp, type TestApp } from "./support/harness";
import { unityFeedback } from "../support/docBuilder";

// A crash of the save-time check is a server bug: the version is stored all the same (201) with a result saying
// the check failed, and the server logs the exception with its stack (common practice: never lose a user's work
// to a server fault, never hide the fault from its developers).

const servo = unityFeedback("K/(s*(s+2))", { K: 4 });

type LogLine = { level: number; msg: string; diagramId?: string; err?: { message: string; stack?: string } };

let t: TestApp;
let owner: Awaited<ReturnType<typeof signedUp>>;
let teamId: string;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signedUp(t, "ines");
  teamId = (await owner.client.post("/api/teams").send({ name: "Winder line" })).body.team.id;
});
afterAll(() => t.close());

/** The app with its check worker started from `entry`, and every error line its logger writes. */
async function appWithCheckWorker(entry: string) {
  const lines: LogLine[] = [];
  const sink = new Writable({ write: (chunk, _encoding, next) => (lines.push(JSON.parse(String(chunk))), next()) });
  const log = pino({ level: "error" }, sink);
  const app = createApp({ ...t.deps, log, saveCheck: createSaveCheck({ log, workerEntry: new URL(entry, import.meta.url) }) });
  const client = request.agent(app).set("Origin", ORIGIN);
  await client.post("/api/auth/sign-in").send({ email: owner.user.email, password: PASSWORD }).expect(200);
  const diagramId = (await client.post(`/api/teams/${teamId}/diagrams`).send({ title: "Tension loop" })).body.diagram.id as string;
  return { client, diagramId, lines };
}

describe("a crash in the save-time check", () => {
  it("stores the version with a crashed result and logs the reducer's exception with its stack", async () => {
    const { client, diagramId, lines } = await appWithCheckWorker("./support/throwingReducerWorkerEntry.mjs");
    const res = await client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: 0, message: "tuned", document: servo });
    expect(res.status).toBe(201);
    expect(res.body.version.result).toMatchObject({ ok: false, failure: "crashed", problems: [{ severity: "error", code: CHECK_CRASHED }] });
    expect(res.body.version.result.problems[0].message).toMatch(/your version is saved/);
    expect(JSON.stringify(res.body)).not.toMatch(/throwingReducerWorker|Cannot read properties/); // no internals to the client

    const stored = await client.get(`/api/diagrams/${diagramId}/versions/1`);
    expect(stored.body.version).toMatchObject({ number: 1, message: "tuned", document: { blocks: servo.blocks } });
    expect(stored.body.version.result).toEqual(res.body.version.result);
    expect((await client.get(`/api/diagrams/${diagramId}/versions`)).body.versions[0].ok).toBe(false);

    const crash = lines.find((l) => l.msg === "save check crashed");
    expect(crash).toMatchObject({ level: 50, diagramId });
    expect(crash?.err?.message).toMatch(/Cannot read properties of undefined \(reading 'id'\)/);
    expect(crash?.err?.stack).toMatch(/throwingReducerWorker\.ts/);
  });

  it("does the same when the worker dies of an uncaught throw, and the next save gets a fresh worker", async () => {
    const { client, diagramId, lines } = await appWithCheckWorker("./support/dyingCheckWorker.mjs");
    for (const baseVersion of [0, 1]) {
      const res = await client.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion, document: servo });
      expect(res.status).toBe(201);
      expect(res.body.version).toMatchObject({ number: baseVersion + 1, result: { ok: false, failure: "crashed", problems: [{ code: CHECK_CRASHED }] } });
    }
    const crashes = lines.filter((l) => l.msg === "save check crashed");
    expect(crashes).toHaveLength(2);
    expect(crashes[0].err?.message).toMatch(/Maximum call stack size exceeded/);
    expect(crashes[0].err?.stack).toMatch(/dyingCheckWorker\.mjs/);
  });
});
