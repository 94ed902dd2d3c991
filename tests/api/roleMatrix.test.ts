import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { Membership } from "@server/db/models/team";
import { ORIGIN, invitationToken, signedUp, startTestApp, uniqueEmail, type TestApp } from "./support/harness";

// Every /api route × every kind of caller, with the status the server must answer (common practice for
// multi-tenant SaaS: non-members get 404 so they learn nothing; members below the needed role get 403).
type Who = "anonymous" | "nonMember" | "viewer" | "editor" | "owner";
const WHO: Who[] = ["anonymous", "nonMember", "viewer", "editor", "owner"];

let t: TestApp;
let teamId: string;
let diagramId: string;
const clients = {} as Record<Who, ReturnType<TestApp["client"]>>;

async function addMember(role: "viewer" | "editor"): Promise<string> {
  const { user } = await signedUp(t, `extra-${role}`);
  await Membership.create({ teamId, userId: user.id, role });
  return user.id;
}

async function pendingInvitation(): Promise<{ id: string; token: string }> {
  const email = uniqueEmail("invitee");
  const res = await clients.owner.post(`/api/teams/${teamId}/invitations`).send({ email, role: "viewer" });
  return { id: res.body.invitation.id, token: invitationToken(t.mailbox, email) };
}

async function shareLink(): Promise<{ id: string; url: string }> {
  const res = await clients.owner.post(`/api/diagrams/${diagramId}/share-links`).send({ version: null, expiresInDays: null });
  return res.body.shareLink;
}

async function ownerThread(): Promise<string> {
  return (await clients.owner.post(`/api/diagrams/${diagramId}/versions/1/comments`).send({ body: "Thread" })).body.thread.id;
}

beforeAll(async () => {
  t = await startTestApp();
  clients.anonymous = t.client();
  const owner = await signedUp(t, "owner");
  clients.owner = owner.client;
  clients.nonMember = (await signedUp(t, "stranger")).client;
  teamId = (await clients.owner.post("/api/teams").send({ name: "Kiln draft loops" })).body.team.id;
  for (const role of ["viewer", "editor"] as const) {
    // Members join through the real invitation flow.
    const email = uniqueEmail(role);
    await clients.owner.post(`/api/teams/${teamId}/invitations`).send({ email, role }).expect(201);
    const client = t.client();
    await client.post("/api/auth/sign-up").send({ name: role, email, password: "correct horse battery" }).expect(201);
    await client.post(`/api/invitations/${invitationToken(t.mailbox, email)}/accept`).expect(200);
    clients[role] = client;
  }
  diagramId = (await clients.owner.post(`/api/teams/${teamId}/diagrams`).send({ title: "Draft fan speed" })).body.diagram.id;
});
afterAll(() => t.close());

const emptyDocument = { format: "loopwright-diagram", version: 1, blocks: [], wires: [] };
// Importing starts a new diagram, so the file must be a diagram without errors: a gain between input and output.
const gainDocument = {
  format: "loopwright-diagram",
  version: 1,
  blocks: [{ id: "r", type: "input" }, { id: "k", type: "gain", expr: "2" }, { id: "y", type: "output" }],
  wires: [{ from: "r", to: "k" }, { from: "k", to: "y" }],
};

interface Route {
  name: string;
  call: (c: ReturnType<TestApp["client"]>) => Promise<request.Response>;
  expect: Record<Who, number>;
}

const A = (anonymous: number, nonMember: number, viewer: number, editor: number, owner: number) => ({ anonymous, nonMember, viewer, editor, owner });

