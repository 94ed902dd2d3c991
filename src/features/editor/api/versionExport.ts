import { href } from "@shared/routes";
import { versionDocumentHref } from "@/features/editor/api/versionDocument";

export type FigureFormat = "svg" | "png";

/** GET /api/diagrams/:id/versions/:n/export.svg|.png — version n's figure shown in a page (an image's src). */
export const versionFigureSrc = (diagramId: string, number: number, format: FigureFormat) =>
  `/api/diagrams/${encodeURIComponent(diagramId)}/versions/${number}/export.${format}`;

/**
 * GET /api/diagrams/:id/versions/:n/export.svg|.png?download=1 — version n's figure as a file download (the server
 * names it `<title>-v<n>.svg|png`), so these are links, not queries.
 */
export const versionFigureHref = (diagramId: string, number: number, format: FigureFormat) =>
  `${versionFigureSrc(diagramId, number, format)}?download=1`;

/** GET /api/shared/:token/export.svg|.png?download=1 — the figure of the version a share link opens (no session). */
export const sharedFigureHref = (token: string, format: FigureFormat) => `/api/shared/${encodeURIComponent(token)}/export.${format}?download=1`;

/** The files the editor's Export menu offers for one saved version. */
export interface VersionExports {
  number: number;
  svg: string;
  png: string;
  /** The SVG with the version's open pinned review comments drawn and listed. */
  svgWithComments: string;
  json: string;
  /** The printable review sheet of the version (a page of the app, not a download). */
  sheet: string;
}

export const versionExports = (diagramId: string, number: number): VersionExports => ({
  number,
  svg: versionFigureHref(diagramId, number, "svg"),
  png: versionFigureHref(diagramId, number, "png"),
  svgWithComments: `${versionFigureHref(diagramId, number, "svg")}&comments=1`,
  json: versionDocumentHref(diagramId, number),
  sheet: href.sheet(diagramId, number),
});
