import { Router, type Request, type Response } from "express";
import type { CheckedResult } from "@shared/api/versions";
import type { DiagramDocument } from "@shared/diagram/schema";
import { exportVersionSvg, svgToPng } from "@server/export/exportVersion";
import { diagramWithRole } from "@server/features/diagrams/access";
import { resolveShareToken } from "@server/features/shareLinks/resolve";
import { documentFileName } from "@server/features/versions/document";
import { getVersion } from "@server/features/versions/service";
import { requireUser } from "@server/http/session";

/** A version's figure as SVG or PNG at 2× (mounted under /api/diagrams; viewers and up, like reading the version). */
export function exportRouter(): Router {
  const router = Router();
  const svgOf = async (req: Request, res: Response) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, String(req.params.id), "viewer");
    const v = await getVersion(diagram.id, Number(req.params.number));
    const svg = await exportVersionSvg({ title: diagram.title, versionNumber: v.number, savedAt: v.createdAt, document: v.document as DiagramDocument, result: v.result as CheckedResult | null });
    const name = (ext: string) => documentFileName(diagram.title, v.number).replace(/\.json$/, ext);
    return { svg, name };
  };
  serveFigures(router, "/:id/versions/:number", svgOf);
  return router;
}

/** The figure of the version a share link opens (mounted under /api/shared; no session: the token is the grant). */
export function sharedExportRouter(): Router {
  const router = Router();
  serveFigures(router, "/:token", async (req) => {
    const { title, version: v } = await resolveShareToken(String(req.params.token));
    const svg = await exportVersionSvg({ title, versionNumber: v.number, savedAt: v.createdAt.toISOString(), document: v.document as DiagramDocument, result: v.result as CheckedResult | null });
    return { svg, name: (ext: string) => documentFileName(title, v.number).replace(/\.json$/, ext) };
  });
  return router;
}

type Figure = (req: Request, res: Response) => Promise<{ svg: string; name: (ext: string) => string }>;

/** `<base>/export.svg` and `<base>/export.png` (2×), as attachments with `?download=1`. */
function serveFigures(router: Router, base: string, figure: Figure): void {
  router.get(`${base}/export.svg`, async (req, res) => {
    const { svg, name } = await figure(req, res);
    if (req.query.download === "1") res.attachment(name(".svg"));
    res.type("image/svg+xml").send(svg);
  });
  router.get(`${base}/export.png`, async (req, res) => {
    const { svg, name } = await figure(req, res);
    if (req.query.download === "1") res.attachment(name(".png"));
    res.type("image/png").send(svgToPng(svg));
  });
}
