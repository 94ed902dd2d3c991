import { Router, type RequestHandler } from "express";
import { inviteSchema } from "@shared/api/teams";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { requireRole } from "@server/features/teams/access";
import type { Mailer } from "@server/mail/mailer";
import { acceptInvitation, invite, previewInvitation, revokeInvitation } from "@server/features/invitations/service";

/** Team-side routes (mounted under /api/teams): create and revoke invitations. */
export function teamInvitationsRouter(deps: { mailer: Mailer; publicUrl: string }, limiter: RequestHandler): Router {
  const router = Router();
  router.post("/:teamId/invitations", limiter, async (req, res) => {
    const { teamId } = req.params as { teamId: string };
    const user = requireUser(res);
    await requireRole(teamId, user.id, "owner");
    const invitation = await invite(deps, teamId, user, parseWith(inviteSchema, req.body));
    res.status(201).json({ invitation });
  });
  router.delete("/:teamId/invitations/:invitationId", async (req, res) => {
    const me = requireUser(res).id;
    await requireRole(req.params.teamId, me, "owner");
    await revokeInvitation(req.params.teamId, req.params.invitationId, me);
    res.status(204).end();
  });
  return router;
}

/** Invitee-side routes (mounted under /api/invitations): look at a link, accept it. */
export function invitationLinkRouter(limiter: RequestHandler): Router {
  const router = Router();
  router.get("/:token", limiter, async (req, res) => {
    res.json({ invitation: await previewInvitation((req.params as { token: string }).token) });
  });
  router.post("/:token/accept", limiter, async (req, res) => {
    res.json({ teamId: await acceptInvitation((req.params as { token: string }).token, requireUser(res)) });
  });
  return router;
}
