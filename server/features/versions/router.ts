import { Router } from "express";
import { saveVersionSchema, versionListQuerySchema } from "@shared/api/versions";
import { diagramWithRole } from "@server/features/diagrams/access";
import type { SaveCheck } from "@server/features/versions/check";
import { diagramDocumentOf, documentFileName } from "@server/features/versions/document";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { getVersion, listVersions, restoreVersion, saveVersion } from "@server/features/versions/service";

/** Versions of a diagram (mounted under /api/diagrams): list, read one, download its document, save the next, restore one. */
export function versionsRouter(check: SaveCheck): Router {
  const router = Router();
  router.get("/:id/versions", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "viewer");
    const { limit } = parseWith(versionListQuerySchema, req.query);
    res.json({ versions: await listVersions(diagram.id, limit) });
  });
  router.get("/:id/versions/:number", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "viewer");
    res.json({ version: await getVersion(diagram.id, Number(req.params.number)) });
  });
  router.get("/:id/versions/:number/document.json", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "viewer");
    const version = await getVersion(diagram.id, Number(req.params.number));
    res.attachment(documentFileName(diagram.title, version.number)).type("application/json");
    res.send(`${JSON.stringify(version.document, null, 2)}\n`);
  });
  router.post("/:id/versions", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "editor");
    const { document, ...input } = parseWith(saveVersionSchema, req.body);
    const version = await saveVersion(diagram, user.id, { ...input, document: diagramDocumentOf(document) }, check);
    res.status(201).json({ version });
  });
  router.post("/:id/versions/:number/restore", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "editor");
    res.status(201).json({ version: await restoreVersion(diagram, user.id, Number(req.params.number), check) });
  });
  return router;
}
