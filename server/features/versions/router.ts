import { Router } from "express";
import { saveVersionSchema } from "@shared/api/versions";
import type { EngineBudget } from "@server/features/versions/check";
import { diagramWithRole } from "@server/features/diagrams/access";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { getVersion, listVersions, saveVersion } from "@server/features/versions/service";

/** Versions of a diagram (mounted under /api/diagrams): list, read one, save the next. */
export function versionsRouter(budget?: EngineBudget): Router {
  const router = Router();
  router.get("/:id/versions", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "viewer");
    res.json({ versions: await listVersions(diagram.id) });
  });
  router.get("/:id/versions/:number", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "viewer");
    res.json({ version: await getVersion(diagram.id, Number(req.params.number)) });
  });
  router.post("/:id/versions", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "editor");
    const version = await saveVersion(diagram, user.id, parseWith(saveVersionSchema, req.body), budget);
    res.status(201).json({ version });
  });
  return router;
}
