import { Router, type Request, type Response } from "express";
import { pinTarget } from "@shared/api/comments";
import type { CheckedResult } from "@shared/api/versions";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { ExportPin } from "@shared/export/diagramSvg";
import { exportVersionSvg, svgToPng } from "@server/export/exportVersion";
import { pinsForVersion } from "@server/features/comments/pins";
import { diagramWithRole } from "@server/features/diagrams/access";
import { resolveShareToken } from "@server/features/shareLinks/resolve";
import { documentFileName } from "@server/features/versions/document";
import { getVersion } from "@server/features/versions/service";
import { requireUser } from "@server/http/session";

/** The open review threads pinned on a version, as the figure marks and lists them: "Comment 2 on block b3 (Plant)". */
async function commentPins(diagramId: string, versionNumber: number, document: DiagramDocument): Promise<ExportPin[]> {
  const pins = await pinsForVersion(diagramId, versionNumber, { includeResolved: false });
  return pins.map((p) => ({ id: p.id, target: p.target, number: Number(p.label), label: `Comment ${p.label} on ${pinTarget(p.target, document)}` }));
}

/**
 * A version's figure as SVG or PNG at 2× (mounted under /api/diagrams; viewers and up, like reading the version).
 * `?comments=1` adds the markers of its open pinned review threads; share links never do (they reveal no comments).
 */
export function exportRouter(): Router {
  const router = Router();
  const svgOf = async (req: Request, res: Response) => {
    const { diagram } = await diagramWithRole(requireUser(res).id, String(req.params.id), "viewer");
    const v = await getVersion(diagram.id, Number(req.params.number));
    const document = v.document as DiagramDocument;
    const pins = req.query.comments === "1" ? await commentPins(diagram.id, v.number, document) : undefined;
    const svg = await exportVersionSvg({ title: diagram.title, versionNumber: v.number, savedAt: v.createdAt, document, result: v.result as CheckedResult | null, pins });
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
