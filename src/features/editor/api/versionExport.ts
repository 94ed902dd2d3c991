import { versionDocumentHref } from "@/features/editor/api/versionDocument";

export type FigureFormat = "svg" | "png";

/** `<base>/export.svg|.png?download=1`: the server sends the figure as an attachment (the PNG at 2× from the same SVG). */
const figureHref = (base: string, format: FigureFormat) => `${base}/export.${format}?download=1`;

/**
 * GET /api/diagrams/:id/versions/:n/export.svg|.png?download=1 — version n's figure as a file download (the server
 * names it `<title>-v<n>.svg|png`), so these are links, not queries.
 */
export const versionFigureHref = (diagramId: string, number: number, format: FigureFormat) =>
  figureHref(`/api/diagrams/${encodeURIComponent(diagramId)}/versions/${number}`, format);

/** GET /api/shared/:token/export.svg|.png?download=1 — the figure of the version a share link opens (no session). */
export const sharedFigureHref = (token: string, format: FigureFormat) => figureHref(`/api/shared/${encodeURIComponent(token)}`, format);

/** The files the editor's Export menu offers for one saved version. */
export interface VersionExports {
  number: number;
  svg: string;
  png: string;
  json: string;
}

export const versionExports = (diagramId: string, number: number): VersionExports => ({
  number,
  svg: versionFigureHref(diagramId, number, "svg"),
  png: versionFigureHref(diagramId, number, "png"),
  json: versionDocumentHref(diagramId, number),
});
