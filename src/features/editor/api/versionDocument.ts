/**
 * GET /api/diagrams/:id/versions/:n/document.json — version n's document as a file download (the server names it
 * `<title>-v<n>.json`), so it is a link, not a query.
 */
export const versionDocumentHref = (diagramId: string, number: number) =>
  `/api/diagrams/${encodeURIComponent(diagramId)}/versions/${number}/document.json`;
