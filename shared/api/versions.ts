import { z } from "zod";
import type { DiagramDocument } from "@shared/diagram/schema";
import type { Problem } from "@shared/diagram/problems";
import type { ReductionResult } from "@shared/reduce/result";
import type { DiagramVersionView } from "@shared/api/diagrams";
import type { VersionSummary } from "@shared/analysis/versionSummary";

/**
 * Saving a version: the editor sends the version it started from; the server refuses with 409 when another
 * version was saved meanwhile, so nothing is overwritten silently.
 * Example: { baseVersion: 3, message: "Retuned PI", document: { format: "loopwright-diagram", … } }.
 */
export const saveVersionSchema = z.object({
  /** The latest version number the editor loaded; 0 when the diagram had none. */
  baseVersion: z.number().int().min(0),
  message: z.string().trim().max(500, "Use at most 500 characters").default(""),
  /** Read with `loadDiagram` at the route's edge, whose problems name the field and block (422 `invalid_document`). */
  document: z.unknown(),
});
export type SaveVersionInput = z.input<typeof saveVersionSchema>;
/** A save request once read at the edge: its document is a diagram document. */
export type SaveVersion = Omit<z.output<typeof saveVersionSchema>, "document"> & { document: DiagramDocument };

/** Problem codes of a save-time check that did not finish; the version is stored all the same. */
export const CHECK_BUDGET = "check-budget";
export const CHECK_CRASHED = "check-crashed";

/**
 * What the server stores in `diagram_versions.result` after re-running the reducer on the saved document:
 * its result, the diagram's problems, or — when the check itself did not finish — why: over the server's time or
 * memory budget, or crashed (a server bug, logged with its stack), with one problem saying so.
 * `engineMs` (the check's duration) keeps its first name: versions already stored carry it. `summary` (the default
 * pair's order, verdict, phase margin, overshoot; null when that pair cannot be analysed) is absent on versions stored
 * before it existed.
 * Example: { ok: false, failure: "crashed", problems: [{ code: "check-crashed", … }], engineMs: 3.1 }.
 */
export type CheckedResult =
  | { ok: true; result: ReductionResult; engineMs: number; summary?: VersionSummary | null }
  | { ok: false; problems: Problem[]; engineMs: number }
  | { ok: false; failure: "over-budget" | "crashed"; problems: [Problem]; engineMs: number };

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

/** `GET /api/diagrams/:id/versions?limit=n`: only the newest n versions. Example: { limit: 1 }. */
export const versionListQuerySchema = z.object({
  limit: z.coerce.number().int().min(1, "limit is at least 1").max(1000, "limit is at most 1000").optional(),
});

export interface VersionListItem {
  number: number;
  message: string;
  createdAt: string;
  createdBy: string;
  ok: boolean | null; // the check's verdict of the stored result; null when never checked
  /** Error problems of a version saved with problems (0 when ok or never checked). */
  problemCount: number;
  /** The checked result's summary; null when there is none (saved with problems, or stored before summaries). */
  summary: VersionSummary | null;
}

/** The version table's reading of a stored check: its verdict, how many errors, the default pair's summary. */
export function checkedSummary(checked: CheckedResult | null): Pick<VersionListItem, "ok" | "problemCount" | "summary"> {
  if (checked === null) return { ok: null, problemCount: 0, summary: null };
  if (checked.ok) return { ok: true, problemCount: 0, summary: checked.summary ?? null };
  return { ok: false, problemCount: checked.problems.filter((p) => p.severity === "error").length, summary: null };
}

/** `POST /api/diagrams/:id/versions/:n/restore` → 201: the new version, saved with message "Restored from vN". */
export const restoredMessage = (from: number) => `Restored from v${from}`;

/**
 * `POST /api/diagrams/:id/versions/import` → 201: the new version, saved with message "Imported from <file name>"
 * (the name cut to fit the 500-character message).
 */
export const importedMessage = (fileName: string) => `Imported from ${fileName}`.slice(0, 500);
