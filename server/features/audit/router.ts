import { Router } from "express";
import { auditQuerySchema } from "@shared/api/audit";
import { listAuditEvents } from "@server/features/audit/service";
import { requireRole } from "@server/features/teams/access";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";

/** The team's audit trail (mounted under /api/teams): owners only; a bad query is a 400 naming the field. */
export function teamAuditRouter(): Router {
  const router = Router();
  router.get("/:teamId/audit", async (req, res) => {
    await requireRole(req.params.teamId, requireUser(res).id, "owner");
    res.json(await listAuditEvents(req.params.teamId, parseWith(auditQuerySchema, req.query, 400)));
  });
  return router;
}
