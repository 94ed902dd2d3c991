import { Router, type Request } from "express";
import { diagramWithRole } from "@server/features/diagrams/access";
import { diagramFileUpload, uploadedDiagram } from "@server/features/diagrams/uploadedDiagram";
import type { SaveCheck } from "@server/features/versions/check";
import { importVersion } from "@server/features/versions/importVersion";
import { requireUser } from "@server/http/session";

/**
 * POST /api/diagrams/:id/versions/import (mounted under /api/diagrams; editors and owners): a .json file, read and
 * validated as for a new diagram's import, becomes the diagram's next version → 201 `{ version }` as a save answers.
 */
export function versionImportRouter(check: SaveCheck): Router {
  const router = Router();
  router.post(
    "/:id/versions/import",
    // Access first, so the file of a non-member or viewer is never read.
    async (req: Request<{ id: string }>, res, next) => (await diagramWithRole(requireUser(res).id, req.params.id, "editor"), next()),
    diagramFileUpload(),
    async (req: Request<{ id: string }>, res) => {
      const user = requireUser(res);
      const { diagram } = await diagramWithRole(user.id, req.params.id, "editor");
      const { document, fileName } = uploadedDiagram(req.file);
      res.status(201).json({ version: await importVersion(diagram, user.id, { fileName, document }, check) });
    },
  );
  return router;
}
