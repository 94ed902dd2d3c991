/** The paper sizes a review sheet prints on, as the paper select names them. */
export const PAPERS = ["A4", "Letter"] as const;
export type Paper = (typeof PAPERS)[number];

/** Every paper's margin on all four sides. */
export const PAGE_MARGIN_MM = 12;

/** A sheet's size in millimetres and its name in CSS `@page { size }`. */
const SIZES: Record<Paper, { css: string; widthMm: number; heightMm: number }> = {
  A4: { css: "A4", widthMm: 210, heightMm: 297 },
  Letter: { css: "letter", widthMm: 215.9, heightMm: 279.4 },
};

// Kept off the printable height so rounding to device pixels can never push the last line onto a second page.
const SLACK_MM = 2;

/** "letter" → "Letter"; anything unknown → A4, the default. Example: paperOf("letter") === "Letter". */
export const paperOf = (value: string | null): Paper => PAPERS.find((p) => p.toLowerCase() === value?.toLowerCase()) ?? "A4";

/** The page rule that sets the printer's paper. Example: pageRule("Letter") === "@page { size: letter; margin: 12mm }". */
export const pageRule = (paper: Paper): string => `@page { size: ${SIZES[paper].css}; margin: ${PAGE_MARGIN_MM}mm }`;

/**
 * The sheet's box: the paper's printable area (less a little slack), in the same CSS millimetres on screen and in
 * print, so the screen shows the page as it prints and the charts keep the width they were drawn at.
 * Example: sheetBox("A4") → { width: "186mm", height: "271mm" }.
 */
export function sheetBox(paper: Paper): { width: string; height: string } {
  const { widthMm, heightMm } = SIZES[paper];
  const round = (mm: number) => `${Math.round(mm * 10) / 10}mm`;
  return { width: round(widthMm - 2 * PAGE_MARGIN_MM), height: round(heightMm - 2 * PAGE_MARGIN_MM - SLACK_MM) };
}
