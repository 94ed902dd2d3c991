import { Router } from "express";
import { changeRoleSchema, createTeamSchema } from "@shared/api/teams";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { requireRole } from "@server/features/teams/access";
import { listInvitations } from "@server/features/invitations/service";
import { changeRole, createTeam, getTeam, listMembers, listTeams, removeMember } from "@server/features/teams/service";

export function teamsRouter(): Router {
  const router = Router();

  router.get("/", async (_req, res) => {
    res.json({ teams: await listTeams(requireUser(res).id) });
  });

  router.post("/", async (req, res) => {
    const user = requireUser(res);
    res.status(201).json({ team: await createTeam(user.id, parseWith(createTeamSchema, req.body)) });
  });

  router.get("/:teamId", async (req, res) => {
    const role = await requireRole(req.params.teamId, requireUser(res).id);
    res.json({ team: await getTeam(req.params.teamId, role) });
  });

  router.get("/:teamId/members", async (req, res) => {
    const role = await requireRole(req.params.teamId, requireUser(res).id);
    const invitations = role === "owner" ? await listInvitations(req.params.teamId) : [];
    res.json({ members: await listMembers(req.params.teamId), invitations });
  });

  router.patch("/:teamId/members/:userId", async (req, res) => {
    const me = requireUser(res).id;
    await requireRole(req.params.teamId, me, "owner");
    res.json({ member: await changeRole(req.params.teamId, me, req.params.userId, parseWith(changeRoleSchema, req.body)) });
  });

  router.delete("/:teamId/members/:userId", async (req, res) => {
    const me = requireUser(res).id;
    // Anyone may leave; removing somebody else takes an owner.
    await requireRole(req.params.teamId, me, me === req.params.userId ? "viewer" : "owner");
    await removeMember(req.params.teamId, me, req.params.userId);
    res.status(204).end();
  });

  return router;
}
