import { Router } from "express";
import { saveVersionSchema, versionListQuerySchema } from "@shared/api/versions";
import type { DiagramDocument } from "@shared/diagram/schema";
import { loadDiagram } from "@shared/diagram/validate";
import { diagramWithRole } from "@server/features/diagrams/access";
import type { SaveCheck } from "@server/features/versions/check";
import { HttpError } from "@server/http/errors";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { getVersion, listVersions, saveVersion } from "@server/features/versions/service";

/** The request's document read as a diagram document; otherwise 422 with problems naming the field and block. */
function diagramDocumentOf(raw: unknown): DiagramDocument {
  const loaded = loadDiagram(raw);
  if (loaded.doc) return loaded.doc;
  throw new HttpError(422, "invalid_document", "This is not a Loopwright diagram document.", undefined, { problems: loaded.problems });
}

/** Versions of a diagram (mounted under /api/diagrams): list, read one, save the next. */
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
  router.post("/:id/versions", async (req, res) => {
    const user = requireUser(res);
    const { diagram } = await diagramWithRole(user.id, req.params.id, "editor");
    const { document, ...input } = parseWith(saveVersionSchema, req.body);
    const version = await saveVersion(diagram, user.id, { ...input, document: diagramDocumentOf(document) }, check);
    res.status(201).json({ version });
  });
  return router;
}
