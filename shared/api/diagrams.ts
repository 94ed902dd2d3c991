import { z } from "zod";

export const diagramTitleSchema = z.string().trim().min(1, "Enter a title").max(120, "Use at most 120 characters");

export const createDiagramSchema = z.object({
  title: diagramTitleSchema,
  description: z.string().trim().max(2000, "Use at most 2000 characters").optional().default(""),
});
export type CreateDiagramInput = z.input<typeof createDiagramSchema>;

export const updateDiagramSchema = z
  .object({
    title: diagramTitleSchema.optional(),
    description: z.string().trim().max(2000, "Use at most 2000 characters").optional(),
  })
  .refine((v) => v.title !== undefined || v.description !== undefined, { message: "Nothing to change" });
export type UpdateDiagramInput = z.infer<typeof updateDiagramSchema>;

export interface DiagramSummary {
  id: string;
  teamId: string;
  title: string;
  description: string;
  latestVersion: number | null;
  updatedAt: string;
  author: string; // name of the creator of the latest version, else of the diagram
  archivedAt: string | null;
}

export interface DiagramVersionView {
  number: number;
  document: unknown;
  result: unknown;
  message: string;
  createdAt: string;
  createdBy: string;
}

/** The latest version as a diagram's page opens it: without the stored result (GET …/versions/:n has it; the editor recomputes it live). */
export type LatestVersionView = Omit<DiagramVersionView, "result">;

export interface DiagramDetail {
  diagram: DiagramSummary & { role: "owner" | "editor" | "viewer"; teamName: string };
  latestVersion: LatestVersionView | null;
}
