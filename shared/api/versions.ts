import { z } from "zod";
import type { Problem } from "@shared/diagram/problems";
import type { ReductionResult } from "@shared/reduce/result";
import type { DiagramVersionView } from "@shared/api/diagrams";

/**
 * Saving a version: the editor sends the version it started from; the server refuses with 409 when another
 * version was saved meanwhile, so nothing is overwritten silently.
 * Example: { baseVersion: 3, message: "Retuned PI", document: { format: "loopwright-diagram", … } }.
 */
export const saveVersionSchema = z.object({
  /** The latest version number the editor loaded; 0 when the diagram had none. */
  baseVersion: z.number().int().min(0),
  message: z.string().trim().max(500, "Use at most 500 characters").default(""),
  /** Checked on the server against the diagram document schema (422 with problems when it fails). */
  document: z.unknown(),
});
export type SaveVersionInput = z.input<typeof saveVersionSchema>;

/** What the server stores in `diagram_versions.result` after re-running the engine on the saved document. */
export type CheckedResult =
  | { ok: true; result: ReductionResult; engineMs: number }
  | { ok: false; problems: Problem[]; engineMs: number };

/** 409 body: the error plus the version that won, so the editor can offer to reload or save as a new diagram. */
export interface StaleVersionBody {
  error: { code: "stale_version"; message: string };
  latest: DiagramVersionView;
}

/** 422 body for a document that is not a Loopwright diagram document. */
export interface InvalidDocumentBody {
  error: { code: "invalid_document"; message: string };
  problems: Problem[];
}

export interface VersionListItem {
  number: number;
  message: string;
  createdAt: string;
  createdBy: string;
  ok: boolean | null; // engine verdict of the stored result; null when never checked
}