const routes: Route[] = [
  { name: "GET /api/auth/me", call: (c) => c.get("/api/auth/me"), expect: A(401, 200, 200, 200, 200) },
  { name: "GET /api/teams", call: (c) => c.get("/api/teams"), expect: A(401, 200, 200, 200, 200) },
  { name: "POST /api/teams", call: (c) => c.post("/api/teams").send({ name: "Another" }), expect: A(401, 201, 201, 201, 201) },
  { name: "GET /api/teams/:id", call: (c) => c.get(`/api/teams/${teamId}`), expect: A(401, 404, 200, 200, 200) },
  { name: "GET /api/teams/:id/members", call: (c) => c.get(`/api/teams/${teamId}/members`), expect: A(401, 404, 200, 200, 200) },
  {
    name: "POST /api/teams/:id/invitations",
    call: (c) => c.post(`/api/teams/${teamId}/invitations`).send({ email: uniqueEmail("m"), role: "editor" }),
    expect: A(401, 404, 403, 403, 201),
  },
  {
    name: "DELETE /api/teams/:id/invitations/:invitationId",
    call: async (c) => c.delete(`/api/teams/${teamId}/invitations/${(await pendingInvitation()).id}`),
    expect: A(401, 404, 403, 403, 204),
  },
  {
    name: "PATCH /api/teams/:id/members/:userId",
    call: async (c) => c.patch(`/api/teams/${teamId}/members/${await addMember("viewer")}`).send({ role: "editor" }),
    expect: A(401, 404, 403, 403, 200),
  },
  {
    name: "DELETE /api/teams/:id/members/:userId",
    call: async (c) => c.delete(`/api/teams/${teamId}/members/${await addMember("viewer")}`),
    expect: A(401, 404, 403, 403, 204),
  },
  { name: "GET /api/teams/:id/diagrams", call: (c) => c.get(`/api/teams/${teamId}/diagrams`), expect: A(401, 404, 200, 200, 200) },
  {
    name: "POST /api/teams/:id/diagrams",
    call: (c) => c.post(`/api/teams/${teamId}/diagrams`).send({ title: "Matrix" }),
    expect: A(401, 404, 403, 201, 201),
  },
  { name: "GET /api/diagrams/:id", call: (c) => c.get(`/api/diagrams/${diagramId}`), expect: A(401, 404, 200, 200, 200) },
  {
    name: "PATCH /api/diagrams/:id",
    call: (c) => c.patch(`/api/diagrams/${diagramId}`).send({ title: "Renamed" }),
    expect: A(401, 404, 403, 200, 200),
  },
  { name: "POST /api/diagrams/:id/archive", call: (c) => c.post(`/api/diagrams/${diagramId}/archive`), expect: A(401, 404, 403, 200, 200) },
  { name: "POST /api/diagrams/:id/restore", call: (c) => c.post(`/api/diagrams/${diagramId}/restore`), expect: A(401, 404, 403, 200, 200) },
  { name: "GET /api/diagrams/:id/versions", call: (c) => c.get(`/api/diagrams/${diagramId}/versions`), expect: A(401, 404, 200, 200, 200) },
  {
    name: "POST /api/diagrams/:id/versions",
    call: async (c) => {
      const base = (await clients.owner.get(`/api/diagrams/${diagramId}`)).body.diagram.latestVersion ?? 0;
      return c.post(`/api/diagrams/${diagramId}/versions`).send({ baseVersion: base, document: emptyDocument });
    },
    expect: A(401, 404, 403, 201, 201),
  },
  {
    name: "GET /api/diagrams/:id/versions/:n/document.json",
    call: (c) => c.get(`/api/diagrams/${diagramId}/versions/1/document.json`), // version 1: saved by the route above
    expect: A(401, 404, 200, 200, 200),
  },
  {
    name: "POST /api/diagrams/:id/versions/:n/restore",
    call: (c) => c.post(`/api/diagrams/${diagramId}/versions/1/restore`),
    expect: A(401, 404, 403, 201, 201),
  },
  {
    name: "POST /api/diagrams/:id/share-links",
    call: (c) => c.post(`/api/diagrams/${diagramId}/share-links`).send({ version: 1, expiresInDays: 7 }),
    expect: A(401, 404, 403, 201, 201),
  },
  { name: "GET /api/diagrams/:id/share-links", call: (c) => c.get(`/api/diagrams/${diagramId}/share-links`), expect: A(401, 404, 403, 200, 200) },
  {
    name: "DELETE /api/diagrams/:id/share-links/:linkId",
    call: async (c) => c.delete(`/api/diagrams/${diagramId}/share-links/${(await shareLink()).id}`),
    expect: A(401, 404, 403, 204, 204),
  },
  { name: "GET /api/teams/:id/share-links", call: (c) => c.get(`/api/teams/${teamId}/share-links`), expect: A(401, 404, 403, 200, 200) },
  {
    name: "GET /api/shared/:token (no session needed)",
    call: async (c) => c.get(`/api/shared/${(await shareLink()).url.split("/s/")[1]}`),
    expect: A(200, 200, 200, 200, 200),
  },
  {
    name: "GET /api/diagrams/:id/versions/:n/comments",
    call: (c) => c.get(`/api/diagrams/${diagramId}/versions/1/comments`),
    expect: A(401, 404, 200, 200, 200),
  },
  {
    name: "POST /api/diagrams/:id/versions/:n/comments",
    call: (c) => c.post(`/api/diagrams/${diagramId}/versions/1/comments`).send({ body: "Matrix" }),
    expect: A(401, 404, 201, 201, 201),
  },
  {
    name: "POST /api/diagrams/:id/comments/:commentId/replies",
    call: async (c) => c.post(`/api/diagrams/${diagramId}/comments/${await ownerThread()}/replies`).send({ body: "Re" }),
    expect: A(401, 404, 201, 201, 201),
  },
  {
    name: "POST /api/diagrams/:id/comments/:commentId/resolve",
    call: async (c) => c.post(`/api/diagrams/${diagramId}/comments/${await ownerThread()}/resolve`),
    expect: A(401, 404, 200, 200, 200),
  },
  {
    name: "POST /api/diagrams/:id/comments/:commentId/reopen",
    call: async (c) => c.post(`/api/diagrams/${diagramId}/comments/${await ownerThread()}/reopen`),
    expect: A(401, 404, 200, 200, 200),
  },
  {
    name: "POST /api/teams/:id/diagrams/import",
    call: (c) =>
      c.post(`/api/teams/${teamId}/diagrams/import`).attach("file", Buffer.from(JSON.stringify(gainDocument)), "matrix.json"),
    expect: A(401, 404, 403, 201, 201),
  },
  {
    name: "POST /api/diagrams/:id/versions/import",
    call: (c) => c.post(`/api/diagrams/${diagramId}/versions/import`).attach("file", Buffer.from(JSON.stringify(gainDocument)), "matrix.json"),
    expect: A(401, 404, 403, 201, 201),
  },
  {
    name: "GET /api/invitations/:token",
    call: async (c) => c.get(`/api/invitations/${(await pendingInvitation()).token}`),
    expect: A(200, 200, 200, 200, 200),
  },
  {
    name: "POST /api/invitations/:token/accept (someone else's invitation)",
    call: async (c) => c.post(`/api/invitations/${(await pendingInvitation()).token}/accept`),
    expect: A(401, 403, 403, 403, 403),
  },
  { name: "GET /api/teams/:id/audit", call: (c) => c.get(`/api/teams/${teamId}/audit`), expect: A(401, 404, 403, 403, 200) },
  { name: "GET /api/config", call: (c) => c.get("/api/config"), expect: A(200, 200, 200, 200, 200) },
];

describe("role matrix", () => {
  for (const route of routes) {
    it(route.name, async () => {
      const got = {} as Record<Who, number>;
      for (const who of WHO) got[who] = (await route.call(clients[who])).status;
      expect(got).toEqual(route.expect);
    });
  }

  it("hides a team from a non-member exactly like a missing one", async () => {
    const missing = await clients.nonMember.get("/api/teams/00000000-0000-4000-8000-000000000000");
    const hidden = await clients.nonMember.get(`/api/teams/${teamId}`);
    expect(hidden.status).toBe(404);
    expect(hidden.body).toEqual(missing.body);
  });

  it("answers a malformed id with 404, not a server error", async () => {
    expect((await clients.owner.get("/api/teams/not-a-uuid")).status).toBe(404);
    expect((await clients.owner.get("/api/diagrams/42")).status).toBe(404);
  });

  it("refuses cookie-authenticated mutations without our Origin for every role", async () => {
    const agent = request(t.app);
    const res = await agent.post(`/api/teams/${teamId}/diagrams`).send({ title: "No origin" });
    expect(res.status).toBe(403);
    expect((await agent.post(`/api/teams/${teamId}/diagrams`).set("Origin", ORIGIN).send({ title: "x" })).status).toBe(401);
  });
});
