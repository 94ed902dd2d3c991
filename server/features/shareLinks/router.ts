import { Router } from "express";
import { createShareLinkSchema } from "@shared/api/shareLinks";
import { diagramWithRole } from "@server/features/diagrams/access";
import { requireRole } from "@server/features/teams/access";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { createShareLink, listDiagramShareLinks, listTeamShareLinks, openSharedVersion, revokeShareLink } from "@server/features/shareLinks/service";

/** A diagram's share links (mounted under /api/diagrams): editors and owners make, list and revoke them. */
export function diagramShareLinksRouter(deps: { publicUrl: string }): Router {
  const router = Router();
  router.post("/:id/share-links", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "editor");
    const shareLink = await createShareLink(diagram, user.id, parseWith(createShareLinkSchema, req.body), deps.publicUrl);
    res.status(201).json({ shareLink });
  });
  router.get("/:id/share-links", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "editor");
    res.json({ shareLinks: await listDiagramShareLinks(diagram.id) });
  });
  router.delete("/:id/share-links/:linkId", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "editor");
    await revokeShareLink(diagram, req.params.linkId, user.id);
    res.status(204).end();
  });
  return router;
}

/** The team page's list of every link of the team's diagrams (mounted under /api/teams). */
export function teamShareLinksRouter(): Router {
  const router = Router();
  router.get("/:teamId/share-links", async (req, res) => {
    await requireRole(req.params.teamId, requireUser(res).id, "editor");
    res.json({ shareLinks: await listTeamShareLinks(req.params.teamId) });
  });
  return router;
}

/** What a link's reader may fetch, with no session (mounted under /api/shared): the one version it grants. */
export function sharedLinkRouter(): Router {
  const router = Router();
  router.get("/:token", async (req, res) => {
    res.json(await openSharedVersion((req.params as { token: string }).token));
  });
  return router;
}
