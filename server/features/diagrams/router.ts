import { Router, type Request } from "express";
import { createDiagramSchema, updateDiagramSchema } from "@shared/api/diagrams";
import { requireUser } from "@server/http/session";
import { parseWith } from "@server/http/validate";
import { requireRole } from "@server/features/teams/access";
import { diagramWithRole } from "@server/features/diagrams/access";
import { createDiagram, diagramDetail, listDiagrams, setArchived, updateDiagram } from "@server/features/diagrams/service";
import { importDiagram } from "@server/features/diagrams/importDiagram";
import { diagramFileUpload, uploadedDiagram } from "@server/features/diagrams/uploadedDiagram";
import type { SaveCheck } from "@server/features/versions/check";

/** Team-side routes (mounted under /api/teams); importing saves through the versions' check. */
export function teamDiagramsRouter(check: SaveCheck): Router {
  const router = Router();
  router.get("/:teamId/diagrams", async (req, res) => {
    await requireRole(req.params.teamId, requireUser(res).id);
    res.json({ diagrams: await listDiagrams(req.params.teamId, req.query.archived === "1") });
  });
  router.post("/:teamId/diagrams", async (req, res) => {
    const user = requireUser(res);
    await requireRole(req.params.teamId, user.id, "editor");
    res.status(201).json({ diagram: await createDiagram(req.params.teamId, user.id, parseWith(createDiagramSchema, req.body)) });
  });
  router.post(
    "/:teamId/diagrams/import",
    // Access first, so the file of a non-member or viewer is never read.
    async (req: Request<{ teamId: string }>, res, next) => (await requireRole(req.params.teamId, requireUser(res).id, "editor"), next()),
    diagramFileUpload(),
    async (req: Request<{ teamId: string }>, res) => {
      const { document, title, fileName } = uploadedDiagram(req.file);
      const input = { document, title: parseWith(createDiagramSchema, { title }).title, fileName };
      res.status(201).json({ diagram: await importDiagram(req.params.teamId, requireUser(res).id, input, check) });
    },
  );
  return router;
}

/** Diagram routes (mounted under /api/diagrams); membership of the diagram's team decides access. */
export function diagramsRouter(): Router {
  const router = Router();
  router.get("/:id", async (req, res) => {
    const { diagram, role } = await diagramWithRole(requireUser(res).id, req.params.id, "viewer");
    res.json(await diagramDetail(diagram, role));
  });
  router.patch("/:id", async (req, res) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "editor");
    res.json({ diagram: await updateDiagram(diagram, parseWith(updateDiagramSchema, req.body)) });
  });
  for (const [action, archived] of [["archive", true], ["restore", false]] as const) {
    router.post(`/:id/${action}`, async (req, res) => {
      const { diagram } = await diagramWithRole(requireUser(res).id, req.params.id, "editor");
      res.json({ diagram: await setArchived(diagram, archived) });
    });
  }
  return router;
}
