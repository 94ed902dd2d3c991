import { Resvg } from "@resvg/resvg-js";
import type { CheckedResult } from "@shared/api/versions";
import type { DiagramDocument } from "@shared/diagram/schema";
import { diagramSvg, type ExportPin } from "@shared/export/diagramSvg";
import { typeset } from "@server/export/typeset";

export interface ExportVersionInput {
  title: string;
  versionNumber: number;
  savedAt: string;
  document: DiagramDocument;
  result: CheckedResult | null;
  pins?: ExportPin[];
}

/** A saved version as a self-contained SVG (formulas as paths). */
export async function exportVersionSvg({ title, versionNumber, savedAt, document, result, pins }: ExportVersionInput): Promise<string> {
  return diagramSvg({ document, result, meta: { title, version: versionNumber, savedAt }, pins, typeset });
}

/** The same SVG as a PNG at twice its size. */
export const svgToPng = (svg: string): Buffer => new Resvg(svg, { fitTo: { mode: "zoom", value: 2 } }).render().asPng();
